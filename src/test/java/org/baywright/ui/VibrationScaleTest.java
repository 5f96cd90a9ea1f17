package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.report.drawing.Cividis;
import org.baywright.report.drawing.Rgb;
import org.junit.jupiter.api.Test;

/**
 * The bay colours of View › Floor vibration: ColorBrewer "Purples" (colorbrewer2.org, from memory) end colours,
 * a scale that darkens steadily with the ratio, and colours kept apart from the members' cividis colours.
 */
class VibrationScaleTest {

    @Test
    void endsAreTheSequentialSchemesLightestAndDarkest() {
        assertAll(() -> assertEquals("#fcfbfd", VibrationScale.at(0).hex(), "ColorBrewer Purples, lightest (from memory)"),
                () -> assertEquals("#3f007d", VibrationScale.at(VibrationScale.FULL).hex(), "darkest (from memory)"),
                () -> assertEquals("#3f007d", VibrationScale.at(3).hex(), "beyond the scale stays darkest"),
                () -> assertEquals(VibrationScale.NOT_CHECKED, VibrationScale.at(Double.NaN), "not checked: grey"));
    }

    /** Luminance falls strictly as the ratio rises: a darker bay is always a livelier one. */
    @Test
    void darkensMonotonically() {
        double last = 2;
        for (int i = 0; i <= 150; i++) {
            double l = VibrationScale.at(i / 100.0).luminance();
            assertTrue(l <= last, "at ratio " + i / 100.0 + ": " + l + " after " + last);
            last = l;
        }
        assertTrue(VibrationScale.at(0).luminance() - VibrationScale.at(1.5).luminance() > 0.8, "a wide range");
    }

    /**
     * No bay colour can be taken for a member's demand/capacity colour: every pair of samples of the two scales
     * is at least 40 apart in sRGB (Euclidean, 0–255 channels), and the grey of "not checked" too.
     */
    @Test
    void distinctFromTheMembersColours() {
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= 60; i++) {
            Rgb bay = VibrationScale.at(i / 40.0);
            for (int j = 0; j <= 60; j++) {
                min = Math.min(min, distance(bay, Cividis.at(j / 60.0)));
            }
        }
        double minGrey = Double.POSITIVE_INFINITY;
        for (int j = 0; j <= 60; j++) {
            minGrey = Math.min(minGrey, distance(VibrationScale.NOT_CHECKED, Cividis.at(j / 60.0)));
        }
        double m = min;
        double g = minGrey;
        assertAll(() -> assertTrue(m >= 40, "closest bay/member colour pair " + m),
                () -> assertTrue(g >= 40, "grey to member colours " + g));
    }

    @Test
    void textReadsOnEveryFill() {
        assertAll(() -> assertEquals(Rgb.INK, VibrationScale.textOn(VibrationScale.at(0))),
                () -> assertEquals(Rgb.WHITE, VibrationScale.textOn(VibrationScale.at(VibrationScale.FULL))));
    }

    private static double distance(Rgb a, Rgb b) {
        return Math.sqrt(Math.pow(a.r() - b.r(), 2) + Math.pow(a.g() - b.g(), 2) + Math.pow(a.b() - b.b(), 2));
    }
}
