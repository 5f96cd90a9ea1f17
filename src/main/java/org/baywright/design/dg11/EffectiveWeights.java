package org.baywright.design.dg11;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * The effective widths and weights of the beam (joist) and girder modes and of the combined mode (DG11
 * 2nd ed. §4.1, equation numbers from memory; CHECK-VALUES §6).
 */
public final class EffectiveWeights {
    private static final String SEC_4_1 = Dg11.section("§4.1");
    private static final String EQ_4_2 = Dg11.eq("4-2");
    private static final String EQ_4_3 = Dg11.eq("4-3");
    private static final String EQ_4_4 = Dg11.eq("4-4");
    private static final String EQ_4_5 = Dg11.eq("4-5");
    private static final String SEC_CONTINUITY = Dg11.section("§4.1 (continuity)");

    private EffectiveWeights() {
    }

    /**
     * DG11 2nd ed. Eq. 4-3 (no. from memory): effective width of the beam (joist) mode,
     * B_j = min(Cj·(Ds/Dj)^0.25·Lj, (2/3)·floor width) [m].
     *
     * @param cj C_j: 2.0 in most areas, 1.0 for beams parallel to an interior edge ({@link Dg11#CJ_INTERIOR})
     * @param ds slab stiffness per width D_s [m⁴/m]
     * @param dj beam stiffness per width D_j [m⁴/m]
     * @param beamSpan L_j [m]
     * @param floorWidth the floor's extent perpendicular to the beams that the bay sees [m]; infinite for no limit
     */
    public static double beamWidth(double cj, double ds, double dj, double beamSpan, double floorWidth, Calc calc) {
        double v = Math.min(cj * Math.pow(ds / dj, 0.25) * beamSpan, Dg11.FLOOR_EXTENT_SHARE * floorWidth);
        return Calc.eq(calc, "B_j", "min(Cj·(Ds/Dj)^0.25·Lj, 2/3·B_floor)", EQ_4_3, v, Quantity.SPAN_LENGTH,
                Arg.num("Cj", cj), Arg.of("Ds", ds, Quantity.SECTION_MODULUS), Arg.of("Dj", dj, Quantity.SECTION_MODULUS),
                Arg.of("Lj", beamSpan, Quantity.SPAN_LENGTH), Arg.of("B_floor", floorWidth, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. Eq. 4-5 (no. from memory): effective width of the girder mode,
     * B_g = min(Cg·(Dj/Dg)^0.25·Lg, (2/3)·floor length) [m].
     *
     * @param cg C_g: 1.8 for beams connected to the girder web, 1.6 for joists on seats ({@link Dg11#CG_WEB_CONNECTED})
     * @param dj beam stiffness per width D_j [m⁴/m]
     * @param dg girder stiffness per width D_g [m⁴/m]
     * @param girderSpan L_g [m]
     * @param floorLength the floor's extent perpendicular to the girders that the bay sees [m]; infinite for no limit
     */
    public static double girderWidth(double cg, double dj, double dg, double girderSpan, double floorLength, Calc calc) {
        double v = Math.min(cg * Math.pow(dj / dg, 0.25) * girderSpan, Dg11.FLOOR_EXTENT_SHARE * floorLength);
        return Calc.eq(calc, "B_g", "min(Cg·(Dj/Dg)^0.25·Lg, 2/3·L_floor)", EQ_4_5, v, Quantity.SPAN_LENGTH,
                Arg.num("Cg", cg), Arg.of("Dj", dj, Quantity.SECTION_MODULUS), Arg.of("Dg", dg, Quantity.SECTION_MODULUS),
                Arg.of("Lg", girderSpan, Quantity.SPAN_LENGTH), Arg.of("L_floor", floorLength, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. §4.1 (from memory): whether a member counts as continuous, the adjacent span at least
     * 0.7 of its span. The bay check takes continuity as an input flag; this is the rule to set it by.
     */
    public static boolean continuous(double span, double adjacentSpan) {
        return adjacentSpan >= Dg11.CONTINUITY_SPAN_SHARE * span;
    }

    /**
     * DG11 2nd ed. §4.1 (from memory): the continuity factor on an effective weight, χ = 1.5 where the
     * member is continuous ({@link #continuous}), else 1.0.
     *
     * @param member what the sheet calls the member ("beam", "girder")
     */
    public static double continuityFactor(String member, boolean continuous, Calc calc) {
        if (calc != null) {
            calc.branch(continuous ? member + ": adjacent span ≥ 0.7 × span → W increased by 50 % (χ = 1.5)"
                    : member + ": no adjacent span ≥ 0.7 × span taken → χ = 1.0", SEC_CONTINUITY);
        }
        return continuous ? Dg11.CONTINUITY_FACTOR : 1.0;
    }

    /**
     * DG11 2nd ed. Eq. 4-2 (no. from memory): effective weight of a mode, W = χ·(w/S)·B·L [N]: the weight per
     * floor area (w over the width it is spread on) times the effective panel B·L, χ the continuity factor.
     *
     * @param symbol W_j or W_g
     * @param chi continuity factor {@link #continuityFactor}
     * @param w the member's weight per length [N/m]
     * @param spreadOver the width that weight is spread on: beams S, girders L_j [m]
     * @param width effective width B [m]
     * @param span the member's span L [m]
     */
    public static double weight(String symbol, double chi, double w, double spreadOver, double width, double span, Calc calc) {
        double v = chi * (w / spreadOver) * width * span;
        return Calc.eq(calc, symbol, "χ·(w/S)·B·L", EQ_4_2, v, Quantity.FORCE, Arg.num("χ", chi),
                Arg.of("w", w, Quantity.LINE_LOAD), Arg.of("S", spreadOver, Quantity.SPAN_LENGTH),
                Arg.of("B", width, Quantity.SPAN_LENGTH), Arg.of("L", span, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. Eq. 4-4 (no. from memory): where the girder span is shorter than the beam mode's width,
     * L_g &lt; B_j, the girder deflection is reduced, Δg′ = max(Lg/Bj, 0.5)·Δg (0.5 ≤ Lg/Bj ≤ 1.0); otherwise
     * Δg′ = Δg [m].
     */
    public static double reducedGirderDeflection(double dg, double girderSpan, double bj, Calc calc) {
        if (!(girderSpan < bj)) {
            Calc.branch(calc, "Lg ≥ Bj → the girder deflection is not reduced, Δg′ = Δg", EQ_4_4);
            return dg;
        }
        double v = Math.max(girderSpan / bj, 0.5) * dg;
        return Calc.eq(calc, "Δg′", "max(Lg/Bj, 0.5)·Δg", EQ_4_4, v, Quantity.SECTION_LENGTH,
                Arg.of("Lg", girderSpan, Quantity.SPAN_LENGTH), Arg.of("Bj", bj, Quantity.SPAN_LENGTH),
                Arg.of("Δg", dg, Quantity.SECTION_LENGTH));
    }

    /**
     * DG11 2nd ed. Eq. 4-2 (no. from memory; CHECK-VALUES §6): effective weight of the combined mode,
     * W = Δj/(Δj + Δg′)·Wj + Δg′/(Δj + Δg′)·Wg [N], Δg′ = Δg unless {@link #reducedGirderDeflection} applies.
     */
    public static double combined(double dj, double dg, double wj, double wg, Calc calc) {
        double v = dj / (dj + dg) * wj + dg / (dj + dg) * wg;
        return Calc.eq(calc, "W", "Δj/(Δj + Δg′)·Wj + Δg′/(Δj + Δg′)·Wg", SEC_4_1, v, Quantity.FORCE,
                Arg.of("Δj", dj, Quantity.SECTION_LENGTH), Arg.of("Δg′", dg, Quantity.SECTION_LENGTH),
                Arg.of("Wj", wj, Quantity.FORCE), Arg.of("Wg", wg, Quantity.FORCE));
    }
}
