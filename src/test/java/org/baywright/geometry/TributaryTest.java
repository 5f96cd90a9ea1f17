package org.baywright.geometry;

import static org.baywright.geometry.FloorSketch.FT;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.junit.jupiter.api.Test;

/**
 * Behaviour of {@link TributaryAnalysis}: invariants on random bays (in any orientation), the statics
 * of the lever rule, located problems for bad geometry, and no exceptions on arbitrary input.
 *
 * <p>Expected values: the half-way rule (common practice: a beam carries half the spacing to each
 * neighbour, CHECK-VALUES §9 rule 1), statics (the shares of a load add up to it and have the same
 * resultant position), and hand calculations written next to each case.
 */
class TributaryTest {

    private static final double TOL = 1e-6;
    private static final double SQFT = FT * FT;

    // ------------------------------------------------------------------ random regular bays

    /** A rectangular bay with girders along y = 0 and y = depth and beams at xs, turned by angle°. */
    record Bay(double width, double depth, double[] xs, double angle) {
        Point at(double x, double y) {
            if (angle == 0) {
                return new Point(x, y);
            }
            double r = Math.toRadians(angle);
            return new Point(x * Math.cos(r) - y * Math.sin(r), x * Math.sin(r) + y * Math.cos(r));
        }

        List<Member> members() {
            List<Member> out = new ArrayList<>();
            out.add(new Member("G-S", MemberKind.GIRDER, at(0, 0), at(width, 0), Optional.empty()));
            out.add(new Member("G-N", MemberKind.GIRDER, at(0, depth), at(width, depth), Optional.empty()));
            for (int i = 0; i < xs.length; i++) {
                out.add(new Member("B-" + i, MemberKind.BEAM, at(xs[i], 0), at(xs[i], depth), Optional.empty()));
            }
            return out;
        }

        Floor floor(List<PointLoadItem> points, List<LineLoad> lines) {
            return floor(points, lines, List.of());
        }

        Floor floor(List<PointLoadItem> points, List<LineLoad> lines, List<AreaLoad> areas) {
            Polygon slab = new Polygon(List.of(at(0, 0), at(width, 0), at(width, depth), at(0, depth)));
            return new Floor("F", "bay", false, slab, List.of(new Deck("DK", slab, angle)), members(), List.of(),
                    List.of(), areas, lines, points);
        }

        /** An area load over x0…x1, y0…y1 of the bay (turned with it). */
        AreaLoad load(double x0, double y0, double x1, double y1) {
            return new AreaLoad("A", new Polygon(List.of(at(x0, y0), at(x1, y0), at(x1, y1), at(x0, y1))),
                    LoadValues.ZERO, LiveLoadUse.ORDINARY);
        }

        /** Hand rule: the part of beam i's strip (half spacing each side, full depth) inside x0…x1, y0…y1. */
        double loadOn(int i, double x0, double y0, double x1, double y1) {
            double lo = i == 0 ? xs[0] : (xs[i - 1] + xs[i]) / 2;
            double hi = i == xs.length - 1 ? xs[i] : (xs[i] + xs[i + 1]) / 2;
            double dx = Math.max(0, Math.min(hi, x1) - Math.max(lo, x0));
            double dy = Math.max(0, Math.min(depth, y1) - Math.max(0, y0));
            return dx * dy;
        }

        /** Half the spacing to each neighbour; the edge beams have one neighbour (hand rule). */
        double trib(int i) {
            double left = i == 0 ? 0 : (xs[i] - xs[i - 1]) / 2;
            double right = i == xs.length - 1 ? 0 : (xs[i + 1] - xs[i]) / 2;
            return left + right;
        }

        /** Allowed area error: exact for quarter turns; otherwise snapping to the 1e-6 m grid moves edges. */
        double areaSlack(double size) {
            return angle % 90 == 0 ? 1e-9 * size : 1e-9 * size + 4 * TOL * (width + depth);
        }
    }

    @Provide
    Arbitrary<Bay> bays() {
        Arbitrary<Integer> mm = Arbitraries.integers().between(2000, 20000);
        Arbitrary<Double> angle = Arbitraries.oneOf(Arbitraries.of(0.0, 90.0, 180.0, 270.0, -90.0),
                Arbitraries.doubles().between(-360, 360));
        Arbitrary<List<Integer>> inner = Arbitraries.integers().between(1, 999).list().ofMaxSize(6).uniqueElements();
        return Combinators.combine(mm, mm, inner, angle).as((w, d, in, a) -> {
            double width = w / 1000.0;
            double[] xs = new double[in.size() + 2];
            xs[0] = 0;
            xs[1] = width;
            for (int i = 0; i < in.size(); i++) {
                xs[i + 2] = Math.round(in.get(i) * w / 1000.0) / 1000.0; // a mm position inside the bay
            }
            double[] sorted = Arrays.stream(xs).sorted().distinct().toArray();
            return new Bay(width, d / 1000.0, sorted, a);
        });
    }

    @Property(tries = 200)
    void regularBaysAreCoveredByHalfSpacingStrips(@ForAll("bays") Bay bay, @ForAll("unit") double ax0,
            @ForAll("unit") double ay0, @ForAll("unit") double ax1, @ForAll("unit") double ay1) {
        // an area load over a random rectangle, part of it on the bay (the bay spans 0…1 of these fractions)
        // on the mm grid, so that snapping to the analysis' 1e-6 m grid changes nothing
        double lx0 = mm((Math.min(ax0, ax1) * 1.5 - 0.25) * bay.width());
        double lx1 = mm((Math.max(ax0, ax1) * 1.5 - 0.25) * bay.width());
        double ly0 = mm((Math.min(ay0, ay1) * 1.5 - 0.25) * bay.depth());
        double ly1 = mm((Math.max(ay0, ay1) * 1.5 - 0.25) * bay.depth());
        boolean withLoad = lx1 - lx0 > 0.01 && ly1 - ly0 > 0.01;
        FloorTributary t = TributaryAnalysis.compute(bay.floor(List.of(), List.of(),
                withLoad ? List.of(bay.load(lx0, ly0, lx1, ly1)) : List.of()), bay.members(), TOL);
        double total = bay.width() * bay.depth();
        List<org.junit.jupiter.api.function.Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(List.of(), t.problems().stream()
                .filter(p -> !p.kind().equals(GeometryProblem.AREA_LOAD_OFF_DECK)).toList()));
        checks.add(() -> assertEquals(total, t.loadedArea(), bay.areaSlack(total)));
        checks.add(() -> assertEquals(t.loadedArea(), t.tributaryArea(), 1e-9 * total));
        checks.add(() -> assertEquals(0.0, t.members().get("G-S").area()));
        checks.add(() -> assertEquals(0.0, t.members().get("G-N").area()));
        for (int i = 0; i < bay.xs().length; i++) {
            MemberTributary m = t.members().get("B-" + i);
            double expected = bay.trib(i) * bay.depth();
            checks.add(() -> assertEquals(expected, m.area(), bay.areaSlack(total), m.memberId()));
            checks.add(() -> assertEquals(m.area(), m.widthIntegral(), 1e-9 * total, m.memberId() + " ∫w ds"));
            if (withLoad) {
                double onBeam = bay.loadOn(i, lx0, ly0, lx1, ly1);
                checks.add(() -> assertEquals(onBeam,
                        MemberTributary.integral(m.areaLoadWidths().getOrDefault("A", List.of())),
                        bay.areaSlack(total) + 1e-9 * total, m.memberId() + " area load"));
            }
            if (bay.angle() % 90 == 0) {
                int k = i;
                checks.add(() -> Close.segments(List.of(new WidthSegment(0, bay.depth(), bay.trib(k), bay.trib(k))),
                        m.widths()));
            }
        }
        assertAll(checks);
    }

    @Property(tries = 200)
    void pointLoadSharesHaveTheLoadsResultant(@ForAll("bays") Bay bay, @ForAll("unit") double fx,
            @ForAll("unit") double fy) {
        Point p = bay.at(fx * bay.width(), fy * bay.depth());
        FloorTributary t = TributaryAnalysis.compute(
                bay.floor(List.of(new PointLoadItem("P", p, LoadValues.ZERO)), List.of()), bay.members(), TOL);
        List<LoadShare> shares = t.pointShares().get("P");
        double sum = 0;
        double x = 0;
        double y = 0;
        for (LoadShare s : shares) {
            Point at = pointOn(bay.members(), s.memberId(), s.s());
            sum += s.fraction();
            x += s.fraction() * at.x();
            y += s.fraction() * at.y();
        }
        assertEquals(List.of(), t.problems());
        assertEquals(1.0, sum, 1e-12);
        // statics: the shares' resultant acts where the load acts (to the snapping of the grid)
        assertEquals(p.x(), x, 4 * TOL);
        assertEquals(p.y(), y, 4 * TOL);
        assertTrue(shares.size() <= 2);
    }

    @Property(tries = 200)
    void lineLoadSharesHaveTheLoadsTotalAndResultant(@ForAll("bays") Bay bay, @ForAll("unit") double x0,
            @ForAll("unit") double y0, @ForAll("unit") double x1, @ForAll("unit") double y1) {
        Point a = bay.at(x0 * bay.width(), y0 * bay.depth());
        Point b = bay.at(x1 * bay.width(), y1 * bay.depth());
        double length = a.distance(b);
        FloorTributary t = TributaryAnalysis.compute(bay.floor(List.of(),
                List.of(new LineLoad("W", List.of(a, b), LoadValues.ZERO))), bay.members(), TOL);
        if (length <= TOL) {
            assertEquals(1, t.problems(GeometryProblem.DEGENERATE_LINE).size());
            return;
        }
        double force = 0;
        double mx = 0;
        double my = 0;
        for (LineShare s : t.lineShares().get("W")) {
            force += s.force(1.0);
            Point c = centroid(bay.members(), s);
            mx += s.force(1.0) * c.x();
            my += s.force(1.0) * c.y();
        }
        assertEquals(List.of(), t.problems());
        assertEquals(length, force, 1e-9 * length + 4 * TOL);
        // the resultant of the shares acts at the middle of the line (statics of the lever rule)
        assertEquals((a.x() + b.x()) / 2, mx / force, 8 * TOL);
        assertEquals((a.y() + b.y()) / 2, my / force, 8 * TOL);
    }

    @Provide
    Arbitrary<Double> unit() {
        return Arbitraries.integers().between(0, 1000).map(i -> i / 1000.0);
    }

    private static double mm(double x) {
        return Math.round(x * 1000) / 1000.0;
    }

    private static Point pointOn(List<Member> members, String id, double s) {
        Member m = members.stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
        double t = s / m.length();
        return new Point(m.start().x() + t * (m.end().x() - m.start().x()),
                m.start().y() + t * (m.end().y() - m.start().y()));
    }

    /** Where a share's force acts: its point, or the centroid of its linear load along the member. */
    private static Point centroid(List<Member> members, LineShare s) {
        if (s.isConcentrated()) {
            return pointOn(members, s.memberId(), s.s0());
        }
        // centroid of a trapezoidal load f0 … f1 on [s0, s1]
        double l = s.s1() - s.s0();
        double c = s.s0() + l * (s.f0() + 2 * s.f1()) / (3 * (s.f0() + s.f1()));
        return pointOn(members, s.memberId(), c);
    }

    // ------------------------------------------------------------------ behaviour cases

    /**
     * Deck on the far side of an opening is a separate piece of deck: it is carried by the supports on
     * its own side. Opening at x = 16…18 ft, y = 6…12 ft; hand calculation: over that height B-10
     * carries x = 5…16 (11 ft, cantilevering 6 ft past it to the opening), B-20 carries x = 18…25 (7 ft).
     * Areas: B-10 = 300 + 6 × 1 = 306 ft², B-20 = 300 − 6 × 3 = 282 ft².
     */
    @Test
    void deckBeyondAnOpeningIsCarriedOnItsOwnSide() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.opening("OP-1", s.rect(16, 6, 18, 12));
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                () -> assertEquals(306 * SQFT, t.members().get("B-10").area(), 1e-9),
                () -> assertEquals(282 * SQFT, t.members().get("B-20").area(), 1e-9),
                () -> Close.segments(List.of(TributaryValidationTest.seg(0, 6, 10, 10), TributaryValidationTest.seg(6, 12, 11, 11),
                        TributaryValidationTest.seg(12, 30, 10, 10)), t.members().get("B-10").widths()));
    }

    /**
     * Two decks with different spans share the member on their common edge. Deck A (x = 0…30 ft) spans
     * east–west onto north–south beams at x = 0, 10, 20, 30; deck B (x = 30…60 ft) spans north–south onto
     * east–west beams at y = 0, 10, 20, 30. Hand calculation: B-30 carries 5 ft of deck A (150 ft²) and
     * nothing of deck B, which runs parallel to it; the east–west beams carry 150, 300, 300, 150 ft².
     */
    @Test
    void decksWithDifferentSpansOnOneFloor() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 60, 30));
        s.deck("DK-A", s.rect(0, 0, 30, 30), 0);
        s.deck("DK-B", s.rect(30, 0, 60, 30), 90);
        s.girder("G-S", 0, 0, 30, 0);
        s.girder("G-N", 0, 30, 30, 30);
        s.girder("G-E", 60, 0, 60, 30);
        for (int x = 0; x <= 30; x += 10) {
            s.beam("B-" + x, x, 0, x, 30);
        }
        for (int y = 0; y <= 30; y += 10) {
            s.beam("E-" + y, 30, y, 60, y);
        }
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                () -> assertEquals(150 * SQFT, t.members().get("B-30").area(), 1e-9),
                () -> assertEquals(300 * SQFT, t.members().get("B-20").area(), 1e-9),
                () -> assertEquals(150 * SQFT, t.members().get("E-0").area(), 1e-9),
                () -> assertEquals(300 * SQFT, t.members().get("E-10").area(), 1e-9),
                () -> assertEquals(300 * SQFT, t.members().get("E-20").area(), 1e-9),
                () -> assertEquals(150 * SQFT, t.members().get("E-30").area(), 1e-9),
                () -> assertEquals(0.0, t.members().get("G-E").area()),
                () -> assertEquals(1800 * SQFT, t.tributaryArea(), 1e-9));
    }

    @Test
    void deckWithNoCrossingMemberIsUnsupported() {
        // only the two girders, both along the span
        FloorSketch s = FloorSketch.bay(30, 30);
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.UNSUPPORTED_DECK);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertEquals("F1", p.get(0).objectId()),
                () -> assertTrue(p.get(0).message().contains("no member crosses")),
                () -> assertEquals(900 * SQFT, area(p.get(0).where()), 1e-9),
                () -> assertEquals(900 * SQFT, t.loadedArea(), 1e-9),
                () -> assertEquals(0.0, t.tributaryArea()),
                () -> assertEquals(List.of(), t.problems(GeometryProblem.COVERAGE)));
    }

    /** Beams stop 5 ft short of the north slab edge: the 30 × 5 ft strip there is unsupported (hand: 150 ft²). */
    @Test
    void deckPastTheEndsOfTheBeamsIsUnsupported() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 30, 30));
        for (int x = 0; x <= 30; x += 10) {
            s.beam("B-" + x, x, 0, x, 25);
        }
        s.pointLoad("P-north", 15, 28);
        s.lineLoad("W-north", 15, 20, 15, 30);
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.UNSUPPORTED_DECK);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertEquals(150 * SQFT, area(p.get(0).where()), 1e-9),
                () -> assertEquals(750 * SQFT, t.tributaryArea(), 1e-9),
                () -> assertEquals(List.of(), t.pointShares().get("P-north")),
                () -> assertEquals(1, t.problems(GeometryProblem.POINT_LOAD_UNSUPPORTED).size()),
                // the wall's 5 ft on supported deck is delivered, the 5 ft beyond is reported
                () -> assertEquals(5 * FT, t.lineShares().get("W-north").stream().mapToDouble(x -> x.force(1)).sum(), 1e-9),
                () -> assertEquals(1, t.problems(GeometryProblem.LINE_LOAD_UNSUPPORTED).size()),
                () -> assertEquals(List.of(), t.problems(GeometryProblem.COVERAGE)));
    }

    /** A bow-tie slab edge: located where it crosses itself, repaired to its two triangles and still analysed. */
    @Test
    void selfIntersectingSlabIsReportedAndRepaired() {
        FloorSketch s = FloorSketch.inMetres();
        s.slab(s.poly(0, 0, 10, 10, 10, 0, 0, 10));
        s.beam("B-0", 0, 0, 0, 10);
        s.beam("B-10", 10, 0, 10, 10);
        FloorTributary t = assertDoesNotThrow(s::compute);
        List<GeometryProblem> p = t.problems(GeometryProblem.SELF_INTERSECTION);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertEquals("F1", p.get(0).objectId()),
                () -> assertEquals(List.of(new Point(5, 5)), p.get(0).where()),
                // hand: two triangles of 5 × 10 / 2 = 25 m² each, one on each beam
                () -> assertEquals(50, t.loadedArea(), 1e-9),
                () -> assertEquals(25, t.members().get("B-0").area(), 1e-9),
                () -> assertEquals(25, t.members().get("B-10").area(), 1e-9),
                () -> assertEquals(List.of(), t.problems(GeometryProblem.COVERAGE)));
    }

    @Test
    void degenerateOutlinesAreReportedAndIgnored() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.opening("OP-flat", s.poly(5, 5, 10, 5, 20, 5));
        s.opening("OP-two", s.poly(5, 5, 6, 6));
        s.areaLoad("AL-thin", s.poly(1, 1, 20, 1, 20, 1.0000001));
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.DEGENERATE_POLYGON);
        assertAll(
                () -> assertEquals(List.of("OP-flat", "OP-two", "AL-thin"), p.stream().map(GeometryProblem::objectId).toList()),
                () -> assertTrue(p.stream().allMatch(x -> !x.where().isEmpty())),
                () -> assertEquals(900 * SQFT, t.loadedArea(), 1e-9),
                () -> assertEquals(3, t.problems().size()));
    }

    @Test
    void zeroLengthAndDuplicateMembersAreReported() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.beam("B-dot", 12, 12, 12, 12);
        s.beam("B-10", 15, 0, 15, 30);
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(1, t.problems(GeometryProblem.ZERO_LENGTH_MEMBER).size()),
                () -> assertEquals("B-dot", t.problems(GeometryProblem.ZERO_LENGTH_MEMBER).get(0).objectId()),
                () -> assertEquals(1, t.problems(GeometryProblem.DUPLICATE_MEMBER).size()),
                () -> assertFalse(t.members().containsKey("B-dot")),
                // the first B-10 stands; the second is ignored
                () -> assertEquals(300 * SQFT, t.members().get("B-10").area(), 1e-9),
                () -> assertEquals(900 * SQFT, t.tributaryArea(), 1e-9));
    }

    /** A beam drawn twice under two ids: reported, and the strip split at their common line (hand: 150 + 150 ft²). */
    @Test
    void coincidentMembersAreReported() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.beam("B-10bis", 10, 0, 10, 30);
        s.opening("OP-1", s.rect(22, 10, 24, 20)); // cuts the strips: the pair is still reported once
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.COINCIDENT_MEMBERS);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertTrue(p.get(0).message().contains("B-10") && p.get(0).message().contains("B-10bis")),
                () -> assertEquals(150 * SQFT, t.members().get("B-10").area(), 1e-9),
                () -> assertEquals(150 * SQFT, t.members().get("B-10bis").area(), 1e-9),
                // the 2 × 10 ft opening is not loaded
                () -> assertEquals(880 * SQFT, t.tributaryArea(), 1e-9));
    }

    @Test
    void overlappingDecksAreReportedAndLoadedOnce() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.deck("DK-1", s.rect(0, 0, 20, 30), 0);
        s.deck("DK-2", s.rect(15, 0, 30, 30), 0);
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.OVERLAP);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertEquals("DK-2", p.get(0).objectId()),
                () -> assertTrue(p.get(0).message().contains("DK-1")),
                // hand: the overlap is 5 × 30 = 150 ft²
                () -> assertEquals(150 * SQFT, area(p.get(0).where()), 1e-9),
                () -> assertEquals(900 * SQFT, t.loadedArea(), 1e-9),
                () -> assertEquals(900 * SQFT, t.tributaryArea(), 1e-9));
    }

    @Test
    void unusableToleranceIsReportedAndReplaced() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        FloorTributary t = TributaryAnalysis.compute(s.floor(), s.members(), Double.NaN);
        assertAll(
                () -> assertEquals(1, t.problems(GeometryProblem.BAD_INPUT).size()),
                () -> assertEquals(300 * SQFT, t.members().get("B-10").area(), 1e-9));
    }

    @Test
    void lineLoadOffTheSlabIsReportedWhereItLeaves() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.lineLoad("W-out", 13, 20, 13, 40);
        FloorTributary t = s.compute();
        List<GeometryProblem> p = t.problems(GeometryProblem.LINE_LOAD_OFF_DECK);
        assertAll(
                () -> assertEquals(1, p.size()),
                () -> assertEquals(List.of(s.p(13, 30), s.p(13, 40)), roundPoints(p.get(0).where())),
                () -> assertEquals(10 * FT, t.lineShares().get("W-out").stream().mapToDouble(x -> x.force(1)).sum(), 1e-9));
    }

    @Test
    void floorWithoutDecksUsesTheSlabSpanningAlongX() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        FloorTributary withDeck = TributaryAnalysis.compute(new Floor("F1", "", false, s.floor().slabEdge(),
                List.of(new Deck("DK", s.floor().slabEdge(), 0)), s.members(), List.of(), List.of(), List.of(),
                List.of(), List.of()), s.members(), TOL);
        FloorTributary without = s.compute();
        for (String id : List.of("B-0", "B-10", "B-20", "B-30", "G-S")) {
            assertEquals(withDeck.members().get(id).area(), without.members().get(id).area(), 1e-12, id);
        }
    }

    // ------------------------------------------------------------------ robustness

    /** Arbitrary, often invalid geometry: never an exception, and the coverage invariants always hold. */
    @Property(tries = 1000)
    void arbitraryGeometryNeverThrowsAndStaysCovered(@ForAll("floors") Floor floor) {
        FloorTributary t = assertDoesNotThrow(() -> TributaryAnalysis.compute(floor, floor.members(), TOL));
        assertEquals(List.of(), t.problems(GeometryProblem.COVERAGE), "coverage");
        assertEquals(List.of(), t.problems(GeometryProblem.INTERNAL), "internal");
        assertEquals(List.of(), t.problems(GeometryProblem.OVERLAP).stream()
                .filter(p -> p.message().startsWith("the tributary areas")).toList(), "member overlap");
        assertTrue(t.tributaryArea() <= t.loadedArea() * (1 + 1e-9) + 1e-12);
        for (MemberTributary m : t.members().values()) {
            assertTrue(m.area() >= 0);
            assertEquals(m.area(), m.widthIntegral(), 1e-9 * Math.max(1, t.loadedArea()));
        }
        double areaLoadDelivered = t.members().values().stream()
                .mapToDouble(m -> MemberTributary.integral(m.areaLoadWidths().getOrDefault("A", List.of()))).sum();
        assertTrue(areaLoadDelivered <= t.tributaryArea() * (1 + 1e-9) + 1e-9, "area load delivered beyond the deck");
        for (List<LoadShare> shares : t.pointShares().values()) {
            if (!shares.isEmpty()) {
                assertEquals(1.0, shares.stream().mapToDouble(LoadShare::fraction).sum(), 1e-9);
            }
        }
    }

    @Provide
    Arbitrary<Floor> floors() {
        Arbitrary<Double> c = Arbitraries.integers().between(0, 40).map(i -> i / 2.0);
        Arbitrary<Point> pt = Combinators.combine(c, c).as(Point::new);
        Arbitrary<Polygon> poly = pt.list().ofMinSize(1).ofMaxSize(7).map(Polygon::new);
        Arbitrary<Member> member = Combinators.combine(pt, pt, Arbitraries.integers().between(0, 999))
                .as((a, b, i) -> new Member("M" + i, MemberKind.BEAM, a, b, Optional.empty()));
        Arbitrary<Double> angle = Arbitraries.oneOf(Arbitraries.of(0.0, 90.0, 30.0, 45.0, 137.5), Arbitraries.doubles().between(-400, 400));
        Arbitrary<Deck> deck = Combinators.combine(poly, angle, Arbitraries.integers().between(0, 9))
                .as((p, a, i) -> new Deck("DK" + i, p, a));
        Arbitrary<List<Deck>> decks = deck.list().ofMaxSize(2);
        Arbitrary<List<Member>> members = member.list().ofMaxSize(8);
        Arbitrary<List<Opening>> openings = poly.map(p -> new Opening("OP", p)).list().ofMaxSize(1);
        Arbitrary<List<PointLoadItem>> points = pt.map(p -> new PointLoadItem("P", p, LoadValues.ZERO)).list().ofMaxSize(1);
        Arbitrary<List<LineLoad>> lines = pt.list().ofMinSize(1).ofMaxSize(3)
                .map(p -> new LineLoad("L", p, LoadValues.ZERO)).list().ofMaxSize(1);
        Arbitrary<List<AreaLoad>> areas = poly.map(p -> new AreaLoad("A", p, LoadValues.ZERO, LiveLoadUse.ORDINARY))
                .list().ofMaxSize(1);
        return Combinators.combine(poly, decks, members, openings, areas, points, lines).as((slab, d, m, o, a, p, l) ->
                new Floor("F", "random", false, slab, d, m, List.of(), o, a, l, p));
    }

    // ------------------------------------------------------------------ helpers

    private static double area(List<Point> pts) {
        return Math.abs(new Polygon(pts).signedArea());
    }

    private static List<Point> roundPoints(List<Point> pts) {
        return pts.stream().map(p -> new Point(Math.round(p.x() * 1e9) / 1e9, Math.round(p.y() * 1e9) / 1e9)).toList();
    }
}
