package org.baywright.report.pdf;

import java.util.LinkedHashMap;
import java.util.Map;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.Steel;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.calc.CalcFormat;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.StoreyLoad;
import org.baywright.units.UnitSystem;

/** The column schedule, the compression strength of each column section used, and the foundation reactions. */
final class ColumnPages {
    private ColumnPages() {
    }

    static void write(Context cx) {
        if (cx.run.takedown().columns().isEmpty()) {
            return;
        }
        schedule(cx);
        strengths(cx);
        moments(cx);
        foundations(cx);
    }

    private static String d(double v, UnitSystem us) {
        return v == 0 ? "–" : Fmt.fixed(v, Quantity.FORCE, us, 1);
    }

    static void schedule(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        f.landscape(true);
        cx.part("Column schedule");
        String fu = Fmt.unit(Quantity.FORCE, us);
        boolean lrfd = cx.method() == DesignMethod.LRFD;
        f.paragraph(f.body, "Axial load in each storey (below the level named), per load case in " + fu + ": live and roof"
                + " live both unreduced and reduced with the column's cumulative A_T (" + FrontMatter.ASCE + " §4.7, §4.8);"
                + " D includes the own weight of the framing and of the column above the storey's base. Required strength "
                + (lrfd ? "Pu" : "Pa") + " from the governing combination of the reduced loads; available strength "
                + (lrfd ? "φc·Pn" : "Pn/Ωc") + " of the tier's section (next part). The ratio is the larger of the axial ratio and"
                + " the interaction of axial load and the moments of the reactions (" + FrontMatter.AISC + " H1.1; part"
                + " \"Column moments and interaction\"). Columns top storey first.");
        f.gap(3);
        Table t = new Table().left("Level", 8).left("Tier section", 8).right("h [" + Fmt.unit(Quantity.SPAN_LENGTH, us) + "]", 5)
                .right("D", 7).right("L unreduced", 8.5f).right("L reduced", 7).right("Lr unreduced", 8.5f).right("Lr reduced", 7)
                .right("S", 6).right("A_T [" + Fmt.unit(Quantity.FLOOR_AREA, us) + "]", 7).right("Floors", 5.5f)
                .right((lrfd ? "Pu" : "Pa") + " [" + fu + "]", 7).right((lrfd ? "φc·Pn" : "Pn/Ωc") + " [" + fu + "]", 7)
                .right("Ratio", 5.5f).left("Combination", 13).fontSize(6.8f);
        for (ColumnResult c : cx.run.takedown().columns()) {
            t.group(c.id() + "  (" + (c.grid().isEmpty() ? "" : "grid " + c.grid() + ", ") + c.position() + ", K_LL = " + org.baywright.calc.CalcFormat.sig(c.kll()) + ")");
            for (int ti = c.tiers().size() - 1; ti >= 0; ti--) {
                ColumnTier tier = c.tiers().get(ti);
                for (int si = tier.storeys().size() - 1; si >= 0; si--) {
                    StoreyLoad s = tier.storeys().get(si);
                    String[] cells = {s.level(), tier.section().isEmpty() ? "none passes" : tier.section(),
                            Fmt.n(s.storeyHeight(), Quantity.SPAN_LENGTH, us),
                            d(s.unreduced()[LoadCase.D.ordinal()], us), d(s.unreduced()[LoadCase.L.ordinal()], us),
                            d(s.reduced()[LoadCase.L.ordinal()], us), d(s.unreduced()[LoadCase.LR.ordinal()], us),
                            d(s.reduced()[LoadCase.LR.ordinal()], us), d(s.unreduced()[LoadCase.S.ordinal()], us),
                            Fmt.fixed(s.reductionArea(), Quantity.FLOOR_AREA, us, 0), Integer.toString(s.floorsSupported()),
                            Fmt.fixed(s.required(), Quantity.FORCE, us, 1), Fmt.fixed(s.available(), Quantity.FORCE, us, 1),
                            Fmt.ratio(s.ratio()), s.combination()};
                    if (org.baywright.design.Check.passes(s.ratio())) {
                        t.row(cells);
                    } else {
                        t.colored(Rgb.FAIL, cells);
                    }
                }
            }
        }
        t.draw(f);
        f.landscape(false);
    }

    /** The E3 calculation of each column section at each storey height used, from the engine's own equations. */
    static void strengths(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        cx.part("Column strengths");
        Catalog catalog = cx.basis().catalog();
        Steel steel = cx.steel();
        boolean lrfd = cx.method() == DesignMethod.LRFD;
        f.paragraph(f.body, "Compression strength of every column section at every storey height where it is used: flexural"
                + " buckling about both axes, K = 1, Lc = storey height (" + FrontMatter.AISC + " E3). The lines are recorded by"
                + " the same function the column design called. The available strength is the value the schedule uses.");
        Map<String, StoreyLoad> seen = new LinkedHashMap<>();
        Map<String, String> users = new LinkedHashMap<>();
        for (ColumnResult c : cx.run.takedown().columns()) {
            for (ColumnTier tier : c.tiers()) {
                if (tier.section().isEmpty()) {
                    continue;
                }
                for (StoreyLoad s : tier.storeys()) {
                    String key = tier.section() + " | " + Fmt.v(s.storeyHeight(), Quantity.SPAN_LENGTH, us);
                    seen.putIfAbsent(key, s);
                    users.merge(key, c.id() + " " + s.level(), (a, b) -> a.contains(b) ? a : a + ", " + b);
                }
            }
        }
        for (Map.Entry<String, StoreyLoad> e : seen.entrySet()) {
            String section = e.getKey().substring(0, e.getKey().indexOf(" | "));
            StoreyLoad s = e.getValue();
            String title = section + ", Lc = " + Fmt.v(s.storeyHeight(), Quantity.SPAN_LENGTH, us);
            f.heading2(title, 80);
            cx.mark(title, "");
            f.paragraph(f.smallGrey, "Used in: " + users.get(e.getKey()));
            Section sec = catalog == null ? null : catalog.find(section).orElse(null);
            if (sec == null) {
                f.paragraph(f.body, "The section is not in the catalog of the run; see the schedule for its strength.");
                continue;
            }
            Calc calc = new Calc();
            IShapeCompression.strength(sec, steel.fy(), steel.e(), s.storeyHeight(), s.storeyHeight(), calc);
            for (CalcLine l : calc.lines()) {
                MemberSheets.calcLine(f, l, us);
            }
            f.paragraph(f.bold, "Available strength used in the schedule: " + (lrfd ? "φc·Pn" : "Pn/Ωc") + " = "
                    + Fmt.v(s.available(), Quantity.FORCE, us) + " with " + (lrfd ? "φc = " + CalcFormat.sig(ResistanceFactors.PHI_C)
                    : "Ωc = " + CalcFormat.sig(ResistanceFactors.OMEGA_C)) + " (" + FrontMatter.AISC + " E1)");
        }
    }

    /**
     * The moments of the reactions and the H1.1 interaction: a table of every storey, then the sheet of each column
     * line's governing storey, recorded by the same function the column design called.
     */
    static void moments(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        cx.part("Column moments and interaction");
        boolean lrfd = cx.method() == DesignMethod.LRFD;
        String fu = Fmt.unit(Quantity.FORCE, us);
        String mu = Fmt.unit(Quantity.MOMENT, us);
        f.paragraph(f.body, "Columns are leaning columns of a braced frame (K = 1); the lateral system is by others. Each"
                + " beam or girder reaction acts at the connection eccentricity e = d/2 + a from the column axis when the"
                + " member frames into a flange and e = tw/2 + a when it frames into the web, a = "
                + Fmt.v(cx.basis().connectionEccentricity(), Quantity.SECTION_LENGTH, us) + " beyond the column face (common"
                + " practice; the plan's connectionEccentricity). A column's web lies along the plan direction whose members"
                + " deliver the larger reactions. The net moment at a floor about each axis takes live load off the side"
                + " that makes it larger where that governs (" + FrontMatter.ASCE + " §4.3.3), with the axial load reduced to"
                + " match; it is shared between the storeys above and below by I/L, amplified by B1 (" + FrontMatter.AISC
                + " Appendix 8, Eq. A-8-3 with Cm by Eq. A-8-4 and Pe1 by Eq. A-8-5) and checked with the axial load by"
                + " Eq. H1-1a or H1-1b. Mcx by F2/F3 with Lb = storey height and Cb = 1.0 (conservative), Mcy by F6. Moments"
                + " use unreduced live load (conservative); roof live load and snow load both sides.");
        f.gap(3);
        Table t = new Table().left("Level", 9).left("Section", 8).left("Web", 3.5f).right((lrfd ? "Pu" : "Pa") + " [" + fu + "]", 7)
                .right("Mrx [" + mu + "]", 7).right("Mry [" + mu + "]", 7).right("B1x", 4.5f).right("B1y", 4.5f)
                .right("H1 ratio", 5.5f).left("Combination", 12).left("Live-load pattern", 30).fontSize(6.5f);
        for (ColumnResult c : cx.run.takedown().columns()) {
            t.group(c.id() + (c.grid().isEmpty() ? "" : "  (grid " + c.grid() + ")"));
            for (int ti = c.tiers().size() - 1; ti >= 0; ti--) {
                ColumnTier tier = c.tiers().get(ti);
                for (int si = tier.storeys().size() - 1; si >= 0; si--) {
                    StoreyLoad s = tier.storeys().get(si);
                    var in = s.interaction();
                    if (in == null) {
                        t.row(s.level(), tier.section().isEmpty() ? "none passes" : tier.section(), "", "", "", "", "", "", "", "", "");
                        continue;
                    }
                    String[] cells = {s.level(), tier.section(), in.webAlongX() ? "x" : "y", Fmt.fixed(in.pr(), Quantity.FORCE, us, 1),
                            Fmt.fixed(in.mrx(), Quantity.MOMENT, us, 1), Fmt.fixed(in.mry(), Quantity.MOMENT, us, 1),
                            CalcFormat.sig(in.b1x()), CalcFormat.sig(in.b1y()), Fmt.ratio(in.ratio()), in.combination(), in.pattern()};
                    if (org.baywright.design.Check.passes(in.ratio())) {
                        t.row(cells);
                    } else {
                        t.colored(Rgb.FAIL, cells);
                    }
                }
            }
        }
        t.draw(f);
        Catalog catalog = cx.basis().catalog();
        if (catalog == null) {
            return;
        }
        org.baywright.design.ColumnDesigner designer = cx.basis().columnDesigner();
        for (ColumnResult c : cx.run.takedown().columns()) {
            StoreyLoad worst = null;
            String section = "";
            for (ColumnTier tier : c.tiers()) {
                for (StoreyLoad s : tier.storeys()) {
                    if (s.interaction() != null && (worst == null || s.interaction().ratio() > worst.interaction().ratio())) {
                        worst = s;
                        section = tier.section();
                    }
                }
            }
            if (worst == null) {
                continue;
            }
            Section sec = catalog.find(section).orElse(null);
            if (sec == null) {
                continue;
            }
            String title = c.id() + ", storey below " + worst.level() + " (" + section + "), the column's highest interaction";
            f.heading2(title, 80);
            cx.mark(title, "");
            Calc calc = new Calc();
            designer.record(worst.interaction(), sec, worst.interaction().pc(), calc);
            for (CalcLine l : calc.lines()) {
                MemberSheets.calcLine(f, l, us);
            }
            f.paragraph(f.bold, "Interaction used in the schedule: " + Fmt.ratio(worst.interaction().ratio()) + " ("
                    + worst.interaction().combination() + ", " + worst.interaction().pattern() + ")");
        }
    }

    static void foundations(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        cx.part("Foundation reactions");
        String fu = Fmt.unit(Quantity.FORCE, us);
        f.paragraph(f.body, "Service reactions on the foundations in " + fu + ", per load case, with live load unreduced"
                + " (what the columns receive) and reduced with the bottom storey's A_T. D includes the own weight of all"
                + " steel above. The totals of the unreduced columns equal the applied loads (equilibrium, part 3).");
        f.gap(3);
        Table t = new Table().left("Column", 10).left("Grid", 7).left("Position", 18).right("D", 10).right("L unreduced", 10)
                .right("L reduced", 10).right("Lr unreduced", 10).right("Lr reduced", 10).right("S", 9).fontSize(7f);
        double[] sum = new double[LoadCase.values().length];
        double[] sumR = new double[LoadCase.values().length];
        for (ColumnResult c : cx.run.takedown().columns()) {
            double[] a = c.foundation();
            double[] r = c.foundationReduced();
            for (int i = 0; i < sum.length; i++) {
                sum[i] += a[i];
                sumR[i] += r[i];
            }
            t.row(c.id(), c.grid(), c.position(), d(a[0], us), d(a[1], us), d(r[1], us), d(a[2], us), d(r[2], us), d(a[3], us));
        }
        t.strong("Total", "", "", d(sum[0], us), d(sum[1], us), d(sumR[1], us), d(sum[2], us), d(sumR[2], us), d(sum[3], us));
        t.draw(f);
    }
}
