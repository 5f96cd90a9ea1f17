package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Quantity;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.plan.VibrationSettings;
import org.baywright.report.BaySummary;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;
import org.baywright.units.UnitSystem;

/**
 * The part "Floor vibration (AISC DG11)": a table of every bay of the run (its levels, f_n, a_p/g, the limit, the
 * ratio and the status), then one sheet per distinct bay printing the bay's calculation record
 * ({@link BayResult#calculation()}) line by line as the member sheets print theirs. Bays whose calculations give
 * the same numbers (same spans, sections, loads, floor extents and continuity) share a sheet, and the sheet names
 * them. Written only when the run checked bays ({@link BaySummary#present}).
 */
final class VibrationPages {
    /** Title of the part, as the contents and the tests find it. */
    static final String TITLE = "Floor vibration (AISC DG11)";

    private VibrationPages() {
    }

    /** Bays that share a sheet: equal calculation numbers and status; the first one's record is printed. */
    record Group(List<BayResult> bays, List<CalcLine> lines) {
        BayResult first() {
            return bays.get(0);
        }

        /** "B-C/2-3 (Level 2, Level 3)" for each bay of the group. */
        List<String> names() {
            List<String> out = new ArrayList<>();
            for (BayResult b : bays) {
                out.add(b.bay().id() + " (" + String.join(", ", b.levels()) + ")");
            }
            return out;
        }
    }

    /**
     * The checked bays grouped by their calculation: two bays share a sheet when every line of their records
     * other than the headings (which name the bay's own members) renders the same, and their status is the same.
     */
    static List<Group> groups(List<BayResult> bays, UnitSystem us) {
        Map<String, List<BayResult>> byKey = new LinkedHashMap<>();
        Map<String, List<CalcLine>> lines = new LinkedHashMap<>();
        for (BayResult b : bays) {
            Calc c = b.calculation();
            if (c == null) {
                continue;
            }
            StringBuilder key = new StringBuilder(b.status()).append('\n');
            for (CalcLine l : c.lines()) {
                if (l.kind() != CalcLine.Kind.HEADING) {
                    key.append(CalcFormat.render(l, us)).append('\n');
                }
            }
            String k = key.toString();
            byKey.computeIfAbsent(k, x -> new ArrayList<>()).add(b);
            lines.putIfAbsent(k, c.lines());
        }
        List<Group> out = new ArrayList<>();
        byKey.forEach((k, v) -> out.add(new Group(v, lines.get(k))));
        return out;
    }

    /** Writes the part; returns the number of sheets. Nothing when the run has no bays. */
    static int write(Context cx) {
        if (!BaySummary.present(cx.run)) {
            return 0;
        }
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        List<BayResult> bays = cx.run.bays();
        List<Group> groups = groups(bays, us);
        int part = cx.part(TITLE);
        f.paragraph(f.body, "Floor vibration from walking, by AISC Design Guide 11 (2nd ed., 2016), Chapter 4, for"
                + " low-frequency floors: the beam (joist) and girder mode frequencies and effective weights of each bay from"
                + " its transformed sections under realistic loads (actual dead, superimposed dead, a vibration live load),"
                + " the combined mode f_n, and the peak acceleration a_p/g = P_o·e^(−0.35·f_n)/(β·W) against the tolerance"
                + " limit a_o/g of the floor's use. A bay meets the check when a_p/g ≤ a_o/g; above 9 Hz the method does not"
                + " apply and the bay is reported as outside it, not as passing.");
        f.gap(2);
        f.paragraph(f.small, settingsLine(cx) + " " + BaySummary.line(cx.run) + ".");
        // the members stiffened so that bays meet the limit (floors sized for vibration)
        for (String line : BaySummary.changeLines(cx.run)) {
            f.paragraph(f.small, line + ".");
        }
        f.gap(4);
        f.heading2("Every bay", 60);
        summaryTable(cx, groups, part);
        if (groups.isEmpty()) {
            return 0;
        }
        f.gap(4);
        f.paragraph(f.small, groups.size() + " sheet" + (groups.size() == 1 ? "" : "s") + " for "
                + groups.stream().mapToInt(g -> g.bays().size()).sum() + " checked bays (bays whose calculations give the"
                + " same numbers share a sheet; the sheet prints the first bay's record and names the others).");
        int n = 0;
        for (Group g : groups) {
            n++;
            sheet(cx, part + "." + n, g);
        }
        return groups.size();
    }

    /** The use, limit, damping and live load the checks used (the first bay's settings; one set per plan). */
    private static String settingsLine(Context cx) {
        for (BayResult b : cx.run.bays()) {
            if (b.checked()) {
                VibrationSettings s = b.settings();
                return "Use: " + name(s.use().name()) + ", tolerance limit a_o/g = "
                        + CalcFormat.sig(b.result().limit() * 100) + " % (DG11 2nd ed. Table 4-1); damping β = "
                        + CalcFormat.sig(b.inputs().vibration().beta()) + " (" + (Double.isNaN(s.damping())
                                ? name(s.effectiveFitOut().name()) : "given") + "); vibration live load "
                        + Fmt.v(b.inputs().live(), Quantity.AREA_LOAD, cx.us) + ".";
            }
        }
        return "";
    }

    private static String name(String constant) {
        return constant.toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    /** One row per bay of every floor layout: id, levels, f_n, a_p/g, limit, ratio, status, sheet. */
    private static void summaryTable(Context cx, List<Group> groups, int part) {
        Map<BayResult, String> sheetOf = new java.util.IdentityHashMap<>();
        int n = 0;
        for (Group g : groups) {
            n++;
            for (BayResult b : g.bays()) {
                sheetOf.put(b, part + "." + n);
            }
        }
        Table t = new Table().left("Bay", 14).left("Levels", 24).right("f_n [Hz]", 10).right("a_p/g [%]", 11)
                .right("Limit [%]", 10).right("Ratio", 8).left("Status", 28).left("Sheet", 7).fontSize(7f);
        for (BayResult b : cx.run.bays()) {
            VibrationResult v = b.result();
            String[] cells = v == null
                    ? new String[] {b.bay().id(), String.join(", ", b.levels()), "", "", "", "", b.note().isEmpty()
                            ? BayResult.NOT_CHECKED : b.note(), ""}
                    : new String[] {b.bay().id(), String.join(", ", b.levels()), fn(v.fn()), apg(v.apg()), apg(v.limit()),
                            Fmt.ratio(v.ratio()), b.status() + (v.belowThreeHz() ? ", below 3 Hz" : ""),
                            sheetOf.getOrDefault(b, "")};
            if (v != null && v.status() == VibrationStatus.EXCEEDS) {
                t.colored(Rgb.FAIL, cells);
            } else {
                t.row(cells);
            }
        }
        t.draw(cx.flow);
    }

    /** f_n as the table prints it: two decimals, Hz. */
    static String fn(double hz) {
        return String.format(Locale.ROOT, "%.2f", hz);
    }

    /** a fraction of g as the table prints it: per cent, three decimals. */
    static String apg(double fraction) {
        return String.format(Locale.ROOT, "%.3f", fraction * 100);
    }

    /** The sheet title as printed in the heading and in the contents. */
    static String title(String number, Group g) {
        BayResult b = g.first();
        return number + " Bay " + b.bay().id() + (g.bays().size() > 1 ? " (" + g.bays().size() + " bays)" : "") + ": "
                + b.status();
    }

    private static void sheet(Context cx, String number, Group g) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        BayResult b = g.first();
        Bay bay = b.bay();
        String title = title(number, g);
        f.runningTitle("Sheet " + number + ": floor vibration, bay " + bay.id());
        f.newPage();
        Set<String> others = new LinkedHashSet<>(g.names());
        cx.mark(title, g.bays().size() > 1 ? String.join(", ", others) : "");
        f.heading2(title, 30);
        f.paragraph(f.small, (g.bays().size() == 1 ? "Bay: " : "Bays sharing this sheet: ") + String.join("; ", others)
                + (g.bays().size() > 1 ? ". The record below is " + bay.id() + "'s; the others give the same numbers with"
                        + " their own members." : ""));
        f.gap(3);
        List<String[]> facts = new ArrayList<>();
        facts.add(new String[] {"Floor layout", Summaries.floorLabel(cx, bay.floor())});
        facts.add(new String[] {"Beams", String.join(", ", bay.beams()) + "; " + bay.beam() + " checked ("
                + bay.beamSection().designationIn(us) + "), span " + Fmt.v(bay.beamSpan(), Quantity.SPAN_LENGTH, us)
                + ", spacing " + Fmt.v(bay.spacing(), Quantity.SPAN_LENGTH, us)});
        for (Bay.BayGirder gd : bay.girders()) {
            facts.add(new String[] {"Carried by", gd.id() + " (" + gd.section().designationIn(us) + "), span "
                    + Fmt.v(gd.span(), Quantity.SPAN_LENGTH, us) + (gd.bothSides() ? "" : ", an edge girder")
                    + (gd.id().equals(b.girder()) ? "; governs" : "")});
        }
        facts.add(new String[] {"Floor", (Double.isFinite(bay.floorWidth()) ? Fmt.v(bay.floorWidth(), Quantity.SPAN_LENGTH, us)
                : "unlimited") + " across the beams, " + (Double.isFinite(bay.floorLength())
                        ? Fmt.v(bay.floorLength(), Quantity.SPAN_LENGTH, us) : "unlimited") + " along them; "
                + (bay.edge() ? "edge bay (C_j = 1.0)" : "interior bay")});
        facts.add(new String[] {"Loads", "slab " + Fmt.v(b.inputs().slabWeight(), Quantity.AREA_LOAD, us) + ", superimposed dead "
                + Fmt.v(b.superimposed(), Quantity.AREA_LOAD, us) + ", vibration live load "
                + Fmt.v(b.inputs().live(), Quantity.AREA_LOAD, us)});
        facts.add(new String[] {"Result", b.result().summary()});
        f.pairs2(facts, 74);
        f.gap(2);
        calculation(cx, g.lines());
    }

    /** The record's lines, exactly as the member sheets print theirs. */
    private static void calculation(Context cx, List<CalcLine> lines) {
        PageFlow f = cx.flow;
        f.heading3("Calculation", 60);
        f.paragraph(f.smallGrey, "As recorded by the vibration check: symbol = formula = numbers = result, reference on the"
                + " right. Equation numbers of DG11 are marked where given from memory.");
        for (int i = 0; i < lines.size(); i++) {
            CalcLine l = lines.get(i);
            if (l.kind() == CalcLine.Kind.HEADING) {
                float next = i + 1 < lines.size() ? 2 * f.body.leading() : 0;
                f.gap(3);
                f.ensure(f.bold.leading() + next);
                f.lineOf(f.bold.withColor(Rgb.ACCENT), f.left(), CalcFormat.render(l, cx.us));
            } else {
                MemberSheets.calcLine(f, l, cx.us);
            }
        }
    }
}
