package org.baywright.analysis;

/**
 * A concentrated force on a span.
 *
 * @param position x of the load from the left support, m; must be finite here, and
 *                 {@link SimpleSpan#of} checks {@code 0 <= position <= length}
 * @param force    the force, N, downward positive; must be finite
 */
public record PointLoad(double position, double force) implements SpanLoad {

    public PointLoad {
        if (!Double.isFinite(position)) {
            throw new IllegalArgumentException("PointLoad.position must be a finite number of metres, was " + position);
        }
        if (!Double.isFinite(force)) {
            throw new IllegalArgumentException("PointLoad.force must be a finite number of newtons, was " + force);
        }
    }

    @Override
    public PointLoad scaled(double factor) {
        return new PointLoad(position, force * Polynomials.checkFactor(factor));
    }

    @Override
    public double total() {
        return force;
    }
}
