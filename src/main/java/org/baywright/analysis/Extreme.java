package org.baywright.analysis;

/**
 * An extreme value of a quantity along a span and where it occurs.
 *
 * @param value    the value, in the quantity's canonical SI unit; each method that returns an
 *                 {@code Extreme} says whether it is signed or a magnitude
 * @param position x from the left support, m
 */
public record Extreme(double value, double position) {

    /** {@code |value|}: what a capacity check compares. */
    public double magnitude() {
        return Math.abs(value);
    }
}
