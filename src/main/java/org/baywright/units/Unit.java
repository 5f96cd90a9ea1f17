package org.baywright.units;

import java.util.List;
import java.util.Objects;

/**
 * A unit of measure: its printed symbol, the other spellings accepted on input, its dimension and
 * the factor that turns one of it into the canonical SI unit of that dimension.
 */
public record Unit(String symbol, List<String> aliases, Dimension dimension, double toSi) {

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
        aliases = List.copyOf(aliases);
        if (!(toSi > 0) || Double.isInfinite(toSi)) {
            throw new IllegalArgumentException("unit factor must be positive and finite: " + symbol);
        }
    }

    /** Converts a value in this unit to canonical SI. */
    public double toSi(double value) {
        return value * toSi;
    }

    /** Converts a canonical SI value to this unit. */
    public double fromSi(double si) {
        return si / toSi;
    }

    /** True if {@code text} (already trimmed) is this unit's symbol or one of its aliases, case-sensitively. */
    boolean matches(String text) {
        return symbol.equals(text) || aliases.contains(text);
    }

    @Override
    public String toString() {
        return symbol;
    }
}
