package org.baywright.study;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.baywright.catalog.Catalog;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.Plan;

/**
 * Finds the best layouts of a base plan for an objective within a structural depth limit, searching
 * the beam spacing over a range and both beam directions.
 *
 * <p>The search is exhaustive but runs each distinct layout once: a maximum spacing only matters
 * through the number of beams it gives in each bay, so spacings that give the same beam counts in
 * every bay give the same plan and the same run. The depth limit is set as the plan's maximum beam
 * depth (members are sized within it) and a layout whose structural depth exceeds it is refused.
 */
public final class Optimiser {
    private Optimiser() {
    }

    /**
     * The outcome.
     *
     * @param best the best layouts, best first; each reported with the largest spacing that gives it
     * @param candidates spacing × direction combinations searched
     * @param runs distinct layouts run
     * @param cancelled true when cancelled before the search finished
     */
    public record Optimum(List<VariantResult> best, int candidates, int runs, boolean cancelled) {
        public Optimum {
            best = List.copyOf(best);
        }
    }

    /** The beam spacings of a range from {@code from} to {@code to} by {@code step} (both ends included when hit). */
    public static List<Double> range(double from, double to, double step) {
        if (!(step > 0) || !(to >= from)) {
            throw new IllegalArgumentException("a range needs a step greater than zero and an end not below its start");
        }
        long n = SearchLimits.count(from, to, step);
        if (n > 100_000) {
            throw new IllegalArgumentException("a range of " + n + " values is too long");
        }
        List<Double> out = new ArrayList<>();
        for (long i = 0; i < n; i++) {
            out.add(from + i * step);
        }
        return out;
    }

    /**
     * The best {@code n} layouts.
     *
     * @param depthLimit structural depth limit, m (0 = none)
     * @param spacings the beam spacings to try, m
     */
    public static Optimum optimise(Plan base, double depthLimit, Objective objective, List<Double> spacings, int n,
            Catalog catalog, int parallelism, ProgressListener listener, CancelToken cancel) {
        Plan limited = Variations.maxDepth(base, Math.max(0, depthLimit));
        List<Setting> spacingValues = spacings.stream().map(s -> Setting.beamSpacing(s, null)).toList();
        List<Setting> directions = List.of(Setting.beamDirection(GridLine.Axis.X), Setting.beamDirection(GridLine.Axis.Y));
        StudySpec all = new StudySpec(limited, List.of(new Sweep(Parameter.BEAM_DIRECTION, directions),
                new Sweep(Parameter.BEAM_SPACING, spacingValues)));
        // group the candidates by layout; keep the last (largest spacing when ascending) as the representative
        Map<Plan, Integer> representative = new LinkedHashMap<>();
        for (int i = 0; i < all.count(); i++) {
            representative.put(layout(all.plan(i)), i);
        }
        List<Integer> chosen = new ArrayList<>(representative.values());
        org.baywright.takedown.FloorCache reuse = new org.baywright.takedown.FloorCache(catalog);
        StudyResult r = Parallel.run(chosen.size(), k -> Study.runOne(all, chosen.get(k), catalog, reuse), parallelism,
                listener, cancel);
        List<VariantResult> best = r.best(objective, depthLimit, n);
        return new Optimum(best, (int) all.count(), r.variants().size(), r.cancelled());
    }

    /** The plan with every infill given by its beam count: equal for spacings that frame alike. */
    static Plan layout(Plan plan) {
        List<Floor> floors = new ArrayList<>();
        for (Floor fl : plan.floors()) {
            List<Infill> infills = new ArrayList<>();
            for (Infill inf : fl.infills()) {
                if (inf.count() > 0) {
                    infills.add(new Infill(inf.id(), inf.x0(), inf.x1(), inf.y0(), inf.y1(), inf.direction(), inf.count(), 0));
                    continue;
                }
                Optional<Double> w = width(plan, inf);
                int c = w.map(x -> Framing.beamCount(inf, x)).orElse(-1);
                infills.add(c > 0 ? new Infill(inf.id(), inf.x0(), inf.x1(), inf.y0(), inf.y1(), inf.direction(), c, 0)
                        : c == 0 ? new Infill(inf.id(), inf.x0(), inf.x1(), inf.y0(), inf.y1(), inf.direction(), 0,
                                Double.POSITIVE_INFINITY) : inf);
            }
            floors.add(new Floor(fl.id(), fl.name(), fl.roof(), fl.slabEdge(), fl.decks(), fl.members(), infills, fl.openings(),
                    fl.areaLoads(), fl.lineLoads(), fl.pointLoads(), fl.composite()));
        }
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(), plan.notes());
    }

    private static Optional<Double> width(Plan plan, Infill inf) {
        boolean alongX = inf.direction() == GridLine.Axis.X;
        Optional<GridLine> a = plan.gridLine(alongX ? inf.y0() : inf.x0());
        Optional<GridLine> b = plan.gridLine(alongX ? inf.y1() : inf.x1());
        if (a.isEmpty() || b.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(Math.abs(b.get().offset() - a.get().offset()));
    }

    static Comparator<VariantResult> order(Objective o) {
        return Comparator.comparingDouble(o::score).thenComparingInt(VariantResult::index);
    }
}
