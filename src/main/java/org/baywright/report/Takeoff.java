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
 * The steel takeoff of a run: pieces, length and weight by section size × level × kind (the tidy table
 * an estimator sorts and pivots), and from it by section size, by member kind and by level; totals,
 * weight per floor area, and an optional allowance for connections and miscellaneous steel (a
 * percentage, shown separately from the member weight). Weights are nominal weight × length.
 *
 * <p>Pieces: a beam or girder is one piece on its level. A column tier (the shaft between two
 * splices) is one piece, counted on the lowest level it spans, where it is erected; its length and
 * weight are split over the storeys it spans, each on the level at the top of the storey. So every
 * table counts the same pieces and the same weight, and each sums to the totals.
 *
 * <p>Composite members: a line also counts the headed studs on its pieces and gives their camber
 * (pieces of one size, level and kind with different cambers are separate lines); the totals add the
 * studs, the pieces cambered and the steel weight without composite action. A run without composite
 * members has none of these, and its CSV and workbook read as they did before composite floors.
 */
public final class Takeoff {
    /**
     * One line of the tidy table: one section size on one level as one kind of member.
     *
     * @param kind "beam", "girder" or "column"
     * @param pieces pieces erected on this level
     * @param length total length on this level, m
     * @param weight total weight on this level, N
     * @param studs headed studs on these pieces (0 for bare steel)
     * @param camber the camber of each of these pieces, m (0 for none): pieces with another camber are a
     *     line of their own
     */
    public record Line(String section, String level, String kind, int pieces, double length, double weight, int studs,
            double camber) {

        /** A line of bare-steel pieces: no studs, no camber. */
        public Line(String section, String level, String kind, int pieces, double length, double weight) {
            this(section, level, kind, pieces, length, weight, 0, 0);
        }

        /** Pieces of this line that are cambered. */
        public int cambered() {
            return camber > 0 ? pieces : 0;
        }
    }

    /**
     * One row: a section size, a kind or a level.
     *
     * @param length total length, m
     * @param weight total weight, N
     */
    public record Row(String item, int count, double length, double weight) {
    }

    private final List<Line> lines;
    private final Map<String, Row> bySection;
    private final Map<String, Row> byKind;
    private final Map<String, Row> byLevel;
    private final double total;
    private final double allowancePercent;
    private final double floorArea;
    private final CompositeTotals composite;

    private Takeoff(List<Line> lines, Map<String, Row> bySection, Map<String, Row> byKind, Map<String, Row> byLevel,
            double total, double allowancePercent, double floorArea, CompositeTotals composite) {
        this.composite = composite;
        this.lines = List.copyOf(lines);
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
        List<String> levelOrder = run.plan().levels().stream().map(Level::name).toList();
        // size × level × kind (× camber), in the order of the levels, then kinds, then sizes, then cambers
        Map<List<String>, Line> cells = new TreeMap<>((a, b) -> {
            int c = Integer.compare(levelOrder.indexOf(a.get(1)), levelOrder.indexOf(b.get(1)));
            if (c == 0) {
                c = Integer.compare(KINDS.indexOf(a.get(2)), KINDS.indexOf(b.get(2)));
            }
            if (c == 0) {
                c = compareSections(a.get(0), b.get(0));
            }
            if (c == 0) {
                c = Double.compare(Double.parseDouble(a.get(3)), Double.parseDouble(b.get(3)));
            }
            return c;
        });
        double floorArea = 0;
        if (t != null) {
            floorArea = t.floorArea();
            for (Level lv : run.plan().levels()) {
                for (MemberResult m : t.members().getOrDefault(t.levelFloors().get(lv.name()), List.of())) {
                    if (!m.section().isEmpty()) {
                        cell(cells, new Line(m.section(), lv.name(), m.kind().name().toLowerCase(Locale.ROOT), 1, m.length(),
                                m.steelWeight(), m.studs(), m.camber()));
                    }
                }
            }
            for (ColumnResult c : t.columns()) {
                for (ColumnTier tier : c.tiers()) {
                    if (tier.section().isEmpty()) {
                        continue;
                    }
                    boolean first = true;
                    for (StoreyLoad st : tier.storeys()) { // bottom first: the piece counts on the lowest
                        cell(cells, new Line(tier.section(), st.level(), "column", first ? 1 : 0, st.storeyHeight(),
                                tier.weight() * st.storeyHeight()));
                        first = false;
                    }
                }
            }
        }
        List<Line> lines = new ArrayList<>(cells.values());
        Map<String, Row> section = new TreeMap<>(Takeoff::compareSections);
        Map<String, Row> kind = new LinkedHashMap<>();
        Map<String, Row> level = new LinkedHashMap<>();
        for (String lv : levelOrder) {
            level.put(lv, new Row(lv, 0, 0, 0));
        }
        for (String k : KINDS) {
            kind.put(k, new Row(k + "s", 0, 0, 0));
        }
        double total = 0;
        for (Line l : lines) {
            add(section, l.section(), l.pieces(), l.length(), l.weight());
            add(kind, l.kind(), l.pieces(), l.length(), l.weight());
            add(level, l.level(), l.pieces(), l.length(), l.weight());
            total += l.weight();
        }
        return new Takeoff(lines, section, kind, level, total, allowancePercent, floorArea, CompositeTotals.of(t));
    }

    /** The kinds of piece, in the order the tables list them. */
    static final List<String> KINDS = List.of("beam", "girder", "column");

    private static void cell(Map<List<String>, Line> cells, Line l) {
        cells.merge(List.of(l.section(), l.level(), l.kind(), Double.toString(l.camber())), l,
                (a, b) -> new Line(a.section(), a.level(), a.kind(), a.pieces() + b.pieces(), a.length() + b.length(),
                        a.weight() + b.weight(), a.studs() + b.studs(), a.camber()));
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

    /** The tidy table: one line per section size × level × kind. */
    public List<Line> lines() {
        return lines;
    }

    /** Pieces in all: beams and girders, and column tiers. */
    public int pieces() {
        return lines.stream().mapToInt(Line::pieces).sum();
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

    /** True when the run has members acting with their slab: the takeoff then lists studs and camber. */
    public boolean composite() {
        return composite.members() > 0;
    }

    /** Headed studs in all. */
    public int studs() {
        return lines.stream().mapToInt(Line::studs).sum();
    }

    /** Pieces cambered in all. */
    public int camberedPieces() {
        return lines.stream().mapToInt(Line::cambered).sum();
    }

    /**
     * Member and column weight the floors would take without composite action (each composite member at
     * its bare-steel design), N; equal to {@link #total()} for a run without composite members.
     */
    public double nonCompositeTotal() {
        return composite() ? composite.nonCompositeWeight() : total;
    }

    /** Floor area of every level, m². */
    public double floorArea() {
        return floorArea;
    }

    /** A weight in N as pounds (US) or kilograms (SI). */
    public static double weightIn(double newtons, UnitSystem us) {
        return RunSummary.weight(newtons, us);
    }

    /** "lb" or "kg". */
    public static String weightUnit(UnitSystem us) {
        return RunSummary.weightUnit(us);
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
     * The tidy table as CSV, for a spreadsheet: a header with the units in the column names, then one
     * row per section size × level × kind with its pieces, length and weight. Weights are whole pounds
     * (kilograms in SI), lengths to 0.01 ft (0.001 m). When the run has composite members two columns
     * follow: the studs on the line's pieces and the camber of each piece (in to 0.01, mm to 0.1). The
     * totals are {@link #totalsCsv(UnitSystem)}.
     */
    public String csv(UnitSystem us) {
        StringBuilder b = new StringBuilder();
        boolean comp = composite();
        b.append("section,level,kind,pieces,length[").append(ascii(us.length().symbol())).append("],weight[")
                .append(RunSummary.weightUnit(us)).append("]");
        if (comp) {
            b.append(",studs,camber[").append(ascii(us.smallLength().symbol())).append("]");
        }
        b.append('\n');
        for (Line l : lines) {
            b.append(csvText(l.section())).append(',').append(csvText(l.level())).append(',').append(l.kind()).append(',')
                    .append(l.pieces()).append(',').append(length(l.length(), us)).append(',').append(wholeWeight(l.weight(), us));
            if (comp) {
                b.append(',').append(l.studs()).append(',').append(camber(l.camber(), us));
            }
            b.append('\n');
        }
        return b.toString();
    }

    /** The totals as CSV: one quantity a row, with its value and unit. */
    public String totalsCsv(UnitSystem us) {
        StringBuilder b = new StringBuilder("quantity,value,unit\n");
        for (Total t : totals(us)) {
            b.append(csvText(t.quantity())).append(',').append(t.value()).append(',').append(csvText(t.unit())).append('\n');
        }
        return b.toString();
    }

    /**
     * One line of the totals: what, the value as text (already rounded for reading), its unit.
     *
     * @param number the value as a number, for a workbook cell
     */
    public record Total(String quantity, String value, double number, String unit) {
    }

    /** The totals in the order they are read: weights, the allowance, pieces, the floor area and weight per area. */
    public List<Total> totals(UnitSystem us) {
        String wu = RunSummary.weightUnit(us);
        boolean usc = us == UnitSystem.US;
        String tu = usc ? "short tons" : "tonnes";
        double area = us.floorArea().fromSi(floorArea);
        double bare = RunSummary.weight(total, us);
        double with = RunSummary.weight(grandTotal(), us);
        List<Total> out = new ArrayList<>();
        out.add(whole("members and columns", bare, wu));
        out.add(new Total("members and columns", tons(total, us), tonsValue(total, us), tu));
        out.add(new Total("connections and miscellaneous allowance", fmt(allowancePercent, 1), allowancePercent, "%"));
        out.add(whole("connections and miscellaneous allowance", RunSummary.weight(allowance(), us), wu));
        out.add(whole("total with allowance", with, wu));
        out.add(new Total("total with allowance", tons(grandTotal(), us), tonsValue(grandTotal(), us), tu));
        out.add(new Total("pieces", Integer.toString(pieces()), pieces(), "beams, girders and column tiers"));
        out.add(new Total("floor area", fmt(area, 0), Math.rint(area), ascii(us.floorArea().symbol())));
        String per = usc ? "lb/ft2" : "kg/m2";
        out.add(new Total("weight per floor area", fmt(area > 0 ? bare / area : 0, 2), area > 0 ? bare / area : 0, per));
        out.add(new Total("weight per floor area with allowance", fmt(area > 0 ? with / area : 0, 2), area > 0 ? with / area : 0,
                per));
        if (composite()) {
            // only for runs with composite members, so the totals of bare-steel runs read as before
            out.add(new Total("headed studs", Integer.toString(studs()), studs(), "studs"));
            out.add(new Total("cambered pieces", Integer.toString(camberedPieces()), camberedPieces(), "beams and girders"));
            out.add(whole("members and columns without composite action", RunSummary.weight(nonCompositeTotal(), us), wu));
            out.add(new Total("members and columns without composite action", tons(nonCompositeTotal(), us),
                    tonsValue(nonCompositeTotal(), us), tu));
            out.add(whole("steel saved by composite action", RunSummary.weight(nonCompositeTotal() - total, us), wu));
        }
        return out;
    }

    private static Total whole(String quantity, double value, String unit) {
        return new Total(quantity, fmt(value, 0), Math.rint(value), unit);
    }

    private static String tons(double newtons, UnitSystem us) {
        return fmt(tonsValue(newtons, us), 2);
    }

    private static double tonsValue(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? shortTons(newtons) : tonnes(newtons);
    }

    /** Length in the system's unit, to 0.01 ft or 0.001 m. */
    static String length(double metres, UnitSystem us) {
        return fmt(us.length().fromSi(metres), us == UnitSystem.US ? 2 : 3);
    }

    /** Camber in inches to 0.01 (mm to 0.1); 0 for none. */
    static String camber(double metres, UnitSystem us) {
        return fmt(us.smallLength().fromSi(metres), us == UnitSystem.US ? 2 : 1);
    }

    /** Weight in whole pounds or kilograms. */
    static String wholeWeight(double newtons, UnitSystem us) {
        return fmt(RunSummary.weight(newtons, us), 0);
    }

    /** A unit symbol a spreadsheet reads anywhere: ft² as ft2. */
    static String ascii(String unit) {
        return unit.replace("²", "2").replace("³", "3");
    }

    private static String fmt(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v + 0.0);
    }

    static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }


}
