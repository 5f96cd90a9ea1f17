package org.baywright.plan;

/**
 * How the members of one floor layout work with its slab.
 *
 * @param mode composite, non-composite, or per member
 * @param shored true when the beams are shored while the concrete hardens (every load then acts on the
 *     composite section; no construction stage, no camber); false (the default) for unshored
 * @param constructionLive the construction live load on the bare steel while the concrete is placed, Pa
 *     (default 20 psf: ASCE/SEI 37, from memory; AISC Design Examples V15 use 25 psf)
 * @param sizeForVibration true when the floor's bays must meet the walking-vibration limit (AISC Design Guide 11)
 *     and their beams or girders are stiffened until they do; false when the check is only reported (files
 *     without the key)
 */
public record CompositeFloor(CompositeMode mode, boolean shored, double constructionLive, boolean sizeForVibration) {
    /** 20 psf, Pa. */
    public static final double DEFAULT_CONSTRUCTION_LIVE = 20 * 4.4482216152605 / (0.3048 * 0.3048);
    /** Bare steel: what a plan file without the setting means (files written before composite floors). */
    public static final CompositeFloor NONE = new CompositeFloor(CompositeMode.NON_COMPOSITE, false, DEFAULT_CONSTRUCTION_LIVE,
            false);
    /** Composite, unshored, 20 psf construction live load: what new plans start with. */
    public static final CompositeFloor DEFAULT = new CompositeFloor(CompositeMode.COMPOSITE, false, DEFAULT_CONSTRUCTION_LIVE,
            false);

    public CompositeFloor {
        if (mode == null) {
            throw new IllegalArgumentException("composite floor: the mode is required");
        }
        if (!(constructionLive >= 0) || !Double.isFinite(constructionLive)) {
            throw new IllegalArgumentException("composite floor: the construction live load must be ≥ 0, got " + constructionLive);
        }
    }

    /** A setting whose vibration check is only reported. */
    public CompositeFloor(CompositeMode mode, boolean shored, double constructionLive) {
        this(mode, shored, constructionLive, false);
    }

    /** True when member {@code m} with slab under it acts compositely on this floor. */
    public boolean composite(Member m) {
        return switch (mode) {
            case COMPOSITE -> m.composite().orElse(true);
            case NON_COMPOSITE -> false;
            case PER_MEMBER -> m.composite().orElse(false);
        };
    }

    public CompositeFloor withMode(CompositeMode m) {
        return new CompositeFloor(m, shored, constructionLive, sizeForVibration);
    }

    public CompositeFloor withShored(boolean s) {
        return new CompositeFloor(mode, s, constructionLive, sizeForVibration);
    }

    public CompositeFloor withConstructionLive(double q) {
        return new CompositeFloor(mode, shored, q, sizeForVibration);
    }

    public CompositeFloor withSizeForVibration(boolean on) {
        return new CompositeFloor(mode, shored, constructionLive, on);
    }
}
