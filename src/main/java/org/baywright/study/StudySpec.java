package org.baywright.study;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Plan;

/**
 * A study: a base plan and an ordered list of sweeps. The variants are the cartesian product of the
 * sweeps' values, the first sweep varying slowest; a variant applies its settings to the base in the
 * sweeps' order.
 */
public record StudySpec(Plan base, List<Sweep> sweeps) {
    public StudySpec {
        sweeps = List.copyOf(sweeps);
        for (int i = 0; i < sweeps.size(); i++) {
            for (int j = i + 1; j < sweeps.size(); j++) {
                if (sweeps.get(i).parameter() == sweeps.get(j).parameter()) {
                    throw new IllegalArgumentException(sweeps.get(i).parameter().key() + " is varied twice");
                }
            }
        }
    }

    /**
     * A study of a plan whose members are sized within a structural depth limit (m; 0 for none): the
     * limit is applied to the base before the sweeps.
     */
    public static StudySpec withDepthLimit(Plan plan, List<Sweep> sweeps, double depthLimit) {
        return new StudySpec(depthLimit > 0 ? Variations.maxDepth(plan, depthLimit) : plan, sweeps);
    }

    /** The number of variants, or {@link Long#MAX_VALUE} when it is too large to count. */
    public long countOrMax() {
        try {
            return count();
        } catch (ArithmeticException e) {
            return Long.MAX_VALUE;
        }
    }

    /** Number of variants (the product of the value counts; 1 with no sweeps). */
    public long count() {
        long n = 1;
        for (Sweep s : sweeps) {
            n = Math.multiplyExact(n, s.values().size());
        }
        return n;
    }

    /** The settings of variant {@code index} (0 ≤ index &lt; count), one per sweep. */
    public List<Setting> variant(long index) {
        List<Setting> out = new ArrayList<>(sweeps.size());
        long rest = index;
        long[] strides = new long[sweeps.size()];
        long stride = 1;
        for (int i = sweeps.size() - 1; i >= 0; i--) {
            strides[i] = stride;
            stride *= sweeps.get(i).values().size();
        }
        for (int i = 0; i < sweeps.size(); i++) {
            int k = (int) (rest / strides[i]);
            rest -= k * strides[i];
            out.add(sweeps.get(i).values().get(k));
        }
        return out;
    }

    /** Every variant's settings, in order. */
    public List<List<Setting>> variants() {
        List<List<Setting>> out = new ArrayList<>();
        for (long i = 0; i < count(); i++) {
            out.add(variant(i));
        }
        return out;
    }

    /** The plan of variant {@code index}. */
    public Plan plan(long index) {
        return Variations.apply(base, variant(index));
    }
}
