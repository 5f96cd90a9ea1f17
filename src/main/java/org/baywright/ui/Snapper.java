package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.baywright.plan.Column;
import org.baywright.plan.GridLine;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;

/**
 * Where a drawing tool's cursor lands: the nearest snap target within a tolerance, in this order of
 * preference: grid intersections and columns, member ends, member midpoints, the perpendicular foot
 * from the point the gesture started at onto a member, a point on a grid line; with none near, the
 * cursor rounded to the drawing precision. Pure arithmetic on plan coordinates (metres), no toolkit.
 */
public final class Snapper {
    /** How a point was found. */
    public enum Kind {
        INTERSECTION("grid intersection"), COLUMN("column"), END("member end"), MIDPOINT("midpoint"),
        PERPENDICULAR("perpendicular"), ON_GRID("on grid line"), FREE("free");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** A snapped point and what it snapped to. */
    public record Snap(Point point, Kind kind) {
    }

    /** A member as a segment. */
    public record Segment(Point a, Point b) {
    }

    /** Free points round to this precision in US plans: one inch, m. */
    public static final double US_PRECISION = 0.0254;
    /** Free points round to this precision in SI plans: 10 mm, m. */
    public static final double SI_PRECISION = 0.010;

    private final List<Point> intersections = new ArrayList<>();
    private final List<Point> columns = new ArrayList<>();
    private final List<Segment> members;
    private final List<GridLine> grid;
    private final double precision;

    public Snapper(Plan plan, List<Segment> members, double precision) {
        this.members = List.copyOf(members);
        this.grid = plan == null ? List.of() : plan.grid();
        this.precision = precision;
        for (GridLine gx : grid) {
            if (gx.axis() != GridLine.Axis.X) {
                continue;
            }
            for (GridLine gy : grid) {
                if (gy.axis() == GridLine.Axis.Y) {
                    intersections.add(new Point(gx.offset(), gy.offset()));
                }
            }
        }
        if (plan != null) {
            for (Column c : plan.columns()) {
                columns.add(c.at());
            }
        }
    }

    /**
     * The snap for a cursor at {@code q}, looking {@code tolerance} metres around it; {@code from} is
     * where the gesture started (for perpendicular feet), or null.
     */
    public Snap snap(Point q, double tolerance, Point from) {
        Optional<Snap> s = nearest(intersections, q, tolerance, Kind.INTERSECTION);
        if (s.isPresent()) {
            return s.get();
        }
        s = nearest(columns, q, tolerance, Kind.COLUMN);
        if (s.isPresent()) {
            return s.get();
        }
        List<Point> ends = new ArrayList<>();
        List<Point> mids = new ArrayList<>();
        for (Segment m : members) {
            ends.add(m.a());
            ends.add(m.b());
            mids.add(new Point((m.a().x() + m.b().x()) / 2, (m.a().y() + m.b().y()) / 2));
        }
        s = nearest(ends, q, tolerance, Kind.END);
        if (s.isPresent()) {
            return s.get();
        }
        s = nearest(mids, q, tolerance, Kind.MIDPOINT);
        if (s.isPresent()) {
            return s.get();
        }
        if (from != null) {
            List<Point> feet = new ArrayList<>();
            for (Segment m : members) {
                foot(from, m).ifPresent(feet::add);
            }
            s = nearest(feet, q, tolerance, Kind.PERPENDICULAR);
            if (s.isPresent()) {
                return s.get();
            }
        }
        GridLine best = null;
        double bestD = tolerance;
        for (GridLine g : grid) {
            double d = Math.abs((g.axis() == GridLine.Axis.X ? q.x() : q.y()) - g.offset());
            if (d <= bestD) {
                bestD = d;
                best = g;
            }
        }
        if (best != null) {
            return best.axis() == GridLine.Axis.X ? new Snap(new Point(best.offset(), round(q.y())), Kind.ON_GRID)
                    : new Snap(new Point(round(q.x()), best.offset()), Kind.ON_GRID);
        }
        return new Snap(new Point(round(q.x()), round(q.y())), Kind.FREE);
    }

    private double round(double v) {
        return precision > 0 ? Math.round(v / precision) * precision : v;
    }

    private static Optional<Snap> nearest(List<Point> pts, Point q, double tol, Kind kind) {
        Point best = null;
        double bestD = tol;
        for (Point p : pts) {
            double d = p.distance(q);
            if (d <= bestD) {
                bestD = d;
                best = p;
            }
        }
        return best == null ? Optional.empty() : Optional.of(new Snap(best, kind));
    }

    /** The foot of the perpendicular from {@code p} onto a member, when it falls within the member. */
    static Optional<Point> foot(Point p, Segment m) {
        double dx = m.b().x() - m.a().x();
        double dy = m.b().y() - m.a().y();
        double len2 = dx * dx + dy * dy;
        if (len2 == 0) {
            return Optional.empty();
        }
        double t = ((p.x() - m.a().x()) * dx + (p.y() - m.a().y()) * dy) / len2;
        if (t <= 1e-9 || t >= 1 - 1e-9) {
            return Optional.empty();
        }
        return Optional.of(new Point(m.a().x() + t * dx, m.a().y() + t * dy));
    }
}
