package org.baywright.plan;

import java.util.Optional;

/**
 * A column line: a stack of column tiers at one plan position, from the foundation to {@code topLevel}.
 *
 * @param id e.g. "C-B2"
 * @param at plan position (usually a grid intersection)
 * @param grid the grid intersection label, e.g. "B-2" (may be empty)
 * @param topLevel name of the highest level the column reaches (empty = the top of the building)
 * @param fixedSection a size the user chose for every tier (checked, not searched), if any
 */
public record Column(String id, Point at, String grid, String topLevel, Optional<String> fixedSection) {
}
