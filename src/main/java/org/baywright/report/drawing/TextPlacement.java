package org.baywright.report.drawing;

/** Where a text's baseline starts on the paper, from its anchor, rotation and measured width. */
final class TextPlacement {
    private TextPlacement() {
    }

    /**
     * The start of the baseline, paper mm.
     *
     * @param at the anchor point on the paper
     * @param width the text's width, mm
     */
    static Pt baselineStart(Primitive.Text t, Pt at, double width) {
        double a = StrictMath.toRadians(t.rotation());
        double ux = StrictMath.cos(a);
        double uy = StrictMath.sin(a);
        double drop = t.anchor().baselineDrop(t.size());
        double along = t.anchor().along() * width;
        return new Pt(at.x() - ux * along + uy * drop, at.y() - uy * along - ux * drop);
    }

    /** The anchor point moved down onto the baseline (keeping its position along the text), paper mm. */
    static Pt onBaseline(Primitive.Text t, Pt at) {
        double a = StrictMath.toRadians(t.rotation());
        double drop = t.anchor().baselineDrop(t.size());
        return new Pt(at.x() + StrictMath.sin(a) * drop, at.y() - StrictMath.cos(a) * drop);
    }
}
