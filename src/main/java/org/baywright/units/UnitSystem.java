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
