package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;
import org.baywright.plan.Point;
import org.junit.jupiter.api.Test;

class PlanHitsTest {
    private final List<PlanHits.Segment> segs = List.of(
            new PlanHits.Segment("G-1", new Point(0, 0), new Point(10, 0)),
            new PlanHits.Segment("B-1", new Point(5, 0), new Point(5, 8)));

    @Test
    void distanceToASegmentClampsToItsEnds() {
        assertAll(
                () -> assertEquals(2, PlanHits.distance(4, 2, new Point(0, 0), new Point(10, 0)), 1e-12),
                () -> assertEquals(5, PlanHits.distance(13, 4, new Point(0, 0), new Point(10, 0)), 1e-12),
                () -> assertEquals(5, PlanHits.distance(3, 4, new Point(0, 0), new Point(0, 0)), 1e-12));
    }

    @Test
    void picksTheNearestWithinTolerance() {
        assertAll(
                () -> assertEquals(Optional.of("G-1"), PlanHits.nearest(segs, 2, 0.1, 0.3).map(PlanHits.Segment::id)),
                () -> assertEquals(Optional.of("B-1"), PlanHits.nearest(segs, 5.2, 3, 0.3).map(PlanHits.Segment::id)),
                () -> assertEquals(Optional.empty(), PlanHits.nearest(segs, 2, 1, 0.3)),
                () -> assertEquals(Optional.of("B-1"), PlanHits.nearest(segs, 5.05, 0.2, 0.3).map(PlanHits.Segment::id),
                        "near a joint the closer member wins"));
    }
}
