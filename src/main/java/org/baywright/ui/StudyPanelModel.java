package org.baywright.ui;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.plan.Plan;
import org.baywright.study.Objective;
import org.baywright.study.Parameter;
import org.baywright.study.Setting;
import org.baywright.study.StudyResult;
import org.baywright.study.StudySpec;
import org.baywright.study.Sweep;
import org.baywright.study.SweepText;
import org.baywright.study.VariantResult;
import org.baywright.study.Variations;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * What the Study panel shows and checks, without JavaFX (tested with plain JUnit): the inputs, their
 * checking into a study with located messages, and the numbers, axes and texts of the results in the
 * plan's units.
 *
 * <p>Inputs are typed as on the command line ({@code baywright study --vary}): a range {@code A..B:STEP}
 * or a list {@code a,b,c}, read by {@link SweepText}, one field per parameter; an empty field is not
 * varied. Every value is also tried on the plan before anything runs, as the command does.
 */
public final class StudyPanelModel {
    private StudyPanelModel() {
    }

    /** Most variants the panel runs (the command line allows more; charts of more are unreadable). */
    public static final int MAX_VARIANTS = 5_000;

    /** Key of the structural depth limit field. */
    public static final String DEPTH_LIMIT = "depth-limit";
    /** Key of the objective field. */
    public static final String OBJECTIVE = "objective";

    /**
     * One input of the panel.
     *
     * @param key the parameter's command-line name, or {@link #DEPTH_LIMIT} / {@link #OBJECTIVE}
     * @param parameter the parameter varied, or null for the two study settings
     * @param label the label shown
     * @param usExample an example in US units (also the prompt text)
     * @param siExample the same in SI
     * @param accepted what the field accepts, for messages and the tooltip
     */
    public record Field(String key, Parameter parameter, String label, String usExample, String siExample,
            String accepted) {
        /** The example in a unit system. */
        public String example(UnitSystem us) {
            return us == UnitSystem.SI ? siExample : usExample;
        }

        /**
         * The field's prompt text: the example, said as one ("e.g. 24in"), so that an empty field does
         * not look set; an empty field is not used.
         */
        public String prompt(UnitSystem us) {
            return "e.g. " + example(us);
        }
    }

    private static final String LENGTHS = "lengths with their unit, as a range A..B:STEP or a list a,b,c";

    /** The fields, in panel order: one per parameter, then the depth limit and the objective. */
    public static final List<Field> FIELDS = List.of(
            new Field("bay-x", Parameter.BAY_X, "Bay widths along x", "25ft..40ft:5ft", "8m..12m:1m", LENGTHS
                    + "; one value may give every bay its own width, separated by ; (30ft;35ft;30ft, 2@30ft;35ft)"),
            new Field("bay-y", Parameter.BAY_Y, "Bay widths along y", "30ft,35ft", "9m,10.5m", LENGTHS
                    + "; one value may give every bay its own width, separated by ; (30ft;35ft;30ft, 2@30ft;35ft)"),
            new Field("beam-spacing", Parameter.BEAM_SPACING, "Beam spacing", "6ft..15ft:1ft", "2m..4.5m:0.5m", LENGTHS
                    + " (the largest spacing; the count is cleared)"),
            new Field("beam-count", Parameter.BEAM_COUNT, "Beams per bay", "1..4:1", "1..4:1",
                    "whole numbers of at least 1, as a range A..B:STEP or a list a,b,c"),
            new Field("beam-direction", Parameter.BEAM_DIRECTION, "Beam direction", "x,y", "x,y", "x, y, or both: x,y"),
            new Field("method", Parameter.METHOD, "Design method", "lrfd,asd", "lrfd,asd", "lrfd, asd, or both: lrfd,asd"),
            new Field("max-depth", Parameter.MAX_DEPTH, "Beam depth limit", "18in,21in,24in", "450mm,530mm,610mm",
                    LENGTHS + " (0 = no limit)"),
            new Field("column-series", Parameter.COLUMN_SERIES, "Column series", "W14,W12;W14", "W14,W12;W14",
                    "series such as W14, several allowed together joined by ; (W12;W14), as a list a,b"),
            new Field("composite", Parameter.COMPOSITE, "Composite action", "on,off", "on,off",
                    "on, off, or both: on,off (every floor whose decks carry a slab composite, or bare steel)"),
            new Field("topping", Parameter.TOPPING, "Concrete above deck", "3.5in..5.5in:1in", "90mm..140mm:25mm",
                    "lengths with their unit, as a range A..B:STEP or a list a,b,c (every slab; the slab is this plus"
                            + " the rib height)"),
            new Field("concrete", Parameter.CONCRETE, "Concrete unit weight", "110pcf,145pcf", "17.5kN/m³,22.8kN/m³",
                    "unit weights with their unit (pcf or kN/m³), as a range A..B:STEP or a list a,b,c (every slab)"),
            new Field(DEPTH_LIMIT, null, "Structural depth limit", "24in", "610mm",
                    "a length with its unit, e.g. 24in or 610mm (empty = none): members are sized within it and deeper"
                            + " variants are not among the best"),
            new Field(OBJECTIVE, null, "Objective", "weight+pieces:150lb", "weight+pieces:0.7kN",
                    "weight, or weight+pieces:COST with COST a weight per piece, e.g. weight+pieces:150lb"));

    /** The field of a key. */
    public static Field field(String key) {
        return FIELDS.stream().filter(f -> f.key().equals(key)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no field " + key));
    }

    /**
     * A checked study, ready to run.
     *
     * @param spec the plan (with the depth limit set) and the sweeps, in panel order
     * @param objective what "best" minimises
     * @param depthLimit structural depth limit, m (0 = none)
     * @param units the plan's unit system, for labels and figures
     */
    public record Setup(StudySpec spec, Objective objective, double depthLimit, UnitSystem units) {
        /** The parameters varied, in order. */
        public List<Parameter> parameters() {
            return spec.sweeps().stream().map(Sweep::parameter).toList();
        }

        /** Number of variants. */
        public int count() {
            return (int) spec.count();
        }
    }

    /**
     * The outcome of checking the fields: a setup, or the problems by field key (the empty key for a
     * problem of the study as a whole), each a message that names the field, quotes the text and says
     * what is accepted.
     */
    public record Checked(Setup setup, Map<String, String> errors) {
        public Checked {
            errors = Map.copyOf(errors);
        }

        public boolean ok() {
            return setup != null;
        }
    }

    /** The unit system a plan is written in (US when it names none). */
    public static UnitSystem units(Plan plan) {
        return org.baywright.run.DesignBasis.unitsOf(plan);
    }

    /**
     * Checks the fields against a plan.
     *
     * @param texts field key → text typed (missing or blank = not used)
     */
    public static Checked check(Plan plan, Map<String, String> texts) {
        Map<String, String> errors = new LinkedHashMap<>();
        if (plan == null) {
            errors.put("", "Open a plan first: a study varies the plan that is open.");
            return new Checked(null, errors);
        }
        UnitSystem us = units(plan);
        List<Sweep> sweeps = new ArrayList<>();
        for (Field f : FIELDS) {
            String text = text(texts, f.key());
            if (f.parameter() == null || text.isEmpty()) {
                continue;
            }
            try {
                Sweep s = SweepText.parse(f.label(), f.key() + "=" + text, us);
                for (Setting value : s.values()) {
                    Variations.apply(plan, value);
                }
                sweeps.add(s);
            } catch (IllegalArgumentException e) {
                errors.put(f.key(), message(f, text, core(e.getMessage(), f.label() + " " + f.key() + "=" + text)));
            }
        }
        double limit = 0;
        String depth = text(texts, DEPTH_LIMIT);
        if (!depth.isEmpty()) {
            Field f = field(DEPTH_LIMIT);
            try {
                limit = Quantities.parseNonNegative(f.label(), depth, Dimension.LENGTH);
            } catch (IllegalArgumentException e) {
                errors.put(DEPTH_LIMIT, message(f, depth, core(e.getMessage(), f.label())));
            }
        }
        Objective objective = Objective.weight();
        String obj = text(texts, OBJECTIVE);
        if (!obj.isEmpty()) {
            Field f = field(OBJECTIVE);
            try {
                objective = Objective.parse(f.label(), obj);
            } catch (IllegalArgumentException e) {
                errors.put(OBJECTIVE, message(f, obj, core(e.getMessage(), f.label())));
            }
        }
        if (!errors.isEmpty()) {
            return new Checked(null, errors);
        }
        if (sweeps.isEmpty()) {
            errors.put("", "Give values to at least one parameter, e.g. Beam spacing " + field("beam-spacing").example(us) + ".");
            return new Checked(null, errors);
        }
        StudySpec spec = StudySpec.withDepthLimit(plan, sweeps, limit);
        long count = spec.countOrMax();
        if (count > MAX_VARIANTS) {
            errors.put("", String.format(Locale.ROOT, "These values make %,d variants; the Study panel runs at most %,d."
                    + " Use fewer values, or the command line (baywright study) for a larger study.", count, MAX_VARIANTS));
            return new Checked(null, errors);
        }
        return new Checked(new Setup(spec, objective, limit, us), errors);
    }

    private static String text(Map<String, String> texts, String key) {
        String t = texts.get(key);
        return t == null ? "" : t.trim();
    }

    /** The reason of a message that starts with "{@code where}: ". */
    private static String core(String message, String where) {
        String m = message == null ? "not accepted" : message;
        return m.startsWith(where + ": ") ? m.substring(where.length() + 2) : m;
    }

    /**
     * The message of a field: its label, the text (or the part of it at fault, when the reason quotes
     * it), the reason and, unless the reason lists them, the forms accepted. E.g. {@code Beam spacing
     * "6ft..3ft:1ft": the end of the range (3ft) is below its start (6ft). Accepted: …}.
     */
    private static String message(Field f, String text, String reason) {
        String r = reason.endsWith(".") ? reason.substring(0, reason.length() - 1) : reason;
        String head = r.startsWith("\"") ? f.label() + ": " : f.label() + " \"" + text + "\": ";
        boolean listsForms = r.contains("; use ");
        return head + r + (listsForms ? "." : ". Accepted: " + f.accepted() + ".");
    }

    // ---- figures in the plan's units ------------------------------------------------------------

    /** Steel weight in lb or kg. */
    public static double weight(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? newtons / Units.NEWTONS_PER_POUND : newtons / Units.STANDARD_GRAVITY;
    }

    /** "lb" or "kg". */
    public static String weightUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb" : "kg";
    }

    /** Steel weight per floor area in lb/ft² or kg/m² (NaN stays NaN). */
    public static double perArea(double pascals, UnitSystem us) {
        return weight(pascals, us) * us.floorArea().toSi(1);
    }

    /** "lb/ft²" or "kg/m²". */
    public static String perAreaUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb/ft²" : "kg/m²";
    }

    /** A depth in in or mm. */
    public static double depth(double metres, UnitSystem us) {
        return us.smallLength().fromSi(metres);
    }

    /**
     * Whether the "Meets floor vibration" filter lets a variant through: always when the filter is off; when on,
     * only variants with a bay checked and none over the limit (a variant without a checked bay has shown
     * nothing either way and is left out).
     */
    public static boolean shown(VariantResult v, boolean meetsVibrationOnly) {
        return !meetsVibrationOnly || v.vibrationChecked() && v.meetsVibration();
    }

    /** True when some variant of the study has a bay checked for floor vibration (the column and filter apply). */
    public static boolean vibrationStudied(StudyResult r) {
        return r != null && r.variants().stream().anyMatch(VariantResult::vibrationChecked);
    }

    /** The vibration cell of a variant: its worst bay ratio to two decimals, or "—" when no bay was checked. */
    public static String vibration(VariantResult v) {
        return v.vibrationChecked() ? String.format(Locale.ROOT, "%.2f", v.vibrationRatio()) : "—";
    }

    /** True when a variant can be drawn: it ran and has a weight per area and a depth. */
    public static boolean plotted(VariantResult v) {
        return Double.isFinite(v.weightPerArea()) && Double.isFinite(v.structuralDepth());
    }

    // ---- the chart across one parameter -------------------------------------------------------

    /**
     * The horizontal axis of the chart across one parameter: numeric (bay width, spacing, count, depth
     * limit, in the plan's units) when every value is one number, else the values in study order at
     * positions 0, 1, 2… with their labels.
     */
    public record XAxis(Parameter parameter, String title, boolean numeric, List<String> categories) {
        public XAxis {
            categories = List.copyOf(categories);
        }
    }

    /** The axis for a parameter of a setup. */
    public static XAxis xAxis(Setup setup, Parameter p) {
        Sweep s = sweep(setup, p);
        boolean numeric = switch (p) {
            case BAY_X, BAY_Y, BEAM_SPACING, BEAM_COUNT, MAX_DEPTH, TOPPING, CONCRETE ->
                    s.values().stream().allMatch(v -> v.numbers().size() == 1);
            default -> false;
        };
        UnitSystem us = setup.units();
        String unit = switch (p) {
            case BAY_X, BAY_Y, BEAM_SPACING -> " (" + us.length().symbol() + ")";
            case MAX_DEPTH, TOPPING -> " (" + us.smallLength().symbol() + ")";
            case CONCRETE -> " (" + us.unitWeight().symbol() + ")";
            default -> "";
        };
        String title = field(p.key()).label() + (numeric ? unit : "");
        return new XAxis(p, title, numeric, numeric ? List.of() : s.values().stream().map(Setting::label).toList());
    }

    /** Where a variant sits on the axis of {@code p}. */
    public static double x(Setup setup, VariantResult v, Parameter p) {
        Sweep s = sweep(setup, p);
        Setting value = v.settings().get(setup.parameters().indexOf(p));
        XAxis axis = xAxis(setup, p);
        if (!axis.numeric()) {
            return s.values().indexOf(value);
        }
        double n = value.number();
        UnitSystem us = setup.units();
        return switch (p) {
            case BAY_X, BAY_Y, BEAM_SPACING -> us.length().fromSi(n);
            case MAX_DEPTH, TOPPING -> us.smallLength().fromSi(n);
            case CONCRETE -> us.unitWeight().fromSi(n);
            default -> n;
        };
    }

    /** The value label of a variant for a parameter, e.g. "8ft". */
    public static String label(Setup setup, VariantResult v, Parameter p) {
        return v.settings().get(setup.parameters().indexOf(p)).label();
    }

    private static Sweep sweep(Setup setup, Parameter p) {
        return setup.spec().sweeps().stream().filter(s -> s.parameter() == p).findFirst()
                .orElseThrow(() -> new IllegalArgumentException(p.key() + " is not varied"));
    }

    /**
     * The default parameter to group the series of the chart across {@code across} by: the other varied
     * parameter with the fewest values, when it has at most {@link #MAX_SERIES}; else none (null).
     */
    public static Parameter defaultGroup(Setup setup, Parameter across) {
        return setup.spec().sweeps().stream().filter(s -> s.parameter() != across && s.values().size() <= MAX_SERIES)
                .min(Comparator.comparingInt(s -> s.values().size())).map(Sweep::parameter).orElse(null);
    }

    /** Most series the chart across a parameter draws (one per value of the grouping parameter). */
    public static final int MAX_SERIES = 8;

    /** Parameters that can group the series: the other varied parameters with at most {@link #MAX_SERIES} values. */
    public static List<Parameter> groups(Setup setup, Parameter across) {
        return setup.spec().sweeps().stream().filter(s -> s.parameter() != across && s.values().size() <= MAX_SERIES)
                .map(Sweep::parameter).toList();
    }

    /** The series of the chart across {@code across}, by the value of {@code group} (null: one series). */
    public static Map<String, List<VariantResult>> series(Setup setup, StudyResult r, Parameter across, Parameter group) {
        Map<String, List<VariantResult>> out = new LinkedHashMap<>();
        if (group != null) {
            for (Setting s : sweep(setup, group).values()) {
                out.put(group.key() + " " + s.label(), new ArrayList<>());
            }
        }
        for (VariantResult v : r.variants()) {
            if (!Double.isFinite(v.weightPerArea())) {
                continue;
            }
            String name = group == null ? "Variants" : group.key() + " " + label(setup, v, group);
            out.computeIfAbsent(name, k -> new ArrayList<>()).add(v);
        }
        out.values().removeIf(List::isEmpty);
        return out;
    }

    // ---- the chart against depth ----------------------------------------------------------------

    /** The series of the chart against depth, in drawing order (later ones are drawn over earlier ones). */
    public enum DepthSeries {
        /** Every variant at the depth of its deepest beam. */
        BEAM("Deepest beam"),
        /** Every variant at the depth of its deepest girder. */
        GIRDER("Deepest girder"),
        /** The weight–depth front, at the structural depth (the deeper of the two). */
        FRONT("Pareto front"),
        /** Variants deeper than the structural depth limit, at the structural depth. */
        TOO_DEEP("Deeper than the limit"),
        /** Variants that ran with problems, at the structural depth. */
        PROBLEMS("With problems"),
        /** Variants with a bay over the floor-vibration limit (AISC DG11 walking), at the structural depth. */
        VIBRATION("Exceeds floor vibration");

        private final String label;

        DepthSeries(String label) {
            this.label = label;
        }

        /** The legend's text. */
        public String label() {
            return label;
        }
    }

    /** One point of the chart against depth: depth in in or mm, steel per floor area in lb/ft² or kg/m². */
    public record DepthPoint(double depth, double perArea, VariantResult variant) {
    }

    /** True when a depth limit is set and the variant's structural depth is over it. */
    public static boolean tooDeep(Setup setup, VariantResult v) {
        return setup.depthLimit() > 0 && Double.isFinite(v.structuralDepth()) && v.structuralDepth() > setup.depthLimit() + 1e-9;
    }

    /**
     * The points of the chart against depth by series, only the series that have points: beams and
     * girders apart (a sweep of beam spacing changes the beams, not the girders, and shows it), then the
     * front, the variants deeper than the limit and those with problems, each at its structural depth.
     */
    public static Map<DepthSeries, List<DepthPoint>> depthSeries(Setup setup, StudyResult r) {
        return depthSeries(setup, r, false);
    }

    /**
     * As {@link #depthSeries(Setup, StudyResult)}, with only the variants that meet floor vibration when
     * {@code meetsVibrationOnly} ({@link #shown}); variants with a bay over the limit are also a series of their own.
     */
    public static Map<DepthSeries, List<DepthPoint>> depthSeries(Setup setup, StudyResult r, boolean meetsVibrationOnly) {
        UnitSystem us = setup.units();
        Map<DepthSeries, List<DepthPoint>> out = new LinkedHashMap<>();
        for (DepthSeries k : DepthSeries.values()) {
            out.put(k, new ArrayList<>());
        }
        Set<Integer> front = depthFront(r);
        for (VariantResult v : r.variants()) {
            if (!plotted(v) || !shown(v, meetsVibrationOnly)) {
                continue;
            }
            double y = perArea(v.weightPerArea(), us);
            if (Double.isFinite(v.beamDepth()) && v.beamDepth() > 0) {
                out.get(DepthSeries.BEAM).add(new DepthPoint(depth(v.beamDepth(), us), y, v));
            }
            if (Double.isFinite(v.girderDepth()) && v.girderDepth() > 0) {
                out.get(DepthSeries.GIRDER).add(new DepthPoint(depth(v.girderDepth(), us), y, v));
            }
            DepthPoint at = new DepthPoint(depth(v.structuralDepth(), us), y, v);
            if (front.contains(v.index())) {
                out.get(DepthSeries.FRONT).add(at);
            }
            if (tooDeep(setup, v)) {
                out.get(DepthSeries.TOO_DEEP).add(at);
            }
            if (!v.sound()) {
                out.get(DepthSeries.PROBLEMS).add(at);
            }
            if (!v.meetsVibration()) {
                out.get(DepthSeries.VIBRATION).add(at);
            }
        }
        out.values().removeIf(List::isEmpty);
        return out;
    }

    /** The name a variant's plan opens under: the plan's name, the variant's number and its values. */
    public static String variantName(Plan base, VariantResult v) {
        return base.name() + " — variant " + (v.index() + 1) + " (" + values(v) + ")";
    }

    /** A variant's plan, named as {@link #variantName} says, to open as a new document. */
    public static Plan named(Plan variant, Plan base, VariantResult v) {
        return new Plan(variantName(base, v), variant.units(), variant.settings(), variant.grid(), variant.levels(),
                variant.floors(), variant.columns(), variant.notes());
    }

    // ---- texts ------------------------------------------------------------------------------------

    /** The variant's values, e.g. "beam-spacing 8ft, beam-direction y". */
    public static String values(VariantResult v) {
        List<String> parts = new ArrayList<>();
        v.settings().forEach(s -> parts.add(s.parameter().key() + " " + s.label()));
        return parts.isEmpty() ? "the plan as it is" : String.join(", ", parts);
    }

    /** The tooltip of a variant: its values and figures, in the plan's units. */
    public static String describe(VariantResult v, UnitSystem us, boolean onDepthFront) {
        return describe(v, us, onDepthFront, java.util.OptionalInt.empty());
    }

    /**
     * The tooltip of a variant, naming the earlier variant that designs the same floor (from
     * {@link StudyResult#sameFloorAs}) when there is one.
     */
    public static String describe(VariantResult v, UnitSystem us, boolean onDepthFront, java.util.OptionalInt sameAs) {
        StringBuilder b = new StringBuilder();
        b.append("Variant ").append(v.index() + 1).append(onDepthFront ? " (on the weight–depth front)" : "").append('\n');
        b.append(values(v)).append('\n');
        if (!v.message().isEmpty()) {
            b.append("Not run: ").append(v.message()).append('\n');
            return b.toString().strip();
        }
        b.append(String.format(Locale.ROOT, "%.2f %s of floor; steel %,.0f %s%n", perArea(v.weightPerArea(), us),
                perAreaUnit(us), weight(v.steelWeight(), us), weightUnit(us)));
        String d = us.smallLength().symbol();
        b.append(String.format(Locale.ROOT, "deepest beam %.1f %s, deepest girder %.1f %s%n", depth(v.beamDepth(), us), d,
                depth(v.girderDepth(), us), d));
        if (v.infill().present()) {
            int n = v.infill().mostBeams();
            b.append(String.format(Locale.ROOT, "infill: %s beam%s per bay, actual spacing up to %.2f %s%n",
                    v.infill().beamsPerBay(), n == 1 && v.infill().fewestBeams() == 1 ? "" : "s",
                    us.length().fromSi(v.infill().largestSpacing()), us.length().symbol()));
        }
        if (sameAs.isPresent()) {
            b.append("the same floor as variant ").append(sameAs.getAsInt() + 1).append(" (members, positions and sizes)\n");
        }
        b.append(String.format(Locale.ROOT, "%d pieces; highest ratio %.2f", v.pieces(), v.maxRatio()));
        if (v.vibrationChecked()) {
            b.append(String.format(Locale.ROOT, "; floor vibration %.2f (%s)", v.vibrationRatio(),
                    v.meetsVibration() ? "meets" : "a bay exceeds the limit"));
        }
        if (v.problems() > 0) {
            b.append(String.format(Locale.ROOT, "; %d problem%s", v.problems(), v.problems() == 1 ? "" : "s"));
        }
        b.append('\n').append("Click to open it as a new plan.");
        return b.toString();
    }

    /** The line under the charts: how many ran, how many are sound, the best for the objective. */
    public static String summary(Setup setup, StudyResult r) {
        UnitSystem us = setup.units();
        StringBuilder b = new StringBuilder();
        b.append(String.format(Locale.ROOT, "%d of %d variants run%s; %d sized without problems.", r.variants().size(),
                r.total(), r.cancelled() ? " (cancelled)" : "", r.sound().size()));
        List<VariantResult> best = r.best(setup.objective(), setup.depthLimit(), 1);
        if (best.isEmpty()) {
            b.append(" None is sound").append(setup.depthLimit() > 0 ? " within the depth limit." : ".");
        } else {
            VariantResult v = best.get(0);
            b.append(String.format(Locale.ROOT, " Best for %s: variant %d (%s), %.2f %s, depth %.1f %s, %d pieces.",
                    setup.objective().pieceCost() == 0 ? "weight" : "weight and pieces", v.index() + 1, values(v),
                    perArea(v.weightPerArea(), us), perAreaUnit(us), depth(v.structuralDepth(), us),
                    us.smallLength().symbol(), v.pieces()));
        }
        return b.toString();
    }

    /** "12 / 400 variants". */
    public static String progress(int done, int total) {
        return String.format(Locale.ROOT, "%,d / %,d variants", done, total);
    }

    /** The indices of the variants on the weight–depth front. */
    public static Set<Integer> depthFront(StudyResult r) {
        Set<Integer> s = new HashSet<>();
        r.weightDepthFront().forEach(v -> s.add(v.index()));
        return s;
    }

    /** The indices of the variants on the weight–pieces front. */
    public static Set<Integer> piecesFront(StudyResult r) {
        Set<Integer> s = new HashSet<>();
        r.weightPiecesFront().forEach(v -> s.add(v.index()));
        return s;
    }
}
