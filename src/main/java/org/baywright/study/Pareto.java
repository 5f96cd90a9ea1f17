package org.baywright.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * The Pareto front of two objectives, both minimised. An item dominates another when it is no worse
 * in both objectives and better in at least one; the front is every item no other item dominates.
 * Items with equal values in both objectives do not dominate each other, so all of them are on the
 * front or none is. Items with a NaN objective are left out.
 */
public final class Pareto {
    private Pareto() {
    }

    /** The non-dominated items, sorted by the first objective then the second (stable otherwise). */
    public static <T> List<T> front(List<T> items, ToDoubleFunction<T> a, ToDoubleFunction<T> b) {
        List<T> sorted = new ArrayList<>();
        for (T t : items) {
            if (!Double.isNaN(a.applyAsDouble(t)) && !Double.isNaN(b.applyAsDouble(t))) {
                sorted.add(t);
            }
        }
        sorted.sort(Comparator.<T>comparingDouble(a).thenComparingDouble(b));
        // sweep in order of a: an item is on the front when its b is below every b seen at a strictly
        // smaller a, and no item of the same a has a smaller b
        List<T> out = new ArrayList<>();
        double bestB = Double.POSITIVE_INFINITY;
        int i = 0;
        while (i < sorted.size()) {
            double ai = a.applyAsDouble(sorted.get(i));
            int j = i;
            while (j < sorted.size() && a.applyAsDouble(sorted.get(j)) == ai) {
                j++;
            }
            double groupMin = b.applyAsDouble(sorted.get(i));
            if (groupMin < bestB) {
                for (int k = i; k < j && b.applyAsDouble(sorted.get(k)) == groupMin; k++) {
                    out.add(sorted.get(k));
                }
                bestB = groupMin;
            }
            i = j;
        }
        return out;
    }

    /** True when {@code x} dominates {@code y} (the definition, for checks). */
    public static <T> boolean dominates(T x, T y, ToDoubleFunction<T> a, ToDoubleFunction<T> b) {
        double ax = a.applyAsDouble(x);
        double ay = a.applyAsDouble(y);
        double bx = b.applyAsDouble(x);
        double by = b.applyAsDouble(y);
        return ax <= ay && bx <= by && (ax < ay || bx < by);
    }
}
