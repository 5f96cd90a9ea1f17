package org.baywright.plan;

/**
 * Service load values per load case of one load item, in canonical SI: Pa for area loads, N/m for
 * line loads, N for point loads. Superimposed dead load is dead load (D) in the combinations; the
 * partition allowance is live load (reducible) unless the plan's settings carry it as dead load.
 *
 * @param dead D (structure: slab, deck; not the framing, whose self-weight the run adds)
 * @param superimposed SD (ceiling, services, finishes)
 * @param live L, floor live load
 * @param roofLive Lr
 * @param snow S
 * @param partition partition allowance (ASCE 7-16 §4.3.2)
 */
public record LoadValues(double dead, double superimposed, double live, double roofLive, double snow, double partition) {
    public static final LoadValues ZERO = new LoadValues(0, 0, 0, 0, 0, 0);

    public LoadValues {
        for (double v : new double[] {dead, superimposed, live, roofLive, snow, partition}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("load values must be finite numbers");
            }
        }
    }

    public LoadValues plus(LoadValues o) {
        return new LoadValues(dead + o.dead, superimposed + o.superimposed, live + o.live, roofLive + o.roofLive,
                snow + o.snow, partition + o.partition);
    }

    public LoadValues scaled(double f) {
        return new LoadValues(dead * f, superimposed * f, live * f, roofLive * f, snow * f, partition * f);
    }

    public boolean isZero() {
        return dead == 0 && superimposed == 0 && live == 0 && roofLive == 0 && snow == 0 && partition == 0;
    }
}
