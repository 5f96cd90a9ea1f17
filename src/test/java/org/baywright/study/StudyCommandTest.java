package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.cli.BaywrightCommand;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** {@code baywright study} as a user drives it. */
class StudyCommandTest {
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = BaywrightCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    static Path plan(Path dir) {
        Path plan = dir.resolve("s.bay.json");
        Run n = run("new", "--bays-x", "2@30ft", "--bays-y", "2@30ft", "--levels", "1@13ft", "--beam-spacing", "10ft", "--dead",
                "56psf", "--live", "50psf", "-o", plan.toString());
        assertEquals(0, n.code(), n.err());
        return plan;
    }

    @Test
    void aStudyAsTableCsvAndJson(@TempDir Path dir) throws Exception {
        Path plan = plan(dir);
        Path csv = dir.resolve("s.csv");
        Run r = run("study", plan.toString(), "--vary", "beam-spacing=8ft..12ft:2ft", "--vary", "beam-direction=x,y",
                "--objective", "weight+pieces:150lb", "--csv", csv.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("6 of 6 variants"), r.out());
        assertTrue(r.out().contains("Best for weight + 150 lb per piece"), r.out());
        assertTrue(r.out().contains("  1. #"), r.out());
        assertTrue(r.out().contains("D"), r.out());
        assertEquals("", r.err(), "no progress line when stderr is not a terminal");
        assertEquals(7, Files.readAllLines(csv).size());
        Run j = run("study", plan.toString(), "--vary", "beam-spacing=8ft,12ft", "--max-depth", "24in", "--json", "-");
        assertEquals(0, j.code(), j.err());
        JsonNode t = new ObjectMapper().readTree(j.out());
        assertEquals("baywright-study", t.get("format").asText());
        assertEquals(2, t.get("variants").size());
        assertEquals(24, t.get("maxDepth").asDouble(), 1e-9);
        assertTrue(t.get("variants").get(0).get("structuralDepth").asDouble() <= 24 + 1e-9);
        assertFalse(t.get("best").isEmpty());
        assertTrue(t.get("variants").get(0).get("weightDepthFront").isBoolean());
    }

    /**
     * A spacing typed as a maximum becomes a whole number of beams per bay: in a 30 ft bay every maximum from
     * 10 ft to 14 ft gives 2 beams at 10 ft (30 / 3), and 15 ft gives 1 beam at 15 ft (arithmetic of the
     * infill rule, COMPUTED). The table, the CSV and the JSON show the actual spacing and beams per bay and mark
     * the variants that design the same floor.
     */
    @Test
    void aSpacingSweepShowsTheActualSpacingAndMarksIdenticalFloors(@TempDir Path dir) throws Exception {
        Path plan = plan(dir);
        Path csv = dir.resolve("s.csv");
        Run r = run("study", plan.toString(), "--vary", "beam-spacing=10ft..15ft:1ft", "--csv", csv.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("beams/bay") && r.out().contains("same as"), r.out());
        assertTrue(r.out().contains("same as: the variant designs the same floor"), r.out());
        Run j = run("study", plan.toString(), "--vary", "beam-spacing=10ft..15ft:1ft", "--json", "-");
        assertEquals(0, j.code(), j.err());
        JsonNode vs = new ObjectMapper().readTree(j.out()).get("variants");
        assertEquals(6, vs.size());
        for (int i = 0; i < 5; i++) {
            JsonNode v = vs.get(i);
            assertEquals(10.0, v.get("beamSpacing").asDouble(), 1e-6, "variant " + (i + 1));
            assertEquals("2", v.get("beamsPerBay").asText(), "variant " + (i + 1));
            if (i == 0) {
                assertTrue(v.get("sameFloorAs").isNull(), "the first of a group names no other");
            } else {
                assertEquals(1, v.get("sameFloorAs").asInt(), "variant " + (i + 1));
            }
        }
        assertEquals(15.0, vs.get(5).get("beamSpacing").asDouble(), 1e-6);
        assertEquals("1", vs.get(5).get("beamsPerBay").asText());
        assertTrue(vs.get(5).get("sameFloorAs").isNull(), "one beam per bay is another floor");
        var lines = Files.readAllLines(csv);
        var header = java.util.Arrays.asList(lines.get(0).split(","));
        int spacing = header.indexOf("actual beam spacing (ft)");
        int beams = header.indexOf("beams per bay");
        int same = header.indexOf("same floor as variant");
        assertTrue(spacing > 0 && beams > 0 && same > 0, lines.get(0));
        String[] third = lines.get(3).split(",", -1);
        assertEquals(10.0, Double.parseDouble(third[spacing]), 1e-6);
        assertEquals("2", third[beams]);
        assertEquals("1", third[same]);
        JsonNode best = new ObjectMapper().readTree(j.out()).get("best");
        assertEquals(2, best.size(), best.toString());
        assertEquals(java.util.Set.of(1, 6), java.util.Set.of(best.get(0).asInt(), best.get(1).asInt()),
                "the best list names each floor once: " + best);
    }

    /**
     * The vibration column appears only when some variant has a bay checked: a plan without a slab
     * ({@code plans/examples/two-bay.bay.json}) prints as before; the demo (a composite floor) carries "vib" in the table, "vibration ratio" in
     * the CSV and vibrationRatio in the JSON, each its variant's worst bay (1.42 for B-C/3-4, a_p/g 0.712 % over
     * 0.5 %, the run's own value; StudyVibrationTest compares every variant with its own run).
     */
    @Test
    void theVibrationColumnOnlyWhereBaysWereChecked(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("s.csv");
        Run bare = run("study", "plans/examples/two-bay.bay.json", "--vary", "method=lrfd,asd", "--csv", csv.toString());
        assertTrue(bare.out().contains("Baywright study") && bare.out().contains(" ratio "), bare.out() + bare.err());
        assertFalse(bare.out().contains(" vib"), bare.out());
        assertFalse(Files.readString(csv).contains("vibration"));
        Path demoCsv = dir.resolve("d.csv");
        Run demo = run("study", "plans/harbourview-offices.bay.json", "--vary", "method=lrfd", "--csv", demoCsv.toString());
        assertEquals(0, demo.code(), demo.err());
        assertTrue(demo.out().contains(" vib") && demo.out().contains("vib: the worst floor-vibration ratio"), demo.out());
        var lines = Files.readAllLines(demoCsv);
        int col = java.util.Arrays.asList(lines.get(0).split(",")).indexOf("vibration ratio");
        assertTrue(col > 0, lines.get(0));
        var run = org.baywright.run.PlanRun.run(org.baywright.io.PlanFiles.read(Path.of("plans/harbourview-offices.bay.json"))
                .plan().orElseThrow());
        assertEquals(VariantResult.vibrationRatio(run), Double.parseDouble(lines.get(1).split(",", -1)[col]), 1e-5);
    }

    @ParameterizedTest
    @ValueSource(strings = {"beam-spacing", "spacing=6ft", "beam-spacing=6ft..3ft:1ft", "beam-spacing=6..15:1",
        "beam-spacing=6ft..15ft", "beam-spacing=6ft,,8ft", "beam-direction=z", "beam-direction=x..y:1", "method=wsd",
        "beam-count=0", "beam-count=two", "bay-x=30ft;30ft;30ft", "bay-x=-5ft", "column-series=14W", "max-depth=deep",
        "beam-spacing=0ft"})
    void badVaryTextsAreBadInput(String text, @TempDir Path dir) {
        Run r = run("study", plan(dir).toString(), "--vary", text);
        assertEquals(2, r.code(), r.out() + r.err());
        String[] lines = r.err().strip().split("\n");
        assertEquals(1, lines.length, r.err());
        assertTrue(lines[0].contains("--vary"), lines[0]);
    }

    @Test
    void otherBadInput(@TempDir Path dir) {
        Path plan = plan(dir);
        assertEquals(2, run("study", plan.toString(), "--vary", "beam-count=1,2", "--vary", "beam-count=3").code());
        assertEquals(2, run("study", plan.toString(), "--objective", "cheapest").code());
        assertEquals(2, run("study", plan.toString(), "--max-depth", "24").code());
        assertEquals(2, run("study", dir.resolve("missing.bay.json").toString()).code());
    }
}
