package org.baywright.design.aisc360;

import java.util.ArrayList;
import java.util.List;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.units.Units;

/**
 * AISC 360-16 I8.2a: the nominal shear strength of one steel headed stud anchor in a composite beam,
 * with the group factor R_g and position factor R_p, the modulus of elasticity of the concrete it
 * uses (I2.1b), and the detailing limits of I3.2c(1) and I8.2d that bound a stud layout.
 *
 * <p>Known limitations: normal-weight and lightweight concrete with 90 pcf ≤ w_c ≤ 155 pcf (the range
 * of the E_c expression); studs of diameter ≤ ¾ in through deck. The equation E_c = w_c^1.5·√f′c is
 * dimensional (w_c in pcf, f′c and E_c in ksi); the sheet prints it with those unit values as inputs
 * (pcf and ksi as symbols) so the formula printed is the one evaluated.
 */
public final class StudStrengthI8 {
    private static final String CLAUSE_I2_1B = Aisc360.clause("I2.1b");
    private static final String EQ_I8_1 = Aisc360.eq("I8-1");
    private static final String CLAUSE_I8_2A = Aisc360.clause("I8.2a");
    private static final String CLAUSE_I8_2D = Aisc360.clause("I8.2d");
    private static final String CLAUSE_I3_2C1 = Aisc360.clause("I3.2c(1)");

    /** One pound per cubic foot, N/m³ (1 lbf / ft³). */
    public static final double PCF = Units.LBF.toSi(1) / Math.pow(Units.FT_.toSi(1), 3);
    /** One ksi, Pa. */
    public static final double KSI = Units.KSI.toSi(1);
    /** One inch, m. */
    public static final double INCH = Units.IN.toSi(1);

    /** R_g and R_p of I8.2a, with the case of the table that gave them. */
    public record Factors(double rg, double rp, String rgCase, String rpCase) {
    }

    private StudStrengthI8() {
    }

    /**
     * AISC 360-16 I2.1b (ACI 318): modulus of elasticity of concrete, E_c = w_c^1.5·√f′c with w_c in
     * pcf and f′c, E_c in ksi [Pa].
     *
     * @param wc unit weight of the concrete [N/m³]
     * @param fc specified compressive strength f′c [Pa]
     */
    public static double ec(double wc, double fc, Calc calc) {
        if (!(wc > 0) || !(fc > 0)) {
            throw new IllegalArgumentException("E_c: the concrete's unit weight and f′c must be positive, got " + wc
                    + " N/m³ and " + fc + " Pa");
        }
        double wcPcf = wc / PCF;
        double v = Math.pow(wcPcf, 1.5) * Math.sqrt(fc / KSI) * KSI;
        return Calc.eq(calc, "Ec", "(wc/pcf)^1.5·√(fc/ksi)·ksi", CLAUSE_I2_1B, v, Quantity.STRESS,
                Arg.num("wc", wc), Arg.num("pcf", PCF), Arg.of("fc", fc, Quantity.STRESS), Arg.of("ksi", KSI, Quantity.STRESS));
    }

    /** Cross-sectional area of a stud shank, A_sa = π·d²/4 [m²] (AISC 360-16 I8.2a). */
    public static double asa(double d, Calc calc) {
        if (!(d > 0)) {
            throw new IllegalArgumentException("stud diameter must be positive, got " + d);
        }
        return Calc.eq(calc, "Asa", "π·d_sa²/4", CLAUSE_I8_2A, Math.PI * d * d / 4, Quantity.AREA,
                Arg.of("d_sa", d, Quantity.SECTION_LENGTH));
    }

    /**
     * AISC 360-16 I8.2a: the group factor R_g and position factor R_p.
     *
     * <ul>
     * <li>R_g = 1.0: studs welded directly to the shape (no deck); deck perpendicular with one stud per
     * rib; deck parallel with w_r/h_r ≥ 1.5. R_g = 0.85: two studs per rib (perpendicular); deck
     * parallel with w_r/h_r &lt; 1.5. R_g = 0.7: three or more studs per rib (perpendicular).</li>
     * <li>R_p = 0.75: no deck; deck parallel; deck perpendicular with e_mid-ht ≥ 2 in (strong
     * position). R_p = 0.6: deck perpendicular with e_mid-ht &lt; 2 in (weak position).</li>
     * </ul>
     *
     * @param perRib studs per rib (perpendicular deck; ignored otherwise)
     * @param wrOverHr average rib width over rib height (parallel deck; ignored otherwise)
     */
    public static Factors factors(DeckRibs ribs, int perRib, StudPosition position, double wrOverHr, Calc calc) {
        double rg;
        double rp;
        String rgCase;
        String rpCase;
        switch (ribs) {
            case NONE -> {
                rg = 1.0;
                rgCase = "studs welded directly to the steel shape → Rg = 1.0";
                rp = 0.75;
                rpCase = "no deck → Rp = 0.75";
            }
            case PERPENDICULAR -> {
                if (perRib < 1) {
                    throw new IllegalArgumentException("studs per rib must be at least 1, got " + perRib);
                }
                rg = perRib == 1 ? 1.0 : perRib == 2 ? 0.85 : 0.7;
                rgCase = "deck perpendicular, " + perRib + (perRib == 1 ? " stud" : " studs") + " per rib → Rg = "
                        + CalcFormat.sig(rg);
                rp = position == StudPosition.STRONG ? 0.75 : 0.6;
                rpCase = "deck perpendicular, " + (position == StudPosition.STRONG
                        ? "strong position (e_mid-ht ≥ 2 in) → Rp = 0.75" : "weak position (e_mid-ht < 2 in) → Rp = 0.6");
            }
            case PARALLEL -> {
                rg = wrOverHr >= 1.5 ? 1.0 : 0.85;
                rgCase = "deck parallel, wr/hr = " + CalcFormat.sig(wrOverHr) + (wrOverHr >= 1.5 ? " ≥ 1.5 → Rg = 1.0"
                        : " < 1.5 → Rg = 0.85");
                rp = 0.75;
                rpCase = "deck parallel → Rp = 0.75";
            }
            default -> throw new IllegalStateException();
        }
        if (calc != null) {
            calc.branch(rgCase, CLAUSE_I8_2A);
            calc.branch(rpCase, CLAUSE_I8_2A);
        }
        return new Factors(rg, rp, rgCase, rpCase);
    }

    /**
     * AISC 360-16 Eq. I8-1: nominal shear strength of one steel headed stud anchor,
     * Q_n = min(0.5·A_sa·√(f′c·E_c), R_g·R_p·A_sa·F_u) [N].
     *
     * @param asa stud shank area [m²]
     * @param fc f′c [Pa]
     * @param ec E_c [Pa]
     * @param fu specified minimum tensile strength of the stud, F_u [Pa] (65 ksi for ASTM A108 studs)
     */
    public static double qn(double asa, double fc, double ec, Factors f, double fu, Calc calc) {
        double concrete = 0.5 * asa * Math.sqrt(fc * ec);
        double steel = f.rg() * f.rp() * asa * fu;
        double v = Math.min(concrete, steel);
        if (calc != null) {
            calc.branch(concrete <= steel ? "0.5·Asa·√(f′c·Ec) ≤ Rg·Rp·Asa·Fu → the concrete governs"
                    : "Rg·Rp·Asa·Fu < 0.5·Asa·√(f′c·Ec) → the stud governs", EQ_I8_1);
        }
        return Calc.eq(calc, "Qn", "min(0.5·Asa·√(fc·Ec), Rg·Rp·Asa·Fu)", EQ_I8_1, v, Quantity.FORCE,
                Arg.of("Asa", asa, Quantity.AREA), Arg.of("fc", fc, Quantity.STRESS), Arg.of("Ec", ec, Quantity.STRESS),
                Arg.num("Rg", f.rg()), Arg.num("Rp", f.rp()), Arg.of("Fu", fu, Quantity.STRESS));
    }

    /** AISC 360-16 I8.2d: minimum centre-to-centre spacing of studs along the beam, 6·d_sa [m]. */
    public static double minSpacing(double d, Calc calc) {
        return Calc.eq(calc, "s_min", "6·d_sa", CLAUSE_I8_2D, 6 * d, Quantity.SECTION_LENGTH,
                Arg.of("d_sa", d, Quantity.SECTION_LENGTH));
    }

    /**
     * AISC 360-16 I8.2d: maximum centre-to-centre spacing of studs, min(8·t_slab, 36 in) [m], with
     * t_slab the total slab thickness.
     */
    public static double maxSpacing(double slabThickness, Calc calc) {
        double cap = 36 * INCH;
        return Calc.eq(calc, "s_max", "min(8·t_slab, s_36)", CLAUSE_I8_2D, Math.min(8 * slabThickness, cap),
                Quantity.SECTION_LENGTH, Arg.of("t_slab", slabThickness, Quantity.SECTION_LENGTH),
                Arg.of("s_36", cap, Quantity.SECTION_LENGTH));
    }

    /**
     * The applicability limits of AISC 360-16 I3.2c(1) for a slab on formed steel deck (and I8.1 for
     * the stud diameter): rib height h_r ≤ 3 in; average rib width w_r ≥ 2 in; stud diameter ≤ ¾ in;
     * concrete above the deck ≥ 2 in; a stud that reaches at least 1½ in above the deck with ½ in of
     * cover over its head. Returns one line per limit violated (empty when the slab and stud qualify).
     *
     * @param studLength the stud's length after welding [m]; NaN to skip the two stud-length limits
     */
    public static List<String> deckLimits(DeckRibs ribs, double hr, double wr, double d, double topping,
            double studLength) {
        List<String> out = new ArrayList<>();
        if (d > 0.75 * INCH + 1e-9) {
            out.add("stud diameter " + sig(d / INCH) + " in > 3/4 in (" + CLAUSE_I3_2C1 + ")");
        }
        if (ribs == DeckRibs.NONE) {
            return out;
        }
        if (hr > 3 * INCH + 1e-9) {
            out.add("rib height h_r = " + sig(hr / INCH) + " in > 3 in (" + CLAUSE_I3_2C1 + ")");
        }
        if (wr < 2 * INCH - 1e-9) {
            out.add("average rib width w_r = " + sig(wr / INCH) + " in < 2 in (" + CLAUSE_I3_2C1 + ")");
        }
        if (topping < 2 * INCH - 1e-9) {
            out.add("concrete above the deck " + sig(topping / INCH) + " in < 2 in (" + CLAUSE_I3_2C1 + ")");
        }
        if (!Double.isNaN(studLength)) {
            if (studLength < hr + 1.5 * INCH - 1e-9) {
                out.add("stud length " + sig(studLength / INCH) + " in < h_r + 1 1/2 in (" + CLAUSE_I3_2C1 + ")");
            }
            if (studLength > hr + topping - 0.5 * INCH + 1e-9) {
                out.add("stud length " + sig(studLength / INCH) + " in leaves less than 1/2 in of cover over its head ("
                        + CLAUSE_I3_2C1 + ")");
            }
        }
        return out;
    }

    private static String sig(double v) {
        return CalcFormat.sig(v);
    }
}
