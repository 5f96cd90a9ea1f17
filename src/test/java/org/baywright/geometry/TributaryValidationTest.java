package org.baywright.geometry;

import static org.baywright.geometry.FloorSketch.FT;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Tributary areas, width profiles and load shares against values worked out by hand.
 *
 * <p>Source of the rules: common practice for one-way decks, as restated in
 * {@code shared/guide/CHECK-VALUES.md} §9 rule 1 (each supporting beam takes half the spacing on each
 * side; an edge beam takes half the spacing plus any overhang) and its check values (30 × 30 ft bay,
 * beams at 10 ft: interior beam AT = 300 ft², edge beam 150 ft²; label COMPUTED there). The other
 * expected values are a hand calculation in this test, written out next to each case (label:
 * COMPUTED by hand from the half-way rule and the lever rule).
 *
 * <p>Tolerance: the hand values are exact in feet; the only error is floating-point rounding of the
 * metre conversion and of the method, so areas and widths are compared within 1e-9 relative.
 * Positions are snapped to a 1e-6 m grid by the analysis; every coordinate here (multiples of
 * 0.3048 m / 1000) lies on that grid.
 */
class TributaryValidationTest {

    private static final double SQFT = FT * FT;
    private static final double REL = 1e-9;

    // ------------------------------------------------------------------ CHECK-VALUES §9 rule 1

    /** CHECK-VALUES §9: 30 × 30 ft bay, beams at third points → interior 300 ft², edge 150 ft². */
    @Test
    void thirdPointBayGivesThreeHundredAndOneHundredFiftySquareFeet() {
        FloorTributary t = FloorSketch.bay(30, 30, 0, 10, 20, 30).compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(150, t, "B-0"), area(300, t, "B-10"), area(300, t, "B-20"), area(150, t, "B-30"),
                // girders on the grid lines run along the span: no deck load
                area(0, t, "G-S"), area(0, t, "G-N"),
                () -> assertEquals(List.of(), t.members().get("G-S").widths()),
                // uniform width profiles of 10 ft and 5 ft over the 30 ft beams
                profile(t, "B-10", seg(0, 30, 10, 10)),
                profile(t, "B-0", seg(0, 30, 5, 5)),
                profile(t, "B-30", seg(0, 30, 5, 5)),
                polygon(t, "B-10", 5, 0, 15, 0, 15, 30, 5, 30),
                polygon(t, "B-0", 0, 0, 5, 0, 5, 30, 0, 30),
                () -> assertEquals(900 * SQFT, t.loadedArea(), REL * 900 * SQFT),
                () -> assertEquals(900 * SQFT, t.tributaryArea(), REL * 900 * SQFT));
    }

    /**
     * Three bays by two, 30 ft each way, beams at 10 ft spanning north–south onto girders on the east–west
     * grid lines, deck spanning east–west. Hand calculation: in each row of bays the members at
     * x = 0 and 90 ft take 5 ft × 30 ft = 150 ft², all others (infill beams and the column-line beams at
     * 30 and 60 ft) 10 ft × 30 ft = 300 ft²; total 90 × 60 = 5,400 ft².
     */
    @Test
    void threeByTwoBayFloor() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 90, 60));
        for (int gy = 0; gy <= 60; gy += 30) {
            for (int gx = 0; gx < 90; gx += 30) {
                s.girder("G-" + gx + "-" + gy, gx, gy, gx + 30, gy);
            }
        }
        for (int row = 0; row < 2; row++) {
            for (int x = 0; x <= 90; x += 10) {
                s.beam("B-" + x + "-" + row, x, 30 * row, x, 30 * (row + 1));
            }
        }
        FloorTributary t = s.compute();
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(List.of(), t.problems()));
        for (int row = 0; row < 2; row++) {
            for (int x = 0; x <= 90; x += 10) {
                double expected = x == 0 || x == 90 ? 150 : 300;
                checks.add(area(expected, t, "B-" + x + "-" + row));
                checks.add(profile(t, "B-" + x + "-" + row, seg(0, 30, expected / 30, expected / 30)));
            }
        }
        for (int gy = 0; gy <= 60; gy += 30) {
            for (int gx = 0; gx < 90; gx += 30) {
                checks.add(area(0, t, "G-" + gx + "-" + gy));
            }
        }
        checks.add(() -> assertEquals(5400 * SQFT, t.tributaryArea(), REL * 5400 * SQFT));
        checks.add(() -> assertEquals(5400 * SQFT, t.loadedArea(), REL * 5400 * SQFT));
        assertAll(checks);
    }

    /**
     * A 3 × 6 ft opening at x = 12…15 ft, y = 6…12 ft lies inside the tributary strip of B-10
     * (x = 5…15 ft). Hand calculation: B-10 loses 3 × 6 = 18 ft² → 282 ft²; its width is 10 ft, except
     * 7 ft (x = 5…12) over y = 6…12; B-20's strip starts at the opening's east edge and is unchanged.
     */
    @Test
    void openingRemovesItsAreaFromOneBeam() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.opening("OP-1", s.rect(12, 6, 15, 12));
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(282, t, "B-10"), area(300, t, "B-20"), area(150, t, "B-0"), area(150, t, "B-30"),
                profile(t, "B-10", seg(0, 6, 10, 10), seg(6, 12, 7, 7), seg(12, 30, 10, 10)),
                polygon(t, "B-10", 5, 0, 15, 0, 15, 6, 12, 6, 12, 12, 15, 12, 15, 30, 5, 30),
                () -> assertEquals(882 * SQFT, t.loadedArea(), REL * 882 * SQFT));
    }

    /**
     * The east slab edge runs from (30, 0) to (36, 30) ft, past the edge beam at x = 30. Hand
     * calculation: the edge beam's strip runs from the midline x = 25 to the edge x = 30 + y/5, so its
     * width grows linearly from 5 ft at its south end to 11 ft at its north end; its area is the
     * trapezoid (5 + 11)/2 × 30 = 240 ft², outline (25, 0), (30, 0), (36, 30), (25, 30).
     */
    @Test
    void skewedSlabEdgeGivesLinearWidth() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.slab(s.poly(0, 0, 30, 0, 36, 30, 0, 30));
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(240, t, "B-30"), area(300, t, "B-20"),
                profile(t, "B-30", seg(0, 30, 5, 11)),
                polygon(t, "B-30", 25, 0, 30, 0, 36, 30, 25, 30),
                () -> assertEquals(990 * SQFT, t.loadedArea(), REL * 990 * SQFT),
                () -> assertEquals(990 * SQFT, t.tributaryArea(), REL * 990 * SQFT));
    }

    /**
     * A 6 × 10 ft balcony on the east side (x = 30…36 ft, y = 10…20 ft) cantilevers past the edge beam.
     * Common practice (CHECK-VALUES §9 rule 1: "an edge beam takes ½ of the spacing plus any slab
     * overhang"); hand calculation: B-30 takes 150 + 6 × 10 = 210 ft², width 5 ft, 11 ft on y = 10…20,
     * 5 ft.
     */
    @Test
    void balconyGoesToTheEdgeMember() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.slab(s.poly(0, 0, 30, 0, 30, 10, 36, 10, 36, 20, 30, 20, 30, 30, 0, 30));
        s.pointLoad("P-balcony", 34, 15);
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(210, t, "B-30"), area(300, t, "B-20"),
                profile(t, "B-30", seg(0, 10, 5, 5), seg(10, 20, 11, 11), seg(20, 30, 5, 5)),
                // a point load on the overhang goes wholly to the outer support
                () -> Close.shares(List.of(new LoadShare("B-30", 15 * FT, 1.0)), t.pointShares().get("P-balcony")));
    }

    /**
     * The same bay with the deck spanning north–south (90°): girders on x = 0 and 30 ft run along the
     * span and get nothing; beams run east–west at y = 0, 10, 20, 30 ft. By symmetry with the first case:
     * 150, 300, 300, 150 ft².
     */
    @Test
    void deckRotatedNinetyDegrees() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 30, 30));
        s.deck("DK-1", s.rect(0, 0, 30, 30), 90);
        s.girder("G-W", 0, 0, 0, 30);
        s.girder("G-E", 30, 0, 30, 30);
        for (int y = 0; y <= 30; y += 10) {
            s.beam("B-" + y, 0, y, 30, y);
        }
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(150, t, "B-0"), area(300, t, "B-10"), area(300, t, "B-20"), area(150, t, "B-30"),
                area(0, t, "G-W"), area(0, t, "G-E"),
                profile(t, "B-10", seg(0, 30, 10, 10)),
                polygon(t, "B-10", 0, 5, 30, 5, 30, 15, 0, 15));
    }

    /**
     * A skewed beam from (10, 0) to (16, 30) ft between straight beams at x = 0 and 30, deck spanning
     * along x. Hand calculation: at height y the skewed beam is at x = 10 + y/5, its strip runs from
     * (0 + 10 + y/5)/2 = 5 + y/10 to (10 + y/5 + 30)/2 = 20 + y/10: a constant chord of 15 ft, area
     * 15 × 30 = 450 ft². Along the beam (length √(6² + 30²) = √936 ft) the width is the chord times
     * sin θ = 30/√936, so ∫ w ds = 450 ft². West beam: chord 5 + y/10, 5 → 8 ft, 195 ft²; east beam:
     * 10 − y/10, 10 → 7 ft, 255 ft².
     */
    @Test
    void skewedBeamWidthIsChordTimesSine() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 30, 30));
        s.girder("G-S", 0, 0, 30, 0);
        s.girder("G-N", 0, 30, 30, 30);
        s.beam("B-W", 0, 0, 0, 30);
        s.beam("B-X", 10, 0, 16, 30);
        s.beam("B-E", 30, 0, 30, 30);
        FloorTributary t = s.compute();
        double len = Math.sqrt(936);
        double w = 15 * 30 / len;
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(450, t, "B-X"), area(195, t, "B-W"), area(255, t, "B-E"),
                profile(t, "B-X", seg(0, len, w, w)),
                profile(t, "B-W", seg(0, 30, 5, 8)),
                profile(t, "B-E", seg(0, 30, 10, 7)),
                polygon(t, "B-X", 5, 0, 20, 0, 23, 30, 8, 30));
    }

    /**
     * A short beam B-15 at x = 15 ft reaches only from y = 0 to 15 ft between edge beams at x = 0 and 30.
     * One-way strips end square at the end of a member (a nearest-member pattern would cut diagonally
     * there). Hand calculation: for y = 0…15 the supports are 0, 15, 30 ft, so B-15 takes x = 7.5…22.5
     * (225 ft²); for y = 15…30 only 0 and 30 ft remain, splitting at 15 ft. B-0 and B-30 each take
     * 7.5 × 15 + 15 × 15 = 337.5 ft², with an L-shaped outline.
     */
    @Test
    void stripsEndSquareAtTheEndOfAMember() {
        FloorSketch s = FloorSketch.inFeet();
        s.slab(s.rect(0, 0, 30, 30));
        s.beam("B-0", 0, 0, 0, 30);
        s.beam("B-15", 15, 0, 15, 15);
        s.beam("B-30", 30, 0, 30, 30);
        FloorTributary t = s.compute();
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                area(225, t, "B-15"), area(337.5, t, "B-0"), area(337.5, t, "B-30"),
                profile(t, "B-0", seg(0, 15, 7.5, 7.5), seg(15, 30, 15, 15)),
                profile(t, "B-15", seg(0, 15, 15, 15)),
                polygon(t, "B-15", 7.5, 0, 22.5, 0, 22.5, 15, 7.5, 15),
                polygon(t, "B-0", 0, 0, 7.5, 0, 7.5, 15, 15, 15, 15, 30, 0, 30));
    }

    // ------------------------------------------------------------------ point, line and area loads

    /**
     * Lever rule (statics of a simply supported deck strip): a point 3 ft from B-10 between beams 10 ft
     * apart sends 7/10 to B-10 and 3/10 to B-20, both at 15 ft along the beams. A point on a girder goes
     * wholly to it; a point in an opening is reported and not delivered.
     */
    @Test
    void pointLoadsByLeverRule() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.opening("OP-1", s.rect(22, 22, 26, 26));
        s.pointLoad("P-1", 13, 15);
        s.pointLoad("P-2", 12, 0);
        s.pointLoad("P-3", 24, 24);
        s.pointLoad("P-4", 20, 7.5);
        FloorTributary t = s.compute();
        assertAll(
                () -> Close.shares(List.of(new LoadShare("B-10", 15 * FT, 0.7), new LoadShare("B-20", 15 * FT, 0.3)),
                        t.pointShares().get("P-1")),
                () -> Close.shares(List.of(new LoadShare("G-S", 12 * FT, 1.0)), t.pointShares().get("P-2")),
                () -> assertEquals(List.of(), t.pointShares().get("P-3")),
                () -> assertEquals(1, t.problems(GeometryProblem.POINT_LOAD_OFF_DECK).size()),
                () -> assertEquals("P-3", t.problems(GeometryProblem.POINT_LOAD_OFF_DECK).get(0).objectId()),
                // on a beam: wholly to it, at its position
                () -> Close.shares(List.of(new LoadShare("B-20", 7.5 * FT, 1.0)), t.pointShares().get("P-4")));
    }

    /**
     * Line loads. Hand calculation with the lever rule:
     * <ul>
     *   <li>a wall along x = 13 ft, parallel to the beams, for the full 30 ft: 0.7 of it to B-10 and 0.3 to
     *       B-20, uniformly along them;</li>
     *   <li>a wall along y = 15 ft across the whole bay: each 10 ft strip sends ∫(1 − x/10) dx = 5 ft of
     *       wall to each of its two beams, as point forces at mid-length: B-0 5 ft, B-10 10 ft,
     *       B-20 10 ft, B-30 5 ft (× the wall's load per foot);</li>
     *   <li>cladding along girder G-S goes to it with factor 1 over its length.</li>
     * </ul>
     */
    @Test
    void lineLoadsByLeverRule() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.lineLoad("W-NS", 13, 0, 13, 30);
        s.lineLoad("W-EW", 0, 15, 30, 15);
        s.lineLoad("CL-S", 0, 0, 30, 0);
        FloorTributary t = s.compute();
        List<LineShare> ns = t.lineShares().get("W-NS");
        List<LineShare> ew = t.lineShares().get("W-EW");
        assertAll(
                () -> assertEquals(List.of(), t.problems()),
                () -> Close.lines(List.of(new LineShare("B-10", 0, 30 * FT, 0.7, 0.7),
                        new LineShare("B-20", 0, 30 * FT, 0.3, 0.3)), ns),
                () -> assertEquals(5 * FT, force(ew, "B-0"), REL),
                () -> assertEquals(10 * FT, force(ew, "B-10"), REL),
                () -> assertEquals(10 * FT, force(ew, "B-20"), REL),
                () -> assertEquals(5 * FT, force(ew, "B-30"), REL),
                () -> assertTrue(ew.stream().allMatch(x -> x.isConcentrated() && Math.abs(x.s0() - 15 * FT) < 1e-9)),
                () -> Close.lines(List.of(new LineShare("G-S", 0, 30 * FT, 1, 1)), t.lineShares().get("CL-S")));
    }

    /**
     * Area loads. Hand calculation:
     * <ul>
     *   <li>a load over x = 0…12 ft covers B-0's whole strip (5 ft) and x = 5…12 of B-10's (7 ft);</li>
     *   <li>a triangle (10, 0), (20, 0), (10, 30): at height y it spans x = 10 … 20 − y/3. Within B-10's
     *       strip (x ≤ 15) the width is 5 ft up to y = 15 and 10 − y/3 (5 → 0) above: 112.5 ft². Within
     *       B-20's strip (x ≥ 15) it is 5 − y/3 (5 → 0) up to y = 15: 37.5 ft². Total 150 ft², the
     *       triangle's area;</li>
     *   <li>a load at x = 25…35, y = 10…20 hangs 5 × 10 = 50 ft² past the slab edge: reported, and only
     *       the 5 ft on the slab reaches B-30.</li>
     * </ul>
     */
    @Test
    void areaLoadsFollowTheTributaryStrips() {
        FloorSketch s = FloorSketch.bay(30, 30, 0, 10, 20, 30);
        s.areaLoad("AL-W", s.rect(0, 0, 12, 30));
        s.areaLoad("AL-T", s.poly(10, 0, 20, 0, 10, 30));
        s.areaLoad("AL-E", s.rect(25, 10, 35, 20));
        FloorTributary t = s.compute();
        Map<String, List<WidthSegment>> b10 = t.members().get("B-10").areaLoadWidths();
        Map<String, List<WidthSegment>> b20 = t.members().get("B-20").areaLoadWidths();
        List<GeometryProblem> off = t.problems(GeometryProblem.AREA_LOAD_OFF_DECK);
        assertAll(
                () -> Close.segments(List.of(seg(0, 30, 5, 5)), t.members().get("B-0").areaLoadWidths().get("AL-W")),
                () -> Close.segments(List.of(seg(0, 30, 7, 7)), b10.get("AL-W")),
                () -> Close.segments(List.of(seg(0, 15, 5, 5), seg(15, 30, 5, 0)), b10.get("AL-T")),
                () -> Close.segments(List.of(seg(0, 15, 5, 0)), b20.get("AL-T")),
                () -> assertEquals(112.5 * SQFT, MemberTributary.integral(b10.get("AL-T")), REL * 150 * SQFT),
                () -> assertEquals(37.5 * SQFT, MemberTributary.integral(b20.get("AL-T")), REL * 150 * SQFT),
                () -> Close.segments(List.of(seg(10, 20, 5, 5)), t.members().get("B-30").areaLoadWidths().get("AL-E")),
                () -> assertEquals(1, off.size()),
                () -> assertEquals("AL-E", off.get(0).objectId()),
                () -> assertEquals(50 * SQFT, polygonArea(off.get(0).where()), REL * 50 * SQFT),
                () -> assertEquals(null, b20.get("AL-W")));
    }

    // ------------------------------------------------------------------ helpers

    /** A width segment given in feet (s and w), converted to metres. */
    static WidthSegment seg(double s0, double s1, double w0, double w1) {
        return new WidthSegment(s0 * FT, s1 * FT, w0 * FT, w1 * FT);
    }

    private static Executable area(double expectedSqFt, FloorTributary t, String id) {
        return () -> {
            MemberTributary m = t.members().get(id);
            assertTrue(m != null, "no entry for " + id);
            assertEquals(expectedSqFt * SQFT, m.area(), REL * Math.max(1, expectedSqFt) * SQFT, id + " area");
            assertEquals(m.area(), m.widthIntegral(), REL * Math.max(1, expectedSqFt) * SQFT, id + " ∫w ds");
        };
    }

    private static Executable profile(FloorTributary t, String id, WidthSegment... expected) {
        return () -> Close.segments(List.of(expected), t.members().get(id).widths());
    }

    /** The member's drawn outline equals the given polygon (feet), as a vertex set and by area. */
    private static Executable polygon(FloorTributary t, String id, double... xyFeet) {
        return () -> {
            List<Polygon> polys = t.members().get(id).polygons();
            assertEquals(1, polys.size(), id + " polygons " + polys);
            List<Point> actual = polys.get(0).vertices();
            List<Point> expected = new ArrayList<>();
            for (int i = 0; i < xyFeet.length; i += 2) {
                expected.add(new Point(xyFeet[i] * FT, xyFeet[i + 1] * FT));
            }
            assertEquals(expected.size(), actual.size(), id + " vertex count " + actual);
            for (Point e : expected) {
                assertTrue(actual.stream().anyMatch(a -> a.distance(e) < 1e-9), id + " lacks vertex " + e + " in " + actual);
            }
            assertEquals(Math.abs(new Polygon(expected).signedArea()), Math.abs(polys.get(0).signedArea()), 1e-9);
        };
    }

    private static double polygonArea(List<Point> pts) {
        return Math.abs(new Polygon(pts).signedArea());
    }

    private static double force(List<LineShare> shares, String id) {
        return shares.stream().filter(x -> x.memberId().equals(id)).mapToDouble(x -> x.force(1.0)).sum();
    }
}
