package org.baywright.design.dg11;

import org.baywright.units.Units;

/**
 * The slab as a vibration analysis sees it.
 *
 * @param tc thickness of the concrete above the deck [m]
 * @param hr height of the deck ribs [m] (0 for a solid slab)
 * @param ribFraction the share of the rib zone filled with concrete, mean rib width / rib pitch (0 to 1)
 * @param ec static modulus of the concrete E_c [Pa]
 */
public record VibrationSlab(double tc, double hr, double ribFraction, double ec) {

    public VibrationSlab {
        if (!(tc > 0) || !(hr >= 0) || !(ribFraction >= 0 && ribFraction <= 1) || !(ec > 0)) {
            throw new IllegalArgumentException("slab: t_c > 0, h_r ≥ 0, 0 ≤ rib fraction ≤ 1 and E_c > 0 are required, got "
                    + tc + ", " + hr + ", " + ribFraction + ", " + ec);
        }
    }

    /** A slab in US units: concrete above the deck and rib height [in], rib fraction, E_c [ksi]. */
    public static VibrationSlab us(double tcIn, double hrIn, double ribFraction, double ecKsi) {
        return new VibrationSlab(Units.IN.toSi(tcIn), Units.IN.toSi(hrIn), ribFraction, Units.KSI.toSi(ecKsi));
    }

    /**
     * The effective depth d_e of the slab for its transverse stiffness D_s: the concrete above the deck plus
     * half the deck height (DG11 2nd ed. §4.1, from memory; CHECK-VALUES §6) [m].
     */
    public double de() {
        return tc + hr / 2;
    }

    /** The rib fraction that counts for a member, by the ribs' direction to it (0 perpendicular, the rib fraction parallel). */
    public double ribShare(Ribs ribs) {
        return ribs == Ribs.PARALLEL ? ribFraction : 0;
    }
}
