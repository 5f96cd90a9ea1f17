package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.design.ColumnDesigner;
import org.baywright.design.ColumnDesigner.Face;
import org.baywright.design.ColumnDesigner.FaceReaction;
import org.baywright.design.ColumnDesigner.Joint;
import org.baywright.design.ColumnDesigner.StoreyCheck;
import org.baywright.design.ColumnDesigner.StoreyDemand;
import org.baywright.design.ColumnDesigner.TierDemand;
import org.baywright.design.ColumnDesigner.TierDesign;
import org.baywright.design.MemberStatus;
import org.baywright.load.LiveLoadReduction;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.takedown.SlabEdges.ColumnPosition;

/**
 * The fifth stage: the column lines. Axial loads are summed from the top level down, live load reduced by
 * the cumulative A_T of the floors supported (ASCE 7-16 §4.7.2; roof live by §4.8), and each tier
 * between splices (every {@code spliceEvery} levels, counted from the foundation) sized by {@link
 * ColumnDesigner} for the axial load and the moments of the reactions' connection eccentricities (AISC 360-16
 * H1.1 with B1): each member's reaction at each level is handed over with the face of the column it meets.
 *
 * @param lines in the plan's order of columns
 * @param problems in the same order: fixed sections not allowed, tiers no section passes
 */
public record ColumnLines(List<Line> lines, List<Problem> problems) {
    private static final int NC = Component.values().length;

    /** One column line, bottom tier first. */
    public record Line(Column column, ColumnPosition position, List<ColumnTier> tiers) {
    }

    /**
     * How column lines are made.
     *
     * @param spliceEvery a splice every this many levels
     * @param reduce apply live-load reduction
     * @param series the column series allowed (for the message when none is left)
     */
    public record Rules(int spliceEvery, boolean reduce, List<String> series) {
    }

    /** What one storey carries from the floors above, before any column's own weight. */
    private record Carried(double[] loads, double floorArea, double roofArea, int floors, double[] l0) {
    }

    public ColumnLines {
        lines = List.copyOf(lines);
        problems = List.copyOf(problems);
    }

    /** Designs every column line of the plan; lines are independent, so they are designed in parallel. */
    public static ColumnLines design(Plan plan, List<LevelDesign> levels, ColumnDesigner designer, Rules rules) {
        record Designed(Line line, List<Problem> problems) {
        }
        List<Designed> all = plan.columns().parallelStream().map(c -> {
            List<Problem> found = new ArrayList<>();
            return new Designed(line(plan, c, levels, designer, rules, found), found);
        }).toList();
        List<Problem> problems = new ArrayList<>();
        for (Designed d : all) {
            problems.addAll(d.problems()); // in the plan's order of columns, whatever order they finished in
        }
        return new ColumnLines(all.stream().map(Designed::line).toList(), problems);
    }

    private static Line line(Plan plan, Column c, List<LevelDesign> levels, ColumnDesigner designer, Rules rules,
            List<Problem> problems) {
        List<Level> lv = plan.levels();
        int top = lv.size() - 1;
        if (c.topLevel() != null && !c.topLevel().isEmpty()) {
            for (int i = 0; i < lv.size(); i++) {
                if (lv.get(i).name().equals(c.topLevel())) {
                    top = i;
                }
            }
        }
        Floor ref = levels.isEmpty() ? null : levels.get(0).floor();
        ColumnPosition pos = SlabEdges.column(plan, c, ref, Takedown.CANTILEVER_SLAB, Takedown.TOLERANCE);
        List<Carried> carried = carried(c, levels, top + 1);
        List<List<FaceReaction>> reactions = reactions(c, levels, top + 1);
        int every = Math.max(1, rules.spliceEvery());
        List<TierDemand> demands = new ArrayList<>();
        for (int b = 0; b <= top; b += every) {
            List<StoreyDemand> storeys = new ArrayList<>();
            for (int i = b; i <= Math.min(top, b + every - 1); i++) {
                Joint upper = new Joint(lv.get(i).name(), reactions.get(i), i < top ? lv.get(i + 1).storeyHeight() : 0);
                Joint lower = i == 0 ? Joint.NONE : new Joint(lv.get(i - 1).name(), reactions.get(i - 1), lv.get(i - 1).storeyHeight());
                storeys.add(demand(lv.get(i), carried.get(i), pos.kll(), rules.reduce(), upper, lower));
            }
            demands.add(new TierDemand(storeys));
        }
        List<TierDesign> designed = designer.design(demands, c.fixedSection(), ColumnDesigner.webAlongX(demands));
        List<ColumnTier> tiers = new ArrayList<>();
        for (int t = 0; t < designed.size(); t++) {
            tiers.add(tier(demands.get(t), designed.get(t), carried, t * every));
        }
        for (int t = tiers.size() - 1; t >= 0; t--) {
            report(c, tiers.get(t), designer, rules, problems);
        }
        return new Line(c, pos, List.copyOf(tiers));
    }

    /** The loads each storey carries from the top level down (without column self-weight), storey by storey from the bottom. */
    private static List<Carried> carried(Column c, List<LevelDesign> levels, int n) {
        Carried[] out = new Carried[n];
        double[] run = new double[NC];
        double[] runL0 = new double[NC];
        double floorArea = 0;
        double roofArea = 0;
        int floors = 0;
        for (int i = n - 1; i >= 0; i--) {
            FloorDesign fd = i < levels.size() ? levels.get(i).design() : null;
            double[] d = fd == null ? null : fd.columnLoads().get(c.id());
            if (d != null) {
                for (int k = 0; k < NC; k++) {
                    run[k] += d[k];
                }
                double a = fd.columnArea().getOrDefault(c.id(), 0.0);
                boolean live = false;
                for (Component comp : Component.values()) {
                    live |= comp.isLive() && comp != Component.L_CONCENTRATED && d[comp.ordinal()] != 0;
                }
                // a roof carrying occupancy live load L over an area (assembly, garden…) is reduced as a floor (ASCE 7-16
                // §4.8.3): its area counts in the §4.7 A_T and it counts as a floor supported. Its area is then
                // not in the roof A_T, so roof live load beside it is reduced by a smaller R1 (conservative).
                if (levels.get(i).floor().roof() && !live) {
                    roofArea += a;
                } else {
                    floorArea += a;
                    if (live) {
                        floors++;
                    }
                }
                double[] lz = fd.columnL0().get(c.id());
                if (lz != null) {
                    for (int k = 0; k < NC; k++) {
                        runL0[k] = Math.max(runL0[k], lz[k]);
                    }
                }
            }
            out[i] = new Carried(run.clone(), floorArea, roofArea, floors, runL0.clone());
        }
        return List.of(out);
    }

    /**
     * The reactions the members deliver to the column at each level (by load case, unreduced), with the face
     * each meets, bottom level first.
     */
    private static List<List<FaceReaction>> reactions(Column c, List<LevelDesign> levels, int n) {
        List<List<FaceReaction>> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            FloorDesign fd = i < levels.size() ? levels.get(i).design() : null;
            List<FloorDesign.ColumnReaction> rs = fd == null ? null : fd.columnReactions().get(c.id());
            List<FaceReaction> at = new ArrayList<>();
            if (rs != null) {
                for (FloorDesign.ColumnReaction r : rs) {
                    at.add(new FaceReaction(r.member(), Face.of(r.dx(), r.dy()), Component.byCase(r.loads())));
                }
            }
            out.add(List.copyOf(at));
        }
        return out;
    }

    /** A storey's demand by load case, unreduced and with live load reduced by the cumulative A_T. */
    private static StoreyDemand demand(Level level, Carried s, double kll, boolean reduce, Joint top, Joint bottom) {
        double[] comp = s.loads();
        double[] reduced = comp.clone();
        if (reduce) {
            for (Component k : Component.values()) {
                if (k.isLive() && comp[k.ordinal()] != 0) {
                    reduced[k.ordinal()] *= LiveLoadReduction.floor(Math.max(s.l0()[k.ordinal()], 1e-9), kll, s.floorArea(),
                            Math.max(1, s.floors()), k.reducibleUse(), null).factor();
                }
            }
            if (comp[Component.LR.ordinal()] != 0) {
                reduced[Component.LR.ordinal()] *= LiveLoadReduction.roof(Math.max(s.l0()[Component.LR.ordinal()], 1e-9),
                        s.roofArea(), 0, null).factor();
            }
        }
        return new StoreyDemand(level.name(), level.storeyHeight(), Component.byCase(comp), Component.byCase(reduced), top,
                bottom);
    }

    /** A tier as the result shows it; {@code lo} is the index of its bottom level. */
    private static ColumnTier tier(TierDemand demand, TierDesign d, List<Carried> carried, int lo) {
        List<StoreyLoad> storeys = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int k = 0; k < d.storeys().size(); k++) {
            StoreyDemand sd = demand.storeys().get(k);
            StoreyCheck sc = d.storeys().get(k);
            Carried c = carried.get(lo + k);
            names.add(sd.level());
            storeys.add(new StoreyLoad(sd.level(), sd.height(), sc.unreduced(), sc.reduced(), c.floorArea(), c.roofArea(),
                    c.floors(), sc.required(), sc.available(), sc.ratio(), sc.combination(), sc.interaction()));
        }
        return new ColumnTier(List.copyOf(names), d.section() == null ? "" : d.section().designation(), d.weight(), d.status(),
                storeys, d.length(), d.rejected());
    }

    /** The problems of one tier: a fixed section that is not allowed, no section that passes. */
    private static void report(Column c, ColumnTier tier, ColumnDesigner designer, Rules rules, List<Problem> problems) {
        if (c.fixedSection().isPresent() && !designer.allows(c.fixedSection().get())) {
            problems.add(Problem.error("unknown-section", "column " + c.id(), c.id(), "column " + c.id() + ": section "
                    + c.fixedSection().get() + " is not among the allowed, non-slender column shapes; the tier was sized instead"));
        }
        if (tier.status() == MemberStatus.OVERSTRESSED) {
            problems.add(new Problem(Problem.Severity.ERROR, "overstressed", "column " + c.id(), c.id(),
                    "column " + c.id() + ", tier " + String.join("–", tier.levels()) + (tier.section().isEmpty()
                            ? ": no section is allowed for columns (the column series " + rules.series()
                                    + " leave no non-slender shape of the catalog); choose other column series"
                            : ": no allowed column section passes; closest " + tier.section() + " at ratio "
                                    + String.format(Locale.ROOT, "%.2f", tier.maxRatio())), List.of(c.at())));
        }
    }
}
