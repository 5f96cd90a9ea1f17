package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The girder A_T option (docs/takedown.md): for an interior girder carrying beams at third points of
 * 30 × 30 ft bays, the delivered area is 600 ft² (L = 34.15 psf for L0 = 50 psf) and half the bay on
 * each side is 900 ft² (L = 30.18 psf). Source: CHECK-VALUES §3 Table 3 "Interior girder" row and §9
 * rule 5 (COMPUTED from ASCE 7-16 Eq. 4.7-1).
 */
class GirderAreaOptionTest {
    private static final double FT = Units.FT_.toSi(1);

    private static MemberResult interiorGirder(boolean delivered) {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("girder area", "us", List.of(30 * FT, 30 * FT),
                List.of(30 * FT, 30 * FT), List.of(13 * FT), true, 10 * FT,
                new LoadValues(Units.PSF.toSi(56), 0, Units.PSF.toSi(50), 0, 0, 0), LoadValues.ZERO, LoadValues.ZERO));
        DesignSettings s = p.settings();
        p = new Plan(p.name(), p.units(), s.withLiveLoad(true, s.partitionAsDead(), delivered), p.grid(), p.levels(), p.floors(), p.columns());
        TakedownResult t = PlanRun.run(p).takedown();
        return t.members().get(t.levelFloors().get("Level 2")).stream().filter(m -> m.id().equals("G-2-AB")).findFirst()
                .orElseThrow();
    }

    @Test
    void deliveredArea() {
        MemberResult g = interiorGirder(true);
        assertEquals(600, g.reductionArea() / (FT * FT), 1e-6);
        assertEquals(34.15 / 50, g.liveFactor(), 0.0001);
    }

    @Test
    void halfBayEachSide() {
        MemberResult g = interiorGirder(false);
        assertEquals(900, g.reductionArea() / (FT * FT), 1e-6);
        assertEquals(30.18 / 50, g.liveFactor(), 0.0001);
    }
}
