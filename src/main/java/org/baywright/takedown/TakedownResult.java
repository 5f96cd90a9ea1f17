package org.baywright.takedown;

import java.util.List;
import java.util.Map;
import org.baywright.plan.Problem;

/**
 * What a takedown produces: every member and column designed in order, the foundation reactions, the
 * equilibrium check per load case and every located problem.
 *
 * @param members by floor layout id, each floor's members in the order they were designed
 * @param levelFloors for each level name, the floor layout id at that level
 * @param floorArea total loaded floor area of all levels, m²
 */
public record TakedownResult(Map<String, List<MemberResult>> members, Map<String, String> levelFloors,
        List<ColumnResult> columns, List<Equilibrium> equilibrium, List<Problem> problems, double floorArea) {

    /** Total steel weight: every member at every level it occurs, plus the columns, N. */
    public double steelWeight() {
        double w = 0;
        for (String floor : levelFloors.values()) {
            for (MemberResult m : members.getOrDefault(floor, List.of())) {
                w += m.steelWeight();
            }
        }
        for (ColumnResult c : columns) {
            for (ColumnTier t : c.tiers()) {
                w += t.weight() * t.length();
            }
        }
        return w;
    }
}
