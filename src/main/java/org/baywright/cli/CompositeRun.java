package org.baywright.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Caution;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.Check;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.MemberStatus;
import org.baywright.design.Rejection;
import org.baywright.design.SearchFilter;
import org.baywright.design.aisc360.CompositeFlexureI3;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.io.JsonText;
import org.baywright.load.DesignMethod;
import org.baywright.report.RunSummary;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * {@code beam --composite}: drives {@link CompositeBeamDesigner} for one beam (a search, or a fixed
 * section with or without a fixed stud count) and prints the result as text or JSON. The design is
 * the engine's; this class only reads and prints it.
 */
final class CompositeRun {
    private final CompositeBeam beam;
    private final CompositeCriteria criteria;
    private final CompositeBeamDesigner designer;
    private final UnitSystem us;
    private final Catalog cat;

    CompositeRun(CompositeBeam beam, CompositeCriteria criteria, UnitSystem us, Catalog cat) {
        this.beam = beam;
        this.criteria = criteria;
        this.designer = new CompositeBeamDesigner(beam, criteria);
        this.us = us;
        this.cat = cat;
    }

    /**
     * Runs the design and prints it. {@code fixed}: the section to check (null: search);
     * {@code perHalf}: the studs per half span to check (−1: the least that pass).
     */
    int execute(PrintWriter out, Section fixed, int perHalf, SearchFilter filter, boolean calc, boolean json,
            boolean allRejected, double deadLine, double liveLine) {
        CompositeDesign d;
        String how;
        if (fixed != null && perHalf >= 0) {
            d = designer.check(fixed, perHalf, null);
            how = "fixed size and studs: checked";
        } else if (fixed != null) {
            // the least studs on the given section: the search over that section alone
            d = designer.search(cat.filter(s -> s.designation().equals(fixed.designation())), SearchFilter.ALL);
            how = "fixed size: the least studs that pass";
        } else {
            d = designer.search(cat, filter);
            how = "sized: least cost-equivalent weight (steel + studs × the weight of a stud)";
        }
        Calc sheet = null;
        if (calc && d.section() != null) {
            sheet = new Calc();
            designer.check(d.section(), d.studsPerHalf(), sheet);
        }
        if (json) {
            Map<String, Object> o = toJson(d, fixed != null, allRejected, deadLine, liveLine);
            if (sheet != null) {
                o.put("calculation", BeamCommand.sheetLines(sheet, us));
            }
            out.print(JsonText.write(o));
        } else {
            printText(out, d, how, fixed != null, perHalf, allRejected, deadLine, liveLine);
            if (sheet != null) {
                BeamCommand.printSheet(out, sheet, us);
            }
        }
        out.flush();
        return d.status() == MemberStatus.OVERSTRESSED ? BaywrightCommand.EXIT_OVERSTRESSED : BaywrightCommand.EXIT_OK;
    }

    private String f(double si, Quantity q) {
        return BeamCommand.fmt(si, q, us);
    }

    private static String percent(double v) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * v);
    }

    private String strengthSymbol() {
        return criteria.method() == DesignMethod.LRFD ? "φbMn" : "Mn/Ωb";
    }

    private static String pnaText(CompositeFlexureI3.Result r) {
        return switch (r.pna()) {
            case SLAB -> "in the slab";
            case TOP_FLANGE -> "in the top flange";
            case WEB -> "in the web";
        };
    }

    private String pnaWhere(CompositeFlexureI3.Result r) {
        double y = r.pnaDepth();
        return y < 0 ? f(-y, Quantity.SECTION_LENGTH) + " above the top of the steel"
                : f(y, Quantity.SECTION_LENGTH) + " below the top of the steel";
    }

    private String ribsText() {
        return beam.ribs() == DeckRibs.PERPENDICULAR ? "ribs perpendicular to the beam (concrete above the deck counts, I3.2c(2))"
                : "ribs parallel to the beam (the ribs' concrete counts, I3.2c(3))";
    }

    private void printText(PrintWriter out, CompositeDesign d, String how, boolean fixed, int perHalf, boolean allRejected,
            double deadLine, double liveLine) {
        double l = beam.span();
        String spanText = us == UnitSystem.US ? UnitSystem.feetInches(l, 16) + " (" + f(l, Quantity.SPAN_LENGTH) + ")"
                : f(l, Quantity.SPAN_LENGTH);
        out.println("Baywright beam, composite: simple span " + spanText + ", beams at " + f(beam.tributaryWidth(),
                Quantity.SPAN_LENGTH) + ", " + criteria.method() + ", " + BeamCommand.steelText(criteria.steel(), us) + ", "
                + (criteria.shored() ? "shored" : "unshored"));
        var slab = beam.slab();
        out.println("Slab: " + f(slab.hr(), Quantity.SECTION_LENGTH) + " deck (ribs " + f(slab.wr(), Quantity.SECTION_LENGTH)
                + " wide at " + f(slab.pitch(), Quantity.SECTION_LENGTH) + "), " + ribsText() + "; "
                + f(slab.topping(), Quantity.SECTION_LENGTH) + " of concrete above the deck, f'c = "
                + f(slab.fc(), Quantity.STRESS) + ", " + density(slab.density()) + "; weight " + f(d.slabWeight(), Quantity.AREA_LOAD)
                + (Double.isNaN(beam.slabWeightOverride()) ? " (from the geometry: w_c·(t_c + h_r·w_r/pitch) + deck "
                + f(slab.deckWeight(), Quantity.AREA_LOAD) + "; common practice)" : " (given with --slab-weight)"));
        var st = beam.studs();
        out.println("Studs: " + f(st.diameter(), Quantity.SECTION_LENGTH) + " headed studs, Fu = " + f(st.fu(), Quantity.STRESS)
                + ", " + st.perRib() + (beam.ribs() == DeckRibs.PERPENDICULAR ? " per rib, "
                + st.position().name().toLowerCase(Locale.ROOT) + " position" : " per row")
                + "; up to " + designer.maxStudsPerHalf() + " per half span fit");
        for (String p : designer.deckProblems()) {
            out.println("  outside the detailing limits of I3.2c(1): " + p);
        }
        double tw = beam.tributaryWidth();
        out.println("Loads (service), over " + f(tw, Quantity.SPAN_LENGTH) + ":");
        out.println("  construction stage (bare steel): D slab " + f(d.slabWeight() * tw, Quantity.LINE_LOAD) + ", L construction "
                + f(beam.constructionLive() * tw, Quantity.LINE_LOAD) + " (" + f(beam.constructionLive(), Quantity.AREA_LOAD) + ")"
                + (criteria.shored() ? ": shored, not checked" : ""));
        out.println("  composite stage: D slab " + f(d.slabWeight() * tw, Quantity.LINE_LOAD) + " + superimposed "
                + f(deadLine, Quantity.LINE_LOAD) + " (--dead), L " + f(liveLine, Quantity.LINE_LOAD));
        out.println("  self-weight: " + (criteria.selfWeight() ? "added per candidate" : "not added (included in the dead load)"));
        DeflectionLimits lim = criteria.deflection();
        out.println("Deflection limits: live " + (lim.live() > 0 ? "L/" + CalcFormat.sig(lim.live()) : "off") + ", total "
                + (lim.total() > 0 ? "L/" + CalcFormat.sig(lim.total()) : "off") + " (" + DeflectionLimits.SOURCE + "). "
                + "Least composite action " + percent(criteria.minDegree()) + "; a stud weighs as "
                + studWeight() + " of steel in the cost.");
        out.println();
        if (d.section() == null) {
            out.println("Result: overstressed: no section of the catalog is allowed by the filters.");
        } else {
            Check g = d.governing();
            String label = switch (d.status()) {
                case SIZED -> how;
                case FIXED_SIZE -> how + ", passes";
                case OVERSTRESSED -> fixed ? "overstressed: the fixed design fails" : "overstressed: no section passes; the closest is shown";
                default -> d.status().label();
            };
            Section s = d.section();
            out.println("Result: " + BeamCommand.name(s, us) + " with " + d.studs() + " studs, camber "
                    + (d.camber() > 0 ? f(d.camber(), Quantity.SECTION_LENGTH) : "none") + "; " + label
                    + "; governing ratio " + BeamCommand.ratio(g.ratio()) + " (" + g.name() + ")");
            out.println();
            CompositeFlexureI3.Result fl = d.flexure();
            TextTable p = new TextTable(new boolean[] {false, false}, "property", "value");
            p.row("section", BeamCommand.name(s, us) + ", " + CalcFormat.sig(us.weightPerLength(s.weight())) + " "
                    + us.weightPerLength().symbol() + ", d = " + f(s.depth(), Quantity.SECTION_LENGTH));
            p.row("studs", d.studs() + " on the beam: " + d.studsPerHalf() + " between each support and midspan"
                    + (perHalf >= 0 ? " (--studs " + 2 * perHalf + " split in two halves)" : ""));
            p.row("camber", d.camber() > 0 ? f(d.camber(), Quantity.SECTION_LENGTH) + " (" + cambered(d) + ")"
                    : criteria.shored() ? "none (shored)" : "none (" + cambered(d) + ")");
            p.row("b_eff (I3.1a)", f(d.beff(), Quantity.SECTION_LENGTH) + " (left " + f(d.beffLeft(), Quantity.SECTION_LENGTH)
                    + ", right " + f(d.beffRight(), Quantity.SECTION_LENGTH) + ")");
            p.row("Qn (I8.2a, Eq. I8-1)", f(d.qn(), Quantity.FORCE) + " per stud");
            p.row("ΣQn", f(d.sumQn(), Quantity.FORCE) + " (" + d.studsPerHalf() + " × Qn)");
            p.row("composite action", percent(fl.degree()) + " (C = " + f(fl.c(), Quantity.FORCE) + " of the full "
                    + f(fl.full(), Quantity.FORCE) + ")");
            p.row("PNA", pnaText(fl) + ", " + pnaWhere(fl) + "; a = " + f(fl.a(), Quantity.SECTION_LENGTH) + ", Y2 = "
                    + f(fl.d1(), Quantity.SECTION_LENGTH));
            p.row(strengthSymbol() + " (I3.2a)", f(d.check("composite flexure").capacity(), Quantity.MOMENT));
            p.row("I_LB (C-I3-1)", f(d.ilb(), Quantity.INERTIA) + " (full transformed I_tr = " + f(d.itr(), Quantity.INERTIA)
                    + ", steel I_x = " + f(s.props().ix(), Quantity.INERTIA) + ")");
            Check live = d.check("live-load deflection");
            Check total = d.check("total-load deflection");
            p.row("deflections", (criteria.shored() ? "" : "pre-composite " + f(d.preDeflection(), Quantity.SECTION_LENGTH) + ", ")
                    + "live " + (live == null ? "not checked" : f(live.demand(), Quantity.SECTION_LENGTH))
                    + ", total " + (total == null ? "not checked" : f(total.demand(), Quantity.SECTION_LENGTH)));
            p.row("construction stage", criteria.shored() ? "shored: none" : "ratio " + BeamCommand.ratio(d.constructionRatio())
                    + " (bare steel, wet slab and construction live load)");
            out.print(p.render("  "));
            out.println();
            TextTable t = new TextTable(new boolean[] {false, true, true, true, false, false, false},
                    "check", "demand", "capacity", "ratio", "combination", "clause", "note");
            for (Check k : d.checks()) {
                t.row(k.name(), f(k.demand(), k.quantity()), f(k.capacity(), k.quantity()), BeamCommand.ratio(k.ratio()),
                        k.combination(), k.clause(), k.note());
            }
            out.print(t.render("  "));
        }
        if (!d.rejected().isEmpty()) {
            List<Rejection> shown = listed(d.rejected(), allRejected);
            out.println();
            out.println("Lighter sections rejected (" + d.rejected().size()
                    + (shown.size() < d.rejected().size() ? "; the " + shown.size() + " nearest shown, all with --all-rejected" : "")
                    + "):");
            TextTable t = new TextTable(new boolean[] {false, true, false, true, false},
                    "section", "weight", "fails on", "ratio", "why");
            for (Rejection x : shown) {
                t.row(BeamCommand.name(x.section(), us), CalcFormat.sig(us.weightPerLength(x.section().weight())) + " "
                        + us.weightPerLength().symbol(), x.governing().name(), BeamCommand.ratio(x.governing().ratio()),
                        x.governing().note());
            }
            out.print(t.render("  "));
        }
        out.println();
        out.println("Composite design: AISC 360-16 Chapter I for one interior beam under uniform loads; plans, the editor and "
                + "the takedown do not design composite floors yet.");
        out.println(Caution.TEXT);
    }

    private String cambered(CompositeDesign d) {
        if (criteria.camber().fraction() == 0) {
            return "--camber off";
        }
        return "about 80 % of Δ_pre = " + f(d.preDeflection(), Quantity.SECTION_LENGTH)
                + ", in 1/4 in steps rounded down; common practice";
    }

    /** The equivalent weight of a stud: lb in US units, N in SI. */
    private String studWeight() {
        double w = criteria.studWeight();
        return us == UnitSystem.US ? CalcFormat.sig(Units.LBF.fromSi(w)) + " lb" : CalcFormat.sig(w) + " N";
    }

    private String density(double wc) {
        double pcf = wc / org.baywright.design.aisc360.StudStrengthI8.PCF;
        return us == UnitSystem.US ? CalcFormat.sig(pcf) + " pcf concrete" : CalcFormat.sig(wc / 1000) + " kN/m³ concrete";
    }

    private static List<Rejection> listed(List<Rejection> all, boolean allRejected) {
        int n = BeamCommand.NEAREST_REJECTED;
        return allRejected || all.size() <= n ? all : all.subList(all.size() - n, all.size());
    }

    private Map<String, Object> toJson(CompositeDesign d, boolean fixed, boolean allRejected, double deadLine, double liveLine) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("units", us.name().toLowerCase(Locale.ROOT));
        o.put("unitNames", RunSummary.ordered(
                "length", us.length().symbol(),
                "weight", us.weightPerLength().symbol(),
                "moment", us.moment().symbol(),
                "force", us.force().symbol(),
                "deflection", us.smallLength().symbol(),
                "sectionLength", us.smallLength().symbol(),
                "inertia", us.inertia().symbol(),
                "lineLoad", us.lineLoad().symbol(),
                "stress", us.stress().symbol(),
                "areaLoad", us.areaLoad().symbol()));
        o.put("span", us.length().fromSi(beam.span()));
        o.put("spacing", us.length().fromSi(beam.tributaryWidth()));
        o.put("method", criteria.method().name().toLowerCase(Locale.ROOT));
        o.put("steel", criteria.steel().name().equals(BeamCommand.FY_GIVEN) ? null : criteria.steel().name());
        o.put("fy", us.stress().fromSi(criteria.steel().fy()));
        o.put("selfWeight", criteria.selfWeight());
        o.put("shored", criteria.shored());
        o.put("catalog", cat.name());
        o.put("superimposedDead", us.lineLoad().fromSi(deadLine));
        o.put("live", us.lineLoad().fromSi(liveLine));
        o.put("constructionLive", us.areaLoad().fromSi(beam.constructionLive()));
        Section s = d.section();
        o.put("section", s == null ? null : BeamCommand.name(s, us));
        o.put("weight", s == null ? null : us.weightPerLength(s.weight()));
        o.put("weightUnit", us.weightPerLength().symbol());
        o.put("depth", s == null ? null : us.smallLength().fromSi(s.depth()));
        o.put("status", d.status().label());
        o.put("governingRatio", s == null ? null : d.governing().ratio());
        if (s != null) {
            CompositeFlexureI3.Result fl = d.flexure();
            Map<String, Object> c = new LinkedHashMap<>();
            c.put("beff", us.smallLength().fromSi(d.beff()));
            c.put("beffLeft", us.smallLength().fromSi(d.beffLeft()));
            c.put("beffRight", us.smallLength().fromSi(d.beffRight()));
            c.put("slabWeight", us.areaLoad().fromSi(d.slabWeight()));
            c.put("qn", us.force().fromSi(d.qn()));
            c.put("sumQn", us.force().fromSi(d.sumQn()));
            c.put("studs", d.studs());
            c.put("studsPerHalf", d.studsPerHalf());
            c.put("degree", fl.degree());
            c.put("pna", switch (fl.pna()) {
                case SLAB -> "slab";
                case TOP_FLANGE -> "top flange";
                case WEB -> "web";
            });
            c.put("pnaDepth", us.smallLength().fromSi(fl.pnaDepth()));
            c.put("a", us.smallLength().fromSi(fl.a()));
            c.put("y2", us.smallLength().fromSi(fl.d1()));
            c.put("mn", us.moment().fromSi(fl.mn()));
            c.put("availableStrength", us.moment().fromSi(d.check("composite flexure").capacity()));
            c.put("ILB", us.inertia().fromSi(d.ilb()));
            c.put("ITR", us.inertia().fromSi(d.itr()));
            c.put("preDeflection", us.smallLength().fromSi(d.preDeflection()));
            c.put("camber", us.smallLength().fromSi(d.camber()));
            c.put("constructionRatio", d.constructionRatio());
            c.put("unitNames", RunSummary.ordered("beff", us.smallLength().symbol(), "slabWeight", us.areaLoad().symbol(),
                    "qn", us.force().symbol(), "sumQn", us.force().symbol(), "pnaDepth", us.smallLength().symbol(),
                    "mn", us.moment().symbol(), "ILB", us.inertia().symbol(), "camber", us.smallLength().symbol(),
                    "preDeflection", us.smallLength().symbol()));
            o.put("composite", c);
            o.put("camber", us.smallLength().fromSi(d.camber()));
            o.put("studs", d.studs());
        }
        List<Object> checks = new ArrayList<>();
        for (Check k : d.checks()) {
            Map<String, Object> j = BeamCommand.checkJson(k, us);
            j.put("note", k.note());
            checks.add(j);
        }
        o.put("checks", checks);
        List<Object> rej = new ArrayList<>();
        for (Rejection x : listed(d.rejected(), allRejected)) {
            rej.add(RunSummary.ordered("section", BeamCommand.name(x.section(), us), "weight",
                    us.weightPerLength(x.section().weight()), "check", x.governing().name(), "ratio", x.governing().ratio(),
                    "reason", x.governing().note()));
        }
        o.put("rejectedCount", d.rejected().size());
        o.put("rejected", rej);
        o.put("deckProblems", designer.deckProblems());
        o.put("caution", Caution.TEXT);
        return o;
    }
}
