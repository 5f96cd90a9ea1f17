package org.baywright.report.drawing;

import org.baywright.units.UnitSystem;

/**
 * What a framing plan drawing shows and how it is laid out.
 *
 * @param units unit system of the labels; null for the plan's own
 * @param paper sheet size; null for ARCH D (US units) or ISO A1 (SI)
 * @param reactions service reactions by case, or one factored reaction for the plan's design method
 * @param date the date printed in the title block as given (e.g. "2025-03-14"); null or blank leaves the
 *     field empty, so that output does not depend on the clock
 * @param dpi resolution of PNG output, dots per inch (PNG only)
 * @param bays true to draw the bay layer: f_n and a_p/g of each checked bay at its centre, exceeding bays marked
 *     ({@link Layer#BAYS}); off by default, so drawings without it are unchanged
 */
public record DrawingOptions(UnitSystem units, Paper paper, ReactionMode reactions, String date, int dpi, boolean bays) {
    /** Options without the bay layer. */
    public DrawingOptions(UnitSystem units, Paper paper, ReactionMode reactions, String date, int dpi) {
        this(units, paper, reactions, date, dpi, false);
    }

    public DrawingOptions {
        if (dpi < 10 || dpi > 1200) {
            throw new IllegalArgumentException("PNG resolution must be 10–1200 dpi, got " + dpi);
        }
        if (reactions == null) {
            throw new IllegalArgumentException("choose the reactions shown: SERVICE or FACTORED");
        }
    }

    /** The plan's units and the matching paper, factored reactions, no date, 150 dpi. */
    public static DrawingOptions defaults() {
        return new DrawingOptions(null, null, ReactionMode.FACTORED, null, 150);
    }

    public DrawingOptions withUnits(UnitSystem u) {
        return new DrawingOptions(u, paper, reactions, date, dpi, bays);
    }

    public DrawingOptions withPaper(Paper p) {
        return new DrawingOptions(units, p, reactions, date, dpi, bays);
    }

    public DrawingOptions withReactions(ReactionMode r) {
        return new DrawingOptions(units, paper, r, date, dpi, bays);
    }

    public DrawingOptions withDate(String d) {
        return new DrawingOptions(units, paper, reactions, d, dpi, bays);
    }

    public DrawingOptions withDpi(int d) {
        return new DrawingOptions(units, paper, reactions, date, d, bays);
    }

    /** The same options with the bay layer on or off. */
    public DrawingOptions withBays(boolean on) {
        return new DrawingOptions(units, paper, reactions, date, dpi, on);
    }
}
