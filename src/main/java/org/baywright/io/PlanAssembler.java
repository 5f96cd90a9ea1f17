package org.baywright.io;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.baywright.io.PlanDocument.AreaLoadDoc;
import org.baywright.io.PlanDocument.ColumnDoc;
import org.baywright.io.PlanDocument.DeckDoc;
import org.baywright.io.PlanDocument.DeflectionDoc;
import org.baywright.io.PlanDocument.FloorDoc;
import org.baywright.io.PlanDocument.GridLineDoc;
import org.baywright.io.PlanDocument.InfillDoc;
import org.baywright.io.PlanDocument.LevelDoc;
import org.baywright.io.PlanDocument.LineLoadDoc;
import org.baywright.io.PlanDocument.MemberDoc;
import org.baywright.io.PlanDocument.OpeningDoc;
import org.baywright.io.PlanDocument.PlanDoc;
import org.baywright.io.PlanDocument.PointLoadDoc;
import org.baywright.io.PlanDocument.SettingsDoc;
import org.baywright.plan.RoofCeiling;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.CompositeRules;
import org.baywright.plan.Deck;
import org.baywright.plan.Slab;
import org.baywright.plan.StudPlacement;
import org.baywright.plan.VibrationSettings;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitParseException;
import org.baywright.units.Units;

/**
 * The second reading stage: turns the shape-checked document records into a {@link Plan}, parsing
 * quantities to SI and checking ranges, unique ids and references. Every problem is reported (a value
 * that is wrong is skipped, and what depends on it is not checked again); the plan is built only when
 * there is none. Absent values were either optional (their default is used) or already reported by
 * {@link ShapeCheck}.
 */
final class PlanAssembler {
    /** Coordinates and lengths beyond this (100 km) are refused as mistakes. */
    static final double MAX_LENGTH = 1e5;
    /** Loads beyond this, in SI units (N, N/m, Pa), are refused as mistakes. */
    static final double MAX_LOAD = 1e12;
    /** A member whose ends are closer than this (m) has no length. */
    static final double MIN_MEMBER_LENGTH = 1e-6;
    static final double MIN_FY = 100e6;
    static final double MAX_FY = 1000e6;
    static final double MIN_RATIO = 60;
    static final double MAX_RATIO = 10000;
    /** Most beams one infill may generate: more is a slip of the finger (a spacing in mm meant in m). */
    static final int MAX_INFILL_BEAMS = org.baywright.plan.Framing.MAX_INFILL_BEAMS;

    private static final Map<String, String> METHODS = ordered("lrfd", "lrfd", "asd", "asd");
    private static final Map<String, MemberKind> KINDS = ordered("girder", MemberKind.GIRDER, "beam", MemberKind.BEAM);
    private static final Map<String, GridLine.Axis> AXES = ordered("x", GridLine.Axis.X, "y", GridLine.Axis.Y);
    private static final Map<String, Boolean> PARTITION_AS_DEAD = ordered("live", false, "dead", true);
    private static final Map<String, Boolean> GIRDER_AREA_DELIVERED = ordered("delivered", true, "half-bay", false);
    /** A roof's ceiling as the file writes it (IBC Table 1604.3 roof rows). */
    private static final Map<String, RoofCeiling> CEILINGS = ordered("plaster", RoofCeiling.PLASTER, "non-plaster",
            RoofCeiling.NON_PLASTER, "none", RoofCeiling.NONE);
    /** The ceilings the roof layouts of the file set, by floor id. */
    private final Map<String, RoofCeiling> roofCeilings = new java.util.LinkedHashMap<>();

    /** The file's word for a roof ceiling. */
    static String ceilingKey(RoofCeiling c) {
        for (Map.Entry<String, RoofCeiling> e : CEILINGS.entrySet()) {
            if (e.getValue() == c) {
                return e.getKey();
            }
        }
        throw new IllegalArgumentException(String.valueOf(c));
    }

    private static final Map<String, Boolean> DEFLECTION_LIVE_REDUCED = ordered("unreduced", false, "reduced", true);
    private static final Map<String, LiveLoadUse> USES = ordered("ordinary", LiveLoadUse.ORDINARY, "assembly",
            LiveLoadUse.ASSEMBLY, "garage", LiveLoadUse.GARAGE, "storage-light", LiveLoadUse.STORAGE_LIGHT, "storage-heavy",
            LiveLoadUse.STORAGE_HEAVY, "not-reducible", LiveLoadUse.NOT_REDUCIBLE);

    private final Problems problems;

    /** Grid lines by label (the first of a duplicated label), with their axis even if the offset is bad. */
    private final Map<String, GridLine.Axis> gridAxes = new LinkedHashMap<>();
    private final Map<String, Double> gridOffsets = new HashMap<>();
    /** Labels of grid lines whose axis is unknown (reported), and whether some label may be unknown. */
    private final Set<String> gridUnusable = new HashSet<>();
    private boolean gridIncomplete;

    PlanAssembler(Problems problems) {
        this.problems = problems;
    }

    /** The plan, or empty when any error was found (in this stage or before). */
    Optional<Plan> assemble(PlanDoc d) {
        String units = d.units();
        if (units != null && !units.equals("us") && !units.equals("si")) {
            problems.error("bad-value", "/units", "", "units: \"" + ShapeCheck.clip(units)
                    + "\" is not a unit system; use \"us\" (feet, kips, psf) or \"si\" (metres, kN, kPa)");
        }
        DesignSettings settings = settings(d.settings());
        List<GridLine> grid = grid(d.grid());
        List<Level> levels = levels(d.levels());
        List<Floor> floors = floors(d.floors());
        if (!roofCeilings.isEmpty()) {
            settings = settings.withRoofCeilings(roofCeilings);
        }
        List<Column> columns = columns(d.columns());
        checkLevelFloors(d.levels(), d.floors());
        checkTopLevels(d.columns(), d.levels());
        if (problems.hasErrors()) {
            return Optional.empty();
        }
        return Optional.of(new Plan(d.name() == null ? "" : d.name(), units, settings, grid, levels, floors, columns,
                d.notes() == null ? "" : d.notes()));
    }

    // ---- settings

    /** The largest distance from a column face to a reaction a plan may give, m (24 in). */
    private static final double MAX_CONNECTION_ECCENTRICITY = 24 * 0.0254;
    private static final Map<String, CompositeMode> ACTIONS = ordered("composite", CompositeMode.COMPOSITE, "non-composite",
            CompositeMode.NON_COMPOSITE, "per-member", CompositeMode.PER_MEMBER);
    private static final Map<String, Boolean> SHORING = ordered("unshored", false, "shored", true);
    private static final Map<String, Boolean> VIBRATION_SIZING = ordered("check", false, "size", true);
    private static final Map<String, StudPlacement> STUD_POSITIONS = ordered("weak", StudPlacement.WEAK, "strong",
            StudPlacement.STRONG);
    private static final double IN = 0.0254;
    private static final double PSF = Units.PSF.toSi(1);
    private static final double PCF = Units.PCF.toSi(1);

    private DesignSettings settings(SettingsDoc s) {
        DesignSettings def = DesignSettings.defaults();
        if (s == null) {
            return def;
        }
        String p = "/settings";
        String method = choice(s.method(), p + "/method", "", "method", METHODS, def.method());
        double fy = def.fy();
        if (s.fy() != null) {
            fy = quantity(s.fy(), Dimension.STRESS, p + "/fy", "", "fy");
            if (fy == fy && (fy < MIN_FY || fy > MAX_FY)) {
                problems.error("out-of-range", p + "/fy", "", "fy: \"" + s.fy() + "\" is " + Numbers.format(Units.MPA.fromSi(fy))
                        + " MPa; the yield stress must be between 100 MPa (14.5 ksi) and 1000 MPa (145 ksi)");
            }
        }
        double live = def.liveDeflection();
        double total = def.totalDeflection();
        DeflectionDoc defl = s.deflection();
        if (defl != null) {
            live = ratio(defl.live(), p + "/deflection/live", "deflection live", live);
            total = ratio(defl.total(), p + "/deflection/total", "deflection total", total);
        }
        boolean deflectionReduced = choice(s.deflectionLiveLoad(), p + "/deflectionLiveLoad", "", "deflectionLiveLoad",
                DEFLECTION_LIVE_REDUCED, def.deflectionLiveReduced());
        List<String> beamSeries = series(s.beamSeries(), p + "/beamSeries", "beamSeries", def.beamSeries());
        List<String> girderSeries = series(s.girderSeries(), p + "/girderSeries", "girderSeries", def.girderSeries());
        List<String> columnSeries = series(s.columnSeries(), p + "/columnSeries", "columnSeries", def.columnSeries());
        double maxDepth = def.maxBeamDepth();
        if (s.maxBeamDepth() != null) {
            maxDepth = length(s.maxBeamDepth(), p + "/maxBeamDepth", "", "maxBeamDepth");
            if (maxDepth < 0) {
                problems.error("out-of-range", p + "/maxBeamDepth", "", "maxBeamDepth: \"" + s.maxBeamDepth()
                        + "\" is negative; give a depth such as \"24in\", or null for no limit");
            }
        }
        int spliceEvery = def.spliceEvery();
        if (s.spliceEvery() != null) {
            spliceEvery = s.spliceEvery();
            if (spliceEvery < 1) {
                problems.error("out-of-range", p + "/spliceEvery", "", "spliceEvery: " + spliceEvery
                        + " is not allowed; columns are spliced every 1 or more levels (e.g. 2)");
            }
        }
        boolean reduction = s.liveLoadReduction() == null ? def.liveLoadReduction() : s.liveLoadReduction();
        boolean partitionAsDead = choice(s.partition(), p + "/partition", "", "partition", PARTITION_AS_DEAD,
                def.partitionAsDead());
        boolean delivered = choice(s.girderArea(), p + "/girderArea", "", "girderArea", GIRDER_AREA_DELIVERED,
                def.girderAreaDelivered());
        String catalog = s.catalog() == null ? def.catalog() : s.catalog();
        if (!catalog.isBlank()) {
            try {
                java.nio.file.Path.of(catalog);
            } catch (java.nio.file.InvalidPathException e) {
                problems.error("bad-value", p + "/catalog", "", "catalog: \"" + ShapeCheck.clip(printable(catalog))
                        + "\" is not a usable file name (" + e.getReason() + "); give the path of a catalog file, or \"\" for "
                        + "the built-in W shapes");
            }
        }
        double eccentricity = def.connectionEccentricity();
        if (s.connectionEccentricity() != null) {
            eccentricity = length(s.connectionEccentricity(), p + "/connectionEccentricity", "", "connectionEccentricity");
            if (eccentricity < 0 || eccentricity > MAX_CONNECTION_ECCENTRICITY) {
                problems.error("out-of-range", p + "/connectionEccentricity", "", "connectionEccentricity: \""
                        + s.connectionEccentricity() + "\" is not allowed; give the distance from the column face to a"
                        + " beam reaction, from 0 to 24 in (600 mm), e.g. \"3in\"");
            }
        }
        return new DesignSettings(method, fy, live, total, beamSeries, girderSeries, columnSeries, maxDepth, spliceEvery,
                reduction, partitionAsDead, delivered, catalog, deflectionReduced, java.util.Map.of(), eccentricity,
                compositeRules(s.composite(), p + "/composite"), vibration(s.vibration(), p + "/vibration"));
    }

    private static final Map<String, VibrationSettings.Use> VIBRATION_USES = ordered("offices", VibrationSettings.Use.OFFICES,
            "residences", VibrationSettings.Use.RESIDENCES, "quiet-areas", VibrationSettings.Use.QUIET_AREAS, "shopping-malls",
            VibrationSettings.Use.SHOPPING_MALLS, "indoor-footbridges", VibrationSettings.Use.INDOOR_FOOTBRIDGES,
            "outdoor-footbridges", VibrationSettings.Use.OUTDOOR_FOOTBRIDGES);
    private static final Map<String, VibrationSettings.FitOut> FIT_OUTS = ordered("electronic-office",
            VibrationSettings.FitOut.ELECTRONIC_OFFICE, "paper-office", VibrationSettings.FitOut.PAPER_OFFICE,
            "full-height-partitions", VibrationSettings.FitOut.FULL_HEIGHT_PARTITIONS, "shopping-mall",
            VibrationSettings.FitOut.SHOPPING_MALL, "footbridge", VibrationSettings.FitOut.FOOTBRIDGE);

    /** The key of a use in the file ("quiet-areas"). */
    static String useKey(VibrationSettings.Use u) {
        return VIBRATION_USES.entrySet().stream().filter(e -> e.getValue() == u).findFirst().orElseThrow().getKey();
    }

    /** The key of a fit-out in the file ("paper-office"). */
    static String fitOutKey(VibrationSettings.FitOut f) {
        return FIT_OUTS.entrySet().stream().filter(e -> e.getValue() == f).findFirst().orElseThrow().getKey();
    }

    /** The vibration inputs; the defaults where a key is absent, and where a value is wrong (reported). */
    private VibrationSettings vibration(PlanDocument.VibrationDoc v, String p) {
        VibrationSettings def = VibrationSettings.defaults();
        if (v == null) {
            return def;
        }
        VibrationSettings.Use use = choice(v.use(), p + "/use", "", "use", VIBRATION_USES, def.use());
        VibrationSettings.FitOut fit = choice(v.fitOut(), p + "/fitOut", "", "fitOut", FIT_OUTS, null);
        double damping = Double.NaN;
        if (v.damping() != null) {
            if (v.damping() > 0 && v.damping() <= 0.2) {
                damping = v.damping();
            } else {
                problems.error("out-of-range", p + "/damping", "", "damping: " + Numbers.format(v.damping()) + " is not allowed;"
                        + " give the damping ratio as a fraction above 0 and at most 0.2, e.g. 0.025 (AISC Design Guide 11), or"
                        + " leave it out to take the fit-out's");
            }
        }
        double live = bounded(v.live(), Dimension.AREA_LOAD, p + "/live", "live", Double.NaN, 0, Units.PSF.toSi(100),
                "the live load of the vibration analysis, 0 to 100 psf, e.g. \"11psf\" (offices, AISC Design Guide 11)");
        return new VibrationSettings(use, fit, damping, live);
    }

    /** The plan-wide composite rules; the defaults where a key is absent, and where a value is wrong (reported). */
    private CompositeRules compositeRules(PlanDocument.CompositeRulesDoc c, String p) {
        CompositeRules def = CompositeRules.DEFAULT;
        if (c == null) {
            return def;
        }
        double degree = def.minDegree();
        if (c.minDegree() != null) {
            degree = c.minDegree();
            if (!(degree >= 0 && degree <= 1)) {
                problems.error("out-of-range", p + "/minDegree", "", "minDegree: " + Numbers.format(degree) + " is not allowed;"
                        + " give the least degree of composite action as a fraction from 0 to 1, e.g. 0.25 (AISC 360-16"
                        + " Commentary I3.2d)");
                degree = def.minDegree();
            }
        }
        double stud = bounded(c.studWeight(), Dimension.FORCE, p + "/studWeight", "studWeight", def.studWeight(), 0,
                Units.LBF.toSi(200), "the steel weight one stud is worth, 0 to 200 lb (900 N), e.g. \"10lb\"");
        double allowance = bounded(c.camberAllowance(), Dimension.FORCE, p + "/camberAllowance", "camberAllowance",
                def.camberAllowance(), 0, Units.LBF.toSi(5000), "the steel weight a cambered piece is worth, 0 to 5000 lb, e.g. \"50lb\"");
        double share = def.camberShare();
        if (c.camberShare() != null) {
            share = c.camberShare();
            if (!(share >= 0 && share <= 1)) {
                problems.error("out-of-range", p + "/camberShare", "", "camberShare: " + Numbers.format(share) + " is not"
                        + " allowed; give the share of the wet-concrete deflection cambered out, from 0 to 1, e.g. 0.8");
                share = def.camberShare();
            }
        }
        boolean camber = c.camber() == null ? def.camber() : c.camber();
        return new CompositeRules(degree, stud, camber, share, allowance);
    }

    /**
     * A quantity that must lie in [min, max]: {@code def} when absent, and when wrong (reported with what is
     * allowed).
     */
    private double bounded(String text, Dimension d, String p, String label, double def, double min, double max, String allowed) {
        if (text == null) {
            return def;
        }
        double v = quantity(text, d, p, "", label);
        if (Double.isNaN(v)) {
            return def;
        }
        if (!(v >= min && v <= max)) {
            problems.error("out-of-range", p, "", label + ": \"" + ShapeCheck.clip(text) + "\" is not allowed; give " + allowed);
            return def;
        }
        return v;
    }

    private double ratio(Double value, String pointer, String label, double def) {
        if (value == null) {
            return def;
        }
        double v = value;
        if (v != 0 && !(v >= MIN_RATIO && v <= MAX_RATIO)) {
            problems.error("out-of-range", pointer, "", label + ": " + Numbers.format(v)
                    + " is not a deflection limit; give a span/deflection ratio between 60 and 10000 (e.g. 360), or 0 for no check");
        }
        return v;
    }

    private List<String> series(List<String> values, String pointer, String label, List<String> def) {
        if (values == null) {
            return def;
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            String v = values.get(i);
            if (v == null) {
                continue;
            }
            if (v.isBlank()) {
                problems.error("bad-value", Pointers.child(pointer, i), "", label + "[" + i
                        + "]: a series is a nominal shape series such as \"W14\", not empty text");
                continue;
            }
            out.add(v);
        }
        return out;
    }

    // ---- grid and levels

    private List<GridLine> grid(List<GridLineDoc> docs) {
        List<GridLine> out = new ArrayList<>();
        if (docs == null) {
            gridIncomplete = problems.reportedAtOrUnder("/grid");
            return out;
        }
        Map<String, String> seen = new HashMap<>();
        for (int i = 0; i < docs.size(); i++) {
            GridLineDoc g = docs.get(i);
            if (g == null || g.label() == null) {
                gridIncomplete = true;
                continue;
            }
            String p = Pointers.child("/grid", i);
            String label = g.label();
            boolean labelOk = label != null && nonBlank(label, p + "/label", "", "label", "a grid line label such as \"A\" or \"1\"");
            if (labelOk) {
                String first = seen.putIfAbsent(label, p);
                if (first != null) {
                    problems.error("duplicate-id", p + "/label", label, "label: the grid line label \"" + label
                            + "\" is already used by " + first + "; grid labels must be unique");
                    labelOk = false;
                }
            }
            String id = label == null ? "" : label;
            GridLine.Axis axis;
            String text;
            String key;
            if (g.x() != null) {
                axis = GridLine.Axis.X;
                text = g.x();
                key = "x";
                if (g.y() != null) {
                    problems.error("bad-value", p + "/y", id, "a grid line has exactly one of x (a line of constant x) or y "
                            + "(a line of constant y); this one has both");
                }
            } else if (g.y() != null) {
                axis = GridLine.Axis.Y;
                text = g.y();
                key = "y";
            } else {
                if (!problems.reportedAtOrUnder(p + "/x") && !problems.reportedAtOrUnder(p + "/y")) {
                    problems.error("missing-field", p + "/x", id, "a grid line needs its position: x (a line of constant x, "
                            + "e.g. {\"label\": \"A\", \"x\": \"0ft\"}) or y (a line of constant y)");
                }
                if (labelOk) {
                    gridUnusable.add(label);
                }
                continue;
            }
            if (labelOk) {
                gridAxes.put(label, axis);
            }
            double offset = length(text, p + "/" + key, id, key);
            if (labelOk && offset == offset) {
                gridOffsets.put(label, offset);
                out.add(new GridLine(label, axis, offset));
            }
        }
        return out;
    }

    private List<Level> levels(List<LevelDoc> docs) {
        List<Level> out = new ArrayList<>();
        if (docs == null) {
            return out;
        }
        Map<String, String> seen = new HashMap<>();
        double below = Double.NaN;
        String belowName = "";
        String belowText = "";
        for (int i = 0; i < docs.size(); i++) {
            LevelDoc l = docs.get(i);
            if (l == null) {
                continue;
            }
            String p = Pointers.child("/levels", i);
            String name = l.name() == null ? "" : l.name();
            if (l.name() != null && nonBlank(name, p + "/name", "", "name", "a level name such as \"Level 2\" or \"Roof\"")) {
                String first = seen.putIfAbsent(name, p);
                if (first != null) {
                    problems.error("duplicate-id", p + "/name", name, "name: the level name \"" + name
                            + "\" is already used by " + first + "; level names must be unique");
                }
            }
            double elevation = l.elevation() == null ? Double.NaN : length(l.elevation(), p + "/elevation", name, "elevation");
            double height = Double.NaN;
            if (l.storeyHeight() != null) {
                height = length(l.storeyHeight(), p + "/storeyHeight", name, "storeyHeight");
                if (height == height && !(height > 0)) {
                    problems.error("out-of-range", p + "/storeyHeight", name, "storeyHeight: \"" + l.storeyHeight()
                            + "\" must be greater than zero (the height of the storey below the level)");
                }
            }
            if (elevation == elevation) {
                if (below == below && !(elevation > below)) {
                    problems.error("level-order", p + "/elevation", name, "elevation: \"" + l.elevation()
                            + "\" is not above the level below (\"" + belowName + "\" at \"" + belowText
                            + "\"); list levels from the bottom up with rising elevations");
                }
                below = elevation;
                belowName = name;
                belowText = l.elevation();
            }
            if (elevation == elevation && height == height && l.floor() != null) {
                out.add(new Level(name, elevation, height, l.floor()));
            }
        }
        return out;
    }

    private void checkLevelFloors(List<LevelDoc> levels, List<FloorDoc> floors) {
        if (levels == null) {
            return;
        }
        if (floors == null ? problems.reportedAtOrUnder("/floors")
                : floors.stream().anyMatch(f -> f == null || f.id() == null)) {
            return; // some floor ids are unknown (reported): references cannot be checked
        }
        Set<String> idSet = new java.util.LinkedHashSet<>();
        if (floors != null) { // absent or null: the plan has no floors, and every reference is unknown
            floors.forEach(f -> idSet.add(f.id()));
        }
        List<String> ids = List.copyOf(idSet);
        for (int i = 0; i < levels.size(); i++) {
            LevelDoc l = levels.get(i);
            if (l != null && l.floor() != null && !idSet.contains(l.floor())) {
                problems.error("unknown-reference", Pointers.child("/levels", i) + "/floor", l.name() == null ? "" : l.name(),
                        "floor: there is no floor with id \"" + ShapeCheck.clip(l.floor()) + "\"; "
                                + (ids.isEmpty() ? "the plan has no floors" : "the floors are " + quotedList(ids)));
            }
        }
    }

    private void checkTopLevels(List<ColumnDoc> columns, List<LevelDoc> levels) {
        if (columns == null) {
            return;
        }
        if (levels == null ? problems.reportedAtOrUnder("/levels")
                : levels.stream().anyMatch(l -> l == null || l.name() == null)) {
            return; // some level names are unknown (reported)
        }
        List<String> names = new ArrayList<>();
        if (levels != null) { // absent or null: the plan has no levels, and every named top level is unknown
            levels.forEach(l -> names.add(l.name()));
        }
        Set<String> nameSet = new HashSet<>(names);
        for (int i = 0; i < columns.size(); i++) {
            ColumnDoc c = columns.get(i);
            if (c != null && c.topLevel() != null && !c.topLevel().isEmpty() && !nameSet.contains(c.topLevel())) {
                problems.error("unknown-reference", Pointers.child("/columns", i) + "/topLevel", c.id() == null ? "" : c.id(),
                        "topLevel: there is no level named \"" + ShapeCheck.clip(c.topLevel()) + "\"; use "
                                + (names.isEmpty() ? "" : "one of " + quotedList(names) + ", or ")
                                + "\"\" for the top of the building");
            }
        }
    }

    // ---- floors

    private List<Floor> floors(List<FloorDoc> docs) {
        List<Floor> out = new ArrayList<>();
        if (docs == null) {
            return out;
        }
        Map<String, String> seen = new HashMap<>();
        for (int i = 0; i < docs.size(); i++) {
            FloorDoc f = docs.get(i);
            if (f == null) {
                continue;
            }
            String p = Pointers.child("/floors", i);
            String id = f.id() == null ? "" : f.id();
            if (f.id() != null && nonBlank(id, p + "/id", "", "id", "a floor id such as \"typical\"")) {
                String first = seen.putIfAbsent(id, p);
                if (first != null) {
                    problems.error("duplicate-id", p + "/id", id, "id: the floor id \"" + id + "\" is already used by " + first
                            + "; floor ids must be unique");
                }
            }
            Polygon slab = f.slabEdge() == null ? null : polygon(f.slabEdge(), p + "/slabEdge", id, "slabEdge");
            if (f.ceiling() != null) {
                RoofCeiling c = choice(f.ceiling(), p + "/ceiling", id, "ceiling", CEILINGS, null);
                if (f.roof() == null || !f.roof()) {
                    problems.error("bad-value", p + "/ceiling", id, "ceiling: \"" + ShapeCheck.clip(f.ceiling()) + "\" is"
                            + " given on floor \"" + id + "\", which is not a roof; the ceiling chooses the deflection limits"
                            + " of roof members (IBC Table 1604.3): set \"roof\": true, or leave the ceiling out");
                } else if (c != null) {
                    roofCeilings.put(id, c);
                }
            }
            FloorIds ids = new FloorIds(id);
            List<Deck> decks = items(f.decks(), p + "/decks", ids, DeckDoc::id, this::deck);
            List<Member> members = items(f.members(), p + "/members", ids, MemberDoc::id, this::member);
            List<Infill> infills = items(f.infills(), p + "/infills", ids, InfillDoc::id, this::infill);
            List<Opening> openings = items(f.openings(), p + "/openings", ids, OpeningDoc::id, this::opening);
            List<AreaLoad> areaLoads = items(f.areaLoads(), p + "/areaLoads", ids, AreaLoadDoc::id, this::areaLoad);
            List<LineLoad> lineLoads = items(f.lineLoads(), p + "/lineLoads", ids, LineLoadDoc::id, this::lineLoad);
            List<PointLoadItem> pointLoads = items(f.pointLoads(), p + "/pointLoads", ids, PointLoadDoc::id, this::pointLoad);
            CompositeFloor composite = compositeFloor(f.composite(), p + "/composite", id);
            if (composite.mode() != CompositeMode.NON_COMPOSITE && f.composite() != null
                    && decks.stream().noneMatch(d -> d.slab() != null) && !decks.isEmpty()) {
                problems.warning("no-slab", p + "/composite", id, "composite: floor \"" + id + "\" is set to act with its slab,"
                        + " but none of its decks describes one (\"slab\"); its members are designed as bare steel");
            }
            if (slab != null) {
                out.add(new Floor(id, f.name() == null ? "" : f.name(), f.roof() != null && f.roof(), slab, decks, members,
                        infills, openings, areaLoads, lineLoads, pointLoads, composite));
            }
        }
        return out;
    }

    /** How a floor's members work with its slab: non-composite when absent (files written before composite floors). */
    private CompositeFloor compositeFloor(PlanDocument.CompositeFloorDoc c, String p, String floorId) {
        if (c == null) {
            return CompositeFloor.NONE;
        }
        CompositeMode mode = c.action() == null ? CompositeMode.NON_COMPOSITE
                : choice(c.action(), p + "/action", floorId, "action", ACTIONS, CompositeMode.NON_COMPOSITE);
        boolean shored = choice(c.shoring(), p + "/shoring", floorId, "shoring", SHORING, false);
        double cl = CompositeFloor.DEFAULT_CONSTRUCTION_LIVE;
        if (c.constructionLive() != null) {
            double v = quantity(c.constructionLive(), Dimension.AREA_LOAD, p + "/constructionLive", floorId, "constructionLive");
            if (!Double.isNaN(v) && !(v >= 0 && v <= 200 * PSF)) {
                problems.error("out-of-range", p + "/constructionLive", floorId, "constructionLive: \""
                        + ShapeCheck.clip(c.constructionLive()) + "\" is not allowed; give the construction live load on the"
                        + " bare steel, 0 to 200 psf (9.6 kPa), e.g. \"20psf\" (ASCE/SEI 37)");
            } else if (!Double.isNaN(v)) {
                cl = v;
            }
        }
        boolean size = choice(c.vibration(), p + "/vibration", floorId, "vibration", VIBRATION_SIZING, false);
        return new CompositeFloor(mode, shored, cl, size);
    }

    /** The ids used on one floor: every object of a floor has its own id. */
    private static final class FloorIds {
        final String floorId;
        final Map<String, String> first = new HashMap<>();

        FloorIds(String floorId) {
            this.floorId = floorId;
        }
    }

    /** Converts one object of a floor; null when it has errors. */
    @FunctionalInterface
    private interface ItemReader<D, T> {
        T read(D doc, String pointer);
    }

    private <D, T> List<T> items(List<D> docs, String pointer, FloorIds ids, Function<D, String> idOf,
            ItemReader<D, T> reader) {
        List<T> out = new ArrayList<>();
        if (docs == null) {
            return out;
        }
        for (int i = 0; i < docs.size(); i++) {
            D d = docs.get(i);
            if (d == null) {
                continue;
            }
            String p = Pointers.child(pointer, i);
            String id = idOf.apply(d);
            if (id != null && nonBlank(id, p + "/id", ids.floorId, "id", "an id such as \"B-12\"")) {
                String first = ids.first.putIfAbsent(id, p);
                if (first != null) {
                    problems.error("duplicate-id", p + "/id", id, "id: \"" + id + "\" is already used on this floor by " + first
                            + "; the ids of a floor's members, infills, decks, openings and loads must all differ");
                }
            }
            T t = reader.read(d, p);
            if (t != null) {
                out.add(t);
            }
        }
        return out;
    }

    private Deck deck(DeckDoc d, String p) {
        String id = orEmpty(d.id());
        Polygon outline = d.outline() == null ? null : polygon(d.outline(), p + "/outline", id, "outline");
        if (d.spanAngle() != null && !Double.isFinite(d.spanAngle())) {
            problems.error("out-of-range", p + "/spanAngle", id, "spanAngle must be a finite number of degrees");
            return null;
        }
        double maxSpan = deckLimit(d.maxSpan(), p + "/maxSpan", id, "maxSpan", Deck.DEFAULT_MAX_SPAN);
        double maxOverhang = deckLimit(d.maxOverhang(), p + "/maxOverhang", id, "maxOverhang", Deck.DEFAULT_MAX_OVERHANG);
        if (Double.isNaN(maxSpan) || Double.isNaN(maxOverhang)) {
            return null;
        }
        Slab slab = null;
        if (d.slab() != null) {
            slab = slab(d.slab(), p + "/slab", id);
            if (slab == null) {
                return null;
            }
        }
        return outline == null || d.spanAngle() == null || d.id() == null ? null
                : new Deck(id, outline, d.spanAngle(), maxSpan, maxOverhang, slab);
    }

    /** A deck's slab; null when anything in it is wrong (each problem reported with its field). */
    private Slab slab(PlanDocument.SlabDoc s, String p, String id) {
        Slab t = Slab.typical();
        int before = problems.errorCount();
        double hr = s.ribHeight() == null ? Double.NaN : inRange(s.ribHeight(), Dimension.LENGTH, p + "/ribHeight", id,
                "ribHeight", 0, 8 * IN, "the deck's rib height, 0 (a solid slab) to 8 in (200 mm), e.g. \"3in\"");
        double wr = s.ribWidth() == null ? t.ribWidth() : inRange(s.ribWidth(), Dimension.LENGTH, p + "/ribWidth", id,
                "ribWidth", 0.5 * IN, 24 * IN, "the average width of a concrete rib, 0.5 to 24 in, e.g. \"6in\"");
        double pitch = s.ribPitch() == null ? t.ribPitch() : inRange(s.ribPitch(), Dimension.LENGTH, p + "/ribPitch", id,
                "ribPitch", 1 * IN, 36 * IN, "the rib pitch, centre to centre, 1 to 36 in, e.g. \"12in\"");
        double deck = s.deckWeight() == null ? t.deckWeight() : inRange(s.deckWeight(), Dimension.AREA_LOAD, p + "/deckWeight",
                id, "deckWeight", 0, 20 * PSF, "the deck's own weight, 0 to 20 psf (0.96 kPa), e.g. \"2.5psf\"");
        double tc = s.topping() == null ? Double.NaN : inRange(s.topping(), Dimension.LENGTH, p + "/topping", id, "topping",
                1 * IN, 16 * IN, "the concrete above the top of the deck, 1 to 16 in, e.g. \"4.5in\"");
        double wc = s.concrete() == null ? Double.NaN : inRange(s.concrete(), Dimension.UNIT_WEIGHT, p + "/concrete", id,
                "concrete", 70 * PCF, 170 * PCF, "the concrete unit weight, 70 to 170 pcf (11 to 26.7 kN/m3), e.g. \"145pcf\"");
        double fc = s.fc() == null ? Double.NaN : inRange(s.fc(), Dimension.STRESS, p + "/fc", id, "fc", Units.KSI.toSi(3),
                Units.KSI.toSi(10), "the concrete strength f'c, 3 to 10 ksi (21 to 69 MPa), the range of AISC 360-16 I1.3, e.g. \"4ksi\"");
        double weight = s.weight() == null ? Double.NaN : inRange(s.weight(), Dimension.AREA_LOAD, p + "/weight", id, "weight",
                5 * PSF, 300 * PSF, "the slab's weight, 5 to 300 psf, or leave it out to have it worked out from the slab's geometry");
        PlanDocument.StudsDoc sd = s.studs();
        double dsa = sd == null || sd.diameter() == null ? t.studDiameter() : inRange(sd.diameter(), Dimension.LENGTH,
                p + "/studs/diameter", id, "diameter", 0.375 * IN, 1 * IN, "the stud shank diameter, 3/8 to 1 in, e.g. \"0.75in\"");
        double fu = sd == null || sd.fu() == null ? t.studFu() : inRange(sd.fu(), Dimension.STRESS, p + "/studs/fu", id, "fu",
                Units.KSI.toSi(50), Units.KSI.toSi(100), "the stud tensile strength, 50 to 100 ksi, e.g. \"65ksi\"");
        int perRib = t.studsPerRib();
        if (sd != null && sd.perRib() != null) {
            perRib = sd.perRib();
            if (perRib < 1 || perRib > 3) {
                problems.error("out-of-range", p + "/studs/perRib", id, "perRib: " + perRib + " is not allowed; give 1, 2 or 3"
                        + " studs per rib (AISC 360-16 Table 3-21 rows)");
            }
        }
        StudPlacement position = sd == null || sd.position() == null ? t.studPosition()
                : choice(sd.position(), p + "/studs/position", id, "position", STUD_POSITIONS, null);
        if (problems.errorCount() > before || position == null) {
            return null;
        }
        if (hr > 0 && wr > pitch) {
            problems.error("bad-value", p + "/ribWidth", id, "ribWidth: \"" + ShapeCheck.clip(s.ribWidth()) + "\" is wider than the"
                    + " rib pitch \"" + (s.ribPitch() == null ? "12in" : ShapeCheck.clip(s.ribPitch())) + "\"; the average rib width"
                    + " must not exceed the pitch");
            return null;
        }
        return new Slab(hr, wr, pitch, deck, tc, wc, fc, dsa, fu, perRib, position, weight);
    }

    /** A quantity in [min, max]; NaN when it does not parse or lies outside (both reported). */
    private double inRange(String text, Dimension d, String p, String id, String label, double min, double max, String allowed) {
        double v = quantity(text, d, p, id, label);
        if (Double.isNaN(v)) {
            return v;
        }
        if (!(v >= min - 1e-12 && v <= max + 1e-12)) {
            problems.error("out-of-range", p, id, label + ": \"" + ShapeCheck.clip(text) + "\" is not allowed; give " + allowed);
            return Double.NaN;
        }
        return v;
    }

    /** A deck's span or overhang limit, m: the default when absent, NaN when wrong (reported). */
    private double deckLimit(String text, String p, String id, String label, double def) {
        if (text == null) {
            return def;
        }
        double v = length(text, p, id, label);
        if (Double.isNaN(v)) {
            return v;
        }
        if (!(v > 0)) {
            problems.error("out-of-range", p, id, label + ": \"" + ShapeCheck.clip(text)
                    + "\" must be a length greater than zero, from the deck maker's tables");
            return Double.NaN;
        }
        return v;
    }

    private Member member(MemberDoc m, String p) {
        String id = orEmpty(m.id());
        MemberKind kind = m.kind() == null ? null : choice(m.kind(), p + "/kind", id, "kind", KINDS, null);
        Point start = m.start() == null ? null : point(m.start(), p + "/start", id, "start");
        Point end = m.end() == null ? null : point(m.end(), p + "/end", id, "end");
        Optional<String> section = section(m.section(), p + "/section", id);
        if (start != null && end != null && start.distance(end) < MIN_MEMBER_LENGTH) {
            problems.error("zero-length", p + "/end", id, "end: the member ends where it starts (" + m.end().get(0) + ", "
                    + m.end().get(1) + "); a member needs two distinct ends");
            return null;
        }
        java.util.OptionalInt studs = java.util.OptionalInt.empty();
        if (m.studs() != null) {
            if (m.studs() < 0 || m.studs() > 400) {
                problems.error("out-of-range", p + "/studs", id, "studs: " + m.studs() + " is not allowed; give the number of"
                        + " studs on the whole member, 0 to 400 (with a fixed section)");
                return null;
            }
            if (section.isEmpty()) {
                problems.error("bad-value", p + "/studs", id, "studs: a stud count is fixed only with a fixed section; give"
                        + " \"section\" too, or leave \"studs\" out to have them searched");
                return null;
            }
            studs = java.util.OptionalInt.of(m.studs());
        }
        if (kind == null || start == null || end == null || m.id() == null || section == null) {
            return null;
        }
        return new Member(id, kind, start, end, section, Optional.ofNullable(m.composite()), studs);
    }

    private Infill infill(InfillDoc n, String p) {
        String id = orEmpty(n.id());
        String[] xs = n.bay() == null ? null : bayLines(n.bay().x(), p + "/bay/x", id, "x", GridLine.Axis.X);
        String[] ys = n.bay() == null ? null : bayLines(n.bay().y(), p + "/bay/y", id, "y", GridLine.Axis.Y);
        GridLine.Axis direction = n.direction() == null ? null : choice(n.direction(), p + "/direction", id, "direction", AXES, null);
        int count = 0;
        double spacing = 0;
        boolean spacingOk = true;
        if (n.count() != null && n.maxSpacing() != null) {
            problems.error("bad-value", p + "/maxSpacing", id, "give either count or maxSpacing, not both (count "
                    + n.count() + ", maxSpacing \"" + n.maxSpacing() + "\")");
            spacingOk = false;
        } else if (n.count() != null) {
            count = n.count();
            if (count < 1) {
                problems.error("out-of-range", p + "/count", id, "count: " + count + " beams is not allowed; give 1 or more, "
                        + "or a maxSpacing instead");
                spacingOk = false;
            } else if (count > MAX_INFILL_BEAMS) {
                problems.error("out-of-range", p + "/count", id, "count: " + count + " beams is not allowed; an infill has "
                        + "at most " + MAX_INFILL_BEAMS + " beams");
                spacingOk = false;
            }
        } else if (n.maxSpacing() != null) {
            spacing = length(n.maxSpacing(), p + "/maxSpacing", id, "maxSpacing");
            if (spacing == spacing && !(spacing > 0)) {
                problems.error("out-of-range", p + "/maxSpacing", id, "maxSpacing: \"" + n.maxSpacing()
                        + "\" must be greater than zero");
            }
            spacingOk = spacing > 0;
        } else {
            spacingOk = false;
            if (!problems.reportedAtOrUnder(p + "/count") && !problems.reportedAtOrUnder(p + "/maxSpacing")) {
                problems.error("missing-field", p + "/count", id, "an infill needs either count (the number of beams, e.g. 2) "
                        + "or maxSpacing (the largest spacing, e.g. \"10ft\")");
            }
        }
        if (xs == null || ys == null || direction == null || !spacingOk || n.id() == null) {
            return null;
        }
        Infill infill = new Infill(id, xs[0], xs[1], ys[0], ys[1], direction, count, spacing);
        if (count == 0) {
            String[] across = direction == GridLine.Axis.X ? ys : xs;
            double width = Math.abs(gridOffsets.get(across[1]) - gridOffsets.get(across[0]));
            int beams = Framing.beamCount(infill, width);
            if (beams > MAX_INFILL_BEAMS) {
                problems.error("out-of-range", p + "/maxSpacing", id, "maxSpacing: \"" + ShapeCheck.clip(n.maxSpacing())
                        + "\" would put " + (beams == Integer.MAX_VALUE - 1 ? "billions of" : Integer.toString(beams))
                        + " beams in the " + Numbers.format(width) + " m wide bay; an infill has at most " + MAX_INFILL_BEAMS
                        + " beams, so give a larger spacing (e.g. \"10ft\" or \"3m\")");
                return null;
            }
        }
        return infill;
    }

    /** The two labels of a bay's x or y lines, west/south first; null when wrong (reported). */
    private String[] bayLines(List<String> labels, String p, String id, String key, GridLine.Axis axis) {
        if (labels == null) {
            return null;
        }
        String lines = key + " lines";
        if (labels.size() != 2) {
            problems.error("bad-value", p, id, "bay " + key + ": give the two " + lines + " that bound the bay, e.g. "
                    + (axis == GridLine.Axis.X ? "[\"A\", \"B\"]" : "[\"1\", \"2\"]") + "; got " + labels.size()
                    + (labels.size() == 1 ? " label" : " labels"));
            return null;
        }
        boolean ok = true;
        for (int j = 0; j < 2; j++) {
            String label = labels.get(j);
            if (label == null) {
                ok = false;
                continue;
            }
            GridLine.Axis found = gridAxes.get(label);
            if (found == null && (gridIncomplete || gridUnusable.contains(label))) {
                ok = false; // the grid line may be one of those with errors, reported there
                continue;
            }
            if (found == axis) {
                continue;
            }
            List<String> onAxis = gridAxes.entrySet().stream().filter(e -> e.getValue() == axis).map(Map.Entry::getKey).toList();
            String allowed = onAxis.isEmpty() ? "the grid has no " + lines : "the " + lines + " are " + quotedList(onAxis);
            if (found == null) {
                problems.error("unknown-reference", Pointers.child(p, j), id, "bay " + key + "[" + j
                        + "]: there is no grid line \"" + ShapeCheck.clip(label) + "\"; " + allowed);
                ok = false;
            } else if (found != axis) {
                problems.error("wrong-axis", Pointers.child(p, j), id, "bay " + key + "[" + j + "]: grid line \"" + label
                        + "\" is " + (found == GridLine.Axis.X ? "an x line" : "a y line") + ", but a bay's " + key
                        + " needs " + lines + "; " + allowed);
                ok = false;
            }
        }
        if (!ok) {
            return null;
        }
        if (labels.get(0).equals(labels.get(1))) {
            problems.error("bad-value", Pointers.child(p, 1), id, "bay " + key + ": the two " + lines
                    + " of a bay must differ (both are \"" + labels.get(0) + "\")");
            return null;
        }
        Double a = gridOffsets.get(labels.get(0));
        Double b = gridOffsets.get(labels.get(1));
        if (a == null || b == null) {
            return null; // the grid line's position is wrong, reported there
        }
        return a <= b ? new String[] {labels.get(0), labels.get(1)} : new String[] {labels.get(1), labels.get(0)};
    }

    private Opening opening(OpeningDoc o, String p) {
        Polygon outline = o.outline() == null ? null : polygon(o.outline(), p + "/outline", orEmpty(o.id()), "outline");
        return outline == null || o.id() == null ? null : new Opening(o.id(), outline);
    }

    private AreaLoad areaLoad(AreaLoadDoc a, String p) {
        String id = orEmpty(a.id());
        Polygon outline = a.outline() == null ? null : polygon(a.outline(), p + "/outline", id, "outline");
        LoadValues values = loads(p, id, Dimension.AREA_LOAD, a.dead(), a.superimposed(), a.live(), a.roofLive(), a.snow(),
                a.partition());
        LiveLoadUse use = a.use() == null ? LiveLoadUse.ORDINARY : choice(a.use(), p + "/use", id, "use", USES, null);
        return outline == null || values == null || use == null || a.id() == null ? null
                : new AreaLoad(id, outline, values, use);
    }

    private LineLoad lineLoad(LineLoadDoc l, String p) {
        String id = orEmpty(l.id());
        List<Point> path = l.path() == null ? null : points(l.path(), p + "/path", id, "path", 2);
        LoadValues values = loads(p, id, Dimension.LINE_LOAD, l.dead(), l.superimposed(), l.live(), l.roofLive(), l.snow(),
                l.partition());
        return path == null || values == null || l.id() == null ? null : new LineLoad(id, path, values);
    }

    private PointLoadItem pointLoad(PointLoadDoc l, String p) {
        String id = orEmpty(l.id());
        Point at = l.at() == null ? null : point(l.at(), p + "/at", id, "at");
        LoadValues values = loads(p, id, Dimension.FORCE, l.dead(), l.superimposed(), l.live(), l.roofLive(), l.snow(),
                l.partition());
        return at == null || values == null || l.id() == null ? null : new PointLoadItem(id, at, values);
    }

    private static final String[] LOAD_KEYS = {"dead", "superimposed", "live", "roofLive", "snow", "partition"};

    private LoadValues loads(String p, String id, Dimension d, String... texts) {
        double[] v = new double[texts.length];
        boolean ok = true;
        for (int i = 0; i < texts.length; i++) {
            if (texts[i] == null) {
                continue;
            }
            String q = p + "/" + LOAD_KEYS[i];
            v[i] = quantity(texts[i], d, q, id, LOAD_KEYS[i]);
            if (v[i] != v[i]) {
                ok = false;
            } else if (v[i] < 0) {
                problems.error("out-of-range", q, id, LOAD_KEYS[i] + ": \"" + texts[i] + "\" is negative; loads must be 0 or more "
                        + "(a load acts downward)");
                ok = false;
            } else if (v[i] > MAX_LOAD) {
                problems.error("out-of-range", q, id, LOAD_KEYS[i] + ": \"" + texts[i] + "\" is implausibly large");
                ok = false;
            }
        }
        return ok ? new LoadValues(v[0], v[1], v[2], v[3], v[4], v[5]) : null;
    }

    // ---- columns

    private List<Column> columns(List<ColumnDoc> docs) {
        List<Column> out = new ArrayList<>();
        if (docs == null) {
            return out;
        }
        Map<String, String> seen = new HashMap<>();
        for (int i = 0; i < docs.size(); i++) {
            ColumnDoc c = docs.get(i);
            if (c == null) {
                continue;
            }
            String p = Pointers.child("/columns", i);
            String id = orEmpty(c.id());
            if (c.id() != null && nonBlank(id, p + "/id", "", "id", "a column id such as \"C-B2\"")) {
                String first = seen.putIfAbsent(id, p);
                if (first != null) {
                    problems.error("duplicate-id", p + "/id", id, "id: the column id \"" + id + "\" is already used by " + first
                            + "; column ids must be unique");
                }
            }
            Point at = c.at() == null ? null : point(c.at(), p + "/at", id, "at");
            Optional<String> section = section(c.section(), p + "/section", id);
            if (at != null && section != null && c.id() != null) {
                out.add(new Column(id, at, orEmpty(c.grid()), orEmpty(c.topLevel()), section));
            }
        }
        return out;
    }

    // ---- values

    /** A fixed section: empty when absent; null when blank (reported). */
    private Optional<String> section(String text, String p, String id) {
        if (text == null) {
            return Optional.empty();
        }
        if (text.isBlank()) {
            problems.error("bad-value", p, id, "section: give a section such as \"W24X55\", or leave the field out (or null) "
                    + "to let Baywright choose");
            return null;
        }
        return Optional.of(text);
    }

    private Point point(List<String> xy, String p, String id, String label) {
        if (xy.size() != 2) {
            problems.error("bad-value", p, id, label + ": a point is a pair [x, y] such as [\"0ft\", \"30ft\"]; got "
                    + xy.size() + (xy.size() == 1 ? " value" : " values"));
            return null;
        }
        double x = xy.get(0) == null ? Double.NaN : length(xy.get(0), p + "/0", id, label + " x");
        double y = xy.get(1) == null ? Double.NaN : length(xy.get(1), p + "/1", id, label + " y");
        return x == x && y == y ? new Point(x, y) : null;
    }

    private List<Point> points(List<List<String>> list, String p, String id, String label, int min) {
        List<Point> out = new ArrayList<>();
        boolean ok = true;
        for (int i = 0; i < list.size(); i++) {
            List<String> xy = list.get(i);
            Point pt = xy == null ? null : point(xy, Pointers.child(p, i), id, label + "[" + i + "]");
            if (pt == null) {
                ok = false;
            } else {
                out.add(pt);
            }
        }
        if (list.size() < min) {
            problems.error("too-few-vertices", p, id, label + ": has " + list.size() + (list.size() == 1 ? " point" : " points")
                    + "; " + (min == 2 ? "a path needs at least 2 points" : "an outline needs at least 3 vertices"));
            return null;
        }
        return ok ? out : null;
    }

    private Polygon polygon(List<List<String>> list, String p, String id, String label) {
        List<Point> vs = points(list, p, id, label, 3);
        if (vs == null) {
            return null;
        }
        if (vs.get(0).equals(vs.get(vs.size() - 1))) {
            problems.error("bad-value", Pointers.child(p, vs.size() - 1), id, label + ": the last vertex repeats the first; "
                    + "list each vertex once (the outline closes by itself)");
            return null;
        }
        return new Polygon(vs);
    }

    /** A coordinate or length in metres; NaN when wrong (reported). */
    private double length(String text, String p, String id, String label) {
        double v = quantity(text, Dimension.LENGTH, p, id, label);
        if (Math.abs(v) > MAX_LENGTH) {
            problems.error("out-of-range", p, id, label + ": \"" + ShapeCheck.clip(text)
                    + "\" is implausibly far; lengths and coordinates must be within 100 km (±328084ft)");
            return Double.NaN;
        }
        return v;
    }

    /** A quantity in SI; NaN when it does not parse (reported with the pointer as the field). */
    private double quantity(String text, Dimension d, String p, String id, String label) {
        try {
            return Quantities.parse(p, text, d);
        } catch (UnitParseException e) {
            String m = e.getMessage();
            String rest = m.startsWith(p + ": ") ? m.substring(p.length() + 2) : m;
            problems.error("bad-quantity", p, id, label + ": " + rest);
            return Double.NaN;
        }
    }

    private boolean nonBlank(String value, String p, String id, String label, String expected) {
        if (value.isBlank()) {
            problems.error("bad-value", p, id, label + ": must not be empty; give " + expected);
            return false;
        }
        return true;
    }

    private <T> T choice(String value, String p, String id, String label, Map<String, T> allowed, T def) {
        if (value == null) {
            return def;
        }
        T t = allowed.get(value);
        if (t == null) {
            problems.error("bad-value", p, id, label + ": \"" + ShapeCheck.clip(value) + "\" is not allowed; use "
                    + quotedList(List.copyOf(allowed.keySet())));
        }
        return t == null ? def : t;
    }

    /** Text with control characters shown as {@code \\uXXXX}, for messages. */
    private static String printable(String s) {
        StringBuilder b = new StringBuilder();
        s.codePoints().forEach(c -> {
            if (Character.isISOControl(c)) {
                b.append(String.format(java.util.Locale.ROOT, "\\u%04X", c));
            } else {
                b.appendCodePoint(c);
            }
        });
        return b.toString();
    }

    private static String orEmpty(String s) {
        return s == null ? "" : s;
    }

    private static String quotedList(List<String> values) {
        StringBuilder b = new StringBuilder();
        int shown = Math.min(values.size(), 12);
        for (int i = 0; i < shown; i++) {
            if (i > 0) {
                b.append(i == values.size() - 1 ? " or " : ", ");
            }
            b.append('"').append(ShapeCheck.clip(values.get(i))).append('"');
        }
        if (values.size() > shown) {
            b.append(", … (").append(values.size()).append(" in all)");
        }
        return b.toString();
    }

    @SuppressWarnings("unchecked")
    private static <T> Map<String, T> ordered(Object... keyValues) {
        Map<String, T> m = new LinkedHashMap<>();
        for (int i = 0; i < keyValues.length; i += 2) {
            m.put((String) keyValues[i], (T) keyValues[i + 1]);
        }
        return m;
    }

}
