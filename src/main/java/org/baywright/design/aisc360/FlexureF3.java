package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/** AISC 360-16 F3: doubly symmetric I-shapes with compact webs and noncompact or slender flanges. */
public final class FlexureF3 {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_F3_2_B = Aisc360.clause("F3.2(b)");
    private static final String EQ_F3_1 = Aisc360.eq("F3-1");
    private static final String EQ_F3_2 = Aisc360.eq("F3-2");

    private FlexureF3() {
    }

    /**
     * AISC 360-16 Eq. F3-1: compression flange local buckling, noncompact flange,
     * Mn = Mp − (Mp − 0.7·Fy·Sx)·(λ − λpf)/(λrf − λpf).
     */
    public static double flbNoncompact(double mp, double fy, double sx, double lambda, double lambdaPf,
            double lambdaRf, Calc calc) {
        double v = mp - (mp - 0.7 * fy * sx) * (lambda - lambdaPf) / (lambdaRf - lambdaPf);
        return Calc.eq(calc, "Mn,FLB", "Mp − (Mp − 0.7·Fy·Sx)·(λ − λpf)/(λrf − λpf)", EQ_F3_1, v,
                Quantity.MOMENT, Arg.of("Mp", mp, Quantity.MOMENT), Arg.of("Fy", fy, Quantity.STRESS),
                Arg.of("Sx", sx, Quantity.SECTION_MODULUS), Arg.num("λ", lambda), Arg.num("λpf", lambdaPf),
                Arg.num("λrf", lambdaRf));
    }

    /** kc = 4/√(h/tw), 0.35 ≤ kc ≤ 0.76 (AISC 360-16 F3.2(b), footnote of Table B4.1b). */
    public static double kc(double hOverTw, Calc calc) {
        double v = Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(hOverTw)));
        return Calc.eq(calc, "kc", "min(max(4/√(h_tw), 0.35), 0.76)", CLAUSE_F3_2_B, v, Quantity.NUMBER,
                Arg.num("h_tw", hOverTw));
    }

    /** AISC 360-16 Eq. F3-2: compression flange local buckling, slender flange, Mn = 0.9·E·kc·Sx/λ². */
    public static double flbSlender(double e, double kc, double sx, double lambda, Calc calc) {
        double v = 0.9 * e * kc * sx / (lambda * lambda);
        return Calc.eq(calc, "Mn,FLB", "0.9·E·kc·Sx/λ²", EQ_F3_2, v, Quantity.MOMENT,
                Arg.of("E", e, Quantity.STRESS), Arg.num("kc", kc), Arg.of("Sx", sx, Quantity.SECTION_MODULUS),
                Arg.num("λ", lambda));
    }
}
