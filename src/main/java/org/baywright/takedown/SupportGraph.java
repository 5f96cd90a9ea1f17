package org.baywright.takedown;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.plan.Column;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Point;
import org.baywright.plan.Problem;

/**
 * The third stage, per floor layout: what supports each member end (a column at that point, otherwise a
 * member passing through it, girders before beams) and the order of design, every member after all the
 * members framing into it (Kahn's algorithm).
 *
 * <p>An overhanging member: when one end of a member has no support but the member crosses a column or
 * another member between its ends (a beam drawn past its support), and that free end lies on the slab,
 * the crossing nearest the free end is its second support and the part beyond it an overhang (a
 * cantilever with a backspan). The plan file needs no field for it: the geometry says it.
 *
 * <p>Members of a support loop cannot be ordered: they are reported and left undesigned, and the
 * members they bear on are designed with the load that reaches them (what the loop carries is missing,
 * and the equilibrium check shows it). A zero-length member is reported and left out.
 *
 * @param ends each member's supports, by member id (zero-length members have none)
 * @param order the members to design, in order
 * @param inLoop the members in a support loop, not designed
 * @param problems zero-length and unsupported members, support loops; in the order found
 */
public record SupportGraph(Map<String, Ends> ends, List<String> order, List<String> inLoop, List<Problem> problems) {

    /** What supports a member end: a column, a member at a position along it, or nothing ({@link #NONE}). */
    public record Support(String column, String member, double position) {
        public static final Support NONE = new Support(null, null, 0);

        static Support column(String id) {
            return new Support(id, null, 0);
        }

        static Support member(String id, double s) {
            return new Support(null, id, s);
        }

        /** "column C-A1", "member G-1", or empty. */
        public String describe() {
            return column != null ? "column " + column : member != null ? "member " + member : "";
        }

        public boolean isNone() {
            return column == null && member == null;
        }
    }

    /**
     * A member's supports at its start and end; for an overhanging member, the support it passes over
     * ({@code over}, at {@code overAt} metres from the member's start) and its free end ({@code free}: 0
     * start, 1 end, -1 when the member does not overhang).
     */
    public record Ends(Support start, Support end, Support over, double overAt, int free) {
        public Ends(Support start, Support end) {
            this(start, end, Support.NONE, 0, -1);
        }

        /** The supports: 0 start, 1 end, 2 the support an overhanging member passes over. */
        Support at(int end) {
            return end == 0 ? start : end == 1 ? this.end : over;
        }

        boolean supported() {
            return overhangs() ? !at(1 - free).isNone() : !start.isNone() && !end.isNone();
        }

        /** True when the member overhangs the support it passes over. */
        public boolean overhangs() {
            return free >= 0 && !over.isNone();
        }
    }

    public SupportGraph {
        ends = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(ends));
        order = List.copyOf(order);
        inLoop = List.copyOf(inLoop);
        problems = List.copyOf(problems);
    }

    /** Builds the graph of a layout with the columns present, its problems' points in SI. */
    public static SupportGraph of(FloorInput in) {
        return of(in, org.baywright.units.UnitSystem.SI);
    }

    /** Builds the graph of a layout with the columns present, its problems' points in {@code units}. */
    public static SupportGraph of(FloorInput in, org.baywright.units.UnitSystem units) {
        List<Problem> problems = new ArrayList<>();
        Map<String, Ends> ends = new LinkedHashMap<>();
        for (Member m : in.members()) {
            if (m.length() < Takedown.TOLERANCE) {
                problems.add(new Problem(Problem.Severity.ERROR, "zero-length-member", "floor " + in.floor().id(), m.id(),
                        "member " + m.id() + " has zero length; its ends must be distinct points", List.of(m.start())));
                continue;
            }
            List<Problem> found = new ArrayList<>();
            Support s0 = support(in, m, m.start(), found, units);
            Support s1 = support(in, m, m.end(), found, units);
            Ends e = new Ends(s0, s1);
            if (s0.isNone() != s1.isNone()) {
                e = overhang(in, m, s0.isNone() ? 0 : 1, e);
            }
            if (e.overhangs()) {
                found.removeIf(pr -> pr.kind().equals("unsupported-member"));
            }
            problems.addAll(found);
            ends.put(m.id(), e);
        }
        Ordering o = new Ordering(ends);
        List<String> inLoop = o.run();
        Map<String, Member> byId = in.byId();
        for (String id : inLoop) {
            Member m = byId.get(id);
            List<String> loop = inLoop.stream().filter(x -> o.reach.get(id).contains(x) && o.reach.get(x).contains(id)).toList();
            problems.add(new Problem(Problem.Severity.ERROR, "support-cycle", "floor " + in.floor().id(), id, "member " + id
                    + " is in a cycle of members supporting each other (" + String.join(", ", loop)
                    + "); one of them must bear on a column or another member", List.of(m.start(), m.end())));
        }
        return new SupportGraph(ends, o.order, inLoop, problems);
    }

    /** Kahn's algorithm over the members framing into each member, with the loops left over. */
    private static final class Ordering {
        final Map<String, Ends> ends;
        final Map<String, Integer> pending = new HashMap<>();
        final Deque<String> ready = new ArrayDeque<>();
        final List<String> order = new ArrayList<>();
        final Map<String, Set<String>> reach = new HashMap<>();

        Ordering(Map<String, Ends> ends) {
            this.ends = ends;
        }

        /** Orders the members; returns those in support loops. */
        List<String> run() {
            for (Map.Entry<String, Ends> e : ends.entrySet()) {
                pending.putIfAbsent(e.getKey(), 0);
                for (int end = 0; end < 3; end++) {
                    Support s = e.getValue().at(end);
                    if (s.member() != null) {
                        pending.merge(s.member(), 1, Integer::sum);
                    }
                }
            }
            for (String id : ends.keySet()) {
                if (pending.get(id) == 0) {
                    ready.add(id);
                }
            }
            release();
            if (order.size() == ends.size()) {
                return List.of();
            }
            // left over: the members of support loops, and the members they bear on (directly or not)
            Set<String> stuck = new LinkedHashSet<>(ends.keySet());
            stuck.removeAll(order);
            for (String id : stuck) {
                reach.put(id, bearsOn(id, stuck));
            }
            List<String> inLoop = stuck.stream().filter(id -> reach.get(id).contains(id)).toList();
            // the members a loop bears on are designed with the load that reaches them
            for (String id : inLoop) {
                for (int end = 0; end < 3; end++) {
                    String on = ends.get(id).at(end).member();
                    if (on != null && !inLoop.contains(on) && pending.merge(on, -1, Integer::sum) == 0) {
                        ready.add(on);
                    }
                }
            }
            release();
            return inLoop;
        }

        /** Takes the ready members in turn, releasing those whose framing members are all taken. */
        private void release() {
            while (!ready.isEmpty()) {
                String id = ready.poll();
                order.add(id);
                for (int end = 0; end < 3; end++) {
                    String on = ends.get(id).at(end).member();
                    if (on != null && pending.merge(on, -1, Integer::sum) == 0) {
                        ready.add(on);
                    }
                }
            }
        }

        /** The members among {@code within} that a member bears on, directly or through others. */
        private Set<String> bearsOn(String id, Set<String> within) {
            Set<String> seen = new LinkedHashSet<>();
            Deque<String> todo = new ArrayDeque<>(List.of(id));
            while (!todo.isEmpty()) {
                Ends e = ends.get(todo.poll());
                for (int end = 0; end < 3; end++) {
                    String on = e.at(end).member();
                    if (on != null && within.contains(on) && seen.add(on)) {
                        todo.add(on);
                    }
                }
            }
            return seen;
        }
    }

    /** What supports the member end at {@code p}; an unsupported end is reported. */
    private static Support support(FloorInput in, Member m, Point p, List<Problem> problems,
            org.baywright.units.UnitSystem units) {
        for (Column c : in.columns()) {
            if (c.at().distance(p) <= Takedown.TOLERANCE) {
                return Support.column(c.id());
            }
        }
        Member best = null;
        double bestS = 0;
        for (Member o : in.members()) {
            if (o == m || o.length() < Takedown.TOLERANCE) {
                continue;
            }
            double s = projection(o, p);
            if (s < -Takedown.TOLERANCE || s > o.length() + Takedown.TOLERANCE || along(o, s).distance(p) > Takedown.TOLERANCE) {
                continue;
            }
            boolean interior = s > Takedown.TOLERANCE && s < o.length() - Takedown.TOLERANCE;
            if (!interior) {
                continue; // meeting another member end to end is not a support
            }
            if (best == null || (o.kind() == MemberKind.GIRDER && best.kind() != MemberKind.GIRDER)) {
                best = o;
                bestS = s;
            }
        }
        if (best != null) {
            return Support.member(best.id(), bestS);
        }
        problems.add(new Problem(Problem.Severity.ERROR, "unsupported-member", "floor " + in.floor().id(), m.id(),
                "member " + m.id() + " has no support at " + units.pointText(p.x(), p.y())
                        + ": no column there and no member passes through that point", List.of(p)));
        return Support.NONE;
    }

    /**
     * The overhang of member {@code m} whose end {@code free} has no support: the column or member it
     * crosses between its ends nearest that end, if the free end lies on the slab; else {@code e} as it is.
     */
    private static Ends overhang(FloorInput in, Member m, int free, Ends e) {
        Point tip = free == 0 ? m.start() : m.end();
        if (!onSlab(in.floor().slabEdge(), tip)) {
            return e;
        }
        double len = m.length();
        double tol = Takedown.TOLERANCE;
        Support best = Support.NONE;
        double bestAt = Double.NaN;
        double bestGap = Double.POSITIVE_INFINITY;
        for (Column c : in.columns()) {
            double s = projection(m, c.at());
            if (s > tol && s < len - tol && along(m, s).distance(c.at()) <= tol) {
                double gap = free == 0 ? s : len - s;
                if (gap < bestGap) {
                    best = Support.column(c.id());
                    bestAt = s;
                    bestGap = gap;
                }
            }
        }
        for (Member o : in.members()) {
            if (o == m || o.length() < tol) {
                continue;
            }
            double[] st = crossing(m, o);
            if (st == null || !(st[0] > tol && st[0] < len - tol && st[1] > tol && st[1] < o.length() - tol)) {
                continue;
            }
            double gap = free == 0 ? st[0] : len - st[0];
            // a column at the same point wins; otherwise the crossing nearest the free end
            if (gap < bestGap - tol || (Math.abs(gap - bestGap) <= tol && best.column() == null && o.kind() == MemberKind.GIRDER)) {
                best = Support.member(o.id(), st[1]);
                bestAt = st[0];
                bestGap = gap;
            }
        }
        if (best.isNone()) {
            return e;
        }
        return new Ends(e.start(), e.end(), best, bestAt, free);
    }

    /** Inside the slab edge or on it (within {@link Takedown#TOLERANCE}). */
    private static boolean onSlab(org.baywright.plan.Polygon slab, Point p) {
        if (slab.contains(p.x(), p.y())) {
            return true;
        }
        List<Point> v = slab.vertices();
        for (int i = 0, j = v.size() - 1; i < v.size(); j = i++) {
            Point a = v.get(j);
            Point b = v.get(i);
            double dx = b.x() - a.x();
            double dy = b.y() - a.y();
            double l2 = dx * dx + dy * dy;
            double t = l2 == 0 ? 0 : Math.max(0, Math.min(1, ((p.x() - a.x()) * dx + (p.y() - a.y()) * dy) / l2));
            if (Math.hypot(a.x() + t * dx - p.x(), a.y() + t * dy - p.y()) <= Takedown.TOLERANCE) {
                return true;
            }
        }
        return false;
    }

    /** Where segments m and o cross: {distance along m, distance along o}, or null when they do not (or are parallel). */
    private static double[] crossing(Member m, Member o) {
        double rx = m.end().x() - m.start().x();
        double ry = m.end().y() - m.start().y();
        double sx = o.end().x() - o.start().x();
        double sy = o.end().y() - o.start().y();
        double den = rx * sy - ry * sx;
        if (Math.abs(den) < 1e-12 * Math.hypot(rx, ry) * Math.hypot(sx, sy)) {
            return null;
        }
        double qx = o.start().x() - m.start().x();
        double qy = o.start().y() - m.start().y();
        double t = (qx * sy - qy * sx) / den;
        double u = (qx * ry - qy * rx) / den;
        if (t < 0 || t > 1 || u < 0 || u > 1) {
            return null;
        }
        return new double[] {t * m.length(), u * o.length()};
    }

    private static double projection(Member o, Point p) {
        double dx = o.end().x() - o.start().x();
        double dy = o.end().y() - o.start().y();
        double len = Math.hypot(dx, dy);
        return ((p.x() - o.start().x()) * dx + (p.y() - o.start().y()) * dy) / len;
    }

    private static Point along(Member o, double s) {
        double f = s / o.length();
        return new Point(o.start().x() + f * (o.end().x() - o.start().x()), o.start().y() + f * (o.end().y() - o.start().y()));
    }
}
