package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.baywright.load.LoadCase;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A regular two-by-two-bay, three-level building taken down by hand (hand calculation in this test,
 * following the tributary practice of CHECK-VALUES §9, common practice): 30 ft × 30 ft bays, beams
 * north–south at 10 ft, deck spanning east–west, D = 56 + 10 psf, L = 50 psf on Levels 2 and 3, roof
 * D = 56 + 15 psf, Lr = 20 psf. Live-load reduction is turned off here so that every number is a
 * plain tributary product; the section weights the run chose are read back and added by hand.
 */
class TakedownValidationTest {
    private static final double FT = Units.FT_.toSi(1);
    private static final double PSF = Units.PSF.toSi(1);
    private static final double KIP = Units.KIPS.toSi(1);
    private static RunResult run;
    private static Map<String, MemberResult> typical;
    private static Map<String, MemberResult> roof;

    @BeforeAll
    static void runIt() {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("hand check", "us", List.of(30 * FT, 30 * FT),
                List.of(30 * FT, 30 * FT), List.of(14 * FT, 13 * FT, 13 * FT), true, 10 * FT,
                new LoadValues(56 * PSF, 10 * PSF, 50 * PSF, 0, 0, 0), new LoadValues(56 * PSF, 15 * PSF, 0, 20 * PSF, 0, 0),
                LoadValues.ZERO));
        var s = p.settings();
        p = new Plan(p.name(), p.units(), new org.baywright.plan.DesignSettings(s.method(), s.fy(), s.liveDeflection(),
                s.totalDeflection(), s.beamSeries(), s.girderSeries(), s.columnSeries(), s.maxBeamDepth(), s.spliceEvery(),
                false, s.partitionAsDead(), s.girderAreaDelivered(), s.catalog()), p.grid(), p.levels(), p.floors(), p.columns());
        run = PlanRun.run(p);
        TakedownResult t = run.takedown();
        typical = t.members().get(t.levelFloors().get("Level 2")).stream()
                .collect(Collectors.toMap(MemberResult::id, m -> m));
        roof = t.members().get(t.levelFloors().get("Roof")).stream().collect(Collectors.toMap(MemberResult::id, m -> m));
    }

    private static double w(MemberResult m) {
        return m.design().section().weight();
    }

    @Test
    void runsCleanly() {
        assertTrue(run.problems().isEmpty(), run.problems().toString());
        assertEquals(3, run.plan().levels().size());
    }

    @Test
    void beamsCarryTheirStrips() {
        // interior infill beam: 10 ft strip × 30 ft = 300 ft²; each end D = 66 psf × 150 ft² + half its own weight
        MemberResult b = typical.get("IF-AB-12/1");
        // column-line beam on the edge (grid A): 5 ft strip = 150 ft²; on grid B: 10 ft = 300 ft²
        MemberResult edge = typical.get("B-A-12");
        MemberResult mid = typical.get("B-B-12");
        assertAll(
                () -> assertEquals(300, b.tributaryArea() / (FT * FT), 1e-6),
                () -> assertEquals(150, edge.tributaryArea() / (FT * FT), 1e-6),
                () -> assertEquals(300, mid.tributaryArea() / (FT * FT), 1e-6),
                () -> assertEquals(66 * 150 * PSF * FT * FT + w(b) * 15 * FT, b.startReaction()[Component.D.ordinal()], 1e-6),
                () -> assertEquals(50 * 150 * PSF * FT * FT, b.startReaction()[Component.L_ORDINARY.ordinal()], 1e-6),
                // a girder parallel to the deck span takes no deck load
                () -> assertEquals(0, typical.get("G-2-AB").tributaryArea(), 1e-9));
    }

    @Test
    void girderCarriesTheBeamReactions() {
        // interior girder on grid 2 between A and B: beams at 10 ft and 20 ft from both sides,
        // P = 2 × (66 psf × 150 ft² + 15 ft × w_beam) at each point; end reaction = P + 15 ft × w_girder
        MemberResult g = typical.get("G-2-AB");
        MemberResult b = typical.get("IF-AB-12/1");
        double p = 2 * (66 * 150 * PSF * FT * FT + w(b) * 15 * FT);
        assertEquals(p + w(g) * 15 * FT, g.startReaction()[Component.D.ordinal()], 1e-6 * p);
        assertEquals(2 * 50 * 150 * PSF * FT * FT, g.startReaction()[Component.L_ORDINARY.ordinal()], 1e-6);
    }

    @Test
    void interiorColumnByHand() {
        // column B2 receives at each floor: girders G-2-AB and G-2-BC (one end each) and column-line beams
        // B-B-12 and B-B-23 (one end each): 900 ft² of deck (common practice: interior column, 30 × 30 ft)
        ColumnResult c = run.takedown().columns().stream().filter(x -> x.id().equals("C-B2")).findFirst().orElseThrow();
        double[] perLevelD = new double[2];
        List<Map<String, MemberResult>> floors = List.of(typical, roof);
        for (int k = 0; k < 2; k++) {
            Map<String, MemberResult> f = floors.get(k);
            double q = k == 0 ? 66 : 71;
            double deck = q * 900 * PSF * FT * FT;
            // self-weight delivered: half of each girder G-2-*, half of each column-line beam B-B-*, and the
            // beams framing into those girders (two per bay side, four bays around B2 → 4 beams × half
            // their weight, each beam feeding half to this girder line… each girder end takes half of the
            // two beams on each side): Σ = Σ over delivered members of their weight share
            double sw = 0.5 * (w(f.get("G-2-AB")) + w(f.get("G-2-BC"))) * 30 * FT
                    + 0.5 * (w(f.get("B-B-12")) + w(f.get("B-B-23"))) * 30 * FT;
            // infill beams: 4 beams on each girder (2 per side); each girder end takes half of them,
            // each beam delivers half its weight to the girder line 2
            for (String id : List.of("IF-AB-12/1", "IF-AB-12/2", "IF-AB-23/1", "IF-AB-23/2",
                    "IF-BC-12/1", "IF-BC-12/2", "IF-BC-23/1", "IF-BC-23/2")) {
                sw += 0.5 * 0.5 * w(f.get(id)) * 30 * FT;
            }
            perLevelD[k] = deck + sw;
        }
        ColumnTier bottom = c.tiers().get(0);
        StoreyLoad storey1 = bottom.storeys().get(0);
        double columnWeight = 0;
        for (ColumnTier t : c.tiers()) {
            columnWeight += t.weight() * t.length();
        }
        double hand = 2 * perLevelD[0] + perLevelD[1] + columnWeight;
        assertAll(
                () -> assertEquals("Level 2", storey1.level()),
                () -> assertEquals(hand, storey1.unreduced()[LoadCase.D.ordinal()], 1e-6 * hand),
                () -> assertEquals(hand, c.foundation()[LoadCase.D.ordinal()], 1e-6 * hand),
                // live: 2 floors × 50 psf × 900 ft² = 90 kip; roof live 20 psf × 900 ft² = 18 kip
                () -> assertEquals(90 * KIP, c.foundation()[LoadCase.L.ordinal()], 1e-6 * KIP),
                () -> assertEquals(18 * KIP, c.foundation()[LoadCase.LR.ordinal()], 1e-6 * KIP),
                // splices every two levels: tiers Level 2–3 and Roof
                () -> assertEquals(List.of("Level 2", "Level 3"), c.tiers().get(0).levels()),
                () -> assertEquals(List.of("Roof"), c.tiers().get(1).levels()));
    }

    @Test
    void cornerAndEdgeColumnsTakeQuarterAndHalfBays() {
        // corner column: 15 × 15 ft = 225 ft²; edge column: 30 × 15 ft = 450 ft² per floor (common practice)
        Map<String, ColumnResult> cols = run.takedown().columns().stream().collect(Collectors.toMap(ColumnResult::id, c -> c));
        assertAll(
                () -> assertEquals(2 * 50 * 225 * PSF * FT * FT, cols.get("C-A1").foundation()[LoadCase.L.ordinal()], 1e-6),
                () -> assertEquals(2 * 50 * 450 * PSF * FT * FT, cols.get("C-B1").foundation()[LoadCase.L.ordinal()], 1e-6),
                () -> assertEquals(2 * 50 * 450 * PSF * FT * FT, cols.get("C-A2").foundation()[LoadCase.L.ordinal()], 1e-6),
                () -> assertEquals("corner", cols.get("C-A1").position()),
                () -> assertEquals("interior", cols.get("C-B2").position()));
    }

    @Test
    void equilibriumHoldsForEveryCase() {
        for (Equilibrium e : run.takedown().equilibrium()) {
            assertTrue(e.holds(), e.toString());
        }
        // total live: 2 floors × 60 ft × 60 ft × 50 psf = 360 kip (hand calculation)
        double l = run.takedown().equilibrium().stream().filter(e -> e.loadCase().equals("L")).findFirst().orElseThrow().applied();
        assertEquals(360 * KIP, l, 1e-6 * KIP);
        assertEquals(Collections.nCopies(1, 3 * 3600.0).get(0), run.takedown().floorArea() / (FT * FT), 1e-6);
    }
}
