package org.baywright.units;

import java.util.List;

/**
 * The units Baywright knows. Internal values are SI doubles in one canonical system: metre, newton,
 * pascal, newton per metre, newton-metre, kilogram per metre. Conversion factors are exact by
 * definition (1 in = 0.0254 m, 1 lbf = 4.4482216152605 N, standard gravity 9.80665 m/s²).
 */
public final class Units {
    private Units() {
    }

    /** Exact: international inch. */
    public static final double METRES_PER_INCH = 0.0254;
    /** Exact: pound-force from the international avoirdupois pound and standard gravity. */
    public static final double NEWTONS_PER_POUND = 4.4482216152605;
    /** Standard gravity, m/s² (exact by definition). */
    public static final double STANDARD_GRAVITY = 9.80665;

    private static final double FT = 12 * METRES_PER_INCH;
    private static final double KIP = 1000 * NEWTONS_PER_POUND;

    // length
    public static final Unit M = new Unit("m", List.of("meter", "metre", "meters", "metres"), Dimension.LENGTH, 1.0);
    public static final Unit MM = new Unit("mm", List.of(), Dimension.LENGTH, 1e-3);
    public static final Unit CM = new Unit("cm", List.of(), Dimension.LENGTH, 1e-2);
    public static final Unit IN = new Unit("in", List.of("\"", "inch", "inches", "in."), Dimension.LENGTH, METRES_PER_INCH);
    public static final Unit FT_ = new Unit("ft", List.of("'", "feet", "foot", "ft."), Dimension.LENGTH, FT);

    // force
    public static final Unit N = new Unit("N", List.of(), Dimension.FORCE, 1.0);
    public static final Unit KN = new Unit("kN", List.of("KN", "kn"), Dimension.FORCE, 1e3);
    public static final Unit LBF = new Unit("lb", List.of("lbf", "lbs"), Dimension.FORCE, NEWTONS_PER_POUND);
    public static final Unit KIPS = new Unit("kip", List.of("kips", "k"), Dimension.FORCE, KIP);

    // line load
    public static final Unit N_PER_M = new Unit("N/m", List.of(), Dimension.LINE_LOAD, 1.0);
    public static final Unit KN_PER_M = new Unit("kN/m", List.of("KN/m", "kn/m"), Dimension.LINE_LOAD, 1e3);
    public static final Unit KLF = new Unit("klf", List.of("kip/ft", "k/ft", "kips/ft"), Dimension.LINE_LOAD, KIP / FT);
    public static final Unit PLF = new Unit("plf", List.of("lb/ft", "lbf/ft", "#/ft"), Dimension.LINE_LOAD, NEWTONS_PER_POUND / FT);

    /** Steel weight per length as the US trade writes it (a force per length, equal to plf). */
    public static final Unit LB_PER_FT = new Unit("lb/ft", List.of(), Dimension.LINE_LOAD, NEWTONS_PER_POUND / FT);

    // area load
    public static final Unit PSF = new Unit("psf", List.of("lb/ft2", "lb/ft²", "#/ft2"), Dimension.AREA_LOAD, NEWTONS_PER_POUND / (FT * FT));
    public static final Unit KSF = new Unit("ksf", List.of("kip/ft2"), Dimension.AREA_LOAD, KIP / (FT * FT));
    public static final Unit KPA = new Unit("kPa", List.of("kN/m2", "kN/m²", "kpa"), Dimension.AREA_LOAD, 1e3);
    public static final Unit PA_AREA = new Unit("Pa", List.of("N/m2", "N/m²"), Dimension.AREA_LOAD, 1.0);

    // stress
    public static final Unit KSI = new Unit("ksi", List.of(), Dimension.STRESS, KIP / (METRES_PER_INCH * METRES_PER_INCH));
    public static final Unit PSI = new Unit("psi", List.of(), Dimension.STRESS, NEWTONS_PER_POUND / (METRES_PER_INCH * METRES_PER_INCH));
    public static final Unit MPA = new Unit("MPa", List.of("N/mm2", "N/mm²", "mpa"), Dimension.STRESS, 1e6);
    public static final Unit GPA = new Unit("GPa", List.of(), Dimension.STRESS, 1e9);

    // moment
    public static final Unit KIP_FT = new Unit("kip-ft", List.of("kip·ft", "k-ft", "kipft"), Dimension.MOMENT, KIP * FT);
    public static final Unit KIP_IN = new Unit("kip-in", List.of("kip·in", "k-in"), Dimension.MOMENT, KIP * METRES_PER_INCH);
    public static final Unit KN_M = new Unit("kN·m", List.of("kN-m", "kNm", "kN.m"), Dimension.MOMENT, 1e3);
    public static final Unit N_M = new Unit("N·m", List.of("N-m", "Nm"), Dimension.MOMENT, 1.0);

    // section properties
    public static final Unit IN2 = new Unit("in²", List.of("in2", "in^2"), Dimension.AREA, Math.pow(METRES_PER_INCH, 2));
    public static final Unit MM2 = new Unit("mm²", List.of("mm2", "mm^2"), Dimension.AREA, 1e-6);
    public static final Unit FT2 = new Unit("ft²", List.of("ft2", "ft^2", "sf"), Dimension.AREA, FT * FT);
    public static final Unit M2 = new Unit("m²", List.of("m2", "m^2"), Dimension.AREA, 1.0);
    public static final Unit IN3 = new Unit("in³", List.of("in3", "in^3"), Dimension.SECTION_MODULUS, Math.pow(METRES_PER_INCH, 3));
    public static final Unit MM3 = new Unit("mm³", List.of("mm3", "mm^3"), Dimension.SECTION_MODULUS, 1e-9);
    public static final Unit CM3 = new Unit("cm³", List.of("cm3", "cm^3"), Dimension.SECTION_MODULUS, 1e-6);
    public static final Unit IN4 = new Unit("in⁴", List.of("in4", "in^4"), Dimension.MOMENT_OF_INERTIA, Math.pow(METRES_PER_INCH, 4));
    public static final Unit MM4 = new Unit("mm⁴", List.of("mm4", "mm^4"), Dimension.MOMENT_OF_INERTIA, 1e-12);
    public static final Unit CM4 = new Unit("cm⁴", List.of("cm4", "cm^4"), Dimension.MOMENT_OF_INERTIA, 1e-8);
    public static final Unit IN6 = new Unit("in⁶", List.of("in6", "in^6"), Dimension.WARPING_CONSTANT, Math.pow(METRES_PER_INCH, 6));
    public static final Unit MM6 = new Unit("mm⁶", List.of("mm6", "mm^6"), Dimension.WARPING_CONSTANT, 1e-18);
    public static final Unit CM6 = new Unit("cm⁶", List.of("cm6", "cm^6"), Dimension.WARPING_CONSTANT, 1e-12);

    // mass per length
    public static final Unit KG_PER_M = new Unit("kg/m", List.of(), Dimension.MASS_PER_LENGTH, 1.0);
    public static final Unit LB_PER_FT_MASS = new Unit("lb/ft", List.of(), Dimension.MASS_PER_LENGTH, 0.45359237 / FT);

    /** Pounds per cubic foot (concrete unit weight). */
    public static final Unit PCF = new Unit("pcf", List.of("lb/ft3", "lb/ft³"), Dimension.UNIT_WEIGHT, NEWTONS_PER_POUND / (FT * FT * FT));
    /** Kilonewtons per cubic metre. */
    public static final Unit KN_PER_M3 = new Unit("kN/m³", List.of("kN/m3", "kn/m3", "KN/m3"), Dimension.UNIT_WEIGHT, 1e3);
    public static final Unit ONE = new Unit("", List.of("-"), Dimension.DIMENSIONLESS, 1.0);

    /** Every unit, in the order they are listed in messages. */
    public static final List<Unit> ALL = List.of(
            FT_, IN, M, MM, CM,
            KIPS, LBF, KN, N,
            KLF, PLF, KN_PER_M, N_PER_M,
            PSF, KSF, KPA, PA_AREA,
            KSI, PSI, MPA, GPA,
            KIP_FT, KIP_IN, KN_M, N_M,
            IN2, MM2, FT2, M2, IN3, MM3, CM3, IN4, MM4, CM4, IN6, MM6, CM6,
            KG_PER_M, LB_PER_FT_MASS, PCF, KN_PER_M3);

    /** The units of one dimension, in message order. */
    public static List<Unit> of(Dimension d) {
        return ALL.stream().filter(u -> u.dimension() == d).toList();
    }

    /** Finds a unit of the given dimension by symbol or alias; null if none. */
    public static Unit find(Dimension d, String symbol) {
        String s = symbol.trim();
        for (Unit u : ALL) {
            if (u.dimension() == d && u.matches(s)) {
                return u;
            }
        }
        return null;
    }
}
