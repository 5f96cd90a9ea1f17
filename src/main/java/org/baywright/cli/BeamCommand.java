package org.baywright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Caution;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.design.Bracing;
import org.baywright.design.Check;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.MemberStatus;
import org.baywright.design.Rejection;
import org.baywright.design.SearchFilter;
import org.baywright.design.Steel;
import org.baywright.io.JsonText;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitParseException;
import org.baywright.run.DesignBasis;
import org.baywright.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code baywright beam}: size (or check) one simple-span member. */
@Command(name = "beam", mixinStandardHelpOptions = true, sortOptions = false,
        description = {
            "Size one simple-span floor member: the lightest catalog section that passes flexure (AISC 360-16 F2/F3, "
            + "with lateral-torsional buckling), shear (G2.1) and the deflection limits, its own weight included.",
            "Loads are service loads; the ASCE 7-16 combinations are applied. Every length, load and stress needs "
            + "its unit: 35ft, 30'-6\", 10.5m; 0.45klf, 450plf, 6.5kN/m; 12kip, 50kN; 50ksi, 345MPa.",
            "Exit code: 0 sized or fixed size passes; 1 overstressed; 2 bad input."},
        footer = {"", Caution.TEXT})
public final class BeamCommand implements Callable<Integer> {
    /** A point load this fraction of the span past the end is still on it: the rounding of a typed position equal to the span. */
    private static final double ON_SPAN = 1e-12;


    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--span", required = true, paramLabel = "LENGTH", description = "Span between supports, e.g. 35ft, 30'-6\", 10.5m.")
    String span;

    @Option(names = "--dead", paramLabel = "LINE-LOAD", description = "Uniform dead load over the whole span (without the member's own weight), e.g. 0.45klf.")
    String dead;

    @Option(names = "--live", paramLabel = "LINE-LOAD", description = "Uniform live load over the whole span, e.g. 0.75klf.")
    String live;

    @Option(names = "--dead-point", paramLabel = "FORCE@POSITION", description = "Dead point load at a distance from the left support, e.g. 12kip@10ft. Repeatable.")
    List<String> deadPoints = new ArrayList<>();

    @Option(names = "--live-point", paramLabel = "FORCE@POSITION", description = "Live point load, e.g. 18kip@10ft. Repeatable.")
    List<String> livePoints = new ArrayList<>();

    @Option(names = "--method", paramLabel = "lrfd|asd", defaultValue = "lrfd", description = "Design method (default: ${DEFAULT-VALUE}).")
    String method;

    @Option(names = "--bracing", paramLabel = "continuous|N", defaultValue = "continuous",
            description = "Compression-flange bracing: continuous (Lb = 0, a deck; the default) or N equal unbraced segments (1 = braced at the supports only).")
    String bracing;

    @Option(names = "--max-depth", paramLabel = "LENGTH", description = "Largest actual depth d allowed, e.g. 18in.")
    String maxDepth;

    @Option(names = "--min-depth", paramLabel = "LENGTH", description = "Smallest actual depth d allowed, e.g. 12in.")
    String minDepth;

    @Option(names = "--series", paramLabel = "LIST", split = ",", description = "Nominal-depth series allowed, e.g. W14,W16.")
    List<String> series = new ArrayList<>();

    @Option(names = "--exclude", paramLabel = "LIST", split = ",", description = "Sections never chosen, e.g. W16X26,W18X35.")
    List<String> exclude = new ArrayList<>();

    @Option(names = "--live-limit", paramLabel = "N|off", defaultValue = "360", description = "Live-load deflection limit L/N (default ${DEFAULT-VALUE}; IBC Table 1604.3), or off.")
    String liveLimit;

    @Option(names = "--total-limit", paramLabel = "N|off", defaultValue = "240", description = "Total-load deflection limit L/N (default ${DEFAULT-VALUE}; IBC Table 1604.3), or off.")
    String totalLimit;

    @Option(names = "--fy", paramLabel = "STRESS", defaultValue = "50ksi", description = "Yield stress (default ${DEFAULT-VALUE}, ASTM A992).")
    String fy;

    @Option(names = "--self-weight", paramLabel = "on|off", defaultValue = "on", description = "Add each candidate's weight to the dead load (default ${DEFAULT-VALUE}).")
    String selfWeight;

    @Option(names = "--section", paramLabel = "DESIGNATION", description = "Check this section instead of searching (fixed size), e.g. W18X50.")
    String section;

    @Option(names = "--catalog", paramLabel = "FILE", description = "Section catalog file (default: the built-in W shapes).")
    Path catalog;

    @Option(names = "--units", paramLabel = "us|si", description = "Units of the output (default: SI when the span is metric, else US).")
    String units;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Option(names = "--calc", description = "Also print the calculation sheet of the chosen section: each equation as formula, substitution and result, with its clause.")
    boolean calc;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        double l = CliValues.quantity("--span", span, Dimension.LENGTH, true);
        UnitSystem us = unitSystem();
        Map<LoadCase, List<SpanLoad>> loads = new EnumMap<>(LoadCase.class);
        loads.put(LoadCase.D, new ArrayList<>());
        loads.put(LoadCase.L, new ArrayList<>());
        if (dead != null) {
            double w = CliValues.quantity("--dead", dead, Dimension.LINE_LOAD, false);
            if (w > 0) {
                loads.get(LoadCase.D).add(DistributedLoad.full(l, w));
            }
        }
        if (live != null) {
            double w = CliValues.quantity("--live", live, Dimension.LINE_LOAD, false);
            if (w > 0) {
                loads.get(LoadCase.L).add(DistributedLoad.full(l, w));
            }
        }
        for (String p : deadPoints) {
            loads.get(LoadCase.D).add(point("--dead-point", p, l));
        }
        for (String p : livePoints) {
            loads.get(LoadCase.L).add(point("--live-point", p, l));
        }
        DesignMethod m = DesignMethod.parse(method);
        if (m == null) {
            throw new BadInputException("--method: \"" + method + "\" is not a design method; use lrfd or asd");
        }
        Bracing b = bracing();
        DeflectionLimits dl = new DeflectionLimits(limit("--live-limit", liveLimit), limit("--total-limit", totalLimit));
        double fyv = CliValues.quantity("--fy", fy, Dimension.STRESS, true);
        Steel steel = DesignBasis.steel(fyv);
        if (fyv >= steel.e() / 10) {
            throw new BadInputException("--fy: \"" + fy + "\" is not a plausible structural steel yield stress");
        }
        boolean sw = onOff("--self-weight", selfWeight);
        Catalog cat = Catalogs.load(catalog);

        double minD = minDepth == null ? 0 : CliValues.quantity("--min-depth", minDepth, Dimension.LENGTH, true);
        double maxD = maxDepth == null ? Double.POSITIVE_INFINITY : CliValues.quantity("--max-depth", maxDepth, Dimension.LENGTH, true);
        if (minD > maxD) {
            throw new BadInputException("--min-depth is larger than --max-depth");
        }
        Set<String> seriesSet = new LinkedHashSet<>();
        for (String s : series) {
            String n = Section.normalize(s);
            if (n.isEmpty()) {
                continue;
            }
            boolean known = cat.sections().stream().anyMatch(x -> x.series().equals(n));
            if (!known) {
                throw new BadInputException("--series: \"" + s + "\" is not a series of the catalog; e.g. W14, W16, W18");
            }
            seriesSet.add(n);
        }
        Set<String> excluded = new LinkedHashSet<>();
        for (String s : exclude) {
            if (s.isBlank()) {
                continue;
            }
            Section x = cat.find(s).orElseThrow(() -> new BadInputException("--exclude: \"" + s + "\" is not in the catalog"));
            excluded.add(x.designation());
        }
        SearchFilter filter = new SearchFilter(minD, maxD, seriesSet, excluded);

        BeamLoads bl;
        try {
            bl = BeamLoads.of(l, loads);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        BeamCriteria criteria = new BeamCriteria(m, steel, b, dl, sw);
        BeamDesigner designer = new BeamDesigner(bl, criteria);
        BeamDesign design;
        if (section != null) {
            Section s = cat.find(section).orElseThrow(() -> new BadInputException("--section: \"" + section
                    + "\" is not in the catalog " + cat.name() + "; see 'baywright catalog list'"));
            design = designer.checkFixed(s);
        } else {
            design = designer.search(cat, filter);
        }
        Calc sheet = null;
        if (calc && design.section() != null) {
            sheet = new Calc();
            designer.check(design.section(), sheet);
        }
        if (json) {
            Map<String, Object> o = toJson(design, us, l, m, criteria, cat);
            if (sheet != null) {
                List<String> lines = new ArrayList<>();
                for (CalcLine line : sheet.lines()) {
                    lines.add(CalcFormat.render(line, us));
                }
                o.put("calculation", lines);
            }
            out.print(JsonText.write(o));
        } else {
            printText(out, design, us, l, loads, criteria, cat, filter);
            if (sheet != null) {
                out.println();
                out.println("Calculation sheet");
                for (CalcLine line : sheet.lines()) {
                    boolean head = line.kind() == CalcLine.Kind.HEADING;
                    if (head) {
                        out.println();
                    }
                    out.println((head ? "" : "  ") + CalcFormat.render(line, us));
                }
                out.println();
                out.println(Caution.TEXT);
            }
        }
        out.flush();
        return design.status() == MemberStatus.OVERSTRESSED ? BaywrightCommand.EXIT_OVERSTRESSED : BaywrightCommand.EXIT_OK;
    }

    private UnitSystem unitSystem() {
        if (units != null) {
            return CliValues.units("--units", units);
        }
        String t = span.trim().toLowerCase(Locale.ROOT);
        return t.endsWith("mm") || t.endsWith("cm") || (t.endsWith("m") && !t.endsWith("in")) ? UnitSystem.SI : UnitSystem.US;
    }


    private static PointLoad point(String option, String text, double span) {
        int at = text.indexOf('@');
        if (at < 0 || text.indexOf('@', at + 1) >= 0) {
            throw new BadInputException(option + ": \"" + text + "\" is not a point load; write FORCE@POSITION, e.g. 12kip@10ft or 50kN@3m");
        }
        double p = CliValues.quantity(option + " (force)", text.substring(0, at), Dimension.FORCE, false);
        double x = CliValues.quantity(option + " (position)", text.substring(at + 1), Dimension.LENGTH, false);
        if (x > span * (1 + ON_SPAN)) {
            throw new BadInputException(option + ": \"" + text + "\": the position is beyond the span; it must lie between 0 and the span from the left support");
        }
        return new PointLoad(Math.min(x, span), p);
    }

    private Bracing bracing() {
        String t = bracing.trim().toLowerCase(Locale.ROOT);
        if (t.equals("continuous")) {
            return Bracing.continuous();
        }
        try {
            int n = Integer.parseInt(t);
            if (n >= 1 && n <= 100) {
                return Bracing.equalSegments(n);
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new BadInputException("--bracing: \"" + bracing + "\" is not allowed; use continuous, or a whole number of equal unbraced segments from 1 to 100 (1 = braced at the supports only)");
    }

    private static double limit(String option, String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.equals("off")) {
            return 0;
        }
        if (t.startsWith("l/")) {
            t = t.substring(2);
        }
        try {
            double v = Double.parseDouble(t);
            if (v >= 60 && v <= 10000) {
                return v;
            }
        } catch (NumberFormatException e) {
            // fall through
        }
        throw new BadInputException(option + ": \"" + text + "\" is not a deflection limit; use a span ratio N for L/N between 60 and 10000 (e.g. 360), or off");
    }

    private static boolean onOff(String option, String text) {
        return switch (text.trim().toLowerCase(Locale.ROOT)) {
            case "on", "true", "yes" -> true;
            case "off", "false", "no" -> false;
            default -> throw new BadInputException(option + ": \"" + text + "\" is not allowed; use on or off");
        };
    }

    static String fmt(double si, Quantity q, UnitSystem us) {
        return CalcFormat.value(si, q, us);
    }

    private static String ratio(double r) {
        return Double.isFinite(r) ? String.format(Locale.ROOT, "%.3f", r) : "n/a";
    }

    private void printText(PrintWriter out, BeamDesign d, UnitSystem us, double l, Map<LoadCase, List<SpanLoad>> loads,
            BeamCriteria c, Catalog cat, SearchFilter filter) {
        String spanText = us == UnitSystem.US ? UnitSystem.feetInches(l, 16) + " (" + fmt(l, Quantity.SPAN_LENGTH, us) + ")"
                : fmt(l, Quantity.SPAN_LENGTH, us);
        out.println("Baywright beam: simple span " + spanText + ", " + c.method() + ", " + c.steel().name()
                + " (Fy = " + fmt(c.steel().fy(), Quantity.STRESS, us) + ")");
        out.println("Loads (service):");
        for (LoadCase lc : new LoadCase[] {LoadCase.D, LoadCase.L}) {
            for (SpanLoad s : loads.get(lc)) {
                out.println("  " + lc.symbol() + "  " + describe(s, us));
            }
        }
        out.println("  self-weight: " + (c.selfWeight() ? "added per candidate" : "not added (included in the dead load)"));
        out.println("Bracing: " + c.bracing().describe() + ". Deflection limits: live "
                + (c.deflection().live() > 0 ? "L/" + CalcFormat.sig(c.deflection().live()) : "off") + ", total "
                + (c.deflection().total() > 0 ? "L/" + CalcFormat.sig(c.deflection().total()) : "off") + " ("
                + DeflectionLimits.SOURCE + ").");
        out.println("Catalog: " + cat.name() + ", " + cat.size() + " sections"
                + (section == null ? ", " + d.candidates() + " allowed by the filters" : ""));
        out.println();
        if (d.section() == null) {
            out.println("Result: overstressed: no section of the catalog is allowed by the filters.");
        } else {
            Check g = d.governing();
            String label = switch (d.status()) {
                case SIZED -> "sized: lightest adequate section";
                case FIXED_SIZE -> "fixed size: checked, passes";
                case OVERSTRESSED -> section != null ? "overstressed: the fixed size fails"
                        : "overstressed: no section passes; the closest is shown";
                default -> d.status().label();
            };
            out.println("Result: " + d.section().designation() + " (" + CalcFormat.sig(us.weightPerLength(d.section().weight()))
                    + " " + us.weightPerLength().symbol() + ", d = " + fmt(d.section().depth(), Quantity.SECTION_LENGTH, us)
                    + "), " + label + "; governing ratio " + ratio(g.ratio()) + " (" + g.name() + ")");
            out.println();
            TextTable t = new TextTable(new boolean[] {false, true, true, true, false, false, false},
                    "check", "demand", "capacity", "ratio", "combination", "clause", "where");
            for (Check k : d.checks()) {
                t.row(k.name(), fmt(k.demand(), k.quantity(), us), fmt(k.capacity(), k.quantity(), us), ratio(k.ratio()),
                        k.combination(), k.clause(), where(k, us));
            }
            out.print(t.render("  "));
        }
        if (!d.rejected().isEmpty()) {
            out.println();
            out.println("Lighter sections rejected (" + d.rejected().size() + "):");
            TextTable t = new TextTable(new boolean[] {false, true, false, true, false},
                    "section", "weight", "fails on", "ratio", "combination");
            for (Rejection r : d.rejected()) {
                t.row(r.section().designation(), CalcFormat.sig(us.weightPerLength(r.section().weight())) + " "
                        + us.weightPerLength().symbol(), r.governing().name(), ratio(r.governing().ratio()),
                        r.governing().combination());
            }
            out.print(t.render("  "));
        }
        out.println();
        out.println(Caution.TEXT);
    }

    private static String where(Check k, UnitSystem us) {
        List<String> parts = new ArrayList<>();
        if (!Double.isNaN(k.position())) {
            parts.add("x = " + fmt(k.position(), Quantity.SPAN_LENGTH, us));
        }
        if (!Double.isNaN(k.lb())) {
            parts.add(k.lb() == 0 ? "Lb = 0" : "Lb = " + fmt(k.lb(), Quantity.SPAN_LENGTH, us));
        }
        if (!Double.isNaN(k.cb())) {
            parts.add("Cb = " + CalcFormat.sig(k.cb()));
        }
        if (!k.note().isEmpty()) {
            parts.add(k.note());
        }
        return String.join(", ", parts);
    }

    private static String describe(SpanLoad s, UnitSystem us) {
        if (s instanceof PointLoad p) {
            return fmt(p.force(), Quantity.FORCE, us) + " point load at " + fmt(p.position(), Quantity.SPAN_LENGTH, us);
        }
        DistributedLoad d = (DistributedLoad) s;
        return fmt(d.wStart(), Quantity.LINE_LOAD, us) + " uniform from " + fmt(d.start(), Quantity.SPAN_LENGTH, us)
                + " to " + fmt(d.end(), Quantity.SPAN_LENGTH, us);
    }

    private Map<String, Object> toJson(BeamDesign d, UnitSystem us, double l, DesignMethod m, BeamCriteria c, Catalog cat) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("units", us.name().toLowerCase(Locale.ROOT));
        o.put("unitNames", org.baywright.report.RunSummary.ordered(
                "length", us.length().symbol(),
                "weight", us.weightPerLength().symbol(),
                "moment", us.moment().symbol(),
                "force", us.force().symbol(),
                "deflection", us.smallLength().symbol()));
        o.put("span", us.length().fromSi(l));
        o.put("method", m.name().toLowerCase(Locale.ROOT));
        o.put("fy", us.stress().fromSi(c.steel().fy()));
        o.put("selfWeight", c.selfWeight());
        o.put("catalog", cat.name());
        o.put("section", d.section() == null ? null : d.section().designation());
        o.put("weight", d.section() == null ? null : us.weightPerLength(d.section().weight()));
        o.put("weightUnit", us.weightPerLength().symbol());
        o.put("depth", d.section() == null ? null : us.smallLength().fromSi(d.section().depth()));
        o.put("status", d.status().label());
        o.put("governingRatio", d.section() == null ? null : d.maxRatio());
        List<Object> checks = new ArrayList<>();
        for (Check k : d.checks()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("name", k.name());
            j.put("ratio", k.ratio());
            j.put("demand", k.quantity().unit(us).fromSi(k.demand()));
            j.put("capacity", k.quantity().unit(us).fromSi(k.capacity()));
            j.put("unit", k.quantity().unit(us).symbol());
            j.put("combination", k.combination());
            j.put("clause", k.clause());
            if (!Double.isNaN(k.position())) {
                j.put("position", us.length().fromSi(k.position()));
            }
            if (!Double.isNaN(k.lb())) {
                j.put("lb", us.length().fromSi(k.lb()));
            }
            if (!Double.isNaN(k.cb())) {
                j.put("cb", k.cb());
            }
            checks.add(j);
        }
        o.put("checks", checks);
        List<Object> rej = new ArrayList<>();
        for (Rejection r : d.rejected()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("section", r.section().designation());
            j.put("weight", us.weightPerLength(r.section().weight()));
            j.put("check", r.governing().name());
            j.put("ratio", r.governing().ratio());
            j.put("combination", r.governing().combination());
            rej.add(j);
        }
        o.put("rejected", rej);
        o.put("caution", Caution.TEXT);
        return o;
    }
}
