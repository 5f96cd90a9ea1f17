package org.baywright.calc;

import java.util.List;

/**
 * One line of a calculation record. An {@link Kind#EQUATION} reads
 * {@code symbol = formula = substituted numbers = result [unit] (reference)}; a {@link Kind#BRANCH}
 * records which case of a clause applied and the evidence ("λf = 7.2 ≤ λpf = 9.2 → compact
 * flange"); a {@link Kind#VALUE} is a result obtained otherwise (statics), printed
 * {@code symbol = value [unit], extra = value … — text (reference)}; a {@link Kind#HEADING} or
 * {@link Kind#NOTE} is text.
 *
 * @param formula the formula as printed and as evaluated by {@link Formula} (symbols of {@code args})
 * @param value the result, canonical SI
 * @param reference standard, edition, clause and equation, e.g. "AISC 360-16 Eq. F2-1"
 * @param text for branches, headings and notes
 */
public record CalcLine(Kind kind, String symbol, String formula, List<Arg> args, double value, Quantity quantity,
        String reference, String text) {

    public CalcLine {
        args = List.copyOf(args);
    }

    /** The kinds of line. */
    public enum Kind {
        HEADING, EQUATION, VALUE, BRANCH, NOTE
    }
}
