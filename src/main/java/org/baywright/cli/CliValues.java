package org.baywright.cli;

import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitParseException;
import org.baywright.units.UnitSystem;

/** Reads option values, turning unit errors into one-line bad-input messages. */
final class CliValues {
    private CliValues() {
    }

    /** A quantity with its unit; {@code positive}: strictly greater than zero, else not negative. */
    static double quantity(String option, String text, Dimension d, boolean positive) {
        try {
            return positive ? Quantities.parsePositive(option, text, d) : Quantities.parseNonNegative(option, text, d);
        } catch (UnitParseException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

    /** "us" or "si". */
    static UnitSystem units(String option, String text) {
        UnitSystem u = UnitSystem.parse(text);
        if (u == null) {
            throw new BadInputException(option + ": \"" + text + "\" is not a unit system; use us or si");
        }
        return u;
    }
}
