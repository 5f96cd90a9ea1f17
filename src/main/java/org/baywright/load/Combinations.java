package org.baywright.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Gravity load combinations of ASCE 7-16 Chapter 2 for floor and roof framing (dead, live, roof
 * live, snow; wind, earthquake and rain are outside Baywright's scope).
 *
 * <p>LRFD, §2.3.1: (1) 1.4D; (2) 1.2D + 1.6L + 0.5(Lr or S); (3) 1.2D + 1.6(Lr or S) + L.
 * The factor 1.0 on L in (3) is kept (the §2.3.1 exception permitting 0.5 is not taken; this is
 * conservative). ASD, §2.4.1: (1) D; (2) D + L; (3) D + (Lr or S); (4) D + 0.75L + 0.75(Lr or S).
 */
public final class Combinations {
    private Combinations() {
    }

    /** Serviceability combination for total-load deflection: D + L (+ Lr or S), unfactored. */
    public static final String SERVICE_REFERENCE = "IBC Table 1604.3 (service loads)";

    /**
     * The combinations of a method that matter for the load cases present. Combinations that only
     * repeat another with zero cases are left out, so a member with only D and L gets 1.4D and
     * 1.2D + 1.6L (LRFD) or D and D + L (ASD).
     */
    public static List<LoadCombination> gravity(DesignMethod method, Set<LoadCase> present) {
        int key = method.ordinal();
        for (LoadCase c : present) {
            key |= 2 << c.ordinal();
        }
        List<LoadCombination> cached = CACHE.get(key);
        if (cached == null) {
            cached = build(method, present);
            CACHE.put(key, cached);
        }
        return cached;
    }

    /**
     * A governing combination and its combined value.
     *
     * @param combination the combination that governs
     * @param index its position in the list it was chosen from
     * @param value its combined value (N, or whatever the by-case values are)
     */
    public record Governing(LoadCombination combination, int index, double value) {
    }

    /**
     * The value of combination {@code c} for values by load case ({@code byCase[LoadCase.ordinal()]}):
     * the sum of factor × value, taken in the order of {@link LoadCase}.
     */
    public static double combine(LoadCombination c, double[] byCase) {
        return c.combine(byCase);
    }

    /**
     * The combination of {@code combos} that gives the largest combined value of {@code byCase} (by
     * {@link #combine}), chosen by the rule of {@link #governing(double[])}. {@code combos} must not be empty.
     */
    public static Governing governing(double[] byCase, List<LoadCombination> combos) {
        double[] values = new double[combos.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = combine(combos.get(i), byCase);
        }
        int g = governing(values);
        return new Governing(combos.get(g), g, values[g]);
    }

    /**
     * Which of several results governs, given one value per result (a combined load, a demand or a
     * ratio; for a member, one per combination or per combination and unbraced segment): the index of
     * the largest value. Of equal values the first governs, so the order of {@link #gravity} decides
     * ties; a NaN never governs (0 is returned when no value is a number). This is the one rule every
     * governing combination in Baywright is chosen by. Allocates nothing (the sizing search calls it
     * for every candidate section).
     */
    public static int governing(double[] values) {
        int g = 0;
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < values.length; i++) {
            if (values[i] > best) {
                best = values[i];
                g = i;
            }
        }
        return g;
    }

    private static final java.util.Map<Integer, List<LoadCombination>> CACHE = new java.util.concurrent.ConcurrentHashMap<>();

    private static List<LoadCombination> build(DesignMethod method, Set<LoadCase> present) {
        boolean l = present.contains(LoadCase.L);
        boolean lr = present.contains(LoadCase.LR);
        boolean s = present.contains(LoadCase.S);
        List<LoadCombination> out = new ArrayList<>();
        if (method == DesignMethod.LRFD) {
            out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (1)", LoadCase.D, 1.4));
            if (l || (!lr && !s)) {
                out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (2)", LoadCase.D, 1.2, LoadCase.L, 1.6));
            }
            if (lr) {
                out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (2)", LoadCase.D, 1.2, LoadCase.L, 1.6, LoadCase.LR, 0.5));
                out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (3)", LoadCase.D, 1.2, LoadCase.LR, 1.6, LoadCase.L, 1.0));
            }
            if (s) {
                out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (2)", LoadCase.D, 1.2, LoadCase.L, 1.6, LoadCase.S, 0.5));
                out.add(LoadCombination.of("ASCE 7-16 §2.3.1 (3)", LoadCase.D, 1.2, LoadCase.S, 1.6, LoadCase.L, 1.0));
            }
        } else {
            out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (1)", LoadCase.D, 1.0));
            if (l || (!lr && !s)) {
                out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (2)", LoadCase.D, 1.0, LoadCase.L, 1.0));
            }
            if (lr) {
                out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (3)", LoadCase.D, 1.0, LoadCase.LR, 1.0));
                out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (4)", LoadCase.D, 1.0, LoadCase.L, 0.75, LoadCase.LR, 0.75));
            }
            if (s) {
                out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (3)", LoadCase.D, 1.0, LoadCase.S, 1.0));
                out.add(LoadCombination.of("ASCE 7-16 §2.4.1 (4)", LoadCase.D, 1.0, LoadCase.L, 0.75, LoadCase.S, 0.75));
            }
        }
        return List.copyOf(out);
    }
}
