package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;

/**
 * Stiffness of a composite beam for deflections: the lower-bound moment of inertia I_LB of the AISC
 * 360-16 Commentary (Section I3.2, Eqs. C-I3-1 and C-I3-2), which accounts for partial composite action
 * through ΣQ_n, and the full elastic transformed moment of inertia I_tr for comparison.
 *
 * <p>Known limitations: short-term stiffness only (no creep or shrinkage of the concrete); I_tr takes the
 * concrete that counts in {@link CompositeSlab} (above the deck with perpendicular ribs, the ribs too
 * when parallel), transformed by n = E_s/E_c, with the concrete below the elastic neutral axis
 * neglected (cracked).
 */
public final class CompositeStiffness {
    private static final String EQ_C_I3_1 = Aisc360.eq("C-I3-1 (Commentary I3.2)");
    private static final String EQ_C_I3_2 = Aisc360.eq("C-I3-2 (Commentary I3.2)");
    private static final String CLAUSE_COMMENTARY_I3_2 = Aisc360.clause("Commentary I3.2 (transformed section)");

    private CompositeStiffness() {
    }

    /**
     * Commentary Eq. C-I3-2: the elastic neutral axis of the lower-bound section, measured from the
     * bottom of the steel, Y_ENA = [A_s·d3 + (ΣQ_n/F_y)·(2·d3 + d1)] / [A_s + ΣQ_n/F_y] [m].
     *
     * @param c the force that ΣQ_n develops in the concrete, min(ΣQ_n, full composite force) [N]
     * @param d3 distance from the steel centroid to the top of the steel, d/2 [m]
     * @param d1 distance from the concrete force to the top of the steel [m]
     */
    public static double yEna(double as, double d3, double d1, double c, double fy, Calc calc) {
        double v = (as * d3 + (c / fy) * (2 * d3 + d1)) / (as + c / fy);
        if (calc == null) {
            return v;
        }
        return Calc.eq(calc, "Y_ENA", "(As·d3 + (ΣQn/Fy)·(2·d3 + d1))/(As + ΣQn/Fy)", EQ_C_I3_2, v, Quantity.SECTION_LENGTH,
                Arg.of("As", as, Quantity.AREA), Arg.of("d3", d3, Quantity.SECTION_LENGTH),
                Arg.of("ΣQn", c, Quantity.FORCE), Arg.of("Fy", fy, Quantity.STRESS), Arg.of("d1", d1, Quantity.SECTION_LENGTH));
    }

    /**
     * Commentary Eq. C-I3-1: lower-bound moment of inertia,
     * I_LB = I_s + A_s·(Y_ENA − d3)² + (ΣQ_n/F_y)·(2·d3 + d1 − Y_ENA)² [m⁴].
     *
     * @param is moment of inertia of the steel section I_s [m⁴]
     * @param c as for {@link #yEna}
     */
    public static double ilb(double is, double as, double d3, double d1, double c, double fy, Calc calc) {
        double y = yEna(as, d3, d1, c, fy, calc);
        double v = is + as * (y - d3) * (y - d3) + (c / fy) * (2 * d3 + d1 - y) * (2 * d3 + d1 - y);
        if (calc == null) {
            return v;
        }
        return Calc.eq(calc, "I_LB", "Is + As·(Y_ENA − d3)² + (ΣQn/Fy)·(2·d3 + d1 − Y_ENA)²", EQ_C_I3_1, v,
                Quantity.INERTIA, Arg.of("Is", is, Quantity.INERTIA), Arg.of("As", as, Quantity.AREA),
                Arg.of("Y_ENA", y, Quantity.SECTION_LENGTH), Arg.of("d3", d3, Quantity.SECTION_LENGTH),
                Arg.of("ΣQn", c, Quantity.FORCE), Arg.of("Fy", fy, Quantity.STRESS), Arg.of("d1", d1, Quantity.SECTION_LENGTH));
    }

    /** I_LB of a section for a plastic result of {@link CompositeFlexureI3#strength} (its C and d1). */
    public static double ilb(Section s, double fy, CompositeFlexureI3.Result r, Calc calc) {
        return ilb(s.props().ix(), s.props().a(), s.depth() / 2, r.d1(), r.c(), fy, calc);
    }

    /** Modular ratio n = E_s/E_c. */
    public static double modularRatio(double es, double ec, Calc calc) {
        return Calc.eq(calc, "n", "Es/Ec", CLAUSE_COMMENTARY_I3_2, es / ec, Quantity.NUMBER,
                Arg.of("Es", es, Quantity.STRESS), Arg.of("Ec", ec, Quantity.STRESS));
    }

    /**
     * Full elastic transformed moment of inertia I_tr of the section with the concrete of
     * {@code slab} (width b/n above the deck, ρ·b/n in the ribs), concrete below the elastic neutral
     * axis neglected [m⁴]. Recorded as a value with n and the neutral axis.
     *
     * @param es E of the steel [Pa]
     * @param ec E of the concrete [Pa]
     */
    public static double transformed(Section s, CompositeSlab slab, double es, double ec, Calc calc) {
        double n = modularRatio(es, ec, calc);
        double as = s.props().a();
        double is = s.props().ix();
        double tc = slab.tc();
        double hr = slab.hr();
        double bTop = slab.b() / n;
        double bRib = slab.b() * slab.ribFraction() / n;
        double ys = slab.ycon() + s.depth() / 2; // steel centroid below the top of the slab
        double concreteBottom = bRib > 0 ? tc + hr : tc;
        // the first moment about depth y of the compressed concrete minus that of the steel: rising in y
        double lo = 0;
        double hi = concreteBottom;
        double y;
        if (firstMoment(concreteBottom, tc, hr, bTop, bRib, as, ys) <= 0) {
            // all the concrete is in compression: the neutral axis lies below it, in closed form
            double aTop = bTop * tc;
            double aRib = bRib * hr;
            y = (aTop * tc / 2 + aRib * (tc + hr / 2) + as * ys) / (aTop + aRib + as);
        } else {
            for (int i = 0; i < 100 && hi - lo > 1e-12; i++) {
                double mid = (lo + hi) / 2;
                if (firstMoment(mid, tc, hr, bTop, bRib, as, ys) > 0) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            y = (lo + hi) / 2;
        }
        double i = is + as * (ys - y) * (ys - y);
        double h1 = Math.min(y, tc);
        i += bTop * h1 * h1 * h1 / 12 + bTop * h1 * (y - h1 / 2) * (y - h1 / 2);
        if (bRib > 0 && y > tc) {
            double h2 = Math.min(y, tc + hr) - tc;
            double yc = tc + h2 / 2;
            i += bRib * h2 * h2 * h2 / 12 + bRib * h2 * (y - yc) * (y - yc);
        }
        if (calc != null) {
            calc.value("I_tr", i, Quantity.INERTIA, "elastic transformed section, concrete below the neutral axis neglected",
                    CLAUSE_COMMENTARY_I3_2, Arg.of("y_ENA below the top of the slab", y, Quantity.SECTION_LENGTH));
        }
        return i;
    }

    private static double firstMoment(double y, double tc, double hr, double bTop, double bRib, double as, double ys) {
        double h1 = Math.min(y, tc);
        double m = bTop * h1 * (y - h1 / 2);
        if (bRib > 0 && y > tc) {
            double h2 = Math.min(y, tc + hr) - tc;
            m += bRib * h2 * (y - tc - h2 / 2);
        }
        return m - as * (ys - y);
    }
}
