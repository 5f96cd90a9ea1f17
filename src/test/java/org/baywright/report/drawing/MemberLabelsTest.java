package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The plan notation of a composite member, common practice: size, studs on the member in parentheses,
 * camber in inches with fractions ({@code W16X26 (16) c=3/4"}, the example of issue 13), mm in SI.
 */
class MemberLabelsTest {
    private static double in(double inches) {
        return Units.IN.toSi(inches);
    }

    @Test
    void camberInInchesWithFractions() {
        assertAll("camber, US",
                () -> assertEquals("3/4\"", MemberLabels.camber(in(0.75), UnitSystem.US)),
                () -> assertEquals("1 1/4\"", MemberLabels.camber(in(1.25), UnitSystem.US)),
                () -> assertEquals("1 1/2\"", MemberLabels.camber(in(1.5), UnitSystem.US)),
                () -> assertEquals("2\"", MemberLabels.camber(in(2.0), UnitSystem.US)),
                () -> assertEquals("2 3/8\"", MemberLabels.camber(in(2.375), UnitSystem.US)),
                // 1.99 in is 2 in to the nearest 1/8 in, not 1 15/16
                () -> assertEquals("2\"", MemberLabels.camber(in(1.99), UnitSystem.US)),
                () -> assertEquals("", MemberLabels.camber(0, UnitSystem.US), "none"),
                () -> assertEquals("", MemberLabels.camber(in(0.05), UnitSystem.US), "below 1/16 in rounds to none"));
    }

    @Test
    void camberInMillimetres() {
        assertAll("camber, SI",
                // 3/4 in = 19.05 mm, 2 in = 50.8 mm (exact conversions)
                () -> assertEquals("19 mm", MemberLabels.camber(in(0.75), UnitSystem.SI)),
                () -> assertEquals("51 mm", MemberLabels.camber(in(2.0), UnitSystem.SI)),
                () -> assertEquals("", MemberLabels.camber(0, UnitSystem.SI)));
    }

    @Test
    void sizeStudsAndCamber() {
        assertAll("labels",
                () -> assertEquals("W16X26 (16) c=3/4\"", MemberLabels.size("W16X26", 16, in(0.75), UnitSystem.US)),
                () -> assertEquals("W21X50 (46) c=2\"", MemberLabels.size("W21X50", 46, in(2), UnitSystem.US)),
                () -> assertEquals("W24X55 (18)", MemberLabels.size("W24X55", 18, 0, UnitSystem.US), "no camber"),
                () -> assertEquals("[W21X50] (46) c=51 mm", MemberLabels.size("[W21X50]", 46, in(2), UnitSystem.SI)),
                () -> assertEquals("W18X35", MemberLabels.size("W18X35", 0, 0, UnitSystem.US), "bare steel"));
    }
}
