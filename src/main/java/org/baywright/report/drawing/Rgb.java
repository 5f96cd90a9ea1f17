package org.baywright.report.drawing;

import java.util.Locale;

/** An opaque sRGB colour, 0–255 per channel. */
public record Rgb(int r, int g, int b) {
    public static final Rgb BLACK = new Rgb(0, 0, 0);
    public static final Rgb WHITE = new Rgb(255, 255, 255);
    /** Ink for secondary line work (grid, hatching, dimension lines). */
    public static final Rgb GREY = new Rgb(110, 110, 110);
    /** Light ink for background line work. */
    public static final Rgb LIGHT_GREY = new Rgb(170, 170, 170);
    /** Near-black ink for text and outlines. */
    public static final Rgb INK = new Rgb(28, 28, 28);

    public Rgb {
        if (r < 0 || r > 255 || g < 0 || g > 255 || b < 0 || b > 255) {
            throw new IllegalArgumentException("colour channels must be 0–255, got " + r + ", " + g + ", " + b);
        }
    }

    /** {@code #rrggbb}, lower case. */
    public String hex() {
        return String.format(Locale.ROOT, "#%02x%02x%02x", r, g, b);
    }

    /** Relative luminance (WCAG 2 definition), 0 for black to 1 for white. */
    public double luminance() {
        return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
    }

    private static double linear(int c) {
        double v = c / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
