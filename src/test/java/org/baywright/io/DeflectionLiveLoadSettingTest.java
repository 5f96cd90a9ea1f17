package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.junit.jupiter.api.Test;

/** settings.deflectionLiveLoad: written, read back, optional with default "unreduced", a bad value located. */
class DeflectionLiveLoadSettingTest {

    private static Plan withSetting(boolean reduced) {
        Plan p = SamplePlans.twoBay();
        return new Plan(p.name(), p.units(), p.settings().withDeflectionLiveReduced(reduced), p.grid(), p.levels(), p.floors(),
                p.columns());
    }

    @Test
    void theSettingRoundTripsThroughAFile() {
        String reduced = PlanFiles.write(withSetting(true));
        String unreduced = PlanFiles.write(withSetting(false));
        assertAll(
                () -> assertTrue(reduced.contains("\"deflectionLiveLoad\": \"reduced\""), reduced),
                () -> assertTrue(unreduced.contains("\"deflectionLiveLoad\": \"unreduced\""), unreduced),
                () -> assertTrue(PlanFiles.read(reduced, "r.bay.json").plan().orElseThrow().settings().deflectionLiveReduced()),
                () -> assertFalse(PlanFiles.read(unreduced, "u.bay.json").plan().orElseThrow().settings().deflectionLiveReduced()));
    }

    @Test
    void aFileWithoutTheKeyReadsAsUnreduced() {
        String text = PlanFiles.write(withSetting(true)).replace("    \"deflectionLiveLoad\": \"reduced\",\n", "");
        assertFalse(text.contains("deflectionLiveLoad"));
        PlanReadResult r = PlanFiles.read(text, "old.bay.json");
        assertFalse(r.plan().orElseThrow().settings().deflectionLiveReduced());
    }

    @Test
    void aBadValueIsALocatedProblem() {
        String text = PlanFiles.write(withSetting(false)).replace("\"deflectionLiveLoad\": \"unreduced\"",
                "\"deflectionLiveLoad\": \"half\"");
        PlanReadResult r = PlanFiles.read(text, "bad.bay.json");
        List<Problem> problems = r.problems();
        assertEquals(1, problems.size(), problems::toString);
        Problem p = problems.get(0);
        assertAll(() -> assertEquals("bad-value", p.kind()),
                () -> assertEquals("/settings/deflectionLiveLoad", p.location()),
                () -> assertTrue(p.message().contains("\"unreduced\"") && p.message().contains("\"reduced\""), p.message()),
                () -> assertTrue(p.message().contains("half"), p.message()));
    }
}
