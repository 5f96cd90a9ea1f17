package org.baywright.report.pdf;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.baywright.calc.Quantity;
import org.baywright.design.MemberStatus;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Problem;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.Equilibrium;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.StoreyLoad;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.UnitSystem;

/** The load summary, the takedown summary and the problems part. */
final class Summaries {
    private Summaries() {
    }

    // ---- loads -------------------------------------------------------------------------------

    static void loads(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        boolean partitionAsDead = cx.basis().liveLoad().partitionAsDead();
        cx.part("Load summary");
        f.paragraph(f.body, "Service loads as given in the plan, per floor layout. The framing's own weight is not listed:"
                + " the design adds each member's and column's nominal weight to D. Partition allowance is carried as "
                + (partitionAsDead ? "dead load" : "live load") + ", so the columns \"D carried\" and \"L carried\""
                + " show what enters the combinations before live-load reduction.");
        f.gap(4);

        f.heading2("Levels", 40);
        Table lv = new Table().left("Level", 22).right("Top of steel [" + Fmt.unit(Quantity.SPAN_LENGTH, us) + "]", 18)
                .right("Storey height [" + Fmt.unit(Quantity.SPAN_LENGTH, us) + "]", 18).left("Floor layout", 42);
        for (int i = cx.run.plan().levels().size() - 1; i >= 0; i--) {
            Level l = cx.run.plan().levels().get(i);
            lv.row(l.name(), Fmt.n(l.elevation(), Quantity.SPAN_LENGTH, us), Fmt.n(l.storeyHeight(), Quantity.SPAN_LENGTH, us),
                    floorLabel(cx, l.floor()));
        }
        lv.draw(f);

        String a = Fmt.unit(Quantity.AREA_LOAD, us);
        String w = Fmt.unit(Quantity.LINE_LOAD, us);
        String p = Fmt.unit(Quantity.FORCE, us);
        for (Floor fl : cx.run.plan().floors()) {
            f.heading2("Floor layout " + floorLabel(cx, fl.id()) + (fl.roof() ? " (roof: roof live load Lr reduces by §4.8.2)" : ""), 60);
            Table t = new Table().left("Area load", 16).left("Use", 12).right("Area [" + Fmt.unit(Quantity.FLOOR_AREA, us) + "]", 10)
                    .right("D", 7).right("SD", 7).right("Partition", 9).right("L", 7).right("Lr", 7).right("S", 7)
                    .right("D carried", 9).right("L carried", 9);
            f.lineOf(f.smallGrey, f.left(), "Area loads in " + a + " (D dead, SD superimposed dead)");
            for (AreaLoad al : fl.areaLoads()) {
                LoadValues v = al.values();
                double area = Math.abs(al.outline().signedArea());
                t.row(al.id(), al.use().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '),
                        Fmt.fixed(area, Quantity.FLOOR_AREA, us, 0), num(v.dead(), Quantity.AREA_LOAD, us),
                        num(v.superimposed(), Quantity.AREA_LOAD, us), num(v.partition(), Quantity.AREA_LOAD, us),
                        num(v.live(), Quantity.AREA_LOAD, us), num(v.roofLive(), Quantity.AREA_LOAD, us),
                        num(v.snow(), Quantity.AREA_LOAD, us), num(carriedDead(v, partitionAsDead), Quantity.AREA_LOAD, us),
                        num(carriedLive(v, partitionAsDead), Quantity.AREA_LOAD, us));
            }
            if (fl.areaLoads().isEmpty()) {
                t.row("(none)");
            }
            t.draw(f);
            if (!fl.lineLoads().isEmpty()) {
                f.lineOf(f.smallGrey, f.left(), "Line loads in " + w);
                Table lt = new Table().left("Line load", 16).right("Length [" + Fmt.unit(Quantity.SPAN_LENGTH, us) + "]", 12)
                        .right("D", 8).right("SD", 8).right("Partition", 9).right("L", 8).right("Lr", 8).right("S", 8)
                        .left("Path", 30);
                for (LineLoad ll : fl.lineLoads()) {
                    LoadValues v = ll.values();
                    double len = 0;
                    for (int i = 1; i < ll.path().size(); i++) {
                        len += ll.path().get(i - 1).distance(ll.path().get(i));
                    }
                    lt.row(ll.id(), Fmt.n(len, Quantity.SPAN_LENGTH, us), num(v.dead(), Quantity.LINE_LOAD, us),
                            num(v.superimposed(), Quantity.LINE_LOAD, us), num(v.partition(), Quantity.LINE_LOAD, us),
                            num(v.live(), Quantity.LINE_LOAD, us), num(v.roofLive(), Quantity.LINE_LOAD, us),
                            num(v.snow(), Quantity.LINE_LOAD, us), path(ll.path(), us));
                }
                lt.draw(f);
            }
            if (!fl.pointLoads().isEmpty()) {
                f.lineOf(f.smallGrey, f.left(), "Point loads in " + p);
                Table pt = new Table().left("Point load", 16).left("At", 20).right("D", 8).right("SD", 8).right("Partition", 9)
                        .right("L", 8).right("Lr", 8).right("S", 8);
                for (PointLoadItem pl : fl.pointLoads()) {
                    LoadValues v = pl.values();
                    pt.row(pl.id(), Fmt.point(pl.at(), us), num(v.dead(), Quantity.FORCE, us), num(v.superimposed(), Quantity.FORCE, us),
                            num(v.partition(), Quantity.FORCE, us), num(v.live(), Quantity.FORCE, us),
                            num(v.roofLive(), Quantity.FORCE, us), num(v.snow(), Quantity.FORCE, us));
                }
                pt.draw(f);
            }
        }
    }

    private static double carriedDead(LoadValues v, boolean partitionAsDead) {
        return v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0);
    }

    private static double carriedLive(LoadValues v, boolean partitionAsDead) {
        return v.live() + (partitionAsDead ? 0 : v.partition());
    }

    private static String num(double si, Quantity q, UnitSystem us) {
        return si == 0 ? "–" : Fmt.n(si, q, us);
    }

    private static String path(List<Point> pts, UnitSystem us) {
        StringBuilder b = new StringBuilder();
        for (Point pt : pts) {
            b.append(b.length() == 0 ? "" : " → ").append("(").append(Fmt.n(pt.x(), Quantity.SPAN_LENGTH, us)).append(", ")
                    .append(Fmt.n(pt.y(), Quantity.SPAN_LENGTH, us)).append(")");
        }
        return b.toString();
    }

    /** "typical — Typical floor (Level 3, Level 4)". */
    static String floorLabel(Context cx, String floorId) {
        String name = cx.run.plan().floor(floorId).map(Floor::name).orElse("");
        StringBuilder b = new StringBuilder("\"").append(floorId).append("\"");
        if (!name.isEmpty() && !name.equals(floorId)) {
            b.append(" ").append(name);
        }
        List<String> levels = cx.run.takedown() == null ? List.of() : MemberGroups.levelsOf(cx.run, floorId);
        if (!levels.isEmpty()) {
            b.append(" (").append(String.join(", ", levels)).append(")");
        }
        return b.toString();
    }

    // ---- takedown ----------------------------------------------------------------------------

    static void takedown(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        TakedownResult t = cx.run.takedown();
        cx.part("Takedown summary");
        f.paragraph(f.body, "Members by level and status, and the steel weight at each level (members of the level's floor"
                + " layout, and column storeys below the level). A typical floor layout designed once is counted at every"
                + " level that uses it.");
        f.gap(4);
        String wu = Fmt.weightUnit(us);
        Table tb = new Table().left("Level", 12).left("Floor layout", 12).right("Beams", 8).right("Girders", 8)
                .left("Status", 22).right("Highest ratio", 9).right("Members [" + wu + "]", 11)
                .right("Columns [" + wu + "]", 11).right("Total [" + wu + "]", 11);
        Map<String, Double> columnWeight = new java.util.HashMap<>();
        double columnRatio = 0;
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                if (Double.isFinite(tier.maxRatio())) {
                    columnRatio = Math.max(columnRatio, tier.maxRatio());
                }
                for (StoreyLoad s : tier.storeys()) {
                    columnWeight.merge(s.level(), tier.weight() * s.storeyHeight(), Double::sum);
                }
            }
        }
        double sumM = 0;
        double sumC = 0;
        double maxAll = 0;
        EnumMap<MemberStatus, Integer> all = new EnumMap<>(MemberStatus.class);
        int beams = 0;
        int girders = 0;
        for (int i = cx.run.plan().levels().size() - 1; i >= 0; i--) {
            Level lv = cx.run.plan().levels().get(i);
            String fl = t.levelFloors().get(lv.name());
            List<MemberResult> ms = t.members().getOrDefault(fl, List.of());
            EnumMap<MemberStatus, Integer> n = new EnumMap<>(MemberStatus.class);
            int b = 0;
            int g = 0;
            double wm = 0;
            double ratio = 0;
            for (MemberResult m : ms) {
                n.merge(m.status(), 1, Integer::sum);
                all.merge(m.status(), 1, Integer::sum);
                if (m.kind() == org.baywright.plan.MemberKind.BEAM) {
                    b++;
                } else {
                    g++;
                }
                wm += m.steelWeight();
                if (Double.isFinite(m.maxRatio())) {
                    ratio = Math.max(ratio, m.maxRatio());
                }
            }
            maxAll = Math.max(maxAll, ratio);
            beams += b;
            girders += g;
            double wc = columnWeight.getOrDefault(lv.name(), 0.0);
            sumM += wm;
            sumC += wc;
            tb.row(lv.name(), fl == null ? "" : fl, Integer.toString(b), Integer.toString(g), statuses(n),
                    Fmt.ratio(ratio), Fmt.grouped(Fmt.weight(wm, us), 0), Fmt.grouped(Fmt.weight(wc, us), 0),
                    Fmt.grouped(Fmt.weight(wm + wc, us), 0));
        }
        tb.strong("All levels", "", Integer.toString(beams), Integer.toString(girders), statuses(all),
                Fmt.ratio(maxAll), Fmt.grouped(Fmt.weight(sumM, us), 0), Fmt.grouped(Fmt.weight(sumC, us), 0),
                Fmt.grouped(Fmt.weight(sumM + sumC, us), 0));
        tb.draw(f);

        int tiers = 0;
        EnumMap<MemberStatus, Integer> ct = new EnumMap<>(MemberStatus.class);
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                tiers++;
                ct.merge(tier.status(), 1, Integer::sum);
            }
        }
        StringBuilder cs = new StringBuilder();
        ct.forEach((k, v) -> cs.append(cs.length() == 0 ? "" : ", ").append(v).append(' ').append(k.label()));
        f.paragraph(f.body, "Columns: " + t.columns().size() + " column lines, " + tiers + " tiers"
                + (cs.length() == 0 ? "" : " (" + cs + ")") + "; highest column ratio " + Fmt.ratio(columnRatio) + ".");
        double area = t.floorArea();
        f.paragraph(f.body, "Floor area of all levels " + Fmt.grouped(Quantity.FLOOR_AREA.unit(us).fromSi(area), 0) + " "
                + Fmt.unit(Quantity.FLOOR_AREA, us) + "; steel " + Fmt.grouped(Fmt.weight(t.steelWeight(), us), 0) + " " + wu
                + (area > 0 ? String.format(java.util.Locale.ROOT, " = %.2f %s", Fmt.weight(t.steelWeight(), us)
                        / Quantity.FLOOR_AREA.unit(us).fromSi(area), Fmt.weightPerAreaUnit(us)) : "")
                + " (members and columns, no allowance: see the takeoff).");

        f.heading2("Equilibrium", 50);
        f.paragraph(f.body, "For each load case, everything applied to the building (area, line and point loads and every"
                + " own weight) against the sum of the foundation reactions. Live loads unreduced.");
        String fu = Fmt.unit(Quantity.FORCE, us);
        Table eq = new Table().left("Case", 10).right("Applied [" + fu + "]", 20).right("Foundation reactions [" + fu + "]", 24)
                .right("Difference [" + fu + "]", 18).left("Result", 18).width(f.width() * 0.8f);
        for (Equilibrium e : t.equilibrium()) {
            String[] cells = {e.loadCase(), Fmt.fixed(e.applied(), Quantity.FORCE, us, 2), Fmt.fixed(e.reactions(), Quantity.FORCE, us, 2),
                    Fmt.fixed(e.applied() - e.reactions(), Quantity.FORCE, us, 3), e.holds() ? "holds" : "DOES NOT HOLD"};
            if (e.holds()) {
                eq.row(cells);
            } else {
                eq.colored(Rgb.FAIL, cells);
            }
        }
        eq.draw(f);

        List<MemberResult> missing = new java.util.ArrayList<>();
        for (List<MemberResult> ms : t.members().values()) {
            for (MemberResult m : ms) {
                if (!MemberGroups.designed(m)) {
                    missing.add(m);
                }
            }
        }
        if (!missing.isEmpty()) {
            f.heading2("Members without a design", 40);
            Table mt = new Table().left("Floor layout", 20).left("Member", 20).left("Kind", 12).left("Status", 16)
                    .left("Supports", 40);
            for (MemberResult m : missing) {
                mt.colored(Rgb.FAIL, m.floor(), m.id(), m.kind().name().toLowerCase(java.util.Locale.ROOT), m.status().label(),
                        blank(m.startSupport()) + " / " + blank(m.endSupport()));
            }
            mt.draw(f);
        }
    }

    private static String blank(String s) {
        return s == null || s.isEmpty() ? "none" : s;
    }

    /** "53 sized, 2 overstressed". */
    static String statuses(Map<MemberStatus, Integer> m) {
        StringBuilder b = new StringBuilder();
        for (MemberStatus s : MemberStatus.values()) {
            int n = m.getOrDefault(s, 0);
            if (n > 0) {
                b.append(b.length() == 0 ? "" : ", ").append(n).append(' ').append(s.label());
            }
        }
        return b.length() == 0 ? "none" : b.toString();
    }

    // ---- problems ----------------------------------------------------------------------------

    static void problems(Context cx) {
        PageFlow f = cx.flow;
        cx.part("Problems reported by the run");
        List<Problem> ps = cx.run.problems();
        if (ps.isEmpty()) {
            f.paragraph(f.body, "None: the plan was read without errors or warnings, every member and column was designed and"
                    + " equilibrium holds for every load case.");
            return;
        }
        Table t = new Table().left("Severity", 10).left("Kind", 16).left("Where", 24).left("Object", 12).left("Message", 50);
        for (Problem p : ps) {
            String[] cells = {p.severity().name().toLowerCase(java.util.Locale.ROOT), p.kind(), p.location(), p.objectId(),
                    p.message()};
            if (p.severity() == Problem.Severity.ERROR) {
                t.colored(Rgb.FAIL, cells);
            } else {
                t.row(cells);
            }
        }
        t.draw(f);
    }
}
