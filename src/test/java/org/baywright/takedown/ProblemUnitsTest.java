package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Problem;
import org.baywright.run.PlanRun;
import org.junit.jupiter.api.Test;

/**
 * Problems speak the plan's units (found by a new user: a US plan said "no support at (9.144 m, 0.000 m)"
 * and "applied 3.70971e+06 N"). The demo building without its columns: girder ends are unsupported
 * and no load reaches a foundation. (G-1-DE's east end is the one read: since the balcony beams on B, C
 * and D run past grid 1, G-1-AB's east end bears on the beam on B passing through it.)
 */
class ProblemUnitsTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static Plan demoWithoutColumns() {
        Plan demo = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        return new Plan(demo.name(), demo.units(), demo.settings(), demo.grid(), demo.levels(), demo.floors(), List.of());
    }

    private static String messages(List<Problem> problems) {
        return String.join("\n", problems.stream().map(Problem::toString).toList());
    }

    @Test
    void aUsPlanSpeaksFeetAndKips() {
        String all = messages(PlanRun.run(demoWithoutColumns(), CATALOG).problems());
        assertAll(
                () -> assertFalse(all.contains("load case D: load case D"), "the location is not repeated in the message"),
                () -> assertTrue(all.contains("member G-1-DE has no support at (120'-0\", 0'-0\")"), all),
                () -> assertTrue(all.matches("(?s).*load case D: applied [\\d,]+\\.\\d kip but the foundations carry 0\\.0 kip.*"),
                        all),
                () -> assertFalse(all.matches("(?s).*\\d e[+-]?\\d.*|.*\\de\\+\\d.*"), "no scientific notation"),
                () -> assertFalse(all.contains(" m,") || all.contains(" m)") || all.contains(" N "), "no SI units"));
    }

    @Test
    void theSamePlanInSiSpeaksMetresAndKilonewtons() {
        String all = messages(PlanRun.run(PlanEdits.withUnits(demoWithoutColumns(), "si"), CATALOG).problems());
        assertAll(
                () -> assertTrue(all.contains("member G-1-DE has no support at (36.576 m, 0.000 m)"), all),
                () -> assertTrue(all.matches("(?s).*load case D: applied [\\d,]+\\.\\d kN but the foundations carry 0\\.0 kN.*"),
                        all));
    }

    /** A floor design shared between runs is kept per unit system: switching units shows the new units. */
    @Test
    void aSharedFloorCacheDoesNotMixUnitSystems() {
        FloorCache cache = new FloorCache(CATALOG);
        Plan us = demoWithoutColumns();
        PlanRun.run(us, CATALOG, cache);
        String si = messages(PlanRun.run(PlanEdits.withUnits(us, "si"), CATALOG, cache).problems());
        assertTrue(si.contains("no support at (36.576 m, 0.000 m)"), si);
    }
}
