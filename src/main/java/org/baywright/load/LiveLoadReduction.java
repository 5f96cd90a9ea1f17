package org.baywright.load;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.units.Units;

/**
 * Reduction of uniform live loads: floors by ASCE 7-16 §4.7, ordinary roofs by §4.8.2.
 *
 * <p><b>Units.</b> Inputs and results are canonical SI (Pa, m²). The standard writes its equations
 * for US customary units, with tributary areas in ft², and prints SI versions whose coefficients are
 * rounded (4.57 in Eq. 4.7-1, 0.011 in R1, 37.16 m², 4.79 kN/m², 0.58 kN/m²). Baywright evaluates
 * the US equations exactly, on areas divided by {@link #SQUARE_FOOT} (1 ft² = 0.3048² m² =
 * 0.09290304 m², exact by the definition of the foot), so that a US hand calculation is reproduced
 * to the last digit and the results do not depend on which unit system the user types in. The
 * recorded formulas show that division ("KLL·AT/A1", A1 = 1 ft²), so they print correctly and evaluate
 * to the same value in either system. The standard's SI Eq. 4.7-1, L0·(0.25 + 4.57/√(KLL·AT)) with AT
 * in m², is the same equation with 15·0.3048 = 4.572 rounded to 4.57; it gives up to 0.0003·L0 more
 * reduction than the exact form, which is the rounding of its coefficient.
 *
 * <p><b>Limits.</b> The 100 psf limit of §4.7.3 and §4.7.5 is printed as 4.79 kN/m² in SI, while
 * 100 psf is 4788.03 Pa exactly. A load counts as heavy only when it exceeds both ({@link
 * #HEAVY_LIVE_LOAD} = 4790 Pa), so that "100 psf" and "4.79 kN/m²", the same tabulated load in the two
 * systems, are treated alike; the window between the two values is 0.04 % wide, far finer than any
 * tabulated live load. The roof minimum is 12 psf exactly ({@link #ROOF_MINIMUM}, 574.56 Pa); the
 * standard's 0.58 kN/m² is that value rounded (0.6 × 0.96 kN/m²).
 */
public final class LiveLoadReduction {
    private LiveLoadReduction() {
    }

    /** One square foot in m², exact: 0.3048² = 0.09290304. Areas are divided by it to enter the US equations. */
    public static final double SQUARE_FOOT = Units.FT2.toSi(1.0);

    /** §4.7.2: reduction is permitted when KLL·AT ≥ 400 ft² (37.16 m²); the value in ft². */
    public static final double MIN_INFLUENCE_AREA_FT2 = 400.0;

    /** §4.7.3, §4.7.5: the heavy live-load limit, Pa; a load above it "exceeds 100 psf (4.79 kN/m²)". See the class notes. */
    public static final double HEAVY_LIVE_LOAD = 4790.0;

    /** §4.8.2: lower bound of the reduced roof live load, 12 psf (0.58 kN/m² in the standard's SI), Pa. */
    public static final double ROOF_MINIMUM = Units.PSF.toSi(12.0);

    /** Rule: Eq. 4.7-1 governed. */
    public static final String RULE_EQUATION = "Eq. 4.7-1";
    /** Rule: the influence area is below the §4.7.2 threshold. */
    public static final String RULE_BELOW_THRESHOLD = "KLL·AT < 400 ft² (37.16 m²): no reduction";
    /** Rule: the §4.7.2 lower limit for members supporting one floor governed. */
    public static final String RULE_LIMIT_ONE_FLOOR = "limit 0.50·L0 (one floor)";
    /** Rule: the §4.7.2 lower limit for members supporting two or more floors governed. */
    public static final String RULE_LIMIT_TWO_OR_MORE = "limit 0.40·L0 (two or more floors)";
    /** Rule: §4.7.3, heavy live load on a member supporting one floor. */
    public static final String RULE_HEAVY_ONE_FLOOR = "L0 > 100 psf: no reduction (one floor)";
    /** Rule: §4.7.3 exception, heavy live load, two or more floors, the 20 % cap governed. */
    public static final String RULE_HEAVY_TWO_OR_MORE = "L0 > 100 psf: ≤ 20 % reduction (two or more floors)";
    /** Rule: §4.7.4, passenger-vehicle garage, member supporting one floor. */
    public static final String RULE_GARAGE_ONE_FLOOR = "garage: no reduction (one floor)";
    /** Rule: §4.7.4 exception, garage, two or more floors, the 20 % cap governed. */
    public static final String RULE_GARAGE_TWO_OR_MORE = "garage: ≤ 20 % reduction (two or more floors)";
    /** Rule: §4.7.5, assembly use with L0 ≤ 100 psf. */
    public static final String RULE_ASSEMBLY = "assembly, L0 ≤ 100 psf: no reduction";
    /** Rule: the load was marked not reducible. */
    public static final String RULE_NOT_REDUCIBLE = "not reducible (excluded by the user)";
    /** Rule: Eq. 4.8-1 governed. */
    public static final String RULE_ROOF_EQUATION = "Eq. 4.8-1";
    /** Rule: the 12 psf lower bound of §4.8.2 governed. */
    public static final String RULE_ROOF_MINIMUM = "minimum 12 psf (0.58 kN/m²)";
    /** Rule: L0 does not exceed the 12 psf lower bound, so nothing may be reduced. */
    public static final String RULE_ROOF_AT_MINIMUM = "L0 ≤ 12 psf (0.58 kN/m²): no reduction";

    /**
     * ASCE 7-16 §4.7.2–4.7.6: reduced uniform floor live load for a member with element factor kll,
     * tributary area at (m²) summed over the floors it supports, floors = number of floors supported,
     * l0 = unreduced live load (Pa).
     *
     * <p>§4.7.2: no reduction when KLL·AT &lt; 400 ft²; otherwise Eq. 4.7-1, not below 0.50·L0 for a
     * member supporting one floor nor 0.40·L0 for two or more. §4.7.3 (L0 &gt; 100 psf) and §4.7.4
     * (passenger-vehicle garages): no reduction for one floor; for two or more floors at most 20 %,
     * and not below the §4.7.2 value, i.e. L = max(0.80·L0, L§4.7.2). §4.7.5: assembly loads of 100 psf
     * or less are not reduced. For a one-way slab the caller limits {@code at} to
     * {@link #oneWaySlabMaxArea} (§4.7.6).
     *
     * @param kll element factor K_LL of Table 4.7-1, 1 to 4 ({@link ElementKind#kll()})
     * @param floors number of floors the member supports, at least 1
     * @throws IllegalArgumentException for a negative or non-finite load or area, a K_LL outside 1–4,
     *     fewer than one floor or a null use
     */
    public static Reduction floor(double l0, double kll, double at, int floors, ReducibleUse use, Calc calc) {
        requireLoad(l0);
        if (!(kll >= 1.0 && kll <= 4.0)) {
            throw new IllegalArgumentException("element factor KLL must be between 1 and 4 (ASCE 7-16 Table 4.7-1), got " + kll);
        }
        requireArea(at);
        if (floors < 1) {
            throw new IllegalArgumentException("number of floors supported must be at least 1, got " + floors);
        }
        if (use == null) {
            throw new IllegalArgumentException("live-load use must not be null");
        }
        if (use == ReducibleUse.NOT_REDUCIBLE) {
            Calc.branch(calc, "live load marked not reducible → L = L0", Asce7.clause("§4.7"));
            return none("L", l0, RULE_NOT_REDUCIBLE, Asce7.clause("§4.7"), calc);
        }
        boolean heavy = l0 > HEAVY_LIVE_LOAD || use == ReducibleUse.HEAVY;
        if (use == ReducibleUse.ASSEMBLY && !heavy) {
            Calc.branch(calc, "assembly use, L0 ≤ 100 psf (4.79 kN/m²) → no reduction", Asce7.clause("§4.7.5"));
            return none("L", l0, RULE_ASSEMBLY, Asce7.clause("§4.7.5"), calc);
        }
        boolean garage = use == ReducibleUse.GARAGE;
        boolean capped = heavy || garage;
        String capClause = Asce7.clause(garage ? "§4.7.4" : "§4.7.3");
        String capWhy = garage ? "passenger-vehicle garage"
                : l0 > HEAVY_LIVE_LOAD ? "L0 > 100 psf (4.79 kN/m²)" : "storage live load (heavy live load whatever L0)";
        if (capped && floors == 1) {
            Calc.branch(calc, capWhy + ", member supporting one floor → no reduction", capClause);
            return none("L", l0, garage ? RULE_GARAGE_ONE_FLOOR : RULE_HEAVY_ONE_FLOOR, capClause, calc);
        }
        Reduction basic = basic(l0, kll, at, floors, calc);
        if (!capped) {
            return basic;
        }
        if (basic.factor() >= 0.80) {
            Calc.branch(calc, capWhy + ", two or more floors: the §4.7.2 value, L/L0 = " + CalcFormat.sig(basic.factor())
                    + " ≥ 0.80, governs", capClause);
            return basic;
        }
        Calc.branch(calc, capWhy + ", two or more floors: reduction limited to 20 % (L/L0 = "
                + CalcFormat.sig(basic.factor()) + " < 0.80)", capClause);
        return new Reduction(0.80, twentyPercentCap(l0, capClause, calc),
                garage ? RULE_GARAGE_TWO_OR_MORE : RULE_HEAVY_TWO_OR_MORE);
    }

    /** §4.7.2 alone: threshold, Eq. 4.7-1 and the one-floor / two-or-more-floor limits. */
    private static Reduction basic(double l0, double kll, double at, int floors, Calc calc) {
        influenceArea(kll, at, calc);
        double x = kll * at / SQUARE_FOOT; // KLL·AT in ft², the same expression as the recorded formulas
        if (!(x >= MIN_INFLUENCE_AREA_FT2)) {
            Calc.branch(calc, "KLL·AT < 400 ft² (37.16 m²) → no reduction", Asce7.clause("§4.7.2"));
            return none("L", l0, RULE_BELOW_THRESHOLD, Asce7.clause("§4.7.2"), calc);
        }
        Calc.branch(calc, "KLL·AT ≥ 400 ft² (37.16 m²) → reduction permitted", Asce7.clause("§4.7.2"));
        double factor = 0.25 + 15 / Math.sqrt(x);
        double l = eq471(l0, kll, at, factor, calc);
        double limit = floors == 1 ? 0.50 : 0.40;
        if (factor >= limit) {
            return new Reduction(factor, l, RULE_EQUATION);
        }
        String who = floors == 1 ? "one floor" : "two or more floors";
        Calc.branch(calc, "L/L0 = " + CalcFormat.sig(factor) + " < " + (floors == 1 ? "0.50" : "0.40")
                + " (member supporting " + who + ") → lower limit governs", Asce7.clause("§4.7.2"));
        return new Reduction(limit, lowerLimit(l0, floors, calc),
                floors == 1 ? RULE_LIMIT_ONE_FLOOR : RULE_LIMIT_TWO_OR_MORE);
    }

    /** ASCE 7-16 §4.7.2: influence area KLL·AT (m²), compared with 400 ft² (37.16 m²). */
    public static double influenceArea(double kll, double at, Calc calc) {
        return Calc.eq(calc, "KLL·AT", "KLL·AT", Asce7.clause("§4.7.2"), kll * at, Quantity.FLOOR_AREA,
                Arg.num("KLL", kll), Arg.of("AT", at, Quantity.FLOOR_AREA));
    }

    /**
     * ASCE 7-16 Eq. 4.7-1: reduced floor live load L = L0·(0.25 + 15/√(KLL·AT/A1)) (Pa), with A1 = 1 ft²
     * so that KLL·AT enters in ft² as the equation requires (see the class notes on units).
     * {@code factor} is the bracket, 0.25 + 15/√(KLL·AT/A1), computed by the caller with the same
     * expression; it is passed so that the factor and the load come from one evaluation.
     */
    private static double eq471(double l0, double kll, double at, double factor, Calc calc) {
        return Calc.eq(calc, "L", "L0·(0.25 + 15/√(KLL·AT/A1))", Asce7.eq("4.7-1"), l0 * factor, Quantity.AREA_LOAD,
                Arg.of("L0", l0, Quantity.AREA_LOAD), Arg.num("KLL", kll), Arg.of("AT", at, Quantity.FLOOR_AREA),
                Arg.of("A1", SQUARE_FOOT, Quantity.FLOOR_AREA));
    }

    /** ASCE 7-16 §4.7.2: lower limit of the reduced floor live load, 0.50·L0 (one floor) or 0.40·L0 (two or more) [Pa]. */
    private static double lowerLimit(double l0, int floors, Calc calc) {
        if (floors == 1) {
            return Calc.eq(calc, "L", "0.50·L0", Asce7.clause("§4.7.2"), 0.50 * l0, Quantity.AREA_LOAD,
                    Arg.of("L0", l0, Quantity.AREA_LOAD));
        }
        return Calc.eq(calc, "L", "0.40·L0", Asce7.clause("§4.7.2"), 0.40 * l0, Quantity.AREA_LOAD,
                Arg.of("L0", l0, Quantity.AREA_LOAD));
    }

    /** ASCE 7-16 §4.7.3 and §4.7.4 exceptions: reduction of at most 20 %, L = 0.80·L0 [Pa]. */
    private static double twentyPercentCap(double l0, String clause, Calc calc) {
        return Calc.eq(calc, "L", "0.80·L0", clause, 0.80 * l0, Quantity.AREA_LOAD, Arg.of("L0", l0, Quantity.AREA_LOAD));
    }

    /**
     * ASCE 7-16 §4.7.6: largest tributary area of a one-way slab for Eq. 4.7-1, AT = 1.5·ls² (m²): the
     * slab span times a width normal to it of 1.5 times the span.
     *
     * @param slabSpan ls, m, positive
     */
    public static double oneWaySlabMaxArea(double slabSpan, Calc calc) {
        if (!(slabSpan > 0) || Double.isInfinite(slabSpan)) {
            throw new IllegalArgumentException("slab span must be positive and finite, got " + slabSpan + " m");
        }
        return Calc.eq(calc, "AT,max", "1.5·ls²", Asce7.clause("§4.7.6"), 1.5 * (slabSpan * slabSpan),
                Quantity.FLOOR_AREA, Arg.of("ls", slabSpan, Quantity.SPAN_LENGTH));
    }

    /**
     * ASCE 7-16 §4.8.2 Eq. 4.8-1: reduced roof live load Lr = L0·R1·R2, 12 psf ≤ Lr ≤ L0 (0.58 kN/m² in
     * SI); f = rise per foot (F) for a pitched roof, 0 for flat.
     *
     * <p>For ordinary flat, pitched and curved roofs (L0 = 20 psf in Table 4.3-1). AT is converted to
     * ft² exactly (1 ft = 0.3048 m) before R1's limits and slope are applied. F is the rise in inches
     * per foot of run (in SI, F = 0.12 × slope in percent); for an arch or dome F = 32 × rise/span
     * (from memory). A load L0 of 12 psf or less is returned unreduced, so the result never exceeds L0.
     * Roofs used for assembly, gardens or other occupancies are reduced as floors (§4.8.3), with
     * {@link #floor}.
     *
     * @throws IllegalArgumentException for a negative or non-finite load, area or F
     */
    public static Reduction roof(double l0, double at, double f, Calc calc) {
        requireLoad(l0);
        requireArea(at);
        if (!(f >= 0) || Double.isInfinite(f)) {
            throw new IllegalArgumentException("roof rise per foot F must be finite and ≥ 0 (0 for a flat roof), got " + f);
        }
        if (l0 <= ROOF_MINIMUM) {
            Calc.branch(calc, "L0 ≤ 12 psf (0.58 kN/m²) → no reduction", Asce7.clause("§4.8.2"));
            return none("Lr", l0, RULE_ROOF_AT_MINIMUM, Asce7.clause("§4.8.2"), calc);
        }
        double r1 = r1(at, calc);
        double r2 = r2(f, calc);
        double lr = eq481(l0, r1, r2, calc);
        if (lr >= ROOF_MINIMUM) {
            return new Reduction(lr / l0, lr, RULE_ROOF_EQUATION);
        }
        Calc.branch(calc, "L0·R1·R2 < 12 psf (0.58 kN/m²) → Lr = 12 psf", Asce7.clause("§4.8.2"));
        double min = Calc.eq(calc, "Lr", "Lmin", Asce7.clause("§4.8.2"), ROOF_MINIMUM, Quantity.AREA_LOAD,
                Arg.of("Lmin", ROOF_MINIMUM, Quantity.AREA_LOAD));
        return new Reduction(min / l0, min, RULE_ROOF_MINIMUM);
    }

    /** ASCE 7-16 Eq. 4.8-1: reduced roof live load Lr = L0·R1·R2 (Pa), before the 12 psf lower bound. */
    private static double eq481(double l0, double r1, double r2, Calc calc) {
        return Calc.eq(calc, "Lr", "L0·R1·R2", Asce7.eq("4.8-1"), l0 * r1 * r2, Quantity.AREA_LOAD,
                Arg.of("L0", l0, Quantity.AREA_LOAD), Arg.num("R1", r1), Arg.num("R2", r2));
    }

    /**
     * ASCE 7-16 §4.8.2: tributary-area factor R1 = 1 for AT ≤ 200 ft²; 1.2 − 0.001·AT for
     * 200 &lt; AT &lt; 600 ft²; 0.6 for AT ≥ 600 ft². AT (m²) is divided by A1 = 1 ft² = 0.09290304 m²
     * (exact, 1 ft = 0.3048 m), so the limits are 18.58 and 55.74 m².
     */
    public static double r1(double at, Calc calc) {
        requireArea(at);
        double x = at / SQUARE_FOOT; // AT in ft², the same expression as the recorded formula
        String ref = Asce7.clause("§4.8.2");
        if (x <= 200) {
            Calc.branch(calc, "AT ≤ 200 ft² (18.58 m²) → R1 = 1", ref);
            return Calc.eq(calc, "R1", "1", ref, 1.0, Quantity.NUMBER);
        }
        if (x < 600) {
            Calc.branch(calc, "200 ft² < AT < 600 ft² (18.58 m² < AT < 55.74 m²)", ref);
            return Calc.eq(calc, "R1", "1.2 − 0.001·(AT/A1)", ref, 1.2 - 0.001 * (at / SQUARE_FOOT), Quantity.NUMBER,
                    Arg.of("AT", at, Quantity.FLOOR_AREA), Arg.of("A1", SQUARE_FOOT, Quantity.FLOOR_AREA));
        }
        Calc.branch(calc, "AT ≥ 600 ft² (55.74 m²) → R1 = 0.6", ref);
        return Calc.eq(calc, "R1", "0.6", ref, 0.6, Quantity.NUMBER);
    }

    /**
     * ASCE 7-16 §4.8.2: roof-slope factor R2 = 1 for F ≤ 4; 1.2 − 0.05·F for 4 &lt; F &lt; 12; 0.6 for
     * F ≥ 12 (F = rise in inches per foot; 0 for a flat roof).
     */
    public static double r2(double f, Calc calc) {
        if (!(f >= 0) || Double.isInfinite(f)) {
            throw new IllegalArgumentException("roof rise per foot F must be finite and ≥ 0 (0 for a flat roof), got " + f);
        }
        String ref = Asce7.clause("§4.8.2");
        if (f <= 4) {
            Calc.branch(calc, "F = " + CalcFormat.sig(f) + " ≤ 4 → R2 = 1", ref);
            return Calc.eq(calc, "R2", "1", ref, 1.0, Quantity.NUMBER);
        }
        if (f < 12) {
            Calc.branch(calc, "4 < F = " + CalcFormat.sig(f) + " < 12", ref);
            return Calc.eq(calc, "R2", "1.2 − 0.05·F", ref, 1.2 - 0.05 * f, Quantity.NUMBER, Arg.num("F", f));
        }
        Calc.branch(calc, "F = " + CalcFormat.sig(f) + " ≥ 12 → R2 = 0.6", ref);
        return Calc.eq(calc, "R2", "0.6", ref, 0.6, Quantity.NUMBER);
    }

    private static Reduction none(String symbol, double l0, String rule, String reference, Calc calc) {
        double l = Calc.eq(calc, symbol, "L0", reference, l0, Quantity.AREA_LOAD, Arg.of("L0", l0, Quantity.AREA_LOAD));
        return new Reduction(1.0, l, rule);
    }

    private static void requireLoad(double l0) {
        if (!(l0 >= 0) || Double.isInfinite(l0)) {
            throw new IllegalArgumentException("unreduced live load L0 must be finite and ≥ 0 Pa, got " + l0);
        }
    }

    private static void requireArea(double at) {
        if (!(at >= 0) || Double.isInfinite(at)) {
            throw new IllegalArgumentException("tributary area AT must be finite and ≥ 0 m², got " + at);
        }
    }
}
