package org.baywright.calc;

/**
 * One named input of an equation on a calculation sheet.
 *
 * @param symbol as it appears in the formula text, e.g. {@code Fy}
 * @param value canonical SI
 * @param quantity how to print it
 */
public record Arg(String symbol, double value, Quantity quantity) {

    public static Arg of(String symbol, double value, Quantity quantity) {
        return new Arg(symbol, value, quantity);
    }

    /** A dimensionless input. */
    public static Arg num(String symbol, double value) {
        return new Arg(symbol, value, Quantity.NUMBER);
    }
}
