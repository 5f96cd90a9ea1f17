package org.baywright.design.dg11;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Behaviour of the DG11 (2nd ed.) functions beyond the handbook example: the floor-extent limits, the
 * girder-deflection reduction and its bounds, continuity, the status outside 3–9 Hz, the tolerance limits by
 * occupancy (Table 4-1, from memory; CHECK-VALUES §6), and the transformed section against a layer sum.
 */
class Dg11Test {
    private static final double ES = Units.KSI.toSi(29000);
    private static final double FT = Units.FT_.toSi(1);
    private static final double IN = Units.IN.toSi(1);

    @Test
    void effectiveWidthsStopAtTwoThirdsOfTheFloor() {
        BayVibration bay = Dg11ValidationTest.handbookBay();
        // the handbook bay's B_j = 32.91 ft and B_g = 47.25 ft; floors of 45 × 60 ft cap them at 30 and 40 ft
        VibrationResult r = Walking.check(bay.withFloor(45 * FT, 60 * FT), null);
        VibrationResult free = Walking.check(bay.withFloor(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY), null);
        assertAll(
                () -> assertEquals(30 * FT, r.bj(), 1e-9),
                () -> assertEquals(40 * FT, r.bg(), 1e-9),
                () -> assertEquals(Walking.check(bay, null).bj(), free.bj(), 1e-12, "180 × 90 ft does not limit"),
                // C_j = 1.0 for beams parallel to an interior edge halves B_j (DG11 §4.1, from memory)
                () -> assertEquals(free.bj() / 2, Walking.check(bay.withCoefficients(1.0, 1.8), null).bj(), 1e-9));
    }

    @Test
    void theGirderDeflectionIsReducedOnlyWhenTheGirderIsShorterThanBjAndByAtMostHalf() {
        double dg = 0.3 * IN;
        assertAll(
                () -> assertEquals(dg, EffectiveWeights.reducedGirderDeflection(dg, 35 * FT, 30 * FT, null), 0, "Lg ≥ Bj"),
                () -> assertEquals(dg, EffectiveWeights.reducedGirderDeflection(dg, 30 * FT, 30 * FT, null), 0, "Lg = Bj"),
                () -> assertEquals(0.8 * dg, EffectiveWeights.reducedGirderDeflection(dg, 24 * FT, 30 * FT, null), 1e-12),
                () -> assertEquals(0.5 * dg, EffectiveWeights.reducedGirderDeflection(dg, 10 * FT, 30 * FT, null), 1e-12,
                        "Lg/Bj = 0.33 is taken as 0.5"));
    }

    @Test
    void continuityCountsFromSevenTenthsOfTheSpanAndAddsHalf() {
        assertAll(
                () -> assertTrue(EffectiveWeights.continuous(30 * FT, 21 * FT)),
                () -> assertFalse(EffectiveWeights.continuous(30 * FT, 20.9 * FT)),
                () -> assertEquals(1.5, EffectiveWeights.continuityFactor("beam", true, null)),
                () -> assertEquals(1.0, EffectiveWeights.continuityFactor("beam", false, null)),
                () -> {
                    BayVibration bay = Dg11ValidationTest.handbookBay();
                    VibrationResult simple = Walking.check(bay.withBeam(bay.beam().withContinuous(false)), null);
                    assertEquals(Walking.check(bay, null).wj() / 1.5, simple.wj(), 1e-9 * simple.wj());
                });
    }

    @Test
    void aStiffShortBayIsOutsideTheMethodNotAPass() {
        VibrationMember beam = new VibrationMember(12 * FT, 8 * FT, Units.IN4.toSi(2000), Units.KLF.toSi(0.5), false);
        VibrationMember girder = new VibrationMember(12 * FT, 12 * FT, Units.IN4.toSi(6000), Units.KLF.toSi(0.8), false);
        VibrationResult r = Walking.check(BayVibration.interior(beam, girder, ES, Stiffness.ds(4.5 * IN, 9, null),
                Occupancy.OFFICES, Damping.PAPER_OFFICE), null);
        assertAll(
                () -> assertTrue(r.fn() > 9, "f_n = " + r.fn()),
                () -> assertEquals(VibrationStatus.OUTSIDE_METHOD, r.status()),
                () -> assertTrue(r.summary().contains("does not apply"), r.summary()));
    }

    @Test
    void aLivelyLongBayBelowThreeHertzIsFlagged() {
        VibrationMember beam = new VibrationMember(48 * FT, 10 * FT, Units.IN4.toSi(1200), Units.KLF.toSi(0.65), false);
        VibrationMember girder = new VibrationMember(40 * FT, 48 * FT, Units.IN4.toSi(3000), Units.KLF.toSi(3.2), false);
        VibrationResult r = Walking.check(BayVibration.interior(beam, girder, ES, Stiffness.ds(4.25 * IN, 10, null),
                Occupancy.OFFICES, Damping.ELECTRONIC_OFFICE), null);
        assertAll(
                () -> assertTrue(r.fn() < 3, "f_n = " + r.fn()),
                () -> assertTrue(r.belowThreeHz()),
                () -> assertEquals(VibrationStatus.EXCEEDS, r.status()),
                () -> assertTrue(r.summary().contains("below 3 Hz"), r.summary()));
    }

    /**
     * Where L_g &lt; B_j, Eq. 4-4's Δg′ = (L_g/B_j)·Δg grows as stiffer beams narrow B_j, so with a girder much
     * softer than the beams (Δg′ &gt; 4·Δj) doubling I_j lowers f_n (COMPUTED: Δj 0.12 → 0.06 in, Δg′ 0.62 → 0.74 in).
     * The property test therefore states "stiffer beams never lower f_n" where Δg′ ≤ 4·Δj.
     */
    @Test
    void theGirderReductionCanLowerTheFrequencyAsBeamsStiffen() {
        double wj = Units.PLF.toSi(740);
        VibrationMember beam = new VibrationMember(40 * FT, 10 * FT, Units.IN4.toSi(12000), wj, false);
        VibrationMember girder = new VibrationMember(20 * FT, 40 * FT, Units.IN4.toSi(400),
                VibrationLoads.girderWeight(wj, 10 * FT, 40 * FT, Units.PLF.toSi(60), null), false);
        BayVibration bay = BayVibration.interior(beam, girder, ES, Stiffness.ds(6 * IN, 9, null), Occupancy.OFFICES,
                Damping.PAPER_OFFICE);
        VibrationResult r1 = Walking.check(bay, null);
        VibrationResult r2 = Walking.check(bay.withBeam(beam.withIt(2 * beam.it())), null);
        assertAll(
                () -> assertTrue(girder.span() < r1.bj() && girder.span() > 0.5 * r1.bj(), "0.5 < Lg/Bj < 1"),
                () -> assertTrue(r1.dgReduced() > 4 * r1.dj()),
                () -> assertTrue(r2.fn() < r1.fn(), r1.fn() + " → " + r2.fn()));
    }

    @Test
    void toleranceLimitsAndWalkingForceByOccupancy() {
        // DG11 2nd ed. Table 4-1 (from memory; CHECK-VALUES §6 method): 0.5 % offices, residences, quiet areas;
        // 1.5 % malls and indoor footbridges; 5 % outdoor footbridges. P_o = 65 lb (FOUND), 92 lb footbridges (memory)
        assertAll(
                () -> assertEquals(0.005, Occupancy.OFFICES.limit()),
                () -> assertEquals(0.005, Occupancy.RESIDENCES.limit()),
                () -> assertEquals(0.005, Occupancy.QUIET_AREAS.limit()),
                () -> assertEquals(0.015, Occupancy.SHOPPING_MALLS.limit()),
                () -> assertEquals(0.015, Occupancy.INDOOR_FOOTBRIDGES.limit()),
                () -> assertEquals(0.05, Occupancy.OUTDOOR_FOOTBRIDGES.limit()),
                () -> assertEquals(65, Units.LBF.fromSi(Occupancy.OFFICES.po()), 1e-9),
                () -> assertEquals(92, Units.LBF.fromSi(Occupancy.OUTDOOR_FOOTBRIDGES.po()), 1e-9),
                // CHECK-VALUES §6: 11 psf offices, 6 psf residences (memory)
                () -> assertEquals(11, Units.PSF.fromSi(Occupancy.OFFICES.vibrationLive()), 1e-9),
                () -> assertEquals(6, Units.PSF.fromSi(Occupancy.RESIDENCES.vibrationLive()), 1e-9),
                // CHECK-VALUES §6: β 0.02 electronic office, 0.025 paper office, 0.03 full-height partitions (memory)
                () -> assertEquals(0.02, Damping.ELECTRONIC_OFFICE.beta()),
                () -> assertEquals(0.025, Damping.PAPER_OFFICE.beta()),
                () -> assertEquals(0.03, Damping.FULL_HEIGHT_PARTITIONS.beta()));
    }

    /**
     * The transformed moment of inertia against an independent sum (COMPUTED): the slab cut into 2,000 thin
     * layers, each b/n (or ρ·b/n in the ribs) wide, about the neutral axis found from the same layers, plus the
     * steel by the parallel-axis rule. W21X44 under 3.5 in of concrete on a 1.5 in deck, b = 120 in, n = 10.06.
     */
    @Test
    void transformedInertiaAgreesWithALayerSum() {
        Section s = CatalogFile.loadDefault().find("W21X44").orElseThrow();
        VibrationSlab slab = VibrationSlab.us(3.5, 1.5, 0.5, 2136);
        for (Ribs ribs : Ribs.values()) {
            double it = Stiffness.transformedInertia(s, slab, ribs, 30 * FT, 10 * FT, ES, null);
            double n = ES / (1.35 * slab.ec());
            double bn = 120 * IN / n;
            double rho = ribs == Ribs.PARALLEL ? 0.5 : 0;
            int layers = 2000;
            double depth = slab.tc() + slab.hr();
            double h = depth / layers;
            double a = s.props().a();
            double ay = a * (depth + s.depth() / 2);
            for (int i = 0; i < layers; i++) {
                double y = (i + 0.5) * h;
                double width = y < slab.tc() ? bn : rho * bn;
                a += width * h;
                ay += width * h * y;
            }
            double yBar = ay / a;
            double sum = s.props().ix() + s.props().a() * Math.pow(depth + s.depth() / 2 - yBar, 2);
            for (int i = 0; i < layers; i++) {
                double y = (i + 0.5) * h;
                double width = y < slab.tc() ? bn : rho * bn;
                sum += width * h * h * h / 12 + width * h * (y - yBar) * (y - yBar);
            }
            double expected = sum;
            assertEquals(expected, it, 1e-6 * expected, ribs.name());
        }
        double perpendicular = Stiffness.transformedInertia(s, slab, Ribs.PERPENDICULAR, 30 * FT, 10 * FT, ES, null);
        double parallel = Stiffness.transformedInertia(s, slab, Ribs.PARALLEL, 30 * FT, 10 * FT, ES, null);
        assertAll(
                () -> assertTrue(parallel > perpendicular, "the ribs' concrete counts when parallel"),
                () -> assertTrue(perpendicular > 2 * s.props().ix(), "composite: more than twice the bare W21X44"));
    }

    @Test
    void inputsOutOfRangeAreRefusedWithTheirNames() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new VibrationMember(0, 10 * FT, 1e-4, 1e3, false));
        assertTrue(e.getMessage().contains("span"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> VibrationSlab.us(3.5, 1.5, 1.2, 2136));
    }
}
