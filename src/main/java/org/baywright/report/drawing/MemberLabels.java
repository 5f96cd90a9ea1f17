package org.baywright.report.drawing;

import java.util.Locale;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * How a composite member's size is written on a framing plan, in the trade's usual notation: the size,
 * the number of headed studs on the member in parentheses, then the camber, e.g. {@code W16X26 (16) c=3/4"}
 * (common practice). Camber is written in inches with fractions to 1/8 in (whole and fraction apart:
 * {@code 1 1/4"}), in whole millimetres in SI ({@code c=19 mm}); a member without studs or camber has
 * no such part.
 */
public final class MemberLabels {
    /** The fraction of an inch camber is written to. */
    static final int EIGHTHS = 8;

    private MemberLabels() {
    }

    /**
     * The size as written along a member: {@code size}, then {@code (studs)} when there are any, then
     * {@code c=camber} when there is one.
     */
    public static String size(String size, int studs, double camber, UnitSystem us) {
        StringBuilder b = new StringBuilder(size);
        if (studs > 0) {
            b.append(" (").append(studs).append(')');
        }
        String c = camber(camber, us);
        if (!c.isEmpty()) {
            b.append(" c=").append(c);
        }
        return b.toString();
    }

    /** The composite part of a member's label, {@code (16) c=3/4"}, or empty for a bare-steel member. */
    public static String studsAndCamber(MemberResult m, UnitSystem us) {
        return size("", m.studs(), m.camber(), us).trim();
    }

    /**
     * A camber as the drawings write it: {@code 3/4"}, {@code 1 1/4"}, {@code 2"} (to the nearest 1/8 in)
     * or {@code 19 mm}; empty when it rounds to nothing.
     */
    public static String camber(double metres, UnitSystem us) {
        if (!(metres > 0)) {
            return "";
        }
        if (us == UnitSystem.SI) {
            long mm = Math.round(metres * 1000);
            return mm == 0 ? "" : mm + " mm";
        }
        long eighths = Math.round(metres / 0.0254 * EIGHTHS);
        if (eighths == 0) {
            return "";
        }
        long whole = eighths / EIGHTHS;
        long num = eighths % EIGHTHS;
        long den = EIGHTHS;
        while (num > 0 && num % 2 == 0) {
            num /= 2;
            den /= 2;
        }
        if (num == 0) {
            return whole + "\"";
        }
        String frac = String.format(Locale.ROOT, "%d/%d", num, den);
        return whole == 0 ? frac + "\"" : whole + " " + frac + "\"";
    }
}
