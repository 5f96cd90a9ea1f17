package org.baywright.takedown;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Section;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamLoads;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.CompositeMember;
import org.baywright.design.MemberStatus;
import org.baywright.design.SearchFilter;
import org.baywright.geometry.FloorTributary;
import org.baywright.geometry.MemberTributary;
import org.baywright.geometry.TributaryAnalysis;
import org.baywright.load.LoadCase;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Problem;
import org.baywright.takedown.MemberLoads.Incoming;
import org.baywright.takedown.SupportGraph.Ends;
import org.baywright.takedown.SupportGraph.Support;

/**
 * The fourth stage, per floor layout: every member designed in the order of its {@link SupportGraph},
 * its reactions passed on unreduced to the member or column that supports it. For each member in turn:
 * its loads ({@link MemberLoads}), its live-load reduction ({@link MemberReduction}), its bracing, the
 * lightest-section search or the check of its fixed size ({@link Searches}), and its reactions.
 */
public final class FloorDesigner {
    private static final int NC = Component.values().length;

    /**
     * What a member hands on with its reactions: the largest live intensities it received, and the deck
     * area whose load it carries with the part of it that goes to its start end.
     */
    private record Handoff(double[] l0, double startShare, double delivered) {
        static final Handoff NONE = new Handoff(new double[NC], 0.5, 0);
    }

    /** A member as designed and what it hands on. */
    private record Designed(MemberResult result, Handoff handoff) {
    }

    private final FloorInput in;
    private final Floor floor;
    private final FloorTributary trib;
    /** The components of the slab area loads, by id ({@link SlabLoads}). */
    private final Map<String, double[]> slabs;
    private final FloorRules rules;
    private final Searches searches;
    private final Map<String, List<Incoming>> incoming = new HashMap<>();
    /** Upward reactions on a member, not designed for but passed through to its supports: {position, N per component}. */
    private final Map<String, List<double[]>> uplifts = new HashMap<>();
    private final Map<String, double[]> columnLoads = new LinkedHashMap<>();
    private final Map<String, Double> columnArea = new LinkedHashMap<>();
    private final Map<String, double[]> columnL0 = new LinkedHashMap<>();
    private final Map<String, List<FloorDesign.ColumnReaction>> columnReactions = new LinkedHashMap<>();
    private final List<Problem> problems = new ArrayList<>();
    private FloorTributary halfBay;

    private FloorDesigner(FloorInput in, FloorTributary trib, FloorRules rules, Searches searches) {
        this.in = in;
        this.floor = in.designFloor();
        this.slabs = SlabLoads.components(in.floor());
        this.trib = trib;
        this.rules = rules;
        this.searches = searches;
    }

    /**
     * Designs a layout's members in order.
     *
     * @param areas the layout's tributary areas (stage 2)
     * @param graph its support graph (stage 3)
     * @param searches the run's searches, shared by its floors
     */
    public static FloorDesign design(FloorInput in, FloorAreas areas, SupportGraph graph, FloorRules rules, Searches searches) {
        FloorDesigner d = new FloorDesigner(in, areas.tributary(), rules, searches);
        d.problems.addAll(in.leftOut());
        d.problems.addAll(areas.problems());
        d.problems.addAll(graph.problems());
        d.problems.addAll(OccupancyLoads.check(in.floor(), rules.units()));
        Map<String, Member> byId = in.byId();
        Map<String, MemberResult> results = new LinkedHashMap<>();
        for (String id : graph.inLoop()) {
            results.put(id, d.notDesigned(byId.get(id), graph.ends().get(id)));
        }
        for (String id : graph.order()) {
            Ends ends = graph.ends().get(id);
            Designed m = d.member(byId.get(id), ends);
            results.put(id, m.result());
            d.passOn(m, ends);
        }
        return new FloorDesign(List.copyOf(results.values()), Collections.unmodifiableMap(d.columnLoads),
                Collections.unmodifiableMap(d.columnArea), Collections.unmodifiableMap(d.columnL0), d.trib.loadedArea(),
                d.trib.areaLoadAreas(), List.copyOf(d.problems), Collections.unmodifiableMap(d.columnReactions));
    }

    /** Designs one member whose framing members are all designed. */
    private Designed member(Member m, Ends ends) {
        if (!ends.supported()) {
            return new Designed(notDesigned(m, ends), Handoff.NONE);
        }
        if (ends.overhangs()) {
            return overhanging(m, ends);
        }
        double span = m.length();
        MemberLoads loads = MemberLoads.of(m, floor, trib, incoming.getOrDefault(m.id(), List.of()),
                rules.liveLoad().partitionAsDead(), slabs);
        MemberReduction reduction = MemberReduction.of(loads, reductionArea(m, loads), kll(m), rules.liveLoad().reduce());
        BeamCriteria criteria = new BeamCriteria(rules.method(), rules.steel(), loads.bracing(m.kind()), rules.deflection(), true);
        CompositeGeometry geometry = floor.composite().composite(m) ? CompositeGeometry.of(floor, in.members(), m) : null;
        Searches.Sized sized = size(m, reduction, loads, criteria, geometry != null);
        BeamDesign d = sized.design();
        CompositeResult composite = null;
        if (geometry != null) {
            composite = composite(m, geometry, loads, reduction, d);
            CompositeDesign cd = composite.design();
            d = new BeamDesign(cd.status(), cd.section(), cd.checks(), cd.rejected(), cd.alternatives().size());
        } else if (m.composite().orElse(false) && floor.composite().mode() != CompositeMode.NON_COMPOSITE) {
            problems.add(new Problem(Problem.Severity.WARNING, "no-slab", "floor " + floor.id(), m.id(), "member " + m.id()
                    + " is marked composite but no deck beside it describes a slab; it was designed as bare steel",
                    List.of(m.start(), m.end())));
        }
        MemberLoads.Reactions rx = loads.reactions(span, d.section());
        passThrough(m, rx, 0, span);
        MemberTributary mt = trib.members().get(m.id());
        MemberResult r = new MemberResult(m.id(), floor.id(), m.kind(), m.start(), m.end(), span, d.status(), d,
                loads.ownArea(), reduction.area(), reduction.kll(), reduction.ordinaryLive(), reduction.roofLive(), rx.start(), rx.end(),
                ends.start().describe(), ends.end().describe(), mt == null ? List.of() : mt.polygons(), sized.loads(), criteria,
                composite);
        return new Designed(r, new Handoff(loads.l0(), loads.startShare(), loads.deliveredArea()));
    }

    /**
     * Designs a member that overhangs the support it passes over (a cantilever with a backspan): supports
     * at a and b along it, K_LL = 1 (ASCE 7-16 Table 4.7-1, cantilever beams), the reactions at the two
     * supports (the one beside the overhang larger than the load between them), and a warning where a
     * pattern of live load lifts the far support.
     */
    private Designed overhanging(Member m, Ends ends) {
        double span = m.length();
        double a = ends.free() == 0 ? ends.overAt() : 0;
        double b = ends.free() == 0 ? span : ends.overAt();
        MemberLoads loads = MemberLoads.of(m, floor, trib, incoming.getOrDefault(m.id(), List.of()),
                rules.liveLoad().partitionAsDead(), slabs, a, b);
        MemberReduction reduction = MemberReduction.of(loads, reductionArea(m, loads), 1, rules.liveLoad().reduce());
        BeamCriteria criteria = new BeamCriteria(rules.method(), rules.steel(), loads.bracing(m.kind()), rules.deflection(), true);
        Searches.Sized sized = size(m, reduction, loads, criteria, a, b, false);
        BeamDesign d = sized.design();
        MemberLoads.Reactions rx = loads.reactions(span, d.section(), a, b);
        passThrough(m, rx, a, b);
        Support sa = ends.free() == 0 ? ends.over() : ends.start();
        Support sb = ends.free() == 0 ? ends.end() : ends.over();
        if (d.section() != null) {
            double[] min = new org.baywright.design.OverhangDesigner(sized.loads(), criteria).minimumReactions(d.section());
            int far = ends.free() == 0 ? 1 : 0;
            if (min[far] < 0) {
                problems.add(new Problem(Problem.Severity.WARNING, "uplift", "floor " + floor.id(), m.id(), "member " + m.id()
                        + " overhangs its support: with live load on the overhang only its far support ("
                        + (far == 0 ? sa : sb).describe() + ") is pulled up by " + String.format(Locale.ROOT, "%.1f kN", -min[far] / 1000)
                        + " (factored); that connection must hold it down (ASCE 7-16 §4.3.3)",
                        List.of(far == 0 ? m.start() : m.end())));
            }
        }
        MemberTributary mt = trib.members().get(m.id());
        String over = " (passed over; the " + (ends.free() == 0 ? "start" : "end") + " overhangs it)";
        MemberResult r = new MemberResult(m.id(), floor.id(), m.kind(), m.start(), m.end(), span, d.status(), d,
                loads.ownArea(), reduction.area(), reduction.kll(), reduction.ordinaryLive(), reduction.roofLive(), rx.start(), rx.end(),
                sa.describe() + (ends.free() == 0 ? over : ""), sb.describe() + (ends.free() == 1 ? over : ""),
                mt == null ? List.of() : mt.polygons(), sized.loads(), criteria);
        return new Designed(r, new Handoff(loads.l0(), loads.startShare(), loads.deliveredArea()));
    }

    /**
     * The search, or the check of the member's fixed size when the catalog has it; problems for what went wrong
     * (none for the bare-steel comparison of a composite member, {@code comparison}).
     */
    private Searches.Sized size(Member m, MemberReduction reduction, MemberLoads loads, BeamCriteria criteria, boolean comparison) {
        return size(m, reduction, loads, criteria, 0, m.length(), comparison);
    }

    /** {@link #size(Member, MemberReduction, MemberLoads, BeamCriteria)} on supports at a and b along the member. */
    private Searches.Sized size(Member m, MemberReduction reduction, MemberLoads loads, BeamCriteria criteria, double a, double b,
            boolean comparison) {
        double span = m.length();
        Optional<String> fixed = m.fixedSection();
        Optional<Section> fixedSection = fixed.flatMap(searches.catalog()::find);
        Map<LoadCase, List<SpanLoad>> caseLoads = reduction.apply(loads);
        // serviceability under unreduced live load (settings.deflectionLiveLoad "unreduced", common practice)
        Map<LoadCase, List<SpanLoad>> deflectionLoads = rules.liveLoad().deflectionUnreduced()
                ? MemberReduction.none(reduction).apply(loads) : null;
        Searches.Sized sized;
        if (fixedSection.isPresent()) {
            sized = searches.check(fixedSection.get(), span, a, b, caseLoads, deflectionLoads, criteria);
        } else {
            if (fixed.isPresent() && !comparison) {
                problems.add(new Problem(Problem.Severity.ERROR, "unknown-section", "floor " + floor.id(), m.id(),
                        "member " + m.id() + ": section " + fixed.get() + " is not in the catalog " + searches.catalog().name()
                                + "; the member was sized instead", List.of(m.start(), m.end())));
            }
            sized = searches.search(span, a, b, caseLoads, deflectionLoads, criteria, filterFor(m));
            if (sized.design().status() == MemberStatus.OVERSTRESSED && vibrationSection(m) != null) {
                // no section of the stiffness asked for vibration passes: the member as it would be without it
                // (run.VibrationSizing sees the stiffness was not reached and tries another change)
                sized = searches.search(span, a, b, caseLoads, deflectionLoads, criteria, baseFilter(m));
            }
        }
        BeamDesign d = sized.design();
        if (d.status() == MemberStatus.OVERSTRESSED && !comparison) {
            problems.add(new Problem(Problem.Severity.ERROR, "overstressed", "floor " + floor.id(), m.id(),
                    "member " + m.id() + (d.section() == null ? ": no section is allowed by the filters"
                            : ": " + (fixed.isPresent() ? "the fixed size " : "no section passes; closest ")
                                    + d.section().designation() + " at ratio " + String.format(Locale.ROOT, "%.2f", d.maxRatio())),
                    List.of(m.start(), m.end())));
        }
        return sized;
    }

    /**
     * The sections a search of member {@code m} may choose: its kind's, and for a member stiffened for walking
     * vibration (run.PlanRun) only those of at least that moment of inertia.
     */
    private SearchFilter filterFor(Member m) {
        SearchFilter f = baseFilter(m);
        Section stiff = vibrationSection(m);
        if (stiff == null) {
            return f;
        }
        java.util.Set<String> out = new java.util.HashSet<>(f.excluded());
        for (Section s : searches.catalog().sections()) {
            if (s.props().ix() < stiff.props().ix() * (1 - 1e-12)) {
                out.add(s.designation());
            }
        }
        return new SearchFilter(f.minDepth(), f.maxDepth(), f.series(), out);
    }

    /** The sections a search of member {@code m} may choose by its kind. */
    private SearchFilter baseFilter(Member m) {
        return m.kind() == MemberKind.GIRDER ? rules.girders() : rules.beams();
    }

    /** The least section of a member stiffened for walking vibration, or null. */
    private Section vibrationSection(Member m) {
        String s = rules.vibrationSections().get(m.id());
        return s == null ? null : searches.catalog().find(s).orElse(null);
    }

    /**
     * The composite design of a simple-span member acting with the slab of the deck beside it (AISC 360-16
     * Chapter I): the slab's weight and the framing's own weight (D_WET) on the bare steel while the concrete
     * hardens, with the construction live load, unless the floor is shored; every other load on the composite
     * section; the effective width from the plan's geometry ({@link CompositeGeometry}). A fixed section is
     * kept (its studs searched unless fixed too).
     */
    private CompositeResult composite(Member m, CompositeGeometry g, MemberLoads loads, MemberReduction reduction, BeamDesign bare) {
        double span = m.length();
        org.baywright.plan.Slab slab = g.deck().slab();
        Map<LoadCase, List<SpanLoad>> caseLoads = reduction.applyComposite(loads);
        Map<LoadCase, List<SpanLoad>> deflectionLoads = rules.liveLoad().deflectionUnreduced()
                ? MemberReduction.none(reduction).applyComposite(loads) : null;
        BeamLoads bl = BeamLoads.of(span, caseLoads);
        if (deflectionLoads != null) {
            bl = bl.withDeflectionLoads(deflectionLoads);
        }
        boolean shored = floor.composite().shored();
        CompositeMember member = new CompositeMember(span, g.ribs(), g.neighbourLeft(), g.neighbourRight(), g.edgeLeft(),
                g.edgeRight(), SlabDesign.slabOnDeck(slab), SlabDesign.studs(slab), SlabDesign.weight(slab),
                loads.byComponent().get(Component.D_WET.ordinal()), loads.byComponent().get(Component.CONSTRUCTION.ordinal()), bl,
                loads.bracing(m.kind()));
        CompositeCriteria cc = rules.compositeCriteria(shored, loads.bracing(m.kind()));
        Optional<String> fixed = m.fixedSection();
        Section fixedSection = fixed.flatMap(searches.catalog()::find).orElse(null);
        int fixedStuds = fixedSection != null && m.fixedStuds().isPresent() ? m.fixedStuds().getAsInt() : -1;
        Searches.CompositeSized cs = searches.composite(member, caseLoads, deflectionLoads, cc,
                filterFor(m), fixedSection, fixedStuds);
        if (fixedSection == null && cs.design().status() == MemberStatus.OVERSTRESSED && vibrationSection(m) != null) {
            // as for a bare-steel member: without the stiffness asked for vibration when none of it passes
            cs = searches.composite(member, caseLoads, deflectionLoads, cc, baseFilter(m), null, -1);
        }
        CompositeDesign cd = cs.design();
        if (fixed.isPresent() && fixedSection == null) {
            problems.add(new Problem(Problem.Severity.ERROR, "unknown-section", "floor " + floor.id(), m.id(),
                    "member " + m.id() + ": section " + fixed.get() + " is not in the catalog " + searches.catalog().name()
                            + "; the member was sized instead", List.of(m.start(), m.end())));
        }
        if (cd.status() == MemberStatus.OVERSTRESSED) {
            problems.add(new Problem(Problem.Severity.ERROR, "overstressed", "floor " + floor.id(), m.id(),
                    "member " + m.id() + " (composite)" + (cd.section() == null ? ": no section is allowed by the filters"
                            : ": " + (fixedSection != null ? "the fixed size " : "no section passes; closest ")
                                    + cd.section().designation() + " with " + cd.studs() + " studs at ratio "
                                    + String.format(Locale.ROOT, "%.2f", cd.governing() == null ? Double.NaN : cd.governing().ratio())),
                    List.of(m.start(), m.end())));
        }
        String ribs = switch (g.ribs()) {
            case PERPENDICULAR -> "perpendicular";
            case PARALLEL -> "parallel";
            case NONE -> "solid slab";
        };
        return new CompositeResult(cd, cs.designer(), bare, ribs, shored, g.deck().id());
    }

    /** Passes a member's reactions to what supports each end, with the deck area and live intensities behind them. */
    private void passOn(Designed m, Ends ends) {
        MemberResult r = m.result();
        Handoff h = m.handoff();
        for (int end = 0; end < 2; end++) {
            // an overhanging member's reactions are at its supports: the one it passes over replaces its free end
            Support s = ends.overhangs() ? (ends.free() == 0 ? (end == 0 ? ends.over() : ends.end())
                    : (end == 0 ? ends.start() : ends.over())) : ends.at(end);
            double[] rx = end == 0 ? r.startReaction() : r.endReaction();
            // the deck area actually delivered passes on (never a girder's half-bay A_T, which would count
            // the same deck twice in the columns' A_T)
            double area = end == 0 ? h.delivered() * h.startShare() : h.delivered() * (1 - h.startShare());
            if (s.member() != null) {
                rx = withoutUplift(r, s, rx);
                incoming.computeIfAbsent(s.member(), k -> new ArrayList<>()).add(new Incoming(s.position(), rx, area, h.l0()));
            } else if (s.column() != null) {
                double[] acc = columnLoads.computeIfAbsent(s.column(), k -> new double[NC]);
                for (int c = 0; c < NC; c++) {
                    acc[c] += rx[c];
                }
                columnArea.merge(s.column(), area, Double::sum);
                double len = r.length();
                double sign = end == 0 ? 1 : -1;
                double dx = len > 0 ? sign * (r.end().x() - r.start().x()) / len : 0;
                double dy = len > 0 ? sign * (r.end().y() - r.start().y()) / len : 0;
                columnReactions.computeIfAbsent(s.column(), k -> new ArrayList<>())
                        .add(new FloorDesign.ColumnReaction(r.id(), dx, dy, rx.clone()));
                double[] l0 = columnL0.computeIfAbsent(s.column(), k -> new double[NC]);
                for (int c = 0; c < NC; c++) {
                    l0[c] = Math.max(l0[c], h.l0()[c]);
                }
            }
        }
    }

    /**
     * A reaction pulling up on the member that supports it (an overhanging member's far end): the beam
     * designer takes downward loads only, so the upward part is left out of that member's design and
     * passed straight through to its supports by the lever rule (equilibrium holds), and a located problem
     * says it was not designed for.
     */
    private double[] withoutUplift(MemberResult r, Support s, double[] rx) {
        double[] out = null;
        for (int c = 0; c < NC; c++) {
            if (rx[c] < 0) {
                out = out == null ? rx.clone() : out;
                out[c] = 0;
            }
        }
        if (out == null) {
            return rx;
        }
        double[] up = new double[NC + 1];
        up[0] = s.position();
        for (int c = 0; c < NC; c++) {
            up[c + 1] = rx[c] - out[c];
        }
        uplifts.computeIfAbsent(s.member(), k -> new ArrayList<>()).add(up);
        problems.add(new Problem(Problem.Severity.ERROR, "uplift-on-member", "floor " + floor.id(), r.id(), "member " + r.id()
                + " pulls up on " + s.describe() + " (its overhang outweighs its backspan); an upward reaction on a member is"
                + " not designed: support that end on a column or shorten the overhang", List.of(r.start(), r.end())));
        return out;
    }

    /** Adds the upward reactions received by {@code m} to its reactions at supports a and b, by the lever rule. */
    private void passThrough(Member m, MemberLoads.Reactions rx, double a, double b) {
        for (double[] up : uplifts.getOrDefault(m.id(), List.of())) {
            double fb = Math.max(0, Math.min(1, (up[0] - a) / (b - a)));
            for (int c = 0; c < NC; c++) {
                rx.start()[c] += up[c + 1] * (1 - fb);
                rx.end()[c] += up[c + 1] * fb;
            }
        }
    }

    private MemberResult notDesigned(Member m, Ends ends) {
        return new MemberResult(m.id(), floor.id(), m.kind(), m.start(), m.end(), m.length(), MemberStatus.UNSUPPORTED, null,
                0, 0, 0, 1, 1, new double[NC], new double[NC], ends.start().describe(), ends.end().describe(), List.of(), null,
                null);
    }

    /**
     * A_T of a member: the area whose load it receives; for a girder with {@code girderAreaDelivered}
     * off, half the bay on each side where that is larger.
     */
    private double reductionArea(Member m, MemberLoads loads) {
        double at = loads.deliveredArea();
        if (m.kind() == MemberKind.GIRDER && !rules.liveLoad().girderAreaDelivered()) {
            MemberTributary half = halfBay().members().get(m.id());
            if (half != null && half.area() > at) {
                at = half.area();
            }
        }
        return at;
    }

    /** Tributary areas with every deck turned 90°: girders then take half the bay on each side. */
    private FloorTributary halfBay() {
        if (halfBay == null) {
            List<Deck> decks = new ArrayList<>();
            List<Deck> src = floor.decks().isEmpty() ? List.of(new Deck("slab", floor.slabEdge(), 0)) : floor.decks();
            for (Deck d : src) {
                decks.add(new Deck(d.id(), d.outline(), d.spanAngle() + 90));
            }
            Floor turned = new Floor(floor.id(), floor.name(), floor.roof(), floor.slabEdge(), decks, floor.members(),
                    floor.infills(), floor.openings(), floor.areaLoads(), List.of(), List.of(), floor.composite());
            halfBay = TributaryAnalysis.compute(turned, in.members(), Takedown.GRID);
        }
        return halfBay;
    }

    /** K_LL of a beam or girder (ASCE 7-16 Table 4.7-1): 1 for an edge member with a cantilever slab beyond it, else 2. */
    private double kll(Member m) {
        MemberTributary mt = trib.members().get(m.id());
        return SlabEdges.isEdgeWithCantilever(floor, in.members(), m, mt == null ? List.of() : mt.polygons(),
                Takedown.CANTILEVER_SLAB, Takedown.TOLERANCE) ? 1 : 2;
    }
}
