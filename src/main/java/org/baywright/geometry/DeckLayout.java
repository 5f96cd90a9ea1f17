package org.baywright.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * The one-way decomposition of one deck region in its span frame.
 *
 * <p>The region is cut by lines across the span ({@code v = const}) at every breakpoint: vertices of
 * the region (deck edge, slab edge, openings), ends of supporting members, and the points where
 * supporting members cross each other or the region's edges. Between two neighbouring breakpoints
 * (a <em>strip</em>) nothing changes order: the region's edges crossing the strip, sorted along the
 * span, bound the <em>pieces</em> of continuous deck (even–odd rule), and the supporting members in a
 * piece keep their order. Each piece then splits at the midlines between neighbouring supports; the
 * deck beyond the outermost support of a piece goes to that support; a piece with no support is
 * unsupported. Every part is a trapezoid with sides on straight lines, so areas and chord lengths are
 * exact.
 *
 * <p>A support belongs to a piece when its line lies inside the piece, or within the tolerance of its
 * edges, at the middle of the strip. Deck on the far side of an opening or notch is a different piece:
 * it is carried by its own supports (or is unsupported), never by a member across the gap.
 */
final class DeckLayout {

    /** A member that may carry this deck: its index in the analysis and its line in the frame. */
    record Support(int member, FrameLine line) {
    }

    /** A piece of continuous deck in a strip, with its supports ordered along the span. */
    record Piece(FrameLine left, FrameLine right, List<Support> supports) {
    }

    /** The deck between two neighbouring breakpoints. */
    record Strip(double va, double vb, List<Piece> pieces) {
    }

    /** The place of a point of the deck: its strip and piece, and the v at which to read the lines. */
    record Location(Strip strip, Piece piece, double v) {
    }

    final List<Strip> strips;
    final List<Trapezoid> trapezoids;
    /** Every region edge and support line, for cutting line loads. */
    final List<FrameLine> lines;
    /** Pairs of member indices found lying on top of each other. */
    final List<int[]> coincident;
    private final double[] starts;
    private final double tol;

    private DeckLayout(List<Strip> strips, List<Trapezoid> trapezoids, List<FrameLine> lines, List<int[]> coincident,
            double tol) {
        this.strips = strips;
        this.trapezoids = trapezoids;
        this.lines = lines;
        this.coincident = coincident;
        this.tol = tol;
        this.starts = new double[strips.size()];
        for (int i = 0; i < strips.size(); i++) {
            starts[i] = strips.get(i).va();
        }
    }

    /**
     * Decomposes {@code region} (polygonal, frame coordinates) among {@code candidates} (members not
     * parallel to the span, frame coordinates).
     */
    static DeckLayout build(Geometry region, List<Support> candidates, double tol) {
        List<FrameLine> edges = edges(region);
        if (edges.isEmpty()) {
            return new DeckLayout(List.of(), List.of(), List.of(), List.of(), tol);
        }
        double vMin = region.getEnvelopeInternal().getMinY();
        double vMax = region.getEnvelopeInternal().getMaxY();
        List<Support> supports = new ArrayList<>();
        for (Support s : candidates) {
            if (s.line().vb() > vMin && s.line().va() < vMax) {
                supports.add(s);
            }
        }

        double[] cuts = breakpoints(edges, supports, vMin, vMax, tol);

        List<FrameLine> sortedEdges = new ArrayList<>(edges);
        sortedEdges.sort(Comparator.comparingDouble(FrameLine::va));
        List<Support> sortedSupports = new ArrayList<>(supports);
        sortedSupports.sort(Comparator.comparingDouble(s -> s.line().va()));

        List<Strip> strips = new ArrayList<>();
        List<Trapezoid> traps = new ArrayList<>();
        List<int[]> coincident = new ArrayList<>();
        List<FrameLine> activeEdges = new ArrayList<>();
        List<Support> activeSupports = new ArrayList<>();
        int ie = 0;
        int is = 0;
        for (int k = 0; k + 1 < cuts.length; k++) {
            double lo = cuts[k];
            double hi = cuts[k + 1];
            while (ie < sortedEdges.size() && sortedEdges.get(ie).va() <= lo) {
                activeEdges.add(sortedEdges.get(ie++));
            }
            while (is < sortedSupports.size() && sortedSupports.get(is).line().va() <= lo) {
                activeSupports.add(sortedSupports.get(is++));
            }
            activeEdges.removeIf(e -> e.vb() <= lo);
            activeSupports.removeIf(s -> s.line().vb() <= lo);
            double mid = 0.5 * (lo + hi);

            List<FrameLine> crossing = new ArrayList<>(activeEdges);
            crossing.sort(Comparator.comparingDouble(e -> e.at(mid)));
            List<Support> inStrip = new ArrayList<>(activeSupports);
            inStrip.sort(Comparator.<Support>comparingDouble(s -> s.line().at(mid)).thenComparingInt(Support::member));

            List<Piece> pieces = new ArrayList<>();
            for (int p = 0; p + 1 < crossing.size(); p += 2) {
                FrameLine left = crossing.get(p);
                FrameLine right = crossing.get(p + 1);
                double l = left.at(mid) - slack(left, tol);
                double r = right.at(mid) + slack(right, tol);
                List<Support> mine = new ArrayList<>();
                for (Support s : inStrip) {
                    double u = s.line().at(mid);
                    if (u >= l && u <= r) {
                        mine.add(s);
                    }
                }
                Piece piece = new Piece(left, right, List.copyOf(mine));
                pieces.add(piece);
                split(piece, lo, hi, traps);
                for (int i = 0; i + 1 < mine.size(); i++) {
                    FrameLine a = mine.get(i).line();
                    FrameLine b = mine.get(i + 1).line();
                    if (Math.abs(a.at(lo) - b.at(lo)) <= tol && Math.abs(a.at(hi) - b.at(hi)) <= tol && hi - lo > tol) {
                        int m0 = Math.min(mine.get(i).member(), mine.get(i + 1).member());
                        int m1 = Math.max(mine.get(i).member(), mine.get(i + 1).member());
                        if (coincident.stream().noneMatch(c -> c[0] == m0 && c[1] == m1)) {
                            coincident.add(new int[] {m0, m1});
                        }
                    }
                }
                // supports claimed by this piece are not offered to the next one
                inStrip.removeAll(mine);
            }
            strips.add(new Strip(lo, hi, List.copyOf(pieces)));
        }
        List<FrameLine> lines = new ArrayList<>(edges);
        for (Support s : supports) {
            lines.add(s.line());
        }
        return new DeckLayout(List.copyOf(strips), List.copyOf(traps), List.copyOf(lines), coincident, tol);
    }

    /**
     * A span or overhang found in one strip, in the frame: from support {@code a} at {@code ua} to
     * support {@code b} (or, for an overhang, {@code b = -1} and the edge) at {@code ub}, at ordinate
     * {@code v}.
     *
     * @param side for an overhang, -1 towards smaller u, +1 towards larger u; 0 for a span
     */
    record Reach(int a, int b, int side, double length, double ua, double ub, double v, boolean backspan) {
    }

    /**
     * Every span between neighbouring supports and every overhang beyond the outermost support of each
     * piece, at both lines and the middle of each strip thicker than the tolerance (supports and edges
     * are straight within a strip, so the longest is at one of its lines; the middle gives a span that
     * does not vary a place half-way along it). Spans and overhangs not longer than the
     * tolerance (coincident members, a member on the edge) are left out.
     */
    List<Reach> reaches() {
        List<Reach> out = new ArrayList<>();
        for (Strip strip : strips) {
            if (!(strip.vb() - strip.va() > tol)) {
                continue;
            }
            double mid = 0.5 * (strip.va() + strip.vb());
            for (Piece piece : strip.pieces()) {
                List<Support> s = piece.supports();
                int n = s.size();
                if (n == 0) {
                    continue;
                }
                boolean backspan = s.get(n - 1).line().at(mid) - s.get(0).line().at(mid) > tol;
                for (double v : new double[] {strip.va(), mid, strip.vb()}) {
                    for (int i = 0; i + 1 < n; i++) {
                        double ua = s.get(i).line().at(v);
                        double ub = s.get(i + 1).line().at(v);
                        if (ub - ua > tol) {
                            out.add(new Reach(s.get(i).member(), s.get(i + 1).member(), 0, ub - ua, ua, ub, v, true));
                        }
                    }
                    double u0 = s.get(0).line().at(v);
                    double left = piece.left().at(v);
                    if (u0 - left > tol) {
                        out.add(new Reach(s.get(0).member(), -1, -1, u0 - left, u0, left, v, backspan));
                    }
                    double u1 = s.get(n - 1).line().at(v);
                    double right = piece.right().at(v);
                    if (right - u1 > tol) {
                        out.add(new Reach(s.get(n - 1).member(), -1, 1, right - u1, u1, right, v, backspan));
                    }
                }
            }
        }
        return out;
    }

    /**
     * How far along the span a point may lie outside an edge and still be within {@code tol} of it,
     * measured square to the edge: tol·√(1 + (du/dv)²), capped at 60·tol (an edge 1° off the span) so
     * that edges almost along the span do not reach across the deck.
     */
    static double slack(FrameLine edge, double tol) {
        return tol * Math.min(Math.hypot(1, edge.slope()), 60);
    }

    /** Splits one piece of one strip at the midlines between its supports. */
    private static void split(Piece piece, double lo, double hi, List<Trapezoid> out) {
        List<Support> s = piece.supports();
        if (s.isEmpty()) {
            double a0 = piece.left().at(lo);
            double b0 = piece.left().at(hi);
            out.add(new Trapezoid(-1, lo, hi, a0, Math.max(a0, piece.right().at(lo)), b0,
                    Math.max(b0, piece.right().at(hi))));
            return;
        }
        double[] a = bounds(piece, lo);
        double[] b = bounds(piece, hi);
        for (int i = 0; i < s.size(); i++) {
            out.add(new Trapezoid(s.get(i).member(), lo, hi, a[i], a[i + 1], b[i], b[i + 1]));
        }
    }

    /**
     * The boundaries between the supports' shares of a piece at {@code v}: the piece's edges at the
     * ends, midpoints between neighbouring supports between, kept inside the piece and in order.
     */
    private static double[] bounds(Piece piece, double v) {
        List<Support> s = piece.supports();
        int n = s.size();
        double[] b = new double[n + 1];
        b[0] = piece.left().at(v);
        b[n] = Math.max(b[0], piece.right().at(v));
        for (int i = 1; i < n; i++) {
            double m = 0.5 * (s.get(i - 1).line().at(v) + s.get(i).line().at(v));
            b[i] = Math.min(b[n], Math.max(b[i - 1], m));
        }
        return b;
    }

    private static double[] breakpoints(List<FrameLine> edges, List<Support> supports, double vMin, double vMax,
            double tol) {
        List<Double> v = new ArrayList<>();
        v.add(vMin);
        v.add(vMax);
        for (FrameLine e : edges) {
            v.add(e.va());
            v.add(e.vb());
        }
        for (Support s : supports) {
            v.add(s.line().va());
            v.add(s.line().vb());
        }
        for (int i = 0; i < supports.size(); i++) {
            FrameLine a = supports.get(i).line();
            for (int j = i + 1; j < supports.size(); j++) {
                v.add(a.crossing(supports.get(j).line(), tol));
            }
            for (FrameLine e : edges) {
                v.add(a.crossing(e, tol));
            }
        }
        double[] all = v.stream().mapToDouble(Double::doubleValue)
                .filter(x -> !Double.isNaN(x) && x >= vMin && x <= vMax).sorted().toArray();
        int n = 0;
        for (int i = 0; i < all.length; i++) {
            if (n == 0 || all[i] != all[n - 1]) {
                all[n++] = all[i];
            }
        }
        return Arrays.copyOf(all, n);
    }

    /** The region's edges that are not parallel to the span, as frame lines. */
    static List<FrameLine> edges(Geometry region) {
        List<FrameLine> out = new ArrayList<>();
        for (int i = 0; i < region.getNumGeometries(); i++) {
            if (region.getGeometryN(i) instanceof Polygon p) {
                ringEdges(p.getExteriorRing(), out);
                for (int h = 0; h < p.getNumInteriorRing(); h++) {
                    ringEdges(p.getInteriorRingN(h), out);
                }
            }
        }
        return out;
    }

    private static void ringEdges(LinearRing ring, List<FrameLine> out) {
        Coordinate[] c = ring.getCoordinates();
        for (int i = 0; i + 1 < c.length; i++) {
            if (c[i].y != c[i + 1].y) {
                out.add(FrameLine.through(c[i].x, c[i].y, c[i + 1].x, c[i + 1].y));
            }
        }
    }

    /**
     * The piece of deck holding the frame point {@code (u, v)}, within the tolerance; null when the
     * point is not on this deck. Strips within the tolerance of v are candidates; a strip thicker than
     * the tolerance is preferred to a sliver (slivers come from vertices a rounding error apart, and
     * their supports may be missing one that ends a hair short), then a strip holding v itself.
     */
    Location locate(double u, double v) {
        if (strips.isEmpty()) {
            return null;
        }
        int k = Arrays.binarySearch(starts, v);
        int at = k >= 0 ? k : Math.max(0, -k - 2);
        int lo = at;
        while (lo > 0 && strips.get(lo - 1).vb() >= v - tol) {
            lo--;
        }
        Location best = null;
        int bestRank = Integer.MAX_VALUE;
        for (int i = lo; i < strips.size() && strips.get(i).va() <= v + tol; i++) {
            Strip s = strips.get(i);
            if (s.vb() < v - tol) {
                continue;
            }
            boolean holds = v >= s.va() && v <= s.vb();
            boolean thick = s.vb() - s.va() > tol;
            int rank = (thick ? 0 : 2) + (holds ? 0 : 1);
            if (rank >= bestRank) {
                continue;
            }
            double w = Math.max(s.va(), Math.min(s.vb(), v));
            for (Piece p : s.pieces()) {
                if (u >= p.left().at(w) - slack(p.left(), tol) && u <= p.right().at(w) + slack(p.right(), tol)) {
                    best = new Location(s, p, w);
                    bestRank = rank;
                    break;
                }
            }
        }
        return best;
    }
}
