package org.baywright.analysis;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * {@link SimpleSpan} against published simple-beam results.
 *
 * <p>Source of the formulas: AISC Steel Construction Manual, Table 3-23 "Shears, moments and
 * deflections", as restated in {@code shared/guide/CHECK-VALUES.md} §5 (case numbers from memory
 * there; the formulas are standard beam theory). Source of the numbers: the same file, Table 5
 * (l = 30 ft, E = 29,000 ksi, I = 1,000 in⁴; every row COMPUTED).
 *
 * <p>Tolerances. A Table 5 number is compared within half a unit of its last printed digit (the
 * source's rounding; "1.2569" → ±0.00005, "13.9" → ±0.05), plus 1e-12 relative for the unit
 * conversions. A closed-form formula is evaluated here in double precision, so it is compared within
 * 1e-10 relative (rounding only), except where the formula itself prints a rounded coefficient.
 */
class SimpleSpanValidationTest {

    // Exact unit definitions: 1 in = 0.0254 m; 1 lbf = 4.4482216152605 N (from memory: the
    // international avoirdupois pound times standard gravity 9.80665 m/s²).
    private static final double IN = 0.0254;
    private static final double FT = 12.0 * IN;
    private static final double LBF = 4.4482216152605;
    private static final double KIP = 1000.0 * LBF;
    private static final double KSI = KIP / (IN * IN);
    private static final double KLF = KIP / FT;
    private static final double KIP_FT = KIP * FT;

    // CHECK-VALUES.md Table 5 inputs: l = 30 ft, E = 29,000 ksi, I = 1,000 in⁴.
    private static final double L = 30.0 * FT;
    private static final double EI = 29_000.0 * KSI * 1_000.0 * Math.pow(IN, 4);

    private static final double FORMULA_TOLERANCE = 1e-10;
    private static final List<String> ERRORS = new ArrayList<>();
    private static double worstRelativeError = 0.0;
    private static String worstLabel = "";

    /** Prints the largest relative error seen against a Table 5 number (for the verification report). */
    @AfterAll
    static void summary() {
        if (Boolean.getBoolean("baywright.verbose")) {
            ERRORS.forEach(System.out::println);
        }
        System.out.printf("SimpleSpanValidationTest: largest relative error vs CHECK-VALUES Table 5 = %.2e (%s)%n",
                worstRelativeError, worstLabel);
    }

    /**
     * Compares {@code actual} with a number printed in the source, within half a unit of its last
     * printed digit.
     */
    private static Executable printed(String label, String printedValue, double actual) {
        return printed(label, printedValue, actual, 0.0);
    }

    /**
     * As {@link #printed(String, String, double)}, widened by {@code sourceRelative} (relative) when
     * the source number was itself computed from a rounded coefficient.
     */
    private static Executable printed(String label, String printedValue, double actual, double sourceRelative) {
        BigDecimal expected = new BigDecimal(printedValue);
        double tolerance = expected.ulp().doubleValue() / 2.0
                + (1e-12 + sourceRelative) * Math.abs(expected.doubleValue());
        return () -> {
            double relative = expected.signum() == 0 ? 0.0
                    : Math.abs(actual - expected.doubleValue()) / Math.abs(expected.doubleValue());
            synchronized (ERRORS) {
                ERRORS.add(String.format("%s: printed %s, got %.6g, relative error %.2e",
                        label, printedValue, actual, relative));
                if (relative > worstRelativeError) {
                    worstRelativeError = relative;
                    worstLabel = label;
                }
            }
            assertEquals(expected.doubleValue(), actual, tolerance, label + " (printed " + printedValue + ")");
        };
    }

    /** Compares with a value computed here from a closed-form formula. */
    private static Executable formula(String label, double expected, double actual) {
        return formula(label, expected, actual, FORMULA_TOLERANCE);
    }

    private static Executable formula(String label, double expected, double actual, double relative) {
        return () -> assertEquals(expected, actual, relative * Math.abs(expected), label);
    }

    private static double kips(double newtons) {
        return newtons / KIP;
    }

    private static double kipFt(double newtonMetres) {
        return newtonMetres / KIP_FT;
    }

    private static double inches(double metres) {
        return metres / IN;
    }

    private static double feet(double metres) {
        return metres / FT;
    }

    // ------------------------------------------------------------------------------------------
    // CHECK-VALUES.md Table 5, row by row.
    // ------------------------------------------------------------------------------------------

    @Test
    void case1UniformLoadTable5() {
        SimpleSpan span = SimpleSpan.of(L, List.of(DistributedLoad.full(L, 2.0 * KLF)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 1, w = 2.0 k/ft (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "30.0", kips(span.leftReaction())),          // Table 5 Case 1: R = 30.0
                printed("R2 [kips]", "30.0", kips(span.rightReaction())),         // Table 5 Case 1: R = 30.0
                printed("Vmax [kips]", "30.0", kips(span.maxShear().value())),    // Table 5 Case 1: V = 30.0
                printed("Mmax [kip-ft]", "225.0", kipFt(m.value())),              // Table 5 Case 1: M = 225.0
                formula("x of Mmax [ft]", 15.0, feet(m.position())),              // Table 3-23 Case 1: at midspan
                printed("Δmax [in]", "1.2569", inches(d.value())),                // Table 5 Case 1: Δ = 1.2569
                formula("x of Δmax [ft]", 15.0, feet(d.position()), 1e-7));       // Table 3-23 Case 1: at midspan
    }

    @Test
    void case7CentralPointLoadTable5() {
        SimpleSpan span = SimpleSpan.of(L, List.of(new PointLoad(L / 2.0, 20.0 * KIP)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 7, P = 20 kips at midspan (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "10.0", kips(span.leftReaction())),          // Table 5 Case 7: R = 10.0
                printed("R2 [kips]", "10.0", kips(span.rightReaction())),         // Table 5 Case 7: R = 10.0
                printed("Mmax [kip-ft]", "150.0", kipFt(m.value())),              // Table 5 Case 7: M = 150.0
                formula("x of Mmax [ft]", 15.0, feet(m.position())),              // Table 3-23 Case 7: at the load
                printed("Δmax [in]", "0.6703", inches(d.value())),                // Table 5 Case 7: Δ = 0.6703
                formula("x of Δmax [ft]", 15.0, feet(d.position()), 1e-7));       // Table 3-23 Case 7: at the center
    }

    @Test
    void case8EccentricPointLoadTable5() {
        // a = 20 ft from the left support, b = 10 ft from the right.
        SimpleSpan span = SimpleSpan.of(L, List.of(new PointLoad(20.0 * FT, 20.0 * KIP)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 8, P = 20 kips at a = 20 ft (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "6.667", kips(span.leftReaction())),         // Table 5 Case 8: Pb/l = 6.667
                printed("R2 [kips]", "13.333", kips(span.rightReaction())),       // Table 5 Case 8: Pa/l = 13.333
                printed("Mmax [kip-ft]", "133.33", kipFt(m.value())),             // Table 5 Case 8: M = 133.33
                formula("x of Mmax [ft]", 20.0, feet(m.position())),              // Table 3-23 Case 8: at the load
                printed("Δ at load [in]", "0.5297", inches(span.deflection(20.0 * FT, EI))), // Table 5 Case 8
                printed("Δmax [in]", "0.5766", inches(d.value())),                // Table 5 Case 8: Δmax = 0.5766
                printed("x of Δmax [ft]", "16.33", feet(d.position())));          // Table 5 Case 8: x = 16.33 ft
    }

    @Test
    void case9TwoEqualLoadsAtThirdPointsTable5() {
        SimpleSpan span = SimpleSpan.of(L, List.of(
                new PointLoad(10.0 * FT, 15.0 * KIP), new PointLoad(20.0 * FT, 15.0 * KIP)));
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 9, two P = 15 kips at the third points (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "15.0", kips(span.leftReaction())),          // Table 5 Case 9: R = 15.0
                printed("R2 [kips]", "15.0", kips(span.rightReaction())),         // Table 5 Case 9: R = 15.0
                printed("Vmax [kips]", "15.0", kips(span.maxShear().value())),    // Table 5 Case 9: V = 15.0
                printed("Mmax [kip-ft]", "150.0", kipFt(span.maxMoment().value())), // Table 5 Case 9: M = 150.0
                printed("M at 12 ft [kip-ft]", "150.0", kipFt(span.moment(12.0 * FT))), // Table 5: constant between loads
                printed("M at 15 ft [kip-ft]", "150.0", kipFt(span.moment(15.0 * FT))), // Table 5: constant between loads
                printed("M at 18 ft [kip-ft]", "150.0", kipFt(span.moment(18.0 * FT))), // Table 5: constant between loads
                printed("V at 15 ft [kips]", "0.0", kips(span.shear(15.0 * FT))),  // Table 3-23 Case 9: no shear between loads
                printed("Δmax [in]", "0.8566", inches(d.value())),                // Table 5 Case 9: Δ = 0.8566
                formula("x of Δmax [ft]", 15.0, feet(d.position()), 1e-7));       // Table 3-23 Case 9: at the center
    }

    @Test
    void case4PartialUniformLoadTable5() {
        // w = 2.0 k/ft from x = 5 ft to x = 15 ft: a = 5, b = 10, c = 15 ft.
        SimpleSpan span = SimpleSpan.of(L, List.of(DistributedLoad.uniform(5.0 * FT, 15.0 * FT, 2.0 * KLF)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 4, w = 2.0 k/ft on 5..15 ft (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "13.333", kips(span.leftReaction())),        // Table 5 Case 4: R1 = 13.333
                printed("R2 [kips]", "6.667", kips(span.rightReaction())),        // Table 5 Case 4: R2 = 6.667
                printed("Mmax [kip-ft]", "111.11", kipFt(m.value())),             // Table 5 Case 4: M = 111.11
                printed("x of Mmax [ft]", "11.667", feet(m.position())),          // Table 5 Case 4: x = 11.667 ft
                printed("Δmax [in]", "0.550", inches(d.value())),                 // Table 5 Case 4: Δmax = 0.550
                printed("x of Δmax [ft]", "13.9", feet(d.position())),            // Table 5 Case 4: x ≈ 13.9 ft
                printed("Δ at midspan [in]", "0.546", inches(span.deflection(15.0 * FT, EI)))); // Table 5 Case 4
    }

    @Test
    void case2TriangleRisingToTheRightTable5() {
        // Total W = 30 kips = w·l/2, so the peak intensity at the right support is 2 k/ft.
        SimpleSpan span = SimpleSpan.of(L, List.of(new DistributedLoad(0.0, L, 0.0, 2.0 * KLF)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 2, W = 30 kips increasing to the right (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "10.0", kips(span.leftReaction())),          // Table 5 Case 2: R1 = 10.0
                printed("R2 [kips]", "20.0", kips(span.rightReaction())),         // Table 5 Case 2: R2 = 20.0
                printed("Mmax [kip-ft]", "115.47", kipFt(m.value())),             // Table 5 Case 2: M = 115.47
                printed("x of Mmax [ft]", "17.32", feet(m.position())),           // Table 5 Case 2: x = 17.32 ft
                // Table 5 Case 2: Δ = 0.6294. That number follows from the Case 2 coefficient printed to
                // 4 figures, 0.01304·Wl³/(EI); the exact coefficient is 0.0130444 (computed with
                // 30 digits from the Δx formula below), giving 0.62958 in. So the tolerance adds the
                // coefficient's rounding, ±0.000005/0.01304 = 3.8e-4 relative.
                printed("Δmax [in]", "0.6294", inches(d.value()), 0.000005 / 0.01304),
                printed("x of Δmax [ft]", "15.58", feet(d.position())));          // Table 5 Case 2: x = 15.58 ft
    }

    @Test
    void case3TrianglePeakedAtCenterTable5() {
        // Total W = 30 kips = w·l/2, so the peak intensity at midspan is 2 k/ft.
        SimpleSpan span = SimpleSpan.of(L, List.of(
                new DistributedLoad(0.0, L / 2.0, 0.0, 2.0 * KLF),
                new DistributedLoad(L / 2.0, L, 2.0 * KLF, 0.0)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(EI);
        assertAll("Table 3-23 Case 3, W = 30 kips peaked at the center (CHECK-VALUES.md Table 5, COMPUTED)",
                printed("R1 [kips]", "15.0", kips(span.leftReaction())),          // Table 5 Case 3: R = 15.0
                printed("R2 [kips]", "15.0", kips(span.rightReaction())),         // Table 5 Case 3: R = 15.0
                printed("Mmax [kip-ft]", "150.0", kipFt(m.value())),              // Table 5 Case 3: M = 150.0
                formula("x of Mmax [ft]", 15.0, feet(m.position())),              // Table 3-23 Case 3: at the center
                printed("Δmax [in]", "0.8044", inches(d.value())),                // Table 5 Case 3: Δ = 0.8044
                formula("x of Δmax [ft]", 15.0, feet(d.position()), 1e-7));       // Table 3-23 Case 3: at the center
    }

    // ------------------------------------------------------------------------------------------
    // Table 3-23 closed forms (CHECK-VALUES.md §5) at arbitrary SI inputs and arbitrary points.
    // ------------------------------------------------------------------------------------------

    private static final double SPAN = 7.3;          // m, arbitrary
    private static final double STIFFNESS = 7.0e7;   // N·m², arbitrary (E = 200 GPa, I = 3.5e-4 m⁴)

    @Test
    void case1FormulasAtArbitraryPoints() {
        double w = 14_600.0; // N/m
        double l = SPAN;
        double ei = STIFFNESS;
        SimpleSpan span = SimpleSpan.of(l, List.of(DistributedLoad.full(l, w)));
        List<Executable> checks = new ArrayList<>();
        for (double x : new double[] {l / 4.0, 0.1 * l, 0.37 * l, 0.5 * l, 0.83 * l}) {
            checks.add(formula("Vx at " + x, w * (l / 2.0 - x), span.shear(x)));                   // Case 1: Vx = w(l/2 − x)
            checks.add(formula("Mx at " + x, w * x * (l - x) / 2.0, span.moment(x)));              // Case 1: Mx = wx(l − x)/2
            checks.add(formula("Δx at " + x,                                                       // Case 1: Δx = wx(l³ − 2lx² + x³)/(24EI)
                    w * x * (l * l * l - 2.0 * l * x * x + x * x * x) / (24.0 * ei), span.deflection(x, ei)));
        }
        checks.add(formula("R1", w * l / 2.0, span.leftReaction()));                               // Case 1: R = wl/2
        checks.add(formula("Mmax", w * l * l / 8.0, span.maxMoment().value()));                   // Case 1: M = wl²/8
        checks.add(formula("Δmax", 5.0 * w * Math.pow(l, 4) / (384.0 * ei), span.maxDeflection(ei).value())); // Case 1: 5wl⁴/(384EI)
        assertAll("Table 3-23 Case 1 closed forms", checks);
    }

    @Test
    void case2Formulas() {
        double bigW = 52_000.0; // N, total load
        double l = SPAN;
        double ei = STIFFNESS;
        SimpleSpan span = SimpleSpan.of(l, List.of(new DistributedLoad(0.0, l, 0.0, 2.0 * bigW / l)));
        Extreme m = span.maxMoment();
        Extreme d = span.maxDeflection(ei);
        assertAll("Table 3-23 Case 2 closed forms",
                formula("R1", bigW / 3.0, span.leftReaction()),                                      // Case 2: R1 = W/3
                formula("R2", 2.0 * bigW / 3.0, span.rightReaction()),                               // Case 2: R2 = 2W/3
                formula("Mmax", 2.0 * bigW * l / (9.0 * Math.sqrt(3.0)), m.value()),                 // Case 2: M = 2Wl/(9√3)
                formula("x of Mmax", l / Math.sqrt(3.0), m.position()),                              // Case 2: x = l/√3
                formula("Δmax", 0.01304 * bigW * l * l * l / ei, d.value(), 0.000005 / 0.01304),     // Case 2: 0.01304·Wl³/(EI), coefficient to 4 figures
                formula("x of Δmax", l * Math.sqrt(1.0 - Math.sqrt(8.0 / 15.0)), d.position(), 1e-9)); // Case 2: x = l√(1 − √(8/15))
    }

    @Test
    void case2DeflectionCurve() {
        double bigW = 52_000.0;
        double l = SPAN;
        double ei = STIFFNESS;
        SimpleSpan span = SimpleSpan.of(l, List.of(new DistributedLoad(0.0, l, 0.0, 2.0 * bigW / l)));
        List<Executable> checks = new ArrayList<>();
        for (double x : new double[] {0.13 * l, l / 4.0, 0.5193 * l, 0.71 * l, 0.94 * l}) {
            // Table 3-23 Case 2 (from memory): Δx = Wx(3x⁴ − 10l²x² + 7l⁴)/(180EIl²)
            double expected = bigW * x * (3.0 * Math.pow(x, 4) - 10.0 * l * l * x * x + 7.0 * Math.pow(l, 4))
                    / (180.0 * ei * l * l);
            checks.add(formula("Δx at " + x, expected, span.deflection(x, ei)));
            // Table 3-23 Case 2 (from memory): Mx = Wx(l² − x²)/(3l²)
            checks.add(formula("Mx at " + x, bigW * x * (l * l - x * x) / (3.0 * l * l), span.moment(x)));
            // Table 3-23 Case 2 (from memory): Vx = W/3 − Wx²/l²
            checks.add(formula("Vx at " + x, bigW / 3.0 - bigW * x * x / (l * l), span.shear(x), 1e-9));
        }
        assertAll("Table 3-23 Case 2 curves", checks);
    }

    @Test
    void case3Formulas() {
        double bigW = 52_000.0;
        double l = SPAN;
        double ei = STIFFNESS;
        SimpleSpan span = SimpleSpan.of(l, List.of(
                new DistributedLoad(0.0, l / 2.0, 0.0, 2.0 * bigW / l),
                new DistributedLoad(l / 2.0, l, 2.0 * bigW / l, 0.0)));
        assertAll("Table 3-23 Case 3 closed forms",
                formula("R1", bigW / 2.0, span.leftReaction()),                       // Case 3: R = W/2
                formula("Mmax", bigW * l / 6.0, span.maxMoment().value()),           // Case 3: M = Wl/6
                formula("Δmax", bigW * l * l * l / (60.0 * ei), span.maxDeflection(ei).value())); // Case 3: Wl³/(60EI)
    }

    @Test
    void case4Formulas() {
        double w = 9_500.0;
        double l = SPAN;
        double a = 1.1;
        double b = 3.4;
        double c = l - a - b;
        SimpleSpan span = SimpleSpan.of(l, List.of(DistributedLoad.uniform(a, a + b, w)));
        double r1 = w * b * (2.0 * c + b) / (2.0 * l);                               // Case 4: R1 = wb(2c + b)/(2l)
        Extreme m = span.maxMoment();
        assertAll("Table 3-23 Case 4 closed forms",
                formula("R1", r1, span.leftReaction()),
                formula("R2", w * b * (2.0 * a + b) / (2.0 * l), span.rightReaction()), // Case 4: R2 = wb(2a + b)/(2l)
                formula("Mmax", r1 * (a + r1 / (2.0 * w)), m.value()),                // Case 4: M = R1(a + R1/(2w))
                formula("x of Mmax", a + r1 / w, m.position()));                      // Case 4: x = a + R1/w
    }

    @Test
    void case7Formulas() {
        double p = 41_000.0;
        double l = SPAN;
        double ei = STIFFNESS;
        SimpleSpan span = SimpleSpan.of(l, List.of(new PointLoad(l / 2.0, p)));
        assertAll("Table 3-23 Case 7 closed forms",
                formula("R1", p / 2.0, span.leftReaction()),                                    // Case 7: R = P/2
                formula("Mmax", p * l / 4.0, span.maxMoment().value()),                         // Case 7: M = Pl/4
                formula("Δmax", p * l * l * l / (48.0 * ei), span.maxDeflection(ei).value()));  // Case 7: Pl³/(48EI)
    }

    @Test
    void case8Formulas() {
        double p = 41_000.0;
        double l = SPAN;
        double ei = STIFFNESS;
        double a = 4.9; // a > b, so the maximum deflection lies in the longer part
        double b = l - a;
        SimpleSpan span = SimpleSpan.of(l, List.of(new PointLoad(a, p)));
        Extreme d = span.maxDeflection(ei);
        assertAll("Table 3-23 Case 8 closed forms",
                formula("R1", p * b / l, span.leftReaction()),                                  // Case 8: R1 = Pb/l
                formula("R2", p * a / l, span.rightReaction()),                                 // Case 8: R2 = Pa/l
                formula("Mmax", p * a * b / l, span.maxMoment().value()),                       // Case 8: M = Pab/l
                formula("Δ at load", p * a * a * b * b / (3.0 * ei * l), span.deflection(a, ei)), // Case 8: Pa²b²/(3EIl)
                formula("Δmax", p * a * b * (a + 2.0 * b) * Math.sqrt(3.0 * a * (a + 2.0 * b)) // Case 8: Pab(a+2b)√(3a(a+2b))/(27EIl)
                        / (27.0 * ei * l), d.value()),
                formula("x of Δmax", Math.sqrt(a * (a + 2.0 * b) / 3.0), d.position(), 1e-9));  // Case 8: x = √(a(a+2b)/3)
    }

    @Test
    void case9Formulas() {
        double p = 23_000.0;
        double l = SPAN;
        double ei = STIFFNESS;
        double a = 0.2 * l;
        SimpleSpan general = SimpleSpan.of(l, List.of(new PointLoad(a, p), new PointLoad(l - a, p)));
        SimpleSpan thirds = SimpleSpan.of(l, List.of(new PointLoad(l / 3.0, p), new PointLoad(2.0 * l / 3.0, p)));
        assertAll("Table 3-23 Case 9 closed forms",
                formula("R", p, general.leftReaction()),                                        // Case 9: R = V = P
                formula("Mmax", p * a, general.maxMoment().value()),                            // Case 9: M = Pa
                formula("M between loads", p * a, general.moment(0.6 * l)),                     // Case 9: M = Pa between the loads
                formula("Δmax", p * a * (3.0 * l * l - 4.0 * a * a) / (24.0 * ei),              // Case 9: Pa(3l² − 4a²)/(24EI)
                        general.maxDeflection(ei).value()),
                formula("Δmax third points", 23.0 * p * l * l * l / (648.0 * ei),               // Case 9: 23Pl³/(648EI)
                        thirds.maxDeflection(ei).value()));
    }
}
