package org.baywright.load;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.StringJoiner;

/**
 * A load combination: a factor for each load case, with the clause it comes from. Immutable; equal when
 * name, factors and clause are.
 */
public final class LoadCombination {
    private final String name;
    private final Map<LoadCase, Double> factors;
    private final String reference;
    /** The factors by {@link LoadCase#ordinal()}: the hot path (column and beam searches) reads these, not the map. */
    private final double[] byCase;

    /**
     * @param name as printed, e.g. {@code 1.2D + 1.6L}
     * @param factors the factor of each load case it names
     * @param reference e.g. "ASCE 7-16 §2.3.1 (2)"
     */
    public LoadCombination(String name, Map<LoadCase, Double> factors, String reference) {
        EnumMap<LoadCase, Double> m = new EnumMap<>(LoadCase.class);
        m.putAll(factors);
        this.name = name;
        this.factors = Collections.unmodifiableMap(m);
        this.reference = reference;
        this.byCase = new double[LoadCase.values().length];
        m.forEach((c, f) -> byCase[c.ordinal()] = f);
    }

    /** As printed, e.g. {@code 1.2D + 1.6L}. */
    public String name() {
        return name;
    }

    /** The factor of each load case the combination names. */
    public Map<LoadCase, Double> factors() {
        return factors;
    }

    /** The clause, e.g. "ASCE 7-16 §2.3.1 (2)". */
    public String reference() {
        return reference;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LoadCombination c && name.equals(c.name) && factors.equals(c.factors) && reference.equals(c.reference);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(name, factors, reference);
    }

    @Override
    public String toString() {
        return "LoadCombination[name=" + name + ", factors=" + factors + ", reference=" + reference + "]";
    }

    /** Builds a combination and names it from its factors ("1.2D + 1.6L"). */
    public static LoadCombination of(String reference, Object... caseFactorPairs) {
        EnumMap<LoadCase, Double> m = new EnumMap<>(LoadCase.class);
        for (int i = 0; i < caseFactorPairs.length; i += 2) {
            m.put((LoadCase) caseFactorPairs[i], ((Number) caseFactorPairs[i + 1]).doubleValue());
        }
        StringJoiner j = new StringJoiner(" + ");
        for (Map.Entry<LoadCase, Double> e : m.entrySet()) {
            double f = e.getValue();
            String fs = f == 1.0 ? "" : (f == Math.rint(f) ? String.format(java.util.Locale.ROOT, "%.1f", f)
                    : String.valueOf(f));
            j.add(fs + e.getKey().symbol());
        }
        return new LoadCombination(j.toString(), m, reference);
    }

    /** The factor on a case (0 where the case is absent). */
    public double factor(LoadCase c) {
        return byCase[c.ordinal()];
    }

    /** The factored sum of service values by {@link LoadCase#ordinal()}: Σ factor·value. */
    public double combine(double[] values) {
        double v = 0;
        for (int k = 0; k < byCase.length; k++) {
            v += byCase[k] * values[k];
        }
        return v;
    }
}
