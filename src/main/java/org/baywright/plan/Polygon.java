package org.baywright.plan;

import java.util.List;

/**
 * A simple polygon on the plan given by its vertices in order (either orientation), not repeating the
 * first vertex at the end. Validity (no self-intersection, non-zero area) is checked by
 * {@code PlanValidator} and the geometry package, which report located problems.
 */
public record Polygon(List<Point> vertices) {
    public Polygon {
        vertices = List.copyOf(vertices);
    }

    /** An axis-aligned rectangle. */
    public static Polygon rectangle(double x0, double y0, double x1, double y1) {
        return new Polygon(List.of(new Point(x0, y0), new Point(x1, y0), new Point(x1, y1), new Point(x0, y1)));
    }

    /** Signed area by the shoelace formula, m² (positive when counter-clockwise). */
    /**
     * Whether the point (x, y) lies inside, by the even–odd rule (points on the boundary may fall either
     * way). The one point-in-polygon test of the program: the editor, the takedown and the drawing call it.
     */
    public boolean contains(double x, double y) {
        boolean in = false;
        for (int i = 0, j = vertices.size() - 1; i < vertices.size(); j = i++) {
            Point a = vertices.get(i);
            Point b = vertices.get(j);
            if ((a.y() > y) != (b.y() > y) && x < (b.x() - a.x()) * (y - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }

    public double signedArea() {
        double a = 0;
        int n = vertices.size();
        for (int i = 0; i < n; i++) {
            Point p = vertices.get(i);
            Point q = vertices.get((i + 1) % n);
            a += p.x() * q.y() - q.x() * p.y();
        }
        return a / 2;
    }
}
