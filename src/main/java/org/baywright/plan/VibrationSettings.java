package org.baywright.plan;

/**
 * The inputs of the floor-vibration check from walking (AISC Design Guide 11, 2nd ed.; the design code is
 * {@code design.dg11}) that a plan sets: what the floors are used for, how they are fitted out (which sets the
 * damping), and the live load a vibration analysis uses ({@link DesignSettings#vibration()}; a plan without
 * them takes {@link #defaults()}: offices, a paper office, the occupancy's vibration live load). The plan-file keys: {@code settings.vibration.use} ({@code offices}, {@code residences}, {@code quiet-areas},
 * {@code shopping-malls}, {@code indoor-footbridges}, {@code outdoor-footbridges}), {@code settings.vibration.fitOut}
 * ({@code electronic-office}, {@code paper-office}, {@code full-height-partitions}, {@code shopping-mall},
 * {@code footbridge}), {@code settings.vibration.damping} (a number) and {@code settings.vibration.live} (an
 * area load such as {@code "11psf"}); each absent means the default.
 *
 * @param use what the floors are used for (sets the tolerance limit a_o/g and the walking force)
 * @param fitOut how the floors are fitted out (sets the damping ratio β), or null for the use's usual fit-out
 *     ({@link Use#usualFitOut()})
 * @param damping a damping ratio β given instead of the fit-out's, or NaN for none
 * @param live the live load of a vibration analysis, Pa, or NaN for the use's (11 psf offices, 6 psf residences;
 *     DG11 2nd ed. §4.1, from memory)
 */
public record VibrationSettings(Use use, FitOut fitOut, double damping, double live) {

    /** What a floor is used for, as DG11 2nd ed. Table 4-1 lists it (from memory). */
    public enum Use {
        OFFICES, RESIDENCES, QUIET_AREAS, SHOPPING_MALLS, INDOOR_FOOTBRIDGES, OUTDOOR_FOOTBRIDGES;

        /**
         * The fit-out assumed when none is given: a paper office for offices, full-height partitions for
         * residences and quiet areas (churches, schools), a shopping mall and a footbridge for the others
         * (DG11 2nd ed. §4.1 guidance, from memory and approximate).
         */
        public FitOut usualFitOut() {
            return switch (this) {
                case OFFICES -> FitOut.PAPER_OFFICE;
                case RESIDENCES, QUIET_AREAS -> FitOut.FULL_HEIGHT_PARTITIONS;
                case SHOPPING_MALLS -> FitOut.SHOPPING_MALL;
                case INDOOR_FOOTBRIDGES, OUTDOOR_FOOTBRIDGES -> FitOut.FOOTBRIDGE;
            };
        }
    }

    /** How a floor is fitted out, which sets its damping (DG11 2nd ed. §4.1, from memory). */
    public enum FitOut {
        ELECTRONIC_OFFICE, PAPER_OFFICE, FULL_HEIGHT_PARTITIONS, SHOPPING_MALL, FOOTBRIDGE
    }

    public VibrationSettings {
        if (use == null) {
            throw new IllegalArgumentException("vibration settings: the use is required");
        }
        if (!Double.isNaN(damping) && !(damping > 0 && damping < 1)) {
            throw new IllegalArgumentException("vibration settings: the damping ratio must be between 0 and 1, got " + damping);
        }
        if (!Double.isNaN(live) && !(live >= 0 && Double.isFinite(live))) {
            throw new IllegalArgumentException("vibration settings: the vibration live load must be 0 or more, got " + live);
        }
    }

    /** Offices, the usual fit-out (a paper office), the damping and live load that go with them. */
    public static VibrationSettings defaults() {
        return new VibrationSettings(Use.OFFICES, null, Double.NaN, Double.NaN);
    }

    /** The fit-out that counts: the one given, else the use's usual one. */
    public FitOut effectiveFitOut() {
        return fitOut != null ? fitOut : use.usualFitOut();
    }

    /** These settings for another use. */
    public VibrationSettings withUse(Use u) {
        return new VibrationSettings(u, fitOut, damping, live);
    }

    /** These settings with another fit-out (null: the use's usual one). */
    public VibrationSettings withFitOut(FitOut f) {
        return new VibrationSettings(use, f, damping, live);
    }

    /** These settings with a damping ratio given (NaN: by the fit-out). */
    public VibrationSettings withDamping(double beta) {
        return new VibrationSettings(use, fitOut, beta, live);
    }

    /** These settings with a vibration live load given, Pa (NaN: by the use). */
    public VibrationSettings withLive(double pa) {
        return new VibrationSettings(use, fitOut, damping, pa);
    }
}
