package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.OverhangSpan;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Problem;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * A beam drawn past its support: one bay 30 ft × 30 ft between girders on grid 1 (y = 0) and grid 2
 * (y = 30 ft), with the slab running 6 ft south of grid 1. Three north–south beams run from grid 2 to
 * the slab edge at y = −6 ft: on A and B they pass over the columns, in the middle (x = 15 ft) over the
 * girder G-1. The deck spans east–west onto the beams, so the middle one carries 15 ft of it, 50 psf
 * dead, nothing else.
 *
 * <p>Expected (COMPUTED, AISC Manual Table 3-23, beam overhanging one support, uniform load on the
 * whole member, from memory): with w the dead load plus the beam's own weight, l = 30 ft and c = 6 ft,
 * the girder takes R2 = w/(2l)·(l + c)² = 0.72·w·(36 ft), more than the 0.5 + 6/36 of a member's load
 * a simple span would hand it, and the far support R1 = w/(2l)·(l² − c²); the sum is the load (the run's
 * equilibrium check holds). Before overhangs were recognised the beam had no support at its south
 * end ("unsupported-member").
 */
class OverhangingBeamTest {
    private static final String PLAN = """
            {"format": "baywright-plan", "version": 1, "name": "overhang", "units": "us",
             "grid": [{"label": "A", "x": "0ft"}, {"label": "B", "x": "30ft"}, {"label": "1", "y": "0ft"}, {"label": "2", "y": "30ft"}],
             "levels": [{"name": "Level 2", "elevation": "14ft", "storeyHeight": "14ft", "floor": "f"}],
             "floors": [{"id": "f", "name": "Floor", "roof": false,
               "slabEdge": [["0ft", "-6ft"], ["30ft", "-6ft"], ["30ft", "30ft"], ["0ft", "30ft"]],
               "decks": [{"id": "DK", "outline": [["0ft", "-6ft"], ["30ft", "-6ft"], ["30ft", "30ft"], ["0ft", "30ft"]], "spanAngle": 0}],
               "members": [
                 {"id": "G-1", "kind": "girder", "start": ["0ft", "0ft"], "end": ["30ft", "0ft"]},
                 {"id": "G-2", "kind": "girder", "start": ["0ft", "30ft"], "end": ["30ft", "30ft"]},
                 {"id": "B-A", "kind": "beam", "start": ["0ft", "30ft"], "end": ["0ft", "-6ft"]},
                 {"id": "B-M", "kind": "beam", "start": ["15ft", "30ft"], "end": ["15ft", "-6ft"]},
                 {"id": "B-B", "kind": "beam", "start": ["30ft", "30ft"], "end": ["30ft", "-6ft"]}],
               "areaLoads": [{"id": "AL", "outline": [["0ft", "-6ft"], ["30ft", "-6ft"], ["30ft", "30ft"], ["0ft", "30ft"]],
                 "dead": "50psf", "use": "ordinary"}]}],
             "columns": [{"id": "C-A1", "at": ["0ft", "0ft"]}, {"id": "C-B1", "at": ["30ft", "0ft"]},
               {"id": "C-A2", "at": ["0ft", "30ft"]}, {"id": "C-B2", "at": ["30ft", "30ft"]}]}
            """;

    @Test
    void theFramingPlanMarksTheSupportPassedOverAndTheFreeEnd() {
        var plan = PlanFiles.read(PLAN, "overhang.bay.json").plan().orElseThrow();
        RunResult run = PlanRun.run(plan, CatalogFile.loadDefault());
        var style = org.baywright.report.drawing.PlanPicture.Style.sheet(org.baywright.units.UnitSystem.US, 2.5,
                null, org.baywright.load.DesignMethod.LRFD);
        var prims = org.baywright.report.drawing.PlanPicture.forPlan(plan, "Level 2", run, style).build(0.05);
        double ft = Units.FT_.toSi(1);
        // a filled wedge with its point on the support passed over: (15 ft, 0) for B-M, the columns for B-A and B-B
        long wedges = prims.stream().filter(p -> p instanceof org.baywright.report.drawing.Primitive.Path path
                && path.points().size() == 3 && path.fill() != null).count();
        boolean atGirder = prims.stream().anyMatch(p -> p instanceof org.baywright.report.drawing.Primitive.Path path
                && path.points().size() == 3 && Math.abs(path.points().get(0).x() - 15 * ft) < 1e-9
                && Math.abs(path.points().get(0).y()) < 1e-9);
        // a bar across each free end, centred on the tip at y = -6 ft
        long bars = prims.stream().filter(p -> p instanceof org.baywright.report.drawing.Primitive.Line l
                && Math.abs(0.5 * (l.from().y() + l.to().y()) + 6 * ft) < 1e-9 && Math.abs(l.from().y() - l.to().y()) < 1e-9
                && Math.abs(l.from().x() - l.to().x()) < 1.0).count();
        assertAll(
                () -> assertEquals(3, wedges, "one wedge per overhanging beam"),
                () -> assertTrue(atGirder, "the wedge of B-M is where it passes over G-1"),
                () -> assertTrue(bars >= 3, "a bar at each free end: " + bars));
    }

    @Test
    void anOverhangThatLiftsTheMemberUnderItsFarEndIsAProblemNotACrash() {
        // the middle beam starts on a girder 4 ft north of grid 1 and overhangs 6 ft: under its full load
        // the far support is pulled up (R1 = w/(2l)·(l² − c²) < 0 for c > l, Table 3-23)
        String plan = PLAN.replace("{\"id\": \"B-M\", \"kind\": \"beam\", \"start\": [\"15ft\", \"30ft\"]",
                "{\"id\": \"G-H\", \"kind\": \"girder\", \"start\": [\"0ft\", \"4ft\"], \"end\": [\"30ft\", \"4ft\"]},"
                        + " {\"id\": \"B-M\", \"kind\": \"beam\", \"start\": [\"15ft\", \"4ft\"]");
        RunResult run = PlanRun.run(PlanFiles.read(plan, "uplift.bay.json").plan().orElseThrow(), CatalogFile.loadDefault());
        assertAll(
                () -> assertTrue(run.problems().stream().anyMatch(p -> p.kind().equals("uplift") && p.objectId().equals("B-M")),
                        () -> run.problems().toString()),
                () -> assertTrue(run.problems().stream().anyMatch(p -> p.kind().equals("uplift-on-member")
                        && p.message().contains("member G-H")), () -> run.problems().toString()),
                () -> assertTrue(run.takedown().equilibrium().stream().allMatch(e -> e.holds()),
                        () -> "the uplift passes through G-H to its supports: " + run.takedown().equilibrium()));
    }

    @Test
    void aBeamDrawnPastItsSupportOverhangsItAndItsGirderGetsTheLargerReaction() {
        var read = PlanFiles.read(PLAN, "overhang.bay.json");
        assertTrue(read.plan().isPresent(), () -> read.problems().toString());
        RunResult run = PlanRun.run(read.plan().get(), CatalogFile.loadDefault());
        List<MemberResult> members = run.takedown().members().get(run.takedown().levelFloors().get("Level 2"));
        MemberResult b = members.stream().filter(m -> m.id().equals("B-M")).findFirst().orElseThrow();
        MemberResult g = members.stream().filter(m -> m.id().equals("G-1")).findFirst().orElseThrow();
        double ft = Units.FT_.toSi(1);
        double w = Units.PSF.toSi(50) * 15 * ft + b.design().section().weight();
        double l = 30 * ft;
        double c = 6 * ft;
        OverhangSpan statics = OverhangSpan.of(l + c, 0, l, List.of(DistributedLoad.full(l + c, w)));
        int d = Component.D.ordinal();
        assertAll(
                () -> assertTrue(run.problems().stream().noneMatch(p -> p.kind().equals("unsupported-member")),
                        () -> "no unsupported member: " + run.problems()),
                () -> assertTrue(b.overhangs(), "B-M overhangs G-1"),
                () -> assertEquals("member G-1 (passed over; the end overhangs it)", b.endSupport()),
                () -> assertEquals(1, b.kll(), "K_LL = 1 for a cantilever beam (ASCE 7-16 Table 4.7-1)"),
                () -> assertEquals(w / (2 * l) * (l + c) * (l + c), b.endReaction()[d], 1e-6, "R2 = w/(2l)·(l + c)²"),
                () -> assertEquals(w / (2 * l) * (l * l - c * c), b.startReaction()[d], 1e-6, "R1 = w/(2l)·(l² − c²)"),
                () -> assertEquals(statics.reactionB(), b.endReaction()[d], 1e-6),
                () -> assertTrue(b.endReaction()[d] > w * (l + c) / 2, "larger than a simple span's half"),
                () -> assertEquals(b.endReaction()[d] + g.design().section().weight() * l, g.startReaction()[d] + g.endReaction()[d],
                        1e-6, "G-1 carries the overhanging beam's reaction (and its own weight)"),
                () -> assertTrue(run.takedown().equilibrium().stream().allMatch(e -> e.holds()), "equilibrium"),
                () -> assertTrue(run.problems().stream().noneMatch(p -> p.severity() == Problem.Severity.ERROR),
                        () -> run.problems().toString()));
    }
}
