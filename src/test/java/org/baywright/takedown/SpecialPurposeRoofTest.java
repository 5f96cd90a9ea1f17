package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.List;
import org.baywright.analysis.SimpleSpan;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.load.LoadCase;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Roofs used for assembly, gardens or other occupancies are reduced as floors (ASCE 7-16 §4.8.3), not by
 * R1·R2 of §4.8.2. A building of 2 × 2 bays of 30 ft, beams along y at 10 ft, one floor (L0 = 50 psf,
 * ordinary) under a roof whose area load is {@code roofLive} 100 psf: once with use "assembly", once
 * "ordinary".
 *
 * <p>Expected values, all COMPUTED by hand here:
 * <ul>
 *   <li>ordinary roof, §4.8.2 Eq. 4.8-1: interior beam A_T = 30 × 10 = 300 ft² → R1 = 1.2 − 0.001·300 =
 *       0.90, flat roof R2 = 1 → Lr = 90 psf; interior column A_T = 900 ft² ≥ 600 → R1 = 0.6 →
 *       100 psf × 900 ft² = 90 kip becomes 54 kip;</li>
 *   <li>assembly roof, §4.8.3 → §4.7.5: assembly live load of 100 psf or less is not reduced: the beam
 *       carries 100 psf × 300 ft² = 30 kip of L, the column 90 kip of L below the roof;</li>
 *   <li>below Level 2 the interior column supports two floors (the assembly roof counts as one, §4.8.3):
 *       ordinary L 50 psf × 900 ft² = 45 kip with K_LL·A_T = 4 × 1800 = 7200 ft² → 0.25 + 15/√7200 =
 *       0.4268 (CHECK-VALUES §3 Table 3, interior column two floors, COMPUTED), plus the 90 kip of
 *       assembly load unreduced.</li>
 * </ul>
 * Tolerance 1e-9 kip: the loads are exact products of the inputs.
 */
class SpecialPurposeRoofTest {

    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double KIP = Units.KIPS.toSi(1);
    private static final int L = LoadCase.L.ordinal();
    private static final int LR = LoadCase.LR.ordinal();

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    private static TakedownResult run(LiveLoadUse roofUse) {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("roof use", "us", List.of(ft(30), ft(30)), List.of(ft(30), ft(30)),
                List.of(ft(13), ft(13)), true, ft(10), new LoadValues(psf(50), psf(10), psf(50), 0, 0, 0),
                new LoadValues(psf(40), psf(10), 0, psf(100), 0, 0), LoadValues.ZERO));
        List<Floor> floors = new ArrayList<>();
        for (Floor f : p.floors()) {
            if (!f.roof()) {
                floors.add(f);
                continue;
            }
            List<AreaLoad> loads = f.areaLoads().stream()
                    .map(al -> new AreaLoad(al.id(), al.outline(), al.values(), roofUse)).toList();
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    loads, f.lineLoads(), f.pointLoads()));
        }
        Plan plan = new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), floors, p.columns());
        return PlanRun.run(plan, CATALOG).takedown();
    }

    private static MemberResult member(TakedownResult t, String level, String id) {
        return t.members().get(t.levelFloors().get(level)).stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    private static StoreyLoad storey(TakedownResult t, String column, String level) {
        return t.columns().stream().filter(c -> c.id().equals(column)).findFirst().orElseThrow().tiers().stream()
                .flatMap(tier -> tier.storeys().stream()).filter(s -> s.level().equals(level)).findFirst().orElseThrow();
    }

    /** Total service load of one case the member was designed for (live loads reduced), kip. */
    private static double designed(MemberResult m, LoadCase c) {
        if (!m.loads().present().contains(c)) {
            return 0;
        }
        SimpleSpan s = m.loads().of(c);
        return (s.leftReaction() + s.rightReaction()) / KIP;
    }

    @Test
    void anAssemblyRoofIsNotReducedAtTheBeamOrTheColumn() {
        TakedownResult t = run(LiveLoadUse.ASSEMBLY);
        MemberResult beam = member(t, "Roof", "IF-AB-12/1");
        StoreyLoad roof = storey(t, "C-B2", "Roof");
        StoreyLoad below = storey(t, "C-B2", "Level 2");
        assertAll(
                // §4.7.5: 100 psf × 300 ft² = 30 kip of L, not reduced; no roof live load left
                () -> assertEquals(30, designed(beam, LoadCase.L), 1e-9),
                () -> assertEquals(0, designed(beam, LoadCase.LR), 1e-9),
                // column below the roof: 90 kip unreduced stays 90 kip (was 54 kip with R1 = 0.6)
                () -> assertEquals(90, roof.unreduced()[L] / KIP, 1e-9),
                () -> assertEquals(90, roof.reduced()[L] / KIP, 1e-9),
                () -> assertEquals(0, roof.reduced()[LR] / KIP, 1e-9),
                // below Level 2: two floors supported; 45 kip × 0.4268 + 90 kip
                () -> assertEquals(2, below.floorsSupported()),
                () -> assertEquals(45 * 0.4268 + 90, below.reduced()[L] / KIP, 45 * 5e-5),
                () -> assertEquals(45 * (0.25 + 15 / Math.sqrt(7200)) + 90, below.reduced()[L] / KIP, 1e-9));
    }

    @Test
    void anOrdinaryRoofIsStillReducedByR1() {
        TakedownResult t = run(LiveLoadUse.ORDINARY);
        MemberResult beam = member(t, "Roof", "IF-AB-12/1");
        StoreyLoad roof = storey(t, "C-B2", "Roof");
        StoreyLoad below = storey(t, "C-B2", "Level 2");
        assertAll(
                // Eq. 4.8-1: 100 psf × 0.90 × 300 ft² = 27 kip of Lr
                () -> assertEquals(27, designed(beam, LoadCase.LR), 1e-9),
                () -> assertEquals(0, designed(beam, LoadCase.L), 1e-9),
                // column: 90 kip × R1 0.6 = 54 kip
                () -> assertEquals(90, roof.unreduced()[LR] / KIP, 1e-9),
                () -> assertEquals(54, roof.reduced()[LR] / KIP, 1e-9),
                // the ordinary roof is no floor: one floor below Level 2, 0.25 + 15/√3600 = 0.500
                () -> assertEquals(1, below.floorsSupported()),
                () -> assertEquals(22.5, below.reduced()[L] / KIP, 1e-9));
    }

    @Test
    void aSpecialRoofLoadIsNoRoofLiveLoad() {
        TakedownResult t = run(LiveLoadUse.NOT_REDUCIBLE);
        StoreyLoad roof = storey(t, "C-B2", "Roof");
        assertAll(() -> assertEquals(90, roof.reduced()[L] / KIP, 1e-9),
                () -> assertFalse(roof.unreduced()[LR] != 0, "roof live load left in Lr"));
    }
}
