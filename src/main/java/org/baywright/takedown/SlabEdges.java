package org.baywright.takedown;

import java.util.List;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Member;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;

/**
 * Classifies members and columns for the live-load element factor K_LL of ASCE 7-16 Table 4.7-1 from
 * the plan's geometry: interior or edge, and whether a cantilever slab extends beyond an edge.
 *
 * <p>Method: for a member, each side of it on which its own tributary area lies (probed just off the
 * member at stations along it) is followed along the span of the deck region there, away from the
 * member; a side whose deck spans along the member delivers no load to it and is skipped. For a column,
 * rays along the grid directions where no other column stands. A side with no supporting member (or
 * column) before the slab edge is an exterior side, and the slab is a cantilever slab on that side when
 * its edge lies more than the given distance beyond. Probing the member's own tributary, not its
 * midpoint alone, matters where two deck regions meet along the member (a balcony deck spanning onto a
 * girder that the main deck runs parallel to): the midpoint lies on their common boundary and could be
 * taken for either.
 */
public final class SlabEdges {
    private SlabEdges() {
    }

    /** Stations along a member where its sides are probed, as fractions of its length. */
    private static final double[] STATIONS = {0.1, 0.3, 0.5, 0.7, 0.9};

    /** How far off the member's line a side is probed, m: well inside any tributary strip, beyond the tolerance. */
    private static final double PROBE = 0.05;

    /**
     * True for an edge beam or girder with a cantilever slab beyond it (K_LL = 1): on a side where the
     * member's own tributary area lies, the deck there spans away from the member and reaches the slab
     * edge, more than {@code cantilever} beyond, with no other member in between.
     *
     * @param tributary the member's tributary polygons (empty when it carries no deck: then false)
     */
    public static boolean isEdgeWithCantilever(Floor floor, List<Member> members, Member m, List<Polygon> tributary,
            double cantilever, double tol) {
        double len = m.length();
        if (tributary.isEmpty() || !(len > tol)) {
            return false;
        }
        double mx = (m.end().x() - m.start().x()) / len;
        double my = (m.end().y() - m.start().y()) / len;
        for (double f : STATIONS) {
            Point at = new Point(m.start().x() + f * (m.end().x() - m.start().x()), m.start().y() + f * (m.end().y() - m.start().y()));
            for (int side = -1; side <= 1; side += 2) {
                // normal (−my, mx) times side: the probe just off the member on that side
                Point probe = new Point(at.x() - side * my * PROBE, at.y() + side * mx * PROBE);
                if (!inAny(tributary, probe)) {
                    continue; // no load reaches the member from this side here
                }
                double angle = spanAngle(floor, probe);
                double dx = Math.cos(Math.toRadians(angle));
                double dy = Math.sin(Math.toRadians(angle));
                double cross = dx * -my + dy * mx; // span direction · normal
                if (Math.abs(cross) < Math.sin(Math.toRadians(1))) {
                    continue; // the deck here spans along the member
                }
                double sign = Math.signum(cross) * side; // the span direction pointing to this side
                if (cantileverBeyond(floor, members, m, at, sign * dx, sign * dy, cantilever, tol)) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean inAny(List<Polygon> polygons, Point p) {
        for (Polygon poly : polygons) {
            if (contains(poly, p)) {
                return true;
            }
        }
        return false;
    }

    /** Along the ray from {@code from}, the slab edge lies more than {@code cantilever} away with no other member before it. */
    private static boolean cantileverBeyond(Floor floor, List<Member> members, Member m, Point from, double ux, double uy,
            double cantilever, double tol) {
        double edge = rayToPolygon(from, ux, uy, floor.slabEdge());
        double nearest = Double.POSITIVE_INFINITY;
        for (Member o : members) {
            if (o == m) {
                continue;
            }
            double t = rayToSegment(from, ux, uy, o.start(), o.end());
            if (t > tol && t < nearest) {
                nearest = t;
            }
        }
        // a member on the slab edge itself (within the tolerance) supports the slab up to the edge:
        // no cantilever beyond it, whichever way rounding puts the two crossings
        return nearest > edge + tol && edge > cantilever;
    }

    /**
     * Where a column stands, for its live-load element factor.
     *
     * @param kll K_LL (ASCE 7-16 Table 4.7-1)
     * @param description "interior", "edge", "corner", "… with cantilever slab"
     */
    public record ColumnPosition(double kll, String description) {
    }

    /** Position of a column: K_LL and a description ("interior", "edge", "corner", "… with cantilever slab"). */
    public static ColumnPosition column(Plan plan, Column c, Floor floor, double cantilever, double tol) {
        double[][] dirs = {{1, 0}, {-1, 0}, {0, 1}, {0, -1}};
        int exposed = 0;
        boolean allCantilever = true;
        for (double[] d : dirs) {
            boolean neighbour = false;
            for (Column o : plan.columns()) {
                if (o == c) {
                    continue;
                }
                double rx = o.at().x() - c.at().x();
                double ry = o.at().y() - c.at().y();
                double along = rx * d[0] + ry * d[1];
                double across = Math.abs(rx * d[1] - ry * d[0]);
                if (along > tol && across <= tol) {
                    neighbour = true;
                    break;
                }
            }
            if (!neighbour) {
                exposed++;
                if (!(floor != null && cantileverOnSide(c.at(), d[0], d[1], floor.slabEdge(), cantilever))) {
                    allCantilever = false;
                }
            }
        }
        if (exposed == 0) {
            return new ColumnPosition(4.0, "interior");
        }
        String where = exposed == 1 ? "edge" : "corner";
        if (allCantilever) {
            return exposed == 1 ? new ColumnPosition(3.0, "edge, with cantilever slab")
                    : new ColumnPosition(2.0, "corner, with cantilever slab");
        }
        return new ColumnPosition(4.0, where);
    }

    /**
     * Whether the slab extends more than {@code cantilever} beyond the column in direction (ux, uy), along the
     * column's line or just beside it on either side ({@link #PROBE} off the line). The probes beside the line
     * catch a column at the end of a cantilever slab (a balcony ending at the column): the ray along the
     * column's own line then runs along the balcony's end edge, and the cantilever slab lies on one side of
     * the column only. Such a column is taken as an edge column with a cantilever slab (ASCE 7-16 Table 4.7-1,
     * K_LL = 3; conservative beside K_LL = 4).
     */
    private static boolean cantileverOnSide(Point at, double ux, double uy, Polygon slab, double cantilever) {
        for (int k = -1; k <= 1; k++) {
            Point from = new Point(at.x() - k * uy * PROBE, at.y() + k * ux * PROBE);
            if (k != 0 && !contains(slab, new Point(from.x() + ux * PROBE, from.y() + uy * PROBE))) {
                continue; // beside the column, just beyond it, is not slab: no slab on this side
            }
            if (rayToPolygon(from, ux, uy, slab) > cantilever) {
                return true;
            }
        }
        return false;
    }

    private static double spanAngle(Floor floor, Point p) {
        for (Deck d : floor.decks()) {
            if (contains(d.outline(), p)) {
                return d.spanAngle();
            }
        }
        return floor.decks().isEmpty() ? 0 : floor.decks().get(0).spanAngle();
    }

    /** Even-odd point in polygon (points on the boundary may go either way). */
    static boolean contains(Polygon poly, Point p) {
        return poly.contains(p.x(), p.y());
    }

    /** Distance along the ray to the farthest crossing of the polygon boundary in front (0 if none). */
    static double rayToPolygon(Point p, double ux, double uy, Polygon poly) {
        List<Point> v = poly.vertices();
        double far = 0;
        double near = Double.POSITIVE_INFINITY;
        for (int i = 0; i < v.size(); i++) {
            double t = rayToSegment(p, ux, uy, v.get(i), v.get((i + 1) % v.size()));
            if (t >= 0 && Double.isFinite(t)) {
                near = Math.min(near, t);
                far = Math.max(far, t);
            }
        }
        return Double.isFinite(near) ? near : 0;
    }

    /** A ray and a segment whose directions' cross product is below this (m²) are parallel: they never meet. */
    private static final double PARALLEL = 1e-12;
    /** A ray meeting a segment this fraction past either end still meets it (a slab corner is on both edges). */
    private static final double ON_SEGMENT = 1e-9;

    /** Parameter t ≥ 0 where the ray p + t·u meets segment ab, or +∞. */
    static double rayToSegment(Point p, double ux, double uy, Point a, Point b) {
        double ex = b.x() - a.x();
        double ey = b.y() - a.y();
        double den = ux * ey - uy * ex;
        if (Math.abs(den) < PARALLEL) {
            return Double.POSITIVE_INFINITY;
        }
        double wx = a.x() - p.x();
        double wy = a.y() - p.y();
        double t = (wx * ey - wy * ex) / den;
        double s = (wx * uy - wy * ux) / den;
        if (t < -PARALLEL || s < -ON_SEGMENT || s > 1 + ON_SEGMENT) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.max(0, t);
    }
}
