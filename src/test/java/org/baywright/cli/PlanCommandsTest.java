package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code new}, {@code check} and {@code design} as a user drives them. */
class PlanCommandsTest {
    @Test
    void newThenDesignAsJson(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("x.bay.json");
        BeamCommandTest.Run n = BeamCommandTest.run("new", "--bays-x", "3@30ft", "--bays-y", "2@30ft", "--levels", "3@13ft",
                "--beams-along", "y", "--beam-spacing", "10ft", "--dead", "56psf", "--superimposed", "10psf", "--live", "50psf",
                "--roof-live", "20psf", "--edge-load", "0.4klf", "-o", plan.toString());
        assertEquals(0, n.code(), n.err());
        assertTrue(Files.size(plan) > 1000);
        BeamCommandTest.Run d = BeamCommandTest.run("design", plan.toString(), "--json", "-");
        assertEquals(0, d.code(), d.err());
        JsonNode j = new ObjectMapper().readTree(d.out());
        JsonNode m = j.get("members").get(0);
        JsonNode c = j.get("columns").get(0);
        assertAll(
                () -> assertEquals("us", j.get("units").get("system").asText()),
                () -> assertTrue(j.get("members").size() > 50),
                () -> assertTrue(m.has("id") && m.has("kind") && m.has("level") && m.has("length") && m.has("section")
                        && m.has("status") && m.has("weight") && m.has("tributaryArea") && m.has("ratios")
                        && m.has("reactions"), m.toString()),
                () -> assertTrue(m.get("reactions").get("start").has("D")),
                () -> assertEquals(12, j.get("columns").size()),
                () -> assertTrue(c.get("tiers").get(0).get("storeys").get(0).get("axial").has("L")),
                () -> assertTrue(c.get("tiers").get(0).get("storeys").get(0).has("axialLiveReduced")),
                () -> assertEquals(12, j.get("foundations").size()),
                () -> assertTrue(j.get("totals").get("steelWeight").asDouble() > 0),
                // 3 levels × 90 ft × 60 ft = 16,200 ft² (hand calculation)
                () -> assertEquals(16200, j.get("totals").get("floorArea").asDouble(), 1e-6),
                () -> assertEquals(4, j.get("equilibrium").size()),
                () -> assertTrue(j.get("equilibrium").get(0).get("holds").asBoolean()),
                () -> assertEquals(0, j.get("problems").size(), j.get("problems").toString()));
        BeamCommandTest.Run text = BeamCommandTest.run("design", plan.toString());
        assertTrue(text.out().contains("Steel weight"), text.out());
        assertTrue(text.out().contains("CAUTION"), text.out());
        BeamCommandTest.Run check = BeamCommandTest.run("check", plan.toString());
        assertEquals(0, check.code(), check.err());
    }

    @Test
    void siPlans(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("si.bay.json");
        assertEquals(0, BeamCommandTest.run("new", "--bays-x", "2@9m", "--bays-y", "2@9m", "--dead", "2.7kPa", "--live",
                "2.4kPa", "-o", plan.toString()).code());
        assertTrue(Files.readString(plan).contains("\"units\": \"si\""), Files.readString(plan));
        BeamCommandTest.Run d = BeamCommandTest.run("design", plan.toString(), "--json", "-");
        JsonNode j = new ObjectMapper().readTree(d.out());
        assertEquals("kN", j.get("units").get("force").asText());
        assertEquals(2 * 9 * 2 * 9, j.get("totals").get("floorArea").asDouble(), 1e-6);
    }

    @Test
    void brokenPlanFilesExitWithTwoAndLocatedLines(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.bay.json");
        Files.writeString(bad, "{\"format\": \"baywright-plan\", \"version\": 1, \"name\": \"x\", \"colour\": 3}");
        BeamCommandTest.Run d = BeamCommandTest.run("design", bad.toString());
        assertEquals(2, d.code());
        assertTrue(d.err().contains("colour"), d.err());
        assertFalse(d.err().contains("Exception"), d.err());
        BeamCommandTest.Run missing = BeamCommandTest.run("check", dir.resolve("none.bay.json").toString());
        assertEquals(2, missing.code());
        BeamCommandTest.Run badNew = BeamCommandTest.run("new", "--bays-x", "3@30yd", "--bays-y", "2@30ft", "-o",
                dir.resolve("y.bay.json").toString());
        assertEquals(2, badNew.code());
        assertTrue(badNew.err().contains("--bays-x"), badNew.err());
    }

    @Test
    void oneCommandWritesTheDeliverables(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("p.bay.json");
        assertEquals(0, BeamCommandTest.run("new", "--bays-x", "2@30ft", "--bays-y", "2@30ft", "--levels", "2@13ft", "-o",
                plan.toString()).code());
        Path pdf = dir.resolve("calc.pdf");
        Path svg = dir.resolve("level.svg");
        Path png = dir.resolve("level.png");
        Path csv = dir.resolve("takeoff.csv");
        Path cols = dir.resolve("columns.csv");
        BeamCommandTest.Run d = BeamCommandTest.run("design", plan.toString(), "--report", pdf.toString(), "--drawing",
                svg.toString(), "--level", "Roof", "--takeoff", csv.toString(), "--schedule", cols.toString(), "--allowance", "10");
        assertEquals(0, d.code(), d.err());
        assertTrue(Files.size(pdf) > 10_000);
        assertTrue(Files.readString(svg).contains("<svg"), "svg");
        // new plans are composite floors (new --composite on, the default): the takeoff adds studs and camber
        assertTrue(Files.readString(csv).startsWith("section,level,kind,pieces,length[ft],weight[lb],studs,camber[in]\n"),
                Files.readString(csv).lines().findFirst().orElse(""));
        assertTrue(Files.readString(dir.resolve("takeoff-totals.csv")).contains("\nheaded studs,"));
        assertTrue(Files.readString(dir.resolve("takeoff-totals.csv")).contains("\nconnections and miscellaneous allowance,10.0,%\n"));
        assertTrue(d.err().contains("wrote " + dir.resolve("takeoff-totals.csv")), d.err());
        assertTrue(d.out().matches("(?s).*\nTakeoff: [\\d,]+ lb members and columns \\+ 10 % allowance [\\d,]+ lb = [\\d,]+ lb .*"),
                "the summary prints the allowance and the total with it: " + d.out());
        Path xlsx = dir.resolve("takeoff.xlsx");
        assertEquals(0, BeamCommandTest.run("design", plan.toString(), "--takeoff", xlsx.toString()).code());
        try (var wb = new org.apache.poi.xssf.usermodel.XSSFWorkbook(Files.newInputStream(xlsx))) {
            assertEquals(5, wb.getNumberOfSheets());
        }
        assertTrue(!BeamCommandTest.run("design", plan.toString()).out().contains("Takeoff:"),
                "no takeoff line without an allowance");
        assertTrue(Files.readString(cols).startsWith("column,grid,position,level,section"));
        try (var doc = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
            assertTrue(text.contains("AISC 360-16"), "design basis");
            assertTrue(text.contains("licensed"), "caution");
        }
        assertEquals(0, BeamCommandTest.run("design", plan.toString(), "--drawing", png.toString()).code());
        assertTrue(Files.size(png) > 10_000);
        BeamCommandTest.Run badLevel = BeamCommandTest.run("design", plan.toString(), "--drawing", svg.toString(), "--level", "Attic");
        assertEquals(2, badLevel.code());
        assertTrue(badLevel.err().contains("Level 2"), badLevel.err());
        BeamCommandTest.Run badExt = BeamCommandTest.run("design", plan.toString(), "--drawing", dir.resolve("x.doc").toString());
        assertEquals(2, badExt.code(), badExt.err());
    }

    @Test
    void theDemoPlanRunsWithoutProblems() throws Exception {
        Path demo = Path.of("plans", "harbourview-offices.bay.json");
        BeamCommandTest.Run d = BeamCommandTest.run("design", demo.toString(), "--json", "-");
        assertEquals(0, d.code(), d.err());
        JsonNode j = new ObjectMapper().readTree(d.out());
        assertEquals(0, j.get("problems").size(), j.get("problems").toString());
        for (JsonNode e : j.get("equilibrium")) {
            assertTrue(e.get("holds").asBoolean(), e.toString());
        }
        assertEquals(4, j.get("columns").get(0).get("tiers").get(0).get("storeys").size() + j.get("columns").get(0)
                .get("tiers").get(1).get("storeys").size());
    }
}
