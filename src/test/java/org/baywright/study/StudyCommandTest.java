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
