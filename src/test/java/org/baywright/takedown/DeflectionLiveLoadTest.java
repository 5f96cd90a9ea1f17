package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.Check;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Which live load the deflection checks take (settings.deflectionLiveLoad). An interior infill beam of a
 * generated floor: 30 ft span, beams at 10 ft, L0 = 50 psf → w_L = 0.500 klf unreduced. Its A_T = 300 ft²,
 * K_LL = 2 → Eq. 4.7-1 factor 0.25 + 15/√600 = 0.8624 (CHECK-VALUES §3 Table 3, COMPUTED) → 0.4312 klf
 * (431 plf, the value the same table gives for this beam).
 *
 * <p>Live-load deflection, simple span under uniform load: Δ = 5·w·L⁴/(384·E·Ix) (AISC Manual Table 3-23
 * Case 1; CHECK-VALUES §5, COMPUTED), E = 29,000 ksi, Ix of the section chosen in each run. Unreduced
 * ("unreduced", the default, common practice for serviceability) takes w = 0.500 klf; "reduced" takes
 * 0.4312 klf. The strength loads are the reduced ones either way. Tolerance 1e-9 relative: the run
 * evaluates the same closed form.
 */
class DeflectionLiveLoadTest {

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static Plan plan(boolean deflectionReduced) {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("deflection", "us", List.of(ft(30), ft(30)), List.of(ft(30), ft(30)),
                List.of(ft(13)), true, ft(10), new LoadValues(Units.PSF.toSi(50), Units.PSF.toSi(10), Units.PSF.toSi(50), 0, 0, 0),
                LoadValues.ZERO, LoadValues.ZERO));
        return new Plan(p.name(), p.units(), p.settings().withDeflectionLiveReduced(deflectionReduced), p.grid(), p.levels(),
                p.floors(), p.columns());
    }

    private static MemberResult beam(boolean deflectionReduced) {
        TakedownResult t = PlanRun.run(plan(deflectionReduced), CatalogFile.loadDefault()).takedown();
        return t.members().values().iterator().next().stream().filter(m -> m.id().equals("IF-AB-12/1")).findFirst()
                .orElseThrow();
    }

    private static Check check(MemberResult m, String name) {
        return m.design().checks().stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
    }

    /** 5·w·L⁴/(384·E·Ix), in inches, w in klf, L in ft, Ix in in⁴. */
    private static double deflectionIn(double wKlf, double spanFt, double ixIn4) {
        double w = wKlf / 12; // kip/in
        double l = spanFt * 12;
        return 5 * w * Math.pow(l, 4) / (384 * 29000 * ixIn4);
    }

    private static double ixIn4(MemberResult m) {
        return m.design().section().props().ix() / Math.pow(Units.IN.toSi(1), 4);
    }

    @Test
    void liveDeflectionIsUnreducedByDefaultAndReducedWhenTheSettingSaysSo() {
        MemberResult unreduced = beam(false);
        MemberResult reduced = beam(true);
        double factor = 0.25 + 15 / Math.sqrt(600);
        Check du = check(unreduced, "live-load deflection");
        Check dr = check(reduced, "live-load deflection");
        double expectedU = deflectionIn(0.500, 30, ixIn4(unreduced));
        double expectedR = deflectionIn(0.500 * factor, 30, ixIn4(reduced));
        assertAll(
                () -> assertEquals(0.8624, factor, 5e-5),
                () -> assertEquals(0.8624, unreduced.liveFactor(), 5e-5), // strength still uses the reduced load
                () -> assertEquals(expectedU, Units.IN.fromSi(du.demand()), expectedU * 1e-9),
                () -> assertEquals(expectedR, Units.IN.fromSi(dr.demand()), expectedR * 1e-9),
                () -> assertTrue(du.note().contains("live load unreduced"), du.note()),
                () -> assertFalse(dr.note().contains("unreduced"), dr.note()));
    }
}
