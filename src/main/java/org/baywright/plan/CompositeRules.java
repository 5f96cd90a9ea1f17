package org.baywright.plan;

/**
 * The plan-wide rules of composite design.
 *
 * @param minDegree least degree of composite action, ΣQ_n over the full composite force (default 0.25:
 *     AISC 360-16 Commentary I3.2d, common practice)
 * @param studWeight the steel weight one stud is worth when sections and stud counts are compared, N
 *     (default 10 lb, common practice)
 * @param camber specify camber on unshored beams (default on)
 * @param camberShare the share of the wet-concrete deflection cambered out (default 0.8, common practice)
 * @param camberAllowance the steel weight a cambered piece is worth in the comparison, N (default 0)
 */
public record CompositeRules(double minDegree, double studWeight, boolean camber, double camberShare, double camberAllowance) {
    private static final double LB = 4.4482216152605;
    /** 25 %, 10 lb per stud, camber 80 %, no allowance per cambered piece. */
    public static final CompositeRules DEFAULT = new CompositeRules(0.25, 10 * LB, true, 0.8, 0);

    public CompositeRules {
        if (!(minDegree >= 0 && minDegree <= 1)) {
            throw new IllegalArgumentException("composite rules: the minimum degree of composite action must lie in [0, 1]");
        }
        if (!(studWeight >= 0) || !Double.isFinite(studWeight) || !(camberAllowance >= 0) || !Double.isFinite(camberAllowance)) {
            throw new IllegalArgumentException("composite rules: the stud and camber weights must be ≥ 0");
        }
        if (!(camberShare >= 0 && camberShare <= 1)) {
            throw new IllegalArgumentException("composite rules: the camber share must lie in [0, 1]");
        }
    }

    public boolean isDefault() {
        return equals(DEFAULT);
    }
}
