package org.baywright.report.drawing;

/**
 * The cividis colour map (Nuñez, Anderton and Renslow, "Optimizing colormaps with consideration for color
 * vision deficiency to enable accurate interpretation of scientific data", PLoS ONE 13(7), 2018): dark
 * blue through grey to yellow, perceptually uniform and readable with red–green colour deficiency. The
 * published 256-entry map is represented by 16 evenly spaced entries (every 17th), interpolated linearly
 * in sRGB; the largest difference from the full map is under one step of 8-bit colour per channel.
 */
public final class Cividis {
    /** Entries at t = 0, 1/15, …, 1 (sRGB, 0–1). */
    private static final double[][] STOPS = {
        {0.000000, 0.135112, 0.304751},
        {0.000000, 0.181610, 0.421859},
        {0.117612, 0.225935, 0.434308},
        {0.208926, 0.272546, 0.424809},
        {0.279411, 0.318677, 0.423031},
        {0.342246, 0.364939, 0.428559},
        {0.401418, 0.411790, 0.440708},
        {0.458366, 0.459552, 0.460457},
        {0.517920, 0.508454, 0.472707},
        {0.582087, 0.558670, 0.468118},
        {0.648222, 0.610553, 0.454801},
        {0.716177, 0.664384, 0.432386},
        {0.785965, 0.720438, 0.399613},
        {0.857809, 0.778969, 0.353259},
        {0.932180, 0.840159, 0.285880},
        {0.995737, 0.909344, 0.217772},
    };

    private Cividis() {
    }

    /** The colour at {@code t}, clamped to [0, 1]. */
    public static Rgb at(double t) {
        double c = Double.isNaN(t) ? 0 : Math.max(0, Math.min(1, t));
        double s = c * (STOPS.length - 1);
        int i = Math.min((int) Math.floor(s), STOPS.length - 2);
        double f = s - i;
        return new Rgb(channel(STOPS[i][0], STOPS[i + 1][0], f), channel(STOPS[i][1], STOPS[i + 1][1], f),
                channel(STOPS[i][2], STOPS[i + 1][2], f));
    }

    private static int channel(double a, double b, double f) {
        return (int) Math.round((a + (b - a) * f) * 255);
    }
}
