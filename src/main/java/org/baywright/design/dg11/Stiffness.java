package org.baywright.design.dg11;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;

/**
 * Stiffness for a vibration analysis (DG11 2nd ed. Ch. 3 and §4.1, numbers from memory): the dynamic
 * modulus of the concrete, the modular ratio, the effective slab width, the fully composite transformed
 * moment of inertia, and the stiffnesses per unit width D_s, D_j and D_g.
 *
 * <p>Composite action is assumed whatever the shear connection (DG11; CHECK-VALUES §6). The transformed
 * section counts all the concrete that counts for the direction of the ribs, uncracked (a walking
 * vibration is a small-amplitude motion about the loaded position); a width or stiffness "per unit width"
 * is in SI m⁴/m = m³, which a US sheet prints in in³ (1 in⁴/ft = 1/12 in³).
 */
public final class Stiffness {
    private static final String SEC_3_2 = Dg11.section("§3.2");
    private static final String SEC_4_1 = Dg11.section("§4.1");

    private Stiffness() {
    }

    /** DG11 2nd ed. §3.2 (from memory): dynamic modulus of the concrete E_c,dyn = 1.35·E_c [Pa]. */
    public static double dynamicModulus(double ec, Calc calc) {
        double v = Dg11.DYNAMIC_MODULUS_FACTOR * ec;
        return Calc.eq(calc, "E_c,dyn", "1.35·Ec", SEC_3_2, v, Quantity.STRESS, Arg.of("Ec", ec, Quantity.STRESS));
    }

    /** DG11 2nd ed. §3.2 (from memory): dynamic modular ratio n = E_s/(1.35·E_c). */
    public static double modularRatio(double es, double ec, Calc calc) {
        double v = es / (Dg11.DYNAMIC_MODULUS_FACTOR * ec);
        return Calc.eq(calc, "n", "Es/(1.35·Ec)", SEC_3_2, v, Quantity.NUMBER, Arg.of("Es", es, Quantity.STRESS),
                Arg.of("Ec", ec, Quantity.STRESS));
    }

    /**
     * DG11 2nd ed. §3.2 (from memory): effective slab width for the transformed section, b = min(S, 0.4·L) [m].
     *
     * @param spacing the member spacing S (beams: the beam spacing; girders: the girder spacing, usually the beam span) [m]
     * @param span the member's span L [m]
     */
    public static double effectiveWidth(double spacing, double span, Calc calc) {
        double v = Math.min(spacing, Dg11.WIDTH_SHARE_OF_SPAN * span);
        return Calc.eq(calc, "b", "min(S, 0.4·L)", SEC_3_2, v, Quantity.SECTION_LENGTH,
                Arg.of("S", spacing, Quantity.SECTION_LENGTH), Arg.of("L", span, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. §3.2 (from memory): depth of the transformed section's elastic neutral axis below the
     * top of the slab, ȳ = ((b/n)·tc²/2 + (b/n)·ρ·hr·(tc + hr/2) + As·(tc + hr + d/2))/((b/n)·tc + (b/n)·ρ·hr + As) [m].
     *
     * @param as steel area [m²]
     * @param d steel depth [m]
     * @param b effective slab width [m]
     * @param n modular ratio
     * @param tc concrete above the deck [m]
     * @param hr rib height [m]; the steel's top flange sits at tc + hr
     * @param rho the share of the rib zone that counts (0 with ribs perpendicular)
     */
    public static double neutralAxis(double as, double d, double b, double n, double tc, double hr, double rho, Calc calc) {
        double bn = b / n;
        double v = (bn * tc * tc / 2 + bn * rho * hr * (tc + hr / 2) + as * (tc + hr + d / 2))
                / (bn * tc + bn * rho * hr + as);
        return Calc.eq(calc, "ȳ", "((b/n)·tc²/2 + (b/n)·ρ·hr·(tc + hr/2) + As·(tc + hr + d/2))/((b/n)·tc + (b/n)·ρ·hr + As)",
                SEC_3_2, v, Quantity.SECTION_LENGTH, Arg.of("b", b, Quantity.SECTION_LENGTH), Arg.num("n", n),
                Arg.of("tc", tc, Quantity.SECTION_LENGTH), Arg.num("ρ", rho), Arg.of("hr", hr, Quantity.SECTION_LENGTH),
                Arg.of("As", as, Quantity.AREA), Arg.of("d", d, Quantity.SECTION_LENGTH));
    }

    /**
     * DG11 2nd ed. §3.2 (from memory): fully composite transformed moment of inertia with the dynamic modulus,
     * I_t = Is + As·(tc + hr + d/2 − ȳ)² + (b/n)·tc³/12 + (b/n)·tc·(ȳ − tc/2)² + (b/n)·ρ·hr³/12
     * + (b/n)·ρ·hr·(ȳ − tc − hr/2)² [m⁴]; all the concrete that counts, uncracked.
     *
     * @param is moment of inertia of the steel alone [m⁴]
     * @param as steel area [m²]
     * @param d steel depth [m]
     * @param b effective slab width {@link #effectiveWidth} [m]
     * @param n modular ratio {@link #modularRatio}
     * @param tc concrete above the deck [m]
     * @param hr rib height [m]
     * @param rho the share of the rib zone that counts ({@link Ribs#concreteShare})
     */
    public static double transformedInertia(double is, double as, double d, double b, double n, double tc, double hr,
            double rho, Calc calc) {
        double y = neutralAxis(as, d, b, n, tc, hr, rho, calc);
        double bn = b / n;
        double ys = tc + hr + d / 2;
        double v = is + as * (ys - y) * (ys - y) + bn * tc * tc * tc / 12 + bn * tc * (y - tc / 2) * (y - tc / 2)
                + bn * rho * hr * hr * hr / 12 + bn * rho * hr * (y - tc - hr / 2) * (y - tc - hr / 2);
        return Calc.eq(calc, "I_t", "Is + As·(tc + hr + d/2 − ȳ)² + (b/n)·tc³/12 + (b/n)·tc·(ȳ − tc/2)²"
                + " + (b/n)·ρ·hr³/12 + (b/n)·ρ·hr·(ȳ − tc − hr/2)²", SEC_3_2, v, Quantity.INERTIA,
                Arg.of("Is", is, Quantity.INERTIA), Arg.of("As", as, Quantity.AREA), Arg.of("tc", tc, Quantity.SECTION_LENGTH),
                Arg.of("hr", hr, Quantity.SECTION_LENGTH), Arg.of("d", d, Quantity.SECTION_LENGTH),
                Arg.of("ȳ", y, Quantity.SECTION_LENGTH), Arg.of("b", b, Quantity.SECTION_LENGTH), Arg.num("n", n),
                Arg.num("ρ", rho));
    }

    /**
     * The transformed moment of inertia of a catalog section under {@code slab}, from the ingredients:
     * n = E_s/(1.35·E_c), b = min(S, 0.4·L), the concrete that counts for the direction of the ribs
     * (DG11 2nd ed. §3.2, from memory) [m⁴].
     *
     * @param span the member's span [m]
     * @param spacing the member spacing [m]
     * @param es modulus of the steel [Pa]
     */
    public static double transformedInertia(Section s, VibrationSlab slab, Ribs ribs, double span, double spacing,
            double es, Calc calc) {
        double n = modularRatio(es, slab.ec(), calc);
        double b = effectiveWidth(spacing, span, calc);
        return transformedInertia(s.props().ix(), s.props().a(), s.depth(), b, n, slab.tc(), slab.hr(),
                ribs.concreteShare(slab), calc);
    }

    /**
     * DG11 2nd ed. §4.1, definitions under Eq. 4-3 (from memory): transformed slab moment of inertia per unit
     * width, D_s = de³/(12·n) [m⁴/m], de the concrete above the deck plus half the deck height ({@link VibrationSlab#de}).
     */
    public static double ds(double de, double n, Calc calc) {
        double v = de * de * de / (12 * n);
        return Calc.eq(calc, "Ds", "de³/(12·n)", SEC_4_1, v, Quantity.SECTION_MODULUS,
                Arg.of("de", de, Quantity.SECTION_LENGTH), Arg.num("n", n));
    }

    /**
     * DG11 2nd ed. §4.1, definitions under Eq. 4-3 (from memory): beam (joist) transformed moment of inertia
     * per unit width, D_j = I_j/S [m⁴/m].
     */
    public static double dj(double ij, double spacing, Calc calc) {
        return Calc.eq(calc, "Dj", "Ij/S", SEC_4_1, ij / spacing, Quantity.SECTION_MODULUS,
                Arg.of("Ij", ij, Quantity.INERTIA), Arg.of("S", spacing, Quantity.SPAN_LENGTH));
    }

    /**
     * DG11 2nd ed. §4.1, definitions under Eq. 4-5 (from memory): girder transformed moment of inertia per unit
     * width, D_g = I_g/L_j [m⁴/m] (interior girder; L_j the span of the beams it carries).
     */
    public static double dg(double ig, double beamSpan, Calc calc) {
        return Calc.eq(calc, "Dg", "Ig/Lj", SEC_4_1, ig / beamSpan, Quantity.SECTION_MODULUS,
                Arg.of("Ig", ig, Quantity.INERTIA), Arg.of("Lj", beamSpan, Quantity.SPAN_LENGTH));
    }
}
