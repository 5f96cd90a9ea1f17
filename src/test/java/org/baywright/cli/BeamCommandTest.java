package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The {@code beam} command as a user drives it. */
class BeamCommandTest {
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = BaywrightCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    static JsonNode json(String... args) throws Exception {
        Run r = run(args);
        assertEquals(0, r.code(), r.err());
        return new ObjectMapper().readTree(r.out());
    }

    @Test
    void designExampleF11aPicksW18x50() throws Exception {
        // AISC Design Examples V15.1, Ex. F.1-1A: 35 ft, D 0.45 klf, L 0.75 klf, d ≤ 18 in, live L/360 → W18X50
        // (FOUND, CHECK-VALUES §1). The example's dead load is taken as given (self-weight off), total-load limit off.
        JsonNode j = json("beam", "--span", "35ft", "--dead", "0.45klf", "--live", "0.75klf", "--max-depth", "18in",
                "--total-limit", "off", "--self-weight", "off", "--json");
        JsonNode flex = j.get("checks").get(0);
        assertAll(
                () -> assertEquals("W18X50", j.get("section").asText()),
                () -> assertEquals("sized", j.get("status").asText()),
                () -> assertEquals(50, j.get("weight").asDouble(), 1e-9),
                () -> assertEquals("lb/ft", j.get("weightUnit").asText()),
                () -> assertEquals("flexure", flex.get("name").asText()),
                // Mu = 266 kip-ft, φbMn = 379 kip-ft (F.1-1A/B, FOUND; COMPUTED 266.4 / 378.8)
                () -> assertEquals(266.4, flex.get("demand").asDouble(), 0.1),
                () -> assertEquals(378.8, flex.get("capacity").asDouble(), 0.1),
                () -> assertEquals("AISC 360-16 F2", flex.get("clause").asText()),
                () -> assertTrue(j.get("rejected").size() > 10),
                () -> assertTrue(j.get("caution").asText().contains("licensed")));
    }

    @Test
    void asdAndSelfWeight() throws Exception {
        // F.1-1A ASD: Ma = 184 kip-ft (FOUND); with the W18X50's own weight added, 191.4 kip-ft (CHECK-VALUES §5, COMPUTED)
        JsonNode j = json("beam", "--span", "35ft", "--dead", "0.45klf", "--live", "0.75klf", "--method", "asd",
                "--section", "W18X50", "--total-limit", "off", "--json");
        assertAll(
                () -> assertEquals("fixed size", j.get("status").asText()),
                () -> assertEquals(191.4, j.get("checks").get(0).get("demand").asDouble(), 0.1),
                // Mn/Ωb = 252 kip-ft (F.1-1B, FOUND)
                () -> assertEquals(252.0, j.get("checks").get(0).get("capacity").asDouble(), 0.1));
    }

    @Test
    void siUnitsGiveTheSameSection() throws Exception {
        // 35 ft = 10.668 m; 0.45 klf = 6.567 kN/m; 0.75 klf = 10.945 kN/m (exact conversions, common practice)
        JsonNode j = json("beam", "--span", "10.668m", "--dead", "6.5673kN/m", "--live", "10.9454kN/m", "--max-depth", "457.2mm",
                "--total-limit", "off", "--self-weight", "off", "--json");
        assertAll(
                () -> assertEquals("si", j.get("units").asText()),
                () -> assertEquals("W18X50", j.get("section").asText()),
                // 50 lb/ft = 74.4 kg/m (common practice)
                () -> assertEquals(74.4, j.get("weight").asDouble(), 0.05),
                () -> assertEquals("kN·m", j.get("checks").get(0).get("unit").asText()),
                // 266.4 kip-ft = 361.2 kN·m (exact conversion)
                () -> assertEquals(361.2, j.get("checks").get(0).get("demand").asDouble(), 0.2),
                () -> assertEquals("mm", j.get("checks").get(2).get("unit").asText()));
    }

    @Test
    void pointLoadsSeriesAndBracing() throws Exception {
        JsonNode j = json("beam", "--span", "30ft", "--dead", "0.3klf", "--live", "0.5klf", "--dead-point", "12kip@10ft",
                "--live-point", "18kip@10ft", "--series", "W14,W16", "--bracing", "3", "--json");
        String section = j.get("section").asText();
        assertTrue(section.startsWith("W14X") || section.startsWith("W16X"), section);
        JsonNode flex = j.get("checks").get(0);
        assertTrue(flex.get("lb").asDouble() > 9.99 && flex.get("lb").asDouble() < 10.01, flex.toString());
        for (JsonNode r : j.get("rejected")) {
            String s = r.get("section").asText();
            assertTrue(s.startsWith("W14X") || s.startsWith("W16X"), s);
        }
    }

    @Test
    void textOutputListsChecksRejectionsAndTheCaution() {
        Run r = run("beam", "--span", "35ft", "--dead", "0.45klf", "--live", "0.75klf", "--max-depth", "18in");
        assertAll(
                () -> assertEquals(0, r.code(), r.err()),
                () -> assertTrue(r.out().contains("Result: W"), r.out()),
                () -> assertTrue(r.out().contains("flexure"), r.out()),
                () -> assertTrue(r.out().contains("AISC 360-16 G2.1(a)"), r.out()),
                () -> assertTrue(r.out().contains("Lighter sections rejected"), r.out()),
                () -> assertTrue(r.out().contains("CAUTION"), r.out()),
                () -> assertTrue(r.err().isEmpty(), r.err()));
    }

    @Test
    void overstressedExitsWithOne() throws Exception {
        Run r = run("beam", "--span", "60ft", "--dead", "5klf", "--live", "8klf", "--max-depth", "12.5in", "--json");
        assertEquals(1, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("overstressed", j.get("status").asText());
        assertTrue(j.get("governingRatio").asDouble() > 1);
        Run fixed = run("beam", "--span", "35ft", "--dead", "0.45klf", "--live", "0.75klf", "--section", "W8X10");
        assertEquals(1, fixed.code());
        assertTrue(fixed.out().contains("overstressed"), fixed.out());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "negative span | --span,-35ft | --span",
        "zero span | --span,0ft | --span",
        "unknown unit | --span,35yd | --span",
        "bare number | --span,35 | has no unit",
        "malformed point load | --span,35ft,--dead-point,12kip | --dead-point",
        "point load beyond the span | --span,35ft,--live-point,12kip@40ft | beyond the span",
        "unknown catalog file | --span,35ft,--catalog,/no/such/file.csv | no such catalog file",
        "unknown section | --span,35ft,--section,W18X51 | --section",
        "bad method | --span,35ft,--method,wsd | --method",
        "bad bracing | --span,35ft,--bracing,often | --bracing",
        "bad limit | --span,35ft,--live-limit,3 | --live-limit",
        "bad series | --span,35ft,--series,W19 | --series",
        "unknown option | --span,35ft,--colour,red | Unknown option",
        "missing span | --dead,1klf | --span"})
    void badInputExitsWithTwoAndOneLine(String name, String args, String expected) {
        String[] a = ("beam," + args).split(",");
        Run r = run(a);
        assertAll(
                () -> assertEquals(2, r.code(), name + ": " + r.err()),
                () -> assertTrue(r.err().contains(expected), name + ": " + r.err()),
                () -> assertFalse(r.err().contains("Exception"), "no stack trace: " + r.err()),
                () -> assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err()));
    }

    @Test
    void calculationSheetPrintsFormulaSubstitutionAndClause() {
        Run r = run("beam", "--span", "35ft", "--dead", "0.45klf", "--live", "0.75klf", "--section", "W18X50", "--calc");
        assertAll(
                () -> assertTrue(r.out().contains("Mp = Fy · Zx = 50 ksi · 101 in³ = 420.8 kip-ft  (AISC 360-16 Eq. F2-1)"), r.out()),
                () -> assertTrue(r.out().contains("compact flange"), r.out()));
    }

    @Test
    void helpWorksWithoutADisplay() {
        Run r = run("--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("beam") && r.out().contains("catalog"), r.out());
    }
}
