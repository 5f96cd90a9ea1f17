package org.baywright.design;

/**
 * Deflection limits as span ratios (L/360 → 360). These are project criteria, not clauses of AISC
 * 360: the defaults are the floor-member limits of IBC Table 1604.3 (L/360 under live load, L/240
 * under dead plus live), and roof members take the table's roof rows by the ceiling they carry
 * ({@link #ROOF_PLASTER_CEILING}, {@link #ROOF_NON_PLASTER_CEILING}, {@link #ROOF_NO_CEILING}). A ratio of 0
 * turns that check off.
 *
 * <p>The live-load limit is checked under the live cases the member carries (L, Lr, S); the roof rows
 * give the same limit for Lr and for S, so one live-load check covers both. The total-load limit is
 * checked under D plus those live cases. IBC Table 1604.3 also has a footnote on the dead load of steel
 * members in the D + L check (from memory: it lets that dead load be taken as zero; the text is not
 * quoted here because the project's reference gives the table's rows but not that footnote's words).
 * Baywright leaves applying it to the user: a total-load limit of 0 in the plan's settings turns the
 * total-load check off for floor and roof members alike.
 *
 * @param live L/n under live load (0 = off)
 * @param total L/n under dead plus live load (0 = off)
 * @param row the members of IBC Table 1604.3 the limits are the row of, in words ("roof members
 *     supporting a non-plaster ceiling"); empty for limits given as numbers (the plan's settings, the
 *     floor members' defaults)
 */
public record DeflectionLimits(double live, double total, String row) {
    /** The source cited for the default limits. */
    public static final String SOURCE = "IBC Table 1604.3";

    /** Floor members: L/360 live, L/240 total (IBC Table 1604.3). */
    public static final DeflectionLimits FLOOR = new DeflectionLimits(360, 240);

    /** Roof members supporting a plaster or stucco ceiling: L/360 under Lr or S, L/240 under D + L (IBC Table 1604.3). */
    public static final DeflectionLimits ROOF_PLASTER_CEILING = new DeflectionLimits(360, 240,
            "roof members supporting a plaster or stucco ceiling");

    /** Roof members supporting a non-plaster ceiling: L/240 under Lr or S, L/180 under D + L (IBC Table 1604.3). */
    public static final DeflectionLimits ROOF_NON_PLASTER_CEILING = new DeflectionLimits(240, 180,
            "roof members supporting a non-plaster ceiling");

    /** Roof members not supporting a ceiling: L/180 under Lr or S, L/120 under D + L (IBC Table 1604.3). */
    public static final DeflectionLimits ROOF_NO_CEILING = new DeflectionLimits(180, 120, "roof members not supporting a ceiling");

    public DeflectionLimits {
        if (live < 0 || total < 0 || !Double.isFinite(live) || !Double.isFinite(total)) {
            throw new IllegalArgumentException("deflection limits must be span ratios ≥ 0 (0 = off)");
        }
        row = row == null ? "" : row;
    }

    /** Limits given as numbers (no row of the table named). */
    public DeflectionLimits(double live, double total) {
        this(live, total, "");
    }

    /**
     * These limits with the checks that {@code settings} turns off (a ratio of 0) turned off too: how a
     * roof row follows the user's choice to leave out a check for every member.
     */
    public DeflectionLimits withChecksOffAs(DeflectionLimits settings) {
        return new DeflectionLimits(settings.live() == 0 ? 0 : live, settings.total() == 0 ? 0 : total, row);
    }
}
