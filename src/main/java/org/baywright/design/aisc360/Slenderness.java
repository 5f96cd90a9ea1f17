package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/** Width-to-thickness limits of AISC 360-16 Tables B4.1a and B4.1b for rolled I-shapes. */
public final class Slenderness {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_TABLE_B4_1A = Aisc360.clause("Table B4.1a");
    private static final String CLAUSE_TABLE_B4_1B = Aisc360.clause("Table B4.1b");

    private Slenderness() {
    }

    private static final String B41B = CLAUSE_TABLE_B4_1B;
    private static final String B41A = CLAUSE_TABLE_B4_1A;

    /** λpf = 0.38√(E/Fy): compact limit, flange of a rolled I in flexure (Table B4.1b, Case 10). */
    public static double lambdaPf(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λpf", "0.38·√(E/Fy)", B41B + " Case 10", 0.38 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** λrf = 1.0√(E/Fy): noncompact limit, flange of a rolled I in flexure (Table B4.1b, Case 10). */
    public static double lambdaRf(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λrf", "1.0·√(E/Fy)", B41B + " Case 10", 1.0 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** λpw = 3.76√(E/Fy): compact limit, web of a doubly symmetric I in flexure (Table B4.1b, Case 15). */
    public static double lambdaPw(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λpw", "3.76·√(E/Fy)", B41B + " Case 15", 3.76 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** λrw = 5.70√(E/Fy): noncompact limit, web of a doubly symmetric I in flexure (Table B4.1b, Case 15). */
    public static double lambdaRw(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λrw", "5.70·√(E/Fy)", B41B + " Case 15", 5.70 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** λr = 0.56√(E/Fy): slender limit, flange of a rolled I in axial compression (Table B4.1a, Case 1). */
    public static double lambdaRfCompression(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λr,f", "0.56·√(E/Fy)", B41A + " Case 1", 0.56 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }

    /** λr = 1.49√(E/Fy): slender limit, web of a doubly symmetric I in axial compression (Table B4.1a, Case 5). */
    public static double lambdaRwCompression(double e, double fy, Calc calc) {
        return Calc.eq(calc, "λr,w", "1.49·√(E/Fy)", B41A + " Case 5", 1.49 * Math.sqrt(e / fy), Quantity.NUMBER,
                Arg.of("E", e, Quantity.STRESS), Arg.of("Fy", fy, Quantity.STRESS));
    }
}
