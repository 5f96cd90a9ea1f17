package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.function.Executable;

/**
 * Comparison of an engine result with a published or independently computed check value, within a
 * relative tolerance chosen from the rounding of the source, for the validation tests of the design
 * package. Each comparison is an {@link Executable} so that a test can hand a whole row to
 * {@code assertAll} and see every mismatch in one run.
 *
 * <p>Every instance keeps the largest relative difference it has seen, so a test class can print
 * one line per group for the verification report ({@link #report()}, called from {@code @AfterAll}).
 *
 * <p>The tolerance constants name the rounding they stand for; a test says beside each use which one
 * applies and why.
 */
public final class Deviations {

    /**
     * AISC Manual tables and the Design Examples print three significant figures: half a unit in the
     * third figure is at most 0.5 % of the value.
     */
    public static final double THREE_FIGURES = 0.005;

    /**
     * A value computed to four significant figures (CHECK-VALUES "COMPUTED" rows with four or more
     * printed figures): half a unit in the fourth figure is at most 0.05 %.
     */
    public static final double FOUR_FIGURES = 0.0005;

    /**
     * A CHECK-VALUES "COMPUTED from DB" value whose inputs include a radius of gyration (ry, rts) or
     * ho as the Shapes Database prints it, to three significant figures. The engine derives those
     * from A, Iy, Cw, Sx and d − tf instead, so the two can differ by the input rounding: up to
     * 0.005/1.1 ≈ 0.45 % for the lightest shapes used here, i.e. within 0.5 %.
     */
    public static final double DB_RADIUS = 0.005;

    /**
     * As {@link #DB_RADIUS}, for a quantity in which that rounding is amplified: the elastic LTB
     * moment varies as rts² (twice the relative rounding of rts), and the Manual's BF divides by
     * Lr − Lp (a difference of two rounded lengths). Up to 2 × 0.45 % ≈ 1 %.
     */
    public static final double DB_RADIUS_AMPLIFIED = 0.01;

    /** Floating-point agreement of two evaluations of the same closed-form expression. */
    public static final double ROUND_OFF = 1e-9;

    private final String group;
    private double worst;
    private String worstLabel = "(none)";

    /** @param group what the report line calls this set of comparisons, e.g. "Table 3-2 rows" */
    public Deviations(String group) {
        this.group = group;
    }

    /**
     * {@code actual} must be within {@code relTol} (relative) of {@code expected}. The relative
     * difference is recorded whether it passes or not.
     */
    public Executable near(String label, double expected, double actual, double relTol) {
        return () -> {
            double rel = expected == 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
            record(label, rel);
            assertEquals(expected, actual, relTol * Math.abs(expected),
                    () -> String.format("%s: expected %.6g ± %.3g %%, got %.6g (%.3f %% off)", label, expected,
                            100 * relTol, actual, 100 * rel));
        };
    }

    /**
     * {@code actual} must round to {@code printed} as the source wrote it: within half a unit in the
     * last digit of {@code printed} (its shortest decimal form, e.g. 58.3 → ±0.05, 106.0 → ±0.05; a trailing
     * zero after the first decimal is lost, so such values use the {@code String} overload), widened by
     * one part in a million so that an exact half-way value (521.25 printed as 521.2) still passes.
     * For values whose inputs the engine holds exactly as the source used them (Zx, Sx, d, tw, E,
     * Fy), so that the source's rounding is the only difference.
     */
    public Executable printed(String label, double printed, double actual) {
        return printed(label, Double.toString(printed), actual);
    }

    /**
     * As {@link #printed(String, double, double)}, with the value written out as the source prints it,
     * for values whose trailing zeros matter ("1.00" → ±0.005).
     */
    public Executable printed(String label, String printed, double actual) {
        BigDecimal p = new BigDecimal(printed);
        double halfUnit = p.ulp().doubleValue() / 2 * (1 + 1e-6);
        return near(label, p.doubleValue(), actual, halfUnit / Math.abs(p.doubleValue()));
    }

    /** A boolean property the source states (a classification, a selection). */
    public static Executable holds(String label, boolean condition) {
        return () -> assertTrue(condition, label);
    }

    private synchronized void record(String label, double rel) {
        if (Double.isNaN(rel) || rel > worst) {
            worst = Double.isNaN(rel) ? Double.POSITIVE_INFINITY : rel;
            worstLabel = label;
        }
    }

    /** The largest relative difference seen. */
    public synchronized double worst() {
        return worst;
    }

    /** Prints the largest relative difference of the group (for the verification report). */
    public synchronized void report() {
        System.out.printf("%s: largest relative difference %.3f %% (%s)%n", group, 100 * worst, worstLabel);
    }
}
