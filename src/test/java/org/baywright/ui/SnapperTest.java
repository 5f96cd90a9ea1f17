package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Point;
import org.junit.jupiter.api.Test;

/** Snap targets and their order of preference, on a 2 × 1 bay grid (10 m bays) with one member. */
class SnapperTest {
    private static final Plan PLAN = PlanEdits.withGrid(PlanEdits.blank("S", "si", 1, 4), List.of(10.0, 10.0), List.of(8.0),
            true, null);
    private static final List<Snapper.Segment> MEMBERS = List.of(new Snapper.Segment(new Point(0, 4), new Point(10, 4)));
    private final Snapper snapper = new Snapper(PLAN, MEMBERS, Snapper.SI_PRECISION);

    @Test
    void eachKindOfTarget() {
        assertAll(
                () -> assertEquals(new Snapper.Snap(new Point(10, 8), Snapper.Kind.INTERSECTION),
                        snapper.snap(new Point(10.2, 7.9), 0.5, null)),
                () -> assertEquals(new Snapper.Snap(new Point(0, 4), Snapper.Kind.END), snapper.snap(new Point(0.3, 4.1), 0.5, null)),
                () -> assertEquals(new Snapper.Snap(new Point(5, 4), Snapper.Kind.MIDPOINT), snapper.snap(new Point(5.2, 4.2), 0.5, null)),
                // from (7, 0) the foot of the perpendicular on the member is (7, 4)
                () -> assertEquals(new Snapper.Snap(new Point(7, 4), Snapper.Kind.PERPENDICULAR),
                        snapper.snap(new Point(7.3, 4.2), 0.5, new Point(7, 0))),
                () -> assertEquals(new Snapper.Snap(new Point(15.23, 0), Snapper.Kind.ON_GRID),
                        snapper.snap(new Point(15.234, 0.2), 0.5, null)),
                () -> assertEquals(Snapper.Kind.FREE, snapper.snap(new Point(13.3333, 2.2222), 0.5, null).kind()));
    }

    @Test
    void freePointsRoundToThePrecision() {
        Point p = snapper.snap(new Point(13.3333, 2.2222), 0.5, null).point();
        assertEquals(13.33, p.x(), 1e-12);
        assertEquals(2.22, p.y(), 1e-12);
        Snapper us = new Snapper(PLAN, List.of(), Snapper.US_PRECISION);
        Point q = us.snap(new Point(3.0, 2.0), 0.01, null).point();
        assertEquals(Math.round(3.0 / 0.0254), q.x() / 0.0254, 1e-9, "a whole number of inches");
    }

    @Test
    void intersectionsWinOverEndsWithinTheTolerance() {
        // the member's end (0, 4) is not an intersection; (0, 0) is both a column and an intersection
        assertEquals(Snapper.Kind.INTERSECTION, snapper.snap(new Point(0.1, 0.1), 0.5, null).kind());
        assertEquals(Snapper.Kind.END, snapper.snap(new Point(0.1, 3.9), 0.5, null).kind());
    }
}
