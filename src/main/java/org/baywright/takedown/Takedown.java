package org.baywright.takedown;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.baywright.load.LiveLoadReduction;
import org.baywright.plan.Framing;
import org.baywright.plan.Problem;
import org.baywright.units.Units;

/**
 * The load takedown of a plan: deck load to the members by tributary area, each member sized before its
 * reactions pass on (its own weight included), reactions onto the members or columns that support
 * it, columns stacked level over level to the foundations. The stages, run in order by {@code
 * run.PlanRun}:
 *
 * <ol>
 *   <li>{@link ExpandedPlan}: the levels, the floor layout and columns present at each, infills expanded
 *       into beams; each distinct layout with its columns once;</li>
 *   <li>{@link FloorAreas}: per layout, the tributary areas of its members;</li>
 *   <li>{@link SupportGraph}: per layout, what supports each member end and the order of design;</li>
 *   <li>{@link FloorDesigner}: per layout, the members designed in that order, reactions passed on;</li>
 *   <li>{@link ColumnLines}: the columns summed from the top down and sized tier by tier;</li>
 *   <li>{@link Foundations}: the reactions on the foundations;</li>
 *   <li>{@link EquilibriumCheck}: applied loads against the foundation reactions per load case.</li>
 * </ol>
 *
 * <p>A typical floor is designed once and its results serve every level that uses it; columns differ
 * per level and are summed from the top down. Stages 2–4 of a layout may come from a {@link FloorCache}.
 *
 * <p>Live load: reactions pass on unreduced, per component ({@link Component}); every member and column
 * reduces by its own A_T and K_LL (ASCE 7-16 §4.7, §4.8). A member's A_T is the deck area whose load
 * it receives: its own tributary area plus the shares of the members framing into it (the
 * {@code girderArea = "delivered"} choice), or for girders, optionally, half the bay on each side.
 *
 * <p>Invariants checked on every run, as located problems: every member supported; no support cycle;
 * tributary coverage (from the geometry); equilibrium per load case between everything applied and the
 * foundation reactions, to {@link Equilibrium#TOLERANCE}.
 */
public final class Takedown {
    /** Grid of the tributary analysis: coordinates are snapped to it, m. */
    public static final double GRID = 1e-6;
    /** Coincidence tolerance for supports, m. */
    public static final double TOLERANCE = 1e-3;
    /** Distance beyond a member or column at which the slab counts as a cantilever slab, m (1 ft). */
    public static final double CANTILEVER_SLAB = Units.FT_.toSi(1);
    /**
     * 100 psf (4.79 kN/m²): the live load above which §4.7.3 applies. The same limit as the reduction
     * itself uses ({@link LiveLoadReduction#HEAVY_LIVE_LOAD}), so that a load is never classed heavy here
     * and ordinary there (an assembly load of 4.79 kN/m² would otherwise be reduced as ordinary load).
     */
    public static final double HEAVY_LIVE = LiveLoadReduction.HEAVY_LIVE_LOAD;

    /** Most beams one infill may generate; an infill asking for more is reported and left out. */
    public static final int MAX_INFILL_BEAMS = Framing.MAX_INFILL_BEAMS;

    private Takedown() {
    }

    /**
     * The takedown's result from its stages: the members of each designed layout under its result key,
     * the layout key of each level, the columns with their foundations, the equilibrium, and every
     * problem in the order of the stages (the plan's, each layout's in the order of the levels, the
     * columns', the equilibrium's).
     *
     * @param designs the design of each of the plan's distinct layouts, in its order
     */
    public static TakedownResult result(ExpandedPlan plan, List<FloorDesign> designs, ColumnLines columns,
            Foundations foundations, EquilibriumCheck equilibrium) {
        List<Problem> problems = new ArrayList<>(plan.problems());
        for (FloorDesign d : designs) {
            problems.addAll(d.problems());
        }
        problems.addAll(columns.problems());
        problems.addAll(equilibrium.problems());
        Map<String, List<MemberResult>> members = new LinkedHashMap<>();
        Map<String, String> levelFloors = new LinkedHashMap<>();
        double floorArea = 0;
        for (ExpandedPlan.LevelFloor lf : plan.levels()) {
            if (lf.floor() < 0) {
                continue;
            }
            FloorDesign d = designs.get(lf.floor());
            members.putIfAbsent(lf.resultKey(), d.members());
            levelFloors.put(lf.level().name(), lf.resultKey());
            floorArea += d.loadedArea();
        }
        return new TakedownResult(members, levelFloors, foundations.columns(), equilibrium.cases(), List.copyOf(problems),
                floorArea);
    }
}
