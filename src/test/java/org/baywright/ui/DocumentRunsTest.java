package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.baywright.plan.GridLine;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Point;
import org.baywright.report.RunSummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.FloorCache;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The editor's runs go through one floor cache per document: an edit designs again only the floor
 * layouts it touches, and every cached run equals a fresh run of the same plan.
 */
class DocumentRunsTest {
    private static EditorModel demo() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(Path.of(BaywrightApp.DEMO)).opened());
        return m;
    }

    /** The whole result as a value tree, in both unit systems. */
    private static Map<String, Object> json(RunResult r) {
        return Map.of("us", RunSummary.json(r, UnitSystem.US), "si", RunSummary.json(r, UnitSystem.SI));
    }

    private static void assertSameAsFresh(EditorModel m, String what) {
        assertNotNull(m.run().takedown(), what);
        assertEquals(json(PlanRun.run(m.plan())), json(m.run()), what + ": the cached run equals a fresh run");
    }

    @Test
    void aLoadOnTheRoofDesignsTheRoofAgainAndReusesTheOtherLayouts() {
        EditorModel m = demo();
        FloorCache cache = m.floorCache();
        assertEquals(3, cache.misses(), "level 2, the typical floor and the roof");
        assertEquals(0, cache.hits());
        MemberResult onRoof = m.run().takedown().members().get("roof").get(0);
        Point at = new Point((onRoof.start().x() + onRoof.end().x()) / 2, (onRoof.start().y() + onRoof.end().y()) / 2);
        RunResult before = m.run();
        assertTrue(m.edit(p -> PlanEdits.addPointLoad(p, "roof", at, new LoadValues(Units.KIPS.toSi(8), 0, 0, 0, 0, 0)),
                "point load"));
        assertAll(
                () -> assertEquals(2, cache.hits(), "the two layouts the load does not reach are reused"),
                () -> assertEquals(4, cache.misses(), "the roof is designed again"),
                () -> assertNotEquals(json(before), json(m.run()), "the load changed the result"));
        assertSameAsFresh(m, "a point load on the roof");
        m.undo();
        assertEquals(5, cache.hits(), "undo finds all three layouts as they were");
        assertSameAsFresh(m, "undone");
    }

    @Test
    void gridMovesAndTheirUndoEqualFreshRuns() {
        EditorModel m = demo();
        GridLine b = PlanEdits.lines(m.plan(), GridLine.Axis.X).get(1);
        double ft = Units.FT_.toSi(1);
        m.edit(p -> PlanEdits.moveGridLine(p, b.label(), b.offset() + ft), "move B");
        assertSameAsFresh(m, "line B moved 1 ft east");
        m.edit(p -> PlanEdits.moveGridLine(p, b.label(), b.offset()), "move B back");
        assertSameAsFresh(m, "line B moved back");
        long hits = m.floorCache().hits();
        m.edit(p -> PlanEdits.moveGridLine(p, b.label(), b.offset() + ft), "move B again");
        assertSameAsFresh(m, "line B moved 1 ft east again");
        assertEquals(hits + 3, m.floorCache().hits(), "a plan seen before reuses every layout");
        m.edit(p -> PlanEdits.withMethod(p, "asd"), "ASD");
        assertSameAsFresh(m, "ASD");
    }

    @Test
    void eachDocumentHasItsOwnCache() {
        EditorModel m = demo();
        FloorCache first = m.floorCache();
        Plan p = m.plan();
        m.openUnsaved(p, "again");
        assertNotSame(first, m.floorCache(), "a new document starts a new cache");
        assertEquals(0, m.floorCache().hits());
        assertSameAsFresh(m, "the same plan as a new document");
    }

    @Test
    void aCatalogThatCannotBeReadGivesTheFreshRunsProblem() {
        EditorModel m = demo();
        m.edit(p -> {
            var s = p.settings();
            var broken = new org.baywright.plan.DesignSettings(s.method(), s.fy(), s.liveDeflection(), s.totalDeflection(),
                    s.beamSeries(), s.girderSeries(), s.columnSeries(), s.maxBeamDepth(), s.spliceEvery(), s.liveLoadReduction(),
                    s.partitionAsDead(), s.girderAreaDelivered(), "no/such/catalog.json");
            return new Plan(p.name(), p.units(), broken, p.grid(), p.levels(), p.floors(), p.columns());
        }, "catalog");
        assertEquals(null, m.run().takedown());
        assertEquals(PlanRun.run(m.plan()).problems(), m.run().problems());
    }
}
