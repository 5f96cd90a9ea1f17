package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/** AISC 360-16 G2.1: shear strength of I-shaped members with unstiffened webs. */
public final class ShearG2 {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_G2_1_A = Aisc360.clause("G2.1(a)");
    private static final String EQ_G2_1 = Aisc360.eq("G2-1");
    private static final String EQ_G2_3 = Aisc360.eq("G2-3");
    private static final String EQ_G2_4 = Aisc360.eq("G2-4");

    private ShearG2() {
    }

    /** Web plate shear buckling coefficient for webs without transverse stiffeners, G2.1(b)(2)(i). */
    public static final double KV_UNSTIFFENED = 5.34;

    /** The limit 2.24√(E/Fy) of G2.1(a) for rolled I-shapes. */
    public static double rolledLimit(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λv,a", "2.24·√(E/Fy)", CLAUSE_G2_1_A, 2.24 * Math.sqrt(e / fy),
                Quantity.NUMBER, Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** True if G2.1(a) applies: a rolled I-shape web with h/tw ≤ 2.24√(E/Fy) (φv = 1.00, Ωv = 1.50, Cv1 = 1.0). */
    public static boolean caseA(double hOverTw, double e, double fy) {
        return hOverTw <= 2.24 * Math.sqrt(e / fy);
    }

    /**
     * AISC 360-16 Eqs. G2-3/G2-4: web shear strength coefficient Cv1. Cv1 = 1.0 when
     * h/tw ≤ 1.10√(kv·E/Fy); otherwise Cv1 = 1.10√(kv·E/Fy)/(h/tw).
     */
    public static double cv1(double hOverTw, double kv, double e, double fy, Calc calc) {
        double limit = 1.10 * Math.sqrt(kv * e / fy);
        if (hOverTw <= limit) {
            if (calc != null) {
                calc.branch("h/tw = " + fmt(hOverTw) + " ≤ 1.10√(kv·E/Fy) = " + fmt(limit) + " → Cv1 = 1.0",
                        EQ_G2_3);
            }
            return 1.0;
        }
        return Calc.eq(calc, "Cv1", "1.10·√(kv·E/Fy)/h_tw", EQ_G2_4, limit / hOverTw, Quantity.NUMBER,
                Arg.num("kv", kv), Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS),
                Arg.num("h_tw", hOverTw));
    }

    /** AISC 360-16 Eq. G2-1: nominal shear strength, Vn = 0.6·Fy·Aw·Cv1, Aw = d·tw [N]. */
    public static double vn(double fy, double d, double tw, double cv1, Calc calc) {
        return Calc.eq(calc, "Vn", "0.6·Fy·d·tw·Cv1", EQ_G2_1, 0.6 * fy * d * tw * cv1, Quantity.FORCE,
                Arg.of("Fy", fy, Quantity.STRESS), Arg.of("d", d, Quantity.SECTION_LENGTH),
                Arg.of("tw", tw, Quantity.SECTION_LENGTH), Arg.num("Cv1", cv1));
    }

    static String fmt(double v) {
        return org.baywright.calc.CalcFormat.sig(v);
    }
}
