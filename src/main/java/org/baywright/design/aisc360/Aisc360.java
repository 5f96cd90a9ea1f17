package org.baywright.design.aisc360;

/**
 * AISC 360-16, Specification for Structural Steel Buildings (ANSI/AISC 360-16). The equations used
 * here are unchanged in the 2022 edition (AISC 360-22) for the clauses implemented: B4.1, E3, F1,
 * F2, F3, F6, G2.1, H1.1 and Appendix 8 (8.2.1, B1).
 *
 * <p>Every function takes canonical SI values (Pa, m, m², m³, m⁴, m⁶, N, N·m) and an optional
 * {@link org.baywright.calc.Calc} recorder; with a recorder it writes the line the calculation sheet
 * prints, from the same expression it evaluates.
 */
public final class Aisc360 {
    private Aisc360() {
    }

    /** Edition cited on every line. */
    public static final String EDITION = "AISC 360-16";

    /** Reference text for an equation, e.g. {@code ref("F2-1")} → "AISC 360-16 Eq. F2-1". */
    public static String eq(String number) {
        // called with calc == null on the search's hot path too: a plain look-up by the number, no
        // string building and no bin lock once the text is known
        String r = EQUATIONS.get(number);
        return r != null ? r : EQUATIONS.computeIfAbsent(number, k -> EDITION + " Eq. " + k);
    }

    private static final java.util.Map<String, String> EQUATIONS = new java.util.concurrent.ConcurrentHashMap<>();
    private static final java.util.Map<String, String> CLAUSES = new java.util.concurrent.ConcurrentHashMap<>();

    /** Reference text for a clause or table, e.g. {@code clause("Table B4.1b")}. */
    public static String clause(String clause) {
        String r = CLAUSES.get(clause);
        return r != null ? r : CLAUSES.computeIfAbsent(clause, k -> EDITION + " " + k);
    }
}
