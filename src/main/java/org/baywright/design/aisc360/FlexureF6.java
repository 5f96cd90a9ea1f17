package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;
import org.baywright.catalog.SectionProperties;

/**
 * AISC 360-16 F6: I-shaped members bent about their minor axis. The nominal strength is the lower of
 * yielding (F6.1) and flange local buckling (F6.2); lateral-torsional buckling does not apply.
 *
 * <p>Known limitations: rolled doubly symmetric I-shapes only (the catalog's W shapes); the flange
 * limits are those of Table B4.1b Case 13 (λpf = 0.38√(E/Fy), λrf = 1.0√(E/Fy)), the same as Case 10.
 */
public final class FlexureF6 {
    private static final String EQ_F6_1 = Aisc360.eq("F6-1");
    private static final String EQ_F6_2 = Aisc360.eq("F6-2");
    private static final String EQ_F6_3 = Aisc360.eq("F6-3");
    private static final String EQ_F6_4 = Aisc360.eq("F6-4");
    private static final String CLAUSE_F6 = Aisc360.clause("F6");
    private static final String CLAUSE_F6_2 = Aisc360.clause("F6.2");

    private FlexureF6() {
    }

    /** AISC 360-16 Eq. F6-1: yielding about the minor axis, Mp = min(Fy·Zy, 1.6·Fy·Sy) [N·m]. */
    public static double mp(double fy, double zy, double sy, Calc calc) {
        return Calc.eq(calc, "Mpy", "min(Fy·Zy, 1.6·Fy·Sy)", EQ_F6_1, Math.min(fy * zy, 1.6 * fy * sy), Quantity.MOMENT,
                Arg.of("Fy", fy, Quantity.STRESS), Arg.of("Zy", zy, Quantity.SECTION_MODULUS),
                Arg.of("Sy", sy, Quantity.SECTION_MODULUS));
    }

    /**
     * AISC 360-16 Eq. F6-2: flange local buckling, noncompact flanges,
     * Mn = Mp − (Mp − 0.7·Fy·Sy)·(λ − λpf)/(λrf − λpf) [N·m].
     */
    public static double flbNoncompact(double mp, double fy, double sy, double lambda, double lambdaPf, double lambdaRf,
            Calc calc) {
        double v = mp - (mp - 0.7 * fy * sy) * (lambda - lambdaPf) / (lambdaRf - lambdaPf);
        return Calc.eq(calc, "Mny,FLB", "Mpy − (Mpy − 0.7·Fy·Sy)·(λ − λpf)/(λrf − λpf)", EQ_F6_2, v, Quantity.MOMENT,
                Arg.of("Mpy", mp, Quantity.MOMENT), Arg.of("Fy", fy, Quantity.STRESS),
                Arg.of("Sy", sy, Quantity.SECTION_MODULUS), Arg.num("λ", lambda), Arg.num("λpf", lambdaPf),
                Arg.num("λrf", lambdaRf));
    }

    /** AISC 360-16 Eq. F6-4: critical stress of slender flanges, Fcr = 0.69·E/λ² [Pa]. */
    public static double fcr(double e, double lambda, Calc calc) {
        return Calc.eq(calc, "Fcr", "0.69·E/λ²", EQ_F6_4, 0.69 * e / (lambda * lambda), Quantity.STRESS,
                Arg.of("E", e, Quantity.STRESS), Arg.num("λ", lambda));
    }

    /** AISC 360-16 Eq. F6-3: flange local buckling, slender flanges, Mn = Fcr·Sy [N·m]. */
    public static double flbSlender(double fcr, double sy, Calc calc) {
        return Calc.eq(calc, "Mny,FLB", "Fcr·Sy", EQ_F6_3, fcr * sy, Quantity.MOMENT, Arg.of("Fcr", fcr, Quantity.STRESS),
                Arg.of("Sy", sy, Quantity.SECTION_MODULUS));
    }

    /**
     * Minor-axis nominal flexural strength of a rolled I-shape, AISC 360-16 F6: Mp (F6.1), reduced for
     * flange local buckling of noncompact or slender flanges (F6.2), N·m.
     */
    public static double mn(Section s, double fy, double e, Calc calc) {
        SectionProperties p = s.props();
        double mp = mp(fy, p.zy(), p.sy(), calc);
        double lambda = s.bfOver2tf();
        double lpf = Slenderness.lambdaPf(e, fy, calc);
        double lrf = Slenderness.lambdaRf(e, fy, calc);
        if (lambda <= lpf) {
            if (calc != null) {
                Calc.branch(calc, "λ = bf/2tf = " + CalcFormat.sig(lambda) + " ≤ λpf = " + CalcFormat.sig(lpf)
                        + " → compact flanges: no flange local buckling, Mny = Mpy", CLAUSE_F6_2);
                calc.eq("Mny", "Mpy", CLAUSE_F6, mp, Quantity.MOMENT, Arg.of("Mpy", mp, Quantity.MOMENT));
            }
            return mp;
        }
        double flb;
        if (lambda <= lrf) {
            if (calc != null) {
                Calc.branch(calc, "λpf = " + CalcFormat.sig(lpf) + " < λ = bf/2tf = " + CalcFormat.sig(lambda) + " ≤ λrf = "
                        + CalcFormat.sig(lrf) + " → noncompact flanges", CLAUSE_F6_2);
            }
            flb = flbNoncompact(mp, fy, p.sy(), lambda, lpf, lrf, calc);
        } else {
            if (calc != null) {
                Calc.branch(calc, "λ = bf/2tf = " + CalcFormat.sig(lambda) + " > λrf = " + CalcFormat.sig(lrf)
                        + " → slender flanges", CLAUSE_F6_2);
            }
            flb = flbSlender(fcr(e, lambda, calc), p.sy(), calc);
        }
        return Calc.eq(calc, "Mny", "min(Mpy, Mny_FLB)", CLAUSE_F6, Math.min(mp, flb), Quantity.MOMENT,
                Arg.of("Mpy", mp, Quantity.MOMENT), Arg.of("Mny_FLB", flb, Quantity.MOMENT));
    }
}
