package org.baywright.cli;

import static org.baywright.cli.CompositeBeamCommandValidationTest.check;
import static org.baywright.cli.CompositeBeamCommandValidationTest.exampleI1;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code beam --composite} as a user drives it: the search, the JSON, SI output and the refusals. */
class CompositeBeamCommandTest {

    /** The search on Example I.1 (AISC DE V15): no heavier and no costlier than the example's W21X50 with 46 studs. */
    @Test
    void searchIsNoWorseThanTheExample() throws Exception {
        JsonNode j = BeamCommandTest.json(exampleI1("--json"));
        double weight = j.get("weight").asDouble();
        int studs = j.get("composite").get("studs").asInt();
        // cost-equivalent weight: steel + 10 lb per stud (the default, common practice); I.1: 50 lb/ft × 45 ft + 46 × 10 lb
        double cost = weight * 45 + studs * 10;
        assertAll("search",
                () -> assertEquals("sized", j.get("status").asText()),
                () -> assertTrue(weight <= 50, j.get("section").asText()),
                () -> assertTrue(cost <= 50 * 45 + 46 * 10, j.get("section").asText() + " with " + studs + " studs"),
                () -> assertTrue(j.get("governingRatio").asDouble() <= 1.0 + 1e-9),
                () -> assertTrue(j.get("rejectedCount").asInt() > 0));
        // the least studs: two fewer (one per half span) on the same section fail, exit 1
        String section = j.get("section").asText();
        BeamCommandTest.Run fewer = BeamCommandTest.run(exampleI1("--section", section, "--studs",
                Integer.toString(studs - 2)));
        assertEquals(BaywrightCommand.EXIT_OVERSTRESSED, fewer.code(), fewer.out());
        assertTrue(fewer.out().contains("overstressed: the fixed design fails"), fewer.out());
    }

    /** --section alone: the least studs on that section; W21X50 needs no more than the example's 46. */
    @Test
    void sectionWithoutStudsFindsTheLeastStuds() throws Exception {
        JsonNode j = BeamCommandTest.json(exampleI1("--section", "W21X50", "--json"));
        assertAll(
                () -> assertEquals("W21X50", j.get("section").asText()),
                () -> assertTrue(j.get("composite").get("studs").asInt() <= 46),
                () -> assertTrue(j.get("composite").get("studs").asInt() >= 2));
    }

    @Test
    void jsonCarriesTheCompositeKeysWithUnits() throws Exception {
        JsonNode j = BeamCommandTest.json(exampleI1("--section", "W21X50", "--studs", "46", "--json"));
        JsonNode c = j.get("composite");
        List<String> names = new ArrayList<>();
        j.get("checks").forEach(k -> names.add(k.get("name").asText()));
        assertAll("JSON",
                () -> assertEquals("us", j.get("units").asText()),
                () -> {
                    for (String k : List.of("beff", "beffLeft", "beffRight", "sumQn", "qn", "studs", "degree", "pna", "ILB",
                            "camber", "constructionRatio")) {
                        assertTrue(c.has(k), "composite." + k + " in " + c);
                    }
                },
                () -> assertEquals("in", c.get("unitNames").get("camber").asText()),
                () -> assertEquals("in", c.get("unitNames").get("beff").asText()),
                () -> assertEquals("kip", c.get("unitNames").get("sumQn").asText()),
                () -> assertEquals("in⁴", c.get("unitNames").get("ILB").asText()),
                () -> assertTrue(names.containsAll(List.of("composite flexure", "construction flexure", "shear",
                        "live-load deflection", "total-load deflection")), names.toString()),
                () -> {
                    for (JsonNode k : j.get("checks")) {
                        for (String f : List.of("demand", "capacity", "ratio", "clause", "unit")) {
                            assertTrue(k.has(f), k.get("name") + " has " + f);
                        }
                    }
                },
                () -> assertEquals("kip-ft", check(j, "composite flexure").get("unit").asText()),
                () -> assertEquals("in", check(j, "live-load deflection").get("unit").asText()));
    }

    /**
     * Example I.1 typed in SI (exact conversions: 45 ft = 13.716 m, 10 ft = 3.048 m, 0.10 klf = 1.4594 kN/m,
     * 1.00 klf = 14.594 kN/m, 3 in = 76.2 mm, 6 in = 152.4 mm, 12 in = 304.8 mm, 4.5 in = 114.3 mm,
     * 145 pcf = 22.78 kN/m³, 4 ksi = 27.58 MPa, 83 psf = 3.974 kPa): the output is in mm and kN, the same design.
     */
    @Test
    void siInputGivesSiOutput() throws Exception {
        JsonNode j = BeamCommandTest.json("beam", "--span", "13.716m", "--dead", "1.4594kN/m", "--live", "14.594kN/m",
                "--spacing", "3.048m", "--composite", "--deck-height", "76.2mm", "--rib-width", "152.4mm", "--rib-pitch",
                "304.8mm", "--ribs", "perpendicular", "--topping", "114.3mm", "--concrete", "22.78kN/m3", "--fc", "27.58MPa",
                "--slab-weight", "3.974kPa", "--self-weight", "off", "--section", "W21X50", "--studs", "46", "--json");
        JsonNode c = j.get("composite");
        assertAll("SI",
                () -> assertEquals("si", j.get("units").asText()),
                () -> assertEquals("mm", c.get("unitNames").get("camber").asText()),
                () -> assertEquals("mm", c.get("unitNames").get("beff").asText()),
                () -> assertEquals("kN", c.get("unitNames").get("qn").asText()),
                // 2 in = 50.8 mm of camber; beff 120 in = 3,048 mm (exact conversions)
                () -> assertEquals(50.8, c.get("camber").asDouble(), 1e-6),
                () -> assertEquals(3048, c.get("beff").asDouble(), 1e-6),
                // Qn = 17.2 kips = 76.5 kN (CHECK-VALUES §7, converted), to the 0.05 kip of the printed value
                () -> assertEquals(17.2 * 4.448222, c.get("qn").asDouble(), 0.05 * 4.448222),
                () -> assertEquals("kN·m", check(j, "composite flexure").get("unit").asText()),
                () -> assertEquals("mm", check(j, "live-load deflection").get("unit").asText()));
        BeamCommandTest.Run text = BeamCommandTest.run(exampleI1("--section", "W21X50", "--studs", "46", "--units", "si"));
        assertAll("SI text",
                () -> assertTrue(text.out().contains("3048 mm (left 1524 mm, right 1524 mm)"), text.out()),
                () -> assertTrue(text.out().contains("camber 50.8 mm"), text.out()),
                () -> assertTrue(text.out().contains(" kN per stud"), text.out()));
    }

    @Test
    void shoredAndCamberOff() throws Exception {
        // shored, the W21X50 carries the slab on I_LB too: (0.93 + 1.00)/1.00 × 1.25 in ≈ 2.4 in > L/240 = 2.25 in, exit 1
        BeamCommandTest.Run s = BeamCommandTest.run(exampleI1("--section", "W21X50", "--studs", "46", "--shored", "--json"));
        JsonNode shored = new com.fasterxml.jackson.databind.ObjectMapper().readTree(s.out());
        // without camber the 2 in cambered out comes back: 2.06 + 2 in > L/240, exit 1
        BeamCommandTest.Run o = BeamCommandTest.run(exampleI1("--section", "W21X50", "--studs", "46", "--camber", "off", "--json"));
        JsonNode off = new com.fasterxml.jackson.databind.ObjectMapper().readTree(o.out());
        List<String> shoredChecks = new ArrayList<>();
        shored.get("checks").forEach(k -> shoredChecks.add(k.get("name").asText()));
        assertAll(
                () -> assertTrue(shored.get("shored").asBoolean()),
                () -> assertEquals(BaywrightCommand.EXIT_OVERSTRESSED, s.code()),
                () -> assertEquals("total-load deflection", governing(shored)),
                () -> assertEquals(0, shored.get("composite").get("camber").asDouble()),
                () -> assertFalse(shoredChecks.contains("construction flexure"), shoredChecks.toString()),
                () -> assertEquals(0, off.get("composite").get("camber").asDouble()),
                () -> assertEquals(BaywrightCommand.EXIT_OVERSTRESSED, o.code()),
                // without camber the total deflection grows by the 2 in cambered out (I.1 above)
                () -> assertEquals(2.0, check(off, "total-load deflection").get("demand").asDouble()
                        - check(BeamCommandTest.json(exampleI1("--section", "W21X50", "--studs", "46", "--json")),
                                "total-load deflection").get("demand").asDouble(), 1e-6));
    }

    private static String governing(JsonNode j) {
        String name = "";
        double worst = -1;
        for (JsonNode k : j.get("checks")) {
            if (k.get("ratio").asDouble() > worst) {
                worst = k.get("ratio").asDouble();
                name = k.get("name").asText();
            }
        }
        return name;
    }

    /** Options and values the command refuses, exit 2, with a message that names the option. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--deck-height 3in|--deck-height applies to composite beams only: add --composite",
        "--studs 46 --section W21X50|--studs applies to composite beams only",
        "--spacing 10ft --ribs perpendicular|--spacing applies to composite beams only: add --composite (or leave out --spacing, --ribs)",
        "--camber off|--camber applies to composite beams only",
    })
    void compositeOptionsNeedComposite(String extra, String message) {
        List<String> a = new ArrayList<>(List.of("beam", "--span", "45ft", "--live", "1klf"));
        a.addAll(Arrays.asList(extra.split(" ")));
        BeamCommandTest.Run r = BeamCommandTest.run(a.toArray(String[]::new));
        assertEquals(BaywrightCommand.EXIT_BAD_INPUT, r.code(), r.out());
        assertTrue(r.err().contains(message), r.err());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--studs 45 --section W21X50|--studs: \"45\" is odd",
        "--studs 46|--studs needs --section",
        "--studs lots --section W21X50|--studs: \"lots\" is not a number of studs",
        "--ribs diagonal|--ribs: \"diagonal\" is not allowed; use perpendicular or parallel",
        "--concrete 145|--concrete: \"145\" needs a unit weight with its unit",
        "--concrete 400pcf|--concrete: \"400pcf\" is not a structural concrete unit weight",
        "--fc 4|--fc: \"4\" has no unit",
        "--min-composite 120%|--min-composite: \"120%\" is not a percentage",
        "--stud-position middle|--stud-position: \"middle\" is not allowed; use weak or strong",
        "--studs-per-rib 5|--studs-per-rib: \"5\" is not a number of studs per rib",
        "--camber maybe|--camber: \"maybe\" is not allowed; use on or off",
        "--rib-width 14in|--rib-width: \"14in\" is wider than --rib-pitch",
        "--dead-point 3kip@10ft|--dead-point is not available with --composite",
        "--tributary-area 450ft2|--tributary-area is not available with --composite",
    })
    void badCompositeValuesAreLocated(String extra, String message) {
        BeamCommandTest.Run r = BeamCommandTest.run(exampleI1(extra.split(" ")));
        assertEquals(BaywrightCommand.EXIT_BAD_INPUT, r.code(), r.out());
        assertTrue(r.err().contains(message), r.err());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    /** --calc prints the composite sheet of the design: Qn by Eq. I8-1, the plastic strength of I3.2a, I_LB. */
    @Test
    void calcPrintsTheCompositeSheet() {
        BeamCommandTest.Run r = BeamCommandTest.run(exampleI1("--section", "W21X50", "--studs", "46", "--calc"));
        String t = r.out();
        assertAll(
                () -> assertEquals(0, r.code(), r.err()),
                () -> assertTrue(t.contains("Calculation sheet"), t),
                () -> assertTrue(t.contains("(AISC 360-16 Eq. I8-1)"), t),
                () -> assertTrue(t.contains("(AISC 360-16 I3.1a)"), t),
                () -> assertTrue(t.contains("ΣQn = n_h · Qn = 23 · "), t),
                () -> assertTrue(t.contains("Composite flexure: W21X50 with 23 studs per half span"), t));
    }

    @Test
    void missingSlabOptionsAreNamed() {
        BeamCommandTest.Run r = BeamCommandTest.run("beam", "--span", "45ft", "--live", "1klf", "--composite", "--spacing", "10ft");
        assertEquals(BaywrightCommand.EXIT_BAD_INPUT, r.code());
        assertTrue(r.err().contains("--composite needs --ribs"), r.err());
        BeamCommandTest.Run s = BeamCommandTest.run("beam", "--span", "45ft", "--live", "1klf", "--composite");
        assertTrue(s.err().contains("--composite needs --spacing"), s.err());
    }
}
