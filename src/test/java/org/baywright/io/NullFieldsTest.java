package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A JSON {@code null} in every position the plan format has, tried deterministically on every run (a
 * random fuzz finds such a position only now and then).
 *
 * <p>The positions come from the format's own records ({@link PlanDocument}), so a field added to the
 * format is covered without touching this test. For every object of every base file and every field its
 * record declares, present in the file or not:
 * <ul>
 * <li>an optional field set to {@code null} reads exactly as if the key were absent: the same plan, or
 * the same problems;</li>
 * <li>a required field set to {@code null} gives a {@code missing-field} problem at that field's
 * pointer;</li>
 * <li>an element of a list set to {@code null} gives a located {@code wrong-type} problem at its
 * pointer.</li>
 * </ul>
 * Never an internal error. The plan format page ({@code docs/plan-format.md}) is the specification:
 * "a {@code null} value counts as absent".
 */
class NullFieldsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    static Stream<String> bases() {
        return Stream.of("plans/examples/two-bay.bay.json", "plans/harbourview-offices.bay.json", "generated-si",
                "generated-us");
    }

    private static String text(String base) {
        return switch (base) {
            case "generated-si" -> PlanFiles.write(RegularPlan.generate(new RegularPlan.Spec("Generated (SI)", "si",
                    List.of(8.0, 9.5), List.of(7.5), List.of(4.2, 3.8), false, 2.5,
                    new LoadValues(2700, 500, 2400, 0, 0, 720), new LoadValues(1500, 300, 0, 960, 1200, 0),
                    new LoadValues(5800, 0, 0, 0, 0, 0))));
            case "generated-us" -> PlanFiles.write(RegularPlan.generate(new RegularPlan.Spec("Generated (US)", "us",
                    List.of(9.144), List.of(9.144, 6.096), List.of(4.2672), true, 3.048,
                    new LoadValues(2681, 479, 2394, 0, 0, 718), new LoadValues(958, 0, 0, 958, 0, 0), LoadValues.ZERO)));
            default -> {
                try {
                    yield Files.readString(Path.of(base));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
    }

    /** One place a null can stand: an object's field (declared by its record) or an element of a list. */
    private record Position(String pointer, String field, boolean required, boolean listElement) {
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("bases")
    void nullInEveryPositionReadsAsAbsentOrIsALocatedProblem(String base) throws IOException {
        String original = text(base);
        JsonNode root = JSON.readTree(original);
        List<Position> positions = new ArrayList<>();
        positions(root, PlanDocument.PlanDoc.class, "", positions::add);
        assertTrue(positions.size() > 50, "the walk found the format's positions: " + positions.size());

        List<Executable> checks = new ArrayList<>();
        for (Position at : positions) {
            checks.add(() -> checkNull(root, at));
        }
        assertAll(base + ": null in " + positions.size() + " positions", checks);
    }

    private static void checkNull(JsonNode root, Position at) {
        JsonNode withNull = root.deepCopy();
        JsonNode parent = withNull.at(at.pointer());
        if (at.listElement()) {
            ((ArrayNode) parent).set(Integer.parseInt(at.field()), NODES.nullNode());
        } else {
            ((ObjectNode) parent).putNull(at.field());
        }
        String where = at.pointer() + "/" + at.field();
        PlanReadResult r = PlanFiles.read(write(withNull), "nulled.bay.json");
        for (Problem p : r.problems()) {
            assertFalse(p.kind().equals("internal"), () -> "null at " + where + ": an internal error: " + p);
        }
        if (at.listElement()) {
            assertTrue(r.problems().stream().anyMatch(p -> p.kind().equals("wrong-type") && p.location().equals(where)),
                    () -> "null at " + where + " (a list element) is a located wrong-type problem: " + r.problems());
            return;
        }
        if (at.required()) {
            assertTrue(r.problems().stream().anyMatch(p -> p.kind().equals("missing-field") && p.location().equals(where)),
                    () -> "null at " + where + " (a required field) is a located missing-field problem: " + r.problems());
            return;
        }
        JsonNode withoutKey = root.deepCopy();
        ((ObjectNode) withoutKey.at(at.pointer())).remove(at.field());
        PlanReadResult absent = PlanFiles.read(write(withoutKey), "nulled.bay.json");
        assertEquals(absent.ok(), r.ok(), () -> "null at " + where + " reads as the key absent: " + r.problems());
        if (r.ok()) {
            assertEquals(absent.plan(), r.plan(), () -> "null at " + where + " gives the plan the absent key gives");
        } else {
            assertEquals(summary(absent.problems()), summary(r.problems()),
                    () -> "null at " + where + " gives the problems the absent key gives");
        }
    }

    private static List<String> summary(List<Problem> problems) {
        return problems.stream().map(p -> p.kind() + " " + p.location() + " " + p.message()).toList();
    }

    /** Every field of every object the schema describes, present or absent, and every list element. */
    private static void positions(JsonNode node, Type type, String pointer, Consumer<Position> out) {
        if (type instanceof ParameterizedType p && p.getRawType() == List.class) {
            if (!node.isArray()) {
                return;
            }
            for (int i = 0; i < node.size(); i++) {
                out.accept(new Position(pointer, Integer.toString(i), false, true));
                positions(node.get(i), p.getActualTypeArguments()[0], Pointers.child(pointer, i), out);
            }
            return;
        }
        if (!(type instanceof Class<?> c) || !c.isRecord() || !node.isObject()) {
            return;
        }
        for (RecordComponent rc : c.getRecordComponents()) {
            String key = rc.getName();
            if (c == PlanDocument.PlanDoc.class && (key.equals("format") || key.equals("version"))) {
                continue; // checked before the shape: a null there is the file's own problem (PlanFilesTest)
            }
            out.accept(new Position(pointer, key, rc.isAnnotationPresent(PlanDocument.Required.class), false));
            JsonNode v = node.get(key);
            if (v != null) {
                positions(v, rc.getGenericType(), Pointers.child(pointer, key), out);
            }
        }
    }

    private static String write(JsonNode n) {
        try {
            return JSON.writeValueAsString(n);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The two nulls a new user met, which once ended in a NullPointerException. */
    @Test
    void levelsOrFloorsNullReadWithoutAnInternalError() throws IOException {
        String demo = Files.readString(Path.of("plans/harbourview-offices.bay.json"));
        ObjectNode noLevels = (ObjectNode) JSON.readTree(demo);
        noLevels.putNull("levels");
        PlanReadResult levels = PlanFiles.read(write(noLevels), "demo-levels-null.bay.json");
        assertTrue(levels.ok(), () -> "levels are optional (docs/plan-format.md): " + levels.problems());
        assertTrue(levels.plan().orElseThrow().levels().isEmpty());

        ObjectNode noFloors = (ObjectNode) JSON.readTree(demo);
        noFloors.putNull("floors");
        PlanReadResult floors = PlanFiles.read(write(noFloors), "demo-floors-null.bay.json");
        assertFalse(floors.ok(), "the levels name floors that are not there");
        assertTrue(floors.problems().stream().noneMatch(p -> p.kind().equals("internal")), () -> "" + floors.problems());
        assertTrue(floors.problems().stream().allMatch(p -> p.kind().equals("unknown-reference")
                && p.location().matches("/levels/\\d+/floor") && p.message().contains("the plan has no floors")),
                () -> "each level's floor is a located unknown reference: " + floors.problems());
    }
}
