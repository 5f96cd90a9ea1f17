package org.baywright.takedown;

import java.util.List;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Member;
import org.baywright.plan.Opening;
import org.baywright.plan.Point;

/**
 * What a composite member sees of the floor around it, read from the plan's geometry: the deck whose slab
 * it acts with, how that deck's ribs run relative to it, and on each side the distance to the next member
 * and to the slab's edge (for the effective width of AISC 360-16 I3.1a).
 *
 * <p>Distances are measured square to the member from its quarter points and mid-span; each side keeps the
 * least (common practice: the effective width is taken where the slab beside the member is narrowest). The
 * next member is one running within 30° of this one; an opening's edge counts as a slab edge.
 *
 * @param deck the deck whose slab the member acts with
 * @param ribs perpendicular when the deck spans across the member (its direction more than 45° from the
 *     member's), parallel when along it; none for a solid slab
 * @param neighbourLeft distance to the next member's centreline on the left, m (∞ when none)
 * @param neighbourRight as on the left
 * @param edgeLeft distance to the slab edge on the left, m (∞ when none is found)
 * @param edgeRight as on the left
 */
record CompositeGeometry(Deck deck, DeckRibs ribs, double neighbourLeft, double neighbourRight, double edgeLeft,
        double edgeRight) {
    /** How far beside the member the deck is looked for, m. */
    private static final double PROBE = 0.15;
    /** Members closer than this are the member itself (a duplicate), m. */
    private static final double SELF = 0.01;
    /** sin 30°: members within 30° of this one count as neighbours. */
    private static final double NEIGHBOUR_SIN = 0.5;
    private static final double[] STATIONS = {0.25, 0.5, 0.75};

    /** The geometry of {@code m}, or null when neither side of it is a deck that describes a slab. */
    static CompositeGeometry of(Floor floor, List<Member> members, Member m) {
        double len = m.length();
        if (!(len > 0)) {
            return null;
        }
        double ux = (m.end().x() - m.start().x()) / len;
        double uy = (m.end().y() - m.start().y()) / len;
        double lx = -uy;
        double ly = ux;
        Point mid = new Point((m.start().x() + m.end().x()) / 2, (m.start().y() + m.end().y()) / 2);
        Deck deck = slabDeck(floor, new Point(mid.x() + PROBE * lx, mid.y() + PROBE * ly));
        if (deck == null) {
            deck = slabDeck(floor, new Point(mid.x() - PROBE * lx, mid.y() - PROBE * ly));
        }
        if (deck == null) {
            return null;
        }
        DeckRibs ribs;
        if (deck.slab().ribHeight() == 0) {
            ribs = DeckRibs.NONE;
        } else {
            double a = Math.toRadians(deck.spanAngle());
            double along = Math.abs(Math.cos(a) * ux + Math.sin(a) * uy);
            ribs = along >= Math.sqrt(0.5) ? DeckRibs.PARALLEL : DeckRibs.PERPENDICULAR;
        }
        double[] left = side(floor, members, m, ux, uy, lx, ly);
        double[] right = side(floor, members, m, ux, uy, -lx, -ly);
        return new CompositeGeometry(deck, ribs, left[0], right[0], left[1], right[1]);
    }

    /** {distance to the next member, distance to the slab edge} on the side of normal (nx, ny). */
    private static double[] side(Floor floor, List<Member> members, Member m, double ux, double uy, double nx, double ny) {
        double neighbour = Double.POSITIVE_INFINITY;
        double edge = Double.POSITIVE_INFINITY;
        for (double f : STATIONS) {
            Point p = new Point(m.start().x() + f * (m.end().x() - m.start().x()), m.start().y() + f * (m.end().y() - m.start().y()));
            for (Member o : members) {
                if (o == m || o.id().equals(m.id())) {
                    continue;
                }
                double ol = o.length();
                if (!(ol > 0)) {
                    continue;
                }
                double ox = (o.end().x() - o.start().x()) / ol;
                double oy = (o.end().y() - o.start().y()) / ol;
                if (Math.abs(ux * oy - uy * ox) > NEIGHBOUR_SIN) {
                    continue;
                }
                double t = SlabEdges.rayToSegment(p, nx, ny, o.start(), o.end());
                if (t > SELF && t < neighbour) {
                    neighbour = t;
                }
            }
            // a member on the slab edge (or an opening's) has the edge at no distance: no slab just beside it
            double px = p.x() + PROBE * nx;
            double py = p.y() + PROBE * ny;
            boolean slabBeside = floor.slabEdge().contains(px, py)
                    && floor.openings().stream().noneMatch(o -> o.outline().contains(px, py));
            double e = slabBeside ? nearestCrossing(p, nx, ny, floor.slabEdge().vertices()) : 0;
            for (Opening o : floor.openings()) {
                e = Math.min(e, nearestCrossing(p, nx, ny, o.outline().vertices()));
            }
            edge = Math.min(edge, e);
        }
        return new double[] {neighbour, edge};
    }

    private static double nearestCrossing(Point p, double nx, double ny, List<Point> v) {
        double near = Double.POSITIVE_INFINITY;
        for (int i = 0; i < v.size(); i++) {
            double t = SlabEdges.rayToSegment(p, nx, ny, v.get(i), v.get((i + 1) % v.size()));
            if (t > SELF) {
                near = Math.min(near, t);
            }
        }
        return near;
    }

    private static Deck slabDeck(Floor floor, Point p) {
        for (Deck d : floor.decks()) {
            if (d.slab() != null && d.outline().contains(p.x(), p.y())) {
                return d;
            }
        }
        return null;
    }
}
