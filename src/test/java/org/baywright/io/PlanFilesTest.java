package org.baywright.io;

import static org.baywright.io.PlanAssertions.assertClose;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Problem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.opentest4j.AssertionFailedError;

class PlanFilesTest {
    private static final Path EXAMPLE = Path.of("plans", "examples", "two-bay.bay.json");
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    /** A valid plan file: the example plan as written. */
    private static final String BASE = PlanFiles.write(SamplePlans.twoBay());

    // ---- round trips

    @ParameterizedTest
    @ValueSource(strings = {"us", "si"})
    void roundTripKeepsEveryValue(String units) {
        Plan plan = SamplePlans.rich(units);
        PlanReadResult r = PlanFiles.read(PlanFiles.write(plan), "rich");
        assertEquals(List.of(), r.problems());
        assertTrue(r.ok());
        assertClose(plan, r.plan().orElseThrow(), 1e-9);
    }

    @ParameterizedTest
    @ValueSource(strings = {"us", "si"})
    void rewritingAReadPlanGivesTheSameBytes(String units) {
        String first = PlanFiles.write(SamplePlans.rich(units));
        String second = PlanFiles.write(read(first));
        assertEquals(first, second);
        assertEquals(second, PlanFiles.write(read(second)));
    }

    @Test
    void theUnitSystemDecidesTheWrittenUnits() {
        String us = PlanFiles.write(SamplePlans.rich("us"));
        String si = PlanFiles.write(SamplePlans.rich("si"));
        assertAll(
                () -> assertTrue(us.contains("\"fy\": \"50.03801952ksi\""), "345 MPa in ksi"),
                () -> assertTrue(us.contains("\"maxBeamDepth\": \"24in\"")),
                () -> assertTrue(us.contains("\"x\": \"23.95013123ft\""), "7.3 m in ft"),
                () -> assertTrue(us.contains("psf\"") && us.contains("klf\"") && us.contains("kip\"")),
                () -> assertFalse(us.contains("kPa") || us.contains("kN")),
                () -> assertTrue(si.contains("\"fy\": \"345MPa\"")),
                () -> assertTrue(si.contains("\"maxBeamDepth\": \"609.6mm\"")),
                () -> assertTrue(si.contains("\"x\": \"7.3m\"")),
                () -> assertTrue(si.contains("\"dead\": \"5.8375kN/m\"") && si.contains("\"live\": \"2.394kPa\"")
                        && si.contains("\"dead\": \"13.34466kN\"")),
                () -> assertFalse(si.contains("psf") || si.matches("(?s).*\\dft\".*")));
    }

    @Test
    void theLayoutIsStable() throws IOException {
        String text = PlanFiles.write(SamplePlans.rich("si"));
        JsonNode tree = JSON.readTree(text);
        assertAll(
                () -> assertTrue(text.startsWith("{\n  \"format\": \"baywright-plan\",\n  \"version\": 1,\n")),
                () -> assertTrue(text.endsWith("}\n")),
                () -> assertFalse(text.contains("\r")),
                () -> assertEquals(List.of("format", "version", "name", "units", "settings", "grid", "levels", "floors",
                        "columns"), keys(tree)),
                () -> assertEquals(List.of("method", "fy", "deflection", "deflectionLiveLoad", "beamSeries", "girderSeries", "columnSeries",
                        "maxBeamDepth", "spliceEvery", "liveLoadReduction", "partition", "girderArea", "catalog"),
                        keys(tree.get("settings"))),
                () -> assertEquals(List.of("id", "name", "roof", "slabEdge", "decks", "members", "infills", "openings",
                        "areaLoads", "lineLoads", "pointLoads"), keys(tree.at("/floors/0"))),
                () -> assertEquals(List.of("id", "kind", "start", "end", "section"), keys(tree.at("/floors/0/members/0"))),
                () -> assertEquals(List.of("id", "kind", "start", "end"), keys(tree.at("/floors/0/members/1")),
                        "a member without a fixed section leaves the key out"),
                () -> assertEquals(List.of("id", "outline", "dead", "superimposed", "live", "partition", "use"),
                        keys(tree.at("/floors/0/areaLoads/0")), "zero loads are left out"),
                () -> assertTrue(text.contains("\"name\": \"Typical — office ☂\""), "non-ASCII text is written as is"),
                () -> assertTrue(text.contains("\"name\": \"Rich \\\"test\\\" plan\\n2nd line\"")));
    }

    private static List<String> keys(JsonNode object) {
        List<String> keys = new ArrayList<>();
        object.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    @Test
    void theComparisonCanTellPlansApart() {
        Plan plan = SamplePlans.rich("us");
        Floor f = plan.floors().get(0);
        Point moved = new Point(f.members().get(0).end().x() * (1 + 1e-8), f.members().get(0).end().y());
        Floor changed = new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(),
                List.of(new org.baywright.plan.Member(f.members().get(0).id(), f.members().get(0).kind(),
                        f.members().get(0).start(), moved, Optional.empty())),
                f.infills(), f.openings(), f.areaLoads(), f.lineLoads(), f.pointLoads());
        Plan other = new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(),
                List.of(changed, plan.floors().get(1)), plan.columns());
        assertThrows(AssertionFailedError.class, () -> assertClose(plan, other, 1e-9));
    }

    @Test
    void writingRefusesAPlanWithoutAUnitSystem() {
        Plan p = SamplePlans.twoBay();
        Plan metric = new Plan(p.name(), "metric", p.settings(), p.grid(), p.levels(), p.floors(), p.columns());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> PlanFiles.write(metric));
        assertTrue(e.getMessage().contains("\"metric\""), e.getMessage());
    }

    // ---- the example file

    @Test
    void theExampleFileReadsAndIsWrittenAsItIs() throws IOException {
        PlanReadResult r = PlanFiles.read(EXAMPLE);
        assertEquals(List.of(), r.problems());
        Plan plan = r.plan().orElseThrow();
        assertClose(SamplePlans.twoBay(), plan, 1e-12);
        assertEquals(Files.readString(EXAMPLE, StandardCharsets.UTF_8), PlanFiles.write(plan));
        assertClose(plan, read(PlanFiles.write(plan)), 1e-9);
    }

    @Test
    void theDocumentationShowsTheExampleFile() throws IOException {
        String doc = Files.readString(Path.of("docs", "plan-format.md"), StandardCharsets.UTF_8);
        assertTrue(doc.contains("```json\n" + Files.readString(EXAMPLE, StandardCharsets.UTF_8) + "```"),
                "docs/plan-format.md ends with the example file as it is");
    }

    @Test
    void theExampleHasTheExpectedContent() {
        Plan p = read(BASE);
        assertAll(
                () -> assertEquals(5, p.grid().size()),
                () -> assertEquals(List.of("Level 2", "Roof"), p.levels().stream().map(l -> l.name()).toList()),
                () -> assertEquals(Units.FT_.toSi(30), p.gridLine("B").orElseThrow().offset(), 1e-12),
                () -> assertEquals(7, p.floor("typical").orElseThrow().members().size()),
                () -> assertEquals(Units.PSF.toSi(56), p.floor("typical").orElseThrow().areaLoads().get(0).values().dead(),
                        1e-9),
                () -> assertEquals(0, p.floor("typical").orElseThrow().areaLoads().get(0).values().snow(),
                        "a load left out is zero"),
                () -> assertEquals(2, p.floor("typical").orElseThrow().infills().get(0).count()),
                () -> assertEquals(Units.FT_.toSi(10), p.floor("typical").orElseThrow().infills().get(1).maxSpacing(), 1e-12),
                () -> assertEquals(0, p.floor("typical").orElseThrow().infills().get(1).count()),
                () -> assertEquals(Optional.of("W14X48"), p.columns().get(4).fixedSection()));
    }

    // ---- accepted input that the writer would not produce

    @Test
    void anyUnitAndDraftersLengthsAreAccepted() {
        ObjectNode r = base();
        ((ArrayNode) r.at("/floors/0/members/0/end")).removeAll().add("30'-6\"").add("0.0m");
        ((ObjectNode) r.at("/grid/1")).put("x", "9.144 m");
        ((ObjectNode) r.at("/floors/0/areaLoads/0")).put("live", "2.4kPa");
        ((ObjectNode) r.at("/settings")).put("fy", "345MPa");
        Plan p = read(r.toString());
        assertAll(
                () -> assertEquals(9.2964, p.floors().get(0).members().get(0).end().x(), 1e-12),
                () -> assertEquals(9.144, p.grid().get(1).offset(), 1e-12),
                () -> assertEquals(2400, p.floors().get(0).areaLoads().get(0).values().live(), 1e-9),
                () -> assertEquals(345e6, p.settings().fy(), 1e-3));
        assertTrue(PlanFiles.write(p).contains("\"end\": [\"30.5ft\", \"0ft\"]"));
    }

    @Test
    void optionalPartsMayBeLeftOutOrNull() {
        String minimal = "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"si\", \"levels\": [],"
                + " \"floors\": [{\"id\": \"f\", \"slabEdge\": [[\"0m\", \"0m\"], [\"9m\", \"0m\"], [\"9m\", \"6m\"]],"
                + " \"members\": [{\"id\": \"B1\", \"kind\": \"beam\", \"start\": [\"0m\", \"0m\"], \"end\": [\"9m\", \"0m\"],"
                + " \"section\": null}]}],"
                + " \"settings\": {\"maxBeamDepth\": null, \"deflection\": {\"live\": 0}}}";
        Plan p = read(minimal);
        assertAll(
                () -> assertEquals("", p.name()),
                () -> assertEquals(0, p.settings().liveDeflection()),
                () -> assertEquals(DesignSettings.defaults().totalDeflection(), p.settings().totalDeflection()),
                () -> assertEquals(DesignSettings.defaults().fy(), p.settings().fy()),
                () -> assertEquals(0, p.settings().maxBeamDepth()),
                () -> assertEquals(Optional.empty(), p.floors().get(0).members().get(0).fixedSection()),
                () -> assertFalse(p.floors().get(0).roof()),
                () -> assertEquals(List.of(), p.floors().get(0).decks()),
                () -> assertEquals(List.of(), p.columns()));
    }

    @Test
    void aByteOrderMarkIsIgnored() {
        assertTrue(PlanFiles.read("\uFEFF" + BASE, "bom").ok());
    }

    @Test
    void bayLinesMayBeGivenInEitherOrder() {
        ObjectNode r = base();
        ArrayNode x = (ArrayNode) r.at("/floors/0/infills/0/bay/x");
        x.removeAll().add("B").add("A");
        assertEquals("A", read(r.toString()).floors().get(0).infills().get(0).x0());
    }

    // ---- validation: one rule, one located problem

    record Case(String name, Consumer<ObjectNode> change, String kind, String pointer, String id) {
        @Override
        public String toString() {
            return name;
        }
    }

    private static Case c(String name, Consumer<ObjectNode> change, String kind, String pointer, String id) {
        return new Case(name, change, kind, pointer, id);
    }

    private static ObjectNode o(ObjectNode r, String pointer) {
        return (ObjectNode) r.at(pointer);
    }

    private static ArrayNode a(ObjectNode r, String pointer) {
        return (ArrayNode) r.at(pointer);
    }

    private static ArrayNode pair(String x, String y) {
        return NODES.arrayNode().add(x).add(y);
    }

    static Stream<Case> brokenFiles() {
        String m0 = "/floors/0/members/0";
        String in0 = "/floors/0/infills/0";
        return Stream.of(
                c("format of another kind", r -> r.put("format", "baywright-catalog"), "not-a-plan", "/format", ""),
                c("format missing", r -> r.remove("format"), "missing-field", "/format", ""),
                c("version missing", r -> r.remove("version"), "missing-field", "/version", ""),
                c("version zero", r -> r.put("version", 0), "bad-version", "/version", ""),
                c("version as text", r -> r.put("version", "1"), "bad-version", "/version", ""),
                c("newer version", r -> r.put("version", 2), "newer-version", "/version", ""),
                c("units missing", r -> r.remove("units"), "missing-field", "/units", ""),
                c("units unknown", r -> r.put("units", "imperial"), "bad-value", "/units", ""),
                c("unknown field at the top", r -> r.put("colour", "red"), "unknown-field", "/colour", ""),
                c("unknown field escaped in the pointer", r -> r.put("a/b~c", 1), "unknown-field", "/a~1b~0c", ""),
                c("unknown field in a member", r -> o(r, m0).put("camber", "1in"), "unknown-field", m0 + "/camber", "G-1-AB"),
                c("unknown field in the deflection limits", r -> o(r, "/settings/deflection").put("long", 480),
                        "unknown-field", "/settings/deflection/long", ""),
                c("member kind missing", r -> o(r, m0).remove("kind"), "missing-field", m0 + "/kind", "G-1-AB"),
                c("member kind null", r -> o(r, m0).putNull("kind"), "missing-field", m0 + "/kind", "G-1-AB"),
                c("member kind unknown", r -> o(r, m0).put("kind", "joist"), "bad-value", m0 + "/kind", "G-1-AB"),
                c("member id not text", r -> o(r, m0).put("id", 7), "wrong-type", m0 + "/id", "typical"),
                c("member id empty", r -> o(r, m0).put("id", " "), "bad-value", m0 + "/id", "typical"),
                c("member written as text", r -> a(r, "/floors/0/members").set(0, NODES.textNode("G-1-AB")),
                        "wrong-type", m0, "typical"),
                c("member null", r -> a(r, "/floors/0/members").set(0, NODES.nullNode()), "wrong-type", m0, "typical"),
                c("coordinate as a bare number", r -> a(r, m0 + "/start").set(0, NODES.numberNode(0)),
                        "wrong-type", m0 + "/start/0", "G-1-AB"),
                c("coordinate in an unknown unit", r -> a(r, m0 + "/end").set(1, NODES.textNode("30yd")),
                        "bad-quantity", m0 + "/end/1", "G-1-AB"),
                c("coordinate without a unit", r -> a(r, m0 + "/end").set(1, NODES.textNode("30")),
                        "bad-quantity", m0 + "/end/1", "G-1-AB"),
                c("coordinate of another dimension", r -> a(r, m0 + "/end").set(0, NODES.textNode("30psf")),
                        "bad-quantity", m0 + "/end/0", "G-1-AB"),
                c("coordinate far away", r -> a(r, m0 + "/end").set(0, NODES.textNode("1e300ft")),
                        "out-of-range", m0 + "/end/0", "G-1-AB"),
                c("coordinate infinite", r -> a(r, m0 + "/end").set(0, NODES.textNode("1e400ft")),
                        "bad-quantity", m0 + "/end/0", "G-1-AB"),
                c("point of three values", r -> a(r, m0 + "/end").add("0ft"), "bad-value", m0 + "/end", "G-1-AB"),
                c("member of zero length", r -> o(r, m0).set("end", pair("0ft", "0'-0\"")), "zero-length", m0 + "/end",
                        "G-1-AB"),
                c("blank fixed section", r -> o(r, "/floors/0/members/5").put("section", ""), "bad-value",
                        "/floors/0/members/5/section", "B-B-12"),
                c("slab edge of two vertices", r -> { a(r, "/floors/0/slabEdge").remove(3); a(r, "/floors/0/slabEdge").remove(2); }, "too-few-vertices",
                        "/floors/0/slabEdge", "typical"),
                c("slab edge repeating its first vertex", r -> a(r, "/floors/0/slabEdge").add(pair("0ft", "0ft")),
                        "bad-value", "/floors/0/slabEdge/4", "typical"),
                c("vertex that is not a pair", r -> a(r, "/floors/0/slabEdge").set(0, NODES.textNode("0ft")),
                        "wrong-type", "/floors/0/slabEdge/0", "typical"),
                c("opening of two vertices", r -> { a(r, "/floors/0/openings/0/outline").remove(0); a(r, "/floors/0/openings/0/outline").remove(0); },
                        "too-few-vertices", "/floors/0/openings/0/outline", "OP-stair"),
                c("duplicate grid label", r -> a(r, "/grid").addObject().put("label", "A").put("x", "90ft"),
                        "duplicate-id", "/grid/5/label", "A"),
                c("empty grid label", r -> a(r, "/grid").addObject().put("label", "").put("x", "90ft"),
                        "bad-value", "/grid/5/label", ""),
                c("grid line with x and y", r -> o(r, "/grid/0").put("y", "0ft"), "bad-value", "/grid/0/y", "A"),
                c("grid line without position", r -> a(r, "/grid").addObject().put("label", "D"), "missing-field",
                        "/grid/5/x", "D"),
                c("grid offset without unit", r -> o(r, "/grid/1").put("x", "30"), "bad-quantity", "/grid/1/x", "B"),
                c("storey height zero", r -> o(r, "/levels/0").put("storeyHeight", "0ft"), "out-of-range",
                        "/levels/0/storeyHeight", "Level 2"),
                c("levels out of order", r -> o(r, "/levels/1").put("elevation", "10ft"), "level-order",
                        "/levels/1/elevation", "Roof"),
                c("levels at one elevation", r -> o(r, "/levels/1").put("elevation", "14ft"), "level-order",
                        "/levels/1/elevation", "Roof"),
                c("level on an unknown floor", r -> o(r, "/levels/0").put("floor", "typ"), "unknown-reference",
                        "/levels/0/floor", "Level 2"),
                c("duplicate level name", r -> a(r, "/levels").addObject().put("name", "Level 2").put("elevation", "40ft")
                        .put("storeyHeight", "13ft").put("floor", "roof"), "duplicate-id", "/levels/2/name", "Level 2"),
                c("level without a name", r -> o(r, "/levels/1").remove("name"), "missing-field", "/levels/1/name", ""),
                c("duplicate floor id", r -> a(r, "/floors").add(o(r, "/floors/1").deepCopy().put("id", "typical")),
                        "duplicate-id", "/floors/2/id", "typical"),
                c("floor without an id", r -> o(r, "/floors/1").remove("id"), "missing-field", "/floors/1/id", ""),
                c("floors not a list", r -> r.set("floors", NODES.objectNode()), "wrong-type", "/floors", ""),
                c("roof flag as text", r -> o(r, "/floors/0").put("roof", "no"), "wrong-type", "/floors/0/roof", "typical"),
                c("duplicate member id", r -> o(r, "/floors/0/members/1").put("id", "G-1-AB"), "duplicate-id",
                        "/floors/0/members/1/id", "G-1-AB"),
                c("deck and member sharing an id", r -> o(r, "/floors/0/decks/0").put("id", "G-1-AB"), "duplicate-id",
                        m0 + "/id", "G-1-AB"),
                c("duplicate column id", r -> o(r, "/columns/1").put("id", "C-A1"), "duplicate-id", "/columns/1/id", "C-A1"),
                c("column without position", r -> o(r, "/columns/0").remove("at"), "missing-field", "/columns/0/at", "C-A1"),
                c("column up to an unknown level", r -> o(r, "/columns/4").put("topLevel", "Level 9"), "unknown-reference",
                        "/columns/4/topLevel", "C-B2"),
                c("infill on an unknown grid line", r -> a(r, in0 + "/bay/x").set(1, NODES.textNode("Q")),
                        "unknown-reference", in0 + "/bay/x/1", "IF-AB-12"),
                c("infill x on a y line", r -> a(r, in0 + "/bay/x").set(1, NODES.textNode("2")), "wrong-axis",
                        in0 + "/bay/x/1", "IF-AB-12"),
                c("infill y on an x line", r -> a(r, in0 + "/bay/y").set(0, NODES.textNode("A")), "wrong-axis",
                        in0 + "/bay/y/0", "IF-AB-12"),
                c("infill between one line", r -> a(r, in0 + "/bay/x").set(1, NODES.textNode("A")), "bad-value",
                        in0 + "/bay/x/1", "IF-AB-12"),
                c("infill with three lines", r -> a(r, in0 + "/bay/x").add("C"), "bad-value", in0 + "/bay/x", "IF-AB-12"),
                c("infill without bay", r -> o(r, in0).remove("bay"), "missing-field", in0 + "/bay", "IF-AB-12"),
                c("infill by count and spacing", r -> o(r, in0).put("maxSpacing", "10ft"), "bad-value",
                        in0 + "/maxSpacing", "IF-AB-12"),
                c("infill by neither", r -> o(r, in0).remove("count"), "missing-field", in0 + "/count", "IF-AB-12"),
                c("infill count zero", r -> o(r, in0).put("count", 0), "out-of-range", in0 + "/count", "IF-AB-12"),
                c("infill count fractional", r -> o(r, in0).put("count", 2.5), "wrong-type", in0 + "/count", "IF-AB-12"),
                c("infill spacing zero", r -> o(r, "/floors/0/infills/1").put("maxSpacing", "0ft"), "out-of-range",
                        "/floors/0/infills/1/maxSpacing", "IF-BC-12"),
                c("infill direction unknown", r -> o(r, in0).put("direction", "z"), "bad-value", in0 + "/direction",
                        "IF-AB-12"),
                c("deck without span angle", r -> o(r, "/floors/0/decks/0").remove("spanAngle"), "missing-field",
                        "/floors/0/decks/0/spanAngle", "DK-1"),
                c("deck span angle as text", r -> o(r, "/floors/0/decks/0").put("spanAngle", "0deg"), "wrong-type",
                        "/floors/0/decks/0/spanAngle", "DK-1"),
                c("negative load", r -> o(r, "/floors/0/areaLoads/0").put("live", "-50psf"), "out-of-range",
                        "/floors/0/areaLoads/0/live", "AL-office"),
                c("area load given as a force", r -> o(r, "/floors/0/areaLoads/0").put("dead", "5kip"), "bad-quantity",
                        "/floors/0/areaLoads/0/dead", "AL-office"),
                c("area load use unknown", r -> o(r, "/floors/0/areaLoads/0").put("use", "office"), "bad-value",
                        "/floors/0/areaLoads/0/use", "AL-office"),
                c("line load of one point", r -> a(r, "/floors/0/lineLoads/0/path").remove(1), "too-few-vertices",
                        "/floors/0/lineLoads/0/path", "LL-cladding"),
                c("line load given as an area load", r -> o(r, "/floors/0/lineLoads/0").put("dead", "0.4psf"),
                        "bad-quantity", "/floors/0/lineLoads/0/dead", "LL-cladding"),
                c("point load without position", r -> o(r, "/floors/0/pointLoads/0").remove("at"), "missing-field",
                        "/floors/0/pointLoads/0/at", "PL-safe"),
                c("settings not an object", r -> r.put("settings", "lrfd"), "wrong-type", "/settings", ""),
                c("design method unknown", r -> o(r, "/settings").put("method", "wsd"), "bad-value", "/settings/method", ""),
                c("yield stress too low", r -> o(r, "/settings").put("fy", "10ksi"), "out-of-range", "/settings/fy", ""),
                c("yield stress too high", r -> o(r, "/settings").put("fy", "1200MPa"), "out-of-range", "/settings/fy", ""),
                c("yield stress without unit", r -> o(r, "/settings").put("fy", "50"), "bad-quantity", "/settings/fy", ""),
                c("live deflection ratio too small", r -> o(r, "/settings/deflection").put("live", 30), "out-of-range",
                        "/settings/deflection/live", ""),
                c("total deflection ratio too large", r -> o(r, "/settings/deflection").put("total", 20000),
                        "out-of-range", "/settings/deflection/total", ""),
                c("huge plain number", r -> o(r, "/settings/deflection").put("total", 1e20), "out-of-range",
                        "/settings/deflection/total", ""),
                c("splices every zero levels", r -> o(r, "/settings").put("spliceEvery", 0), "out-of-range",
                        "/settings/spliceEvery", ""),
                c("huge whole number", r -> o(r, "/settings").put("spliceEvery", new BigInteger("1000000000000000000000")),
                        "out-of-range", "/settings/spliceEvery", ""),
                c("whole number as text", r -> o(r, "/settings").put("spliceEvery", "2"), "wrong-type",
                        "/settings/spliceEvery", ""),
                c("flag as text", r -> o(r, "/settings").put("liveLoadReduction", "yes"), "wrong-type",
                        "/settings/liveLoadReduction", ""),
                c("partition unknown", r -> o(r, "/settings").put("partition", "both"), "bad-value", "/settings/partition",
                        ""),
                c("girder area unknown", r -> o(r, "/settings").put("girderArea", "half"), "bad-value",
                        "/settings/girderArea", ""),
                c("deflection live load unknown", r -> o(r, "/settings").put("deflectionLiveLoad", "partly"), "bad-value",
                        "/settings/deflectionLiveLoad", ""),
                c("negative depth limit", r -> o(r, "/settings").put("maxBeamDepth", "-1in"), "out-of-range",
                        "/settings/maxBeamDepth", ""),
                c("empty series", r -> a(r, "/settings/columnSeries").set(0, NODES.textNode("")), "bad-value",
                        "/settings/columnSeries/0", ""));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenFiles")
    void eachRuleGivesOneLocatedProblem(Case c) {
        ObjectNode r = base();
        c.change().accept(r);
        PlanReadResult result = PlanFiles.read(r.toString(), "case.bay.json");
        assertFalse(result.ok());
        assertEquals(Optional.empty(), result.plan());
        assertEquals(1, result.problems().size(), () -> "expected one problem, got " + result.problems());
        Problem p = result.problems().get(0);
        assertAll(
                () -> assertEquals(Problem.Severity.ERROR, p.severity()),
                () -> assertEquals(c.kind(), p.kind(), p::toString),
                () -> assertEquals(c.pointer(), p.location(), p::toString),
                () -> assertEquals(c.id(), p.objectId(), p::toString),
                () -> assertTrue(p.message().length() > 20, p::toString));
    }

    @Test
    void theBaseOfTheBrokenFilesIsValid() {
        PlanReadResult r = PlanFiles.read(base().toString(), "base");
        assertEquals(List.of(), r.problems());
        assertTrue(r.ok());
    }

    @Test
    void allProblemsOfAFileAreReportedAtOnce() {
        ObjectNode r = base();
        r.put("colour", "red");
        o(r, "/settings").put("spliceEvery", 0);
        o(r, "/levels/0").put("storeyHeight", "-13ft");
        o(r, "/floors/0/members/0").put("kind", "joist");
        a(r, "/floors/0/members/2/end").set(1, NODES.textNode("30yd"));
        a(r, "/floors/0/infills/0/bay/x").set(1, NODES.textNode("Q"));
        o(r, "/floors/1/areaLoads/0").put("snow", "-25psf");
        o(r, "/columns/5").put("topLevel", "Attic");
        PlanReadResult result = PlanFiles.read(r.toString(), "many");
        List<String> where = result.problems().stream().map(p -> p.location() + " " + p.objectId()).toList();
        assertEquals(List.of(
                "/colour ",
                "/settings/spliceEvery ",
                "/levels/0/storeyHeight Level 2",
                "/floors/0/members/0/kind G-1-AB",
                "/floors/0/members/2/end/1 G-2-AB",
                "/floors/0/infills/0/bay/x/1 IF-AB-12",
                "/floors/1/areaLoads/0/snow AL-roof",
                "/columns/5/topLevel C-C2"), where);
        assertTrue(result.plan().isEmpty());
    }

    // ---- messages

    @Test
    void anUnknownFieldIsNamedWithTheFieldsAllowed() {
        ObjectNode r = base();
        o(r, "/floors/0/members/0").put("sectoin", "W24X55");
        Problem p = single(r.toString());
        assertAll(
                () -> assertTrue(p.message().contains("\"sectoin\""), p.message()),
                () -> assertTrue(p.message().contains("did you mean \"section\""), p.message()),
                () -> assertTrue(p.message().contains("id, kind, start, end, section"), p.message()),
                () -> assertEquals("error: /floors/0/members/0/sectoin (G-1-AB): " + p.message(), p.toString()));
    }

    @Test
    void aUnitErrorNamesFieldValueAndAcceptedForms() {
        ObjectNode r = base();
        a(r, "/floors/0/members/0/end").set(1, NODES.textNode("30yd"));
        Problem p = single(r.toString());
        assertTrue(p.message().startsWith("end y: \"30yd\""), p.message());
        assertTrue(p.message().contains("ft, in, m, mm or cm"), p.message());
    }

    @Test
    void aReferenceErrorListsTheChoices() {
        ObjectNode r = base();
        o(r, "/levels/0").put("floor", "typ");
        Problem p = single(r.toString());
        assertTrue(p.message().contains("\"typ\"") && p.message().contains("\"typical\" or \"roof\""), p.message());
    }

    @Test
    void aNewerVersionIsRefusedNamingBothVersions() {
        ObjectNode r = base();
        r.put("version", 7);
        r.put("somethingNew", true);
        Problem p = single(r.toString());
        assertEquals("newer-version", p.kind());
        assertTrue(p.message().contains("version 7") && p.message().contains("(1)"), p.message());
    }

    // ---- malformed JSON

    @Test
    void duplicateKeysAreRefused() {
        Problem p = single(BASE.replace("\"name\": \"Two-bay example\",",
                "\"name\": \"Two-bay example\", \"name\": \"again\","));
        assertEquals("duplicate-key", p.kind());
        assertEquals("/name", p.location());
        assertTrue(p.message().contains("\"name\" appears twice") && p.message().contains("line 4"), p.message());
    }

    @Test
    void duplicateKeysDeepInsideAreLocated() {
        Problem p = single(BASE.replace("{\"label\": \"B\", \"x\": \"30ft\"}", "{\"label\": \"B\", \"x\": \"30ft\", \"x\": \"31ft\"}"));
        assertEquals("duplicate-key", p.kind());
        assertEquals("/grid/1/x", p.location());
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "-Infinity", "+Infinity"})
    void nonFiniteNumbersAreRefused(String token) {
        Problem p = single(BASE.replaceFirst("\"spanAngle\": 0", "\"spanAngle\": " + token));
        assertEquals("not-a-number", p.kind());
        assertEquals("/floors/0/decks/0/spanAngle", p.location());
    }

    @Test
    void deepNestingIsRefused() {
        int depth = 200;
        String json = "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"us\", \"x\": "
                + "[".repeat(depth) + "]".repeat(depth) + "}";
        Problem p = single(json);
        assertEquals("too-deep", p.kind());
        assertTrue(p.message().contains("64"), p.message());
    }

    @Test
    void nestingWithinTheLimitIsOnlyAnUnknownField() {
        int depth = PlanFiles.MAX_NESTING - 2;
        String json = "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"us\", \"x\": "
                + "[".repeat(depth) + "]".repeat(depth) + "}";
        assertEquals("unknown-field", single(json).kind());
    }

    @Test
    void aTruncatedFileIsReported() {
        Problem p = single(BASE.substring(0, BASE.length() / 2));
        assertEquals("truncated", p.kind());
        assertTrue(p.message().contains("line "), p.message());
        assertFalse(p.message().contains("Source"), p.message());
    }

    @Test
    void textAfterThePlanIsRefused() {
        assertEquals("syntax", single(BASE + "{}").kind());
    }

    @Test
    void brokenJsonIsASyntaxProblem() {
        Problem p = single(BASE.replace("\"version\": 1,", "\"version\": 1"));
        assertEquals("syntax", p.kind());
        assertTrue(p.message().contains("line 4"), p.message());
    }

    @Test
    void overlongTextIsRefused() {
        String json = "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"us\", \"name\": \""
                + "x".repeat(PlanFiles.MAX_STRING + 1) + "\"}";
        assertEquals("too-long", single(json).kind());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "   \n", "[]", "\"plan\"", "42", "null"})
    void somethingOtherThanAnObjectIsNotAPlan(String json) {
        Problem p = single(json);
        assertTrue(p.kind().equals("empty") || p.kind().equals("not-a-plan"), p::toString);
    }

    // ---- files

    @Test
    void aMissingFileIsAProblem(@TempDir Path dir) {
        PlanReadResult r = PlanFiles.read(dir.resolve("nothing.bay.json"));
        assertFalse(r.ok());
        assertEquals("io", r.problems().get(0).kind());
        assertTrue(r.problems().get(0).message().contains("no such file"));
        assertEquals("io", PlanFiles.read(dir).problems().get(0).kind(), "a folder");
    }

    @Test
    void aFileThatIsNotUtf8IsAProblem(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("latin1.bay.json");
        Files.write(f, BASE.replace("Two-bay example", "Caf\u00e9").getBytes(StandardCharsets.ISO_8859_1));
        assertEquals("not-utf8", PlanFiles.read(f).problems().get(0).kind());
    }

    @Test
    void anOversizedFileIsRefusedUnread(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("huge.bay.json");
        try (RandomAccessFile raf = new RandomAccessFile(f.toFile(), "rw")) {
            raf.setLength(PlanFiles.MAX_DOCUMENT + 1);
        }
        PlanReadResult r = PlanFiles.read(f);
        assertEquals(List.of("too-large"), r.problems().stream().map(Problem::kind).toList());
    }

    @Test
    void writingIsAtomicAndKeepsTheLastVersionAsBak(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("plan" + PlanFiles.EXTENSION);
        Plan first = SamplePlans.twoBay();
        Plan second = SamplePlans.rich("si");
        Plan third = SamplePlans.rich("us");
        PlanFiles.write(first, f);
        assertEquals(List.of("plan.bay.json"), names(dir), "no backup of nothing, no temporary file left");
        PlanFiles.write(second, f);
        assertEquals(List.of("plan.bay.json", "plan.bay.json.bak"), names(dir));
        assertEquals(PlanFiles.write(second), Files.readString(f));
        assertEquals(PlanFiles.write(first), Files.readString(dir.resolve("plan.bay.json.bak")));
        PlanFiles.write(third, f);
        assertEquals(List.of("plan.bay.json", "plan.bay.json.bak"), names(dir));
        assertEquals(PlanFiles.write(second), Files.readString(dir.resolve("plan.bay.json.bak")));
        assertClose(third, PlanFiles.read(f).plan().orElseThrow(), 1e-9);
    }

    @Test
    void writingIntoAMissingFolderFailsWithoutLeavingFiles(@TempDir Path dir) {
        assertThrows(IOException.class, () -> PlanFiles.write(SamplePlans.twoBay(), dir.resolve("no/such/plan.bay.json")));
        assertEquals(List.of(), names(dir));
    }

    // ---- helpers

    private static List<String> names(Path dir) {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static ObjectNode base() {
        try {
            return (ObjectNode) JSON.readTree(BASE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Plan read(String json) {
        PlanReadResult r = PlanFiles.read(json, "test");
        assertEquals(List.of(), r.problems());
        return r.plan().orElseThrow();
    }

    private static Problem single(String json) {
        PlanReadResult r = PlanFiles.read(json, "test.bay.json");
        assertFalse(r.ok());
        assertTrue(r.plan().isEmpty());
        assertEquals(1, r.problems().size(), () -> r.problems().toString());
        return r.problems().get(0);
    }
}
