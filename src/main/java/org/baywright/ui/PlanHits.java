package org.baywright.ui;

import java.util.List;
import java.util.Optional;
import org.baywright.plan.Point;

/** Hit-testing on the plan, in plan units (metres): what lies under the pointer. */
public final class PlanHits {
    /** How close to a member the pointer must be to pick it, in pixels. */
    public static final double TOLERANCE_PX = 6;

    private PlanHits() {
    }

    /** A line on the plan that can be picked. */
    public record Segment(String id, Point start, Point end) {
    }

    /** Distance from a point to a segment, m. */
    public static double distance(double px, double py, Point a, Point b) {
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : ((px - a.x()) * dx + (py - a.y()) * dy) / len2;
        t = Math.max(0, Math.min(1, t));
        return Math.hypot(px - (a.x() + t * dx), py - (a.y() + t * dy));
    }

    /**
     * The segment nearest the plan point (px, py) within {@code tolerance} metres, or empty. Ties go to
     * the segment listed first.
     */
    public static Optional<Segment> nearest(List<Segment> segments, double px, double py, double tolerance) {
        Segment best = null;
        double bestD = tolerance;
        for (Segment s : segments) {
            double d = distance(px, py, s.start(), s.end());
            if (d < bestD || best == null && d <= tolerance) {
                best = s;
                bestD = d;
            }
        }
        return Optional.ofNullable(best);
    }
}
