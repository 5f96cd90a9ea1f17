package org.baywright.design.dg11;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.baywright.units.Units;

/**
 * Properties of the DG11 (2nd ed.) walking check over bays of practice (spans 15–45 ft, beams at 6–15 ft,
 * I_t of W12 to W36 composite sections, realistic weights; continuity, C_j and the floor limits varied):
 * a stiffer member never lowers f_n, and a heavier floor never raises a_p/g at the same f_n.
 */
class Dg11PropertiesTest {
    private static final double ES = Units.KSI.toSi(29000);

    @Provide
    Arbitrary<BayVibration> bays() {
        Arbitrary<Double> lj = Arbitraries.doubles().between(15, 45);
        Arbitrary<Double> s = Arbitraries.doubles().between(6, 15);
        Arbitrary<Double> ij = Arbitraries.doubles().between(300, 12000);
        Arbitrary<Double> lg = Arbitraries.doubles().between(15, 45);
        Arbitrary<Double> ig = Arbitraries.doubles().between(600, 30000);
        Arbitrary<Double> psf = Arbitraries.doubles().between(40, 110);
        Arbitrary<Boolean> cont = Arbitraries.of(true, false);
        Arbitrary<Double> de = Arbitraries.doubles().between(3, 7);
        Arbitrary<Double> floor = Arbitraries.doubles().between(40, 400);
        return Combinators.combine(lj, s, ij, lg, ig, psf, cont, de).as((l1, sp, i1, l2, i2, w, c, d) -> {
            double wj = Units.PSF.toSi(w) * Units.FT_.toSi(sp) + Units.PLF.toSi(40);
            double wg = wj * l1 / sp + Units.PLF.toSi(60);
            VibrationMember beam = new VibrationMember(Units.FT_.toSi(l1), Units.FT_.toSi(sp), Units.IN4.toSi(i1), wj, c);
            VibrationMember girder = new VibrationMember(Units.FT_.toSi(l2), Units.FT_.toSi(l1), Units.IN4.toSi(i2), wg, !c);
            double ds = Stiffness.ds(Units.IN.toSi(d), 9, null);
            return BayVibration.interior(beam, girder, ES, ds, Occupancy.OFFICES, Damping.PAPER_OFFICE);
        }).flatMap(b -> Combinators.combine(floor, floor, Arbitraries.of(Dg11.CJ_INTERIOR, Dg11.CJ_PARALLEL_TO_INTERIOR_EDGE))
                .as((fw, fl, cj) -> b.withFloor(Units.FT_.toSi(fw), Units.FT_.toSi(fl)).withCoefficients(cj, b.cg())));
    }

    /**
     * A stiffer girder never lowers f_n: Δg falls and nothing else in f_n moves (B_j does not depend on the
     * girder).
     */
    @Property
    void aStifferGirderNeverLowersTheFrequency(@ForAll("bays") BayVibration bay, @ForAll @DoubleRange(min = 1, max = 4) double k) {
        VibrationResult before = Walking.check(bay, null);
        VibrationResult after = Walking.check(bay.withGirder(bay.girder().withIt(k * bay.girder().it())), null);
        assertTrue(after.fn() >= before.fn() * (1 - 1e-12), () -> before.fn() + " → " + after.fn());
    }

    /**
     * Stiffer beams never lower f_n. Δj falls as 1/I_j; where L_g &lt; B_j the reduced girder deflection
     * Δg′ = (L_g/B_j)·Δg (Eq. 4-4) rises, as B_j ∝ I_j^(−¼) narrows, by at most a quarter of the relative
     * change — so the property holds where Δg′ ≤ 4·Δj. (Beyond that, a very stiff beam on a much softer girder
     * of a short span, the method itself lowers f_n a little as the beams stiffen: see
     * {@link #theGirderReductionCanLowerTheFrequencyAsBeamsStiffen}.)
     */
    @Property
    void stifferBeamsNeverLowerTheFrequency(@ForAll("bays") BayVibration bay, @ForAll @DoubleRange(min = 1, max = 4) double k) {
        VibrationResult before = Walking.check(bay, null);
        VibrationResult after = Walking.check(bay.withBeam(bay.beam().withIt(k * bay.beam().it())), null);
        net.jqwik.api.Assume.that(after.dgReduced() <= 4 * after.dj());
        assertTrue(after.fn() >= before.fn() * (1 - 1e-12), () -> before.fn() + " → " + after.fn());
    }

    /**
     * A floor k times heavier and k times stiffer throughout (w, I_j, I_g and D_s × k) has every deflection,
     * width and so f_n unchanged, and every weight × k: a_p/g at the same f_n never rises; it falls as 1/k.
     */
    @Property
    void aHeavierFloorNeverRaisesTheAccelerationAtTheSameFrequency(@ForAll("bays") BayVibration bay,
            @ForAll @DoubleRange(min = 1, max = 3) double k) {
        VibrationResult before = Walking.check(bay, null);
        BayVibration heavier = new BayVibration(
                bay.beam().withWeight(k * bay.beam().weight()).withIt(k * bay.beam().it()),
                bay.girder().withWeight(k * bay.girder().weight()).withIt(k * bay.girder().it()),
                bay.es(), k * bay.ds(), bay.cj(), bay.cg(), bay.floorWidth(), bay.floorLength(), bay.beta(), bay.po(),
                bay.limit());
        VibrationResult after = Walking.check(heavier, null);
        assertEquals(before.fn(), after.fn(), 1e-9 * before.fn(), "the same f_n");
        assertTrue(after.apg() <= before.apg() * (1 + 1e-12), () -> before.apg() + " → " + after.apg());
        assertEquals(before.apg() / k, after.apg(), 1e-9 * before.apg(), "a_p/g ÷ k");
    }

    /** Eq. 4-1 alone: at a fixed f_n, a larger W never raises a_p/g. */
    @Property
    void aLargerWeightNeverRaisesTheAcceleration(@ForAll @DoubleRange(min = 1, max = 12) double fn,
            @ForAll @DoubleRange(min = 10, max = 500) double kips, @ForAll @DoubleRange(min = 0, max = 200) double moreKips) {
        double a = Walking.peakAcceleration(Dg11.PO_FLOORS, fn, 0.025, Units.KIPS.toSi(kips), null);
        double b = Walking.peakAcceleration(Dg11.PO_FLOORS, fn, 0.025, Units.KIPS.toSi(kips + moreKips), null);
        assertTrue(b <= a);
    }
}
