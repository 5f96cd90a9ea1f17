package org.baywright.geometry;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Member;
import org.baywright.plan.Opening;
import org.baywright.plan.Point;
import org.baywright.units.UnitSystem;
import org.baywright.plan.PointLoadItem;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.geom.util.PolygonExtracter;

/**
 * Tributary areas of a floor with one-way decks, and where its area, point and line loads go.
 *
 * <p>Method. The outlines of the slab edge, decks and openings are noded together on the tolerance grid
 * and cut into faces ({@link Partition}); each face inside the slab belongs to the first deck containing
 * it (overlaps are reported) and carries no load inside an opening. Each deck's region is rotated so
 * that the deck spans along the first axis; it is cut into strips across the span at every breakpoint,
 * and in each strip every piece of continuous deck is divided at the midpoints between neighbouring
 * supporting members, the deck beyond the outermost support of the piece going to that support
 * ({@link DeckLayout}). A member supports a deck when it is more than 1° off the deck's span
 * direction. The parts are trapezoids, so each member's area and its width profile
 * w(s) = chord along the span × |sin θ| are exact piecewise-linear functions. Area loads are the same
 * trapezoids intersected with the load outline (JTS overlay); point and line loads go to a member they
 * lie on, otherwise by the lever rule between the supports on either side along the span
 * ({@link LoadPlacement}).
 *
 * <p>Invariants checked before returning, each reported as a located {@link GeometryProblem} rather than
 * thrown: the members' areas plus the unsupported deck add up to the loaded area, each member's width
 * profile integrates to its area (both to a relative 1e-9), and no two members' tributary areas
 * overlap. Input polygons are snapped to the tolerance grid and validated first; a self-intersecting
 * polygon is repaired and reported, a degenerate one ignored and reported.
 *
 * <p>Known limitations:
 * <ul>
 *   <li>The deck is one-way everywhere: it never carries load perpendicular to its span. Deck beyond the
 *       end of the supporting members, across the span, is reported as unsupported.</li>
 *   <li>A member supports deck only along its centre line; its width is not subtracted.</li>
 *   <li>Where decks overlap the earlier deck in the list wins.</li>
 *   <li>Line loads between two non-parallel supports are delivered with lever fractions linear on small
 *       pieces (accuracy 1e-6); totals are exact.</li>
 * </ul>
 */
public final class TributaryAnalysis {
    /**
     * Sine of the angle below which three outline vertices count as on one line (the middle one is
     * dropped): far below any angle a plan is drawn with, just above the rounding of coordinates
     * snapped to the 1e-6 m grid.
     */
    private static final double COLLINEAR = 1e-12;


    /** A member within this angle of a deck's span direction does not support that deck. */
    public static final double PARALLEL_ANGLE_DEGREES = 1.0;
    /** Relative accuracy of the coverage invariants. */
    public static final double COVERAGE_ACCURACY = 1e-9;
    private static final double DEFAULT_TOLERANCE = 1e-6;
    private static final double SIN_PARALLEL = Math.sin(Math.toRadians(PARALLEL_ANGLE_DEGREES));

    private TributaryAnalysis() {
    }

    /**
     * Tributary areas of one floor.
     *
     * @param floor the floor: slab edge, decks, openings and loads (its members are used when
     *     {@code members} is null)
     * @param members the floor's framing, already expanded (infill beams as members)
     * @param tolerance distance, m, below which points coincide (coordinates are snapped to this grid),
     *     e.g. 1e-6
     */
    public static FloorTributary compute(Floor floor, List<Member> members, double tolerance) {
        return compute(floor, members, tolerance, UnitSystem.SI);
    }

    /**
     * Tributary areas of one floor, with the problems' quantities written in {@code units} (the plan's
     * unit system: what the user reads).
     */
    public static FloorTributary compute(Floor floor, List<Member> members, double tolerance, UnitSystem units) {
        return new Run(floor, members, tolerance, units).result();
    }

    /** One computation: mutable working state, discarded after {@link #result()}. */
    private static final class Run {
        private final Floor floor;
        /** The plan's unit system: the quantities in problems are written in it. */
        private final UnitSystem units;
        private final List<GeometryProblem> problems = new ArrayList<>();
        private final double tol;
        private final Shapes shapes;
        private final List<PlacedMember> placed = new ArrayList<>();
        private final List<DeckContext> decks = new ArrayList<>();
        // per member
        private double[] area;
        private WidthProfile[] widths;
        private List<List<org.baywright.plan.Polygon>> drawings;
        private List<Map<String, WidthProfile>> loadWidths;
        // per laid-out deck, aligned with decks: the member trapezoids, by member, in the deck's frame
        private final List<Map<Integer, List<Trapezoid>>> deckTraps = new ArrayList<>();
        /** Deck whose load goes nowhere: unsupported, or on a deck that could not be laid out, m². */
        private double undeliveredArea;
        private Geometry decksUnion;
        private double loadedArea;
        private Geometry loadedUnion;
        private final Map<String, Double> areaLoadAreas = new java.util.LinkedHashMap<>();
        /** Per deck, the longest span of each pair of supports and overhang of each support and side. */
        private final List<DeckSpan> deckSpans = new ArrayList<>();

        /** An area to nine significant figures in the plan's unit (an invariant check: the digits matter). */
        private String exact(double squareMetres) {
            return String.format(Locale.ROOT, "%.9g %s", units.floorArea().fromSi(squareMetres), units.floorArea().symbol());
        }

        Run(Floor floor, List<Member> members, double tolerance, UnitSystem units) {
            this.floor = floor;
            this.units = units;
            double t = tolerance;
            if (!(t > 0) || !Double.isFinite(t)) {
                problems.add(new GeometryProblem(GeometryProblem.BAD_INPUT, floor.id(),
                        "tolerance " + tolerance + " m is not a positive number; " + units.toleranceText(DEFAULT_TOLERANCE)
                                + " is used", List.of()));
                t = DEFAULT_TOLERANCE;
            }
            this.tol = t;
            this.shapes = new Shapes(t, units);
            acceptMembers(members != null ? members : floor.members());
        }

        FloorTributary result() {
            int n = placed.size();
            area = new double[n];
            widths = new WidthProfile[n];
            drawings = new ArrayList<>();
            loadWidths = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                widths[i] = new WidthProfile();
                drawings.add(new ArrayList<>());
                loadWidths.add(new LinkedHashMap<>());
            }
            guard("decks", floor.id(), this::layDecks);
            guard("deck spans", floor.id(), this::measureSpans);
            guard("area loads", floor.id(), this::areaLoads);
            Map<String, List<LoadShare>> pointShares = new LinkedHashMap<>();
            Map<String, List<LineShare>> lineShares = new LinkedHashMap<>();
            LoadPlacement placement = new LoadPlacement(placed, decks, tol, problems, units);
            for (PointLoadItem p : floor.pointLoads()) {
                pointShares.put(p.id(), List.of());
                guard("point load", p.id(), () -> pointShares.put(p.id(), placement.point(p, shapes.snap(p.at()))));
            }
            for (LineLoad l : floor.lineLoads()) {
                lineShares.put(l.id(), List.of());
                List<Point> path = l.path().stream().map(shapes::snap).toList();
                guard("line load", l.id(), () -> lineShares.put(l.id(), placement.line(l, path)));
            }

            Map<String, MemberTributary> out = new LinkedHashMap<>();
            double tributary = 0;
            double widthSum = 0;
            for (PlacedMember m : placed) {
                int i = m.index();
                List<WidthSegment> w = widths[i].build();
                Map<String, List<WidthSegment>> byLoad = new LinkedHashMap<>();
                loadWidths.get(i).forEach((id, prof) -> {
                    List<WidthSegment> segs = prof.build();
                    if (!segs.isEmpty()) {
                        byLoad.put(id, segs);
                    }
                });
                MemberTributary mt = new MemberTributary(m.id(), area[i], drawings.get(i), w, byLoad);
                out.put(m.id(), mt);
                tributary += area[i];
                double integral = mt.widthIntegral();
                widthSum += integral;
                if (Math.abs(integral - area[i]) > COVERAGE_ACCURACY * Math.max(area[i], Math.max(loadedArea, tol * tol))) {
                    problems.add(new GeometryProblem(GeometryProblem.COVERAGE, m.id(), String.format(Locale.ROOT,
                            "the width profile of %s integrates to %s but its tributary area is %s",
                            m.id(), exact(integral), exact(area[i])), List.of(m.a(), m.b())));
                }
            }
            double scale = Math.max(loadedArea, tol * tol);
            if (Math.abs(tributary + undeliveredArea - loadedArea) > COVERAGE_ACCURACY * scale) {
                problems.add(new GeometryProblem(GeometryProblem.COVERAGE, floor.id(), String.format(Locale.ROOT,
                        "tributary areas %s plus undelivered deck %s do not add up to the loaded area %s",
                        exact(tributary), exact(undeliveredArea), exact(loadedArea)), List.of()));
            }
            if (Math.abs(widthSum - tributary) > COVERAGE_ACCURACY * scale) {
                problems.add(new GeometryProblem(GeometryProblem.COVERAGE, floor.id(), String.format(Locale.ROOT,
                        "width profiles integrate to %s but the tributary areas add up to %s",
                        exact(widthSum), exact(tributary)), List.of()));
            }
            return new FloorTributary(out, loadedArea, tributary, problems, pointShares, lineShares, areaLoadAreas, deckSpans);
        }

        /** Runs a step; an unexpected failure becomes a located problem instead of an exception. */
        private void guard(String what, String id, Runnable step) {
            try {
                step.run();
            } catch (RuntimeException e) {
                problems.add(new GeometryProblem(GeometryProblem.INTERNAL, id,
                        "the geometry of " + what + " " + id + " could not be processed (" + e + "); it is skipped",
                        List.of()));
            }
        }

        private void acceptMembers(List<Member> members) {
            Set<String> ids = new HashSet<>();
            for (Member m : members) {
                if (m == null) {
                    continue;
                }
                String id = String.valueOf(m.id());
                if (!ids.add(id)) {
                    problems.add(new GeometryProblem(GeometryProblem.DUPLICATE_MEMBER, id,
                            "member id " + id + " is used twice; the second member is ignored", ends(m)));
                    continue;
                }
                if (m.start() == null || m.end() == null) {
                    problems.add(new GeometryProblem(GeometryProblem.ZERO_LENGTH_MEMBER, id,
                            "member " + id + " has a missing end point; it is ignored", ends(m)));
                    continue;
                }
                Point a = shapes.snap(m.start());
                Point b = shapes.snap(m.end());
                double length = a.distance(b);
                if (length <= tol) {
                    problems.add(new GeometryProblem(GeometryProblem.ZERO_LENGTH_MEMBER, id,
                            "member " + id + " has zero length (its ends are within " + units.toleranceText(tol)
                                    + "); it is ignored",
                            List.of(a)));
                    continue;
                }
                placed.add(new PlacedMember(placed.size(), id, a, b, length));
            }
        }

        private static List<Point> ends(Member m) {
            List<Point> out = new ArrayList<>();
            if (m.start() != null) {
                out.add(m.start());
            }
            if (m.end() != null) {
                out.add(m.end());
            }
            return out;
        }

        // ------------------------------------------------------------ decks

        private record DeckInput(String id, Geometry outline, double angle) {
        }

        private void layDecks() {
            Geometry slab = null;
            // a slab edge with no vertices is one not drawn yet (a new plan before its grid): nothing to check
            boolean noSlab = floor.slabEdge() == null || floor.slabEdge().vertices().isEmpty();
            if (!noSlab) {
                slab = shapes.polygon(floor.slabEdge(), floor.id(), "slab edge of floor", problems);
            }
            List<Geometry> openings = new ArrayList<>();
            for (Opening o : floor.openings()) {
                Geometry g = shapes.polygon(o.outline(), o.id(), "opening", problems);
                if (g != null) {
                    openings.add(g);
                }
            }
            List<DeckInput> inputs = new ArrayList<>();
            if (floor.decks().isEmpty()) {
                if (slab != null) {
                    inputs.add(new DeckInput(floor.id(), slab, 0.0));
                } else if (noSlab && !(floor.members().isEmpty() && floor.infills().isEmpty())) {
                    problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, floor.id(),
                            "floor " + floor.id() + " has neither a slab edge nor decks; nothing is loaded", List.of()));
                }
            }
            for (Deck d : floor.decks()) {
                if (!Double.isFinite(d.spanAngle())) {
                    problems.add(new GeometryProblem(GeometryProblem.BAD_INPUT, d.id(),
                            "deck " + d.id() + " has no usable span angle (" + d.spanAngle() + "); it is ignored",
                            d.outline() == null ? List.of() : d.outline().vertices()));
                    continue;
                }
                Geometry g = shapes.polygon(d.outline(), d.id(), "deck", problems);
                if (g != null) {
                    inputs.add(new DeckInput(d.id(), g, d.spanAngle()));
                }
            }

            Partition parts = Partition.of(shapes, slab, inputs.stream().map(DeckInput::outline).toList(), openings);
            decksUnion = parts.decked();
            loadedArea = parts.loadedArea();
            loadedUnion = parts.loaded();
            for (Partition.Overlap o : parts.overlaps()) {
                DeckInput first = inputs.get(o.first());
                DeckInput later = inputs.get(o.later());
                problems.add(new GeometryProblem(GeometryProblem.OVERLAP, later.id(), String.format(Locale.ROOT,
                        "deck %s overlaps deck %s by %s; the overlap is carried once, by %s's span",
                        later.id(), first.id(), units.areaText(o.area().getArea()), first.id()), Shapes.outline(o.area())));
            }
            for (int i = 0; i < inputs.size(); i++) {
                DeckInput d = inputs.get(i);
                Geometry region = parts.region(i);
                if (region.isEmpty()) {
                    continue;
                }
                int before = problems.size();
                try {
                    layDeck(d, region);
                } catch (RuntimeException e) {
                    problems.subList(before, problems.size()).clear();
                    problems.add(new GeometryProblem(GeometryProblem.INTERNAL, d.id(),
                            "the tributary areas of deck " + d.id() + " could not be computed (" + e
                                    + "); its load is not delivered", Shapes.outline(region)));
                    undeliveredArea += region.getArea();
                }
            }
        }

        /** The members that may carry a deck spanning in {@code frame}: those not parallel to its span. */
        private List<DeckLayout.Support> candidates(SpanFrame frame) {
            List<DeckLayout.Support> candidates = new ArrayList<>();
            for (PlacedMember m : placed) {
                double u1 = frame.u(m.a());
                double v1 = frame.v(m.a());
                double u2 = frame.u(m.b());
                double v2 = frame.v(m.b());
                if (Math.abs(v2 - v1) / m.length() > SIN_PARALLEL) {
                    candidates.add(new DeckLayout.Support(m.index(), FrameLine.through(u1, v1, u2, v2)));
                }
            }
            return candidates;
        }

        /**
         * The spans and overhangs of every laid-out deck. Decks with the same span direction that meet
         * are one continuous deck for this purpose (a deck drawn in two outlines does not end where they
         * meet): they are laid out together and each span or overhang is given to the deck holding its
         * middle. A deck alone in its direction keeps its own layout.
         */
        private void measureSpans() {
            Map<Double, List<DeckContext>> byAngle = new LinkedHashMap<>();
            for (DeckContext c : decks) {
                double a = c.spanAngle() % 360.0;
                byAngle.computeIfAbsent(a < 0 ? a + 360.0 : a + 0.0, k -> new ArrayList<>()).add(c);
            }
            for (List<DeckContext> group : byAngle.values()) {
                if (group.size() == 1) {
                    deckSpans.addAll(spans(group.get(0), group.get(0).layout(), group));
                    continue;
                }
                try {
                    DeckContext first = group.get(0);
                    Geometry union = shapes.frameUnion(group.stream().map(DeckContext::region).toList());
                    DeckLayout together = DeckLayout.build(union, candidates(first.frame()), tol);
                    deckSpans.addAll(spans(first, together, group));
                } catch (RuntimeException e) {
                    for (DeckContext c : group) {
                        deckSpans.addAll(spans(c, c.layout(), List.of(c)));
                    }
                }
            }
        }

        private void layDeck(DeckInput d, Geometry region) {
            SpanFrame frame = SpanFrame.ofDegrees(d.angle());
            Geometry inFrame = frame.toFrame(region, shapes.frameFactory);
            List<DeckLayout.Support> candidates = candidates(frame);
            DeckLayout layout = DeckLayout.build(inFrame, candidates, tol);
            DeckContext ctx = new DeckContext(d.id(), d.angle(), frame, layout, inFrame, tol);

            // everything is worked out first and committed at the end, so that a failure leaves no half deck
            Map<Integer, List<Trapezoid>> byMember = new LinkedHashMap<>();
            List<Geometry> unsupported = new ArrayList<>();
            double deckUnsupported = 0;
            for (Trapezoid t : layout.trapezoids) {
                if (t.member() < 0) {
                    deckUnsupported += t.area();
                    Geometry g = t.toJts(shapes.frameFactory);
                    if (g != null) {
                        unsupported.add(g);
                    }
                } else {
                    byMember.computeIfAbsent(t.member(), k -> new ArrayList<>()).add(t);
                }
            }
            List<GeometryProblem> found = new ArrayList<>();
            for (int[] pair : layout.coincident) {
                PlacedMember a = placed.get(pair[0]);
                PlacedMember b = placed.get(pair[1]);
                found.add(new GeometryProblem(GeometryProblem.COINCIDENT_MEMBERS, a.id(), "members " + a.id()
                        + " and " + b.id() + " lie on top of each other; the deck between them is split at their line",
                        List.of(a.a(), a.b())));
            }
            reportUnsupported(ctx, unsupported, candidates.isEmpty(), found);

            Map<Integer, Geometry> unions = new LinkedHashMap<>();
            Map<Integer, List<org.baywright.plan.Polygon>> drawn = new LinkedHashMap<>();
            for (Map.Entry<Integer, List<Trapezoid>> e : byMember.entrySet()) {
                List<Geometry> polys = new ArrayList<>();
                for (Trapezoid t : e.getValue()) {
                    Geometry g = t.toJts(shapes.frameFactory);
                    if (g != null) {
                        polys.add(g);
                    }
                }
                if (polys.isEmpty()) {
                    continue;
                }
                Geometry u = shapes.frameUnion(polys);
                unions.put(e.getKey(), u);
                drawn.put(e.getKey(), Drawing.polygons(u, polys, frame));
            }
            checkOverlaps(unions, byMember, frame, found);

            for (Map.Entry<Integer, List<Trapezoid>> e : byMember.entrySet()) {
                PlacedMember m = placed.get(e.getKey());
                double factor = ctx.crossFactor(m);
                for (Trapezoid t : e.getValue()) {
                    area[m.index()] += t.area();
                    widths[m.index()].add(ctx.along(m, t.va()), ctx.along(m, t.vb()), t.chordA() * factor,
                            t.chordB() * factor);
                }
            }
            drawn.forEach((i, polys) -> drawings.get(i).addAll(polys));
            undeliveredArea += deckUnsupported;
            decks.add(ctx);
            deckTraps.add(byMember);
            problems.addAll(found);
        }

        /**
         * The spans and overhangs of {@code layout} (in {@code frame}'s deck frame), each given to the deck
         * of {@code owners} holding its middle; per deck the longest of each pair of members (span) and
         * of each member and side (overhang), in the order first found.
         */
        private List<DeckSpan> spans(DeckContext frame, DeckLayout layout, List<DeckContext> owners) {
            Map<String, List<DeckLayout.Reach>> byKey = new LinkedHashMap<>();
            Map<String, String> owner = new LinkedHashMap<>();
            for (DeckLayout.Reach r : layout.reaches()) {
                String deck = owners.get(0).deckId();
                if (owners.size() > 1) {
                    double u = 0.5 * (r.ua() + r.ub());
                    for (DeckContext c : owners) {
                        if (c.layout().locate(u, r.v()) != null) {
                            deck = c.deckId();
                            break;
                        }
                    }
                }
                String key = deck + "|" + r.a() + "|" + r.b() + "|" + r.side() + "|" + r.backspan();
                byKey.computeIfAbsent(key, k -> new ArrayList<>()).add(r);
                owner.put(key, deck);
            }
            List<DeckSpan> out = new ArrayList<>();
            for (Map.Entry<String, List<DeckLayout.Reach>> e : byKey.entrySet()) {
                List<DeckLayout.Reach> all = e.getValue();
                double longest = all.stream().mapToDouble(DeckLayout.Reach::length).max().orElse(0);
                // of the places where it is (within the tolerance) longest, the middle one: a constant
                // span is drawn half-way along its members, not at a corner
                List<DeckLayout.Reach> at = new ArrayList<>(all.stream().filter(r -> r.length() >= longest - tol).toList());
                at.sort(java.util.Comparator.comparingDouble(DeckLayout.Reach::v));
                DeckLayout.Reach r = at.get(at.size() / 2);
                Point from = frame.frame().toPlan(r.ua(), r.v());
                Point to = frame.frame().toPlan(r.ub(), r.v());
                out.add(new DeckSpan(owner.get(e.getKey()), r.b() < 0, longest, from, to, placed.get(r.a()).id(),
                        r.b() < 0 ? "" : placed.get(r.b()).id(), r.backspan()));
            }
            return out;
        }

        private void reportUnsupported(DeckContext ctx, List<Geometry> parts, boolean noSupports,
                List<GeometryProblem> found) {
            if (parts.isEmpty()) {
                return;
            }
            Geometry all = shapes.frameUnion(parts);
            for (Object o : PolygonExtracter.getPolygons(all)) {
                Geometry part = (Geometry) o;
                if (!shapes.substantial(part)) {
                    continue;
                }
                Geometry plan = ctx.frame().toPlan(part, shapes.frameFactory);
                String why = noSupports
                        ? "no member crosses its span direction (" + ctx.spanAngle() + "°)"
                        : "no member supports it on either side along its span (" + ctx.spanAngle() + "°)";
                found.add(new GeometryProblem(GeometryProblem.UNSUPPORTED_DECK, ctx.deckId(), String.format(Locale.ROOT,
                        "%s of deck %s is unsupported: %s; its load is not delivered", units.areaText(part.getArea()),
                        ctx.deckId(), why), Shapes.outline(plan)));
            }
        }

        /**
         * Reports members whose tributary areas overlap. A pair whose trapezoids are provably apart
         * ({@link Trapezoid#apart}) cannot overlap and is not intersected; any other pair with touching envelopes
         * is intersected with JTS and reported when the overlap is substantial.
         */
        private void checkOverlaps(Map<Integer, Geometry> unions, Map<Integer, List<Trapezoid>> traps, SpanFrame frame,
                List<GeometryProblem> found) {
            List<Map.Entry<Integer, Geometry>> list = new ArrayList<>(unions.entrySet());
            for (int i = 0; i < list.size(); i++) {
                Envelope ei = list.get(i).getValue().getEnvelopeInternal();
                for (int j = i + 1; j < list.size(); j++) {
                    Geometry gj = list.get(j).getValue();
                    if (!ei.intersects(gj.getEnvelopeInternal())) {
                        continue;
                    }
                    if (Trapezoid.apart(traps.get(list.get(i).getKey()), traps.get(list.get(j).getKey()))) {
                        continue;
                    }
                    Geometry both = shapes.frameIntersection(list.get(i).getValue(), gj);
                    if (shapes.substantial(both)) {
                        PlacedMember a = placed.get(list.get(i).getKey());
                        PlacedMember b = placed.get(list.get(j).getKey());
                        found.add(new GeometryProblem(GeometryProblem.OVERLAP, a.id(), String.format(Locale.ROOT,
                                "the tributary areas of members %s and %s overlap by %s", a.id(), b.id(),
                                units.areaText(both.getArea())), Shapes.outline(frame.toPlan(both, shapes.frameFactory))));
                    }
                }
            }
        }

        // ------------------------------------------------------------ area loads

        private void areaLoads() {
            for (AreaLoad load : floor.areaLoads()) {
                int before = problems.size();
                try {
                    areaLoad(load);
                } catch (RuntimeException e) {
                    problems.subList(before, problems.size()).clear();
                    problems.add(new GeometryProblem(GeometryProblem.INTERNAL, load.id(),
                            "area load " + load.id() + " could not be intersected with the tributary areas (" + e
                                    + "); it is skipped", load.outline() == null ? List.of() : load.outline().vertices()));
                }
            }
        }

        private void areaLoad(AreaLoad load) {
            Geometry g = shapes.polygon(load.outline(), load.id(), "area load", problems);
            if (g == null) {
                return;
            }
            Geometry off = decksUnion == null ? g : shapes.difference(g, decksUnion);
            areaLoadAreas.put(load.id(), loadedUnion == null ? 0.0 : shapes.frameIntersection(g, loadedUnion).getArea());
            if (shapes.substantial(off)) {
                problems.add(new GeometryProblem(GeometryProblem.AREA_LOAD_OFF_DECK, load.id(), String.format(Locale.ROOT,
                        "%s of area load %s lies outside the decks and slab edge; that part is not delivered",
                        units.areaText(off.getArea()), load.id()), Shapes.outline(off)));
            }
            for (int d = 0; d < decks.size(); d++) {
                DeckContext ctx = decks.get(d);
                Geometry inFrame = ctx.frame().toFrame(g, shapes.frameFactory);
                Envelope env = inFrame.getEnvelopeInternal();
                PreparedGeometry prepared = PreparedGeometryFactory.prepare(inFrame);
                for (Map.Entry<Integer, List<Trapezoid>> e : deckTraps.get(d).entrySet()) {
                    PlacedMember m = placed.get(e.getKey());
                    double factor = ctx.crossFactor(m);
                    for (Trapezoid t : e.getValue()) {
                        Geometry tg = t.toJts(shapes.frameFactory);
                        if (tg == null || !env.intersects(tg.getEnvelopeInternal()) || !prepared.intersects(tg)) {
                            continue;
                        }
                        WidthProfile prof = loadWidths.get(m.index()).computeIfAbsent(load.id(), k -> new WidthProfile());
                        if (prepared.contains(tg)) {
                            prof.add(ctx.along(m, t.va()), ctx.along(m, t.vb()), t.chordA() * factor,
                                    t.chordB() * factor);
                            continue;
                        }
                        Geometry part = shapes.frameIntersection(tg, inFrame);
                        for (ChordProfile.Piece p : ChordProfile.of(part)) {
                            prof.add(ctx.along(m, p.va()), ctx.along(m, p.vb()), p.ca() * factor, p.cb() * factor);
                        }
                    }
                }
            }
        }
    }

    /** Turns a member's tributary area into simple polygons for drawing. */
    static final class Drawing {
        private Drawing() {
        }

        static List<org.baywright.plan.Polygon> polygons(Geometry union, List<Geometry> parts, SpanFrame frame) {
            List<org.baywright.plan.Polygon> out = new ArrayList<>();
            for (Object o : PolygonExtracter.getPolygons(union)) {
                org.locationtech.jts.geom.Polygon p = (org.locationtech.jts.geom.Polygon) o;
                if (p.getNumInteriorRing() == 0) {
                    out.add(plan(p.getExteriorRing().getCoordinates(), frame));
                } else {
                    // a polygon with holes cannot be drawn as one simple polygon: draw its trapezoids
                    for (Geometry t : parts) {
                        if (p.covers(t.getInteriorPoint())) {
                            out.add(plan(t.getCoordinates(), frame));
                        }
                    }
                }
            }
            return out;
        }

        private static org.baywright.plan.Polygon plan(Coordinate[] ring, SpanFrame frame) {
            List<Point> pts = new ArrayList<>();
            for (int i = 0; i + 1 < ring.length; i++) {
                pts.add(frame.toPlan(ring[i].x, ring[i].y));
            }
            pts = withoutStraightVertices(pts);
            org.baywright.plan.Polygon poly = new org.baywright.plan.Polygon(pts);
            if (poly.signedArea() < 0) {
                List<Point> rev = new ArrayList<>(pts);
                java.util.Collections.reverse(rev);
                poly = new org.baywright.plan.Polygon(rev);
            }
            return poly;
        }

        /** Drops vertices where the outline goes straight on. */
        static List<Point> withoutStraightVertices(List<Point> pts) {
            List<Point> cur = new ArrayList<>(pts);
            boolean changed = true;
            while (changed && cur.size() > 3) {
                changed = false;
                for (int i = 0; i < cur.size() && cur.size() > 3; i++) {
                    Point a = cur.get((i + cur.size() - 1) % cur.size());
                    Point b = cur.get(i);
                    Point c = cur.get((i + 1) % cur.size());
                    double ax = b.x() - a.x();
                    double ay = b.y() - a.y();
                    double bx = c.x() - b.x();
                    double by = c.y() - b.y();
                    double cross = ax * by - ay * bx;
                    double dot = ax * bx + ay * by;
                    double la = Math.hypot(ax, ay);
                    double lb = Math.hypot(bx, by);
                    if (la == 0 || lb == 0 || Math.abs(cross) <= COLLINEAR * la * lb && dot > 0) {
                        cur.remove(i);
                        changed = true;
                        i--;
                    }
                }
            }
            return cur;
        }
    }
}
