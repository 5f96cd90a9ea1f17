package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.design.Check;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.report.RunSummary;
import org.baywright.run.RunResult;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/** The texts the window shows: status bar totals, the Properties rows of a member, the takeoff and calculation tabs. */
public final class Readouts {
    private Readouts() {
    }

    /** One labelled value of the Properties panel. */
    public record Row(String label, String value) {
    }

    /** Total steel weight, e.g. "Steel 312,400 lb (156.2 short tons)"; a dash before a run. */
    public static String steelWeight(RunResult run, UnitSystem us) {
        TakedownResult t = run == null ? null : run.takedown();
        if (t == null) {
            return "Steel —";
        }
        double w = weight(t.steelWeight(), us);
        return us == UnitSystem.US
                ? String.format(Locale.ROOT, "Steel %,.0f lb (%.1f short tons)", w, w / 2000)
                : String.format(Locale.ROOT, "Steel %,.0f kg (%.1f t)", w, w / 1000);
    }

    /** Steel weight per floor area, e.g. "8.41 lb/ft² of floor". */
    public static String weightPerArea(RunResult run, UnitSystem us) {
        TakedownResult t = run == null ? null : run.takedown();
        if (t == null || !(t.floorArea() > 0)) {
            return "— per floor area";
        }
        double per = weight(t.steelWeight(), us) / us.floorArea().fromSi(t.floorArea());
        return String.format(Locale.ROOT, "%.2f %s of floor", per, us == UnitSystem.US ? "lb/ft²" : "kg/m²");
    }

    /** The highest demand/capacity ratio, e.g. "Highest ratio 0.97". */
    public static String highestRatio(RunResult run) {
        TakedownResult t = run == null ? null : run.takedown();
        return t == null ? "Highest ratio —" : String.format(Locale.ROOT, "Highest ratio %.2f", RunSummary.maxRatio(t));
    }

    /** A ratio as printed on the plan and in Properties: two decimals, a dash when not designed. */
    public static String ratio(double r) {
        return Double.isNaN(r) ? "—" : String.format(Locale.ROOT, "%.2f", r);
    }

    private static double weight(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? newtons / Units.NEWTONS_PER_POUND : newtons / Units.STANDARD_GRAVITY;
    }

    /** The Properties rows of a member, with the reactions factored by LRFD. */
    public static List<Row> member(MemberResult m, UnitSystem us) {
        return member(m, us, DesignMethod.LRFD);
    }

    /**
     * An overhanging member's parts: "backspan 35.00 ft, overhang 6.00 ft past its second support (tip deflection
     * limit taken on twice the overhang)".
     */
    static String overhang(MemberResult m, UnitSystem us) {
        double a = m.loads().supportA();
        double b = m.loads().supportB();
        double l = m.loads().span();
        List<String> parts = new ArrayList<>();
        parts.add("backspan " + UnitSystem.format(b - a, us.length(), 2));
        if (a > 0) {
            parts.add("overhang " + UnitSystem.format(a, us.length(), 2) + " before its first support");
        }
        if (l - b > 0) {
            parts.add("overhang " + UnitSystem.format(l - b, us.length(), 2) + " past its second support");
        }
        return String.join(", ", parts) + "\n(tip deflection limit on twice the overhang, IBC Table 1604.3 note;"
                + " K_LL = 1; live load patterned, ASCE 7-16 §4.3.3)";
    }

    /**
     * The Properties rows of a member: identity, size, status, ratios, the loads on its span and its
     * end reactions. Every force says what it is: the span's loads are service loads with the live
     * load shown both unreduced (L0) and reduced (L, with the member's factor, ASCE 7-16 §4.7) as the
     * design took it; the end reactions are service loads by case with the live load unreduced (what
     * passes on to the support), then the largest factored reaction of {@code method}'s combinations
     * with the combination that gives it.
     */
    public static List<Row> member(MemberResult m, UnitSystem us, DesignMethod method) {
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("Member", m.id()));
        rows.add(new Row("Kind", m.kind().name().toLowerCase(Locale.ROOT)));
        rows.add(new Row("Section", m.section().isEmpty() ? "—" : m.section()));
        rows.add(new Row("Status", m.status().label()));
        rows.add(new Row("Length", UnitSystem.format(m.length(), us.length(), 2)));
        if (m.overhangs()) {
            rows.add(new Row("Overhang", overhang(m, us)));
        }
        rows.add(new Row("Tributary area", UnitSystem.format(m.tributaryArea(), us.floorArea(), 0)));
        rows.add(new Row("Reduction area", UnitSystem.format(m.reductionArea(), us.floorArea(), 0)
                + String.format(java.util.Locale.ROOT, "  (live × %.2f)", m.liveFactor())));
        if (m.loads() != null) {
            rows.add(new Row("Span loads, service", spanLoads(m, us)));
        }
        rows.add(new Row("Highest ratio", ratio(m.maxRatio())));
        if (m.design() != null) {
            for (Check c : m.design().checks()) {
                rows.add(new Row("  " + c.name(), ratio(c.ratio()) + (c.combination().isEmpty() ? "" : "  (" + c.combination() + ")")));
            }
        }
        rows.add(new Row("Start reaction, service", reactions(m.startReaction(), us) + LIVE_UNREDUCED));
        rows.add(new Row("Start reaction, " + factoredWord(method), factored(Component.byCase(m.startReaction()), method, us)
                + LIVE_UNREDUCED));
        rows.add(new Row("End reaction, service", reactions(m.endReaction(), us) + LIVE_UNREDUCED));
        rows.add(new Row("End reaction, " + factoredWord(method), factored(Component.byCase(m.endReaction()), method, us)
                + LIVE_UNREDUCED));
        rows.add(new Row("Start support", m.startSupport().isEmpty() ? "none" : m.startSupport()));
        rows.add(new Row("End support", m.endSupport().isEmpty() ? "none" : m.endSupport()));
        return rows;
    }

    /**
     * A member as the framing plan names it: the size, then the stud count in brackets and the camber, e.g.
     * {@code W16X26 (16) c=3/4"}; a fixed size is in square brackets as on the plan; a bare-steel member is its
     * size alone. The drawings' own notation ({@link org.baywright.report.drawing.MemberLabels}), so the
     * canvas, Properties and the framing plan write it alike.
     */
    public static String planNotation(MemberResult m, UnitSystem us, boolean fixed) {
        String size = m.section().isEmpty() ? "" : fixed ? "[" + m.section() + "]" : m.section();
        return size.isEmpty() || !m.isComposite() ? size
                : org.baywright.report.drawing.MemberLabels.size(size, m.studs(), m.camber(), us);
    }

    /** A camber as the drawings write it ({@code 3/4"}, {@code 1 1/4"}, {@code 19 mm}). */
    static String camber(double metres, UnitSystem us) {
        return org.baywright.report.drawing.MemberLabels.camber(metres, us);
    }

    /**
     * The Properties rows of a composite member (AISC 360-16 Chapter I): effective width by side, the studs
     * and their strength, the degree of composite action, where the plastic neutral axis lies, the
     * construction stage, the camber, the lower-bound moment of inertia and the bare-steel section the
     * member would take without the slab. Empty for a bare-steel member.
     */
    public static List<Row> composite(MemberResult m, UnitSystem us) {
        List<Row> rows = new ArrayList<>();
        var c = m.composite();
        if (c == null || c.design() == null) {
            return rows;
        }
        var d = c.design();
        rows.add(new Row("Composite", "acts with the slab of " + c.deck() + ", ribs " + c.ribs()
                + (c.shored() ? ", shored" : ", unshored")));
        if (d.section() == null) {
            rows.add(new Row("Composite design", "no section and stud count passes"));
            return rows;
        }
        rows.add(new Row("Effective width b_eff", UnitSystem.format(d.beff(), us.smallLength(), 1) + "  (left "
                + UnitSystem.format(d.beffLeft(), us.smallLength(), 1) + ", right " + UnitSystem.format(d.beffRight(), us.smallLength(), 1)
                + "; I3.1a)"));
        rows.add(new Row("Studs", d.studs() + " (" + d.studsPerHalf() + " each side of mid-span)"));
        rows.add(new Row("Stud strength Q_n", UnitSystem.format(d.qn(), us.force(), 2) + " (I8-1)"));
        rows.add(new Row("ΣQ_n", UnitSystem.format(d.sumQn(), us.force(), 1)));
        var f = d.flexure();
        if (f != null) {
            rows.add(new Row("Composite action", String.format(Locale.ROOT, "%.0f %% of full", 100 * f.degree())));
            rows.add(new Row("Plastic neutral axis", pna(f, us)));
        }
        rows.add(new Row("Construction stage", c.shored() ? "none (shored)" : ratio(d.constructionRatio())
                + " (bare steel, wet concrete and construction live load)"));
        rows.add(new Row("Camber", d.camber() > 0 ? camber(d.camber(), us)
                + "  (bare-steel deflection under wet concrete " + UnitSystem.format(d.preDeflection(), us.smallLength(), 2) + ")"
                : c.shored() ? "none (shored)" : "none"));
        rows.add(new Row("I_LB", UnitSystem.format(d.ilb(), us.inertia(), 0) + " (Commentary Eq. C-I3-1)"));
        var bare = c.bare();
        if (bare != null && bare.section() != null) {
            double w = us.weightPerLength(m.composite().bareWeightPerLength()) - us.weightPerLength(d.section().weight());
            rows.add(new Row("Bare steel instead", bare.section().designation() + String.format(Locale.ROOT, "  (%+.0f %s)",
                    w, us == UnitSystem.US ? "lb/ft" : "kg/m") + "  " + ratio(bare.maxRatio())));
        } else {
            rows.add(new Row("Bare steel instead", "no section passes without the slab"));
        }
        return rows;
    }

    /** Where the plastic neutral axis lies: in the slab, or at a depth below the top of the steel (flange or web). */
    static String pna(org.baywright.design.aisc360.CompositeFlexureI3.Result f, UnitSystem us) {
        return switch (f.pna()) {
            case SLAB -> "in the slab, " + UnitSystem.format(-f.pnaDepth(), us.smallLength(), 2) + " above the steel";
            case TOP_FLANGE -> "in the top flange, " + UnitSystem.format(f.pnaDepth(), us.smallLength(), 2) + " below its top";
            case WEB -> "in the web, " + UnitSystem.format(f.pnaDepth(), us.smallLength(), 2) + " below the top of the steel";
        };
    }

    /** Said after reactions whose live load is not reduced. */
    static final String LIVE_UNREDUCED = "\n(live load unreduced)";

    /** "factored" (LRFD) or "ASD" (ASD's combinations are not factored up). */
    static String factoredWord(DesignMethod method) {
        return method == DesignMethod.LRFD ? "factored" : "ASD";
    }

    /**
     * The member's service loads on its span by case, a line each: dead load (self-weight is added by
     * the design), live load unreduced as L0 and reduced as L with the factor, roof live, snow.
     * The unreduced live load is the sum of the end reactions' live load (the takedown passes live
     * load on unreduced), which for a simple span is the live load on it.
     */
    static String spanLoads(MemberResult m, UnitSystem us) {
        List<String> lines = new ArrayList<>();
        double[] unreduced = Component.byCase(m.startReaction());
        double[] end = Component.byCase(m.endReaction());
        for (int i = 0; i < unreduced.length; i++) {
            unreduced[i] += end[i];
        }
        for (LoadCase lc : m.loads().present()) {
            var span = m.loads().of(lc);
            String n = span.loads().size() > 1 ? ", " + span.loads().size() + " loads" : "";
            String v = UnitSystem.format(span.totalLoad(), us.force(), 1);
            if (lc == LoadCase.D) {
                lines.add("D " + v + " + self-weight" + n);
            } else if (lc == LoadCase.L) {
                lines.add("L0 " + UnitSystem.format(unreduced[LoadCase.L.ordinal()], us.force(), 1) + " unreduced");
                lines.add("L " + v + String.format(Locale.ROOT, " reduced (× %.2f)", m.liveFactor()) + n);
            } else {
                lines.add(lc.symbol() + " " + v + n);
            }
        }
        return lines.isEmpty() ? "none" : String.join("\n", lines);
    }

    /**
     * The largest reaction of the method's gravity combinations for forces by case, with the
     * combination that gives it: "28.4 kip (1.2D + 1.6L)".
     */
    static String factored(double[] byCase, DesignMethod method, UnitSystem us) {
        java.util.Set<LoadCase> present = java.util.EnumSet.of(LoadCase.D);
        for (LoadCase c : LoadCase.values()) {
            if (byCase[c.ordinal()] != 0) {
                present.add(c);
            }
        }
        double best = Double.NEGATIVE_INFINITY;
        String name = "";
        for (org.baywright.load.LoadCombination combo : org.baywright.load.Combinations.gravity(method, present)) {
            double v = 0;
            for (LoadCase c : LoadCase.values()) {
                v += combo.factor(c) * byCase[c.ordinal()];
            }
            if (v > best) {
                best = v;
                name = combo.name();
            }
        }
        return UnitSystem.format(best, us.force(), 1) + " (" + name + ")";
    }

    /** Unreduced reactions by load case, non-zero cases only: "D 12.3 kip, L 10.1 kip". */
    static String reactions(double[] components, UnitSystem us) {
        return byCase(Component.byCase(components), us);
    }

    /**
     * Forces already summed by load case (indexed by {@link LoadCase#ordinal()}, as a column's
     * foundation reaction), non-zero cases only: "D 120.4 kip, L 88.0 kip".
     */
    static String byCase(double[] byCase, UnitSystem us) {
        List<String> parts = new ArrayList<>();
        for (LoadCase lc : LoadCase.values()) {
            if (byCase[lc.ordinal()] != 0) {
                parts.add(lc.symbol() + " " + UnitSystem.format(byCase[lc.ordinal()], us.force(), 1));
            }
        }
        return parts.isEmpty() ? "0" : String.join(", ", parts);
    }

    /** The non-zero values of a load, each with its case symbol, in a unit: "SD 15 psf, L 100 psf". */
    static String values(org.baywright.plan.LoadValues v, org.baywright.units.Unit unit, int decimals) {
        List<String> parts = new ArrayList<>();
        String[] names = {"D", "SD", "L", "Lr", "S", "partitions"};
        double[] xs = {v.dead(), v.superimposed(), v.live(), v.roofLive(), v.snow(), v.partition()};
        for (int i = 0; i < xs.length; i++) {
            if (xs[i] != 0) {
                parts.add(names[i] + " " + UnitSystem.format(xs[i], unit, decimals));
            }
        }
        return parts.isEmpty() ? "no load" : String.join(", ", parts);
    }

    /** An area load's values. */
    public static String areaLoad(org.baywright.plan.LoadValues v, UnitSystem us) {
        return values(v, us.areaLoad(), us == UnitSystem.US ? 0 : 2);
    }

    /** A line load's values. */
    public static String lineLoad(org.baywright.plan.LoadValues v, UnitSystem us) {
        return values(v, us.lineLoad(), 2);
    }

    /** A point load's values. */
    public static String force(org.baywright.plan.LoadValues v, UnitSystem us) {
        return values(v, us.force(), 1);
    }

    /** Reactions for the canvas, numbers only in kip or kN, non-zero cases: "D13.5 L12.3". */
    public static String compactReactions(double[] components, UnitSystem us) {
        double[] byCase = Component.byCase(components);
        List<String> parts = new ArrayList<>();
        for (LoadCase lc : LoadCase.values()) {
            double v = byCase[lc.ordinal()];
            if (v != 0) {
                parts.add(lc.symbol() + String.format(Locale.ROOT, "%.1f", us.force().fromSi(v)));
            }
        }
        return String.join(" ", parts);
    }
    /** The takeoff's totals under its table: short tons and tonnes, the weight per floor area and a note. */
    public static String takeoffTotals(org.baywright.report.Takeoff t, RunResult run, UnitSystem us) {
        double tons = org.baywright.report.Takeoff.shortTons(t.total());
        double tonnes = org.baywright.report.Takeoff.tonnes(t.total());
        String total = us == UnitSystem.US ? String.format(Locale.ROOT, "%.2f short tons (%.2f tonnes)", tons, tonnes)
                : String.format(Locale.ROOT, "%.2f tonnes (%.2f short tons)", tonnes, tons);
        return "Total " + total + ", " + t.pieces() + " pieces\n" + weightPerArea(run, us)
                + "\nWithout a connection allowance. File › Export › Takeoff writes a workbook or CSV by size,"
                + " level and kind, with the allowance you choose.";
    }

    /** The Takeoff tab's views of its table. */
    public enum TakeoffView {
        SIZE("By size", "Size"), KIND("By kind", "Kind"), LEVEL("By level", "Level");

        private final String label;
        private final String heading;

        TakeoffView(String label, String heading) {
            this.label = label;
            this.heading = heading;
        }

        /** The choice's text, e.g. "By level". */
        public String label() {
            return label;
        }

        /** The heading of the table's first column, e.g. "Level". */
        public String heading() {
            return heading;
        }

        @Override
        public String toString() {
            return label;
        }
    }

    /** The rows of a takeoff in one view: by section size, by kind of member, or by level (bottom first). */
    public static List<org.baywright.report.Takeoff.Row> takeoffRows(org.baywright.report.Takeoff t, TakeoffView view) {
        return switch (view) {
            case SIZE -> t.bySection();
            case KIND -> t.byKind();
            case LEVEL -> t.byLevel();
        };
    }

    /** The heading of the takeoff's weight column: "Short tons" in a US plan, "Tonnes" in an SI plan. */
    public static String takeoffWeightHeading(UnitSystem us) {
        return us == UnitSystem.US ? "Short tons" : "Tonnes";
    }

    /** A takeoff row's weight as a number in the unit of {@link #takeoffWeightHeading}: short tons (US) or tonnes (SI). */
    public static String takeoffWeight(double newtons, UnitSystem us) {
        return String.format(Locale.ROOT, "%.2f", us == UnitSystem.US ? org.baywright.report.Takeoff.shortTons(newtons)
                : org.baywright.report.Takeoff.tonnes(newtons));
    }

    /**
     * The Calculation tab's text: the selected member's calculation sheet (the equations the run used,
     * with their numbers and clauses) and the caution; a prompt when nothing is selected.
     */
    public static String calculationSheet(java.util.Optional<MemberResult> selected, UnitSystem us) {
        if (selected.isEmpty()) {
            return "Select a member to see its calculation sheet: the equations the run used, with"
                    + " their numbers and clauses.\n\n" + org.baywright.calc.Caution.TEXT;
        }
        MemberResult m = selected.get();
        var calc = m.calculation();
        if (calc == null) {
            return m.id() + " was not designed (" + m.status().label() + ").";
        }
        StringBuilder b = new StringBuilder(m.id() + "  " + m.section() + "\n\n");
        for (var line : calc.lines()) {
            b.append(org.baywright.calc.CalcFormat.render(line, us)).append('\n');
        }
        return b.append('\n').append(org.baywright.calc.Caution.TEXT).toString();
    }
}
