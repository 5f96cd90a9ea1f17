package org.baywright.run;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.ColumnDesigner;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.SearchFilter;
import org.baywright.design.Steel;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadRules;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.plan.RoofCeiling;
import org.baywright.takedown.ColumnLines;
import org.baywright.takedown.FloorRules;
import org.baywright.units.UnitSystem;

/**
 * The design basis of a run, worked out once from the plan's settings: what every stage, report and
 * command reads instead of the settings' text. The only place that parses the design method and the
 * unit system of a plan, derives the steel from its Fy, and loads the catalog its settings name.
 *
 * @param method the design method; LRFD when the plan's text names none
 * @param steel ASTM A992 at the plan's Fy
 * @param catalog the sections to choose from; null only when the catalog could not be read (the run
 *     stopped before sizing)
 * @param catalogFile the catalog file the settings name, empty for the built-in W shapes
 * @param units the plan's unit system for output; US when its text names none
 * @param deflection the deflection limits of floor beams and girders (project criteria)
 * @param roofDeflection the deflection limits of the members of each roof floor layout, by floor id: the
 *     IBC Table 1604.3 roof row of the ceiling the plan sets for it, with the checks the plan turns off
 *     turned off
 * @param liveLoad how live load is reduced and classed
 * @param beams the sections a beam may be (series, depth limit)
 * @param girders the sections a girder may be
 * @param columnSeries the series allowed for columns (empty = all)
 * @param spliceEvery column tiers: a splice every this many levels
 * @param connectionEccentricity how far beyond the column face a reaction acts, m (column moments; common practice)
 */
public record DesignBasis(DesignMethod method, Steel steel, Catalog catalog, String catalogFile, UnitSystem units,
        DeflectionLimits deflection, LiveLoadRules liveLoad, SearchFilter beams, SearchFilter girders,
        List<String> columnSeries, int spliceEvery, Map<String, DeflectionLimits> roofDeflection,
        double connectionEccentricity, org.baywright.plan.CompositeRules composite) {

    public DesignBasis {
        columnSeries = List.copyOf(columnSeries);
        catalogFile = catalogFile == null ? "" : catalogFile;
        roofDeflection = Collections.unmodifiableMap(new LinkedHashMap<>(roofDeflection));
    }

    /** A catalog read for a basis, or the located problem of a catalog that cannot be read. */
    public record Loaded(DesignBasis basis, List<Problem> problems) {
        public Loaded {
            problems = List.copyOf(problems);
        }

        /** True when the catalog was read. */
        public boolean ok() {
            return problems.isEmpty();
        }
    }

    /** The basis of a plan with a catalog given (null: none could be read). */
    public static DesignBasis of(Plan plan, Catalog catalog) {
        DesignSettings s = plan.settings();
        return new DesignBasis(methodOf(plan), steel(s.fy()), catalog, s.catalog(), unitsOf(plan),
                new DeflectionLimits(s.liveDeflection(), s.totalDeflection()), new LiveLoadRules(s.liveLoadReduction(), s.partitionAsDead(), s.girderAreaDelivered(),
                        s.deflectionLiveReduced()),
                filter(s.beamSeries(), s.maxBeamDepth()), filter(s.girderSeries(), s.maxBeamDepth()), s.columnSeries(),
                s.spliceEvery(), roofDeflection(plan), s.connectionEccentricity(), s.composite());
    }

    /** The deflection limits of the members of every roof layout of a plan, by floor id. */
    private static Map<String, DeflectionLimits> roofDeflection(Plan plan) {
        DesignSettings s = plan.settings();
        DeflectionLimits settings = new DeflectionLimits(s.liveDeflection(), s.totalDeflection());
        Map<String, DeflectionLimits> out = new LinkedHashMap<>();
        for (Floor f : plan.floors()) {
            if (f.roof()) {
                out.put(f.id(), roofRow(s.roofCeiling(f.id())).withChecksOffAs(settings));
            }
        }
        return out;
    }

    /** The row of IBC Table 1604.3 for roof members carrying {@code ceiling}. */
    public static DeflectionLimits roofRow(RoofCeiling ceiling) {
        return switch (ceiling) {
            case PLASTER -> DeflectionLimits.ROOF_PLASTER_CEILING;
            case NON_PLASTER -> DeflectionLimits.ROOF_NON_PLASTER_CEILING;
            case NONE -> DeflectionLimits.ROOF_NO_CEILING;
        };
    }

    /**
     * The deflection limits of the members of a floor layout: the roof row of its ceiling for a roof
     * (the default ceiling for a roof layout this basis was not made with), else the floor limits.
     */
    public DeflectionLimits deflectionOf(Floor floor) {
        if (!floor.roof()) {
            return deflection;
        }
        DeflectionLimits r = roofDeflection.get(floor.id());
        return r != null ? r : roofRow(RoofCeiling.DEFAULT).withChecksOffAs(deflection);
    }

    /** The design method a plan's settings name: LRFD when they name none. */
    public static DesignMethod methodOf(Plan plan) {
        DesignMethod m = DesignMethod.parse(plan.settings().method());
        return m == null ? DesignMethod.LRFD : m;
    }

    /** The unit system a plan is written in: US when it names none. */
    public static UnitSystem unitsOf(Plan plan) {
        UnitSystem us = UnitSystem.parse(plan.units());
        return us == null ? UnitSystem.US : us;
    }

    /**
     * The basis of a plan with the catalog its settings name (the built-in one when empty). A catalog
     * that cannot be read gives a basis without one and a located problem at {@code /settings/catalog}.
     */
    public static Loaded load(Plan plan) {
        try {
            return new Loaded(of(plan, catalogOf(plan)), List.of());
        } catch (CatalogException e) {
            return new Loaded(of(plan, null), List.of(Problem.error("catalog", "/settings/catalog", "", e.getMessage())));
        }
    }

    /**
     * The catalog a plan's settings name: the built-in W shapes when empty, else the file.
     *
     * @throws CatalogException when the file cannot be read or its name is not a usable file name
     */
    public static Catalog catalogOf(Plan plan) {
        String c = plan.settings().catalog();
        if (c == null || c.isBlank()) {
            return CatalogFile.loadDefault();
        }
        try {
            return CatalogFile.read(Path.of(c));
        } catch (InvalidPathException e) {
            throw new CatalogException("catalog: \"" + e.getInput().replaceAll("\\p{Cntrl}", "?")
                    + "\" is not a usable file name (" + e.getReason() + ")", e);
        }
    }

    /** ASTM A992 steel with yield stress {@code fy}, Pa (the same steel when fy is A992's 50 ksi). */
    public static Steel steel(double fy) {
        return Steel.A992.fy() == fy ? Steel.A992 : Steel.A992.withFy(fy);
    }

    /** The same basis with another catalog (e.g. one a command line names). */
    public DesignBasis withCatalog(Catalog other) {
        return new DesignBasis(method, steel, other, catalogFile, units, deflection, liveLoad, beams, girders, columnSeries,
                spliceEvery, roofDeflection, connectionEccentricity, composite);
    }

    /** What the design of a floor (not roof) layout reads from the basis (besides the catalog). */
    public FloorRules floorRules() {
        return new FloorRules(method, steel, deflection, beams, girders, liveLoad, units, composite);
    }

    /** What the design of {@code floor} reads from the basis: its own deflection limits (roof rows for a roof). */
    public FloorRules floorRules(Floor floor) {
        return new FloorRules(method, steel, deflectionOf(floor), beams, girders, liveLoad, units, composite);
    }

    /** The designer of column tiers: the catalog's non-slender shapes of the allowed series. */
    public ColumnDesigner columnDesigner() {
        return new ColumnDesigner(catalog, steel, method, columnSeries, connectionEccentricity);
    }

    /** How column lines are tiered and reduced. */
    public ColumnLines.Rules columnRules() {
        return new ColumnLines.Rules(spliceEvery, liveLoad.reduce(), columnSeries);
    }

    private static SearchFilter filter(List<String> series, double maxBeamDepth) {
        double maxD = maxBeamDepth > 0 ? maxBeamDepth : Double.POSITIVE_INFINITY;
        Set<String> s = new LinkedHashSet<>();
        for (String x : series) {
            s.add(Section.normalize(x));
        }
        return new SearchFilter(0, maxD, s, Set.of());
    }
}
