package org.baywright.ui;

import org.baywright.report.drawing.Rgb;

/**
 * The colours of View › Floor vibration: a bay's ratio a_p/g ÷ a_o/g on a light-to-dark purple sequential
 * scale, kept apart from the members' demand/capacity colours (cividis, dark blue through grey to yellow) so a
 * tinted bay is never read as a member's ratio. The stops are ColorBrewer's nine-class "Purples" (Brewer and
 * Harrower, colorbrewer2.org, marked there colour-blind safe; from memory), interpolated linearly in sRGB.
 * Ratio 0 is the lightest, {@link #FULL} and above the darkest; bays that exceed the limit are also hatched
 * and outlined (shape, not only colour), bays not checked are {@link #NOT_CHECKED} grey.
 */
public final class VibrationScale {
    /** The ratio drawn in the darkest colour (bays beyond it stay darkest). */
    public static final double FULL = 1.5;
    /** Bays that were not checked (no slab, a roof): a neutral grey. */
    public static final Rgb NOT_CHECKED = new Rgb(200, 200, 200);
    /** The outline and hatch of bays that exceed the limit. */
    public static final Rgb EXCEEDS_INK = new Rgb(40, 0, 80);

    private static final int[][] STOPS = {
        {0xfc, 0xfb, 0xfd}, {0xef, 0xed, 0xf5}, {0xda, 0xda, 0xeb}, {0xbc, 0xbd, 0xdc}, {0x9e, 0x9a, 0xc8},
        {0x80, 0x7d, 0xba}, {0x6a, 0x51, 0xa3}, {0x54, 0x27, 0x8f}, {0x3f, 0x00, 0x7d},
    };

    private VibrationScale() {
    }

    /** The colour of a ratio (0 lightest, {@link #FULL} and above darkest); NaN (not checked) is grey. */
    public static Rgb at(double ratio) {
        if (Double.isNaN(ratio)) {
            return NOT_CHECKED;
        }
        double t = Math.max(0, Math.min(1, ratio / FULL));
        double s = t * (STOPS.length - 1);
        int i = Math.min((int) Math.floor(s), STOPS.length - 2);
        double f = s - i;
        return new Rgb(mix(STOPS[i][0], STOPS[i + 1][0], f), mix(STOPS[i][1], STOPS[i + 1][1], f),
                mix(STOPS[i][2], STOPS[i + 1][2], f));
    }

    /** Ink that reads on {@code fill}: near-black on light fills, white on dark ones. */
    public static Rgb textOn(Rgb fill) {
        return fill.luminance() > 0.25 ? Rgb.INK : Rgb.WHITE;
    }

    private static int mix(int a, int b, double f) {
        return (int) Math.round(a + (b - a) * f);
    }
}
