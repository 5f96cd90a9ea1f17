package org.baywright.takedown;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;

/**
 * Finds the bays of a designed floor layout ({@link Bay}): the beams (members of kind beam) whose ends both
 * rest on members are grouped by the pair of members carrying them; each group, with those members, is a
 * bay. Its extent along the carrying members is their common length; its spacing that length over the number
 * of beams plus one; its id the grid lines its sides lie on.
 *
 * <p>The floor extents are the chords of the slab, its openings cut out, through the bay's centre; a bay is at
 * an edge when a side along its beams is within half a spacing of the slab edge or of an opening (an atrium).
 *
 * <p>Known limitations: beams resting on a column at either end belong to no bay (a beam on a column line is a
 * side of a bay, not in it); a small opening crossing a chord cuts the floor extent there as an atrium would; a
 * bay whose beams are not parallel is taken by its first beam's direction.
 */
public final class Bays {
    /** Positions closer than this are the same point, and a side this close to a grid line lies on it, m. */
    private static final double TOL = 0.01;

    private Bays() {
    }

    /**
     * The bays of one designed floor layout, in the order of their first beam.
     *
     * @param key the layout's key in the run's results
     * @param members the layout's designed members
     */
    public static List<Bay> find(Plan plan, Floor floor, String key, List<MemberResult> members) {
        Map<String, MemberResult> byId = new HashMap<>();
        for (MemberResult m : members) {
            byId.put(m.id(), m);
        }
        Map<List<String>, List<MemberResult>> groups = new LinkedHashMap<>();
        for (MemberResult m : members) {
            if (m.kind() != MemberKind.BEAM || m.overhangs()) {
                continue;
            }
            String a = carrier(m.startSupport());
            String b = carrier(m.endSupport());
            if (a == null || b == null || !byId.containsKey(a) || !byId.containsKey(b) || a.equals(b)) {
                continue;
            }
            List<String> pair = a.compareTo(b) < 0 ? List.of(a, b) : List.of(b, a);
            groups.computeIfAbsent(pair, k -> new ArrayList<>()).add(m);
        }
        List<Bay> out = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (Map.Entry<List<String>, List<MemberResult>> e : groups.entrySet()) {
            Bay bay = bay(plan, floor, key, e.getKey(), e.getValue(), byId, members);
            if (bay == null) {
                continue;
            }
            if (!ids.add(bay.id())) {
                // two bays between the same grid lines (a bay split by a member): name this one by its members
                bay = withId(bay, String.join("/", e.getKey()));
                ids.add(bay.id());
            }
            out.add(bay);
        }
        return out;
    }

    private static Bay withId(Bay b, String id) {
        return new Bay(id, b.floor(), b.beams(), b.beam(), b.beamSection(), b.beamSpan(), b.spacing(), b.beamAdjacentSpan(),
                b.girders(), b.centre(), b.beamAngle(), b.width(), b.floorWidth(), b.floorLength(), b.edge());
    }

    /** The member id of a support text "member G-1", or null for a column or none. */
    static String carrier(String support) {
        return support != null && support.startsWith("member ") ? support.substring("member ".length()) : null;
    }

    private static Bay bay(Plan plan, Floor floor, String key, List<String> pair, List<MemberResult> beams,
            Map<String, MemberResult> byId, List<MemberResult> all) {
        for (MemberResult m : beams) {
            if (m.design() == null || m.design().section() == null) {
                return null;
            }
        }
        MemberResult first = beams.get(0);
        double ux = (first.end().x() - first.start().x()) / first.length();
        double uy = (first.end().y() - first.start().y()) / first.length();
        if (ux < -1e-9 || (Math.abs(ux) <= 1e-9 && uy < 0)) {
            ux = -ux;
            uy = -uy;
        }
        double vx = -uy;
        double vy = ux;
        // across the bay (along v): the common extent of the carrying members, else their union with the beams
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        List<Bay.BayGirder> girders = new ArrayList<>();
        for (String gid : pair) {
            MemberResult g = byId.get(gid);
            if (g.design() == null || g.design().section() == null) {
                return null;
            }
            double a = g.start().x() * vx + g.start().y() * vy;
            double b = g.end().x() * vx + g.end().y() * vy;
            lo = Math.max(lo, Math.min(a, b));
            hi = Math.min(hi, Math.max(a, b));
            double[] sides = sides(g, all);
            girders.add(new Bay.BayGirder(gid, g.design().section(), g.length(), (sides[0] + sides[1]) / 2,
                    adjacentSpan(g, all, MemberKind.GIRDER, g.kind()), sides[0] > 0 && sides[1] > 0));
        }
        // west to east, then south to north
        List<MemberResult> sorted = new ArrayList<>(beams);
        sorted.sort(Comparator.comparingDouble((MemberResult m) -> Math.round(mid(m).x() / TOL))
                .thenComparingDouble(m -> mid(m).y()));
        double pmin = Double.POSITIVE_INFINITY;
        double pmax = Double.NEGATIVE_INFINITY;
        for (MemberResult m : sorted) {
            pmin = Math.min(pmin, along(m, vx, vy));
            pmax = Math.max(pmax, along(m, vx, vy));
        }
        if (!(hi - lo > pmax - pmin + TOL) || pmin < lo - TOL || pmax > hi + TOL) {
            // the carrying members do not both reach past the beams: take the beams' own extent and spacing
            double gap = sorted.size() > 1 ? (pmax - pmin) / (sorted.size() - 1) : first.length();
            lo = pmin - gap;
            hi = pmax + gap;
        }
        double width = hi - lo;
        double spacing = width / (sorted.size() + 1);
        // along the beams (u): from the nearer to the farther carrying member
        double ulo = Double.POSITIVE_INFINITY;
        double uhi = Double.NEGATIVE_INFINITY;
        MemberResult rep = first;
        double worst = -1;
        for (MemberResult m : sorted) {
            for (Point p : List.of(m.start(), m.end())) {
                double t = p.x() * ux + p.y() * uy;
                ulo = Math.min(ulo, t);
                uhi = Math.max(uhi, t);
            }
            double flex = Math.pow(m.length(), 4) / m.design().section().props().ix();
            if (flex > worst * (1 + 1e-12)) {
                worst = flex;
                rep = m;
            }
        }
        double um = (ulo + uhi) / 2;
        double vm = (lo + hi) / 2;
        Point centre = new Point(um * ux + vm * vx, um * uy + vm * vy);
        List<Polygon> outline = new ArrayList<>();
        outline.add(floor.slabEdge());
        floor.openings().forEach(o -> outline.add(o.outline()));
        double[] across = chord(outline, centre, vx, vy);
        double[] alongBeams = chord(outline, centre, ux, uy);
        double floorWidth = across == null ? Double.POSITIVE_INFINITY : across[1] - across[0];
        double floorLength = alongBeams == null ? Double.POSITIVE_INFINITY : alongBeams[1] - alongBeams[0];
        double halfWidth = width / 2;
        double reach = Math.max(spacing / 2, TOL);
        boolean edge = across != null && (-halfWidth - across[0] < reach || across[1] - halfWidth < reach);
        double angle = Math.toDegrees(Math.atan2(uy, ux));
        if (angle < 0) {
            angle += 180;
        }
        String id = gridId(plan, ux, uy, um, vm, ulo, uhi, lo, hi).orElse(String.join("/", pair));
        return new Bay(id, key, sorted.stream().map(MemberResult::id).toList(), rep.id(), rep.design().section(),
                rep.length(), spacing, adjacentSpan(rep, all, MemberKind.BEAM, MemberKind.BEAM), girders, centre, angle,
                width, floorWidth, floorLength, edge);
    }

    private static Point mid(MemberResult m) {
        return new Point((m.start().x() + m.end().x()) / 2, (m.start().y() + m.end().y()) / 2);
    }

    private static double along(MemberResult m, double vx, double vy) {
        Point p = mid(m);
        return p.x() * vx + p.y() * vy;
    }

    /**
     * The longest member framing into a carrying member from each side, {left, right} (0 for none): half of each
     * is the width of floor it carries across it.
     */
    static double[] sides(MemberResult g, List<MemberResult> all) {
        double nx = -(g.end().y() - g.start().y()) / g.length();
        double ny = (g.end().x() - g.start().x()) / g.length();
        double left = 0;
        double right = 0;
        for (MemberResult m : all) {
            if (m == g || !(g.id().equals(carrier(m.startSupport())) || g.id().equals(carrier(m.endSupport())))) {
                continue;
            }
            Point p = mid(m);
            double side = (p.x() - g.start().x()) * nx + (p.y() - g.start().y()) * ny;
            if (side >= 0) {
                left = Math.max(left, m.length());
            } else {
                right = Math.max(right, m.length());
            }
        }
        return new double[] {left, right};
    }

    /**
     * The longer span of a member of kind {@code kind} continuing {@code m} in line beyond either end (sharing the
     * end point, parallel to it), or 0 for none.
     */
    static double adjacentSpan(MemberResult m, List<MemberResult> all, MemberKind kind, MemberKind alsoKind) {
        double ux = (m.end().x() - m.start().x()) / m.length();
        double uy = (m.end().y() - m.start().y()) / m.length();
        double best = 0;
        for (MemberResult o : all) {
            if (o == m || (o.kind() != kind && o.kind() != alsoKind) || !(o.length() > 0)) {
                continue;
            }
            double ox = (o.end().x() - o.start().x()) / o.length();
            double oy = (o.end().y() - o.start().y()) / o.length();
            if (Math.abs(ux * oy - uy * ox) > 1e-3) {
                continue;
            }
            boolean touches = near(o.start(), m.end()) || near(o.end(), m.start()) || near(o.start(), m.start())
                    || near(o.end(), m.end());
            if (touches) {
                best = Math.max(best, o.length());
            }
        }
        return best;
    }

    private static boolean near(Point a, Point b) {
        return a.distance(b) < TOL;
    }

    /** {@link #chord(List, Point, double, double)} of one polygon. */
    static double[] chord(Polygon p, Point c, double dx, double dy) {
        return chord(List.of(p), c, dx, dy);
    }

    /**
     * The interval of the line through {@code c} in direction (dx, dy) (unit) inside the area the polygons bound
     * by the even-odd rule (a slab edge and its openings), as parameters {lo, hi} from {@code c} (lo ≤ 0 ≤ hi);
     * null when {@code c} is outside.
     */
    static double[] chord(List<Polygon> polygons, Point c, double dx, double dy) {
        List<Double> ts = new ArrayList<>();
        for (Polygon p : polygons) {
            crossings(p, c, dx, dy, ts);
        }
        ts.sort(Double::compare);
        for (int i = 0; i + 1 < ts.size(); i += 2) {
            if (ts.get(i) <= 0 && ts.get(i + 1) >= 0) {
                return new double[] {ts.get(i), ts.get(i + 1)};
            }
        }
        return null;
    }

    /**
     * The parameters along the line where the polygon's edges cross it, by the half-open rule: an edge crosses
     * when its ends lie on different sides, a point on the line counting as the left side, so a vertex on the
     * line is counted once when the outline crosses there and not at all (or twice) when it only touches.
     */
    private static void crossings(Polygon p, Point c, double dx, double dy, List<Double> ts) {
        List<Point> v = p.vertices();
        int n = v.size();
        for (int i = 0; i < n; i++) {
            Point a = v.get(i);
            Point b = v.get((i + 1) % n);
            double da = dx * (a.y() - c.y()) - dy * (a.x() - c.x());
            double db = dx * (b.y() - c.y()) - dy * (b.x() - c.x());
            if ((da >= 0) != (db >= 0)) {
                double f = da / (da - db);
                double x = a.x() + f * (b.x() - a.x());
                double y = a.y() + f * (b.y() - a.y());
                ts.add((x - c.x()) * dx + (y - c.y()) * dy);
            }
        }
    }

    /** "B-C/2-3" when the beams run along x or y and the bay's four sides lie on grid lines. */
    private static Optional<String> gridId(Plan plan, double ux, double uy, double um, double vm, double ulo, double uhi,
            double vlo, double vhi) {
        double x0;
        double x1;
        double y0;
        double y1;
        if (Math.abs(ux - 1) < 1e-6) { // beams along x: u = x, v = y
            x0 = ulo;
            x1 = uhi;
            y0 = vlo;
            y1 = vhi;
        } else if (Math.abs(uy - 1) < 1e-6) { // beams along y: u = y, v = −x
            x0 = -vhi;
            x1 = -vlo;
            y0 = ulo;
            y1 = uhi;
        } else {
            return Optional.empty();
        }
        Optional<String> a = line(plan, GridLine.Axis.X, x0);
        Optional<String> b = line(plan, GridLine.Axis.X, x1);
        Optional<String> c = line(plan, GridLine.Axis.Y, y0);
        Optional<String> d = line(plan, GridLine.Axis.Y, y1);
        if (a.isEmpty() || b.isEmpty() || c.isEmpty() || d.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(a.get() + "-" + b.get() + "/" + c.get() + "-" + d.get());
    }

    private static Optional<String> line(Plan plan, GridLine.Axis axis, double offset) {
        return plan.grid().stream().filter(g -> g.axis() == axis && Math.abs(g.offset() - offset) < TOL)
                .map(GridLine::label).findFirst();
    }

    /** The bay named {@code id} (case-insensitive) among {@code bays}. */
    public static Optional<Bay> named(List<Bay> bays, String id) {
        String k = id.trim().toLowerCase(Locale.ROOT);
        return bays.stream().filter(b -> b.id().toLowerCase(Locale.ROOT).equals(k)).findFirst();
    }
}
