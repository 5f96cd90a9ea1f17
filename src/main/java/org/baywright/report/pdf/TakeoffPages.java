package org.baywright.report.pdf;

import java.util.List;
import java.util.Locale;
import org.baywright.calc.Quantity;
import org.baywright.report.Takeoff;
import org.baywright.units.UnitSystem;

/** The steel takeoff: by section, by kind and by level, with totals and the allowance shown apart. */
final class TakeoffPages {
    private TakeoffPages() {
    }

    static void write(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        Takeoff t = Takeoff.of(cx.run, cx.options.allowancePercent());
        cx.part("Steel takeoff");
        f.paragraph(f.body, "Nominal weight × length of every member at every level it occurs and of every column tier."
                + " Short tons of 2,000 lb; tonnes of 1,000 kg. The allowance for connections and miscellaneous steel is a"
                + " percentage of the member weight, shown on its own line.");
        f.gap(2);
        table(f, "By section", t.bySection(), us);
        table(f, "By kind", t.byKind(), us);
        table(f, "By level (count: members of the level; length and weight include the column storeys below it)", t.byLevel(), us);

        f.heading2("Totals", 60);
        String wu = Fmt.weightUnit(us);
        Table tt = new Table().left("", 44).right("Weight [" + wu + "]", 16).right("Short tons", 12).right("Tonnes", 12);
        tt.row("Members and columns", Fmt.grouped(Fmt.weight(t.total(), us), 0), fmt2(Takeoff.shortTons(t.total())),
                fmt2(Takeoff.tonnes(t.total())));
        tt.row(String.format(Locale.ROOT, "Allowance for connections and miscellaneous steel, %s %%",
                org.baywright.calc.CalcFormat.sig(t.allowancePercent())), Fmt.grouped(Fmt.weight(t.allowance(), us), 0),
                fmt2(Takeoff.shortTons(t.allowance())), fmt2(Takeoff.tonnes(t.allowance())));
        tt.strong("Total with allowance", Fmt.grouped(Fmt.weight(t.grandTotal(), us), 0), fmt2(Takeoff.shortTons(t.grandTotal())),
                fmt2(Takeoff.tonnes(t.grandTotal())));
        if (t.composite()) {
            tt.row("Members and columns without composite action", Fmt.grouped(Fmt.weight(t.nonCompositeTotal(), us), 0),
                    fmt2(Takeoff.shortTons(t.nonCompositeTotal())), fmt2(Takeoff.tonnes(t.nonCompositeTotal())));
            double saved = t.nonCompositeTotal() - t.total();
            tt.row("Saved by composite action", Fmt.grouped(Fmt.weight(saved, us), 0), fmt2(Takeoff.shortTons(saved)),
                    fmt2(Takeoff.tonnes(saved)));
        }
        tt.draw(f);
        if (t.composite()) {
            f.paragraph(f.body, "Composite members: " + Fmt.grouped(t.studs(), 0) + " headed studs in all; "
                    + t.camberedPieces() + " pieces cambered. Without composite action each composite member is taken at"
                    + " its bare-steel design under the same loads (the weight the floors would take as bare steel).");
            cambers(f, t, us);
        }
        double area = Quantity.FLOOR_AREA.unit(us).fromSi(t.floorArea());
        String au = Fmt.unit(Quantity.FLOOR_AREA, us);
        if (area > 0) {
            f.paragraph(f.body, "Floor area of all levels " + Fmt.grouped(area, 0) + " " + au + ". Weight per floor area: "
                    + String.format(Locale.ROOT, "%.2f", Fmt.weight(t.total(), us) / area) + " " + Fmt.weightPerAreaUnit(us)
                    + " without the allowance, " + String.format(Locale.ROOT, "%.2f", Fmt.weight(t.grandTotal(), us) / area)
                    + " " + Fmt.weightPerAreaUnit(us) + " with it.");
        }
    }

    private static void table(PageFlow f, String title, List<Takeoff.Row> rows, UnitSystem us) {
        f.heading2(title, 40);
        String wu = Fmt.weightUnit(us);
        Table t = new Table().left("Item", 30).right("Count", 10).right("Length [" + Fmt.unit(Quantity.SPAN_LENGTH, us) + "]", 16)
                .right("Weight [" + wu + "]", 16).right("Short tons", 12).right("Tonnes", 12);
        double w = 0;
        int n = 0;
        double len = 0;
        for (Takeoff.Row r : rows) {
            t.row(r.item(), Integer.toString(r.count()), Fmt.fixed(r.length(), Quantity.SPAN_LENGTH, us, 1),
                    Fmt.grouped(Fmt.weight(r.weight(), us), 0), fmt2(Takeoff.shortTons(r.weight())), fmt2(Takeoff.tonnes(r.weight())));
            w += r.weight();
            n += r.count();
            len += r.length();
        }
        t.strong("Sum", Integer.toString(n), Fmt.fixed(len, Quantity.SPAN_LENGTH, us, 1), Fmt.grouped(Fmt.weight(w, us), 0),
                fmt2(Takeoff.shortTons(w)), fmt2(Takeoff.tonnes(w)));
        t.draw(f);
    }

    /** Studs and camber by size, level and kind, for the lines that have any. */
    private static void cambers(PageFlow f, Takeoff t, UnitSystem us) {
        f.heading2("Studs and camber", 40);
        Table tb = new Table().left("Section", 16).left("Level", 18).left("Kind", 10).right("Pieces", 8).right("Studs", 8)
                .right("Camber [" + Fmt.unit(Quantity.SECTION_LENGTH, us) + "]", 14);
        int pieces = 0;
        int studs = 0;
        for (Takeoff.Line l : t.lines()) {
            if (l.studs() == 0 && l.camber() == 0) {
                continue;
            }
            tb.row(l.section(), l.level(), l.kind(), Integer.toString(l.pieces()), Integer.toString(l.studs()),
                    l.camber() > 0 ? org.baywright.report.drawing.MemberLabels.camber(l.camber(), us) : "none");
            pieces += l.pieces();
            studs += l.studs();
        }
        tb.strong("Sum", "", "", Integer.toString(pieces), Integer.toString(studs), "");
        tb.draw(f);
    }

    private static String fmt2(double v) {
        return String.format(Locale.ROOT, "%,.2f", v);
    }
}
