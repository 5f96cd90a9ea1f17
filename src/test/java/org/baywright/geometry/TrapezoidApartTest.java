package org.baywright.geometry;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * The shortcut of the member-overlap check ({@link Trapezoid#apart}) against JTS: whenever it says two
 * sets of trapezoids are apart, their JTS intersection has no area.
 */
class TrapezoidApartTest {
    private static final GeometryFactory F = new GeometryFactory();

    @Test
    void neighboursInAStripAreApartAndAnOverlapIsNot() {
        Trapezoid left = new Trapezoid(0, 0, 2, 0, 1.5, 0, 1.25);
        Trapezoid right = new Trapezoid(1, 0, 2, 1.5, 3, 1.25, 3);
        Trapezoid above = new Trapezoid(1, 2, 3, 0, 3, 0, 3);
        assertTrue(Trapezoid.apart(List.of(left), List.of(right, above)), "a shared side and a shared strip line");
        Trapezoid crossing = new Trapezoid(1, 0, 2, 1.0, 3, 1.25, 3); // starts inside left at v = 0
        assertFalse(Trapezoid.apart(List.of(left), List.of(crossing)));
        // the same strip lines but sides that cross: apart at one line only is not apart
        Trapezoid twisted = new Trapezoid(1, 0, 2, 1.5, 3, 1.0, 3);
        assertFalse(Trapezoid.apart(List.of(left), List.of(twisted)));
        // overlapping v ranges of different strips are left to the full intersection
        assertFalse(Trapezoid.apart(List.of(left), List.of(new Trapezoid(1, 1, 3, 5, 6, 5, 6))));
        assertFalse(Trapezoid.apart(null, List.of(left)));
    }

    @Property(tries = 400)
    void whenApartTheJtsIntersectionHasNoArea(@ForAll("sets") List<Trapezoid> a, @ForAll("sets") List<Trapezoid> b) {
        if (!Trapezoid.apart(a, b)) {
            return;
        }
        for (Trapezoid s : a) {
            for (Trapezoid t : b) {
                Geometry gs = s.toJts(F);
                Geometry gt = t.toJts(F);
                if (gs == null || gt == null) {
                    continue;
                }
                double area = gs.intersection(gt).getArea();
                assertTrue(area <= 1e-9, s + " and " + t + " overlap by " + area);
            }
        }
    }

    /** Trapezoids on a coarse grid, so that shared sides, shared strip lines and overlaps all occur often. */
    @Provide
    Arbitrary<List<Trapezoid>> sets() {
        Arbitrary<Double> c = Arbitraries.integers().between(0, 6).map(i -> i * 0.5);
        Arbitrary<Trapezoid> t = Combinators.combine(c, c, c, c, c, c).as((v0, dv, a0, da, b0, db) ->
                new Trapezoid(0, v0, v0 + Math.max(0.5, dv), a0, a0 + da, b0, b0 + db));
        return t.list().ofMinSize(1).ofMaxSize(3);
    }
}
