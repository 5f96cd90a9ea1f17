package org.baywright.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.takedown.BayResult;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;

/**
 * Sizing for walking vibration (AISC Design Guide 11, 2nd ed.): the demo's floors, which have bays above the
 * office limit of 0.5 %g when only checked, sized for it.
 */
class VibrationSizingTest {
    private static Plan demo(boolean size) {
        Plan p = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), p.floors().stream()
                .map(f -> f.roof() ? f : f.withComposite(f.composite().withSizeForVibration(size))).toList(), p.columns(), p.notes());
    }

    private static long exceeding(RunResult r) {
        return r.bays().stream().filter(BayResult::checked).filter(b -> b.ratio() > 1).count();
    }

    @Test
    void baysThatExceedAreStiffenedUntilTheyMeetAndTheMembersCarryIt() {
        RunResult checked = PlanRun.run(demo(false), CatalogFile.loadDefault());
        RunResult sized = PlanRun.run(demo(true), CatalogFile.loadDefault());
        assertTrue(exceeding(checked) > 0, "the demo has bays above the limit when only checked");
        assertTrue(checked.sizedForVibration().isEmpty());
        assertEquals(0, exceeding(sized), "every checked bay meets the limit once sized: " + sized.bays().stream()
                .filter(b -> b.checked() && b.ratio() > 1).map(b -> b.bay().id() + " " + b.ratio()).toList());
        assertFalse(sized.sizedForVibration().isEmpty());
        // every member named in a change carries at least the section it was given, and still passes its checks
        Map<String, MemberResult> byKey = new HashMap<>();
        sized.takedown().members().forEach((k, l) -> l.forEach(m -> byKey.put(k + "|" + m.id(), m)));
        double ixMin;
        for (VibrationSizing.Change c : sized.sizedForVibration()) {
            ixMin = CatalogFile.loadDefault().find(c.to()).orElseThrow().props().ix();
            for (String id : c.members()) {
                MemberResult m = byKey.get(c.floor() + "|" + id);
                assertTrue(m.design().section().props().ix() >= ixMin * (1 - 1e-12), id + " " + m.section() + " < " + c.to());
                assertTrue(m.maxRatio() <= 1 + 1e-9, id + " ratio " + m.maxRatio());
            }
            assertTrue(c.ratioBefore() > 1, c.toString());
        }
        // stiffening adds steel; equilibrium still holds and nothing else is a problem
        double before = steel(checked);
        double after = steel(sized);
        assertTrue(after > before, after + " vs " + before);
        assertTrue(sized.problems().isEmpty(), sized.problems().toString());
    }

    private static double steel(RunResult r) {
        return r.takedown().members().values().stream().flatMap(List::stream).mapToDouble(MemberResult::steelWeight).sum();
    }
}
