package org.baywright.design.dg11;

/**
 * The inputs of the walking check of one bay (DG11 2nd ed. Ch. 4, low-frequency floors): its beams and its
 * girder, the slab's transverse stiffness, the coefficients and floor extents that set the effective widths,
 * damping, walking force and limit. All SI.
 *
 * @param beam the beams (joists) of the bay
 * @param girder the girder carrying them
 * @param es modulus of the steel E_s [Pa]
 * @param ds transformed slab moment of inertia per unit width D_s = de³/(12·n) ({@link Stiffness#ds}) [m⁴/m]
 * @param cj C_j ({@link Dg11#CJ_INTERIOR} 2.0, {@link Dg11#CJ_PARALLEL_TO_INTERIOR_EDGE} 1.0)
 * @param cg C_g ({@link Dg11#CG_WEB_CONNECTED} 1.8, {@link Dg11#CG_JOIST_SEATS} 1.6)
 * @param floorWidth the floor extent perpendicular to the beams that the bay sees; B_j ≤ 2/3 of it [m] (∞: no limit)
 * @param floorLength the floor extent perpendicular to the girders that the bay sees; B_g ≤ 2/3 of it [m] (∞: no limit)
 * @param beta modal damping ratio β ({@link Damping})
 * @param po walking force P_o [N] ({@link Occupancy#po})
 * @param limit tolerance limit a_o/g, a fraction of g ({@link Occupancy#limit})
 */
public record BayVibration(VibrationMember beam, VibrationMember girder, double es, double ds, double cj, double cg,
        double floorWidth, double floorLength, double beta, double po, double limit) {

    public BayVibration {
        if (beam == null || girder == null) {
            throw new IllegalArgumentException("bay vibration: a beam and a girder are required");
        }
        if (!(es > 0) || !(ds > 0) || !(cj > 0) || !(cg > 0) || !(floorWidth > 0) || !(floorLength > 0) || !(beta > 0)
                || !(po > 0) || !(limit > 0)) {
            throw new IllegalArgumentException("bay vibration: E_s, D_s, C_j, C_g, floor extents, β, P_o and a_o/g must be"
                    + " positive, got " + es + ", " + ds + ", " + cj + ", " + cg + ", " + floorWidth + ", " + floorLength
                    + ", " + beta + ", " + po + ", " + limit);
        }
    }

    /**
     * An interior bay (C_j = 2.0, C_g = 1.8, no floor-extent limit) of {@code occupancy} with damping
     * {@code damping}; P_o and a_o/g by the occupancy.
     */
    public static BayVibration interior(VibrationMember beam, VibrationMember girder, double es, double ds,
            Occupancy occupancy, Damping damping) {
        return new BayVibration(beam, girder, es, ds, Dg11.CJ_INTERIOR, Dg11.CG_WEB_CONNECTED, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, damping.beta(), occupancy.po(), occupancy.limit());
    }

    /** The same bay with the floor extents it sees (B_j ≤ 2/3 width, B_g ≤ 2/3 length) [m]. */
    public BayVibration withFloor(double width, double length) {
        return new BayVibration(beam, girder, es, ds, cj, cg, width, length, beta, po, limit);
    }

    /** The same bay with other C_j and C_g (e.g. beams parallel to an interior edge: C_j = 1.0). */
    public BayVibration withCoefficients(double cjValue, double cgValue) {
        return new BayVibration(beam, girder, es, ds, cjValue, cgValue, floorWidth, floorLength, beta, po, limit);
    }

    /** The same bay with another damping ratio. */
    public BayVibration withBeta(double value) {
        return new BayVibration(beam, girder, es, ds, cj, cg, floorWidth, floorLength, value, po, limit);
    }

    /** The same bay with another walking force and limit (another occupancy). */
    public BayVibration withOccupancy(Occupancy occupancy) {
        return new BayVibration(beam, girder, es, ds, cj, cg, floorWidth, floorLength, beta, occupancy.po(), occupancy.limit());
    }

    public BayVibration withBeam(VibrationMember value) {
        return new BayVibration(value, girder, es, ds, cj, cg, floorWidth, floorLength, beta, po, limit);
    }

    public BayVibration withGirder(VibrationMember value) {
        return new BayVibration(beam, value, es, ds, cj, cg, floorWidth, floorLength, beta, po, limit);
    }
}
