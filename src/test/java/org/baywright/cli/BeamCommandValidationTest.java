package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The {@code beam} command's end reactions, live-load reduction and dead-load deflection against
 * published formulas. Self-weight is off where the expected value is a bare formula, so that the
 * loads are exactly the ones the formula takes.
 */
class BeamCommandValidationTest {
    private static final double KIP = 1e-9; // reactions are exact statics: only rounding differs

    private static JsonNode json(String... args) throws Exception {
        return BeamCommandTest.json(args);
    }

    /** The service reaction of a case: {left, right}. */
    static double[] service(JsonNode j, String c) {
        for (JsonNode n : j.get("reactions").get("service")) {
            if (n.get("case").asText().equals(c)) {
                return new double[] {n.get("left").asDouble(), n.get("right").asDouble()};
            }
        }
        throw new AssertionError("no service reaction for " + c + " in " + j.get("reactions"));
    }

    /** The factored reaction of a combination: {left, right}. */
    static double[] factored(JsonNode j, String combination) {
        for (JsonNode n : j.get("reactions").get("factored")) {
            if (n.get("combination").asText().equals(combination)) {
                return new double[] {n.get("left").asDouble(), n.get("right").asDouble()};
            }
        }
        throw new AssertionError("no factored reaction for " + combination + " in " + j.get("reactions"));
    }

    @Test
    void uniformLoadReactionsAreHalfTheLoad() throws Exception {
        // AISC Steel Construction Manual, Table 3-23 case 1 (simple beam, uniformly distributed load): R = wl/2
        // (from memory). 30 ft: D 1 klf → 15 kip, L 2 klf → 30 kip at each end (COMPUTED).
        // Factored by ASCE 7-16 §2.3.1: 1.4D = 21 kip; 1.2D + 1.6L = 18 + 48 = 66 kip (COMPUTED).
        JsonNode j = json("beam", "--span", "30ft", "--dead", "1klf", "--live", "2klf", "--section", "W24X68",
                "--self-weight", "off", "--json");
        assertAll(
                () -> assertEquals("kip", j.get("reactions").get("unit").asText()),
                () -> assertEquals(15.0, service(j, "D")[0], KIP),
                () -> assertEquals(15.0, service(j, "D")[1], KIP),
                () -> assertEquals(30.0, service(j, "L")[0], KIP),
                () -> assertEquals(30.0, service(j, "L")[1], KIP),
                () -> assertEquals(21.0, factored(j, "1.4D")[0], KIP),
                () -> assertEquals(66.0, factored(j, "1.2D + 1.6L")[1], KIP));
    }

    @Test
    void pointLoadReactionsFollowTheLever() throws Exception {
        // AISC Steel Construction Manual, Table 3-23 (from memory): case 7, concentrated load at center, R = P/2;
        // case 8, concentrated load at any point, R1 = Pb/l, R2 = Pa/l.
        // 30 ft, L 12 kip at a = 10 ft: R1 = 12·20/30 = 8 kip, R2 = 12·10/30 = 4 kip; D 0.5 klf: 7.5 kip each end;
        // 1.2D + 1.6L: left 9 + 12.8 = 21.8 kip, right 9 + 6.4 = 15.4 kip (COMPUTED).
        JsonNode j = json("beam", "--span", "30ft", "--dead", "0.5klf", "--live-point", "12kip@10ft", "--section", "W24X68",
                "--self-weight", "off", "--json");
        // case 7: L 20 kip at mid-span: 10 kip each end (COMPUTED)
        JsonNode c = json("beam", "--span", "30ft", "--live-point", "20kip@15ft", "--section", "W24X68",
                "--self-weight", "off", "--json");
        assertAll(
                () -> assertEquals(8.0, service(j, "L")[0], KIP),
                () -> assertEquals(4.0, service(j, "L")[1], KIP),
                () -> assertEquals(7.5, service(j, "D")[0], KIP),
                () -> assertEquals(21.8, factored(j, "1.2D + 1.6L")[0], KIP),
                () -> assertEquals(15.4, factored(j, "1.2D + 1.6L")[1], KIP),
                () -> assertEquals(10.0, service(c, "L")[0], KIP),
                () -> assertEquals(10.0, service(c, "L")[1], KIP));
    }

    @Test
    void aPointLoadOverASupportGoesStraightIntoIt() throws Exception {
        // A load exactly over a support is carried by the support, not by the beam (statics; AISC Manual Table
        // 3-23 case 8 with a = 0 gives R1 = P, no shear in the span, from memory). D 1 klf on 30 ft and D 10 kip
        // over the left support: the beam's shear under 1.4D is 1.4·15 = 21 kip, not 1.4·25 = 35 kip (COMPUTED).
        JsonNode j = json("beam", "--span", "30ft", "--dead", "1klf", "--dead-point", "10kip@0ft", "--section", "W24X68",
                "--self-weight", "off", "--json");
        JsonNode shear = j.get("checks").get(1);
        JsonNode direct = j.get("loadsOnSupports").get(0);
        assertAll(
                () -> assertEquals("shear", shear.get("name").asText()),
                () -> assertEquals(21.0, shear.get("demand").asDouble(), KIP),
                () -> assertEquals(15.0, service(j, "D")[0], KIP),
                () -> assertEquals("D", direct.get("case").asText()),
                () -> assertEquals("left", direct.get("support").asText()),
                () -> assertEquals(10.0, direct.get("force").asDouble(), KIP));
    }

    @ParameterizedTest(name = "K_LL {1}, A_T {0} ft², {2} floor(s) → {3}")
    @CsvSource({
        // ASCE 7-16 §4.7.2, Eq. 4.7-1: L = L0·(0.25 + 15/√(K_LL·A_T)), not below 0.50·L0 (one floor) or
        // 0.40·L0 (two or more floors); no reduction when K_LL·A_T < 400 ft². Factors COMPUTED:
        "800,  2, 1, 0.625",                 // 0.25 + 15/√1600 = 0.625
        "800,  1, 1, 0.780330085889911",     // 0.25 + 15/√800
        "2000, 2, 1, 0.5",                   // 0.25 + 15/√4000 = 0.487 < 0.50 → 0.50·L0 (one floor)
        "2000, 2, 2, 0.487170824512628",     // two floors: 0.487 ≥ 0.40
        "8000, 2, 2, 0.4",                   // 0.25 + 15/√16000 = 0.369 < 0.40 → 0.40·L0
        "150,  2, 1, 1.0"})                  // 300 ft² < 400 ft²: not reduced
    void liveLoadIsReducedByEquation471(double at, int kll, int floors, double factor) throws Exception {
        // 30 ft, L 0.4 klf (L0 = 12 kip / A_T, at most 80 psf: ordinary, not above 100 psf); R_L = 6 kip × factor
        JsonNode j = json("beam", "--span", "30ft", "--live", "0.4klf", "--dead", "0.5klf", "--section", "W24X68",
                "--self-weight", "off", "--tributary-area", at + "ft2", "--kll", Integer.toString(kll),
                "--floors", Integer.toString(floors), "--json");
        JsonNode r = j.get("liveLoadReduction").get(0);
        assertAll(
                () -> assertEquals("L", r.get("case").asText()),
                () -> assertEquals(factor, r.get("factor").asDouble(), 1e-12),
                () -> assertEquals(at, r.get("tributaryArea").asDouble(), 1e-9),
                () -> assertEquals(6.0 * factor, service(j, "L")[0], KIP));
    }

    @Test
    void deflectionIsCheckedUnderTheUnreducedLiveLoad() throws Exception {
        // common practice (the plan's default): strength under reduced L, deflection under L as given
        JsonNode plain = json("beam", "--span", "30ft", "--live", "2klf", "--dead", "1klf", "--section", "W24X68", "--json");
        JsonNode reduced = json("beam", "--span", "30ft", "--live", "2klf", "--dead", "1klf", "--section", "W24X68",
                "--tributary-area", "800ft2", "--json");
        assertAll(
                () -> assertEquals(plain.get("checks").get(2).get("demand").asDouble(),
                        reduced.get("checks").get(2).get("demand").asDouble(), 1e-12),
                () -> assertEquals("unreduced", reduced.get("deflectionLiveLoad").asText()),
                // 1.2D + 1.6L flexure falls with L × 0.625 (COMPUTED, Eq. 4.7-1)
                () -> assertEquals(1.2 * 1 * 900 / 8 + 1.6 * 0.625 * 2 * 900 / 8 + 1.2 * 0.068 * 900 / 8,
                        reduced.get("checks").get(0).get("demand").asDouble(), 1e-9));
    }

    @ParameterizedTest(name = "Lr {0} on 30 ft, A_T {1} ft² → Lr = {2}·L0")
    @CsvSource({
        // ASCE 7-16 §4.8.2, Eq. 4.8-1: Lr = L0·R1·R2 with R1 = 1 up to 200 ft², 1.2 − 0.001·A_T for 200 < A_T < 600 ft²,
        // 0.6 from 600 ft²; R2 = 1 (flat roof); 12 psf ≤ Lr ≤ L0. L0 = roof live load on the member / A_T. COMPUTED:
        "0.2klf, 300, 0.9",   // L0 = 6 kip / 300 ft² = 20 psf, R1 = 0.9 → 18 psf
        "0.4klf, 600, 0.6",   // L0 = 12 kip / 600 ft² = 20 psf, R1 = 0.6 → 12 psf, at the minimum
        "0.2klf, 150, 1.0",   // R1 = 1
        "0.3klf, 800, 1.0"})  // L0 = 9 kip / 800 ft² = 11.25 psf ≤ 12 psf: not reduced
    void roofLiveLoadIsReducedByEquation481(String lr, double at, double factor) throws Exception {
        JsonNode j = json("beam", "--span", "30ft", "--roof-live", lr, "--dead", "0.5klf", "--section", "W24X68",
                "--self-weight", "off", "--tributary-area", at + "ft2", "--json");
        JsonNode r = j.get("liveLoadReduction").get(0);
        double total = Double.parseDouble(lr.replace("klf", "")) * 30;
        assertAll(
                () -> assertEquals("Lr", r.get("case").asText()),
                () -> assertEquals(factor, r.get("factor").asDouble(), 1e-12),
                () -> assertEquals(total / 2 * factor, service(j, "Lr")[0], KIP));
    }

    @Test
    void deadLoadDeflectionAndCamber() throws Exception {
        // AISC Manual Table 3-23 case 1: Δmax = 5wl⁴/(384EI) (from memory). W18X50, Ix = 800 in⁴, E = 29,000 ksi,
        // 35 ft = 420 in: D 1.5 klf → Δ = 5 · 0.125 · 420⁴ / (384 · 29000 · 800) = 2.1830 in (COMPUTED);
        // camber 0.8 · 2.183 = 1.746 → 1.5 in (rounded down to 1/4 in; common practice).
        // D 0.45 klf → Δ = 0.6549 in; 0.8 · 0.655 = 0.524 → 0.5 in < 3/4 in → no camber (common practice).
        JsonNode heavy = json("beam", "--span", "35ft", "--dead", "1.5klf", "--section", "W18X50", "--self-weight", "off", "--total-limit", "off",
                "--json");
        JsonNode light = json("beam", "--span", "35ft", "--dead", "0.45klf", "--section", "W18X50", "--self-weight", "off",
                "--json");
        double delta = 5 * (1.5 / 12) * Math.pow(420, 4) / (384 * 29000.0 * 800);
        assertAll(
                () -> assertEquals(delta, heavy.get("deadLoadDeflection").asDouble(), 1e-9),
                () -> assertEquals(1.5, heavy.get("camber").asDouble(), 1e-9),
                () -> assertEquals(delta * 0.45 / 1.5, light.get("deadLoadDeflection").asDouble(), 1e-9),
                () -> assertEquals(0.0, light.get("camber").asDouble(), 0),
                () -> assertEquals(true, heavy.get("camberRule").asText().contains("common practice")));
    }
}
