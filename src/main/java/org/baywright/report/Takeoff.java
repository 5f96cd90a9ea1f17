package org.baywright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.baywright.plan.Level;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.StoreyLoad;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * The steel takeoff of a run: count, length and weight by section size, by member kind and by level,
 * totals, weight per floor area, and an optional allowance for connections and miscellaneous steel
 * (a percentage, shown separately from the member weight). Weights are nominal weight × length.
 */
public final class Takeoff {
    /**
     * One row: a section size, a kind or a level.
     *
     * @param length total length, m
     * @param weight total weight, N
     */
    public record Row(String item, int count, double length, double weight) {
    }

    private final Map<String, Row> bySection;
    private final Map<String, Row> byKind;
    private final Map<String, Row> byLevel;
    private final double total;
    private final double allowancePercent;
    private final double floorArea;

    private Takeoff(Map<String, Row> bySection, Map<String, Row> byKind, Map<String, Row> byLevel, double total,
            double allowancePercent, double floorArea) {
        this.bySection = bySection;
        this.byKind = byKind;
        this.byLevel = byLevel;
        this.total = total;
        this.allowancePercent = allowancePercent;
        this.floorArea = floorArea;
    }

    /** The takeoff of a run; {@code allowancePercent} ≥ 0 (e.g. 10 for 10 % for connections). */
    public static Takeoff of(RunResult run, double allowancePercent) {
        if (!(allowancePercent >= 0) || allowancePercent > 100) {
            throw new IllegalArgumentException("the connection allowance must be a percentage from 0 to 100, got " + allowancePercent);
        }
        TakedownResult t = run.takedown();
        Map<String, Row> section = new TreeMap<>(Takeoff::compareSections);
        Map<String, Row> kind = new LinkedHashMap<>();
        Map<String, Row> level = new LinkedHashMap<>();
        double total = 0;
        for (Level lv : run.plan().levels()) {
            level.put(lv.name(), new Row(lv.name(), 0, 0, 0));
        }
        for (String k : List.of("beam", "girder", "column")) {
            kind.put(k, new Row(k + "s", 0, 0, 0));
        }
        if (t == null) {
            return new Takeoff(section, kind, level, 0, allowancePercent, 0);
        }
        for (Level lv : run.plan().levels()) {
            for (MemberResult m : t.members().getOrDefault(t.levelFloors().get(lv.name()), List.of())) {
                if (m.section().isEmpty()) {
                    continue;
                }
                double w = m.steelWeight();
                add(section, m.section(), 1, m.length(), w);
                add(kind, m.kind().name().toLowerCase(Locale.ROOT), 1, m.length(), w);
                add(level, lv.name(), 1, m.length(), w);
                total += w;
            }
        }
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                if (tier.section().isEmpty()) {
                    continue;
                }
                double w = tier.weight() * tier.length();
                add(section, tier.section(), 1, tier.length(), w);
                add(kind, "column", 1, tier.length(), w);
                total += w;
                for (StoreyLoad s : tier.storeys()) {
                    add(level, s.level(), 0, s.storeyHeight(), tier.weight() * s.storeyHeight());
                }
            }
        }
        return new Takeoff(section, kind, level, total, allowancePercent, t.floorArea());
    }

    private static void add(Map<String, Row> m, String key, int count, double length, double weight) {
        Row r = m.get(key);
        m.put(key, r == null ? new Row(key, count, length, weight)
                : new Row(r.item(), r.count() + count, r.length() + length, r.weight() + weight));
    }

    /** Sections in the trade's order: shape, then nominal depth, then weight (W8X10 before W10X12 before W10X15). */
    static int compareSections(String a, String b) {
        double[] x = key(a);
        double[] y = key(b);
        for (int i = 0; i < 2; i++) {
            int c = Double.compare(x[i], y[i]);
            if (c != 0) {
                return c;
            }
        }
        return a.compareTo(b);
    }

    private static double[] key(String s) {
        try {
            int x = s.indexOf('X');
            int start = 0;
            while (start < s.length() && !Character.isDigit(s.charAt(start))) {
                start++;
            }
            return new double[] {Double.parseDouble(s.substring(start, x)), Double.parseDouble(s.substring(x + 1))};
        } catch (RuntimeException e) {
            return new double[] {0, 0};
        }
    }

    public List<Row> bySection() {
        return new ArrayList<>(bySection.values());
    }

    public List<Row> byKind() {
        return new ArrayList<>(byKind.values());
    }

    public List<Row> byLevel() {
        return new ArrayList<>(byLevel.values());
    }

    /** Member and column weight, N. */
    public double total() {
        return total;
    }

    /** The connection and miscellaneous allowance, N. */
    public double allowance() {
        return total * allowancePercent / 100;
    }

    public double allowancePercent() {
        return allowancePercent;
    }

    /** Total with the allowance, N. */
    public double grandTotal() {
        return total + allowance();
    }

    /** Floor area of every level, m². */
    public double floorArea() {
        return floorArea;
    }

    /** Short tons (2,000 lb) of a weight in N. */
    public static double shortTons(double newtons) {
        return newtons / Units.NEWTONS_PER_POUND / 2000;
    }

    /** Tonnes (1,000 kg) of a weight in N. */
    public static double tonnes(double newtons) {
        return newtons / Units.STANDARD_GRAVITY / 1000;
    }

    /**
     * The takeoff as CSV: one header row with the units in the column names, then rows grouped by
     * section, kind and level, and the totals.
     */
    public String csv(UnitSystem us) {
        String lu = us.length().symbol();
        String wu = RunSummary.weightUnit(us);
        StringBuilder b = new StringBuilder();
        b.append("group,item,count,length[").append(lu).append("],weight[").append(wu).append("],short tons,tonnes,value\n");
        for (Row r : bySection()) {
            row(b, "section", r, us);
        }
        for (Row r : byKind()) {
            row(b, "kind", r, us);
        }
        for (Row r : byLevel()) {
            row(b, "level", r, us);
        }
        row(b, "total", new Row("members and columns", -1, Double.NaN, total), us);
        row(b, "total", new Row(String.format(Locale.ROOT, "connections and miscellaneous allowance %.1f %%", allowancePercent),
                -1, Double.NaN, allowance()), us);
        row(b, "total", new Row("total with allowance", -1, Double.NaN, grandTotal()), us);
        double area = us.floorArea().fromSi(floorArea);
        b.append("total,floor area [").append(us.floorArea().symbol().replace("²", "2")).append("],,,,,,")
                .append(fmt(area)).append('\n');
        b.append("total,weight per floor area with allowance [").append(us == UnitSystem.US ? "lb/ft2" : "kg/m2")
                .append("],,,,,,").append(fmt(area > 0 ? RunSummary.weight(grandTotal(), us) / area : 0)).append('\n');
        return b.toString();
    }

    private static void row(StringBuilder b, String group, Row r, UnitSystem us) {
        b.append(group).append(',').append(csvText(r.item())).append(',').append(r.count() < 0 ? "" : Integer.toString(r.count()))
                .append(',').append(Double.isNaN(r.length()) ? "" : fmt(us.length().fromSi(r.length()))).append(',')
                .append(fmt(RunSummary.weight(r.weight(), us))).append(',').append(fmt(shortTons(r.weight()))).append(',')
                .append(fmt(tonnes(r.weight()))).append(",\n");
    }

    static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

}
