package org.baywright.load;

import java.util.Objects;

/**
 * The result of a live-load reduction.
 *
 * @param factor the ratio actually applied, reduced / L0 (1.0 when nothing is reduced; never above 1)
 * @param reduced the reduced live load, Pa
 * @param rule which clause or limit governed, e.g. "Eq. 4.7-1" or "limit 0.50·L0 (one floor)"; one of
 *     the {@code RULE_…} constants of {@link LiveLoadReduction}
 */
public record Reduction(double factor, double reduced, String rule) {

    public Reduction {
        Objects.requireNonNull(rule, "rule");
    }
}
