package org.baywright.design;

import org.baywright.design.aisc360.StudPosition;
import org.baywright.units.Units;

/**
 * The steel headed stud anchors of a composite beam.
 *
 * @param diameter shank diameter d_sa [m]
 * @param fu specified minimum tensile strength F_u [Pa]
 * @param perRib studs per rib (deck perpendicular) or per row across the flange (deck parallel, solid slab)
 * @param position weak or strong position in a perpendicular rib (I8.2a, R_p)
 */
public record Studs(double diameter, double fu, int perRib, StudPosition position) {

    public Studs {
        if (!(diameter > 0) || !(fu > 0) || perRib < 1 || position == null) {
            throw new IllegalArgumentException("studs: diameter and Fu must be positive, at least one stud per rib, a position");
        }
    }

    /** ¾ in studs, F_u = 65 ksi (ASTM A108 Type B, AWS D1.1), one per rib, weak position: common practice. */
    public static Studs defaults() {
        return new Studs(Units.IN.toSi(0.75), Units.KSI.toSi(65), 1, StudPosition.WEAK);
    }

    public Studs withPerRib(int n) {
        return new Studs(diameter, fu, n, position);
    }

    public Studs withPosition(StudPosition p) {
        return new Studs(diameter, fu, perRib, p);
    }
}
