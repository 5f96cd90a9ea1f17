package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Quantity;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.BeamLoads;
import org.baywright.design.Check;
import org.baywright.design.MemberStatus;
import org.baywright.design.Rejection;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.MemberKind;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * The member calculation sheets: one part per floor layout, one sheet per group of identical members
 * ({@link MemberGroups}), each starting on a new page.
 */
final class MemberSheets {
    /** Lighter sections listed one by one; the lighter ones are summarised by governing check. */
    static final int REJECTED_LISTED = 8;
    private static final float REF_COLUMN = 128;

    private MemberSheets() {
    }

    /** Writes every floor layout's sheets; returns {sheets, members covered}. */
    static int[] write(Context cx) {
        int sheets = 0;
        int members = 0;
        for (String floor : MemberGroups.floorOrder(cx.run)) {
            List<MemberResult> ms = cx.run.takedown().members().getOrDefault(floor, List.of());
            List<MemberGroups.Group> groups = MemberGroups.of(floor, ms);
            if (groups.isEmpty()) {
                continue;
            }
            int part = cx.part("Member sheets: floor layout " + Summaries.floorLabel(cx, floor));
            PageFlow f = cx.flow;
            f.paragraph(f.body, groups.size() + " sheet" + (groups.size() == 1 ? "" : "s") + " for "
                    + groups.stream().mapToInt(g -> g.members().size()).sum() + " designed members of this floor layout"
                    + " (members with the same section, span, criteria and loads share a sheet).");
            f.gap(4);
            index(cx, part, groups);
            int n = 0;
            for (MemberGroups.Group g : groups) {
                n++;
                sheet(cx, part + "." + n, g);
                sheets++;
                members += g.members().size();
            }
        }
        return new int[] {sheets, members};
    }

    /** Short table of the part's sheets. */
    private static void index(Context cx, int part, List<MemberGroups.Group> groups) {
        Table t = new Table().left("Sheet", 7).left("Section", 10).left("Kind", 8).right("Span", 9).right("Ratio", 7)
                .left("Governs", 16).left("Members", 60).fontSize(7f);
        int n = 0;
        for (MemberGroups.Group g : groups) {
            n++;
            MemberResult m = g.first();
            Check gov = m.design().governing();
            t.row(part + "." + n, label(m, cx.us), kind(m.kind(), 1), Fmt.v(m.length(), Quantity.SPAN_LENGTH, cx.us),
                    Fmt.ratio(m.maxRatio()), gov == null ? "" : gov.name(), String.join(", ", g.ids()));
        }
        t.draw(cx.flow);
    }

    static String kind(MemberKind k, int count) {
        String s = k == MemberKind.GIRDER ? "girder" : "beam";
        return count == 1 ? s : s + "s";
    }

    /** The sheet title as printed in the heading and in the contents. */
    static String title(String number, MemberResult m, int count, UnitSystem us) {
        String k = kind(m.kind(), count);
        return number + " " + label(m, us) + " " + k + ", span " + Fmt.v(m.length(), Quantity.SPAN_LENGTH, us)
                + (count > 1 ? " (" + count + " members)" : " (" + m.id() + ")");
    }

    /** The section as the sheet names it: W21X50, or for a composite member W21X50 (46) c=2" as on the plan. */
    static String label(MemberResult m, UnitSystem us) {
        return m.isComposite() ? org.baywright.report.drawing.MemberLabels.size(m.section(), m.studs(), m.camber(), us) : m.section();
    }

    static void sheet(Context cx, String number, MemberGroups.Group g) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        MemberResult m = g.first();
        BeamDesign d = m.design();
        BeamLoads loads = m.loads();
        BeamCriteria cr = m.criteria();
        String title = title(number, m, g.members().size(), us);
        f.runningTitle("Sheet " + number + ": " + label(m, us) + " " + kind(m.kind(), g.members().size()));
        f.newPage();
        cx.mark(title, g.members().size() > 1 ? String.join(", ", g.ids()) : "");
        f.heading2(title, 30);
        f.paragraph(f.small, (g.members().size() == 1 ? "Member: " : "Members: ") + String.join(", ", g.ids()));
        f.gap(3);

        List<String[]> facts = new ArrayList<>();
        facts.add(new String[] {"Floor layout", Summaries.floorLabel(cx, g.floor())});
        facts.add(new String[] {"Status", m.status().label() + (m.status() == MemberStatus.OVERSTRESSED
                ? ": no catalog section passes" : "")});
        facts.add(new String[] {"Section", m.section() + ", " + Fmt.weightPerLength(d.section().weight(), us)
                + ", d = " + Fmt.v(d.section().depth(), Quantity.SECTION_LENGTH, us)});
        facts.add(new String[] {"Span", Fmt.v(m.length(), Quantity.SPAN_LENGTH, us)
                + (us == UnitSystem.US ? " (" + UnitSystem.feetInches(m.length(), 16) + ")" : "") + (m.overhangs()
                        ? ", overhanging a support: backspan " + Fmt.v(loads.supportB() - loads.supportA(), Quantity.SPAN_LENGTH, us)
                                + ", overhang " + Fmt.v(Math.max(loads.supportA(), m.length() - loads.supportB()), Quantity.SPAN_LENGTH, us)
                                + " (cantilever with backspan; live load patterned, ASCE 7-16 §4.3.3)"
                        : ", simply supported")});
        facts.add(new String[] {"First member", m.id() + " from " + Fmt.point(m.start(), us) + " to " + Fmt.point(m.end(), us)});
        facts.add(new String[] {"Supported by", blank(m.startSupport()) + " (start), " + blank(m.endSupport()) + " (end)"});
        facts.add(new String[] {"Method", cr.method() + ", " + cr.steel().name() + ", Fy = " + Fmt.v(cr.steel().fy(), Quantity.STRESS, us)});
        facts.add(new String[] {"Bracing", m.overhangs() ? "top flange by the deck; bottom flange (in compression over the"
                + " support and on the overhang) braced at the support only, Cb = 1.0 there (common practice)" : cr.bracing().describe()});
        facts.add(new String[] {"Tributary area", Fmt.v(m.tributaryArea(), Quantity.FLOOR_AREA, us) + " of deck carried directly"});
        facts.add(new String[] {"Live reduction", liveReduction(m, us)});
        facts.add(new String[] {"Deflection limits", FrontMatter.limit(cr.deflection().live()) + " live, "
                + FrontMatter.limit(cr.deflection().total()) + " total" + (cr.deflection().row().isEmpty() ? ""
                        : " (" + DeflectionLimits.SOURCE + ", " + cr.deflection().row() + ")")});
        facts.add(new String[] {"Own weight", cr.selfWeight() ? "added to D by the check (line wsw)" : "not added (taken as included in D)"});
        f.pairs2(facts, 74);
        f.gap(2);

        loadsBlock(cx, loads);
        reactions(cx, m);
        forces(cx, m);
        CompositeSection.write(cx, m);
        calculation(cx, m);
        checks(cx, d);
        rejected(cx, d);
    }

    private static String blank(String s) {
        return s == null || s.isEmpty() ? "none" : s;
    }

    // ---- loads -------------------------------------------------------------------------------

    private static void loadsBlock(Context cx, BeamLoads loads) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        f.heading3("Service loads (live load reduced; own weight not included)", 50);
        Table t = new Table().left("Case", 6).left("Load", 12).right("From x", 11).right("To x", 11).right("Intensity or force", 30)
                .right("Total", 14).fontSize(7f);
        int rows = 0;
        for (LoadCase c : LoadCase.values()) {
            for (SpanLoad l : loads.of(c).loads()) {
                if (l instanceof DistributedLoad dl && (dl.wStart() != 0 || dl.wEnd() != 0)) {
                    String w = dl.wStart() == dl.wEnd() ? Fmt.v(dl.wStart(), Quantity.LINE_LOAD, us)
                            : Fmt.v(dl.wStart(), Quantity.LINE_LOAD, us) + " to " + Fmt.v(dl.wEnd(), Quantity.LINE_LOAD, us);
                    t.row(c.symbol(), dl.wStart() == dl.wEnd() ? "uniform" : "linear", Fmt.v(dl.start(), Quantity.SPAN_LENGTH, us),
                            Fmt.v(dl.end(), Quantity.SPAN_LENGTH, us), w, Fmt.v(dl.total(), Quantity.FORCE, us));
                    rows++;
                } else if (l instanceof PointLoad p && p.force() != 0) {
                    t.row(c.symbol(), "point", Fmt.v(p.position(), Quantity.SPAN_LENGTH, us), "",
                            Fmt.v(p.force(), Quantity.FORCE, us), Fmt.v(p.force(), Quantity.FORCE, us));
                    rows++;
                }
            }
        }
        if (rows == 0) {
            t.row("", "none");
        }
        t.draw(f);
        SpanDiagrams.loads(f, loads, us);
        f.gap(2);
    }

    private static void reactions(Context cx, MemberResult m) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        f.heading3("End reactions (service, live load unreduced, own weight in D) [" + Fmt.unit(Quantity.FORCE, us) + "]", 40);
        double[] a = Component.byCase(m.startReaction());
        double[] b = Component.byCase(m.endReaction());
        Table t = new Table().left("End", 34).right("D", 12).right("L", 12).right("Lr", 12).right("S", 12).fontSize(7f)
                .width(f.width() * 0.75f);
        t.row("start: " + blank(m.startSupport()), n(a[0], us), n(a[1], us), n(a[2], us), n(a[3], us));
        t.row("end: " + blank(m.endSupport()), n(b[0], us), n(b[1], us), n(b[2], us), n(b[3], us));
        t.draw(f);
    }

    private static String n(double v, UnitSystem us) {
        return v == 0 ? "–" : us.forceNumber(v);
    }

    // ---- shear and moment --------------------------------------------------------------------

    /** The strength combination that governs flexure (falls back on the first one). */
    static LoadCombination governingCombination(MemberResult m) {
        for (Check c : m.design().checks()) {
            if ((c.name().equals("flexure") || c.name().equals("composite flexure")) && c.loadCombination() != null) {
                return c.loadCombination();
            }
        }
        return Combinations.gravity(m.criteria().method(), m.loads().present()).get(0);
    }

    /** The span under a combination, with the section's own weight as the check adds it. */
    static SimpleSpan factored(MemberResult m, LoadCombination combo) {
        BeamLoads loads = m.loads();
        LoadCase[] cases = LoadCase.values();
        SimpleSpan[] spans = new SimpleSpan[cases.length];
        double[] fac = new double[cases.length];
        for (int i = 0; i < cases.length; i++) {
            spans[i] = loads.of(cases[i]);
            fac[i] = combo.factor(cases[i]);
        }
        SimpleSpan s = SimpleSpan.combine(fac, spans);
        double w = m.criteria().selfWeight() ? m.design().section().weight() * combo.factor(LoadCase.D) : 0;
        if (w != 0) {
            s = s.plus(SimpleSpan.of(loads.span(), List.of(DistributedLoad.full(loads.span(), w))));
        }
        return s;
    }

    private static void forces(Context cx, MemberResult m) {
        if (m.overhangs()) {
            overhangForces(cx, m);
            return;
        }
        PageFlow f = cx.flow;
        LoadCombination c = governingCombination(m);
        f.heading3("Shear and moment under " + c.name() + (m.criteria().method() == DesignMethod.LRFD ? ", factored" : "")
                + (m.criteria().selfWeight() ? ", own weight included" : "") + " (governs flexure)",
                SpanDiagrams.forceHeight());
        SpanDiagrams.forces(f, factored(m, c), cx.us);
        f.gap(2);
    }

    /**
     * An overhanging member: its statics under each live-load pattern of the combination that governs
     * flexure (AISC Manual Table 3-23 overhang cases, solved for the actual loads; ASCE 7-16 §4.3.3).
     */
    private static void overhangForces(Context cx, MemberResult m) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        org.baywright.design.OverhangDesigner o = new org.baywright.design.OverhangDesigner(m.loads(), m.criteria());
        LoadCombination c = governingCombination(m);
        int ci = Math.max(0, o.combinations().indexOf(c));
        double w = m.criteria().selfWeight() ? m.design().section().weight() : 0;
        f.heading3("Overhang statics under " + c.name() + (m.criteria().method() == DesignMethod.LRFD ? ", factored" : "")
                + (m.criteria().selfWeight() ? ", own weight included" : "") + ", by live-load pattern (ASCE 7-16 §4.3.3) ["
                + Fmt.unit(Quantity.FORCE, us) + ", " + Fmt.unit(Quantity.MOMENT, us) + "]", 40);
        Table t = new Table().left("Pattern", 46).right("R1", 12).right("R2", 12).right("M sagging", 14).right("M over support", 16)
                .fontSize(7f);
        for (int p = 0; p < o.patternCount(); p++) {
            org.baywright.analysis.OverhangSpan s = o.statics(ci, p, w);
            double sag = s.extremeMoment(s.supportA(), s.supportB(), false).value();
            double hog = s.extremeMoment(0, s.length(), true).value();
            t.row(o.patternText(p), Fmt.n(s.reactionA(), Quantity.FORCE, us), Fmt.n(s.reactionB(), Quantity.FORCE, us),
                    Fmt.n(sag, Quantity.MOMENT, us), Fmt.n(hog, Quantity.MOMENT, us));
        }
        t.draw(f);
        f.paragraph(f.small, "R1, R2: reactions at the first and second support (a negative value is uplift). "
                + org.baywright.design.OverhangDesigner.BRACING_ASSUMPTION + " Tip deflection limits take l = 2 × the overhang"
                + " (IBC Table 1604.3, footnote).");
        f.gap(2);
    }

    // ---- calculation lines -------------------------------------------------------------------

    private static void calculation(Context cx, MemberResult m) {
        PageFlow f = cx.flow;
        Calc calc = m.calculation();
        f.heading3("Calculation", 60);
        f.paragraph(f.smallGrey, "As recorded by the design engine while checking " + m.section()
                + ": symbol = formula = numbers = result, clause on the right.");
        if (calc == null) {
            f.paragraph(f.body, "No calculation: the member was not designed.");
            return;
        }
        List<CalcLine> lines = calc.lines();
        for (int i = 0; i < lines.size(); i++) {
            CalcLine l = lines.get(i);
            if (l.kind() == CalcLine.Kind.HEADING) {
                // keep a heading with the next line
                float next = i + 1 < lines.size() ? 2 * f.body.leading() : 0;
                f.gap(3);
                f.ensure(f.bold.leading() + next);
                f.lineOf(f.bold.withColor(Rgb.ACCENT), f.left(), CalcFormat.render(l, cx.us));
            } else {
                calcLine(f, l, cx.us);
            }
        }
    }

    /** One calculation line: the rendered text, wrapped with a hanging indent, its clause in the right column. */
    static void calcLine(PageFlow f, CalcLine l, UnitSystem us) {
        String full = CalcFormat.render(l, us);
        String ref = l.reference() == null ? "" : l.reference();
        String suffix = "  (" + ref + ")";
        String main = full;
        if (!ref.isEmpty() && full.endsWith(suffix)) {
            main = full.substring(0, full.length() - suffix.length());
        } else {
            ref = "";
        }
        Style s = l.kind() == CalcLine.Kind.BRANCH || l.kind() == CalcLine.Kind.NOTE ? f.body.withColor(new Rgb(0.15f, 0.3f, 0.45f))
                : f.body;
        float indent = 8;
        float hang = 22;
        float w = f.width() - REF_COLUMN - indent;
        List<String> lines = f.wrap(s, main, w, w - (hang - indent));
        List<String> refs = ref.isEmpty() ? List.of() : f.wrap(f.smallGrey, ref, REF_COLUMN - 6);
        int n = Math.max(lines.size(), refs.size());
        f.ensure(n * s.leading()); // a line is never split across pages
        for (int k = 0; k < n; k++) {
            float base = f.y() - s.size();
            if (k < lines.size()) {
                f.text(s, f.left() + (k == 0 ? indent : hang), base, lines.get(k));
            }
            if (k < refs.size()) {
                f.textRight(f.smallGrey, f.right(), base, refs.get(k));
            }
            f.y(f.y() - s.leading());
        }
    }

    // ---- checks and rejections ---------------------------------------------------------------

    private static void checks(Context cx, BeamDesign d) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        f.heading3("Checks of " + d.section().designation(), 50);
        Table t = new Table().left("Check", 16).left("Combination", 15).right("Demand", 13).right("Capacity", 13)
                .right("Ratio", 8).left("Where", 20).left("Clause", 18).fontSize(7f);
        for (Check c : d.checks()) {
            List<String> where = new ArrayList<>();
            if (Double.isFinite(c.position())) {
                where.add("x = " + Fmt.v(c.position(), Quantity.SPAN_LENGTH, us));
            }
            if (Double.isFinite(c.lb())) {
                where.add("Lb = " + Fmt.v(c.lb(), Quantity.SPAN_LENGTH, us));
            }
            if (Double.isFinite(c.cb())) {
                where.add("Cb = " + CalcFormat.sig(c.cb()));
            }
            if (c.note() != null && !c.note().isEmpty()) {
                where.add(c.note());
            }
            String[] cells = {c.name(), c.combination(), Fmt.v(c.demand(), c.quantity(), us), Fmt.v(c.capacity(), c.quantity(), us),
                    Fmt.ratio(c.ratio()) + (c.passes() ? "" : " ✗"), String.join(", ", where), c.clause()};
            if (c.passes()) {
                t.row(cells);
            } else {
                t.colored(Rgb.FAIL, cells);
            }
        }
        t.draw(f);
        Check g = d.governing();
        if (g != null) {
            f.paragraph(f.small, "Governing: " + g.name() + ", ratio " + Fmt.ratio(g.ratio())
                    + (g.passes() ? " ≤ 1.0: the section is adequate." : " > 1.0: the section is NOT adequate."));
        }
    }

    private static void rejected(Context cx, BeamDesign d) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        List<Rejection> rs = d.rejected();
        if (d.status() == MemberStatus.FIXED_SIZE || (rs.isEmpty() && d.candidates() <= 1)) {
            f.heading3("Lighter sections", 20);
            f.paragraph(f.small, "The size was fixed in the plan: it was checked, not searched.");
            return;
        }
        f.heading3("Lighter sections rejected, nearest first (" + rs.size() + " of " + d.candidates() + " candidates)", 40);
        if (rs.isEmpty()) {
            f.paragraph(f.small, "None: " + d.section().designation() + " is the lightest candidate the filters allow.");
            return;
        }
        int from = Math.max(0, rs.size() - REJECTED_LISTED);
        Table t = new Table().left("Section", 12).right("Weight", 12).left("Fails", 24).right("Ratio", 9).left("Combination", 18)
                .left("Clause", 20).fontSize(7f);
        for (int i = rs.size() - 1; i >= from; i--) {
            Rejection r = rs.get(i);
            Check c = r.governing();
            t.row(r.section().designation(), Fmt.weightPerLength(r.section().weight(), us), c.name(), Fmt.ratio(c.ratio()),
                    c.combination(), c.clause());
        }
        t.draw(f);
        if (from > 0) {
            Map<String, double[]> by = new LinkedHashMap<>();
            for (int i = 0; i < from; i++) {
                Check c = rs.get(i).governing();
                double[] s = by.computeIfAbsent(c.name(), k -> new double[] {0, Double.POSITIVE_INFINITY, 0});
                s[0]++;
                s[1] = Math.min(s[1], c.ratio());
                s[2] = Math.max(s[2], c.ratio());
            }
            StringBuilder b = new StringBuilder("The " + from + " lighter sections (" + rs.get(0).section().designation()
                    + " to " + rs.get(from - 1).section().designation() + ") fail too: ");
            int k = 0;
            for (var e : by.entrySet()) {
                b.append(k++ == 0 ? "" : "; ").append(e.getKey()).append(" governs ").append((int) e.getValue()[0])
                        .append(" (ratios ").append(Fmt.ratio(e.getValue()[1])).append(" to ").append(Fmt.ratio(e.getValue()[2]))
                        .append(")");
            }
            f.paragraph(f.small, b.append('.').toString());
        }
    }

    /**
     * The live-load reduction the member was designed with, per load case it carries: floor live L by
     * ASCE 7-16 §4.7 (A_T, K_LL, L/L0) and roof live Lr by §4.8.2 (A_T, Lr/L0 = R1·R2 or the 12 psf minimum).
     */
    static String liveReduction(MemberResult m, UnitSystem us) {
        java.util.Set<LoadCase> present = m.loads() == null ? java.util.Set.of() : m.loads().present();
        boolean l = present.contains(LoadCase.L);
        boolean lr = present.contains(LoadCase.LR);
        StringBuilder s = new StringBuilder("A_T = " + Fmt.v(m.reductionArea(), Quantity.FLOOR_AREA, us));
        if (l || !lr) {
            s.append(", K_LL = ").append(CalcFormat.sig(m.kll())).append(", L = ")
                    .append(String.format(Locale.ROOT, "%.3f", m.liveFactor())).append("·L0")
                    .append(m.liveFactor() >= 1 ? " (not reduced)" : "").append(" (§4.7)");
        }
        if (lr) {
            s.append(l ? "; " : ", ").append("Lr = ").append(String.format(Locale.ROOT, "%.3f", m.roofLiveFactor())).append("·L0")
                    .append(m.roofLiveFactor() >= 1 ? " (not reduced)" : "").append(" (§4.8.2)");
        }
        return s.toString();
    }
}
