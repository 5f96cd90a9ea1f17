package org.baywright.study;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.baywright.plan.GridLine;

/**
 * One value of one parameter, SI. Which fields are used depends on the parameter: {@code numbers} holds
 * the bay widths (one value = every bay), the spacing, the count or the depth; {@code texts} the
 * direction ("x"/"y"), the method or the column series.
 *
 * @param label how the value is shown (the user's text, or an SI rendering)
 */
public record Setting(Parameter parameter, List<Double> numbers, List<String> texts, String label) {
    public Setting {
        Objects.requireNonNull(parameter);
        numbers = List.copyOf(numbers);
        texts = List.copyOf(texts);
    }

    /** Bay widths along x or y, m: one width for every bay, or one per bay. */
    public static Setting bays(Parameter p, List<Double> widths, String label) {
        if (p != Parameter.BAY_X && p != Parameter.BAY_Y) {
            throw new IllegalArgumentException(p.key() + " is not a bay parameter");
        }
        if (widths.isEmpty() || widths.stream().anyMatch(w -> !(w > 0) || !Double.isFinite(w))) {
            throw new IllegalArgumentException(p.key() + ": bay widths must be greater than zero");
        }
        return new Setting(p, widths, List.of(), label != null ? label : si(widths));
    }

    /** A maximum beam spacing, m. */
    public static Setting beamSpacing(double spacing, String label) {
        if (!(spacing > 0) || !Double.isFinite(spacing)) {
            throw new IllegalArgumentException("beam-spacing must be greater than zero");
        }
        return new Setting(Parameter.BEAM_SPACING, List.of(spacing), List.of(), label != null ? label : si(List.of(spacing)));
    }

    /** A beam count per bay (≥ 1). */
    public static Setting beamCount(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("beam-count must be a whole number of at least 1");
        }
        return new Setting(Parameter.BEAM_COUNT, List.of((double) count), List.of(), Integer.toString(count));
    }

    /** The direction the infill beams span. */
    public static Setting beamDirection(GridLine.Axis direction) {
        String d = direction.name().toLowerCase(Locale.ROOT);
        return new Setting(Parameter.BEAM_DIRECTION, List.of(), List.of(d), d);
    }

    /** "lrfd" or "asd". */
    public static Setting method(String method) {
        String m = method.trim().toLowerCase(Locale.ROOT);
        if (!m.equals("lrfd") && !m.equals("asd")) {
            throw new IllegalArgumentException("method must be lrfd or asd");
        }
        return new Setting(Parameter.METHOD, List.of(), List.of(m), m);
    }

    /** A depth limit for beams and girders, m (0 = none). */
    public static Setting maxDepth(double depth, String label) {
        if (!(depth >= 0) || !Double.isFinite(depth)) {
            throw new IllegalArgumentException("max-depth must not be negative");
        }
        return new Setting(Parameter.MAX_DEPTH, List.of(depth), List.of(), label != null ? label : si(List.of(depth)));
    }

    /** Column series, e.g. ["W14"] or ["W12", "W14"]. */
    public static Setting columnSeries(List<String> series) {
        if (series.isEmpty() || series.stream().anyMatch(String::isBlank)) {
            throw new IllegalArgumentException("column-series must name at least one series, e.g. W14");
        }
        List<String> s = series.stream().map(x -> x.trim().toUpperCase(Locale.ROOT)).toList();
        return new Setting(Parameter.COLUMN_SERIES, List.of(), s, String.join(";", s));
    }

    /** Composite action on ("on": every layout with a slab composite) or off (bare steel). */
    public static Setting composite(boolean on) {
        String t = on ? "on" : "off";
        return new Setting(Parameter.COMPOSITE, List.of(), List.of(t), t);
    }

    /** The concrete above the deck of every slab, m. */
    public static Setting topping(double t, String label) {
        if (!(t > 0) || !Double.isFinite(t)) {
            throw new IllegalArgumentException("topping must be greater than zero");
        }
        return new Setting(Parameter.TOPPING, List.of(t), List.of(), label != null ? label : si(List.of(t)));
    }

    /** The concrete unit weight of every slab, N/m³. */
    public static Setting concrete(double density, String label) {
        if (!(density > 0) || !Double.isFinite(density)) {
            throw new IllegalArgumentException("concrete must be a unit weight greater than zero");
        }
        return new Setting(Parameter.CONCRETE, List.of(density), List.of(), label != null ? label
                : String.format(Locale.ROOT, "%.2fkN/m³", density / 1000));
    }

    /** The single number (spacing, count, depth). */
    public double number() {
        return numbers.get(0);
    }

    private static String si(List<Double> metres) {
        StringBuilder b = new StringBuilder();
        for (double m : metres) {
            if (b.length() > 0) {
                b.append(';');
            }
            b.append(String.format(Locale.ROOT, "%.3fm", m));
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return parameter.key() + "=" + label;
    }
}
