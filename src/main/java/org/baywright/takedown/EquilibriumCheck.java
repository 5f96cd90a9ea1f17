package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.load.LoadCase;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.LineLoad;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Problem;

/**
 * The last stage: per load case, everything applied to the building (area, line and point loads on every
 * level, the own weight of all framing and columns) against the sum of the foundation reactions, to
 * {@link Equilibrium#TOLERANCE}. A difference is a located problem.
 *
 * @param cases one per load case
 * @param problems the load cases that do not balance
 */
public record EquilibriumCheck(List<Equilibrium> cases, List<Problem> problems) {
    public EquilibriumCheck {
        cases = List.copyOf(cases);
        problems = List.copyOf(problems);
    }

    /** Checks the levels' applied loads against the foundations; forces in problems are in {@code units}. */
    public static EquilibriumCheck of(List<LevelDesign> levels, Foundations foundations, boolean partitionAsDead,
            org.baywright.units.UnitSystem units) {
        double[] applied = new double[LoadCase.values().length];
        double[] slack = new double[LoadCase.values().length];
        for (LevelDesign lv : levels) {
            if (lv.design() != null) {
                applied(lv, partitionAsDead, applied, slack);
            }
        }
        for (ColumnResult c : foundations.columns()) {
            for (ColumnTier t : c.tiers()) {
                applied[LoadCase.D.ordinal()] += t.weight() * t.length();
            }
        }
        double[] reactions = foundations.total();
        List<Equilibrium> out = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        for (LoadCase lc : LoadCase.values()) {
            Equilibrium e = new Equilibrium(lc.symbol(), applied[lc.ordinal()], reactions[lc.ordinal()],
                    Math.abs(slack[lc.ordinal()]));
            out.add(e);
            if (!e.holds()) {
                problems.add(Problem.error("equilibrium", "load case " + lc.symbol(), "", String.format(Locale.ROOT,
                        "applied %s but the foundations carry %s (difference %.1f %%); see the"
                                + " other problems for load that does not reach a column",
                        units.forceText(e.applied()), units.forceText(e.reactions()), 100 * (e.reactions()
                                - e.applied()) / Math.max(Math.abs(e.applied()), Double.MIN_NORMAL))));
            }
        }
        return new EquilibriumCheck(out, problems);
    }

    /** Adds one level's applied loads, and the slack its line loads get from the geometry's grid. */
    private static void applied(LevelDesign lv, boolean partitionAsDead, double[] applied, double[] slack) {
        for (AreaLoad al : lv.floor().areaLoads()) {
            double area = lv.design().areaLoadAreas().getOrDefault(al.id(), 0.0);
            add(applied, ServiceLoads.split(al.values(), al.use(), partitionAsDead, null), area);
        }
        // the slabs the decks describe, carried as area loads over their decks
        for (java.util.Map.Entry<String, double[]> slab : SlabLoads.components(lv.floor()).entrySet()) {
            add(applied, slab.getValue(), lv.design().areaLoadAreas().getOrDefault(slab.getKey(), 0.0));
        }
        for (LineLoad ll : lv.floor().lineLoads()) {
            double len = 0;
            for (int k = 0; k + 1 < ll.path().size(); k++) {
                len += ll.path().get(k).distance(ll.path().get(k + 1));
            }
            double[] q = ServiceLoads.concentrated(ll.values(), partitionAsDead);
            add(applied, q, len);
            // the analysis works on the path snapped to its grid: each point may move by up to half a step
            // in x and in y, and pieces shorter than a step are not placed
            add(slack, q, 2 * Takedown.GRID * ll.path().size());
        }
        for (PointLoadItem p : lv.floor().pointLoads()) {
            add(applied, ServiceLoads.concentrated(p.values(), partitionAsDead), 1);
        }
        for (MemberResult m : lv.design().members()) {
            applied[LoadCase.D.ordinal()] += m.steelWeight();
        }
    }

    private static void add(double[] perCase, double[] components, double scale) {
        double[] byCase = Component.byCase(components);
        for (int k = 0; k < perCase.length; k++) {
            perCase[k] += byCase[k] * scale;
        }
    }
}
