package org.baywright.plan;

/**
 * Infill beams filling a rectangular bay between two pairs of grid lines, spanning in one direction
 * between the girders on the bay's sides; by count or by maximum spacing.
 *
 * @param id e.g. "IF-A1"
 * @param x0 label of the west grid line of the bay
 * @param x1 label of the east grid line
 * @param y0 label of the south grid line
 * @param y1 label of the north grid line
 * @param direction the direction the beams span: X (east–west) or Y (north–south)
 * @param count number of beams (≥ 1), or 0 when {@code maxSpacing} governs
 * @param maxSpacing largest spacing between beams, m (used when count is 0)
 */
public record Infill(String id, String x0, String x1, String y0, String y1, GridLine.Axis direction, int count,
        double maxSpacing) {
}
