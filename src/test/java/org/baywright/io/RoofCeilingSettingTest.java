package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.plan.RoofCeiling;
import org.junit.jupiter.api.Test;

/**
 * A roof layout's "ceiling" (what its members carry below them, which chooses their IBC Table 1604.3 roof
 * row): written only when set, read back, absent → the default (non-plaster), and located problems for a
 * bad value or a ceiling on a layout that is not a roof.
 */
class RoofCeilingSettingTest {

    private static String roofId(Plan p) {
        return p.floors().stream().filter(Floor::roof).map(Floor::id).findFirst().orElseThrow();
    }

    private static Plan withCeiling(RoofCeiling c) {
        Plan p = SamplePlans.twoBay();
        return new Plan(p.name(), p.units(), p.settings().withRoofCeiling(roofId(p), c), p.grid(), p.levels(), p.floors(),
                p.columns());
    }

    @Test
    void theCeilingRoundTripsThroughAFile() {
        String plaster = PlanFiles.write(withCeiling(RoofCeiling.PLASTER));
        String none = PlanFiles.write(withCeiling(RoofCeiling.NONE));
        String plain = PlanFiles.write(SamplePlans.twoBay());
        String id = roofId(SamplePlans.twoBay());
        assertAll(
                () -> assertTrue(plaster.contains("\"roof\": true, \"ceiling\": \"plaster\"")
                        || plaster.contains("\"ceiling\": \"plaster\""), plaster),
                () -> assertEquals(RoofCeiling.PLASTER,
                        PlanFiles.read(plaster, "p.bay.json").plan().orElseThrow().settings().roofCeiling(id)),
                () -> assertEquals(RoofCeiling.NONE, PlanFiles.read(none, "n.bay.json").plan().orElseThrow().settings().roofCeiling(id)),
                () -> assertFalse(plain.contains("\"ceiling\""), "not written when the plan sets none"),
                () -> assertEquals(RoofCeiling.NON_PLASTER,
                        PlanFiles.read(plain, "d.bay.json").plan().orElseThrow().settings().roofCeiling(id),
                        "absent: the default, a non-plaster ceiling"),
                () -> assertEquals(PlanFiles.write(PlanFiles.read(plaster, "p.bay.json").plan().orElseThrow()), plaster,
                        "writing what was read gives the same text"));
    }

    @Test
    void aBadValueIsALocatedProblem() {
        String text = PlanFiles.write(withCeiling(RoofCeiling.PLASTER)).replace("\"ceiling\": \"plaster\"",
                "\"ceiling\": \"gypsum\"");
        List<Problem> problems = PlanFiles.read(text, "bad.bay.json").problems();
        assertEquals(1, problems.size(), problems::toString);
        Problem p = problems.get(0);
        assertAll(() -> assertEquals("bad-value", p.kind()),
                () -> assertTrue(p.location().matches("/floors/\\d+/ceiling"), p.location()),
                () -> assertTrue(p.message().contains("\"plaster\"") && p.message().contains("\"non-plaster\"")
                        && p.message().contains("\"none\""), p.message()));
    }

    @Test
    void aCeilingOnAFloorThatIsNotARoofIsALocatedProblem() {
        String text = PlanFiles.write(SamplePlans.twoBay()).replaceFirst("\"roof\": false", "\"roof\": false, \"ceiling\": \"none\"");
        List<Problem> problems = PlanFiles.read(text, "floor.bay.json").problems();
        assertEquals(1, problems.size(), problems::toString);
        assertAll(() -> assertEquals("bad-value", problems.get(0).kind()),
                () -> assertTrue(problems.get(0).message().contains("not a roof"), problems.get(0).message()));
    }
}
