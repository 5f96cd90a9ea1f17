package org.baywright.design.dg11;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * Natural frequencies of the beam (joist) and girder modes and of the combined mode (DG11 2nd ed. Ch. 3,
 * equation numbers from memory). Frequencies are in Hz; a sheet prints them as plain numbers.
 *
 * <p>On a sheet g is printed as the length it is per s² (386.1 in, 9807 mm): the sheet's quantities have
 * no acceleration, and so the substitution reads as DG11 writes it, 0.18·√(386.1 in/0.447 in).
 */
public final class Modes {
    private static final String EQ_3_1 = Dg11.eq("3-1");
    private static final String EQ_3_2 = Dg11.eq("3-2");
    private static final String EQ_3_3 = Dg11.eq("3-3");
    private static final String EQ_3_4 = Dg11.eq("3-4");

    private Modes() {
    }

    /**
     * DG11 2nd ed. Eq. 3-2 (no. from memory): midspan deflection of a simply supported member under its
     * supported weight, Δ = 5·w·L⁴/(384·Es·It) [m].
     *
     * @param w weight per length (realistic, {@link VibrationLoads}) [N/m]
     * @param span L [m]
     * @param es modulus of the steel [Pa]
     * @param it transformed moment of inertia [m⁴]
     */
    public static double deflection(double w, double span, double es, double it, Calc calc) {
        return deflection("Δ", w, span, es, it, calc);
    }

    /** {@link #deflection} recorded under another symbol (Δj, Δg). */
    public static double deflection(String symbol, double w, double span, double es, double it, Calc calc) {
        double v = 5 * w * span * span * span * span / (384 * es * it);
        return Calc.eq(calc, symbol, "5·w·L⁴/(384·Es·It)", EQ_3_2, v, Quantity.SECTION_LENGTH,
                Arg.of("w", w, Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH),
                Arg.of("Es", es, Quantity.STRESS), Arg.of("It", it, Quantity.INERTIA));
    }

    /**
     * DG11 2nd ed. Eq. 3-3 (no. from memory): natural frequency of a mode from its deflection,
     * f = 0.18·√(g/Δ) [Hz].
     *
     * @param symbol what the sheet calls it (f_j, f_g)
     * @param deflection Δ [m]
     */
    public static double frequency(String symbol, double deflection, Calc calc) {
        double v = 0.18 * Math.sqrt(Dg11.G / deflection);
        return Calc.eq(calc, symbol, "0.18·√(g/Δ)", EQ_3_3, v, Quantity.NUMBER,
                Arg.of("g", Dg11.G, Quantity.SECTION_LENGTH), Arg.of("Δ", deflection, Quantity.SECTION_LENGTH));
    }

    /**
     * DG11 2nd ed. Eq. 3-1 (no. from memory): the closed form for a simply supported beam,
     * f = (π/2)·√(g·Es·It/(w·L⁴)) [Hz]. Eq. 3-3 is this with Δ of Eq. 3-2 and π/2·√(5/384) = 0.17925 rounded to 0.18.
     */
    public static double closedForm(double w, double span, double es, double it, Calc calc) {
        double v = Math.PI / 2 * Math.sqrt(Dg11.G * es * it / (w * span * span * span * span));
        return Calc.eq(calc, "f", "(π/2)·√(g·Es·It/(w·L⁴))", EQ_3_1, v, Quantity.NUMBER,
                Arg.of("g", Dg11.G, Quantity.SECTION_LENGTH), Arg.of("Es", es, Quantity.STRESS),
                Arg.of("It", it, Quantity.INERTIA), Arg.of("w", w, Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. Eq. 3-4 (no. from memory): the combined mode by Dunkerley's relation,
     * f_n = 0.18·√(g/(Δj + Δg′)) [Hz], Δg′ = Δg unless Eq. 4-4 reduces it.
     *
     * @param dj beam (joist) deflection Δj [m]
     * @param dg girder deflection Δg, reduced to Δg′ where {@link EffectiveWeights#reducedGirderDeflection} applies [m]
     */
    public static double combined(double dj, double dg, Calc calc) {
        double v = 0.18 * Math.sqrt(Dg11.G / (dj + dg));
        return Calc.eq(calc, "f_n", "0.18·√(g/(Δj + Δg′))", EQ_3_4, v, Quantity.NUMBER,
                Arg.of("g", Dg11.G, Quantity.SECTION_LENGTH), Arg.of("Δj", dj, Quantity.SECTION_LENGTH),
                Arg.of("Δg′", dg, Quantity.SECTION_LENGTH));
    }
}
