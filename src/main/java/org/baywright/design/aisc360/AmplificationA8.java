package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.load.DesignMethod;

/**
 * AISC 360-16 Appendix 8, 8.2.1: the multiplier B1 for P-δ effects of a member in a braced frame (no
 * lateral translation of its ends, so B2 and Mlt do not arise: Mr = B1·Mnt, Eq. A-8-1).
 *
 * <p>Known limitations: members without transverse loading between their supports (the moments come
 * from the ends only), so Cm by Eq. A-8-4; the elastic buckling strength uses the gross EI (the
 * τb-reduced EI* of the direct analysis method is not applied; the effective length method's EI).
 */
public final class AmplificationA8 {
    private static final String EQ_A_8_3 = Aisc360.eq("A-8-3");
    private static final String EQ_A_8_4 = Aisc360.eq("A-8-4");
    private static final String EQ_A_8_5 = Aisc360.eq("A-8-5");

    private AmplificationA8() {
    }

    /** α of Appendix 8 (8.2.1): 1.00 for LRFD, 1.60 for ASD. */
    public static double alpha(DesignMethod method) {
        return method == DesignMethod.LRFD ? 1.0 : 1.6;
    }

    /**
     * AISC 360-16 Eq. A-8-4: Cm = 0.6 − 0.4·(M1/M2), with M1/M2 positive for reverse curvature and
     * negative for single curvature.
     *
     * @param m1 the smaller end moment, N·m, signed: positive when the member bends in reverse curvature
     * @param m2 the larger end moment in absolute value, N·m (&gt; 0)
     */
    public static double cm(double m1, double m2, Calc calc) {
        return Calc.eq(calc, "Cm", "0.6 − 0.4·(M1/M2)", EQ_A_8_4, 0.6 - 0.4 * (m1 / m2), Quantity.NUMBER,
                Arg.of("M1", m1, Quantity.MOMENT), Arg.of("M2", m2, Quantity.MOMENT));
    }

    /**
     * AISC 360-16 Eq. A-8-5: elastic critical buckling strength in the plane of bending,
     * Pe1 = π²·EI/(Lc1)² [N], with EI the flexural rigidity (N·m²) as E·I and Lc1 = K1·L, K1 = 1.
     */
    public static double pe1(double e, double i, double lc1, Calc calc) {
        return Calc.eq(calc, "Pe1", "π²·E·I/Lc1²", EQ_A_8_5, Math.PI * Math.PI * e * i / (lc1 * lc1), Quantity.FORCE,
                Arg.of("E", e, Quantity.STRESS), Arg.of("I", i, Quantity.INERTIA), Arg.of("Lc1", lc1, Quantity.SPAN_LENGTH));
    }

    /**
     * AISC 360-16 Eq. A-8-3: B1 = Cm/(1 − α·Pr/Pe1) ≥ 1. Infinite when α·Pr ≥ Pe1 (the member buckles
     * in the plane of bending).
     *
     * @param pr required axial strength, N
     */
    public static double b1(double cm, double alpha, double pr, double pe1, Calc calc) {
        double den = 1 - alpha * pr / pe1;
        double v = den <= 0 ? Double.POSITIVE_INFINITY : Math.max(1.0, cm / den);
        return Calc.eq(calc, "B1", "max(Cm/(1 − α·Pr/Pe1), 1)", EQ_A_8_3, v, Quantity.NUMBER, Arg.num("Cm", cm),
                Arg.num("α", alpha), Arg.of("Pr", pr, Quantity.FORCE), Arg.of("Pe1", pe1, Quantity.FORCE));
    }
}
