package org.baywright.load;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link LiveLoadReduction} and {@link ElementKind} against the check values of
 * {@code shared/guide/CHECK-VALUES.md} §3 ("ASCE 7-16 / 7-22 live loads, live-load reduction and load
 * combinations"), Table 3, and the traps listed at the end of that file (items 3, 4 and 9).
 *
 * <p>Each value names its row and carries the row's "how obtained" label: FOUND (read in the named
 * document), MEMORY (from memory: recalled, not re-read) or COMPUTED (computed from the §3 method).
 *
 * <p>Tolerances. A number printed in the source is compared within half a unit of its last printed
 * digit ("0.8624" → ±0.00005, "43.1" → ±0.05 psf), plus 1e-12 relative for the unit conversions.
 * Where a value is exact by its rule (no reduction, a limit such as 0.40·L0, the 20 % cap, R1 = 0.6,
 * 15/√900 = 0.5) it is written with more digits than the row prints, so that the check stays tight.
 * The engine evaluates the US form of Eq. 4.7-1 exactly (AT converted to ft² with 1 ft = 0.3048 m),
 * so the US rows need no other allowance. The SI row was computed with the standard's SI coefficient
 * 4.57, which is 15 × 0.3048 = 4.572 rounded: its factor is compared within half a unit of its last
 * digit plus the effect of that rounding, 0.002/√(KLL·AT [m²]).
 *
 * <p>Units here are defined independently of {@code org.baywright.units}: 1 ft = 0.3048 m and
 * 1 lbf = 4.4482216152605 N, both exact by definition.
 */
class LiveLoadReductionValidationTest {
    private static final double FT = 0.3048;
    private static final double FT2 = FT * FT;
    private static final double LBF = 4.4482216152605;
    private static final double PSF = LBF / FT2;
    private static final double PLF = LBF / FT;
    private static final double KPA = 1000.0;

    /** {@code actual} within half a unit of the last digit of {@code printed}, plus 1e-12 relative. */
    private static Executable printed(String label, String printed, double actual) {
        return printed(label, printed, actual, 0.0);
    }

    /** As {@link #printed(String, String, double)}, widened by {@code extra} (absolute, same unit). */
    private static Executable printed(String label, String printed, double actual, double extra) {
        BigDecimal expected = new BigDecimal(printed);
        double tolerance = expected.ulp().doubleValue() / 2 + extra + 1e-12 * Math.abs(expected.doubleValue());
        return () -> assertEquals(expected.doubleValue(), actual, tolerance,
                () -> label + ": source prints " + printed + ", got " + actual);
    }

    /** The value of the last equation recorded under {@code reference}, or NaN. */
    private static double recorded(Calc calc, String reference) {
        double v = Double.NaN;
        for (CalcLine line : calc.lines()) {
            if (line.kind() == CalcLine.Kind.EQUATION && reference.equals(line.reference())) {
                v = line.value();
            }
        }
        return v;
    }

    // ---------------------------------------------------------------------------------------------
    // KLL table

    /**
     * CHECK-VALUES §3 Table 3 row "KLL table": 4, 4, 3, 2, 2, 2, 1 for the element types listed in §3
     * "Live-load element factor KLL" — FOUND (IBC Table 1607.11.1, same as ASCE 7; Brockenbrough,
     * Structural Steel Designer's Handbook 4th ed., Table 4.4). The table's number in ASCE 7-16
     * (Table 4.7-1) is MEMORY (from memory; CHECK-VALUES trap 9). Trap 3: third-party summaries giving
     * exterior columns 2 or 3 and interior beams 1 are wrong; the standard's rows are used here.
     */
    @ParameterizedTest(name = "{0}: KLL = {1}")
    @CsvSource({
        "INTERIOR_COLUMN, 4",
        "EXTERIOR_COLUMN, 4",
        "EDGE_COLUMN_WITH_CANTILEVER_SLAB, 3",
        "CORNER_COLUMN_WITH_CANTILEVER_SLAB, 2",
        "EDGE_BEAM, 2",
        "INTERIOR_BEAM, 2",
        "EDGE_BEAM_WITH_CANTILEVER_SLAB, 1",
        "CANTILEVER_BEAM, 1",
        "ONE_WAY_SLAB, 1",
        "TWO_WAY_SLAB, 1",
        "OTHER, 1",
    })
    void elementFactorTable(ElementKind kind, double expected) {
        assertEquals(expected, kind.kll(), 0.0, kind + " (CHECK-VALUES §3 KLL table, FOUND)");
    }

    // ---------------------------------------------------------------------------------------------
    // Floor rows of Table 3

    /**
     * One row of Table 3 for {@link LiveLoadReduction#floor}: inputs in US units as the row gives
     * them; expected values as printed (null where the row prints none).
     */
    record FloorRow(String row, String obtained, double l0Psf, double kll, double atFt2, int floors,
            ReducibleUse use, String factor, String reducedPsf, String rule, String eq471Factor) {
        @Override
        public String toString() {
            return row;
        }
    }

    static Stream<Arguments> floorRows() {
        return Stream.of(
                // Table 3 "Interior beam": L0 = 50 psf, 30 ft span at 10 ft, AT = 300 ft², KLL = 2 →
                // factor 0.8624, L = 43.1 psf — COMPUTED
                new FloorRow("Interior beam", "COMPUTED", 50, ElementKind.INTERIOR_BEAM.kll(), 300, 1,
                        ReducibleUse.ORDINARY, "0.8624", "43.1", LiveLoadReduction.RULE_EQUATION, "0.8624"),
                // Table 3 "Edge beam without cantilever slab": AT = 150 ft², KLL = 2 → 300 < 400,
                // no reduction, 50 psf — COMPUTED
                new FloorRow("Edge beam without cantilever slab", "COMPUTED", 50, ElementKind.EDGE_BEAM.kll(), 150, 1,
                        ReducibleUse.ORDINARY, "1.0000", "50.000", LiveLoadReduction.RULE_BELOW_THRESHOLD, null),
                // Table 3 "Interior girder": AT = 600 ft² → factor 0.6830, 34.15 psf — COMPUTED
                new FloorRow("Interior girder, AT = 600 ft² (delivered)", "COMPUTED", 50, ElementKind.INTERIOR_BEAM.kll(),
                        600, 1, ReducibleUse.ORDINARY, "0.6830", "34.15", LiveLoadReduction.RULE_EQUATION, "0.6830"),
                // Table 3 "Interior girder": AT = 900 ft² → factor 0.6036, 30.18 psf — COMPUTED
                new FloorRow("Interior girder, AT = 900 ft² (half-bay each side)", "COMPUTED", 50,
                        ElementKind.INTERIOR_BEAM.kll(), 900, 1, ReducibleUse.ORDINARY, "0.6036", "30.18",
                        LiveLoadReduction.RULE_EQUATION, "0.6036"),
                // Table 3 "Interior column, one floor": AT = 900 ft², KLL = 4 → 0.25 + 15/60 = 0.500,
                // 25.0 psf, exactly the 0.5 limit (either rule may be named at the tie) — COMPUTED
                new FloorRow("Interior column, one floor", "COMPUTED", 50, ElementKind.INTERIOR_COLUMN.kll(), 900, 1,
                        ReducibleUse.ORDINARY, "0.5000", "25.000", null, "0.5000"),
                // Table 3 "Interior column, 2 / 3 / 4 floors": cumulative AT 1800 / 2700 / 3600 ft² →
                // Eq. 4.7-1 factors 0.4268 / 0.3943 / 0.375, applied 0.4268 / 0.40 / 0.40,
                // L = 21.34 / 20.0 / 20.0 psf — COMPUTED
                new FloorRow("Interior column, 2 floors", "COMPUTED", 50, ElementKind.INTERIOR_COLUMN.kll(), 1800, 2,
                        ReducibleUse.ORDINARY, "0.4268", "21.34", LiveLoadReduction.RULE_EQUATION, "0.4268"),
                new FloorRow("Interior column, 3 floors", "COMPUTED", 50, ElementKind.INTERIOR_COLUMN.kll(), 2700, 3,
                        ReducibleUse.ORDINARY, "0.4000", "20.000", LiveLoadReduction.RULE_LIMIT_TWO_OR_MORE, "0.3943"),
                new FloorRow("Interior column, 4 floors", "COMPUTED", 50, ElementKind.INTERIOR_COLUMN.kll(), 3600, 4,
                        ReducibleUse.ORDINARY, "0.4000", "20.000", LiveLoadReduction.RULE_LIMIT_TWO_OR_MORE, "0.3750"),
                // Table 3 "Corner column without cantilever slab (KLL = 4)": AT = 225 ft² → 900,
                // factor 0.750, 37.5 psf — COMPUTED. A corner column without cantilever slabs is an
                // exterior column without cantilever slabs in the KLL table (§3, FOUND).
                new FloorRow("Corner column without cantilever slab", "COMPUTED", 50, ElementKind.EXTERIOR_COLUMN.kll(),
                        225, 1, ReducibleUse.ORDINARY, "0.7500", "37.500", LiveLoadReduction.RULE_EQUATION, "0.7500"),
                // Table 3 "Heavy live load": light storage L0 = 125 psf, column supporting ≥ 2 floors →
                // at most 20 % reduction, ≥ 100 psf — MEMORY (from memory; wording matches IBC 1607.11.2, found)
                new FloorRow("Heavy live load, column, 2 floors", "MEMORY", 125, ElementKind.INTERIOR_COLUMN.kll(), 1800, 2,
                        ReducibleUse.ORDINARY, "0.8000", "100.000", LiveLoadReduction.RULE_HEAVY_TWO_OR_MORE, "0.4268"),
                new FloorRow("Heavy live load, column, 4 floors", "MEMORY", 125, ElementKind.INTERIOR_COLUMN.kll(), 3600, 4,
                        ReducibleUse.ORDINARY, "0.8000", "100.000", LiveLoadReduction.RULE_HEAVY_TWO_OR_MORE, "0.3750"),
                // same row: "no reduction for members supporting one floor" — MEMORY (from memory)
                new FloorRow("Heavy live load, one floor", "MEMORY", 125, ElementKind.INTERIOR_COLUMN.kll(), 900, 1,
                        ReducibleUse.ORDINARY, "1.0000", "125.000", LiveLoadReduction.RULE_HEAVY_ONE_FLOOR, null),
                // same row: "and not less than the Eq. 4.7-1 value" — MEMORY (from memory). With KLL·AT = 600 ft²
                // (the interior-beam row's influence area) Eq. 4.7-1 gives 0.8624 > 0.80, so it governs:
                // 0.8624 × 125 = 107.8 psf — COMPUTED from the interior-beam row's factor
                new FloorRow("Heavy live load, 2 floors, small area: Eq. 4.7-1 governs", "MEMORY + COMPUTED", 125,
                        ElementKind.INTERIOR_BEAM.kll(), 300, 2, ReducibleUse.ORDINARY, "0.8624", "107.8",
                        LiveLoadReduction.RULE_EQUATION, "0.8624"),
                // same row, below the §4.7.2 threshold: the §4.7.2 value is L0 itself, so nothing is reduced
                // (KLL·AT = 2 × 150 = 300 < 400, the edge-beam row) — COMPUTED
                new FloorRow("Heavy live load, 2 floors, below threshold", "MEMORY + COMPUTED", 125,
                        ElementKind.EDGE_BEAM.kll(), 150, 2, ReducibleUse.ORDINARY, "1.0000", "125.000",
                        LiveLoadReduction.RULE_BELOW_THRESHOLD, null),
                // Trap 3: the cut-off is loads that EXCEED 100 psf; 100 psf itself is reduced as usual
                // (Eq. 4.7-1 factor of the 2-floor column row, 0.4268 → 42.68 psf) — FOUND (IBC text) + COMPUTED
                new FloorRow("L0 = 100 psf is not a heavy load", "FOUND + COMPUTED", 100, ElementKind.INTERIOR_COLUMN.kll(),
                        1800, 2, ReducibleUse.ORDINARY, "0.4268", "42.68", LiveLoadReduction.RULE_EQUATION, "0.4268"),
                // §3 "Exclusions and limits", §4.7.5: assembly uses, live loads of 100 psf or less are not reduced
                // (assembly without fixed seats, 100 psf, Table 3 row "Table 4.3-1, other occupancies") — FOUND (§3 text)
                new FloorRow("Assembly, 100 psf", "FOUND", 100, ElementKind.INTERIOR_COLUMN.kll(), 1800, 2,
                        ReducibleUse.ASSEMBLY, "1.0000", "100.000", LiveLoadReduction.RULE_ASSEMBLY, null),
                // §3 "Exclusions and limits", §4.7.4: garages, no reduction except 20 % for two or more floors;
                // passenger-car garages 40 psf (Table 3, "Table 4.3-1, other occupancies", MEMORY) — FOUND (§3 text)
                new FloorRow("Garage, one floor", "FOUND", 40, ElementKind.INTERIOR_COLUMN.kll(), 900, 1,
                        ReducibleUse.GARAGE, "1.0000", "40.000", LiveLoadReduction.RULE_GARAGE_ONE_FLOOR, null),
                new FloorRow("Garage, 2 floors", "FOUND", 40, ElementKind.INTERIOR_COLUMN.kll(), 1800, 2,
                        ReducibleUse.GARAGE, "0.8000", "32.000", LiveLoadReduction.RULE_GARAGE_TWO_OR_MORE, "0.4268"))
                .map(Arguments::of);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("floorRows")
    void floorRow(FloorRow r) {
        Calc calc = new Calc();
        Reduction got = LiveLoadReduction.floor(r.l0Psf() * PSF, r.kll(), r.atFt2() * FT2, r.floors(), r.use(), calc);
        String where = r.row() + " (CHECK-VALUES §3, " + r.obtained() + ")";
        List<Executable> checks = new ArrayList<>();
        checks.add(printed(where + ": factor", r.factor(), got.factor()));
        checks.add(printed(where + ": L [psf]", r.reducedPsf(), got.reduced() / PSF));
        checks.add(() -> assertEquals(got.factor() * r.l0Psf() * PSF, got.reduced(), 1e-12 * got.reduced(),
                where + ": reduced = factor·L0"));
        if (r.rule() != null) {
            checks.add(() -> assertEquals(r.rule(), got.rule(), where + ": governing rule"));
        } else {
            checks.add(() -> assertTrue(got.rule().equals(LiveLoadReduction.RULE_EQUATION)
                    || got.rule().equals(LiveLoadReduction.RULE_LIMIT_ONE_FLOOR), where + ": rule " + got.rule()));
        }
        double eq = recorded(calc, "ASCE 7-16 Eq. 4.7-1") / (r.l0Psf() * PSF);
        if (r.eq471Factor() != null) {
            checks.add(printed(where + ": Eq. 4.7-1 factor before limits (recorded)", r.eq471Factor(), eq));
        } else {
            checks.add(() -> assertTrue(Double.isNaN(eq), where + ": Eq. 4.7-1 must not be applied"));
        }
        assertAll(where, checks);
    }

    /**
     * Table 3 "Interior beam": the reduced load on the beam, 43.1 psf × 10 ft = 431 plf, and the
     * LRFD/ASD row's L = 0.431 k/ft built on it — COMPUTED.
     */
    @Test
    void interiorBeamLineLoad() {
        Reduction r = LiveLoadReduction.floor(50 * PSF, 2, 300 * FT2, 1, ReducibleUse.ORDINARY, null);
        double w = r.reduced() * 10 * FT;
        assertAll("interior beam line load (CHECK-VALUES §3, COMPUTED)",
                printed("w [plf]", "431", w / PLF),
                printed("w [k/ft]", "0.431", w / (1000 * PLF)));
    }

    /** Table 3 "Reduction threshold; 1-floor and multi-floor limits" — FOUND (IBC text in §3). */
    @Test
    void thresholdAndLimits() {
        double l0 = 50 * PSF;
        // KLL·AT just under and at 400 ft²; 37.16 m² is 400 ft² rounded (400 ft² = 37.161216 m²)
        Reduction below = LiveLoadReduction.floor(l0, 2, 199.99 * FT2, 1, ReducibleUse.ORDINARY, null);
        Reduction below37 = LiveLoadReduction.floor(l0, 1, 37.16, 1, ReducibleUse.ORDINARY, null);
        Reduction above37 = LiveLoadReduction.floor(l0, 1, 37.17, 1, ReducibleUse.ORDINARY, null);
        Reduction at = LiveLoadReduction.floor(l0, 4, 100 * FT2, 1, ReducibleUse.ORDINARY, null);
        Reduction oneFloor = LiveLoadReduction.floor(l0, 4, 100_000 * FT2, 1, ReducibleUse.ORDINARY, null);
        Reduction twoFloors = LiveLoadReduction.floor(l0, 4, 100_000 * FT2, 2, ReducibleUse.ORDINARY, null);
        assertAll("§4.7.2 threshold and limits (CHECK-VALUES §3, FOUND)",
                () -> assertEquals(1.0, below.factor(), 0.0, "KLL·AT = 399.98 ft²: no reduction"),
                () -> assertEquals(LiveLoadReduction.RULE_BELOW_THRESHOLD, below.rule()),
                () -> assertEquals(LiveLoadReduction.RULE_BELOW_THRESHOLD, below37.rule(), "37.16 m² < 400 ft²"),
                () -> assertEquals(LiveLoadReduction.RULE_EQUATION, above37.rule(), "37.17 m² > 400 ft²"),
                () -> assertTrue(above37.factor() < 1 && above37.factor() > 0.9998, "just above: " + above37.factor()),
                printed("KLL·AT = 400 ft²: Eq. 4.7-1 gives 1", "1.0000", at.factor()),
                () -> assertEquals(0.50, oneFloor.factor(), 0.0, "0.50·L0, one floor"),
                () -> assertEquals(LiveLoadReduction.RULE_LIMIT_ONE_FLOOR, oneFloor.rule()),
                () -> assertEquals(0.40, twoFloors.factor(), 0.0, "0.40·L0, two or more floors"),
                () -> assertEquals(LiveLoadReduction.RULE_LIMIT_TWO_OR_MORE, twoFloors.rule()));
    }

    /**
     * Table 3 "SI form": L0 = 2.40 kN/m², AT = 83.61 m² (900 ft²), KLL = 4 → 0.25 + 4.57/√334.45 =
     * 0.4999 → 1.20 kN/m² — COMPUTED (with the standard's SI coefficient 4.57, see the class notes).
     */
    @Test
    void siForm() {
        Calc calc = new Calc();
        double at = 83.61;
        Reduction r = LiveLoadReduction.floor(2.40 * KPA, 4, at, 1, ReducibleUse.ORDINARY, calc);
        double eq = recorded(calc, "ASCE 7-16 Eq. 4.7-1") / (2.40 * KPA);
        double coefficientRounding = (15 * FT - 4.57) / Math.sqrt(4 * at);
        assertAll("SI form (CHECK-VALUES §3, COMPUTED)",
                printed("Eq. 4.7-1 factor, within the rounding of 4.57", "0.4999", eq, coefficientRounding),
                printed("L [kN/m²]", "1.20", r.reduced() / KPA),
                printed("factor", "0.500", r.factor()));
    }

    /**
     * Table 3 "One-way slab limit": slab span 10 ft → AT ≤ 10 × 15 = 150 ft²; KLL = 1 → 150 < 400 →
     * no reduction — MEMORY (from memory; found as IBC 1607.10.1.1 text) + COMPUTED.
     */
    @Test
    void oneWaySlab() {
        Calc calc = new Calc();
        double atMax = LiveLoadReduction.oneWaySlabMaxArea(10 * FT, calc);
        Reduction r = LiveLoadReduction.floor(50 * PSF, ElementKind.ONE_WAY_SLAB.kll(), atMax, 1,
                ReducibleUse.ORDINARY, null);
        assertAll("one-way slab (CHECK-VALUES §3, MEMORY + COMPUTED)",
                printed("AT,max [ft²]", "150.000", atMax / FT2),
                () -> assertEquals(LiveLoadReduction.RULE_BELOW_THRESHOLD, r.rule()),
                () -> assertEquals(50 * PSF, r.reduced(), 0.0, "no reduction"),
                () -> assertEquals("ASCE 7-16 §4.7.6", calc.lines().get(0).reference()));
    }

    // ---------------------------------------------------------------------------------------------
    // Roof

    /**
     * Table 3 "Roof LL reduction": flat roof (F ≤ 4), L0 = 20 psf, AT = 900 ft² → R1 = 0.6, R2 = 1.0 →
     * Lr = 12 psf (= minimum) — MEMORY + COMPUTED (from memory).
     */
    @Test
    void roofFlatLargeArea() {
        Calc calc = new Calc();
        Reduction r = LiveLoadReduction.roof(20 * PSF, 900 * FT2, 0, calc);
        double r1 = Double.NaN;
        double r2 = Double.NaN;
        for (CalcLine line : calc.lines()) {
            if (line.kind() == CalcLine.Kind.EQUATION && line.symbol().equals("R1")) {
                r1 = line.value();
            }
            if (line.kind() == CalcLine.Kind.EQUATION && line.symbol().equals("R2")) {
                r2 = line.value();
            }
        }
        double fr1 = r1;
        double fr2 = r2;
        assertAll("roof, flat, 900 ft² (CHECK-VALUES §3, MEMORY + COMPUTED)",
                printed("R1", "0.6000", fr1),
                printed("R2", "1.0000", fr2),
                printed("Lr [psf]", "12.000", r.reduced() / PSF),
                printed("factor", "0.6000", r.factor()),
                () -> assertTrue(r.rule().equals(LiveLoadReduction.RULE_ROOF_EQUATION)
                        || r.rule().equals(LiveLoadReduction.RULE_ROOF_MINIMUM), r.rule()));
    }

    /**
     * §3 "Exclusions and limits", roof: R1 and R2 as functions of AT and F — MEMORY (from memory), values
     * COMPUTED here from the §3 formulas. CHECK-VALUES trap 4: R2 = 1.2 − 0.05F (a third-party page prints
     * 0.01F); F = 6 gives 0.90, where 0.01F would give 1.14.
     */
    @ParameterizedTest(name = "AT = {0} ft², F = {1}: R1 = {2}, R2 = {3}, Lr = {4} psf")
    @CsvSource({
        "100, 0, 1.0000, 1.0000, 20.000",
        "200, 4, 1.0000, 1.0000, 20.000",
        "400, 0, 0.8000, 1.0000, 16.000",
        "500, 6, 0.7000, 0.9000, 12.600",
        "300, 8, 0.9000, 0.8000, 14.400",
        "250, 10, 0.9500, 0.7000, 13.300",
        "600, 12, 0.6000, 0.6000, 12.000",
        "150, 14, 1.0000, 0.6000, 12.000",
    })
    void roofFactors(double atFt2, double f, String r1, String r2, String lrPsf) {
        Reduction r = LiveLoadReduction.roof(20 * PSF, atFt2 * FT2, f, null);
        assertAll("roof AT = " + atFt2 + " ft², F = " + f + " (CHECK-VALUES §3 roof, MEMORY + COMPUTED)",
                printed("R1", r1, LiveLoadReduction.r1(atFt2 * FT2, null)),
                printed("R2", r2, LiveLoadReduction.r2(f, null)),
                printed("Lr [psf]", lrPsf, r.reduced() / PSF));
    }

    @Test
    void roofRecordsItsEquation() {
        Calc calc = new Calc();
        LiveLoadReduction.roof(20 * PSF, 400 * FT2, 6, calc);
        CalcLine last = null;
        for (CalcLine line : calc.lines()) {
            if (line.kind() == CalcLine.Kind.EQUATION) {
                last = line;
            }
        }
        assertNotNull(last);
        // 20 × 0.8 × 0.9 = 14.4 psf — COMPUTED from the §3 roof formulas (MEMORY)
        CalcLine eq = last;
        assertAll(() -> assertEquals("ASCE 7-16 Eq. 4.8-1", eq.reference()),
                printed("Lr [psf]", "14.400", eq.value() / PSF));
    }
}
