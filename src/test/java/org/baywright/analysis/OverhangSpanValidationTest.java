package org.baywright.analysis;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * {@link OverhangSpan} against the closed forms of the AISC Steel Construction Manual, Table 3-23
 * "Shears, moments and deflections", the three "beam overhanging one support" diagrams: uniform load
 * on the whole member, uniform load on the overhang only, concentrated load at the end of the
 * overhang (the formulas from memory; they are standard beam theory). Notation of the table: l the
 * backspan, a the overhang, x1 measured from the support along the overhang.
 *
 * <p>Tolerance: the formulas are evaluated here in double precision, so they are compared within
 * 1e-9 relative (rounding only), except the printed coefficients 0.03208 and 0.06415 (four
 * significant figures: ±5e-5 relative to them, so 2e-4 relative to the value).
 */
class OverhangSpanValidationTest {
    private static final double L = 9.0;      // backspan l, m
    private static final double A = 2.5;      // overhang a, m
    private static final double W = 12_000;   // N/m
    private static final double P = 30_000;   // N
    private static final double EI = 4.0e7;   // N·m²

    private static void near(List<org.junit.jupiter.api.function.Executable> out, String what, double expected,
            double actual, double rel) {
        out.add(() -> assertEquals(expected, actual, Math.abs(expected) * rel + 1e-9, what));
    }

    @Test
    void uniformLoadOnTheWholeMember() {
        // Table 3-23, beam overhanging one support, uniformly distributed load (from memory)
        OverhangSpan s = OverhangSpan.of(L + A, 0, L, List.of(DistributedLoad.full(L + A, W)));
        var c = new java.util.ArrayList<org.junit.jupiter.api.function.Executable>();
        near(c, "R1 = w/(2l)·(l² − a²)", W / (2 * L) * (L * L - A * A), s.reactionA(), 1e-9);
        near(c, "R2 = w/(2l)·(l + a)²", W / (2 * L) * (L + A) * (L + A), s.reactionB(), 1e-9);
        near(c, "V2 = w·a (overhang side of R2)", W * A, s.shear(L), 1e-9);
        near(c, "V3 = w/(2l)·(l² + a²) (backspan side of R2)", -W / (2 * L) * (L * L + A * A), s.shearLeft(L), 1e-9);
        double x1 = L / 2 * (1 - A * A / (L * L));
        near(c, "M1 = w/(8l²)·(l + a)²·(l − a)²", W / (8 * L * L) * Math.pow(L + A, 2) * Math.pow(L - A, 2),
                s.extremeMoment(0, L, false).value(), 1e-9);
        near(c, "M1 at x = l/2·(1 − a²/l²)", x1, s.extremeMoment(0, L, false).position(), 1e-9);
        near(c, "M2 = w·a²/2 (hogging, at R2)", -W * A * A / 2, s.moment(L), 1e-9);
        near(c, "M2 is the largest hogging moment", -W * A * A / 2, s.extremeMoment(0, L + A, true).value(), 1e-9);
        near(c, "Δ at the tip = w·a/(24EI)·(4a²l − l³ + 3a³)", W * A / (24 * EI) * (4 * A * A * L - L * L * L + 3 * A * A * A),
                s.deflection(L + A, EI), 1e-9);
        near(c, "sum of reactions = load", W * (L + A), s.reactionA() + s.reactionB(), 1e-12);
        assertAll(c);
    }

    @Test
    void uniformLoadOnTheOverhangOnly() {
        // Table 3-23, beam overhanging one support, uniformly distributed load on overhang (from memory)
        OverhangSpan s = OverhangSpan.of(L + A, 0, L, List.of(DistributedLoad.uniform(L, L + A, W)));
        var c = new java.util.ArrayList<org.junit.jupiter.api.function.Executable>();
        near(c, "R1 = w·a²/(2l), acting downward (uplift at the far end)", -W * A * A / (2 * L), s.reactionA(), 1e-9);
        near(c, "R2 = w·a/(2l)·(2l + a)", W * A / (2 * L) * (2 * L + A), s.reactionB(), 1e-9);
        near(c, "M max at R2 = w·a²/2", -W * A * A / 2, s.moment(L), 1e-9);
        near(c, "Δ max between supports at x = l/√3: 0.03208·w·a²·l²/EI, upward",
                -0.03208 * W * A * A * L * L / EI, s.deflection(L / Math.sqrt(3), EI), 2e-4);
        near(c, "that is the extreme between the supports", s.deflection(L / Math.sqrt(3), EI),
                s.extremeEiDeflection(0, L).value() / EI, 1e-9);
        near(c, "Δ at the tip = w·a³/(24EI)·(4l + 3a)", W * A * A * A / (24 * EI) * (4 * L + 3 * A), s.deflection(L + A, EI), 1e-9);
        assertAll(c);
    }

    @Test
    void concentratedLoadAtTheEndOfTheOverhang() {
        // Table 3-23, beam overhanging one support, concentrated load at end of overhang (from memory)
        OverhangSpan s = OverhangSpan.of(L + A, 0, L, List.of(new PointLoad(L + A, P)));
        var c = new java.util.ArrayList<org.junit.jupiter.api.function.Executable>();
        near(c, "R1 = P·a/l, downward", -P * A / L, s.reactionA(), 1e-9);
        near(c, "R2 = P/l·(l + a)", P / L * (L + A), s.reactionB(), 1e-9);
        near(c, "V2 = P", P, s.shear(L), 1e-9);
        near(c, "M max at R2 = P·a", -P * A, s.moment(L), 1e-9);
        near(c, "Δ max between supports at x = l/√3: 0.06415·P·a·l²/EI, upward", -0.06415 * P * A * L * L / EI,
                s.deflection(L / Math.sqrt(3), EI), 2e-4);
        near(c, "Δ at the tip = P·a²/(3EI)·(l + a)", P * A * A / (3 * EI) * (L + A), s.deflection(L + A, EI), 1e-9);
        near(c, "largest |V| is P on the overhang", P, s.maxShear().value(), 1e-9);
        assertAll(c);
    }

    @Test
    void aSimpleSpanIsTheSpecialCaseWithNoOverhang() {
        // the general solution with a = 0 and b = L reproduces SimpleSpan for a mixed load
        List<SpanLoad> loads = List.of(new DistributedLoad(1.0, 6.0, 3_000, 9_000), new PointLoad(4.2, 20_000),
                DistributedLoad.full(8.0, 1_500));
        OverhangSpan o = OverhangSpan.of(8.0, 0, 8.0, loads);
        SimpleSpan s = SimpleSpan.of(8.0, loads);
        var c = new java.util.ArrayList<org.junit.jupiter.api.function.Executable>();
        near(c, "R1", s.leftReaction(), o.reactionA(), 1e-10);
        near(c, "R2", s.rightReaction(), o.reactionB(), 1e-10);
        for (double x : new double[] {0.5, 2.0, 4.2, 5.5, 7.9}) {
            near(c, "M at " + x, s.moment(x), o.moment(x), 1e-10);
            near(c, "Δ at " + x, s.deflection(x, EI), o.deflection(x, EI), 1e-9);
        }
        near(c, "max Δ", s.maxDeflection(EI).value(), o.extremeEiDeflection(0, 8).value() / EI, 1e-9);
        assertAll(c);
    }

    @Test
    void anOverhangAtTheStartMirrorsOneAtTheEnd() {
        // the same member turned end for end: overhang at the start, supports at a and L
        OverhangSpan end = OverhangSpan.of(L + A, 0, L, List.of(new PointLoad(L + A, P), new DistributedLoad(0, L + A, W, 0.5 * W)));
        OverhangSpan start = OverhangSpan.of(L + A, A, L + A, List.of(new PointLoad(0, P), new DistributedLoad(0, L + A, 0.5 * W, W)));
        assertAll(
                () -> assertEquals(end.reactionA(), start.reactionB(), 1e-6),
                () -> assertEquals(end.reactionB(), start.reactionA(), 1e-6),
                () -> assertEquals(end.moment(L), start.moment(A), 1e-6),
                () -> assertEquals(end.deflection(L + A, EI), start.deflection(0, EI), 1e-12),
                () -> assertEquals(end.totalLoad(), start.reactionA() + start.reactionB(), 1e-6, "equilibrium"));
    }

    @Test
    void refusesSupportsOutsideTheMember() {
        assertThrows(IllegalArgumentException.class, () -> OverhangSpan.of(5, 3, 2, List.of()));
        assertThrows(IllegalArgumentException.class, () -> OverhangSpan.of(5, 0, 6, List.of()));
    }
}
