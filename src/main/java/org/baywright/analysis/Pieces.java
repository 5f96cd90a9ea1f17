package org.baywright.analysis;

import java.util.List;

/**
 * What {@link SimpleSpan} and {@link OverhangSpan} share about their piecewise polynomials: the breakpoints
 * {@code xs} (from 0 to the length), the piece that holds a position, positions kept on the member, and the
 * coefficients of shear (3 per piece), moment (4) and EI·deflection (6), each in the local coordinate t = x − xs[k].
 */
final class Pieces {
    /** A position this share of the length outside the member still counts as on it (rounding). */
    static final double POSITION_SLACK = 1e-9;

    private Pieces() {
    }

    /** x kept within [0, length]. */
    static double clamp(double x, double length) {
        return x < 0.0 ? 0.0 : Math.min(x, length);
    }

    /**
     * Index of the piece holding x: {@code xs[k] <= x < xs[k+1]}, the last piece for x = length.
     *
     * @param what what the length is, for the message ("span", "member")
     */
    static int piece(double[] xs, double length, double x, String what) {
        if (!(x >= -POSITION_SLACK * length && x <= length * (1.0 + POSITION_SLACK))) {
            throw new IllegalArgumentException("x = " + x + " m is outside the " + what + ": allowed range is [0, "
                    + length + "] m");
        }
        int last = xs.length - 2;
        if (x >= length) {
            return last;
        }
        if (x <= 0.0) {
            return 0;
        }
        // the last breakpoint at or before x (0 < x < length here, so xs[0] = 0 <= x < xs[last + 1] = length)
        int lo = 0;
        int hi = last;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (xs[mid] <= x) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** Shear on piece k at local t. */
    static double shear(double[] vc, int k, double t) {
        return vc[3 * k] + t * (vc[3 * k + 1] + t * vc[3 * k + 2]);
    }

    /** Moment on piece k at local t. */
    static double moment(double[] mc, int k, double t) {
        return mc[4 * k] + t * (mc[4 * k + 1] + t * (mc[4 * k + 2] + t * mc[4 * k + 3]));
    }

    /** EI × slope on piece k at local t: the derivative of the EI·deflection quintic. */
    static double eiSlope(double[] yc, int k, double t) {
        int o = 6 * k;
        return yc[o + 1] + t * (2.0 * yc[o + 2] + t * (3.0 * yc[o + 3] + t * (4.0 * yc[o + 4] + t * 5.0 * yc[o + 5])));
    }

    /** Sum of the resultants of the loads, N. */
    static double totalLoad(List<SpanLoad> loads) {
        double sum = 0.0;
        for (SpanLoad load : loads) {
            sum += load.total();
        }
        return sum;
    }
}
