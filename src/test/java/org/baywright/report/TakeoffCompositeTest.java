package org.baywright.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;

/**
 * The takeoff of floors with composite members ({@link CompositeRuns}: AISC Design Examples V15
 * Example I.1 beams, W21X50 with 46 studs cambered 2 in, beside a bare W18X50), on three levels.
 */
class TakeoffCompositeTest {

    @Test
    void studsAndCamberAddUp() {
        RunResult run = CompositeRuns.run(List.of(CompositeRuns.composite("B-1", 0, CompositeRuns.w21x50()),
                CompositeRuns.composite("B-2", CompositeRuns.SPACING, CompositeRuns.w21x50()),
                CompositeRuns.bare("B-3", 2 * CompositeRuns.SPACING)), 3);
        Takeoff t = Takeoff.of(run, 0);
        List<MemberResult> ms = run.takedown().members().get("f1");
        int perFloor = ms.stream().mapToInt(MemberResult::studs).sum();
        assertAll("takeoff",
                () -> assertTrue(t.composite()),
                // 46 studs per beam (Example I.1), 2 beams a level, 3 levels
                () -> assertEquals(46 * 2 * 3, t.studs()),
                () -> assertEquals(3 * perFloor, t.studs()),
                () -> assertEquals(t.studs(), t.lines().stream().mapToInt(Takeoff.Line::studs).sum()),
                () -> assertEquals(6, t.camberedPieces()),
                () -> assertEquals(3 * 2, t.lines().stream().filter(l -> l.section().equals("W21X50")).mapToInt(Takeoff.Line::pieces).sum()),
                () -> assertTrue(t.nonCompositeTotal() > t.total()),
                () -> assertEquals(CompositeTotals.of(run.takedown()).nonCompositeWeight(), t.nonCompositeTotal(), 1e-9));
    }

    @Test
    void csvHasStudAndCamberColumnsOnlyWhenComposite() {
        Takeoff t = Takeoff.of(CompositeRuns.mixed(), 0);
        List<String> csv = t.csv(UnitSystem.US).lines().toList();
        String totals = t.totalsCsv(UnitSystem.US);
        Takeoff bare = Takeoff.of(CompositeRuns.run(List.of(CompositeRuns.bare("B-3", 0)), 1), 0);
        assertAll("csv",
                () -> assertEquals("section,level,kind,pieces,length[ft],weight[lb],studs,camber[in]", csv.get(0)),
                // 2 × W21X50, 45 ft each at 50 lb/ft, 92 studs, 2 in camber
                () -> assertTrue(csv.contains("W21X50,Level 2,beam,2,90.00,4500,92,2.00"), csv.toString()),
                () -> assertTrue(csv.contains("W18X50,Level 2,beam,1,35.00,1750,0,0.00"), csv.toString()),
                () -> assertTrue(totals.contains("headed studs,92,studs"), totals),
                () -> assertTrue(totals.contains("cambered pieces,2,"), totals),
                () -> assertTrue(totals.contains("members and columns without composite action,"), totals),
                () -> assertEquals("section,level,kind,pieces,length[ft],weight[lb]", bare.csv(UnitSystem.US).lines().findFirst().orElseThrow()),
                () -> assertFalse(bare.totalsCsv(UnitSystem.US).contains("studs")));
    }

    @Test
    void differentCambersAreSeparateLines() {
        var d = CompositeRuns.w21x50();
        var flat = new org.baywright.design.CompositeDesign(d.status(), d.section(), d.studsPerHalf(), d.studs(), d.qn(), d.sumQn(),
                d.beff(), d.beffLeft(), d.beffRight(), d.slabWeight(), d.flexure(), d.ilb(), d.itr(), d.preDeflection(), 0,
                d.constructionRatio(), d.checks(), d.rejected(), d.alternatives(), d.costWeight(), d.evaluations());
        RunResult run = CompositeRuns.run(List.of(CompositeRuns.composite("B-1", 0, d),
                CompositeRuns.composite("B-2", CompositeRuns.SPACING, flat)), 1);
        Takeoff t = Takeoff.of(run, 0);
        assertAll("lines",
                () -> assertEquals(2, t.lines().size(), t.lines().toString()),
                () -> assertEquals(1, t.camberedPieces()),
                () -> assertEquals(92, t.studs()));
    }
}
