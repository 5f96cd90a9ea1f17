package org.baywright.geometry;

import org.baywright.plan.Point;

/**
 * A member accepted by the analysis: its ends snapped to the tolerance grid.
 *
 * @param index position in the analysis' member list
 */
record PlacedMember(int index, String id, Point a, Point b, double length) {

    /** The position along the member of the point nearest to {@code p}, clamped to the member, m. */
    double project(Point p) {
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        double s = ((p.x() - a.x()) * dx + (p.y() - a.y()) * dy) / length;
        return Math.max(0, Math.min(length, s));
    }

    /** The point at {@code s} along the member. */
    Point at(double s) {
        double t = s / length;
        return new Point(a.x() + t * (b.x() - a.x()), a.y() + t * (b.y() - a.y()));
    }

    /** Signed distance of {@code p} from the member's line (left positive), m. */
    double offset(Point p) {
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        return (dx * (p.y() - a.y()) - dy * (p.x() - a.x())) / length;
    }
}
