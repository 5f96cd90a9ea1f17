package org.baywright.design.aisc360;

import static org.junit.jupiter.api.Assertions.assertAll;

import java.util.List;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.design.Deviations;
import org.baywright.units.Units;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

/**
 * AISC 360-16 Eq. F1-1 ({@link BendingCoefficient#cb}) on real moment diagrams of a simple span
 * ({@link SimpleSpan}), against CHECK-VALUES §1 Table 1 rows "Cb, Eq. F1-1" and "Cb, other cases"
 * (COMPUTED; the AISC Manual Table 3-1 values beside them are MEMORY, "they agree").
 *
 * <p>For each unbraced segment the moments are taken at its quarter, centre and three-quarter points
 * and its maximum from a fine sampling of the diagram that includes the segment ends and the span's
 * midspan and quarter points, where every maximum of these load cases lies.
 *
 * <p>Tolerances: the guide's four-figure values (1.136) and the Manual's two-decimal values (1.14)
 * are each compared within half a unit of their last digit ({@link Deviations#printed}); Eq. F1-1
 * has no other input than the diagram, which the statics reproduce exactly.
 */
class BendingCoefficientValidationTest {
    private static final Deviations CB = new Deviations("Cb, Eq. F1-1 (Manual Table 3-1 cases)");

    /** Any span will do: Cb depends on the shape of the diagram only. 35 ft as in AISC DE Ex. F.1. */
    private static final double L = Units.FT_.toSi(35);

    @AfterAll
    static void report() {
        CB.report();
    }

    private static SimpleSpan udl() {
        return SimpleSpan.of(L, List.of(DistributedLoad.full(L, Units.KLF.toSi(1.0))));
    }

    /** Cb of the segment between fractions {@code from} and {@code to} of the span. */
    private static double cb(SimpleSpan span, double from, double to) {
        double a = from * L;
        double b = to * L;
        int n = 4800; // divisible by 2, 3, 4: hits quarter, third and midspan points exactly
        double max = 0;
        for (int i = 0; i <= n; i++) {
            double x = a + (b - a) * i / n;
            max = Math.max(max, Math.abs(span.moment(x)));
        }
        double q = (b - a) / 4;
        return BendingCoefficient.cb(max, span.moment(a + q), span.moment(a + 2 * q), span.moment(a + 3 * q), null);
    }

    @Test
    void uniformLoadOnASimpleSpan() {
        SimpleSpan s = udl();
        assertAll("Cb, simple span, uniform load",
                // CHECK-VALUES §1 "Cb, Eq. F1-1 (simple span, UDL)": unbraced full span 1.136, COMPUTED
                CB.printed("UDL, braced at the supports only", 1.136, cb(s, 0, 1)),
                // AISC Manual Table 3-1: 1.14, MEMORY (from memory), as quoted in CHECK-VALUES §1
                CB.printed("UDL, braced at the supports only (Table 3-1)", 1.14, cb(s, 0, 1)),
                // CHECK-VALUES §1: braced at midspan 1.299, COMPUTED; Manual Table 3-1: 1.30, MEMORY (from memory)
                CB.printed("UDL, braced at midspan, left segment", 1.299, cb(s, 0, 0.5)),
                CB.printed("UDL, braced at midspan, right segment", 1.299, cb(s, 0.5, 1)),
                CB.printed("UDL, braced at midspan (Table 3-1)", "1.30", cb(s, 0, 0.5)),
                // CHECK-VALUES §1: third points, end segment 1.460, COMPUTED; Table 3-1: 1.46, MEMORY (from memory)
                CB.printed("UDL, third points, end segment", "1.460", cb(s, 0, 1.0 / 3)),
                CB.printed("UDL, third points, other end segment", "1.460", cb(s, 2.0 / 3, 1)),
                CB.printed("UDL, third points, end segment (Table 3-1)", 1.46, cb(s, 0, 1.0 / 3)),
                // CHECK-VALUES §1: third points, middle segment 1.014, COMPUTED; Table 3-1: 1.01, MEMORY (from memory)
                CB.printed("UDL, third points, middle segment", 1.014, cb(s, 1.0 / 3, 2.0 / 3)),
                CB.printed("UDL, third points, middle segment (Table 3-1)", 1.01, cb(s, 1.0 / 3, 2.0 / 3)),
                // CHECK-VALUES §1: quarter points, end segment 1.523, COMPUTED; Table 3-1: 1.52, MEMORY (from memory)
                CB.printed("UDL, quarter points, end segment", 1.523, cb(s, 0, 0.25)),
                CB.printed("UDL, quarter points, end segment (Table 3-1)", 1.52, cb(s, 0.75, 1)),
                // CHECK-VALUES §1: quarter points, inner segment 1.061, COMPUTED; Table 3-1: 1.06, MEMORY (from memory)
                CB.printed("UDL, quarter points, inner segment", 1.061, cb(s, 0.25, 0.5)),
                CB.printed("UDL, quarter points, other inner segment", 1.061, cb(s, 0.5, 0.75)),
                CB.printed("UDL, quarter points, inner segment (Table 3-1)", 1.06, cb(s, 0.25, 0.5)));
    }

    @Test
    void pointLoadsAndLinearDiagrams() {
        SimpleSpan central = SimpleSpan.of(L, List.of(new PointLoad(L / 2, Units.KIPS.toSi(10))));
        SimpleSpan thirdPoints = SimpleSpan.of(L,
                List.of(new PointLoad(L / 3, Units.KIPS.toSi(10)), new PointLoad(2 * L / 3, Units.KIPS.toSi(10))));
        assertAll("Cb, point loads",
                // CHECK-VALUES §1 "Cb, other cases": midspan point load braced at ends only 1.316, COMPUTED
                CB.printed("midspan point load, braced at the supports only", 1.316, cb(central, 0, 1)),
                // Manual Table 3-1: 1.32, MEMORY (from memory), as quoted in CHECK-VALUES §1
                CB.printed("midspan point load, braced at the supports only (Table 3-1)", 1.32, cb(central, 0, 1)),
                // CHECK-VALUES §1: same load braced at the load point 1.667, COMPUTED; Table 3-1: 1.67, MEMORY
                CB.printed("midspan point load, braced at the load", 1.667, cb(central, 0, 0.5)),
                CB.printed("midspan point load, braced at the load (Table 3-1)", 1.67, cb(central, 0.5, 1)),
                // CHECK-VALUES §1: uniform moment 1.00, COMPUTED (the segment between two equal third-point loads)
                CB.printed("uniform moment (between equal third-point loads)", "1.00", cb(thirdPoints, 1.0 / 3, 2.0 / 3)),
                // CHECK-VALUES §1: moment varying linearly to 0: 1.667, COMPUTED (support to the first load)
                CB.printed("moment linear to zero (support to a third-point load)", 1.667, cb(thirdPoints, 0, 1.0 / 3)));
    }

    /**
     * Equal end moments in reverse curvature cannot arise in a simple span loaded downward, so the
     * linear diagram M(x) = M·(1 − 2x/Lb) is entered directly: |MA| = |MC| = M/2, MB = 0.
     */
    @Test
    void reverseCurvatureEqualEndMoments() {
        double m = Units.KIP_FT.toSi(100);
        assertAll("Cb, reverse curvature",
                // CHECK-VALUES §1 "Cb, other cases": equal end moments, reverse curvature 2.273, COMPUTED
                CB.printed("equal end moments, reverse curvature", 2.273,
                        BendingCoefficient.cb(m, m / 2, 0, -m / 2, null)),
                // CHECK-VALUES §1 Method: F1-1 uses absolute values: the sign of the moments must not matter
                CB.printed("same, moments entered with the opposite signs", 2.273,
                        BendingCoefficient.cb(-m, -m / 2, 0, m / 2, null)));
    }
}
