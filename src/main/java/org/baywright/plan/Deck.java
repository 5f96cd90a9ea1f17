package org.baywright.plan;

/**
 * A deck area spanning one way. Each point of it carries its load to the nearest supporting member on
 * each side along the span direction.
 *
 * @param id e.g. "DK-1"
 * @param outline the deck area
 * @param spanAngle direction of the deck span (ribs), degrees counter-clockwise from the x axis; 0 = ribs
 *     run east–west (so the deck spans onto north–south members), 90 = ribs run north–south
 */
public record Deck(String id, Polygon outline, double spanAngle) {
}
