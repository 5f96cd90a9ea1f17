package org.baywright.plan;

import java.util.List;
import java.util.Optional;

/**
 * A Baywright plan: the building's grid, levels, floor layouts, columns and design basis. Immutable; an
 * edit produces a new plan.
 *
 * @param name project name
 * @param units the unit system the user works in ("us" or "si"); values are SI regardless
 */
public record Plan(String name, String units, DesignSettings settings, List<GridLine> grid, List<Level> levels,
        List<Floor> floors, List<Column> columns) {
    public Plan {
        grid = List.copyOf(grid);
        levels = List.copyOf(levels);
        floors = List.copyOf(floors);
        columns = List.copyOf(columns);
    }

    public Optional<Floor> floor(String id) {
        return floors.stream().filter(f -> f.id().equals(id)).findFirst();
    }

    public Optional<GridLine> gridLine(String label) {
        return grid.stream().filter(g -> g.label().equals(label)).findFirst();
    }
}
