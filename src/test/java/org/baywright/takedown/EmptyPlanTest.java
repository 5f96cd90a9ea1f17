package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.junit.jupiter.api.Test;

/** Plans stripped of levels or columns (found by the file fuzz test) give located problems, never an exception. */
class EmptyPlanTest {
    private static Plan demo() {
        return PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow();
    }

    @Test
    void noLevels() {
        Plan p = demo();
        RunResult r = PlanRun.run(new Plan(p.name(), p.units(), p.settings(), p.grid(), List.of(), p.floors(), p.columns()));
        assertTrue(r.problems().stream().anyMatch(x -> x.kind().equals("no-levels")), r.problems().toString());
    }

    @Test
    void noColumns() {
        Plan p = demo();
        RunResult r = PlanRun.run(new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), p.floors(), List.of()));
        assertTrue(r.problems().stream().anyMatch(x -> x.kind().equals("unsupported-member")), "members find no column");
    }
}
