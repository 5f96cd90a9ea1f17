package org.baywright.geometry;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

/**
 * A strip of deck between two lines across the span, in a deck frame: at {@code v = va} it runs from
 * {@code u = a0} to {@code a1}, at {@code v = vb} from {@code b0} to {@code b1}; its sides are straight.
 * Its chord along the span varies linearly from {@code a1 − a0} to {@code b1 − b0}.
 *
 * @param member index of the supporting member, or −1 for unsupported deck
 */
record Trapezoid(int member, double va, double vb, double a0, double a1, double b0, double b1) {

    double chordA() {
        return a1 - a0;
    }

    double chordB() {
        return b1 - b0;
    }

    double area() {
        return 0.5 * (vb - va) * (chordA() + chordB());
    }

    /**
     * True when no trapezoid of {@code a} shares interior with a trapezoid of {@code b}, decided with
     * exact comparisons of their coordinates: for every pair, their ranges across the span meet at most
     * at a line, or they lie in the same strip and one ends along the span where the other begins, at
     * both of the strip's lines (their sides are straight, so then all along). A deck layout makes
     * neighbouring parts share such edges exactly. False means "not shown apart", not "overlapping":
     * the caller then intersects the areas.
     */
    static boolean apart(java.util.List<Trapezoid> a, java.util.List<Trapezoid> b) {
        if (a == null || b == null) {
            return false;
        }
        for (Trapezoid s : a) {
            for (Trapezoid t : b) {
                if (s.vb() <= t.va() || t.vb() <= s.va()) {
                    continue;
                }
                boolean sameStrip = s.va() == t.va() && s.vb() == t.vb();
                if (sameStrip && (s.a1() <= t.a0() && s.b1() <= t.b0() || t.a1() <= s.a0() && t.b1() <= s.b0())) {
                    continue;
                }
                return false;
            }
        }
        return true;
    }

    /** The trapezoid as a JTS polygon of the frame, repeated corners dropped; null when it has no area. */
    Polygon toJts(GeometryFactory f) {
        if (!(area() > 0)) {
            return null;
        }
        Coordinate[] raw = {new Coordinate(a0, va), new Coordinate(a1, va), new Coordinate(b1, vb),
            new Coordinate(b0, vb)};
        Coordinate[] ring = new Coordinate[5];
        int n = 0;
        for (Coordinate c : raw) {
            if (n == 0 || !c.equals2D(ring[n - 1])) {
                ring[n++] = c;
            }
        }
        if (n > 1 && ring[n - 1].equals2D(ring[0])) {
            n--;
        }
        if (n < 3) {
            return null;
        }
        Coordinate[] closed = new Coordinate[n + 1];
        System.arraycopy(ring, 0, closed, 0, n);
        closed[n] = ring[0].copy();
        return f.createPolygon(closed);
    }
}
