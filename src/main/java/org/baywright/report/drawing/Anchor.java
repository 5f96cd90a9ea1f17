package org.baywright.report.drawing;

/**
 * Which point of a text its position names: along the text (start, middle, end, in reading direction)
 * and across it (baseline, centre of the capitals, top of the capitals).
 */
public enum Anchor {
    START_BASELINE(0, 0), MIDDLE_BASELINE(0.5, 0), END_BASELINE(1, 0),
    START_CENTRE(0, 0.5), MIDDLE_CENTRE(0.5, 0.5), END_CENTRE(1, 0.5),
    START_TOP(0, 1), MIDDLE_TOP(0.5, 1), END_TOP(1, 1);

    /** Height of the capitals of the drawing font (DejaVu Sans), as a fraction of the text size. */
    public static final double CAP_HEIGHT = 0.729;

    private final double along;
    private final double across;

    Anchor(double along, double across) {
        this.along = along;
        this.across = across;
    }

    /** 0 start, 0.5 middle, 1 end. */
    public double along() {
        return along;
    }

    /** 0 baseline, 0.5 centre of the capitals, 1 top of the capitals. */
    public double across() {
        return across;
    }

    /** How far the baseline lies below the anchor point, for a text of this size, paper mm. */
    public double baselineDrop(double size) {
        return across * CAP_HEIGHT * size;
    }
}
