package org.baywright.study;

import java.util.Comparator;
import java.util.List;

/**
 * What a study produced.
 *
 * @param variants the variants that finished, in study order (all of them unless cancelled)
 * @param total the number of variants in the study
 * @param cancelled true when the study was cancelled before every variant ran
 */
public record StudyResult(List<VariantResult> variants, int total, boolean cancelled) {
    public StudyResult {
        variants = List.copyOf(variants);
    }

    /** The variants that ran with every member sized and no error. */
    public List<VariantResult> sound() {
        return variants.stream().filter(VariantResult::sound).toList();
    }

    /** Pareto front of (weight per area, structural depth) over the sound variants, lightest first. */
    public List<VariantResult> weightDepthFront() {
        return Pareto.front(sound(), VariantResult::weightPerArea, VariantResult::structuralDepth);
    }

    /** Pareto front of (weight per area, piece count) over the sound variants, lightest first. */
    public List<VariantResult> weightPiecesFront() {
        return Pareto.front(sound(), VariantResult::weightPerArea, v -> v.pieces());
    }

    /**
     * The best {@code n} sound variants for an objective whose structural depth is within a limit
     * (0 = none), best first; ties keep study order. A variant that designs the same floor as an earlier one
     * is that floor again, so only the first of each group is listed.
     */
    public List<VariantResult> best(Objective objective, double depthLimit, int n) {
        return sound().stream().filter(v -> depthLimit <= 0 || v.structuralDepth() <= depthLimit + SearchLimits.DEPTH_ROUNDING)
                .filter(v -> sameFloorAs(v).isEmpty())
                .sorted(Comparator.comparingDouble(objective::score).thenComparingInt(VariantResult::index)).limit(n).toList();
    }

    /**
     * The first variant (lowest index) that designs the same floor as {@code v}, when it is not {@code v}
     * itself: a spacing sweep often gives the same beams for several spacings. Empty for the first of a group
     * and for a variant that did not run.
     */
    public java.util.OptionalInt sameFloorAs(VariantResult v) {
        if (v.floorKey().isEmpty()) {
            return java.util.OptionalInt.empty();
        }
        return variants.stream().filter(o -> o.floorKey().equals(v.floorKey())).mapToInt(VariantResult::index).min()
                .stream().filter(i -> i != v.index()).findFirst();
    }
}
