package org.baywright.design.dg11;

/**
 * The walking check of one bay with every intermediate value (SI; frequencies in Hz, accelerations as
 * fractions of g), as {@code bays[]} of the design JSON will carry it.
 *
 * @param dj beam (joist) mode deflection Δ_j [m]
 * @param dg girder mode deflection Δ_g [m]
 * @param dgReduced Δ_g′, the girder deflection the combined mode uses (= Δ_g unless L_g &lt; B_j) [m]
 * @param fj beam mode frequency [Hz]
 * @param fg girder mode frequency [Hz]
 * @param fn combined mode frequency [Hz]
 * @param bj beam mode effective width [m]
 * @param bg girder mode effective width [m]
 * @param wj beam mode effective weight [N]
 * @param wg girder mode effective weight [N]
 * @param w combined effective weight [N]
 * @param apg peak acceleration a_p/g
 * @param limit tolerance limit a_o/g
 * @param ratio a_p/g ÷ a_o/g
 * @param status meets, exceeds, or outside the method (f_n &gt; 9 Hz)
 * @param belowThreeHz f_n &lt; 3 Hz: such floors should be avoided (a flag beside the status)
 */
public record VibrationResult(double dj, double dg, double dgReduced, double fj, double fg, double fn, double bj,
        double bg, double wj, double wg, double w, double apg, double limit, double ratio, VibrationStatus status,
        boolean belowThreeHz) {

    /** A line a report can print: status, f_n and a_p/g against the limit, and the flag. */
    public String summary() {
        String s = String.format(java.util.Locale.ROOT, "%s: f_n = %.2f Hz, a_p/g = %.3f %% (limit %.1f %%, ratio %.2f)",
                status.label(), fn, apg * 100, limit * 100, ratio);
        if (status == VibrationStatus.OUTSIDE_METHOD) {
            s += "; f_n > 9 Hz, the low-frequency walking method does not apply";
        }
        return belowThreeHz ? s + "; f_n < 3 Hz, floors below 3 Hz should be avoided" : s;
    }
}
