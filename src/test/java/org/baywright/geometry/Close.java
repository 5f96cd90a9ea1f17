package org.baywright.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

/** Comparisons of result records within 1e-9 (m, or a fraction), for exact hand values and rounding-only errors. */
final class Close {
    static final double ABS = 1e-9;

    private Close() {
    }

    static void segments(List<WidthSegment> expected, List<WidthSegment> actual) {
        assertEquals(expected != null, actual != null, "profile present");
        if (expected == null) {
            return;
        }
        assertEquals(expected.size(), actual.size(), "pieces: expected " + expected + " but was " + actual);
        for (int i = 0; i < expected.size(); i++) {
            WidthSegment e = expected.get(i);
            WidthSegment a = actual.get(i);
            String msg = "piece " + i + ": expected " + e + " but was " + a;
            assertEquals(e.s0(), a.s0(), ABS, msg);
            assertEquals(e.s1(), a.s1(), ABS, msg);
            assertEquals(e.w0(), a.w0(), ABS, msg);
            assertEquals(e.w1(), a.w1(), ABS, msg);
        }
    }

    static void shares(List<LoadShare> expected, List<LoadShare> actual) {
        assertEquals(expected.size(), actual.size(), "shares: expected " + expected + " but was " + actual);
        for (int i = 0; i < expected.size(); i++) {
            LoadShare e = expected.get(i);
            LoadShare a = actual.get(i);
            String msg = "share " + i + ": expected " + e + " but was " + a;
            assertEquals(e.memberId(), a.memberId(), msg);
            assertEquals(e.s(), a.s(), ABS, msg);
            assertEquals(e.fraction(), a.fraction(), ABS, msg);
        }
    }

    static void lines(List<LineShare> expected, List<LineShare> actual) {
        assertEquals(expected.size(), actual.size(), "shares: expected " + expected + " but was " + actual);
        for (int i = 0; i < expected.size(); i++) {
            LineShare e = expected.get(i);
            LineShare a = actual.get(i);
            String msg = "share " + i + ": expected " + e + " but was " + a;
            assertEquals(e.memberId(), a.memberId(), msg);
            assertEquals(e.s0(), a.s0(), ABS, msg);
            assertEquals(e.s1(), a.s1(), ABS, msg);
            assertEquals(e.f0(), a.f0(), ABS, msg);
            assertEquals(e.f1(), a.f1(), ABS, msg);
        }
    }
}
