package org.baywright.load;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.StringJoiner;

/**
 * A load combination: a factor for each load case, with the clause it comes from.
 *
 * @param name as printed, e.g. {@code 1.2D + 1.6L}
 * @param reference e.g. "ASCE 7-16 §2.3.1 (2)"
 */
public record LoadCombination(String name, Map<LoadCase, Double> factors, String reference) {

    public LoadCombination {
        EnumMap<LoadCase, Double> m = new EnumMap<>(LoadCase.class);
        m.putAll(factors);
        factors = Collections.unmodifiableMap(m);
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
        Double f = factors.get(c);
        return f == null ? 0 : f;
    }
}
