package org.baywright.plan;

import java.util.List;
import java.util.Optional;

/**
 * A Baywright plan: the building's grid, levels, floor layouts, columns and design basis. Immutable; an
 * edit produces a new plan.
 *
 * @param name project name
 * @param units the unit system the user works in ("us" or "si"); values are SI regardless
 * @param notes the designer's notes on the plan, free text ("" for none): e.g. why a load departs from
 *     the office defaults, such as no partition allowance (ASCE 7-16 §4.3.2)
 */
public record Plan(String name, String units, DesignSettings settings, List<GridLine> grid, List<Level> levels,
        List<Floor> floors, List<Column> columns, String notes) {
    public Plan {
        grid = List.copyOf(grid);
        levels = List.copyOf(levels);
        floors = List.copyOf(floors);
        columns = List.copyOf(columns);
        notes = notes == null ? "" : notes;
    }

    /** A plan without notes. */
    public Plan(String name, String units, DesignSettings settings, List<GridLine> grid, List<Level> levels,
            List<Floor> floors, List<Column> columns) {
        this(name, units, settings, grid, levels, floors, columns, "");
    }

    /** The same plan with other notes. */
    public Plan withNotes(String text) {
        return new Plan(name, units, settings, grid, levels, floors, columns, text);
    }

    public Optional<Floor> floor(String id) {
        return floors.stream().filter(f -> f.id().equals(id)).findFirst();
    }

    public Optional<GridLine> gridLine(String label) {
        return grid.stream().filter(g -> g.label().equals(label)).findFirst();
    }
}
