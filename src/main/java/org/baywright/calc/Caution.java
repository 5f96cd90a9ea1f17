package org.baywright.calc;

/** The caution printed with every result. */
public final class Caution {
    /** One paragraph, printed by the CLI, the app and every report. */
    public static final String TEXT =
            "CAUTION: Baywright is a preliminary design aid. Every result must be checked and approved by a"
            + " licensed professional engineer; the governing local building code and standards take precedence.";

    private Caution() {
    }
}
