package org.baywright.report.pdf;

import java.util.Locale;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/** Number formats shared by the pages: every value goes through {@link CalcFormat} or these helpers. */
final class Fmt {
    private Fmt() {
    }

    /** A value with its unit, four significant figures, as the calculation lines print it. */
    static String v(double si, Quantity q, UnitSystem us) {
        return CalcFormat.value(si, q, us);
    }

    /** A number alone (no unit) in the unit of {@code q}, four significant figures. */
    static String n(double si, Quantity q, UnitSystem us) {
        return CalcFormat.sig(q.unit(us).fromSi(si));
    }

    /** A number in the unit of {@code q} with a fixed number of decimals and thousands separators. */
    static String fixed(double si, Quantity q, UnitSystem us, int decimals) {
        return String.format(Locale.ROOT, "%,." + decimals + "f", q.unit(us).fromSi(si));
    }

    static String unit(Quantity q, UnitSystem us) {
        return q.unit(us).symbol();
    }

    static String ratio(double r) {
        return Double.isFinite(r) ? String.format(Locale.ROOT, "%.3f", r) : "n/a";
    }

    /** A weight in N as the trade states totals: lb (US) or kg (SI). */
    static double weight(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? newtons / Units.NEWTONS_PER_POUND : newtons / Units.STANDARD_GRAVITY;
    }

    static String weightUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb" : "kg";
    }

    static String weightPerAreaUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb/ft²" : "kg/m²";
    }

    static String grouped(double v, int decimals) {
        return String.format(Locale.ROOT, "%,." + decimals + "f", v);
    }

    /** A section's nominal weight per length: "44 lb/ft" or "65.5 kg/m". */
    static String weightPerLength(double newtonsPerMetre, UnitSystem us) {
        return CalcFormat.sig(us.weightPerLength(newtonsPerMetre)) + " " + us.weightPerLength().symbol();
    }

    /** A plan point as (x, y) in spans' units. */
    static String point(org.baywright.plan.Point p, UnitSystem us) {
        return "(" + n(p.x(), Quantity.SPAN_LENGTH, us) + ", " + n(p.y(), Quantity.SPAN_LENGTH, us) + ") "
                + unit(Quantity.SPAN_LENGTH, us);
    }
}
