package org.baywright.plan;

/** A point on the plan, metres; x to the east (right on the drawing), y to the north (up). */
public record Point(double x, double y) {
    public Point {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("plan coordinates must be finite numbers, got (" + x + ", " + y + ")");
        }
    }

    public double distance(Point o) {
        return Math.hypot(o.x - x, o.y - y);
    }
}
