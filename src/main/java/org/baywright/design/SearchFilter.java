package org.baywright.design;

import java.util.Set;
import org.baywright.catalog.Section;

/**
 * Which catalog sections a search may choose.
 *
 * @param minDepth lower limit on the actual depth d, m (0 = none)
 * @param maxDepth upper limit on the actual depth d, m (infinity = none): what a ceiling plenum sees
 * @param series nominal-depth series allowed, e.g. {@code W14, W16} (empty = all)
 * @param excluded designations never chosen
 */
public record SearchFilter(double minDepth, double maxDepth, Set<String> series, Set<String> excluded) {
    /**
     * A depth limit admits sections this much deeper (m, a nanometre): a limit typed as the catalog's own
     * depth (24in = 0.6096 m) must admit that section after unit conversion.
     */
    public static final double DEPTH_ROUNDING = 1e-9;


    public static final SearchFilter ALL = new SearchFilter(0, Double.POSITIVE_INFINITY, Set.of(), Set.of());

    public SearchFilter {
        series = Set.copyOf(series);
        excluded = Set.copyOf(excluded);
        if (minDepth < 0 || !(maxDepth > 0) || minDepth > maxDepth) {
            throw new IllegalArgumentException("depth limits must satisfy 0 ≤ min ≤ max");
        }
    }

    /** Whether the search may choose {@code s}. */
    public boolean allows(Section s) {
        double d = s.depth();
        return d >= minDepth - DEPTH_ROUNDING && d <= maxDepth + DEPTH_ROUNDING
                && (series.isEmpty() || series.contains(s.series()))
                && !excluded.contains(s.designation());
    }
}
