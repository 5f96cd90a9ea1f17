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

    /** A member's supports at its start and end. */
    public record Ends(Support start, Support end) {
        Support at(int end) {
            return end == 0 ? start : this.end;
        }

        boolean supported() {
            return !start.isNone() && !end.isNone();
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
            ends.put(m.id(), new Ends(support(in, m, m.start(), problems, units), support(in, m, m.end(), problems, units)));
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
                for (int end = 0; end < 2; end++) {
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
                for (int end = 0; end < 2; end++) {
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
                for (int end = 0; end < 2; end++) {
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
                for (int end = 0; end < 2; end++) {
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
