package org.baywright.takedown;

import java.util.List;
import java.util.Map;
import org.baywright.plan.Problem;

/**
 * What designing one floor layout (with the columns present under it) produces, shared read-only by
 * every level that uses the layout and, through a {@link FloorCache}, by other runs.
 *
 * @param members the members in the order they were designed
 * @param columnLoads column id → loads delivered by this floor's members, by component, N
 * @param columnArea column id → A_T delivered, m²
 * @param columnL0 column id → the largest live intensity delivered, by component (for ASCE 7-16 §4.7.3)
 * @param loadedArea the floor's loaded area, m²
 * @param areaLoadAreas area load id → the part of it on the loaded floor, m²
 * @param problems the floor's problems in the order found
 * @param columnReactions column id → each member's reaction on it with the plan direction from the column to the
 *     member (for the moments of the connection eccentricities)
 */
public record FloorDesign(List<MemberResult> members, Map<String, double[]> columnLoads, Map<String, Double> columnArea,
        Map<String, double[]> columnL0, double loadedArea, Map<String, Double> areaLoadAreas, List<Problem> problems,
        Map<String, List<ColumnReaction>> columnReactions) {

    /**
     * One member's reaction on a column.
     *
     * @param dx plan direction from the column to the member, x component (unit vector)
     * @param dy y component
     * @param loads the reaction by {@link Component}, unreduced, N
     */
    public record ColumnReaction(String member, double dx, double dy, double[] loads) {
    }

    /** A floor design without the reactions' directions (no column moments). */
    public FloorDesign(List<MemberResult> members, Map<String, double[]> columnLoads, Map<String, Double> columnArea,
            Map<String, double[]> columnL0, double loadedArea, Map<String, Double> areaLoadAreas, List<Problem> problems) {
        this(members, columnLoads, columnArea, columnL0, loadedArea, areaLoadAreas, problems, Map.of());
    }
}
