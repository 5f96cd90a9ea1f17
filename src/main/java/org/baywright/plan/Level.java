package org.baywright.plan;

/**
 * A level of the building, bottom to top in the plan's list. Several levels may share one floor layout
 * (a typical floor).
 *
 * @param name e.g. "Level 2", "Roof"
 * @param elevation top of steel, m
 * @param storeyHeight height of the storey below this level (the column tier's unbraced length), m
 * @param floor id of the {@link Floor} layout at this level
 */
public record Level(String name, double elevation, double storeyHeight, String floor) {
}
