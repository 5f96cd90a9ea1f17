package org.baywright.plan;

/**
 * A grid line of the orthogonal grid: lettered lines run north–south and sit at an x coordinate;
 * numbered lines run east–west and sit at a y coordinate (drafting habit; the labels are the user's).
 *
 * @param label e.g. "A" or "1"
 * @param axis which coordinate the line fixes
 * @param offset that coordinate, m
 */
public record GridLine(String label, Axis axis, double offset) {
    /** The coordinate a grid line fixes. */
    public enum Axis {
        /** A line of constant x (runs north–south). */
        X,
        /** A line of constant y (runs east–west). */
        Y
    }
}
