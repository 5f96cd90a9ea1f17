package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Hatch lines of a polygon on the paper, computed once for every renderer: each family of parallel lines
 * sits at multiples of the spacing from the paper origin (so neighbouring areas' hatching lines up) and
 * is cut to the polygon by the even–odd rule, which also handles concave outlines. Public for renderers outside
 * this package (the editor's canvas).
 */
public final class Hatching {
    private Hatching() {
    }

    /** The hatch segments inside a polygon given in paper mm, each {@code {from, to}}. */
    public static List<Pt[]> segments(List<Pt> polygon, Hatch hatch) {
        List<Pt[]> out = new ArrayList<>();
        int n = polygon.size();
        if (n < 3) {
            return out;
        }
        double sp = hatch.spacing();
        for (double angle : hatch.pattern().angles()) {
            double a = StrictMath.toRadians(angle);
            double ux = StrictMath.cos(a);
            double uy = StrictMath.sin(a);
            double nx = -uy;
            double ny = ux;
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (Pt p : polygon) {
                double d = p.x() * nx + p.y() * ny;
                lo = Math.min(lo, d);
                hi = Math.max(hi, d);
            }
            for (long i = (long) Math.ceil(lo / sp); i * sp <= hi; i++) {
                double d = i * sp;
                double[] cuts = new double[n];
                int c = 0;
                for (int j = 0; j < n; j++) {
                    Pt p = polygon.get(j);
                    Pt q = polygon.get((j + 1) % n);
                    double dp = p.x() * nx + p.y() * ny - d;
                    double dq = q.x() * nx + q.y() * ny - d;
                    if ((dp > 0) != (dq > 0)) {
                        double f = dp / (dp - dq);
                        double x = p.x() + f * (q.x() - p.x());
                        double y = p.y() + f * (q.y() - p.y());
                        cuts[c++] = x * ux + y * uy;
                    }
                }
                Arrays.sort(cuts, 0, c);
                for (int j = 0; j + 1 < c; j += 2) {
                    if (cuts[j + 1] - cuts[j] > 1e-6) {
                        out.add(new Pt[] {new Pt(d * nx + cuts[j] * ux, d * ny + cuts[j] * uy),
                            new Pt(d * nx + cuts[j + 1] * ux, d * ny + cuts[j + 1] * uy)});
                    }
                }
            }
        }
        return out;
    }
}
