package org.baywright.study;

import java.util.Locale;

/** What a study can vary, each with the name the command line uses. */
public enum Parameter {
    /** Every bay width along x (between lettered grid lines). */
    BAY_X("bay-x"),
    /** Every bay depth along y (between numbered grid lines). */
    BAY_Y("bay-y"),
    /** Every infill's maximum beam spacing (its count cleared). */
    BEAM_SPACING("beam-spacing"),
    /** Every infill's beam count. */
    BEAM_COUNT("beam-count"),
    /** Every infill's direction, the decks and the kinds of members on grid lines with it. */
    BEAM_DIRECTION("beam-direction"),
    /** The design method. */
    METHOD("method"),
    /** The actual-depth limit of beams and girders. */
    MAX_DEPTH("max-depth"),
    /** The nominal-depth series allowed for columns. */
    COLUMN_SERIES("column-series"),
    /** Whether the members act with the slab: every layout with a slab composite (on) or bare steel (off). */
    COMPOSITE("composite"),
    /** The concrete above the deck of every slab (the slab thickness less the rib height). */
    TOPPING("topping"),
    /** The concrete unit weight of every slab. */
    CONCRETE("concrete");

    private final String key;

    Parameter(String key) {
        this.key = key;
    }

    /** The command-line name, e.g. "beam-spacing". */
    public String key() {
        return key;
    }

    /** The parameter of a command-line name (any case), or null. */
    public static Parameter parse(String text) {
        if (text == null) {
            return null;
        }
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (Parameter p : values()) {
            if (p.key.equals(t)) {
                return p;
            }
        }
        return null;
    }

    /** The names, for messages. */
    public static String names() {
        StringBuilder b = new StringBuilder();
        for (Parameter p : values()) {
            if (b.length() > 0) {
                b.append(", ");
            }
            b.append(p.key);
        }
        return b.toString();
    }
}
