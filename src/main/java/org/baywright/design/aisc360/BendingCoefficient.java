package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/** AISC 360-16 F1: the lateral-torsional buckling modification factor. */
public final class BendingCoefficient {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String EQ_F1_1 = Aisc360.eq("F1-1");

    private BendingCoefficient() {
    }

    /**
     * AISC 360-16 Eq. F1-1: Cb = 12.5·Mmax/(2.5·Mmax + 3·MA + 4·MB + 3·MC), with absolute values of
     * the maximum moment in the unbraced segment and the moments at its quarter, centre and
     * three-quarter points. Returns 1.0 when the segment carries no moment.
     */
    public static double cb(double mMax, double mA, double mB, double mC, Calc calc) {
        double max = Math.abs(mMax);
        double a = Math.abs(mA);
        double b = Math.abs(mB);
        double c = Math.abs(mC);
        double den = 2.5 * max + 3 * a + 4 * b + 3 * c;
        double v = den == 0 ? 1.0 : 12.5 * max / den;
        return Calc.eq(calc, "Cb", "12.5·Mmax/(2.5·Mmax + 3·MA + 4·MB + 3·MC)", EQ_F1_1, v,
                Quantity.NUMBER, Arg.of("Mmax", max, Quantity.MOMENT), Arg.of("MA", a, Quantity.MOMENT),
                Arg.of("MB", b, Quantity.MOMENT), Arg.of("MC", c, Quantity.MOMENT));
    }
}
