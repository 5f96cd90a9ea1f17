package org.baywright.design.dg11;

import org.baywright.units.Units;

/**
 * AISC Design Guide 11, Vibrations of Steel-Framed Structural Systems Due to Human Activity, 2nd ed.
 * (2016): the reference texts cited on every line, and the guide's constants.
 *
 * <p>Chapter, section and equation numbers are recalled from memory of the 2nd edition (the team's
 * check-values guide, §6, says the same: "equation and table numbers may be slightly off"); every
 * reference built here ends in "(no. from memory)" so a sheet never presents them as checked.
 */
public final class Dg11 {
    private Dg11() {
    }

    /** Edition cited on every line. */
    public static final String EDITION = "AISC DG11 2nd ed.";

    private static final String MEMORY = " (no. from memory)";

    /** Reference text for an equation, e.g. {@code eq("4-1")} → "AISC DG11 2nd ed. Eq. 4-1 (no. from memory)". */
    public static String eq(String number) {
        return EDITION + " Eq. " + number + MEMORY;
    }

    /** Reference text for a section or table, e.g. {@code section("§3.2")}. */
    public static String section(String section) {
        return EDITION + " " + section + MEMORY;
    }

    /** Acceleration of gravity g [m/s²] (standard gravity; DG11 uses 386 in/s²). */
    public static final double G = Units.STANDARD_GRAVITY;

    /**
     * Factor on the static modulus of the concrete for the dynamic modulus, 1.35 (DG11 2nd ed. §3.2, from
     * memory; CHECK-VALUES §6).
     */
    public static final double DYNAMIC_MODULUS_FACTOR = 1.35;

    /** Effective slab width as a share of the span, 0.4 (DG11 2nd ed. §3.2, from memory; CHECK-VALUES §6). */
    public static final double WIDTH_SHARE_OF_SPAN = 0.4;

    /** Constant amplitude force of walking P_o = 65 lb, the reduction factor R = 0.5 included (DG11 2nd ed. §4.1; CHECK-VALUES §6, FOUND). */
    public static final double PO_FLOORS = Units.LBF.toSi(65);

    /** P_o for footbridges, 92 lb (R = 0.7; DG11 2nd ed. Table 4-1, from memory). */
    public static final double PO_FOOTBRIDGES = Units.LBF.toSi(92);

    /** Increase of an effective weight for continuity, 1.5 (DG11 2nd ed. §4.1, from memory). */
    public static final double CONTINUITY_FACTOR = 1.5;

    /** The adjacent span, as a share of the span, from which continuity counts: 0.7 (DG11 2nd ed. §4.1, from memory). */
    public static final double CONTINUITY_SPAN_SHARE = 0.7;

    /** C_j for beams (joists) in most areas, 2.0 (DG11 2nd ed. §4.1, from memory). */
    public static final double CJ_INTERIOR = 2.0;

    /** C_j for beams (joists) parallel to an interior edge, 1.0 (DG11 2nd ed. §4.1, from memory). */
    public static final double CJ_PARALLEL_TO_INTERIOR_EDGE = 1.0;

    /** C_g for girders supporting beams connected to the girder web, 1.8 (DG11 2nd ed. §4.1, from memory). */
    public static final double CG_WEB_CONNECTED = 1.8;

    /** C_g for girders supporting joists on seats, 1.6 (DG11 2nd ed. §4.1, from memory). */
    public static final double CG_JOIST_SEATS = 1.6;

    /** The effective widths' limit as a share of the floor extent, 2/3 (DG11 2nd ed. §4.1, from memory). */
    public static final double FLOOR_EXTENT_SHARE = 2.0 / 3.0;

    /** The highest f_n for which the low-frequency walking check applies, 9 Hz (DG11 2nd ed. Ch. 4, from memory). */
    public static final double HIGHEST_LOW_FREQUENCY = 9.0;

    /** Floors below 3 Hz should be avoided (DG11 2nd ed. Ch. 4, from memory; CHECK-VALUES §6). */
    public static final double LOWEST_ADVISABLE_FREQUENCY = 3.0;
}
