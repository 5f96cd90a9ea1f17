package org.baywright.plan;

/**
 * A concentrated load at a point of the plan (equipment, a hanger), delivered to the member it lies on
 * or through the deck.
 *
 * @param values per case, N
 */
public record PointLoadItem(String id, Point at, LoadValues values) {
}
