package org.baywright.calc;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A calculation record being written. Design-equation functions take a {@code Calc} that may be
 * {@code null}: the lightest-section search passes null and pays nothing; a report passes a
 * recorder and gets, from the same function call, the line that the sheet prints.
 */
public final class Calc {
    private final List<CalcLine> lines = new ArrayList<>();

    /** Records an equation. Returns {@code value} so a call can be written inline. */
    public double eq(String symbol, String formula, String reference, double value, Quantity quantity, Arg... args) {
        lines.add(new CalcLine(CalcLine.Kind.EQUATION, symbol, formula, List.of(args), value, quantity, reference, ""));
        return value;
    }

    /**
     * Records a value obtained by other means than a printed formula (e.g. the statics of a span),
     * with optional further values printed after it ({@code x = 17.5 ft}).
     */
    public double value(String symbol, double value, Quantity quantity, String text, String reference, Arg... extras) {
        lines.add(new CalcLine(CalcLine.Kind.VALUE, symbol, "", List.of(extras), value, quantity, reference, text));
        return value;
    }

    /** Records which branch of a clause applies, with its evidence. */
    public void branch(String text, String reference) {
        lines.add(new CalcLine(CalcLine.Kind.BRANCH, "", "", List.of(), Double.NaN, Quantity.NUMBER, reference, text));
    }

    public void heading(String text) {
        lines.add(new CalcLine(CalcLine.Kind.HEADING, "", "", List.of(), Double.NaN, Quantity.NUMBER, "", text));
    }

    public void note(String text, String reference) {
        lines.add(new CalcLine(CalcLine.Kind.NOTE, "", "", List.of(), Double.NaN, Quantity.NUMBER, reference, text));
    }

    public List<CalcLine> lines() {
        return Collections.unmodifiableList(lines);
    }

    // Static helpers so clause functions stay one line when the recorder is null.

    /** Records an equation if {@code calc} is not null; returns {@code value}. */
    public static double eq(Calc calc, String symbol, String formula, String reference, double value,
            Quantity quantity, Arg... args) {
        if (calc != null) {
            calc.eq(symbol, formula, reference, value, quantity, args);
        }
        return value;
    }

    /** Records a branch if {@code calc} is not null. */
    public static void branch(Calc calc, String text, String reference) {
        if (calc != null) {
            calc.branch(text, reference);
        }
    }
}
