package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The Pareto front: the non-dominated set, both objectives minimised. */
class ParetoTest {
    record P(String name, double w, double d) {
    }

    @Test
    void aHandMadeSet() {
        List<P> pts = List.of(new P("A", 10, 30), new P("B", 12, 24), new P("C", 12, 24), new P("D", 15, 24),
                new P("E", 9, 40), new P("F", 11, 35), new P("G", 20, 18), new P("H", 9, 40), new P("I", 9, 41),
                new P("J", 25, 18), new P("K", Double.NaN, 1));
        // D is dominated by B (same depth, heavier); F by A; I by E (same weight, deeper); J by G; K has no weight
        List<String> front = Pareto.front(pts, P::w, P::d).stream().map(P::name).toList();
        assertEquals(List.of("E", "H", "A", "B", "C", "G"), front);
    }

    @Test
    void agreesWithTheDefinitionOnRandomSets() {
        Random rnd = new Random(7);
        for (int trial = 0; trial < 200; trial++) {
            List<P> pts = new ArrayList<>();
            int n = 1 + rnd.nextInt(30);
            for (int i = 0; i < n; i++) {
                // few distinct values so that ties are common
                pts.add(new P("p" + i, rnd.nextInt(8), rnd.nextInt(8)));
            }
            Set<P> expected = new HashSet<>();
            for (P x : pts) {
                boolean dominated = false;
                for (P y : pts) {
                    dominated |= Pareto.dominates(y, x, P::w, P::d);
                }
                if (!dominated) {
                    expected.add(x);
                }
            }
            List<P> front = Pareto.front(pts, P::w, P::d);
            assertEquals(expected, new HashSet<>(front), "trial " + trial);
            assertEquals(expected.size(), front.size());
        }
    }

    @Test
    void emptyAndSingle() {
        assertEquals(List.of(), Pareto.front(List.<P>of(), P::w, P::d));
        P a = new P("a", 1, 1);
        assertEquals(List.of(a), Pareto.front(List.of(a), P::w, P::d));
    }
}
