package org.baywright.units;

import java.util.EnumMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads quantities typed by a user (CLI options, UI fields, plan files) into canonical SI doubles.
 * A number must carry its unit: a bare number is refused because it is ambiguous between the two
 * unit systems. Lengths also accept feet-and-inches as a drafter writes them ({@code 30'-6"},
 * {@code 30' 6 1/2"}, {@code 6"}).
 */
public final class Quantities {
    private Quantities() {
    }

    private static final String NUM = "[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?";
    private static final Pattern NUMBER_UNIT = Pattern.compile("^(" + NUM + ")\\s*(.*)$");
    /** 30'-6", 30' 6", 30'6", 30'-6 1/2", 30', 30'-0". */
    private static final Pattern FEET_INCHES = Pattern.compile(
            "^([+-]?\\d+(?:\\.\\d+)?)\\s*'\\s*(?:-?\\s*(\\d+(?:\\.\\d+)?)?(?:\\s*(\\d+)\\s*/\\s*(\\d+))?\\s*\")?$");
    /** 6", 6 1/2", 1/2". */
    private static final Pattern INCHES_FRACTION = Pattern.compile(
            "^(\\d+(?:\\.\\d+)?)?(?:\\s*(\\d+)\\s*/\\s*(\\d+))?\\s*\"$");
    /** 30ft 6in, 30 ft 6 in. */
    private static final Pattern FT_IN_WORDS = Pattern.compile(
            "^([+-]?\\d+(?:\\.\\d+)?)\\s*ft\\.?\\s*(\\d+(?:\\.\\d+)?)\\s*in\\.?$");

    private static final Map<Dimension, String> ACCEPTED = new EnumMap<>(Dimension.class);

    static {
        ACCEPTED.put(Dimension.LENGTH, "a number with ft, in, m, mm or cm, e.g. 35ft, 30'-6\", 420in, 10.5m, 250mm");
        ACCEPTED.put(Dimension.FORCE, "a number with kip, lb, kN or N, e.g. 12kip, 500lb, 50kN");
        ACCEPTED.put(Dimension.LINE_LOAD, "a number with klf, plf, kN/m or N/m, e.g. 0.45klf, 450plf, 6.5kN/m");
        ACCEPTED.put(Dimension.AREA_LOAD, "a number with psf, ksf, kPa or Pa, e.g. 50psf, 2.4kPa");
        ACCEPTED.put(Dimension.STRESS, "a number with ksi, psi, MPa or GPa, e.g. 50ksi, 345MPa");
        ACCEPTED.put(Dimension.MOMENT, "a number with kip-ft, kip-in, kN·m or N·m, e.g. 266kip-ft, 360kNm");
        ACCEPTED.put(Dimension.AREA, "a number with in2, ft2, mm2 or m2, e.g. 14.7in2, 900ft2");
        ACCEPTED.put(Dimension.SECTION_MODULUS, "a number with in3, mm3 or cm3, e.g. 101in3");
        ACCEPTED.put(Dimension.MOMENT_OF_INERTIA, "a number with in4, mm4 or cm4, e.g. 800in4");
        ACCEPTED.put(Dimension.WARPING_CONSTANT, "a number with in6, mm6 or cm6, e.g. 3040in6");
        ACCEPTED.put(Dimension.MASS_PER_LENGTH, "a number with kg/m or lb/ft, e.g. 74.4kg/m");
        ACCEPTED.put(Dimension.UNIT_WEIGHT, "a number with pcf or kN/m3, e.g. 145pcf, 22.8kN/m3");
        ACCEPTED.put(Dimension.DIMENSIONLESS, "a plain number, e.g. 1.5");
    }

    /** The accepted forms of a dimension, as printed in error messages. */
    public static String accepted(Dimension d) {
        return ACCEPTED.get(d);
    }

    /**
     * Parses {@code text} as a quantity of dimension {@code d} and returns it in canonical SI.
     *
     * @param field the name of the field or option, used in the error message
     * @throws UnitParseException naming the field, the text and the accepted forms
     */
    public static double parse(String field, String text, Dimension d) {
        if (text == null || text.isBlank()) {
            throw new UnitParseException(field, text == null ? "" : text, "is empty", ACCEPTED.get(d));
        }
        String t = text.trim().replace('’', '\'').replace('′', '\'').replace('″', '"').replace('”', '"');
        double value;
        if (d == Dimension.LENGTH && (value = feetInches(t)) == value) {
            return checkFinite(field, text, d, value);
        }
        Matcher m = NUMBER_UNIT.matcher(t);
        if (!m.matches()) {
            throw new UnitParseException(field, text, "is not a " + d.label(), ACCEPTED.get(d));
        }
        double number;
        try {
            number = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            throw new UnitParseException(field, text, "is not a " + d.label(), ACCEPTED.get(d));
        }
        String unitText = m.group(2).trim();
        if (unitText.isEmpty()) {
            if (d == Dimension.DIMENSIONLESS) {
                return checkFinite(field, text, d, number);
            }
            throw new UnitParseException(field, text, "has no unit", ACCEPTED.get(d));
        }
        Unit u = Units.find(d, unitText);
        if (u == null) {
            throw new UnitParseException(field, text,
                    "has a unit (\"" + unitText + "\") that is not a unit of " + d.label(), ACCEPTED.get(d));
        }
        return checkFinite(field, text, d, u.toSi(number));
    }

    /** Parses a quantity that must be strictly positive (a span, a yield stress). */
    public static double parsePositive(String field, String text, Dimension d) {
        double v = parse(field, text, d);
        if (!(v > 0)) {
            throw new UnitParseException(field, text, "must be greater than zero", ACCEPTED.get(d));
        }
        return v;
    }

    /** Parses a quantity that must not be negative (a load). */
    public static double parseNonNegative(String field, String text, Dimension d) {
        double v = parse(field, text, d);
        if (v < 0) {
            throw new UnitParseException(field, text, "must not be negative", ACCEPTED.get(d));
        }
        return v;
    }

    public static double length(String field, String text) {
        return parse(field, text, Dimension.LENGTH);
    }

    public static double force(String field, String text) {
        return parse(field, text, Dimension.FORCE);
    }

    public static double lineLoad(String field, String text) {
        return parse(field, text, Dimension.LINE_LOAD);
    }

    public static double areaLoad(String field, String text) {
        return parse(field, text, Dimension.AREA_LOAD);
    }

    public static double stress(String field, String text) {
        return parse(field, text, Dimension.STRESS);
    }

    /**
     * Parses a list of lengths such as bay spacings: items separated by spaces or commas, each a length
     * or {@code N@LENGTH} for N equal lengths ({@code 3@30ft}, {@code 25'-6" 30ft 30ft}). Items may not
     * contain spaces.
     */
    public static java.util.List<Double> lengthList(String field, String text) {
        if (text == null || text.isBlank()) {
            throw new UnitParseException(field, text == null ? "" : text, "is empty",
                    "lengths separated by spaces or commas, or N@LENGTH, e.g. 3@30ft or 25ft,30ft,30ft");
        }
        java.util.List<Double> out = new java.util.ArrayList<>();
        for (String item : text.trim().split("[,\\s]+")) {
            int at = item.indexOf('@');
            int n = 1;
            String len = item;
            if (at >= 0) {
                try {
                    n = Integer.parseInt(item.substring(0, at).trim());
                } catch (NumberFormatException e) {
                    n = -1;
                }
                if (n < 1 || n > 1000) {
                    throw new UnitParseException(field, text, "has a repeat count \"" + item.substring(0, at)
                            + "\" that is not a whole number from 1 to 1000", "N@LENGTH, e.g. 3@30ft");
                }
                len = item.substring(at + 1);
            }
            double v = parsePositive(field, len, Dimension.LENGTH);
            for (int i = 0; i < n; i++) {
                out.add(v);
            }
        }
        return out;
    }

    private static double checkFinite(String field, String text, Dimension d, double v) {
        if (!Double.isFinite(v)) {
            throw new UnitParseException(field, text, "is not a finite number", ACCEPTED.get(d));
        }
        return v;
    }

    /** Feet-and-inches forms; NaN when the text is not one of them. */
    private static double feetInches(String t) {
        Matcher m = FEET_INCHES.matcher(t);
        if (m.matches()) {
            double feet = Double.parseDouble(m.group(1));
            double inches = m.group(2) == null ? 0 : Double.parseDouble(m.group(2));
            inches += fraction(m.group(3), m.group(4));
            if (Double.isNaN(inches)) {
                return Double.NaN;
            }
            double sign = m.group(1).startsWith("-") ? -1 : 1;
            return Units.FT_.toSi(feet) + sign * Units.IN.toSi(inches);
        }
        m = INCHES_FRACTION.matcher(t);
        if (m.matches() && (m.group(1) != null || m.group(2) != null)) {
            double inches = (m.group(1) == null ? 0 : Double.parseDouble(m.group(1))) + fraction(m.group(2), m.group(3));
            return Double.isNaN(inches) ? Double.NaN : Units.IN.toSi(inches);
        }
        m = FT_IN_WORDS.matcher(t);
        if (m.matches()) {
            double feet = Double.parseDouble(m.group(1));
            double inches = Double.parseDouble(m.group(2));
            double sign = m.group(1).startsWith("-") ? -1 : 1;
            return Units.FT_.toSi(feet) + sign * Units.IN.toSi(inches);
        }
        return Double.NaN;
    }

    private static double fraction(String num, String den) {
        if (num == null) {
            return 0;
        }
        double d = Double.parseDouble(den);
        return d == 0 ? Double.NaN : Double.parseDouble(num) / d;
    }
}
