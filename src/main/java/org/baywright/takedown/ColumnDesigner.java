package org.baywright.takedown;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.MemberStatus;
import org.baywright.design.Steel;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadReduction;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/**
 * Sizes column lines: axial loads summed from the top level down, live load reduced by the cumulative
 * A_T of the floors supported (ASCE 7-16 §4.7.2; roof live by §4.8), flexural buckling by AISC 360-16
 * E3 with K = 1 and the storey height as unbraced length about both axes, one section per tier between
 * splices (every {@code spliceEvery} levels, counted from the foundation), each tier's own weight
 * included, shapes with slender elements excluded.
 */
final class ColumnDesigner {
    /** What one level delivers to its columns. */
    record LevelLoads(Map<String, double[]> loads, Map<String, Double> area, Map<String, double[]> l0, Floor floor) {
    }

    private static final int NC = Component.values().length;
    private final Plan plan;
    private final Catalog candidates;
    private final Steel steel;
    private final DesignMethod method;
    private final List<LevelLoads> levels;
    private final List<Problem> problems;

    ColumnDesigner(Plan plan, Catalog catalog, Steel steel, DesignMethod method, List<LevelLoads> levels,
            List<Problem> problems) {
        this.plan = plan;
        this.steel = steel;
        this.method = method;
        this.levels = levels;
        this.problems = problems;
        List<String> series = plan.settings().columnSeries();
        this.candidates = catalog.filter(s -> (series.isEmpty() || series.contains(s.series()))
                && !IShapeCompression.hasSlenderElement(s, steel.fy(), steel.e(), null));
    }

    /** Designs every column line; lines are independent, so they are designed in parallel. */
    List<ColumnResult> design() {
        record Designed(ColumnResult result, List<Problem> problems) {
        }
        List<Designed> all = plan.columns().parallelStream().map(c -> {
            List<Problem> found = new ArrayList<>();
            return new Designed(design(c, found), found);
        }).toList();
        for (Designed d : all) {
            problems.addAll(d.problems()); // in the plan's order of columns, whatever order they finished in
        }
        return all.stream().map(Designed::result).toList();
    }

    private ColumnResult design(Column c, List<Problem> problems) {
        List<Level> lv = plan.levels();
        int top = lv.size() - 1;
        if (c.topLevel() != null && !c.topLevel().isEmpty()) {
            for (int i = 0; i < lv.size(); i++) {
                if (lv.get(i).name().equals(c.topLevel())) {
                    top = i;
                }
            }
        }
        Floor ref = levels.isEmpty() || levels.get(0) == null ? null : levels.get(0).floor();
        Object[] pos = SlabEdges.column(plan, c, ref, Takedown.CANTILEVER_SLAB, Takedown.TOLERANCE);
        double kll = (Double) pos[0];
        // cumulative loads from the top down (without column self-weight)
        int n = top + 1;
        double[][] cum = new double[n][NC];
        double[] atFloor = new double[n];
        double[] atRoof = new double[n];
        int[] floors = new int[n];
        double[][] l0 = new double[n][NC];
        double[] run = new double[NC];
        double[] runL0 = new double[NC];
        double runFloorArea = 0;
        double runRoofArea = 0;
        int runFloors = 0;
        for (int i = top; i >= 0; i--) {
            LevelLoads ll = i < levels.size() ? levels.get(i) : null;
            if (ll != null) {
                double[] d = ll.loads().get(c.id());
                if (d != null) {
                    for (int k = 0; k < NC; k++) {
                        run[k] += d[k];
                    }
                    double a = ll.area().getOrDefault(c.id(), 0.0);
                    if (ll.floor().roof()) {
                        runRoofArea += a;
                    } else {
                        runFloorArea += a;
                        boolean live = false;
                        for (Component comp : Component.values()) {
                            live |= comp.isLive() && d[comp.ordinal()] != 0;
                        }
                        if (live) {
                            runFloors++;
                        }
                    }
                    double[] lz = ll.l0().get(c.id());
                    if (lz != null) {
                        for (int k = 0; k < NC; k++) {
                            runL0[k] = Math.max(runL0[k], lz[k]);
                        }
                    }
                }
            }
            cum[i] = run.clone();
            atFloor[i] = runFloorArea;
            atRoof[i] = runRoofArea;
            floors[i] = runFloors;
            l0[i] = runL0.clone();
        }
        // tiers from the foundation up, designed from the top down
        int every = Math.max(1, plan.settings().spliceEvery());
        List<int[]> tiers = new ArrayList<>();
        for (int b = 0; b < n; b += every) {
            tiers.add(new int[] {b, Math.min(n, b + every) - 1});
        }
        ColumnTier[] result = new ColumnTier[tiers.size()];
        double weightAbove = 0;
        for (int t = tiers.size() - 1; t >= 0; t--) {
            int lo = tiers.get(t)[0];
            int hi = tiers.get(t)[1];
            double length = 0;
            for (int i = lo; i <= hi; i++) {
                length += lv.get(i).storeyHeight();
            }
            List<String> rejected = new ArrayList<>();
            ColumnTier chosen = null;
            ColumnTier best = null;
            for (Section s : candidates.sections()) {
                ColumnTier tier = check(c, s, lo, hi, weightAbove, cum, atFloor, atRoof, floors, l0, kll, length, rejected);
                if (tier.maxRatio() <= 1.0 + 1e-9) {
                    chosen = tier;
                    break;
                }
                rejected.add(s.designation() + " " + String.format(Locale.ROOT, "%.2f", tier.maxRatio()));
                if (best == null || tier.maxRatio() < best.maxRatio()) {
                    best = tier;
                }
            }
            if (c.fixedSection().isPresent()) {
                Section s = candidates.find(c.fixedSection().get()).orElse(null);
                if (s != null) {
                    rejected.clear();
                    ColumnTier tier = check(c, s, lo, hi, weightAbove, cum, atFloor, atRoof, floors, l0, kll, length, rejected);
                    chosen = tier.maxRatio() <= 1.0 + 1e-9 ? withStatus(tier, MemberStatus.FIXED_SIZE) : null;
                    best = tier;
                } else {
                    problems.add(Problem.error("unknown-section", "column " + c.id(), c.id(), "column " + c.id() + ": section "
                            + c.fixedSection().get() + " is not among the allowed, non-slender column shapes; the tier was sized instead"));
                }
            }
            if (chosen == null) {
                // with no section at all the tier still carries its loads down (without its own weight),
                // so that the foundation reactions and the equilibrium check stay whole
                chosen = best == null ? withStatus(check(c, null, lo, hi, weightAbove, cum, atFloor, atRoof, floors, l0, kll,
                        length, rejected), MemberStatus.OVERSTRESSED) : withStatus(best, MemberStatus.OVERSTRESSED);
                problems.add(new Problem(Problem.Severity.ERROR, "overstressed", "column " + c.id(), c.id(),
                        "column " + c.id() + ", tier " + String.join("–", names(lo, hi)) + (best == null
                                ? ": no section is allowed for columns (the column series " + plan.settings().columnSeries()
                                        + " leave no non-slender shape of the catalog); choose other column series"
                                : ": no allowed column section passes; closest " + best.section() + " at ratio "
                                        + String.format(Locale.ROOT, "%.2f", best.maxRatio())), List.of(c.at())));
            }
            result[t] = chosen;
            weightAbove += chosen.weight() * length;
        }
        // foundation: the bottom storey
        StoreyLoad bottom = result.length == 0 || result[0].storeys().isEmpty() ? null : result[0].storeys().get(0);
        double[] found = bottom == null ? new double[LoadCase.values().length] : bottom.unreduced();
        double[] foundRed = bottom == null ? new double[LoadCase.values().length] : bottom.reduced();
        return new ColumnResult(c.id(), c.grid(), c.at(), kll, (String) pos[1], List.of(result), found, foundRed);
    }

    private static ColumnTier withStatus(ColumnTier t, MemberStatus s) {
        return new ColumnTier(t.levels(), t.section(), t.weight(), s, t.storeys(), t.length(), t.rejected());
    }

    private List<String> names(int lo, int hi) {
        List<String> out = new ArrayList<>();
        for (int i = lo; i <= hi; i++) {
            out.add(plan.levels().get(i).name());
        }
        return out;
    }

    /** The tier's storey loads and ratios with section {@code s}; with none (null), the loads alone (ratios NaN). */
    private ColumnTier check(Column c, Section s, int lo, int hi, double weightAbove, double[][] cum, double[] atFloor,
            double[] atRoof, int[] floors, double[][] l0, double kll, double length, List<String> rejected) {
        List<Level> lv = plan.levels();
        List<StoreyLoad> storeys = new ArrayList<>();
        double own = 0;
        for (int i = hi; i >= lo; i--) {
            double h = lv.get(i).storeyHeight();
            own += s == null ? 0 : s.weight() * h;
            double[] comp = cum[i].clone();
            comp[Component.D.ordinal()] += weightAbove + own;
            double[] unreduced = Component.byCase(comp);
            double[] reducedComp = comp.clone();
            boolean llr = plan.settings().liveLoadReduction();
            if (llr) {
                for (Component k : Component.values()) {
                    if (k.isLive() && comp[k.ordinal()] != 0) {
                        reducedComp[k.ordinal()] *= LiveLoadReduction.floor(Math.max(l0[i][k.ordinal()], 1e-9), kll, atFloor[i],
                                Math.max(1, floors[i]), k.reducibleUse(), null).factor();
                    }
                }
                if (comp[Component.LR.ordinal()] != 0) {
                    reducedComp[Component.LR.ordinal()] *= LiveLoadReduction.roof(Math.max(l0[i][Component.LR.ordinal()], 1e-9),
                            atRoof[i], 0, null).factor();
                }
            }
            double[] reduced = Component.byCase(reducedComp);
            Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
            for (LoadCase lc : LoadCase.values()) {
                if (reduced[lc.ordinal()] != 0) {
                    present.add(lc);
                }
            }
            double req = 0;
            String gov = "";
            for (LoadCombination combo : Combinations.gravity(method, present)) {
                double p = 0;
                for (LoadCase lc : LoadCase.values()) {
                    p += combo.factor(lc) * reduced[lc.ordinal()];
                }
                if (p > req || gov.isEmpty()) {
                    req = p;
                    gov = combo.name();
                }
            }
            double avail = Double.NaN;
            if (s != null) {
                IShapeCompression.Strength st = IShapeCompression.strength(s, steel.fy(), steel.e(), h, h, null);
                avail = method.available(st.pn(), ResistanceFactors.PHI_C, ResistanceFactors.OMEGA_C);
            }
            storeys.add(0, new StoreyLoad(lv.get(i).name(), h, unreduced, reduced, atFloor[i], atRoof[i], floors[i], req, avail,
                    req / avail, gov));
        }
        return s == null ? new ColumnTier(names(lo, hi), "", 0, MemberStatus.OVERSTRESSED, storeys, length, List.copyOf(rejected))
                : new ColumnTier(names(lo, hi), s.designation(), s.weight(), MemberStatus.SIZED, storeys, length,
                        List.copyOf(rejected));
    }

}
