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
import org.baywright.load.Asce7;
import org.baywright.load.LiveLoadReduction;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.load.ReducibleUse;
import org.baywright.load.Reduction;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitParseException;
import org.baywright.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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
    /** The name of a steel with the yield stress the user gave (not A992's 50 ksi). */
    static final String FY_GIVEN = "given with --fy";

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

    @Option(names = "--roof-live", paramLabel = "LINE-LOAD", description = "Uniform roof live load Lr over the whole span, e.g. 0.2klf; the ASCE 7-16 combinations with Lr apply (§2.3.1, §2.4.1).")
    String roofLive;

    @Option(names = "--snow", paramLabel = "LINE-LOAD", description = "Uniform snow load S over the whole span, e.g. 0.3klf; the ASCE 7-16 combinations with S apply (§2.3.1, §2.4.1).")
    String snow;

    @Option(names = "--dead-point", paramLabel = "FORCE@POSITION", description = "Dead point load at a distance from the left support, e.g. 12kip@10ft. Repeatable.")
    List<String> deadPoints = new ArrayList<>();

    @Option(names = "--live-point", paramLabel = "FORCE@POSITION", description = "Live point load, e.g. 18kip@10ft. Repeatable.")
    List<String> livePoints = new ArrayList<>();

    @Option(names = "--tributary-area", paramLabel = "AREA",
            description = "Tributary area A_T of the member, e.g. 400ft2 or 37m2. Reduces the live load by ASCE 7-16 §4.7.2 "
            + "(Eq. 4.7-1, not below 0.50·L0, or 0.40·L0 with --floors 2 or more; no reduction when K_LL·A_T < 400 ft²) "
            + "and the roof live load by §4.8.2 (Eq. 4.8-1, R1 from A_T, R2 = 1 for a flat or low-slope roof, not below 12 psf). "
            + "L0 is taken as the member's live load divided by A_T. Without it nothing is reduced.")
    String tributaryArea;

    @Option(names = "--kll", paramLabel = "N", description = "Live-load element factor K_LL, ASCE 7-16 Table 4.7-1 "
            + "(default 2: interior beam, or edge beam without a cantilever slab; 1: edge beam with a cantilever slab, "
            + "cantilever beam). Needs --tributary-area.")
    String kll;

    @Option(names = "--floors", paramLabel = "N", description = "Floors the member supports, for the §4.7.2 lower limit "
            + "(default 1: 0.50·L0; 2 or more: 0.40·L0). Needs --tributary-area.")
    String floors;

    @Option(names = "--method", paramLabel = "lrfd|asd", defaultValue = "lrfd", description = "Design method (default: ${DEFAULT-VALUE}).")
    String method;

    @Option(names = "--bracing", paramLabel = "continuous|N", defaultValue = "continuous",
            description = "Compression-flange bracing: continuous (Lb = 0, a deck; the default) or N equal unbraced segments (1 = braced at the supports only). With --composite: the bracing of the bare steel during construction "
            + "where the deck does not brace it (ribs parallel; default there: 1).")
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

    @Option(names = "--all-rejected", description = "List every lighter section rejected (default: the five nearest the result).")
    boolean allRejected;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Mixin
    CompositeOptions composite = new CompositeOptions();

    @Option(names = "--calc", description = "Also print the calculation sheet of the chosen section: each equation as formula, substitution and result, with its clause.")
    boolean calc;

    /** How many of the lighter sections rejected are listed without {@code --all-rejected}: the nearest to the result. */
    static final int NEAREST_REJECTED = 5;

    /** Camber, common practice: about this fraction of the dead-load deflection… */
    static final double CAMBER_FRACTION = 0.80;
    /** …rounded down to this step (1/4 in)… */
    static final double CAMBER_STEP = 0.25 * 0.0254;
    /** …and none when that is below this (3/4 in). */
    static final double CAMBER_MIN = 0.75 * 0.0254;
    /** The camber rule as the output states it. */
    static final String CAMBER_RULE = "common practice: about 80 % of the dead-load deflection, rounded down to 1/4 in "
            + "(6 mm); none below 3/4 in (19 mm)";

    /** A point load placed exactly over a support: it goes straight into the support, not through the beam. */
    record SupportLoad(LoadCase loadCase, boolean left, double force) {
    }

    /** A live-load reduction applied: which case, what was reduced, and how. */
    record Applied(LoadCase loadCase, double l0, Reduction reduction, String clause) {
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        composite.refuseWithoutComposite();
        if (composite.on) {
            refuseForComposite();
        }
        double l = CliValues.quantity("--span", span, Dimension.LENGTH, true);
        UnitSystem us = unitSystem();
        Map<LoadCase, List<SpanLoad>> loads = new EnumMap<>(LoadCase.class);
        for (LoadCase c : LoadCase.values()) {
            loads.put(c, new ArrayList<>());
        }
        List<SupportLoad> onSupports = new ArrayList<>();
        boolean anyLoadOption = false;
        String[][] uniform = {{"--dead", dead}, {"--live", live}, {"--roof-live", roofLive}, {"--snow", snow}};
        LoadCase[] uniformCase = {LoadCase.D, LoadCase.L, LoadCase.LR, LoadCase.S};
        for (int i = 0; i < uniform.length; i++) {
            if (uniform[i][1] != null) {
                anyLoadOption = true;
                double w = CliValues.quantity(uniform[i][0], uniform[i][1], Dimension.LINE_LOAD, false);
                if (w > 0) {
                    loads.get(uniformCase[i]).add(DistributedLoad.full(l, w));
                }
            }
        }
        for (String p : deadPoints) {
            anyLoadOption = true;
            place(LoadCase.D, point("--dead-point", p, l), l, loads, onSupports);
        }
        for (String p : livePoints) {
            anyLoadOption = true;
            place(LoadCase.L, point("--live-point", p, l), l, loads, onSupports);
        }
        DesignMethod m = DesignMethod.parse(method);
        if (m == null) {
            throw new BadInputException("--method: \"" + method + "\" is not a design method; use lrfd or asd");
        }
        Bracing b = bracing();
        DeflectionLimits dl = new DeflectionLimits(limit("--live-limit", liveLimit), limit("--total-limit", totalLimit));
        double fyv = CliValues.quantity("--fy", fy, Dimension.STRESS, true);
        // A992 at its 50 ksi; any other Fy is named by the option, so that Fy is printed once (not also in the steel's name)
        Steel steel = fyv == Steel.A992.fy() ? Steel.A992 : new Steel(FY_GIVEN, fyv, Steel.A992.e());
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
        Section fixed = section == null ? null : cat.find(section).orElseThrow(() -> new BadInputException("--section: \""
                + section + "\" is not in the catalog " + cat.name() + "; see 'baywright catalog list'"));
        if (composite.on) {
            double wd = dead == null ? 0 : CliValues.quantity("--dead", dead, Dimension.LINE_LOAD, false);
            double wl = live == null ? 0 : CliValues.quantity("--live", live, Dimension.LINE_LOAD, false);
            boolean bracingGiven = spec.commandLine().getParseResult().hasMatchedOption("--bracing");
            CompositeRun run = new CompositeRun(composite.beam(l, wd, wl),
                    composite.criteria(m, steel, dl, sw, bracingGiven ? b : null), us, cat);
            int perHalf = composite.studsPerHalf(fixed != null);
            return run.execute(out, fixed, perHalf, filter, calc, json, allRejected, wd, wl);
        }
        boolean spanLoaded = loads.values().stream().anyMatch(x -> x.stream().anyMatch(y -> y.total() > 0));
        if (!spanLoaded) {
            if (!anyLoadOption || !sw) {
                throw new BadInputException("no load on the span: give at least one of --dead, --live, --roof-live, --snow "
                        + "(uniform, e.g. 0.45klf) or --dead-point, --live-point (e.g. 12kip@10ft)"
                        + (anyLoadOption ? "; the loads given are zero or lie over a support, and --self-weight is off" : ""));
            }
            err.println("warning: no load on the span (the loads given are zero or lie over a support): the member is "
                    + "sized for its own weight only");
        }
        List<Applied> reductions = reductions(l, loads);

        BeamLoads bl;
        try {
            if (reductions.isEmpty()) {
                bl = BeamLoads.of(l, loads);
            } else {
                // strength with the reduced live loads; deflection under the unreduced ones (common practice)
                Map<LoadCase, List<SpanLoad>> reduced = new EnumMap<>(loads);
                for (Applied a : reductions) {
                    List<SpanLoad> r = new ArrayList<>();
                    for (SpanLoad x : loads.get(a.loadCase())) {
                        r.add(x.scaled(a.reduction().factor()));
                    }
                    reduced.put(a.loadCase(), r);
                }
                bl = BeamLoads.of(l, reduced).withDeflectionLoads(loads);
            }
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        BeamCriteria criteria = new BeamCriteria(m, steel, b, dl, sw);
        BeamDesigner designer = new BeamDesigner(bl, criteria);
        BeamDesign design;
        if (fixed != null) {
            design = designer.checkFixed(fixed);
        } else {
            design = designer.search(cat, filter);
        }
        Calc sheet = null;
        if (calc && design.section() != null) {
            sheet = new Calc();
            recordReductions(sheet, l, loads);
            designer.check(design.section(), sheet);
        }
        Result r = new Result(design, designer, bl, loads, onSupports, reductions);
        if (json) {
            Map<String, Object> o = toJson(r, us, l, m, criteria, cat);
            if (sheet != null) {
                o.put("calculation", BeamCommand.sheetLines(sheet, us));
            }
            out.print(JsonText.write(o));
        } else {
            printText(out, r, us, l, criteria, cat);
            if (sheet != null) {
                printSheet(out, sheet, us);
            }
        }
        out.flush();
        return design.status() == MemberStatus.OVERSTRESSED ? BaywrightCommand.EXIT_OVERSTRESSED : BaywrightCommand.EXIT_OK;
    }

    /** Options of the plain beam that a composite beam does not take (uniform --dead and --live only). */
    private void refuseForComposite() {
        String[][] plainOnly = {{"--dead-point", deadPoints.isEmpty() ? null : ""}, {"--live-point", livePoints.isEmpty() ? null : ""},
            {"--roof-live", roofLive}, {"--snow", snow}, {"--tributary-area", tributaryArea}, {"--kll", kll}, {"--floors", floors}};
        for (String[] o : plainOnly) {
            if (o[1] != null) {
                throw new BadInputException(o[0] + " is not available with --composite: a composite beam takes uniform "
                        + "--dead (superimposed) and --live loads only; point loads, roof live load, snow and live-load "
                        + "reduction are not designed composite yet");
            }
        }
    }

    /** Prints a calculation sheet, one line per entry, headings set apart. */
    /** The calculation sheet as the JSON's "calculation" lines (one rendered line each). */
    static List<String> sheetLines(Calc sheet, UnitSystem us) {
        List<String> lines = new ArrayList<>();
        for (CalcLine line : sheet.lines()) {
            lines.add(CalcFormat.render(line, us));
        }
        return lines;
    }

    static void printSheet(PrintWriter out, Calc sheet, UnitSystem us) {
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

    /** What the outputs print: the design and what it was made from. */
    private record Result(BeamDesign design, BeamDesigner designer, BeamLoads loads, Map<LoadCase, List<SpanLoad>> service,
            List<SupportLoad> onSupports, List<Applied> reductions) {
    }

    /** A point load on the span, or, exactly over a support, a load that goes straight into that support. */
    private static void place(LoadCase c, PointLoad p, double l, Map<LoadCase, List<SpanLoad>> loads, List<SupportLoad> onSupports) {
        if (p.force() == 0) {
            return;
        }
        if (p.position() == 0 || p.position() == l) {
            onSupports.add(new SupportLoad(c, p.position() == 0, p.force()));
        } else {
            loads.get(c).add(p);
        }
    }

    /** The live-load reductions the options ask for (none without --tributary-area). */
    private List<Applied> reductions(double l, Map<LoadCase, List<SpanLoad>> loads) {
        if (tributaryArea == null) {
            if (kll != null || floors != null) {
                throw new BadInputException((kll != null ? "--kll" : "--floors") + " needs --tributary-area (the member's "
                        + "tributary area A_T, e.g. 400ft2), which the live-load reduction of ASCE 7-16 §4.7.2 works from");
            }
            return List.of();
        }
        double at = CliValues.quantity("--tributary-area", tributaryArea, Dimension.AREA, true);
        double k = kllValue();
        int n = floorsValue();
        List<Applied> out = new ArrayList<>();
        double totalL = total(loads.get(LoadCase.L));
        if (totalL > 0) {
            double l0 = totalL / at;
            out.add(new Applied(LoadCase.L, l0, LiveLoadReduction.floor(l0, k, at, n, ReducibleUse.ORDINARY, null),
                    Asce7.clause("§4.7.2")));
        }
        double totalLr = total(loads.get(LoadCase.LR));
        if (totalLr > 0) {
            double l0 = totalLr / at;
            out.add(new Applied(LoadCase.LR, l0, LiveLoadReduction.roof(l0, at, 0, null), Asce7.clause("§4.8.2")));
        }
        if (out.isEmpty()) {
            throw new BadInputException("--tributary-area: there is no live load (--live, --live-point) or roof live load "
                    + "(--roof-live) on the span to reduce");
        }
        return out;
    }

    /** The same reductions written on the calculation sheet. */
    private void recordReductions(Calc sheet, double l, Map<LoadCase, List<SpanLoad>> loads) {
        if (tributaryArea == null) {
            return;
        }
        double at = CliValues.quantity("--tributary-area", tributaryArea, Dimension.AREA, true);
        double totalL = total(loads.get(LoadCase.L));
        if (totalL > 0) {
            sheet.heading("Live-load reduction, L0 = live load on the member / A_T");
            LiveLoadReduction.floor(totalL / at, kllValue(), at, floorsValue(), ReducibleUse.ORDINARY, sheet);
        }
        double totalLr = total(loads.get(LoadCase.LR));
        if (totalLr > 0) {
            sheet.heading("Roof live-load reduction, L0 = roof live load on the member / A_T, flat or low-slope roof (F ≤ 4)");
            LiveLoadReduction.roof(totalLr / at, at, 0, sheet);
        }
    }

    private double kllValue() {
        if (kll == null) {
            return 2;
        }
        try {
            double v = Double.parseDouble(kll.trim());
            if (v == 1 || v == 2 || v == 3 || v == 4) {
                return v;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new BadInputException("--kll: \"" + kll + "\" is not an element factor of ASCE 7-16 Table 4.7-1; use 1, 2, 3 or 4 "
                + "(2 for an interior beam or an edge beam without a cantilever slab)");
    }

    private int floorsValue() {
        if (floors == null) {
            return 1;
        }
        try {
            int v = Integer.parseInt(floors.trim());
            if (v >= 1 && v <= 200) {
                return v;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new BadInputException("--floors: \"" + floors + "\" is not a number of floors; use a whole number from 1 to 200");
    }

    private static double total(List<SpanLoad> loads) {
        double t = 0;
        for (SpanLoad x : loads) {
            t += x.total();
        }
        return t;
    }

    /** Service end reactions of the chosen section by load case, N: {left, right}; the self-weight is in D. */
    private static Map<LoadCase, double[]> serviceReactions(Result r, double l) {
        Map<LoadCase, double[]> out = new EnumMap<>(LoadCase.class);
        double w = r.designer().criteria().selfWeight() ? r.design().section().weight() : 0;
        for (LoadCase c : LoadCase.values()) {
            org.baywright.analysis.SimpleSpan s = r.loads().of(c);
            double sw = c == LoadCase.D ? w * l / 2 : 0;
            double left = s.leftReaction() + sw;
            double right = s.rightReaction() + sw;
            if (left != 0 || right != 0 || c == LoadCase.D) {
                out.put(c, new double[] {left, right});
            }
        }
        return out;
    }

    /** End reactions per strength combination, N: {left, right}, in the order of the designer's combinations. */
    private static List<double[]> factoredReactions(Result r, Map<LoadCase, double[]> service) {
        List<double[]> out = new ArrayList<>();
        for (LoadCombination c : r.designer().combinations()) {
            double left = 0;
            double right = 0;
            for (Map.Entry<LoadCase, double[]> e : service.entrySet()) {
                left += c.factor(e.getKey()) * e.getValue()[0];
                right += c.factor(e.getKey()) * e.getValue()[1];
            }
            out.add(new double[] {left, right});
        }
        return out;
    }

    /** Dead-load deflection of the chosen section, m: the dead load given and the self-weight, service. */
    private static double deadDeflection(Result r) {
        Section s = r.design().section();
        double w = r.designer().criteria().selfWeight() ? s.weight() : 0;
        double[] m = new double[2];
        r.loads().forDeflection(LoadCase.D).maxEiDeflectionWithUniform(w, m);
        return m[0] / (r.designer().criteria().steel().e() * s.props().ix());
    }

    /** The camber a dead-load deflection implies (common practice, {@link #CAMBER_RULE}), m; 0 for none. */
    static double camber(double deadDeflection) {
        double c = Math.floor(CAMBER_FRACTION * deadDeflection / CAMBER_STEP + 1e-9) * CAMBER_STEP;
        return c < CAMBER_MIN - 1e-12 ? 0 : c;
    }

    /** The rejected sections to list: all, or the nearest few (the heaviest of them, closest to the result). */
    private List<Rejection> listed(List<Rejection> all) {
        return allRejected || all.size() <= NEAREST_REJECTED ? all : all.subList(all.size() - NEAREST_REJECTED, all.size());
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

    static String ratio(double r) {
        return Double.isFinite(r) ? String.format(Locale.ROOT, "%.3f", r) : "n/a";
    }

    private void printText(PrintWriter out, Result r, UnitSystem us, double l, BeamCriteria c, Catalog cat) {
        BeamDesign d = r.design();
        String spanText = us == UnitSystem.US ? UnitSystem.feetInches(l, 16) + " (" + fmt(l, Quantity.SPAN_LENGTH, us) + ")"
                : fmt(l, Quantity.SPAN_LENGTH, us);
        out.println("Baywright beam: simple span " + spanText + ", " + c.method() + ", " + steelText(c.steel(), us));
        out.println("Loads (service):");
        for (LoadCase lc : LoadCase.values()) {
            for (SpanLoad s : r.service().get(lc)) {
                out.println("  " + lc.symbol() + "  " + describe(s, us));
            }
        }
        for (SupportLoad s : r.onSupports()) {
            out.println("  " + s.loadCase().symbol() + "  " + fmt(s.force(), Quantity.FORCE, us) + " point load over the "
                    + (s.left() ? "left" : "right") + " support: goes straight into the support (no beam shear or moment)");
        }
        out.println("  self-weight: " + (c.selfWeight() ? "added per candidate" : "not added (included in the dead load)"));
        for (Applied a : r.reductions()) {
            out.println(reductionText(a, us));
        }
        out.println("Bracing: " + c.bracing().describe() + ". Deflection limits: live "
                + (c.deflection().live() > 0 ? "L/" + CalcFormat.sig(c.deflection().live()) : "off") + ", total "
                + (c.deflection().total() > 0 ? "L/" + CalcFormat.sig(c.deflection().total()) : "off") + " ("
                + DeflectionLimits.SOURCE + ")" + (r.reductions().isEmpty() ? "" : ", under the unreduced live load (common practice)")
                + ".");
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
            out.println("Result: " + name(d.section(), us) + " (" + CalcFormat.sig(us.weightPerLength(d.section().weight()))
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
            printReactions(out, r, us, l, c);
            double dd = deadDeflection(r);
            double cam = camber(dd);
            out.println();
            out.println("Dead-load deflection: " + fmt(dd, Quantity.SECTION_LENGTH, us) + " (service dead load"
                    + (c.selfWeight() ? " and self-weight" : "") + "). Camber: "
                    + (cam > 0 ? fmt(cam, Quantity.SECTION_LENGTH, us) : "none") + " (" + CAMBER_RULE + ").");
        }
        if (!d.rejected().isEmpty()) {
            List<Rejection> shown = listed(d.rejected());
            out.println();
            out.println("Lighter sections rejected (" + d.rejected().size()
                    + (shown.size() < d.rejected().size() ? "; the " + shown.size() + " nearest shown, all with --all-rejected" : "")
                    + "):");
            TextTable t = new TextTable(new boolean[] {false, true, false, true, false},
                    "section", "weight", "fails on", "ratio", "combination");
            for (Rejection x : shown) {
                t.row(name(x.section(), us), CalcFormat.sig(us.weightPerLength(x.section().weight())) + " "
                        + us.weightPerLength().symbol(), x.governing().name(), ratio(x.governing().ratio()),
                        x.governing().combination());
            }
            out.print(t.render("  "));
        }
        out.println();
        out.println(Caution.TEXT);
    }

    private static void printReactions(PrintWriter out, Result r, UnitSystem us, double l, BeamCriteria c) {
        Map<LoadCase, double[]> service = serviceReactions(r, l);
        List<double[]> factored = factoredReactions(r, service);
        out.println();
        out.println("End reactions (the beam's shear at each support" + (c.selfWeight() ? "; self-weight in D" : "") + "):");
        TextTable t = new TextTable(new boolean[] {false, true, true, false}, "load", "left", "right", "");
        for (Map.Entry<LoadCase, double[]> e : service.entrySet()) {
            boolean reduced = r.reductions().stream().anyMatch(a -> a.loadCase() == e.getKey() && a.reduction().factor() < 1);
            t.row(e.getKey().symbol(), fmt(e.getValue()[0], Quantity.FORCE, us), fmt(e.getValue()[1], Quantity.FORCE, us),
                    "service, " + e.getKey().label() + (reduced ? ", reduced" : ""));
        }
        List<LoadCombination> combos = r.designer().combinations();
        for (int i = 0; i < combos.size(); i++) {
            t.row(combos.get(i).name(), fmt(factored.get(i)[0], Quantity.FORCE, us), fmt(factored.get(i)[1], Quantity.FORCE, us),
                    combos.get(i).reference());
        }
        out.print(t.render("  "));
        for (SupportLoad s : r.onSupports()) {
            out.println("  and straight into the " + (s.left() ? "left" : "right") + " support, not through the beam: "
                    + s.loadCase().symbol() + " " + fmt(s.force(), Quantity.FORCE, us));
        }
    }

    private static String reductionText(Applied a, UnitSystem us) {
        Reduction x = a.reduction();
        String sym = a.loadCase() == LoadCase.L ? "L" : "Lr";
        return "Live-load reduction of " + sym + " (" + a.clause() + "): L0 = " + fmt(a.l0(), Quantity.AREA_LOAD, us)
                + " (the member's " + a.loadCase().label() + " load / A_T) → " + sym + " = "
                + String.format(Locale.ROOT, "%.3f", x.factor()) + "·L0 (" + x.rule() + ")";
    }

    /** "ASTM A992, Fy = 50 ksi", or "Fy = 55 ksi (given with --fy)": Fy printed once. */
    static String steelText(Steel s, UnitSystem us) {
        String fyText = "Fy = " + fmt(s.fy(), Quantity.STRESS, us);
        return s.name().equals(FY_GIVEN) ? fyText + " (" + FY_GIVEN + ")" : s.name() + ", " + fyText;
    }

    /** A section's designation in the output's units: in SI, the SI designation where the catalog gives it. */
    static String name(Section s, UnitSystem us) {
        return s.designationIn(us);
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

    private Map<String, Object> toJson(Result r, UnitSystem us, double l, DesignMethod m, BeamCriteria c, Catalog cat) {
        BeamDesign d = r.design();
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("units", us.name().toLowerCase(Locale.ROOT));
        o.put("unitNames", org.baywright.report.RunSummary.ordered(
                "length", us.length().symbol(),
                "weight", us.weightPerLength().symbol(),
                "moment", us.moment().symbol(),
                "force", us.force().symbol(),
                "deflection", us.smallLength().symbol(),
                "stress", us.stress().symbol(),
                "area", us.floorArea().symbol(),
                "areaLoad", us.areaLoad().symbol()));
        o.put("span", us.length().fromSi(l));
        o.put("method", m.name().toLowerCase(Locale.ROOT));
        o.put("steel", c.steel().name().equals(FY_GIVEN) ? null : c.steel().name());
        o.put("fy", us.stress().fromSi(c.steel().fy()));
        o.put("selfWeight", c.selfWeight());
        o.put("catalog", cat.name());
        o.put("section", d.section() == null ? null : name(d.section(), us));
        o.put("weight", d.section() == null ? null : us.weightPerLength(d.section().weight()));
        o.put("weightUnit", us.weightPerLength().symbol());
        o.put("depth", d.section() == null ? null : us.smallLength().fromSi(d.section().depth()));
        o.put("status", d.status().label());
        o.put("governingRatio", d.section() == null ? null : d.maxRatio());
        List<Object> supports = new ArrayList<>();
        for (SupportLoad s : r.onSupports()) {
            supports.add(org.baywright.report.RunSummary.ordered("case", s.loadCase().symbol(), "support",
                    s.left() ? "left" : "right", "force", us.force().fromSi(s.force())));
        }
        o.put("loadsOnSupports", supports);
        List<Object> red = new ArrayList<>();
        for (Applied a : r.reductions()) {
            red.add(org.baywright.report.RunSummary.ordered("case", a.loadCase().symbol(), "clause", a.clause(),
                    "kll", a.loadCase() == LoadCase.L ? kllValue() : null,
                    "floors", a.loadCase() == LoadCase.L ? floorsValue() : null,
                    "tributaryArea", us.floorArea().fromSi(CliValues.quantity("--tributary-area", tributaryArea, Dimension.AREA, true)),
                    "l0", us.areaLoad().fromSi(a.l0()), "factor", a.reduction().factor(), "rule", a.reduction().rule()));
        }
        o.put("liveLoadReduction", red);
        o.put("deflectionLiveLoad", r.reductions().isEmpty() ? "as given" : "unreduced");
        List<Object> checks = new ArrayList<>();
        for (Check k : d.checks()) {
            Map<String, Object> j = checkJson(k, us);
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
        if (d.section() != null) {
            Map<LoadCase, double[]> service = serviceReactions(r, l);
            List<double[]> factored = factoredReactions(r, service);
            List<Object> sv = new ArrayList<>();
            for (Map.Entry<LoadCase, double[]> e : service.entrySet()) {
                sv.add(org.baywright.report.RunSummary.ordered("case", e.getKey().symbol(),
                        "left", us.force().fromSi(e.getValue()[0]), "right", us.force().fromSi(e.getValue()[1])));
            }
            List<Object> fc = new ArrayList<>();
            List<LoadCombination> combos = r.designer().combinations();
            for (int i = 0; i < combos.size(); i++) {
                fc.add(org.baywright.report.RunSummary.ordered("combination", combos.get(i).name(),
                        "reference", combos.get(i).reference(),
                        "left", us.force().fromSi(factored.get(i)[0]), "right", us.force().fromSi(factored.get(i)[1])));
            }
            o.put("reactions", org.baywright.report.RunSummary.ordered("unit", us.force().symbol(),
                    "selfWeightInD", c.selfWeight(), "service", sv, "factored", fc));
            double dd = deadDeflection(r);
            o.put("deadLoadDeflection", us.smallLength().fromSi(dd));
            o.put("camber", us.smallLength().fromSi(camber(dd)));
            o.put("camberRule", CAMBER_RULE);
        }
        List<Rejection> shown = listed(d.rejected());
        List<Object> rej = new ArrayList<>();
        for (Rejection x : shown) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("section", name(x.section(), us));
            j.put("weight", us.weightPerLength(x.section().weight()));
            j.put("check", x.governing().name());
            j.put("ratio", x.governing().ratio());
            j.put("combination", x.governing().combination());
            rej.add(j);
        }
        o.put("rejectedCount", d.rejected().size());
        o.put("rejected", rej);
        o.put("caution", Caution.TEXT);
        return o;
    }

    /**
     * A check as the JSON of {@code beam} writes it, in the output's units: name, ratio, demand, capacity, unit,
     * combination and clause (the plain and the composite output add their own keys after these).
     */
    static Map<String, Object> checkJson(Check k, UnitSystem us) {
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("name", k.name());
        j.put("ratio", k.ratio());
        j.put("demand", k.quantity().unit(us).fromSi(k.demand()));
        j.put("capacity", k.quantity().unit(us).fromSi(k.capacity()));
        j.put("unit", k.quantity().unit(us).symbol());
        j.put("combination", k.combination());
        j.put("clause", k.clause());
        return j;
    }
}
