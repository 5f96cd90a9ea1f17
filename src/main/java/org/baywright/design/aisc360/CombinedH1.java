package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;

/**
 * AISC 360-16 H1.1: doubly and singly symmetric members subject to flexure and axial compression,
 * the interaction of Eq. H1-1a and H1-1b.
 *
 * <p>Arguments are required strengths (Pr, Mrx, Mry: LRFD Pu, Mu or ASD Pa, Ma, including second-order
 * effects) and available strengths (Pc, Mcx, Mcy: φ·Pn, φb·Mn or Pn/Ω, Mn/Ωb), in N and N·m.
 */
public final class CombinedH1 {
    private static final String EQ_H1_1A = Aisc360.eq("H1-1a");
    private static final String EQ_H1_1B = Aisc360.eq("H1-1b");
    private static final String CLAUSE_H1_1 = Aisc360.clause("H1.1");

    private CombinedH1() {
    }

    /** AISC 360-16 Eq. H1-1a (Pr/Pc ≥ 0.2): Pr/Pc + 8/9·(Mrx/Mcx + Mry/Mcy). */
    public static double h1a(double pr, double pc, double mrx, double mcx, double mry, double mcy, Calc calc) {
        double v = pr / pc + 8.0 / 9.0 * (mrx / mcx + mry / mcy);
        return Calc.eq(calc, "H1-1a", "Pr/Pc + 8/9·(Mrx/Mcx + Mry/Mcy)", EQ_H1_1A, v, Quantity.NUMBER, args(pr, pc, mrx, mcx,
                mry, mcy));
    }

    /** AISC 360-16 Eq. H1-1b (Pr/Pc &lt; 0.2): Pr/(2·Pc) + (Mrx/Mcx + Mry/Mcy). */
    public static double h1b(double pr, double pc, double mrx, double mcx, double mry, double mcy, Calc calc) {
        double v = pr / (2 * pc) + (mrx / mcx + mry / mcy);
        return Calc.eq(calc, "H1-1b", "Pr/(2·Pc) + (Mrx/Mcx + Mry/Mcy)", EQ_H1_1B, v, Quantity.NUMBER, args(pr, pc, mrx, mcx,
                mry, mcy));
    }

    /** The interaction ratio of AISC 360-16 H1.1: Eq. H1-1a when Pr/Pc ≥ 0.2, else Eq. H1-1b. */
    public static double ratio(double pr, double pc, double mrx, double mcx, double mry, double mcy, Calc calc) {
        double r = pr / pc;
        boolean a = r >= 0.2;
        if (calc != null) {
            Calc.branch(calc, "Pr/Pc = " + CalcFormat.sig(r) + (a ? " ≥ 0.2 → Eq. H1-1a" : " < 0.2 → Eq. H1-1b"), CLAUSE_H1_1);
        }
        return a ? h1a(pr, pc, mrx, mcx, mry, mcy, calc) : h1b(pr, pc, mrx, mcx, mry, mcy, calc);
    }

    private static Arg[] args(double pr, double pc, double mrx, double mcx, double mry, double mcy) {
        return new Arg[] {Arg.of("Pr", pr, Quantity.FORCE), Arg.of("Pc", pc, Quantity.FORCE), Arg.of("Mrx", mrx, Quantity.MOMENT),
            Arg.of("Mcx", mcx, Quantity.MOMENT), Arg.of("Mry", mry, Quantity.MOMENT), Arg.of("Mcy", mcy, Quantity.MOMENT)};
    }
}
