package org.baywright.geometry;

/**
 * A straight segment of a deck frame, not parallel to the span, written as {@code u} as a linear
 * function of {@code v} on {@code [va, vb]} ({@code va < vb}). Deck edges and supporting members are
 * frame lines. At its own end ordinates it returns its end values exactly, so that pieces meeting at a
 * vertex share that vertex bit for bit.
 */
record FrameLine(double va, double ua, double vb, double ub) {

    /** The line through {@code (u0, v0)} and {@code (u1, v1)}, ordered by v; {@code v0 != v1}. */
    static FrameLine through(double u0, double v0, double u1, double v1) {
        return v0 <= v1 ? new FrameLine(v0, u0, v1, u1) : new FrameLine(v1, u1, v0, u0);
    }

    /** u at {@code v}, extrapolating linearly outside {@code [va, vb]}. */
    double at(double v) {
        if (v == va) {
            return ua;
        }
        if (v == vb) {
            return ub;
        }
        return ua + (v - va) / (vb - va) * (ub - ua);
    }

    /** du/dv. */
    double slope() {
        return (ub - ua) / (vb - va);
    }

    /**
     * The v where this line and {@code o} cross strictly inside their common v-range, or NaN. Lines
     * closer than {@code tol} at an end of the common range are taken to meet there (that end is a
     * breakpoint already), not to cross.
     */
    double crossing(FrameLine o, double tol) {
        double lo = Math.max(va, o.va);
        double hi = Math.min(vb, o.vb);
        if (!(hi > lo)) {
            return Double.NaN;
        }
        double dlo = at(lo) - o.at(lo);
        double dhi = at(hi) - o.at(hi);
        if (Math.abs(dlo) <= tol || Math.abs(dhi) <= tol || (dlo > 0) == (dhi > 0)) {
            return Double.NaN;
        }
        double v = lo + (hi - lo) * (dlo / (dlo - dhi));
        return v > lo && v < hi ? v : Double.NaN;
    }
}
