package org.baywright.takedown;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.design.Bracing;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.MemberStatus;
import org.baywright.design.SearchFilter;
import org.baywright.design.Steel;
import org.baywright.geometry.FloorTributary;
import org.baywright.geometry.GeometryProblem;
import org.baywright.geometry.LineShare;
import org.baywright.geometry.LoadShare;
import org.baywright.geometry.MemberTributary;
import org.baywright.geometry.TributaryAnalysis;
import org.baywright.geometry.WidthSegment;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadReduction;
import org.baywright.load.LoadCase;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Problem;
import org.baywright.units.Units;

/**
 * The load takedown of a plan: deck load to the members by tributary area, each member sized before its
 * reactions pass on (its own weight included), reactions onto the members or columns that support
 * it, columns stacked level over level to the foundations.
 *
 * <p>Order: on each floor layout a support graph is built from positions (a member end is supported
 * by a column at that point, otherwise by a member passing through it, girders before beams) and
 * processed in topological order, so every member is designed after all the members framing into it.
 * A typical floor is designed once and its results serve every level that uses it; columns differ per
 * level and are summed from the top down.
 *
 * <p>Live load: reactions pass on unreduced, per component ({@link Component}); every member and column
 * reduces by its own A_T and K_LL (ASCE 7-16 §4.7, §4.8). A member's A_T is the deck area whose load
 * it receives: its own tributary area plus the shares of the members framing into it (the
 * {@code girderArea = "delivered"} choice), or for girders, optionally, half the bay on each side.
 *
 * <p>Invariants checked on every run, as located problems: every member supported; no support cycle;
 * tributary coverage (from the geometry); equilibrium per load case between everything applied and the
 * foundation reactions, to {@link Equilibrium#TOLERANCE}.
 */
public final class Takedown {
    /** Grid of the tributary analysis: coordinates are snapped to it, m. */
    public static final double GRID = 1e-6;
    /** Coincidence tolerance for supports, m. */
    public static final double TOLERANCE = 1e-3;
    /** Distance beyond a member or column at which the slab counts as a cantilever slab, m (1 ft). */
    public static final double CANTILEVER_SLAB = Units.FT_.toSi(1);
    /**
     * 100 psf (4.79 kN/m²): the live load above which §4.7.3 applies. The same limit as the reduction
     * itself uses ({@link LiveLoadReduction#HEAVY_LIVE_LOAD}), so that a load is never classed heavy here
     * and ordinary there (an assembly load of 4.79 kN/m² would otherwise be reduced as ordinary load).
     */
    public static final double HEAVY_LIVE = LiveLoadReduction.HEAVY_LIVE_LOAD;

    /** Most beams one infill may generate; an infill asking for more is reported and left out. */
    public static final int MAX_INFILL_BEAMS = Framing.MAX_INFILL_BEAMS;

    private static final int NC = Component.values().length;

    private final Plan plan;
    private final DesignSettings settings;
    private final Catalog catalog;
    private final Steel steel;
    private final DesignMethod method;
    /** Problems found, in a list safe for the parallel stages. */
    private final List<Problem> problems = java.util.Collections.synchronizedList(new ArrayList<>());

    /** Floor designs shared with other runs, or null. */
    private final FloorCache reuse;

    private Takedown(Plan plan, Catalog catalog, FloorCache reuse) {
        this.plan = plan;
        this.settings = plan.settings();
        this.catalog = catalog;
        this.reuse = reuse != null && reuse.catalog() == catalog ? reuse : null;
        this.steel = Steel.A992.fy() == settings.fy() ? Steel.A992 : Steel.A992.withFy(settings.fy());
        DesignMethod m = DesignMethod.parse(settings.method());
        this.method = m == null ? DesignMethod.LRFD : m;
    }

    /** Runs the takedown of a valid plan. */
    public static TakedownResult run(Plan plan, Catalog catalog) {
        return new Takedown(plan, catalog, null).run();
    }

    /**
     * Runs the takedown of a valid plan, taking the design of a floor layout from {@code reuse} when a
     * run with the same catalog has designed one with exactly the same inputs (see {@link FloorCache}),
     * and leaving its own there. The result is the same as without it.
     *
     * @param reuse floor designs shared between runs, or null
     */
    public static TakedownResult run(Plan plan, Catalog catalog, FloorCache reuse) {
        return new Takedown(plan, catalog, reuse).run();
    }

    /** A floor's members as designed: those drawn and those its infills generate, and the infills left out. */
    private record Expansion(List<Member> members, List<Problem> problems) {
    }

    /**
     * The members drawn and those the infills generate; an infill that would generate more than
     * {@link #MAX_INFILL_BEAMS} beams (a plan built in code; files are checked on reading) is
     * reported and left out instead of exhausting memory.
     */
    private Expansion expand(Floor f) {
        List<Member> out = new ArrayList<>(f.members());
        List<Problem> left = new ArrayList<>();
        for (org.baywright.plan.Infill inf : f.infills()) {
            double width = bayWidth(inf);
            int n = Framing.beamCount(inf, width);
            if (n > MAX_INFILL_BEAMS) {
                left.add(Problem.error("too-many-beams", "floor " + f.id(), inf.id(), "infill " + inf.id()
                        + " would generate " + n + " beams; an infill has at most " + MAX_INFILL_BEAMS
                        + " beams (give a smaller count or a larger maxSpacing); it was left out"));
                continue;
            }
            out.addAll(Framing.infillBeams(plan, inf));
        }
        return new Expansion(List.copyOf(out), List.copyOf(left));
    }

    /** The width of an infill's bay across its beams, m (0 when a grid line is unknown). */
    private double bayWidth(org.baywright.plan.Infill inf) {
        boolean alongX = inf.direction() == org.baywright.plan.GridLine.Axis.X;
        Optional<org.baywright.plan.GridLine> a = plan.gridLine(alongX ? inf.y0() : inf.x0());
        Optional<org.baywright.plan.GridLine> b = plan.gridLine(alongX ? inf.y1() : inf.x1());
        return a.isPresent() && b.isPresent() ? Math.abs(b.get().offset() - a.get().offset()) : 0;
    }

    /**
     * Designs one floor layout with the columns present, or takes the design from the cache. The key
     * holds every input the design reads: the layout with its members expanded (the infills as the
     * beams they generate), the infills left out, the columns present with their positions, the design
     * settings that concern floors (the column series and splices do not) and, through the cache, the
     * catalog.
     */
    private FloorDesign designFloor(Floor floor, Set<String> columnsPresent) {
        Expansion ex = expand(floor);
        if (reuse == null) {
            return new FloorRun(floor, ex, columnsPresent).outcome();
        }
        List<Column> columns = new ArrayList<>();
        for (Column c : plan.columns()) {
            if (columnsPresent.contains(c.id())) {
                columns.add(c);
            }
        }
        DesignSettings s = settings;
        DesignSettings forFloors = new DesignSettings(s.method(), s.fy(), s.liveDeflection(), s.totalDeflection(),
                s.beamSeries(), s.girderSeries(), List.of(), s.maxBeamDepth(), 0, s.liveLoadReduction(), s.partitionAsDead(),
                s.girderAreaDelivered(), "");
        FloorKey key = new FloorKey(floor.id(), floor.name(), floor.roof(), floor.slabEdge(), floor.decks(), ex.members(),
                ex.problems(), floor.openings(), floor.areaLoads(), floor.lineLoads(), floor.pointLoads(), columns, forFloors);
        return reuse.get(key, () -> new FloorRun(floor, ex, columnsPresent).outcome());
    }

    /** Everything a floor design depends on besides the catalog (see {@link #designFloor}). */
    private record FloorKey(String id, String name, boolean roof, org.baywright.plan.Polygon slabEdge,
            List<org.baywright.plan.Deck> decks, List<Member> members, List<Problem> leftOut,
            List<org.baywright.plan.Opening> openings, List<AreaLoad> areaLoads, List<LineLoad> lineLoads,
            List<PointLoadItem> pointLoads, List<Column> columns, DesignSettings settings) {
    }

    /** The per-floor state: members, geometry and results. */
    private final class FloorRun {
        final Floor floor;
        final List<Member> members;
        final FloorTributary trib;
        final Map<String, Member> byId = new LinkedHashMap<>();
        final Map<String, MemberResult> results = new LinkedHashMap<>();
        /** Column id → component loads delivered by this floor's members. */
        final Map<String, double[]> columnLoads = new LinkedHashMap<>();
        /** This floor's problems in the order found; merged in the plan's order after the parallel stage. */
        final List<Problem> problems = new ArrayList<>();
        /** Column id → A_T delivered. */
        final Map<String, Double> columnArea = new LinkedHashMap<>();
        /** Column id → the largest live intensity per component delivered (for §4.7.3). */
        final Map<String, double[]> columnL0 = new LinkedHashMap<>();
        double loadedArea;

        FloorRun(Floor floor, Expansion expansion, Set<String> columnsPresent) {
            this.floor = floor;
            this.members = expansion.members();
            problems.addAll(expansion.problems());
            for (Member m : members) {
                byId.put(m.id(), m);
            }
            this.trib = TributaryAnalysis.compute(floor, members, GRID);
            this.loadedArea = trib.loadedArea();
            for (GeometryProblem g : trib.problems()) {
                problems.add(new Problem(Problem.Severity.ERROR, g.kind(), "floor " + floor.id(), g.objectId(), g.message(),
                        g.where()));
            }
            design(columnsPresent);
        }

        /** What this floor's design produced, for every level (and run) that uses it. */
        FloorDesign outcome() {
            return new FloorDesign(List.copyOf(results.values()), java.util.Collections.unmodifiableMap(columnLoads),
                    java.util.Collections.unmodifiableMap(columnArea), java.util.Collections.unmodifiableMap(columnL0),
                    loadedArea, trib.areaLoadAreas(), List.copyOf(problems));
        }

        private void design(Set<String> columnsPresent) {
            // 1. supports of every member end
            Map<String, Support[]> supports = new LinkedHashMap<>();
            for (Member m : members) {
                if (m.length() < TOLERANCE) {
                    problems.add(new Problem(Problem.Severity.ERROR, "zero-length-member", "floor " + floor.id(), m.id(),
                            "member " + m.id() + " has zero length; its ends must be distinct points", List.of(m.start())));
                    continue;
                }
                supports.put(m.id(), new Support[] {support(m, m.start(), columnsPresent), support(m, m.end(), columnsPresent)});
            }
            // 2. topological order: a member after every member framing into it
            Map<String, List<String>> framingInto = new HashMap<>();
            Map<String, Integer> pending = new HashMap<>();
            for (Map.Entry<String, Support[]> e : supports.entrySet()) {
                pending.putIfAbsent(e.getKey(), 0);
                for (Support s : e.getValue()) {
                    if (s.member != null) {
                        framingInto.computeIfAbsent(s.member, k -> new ArrayList<>()).add(e.getKey());
                        pending.merge(s.member, 1, Integer::sum);
                    }
                }
            }
            Deque<String> ready = new ArrayDeque<>();
            for (String id : supports.keySet()) {
                if (pending.get(id) == 0) {
                    ready.add(id);
                }
            }
            List<String> order = new ArrayList<>();
            release(ready, order, supports, pending);
            if (order.size() < supports.size()) {
                // left over: the members of support loops, and the members they bear on (directly or not)
                Set<String> stuck = new LinkedHashSet<>(supports.keySet());
                stuck.removeAll(order);
                Map<String, Set<String>> reach = new HashMap<>();
                for (String id : stuck) {
                    reach.put(id, bearsOn(id, supports, stuck));
                }
                Set<String> inLoop = new LinkedHashSet<>();
                for (String id : stuck) {
                    if (reach.get(id).contains(id)) {
                        inLoop.add(id);
                    }
                }
                for (String id : inLoop) {
                    Member m = byId.get(id);
                    List<String> loop = inLoop.stream().filter(o -> reach.get(id).contains(o) && reach.get(o).contains(id)).toList();
                    problems.add(new Problem(Problem.Severity.ERROR, "support-cycle", "floor " + floor.id(), id,
                            "member " + id + " is in a cycle of members supporting each other (" + String.join(", ", loop)
                                    + "); one of them must bear on a column or another member", List.of(m.start(), m.end())));
                    results.put(id, notDesigned(m, MemberStatus.UNSUPPORTED, supports.get(id)));
                }
                // the members a loop bears on are designed with the load that reaches them, like the member
                // under an unsupported one; what the loop carries is missing, and the equilibrium shows it
                for (String id : inLoop) {
                    for (Support s : supports.get(id)) {
                        if (s.member != null && !inLoop.contains(s.member) && pending.merge(s.member, -1, Integer::sum) == 0) {
                            ready.add(s.member);
                        }
                    }
                }
                release(ready, order, supports, pending);
            }
            // 3. design in order, passing reactions on
            Map<String, List<Incoming>> incoming = new HashMap<>();
            for (String id : order) {
                Member m = byId.get(id);
                Support[] sup = supports.get(id);
                MemberResult r = designMember(m, sup, incoming.getOrDefault(id, List.of()));
                results.put(id, r);
                for (int end = 0; end < 2; end++) {
                    Support s = sup[end];
                    double[] rx = end == 0 ? r.startReaction() : r.endReaction();
                    // the deck area actually delivered passes on (never a girder's half-bay A_T, which
                    // would count the same deck twice in the columns' A_T)
                    double delivered = memberDelivered.getOrDefault(id, r.reductionArea());
                    double area = end == 0 ? delivered * startShare(r) : delivered * (1 - startShare(r));
                    if (s.member != null) {
                        incoming.computeIfAbsent(s.member, k -> new ArrayList<>()).add(new Incoming(id, s.position, rx, area,
                                r.kind(), l0Of(r)));
                    } else if (s.column != null) {
                        double[] acc = columnLoads.computeIfAbsent(s.column, k -> new double[NC]);
                        for (int c = 0; c < NC; c++) {
                            acc[c] += rx[c];
                        }
                        columnArea.merge(s.column, area, Double::sum);
                        double[] l0 = columnL0.computeIfAbsent(s.column, k -> new double[NC]);
                        double[] ml0 = l0Of(r);
                        for (int c = 0; c < NC; c++) {
                            l0[c] = Math.max(l0[c], ml0[c]);
                        }
                    }
                }
            }
        }

        /** Kahn's algorithm: takes the ready members in turn, releasing those whose framing members are all taken. */
        private void release(Deque<String> ready, List<String> order, Map<String, Support[]> supports,
                Map<String, Integer> pending) {
            while (!ready.isEmpty()) {
                String id = ready.poll();
                order.add(id);
                for (Support s : supports.get(id)) {
                    if (s.member != null && pending.merge(s.member, -1, Integer::sum) == 0) {
                        ready.add(s.member);
                    }
                }
            }
        }

        /** The members among {@code within} that a member bears on, directly or through others. */
        private Set<String> bearsOn(String id, Map<String, Support[]> supports, Set<String> within) {
            Set<String> seen = new LinkedHashSet<>();
            Deque<String> todo = new ArrayDeque<>(List.of(id));
            while (!todo.isEmpty()) {
                for (Support s : supports.get(todo.poll())) {
                    if (s.member != null && within.contains(s.member) && seen.add(s.member)) {
                        todo.add(s.member);
                    }
                }
            }
            return seen;
        }

        /** The member's largest live intensity per component, kept on the side for heavy-load checks. */
        private final Map<String, double[]> memberL0 = new HashMap<>();
        private final Map<String, Double> memberStartShare = new HashMap<>();
        /** The deck area whose load each member receives (its own plus what frames into it), m². */
        private final Map<String, Double> memberDelivered = new HashMap<>();

        private double[] l0Of(MemberResult r) {
            return memberL0.getOrDefault(r.id(), new double[NC]);
        }

        private double startShare(MemberResult r) {
            return memberStartShare.getOrDefault(r.id(), 0.5);
        }

        private MemberResult notDesigned(Member m, MemberStatus status, Support[] sup) {
            return new MemberResult(m.id(), floor.id(), m.kind(), m.start(), m.end(), m.length(), status, null, 0, 0, 0, 1,
                    new double[NC], new double[NC], sup == null ? "" : sup[0].describe(), sup == null ? "" : sup[1].describe(),
                    List.of(), null, null);
        }

        private Support support(Member m, Point p, Set<String> columnsPresent) {
            for (Column c : plan.columns()) {
                if (columnsPresent.contains(c.id()) && c.at().distance(p) <= TOLERANCE) {
                    return Support.column(c.id());
                }
            }
            Member best = null;
            double bestS = 0;
            for (Member o : members) {
                if (o == m || o.length() < TOLERANCE) {
                    continue;
                }
                double s = projection(o, p);
                if (s < -TOLERANCE || s > o.length() + TOLERANCE) {
                    continue;
                }
                Point q = along(o, s);
                if (q.distance(p) > TOLERANCE) {
                    continue;
                }
                boolean interior = s > TOLERANCE && s < o.length() - TOLERANCE;
                if (!interior) {
                    continue; // meeting another member end to end is not a support
                }
                if (best == null || (o.kind() == MemberKind.GIRDER && best.kind() != MemberKind.GIRDER)) {
                    best = o;
                    bestS = s;
                }
            }
            if (best != null) {
                return Support.member(best.id(), bestS);
            }
            problems.add(new Problem(Problem.Severity.ERROR, "unsupported-member", "floor " + floor.id(), m.id(),
                    "member " + m.id() + " has no support at (" + fmt(p) + "): no column there and no member passes through"
                            + " that point", List.of(p)));
            return Support.NONE;
        }

        private MemberResult designMember(Member m, Support[] sup, List<Incoming> in) {
            double span = m.length();
            if (sup[0] == Support.NONE || sup[1] == Support.NONE) {
                MemberResult r = notDesigned(m, MemberStatus.UNSUPPORTED, sup);
                return r;
            }
            List<List<SpanLoad>> comp = new ArrayList<>();
            for (int c = 0; c < NC; c++) {
                comp.add(new ArrayList<>());
            }
            List<SpanLoad> areaFlow = new ArrayList<>();
            double[] l0 = new double[NC];
            MemberTributary mt = trib.members().get(m.id());
            double own = mt == null ? 0 : mt.area();
            // deck: area loads through the width profiles
            if (mt != null) {
                for (WidthSegment w : mt.widths()) {
                    if (clampS(w.s1(), span) - clampS(w.s0(), span) <= 1e-9) {
                        continue;
                    }
                    areaFlow.add(new DistributedLoad(clampS(w.s0(), span), clampS(w.s1(), span), w.w0(), w.w1()));
                }
                for (AreaLoad al : floor.areaLoads()) {
                    List<WidthSegment> segs = mt.areaLoadWidths().get(al.id());
                    if (segs == null || segs.isEmpty()) {
                        continue;
                    }
                    double[] q = components(al.values(), al.use(), l0);
                    for (WidthSegment w : segs) {
                        if (clampS(w.s1(), span) - clampS(w.s0(), span) <= 1e-9) {
                            continue;
                        }
                        for (int c = 0; c < NC; c++) {
                            if (q[c] != 0) {
                                comp.get(c).add(new DistributedLoad(clampS(w.s0(), span), clampS(w.s1(), span), w.w0() * q[c],
                                        w.w1() * q[c]));
                            }
                        }
                    }
                }
            }
            // line loads
            for (LineLoad ll : floor.lineLoads()) {
                for (LineShare sh : trib.lineShares().getOrDefault(ll.id(), List.of())) {
                    if (!sh.memberId().equals(m.id())) {
                        continue;
                    }
                    double[] q = components(ll.values(), LiveLoadUse.ORDINARY, null);
                    for (int c = 0; c < NC; c++) {
                        if (q[c] == 0) {
                            continue;
                        }
                        if (sh.isConcentrated()) {
                            comp.get(c).add(new PointLoad(clampS(sh.s0(), span), sh.force(q[c])));
                        } else if (clampS(sh.s1(), span) - clampS(sh.s0(), span) > 1e-9) {
                            comp.get(c).add(new DistributedLoad(clampS(sh.s0(), span), clampS(sh.s1(), span), sh.f0() * q[c],
                                    sh.f1() * q[c]));
                        }
                    }
                }
            }
            // point loads
            for (PointLoadItem pl : floor.pointLoads()) {
                for (LoadShare sh : trib.pointShares().getOrDefault(pl.id(), List.of())) {
                    if (!sh.memberId().equals(m.id())) {
                        continue;
                    }
                    double[] q = components(pl.values(), LiveLoadUse.ORDINARY, null);
                    for (int c = 0; c < NC; c++) {
                        if (q[c] != 0) {
                            comp.get(c).add(new PointLoad(clampS(sh.s(), span), sh.fraction() * q[c]));
                        }
                    }
                }
            }
            // reactions of members framing in
            List<Double> bracePoints = new ArrayList<>();
            double incomingArea = 0;
            for (Incoming i : in) {
                double s = clampS(i.position, span);
                for (int c = 0; c < NC; c++) {
                    if (i.reaction[c] != 0) {
                        comp.get(c).add(new PointLoad(s, i.reaction[c]));
                    }
                    l0[c] = Math.max(l0[c], i.l0[c]);
                }
                if (i.area != 0) {
                    areaFlow.add(new PointLoad(s, i.area));
                }
                incomingArea += i.area;
                if (s > TOLERANCE && s < span - TOLERANCE) {
                    bracePoints.add(s / span);
                }
            }
            memberL0.put(m.id(), l0);
            SimpleSpan flow = SimpleSpan.of(span, areaFlow);
            double at = own + incomingArea;
            memberStartShare.put(m.id(), at > 0 ? flow.leftReaction() / at : 0.5);
            memberDelivered.put(m.id(), at);
            if (m.kind() == MemberKind.GIRDER && !settings.girderAreaDelivered()) {
                MemberTributary half = halfBay().members().get(m.id());
                if (half != null && half.area() > at) {
                    at = half.area();
                }
            }
            double kll = memberKll(m);
            // live-load reduction of this member by its own A_T
            double[] factor = new double[NC];
            Arrays.fill(factor, 1.0);
            if (settings.liveLoadReduction()) {
                for (Component c : Component.values()) {
                    if (c.isLive() && !comp.get(c.ordinal()).isEmpty()) {
                        factor[c.ordinal()] = LiveLoadReduction.floor(Math.max(l0[c.ordinal()], 1e-9), kll, at, 1,
                                c.reducibleUse(), null).factor();
                    }
                }
                if (!comp.get(Component.LR.ordinal()).isEmpty()) {
                    factor[Component.LR.ordinal()] = LiveLoadReduction.roof(Math.max(l0[Component.LR.ordinal()], 1e-9), at, 0,
                            null).factor();
                }
            }
            Map<LoadCase, List<SpanLoad>> caseLoads = new EnumMap<>(LoadCase.class);
            for (Component c : Component.values()) {
                List<SpanLoad> list = caseLoads.computeIfAbsent(c.loadCase(), k -> new ArrayList<>());
                double f = factor[c.ordinal()];
                for (SpanLoad l : comp.get(c.ordinal())) {
                    list.add(f == 1.0 ? l : l.scaled(f));
                }
            }
            Bracing bracing = m.kind() == MemberKind.BEAM || bracePoints.isEmpty() && own > 0 ? Bracing.continuous()
                    : Bracing.atFractions(bracePoints.stream().distinct().mapToDouble(Double::doubleValue).toArray());
            if (m.kind() == MemberKind.GIRDER && bracePoints.isEmpty() && own == 0) {
                bracing = Bracing.equalSegments(1);
            }
            BeamCriteria criteria = new BeamCriteria(method, steel, bracing,
                    new DeflectionLimits(settings.liveDeflection(), settings.totalDeflection()), true);
            BeamLoads bl;
            BeamDesign d;
            Optional<String> fixed = m.fixedSection();
            Optional<Section> fixedSection = fixed.flatMap(catalog::find);
            if (fixedSection.isPresent()) {
                bl = BeamLoads.of(span, caseLoads);
                d = new BeamDesigner(bl, criteria).checkFixed(fixedSection.get());
            } else {
                if (fixed.isPresent()) {
                    problems.add(new Problem(Problem.Severity.ERROR, "unknown-section", "floor " + floor.id(), m.id(),
                            "member " + m.id() + ": section " + fixed.get() + " is not in the catalog " + catalog.name()
                                    + "; the member was sized instead", List.of(m.start(), m.end())));
                }
                Sized sized = sized(span, caseLoads, criteria, filter(m.kind()));
                bl = sized.loads();
                d = sized.design();
            }
            if (d.status() == MemberStatus.OVERSTRESSED) {
                problems.add(new Problem(Problem.Severity.ERROR, "overstressed", "floor " + floor.id(), m.id(),
                        "member " + m.id() + (d.section() == null ? ": no section is allowed by the filters"
                                : ": " + (fixed.isPresent() ? "the fixed size " : "no section passes; closest ")
                                        + d.section().designation() + " at ratio "
                                        + String.format(java.util.Locale.ROOT, "%.2f", d.maxRatio())),
                        List.of(m.start(), m.end())));
            }
            // reactions by component, unreduced, with self-weight in D
            double[] r0 = new double[NC];
            double[] r1 = new double[NC];
            for (int c = 0; c < NC; c++) {
                if (comp.get(c).isEmpty()) {
                    continue;
                }
                SimpleSpan s = SimpleSpan.of(span, comp.get(c));
                r0[c] = s.leftReaction();
                r1[c] = s.rightReaction();
            }
            double sw = d.section() == null ? 0 : d.section().weight() * span / 2;
            r0[Component.D.ordinal()] += sw;
            r1[Component.D.ordinal()] += sw;
            return new MemberResult(m.id(), floor.id(), m.kind(), m.start(), m.end(), span, d.status(), d, own, at, kll,
                    factor[Component.L_ORDINARY.ordinal()], r0, r1, sup[0].describe(), sup[1].describe(),
                    mt == null ? List.of() : mt.polygons(), bl, criteria);
        }

        private FloorTributary halfBayCache;

        /** Tributary areas with every deck turned 90°: girders then take half the bay on each side. */
        private FloorTributary halfBay() {
            if (halfBayCache == null) {
                List<org.baywright.plan.Deck> decks = new ArrayList<>();
                List<org.baywright.plan.Deck> src = floor.decks().isEmpty()
                        ? List.of(new org.baywright.plan.Deck("slab", floor.slabEdge(), 0)) : floor.decks();
                for (org.baywright.plan.Deck d : src) {
                    decks.add(new org.baywright.plan.Deck(d.id(), d.outline(), d.spanAngle() + 90));
                }
                Floor turned = new Floor(floor.id(), floor.name(), floor.roof(), floor.slabEdge(), decks, floor.members(),
                        floor.infills(), floor.openings(), floor.areaLoads(), List.of(), List.of());
                halfBayCache = TributaryAnalysis.compute(turned, members, GRID);
            }
            return halfBayCache;
        }

        /** K_LL of a beam or girder (ASCE 7-16 Table 4.7-1): 1 for an edge member with a cantilever slab beyond it, else 2. */
        private double memberKll(Member m) {
            return SlabEdges.isEdgeWithCantilever(floor, members, m, CANTILEVER_SLAB, TOLERANCE) ? 1 : 2;
        }
    }


    /**
     * The inputs that fix the outcome of a lightest-section search: span, service loads by load case,
     * criteria and filter (the catalog is the run's). Equal keys give equal designs, so a search is run
     * once per key: on a regular floor most beams carry exactly the same loads.
     */
    private record SearchKey(double span, List<List<SpanLoad>> loads, BeamCriteria criteria, SearchFilter filter) {
    }

    /** A member's service loads and the search's outcome for them. */
    private record Sized(BeamLoads loads, BeamDesign design) {
    }

    /** Searches done in this run, by their inputs (floors run in parallel). */
    private final Map<SearchKey, Sized> searches = new java.util.concurrent.ConcurrentHashMap<>();

    /** The lightest section for these loads: searched once per distinct set of inputs in a run. */
    private Sized sized(double span, Map<LoadCase, List<SpanLoad>> caseLoads, BeamCriteria criteria, SearchFilter filter) {
        List<List<SpanLoad>> byCase = new ArrayList<>();
        for (LoadCase c : LoadCase.values()) {
            byCase.add(List.copyOf(caseLoads.getOrDefault(c, List.of())));
        }
        SearchKey key = new SearchKey(span, byCase, criteria, filter);
        Sized done = searches.get(key);
        if (done == null) {
            BeamLoads bl = BeamLoads.of(span, caseLoads);
            done = new Sized(bl, new BeamDesigner(bl, criteria).search(catalog, filter));
            Sized raced = searches.putIfAbsent(key, done);
            done = raced != null ? raced : done;
        }
        return done;
    }

    /** Splits load values into components; records the largest live intensity per component in l0. */
    private double[] components(LoadValues v, LiveLoadUse use, double[] l0) {
        double[] q = new double[NC];
        double partition = settings.partitionAsDead() ? 0 : v.partition();
        q[Component.D.ordinal()] = v.dead() + v.superimposed() + (settings.partitionAsDead() ? v.partition() : 0);
        double live = v.live() + partition;
        Component lc = switch (use) {
            case GARAGE -> Component.L_GARAGE;
            case NOT_REDUCIBLE -> Component.L_FIXED;
            case ASSEMBLY -> live > HEAVY_LIVE ? Component.L_HEAVY : Component.L_ASSEMBLY;
            case ORDINARY -> live > HEAVY_LIVE ? Component.L_HEAVY : Component.L_ORDINARY;
        };
        q[lc.ordinal()] = live;
        q[Component.LR.ordinal()] = v.roofLive();
        q[Component.S.ordinal()] = v.snow();
        if (l0 != null) {
            l0[lc.ordinal()] = Math.max(l0[lc.ordinal()], live);
            l0[Component.LR.ordinal()] = Math.max(l0[Component.LR.ordinal()], v.roofLive());
        }
        return q;
    }

    private SearchFilter filter(MemberKind kind) {
        List<String> series = kind == MemberKind.GIRDER ? settings.girderSeries() : settings.beamSeries();
        double maxD = settings.maxBeamDepth() > 0 ? settings.maxBeamDepth() : Double.POSITIVE_INFINITY;
        Set<String> s = new LinkedHashSet<>();
        for (String x : series) {
            s.add(Section.normalize(x));
        }
        return new SearchFilter(0, maxD, s, Set.of());
    }

    private static double clampS(double s, double span) {
        return Math.max(0, Math.min(span, s));
    }

    private static double projection(Member o, Point p) {
        double dx = o.end().x() - o.start().x();
        double dy = o.end().y() - o.start().y();
        double len = Math.hypot(dx, dy);
        return ((p.x() - o.start().x()) * dx + (p.y() - o.start().y()) * dy) / len;
    }

    private static Point along(Member o, double s) {
        double len = o.length();
        double f = s / len;
        return new Point(o.start().x() + f * (o.end().x() - o.start().x()), o.start().y() + f * (o.end().y() - o.start().y()));
    }

    private static String fmt(Point p) {
        return String.format(java.util.Locale.ROOT, "%.3f m, %.3f m", p.x(), p.y());
    }

    /** A member's reaction arriving on the member that supports it. */
    private record Incoming(String from, double position, double[] reaction, double area, MemberKind kind, double[] l0) {
    }

    /** What supports a member end. */
    private static final class Support {
        static final Support NONE = new Support(null, null, 0);
        final String column;
        final String member;
        final double position;

        private Support(String column, String member, double position) {
            this.column = column;
            this.member = member;
            this.position = position;
        }

        static Support column(String id) {
            return new Support(id, null, 0);
        }

        static Support member(String id, double s) {
            return new Support(null, id, s);
        }

        String describe() {
            return column != null ? "column " + column : member != null ? "member " + member : "";
        }
    }

    private TakedownResult run() {
        List<Level> levels = plan.levels();
        if (levels.isEmpty()) {
            problems.add(Problem.error("no-levels", "/levels", "", "the plan has no levels, so nothing stands on the"
                    + " columns; add at least one level with a floor layout"));
        }
        Map<String, Integer> levelIndex = new HashMap<>();
        for (int i = 0; i < levels.size(); i++) {
            levelIndex.put(levels.get(i).name(), i);
        }
        // columns present at each level
        List<Set<String>> present = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            Set<String> s = new LinkedHashSet<>();
            for (Column c : plan.columns()) {
                int top = c.topLevel() == null || c.topLevel().isEmpty() ? levels.size() - 1
                        : levelIndex.getOrDefault(c.topLevel(), levels.size() - 1);
                if (i <= top) {
                    s.add(c.id());
                }
            }
            present.add(s);
        }
        // design each floor layout once per set of columns present; distinct layouts in parallel
        Map<String, Floor> distinct = new LinkedHashMap<>();
        Map<String, Set<String>> distinctColumns = new HashMap<>();
        List<String> levelKeys = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            Level lv = levels.get(i);
            Optional<Floor> f = plan.floor(lv.floor());
            if (f.isEmpty()) {
                problems.add(Problem.error("unknown-floor", "level " + lv.name(), lv.name(), "level " + lv.name()
                        + " refers to floor layout \"" + lv.floor() + "\", which the plan does not have"));
                levelKeys.add(null);
                continue;
            }
            String key = f.get().id() + "|" + String.join(",", present.get(i));
            distinct.putIfAbsent(key, f.get());
            distinctColumns.putIfAbsent(key, present.get(i));
            levelKeys.add(key);
        }
        Map<String, FloorDesign> runs = new java.util.concurrent.ConcurrentHashMap<>();
        distinct.entrySet().parallelStream().forEach(e -> runs.put(e.getKey(),
                designFloor(e.getValue(), distinctColumns.get(e.getKey()))));
        for (String key : distinct.keySet()) {
            problems.addAll(runs.get(key).problems()); // in the plan's order, whatever order the floors finished in
        }
        // result keys: the layout id, or id@level when one layout runs with different columns
        Map<String, String> resultKeys = new LinkedHashMap<>();
        Map<String, Integer> perLayout = new HashMap<>();
        for (String key : distinct.keySet()) {
            perLayout.merge(distinct.get(key).id(), 1, Integer::sum);
        }
        List<AtLevel> levelRuns = new ArrayList<>();
        Map<String, String> levelFloors = new LinkedHashMap<>();
        Map<String, List<MemberResult>> members = new LinkedHashMap<>();
        for (int i = 0; i < levels.size(); i++) {
            String key = levelKeys.get(i);
            if (key == null) {
                levelRuns.add(null);
                continue;
            }
            FloorDesign fr = runs.get(key);
            levelRuns.add(new AtLevel(distinct.get(key), fr));
            String id = distinct.get(key).id();
            String resultKey = resultKeys.computeIfAbsent(key, k -> perLayout.get(id) == 1 ? id : id + "@" + levels.get(
                    levelKeys.indexOf(k)).name());
            members.putIfAbsent(resultKey, fr.members());
            levelFloors.put(levels.get(i).name(), resultKey);
        }
        double floorArea = 0;
        for (AtLevel fr : levelRuns) {
            if (fr != null) {
                floorArea += fr.design().loadedArea();
            }
        }
        List<ColumnResult> columns = new ColumnDesigner(plan, catalog, steel, method, levelRuns.stream()
                .map(fr -> fr == null ? null : new ColumnDesigner.LevelLoads(fr.design().columnLoads(),
                        fr.design().columnArea(), fr.design().columnL0(), fr.floor()))
                .toList(), problems).design();
        List<Equilibrium> eq = equilibrium(levelRuns, columns);
        return new TakedownResult(members, levelFloors, columns, eq, List.copyOf(problems), floorArea);
    }

    /** Applied loads per load case against the foundation reactions. */
    /** A level's floor layout and its design. */
    private record AtLevel(Floor floor, FloorDesign design) {
    }

    private List<Equilibrium> equilibrium(List<AtLevel> levelRuns, List<ColumnResult> columns) {
        double[] applied = new double[LoadCase.values().length];
        double[] slack = new double[LoadCase.values().length];
        for (AtLevel fr : levelRuns) {
            if (fr == null) {
                continue;
            }
            for (AreaLoad al : fr.floor().areaLoads()) {
                double area = fr.design().areaLoadAreas().getOrDefault(al.id(), 0.0);
                add(applied, components(al.values(), al.use(), null), area);
            }
            for (LineLoad ll : fr.floor().lineLoads()) {
                double len = 0;
                for (int k = 0; k + 1 < ll.path().size(); k++) {
                    len += ll.path().get(k).distance(ll.path().get(k + 1));
                }
                double[] q = components(ll.values(), LiveLoadUse.ORDINARY, null);
                add(applied, q, len);
                // the analysis works on the path snapped to its grid: each point may move by up to
                // half a step in x and in y, and pieces shorter than a step are not placed
                add(slack, q, 2 * GRID * ll.path().size());
            }
            for (PointLoadItem p : fr.floor().pointLoads()) {
                add(applied, components(p.values(), LiveLoadUse.ORDINARY, null), 1);
            }
            for (MemberResult m : fr.design().members()) {
                applied[LoadCase.D.ordinal()] += m.steelWeight();
            }
        }
        double[] reactions = new double[LoadCase.values().length];
        for (ColumnResult c : columns) {
            for (ColumnTier t : c.tiers()) {
                applied[LoadCase.D.ordinal()] += t.weight() * t.length();
            }
            for (int k = 0; k < reactions.length; k++) {
                reactions[k] += c.foundation()[k];
            }
        }
        List<Equilibrium> out = new ArrayList<>();
        for (LoadCase lc : LoadCase.values()) {
            Equilibrium e = new Equilibrium(lc.symbol(), applied[lc.ordinal()], reactions[lc.ordinal()],
                    Math.abs(slack[lc.ordinal()]));
            out.add(e);
            if (!e.holds()) {
                problems.add(Problem.error("equilibrium", "load case " + lc.symbol(), "", String.format(java.util.Locale.ROOT,
                        "load case %s: applied %.6g N but the foundations carry %.6g N (difference %.3g %%); see the"
                                + " other problems for load that does not reach a column",
                        lc.symbol(), e.applied(), e.reactions(), 100 * (e.reactions() - e.applied())
                                / Math.max(Math.abs(e.applied()), 1e-30))));
            }
        }
        return out;
    }

    private static void add(double[] perCase, double[] components, double scale) {
        double[] byCase = Component.byCase(components);
        for (int k = 0; k < perCase.length; k++) {
            perCase[k] += byCase[k] * scale;
        }
    }
}
