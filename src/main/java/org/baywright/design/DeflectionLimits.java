package org.baywright.design;

/**
 * Deflection limits as span ratios (L/360 → 360). These are project criteria, not clauses of AISC
 * 360: the defaults are the floor-member limits of IBC Table 1604.3 (L/360 under live load, L/240
 * under dead plus live). A ratio of 0 turns that check off.
 */
public record DeflectionLimits(double live, double total) {
    /** The source cited for the default limits. */
    public static final String SOURCE = "IBC Table 1604.3";

    /** Floor members: L/360 live, L/240 total (IBC Table 1604.3). */
    public static final DeflectionLimits FLOOR = new DeflectionLimits(360, 240);

    public DeflectionLimits {
        if (live < 0 || total < 0 || !Double.isFinite(live) || !Double.isFinite(total)) {
            throw new IllegalArgumentException("deflection limits must be span ratios ≥ 0 (0 = off)");
        }
    }
}
