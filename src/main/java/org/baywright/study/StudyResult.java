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
     * (0 = none), best first; ties keep study order.
     */
    public List<VariantResult> best(Objective objective, double depthLimit, int n) {
        return sound().stream().filter(v -> depthLimit <= 0 || v.structuralDepth() <= depthLimit + SearchLimits.DEPTH_ROUNDING)
                .sorted(Comparator.comparingDouble(objective::score).thenComparingInt(VariantResult::index)).limit(n).toList();
    }
}
