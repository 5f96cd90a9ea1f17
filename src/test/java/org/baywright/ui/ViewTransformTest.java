package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.geometry.Point2D;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

class ViewTransformTest {
    private static final double EPS = 1e-9;

    @Test
    void planYGoesUpScreenYGoesDown() {
        ViewTransform t = new ViewTransform(10, 100, 500);
        assertAll(
                () -> assertEquals(100, t.screenX(0), EPS),
                () -> assertEquals(500, t.screenY(0), EPS),
                () -> assertEquals(130, t.screenX(3), EPS),
                () -> assertEquals(480, t.screenY(2), EPS, "2 m north is 20 px up"),
                () -> assertEquals(new Point2D(3, 2), t.toWorld(130, 480)));
    }

    @Property
    void worldToScreenAndBackIsIdentity(@ForAll @DoubleRange(min = -1e4, max = 1e4) double x,
            @ForAll @DoubleRange(min = -1e4, max = 1e4) double y,
            @ForAll @DoubleRange(min = 0.1, max = 1000) double s) {
        ViewTransform t = new ViewTransform(s, 37.5, -12.25);
        Point2D p = t.toScreen(x, y);
        Point2D w = t.toWorld(p.getX(), p.getY());
        assertEquals(x, w.getX(), 1e-6 * Math.max(1, Math.abs(x)));
        assertEquals(y, w.getY(), 1e-6 * Math.max(1, Math.abs(y)));
    }

    @Test
    void panMovesTheDrawingWithThePointer() {
        ViewTransform t = new ViewTransform(4, 0, 0).panBy(15, -7);
        assertAll(
                () -> assertEquals(15, t.screenX(0), EPS),
                () -> assertEquals(-7, t.screenY(0), EPS),
                () -> assertEquals(4, t.scale(), EPS));
    }

    @Test
    void zoomKeepsThePointUnderTheCursor() {
        ViewTransform t = new ViewTransform(5, 20, 400);
        Point2D before = t.toWorld(250, 130);
        ViewTransform z = t.zoomAt(250, 130, 2.5);
        Point2D after = z.toWorld(250, 130);
        assertAll(
                () -> assertEquals(12.5, z.scale(), EPS),
                () -> assertEquals(before.getX(), after.getX(), 1e-9),
                () -> assertEquals(before.getY(), after.getY(), 1e-9));
    }

    @Test
    void zoomStopsAtTheLimitsWithoutDrifting() {
        ViewTransform t = new ViewTransform(ViewTransform.MAX_SCALE, 10, 10);
        ViewTransform z = t.zoomAt(300, 200, 10);
        assertAll(
                () -> assertEquals(ViewTransform.MAX_SCALE, z.scale(), EPS),
                () -> assertEquals(t, z),
                () -> assertEquals(ViewTransform.MIN_SCALE, new ViewTransform(1e-9, 0, 0).scale(), EPS),
                () -> assertThrows(IllegalArgumentException.class, () -> t.zoomAt(0, 0, 0)),
                () -> assertThrows(IllegalArgumentException.class, () -> new ViewTransform(Double.NaN, 0, 0)));
    }

    @Test
    void fitShowsTheWholeRectangleCentred() {
        // 40 m × 30 m in an 800 × 500 canvas with 50 px margins: height governs, 400/30 px per metre
        ViewTransform t = ViewTransform.fit(-5, 0, 35, 30, 800, 500, 50);
        double s = 400.0 / 30;
        assertAll(
                () -> assertEquals(s, t.scale(), 1e-9),
                () -> assertEquals(400, t.screenX(15), 1e-9, "centre x"),
                () -> assertEquals(250, t.screenY(15), 1e-9, "centre y"),
                () -> assertEquals(50, t.screenY(30), 1e-9, "top edge at the margin"),
                () -> assertEquals(450, t.screenY(0), 1e-9, "bottom edge at the margin"),
                () -> assertTrue(t.screenX(-5) >= 50 && t.screenX(35) <= 750, "width fits"));
    }

    @Test
    void fitOfAPointIsFinite() {
        ViewTransform t = ViewTransform.fit(3, 4, 3, 4, 600, 400, 20);
        assertAll(
                () -> assertEquals(300, t.screenX(3), 1e-9),
                () -> assertEquals(200, t.screenY(4), 1e-9),
                () -> assertTrue(Double.isFinite(t.scale())));
    }

    @Test
    void worldLengthOfPixels() {
        assertEquals(0.5, new ViewTransform(12, 0, 0).toWorldLength(6), EPS);
    }
}
