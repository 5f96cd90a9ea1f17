package org.baywright.takedown;

import static org.baywright.takedown.BayPlans.ft;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.Slab;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.junit.jupiter.api.Test;

/** Finding the bays of a designed floor layout ({@link Bays}) and which of them are checked ({@link BayChecks}). */
class BaysTest {
    private static final double MM = 1e-3;

    private static List<Bay> bays(Plan plan, String layout) {
        RunResult r = PlanRun.run(plan);
        Floor f = plan.floor(layout).orElseThrow();
        return Bays.find(plan, f, layout, r.takedown().members().get(layout));
    }

    private static Bay named(List<Bay> bays, String id) {
        return Bays.named(bays, id).orElseThrow(() -> new AssertionError("no bay " + id + " in "
                + bays.stream().map(Bay::id).toList()));
    }

    @Test
    void aRegularGridWithBeamsNorthSouthHasOneBayPerPanelNamedByItsGridLines() {
        // 3 × 2 bays of 30 × 35 ft, beams spanning north–south at most 10 ft apart (RegularPlan)
        List<Bay> bays = bays(BayPlans.regular(3, 2, true), "typical");
        assertEquals(Set.of("A-B/1-2", "B-C/1-2", "C-D/1-2", "A-B/2-3", "B-C/2-3", "C-D/2-3"),
                bays.stream().map(Bay::id).collect(Collectors.toSet()));
        assertEquals(6, bays.size());
        Bay b = named(bays, "B-C/1-2");
        assertAll("bay B-C/1-2: beams span 35 ft between girders G-1-BC and G-2-BC, 30 ft / 3 = 10 ft apart",
                () -> assertEquals(2, b.beams().size(), "two infill beams (30 ft at most 10 ft apart: three spaces)"),
                () -> assertEquals(ft(35), b.beamSpan(), MM),
                () -> assertEquals(ft(10), b.spacing(), MM),
                () -> assertEquals(ft(30), b.width(), MM),
                () -> assertEquals(Set.of("G-1-BC", "G-2-BC"), b.girders().stream().map(Bay.BayGirder::id).collect(Collectors.toSet())),
                () -> b.girders().forEach(g -> assertEquals(ft(30), g.span(), MM)),
                () -> assertEquals(ft(90), b.floorWidth(), MM, "the slab across the beams: 3 × 30 ft"),
                () -> assertEquals(ft(70), b.floorLength(), MM, "the slab along the beams: 2 × 35 ft"),
                () -> assertFalse(b.edge(), "both sides along the beams are inside the slab"),
                () -> assertEquals(90.0, b.beamAngle(), 1e-9),
                () -> assertEquals(ft(35), b.beamAdjacentSpan(), MM, "the beams continue in line into B-C/2-3"),
                () -> assertTrue(b.girders().stream().allMatch(g -> Math.abs(g.adjacentSpan() - ft(30)) < MM)),
                () -> assertTrue(b.beams().stream().noneMatch(id -> id.startsWith("B-B-") || id.startsWith("B-C-")),
                        "the beams on the column lines rest on columns: sides of the bay, not in it"));
        Bay g1 = named(bays, "B-C/1-2");
        Bay.BayGirder edgeGirder = g1.girders().stream().filter(g -> g.id().equals("G-1-BC")).findFirst().orElseThrow();
        Bay.BayGirder inner = g1.girders().stream().filter(g -> g.id().equals("G-2-BC")).findFirst().orElseThrow();
        assertEquals(ft(35) / 2, edgeGirder.carriedWidth(), MM, "an edge girder carries half the beams' span");
        assertEquals(ft(35), inner.carriedWidth(), MM, "an interior girder carries half the span each side");
        assertFalse(edgeGirder.bothSides());
        assertTrue(inner.bothSides());
        assertTrue(named(bays, "A-B/1-2").edge(), "A-B: the side on grid A is the slab edge");
        assertTrue(named(bays, "C-D/2-3").edge(), "C-D: the side on grid D is the slab edge");
    }

    @Test
    void beamsEastWestGiveTheSameNamesAndSpacingByTheInfillRule() {
        // 2 × 2 bays, beams spanning east–west: 35 ft at most 10 ft apart → 4 spaces of 8.75 ft, 3 beams
        List<Bay> bays = bays(BayPlans.regular(2, 2, false), "typical");
        assertEquals(Set.of("A-B/1-2", "B-C/1-2", "A-B/2-3", "B-C/2-3"), bays.stream().map(Bay::id).collect(Collectors.toSet()));
        Bay b = named(bays, "A-B/1-2");
        assertAll(
                () -> assertEquals(3, b.beams().size()),
                () -> assertEquals(ft(30), b.beamSpan(), MM),
                () -> assertEquals(ft(8.75), b.spacing(), MM),
                () -> assertEquals(ft(60), b.floorLength(), MM, "along the beams: 2 × 30 ft"),
                () -> assertEquals(ft(70), b.floorWidth(), MM, "across the beams: 2 × 35 ft"),
                () -> assertEquals(0.0, b.beamAngle(), 1e-9),
                () -> assertTrue(b.edge(), "the side on grid 1 is the slab edge"));
    }

    @Test
    void oneBayAcrossHasNoContinuity() {
        Bay b = named(bays(BayPlans.regular(1, 1, true), "typical"), "A-B/1-2");
        assertAll(() -> assertEquals(0, b.beamAdjacentSpan()),
                () -> b.girders().forEach(g -> assertEquals(0, g.adjacentSpan())));
    }

    @Test
    void runsCheckBaysOnlyWhenAFloorDescribesASlab() {
        Plan plain = BayPlans.regular(2, 1, true);
        assertTrue(PlanRun.run(plain).bays().isEmpty(), "no slab anywhere: no bays, the result as before");
        RunResult r = PlanRun.run(BayPlans.withSlab(plain, Slab.typical()));
        List<BayResult> typical = r.bays().stream().filter(b -> b.bay().floor().equals("typical")).toList();
        List<BayResult> roof = r.bays().stream().filter(b -> b.bay().floor().equals("roof")).toList();
        assertAll(
                () -> assertEquals(2, typical.size()),
                () -> assertEquals(2, roof.size()),
                () -> typical.forEach(b -> assertTrue(b.checked(), b.bay().id())),
                () -> typical.forEach(b -> assertEquals(List.of("Level 2"), b.levels())),
                // one bay deep: no interior girder, so the check takes the edge girders, the worse governing
                () -> typical.forEach(b -> assertTrue(b.girder().startsWith("G-"), b.girder())),
                () -> roof.forEach(b -> assertEquals(BayChecks.ROOF, b.note())),
                () -> roof.forEach(b -> assertEquals(BayResult.NOT_CHECKED, b.status())));
    }

    @Test
    void aLayoutWithoutASlabIsReportedNotChecked() {
        Plan p = BayPlans.regular(2, 1, true);
        // a slab on the roof's decks only: the floor's bays have none
        Plan roofSlab = new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), p.floors().stream()
                .map(f -> f.roof() ? f.withDecks(f.decks().stream().map(d -> d.withSlab(Slab.typical())).toList()) : f)
                .toList(), p.columns());
        RunResult r = PlanRun.run(roofSlab);
        List<BayResult> typical = r.bays().stream().filter(b -> b.bay().floor().equals("typical")).toList();
        assertEquals(2, typical.size());
        typical.forEach(b -> assertAll(() -> assertEquals(BayChecks.NO_SLAB, b.note()), () -> assertNull(b.result())));
    }

    @Test
    void shortStiffBaysAreOutsideTheMethodNotPassed() {
        // 2 × 2 bays of 10 × 10 ft, a beam at mid-bay, the typical slab: f_n far above 9 Hz, where DG11's
        // low-frequency walking criterion does not apply (CHECK-VALUES §6; DG11 2nd ed. Ch. 4, from memory)
        Plan p = org.baywright.plan.RegularPlan.generate(new org.baywright.plan.RegularPlan.Spec("Short", "us",
                List.of(ft(10), ft(10)), List.of(ft(10), ft(10)), List.of(ft(14)), true, ft(5),
                org.baywright.plan.RegularPlan.OFFICE_FLOOR, org.baywright.plan.LoadValues.ZERO,
                org.baywright.plan.LoadValues.ZERO));
        RunResult r = PlanRun.run(BayPlans.withSlab(p, Slab.typical()));
        assertEquals(4, r.bays().size());
        r.bays().forEach(b -> assertAll(b.bay().id(),
                () -> assertEquals(org.baywright.design.dg11.VibrationStatus.OUTSIDE_METHOD, b.result().status()),
                () -> assertTrue(b.result().fn() > 9, "f_n = " + b.result().fn()),
                () -> assertEquals("outside the method", b.status()),
                () -> assertTrue(b.result().summary().contains("does not apply"), b.result().summary())));
        String line = org.baywright.report.BaySummary.line(r);
        assertTrue(line.contains("4 bays: 4 above 9 Hz (outside the method)"), line);
        assertFalse(line.contains("worst"), "no bay was checked by the method: " + line);
    }

    @Test
    void anInputTheMethodRefusesIsReportedNotThrown() {
        // no concrete above the deck: DG11's transformed section and D_s need some (VibrationSlab: t_c > 0)
        // (the takedown refuses such a slab first; the bay step must not depend on that)
        Plan p = BayPlans.regular(1, 1, true);
        Bay bay = bays(p, "typical").get(0);
        Floor bare = BayPlans.withSlab(p, Slab.typical().withTopping(0)).floor("typical").orElseThrow();
        BayResult r = BayChecks.check(bare, bay, List.of("Level 2"), org.baywright.plan.VibrationSettings.defaults());
        assertTrue(r.note().startsWith("not checked: slab: t_c > 0"), r.note());
        assertEquals(BayResult.NOT_CHECKED, r.status());
    }

    @Test
    void theChordOfARectangleThroughAPoint() {
        var rect = org.baywright.plan.Polygon.rectangle(0, 0, 10, 4);
        double[] c = Bays.chord(rect, new org.baywright.plan.Point(3, 1), 1, 0);
        assertEquals(-3, c[0], 1e-12);
        assertEquals(7, c[1], 1e-12);
        double[] v = Bays.chord(rect, new org.baywright.plan.Point(3, 1), 0, 1);
        assertEquals(-1, v[0], 1e-12);
        assertEquals(3, v[1], 1e-12);
        assertNull(Bays.chord(rect, new org.baywright.plan.Point(11, 1), 1, 0));
        // an L-shaped slab: 10 × 4 with a 5 × 4 wing above its east half
        var ell = new org.baywright.plan.Polygon(List.of(new org.baywright.plan.Point(0, 0), new org.baywright.plan.Point(10, 0),
                new org.baywright.plan.Point(10, 8), new org.baywright.plan.Point(5, 8), new org.baywright.plan.Point(5, 4),
                new org.baywright.plan.Point(0, 4)));
        double[] mid = Bays.chord(ell, new org.baywright.plan.Point(7, 6), -1, 0); // westward: x = 10 is behind
        assertEquals(-3, mid[0], 1e-12);
        assertEquals(2, mid[1], 1e-12);
        double[] low = Bays.chord(ell, new org.baywright.plan.Point(7, 2), 1, 0);
        assertEquals(-7, low[0], 1e-12);
        assertEquals(3, low[1], 1e-12);
        // a vertical line through the re-entrant vertex (5, 4): the slab below it, from y = 0 to 8 on x = 5
        double[] up = Bays.chord(ell, new org.baywright.plan.Point(5, 2), 0, 1);
        assertEquals(-2, up[0], 1e-12);
        assertEquals(6, up[1], 1e-12);
        // a hole (an atrium) cuts the chord
        var atrium = org.baywright.plan.Polygon.rectangle(4, 1, 6, 3);
        double[] cut = Bays.chord(List.of(rect, atrium), new org.baywright.plan.Point(2, 2), 1, 0);
        assertEquals(-2, cut[0], 1e-12);
        assertEquals(2, cut[1], 1e-12);
    }

    @Test
    void aBayBesideAnAtriumWithItsBeamsAlongTheAtriumIsAnEdgeBay() {
        // the demo plan: the atrium fills B-C/2-3 on the typical floor; A-B/2-3 and C-D/2-3 have beams
        // spanning north–south, along the atrium's sides on grids B and C (DG11's interior edge, C_j = 1.0)
        Plan demo = org.baywright.io.PlanFiles.read(java.nio.file.Path.of("plans/harbourview-offices.bay.json")).plan()
                .orElseThrow();
        List<Bay> bays = bays(demo, "typical");
        Bay c = named(bays, "C-D/2-3");
        assertAll(() -> assertTrue(c.edge(), "the side on grid C is the atrium's"),
                () -> assertEquals(ft(60), c.floorWidth(), MM, "across the beams from the atrium at C to the slab edge at E"),
                () -> assertFalse(named(bays, "C-D/3-4").edge() && named(bays, "C-D/3-4").floorWidth() < ft(60),
                        "C-D/3-4 is beside the atrium only across its beams"));
    }
}
