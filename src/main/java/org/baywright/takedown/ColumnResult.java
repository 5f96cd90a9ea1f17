package org.baywright.takedown;

import java.util.List;
import org.baywright.plan.Point;

/**
 * One column line from its top level to the foundation.
 *
 * @param kll live-load element factor (ASCE 7-16 Table 4.7-1), from the column's position
 * @param position "interior", "edge", "corner", with "with cantilever slab" where it applies
 * @param tiers bottom tier first
 * @param foundation the reaction on the foundation by load case ordinal (D, L, Lr, S), unreduced, N
 * @param foundationReduced the same with live loads reduced, N
 */
public record ColumnResult(String id, String grid, Point at, double kll, String position, List<ColumnTier> tiers,
        double[] foundation, double[] foundationReduced) {
}
