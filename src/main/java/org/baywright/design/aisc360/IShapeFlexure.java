package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;
import org.baywright.catalog.SectionProperties;

/**
 * Major-axis nominal flexural strength of a rolled doubly symmetric I-shape, AISC 360-16 F2 (compact
 * flange) or F3 (noncompact or slender flange), both with a compact web. Lateral-torsional buckling
 * (F2.2) applies in both; flange local buckling (F3.2) in F3.
 *
 * <p>Known limitations: webs must be compact (every rolled W shape is at Fy ≤ 65 ksi; a noncompact
 * web would need F4 and is reported as not applicable). Load is taken at the shear centre.
 */
public final class IShapeFlexure {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_F2 = Aisc360.clause("F2");
    private static final String CLAUSE_F2_2 = Aisc360.clause("F2.2");
    private static final String CLAUSE_F2_2_A = Aisc360.clause("F2.2(a)");
    private static final String CLAUSE_F2_2_B = Aisc360.clause("F2.2(b)");
    private static final String CLAUSE_F2_2_C = Aisc360.clause("F2.2(c)");
    private static final String CLAUSE_F3 = Aisc360.clause("F3");
    private static final String CLAUSE_TABLE_B4_1B_CASE_10 = Aisc360.clause("Table B4.1b Case 10");
    private static final String CLAUSE_TABLE_B4_1B_CASE_15 = Aisc360.clause("Table B4.1b Case 15");
    private static final String EQ_F2_7 = Aisc360.eq("F2-7");

    private IShapeFlexure() {
    }

    /**
     * The section constants of F2/F3 that do not depend on the unbraced length, computed once per
     * section and material.
     *
     * @param mnFlb nominal strength for flange local buckling (equal to Mp for a compact flange)
     */
    public record Constants(String designation, double fy, double e, double mp, double mr, double lp, double lr,
            double rts, double j, double sx, double ho, double lambdaF, double lambdaPf, double lambdaRf,
            double mnFlb, FlangeClass flange, boolean webCompact) {
    }

    /** Flange class under Table B4.1b Case 10. */
    public enum FlangeClass {
        COMPACT, NONCOMPACT, SLENDER
    }

    /** Computes the length-independent constants of a section (recording them when {@code calc} is given). */
    public static Constants constants(Section s, double fy, double e, Calc calc) {
        SectionProperties p = s.props();
        double lambdaF = s.bfOver2tf();
        double lambdaW = s.hOverTw();
        double lpf = Slenderness.lambdaPf(e, fy, calc);
        double lrf = Slenderness.lambdaRf(e, fy, calc);
        double lpw = Slenderness.lambdaPw(e, fy, calc);
        boolean webCompact = lambdaW <= lpw;
        FlangeClass fc = lambdaF <= lpf ? FlangeClass.COMPACT : lambdaF <= lrf ? FlangeClass.NONCOMPACT : FlangeClass.SLENDER;
        if (calc != null) { // the words only for a sheet: the searches call this for every section
            classification(lambdaW, lpw, webCompact, lambdaF, lpf, lrf, fc, calc);
        }
        double sx = p.sx();
        double mp = FlexureF2.mp(fy, p.zx(), calc);
        double mr = FlexureF2.mr(fy, sx, calc);
        double ry = p.ry();
        double rts = Calc.eq(calc, "rts", "√(√(Iy·Cw)/Sx)", EQ_F2_7, p.rts(), Quantity.SECTION_LENGTH,
                Arg.of("Iy", p.iy(), Quantity.INERTIA), Arg.of("Cw", p.cw(), Quantity.WARPING),
                Arg.of("Sx", sx, Quantity.SECTION_MODULUS));
        double ho = s.ho();
        double lp = FlexureF2.lp(ry, e, fy, calc);
        double lr = FlexureF2.lr(rts, e, fy, p.j(), sx, ho, calc);
        double mnFlb = switch (fc) {
            case COMPACT -> mp;
            case NONCOMPACT -> FlexureF3.flbNoncompact(mp, fy, sx, lambdaF, lpf, lrf, calc);
            case SLENDER -> FlexureF3.flbSlender(e, FlexureF3.kc(lambdaW, calc), sx, lambdaF, calc);
        };
        return new Constants(s.designation(), fy, e, mp, mr, lp, lr, rts, p.j(), sx, ho, lambdaF, lpf, lrf, mnFlb, fc,
                webCompact);
    }

    /** The branch lines of the web and flange classification (Table B4.1b), for a sheet. */
    private static void classification(double lambdaW, double lpw, boolean webCompact, double lambdaF, double lpf, double lrf,
            FlangeClass fc, Calc calc) {
        Calc.branch(calc, "λw = h/tw = " + CalcFormat.sig(lambdaW) + (webCompact ? " ≤ " : " > ") + "λpw = "
                + CalcFormat.sig(lpw) + (webCompact ? " → compact web" : " → noncompact web: F4 applies (not implemented)"),
                CLAUSE_TABLE_B4_1B_CASE_15);
        Calc.branch(calc, "λf = bf/2tf = " + CalcFormat.sig(lambdaF) + switch (fc) {
            case COMPACT -> " ≤ λpf = " + CalcFormat.sig(lpf) + " → compact flange: F2 applies";
            case NONCOMPACT -> " > λpf = " + CalcFormat.sig(lpf) + ", ≤ λrf = " + CalcFormat.sig(lrf)
                    + " → noncompact flange: F3 applies";
            case SLENDER -> " > λrf = " + CalcFormat.sig(lrf) + " → slender flange: F3 applies";
        }, CLAUSE_TABLE_B4_1B_CASE_10);
    }

    /**
     * Nominal flexural strength Mn for an unbraced length {@code lb} and bending coefficient
     * {@code cb}: the lower of yielding / LTB (F2.1, F2.2) and, for F3 shapes, flange local buckling
     * (F3.2). Returns NaN for a noncompact web (F4, not implemented).
     */
    public static double mn(Constants k, double lb, double cb, Calc calc) {
        if (!k.webCompact()) {
            return Double.NaN;
        }
        double ltb;
        if (lb <= k.lp()) {
            // two whole constants, not a concatenation: the search calls this without a recorder for every candidate
            Calc.branch(calc, lb == 0 ? "Lb = 0 (continuously braced) → no lateral-torsional buckling"
                    : "Lb ≤ Lp → no lateral-torsional buckling", CLAUSE_F2_2_A);
            ltb = k.mp();
        } else if (lb <= k.lr()) {
            Calc.branch(calc, "Lp < Lb ≤ Lr → inelastic lateral-torsional buckling", CLAUSE_F2_2_B);
            ltb = FlexureF2.inelasticLtb(cb, k.mp(), k.fy(), k.sx(), lb, k.lp(), k.lr(), calc);
        } else {
            Calc.branch(calc, "Lb > Lr → elastic lateral-torsional buckling", CLAUSE_F2_2_C);
            double fcr = FlexureF2.fcr(cb, k.e(), lb, k.rts(), k.j(), k.sx(), k.ho(), calc);
            ltb = FlexureF2.elasticLtb(fcr, k.sx(), calc);
        }
        if (ltb > k.mp()) {
            Calc.branch(calc, "Mn,LTB > Mp → Mn,LTB = Mp", CLAUSE_F2_2);
            ltb = k.mp();
        }
        double mn = Math.min(ltb, k.mnFlb());
        if (calc != null) {
            if (k.flange() == FlangeClass.COMPACT) {
                calc.eq("Mn", "min(Mp, Mn_LTB)", CLAUSE_F2, mn, Quantity.MOMENT,
                        Arg.of("Mp", k.mp(), Quantity.MOMENT), Arg.of("Mn_LTB", ltb, Quantity.MOMENT));
            } else {
                calc.eq("Mn", "min(Mn_LTB, Mn_FLB)", CLAUSE_F3, mn, Quantity.MOMENT,
                        Arg.of("Mn_LTB", ltb, Quantity.MOMENT), Arg.of("Mn_FLB", k.mnFlb(), Quantity.MOMENT));
            }
        }
        return mn;
    }
}
