package org.baywright.design.dg11;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * Realistic loads for a vibration analysis (DG11 2nd ed. §4.1, from memory; CHECK-VALUES §6): the actual
 * dead load (slab, deck, the member's own weight), the superimposed dead load actually expected (about 4
 * psf for ceiling and services), and a vibration live load by occupancy ({@link Occupancy#vibrationLive}:
 * 11 psf offices, 6 psf residences), not the design loads.
 */
public final class VibrationLoads {
    private static final String SEC_4_1 = Dg11.section("§4.1 (realistic loads)");

    private VibrationLoads() {
    }

    /**
     * DG11 2nd ed. §4.1 (from memory): the weight per floor area a vibration analysis uses,
     * w_a = D + SD + L_v [Pa].
     *
     * @param dead actual dead load of slab and deck [Pa]
     * @param superimposed superimposed dead load actually expected [Pa]
     * @param live the vibration live load [Pa]
     */
    public static double areaWeight(double dead, double superimposed, double live, Calc calc) {
        return Calc.eq(calc, "w_a", "D + SD + Lv", SEC_4_1, dead + superimposed + live, Quantity.AREA_LOAD,
                Arg.of("D", dead, Quantity.AREA_LOAD), Arg.of("SD", superimposed, Quantity.AREA_LOAD),
                Arg.of("Lv", live, Quantity.AREA_LOAD));
    }

    /**
     * DG11 2nd ed. §4.1 (from memory): the weight per length a beam (joist) supports,
     * w_j = w_a·S + w_self [N/m].
     *
     * @param areaWeight {@link #areaWeight} [Pa]
     * @param spacing beam spacing S [m]
     * @param self the beam's own weight [N/m]
     */
    public static double beamWeight(double areaWeight, double spacing, double self, Calc calc) {
        return Calc.eq(calc, "w_j", "w_a·S + w_self", SEC_4_1, areaWeight * spacing + self, Quantity.LINE_LOAD,
                Arg.of("w_a", areaWeight, Quantity.AREA_LOAD), Arg.of("S", spacing, Quantity.SPAN_LENGTH),
                Arg.of("w_self", self, Quantity.LINE_LOAD));
    }

    /**
     * DG11 2nd ed. §4.1 (from memory): the equivalent uniform weight per length a girder supports, the beams'
     * reactions spread along it plus its own weight, w_g = w_j·Lj/S + w_self [N/m].
     *
     * @param beamWeight the beams' weight per length w_j [N/m]
     * @param spacing beam spacing S [m]
     * @param beamSpan the beams' span L_j [m]
     * @param self the girder's own weight [N/m]
     */
    public static double girderWeight(double beamWeight, double spacing, double beamSpan, double self, Calc calc) {
        return Calc.eq(calc, "w_g", "w_j·Lj/S + w_self", SEC_4_1, beamWeight * beamSpan / spacing + self,
                Quantity.LINE_LOAD, Arg.of("w_j", beamWeight, Quantity.LINE_LOAD), Arg.of("Lj", beamSpan, Quantity.SPAN_LENGTH),
                Arg.of("S", spacing, Quantity.SPAN_LENGTH), Arg.of("w_self", self, Quantity.LINE_LOAD));
    }
}
