package org.baywright.load;

/**
 * ASCE/SEI 7-16, Minimum Design Loads and Associated Criteria for Buildings and Other Structures:
 * the reference text printed beside every load equation on a calculation sheet.
 */
public final class Asce7 {
    private Asce7() {
    }

    /** Edition cited on every line. */
    public static final String EDITION = "ASCE 7-16";

    /** Reference text for an equation, e.g. {@code eq("4.7-1")} → "ASCE 7-16 Eq. 4.7-1". */
    public static String eq(String number) {
        return EDITION + " Eq. " + number;
    }

    /** Reference text for a clause or table, e.g. {@code clause("§4.7.2")} → "ASCE 7-16 §4.7.2". */
    public static String clause(String clause) {
        return EDITION + " " + clause;
    }
}
