package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.plan.Floor;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Point;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** A new plan has nothing wrong with it before anything is drawn, and its slab edge follows the grid. */
class NewPlanProblemsTest {
    private static final double FT = Units.FT_.toSi(1);

    @Test
    void anEmptyNewPlanHasNoProblems() {
        for (UnitSystem us : UnitSystem.values()) {
            EditorModel m = new EditorModel(TaskRunner.direct());
            m.newPlan("Sketch", us, 2, 13 * FT);
            assertNotNull(m.run(), "the empty plan is run");
            assertEquals(List.of(), List.copyOf(m.problems()), us + ": an empty plan has no problems");
        }
    }

    @Test
    void theSlabEdgeFollowsTheGridUntilOneIsDrawn() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        m.newPlan("Sketch", UnitSystem.US, 1, 13 * FT);
        assertTrue(m.edit(p -> PlanEdits.withGrid(p, List.of(30 * FT, 30 * FT), List.of(25 * FT), true, PlanEdits.OFFICE_FLOOR),
                "Grid set"));
        assertEquals(rounded(List.of(new Point(0, 0), new Point(60 * FT, 0), new Point(60 * FT, 25 * FT), new Point(0, 25 * FT))),
                corners(m.currentFloor().orElseThrow()));
        // a wider grid: the slab edge goes with it
        assertTrue(m.edit(p -> PlanEdits.withGrid(p, List.of(30 * FT, 30 * FT, 20 * FT), List.of(25 * FT, 25 * FT), true,
                PlanEdits.OFFICE_FLOOR), "Grid set"));
        assertEquals(rounded(List.of(new Point(0, 0), new Point(80 * FT, 0), new Point(80 * FT, 50 * FT), new Point(0, 50 * FT))),
                corners(m.currentFloor().orElseThrow()));
    }

    private static List<Point> corners(Floor f) {
        return rounded(f.slabEdge().vertices());
    }

    private static List<Point> rounded(List<Point> ps) {
        return ps.stream().map(p -> new Point(round(p.x()), round(p.y()))).toList();
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }
}
