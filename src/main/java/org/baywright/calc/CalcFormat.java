package org.baywright.calc;

import java.util.Locale;
import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;

/** Renders calculation lines as text in a unit system. */
public final class CalcFormat {
    private CalcFormat() {
    }

    /** A number to 4 significant figures, plain notation where reasonable. */
    public static String sig(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v == 0 ? "0" : String.valueOf(v);
        }
        double a = Math.abs(v);
        if (a >= 1e7 || a < 1e-4) {
            return String.format(Locale.ROOT, "%.4g", v).replace("e+0", "e").replace("e+", "e").replace("e-0", "e-");
        }
        int digits = Math.max(0, 3 - (int) Math.floor(Math.log10(a)));
        String s = String.format(Locale.ROOT, "%." + digits + "f", v);
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    /** A value with its unit, e.g. {@code 50 ksi}. */
    public static String value(double si, Quantity q, UnitSystem system) {
        Unit u = q.unit(system);
        String n = sig(u.fromSi(si));
        return u.symbol().isEmpty() ? n : n + " " + u.symbol();
    }

    /** One line as the sheet prints it. */
    public static String render(CalcLine line, UnitSystem system) {
        String ref = line.reference() == null || line.reference().isEmpty() ? "" : "  (" + line.reference() + ")";
        return switch (line.kind()) {
            case HEADING -> line.text();
            case NOTE, BRANCH -> line.text() + ref;
            case VALUE -> {
                StringBuilder b = new StringBuilder(line.symbol()).append(" = ")
                        .append(value(line.value(), line.quantity(), system));
                for (Arg a : line.args()) {
                    b.append(", ").append(a.symbol()).append(" = ").append(value(a.value(), a.quantity(), system));
                }
                if (line.text() != null && !line.text().isEmpty()) {
                    b.append(" — ").append(line.text());
                }
                yield b.append(ref).toString();
            }
            case EQUATION -> {
                String result = value(line.value(), line.quantity(), system);
                String formula = Formula.substitute(line.formula(), s -> null);
                if (line.args().isEmpty() || isPlainSymbol(line.formula())) {
                    String mid = line.args().isEmpty() ? formula : formula + " = "
                            + value(line.args().get(0).value(), line.args().get(0).quantity(), system);
                    yield line.symbol() + " = " + mid + " = " + result + ref;
                }
                String subst = Formula.substitute(line.formula(), s -> {
                    for (Arg a : line.args()) {
                        if (a.symbol().equals(s)) {
                            return value(a.value(), a.quantity(), system);
                        }
                    }
                    return null;
                });
                yield line.symbol() + " = " + formula + " = " + subst + " = " + result + ref;
            }
        };
    }

    private static boolean isPlainSymbol(String formula) {
        return formula.matches("\\p{L}[\\p{L}\\p{N}_′]*");
    }
}
