package org.baywright.design;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.units.Units;

/**
 * How much camber to specify for an unshored beam from its deflection under the wet concrete and its
 * own weight. Common practice (CHECK-VALUES §4, from AISC guidance, from memory): camber about 80 % of
 * that deflection, specified in ¼ in steps rounded down, none when it would be under ¾ in or the span
 * is short (under about 20 ft).
 *
 * @param fraction share of the deflection cambered out (0.8)
 * @param increment the step camber is specified in, rounded down (¼ in) [m]
 * @param minimum no camber below this (¾ in) [m]
 * @param minSpan no camber on spans shorter than this (20 ft) [m]
 */
public record CamberRule(double fraction, double increment, double minimum, double minSpan) {
    private static final String PRACTICE = "camber, common practice (CHECK-VALUES §4)";

    public CamberRule {
        if (!(fraction >= 0 && fraction <= 1) || !(increment > 0) || !(minimum >= 0) || !(minSpan >= 0)) {
            throw new IllegalArgumentException("camber rule: the fraction must lie in [0, 1], the increment be positive, "
                    + "the minimum and the shortest span not negative");
        }
    }

    /** 80 %, ¼ in steps rounded down, none under ¾ in or on spans under 20 ft. */
    public static CamberRule defaults() {
        return new CamberRule(0.8, Units.IN.toSi(0.25), Units.IN.toSi(0.75), Units.FT_.toSi(20));
    }

    /** No camber at all. */
    public static CamberRule none() {
        return new CamberRule(0, Units.IN.toSi(0.25), Double.MAX_VALUE, 0);
    }

    /** The camber to specify for a pre-composite deflection {@code deflection} on span {@code span} [m]. */
    public double camber(double deflection, double span, Calc calc) {
        if (span < minSpan) {
            Calc.branch(calc, "span below the shortest cambered span → no camber", PRACTICE);
            return 0;
        }
        double raw = fraction * deflection;
        if (calc != null) {
            calc.eq("c_raw", "f_c·Δ_pre", PRACTICE, raw, Quantity.SECTION_LENGTH, Arg.num("f_c", fraction),
                    Arg.of("Δ_pre", deflection, Quantity.SECTION_LENGTH));
        }
        // rounded down to the increment; the small allowance keeps an exact multiple (2.0 in) from dropping a step
        double steps = Math.floor(raw / increment + 1e-9);
        double v = steps * increment;
        if (v < minimum || v <= 0) {
            Calc.branch(calc, "camber below the minimum → no camber", PRACTICE);
            return 0;
        }
        if (calc != null) {
            calc.eq("camber", "n_c·Δc", PRACTICE, v, Quantity.SECTION_LENGTH, Arg.num("n_c", steps),
                    Arg.of("Δc", increment, Quantity.SECTION_LENGTH));
        }
        return v;
    }
}
