package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.baywright.plan.LoadValues;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * Reads the tool options the user typed: quantities with or without a unit (a bare number is in the
 * plan's units: feet, psf, klf, kip in a US plan; metres, kPa, kN/m, kN in an SI plan), blank meaning
 * zero for loads. Errors are {@link org.baywright.units.UnitParseException}s naming the field.
 */
public final class ToolValues {
    private static final Pattern BARE = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private ToolValues() {
    }

    /** The text with the default unit appended when it is a bare number. */
    static String withUnit(String text, Unit unit) {
        String t = text == null ? "" : text.trim();
        return BARE.matcher(t).matches() ? t + unit.symbol() : t;
    }

    /** Bay spacings, e.g. {@code 3@30ft}, {@code 25'-6" 30' 30'}, {@code 3@30} (bare numbers in the plan's units). */
    public static List<Double> spacings(String field, String text, UnitSystem us) {
        if (text == null || text.isBlank()) {
            return Quantities.lengthList(field, text);
        }
        List<String> items = new ArrayList<>();
        for (String item : text.trim().split("[,\\s]+")) {
            int at = item.indexOf('@');
            items.add(at >= 0 ? item.substring(0, at + 1) + withUnit(item.substring(at + 1), us.length())
                    : withUnit(item, us.length()));
        }
        return Quantities.lengthList(field, String.join(" ", items));
    }

    /** A length; blank is an error. */
    public static double length(String field, String text, UnitSystem us) {
        return Quantities.parsePositive(field, withUnit(text, us.length()), Dimension.LENGTH);
    }

    /** A load that may be blank (zero) but not negative. */
    public static double load(String field, String text, Unit unit) {
        if (text == null || text.isBlank()) {
            return 0;
        }
        return Quantities.parseNonNegative(field, withUnit(text, unit), unit.dimension());
    }

    /** An infill setting: a whole number is a count of beams, anything else a largest spacing. */
    public record InfillSetting(int count, double spacing) {
    }

    public static InfillSetting infill(String text, UnitSystem us) {
        String t = text == null ? "" : text.trim();
        if (t.matches("\\d+")) {
            int n = Integer.parseInt(t);
            if (n < 1 || n > 200) {
                throw new org.baywright.units.UnitParseException("infill", t, "is not a beam count from 1 to 200",
                        "a count such as 3, or a largest spacing such as 10ft or 3m");
            }
            return new InfillSetting(n, 0);
        }
        return new InfillSetting(0, Quantities.parsePositive("infill", t, Dimension.LENGTH));
    }

    /** The load-area values of the tool options (live load goes to roof live load on a roof). */
    public static LoadValues areaLoad(ToolSettings s, UnitSystem us, boolean roof) {
        double sd = load("superimposed dead", s.areaSd.get(), us.areaLoad());
        double live = load(roof ? "roof live" : "live", s.areaLive.get(), us.areaLoad());
        return roof ? new LoadValues(0, sd, 0, live, 0, 0) : new LoadValues(0, sd, live, 0, 0, 0);
    }

    /** The line-load values of the tool options, per length. */
    public static LoadValues lineLoad(ToolSettings s, UnitSystem us) {
        return new LoadValues(load("line dead", s.lineDead.get(), us.lineLoad()), 0,
                load("line live", s.lineLive.get(), us.lineLoad()), 0, 0, 0);
    }

    /** The point-load values of the tool options, forces. */
    public static LoadValues pointLoad(ToolSettings s, UnitSystem us) {
        return new LoadValues(load("point dead", s.pointDead.get(), us.force()), 0,
                load("point live", s.pointLive.get(), us.force()), 0, 0, 0);
    }
    /**
     * The spacings between neighbouring grid lines as the Grid tool's field shows them, in the plan's
     * units: {@code 30' 25'-6"} (whole inches; decimal feet otherwise) or {@code 9.000m 7.500m}. Read
     * back with {@link #spacings}.
     */
    public static String spacingText(List<org.baywright.plan.GridLine> lines, UnitSystem us) {
        List<String> parts = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            double d = lines.get(i).offset() - lines.get(i - 1).offset();
            parts.add(us == UnitSystem.SI ? String.format(java.util.Locale.ROOT, "%.3fm", Units.M.fromSi(d)) : feetText(d));
        }
        return String.join(" ", parts);
    }

    /** A spacing as typed text: 30' or 25'-6" when whole inches, else decimal feet. */
    static String feetText(double metres) {
        double inches = Units.IN.fromSi(metres);
        long whole = Math.round(inches);
        if (Math.abs(inches - whole) < 1e-6) {
            long ft = whole / 12;
            long in = whole % 12;
            return in == 0 ? ft + "'" : ft + "'-" + in + "\"";
        }
        return String.format(java.util.Locale.ROOT, "%.4fft", Units.FT_.fromSi(metres));
    }
}
