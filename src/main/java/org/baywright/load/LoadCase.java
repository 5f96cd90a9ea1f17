package org.baywright.load;

/**
 * The gravity load cases Baywright carries separately (ASCE 7-16 Chapter 2 notation). Superimposed
 * dead load is part of D in the combinations; it is kept apart in plans only for reporting.
 */
public enum LoadCase {
    /** Dead load, including member self-weight. */
    D("D", "dead"),
    /** Floor live load (reducible unless flagged otherwise). */
    L("L", "live"),
    /** Roof live load. */
    LR("Lr", "roof live"),
    /** Snow load. */
    S("S", "snow");

    private final String symbol;
    private final String label;

    LoadCase(String symbol, String label) {
        this.symbol = symbol;
        this.label = label;
    }

    public String symbol() {
        return symbol;
    }

    public String label() {
        return label;
    }
}
