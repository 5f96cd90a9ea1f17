package org.baywright.units;

import java.util.Locale;

/**
 * The two unit systems a user can work in. Each names the unit it prints for every dimension; both
 * read any unit on input.
 */
public enum UnitSystem {
    /** US customary: ft for spans, in for section sizes and deflections, kip, klf, psf, ksi, kip-ft. */
    US(Units.FT_, Units.IN, Units.KIPS, Units.KLF, Units.PSF, Units.KSI, Units.KIP_FT,
            Units.IN2, Units.IN3, Units.IN4, Units.IN6, Units.LB_PER_FT, Units.FT2),
    /** SI: m for spans, mm for section sizes and deflections, kN, kN/m, kPa, MPa, kN·m. */
    SI(Units.M, Units.MM, Units.KN, Units.KN_PER_M, Units.KPA, Units.MPA, Units.KN_M,
            Units.MM2, Units.MM3, Units.MM4, Units.MM6, Units.KG_PER_M, Units.M2);

    private final Unit length;
    private final Unit smallLength;
    private final Unit force;
    private final Unit lineLoad;
    private final Unit areaLoad;
    private final Unit stress;
    private final Unit moment;
    private final Unit area;
    private final Unit sectionModulus;
    private final Unit inertia;
    private final Unit warping;
    private final Unit weightPerLength;
    private final Unit floorArea;

    UnitSystem(Unit length, Unit smallLength, Unit force, Unit lineLoad, Unit areaLoad, Unit stress,
            Unit moment, Unit area, Unit sectionModulus, Unit inertia, Unit warping, Unit weightPerLength,
            Unit floorArea) {
        this.length = length;
        this.smallLength = smallLength;
        this.force = force;
        this.lineLoad = lineLoad;
        this.areaLoad = areaLoad;
        this.stress = stress;
        this.moment = moment;
        this.area = area;
        this.sectionModulus = sectionModulus;
        this.inertia = inertia;
        this.warping = warping;
        this.weightPerLength = weightPerLength;
        this.floorArea = floorArea;
    }

    /** Spans and member lengths: ft or m. */
    public Unit length() {
        return length;
    }

    /** Section dimensions and deflections: in or mm. */
    public Unit smallLength() {
        return smallLength;
    }

    public Unit force() {
        return force;
    }

    public Unit lineLoad() {
        return lineLoad;
    }

    public Unit areaLoad() {
        return areaLoad;
    }

    public Unit stress() {
        return stress;
    }

    public Unit moment() {
        return moment;
    }

    /** Cross-section area: in² or mm². */
    public Unit area() {
        return area;
    }

    public Unit sectionModulus() {
        return sectionModulus;
    }

    public Unit inertia() {
        return inertia;
    }

    public Unit warping() {
        return warping;
    }

    /**
     * Steel weight per length as the trade states it: lb/ft (a force per length, plf) in US units,
     * kg/m (a mass per length) in SI. Use {@link #weightPerLength(double)} to convert.
     */
    public Unit weightPerLength() {
        return weightPerLength;
    }

    /** Floor and tributary areas: ft² or m². */
    public Unit floorArea() {
        return floorArea;
    }

    /** Concrete unit weight: pcf or kN/m³. */
    public Unit unitWeight() {
        return this == US ? Units.PCF : Units.KN_PER_M3;
    }

    /** Converts a weight per length in N/m to this system's number (lb/ft, or kg/m by standard gravity). */
    public double weightPerLength(double newtonsPerMetre) {
        if (this == SI) {
            return newtonsPerMetre / Units.STANDARD_GRAVITY;
        }
        return Units.PLF.fromSi(newtonsPerMetre);
    }

    /** Parses "us" or "si" (any case); null for anything else. */
    public static UnitSystem parse(String text) {
        if (text == null) {
            return null;
        }
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "us", "imperial", "customary" -> US;
            case "si", "metric" -> SI;
            default -> null;
        };
    }

    // ---- quantities in messages: the same words and precision wherever a problem is shown

    /**
     * A length as a message prints it: {@code 30'-6"} (to 1/8 in) in US units, {@code 9.144 m} in SI.
     */
    public String lengthText(double metres) {
        return this == US ? feetInches(metres, 8) : grouped(metres, 3) + " m";
    }

    /** A plan point as a message prints it: {@code (30'-0", 12'-6")} or {@code (9.144 m, 3.810 m)}. */
    public String pointText(double x, double y) {
        return "(" + lengthText(x) + ", " + lengthText(y) + ")";
    }

    /**
     * A floor area as a message prints it, in ft² or m², grouped: whole units from 100 up, to 0.1 from 1
     * up, and two significant figures below, so a sliver is never printed as 0.
     */
    public String areaText(double squareMetres) {
        double v = floorArea.fromSi(squareMetres);
        double a = Math.abs(v);
        return (a >= 1 ? grouped(v, a >= 100 ? 0 : 1) : twoFigures(v)) + " " + floorArea.symbol();
    }

    /** Two significant figures in plain notation (0.000096), for values below one. */
    private static String twoFigures(double v) {
        return v == 0 ? "0" : !Double.isFinite(v) ? String.valueOf(v)
                : new java.math.BigDecimal(v).round(new java.math.MathContext(2)).stripTrailingZeros().toPlainString();
    }

    /** An area load as a message prints it: whole psf in US units, kN/m² to 0.01 in SI ({@code 125 psf}, {@code 5.99 kN/m²}). */
    public String areaLoadText(double pascals) {
        return grouped(areaLoad().fromSi(pascals), this == US ? 0 : 2) + " " + areaLoad().symbol();
    }

    /**
     * A force as a message prints it, by the rule of {@link #forceNumber}: {@code 3,709.7 kip},
     * {@code 6.30 kip}.
     */
    public String forceText(double newtons) {
        return forceNumber(newtons) + " " + force.symbol();
    }

    /**
     * A force in kip or kN as every report prints it (tables, sheets, drawing tags, messages): the one
     * rule of {@link #threeFigures}, so "D 6.30, L 5.69" and never "D 6.3, L 5.688".
     */
    public String forceNumber(double newtons) {
        return threeFigures(force.fromSi(newtons));
    }

    /**
     * A number to three significant figures with at least one decimal, zeros kept and thousands grouped:
     * 6.30, 5.69, 0.0457, 12.3, 123.4, 3,709.7. Three figures are what published tables of forces carry
     * (the AISC Manual's tables round to three significant figures); the decimal keeps a column of
     * values readable as forces rather than counts.
     */
    public static String threeFigures(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        if (v == 0) {
            return "0.0";
        }
        int scale = new java.math.BigDecimal(v).round(new java.math.MathContext(3)).scale();
        return grouped(v, Math.max(1, scale));
    }

    /**
     * A very small length (a tolerance) as a message prints it, to two significant figures in inches or
     * millimetres, never in scientific notation: {@code 0.000039 in}, {@code 0.001 mm}.
     */
    public String toleranceText(double metres) {
        return twoFigures(smallLength.fromSi(metres)) + " " + smallLength.symbol();
    }

    private static String grouped(double v, int decimals) {
        return String.format(Locale.US, "%,." + decimals + "f", v + 0.0);
    }

    /** Formats an SI value in the given unit with a fixed number of decimals and the unit symbol. */
    public static String format(double si, Unit unit, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f %s", unit.fromSi(si), unit.symbol()).trim();
    }

    /**
     * Formats a length as a drafter writes it, {@code 30'-6 1/2"}, rounded to the nearest
     * 1/{@code denominator} inch.
     */
    public static String feetInches(double metres, int denominator) {
        double totalInches = Units.IN.fromSi(Math.abs(metres));
        long units = Math.round(totalInches * denominator);
        long feet = units / (12L * denominator);
        long rest = units - feet * 12L * denominator;
        long wholeIn = rest / denominator;
        long frac = rest - wholeIn * denominator;
        StringBuilder sb = new StringBuilder(metres < 0 ? "-" : "");
        sb.append(feet).append("'-").append(wholeIn);
        if (frac != 0) {
            long g = gcd(frac, denominator);
            sb.append(' ').append(frac / g).append('/').append(denominator / g);
        }
        return sb.append('"').toString();
    }

    private static long gcd(long a, long b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
