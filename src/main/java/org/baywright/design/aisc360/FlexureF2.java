package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * AISC 360-16 F2: doubly symmetric compact I-shaped members bent about their major axis. F3 uses the
 * same lateral-torsional buckling equations.
 */
public final class FlexureF2 {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String EQ_F2_1 = Aisc360.eq("F2-1");
    private static final String EQ_F2_2 = Aisc360.eq("F2-2");
    private static final String EQ_F2_3 = Aisc360.eq("F2-3");
    private static final String EQ_F2_4 = Aisc360.eq("F2-4");
    private static final String EQ_F2_5 = Aisc360.eq("F2-5");
    private static final String EQ_F2_6 = Aisc360.eq("F2-6");

    private FlexureF2() {
    }

    /** c = 1.0 for a doubly symmetric I-shape (Eq. F2-8a). */
    public static final double C_DOUBLY_SYMMETRIC = 1.0;

    /** AISC 360-16 Eq. F2-1: plastic moment, Mp = Fy·Zx [N·m]. */
    public static double mp(double fy, double zx, Calc calc) {
        return Calc.eq(calc, "Mp", "Fy·Zx", EQ_F2_1, fy * zx, Quantity.MOMENT,
                Arg.of("Fy", fy, Quantity.STRESS), Arg.of("Zx", zx, Quantity.SECTION_MODULUS));
    }

    /** Moment at the limit of inelastic LTB, 0.7·Fy·Sx [N·m] (AISC 360-16 Eq. F2-2 term; Manual Mrx). */
    public static double mr(double fy, double sx, Calc calc) {
        return Calc.eq(calc, "Mr", "0.7·Fy·Sx", EQ_F2_2, 0.7 * fy * sx, Quantity.MOMENT,
                Arg.of("Fy", fy, Quantity.STRESS), Arg.of("Sx", sx, Quantity.SECTION_MODULUS));
    }

    /** AISC 360-16 Eq. F2-5: limiting laterally unbraced length for yielding, Lp = 1.76·ry·√(E/Fy) [m]. */
    public static double lp(double ry, double e, double fy, Calc calc) {
        return Calc.eq(calc, "Lp", "1.76·ry·√(E/Fy)", EQ_F2_5, 1.76 * ry * Math.sqrt(e / fy),
                Quantity.SPAN_LENGTH, Arg.of("ry", ry, Quantity.SECTION_LENGTH), Arg.of("E", e, Quantity.STRESS),
                Arg.of("Fy", fy, Quantity.STRESS));
    }

    /**
     * AISC 360-16 Eq. F2-6: limiting unbraced length for inelastic LTB,
     * Lr = 1.95·rts·(E/(0.7Fy))·√(Jc/(Sx·ho) + √((Jc/(Sx·ho))² + 6.76(0.7Fy/E)²)) [m], with c = 1.
     */
    public static double lr(double rts, double e, double fy, double j, double sx, double ho, Calc calc) {
        double c = C_DOUBLY_SYMMETRIC;
        double t = j * c / (sx * ho);
        double k = 0.7 * fy / e;
        double v = 1.95 * rts * (e / (0.7 * fy)) * Math.sqrt(t + Math.sqrt(t * t + 6.76 * k * k));
        return Calc.eq(calc, "Lr", "1.95·rts·(E/(0.7·Fy))·√(J·c/(Sx·ho) + √((J·c/(Sx·ho))² + 6.76·(0.7·Fy/E)²))",
                EQ_F2_6, v, Quantity.SPAN_LENGTH,
                Arg.of("rts", rts, Quantity.SECTION_LENGTH), Arg.of("E", e, Quantity.STRESS),
                Arg.of("Fy", fy, Quantity.STRESS), Arg.of("J", j, Quantity.INERTIA), Arg.num("c", c),
                Arg.of("Sx", sx, Quantity.SECTION_MODULUS), Arg.of("ho", ho, Quantity.SECTION_LENGTH));
    }

    /** AISC 360-16 Eq. F2-2: inelastic LTB, Mn = Cb·[Mp − (Mp − 0.7Fy·Sx)·(Lb − Lp)/(Lr − Lp)] (before the Mp cap). */
    public static double inelasticLtb(double cb, double mp, double fy, double sx, double lb, double lp, double lr,
            Calc calc) {
        double v = cb * (mp - (mp - 0.7 * fy * sx) * (lb - lp) / (lr - lp));
        return Calc.eq(calc, "Mn,LTB", "Cb·[Mp − (Mp − 0.7·Fy·Sx)·(Lb − Lp)/(Lr − Lp)]", EQ_F2_2, v,
                Quantity.MOMENT, Arg.num("Cb", cb), Arg.of("Mp", mp, Quantity.MOMENT), Arg.of("Fy", fy, Quantity.STRESS),
                Arg.of("Sx", sx, Quantity.SECTION_MODULUS), Arg.of("Lb", lb, Quantity.SPAN_LENGTH),
                Arg.of("Lp", lp, Quantity.SPAN_LENGTH), Arg.of("Lr", lr, Quantity.SPAN_LENGTH));
    }

    /**
     * AISC 360-16 Eq. F2-4: elastic LTB critical stress,
     * Fcr = Cb·π²·E/(Lb/rts)² · √(1 + 0.078·(J·c/(Sx·ho))·(Lb/rts)²) [Pa], c = 1.
     */
    public static double fcr(double cb, double e, double lb, double rts, double j, double sx, double ho, Calc calc) {
        double c = C_DOUBLY_SYMMETRIC;
        double s = lb / rts;
        double v = cb * Math.PI * Math.PI * e / (s * s) * Math.sqrt(1 + 0.078 * (j * c / (sx * ho)) * s * s);
        return Calc.eq(calc, "Fcr", "Cb·π²·E/(Lb/rts)²·√(1 + 0.078·(J·c/(Sx·ho))·(Lb/rts)²)", EQ_F2_4, v,
                Quantity.STRESS, Arg.num("Cb", cb), Arg.of("E", e, Quantity.STRESS),
                Arg.of("Lb", lb, Quantity.SPAN_LENGTH), Arg.of("rts", rts, Quantity.SECTION_LENGTH),
                Arg.of("J", j, Quantity.INERTIA), Arg.num("c", c), Arg.of("Sx", sx, Quantity.SECTION_MODULUS),
                Arg.of("ho", ho, Quantity.SECTION_LENGTH));
    }

    /** AISC 360-16 Eq. F2-3: elastic LTB, Mn = Fcr·Sx (before the Mp cap). */
    public static double elasticLtb(double fcr, double sx, Calc calc) {
        return Calc.eq(calc, "Mn,LTB", "Fcr·Sx", EQ_F2_3, fcr * sx, Quantity.MOMENT,
                Arg.of("Fcr", fcr, Quantity.STRESS), Arg.of("Sx", sx, Quantity.SECTION_MODULUS));
    }
}
