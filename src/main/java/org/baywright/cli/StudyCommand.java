package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.baywright.calc.Caution;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.io.JsonText;
import org.baywright.plan.Plan;
import org.baywright.study.CancelToken;
import org.baywright.study.Objective;
import org.baywright.study.ProgressListener;
import org.baywright.study.Setting;
import org.baywright.study.Study;
import org.baywright.study.StudyResult;
import org.baywright.study.StudySpec;
import org.baywright.study.Sweep;
import org.baywright.study.SweepText;
import org.baywright.study.VariantResult;
import org.baywright.study.Variations;
import org.baywright.units.Dimension;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code baywright study}: sweep bay sizes and beam layouts of a plan and compare steel weight and depth. */
@Command(name = "study", mixinStandardHelpOptions = true,
        description = {"Sweep bay sizes, beam spacing and direction (and design settings) of a plan: every variant is a full run.",
            "Prints the variants sorted by steel weight per floor area, marks the Pareto fronts of weight against "
            + "structural depth (D) and against piece count (P), and the best three for the objective (see docs/study.md).",
            "Exit code: 0 some variant sized without problems; 1 none did; 2 bad input."},
        footer = {"", "Parameters: bay-x, bay-y, beam-spacing, beam-count, beam-direction, method, max-depth, column-series,"
            + " composite (on,off), topping, concrete (a unit weight: 110pcf,145pcf).",
            "Values: a range A..B:STEP (6ft..15ft:1ft) or a list a,b,c (x,y); a bay value may give one width per bay: 30ft;35ft;30ft.",
            "", Caution.TEXT})
public final class StudyCommand implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(paramLabel = "PLAN.bay.json")
    Path file;

    @Option(names = "--vary", paramLabel = "PARAMETER=VALUES", description = "A parameter and its values (repeat for more; the variants are every combination).")
    List<String> vary = new ArrayList<>();

    @Option(names = "--objective", paramLabel = "weight|weight+pieces:COST", defaultValue = "weight",
            description = "What the best three minimise: steel weight, or weight plus COST (a weight, e.g. 150lb) per piece (default ${DEFAULT-VALUE}).")
    String objective;

    @Option(names = "--max-depth", paramLabel = "DEPTH", description = "Structural depth limit, e.g. 24in: members are sized within it and deeper variants are not best.")
    String maxDepth;

    @Option(names = "--units", paramLabel = "us|si", description = "Units of the output (default: the plan's).")
    String units;

    @Option(names = "--csv", paramLabel = "OUT", description = "Write every variant as CSV.")
    Path csv;

    @Option(names = "--json", paramLabel = "OUT|-", description = "Write the study as JSON to a file, or - for standard output.")
    String json;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    /** Most variants one study may have. */
    static final long MAX_VARIANTS = 100_000;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Plan plan = PlanInput.read(file, err);
        if (plan == null) {
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        UnitSystem us = CliValues.units("--units", units != null ? units : plan.units());
        Objective obj;
        try {
            obj = Objective.parse("--objective", objective);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(e.getMessage(), e);
        }
        double limit = maxDepth == null ? 0 : CliValues.quantity("--max-depth", maxDepth, Dimension.LENGTH, true);
        if (threads != null && (threads < 1 || threads > 1024)) {
            throw new BadInputException("--threads: " + threads + " is not allowed; use 1 to 1024");
        }
        List<Sweep> sweeps = new ArrayList<>();
        for (String v : vary) {
            Sweep s;
            try {
                s = SweepText.parse("--vary", v, us);
            } catch (IllegalArgumentException e) {
                throw new BadInputException(e.getMessage(), e);
            }
            for (Sweep other : sweeps) {
                if (other.parameter() == s.parameter()) {
                    throw new BadInputException("--vary " + v + ": " + s.parameter().key() + " is already varied");
                }
            }
            for (Setting value : s.values()) {
                try {
                    Variations.apply(plan, value);
                } catch (IllegalArgumentException e) {
                    throw new BadInputException("--vary " + v + ": " + e.getMessage(), e);
                }
            }
            sweeps.add(s);
        }
        StudySpec study = StudySpec.withDepthLimit(plan, sweeps, limit);
        long count = study.countOrMax();
        if (count > MAX_VARIANTS) {
            throw new BadInputException("--vary: " + count + " variants is too many; at most " + MAX_VARIANTS);
        }
        Catalog catalog;
        try {
            catalog = Study.catalogOf(study.base());
        } catch (CatalogException e) {
            throw new BadInputException(file + ": /settings/catalog: " + e.getMessage(), e);
        }
        boolean terminal = System.console() != null;
        ProgressListener progress = terminal ? (done, total) -> {
            err.print(String.format(Locale.ROOT, "\rstudy: %d/%d variants", done, total));
            err.flush();
        } : ProgressListener.NONE;
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        StudyResult r = Study.run(study, catalog, n, progress, new CancelToken());
        if (terminal) {
            err.print("\r" + " ".repeat(40) + "\r");
            err.flush();
        }
        List<VariantResult> best = r.best(obj, limit, 3);
        if (csv != null) {
            Files.writeString(csv, csv(r, sweeps, us, obj), StandardCharsets.UTF_8);
        }
        PlanInput.writeResult(out, json, () -> JsonText.write(json(r, sweeps, plan, us, obj, limit, best)),
                () -> text(r, sweeps, plan, us, obj, limit, best));
        return best.isEmpty() ? BaywrightCommand.EXIT_OVERSTRESSED : BaywrightCommand.EXIT_OK;
    }

    static double weight(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? newtons / Units.NEWTONS_PER_POUND : newtons / Units.STANDARD_GRAVITY;
    }

    static String weightUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb" : "kg";
    }

    static double perArea(double pascals, UnitSystem us) {
        return weight(pascals, us) * us.floorArea().toSi(1);
    }

    static String perAreaUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb/ft²" : "kg/m²";
    }

    private static List<VariantResult> byWeight(StudyResult r) {
        return r.variants().stream().sorted(Comparator.comparingDouble((VariantResult v) -> Double.isNaN(v.weightPerArea())
                ? Double.POSITIVE_INFINITY : v.weightPerArea()).thenComparingInt(VariantResult::index)).toList();
    }

    private static String num(double v, int decimals) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%,." + decimals + "f", v);
    }

    static String text(StudyResult r, List<Sweep> sweeps, Plan plan, UnitSystem us, Objective obj, double limit,
            List<VariantResult> best) {
        Set<Integer> depthFront = indices(r.weightDepthFront());
        Set<Integer> piecesFront = indices(r.weightPiecesFront());
        List<String> header = new ArrayList<>(List.of("#"));
        sweeps.forEach(s -> header.add(s.parameter().key()));
        boolean infill = r.variants().stream().anyMatch(v -> v.infill().present());
        if (infill) {
            header.addAll(List.of("spacing " + us.length().symbol(), "beams/bay"));
        }
        header.addAll(List.of("weight " + weightUnit(us), perAreaUnit(us), "beam d " + us.smallLength().symbol(),
                "girder d " + us.smallLength().symbol(), "pieces", "ratio"));
        boolean vib = vibration(r);
        if (vib) {
            header.add("vib");
        }
        header.addAll(List.of("problems", "front", "same as"));
        boolean[] right = new boolean[header.size()];
        for (int i = 1 + sweeps.size(); i < right.length - 1; i++) {
            right[i] = true;
        }
        right[0] = true;
        TextTable t = new TextTable(right, header.toArray(String[]::new));
        for (VariantResult v : byWeight(r)) {
            List<String> row = new ArrayList<>();
            row.add(Integer.toString(v.index() + 1));
            v.settings().forEach(s -> row.add(s.label()));
            if (infill) {
                row.add(num(us.length().fromSi(v.infill().largestSpacing()), 2));
                row.add(v.infill().present() ? v.infill().beamsPerBay() : "-");
            }
            row.add(num(weight(v.steelWeight(), us), 0));
            row.add(num(perArea(v.weightPerArea(), us), 2));
            row.add(num(us.smallLength().fromSi(v.beamDepth()), 1));
            row.add(num(us.smallLength().fromSi(v.girderDepth()), 1));
            row.add(Integer.toString(v.pieces()));
            row.add(num(v.maxRatio(), 3));
            if (vib) {
                row.add(v.vibrationChecked() ? num(v.vibrationRatio(), 2) : "-");
            }
            row.add(v.message().isEmpty() ? Integer.toString(v.problems()) : "not run");
            row.add((depthFront.contains(v.index()) ? "D" : "") + (piecesFront.contains(v.index()) ? "P" : ""));
            row.add(sameAs(r, v));
            t.row(row.toArray(String[]::new));
        }
        StringBuilder b = new StringBuilder();
        b.append("Baywright study: ").append(plan.name()).append(" (").append(r.variants().size()).append(" of ")
                .append(r.total()).append(" variants, each a full run").append(r.cancelled() ? "; cancelled" : "").append(")\n");
        b.append(t.render("  "));
        b.append("front: D = Pareto front of weight per area and structural depth; P = of weight per area and pieces\n");
        if (vib) {
            b.append("vib: the worst floor-vibration ratio (a_p/g over the limit, AISC DG11 2nd ed., walking) of the"
                    + " variant's bays; over 1.00 exceeds; - no bay checked\n");
        }
        if (infill) {
            b.append("spacing: the largest actual distance between infill beams (a typed spacing is a maximum, rounded to"
                    + " whole beams per bay)\n");
        }
        if (r.variants().stream().anyMatch(v -> r.sameFloorAs(v).isPresent())) {
            b.append("same as: the variant designs the same floor (members, positions and sizes) as the one named\n");
        }
        for (VariantResult v : r.variants()) {
            if (!v.message().isEmpty()) {
                b.append("  variant ").append(v.index() + 1).append(": ").append(v.message()).append('\n');
            }
        }
        b.append("Best for ").append(describe(obj, us))
                .append(limit > 0 ? " within " + SweepLabel.length(limit, us) + " depth" : "").append(":\n");
        if (best.isEmpty()) {
            b.append("  none: no variant was sized without problems").append(limit > 0 ? " within the depth limit" : "")
                    .append('\n');
        }
        int k = 1;
        for (VariantResult v : best) {
            b.append(String.format(Locale.ROOT, "  %d. #%d %s: %s %s, %s %s, depth %s %s, %d pieces%n", k++, v.index() + 1,
                    values(v), num(weight(v.steelWeight(), us), 0), weightUnit(us), num(perArea(v.weightPerArea(), us), 2),
                    perAreaUnit(us), num(us.smallLength().fromSi(v.structuralDepth()), 1), us.smallLength().symbol(),
                    v.pieces()));
        }
        b.append(Caution.TEXT).append('\n');
        return b.toString();
    }

    /** "#3" when the variant designs the same floor as variant 3, else empty. */
    static String sameAs(StudyResult r, VariantResult v) {
        var same = r.sameFloorAs(v);
        return same.isPresent() ? "#" + (same.getAsInt() + 1) : "";
    }

    private static String describe(Objective obj, UnitSystem us) {
        return obj.pieceCost() == 0 ? "weight"
                : "weight + " + num(weight(obj.pieceCost(), us), 0) + " " + weightUnit(us) + " per piece";
    }

    private static String values(VariantResult v) {
        if (v.settings().isEmpty()) {
            return "base plan";
        }
        List<String> parts = new ArrayList<>();
        v.settings().forEach(s -> parts.add(s.toString()));
        return String.join(" ", parts);
    }

    private static Set<Integer> indices(List<VariantResult> l) {
        Set<Integer> s = new HashSet<>();
        l.forEach(v -> s.add(v.index()));
        return s;
    }

    static String csv(StudyResult r, List<Sweep> sweeps, UnitSystem us, Objective obj) {
        Set<Integer> depthFront = indices(r.weightDepthFront());
        Set<Integer> piecesFront = indices(r.weightPiecesFront());
        StringBuilder b = new StringBuilder();
        List<String> header = new ArrayList<>(List.of("variant"));
        sweeps.forEach(s -> header.add(s.parameter().key()));
        String small = us.smallLength().symbol();
        header.addAll(List.of("actual beam spacing (" + us.length().symbol() + ")", "beams per bay",
                "steel weight (" + weightUnit(us) + ")", "weight per area (" + perAreaUnit(us) + ")",
                "deepest beam d (" + small + ")", "deepest girder d (" + small + ")", "structural depth (" + small + ")",
                "pieces", "max ratio"));
        boolean vib = vibration(r);
        if (vib) {
            header.add("vibration ratio");
        }
        header.addAll(List.of("problems", "sound", "weight-depth front", "weight-pieces front",
                "score (" + perAreaUnit(us) + ")", "same floor as variant", "message"));
        b.append(String.join(",", header.stream().map(StudyCommand::cell).toList())).append('\n');
        for (VariantResult v : r.variants()) {
            List<String> row = new ArrayList<>();
            row.add(Integer.toString(v.index() + 1));
            v.settings().forEach(s -> row.add(cell(s.label())));
            row.add(plain(us.length().fromSi(v.infill().largestSpacing())));
            row.add(v.infill().beamsPerBay());
            row.add(plain(weight(v.steelWeight(), us)));
            row.add(plain(perArea(v.weightPerArea(), us)));
            row.add(plain(us.smallLength().fromSi(v.beamDepth())));
            row.add(plain(us.smallLength().fromSi(v.girderDepth())));
            row.add(plain(us.smallLength().fromSi(v.structuralDepth())));
            row.add(Integer.toString(v.pieces()));
            row.add(plain(v.maxRatio()));
            if (vib) {
                row.add(plain(v.vibrationRatio()));
            }
            row.add(Integer.toString(v.problems()));
            row.add(Boolean.toString(v.sound()));
            row.add(Boolean.toString(depthFront.contains(v.index())));
            row.add(Boolean.toString(piecesFront.contains(v.index())));
            row.add(plain(perArea(obj.score(v), us)));
            row.add(sameAs(r, v).replace("#", ""));
            row.add(cell(v.message()));
            b.append(String.join(",", row)).append('\n');
        }
        return b.toString();
    }

    /**
     * Whether the outputs carry the vibration column: only when some variant has a bay checked, so studies of
     * plans without slabs print exactly as before.
     */
    static boolean vibration(StudyResult r) {
        return r.variants().stream().anyMatch(VariantResult::vibrationChecked);
    }

    private static String plain(double v) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.6g", v);
    }

    private static String cell(String s) {
        return s.contains(",") || s.contains("\"") || s.contains("\n") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static Object json(double v) {
        return Double.isNaN(v) || Double.isInfinite(v) ? null : v;
    }

    static Map<String, Object> json(StudyResult r, List<Sweep> sweeps, Plan plan, UnitSystem us, Objective obj, double limit,
            List<VariantResult> best) {
        Set<Integer> depthFront = indices(r.weightDepthFront());
        Set<Integer> piecesFront = indices(r.weightPiecesFront());
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("format", "baywright-study");
        o.put("version", 1);
        o.put("plan", plan.name());
        o.put("units", org.baywright.report.RunSummary.ordered("system", us.name().toLowerCase(Locale.ROOT), "weight", weightUnit(us), "weightPerArea",
                perAreaUnit(us), "depth", us.smallLength().symbol(), "spacing", us.length().symbol()));
        o.put("parameters", sweeps.stream().map(s -> s.parameter().key()).toList());
        o.put("objective", obj.pieceCost() == 0 ? "weight" : "weight+pieces");
        o.put("pieceCost", weight(obj.pieceCost(), us));
        o.put("maxDepth", limit > 0 ? us.smallLength().fromSi(limit) : null);
        o.put("total", r.total());
        o.put("finished", r.variants().size());
        o.put("cancelled", r.cancelled());
        List<Object> variants = new ArrayList<>();
        for (VariantResult v : r.variants()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("variant", v.index() + 1);
            Map<String, Object> values = new LinkedHashMap<>();
            v.settings().forEach(s -> values.put(s.parameter().key(), s.label()));
            j.put("values", values);
            j.put("beamSpacing", json(us.length().fromSi(v.infill().largestSpacing())));
            j.put("beamsPerBay", v.infill().present() ? v.infill().beamsPerBay() : null);
            j.put("steelWeight", json(weight(v.steelWeight(), us)));
            j.put("weightPerArea", json(perArea(v.weightPerArea(), us)));
            j.put("beamDepth", json(us.smallLength().fromSi(v.beamDepth())));
            j.put("girderDepth", json(us.smallLength().fromSi(v.girderDepth())));
            j.put("structuralDepth", json(us.smallLength().fromSi(v.structuralDepth())));
            j.put("pieces", v.pieces());
            j.put("maxRatio", json(v.maxRatio()));
            if (vibration(r)) {
                j.put("vibrationRatio", json(v.vibrationRatio()));
            }
            j.put("problems", v.problems());
            j.put("sound", v.sound());
            j.put("weightDepthFront", depthFront.contains(v.index()));
            j.put("weightPiecesFront", piecesFront.contains(v.index()));
            j.put("score", json(perArea(obj.score(v), us)));
            var same = r.sameFloorAs(v);
            j.put("sameFloorAs", same.isPresent() ? (Object) (same.getAsInt() + 1) : null);
            j.put("message", v.message().isEmpty() ? null : v.message());
            variants.add(j);
        }
        o.put("variants", variants);
        o.put("best", best.stream().map(v -> v.index() + 1).toList());
        o.put("caution", Caution.TEXT);
        return o;
    }

    /** Lengths for messages. */
    static final class SweepLabel {
        private SweepLabel() {
        }

        static String length(double m, UnitSystem us) {
            return String.format(Locale.ROOT, "%.1f %s", us.smallLength().fromSi(m), us.smallLength().symbol());
        }
    }
}
