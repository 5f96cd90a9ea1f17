package org.baywright.design.dg11;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * The walking-excitation criterion for low-frequency floors (DG11 2nd ed. Ch. 4, from memory) and the
 * whole check of one bay ({@link #check}).
 */
public final class Walking {
    private static final String EQ_4_1 = Dg11.eq("4-1");
    private static final String CH_4 = Dg11.section("Ch. 4");

    private Walking() {
    }

    /**
     * DG11 2nd ed. Eq. 4-1 (no. from memory): peak acceleration from walking as a fraction of g,
     * a_p/g = Po·e^(−0.35·fn)/(β·W).
     *
     * @param po walking force P_o [N] (65 lb for floors, R = 0.5 included)
     * @param fn combined mode frequency [Hz]
     * @param beta modal damping ratio β
     * @param w combined effective weight W [N]
     */
    public static double peakAcceleration(double po, double fn, double beta, double w, Calc calc) {
        double v = po * Math.exp(-0.35 * fn) / (beta * w);
        return Calc.eq(calc, "a_p/g", "Po·e^(−0.35·fn)/(β·W)", EQ_4_1, v, Quantity.NUMBER,
                Arg.of("Po", po, Quantity.FORCE), Arg.num("e", Math.E), Arg.num("fn", fn), Arg.num("β", beta),
                Arg.of("W", w, Quantity.FORCE));
    }

    /** DG11 2nd ed. Eq. 4-1 (no. from memory): the demand over the tolerance limit, (a_p/g)/(a_o/g). */
    public static double ratio(double apg, double limit, Calc calc) {
        return Calc.eq(calc, "ratio", "apg/aog", EQ_4_1, apg / limit, Quantity.NUMBER, Arg.num("apg", apg),
                Arg.num("aog", limit));
    }

    /**
     * DG11 2nd ed. Ch. 4 (from memory): the status. Above 9 Hz the low-frequency method does not apply and
     * the bay is outside this check (not a pass); otherwise it meets the limit when a_p/g ≤ a_o/g.
     */
    public static VibrationStatus status(double fn, double apg, double limit, Calc calc) {
        VibrationStatus s;
        if (fn > Dg11.HIGHEST_LOW_FREQUENCY) {
            s = VibrationStatus.OUTSIDE_METHOD;
            Calc.branch(calc, String.format(java.util.Locale.ROOT,
                    "f_n = %.2f Hz > 9 Hz → the low-frequency walking method does not apply; outside this check", fn), CH_4);
        } else {
            s = apg <= limit ? VibrationStatus.MEETS : VibrationStatus.EXCEEDS;
            Calc.branch(calc, String.format(java.util.Locale.ROOT, "a_p/g = %.3f %% %s a_o/g = %.2f %% → %s", apg * 100,
                    apg <= limit ? "≤" : ">", limit * 100, s.label()), EQ_4_1);
        }
        if (fn < Dg11.LOWEST_ADVISABLE_FREQUENCY) {
            Calc.branch(calc, String.format(java.util.Locale.ROOT,
                    "f_n = %.2f Hz < 3 Hz → floors below 3 Hz should be avoided", fn), CH_4);
        }
        return s;
    }

    /**
     * DG11 2nd ed. Ch. 3 and 4 (numbers from memory): the walking check of one bay, every equation in order —
     * beam and girder mode deflections and frequencies (Eqs. 3-2, 3-3), D_j, D_g, the effective widths
     * (Eqs. 4-3, 4-5), the mode weights with continuity (Eq. 4-2), the girder-deflection reduction (Eq. 4-4),
     * the combined frequency (Eq. 3-4) and weight, a_p/g (Eq. 4-1), the ratio and the status.
     */
    public static VibrationResult check(BayVibration bay, Calc calc) {
        VibrationMember b = bay.beam();
        VibrationMember g = bay.girder();
        if (calc != null) {
            calc.heading("Floor vibration from walking, low-frequency floors (DG11 2nd ed.; frequencies in Hz, a_p/g"
                    + " a fraction of g)");
            calc.heading("Beam (joist) mode");
        }
        double dj = Modes.deflection("Δj", b.weight(), b.span(), bay.es(), b.it(), calc);
        double fj = Modes.frequency("f_j", dj, calc);
        double djStiff = Stiffness.dj(b.it(), b.spacing(), calc);
        double bj = EffectiveWeights.beamWidth(bay.cj(), bay.ds(), djStiff, b.span(), bay.floorWidth(), calc);
        double wj = EffectiveWeights.weight("W_j", EffectiveWeights.continuityFactor("beam", b.continuous(), calc),
                b.weight(), b.spacing(), bj, b.span(), calc);
        if (calc != null) {
            calc.heading("Girder mode");
        }
        double dg = Modes.deflection("Δg", g.weight(), g.span(), bay.es(), g.it(), calc);
        double fg = Modes.frequency("f_g", dg, calc);
        double dgStiff = Stiffness.dg(g.it(), b.span(), calc);
        double bg = EffectiveWeights.girderWidth(bay.cg(), djStiff, dgStiff, g.span(), bay.floorLength(), calc);
        double wg = EffectiveWeights.weight("W_g", EffectiveWeights.continuityFactor("girder", g.continuous(), calc),
                g.weight(), b.span(), bg, g.span(), calc);
        if (calc != null) {
            calc.heading("Combined mode");
        }
        double dgr = EffectiveWeights.reducedGirderDeflection(dg, g.span(), bj, calc);
        double fn = Modes.combined(dj, dgr, calc);
        double w = EffectiveWeights.combined(dj, dgr, wj, wg, calc);
        double apg = peakAcceleration(bay.po(), fn, bay.beta(), w, calc);
        double ratio = ratio(apg, bay.limit(), calc);
        VibrationStatus status = status(fn, apg, bay.limit(), calc);
        return new VibrationResult(dj, dg, dgr, fj, fg, fn, bj, bg, wj, wg, w, apg, bay.limit(), ratio, status,
                fn < Dg11.LOWEST_ADVISABLE_FREQUENCY);
    }
}
