package org.baywright.design;

import java.util.Arrays;

/**
 * Lateral bracing of a member's compression flange: continuous (a deck attached along the top
 * flange: Lb = 0), or discrete brace points given as fractions of the span between the supports
 * (the supports themselves are always braced).
 */
public final class Bracing {
    private final boolean continuous;
    private final double[] points;

    private Bracing(boolean continuous, double[] points) {
        this.continuous = continuous;
        this.points = points;
    }

    /** Compression flange braced along its length (Lb = 0). */
    public static Bracing continuous() {
        return new Bracing(true, new double[0]);
    }

    /** {@code n} equal unbraced segments between braces; 1 = braced only at the supports. */
    public static Bracing equalSegments(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("the number of unbraced segments must be at least 1, got " + n);
        }
        double[] p = new double[n - 1];
        for (int i = 1; i < n; i++) {
            p[i - 1] = (double) i / n;
        }
        return new Bracing(false, p);
    }

    /** Braces at the given fractions of the span (0 < f < 1), e.g. where beams frame into a girder. */
    public static Bracing atFractions(double... fractions) {
        double[] p = fractions.clone();
        Arrays.sort(p);
        for (double f : p) {
            if (!(f > 0 && f < 1)) {
                throw new IllegalArgumentException("brace points must lie strictly between the supports, got fraction " + f);
            }
        }
        return new Bracing(false, p);
    }

    public boolean isContinuous() {
        return continuous;
    }

    /** Segment boundaries as fractions, from 0 to 1 inclusive. Continuous bracing gives {0, 1}. */
    public double[] boundaries() {
        double[] b = new double[points.length + 2];
        b[0] = 0;
        System.arraycopy(points, 0, b, 1, points.length);
        b[b.length - 1] = 1;
        return b;
    }

    /** Describes the bracing, e.g. "continuous" or "3 segments (braced at 1/3 points)". */
    public String describe() {
        if (continuous) {
            return "continuous (Lb = 0)";
        }
        int n = points.length + 1;
        return n == 1 ? "at supports only (1 segment)" : n + " unbraced segments";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Bracing b && b.continuous == continuous && Arrays.equals(b.points, points);
    }

    @Override
    public int hashCode() {
        return Boolean.hashCode(continuous) * 31 + Arrays.hashCode(points);
    }
}
