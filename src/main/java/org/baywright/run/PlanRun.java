package org.baywright.run;

import java.util.List;
import java.util.Map;
import java.util.HashMap;
import java.util.ArrayList;
import org.baywright.catalog.Catalog;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.VibrationSettings;
import org.baywright.takedown.BayChecks;
import org.baywright.takedown.BayResult;
import org.baywright.takedown.ColumnLines;
import org.baywright.takedown.EquilibriumCheck;
import org.baywright.takedown.ExpandedPlan;
import org.baywright.takedown.FloorAreas;
import org.baywright.takedown.FloorCache;
import org.baywright.takedown.FloorDesign;
import org.baywright.takedown.FloorDesigner;
import org.baywright.takedown.FloorInput;
import org.baywright.takedown.FloorRules;
import org.baywright.takedown.Foundations;
import org.baywright.takedown.LevelDesign;
import org.baywright.takedown.Searches;
import org.baywright.takedown.SupportGraph;
import org.baywright.takedown.Takedown;
import org.baywright.takedown.TakedownResult;

/**
 * The pipeline: the design basis, then the stages of the takedown in order, each returning an
 * immutable result — the plan expanded, per floor layout its tributary areas, support graph and
 * members designed in order, the column lines, the foundations, the equilibrium check — and the run
 * result with its provenance. See {@link Takedown} for what each stage does.
 */
public final class PlanRun {
    private PlanRun() {
    }

    /** Runs a plan with the catalog its settings name (the built-in one when empty). */
    public static RunResult run(Plan plan) {
        DesignBasis.Loaded basis = DesignBasis.load(plan);
        if (!basis.ok()) {
            return new RunResult(plan, null, basis.problems(), "", version(), 0, basis.basis());
        }
        return run(plan, basis.basis(), null);
    }

    /** Runs a plan with a given catalog. */
    public static RunResult run(Plan plan, Catalog catalog) {
        return run(plan, catalog, null);
    }

    /**
     * Runs a plan with a given catalog, sharing floor designs with other runs through {@code reuse}
     * (null: none). The result is the same as {@link #run(Plan, Catalog)}'s; a study passes one cache to
     * all its variants.
     */
    public static RunResult run(Plan plan, Catalog catalog, FloorCache reuse) {
        return run(plan, DesignBasis.of(plan, catalog), reuse);
    }

    /**
     * Runs a plan on a design basis with a catalog, sharing floor designs through {@code reuse} when it
     * serves the basis's catalog (null: none).
     *
     * @throws IllegalArgumentException when the basis has no catalog
     */
    public static RunResult run(Plan plan, DesignBasis basis, FloorCache reuse) {
        if (basis.catalog() == null) {
            throw new IllegalArgumentException("a run needs the catalog of its design basis; this basis has none");
        }
        long t0 = System.nanoTime();
        Searches searches = new Searches(basis.catalog());
        FloorCache cache = reuse != null && reuse.catalog() == basis.catalog() ? reuse : null;
        ExpandedPlan expanded = ExpandedPlan.of(plan);
        Map<String, Map<String, String>> least = new HashMap<>();
        Attempt a = attempt(plan, basis, searches, cache, expanded, least);
        List<VibrationSizing.Change> changes = new ArrayList<>();
        if (VibrationSizing.wanted(plan)) {
            // floors sized for walking vibration: stiffen the bays that exceed their limit and design again
            java.util.Set<String> refused = new java.util.HashSet<>();
            for (int round = 0; round < VibrationSizing.MAX_ROUNDS; round++) {
                List<VibrationSizing.Change> c = VibrationSizing.stiffen(plan, a.takedown(), a.bays(), basis, least, refused);
                if (c.isEmpty()) {
                    break;
                }
                changes.addAll(c);
                a = attempt(plan, basis, searches, cache, expanded, least);
            }
            // the changes that stand: members that took the stiffness they were given
            changes.removeIf(c -> c.members().stream().anyMatch(id -> refused.contains(c.floor() + "|" + id)));
            VibrationSizing.stiffen(plan, a.takedown(), List.of(), basis, least, refused);
            changes.removeIf(c -> c.members().stream().anyMatch(id -> refused.contains(c.floor() + "|" + id)));
        }
        double ms = (System.nanoTime() - t0) / 1e6;
        return new RunResult(plan, a.takedown(), List.of(), basis.catalog().name(), version(), ms, basis, a.bays(), changes);
    }

    /** One design of the plan and its bays. */
    private record Attempt(TakedownResult takedown, List<BayResult> bays) {
    }

    /**
     * Stages 2 to 7 and the bay checks, each floor layout with the least sections its members were given for
     * vibration ({@code least}: result key → member id → section).
     */
    private static Attempt attempt(Plan plan, DesignBasis basis, Searches searches, FloorCache cache, ExpandedPlan expanded,
            Map<String, Map<String, String>> least) {
        Map<Integer, String> keys = new HashMap<>();
        for (ExpandedPlan.LevelFloor lf : expanded.levels()) {
            if (lf.floor() >= 0) {
                keys.putIfAbsent(lf.floor(), lf.resultKey());
            }
        }
        List<FloorInput> inputs = expanded.floors();
        List<FloorDesign> floors = java.util.stream.IntStream.range(0, inputs.size()).parallel()
                .mapToObj(i -> {
                    FloorInput f = inputs.get(i);
                    // each layout with its own deflection limits: the roof rows of IBC Table 1604.3 on a roof
                    FloorRules rules = basis.floorRules(f.floor());
                    Map<String, String> stiff = least.get(keys.get(i));
                    if (stiff != null && !stiff.isEmpty()) {
                        rules = rules.withVibrationSections(stiff);
                    }
                    FloorRules r = rules;
                    return cache == null ? designFloor(f, r, searches) : cache.get(f.key(r), () -> designFloor(f, r, searches));
                })
                .toList();
        List<LevelDesign> levels = expanded.withDesigns(floors);
        ColumnLines columns = ColumnLines.design(plan, levels, basis.columnDesigner(), basis.columnRules());
        Foundations foundations = Foundations.of(columns);
        EquilibriumCheck equilibrium = EquilibriumCheck.of(levels, foundations, basis.liveLoad().partitionAsDead(), basis.units());
        TakedownResult t = Takedown.result(expanded, floors, columns, foundations, equilibrium);
        List<BayResult> bays = plan.floors().stream().anyMatch(Floor::hasSlab)
                ? BayChecks.of(plan, t, vibrationSettings(plan)) : List.of();
        return new Attempt(t, bays);
    }

    /** Stages 2 to 4 for one floor layout: tributary areas, support graph, members designed in order. */
    private static FloorDesign designFloor(FloorInput floor, FloorRules rules, Searches searches) {
        FloorAreas areas = FloorAreas.of(floor, rules.units());
        SupportGraph graph = SupportGraph.of(floor, rules.units());
        return FloorDesigner.design(floor, areas, graph, rules, searches);
    }

    /**
     * The floor-vibration settings a run of {@code plan} uses: the plan's ({@code settings.vibration} in its file;
     * offices, the usual fit-out and the use's vibration live load where it gives none).
     */
    public static VibrationSettings vibrationSettings(Plan plan) {
        return plan.settings().vibration();
    }

    /** Baywright's version from the jar manifest, or "development build". */
    public static String version() {
        String v = PlanRun.class.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }
}
