package org.baywright.study;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.plan.GridLine;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;

/**
 * Reads a sweep as a user types it: {@code PARAMETER=VALUES} where VALUES is a range
 * {@code A..B:STEP} (both ends included when the steps hit them) or a list {@code a,b,c}. Lengths carry
 * their units ({@code beam-spacing=6ft..15ft:1ft}, {@code max-depth=18in,21in,24in}); counts are whole
 * numbers ({@code beam-count=1..4:1}); {@code beam-direction=x,y}; {@code method=lrfd,asd};
 * {@code column-series=W14,W12;W14}; {@code composite=on,off}; {@code topping=3.5in..5.5in:0.5in} (the concrete
 * above the deck of every slab); {@code concrete=110pcf,145pcf} (its unit weight). A bay value may list one width per bay separated by semicolons,
 * with {@code N@LENGTH} for repeats ({@code bay-x=30ft,25ft;35ft;35ft;25ft}). Errors are
 * {@link IllegalArgumentException}s whose one-line message names the option and the text.
 */
public final class SweepText {
    private SweepText() {
    }

    /** Most values one sweep may have. */
    public static final int MAX_VALUES = 10_000;

    /**
     * Parses one sweep.
     *
     * @param option the option name for messages, e.g. "--vary"
     * @param units the unit system labels are written in
     */
    public static Sweep parse(String option, String text, UnitSystem units) {
        String where = option + " " + (text == null ? "" : text);
        int eq = text == null ? -1 : text.indexOf('=');
        if (eq < 0) {
            throw new IllegalArgumentException(where + ": expected PARAMETER=VALUES, e.g. beam-spacing=6ft..15ft:1ft");
        }
        Parameter p = Parameter.parse(text.substring(0, eq));
        if (p == null) {
            throw new IllegalArgumentException(where + ": \"" + text.substring(0, eq).trim() + "\" is not a parameter; use one of "
                    + Parameter.names());
        }
        String values = text.substring(eq + 1).trim();
        if (values.isEmpty()) {
            throw new IllegalArgumentException(where + ": no values");
        }
        List<Setting> out = new ArrayList<>();
        try {
            if (values.contains("..")) {
                out.addAll(range(p, values, where, units));
            } else {
                for (String item : values.split(",", -1)) {
                    out.add(item(p, item.trim(), where, units));
                }
            }
        } catch (IllegalArgumentException e) {
            throw e.getMessage() != null && e.getMessage().startsWith(option) ? e
                    : new IllegalArgumentException(where + ": " + e.getMessage(), e);
        }
        return new Sweep(p, out);
    }

    private static List<Setting> range(Parameter p, String values, String where, UnitSystem units) {
        int dots = values.indexOf("..");
        int colon = values.lastIndexOf(':');
        if (colon < dots) {
            throw new IllegalArgumentException(where + ": a range is A..B:STEP, e.g. 6ft..15ft:1ft");
        }
        String a = values.substring(0, dots).trim();
        String b = values.substring(dots + 2, colon).trim();
        String step = values.substring(colon + 1).trim();
        List<Setting> out = new ArrayList<>();
        switch (p) {
            case BEAM_COUNT -> {
                int from = whole(a, where);
                int to = whole(b, where);
                int by = whole(step, where);
                check(from >= 1 && to >= from && by >= 1 && (to - from) / by < MAX_VALUES, where,
                        "a count range needs 1 ≤ A ≤ B and a step of at least 1");
                for (int c = from; c <= to; c += by) {
                    out.add(Setting.beamCount(c));
                }
            }
            case BAY_X, BAY_Y, BEAM_SPACING, MAX_DEPTH -> {
                double from = p == Parameter.MAX_DEPTH ? Quantities.parseNonNegative(where, a, Dimension.LENGTH)
                        : Quantities.parsePositive(where, a, Dimension.LENGTH);
                double to = Quantities.parsePositive(where, b, Dimension.LENGTH);
                double by = Quantities.parsePositive(where, step, Dimension.LENGTH);
                check(to >= from, where, "the end of the range (" + b + ") is below its start (" + a + ")");
                long n = SearchLimits.count(from, to, by);
                check(n <= MAX_VALUES, where, "the range has " + n + " values; at most " + MAX_VALUES);
                Unit u = p == Parameter.MAX_DEPTH ? units.smallLength() : units.length();
                for (long i = 0; i < n; i++) {
                    double v = from + i * by;
                    String label = label(v, u);
                    out.add(switch (p) {
                        case BEAM_SPACING -> Setting.beamSpacing(v, label);
                        case MAX_DEPTH -> Setting.maxDepth(v, label);
                        default -> Setting.bays(p, List.of(v), label);
                    });
                }
            }
            case TOPPING, CONCRETE -> {
                Dimension dim = p == Parameter.TOPPING ? Dimension.LENGTH : Dimension.UNIT_WEIGHT;
                double from = Quantities.parsePositive(where, a, dim);
                double to = Quantities.parsePositive(where, b, dim);
                double by = Quantities.parsePositive(where, step, dim);
                check(to >= from, where, "the end of the range (" + b + ") is below its start (" + a + ")");
                long n = SearchLimits.count(from, to, by);
                check(n <= MAX_VALUES, where, "the range has " + n + " values; at most " + MAX_VALUES);
                Unit u = p == Parameter.TOPPING ? units.smallLength() : units.unitWeight();
                for (long i = 0; i < n; i++) {
                    double v = from + i * by;
                    out.add(p == Parameter.TOPPING ? Setting.topping(v, label(v, u)) : Setting.concrete(v, label(v, u)));
                }
            }
            default -> throw new IllegalArgumentException(where + ": " + p.key() + " takes a list, not a range");
        }
        return out;
    }

    private static Setting item(Parameter p, String item, String where, UnitSystem units) {
        check(!item.isEmpty(), where, "has an empty value");
        return switch (p) {
            case BAY_X, BAY_Y -> Setting.bays(p, Quantities.lengthList(where, item.replace(';', ' ')), item);
            case BEAM_SPACING -> Setting.beamSpacing(Quantities.parsePositive(where, item, Dimension.LENGTH), item);
            case MAX_DEPTH -> Setting.maxDepth(Quantities.parseNonNegative(where, item, Dimension.LENGTH), item);
            case BEAM_COUNT -> {
                int c = whole(item, where);
                check(c >= 1, where, "a beam count must be at least 1");
                yield Setting.beamCount(c);
            }
            case BEAM_DIRECTION -> switch (item.toLowerCase(Locale.ROOT)) {
                case "x" -> Setting.beamDirection(GridLine.Axis.X);
                case "y" -> Setting.beamDirection(GridLine.Axis.Y);
                default -> throw new IllegalArgumentException(where + ": \"" + item + "\" is not a direction; use x or y");
            };
            case METHOD -> {
                String m = item.toLowerCase(Locale.ROOT);
                check(m.equals("lrfd") || m.equals("asd"), where, "\"" + item + "\" is not a design method; use lrfd or asd");
                yield Setting.method(m);
            }
            case COMPOSITE -> switch (item.toLowerCase(Locale.ROOT)) {
                case "on" -> Setting.composite(true);
                case "off" -> Setting.composite(false);
                default -> throw new IllegalArgumentException(where + ": \"" + item + "\" is not on or off");
            };
            case TOPPING -> Setting.topping(Quantities.parsePositive(where, item, Dimension.LENGTH), item);
            case CONCRETE -> Setting.concrete(Quantities.parsePositive(where, item, Dimension.UNIT_WEIGHT), item);
            case COLUMN_SERIES -> {
                List<String> s = List.of(item.split(";"));
                for (String x : s) {
                    check(x.trim().matches("(?i)[A-Z]+\\d+"), where, "\"" + x.trim() + "\" is not a series such as W14");
                }
                yield Setting.columnSeries(s);
            }
        };
    }

    private static int whole(String t, String where) {
        try {
            return Integer.parseInt(t.trim());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(where + ": \"" + t + "\" is not a whole number", e);
        }
    }

    private static void check(boolean ok, String where, String message) {
        if (!ok) {
            throw new IllegalArgumentException(where + ": " + message);
        }
    }

    /** A length in a unit with up to three decimals, trailing zeros dropped: "7.5ft", "24in". */
    static String label(double si, Unit u) {
        BigDecimal d = BigDecimal.valueOf(u.fromSi(si)).setScale(3, java.math.RoundingMode.HALF_UP).stripTrailingZeros();
        return d.toPlainString() + u.symbol();
    }
}
