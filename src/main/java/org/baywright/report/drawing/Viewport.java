package org.baywright.report.drawing;

/**
 * How the plan sits on the paper: a plan point maps to
 * {@code paperOrigin + (p − planOrigin) × 1000 / denominator}, both spaces with y up.
 *
 * @param denominator the scale's denominator (1:denominator)
 * @param planOrigin a plan point, m
 * @param paperOrigin where that point sits on the paper, mm
 */
public record Viewport(double denominator, Pt planOrigin, Pt paperOrigin) {
    public Viewport {
        if (!(denominator > 0)) {
            throw new IllegalArgumentException("scale denominator must be positive");
        }
    }

    /** Paper position of a plan point, mm. */
    public Pt toPaper(Pt plan) {
        double k = 1000.0 / denominator;
        return new Pt(paperOrigin.x() + (plan.x() - planOrigin.x()) * k, paperOrigin.y() + (plan.y() - planOrigin.y()) * k);
    }

    /** Plan position of a paper point, m. */
    public Pt toPlan(Pt paper) {
        double k = denominator / 1000.0;
        return new Pt(planOrigin.x() + (paper.x() - paperOrigin.x()) * k, planOrigin.y() + (paper.y() - paperOrigin.y()) * k);
    }

    /** Plan metres represented by one paper millimetre. */
    public double metresPerMm() {
        return denominator / 1000.0;
    }
}
