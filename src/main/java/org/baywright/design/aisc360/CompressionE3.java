package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/** AISC 360-16 E3: flexural buckling of members without slender elements. */
public final class CompressionE3 {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String EQ_E3_1 = Aisc360.eq("E3-1");
    private static final String EQ_E3_2 = Aisc360.eq("E3-2");
    private static final String EQ_E3_3 = Aisc360.eq("E3-3");
    private static final String EQ_E3_4 = Aisc360.eq("E3-4");

    private CompressionE3() {
    }

    /** AISC 360-16 Eq. E3-4: elastic buckling stress, Fe = π²·E/(Lc/r)² [Pa]. */
    public static double fe(double e, double lc, double r, Calc calc) {
        double s = lc / r;
        return Calc.eq(calc, "Fe", "π²·E/(Lc/r)²", EQ_E3_4, Math.PI * Math.PI * e / (s * s), Quantity.STRESS,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Lc", lc, Quantity.SPAN_LENGTH),
                Arg.of("r", r, Quantity.SECTION_LENGTH));
    }

    /**
     * AISC 360-16 Eqs. E3-2/E3-3: critical stress. When Lc/r ≤ 4.71√(E/Fy) (Fy/Fe ≤ 2.25):
     * Fcr = 0.658^(Fy/Fe)·Fy; otherwise Fcr = 0.877·Fe.
     */
    public static double fcr(double fy, double fe, double e, double slenderness, Calc calc) {
        double limit = 4.71 * Math.sqrt(e / fy);
        if (slenderness <= limit) {
            if (calc != null) {
                calc.branch("Lc/r = " + ShearG2.fmt(slenderness) + " ≤ 4.71√(E/Fy) = " + ShearG2.fmt(limit)
                        + " → inelastic buckling", EQ_E3_2);
            }
            return Calc.eq(calc, "Fcr", "0.658^(Fy/Fe)·Fy", EQ_E3_2, Math.pow(0.658, fy / fe) * fy,
                    Quantity.STRESS, Arg.of("Fy", fy, Quantity.STRESS), Arg.of("Fe", fe, Quantity.STRESS));
        }
        if (calc != null) {
            calc.branch("Lc/r = " + ShearG2.fmt(slenderness) + " > 4.71√(E/Fy) = " + ShearG2.fmt(limit)
                    + " → elastic buckling", EQ_E3_3);
        }
        return Calc.eq(calc, "Fcr", "0.877·Fe", EQ_E3_3, 0.877 * fe, Quantity.STRESS,
                Arg.of("Fe", fe, Quantity.STRESS));
    }

    /** AISC 360-16 Eq. E3-1: nominal compressive strength, Pn = Fcr·Ag [N]. */
    public static double pn(double fcr, double ag, Calc calc) {
        return Calc.eq(calc, "Pn", "Fcr·Ag", EQ_E3_1, fcr * ag, Quantity.FORCE,
                Arg.of("Fcr", fcr, Quantity.STRESS), Arg.of("Ag", ag, Quantity.AREA));
    }
}
