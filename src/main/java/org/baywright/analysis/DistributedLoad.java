package org.baywright.analysis;

/**
 * A line load whose intensity varies linearly from {@code wStart} at {@code x = start} to
 * {@code wEnd} at {@code x = end}: a uniform load, a triangle or a trapezoid.
 *
 * @param start  left end of the loaded length, m from the left support; finite
 * @param end    right end of the loaded length, m; finite and greater than {@code start}
 * @param wStart intensity at {@code start}, N/m, downward positive; finite
 * @param wEnd   intensity at {@code end}, N/m, downward positive; finite
 */
public record DistributedLoad(double start, double end, double wStart, double wEnd) implements SpanLoad {

    public DistributedLoad {
        requireFinite("start", start, "metres");
        requireFinite("end", end, "metres");
        requireFinite("wStart", wStart, "N/m");
        requireFinite("wEnd", wEnd, "N/m");
        if (!(start < end)) {
            throw new IllegalArgumentException("DistributedLoad.start (" + start
                    + " m) must be less than DistributedLoad.end (" + end + " m)");
        }
    }

    /** A uniform load of intensity {@code w} (N/m) from {@code start} to {@code end} (m). */
    public static DistributedLoad uniform(double start, double end, double w) {
        return new DistributedLoad(start, end, w, w);
    }

    /** A uniform load of intensity {@code w} (N/m) over the whole of a span of length {@code span} (m). */
    public static DistributedLoad full(double span, double w) {
        return uniform(0.0, span, w);
    }

    /** Loaded length, m. */
    public double length() {
        return end - start;
    }

    /** Intensity (N/m) at {@code x}, interpolated linearly; meaningful for {@code start <= x <= end}. */
    public double intensityAt(double x) {
        return wStart + (wEnd - wStart) * ((x - start) / (end - start));
    }

    /** Rate of change of the intensity along the span, N/m per m. */
    public double slope() {
        return (wEnd - wStart) / (end - start);
    }

    @Override
    public DistributedLoad scaled(double factor) {
        Polynomials.checkFactor(factor);
        return new DistributedLoad(start, end, wStart * factor, wEnd * factor);
    }

    @Override
    public double total() {
        return 0.5 * (wStart + wEnd) * (end - start);
    }

    private static void requireFinite(String field, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("DistributedLoad." + field + " must be a finite number of "
                    + unit + ", was " + value);
        }
    }
}
