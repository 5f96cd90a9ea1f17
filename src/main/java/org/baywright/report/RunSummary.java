package org.baywright.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.calc.Caution;
import org.baywright.design.BeamDesign;
import org.baywright.design.Check;
import org.baywright.design.CompositeDesign;
import org.baywright.design.aisc360.CompositeFlexureI3;
import org.baywright.design.MemberStatus;
import org.baywright.load.LoadCase;
import org.baywright.plan.Level;
import org.baywright.plan.Problem;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.CompositeResult;
import org.baywright.takedown.Equilibrium;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.StoreyLoad;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * The run result as a plain tree (maps and lists) for JSON output, in a unit system, and as a short
 * text summary. The JSON layout is documented in {@code docs/design-output.md}.
 */
public final class RunSummary {
    private RunSummary() {
    }

    /** Counts of members (and column tiers) by status. */
    public static Map<MemberStatus, Integer> statusCounts(TakedownResult t) {
        Map<MemberStatus, Integer> m = new LinkedHashMap<>();
        for (MemberStatus s : MemberStatus.values()) {
            m.put(s, 0);
        }
        for (String floor : t.levelFloors().values()) {
            for (MemberResult r : t.members().getOrDefault(floor, List.of())) {
                m.merge(r.status(), 1, Integer::sum);
            }
        }
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                m.merge(tier.status(), 1, Integer::sum);
            }
        }
        return m;
    }

    /** Highest ratio over every member and column tier. */
    public static double maxRatio(TakedownResult t) {
        double r = 0;
        for (List<MemberResult> ms : t.members().values()) {
            for (MemberResult m : ms) {
                if (!Double.isNaN(m.maxRatio())) {
                    r = Math.max(r, m.maxRatio());
                }
            }
        }
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                if (!Double.isNaN(tier.maxRatio())) {
                    r = Math.max(r, tier.maxRatio());
                }
            }
        }
        return r;
    }

    /** Weight N as the trade states totals: lb (US) or kg (SI). */
    static double weight(double newtons, UnitSystem us) {
        return us == UnitSystem.US ? newtons / Units.NEWTONS_PER_POUND : newtons / Units.STANDARD_GRAVITY;
    }

    static String weightUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb" : "kg";
    }

    static String weightPerAreaUnit(UnitSystem us) {
        return us == UnitSystem.US ? "lb/ft²" : "kg/m²";
    }

    private static Map<String, Object> perCase(double[] byCase, UnitSystem us) {
        Map<String, Object> o = new LinkedHashMap<>();
        for (LoadCase lc : LoadCase.values()) {
            o.put(lc.symbol(), us.force().fromSi(byCase[lc.ordinal()]));
        }
        return o;
    }

    /**
     * A JSON object with its keys in the order given ({@code Map.of} has none, so the output would change
     * from run to run): {@code ordered("a", 1, "b", 2)}.
     */
    public static Map<String, Object> ordered(Object... keysAndValues) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i + 1 < keysAndValues.length; i += 2) {
            m.put((String) keysAndValues[i], keysAndValues[i + 1]);
        }
        return m;
    }

    /** The full result as a tree. */
    public static Map<String, Object> json(RunResult run, UnitSystem us) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("format", "baywright-run");
        o.put("version", 1);
        o.put("plan", run.plan().name());
        o.put("program", "Baywright " + run.version());
        o.put("catalog", run.catalogName());
        o.put("method", run.basis().method().name().toLowerCase(Locale.ROOT));
        o.put("units", ordered("system", us.name().toLowerCase(Locale.ROOT), "length", us.length().symbol(),
                "force", us.force().symbol(), "area", us.floorArea().symbol(), "weightPerLength", us.weightPerLength().symbol(),
                "weight", weightUnit(us), "weightPerArea", weightPerAreaUnit(us), "moment", us.moment().symbol(),
                "deflection", us.smallLength().symbol()));
        TakedownResult t = run.takedown();
        boolean composite = hasComposite(t);
        if (composite) {
            // only runs with composite members carry it, so older outputs stay byte for byte the same
            @SuppressWarnings("unchecked")
            Map<String, Object> units = (Map<String, Object>) o.get("units");
            units.put("inertia", us.inertia().symbol());
        }
        List<Object> members = new ArrayList<>();
        List<Object> columns = new ArrayList<>();
        List<Object> foundations = new ArrayList<>();
        List<Object> equilibrium = new ArrayList<>();
        if (t != null) {
            for (Level lv : run.plan().levels()) {
                String key = t.levelFloors().get(lv.name());
                for (MemberResult m : t.members().getOrDefault(key, List.of())) {
                    members.add(member(m, lv.name(), us));
                }
            }
            for (ColumnResult c : t.columns()) {
                columns.add(column(c, us));
                Map<String, Object> f = new LinkedHashMap<>();
                f.put("column", c.id());
                f.put("grid", c.grid());
                f.put("reactions", perCase(c.foundation(), us));
                f.put("reactionsLiveReduced", perCase(c.foundationReduced(), us));
                foundations.add(f);
            }
            for (Equilibrium e : t.equilibrium()) {
                Map<String, Object> q = new LinkedHashMap<>();
                q.put("case", e.loadCase());
                q.put("applied", us.force().fromSi(e.applied()));
                q.put("reactions", us.force().fromSi(e.reactions()));
                q.put("holds", e.holds());
                equilibrium.add(q);
            }
        }
        o.put("members", members);
        o.put("columns", columns);
        o.put("foundations", foundations);
        Map<String, Object> totals = new LinkedHashMap<>();
        if (t != null) {
            double w = t.steelWeight();
            totals.put("steelWeight", weight(w, us));
            totals.put("floorArea", us.floorArea().fromSi(t.floorArea()));
            totals.put("weightPerArea", t.floorArea() > 0 ? weight(w, us) / us.floorArea().fromSi(t.floorArea()) : null);
            totals.put("maxRatio", maxRatio(t));
            if (composite) {
                CompositeTotals c = CompositeTotals.of(t);
                totals.put("studs", c.studs());
                totals.put("camberedPieces", c.cambered());
                totals.put("compositeMembers", c.members());
                totals.put("steelWeightNonComposite", weight(c.nonCompositeWeight(), us));
            }
            Map<String, Object> counts = new LinkedHashMap<>();
            statusCounts(t).forEach((k, v) -> counts.put(k.label(), v));
            totals.put("byStatus", counts);
        }
        o.put("totals", totals);
        o.put("equilibrium", equilibrium);
        List<Object> problems = new ArrayList<>();
        for (Problem p : run.problems()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("severity", p.severity().name().toLowerCase(Locale.ROOT));
            j.put("kind", p.kind());
            j.put("location", p.location());
            j.put("id", p.objectId());
            j.put("message", p.message());
            problems.add(j);
        }
        o.put("problems", problems);
        if (BaySummary.present(run)) {
            o.put("bays", BaySummary.json(run, us)); // only when a floor describes a slab: older outputs unchanged
            if (!run.sizedForVibration().isEmpty()) {
                o.put("sizedForVibration", BaySummary.changes(run));
            }
        }
        o.put("caution", Caution.TEXT);
        return o;
    }

    private static Map<String, Object> member(MemberResult m, String level, UnitSystem us) {
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("id", m.id());
        j.put("kind", m.kind().name().toLowerCase(Locale.ROOT));
        j.put("level", level);
        j.put("floor", m.floor());
        j.put("length", us.length().fromSi(m.length()));
        j.put("section", m.section().isEmpty() ? null : m.section());
        j.put("status", m.status().label());
        j.put("weight", m.design() == null || m.design().section() == null ? null
                : us.weightPerLength(m.design().section().weight()));
        j.put("tributaryArea", us.floorArea().fromSi(m.tributaryArea()));
        j.put("reductionArea", us.floorArea().fromSi(m.reductionArea()));
        j.put("kll", m.kll());
        j.put("liveReductionFactor", m.liveFactor());
        j.put("roofLiveReductionFactor", m.roofLiveFactor());
        Map<String, Object> ratios = new LinkedHashMap<>();
        if (m.design() != null) {
            for (Check c : m.design().checks()) {
                ratios.put(c.name(), c.ratio());
            }
        }
        j.put("ratios", ratios);
        Map<String, Object> reactions = new LinkedHashMap<>();
        reactions.put("start", perCase(org.baywright.takedown.Component.byCase(m.startReaction()), us));
        reactions.put("end", perCase(org.baywright.takedown.Component.byCase(m.endReaction()), us));
        j.put("reactions", reactions);
        j.put("supports", List.of(m.startSupport(), m.endSupport()));
        if (m.isComposite()) {
            j.put("composite", composite(m, us));
        }
        return j;
    }

    /** True when any member of the run acts compositely with its slab. */
    public static boolean hasComposite(TakedownResult t) {
        if (t == null) {
            return false;
        }
        for (List<MemberResult> ms : t.members().values()) {
            for (MemberResult m : ms) {
                if (m.isComposite()) {
                    return true;
                }
            }
        }
        return false;
    }

    /** The PNA's place as the JSON and the sheets name it: "slab", "top flange" or "web". */
    public static String pnaName(CompositeFlexureI3.Pna p) {
        return switch (p) {
            case SLAB -> "slab";
            case TOP_FLANGE -> "top flange";
            case WEB -> "web";
        };
    }

    /**
     * A composite member's {@code composite} object: widths, camber and b_eff in the {@code deflection}
     * unit (in, mm), forces in the force unit, I_LB in the inertia unit, weights per length as the member's.
     */
    static Map<String, Object> composite(MemberResult m, UnitSystem us) {
        CompositeResult cr = m.composite();
        CompositeDesign d = cr.design();
        Map<String, Object> c = new LinkedHashMap<>();
        boolean designed = d.section() != null;
        c.put("beff", us.smallLength().fromSi(d.beff()));
        c.put("beffLeft", us.smallLength().fromSi(d.beffLeft()));
        c.put("beffRight", us.smallLength().fromSi(d.beffRight()));
        c.put("qn", us.force().fromSi(d.qn()));
        c.put("sumQn", designed ? us.force().fromSi(d.sumQn()) : null);
        c.put("studs", cr.studs());
        c.put("studsPerHalf", designed ? d.studsPerHalf() : 0);
        c.put("degree", designed && d.flexure() != null ? d.flexure().degree() : null);
        c.put("pna", designed && d.flexure() != null ? pnaName(d.flexure().pna()) : null);
        c.put("ILB", designed ? us.inertia().fromSi(d.ilb()) : null);
        c.put("camber", us.smallLength().fromSi(cr.camber()));
        c.put("constructionRatio", designed ? d.constructionRatio() : null);
        c.put("ribs", cr.ribs());
        c.put("shored", cr.shored());
        c.put("deck", cr.deck());
        BeamDesign bare = cr.bare();
        boolean bareDesigned = bare != null && bare.section() != null;
        c.put("bareSection", bareDesigned ? bare.section().designation() : null);
        c.put("bareWeight", bareDesigned ? us.weightPerLength(bare.section().weight()) : null);
        return c;
    }

    private static Map<String, Object> column(ColumnResult c, UnitSystem us) {
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("id", c.id());
        j.put("grid", c.grid());
        j.put("position", c.position());
        j.put("kll", c.kll());
        List<Object> tiers = new ArrayList<>();
        for (ColumnTier t : c.tiers()) {
            Map<String, Object> tj = new LinkedHashMap<>();
            tj.put("levels", t.levels());
            tj.put("section", t.section().isEmpty() ? null : t.section());
            tj.put("status", t.status().label());
            tj.put("weight", us.weightPerLength(t.weight()));
            tj.put("length", us.length().fromSi(t.length()));
            List<Object> storeys = new ArrayList<>();
            for (StoreyLoad s : t.storeys()) {
                Map<String, Object> sj = new LinkedHashMap<>();
                sj.put("level", s.level());
                sj.put("axial", perCase(s.unreduced(), us));
                sj.put("axialLiveReduced", perCase(s.reduced(), us));
                sj.put("reductionArea", us.floorArea().fromSi(s.reductionArea()));
                sj.put("roofArea", us.floorArea().fromSi(s.roofArea()));
                sj.put("floorsSupported", s.floorsSupported());
                sj.put("required", us.force().fromSi(s.required()));
                sj.put("available", us.force().fromSi(s.available()));
                sj.put("ratio", s.ratio());
                sj.put("combination", s.combination());
                org.baywright.design.ColumnDesigner.Interaction in = s.interaction();
                if (in != null) {
                    Map<String, Object> ij = new LinkedHashMap<>();
                    ij.put("ratio", in.ratio());
                    ij.put("combination", in.combination());
                    ij.put("pattern", in.pattern());
                    ij.put("webAlong", in.webAlongX() ? "x" : "y");
                    ij.put("required", us.force().fromSi(in.pr()));
                    ij.put("available", us.force().fromSi(in.pc()));
                    ij.put("mrx", us.moment().fromSi(in.mrx()));
                    ij.put("mry", us.moment().fromSi(in.mry()));
                    ij.put("mcx", us.moment().fromSi(in.mcx()));
                    ij.put("mcy", us.moment().fromSi(in.mcy()));
                    ij.put("b1x", in.b1x());
                    ij.put("b1y", in.b1y());
                    sj.put("interaction", ij);
                }
                storeys.add(sj);
            }
            tj.put("storeys", storeys);
            tj.put("interactionRatio", t.storeys().stream().filter(s -> s.interaction() != null)
                    .mapToDouble(s -> s.interaction().ratio()).max().orElse(Double.NaN));
            tiers.add(tj);
        }
        j.put("tiers", tiers);
        return j;
    }

    /** A short text summary for the terminal. */
    public static String text(RunResult run, UnitSystem us) {
        StringBuilder b = new StringBuilder();
        TakedownResult t = run.takedown();
        b.append("Baywright design: ").append(run.plan().name()).append(" (").append(run.plan().levels().size())
                .append(" levels, ").append(run.basis().method().name()).append(", ")
                .append(run.catalogName()).append(")\n");
        if (t != null) {
            Map<MemberStatus, Integer> counts = statusCounts(t);
            b.append("Members and column tiers: ");
            List<String> parts = new ArrayList<>();
            counts.forEach((k, v) -> {
                if (v > 0) {
                    parts.add(v + " " + k.label());
                }
            });
            b.append(String.join(", ", parts)).append('\n');
            double w = t.steelWeight();
            b.append(String.format(Locale.ROOT, "Steel weight: %,.0f %s (%s); floor area %,.0f %s; %.2f %s; highest ratio %.3f%n",
                    weight(w, us), weightUnit(us), us == UnitSystem.US
                            ? String.format(Locale.ROOT, "%.1f short tons", weight(w, us) / 2000)
                            : String.format(Locale.ROOT, "%.1f tonnes", weight(w, us) / 1000),
                    us.floorArea().fromSi(t.floorArea()), us.floorArea().symbol(),
                    t.floorArea() > 0 ? weight(w, us) / us.floorArea().fromSi(t.floorArea()) : 0, weightPerAreaUnit(us),
                    maxRatio(t)));
            if (hasComposite(t)) {
                CompositeTotals c = CompositeTotals.of(t);
                b.append(String.format(Locale.ROOT, "Composite: %d members, %,d headed studs, %d pieces cambered; without composite"
                        + " action the steel would weigh %,.0f %s%n", c.members(), c.studs(), c.cambered(),
                        weight(c.nonCompositeWeight(), us), weightUnit(us)));
            }
            b.append(String.format(Locale.ROOT, "Run time: %.0f ms%n", run.milliseconds()));
            b.append("Equilibrium:");
            for (Equilibrium e : t.equilibrium()) {
                b.append(String.format(Locale.ROOT, " %s %s", e.loadCase(), e.holds() ? "ok" : "FAILS"));
            }
            b.append('\n');
            if (BaySummary.present(run)) {
                b.append(BaySummary.line(run)).append('\n');
                for (String line : BaySummary.changeLines(run)) {
                    b.append(line).append('\n');
                }
            }
        }
        List<Problem> problems = run.problems();
        b.append(problems.isEmpty() ? "No problems.\n" : "Problems (" + problems.size() + "):\n");
        for (Problem p : problems) {
            b.append("  ").append(p).append('\n');
        }
        b.append(Caution.TEXT).append('\n');
        return b.toString();
    }
}
