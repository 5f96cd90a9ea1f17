package org.baywright.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Adds up linear pieces of width along a member into one profile: pieces that overlap are summed
 * (a member carrying deck from two decks, or from two pieces of one), collinear neighbours are merged,
 * stretches of zero width are left out. The sum is exact apart from rounding; merging accepts only
 * neighbours that agree to a relative 1e-12, so ∫ w ds is kept to that order.
 */
final class WidthProfile {
    private static final double MERGE = 1e-12;
    private final List<double[]> pieces = new ArrayList<>();

    /** Adds width {@code w0 … w1} on {@code [s0, s1]} (either order). */
    void add(double s0, double s1, double w0, double w1) {
        if (s0 == s1 || !Double.isFinite(s0) || !Double.isFinite(s1)) {
            return;
        }
        if (s1 < s0) {
            pieces.add(new double[] {s1, s0, w1, w0});
        } else {
            pieces.add(new double[] {s0, s1, w0, w1});
        }
    }

    boolean isEmpty() {
        return pieces.isEmpty();
    }

    /** The summed, merged profile, in increasing s. */
    List<WidthSegment> build() {
        if (pieces.isEmpty()) {
            return List.of();
        }
        double[] cuts = new double[2 * pieces.size()];
        int n = 0;
        double scale = 0;
        for (double[] p : pieces) {
            cuts[n++] = p[0];
            cuts[n++] = p[1];
            scale = Math.max(scale, Math.max(Math.abs(p[2]), Math.abs(p[3])));
        }
        Arrays.sort(cuts);
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (m == 0 || cuts[i] != cuts[m - 1]) {
                cuts[m++] = cuts[i];
            }
        }
        pieces.sort((a, b) -> Double.compare(a[0], b[0]));
        List<double[]> active = new ArrayList<>();
        List<double[]> out = new ArrayList<>();
        int next = 0;
        for (int k = 0; k + 1 < m; k++) {
            double lo = cuts[k];
            double hi = cuts[k + 1];
            while (next < pieces.size() && pieces.get(next)[0] <= lo) {
                active.add(pieces.get(next++));
            }
            active.removeIf(p -> p[1] <= lo);
            double wa = 0;
            double wb = 0;
            for (double[] p : active) {
                wa += at(p, lo);
                wb += at(p, hi);
            }
            out.add(new double[] {lo, hi, wa, wb});
        }
        double eps = MERGE * Math.max(scale, Double.MIN_NORMAL);
        List<WidthSegment> merged = new ArrayList<>();
        double[] cur = null;
        for (double[] p : out) {
            if (Math.abs(p[2]) <= eps && Math.abs(p[3]) <= eps) {
                if (cur != null) {
                    merged.add(segment(cur));
                    cur = null;
                }
                continue;
            }
            if (cur != null && cur[1] == p[0] && collinear(cur, p, eps)) {
                cur = new double[] {cur[0], p[1], cur[2], p[3]};
            } else {
                if (cur != null) {
                    merged.add(segment(cur));
                }
                cur = p;
            }
        }
        if (cur != null) {
            merged.add(segment(cur));
        }
        return merged;
    }

    private static WidthSegment segment(double[] p) {
        return new WidthSegment(p[0], p[1], p[2], p[3]);
    }

    /** Whether b continues a on the same straight line (and without a jump). */
    private static boolean collinear(double[] a, double[] b, double eps) {
        if (Math.abs(a[3] - b[2]) > eps) {
            return false;
        }
        // the straight line from a's start to b's end must pass through the joint
        double t = (a[1] - a[0]) / (b[1] - a[0]);
        double joint = a[2] + t * (b[3] - a[2]);
        return Math.abs(joint - a[3]) <= eps && Math.abs(joint - b[2]) <= eps;
    }

    private static double at(double[] p, double s) {
        if (s == p[0]) {
            return p[2];
        }
        if (s == p[1]) {
            return p[3];
        }
        return p[2] + (s - p[0]) / (p[1] - p[0]) * (p[3] - p[2]);
    }
}
