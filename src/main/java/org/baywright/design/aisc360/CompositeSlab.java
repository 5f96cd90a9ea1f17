package org.baywright.design.aisc360;

/**
 * The concrete of a composite beam as AISC 360-16 I3 sees it over the effective width: a solid layer
 * above the deck and, below it, the deck ribs, of which the share {@code ribFraction} of the width is
 * concrete that counts. Lengths in m, stress in Pa.
 *
 * <p>Which concrete counts (I3.2c(2), I3.2c(3)): with the ribs perpendicular to the beam the concrete
 * below the top of the deck is neglected ({@code ribFraction = 0}); with the ribs parallel to the beam
 * it is included, as the average rib width over the rib pitch ({@code ribFraction = w_r/pitch});
 * a solid slab has {@code hr = 0}. Use {@link #of} to build it from the deck's geometry.
 *
 * @param b effective width b (I3.1a)
 * @param tc concrete thickness above the deck (the whole slab when there is no deck)
 * @param hr rib height h_r: distance from the top of the steel to the underside of the solid layer
 * @param ribFraction ρ, the share of b that is concrete between the ribs' top and bottom (0 to 1)
 * @param fc specified compressive strength f′c
 */
public record CompositeSlab(double b, double tc, double hr, double ribFraction, double fc) {

    public CompositeSlab {
        if (!(b > 0) || !(tc > 0) || !(hr >= 0) || !(fc > 0) || !(ribFraction >= 0 && ribFraction <= 1)
                || !Double.isFinite(b + tc + hr + fc)) {
            throw new IllegalArgumentException("composite slab: b, tc and f′c must be positive, hr ≥ 0 and the rib "
                    + "fraction between 0 and 1; got b = " + b + ", tc = " + tc + ", hr = " + hr + ", ρ = " + ribFraction
                    + ", f′c = " + fc);
        }
    }

    /**
     * The slab as the orientation of the ribs makes it count (I3.2c(2) perpendicular: concrete above the
     * deck only; I3.2c(3) parallel: the ribs' concrete too, as w_r/pitch of the width).
     *
     * @param wr average rib width (concrete) [m]; ignored when there is no deck or the ribs are perpendicular
     * @param pitch rib pitch [m]; as for {@code wr}
     */
    public static CompositeSlab of(double b, double tc, double hr, double wr, double pitch, DeckRibs ribs, double fc) {
        return switch (ribs) {
            case NONE -> new CompositeSlab(b, tc, 0, 0, fc);
            case PERPENDICULAR -> new CompositeSlab(b, tc, hr, 0, fc);
            case PARALLEL -> new CompositeSlab(b, tc, hr, Math.min(1, wr / pitch), fc);
        };
    }

    /** Y_con: distance from the top of the steel to the top of the slab, h_r + t_c [m]. */
    public double ycon() {
        return hr + tc;
    }

    /** A_c: area of concrete that counts over the effective width, b·(t_c + ρ·h_r) [m²]. */
    public double ac() {
        return b * (tc + ribFraction * hr);
    }
}
