package org.baywright.design;

import org.baywright.calc.Quantity;

/**
 * One design check of a member: demand against capacity. Numbers are canonical SI; units are applied
 * when printed.
 *
 * @param name "flexure", "shear", "live-load deflection", "total-load deflection", "compression"
 * @param demand required strength (or computed deflection)
 * @param capacity available strength (or allowable deflection)
 * @param ratio demand / capacity
 * @param combination the governing load combination, e.g. "1.2D + 1.6L"
 * @param clause the standard and clause, e.g. "AISC 360-16 F2"
 * @param quantity the kind of number demand and capacity are
 * @param position where along the member the demand occurs, m (NaN if not applicable)
 * @param lb unbraced length of the governing segment, m (NaN if not applicable; 0 = continuous)
 * @param cb bending coefficient of the governing segment (NaN if not applicable)
 * @param note further words, e.g. "limit L/360", "left support"; may be empty
 */
public record Check(String name, double demand, double capacity, double ratio, String combination, String clause,
        Quantity quantity, double position, double lb, double cb, String note) {

    /** True when the ratio is within 1.0 (with a tolerance of 1e-9 for rounding in the last digit). */
    public boolean passes() {
        return ratio <= 1.0 + 1e-9;
    }
}
