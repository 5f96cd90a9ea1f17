package org.baywright.design.aisc360;

import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.catalog.Section;

/** Major-axis shear strength of a rolled I-shape with an unstiffened web, AISC 360-16 G2.1. */
public final class IShapeShear {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_G2_1_A = Aisc360.clause("G2.1(a)");
    private static final String CLAUSE_G2_1_B = Aisc360.clause("G2.1(b)");

    private IShapeShear() {
    }

    /**
     * Nominal shear strength and the factors that go with it.
     *
     * @param caseA true when G2.1(a) applies (φv = 1.00, Ωv = 1.50)
     */
    public record Strength(double vn, double phi, double omega, boolean caseA) {
    }

    /** Vn with φv and Ωv per G2.1(a) or (b). */
    public static Strength strength(Section s, double fy, double e, Calc calc) {
        double hw = s.hOverTw();
        double limA = ShearG2.rolledLimit(e, fy, calc);
        boolean a = hw <= limA;
        double cv1;
        if (a) {
            if (calc != null) { // the words only for a sheet: the searches call this for every section
                Calc.branch(calc, "h/tw = " + CalcFormat.sig(hw) + " ≤ 2.24√(E/Fy) = " + CalcFormat.sig(limA)
                        + " → Cv1 = 1.0, φv = 1.00, Ωv = 1.50", CLAUSE_G2_1_A);
            }
            cv1 = 1.0;
        } else {
            if (calc != null) {
                Calc.branch(calc, "h/tw = " + CalcFormat.sig(hw) + " > 2.24√(E/Fy) = " + CalcFormat.sig(limA)
                        + " → φv = 0.90, Ωv = 1.67", CLAUSE_G2_1_B);
            }
            cv1 = ShearG2.cv1(hw, ShearG2.KV_UNSTIFFENED, e, fy, calc);
        }
        double vn = ShearG2.vn(fy, s.depth(), s.dims().tw(), cv1, calc);
        return a ? new Strength(vn, ResistanceFactors.PHI_V_ROLLED, ResistanceFactors.OMEGA_V_ROLLED, true)
                : new Strength(vn, ResistanceFactors.PHI_V, ResistanceFactors.OMEGA_V, false);
    }
}
