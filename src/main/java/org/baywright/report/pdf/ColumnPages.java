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
                + (lrfd ? "φc·Pn" : "Pn/Ωc") + " of the tier's section (next part). Columns top storey first.");
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
