package org.baywright.report.drawing;

import java.util.List;

/**
 * How a line is drawn.
 *
 * @param width line weight, paper mm
 * @param dash dash pattern, paper mm, alternating on and off lengths; empty for a solid line
 * @param colour ink
 */
public record Pen(double width, List<Double> dash, Rgb colour) {
    public Pen {
        if (!(width > 0) || Double.isInfinite(width)) {
            throw new IllegalArgumentException("line weight must be positive, got " + width);
        }
        dash = List.copyOf(dash);
        if (dash.size() % 2 != 0 || dash.stream().anyMatch(d -> !(d > 0))) {
            throw new IllegalArgumentException("a dash pattern is pairs of positive lengths, got " + dash);
        }
    }

    /** A solid pen. */
    public static Pen solid(double width, Rgb colour) {
        return new Pen(width, List.of(), colour);
    }

    /** A dashed pen. */
    public static Pen dashed(double width, Rgb colour, double... pattern) {
        Double[] d = new Double[pattern.length];
        for (int i = 0; i < pattern.length; i++) {
            d[i] = pattern[i];
        }
        return new Pen(width, List.of(d), colour);
    }

    public boolean isDashed() {
        return !dash.isEmpty();
    }
}
