package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.load.LiveLoadReduction;
import org.baywright.load.LoadCase;
import org.baywright.load.ReducibleUse;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Storage live load is a heavy live load whatever value is typed (ASCE 7-16 §4.7.3: live loads exceeding
 * 100 psf are not reduced, except by up to 20 % for members supporting two or more floors; storage
 * warehouses are 125 psf light and 250 psf heavy in Table 4.3-1, FOUND in the standard, so storage is
 * always in that class). A storage load typed below its table value also gets a warning.
 */
class StorageLiveLoadTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final int L = LoadCase.L.ordinal();

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    /** Three levels (two floors and a roof) of 2 × 2 bays of 30 ft, the floors' area load given the use and live load. */
    private static RunResult run(LiveLoadUse use, double livePsf) {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("storage", "us", List.of(ft(30), ft(30)), List.of(ft(30), ft(30)),
                List.of(4.0, 4.0, 4.0), true, ft(10), new LoadValues(psf(50), 0, psf(livePsf), 0, 0, 0),
                new LoadValues(psf(20), 0, 0, psf(20), 0, 0), LoadValues.ZERO));
        List<Floor> floors = new ArrayList<>();
        for (Floor f : p.floors()) {
            if (f.roof()) {
                floors.add(f);
                continue;
            }
            AreaLoad al = f.areaLoads().get(0);
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    List.of(new AreaLoad(al.id(), al.outline(), al.values(), use)), f.lineLoads(), f.pointLoads()));
        }
        return PlanRun.run(new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), floors, p.columns()), CATALOG);
    }

    @Test
    void theReductionRuleIsTheHeavyLoadRuleWhateverTheValue() {
        // ASCE 7-16 §4.7.3 with §4.7.2 Eq. 4.7-1, COMPUTED: one floor, no reduction; two or more floors, the
        // Eq. 4.7-1 value (0.25 + 15/√(2·1,000) = 0.585) limited to 0.80
        assertEquals(1.0, LiveLoadReduction.floor(psf(80), 2, Units.FT2.toSi(1000), 1, ReducibleUse.HEAVY, null).factor(), 1e-12);
        assertEquals(0.80, LiveLoadReduction.floor(psf(80), 2, Units.FT2.toSi(1000), 2, ReducibleUse.HEAVY, null).factor(), 1e-12);
        assertEquals(0.25 + 15 / Math.sqrt(2000),
                LiveLoadReduction.floor(psf(80), 2, Units.FT2.toSi(1000), 2, ReducibleUse.ORDINARY, null).factor(), 1e-12,
                "the same load as ordinary occupancy is reduced by Eq. 4.7-1");
    }

    @Test
    void storageOnAFloorIsNotReducedOnOneFloorAndAtMostTwentyPercentOnTwo() {
        for (LiveLoadUse use : List.of(LiveLoadUse.STORAGE_LIGHT, LiveLoadUse.STORAGE_HEAVY)) {
            RunResult r = run(use, 80);
            for (var floor : r.takedown().members().values()) {
                for (MemberResult m : floor) {
                    if (m.loads() != null && m.liveFactor() > 0 && m.tributaryArea() > 0 && !Double.isNaN(m.liveFactor())) {
                        assertEquals(1.0, m.liveFactor(), 1e-12, use + " " + m.id() + ": a member supports one floor");
                    }
                }
            }
            List<Double> factors = new ArrayList<>();
            for (ColumnResult c : r.takedown().columns()) {
                for (ColumnTier t : c.tiers()) {
                    for (StoreyLoad s : t.storeys()) {
                        if (s.unreduced()[L] > 0) {
                            factors.add(s.reduced()[L] / s.unreduced()[L]);
                        }
                    }
                }
            }
            assertTrue(factors.stream().allMatch(f -> Math.abs(f - 1.0) < 1e-9 || Math.abs(f - 0.8) < 1e-9), use + " " + factors);
            assertTrue(factors.stream().anyMatch(f -> Math.abs(f - 0.8) < 1e-9), use + ": storeys carrying two floors " + factors);
        }
        RunResult ordinary = run(LiveLoadUse.ORDINARY, 80);
        double least = ordinary.takedown().columns().stream().flatMap(c -> c.tiers().stream()).flatMap(t -> t.storeys().stream())
                .filter(s -> s.unreduced()[L] > 0).mapToDouble(s -> s.reduced()[L] / s.unreduced()[L]).min().orElseThrow();
        assertTrue(least < 0.8, "ordinary occupancy at 80 psf reduces further: " + least);
    }

    @Test
    void storageBelowItsTableValueIsWarnedWithTheLoadAreaNamed() {
        RunResult low = run(LiveLoadUse.STORAGE_HEAVY, 125);
        List<Problem> warned = low.problems().stream().filter(p -> p.kind().equals("below-table-live-load")).toList();
        assertTrue(!warned.isEmpty(), low.problems().toString());
        Problem w = warned.get(0);
        assertEquals(Problem.Severity.WARNING, w.severity());
        assertTrue(w.message().contains("125 psf") && w.message().contains("250 psf") && w.message().contains("Table 4.3-1"),
                w.message());
        assertEquals(1, w.where().size(), "drawn at the load area");
        assertTrue(run(LiveLoadUse.STORAGE_HEAVY, 250).problems().stream().noneMatch(p -> p.kind().equals("below-table-live-load")));
        assertTrue(run(LiveLoadUse.STORAGE_LIGHT, 125).problems().stream().noneMatch(p -> p.kind().equals("below-table-live-load")));
    }
}
