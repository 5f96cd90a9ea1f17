package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;

/**
 * AISC 360-16 I3.2a and I3.2d(1): the positive flexural strength of a composite beam (a rolled
 * doubly symmetric I-shape with a concrete slab on top, connected by steel headed stud anchors) by the
 * plastic stress distribution, for any position of the plastic neutral axis (PNA): in the slab, in the
 * top flange, or in the web.
 *
 * <p>The method: the compression force in the concrete is C = min(0.85·f′c·A_c, A_s·F_y, ΣQ_n)
 * (I3.2d(1), Eqs. I3-1a, I3-1b, I3-1c); it acts at the centroid of a 0.85·f′c stress block of depth a
 * below the top of the slab, at d1 above the top of the steel. The steel carries the balance: with
 * P_y = A_s·F_y, a compression C_s = (P_y − C)/2 at the top of the section (centroid d2 below the top of
 * the steel) and the rest in tension; taking moments, M_n = C·(d1 + d2) + P_y·(d3 − d2) with d3 = d/2
 * (AISC 360-16 Commentary I3.2a, Fig. C-I3.3; the same expression as the Manual's Table 3-19).
 *
 * <p>The steel shape is taken as two flanges b_f × t_f and a web carrying the rest of the tabulated
 * area, A_s − 2·b_f·t_f, spread over d − 2·t_f (the fillets go with the web). A_s is exact, so the
 * full-composite and flange positions agree with the Manual; with the PNA in the web the fillet area
 * is placed a little further from the flange than it is.
 *
 * <p>Known limitations: positive moment only; webs with h/t_w ≤ 3.76√(E/F_y) (I3.2a(a); every rolled
 * W shape at F_y ≤ 50 ksi); the I3.2a(b) elastic method for other webs is not implemented (NaN).
 * Which concrete counts (I3.2c(2)/(3), ribs perpendicular or parallel) is the {@link CompositeSlab}'s.
 */
public final class CompositeFlexureI3 {
    private static final String CLAUSE_I3_2A = Aisc360.clause("I3.2a");
    private static final String CLAUSE_I3_2A_A = Aisc360.clause("I3.2a(a)");
    private static final String CLAUSE_I3_2C = Aisc360.clause("I3.2c");
    private static final String CLAUSE_I3_2D1 = Aisc360.clause("I3.2d(1)");
    private static final String EQ_I3_1A = Aisc360.eq("I3-1a");
    private static final String EQ_I3_1B = Aisc360.eq("I3-1b");

    /** Resistance factor for positive flexure of a composite beam, I3.2a: φ_b = 0.90. */
    public static final double PHI_B = 0.90;
    /** Safety factor for positive flexure of a composite beam, I3.2a: Ω_b = 1.67. */
    public static final double OMEGA_B = 1.67;

    private CompositeFlexureI3() {
    }

    /** Where the plastic neutral axis lies. */
    public enum Pna {
        /** In the concrete (C = A_s·F_y: the steel is all in tension). */
        SLAB,
        /** In the top flange of the steel. */
        TOP_FLANGE,
        /** In the web. */
        WEB
    }

    /**
     * The plastic stress distribution of one composite section for one ΣQ_n. Forces N, lengths m,
     * moment N·m.
     *
     * @param vc concrete crushing, 0.85·f′c·A_c (I3-1a)
     * @param vs steel yielding, A_s·F_y (I3-1b)
     * @param c the compression force in the concrete, min(V′c, V′s, ΣQ_n)
     * @param degree C/min(V′c, V′s): the degree of composite action (1 = full)
     * @param a depth of the concrete stress block from the top of the slab
     * @param d1 distance from the concrete force to the top of the steel (Manual Y2)
     * @param cs compression force in the steel
     * @param d2 distance from the steel compression force to the top of the steel (0 when none)
     * @param d3 distance from P_y (the steel centroid) to the top of the steel, d/2
     * @param pnaDepth the PNA's distance below the top of the steel (negative when it is in the slab)
     * @param pna where the PNA lies
     * @param mn nominal flexural strength M_n (NaN when I3.2a(a) does not apply)
     */
    public record Result(double vc, double vs, double c, double degree, double a, double d1, double cs, double d2,
            double d3, double pnaDepth, Pna pna, double mn) {

        /** The full composite force, min(V′c, V′s): ΣQ_n beyond it adds no strength. */
        public double full() {
            return Math.min(vc, vs);
        }
    }

    /** AISC 360-16 Eq. I3-1a: concrete crushing, V′c = 0.85·f′c·A_c [N]. */
    public static double concreteCrushing(double fc, double ac, Calc calc) {
        double v = 0.85 * fc * ac;
        if (calc != null) {
            calc.eq("Vc", "0.85·fc·Ac", EQ_I3_1A, v, Quantity.FORCE, Arg.of("fc", fc, Quantity.STRESS),
                    Arg.of("Ac", ac, Quantity.AREA));
        }
        return v;
    }

    /** AISC 360-16 Eq. I3-1b: tensile yielding of the steel section, V′s = A_s·F_y [N]. */
    public static double steelYielding(double as, double fy, Calc calc) {
        double v = as * fy;
        if (calc != null) {
            calc.eq("Vs", "As·Fy", EQ_I3_1B, v, Quantity.FORCE, Arg.of("As", as, Quantity.AREA),
                    Arg.of("Fy", fy, Quantity.STRESS));
        }
        return v;
    }

    /**
     * The positive nominal flexural strength of {@code s} with slab {@code slab} and the sum of the stud
     * strengths between the point of zero and maximum moment {@code sumQn}, by the plastic stress
     * distribution (I3.2a), recording every step when {@code calc} is given.
     *
     * @param fy F_y of the steel [Pa]
     * @param e E of the steel [Pa]
     * @param sumQn ΣQ_n [N] (≥ 0; values beyond the full composite force add nothing)
     */
    public static Result strength(Section s, double fy, double e, CompositeSlab slab, double sumQn, Calc calc) {
        if (!(sumQn >= 0)) {
            throw new IllegalArgumentException("ΣQn must be ≥ 0, got " + sumQn);
        }
        double as = s.props().a();
        double d = s.depth();
        double bf = s.dims().bf();
        double tf = s.dims().tf();
        double hw = s.hOverTw();
        double limit = 3.76 * Math.sqrt(e / fy);
        boolean plastic = hw <= limit;
        if (calc != null) {
            calc.branch("h/tw = " + CalcFormat.sig(hw) + (plastic ? " ≤ " : " > ") + "3.76√(E/Fy) = " + CalcFormat.sig(limit)
                    + (plastic ? " → plastic stress distribution" : " → elastic method of I3.2a(b) (not implemented)"),
                    CLAUSE_I3_2A_A);
        }
        double ac = slab.ac();
        if (calc != null) {
            calc.eq("Ac", "b·(tc + ρ·hr)", CLAUSE_I3_2C, ac, Quantity.AREA,
                    Arg.of("b", slab.b(), Quantity.SECTION_LENGTH), Arg.of("tc", slab.tc(), Quantity.SECTION_LENGTH),
                    Arg.num("ρ", slab.ribFraction()), Arg.of("hr", slab.hr(), Quantity.SECTION_LENGTH));
        }
        double fc = slab.fc();
        double vc = concreteCrushing(fc, ac, calc);
        double py = steelYielding(as, fy, calc);
        double c = Math.min(vc, Math.min(py, sumQn));
        if (calc != null) {
            calc.eq("C", "min(Vc, Vs, ΣQn)", CLAUSE_I3_2D1, c, Quantity.FORCE, Arg.of("Vc", vc, Quantity.FORCE),
                    Arg.of("Vs", py, Quantity.FORCE), Arg.of("ΣQn", sumQn, Quantity.FORCE));
        }
        double full = Math.min(vc, py);
        double degree = c / full;
        if (calc != null) {
            calc.eq("η", "C/min(Vc, Vs)", CLAUSE_I3_2D1, degree, Quantity.NUMBER, Arg.of("C", c, Quantity.FORCE),
                    Arg.of("Vc", vc, Quantity.FORCE), Arg.of("Vs", py, Quantity.FORCE));
        }

        // the concrete stress block
        double b = slab.b();
        double tc = slab.tc();
        double ycon = slab.ycon();
        double top = 0.85 * fc * b * tc;
        double a;
        double d1;
        if (c <= top || slab.ribFraction() == 0) {
            a = c / (0.85 * fc * b);
            if (calc != null) {
                calc.eq("a", "C/(0.85·fc·b)", CLAUSE_I3_2A, a, Quantity.SECTION_LENGTH, Arg.of("C", c, Quantity.FORCE),
                        Arg.of("fc", fc, Quantity.STRESS), Arg.of("b", b, Quantity.SECTION_LENGTH));
            }
            d1 = ycon - a / 2;
            if (calc != null) {
                calc.eq("d1", "Ycon − a/2", CLAUSE_I3_2A, d1, Quantity.SECTION_LENGTH,
                        Arg.of("Ycon", ycon, Quantity.SECTION_LENGTH), Arg.of("a", a, Quantity.SECTION_LENGTH));
            }
        } else {
            // ribs parallel: the block reaches into the ribs, where only ρ·b is concrete (I3.2c(3))
            double rho = slab.ribFraction();
            Calc.branch(calc, "C > 0.85·f′c·b·tc → the stress block reaches into the ribs (deck parallel)", CLAUSE_I3_2C);
            a = tc + (c - 0.85 * fc * b * tc) / (0.85 * fc * b * rho);
            if (calc != null) {
                calc.eq("a", "tc + (C − 0.85·fc·b·tc)/(0.85·fc·b·ρ)", CLAUSE_I3_2A, a, Quantity.SECTION_LENGTH,
                        Arg.of("C", c, Quantity.FORCE), Arg.of("fc", fc, Quantity.STRESS),
                        Arg.of("b", b, Quantity.SECTION_LENGTH), Arg.of("tc", tc, Quantity.SECTION_LENGTH),
                        Arg.num("ρ", rho));
            }
            d1 = ycon - (0.85 * fc * b * tc * tc / 2 + (c - 0.85 * fc * b * tc) * (tc + (a - tc) / 2)) / c;
            if (calc != null) {
                calc.eq("d1", "Ycon − (0.85·fc·b·tc·tc/2 + (C − 0.85·fc·b·tc)·(tc + (a − tc)/2))/C", CLAUSE_I3_2A, d1, Quantity.SECTION_LENGTH,
                        Arg.of("Ycon", ycon, Quantity.SECTION_LENGTH), Arg.of("fc", fc, Quantity.STRESS),
                        Arg.of("b", b, Quantity.SECTION_LENGTH), Arg.of("tc", tc, Quantity.SECTION_LENGTH),
                        Arg.of("C", c, Quantity.FORCE), Arg.of("a", a, Quantity.SECTION_LENGTH));
            }
        }

        // the steel: compression Cs at the top, centroid d2 below the top of the steel
        double cs = Math.max(0, (py - c) / 2);
        double flange = bf * tf * fy;
        double d2;
        double pnaDepth;
        Pna pna;
        if (cs <= 0) {
            pna = Pna.SLAB;
            d2 = 0;
            pnaDepth = -(ycon - a);
            Calc.branch(calc, "C = As·Fy → the PNA is in the slab; the whole steel section yields in tension", CLAUSE_I3_2A);
        } else {
            if (calc != null) {
                calc.eq("Cs", "(As·Fy − C)/2", CLAUSE_I3_2A, cs, Quantity.FORCE, Arg.of("As", as, Quantity.AREA),
                        Arg.of("Fy", fy, Quantity.STRESS), Arg.of("C", c, Quantity.FORCE));
            }
            if (cs <= flange) {
                pna = Pna.TOP_FLANGE;
                Calc.branch(calc, "Cs ≤ bf·tf·Fy → the PNA is in the top flange",
                        CLAUSE_I3_2A);
                double x = cs / (bf * fy);
                if (calc != null) {
                    calc.eq("x", "Cs/(bf·Fy)", CLAUSE_I3_2A, x, Quantity.SECTION_LENGTH,
                            Arg.of("Cs", cs, Quantity.FORCE), Arg.of("bf", bf, Quantity.SECTION_LENGTH),
                            Arg.of("Fy", fy, Quantity.STRESS));
                }
                pnaDepth = x;
                d2 = x / 2;
                if (calc != null) {
                    calc.eq("d2", "x/2", CLAUSE_I3_2A, d2, Quantity.SECTION_LENGTH, Arg.of("x", x, Quantity.SECTION_LENGTH));
                }
            } else {
                pna = Pna.WEB;
                Calc.branch(calc, "Cs > bf·tf·Fy → the PNA is in the web", CLAUSE_I3_2A);
                double twe = (as - 2 * bf * tf) / (d - 2 * tf);
                if (calc != null) {
                    calc.eq("tw_e", "(As − 2·bf·tf)/(d − 2·tf)", CLAUSE_I3_2A, twe, Quantity.SECTION_LENGTH,
                            Arg.of("As", as, Quantity.AREA), Arg.of("bf", bf, Quantity.SECTION_LENGTH),
                            Arg.of("tf", tf, Quantity.SECTION_LENGTH), Arg.of("d", d, Quantity.SECTION_LENGTH));
                }
                double xw = (cs - flange) / (twe * fy);
                if (calc != null) {
                    calc.eq("x_w", "(Cs − bf·tf·Fy)/(tw_e·Fy)", CLAUSE_I3_2A, xw, Quantity.SECTION_LENGTH,
                            Arg.of("Cs", cs, Quantity.FORCE), Arg.of("bf", bf, Quantity.SECTION_LENGTH),
                            Arg.of("tf", tf, Quantity.SECTION_LENGTH), Arg.of("Fy", fy, Quantity.STRESS),
                            Arg.of("tw_e", twe, Quantity.SECTION_LENGTH));
                }
                pnaDepth = tf + xw;
                d2 = (flange * tf / 2 + (cs - flange) * (tf + xw / 2)) / cs;
                if (calc != null) {
                    calc.eq("d2", "(bf·tf·Fy·tf/2 + (Cs − bf·tf·Fy)·(tf + x_w/2))/Cs", CLAUSE_I3_2A, d2, Quantity.SECTION_LENGTH,
                            Arg.of("bf", bf, Quantity.SECTION_LENGTH), Arg.of("tf", tf, Quantity.SECTION_LENGTH),
                            Arg.of("Fy", fy, Quantity.STRESS), Arg.of("Cs", cs, Quantity.FORCE),
                            Arg.of("x_w", xw, Quantity.SECTION_LENGTH));
                }
            }
        }
        double d3 = d / 2;
        if (calc != null) {
            calc.eq("d3", "d/2", CLAUSE_I3_2A, d3, Quantity.SECTION_LENGTH, Arg.of("d", d, Quantity.SECTION_LENGTH));
        }
        double mn = c * (d1 + d2) + py * (d3 - d2);
        if (!plastic) {
            mn = Double.NaN;
        } else {
            if (calc != null) {
                calc.eq("Mn", "C·(d1 + d2) + As·Fy·(d3 − d2)", CLAUSE_I3_2A, mn, Quantity.MOMENT,
                        Arg.of("C", c, Quantity.FORCE), Arg.of("d1", d1, Quantity.SECTION_LENGTH),
                        Arg.of("d2", d2, Quantity.SECTION_LENGTH), Arg.of("As", as, Quantity.AREA),
                        Arg.of("Fy", fy, Quantity.STRESS), Arg.of("d3", d3, Quantity.SECTION_LENGTH));
            }
        }
        return new Result(vc, py, c, degree, a, d1, cs, d2, d3, pnaDepth, pna, mn);
    }
}
