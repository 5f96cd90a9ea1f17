package org.baywright.study;

import java.util.Locale;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;

/**
 * What the best layout minimises: the steel weight, or the steel weight plus a weight equivalent per
 * piece (fabrication and erection cost expressed as steel, e.g. 150 lb a piece).
 *
 * @param pieceCost weight equivalent of one piece, N (0 for weight alone)
 */
public record Objective(double pieceCost) {
    public Objective {
        if (!(pieceCost >= 0) || !Double.isFinite(pieceCost)) {
            throw new IllegalArgumentException("the piece cost must be a weight of zero or more");
        }
    }

    /** Steel weight alone. */
    public static Objective weight() {
        return new Objective(0);
    }

    /**
     * Score of a variant per floor area, Pa: (steel weight + pieces × piece cost) / floor area, so that
     * layouts of different bay sizes compare fairly (NaN when it did not run).
     */
    public double score(VariantResult v) {
        return (v.steelWeight() + v.pieces() * pieceCost) / v.floorArea();
    }

    /**
     * Parses {@code weight} or {@code weight+pieces:COST} with COST a weight with its unit (150lb, 70kg
     * is refused: a force unit is needed, e.g. 0.7kN).
     */
    public static Objective parse(String option, String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("weight")) {
            return weight();
        }
        String prefix = "weight+pieces:";
        if (t.startsWith(prefix)) {
            return new Objective(Quantities.parseNonNegative(option, text.trim().substring(prefix.length()), Dimension.FORCE));
        }
        throw new IllegalArgumentException(option + ": \"" + text + "\" is not an objective; use weight or weight+pieces:COST, "
                + "e.g. weight+pieces:150lb");
    }

    @Override
    public String toString() {
        return pieceCost == 0 ? "weight" : String.format(Locale.ROOT, "weight+pieces:%.1fN", pieceCost);
    }
}
