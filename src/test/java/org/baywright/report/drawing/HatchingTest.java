package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.junit.jupiter.api.Test;

class HatchingTest {
    private static final Pen PEN = Pen.solid(0.1, Rgb.BLACK);

    private static double length(Pt[] s) {
        return Math.hypot(s[1].x() - s[0].x(), s[1].y() - s[0].y());
    }

    @Test
    void horizontalHatchOfARectangle() {
        List<Pt> rect = List.of(new Pt(0.5, 0.5), new Pt(10.5, 0.5), new Pt(10.5, 5.5), new Pt(0.5, 5.5));
        List<Pt[]> segs = Hatching.segments(rect, new Hatch(Hatch.Pattern.HORIZONTAL, 1, PEN));
        assertAll(
                () -> assertEquals(5, segs.size(), "lines at y = 1 … 5"),
                () -> assertTrue(segs.stream().allMatch(s -> Math.abs(length(s) - 10) < 1e-9)),
                () -> assertTrue(segs.stream().allMatch(s -> s[0].y() == s[1].y())));
    }

    @Test
    void aConcaveOutlineSplitsTheLinesThatCrossItsNotch() {
        // a U: 0–9 wide, 0–6 high, notch x 3–6 from y 2 up
        List<Pt> u = List.of(new Pt(0, 0), new Pt(9, 0), new Pt(9, 6), new Pt(6, 6), new Pt(6, 2), new Pt(3, 2), new Pt(3, 6),
                new Pt(0, 6));
        List<Pt[]> segs = Hatching.segments(u, new Hatch(Hatch.Pattern.HORIZONTAL, 0.5, PEN));
        Polygon poly = new Polygon(u.stream().map(p -> new Point(p.x(), p.y())).toList());
        double total = segs.stream().mapToDouble(HatchingTest::length).sum();
        assertAll(
                () -> assertTrue(segs.stream().allMatch(s -> PlanPicture.contains(poly,
                        new Pt((s[0].x() + s[1].x()) / 2, (s[0].y() + s[1].y()) / 2))), "every segment inside"),
                // y = 0 … 1.5: one segment each; y = 2 … 5.5: two (either side of the notch); none at the top edge
                () -> assertEquals(4 + 8 * 2, segs.size()),
                () -> assertEquals(Math.abs(poly.signedArea()) / 0.5, total, 1e-9, "total length = area / spacing"));
    }

    @Test
    void crossHatchingHasBothDiagonals() {
        List<Pt> sq = List.of(new Pt(0, 0), new Pt(10, 0), new Pt(10, 10), new Pt(0, 10));
        List<Pt[]> segs = Hatching.segments(sq, new Hatch(Hatch.Pattern.CROSS, 1, PEN));
        long rising = segs.stream().filter(s -> (s[1].x() - s[0].x()) * (s[1].y() - s[0].y()) > 0).count();
        long falling = segs.stream().filter(s -> (s[1].x() - s[0].x()) * (s[1].y() - s[0].y()) < 0).count();
        assertAll(
                () -> assertTrue(rising >= 13, "rising " + rising),
                () -> assertTrue(falling >= 13, "falling " + falling),
                () -> assertEquals(segs.size(), rising + falling, "nothing but diagonals"),
                () -> assertTrue(segs.stream().allMatch(s -> Math.abs(Math.abs(s[1].x() - s[0].x())
                        - Math.abs(s[1].y() - s[0].y())) < 1e-9), "at 45°"));
    }
}
