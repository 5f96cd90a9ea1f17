package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.report.RunSummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The reduction a roof member was designed with is the one reported, per load case, in {@code design
 * --json} and on the member sheet. A generated building: 2 × 2 bays of 30 ft, beams along y at 10 ft,
 * one floor (L0 = 50 psf) under a flat roof with Lr = 20 psf (ordinary).
 *
 * <p>Expected factors, COMPUTED by hand from ASCE 7-16 §4.8.2 Eq. 4.8-1 (R2 = 1 for a flat roof, F ≤ 4):
 * roof interior beam A_T = 30 ft × 10 ft = 300 ft² → R1 = 1.2 − 0.001·300 = 0.900; roof interior girder
 * A_T = 4 × 150 = 600 ft² → R1 = 0.6, Lr = 12 psf, exactly the minimum → 0.600. Floor interior beam:
 * Eq. 4.7-1, K_LL = 2, A_T = 300 ft² → 0.25 + 15/√600 = 0.8624 (CHECK-VALUES §3 Table 3, COMPUTED).
 * The printed factors are rounded to three decimals; the JSON ones are compared to 1e-12.
 */
class RoofReductionReportTest {

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    private static final RunResult RUN = PlanRun.run(plan(), CatalogFile.loadDefault());

    private static Plan plan() {
        return RegularPlan.generate(new RegularPlan.Spec("roof report", "us", List.of(ft(30), ft(30)), List.of(ft(30), ft(30)),
                List.of(ft(13), ft(13)), true, ft(10), new LoadValues(psf(50), psf(10), psf(50), 0, 0, 0),
                new LoadValues(psf(40), psf(10), 0, psf(20), 0, 0), LoadValues.ZERO));
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(String level, String id) {
        List<Map<String, Object>> members = (List<Map<String, Object>>) RunSummary.json(RUN, UnitSystem.US).get("members");
        return members.stream().filter(m -> m.get("id").equals(id) && m.get("level").equals(level)).findFirst().orElseThrow();
    }

    private static MemberResult member(String level, String id) {
        var t = RUN.takedown();
        return t.members().get(t.levelFloors().get(level)).stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void theJsonGivesTheRoofLiveFactorApplied() {
        Map<String, Object> beam = json("Roof", "IF-AB-12/1");
        Map<String, Object> girder = json("Roof", "G-2-AB");
        Map<String, Object> floorBeam = json("Level 2", "IF-AB-12/1");
        assertAll(
                () -> assertEquals(1.2 - 0.001 * 300, (double) beam.get("roofLiveReductionFactor"), 1e-12),
                () -> assertEquals(1.0, (double) beam.get("liveReductionFactor")), // no floor live load on the roof
                () -> assertEquals(0.6, (double) girder.get("roofLiveReductionFactor"), 1e-12),
                () -> assertEquals(0.25 + 15 / Math.sqrt(600), (double) floorBeam.get("liveReductionFactor"), 1e-12),
                () -> assertEquals(0.8624, (double) floorBeam.get("liveReductionFactor"), 5e-5),
                () -> assertEquals(1.0, (double) floorBeam.get("roofLiveReductionFactor")));
    }

    @Test
    void theSheetPrintsTheReductionOfEachLoadCase() {
        String roof = MemberSheets.liveReduction(member("Roof", "IF-AB-12/1"), UnitSystem.US);
        String floor = MemberSheets.liveReduction(member("Level 2", "IF-AB-12/1"), UnitSystem.US);
        assertAll(
                () -> assertTrue(roof.contains("Lr = 0.900·L0 (§4.8.2)"), roof),
                () -> assertFalse(roof.contains("not reduced"), roof),
                () -> assertFalse(roof.contains("K_LL"), roof), // K_LL plays no part in §4.8.2
                () -> assertTrue(floor.contains("K_LL = 2, L = 0.862·L0 (§4.7)"), floor),
                () -> assertFalse(floor.contains("Lr ="), floor));
    }
}
