package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import org.baywright.io.PlanFiles;
import org.baywright.takedown.BayPlans;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code baywright bay} and the bays of {@code design}, on the floor of the Designer's Handbook DG11 example
 * ({@link BayPlans#handbookFloor}: 180 × 90 ft in 30 × 30 ft bays, beams at 10 ft; Brockenbrough &amp; Merritt, 4th
 * ed., §6 p. 6.26, via CHECK-VALUES §6).
 */
class BayCommandTest {
    @TempDir
    static Path dir;
    static Path plan;
    static Path plain;

    @BeforeAll
    static void write() throws Exception {
        plan = dir.resolve("handbook.bay.json");
        PlanFiles.write(BayPlans.handbookFloor(BayPlans.handbookSlab()), plan);
        plain = dir.resolve("plain.bay.json");
        PlanFiles.write(BayPlans.handbookFloor(null), plain);
    }

    @Test
    void printsOneBaysCheckWithItsCalculation() {
        BeamCommandTest.Run r = BeamCommandTest.run("bay", plan.toString(), "--level", "Level 2", "--bay", "C-D/2-3");
        String o = r.out();
        assertAll(r.err(),
                () -> assertTrue(r.code() == 0 || r.code() == 1, "0 meets, 1 exceeds: " + r.code()),
                () -> assertTrue(o.startsWith("Bay C-D/2-3 at Level 2"), o),
                // the handbook bay: 30 ft beams at 10 ft, 30 ft girders, 180 × 90 ft floor (p. 6.26)
                () -> assertTrue(o.contains("span 30'-0\", spacing 10'-0\""), o),
                () -> assertTrue(o.contains("Floor: 180'-0\" across the beams, 90'-0\" along them; interior bay"), o),
                () -> assertTrue(o.contains("vibration live load 11 psf"), o),
                () -> assertTrue(o.contains("Calculation sheet"), o),
                () -> assertTrue(o.contains("Ds = de³ / (12 · n) = 4.25 in³"), o),
                () -> assertTrue(o.contains("B_j = min(Cj · (Ds / Dj)^0.25 · Lj"), o),
                () -> assertTrue(o.contains("a_p/g = Po · e^(− 0.35 · fn) / (β · W)"), o),
                () -> assertTrue(o.contains("Eq. 4-1"), o),
                () -> assertTrue(o.contains("CAUTION"), o));
        assertEquals(o.contains("→ exceeds") ? 1 : 0, r.code(), "exit code as the status");
    }

    @Test
    void jsonOfOneBayIsTheDesignOutputsEntryWithTheCalculation() throws Exception {
        BeamCommandTest.Run r = BeamCommandTest.run("bay", plan.toString(), "--level", "Level 2", "--bay", "c-d/2-3", "--json");
        JsonNode b = new ObjectMapper().readTree(r.out());
        for (String k : List.of("id", "level", "members", "fn", "apg", "limit", "ratio", "status", "dj", "dg", "dgReduced", "bj",
                "bg", "wj", "wg", "w", "fj", "fg", "beamSpan", "spacing", "girderSpan", "floorWidth", "floorLength", "edge",
                "calculation", "caution")) {
            assertTrue(b.has(k), k + " in " + b);
        }
        BeamCommandTest.Run d = BeamCommandTest.run("design", plan.toString(), "--json", "-");
        JsonNode bays = new ObjectMapper().readTree(d.out()).get("bays");
        assertEquals(18, bays.size(), "6 × 3 bays (handbook p. 6.26)");
        JsonNode same = null;
        for (JsonNode x : bays) {
            if (x.get("id").asText().equals("C-D/2-3")) {
                same = x;
            }
        }
        JsonNode s = same;
        assertAll(
                () -> assertEquals(0.005, b.get("limit").asDouble(), 1e-12, "offices 0.5 % g"),
                () -> assertEquals(30, b.get("beamSpan").asDouble(), 1e-9),
                () -> assertEquals(10, b.get("spacing").asDouble(), 1e-9),
                () -> assertEquals(180, b.get("floorWidth").asDouble(), 1e-9),
                () -> assertEquals(90, b.get("floorLength").asDouble(), 1e-9),
                () -> assertEquals(List.of("J-CD-23-1", "J-CD-23-2", "G-2-CD", "G-3-CD"),
                        new ObjectMapper().convertValue(b.get("members"), List.class)),
                () -> assertEquals(s.get("fn").asDouble(), b.get("fn").asDouble(), 0),
                () -> assertEquals(s.get("apg").asDouble(), b.get("apg").asDouble(), 0),
                () -> assertEquals(s.get("status").asText(), b.get("status").asText()),
                () -> assertEquals(b.get("apg").asDouble() / 0.005, b.get("ratio").asDouble(), 1e-12),
                () -> assertTrue(b.get("calculation").size() > 20));
    }

    @Test
    void designPrintsTheWorstBayAndLeavesPlansWithoutASlabAsTheyWere() throws Exception {
        BeamCommandTest.Run d = BeamCommandTest.run("design", plan.toString());
        assertTrue(d.out().contains("Floor vibration (AISC DG11 walking): 18 bays: "), d.out());
        assertTrue(d.out().contains("; worst "), d.out());
        BeamCommandTest.Run p = BeamCommandTest.run("design", plain.toString());
        assertFalse(p.out().contains("Floor vibration"), p.out());
        JsonNode j = new ObjectMapper().readTree(BeamCommandTest.run("design", plain.toString(), "--json", "-").out());
        assertFalse(j.has("bays"), "no slab described: no bays[] (older outputs unchanged)");
    }

    @Test
    void aBayWithoutASlabSaysSo() {
        BeamCommandTest.Run r = BeamCommandTest.run("bay", plain.toString(), "--level", "Level 2", "--bay", "C-D/2-3");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Status: no slab described — not checked"), r.out());
    }

    @Test
    void unknownLevelsAndBaysAreLocatedAndListWhatExists() {
        BeamCommandTest.Run l = BeamCommandTest.run("bay", plan.toString(), "--level", "Level 9", "--bay", "C-D/2-3");
        assertEquals(2, l.code());
        assertTrue(l.err().contains("--level: \"Level 9\" is not a level of the plan; levels: Level 2"), l.err());
        BeamCommandTest.Run b = BeamCommandTest.run("bay", plan.toString(), "--level", "Level 2", "--bay", "H-J/1-2");
        assertEquals(2, b.code());
        assertTrue(b.err().contains("--bay: \"H-J/1-2\" is not a bay of Level 2; bays: A-B/1-2, "), b.err());
        assertTrue(b.err().contains("F-G/3-4"), b.err());
        assertFalse(b.err().contains("Exception"), b.err());
    }
}
