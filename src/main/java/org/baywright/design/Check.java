package org.baywright.design;

import java.util.List;
import org.baywright.calc.Quantity;
import org.baywright.load.LoadCombination;

/**
 * One design check of a member: demand against capacity. Numbers are canonical SI; units are applied
 * when printed.
 *
 * @param name "flexure", "shear", "live-load deflection", "total-load deflection", "compression"
 * @param demand required strength (or computed deflection)
 * @param capacity available strength (or allowable deflection)
 * @param ratio demand / capacity
 * @param loadCombination the governing load combination (for a deflection, the service loads it is
 *     computed under, named as printed, e.g. "D + L + self-weight")
 * @param clause the standard and clause, e.g. "AISC 360-16 F2"
 * @param quantity the kind of number demand and capacity are
 * @param position where along the member the demand occurs, m (NaN if not applicable)
 * @param segment the governing unbraced segment of a flexure check when the member has brace points;
 *     null where it does not apply (continuous bracing, shear, deflection)
 * @param lb unbraced length of the governing segment, m (NaN if not applicable; 0 = continuous)
 * @param cb bending coefficient of the governing segment (NaN if not applicable)
 * @param note further words, e.g. "limit L/360", "left support"; may be empty
 */
public record Check(String name, double demand, double capacity, double ratio, LoadCombination loadCombination,
        String clause, Quantity quantity, double position, UnbracedSegment segment, double lb, double cb, String note) {

    /**
     * How far above 1.0 a ratio may be and still pass. A demand exactly equal to its capacity can come
     * out as 1.0000000000000002 after the few multiplications and divisions that produce a ratio
     * (relative rounding of a double is about 1e-16 per operation); 1e-9 absorbs that noise with a wide
     * margin while staying far below any difference a design could rest on (ratios are printed to three
     * decimals).
     */
    public static final double RATIO_TOLERANCE = 1e-9;

    /**
     * True when a demand/capacity ratio passes: within 1.0, up to {@link #RATIO_TOLERANCE}. The one
     * pass/fail test of Baywright: every member, check and rejection is judged by it.
     */
    public static boolean passes(double ratio) {
        return ratio <= 1.0 + RATIO_TOLERANCE;
    }

    /** True when this check's ratio passes ({@link #passes(double)}). */
    public boolean passes() {
        return passes(ratio);
    }

    /** The governing combination as printed, e.g. "1.2D + 1.6L" (empty when there is none). */
    public String combination() {
        return loadCombination == null ? "" : loadCombination.name();
    }

    /** The check with the highest ratio (a NaN ratio governs: it cannot be shown to pass); null for none. */
    public static Check governing(List<Check> checks) {
        Check g = null;
        for (Check c : checks) {
            if (g == null || c.ratio() > g.ratio() || Double.isNaN(c.ratio())) {
                g = c;
            }
        }
        return g;
    }
}
