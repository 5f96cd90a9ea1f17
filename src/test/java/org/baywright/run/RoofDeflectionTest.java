package org.baywright.run;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.baywright.design.Check;
import org.baywright.design.DeflectionLimits;
import org.baywright.io.PlanFiles;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.RoofCeiling;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Roof members take the roof rows of IBC Table 1604.3 by the ceiling they carry, a plan setting per roof
 * layout; floor members keep the floor row. The rows (IBC 2018 Table 1604.3; FOUND, as gathered in the
 * team's check values, §4 Table 4): roof members supporting a plaster or stucco ceiling l/360 under Lr or
 * S and l/240 under D + L; supporting a non-plaster ceiling l/240 and l/180; not supporting a ceiling
 * l/180 and l/120; floor members l/360 and l/240.
 */
class RoofDeflectionTest {

    private static Plan twoBay() {
        return PlanFiles.read(Path.of("plans", "examples", "two-bay.bay.json")).plan().orElseThrow();
    }

    private static Plan with(Plan p, DesignSettings s) {
        return new Plan(p.name(), p.units(), s, p.grid(), p.levels(), p.floors(), p.columns());
    }

    private static String roofId(Plan p) {
        return p.floors().stream().filter(Floor::roof).map(Floor::id).findFirst().orElseThrow();
    }

    @Test
    void theRowsOfTheTable() {
        assertAll(
                () -> assertEquals(360, DeflectionLimits.FLOOR.live()),
                () -> assertEquals(240, DeflectionLimits.FLOOR.total()),
                () -> assertEquals(360, DesignBasis.roofRow(RoofCeiling.PLASTER).live()),
                () -> assertEquals(240, DesignBasis.roofRow(RoofCeiling.PLASTER).total()),
                () -> assertEquals(240, DesignBasis.roofRow(RoofCeiling.NON_PLASTER).live()),
                () -> assertEquals(180, DesignBasis.roofRow(RoofCeiling.NON_PLASTER).total()),
                () -> assertEquals(180, DesignBasis.roofRow(RoofCeiling.NONE).live()),
                () -> assertEquals(120, DesignBasis.roofRow(RoofCeiling.NONE).total()),
                // the default (common practice: a suspended non-plaster ceiling is what a roof usually carries)
                () -> assertEquals(RoofCeiling.NON_PLASTER, DesignSettings.defaults().roofCeiling("any-roof")));
    }

    /** Every roof member's deflection checks use the row's limits, every floor member the floor row. */
    private static void assertLimits(RunResult run, String roof, double roofLive, double roofTotal) {
        List<Executable> checks = new ArrayList<>();
        run.takedown().members().forEach((floor, members) -> {
            boolean isRoof = floor.equals(roof);
            double live = isRoof ? roofLive : 360;
            double total = isRoof ? roofTotal : 240;
            for (MemberResult m : members) {
                if (m.design() == null) {
                    continue;
                }
                Optional<Check> l = m.design().checks().stream().filter(c -> c.name().equals("live-load deflection")).findFirst();
                Optional<Check> t = m.design().checks().stream().filter(c -> c.name().equals("total-load deflection")).findFirst();
                checks.add(() -> assertEquals(m.length() / live, l.orElseThrow().capacity(), 1e-9, m.id() + " live limit"));
                if (total == 0) {
                    checks.add(() -> assertTrue(t.isEmpty(), m.id() + " total-load check off"));
                } else {
                    checks.add(() -> assertEquals(m.length() / total, t.orElseThrow().capacity(), 1e-9, m.id() + " total limit"));
                }
            }
        });
        assertFalse(run.takedown().members().getOrDefault(roof, List.of()).isEmpty(), "the roof has members");
        assertAll(checks);
    }

    @Test
    void roofMembersTakeTheNonPlasterRowByDefault() {
        Plan p = twoBay();
        RunResult run = PlanRun.run(p);
        assertLimits(run, roofId(p), 240, 180);
        assertEquals(DeflectionLimits.ROOF_NON_PLASTER_CEILING, run.basis().roofDeflection().get(roofId(p)));
    }

    @Test
    void aPlasterCeilingAndNoCeiling() {
        Plan p = twoBay();
        String roof = roofId(p);
        assertLimits(PlanRun.run(with(p, p.settings().withRoofCeiling(roof, RoofCeiling.PLASTER))), roof, 360, 240);
        assertLimits(PlanRun.run(with(p, p.settings().withRoofCeiling(roof, RoofCeiling.NONE))), roof, 180, 120);
    }

    /**
     * The dead-load footnote of IBC Table 1604.3 for steel members (from memory: the dead load may be taken
     * as zero in the D + L check) is the user's choice: a total-load limit of 0 in the settings turns the
     * check off for roof members too, while the live-load limit stays the roof row's.
     */
    @Test
    void aTotalLoadCheckTurnedOffIsOffOnTheRoofToo() {
        Plan p = twoBay();
        DesignSettings s = p.settings().withDeflection(360, 0);
        RunResult run = PlanRun.run(with(p, s));
        List<Executable> checks = new ArrayList<>();
        for (MemberResult m : run.takedown().members().get(roofId(p))) {
            if (m.design() != null) {
                checks.add(() -> assertTrue(m.design().checks().stream().noneMatch(c -> c.name().equals("total-load deflection")),
                        m.id()));
                checks.add(() -> assertEquals(m.length() / 240, m.design().checks().stream()
                        .filter(c -> c.name().equals("live-load deflection")).findFirst().orElseThrow().capacity(), 1e-9, m.id()));
            }
        }
        assertAll(checks);
    }
}
