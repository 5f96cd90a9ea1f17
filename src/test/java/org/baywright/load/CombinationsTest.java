package org.baywright.load;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The one rule for a governing combination: the largest combined value, the first of equals, never a
 * NaN. Factors are those of ASCE 7-16 §2.3.1 and §2.4.1 (from memory).
 */
class CombinationsTest {
    private static final List<LoadCombination> LRFD = Combinations.gravity(DesignMethod.LRFD, EnumSet.of(LoadCase.D, LoadCase.L));

    private static double[] byCase(double d, double l, double lr, double s) {
        return new double[] {d, l, lr, s};
    }

    @Test
    void combineSumsFactorTimesValue() {
        LoadCombination c = LoadCombination.of("test", LoadCase.D, 1.2, LoadCase.L, 1.6, LoadCase.S, 0.5);
        assertEquals(1.2 * 10 + 1.6 * 20 + 0.5 * 4, Combinations.combine(c, byCase(10, 20, 7, 4)), 1e-12);
    }

    @Test
    void deadAloneIsGovernedByOnePointFourD() {
        Combinations.Governing g = Combinations.governing(byCase(10, 0, 0, 0), LRFD);
        assertAll(
                () -> assertEquals("1.4D", g.combination().name()),
                () -> assertEquals(0, g.index()),
                () -> assertEquals(14, g.value(), 1e-12));
    }

    @Test
    void liveLoadMakesTheSecondCombinationGovern() {
        Combinations.Governing g = Combinations.governing(byCase(10, 5, 0, 0), LRFD);
        // 1.2·10 + 1.6·5 = 20 > 1.4·10 = 14
        assertAll(
                () -> assertEquals("1.2D + 1.6L", g.combination().name()),
                () -> assertEquals(20, g.value(), 1e-12));
    }

    @Test
    void roofLoadsPickTheirOwnCombination() {
        List<LoadCombination> asd = Combinations.gravity(DesignMethod.ASD, EnumSet.of(LoadCase.D, LoadCase.L, LoadCase.S));
        // D + S = 30 governs over D + L = 12, D + 0.75L + 0.75S = 26.5
        Combinations.Governing g = Combinations.governing(byCase(10, 2, 0, 20), asd);
        assertEquals("D + S", g.combination().name());
    }

    @Test
    void theFirstOfEqualValuesGovernsAndNaNNever() {
        assertAll(
                () -> assertEquals(1, Combinations.governing(new double[] {1, 3, 3, 2})),
                () -> assertEquals(1, Combinations.governing(new double[] {Double.NaN, 2, Double.NaN})),
                () -> assertEquals(2, Combinations.governing(new double[] {1, Double.NaN, Double.POSITIVE_INFINITY})),
                () -> assertEquals(0, Combinations.governing(new double[] {Double.NaN, Double.NaN})),
                () -> assertEquals(0, Combinations.governing(new double[] {-1, -2})));
    }
}
