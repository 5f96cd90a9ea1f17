package org.baywright.report.drawing;

/**
 * Parallel-line hatching of a closed shape.
 *
 * @param pattern the families of lines
 * @param spacing distance between neighbouring lines of a family, paper mm
 * @param pen the hatch lines' pen
 */
public record Hatch(Pattern pattern, double spacing, Pen pen) {
    /** Families of hatch lines. */
    public enum Pattern {
        /** Lines at 45° (rising to the right). */
        DIAGONAL(45),
        /** Lines at 135° (falling to the right). */
        BACK_DIAGONAL(135),
        /** Both diagonals: cross-hatching. */
        CROSS(45, 135),
        /** Horizontal lines. */
        HORIZONTAL(0);

        private final double[] angles;

        Pattern(double... angles) {
            this.angles = angles;
        }

        /** Directions of the line families, degrees counter-clockwise from the paper's x axis. */
        public double[] angles() {
            return angles.clone();
        }
    }

    public Hatch {
        if (!(spacing > 0) || Double.isInfinite(spacing)) {
            throw new IllegalArgumentException("hatch spacing must be positive, got " + spacing);
        }
    }
}
