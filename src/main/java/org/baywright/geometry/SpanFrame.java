package org.baywright.geometry;

import org.baywright.plan.Point;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * The frame of one deck: plan coordinates rotated so that the deck spans along the first axis.
 * {@code u} runs along the span (the ribs), {@code v} across it. In JTS geometries of this frame the
 * x ordinate holds u and the y ordinate holds v. Multiples of 90° rotate exactly.
 */
final class SpanFrame {
    private final double cos;
    private final double sin;

    private SpanFrame(double cos, double sin) {
        this.cos = cos;
        this.sin = sin;
    }

    /** The frame of a deck spanning at {@code degrees} counter-clockwise from the plan x axis. */
    static SpanFrame ofDegrees(double degrees) {
        double a = degrees % 360.0;
        if (a < 0) {
            a += 360.0;
        }
        if (a == 0.0) {
            return new SpanFrame(1, 0);
        } else if (a == 90.0) {
            return new SpanFrame(0, 1);
        } else if (a == 180.0) {
            return new SpanFrame(-1, 0);
        } else if (a == 270.0) {
            return new SpanFrame(0, -1);
        }
        double r = Math.toRadians(a);
        return new SpanFrame(Math.cos(r), Math.sin(r));
    }

    double u(double x, double y) {
        return x * cos + y * sin;
    }

    double v(double x, double y) {
        return -x * sin + y * cos;
    }

    double u(Point p) {
        return u(p.x(), p.y());
    }

    double v(Point p) {
        return v(p.x(), p.y());
    }

    /** The plan point of frame coordinates {@code (u, v)}. */
    Point toPlan(double u, double v) {
        return new Point(u * cos - v * sin, u * sin + v * cos);
    }

    /** |sin| of the angle between the span and a plan direction {@code (dx, dy)} of length {@code length}. */
    double crossFactor(double dx, double dy, double length) {
        return Math.abs(v(dx, dy)) / length;
    }

    /** A copy of a plan geometry in this frame, built by {@code factory}. */
    Geometry toFrame(Geometry g, GeometryFactory factory) {
        return transform(g, factory, true);
    }

    /** A copy of a frame geometry in plan coordinates, built by {@code factory}. */
    Geometry toPlan(Geometry g, GeometryFactory factory) {
        return transform(g, factory, false);
    }

    private Geometry transform(Geometry g, GeometryFactory factory, boolean forward) {
        Geometry t = factory.createGeometry(g);
        t.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                double x = seq.getX(i);
                double y = seq.getY(i);
                if (forward) {
                    seq.setOrdinate(i, 0, u(x, y));
                    seq.setOrdinate(i, 1, v(x, y));
                } else {
                    seq.setOrdinate(i, 0, x * cos - y * sin);
                    seq.setOrdinate(i, 1, x * sin + y * cos);
                }
            }

            @Override
            public boolean isDone() {
                return false;
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        t.geometryChanged();
        return t;
    }
}
