package org.baywright.robust;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import net.jqwik.api.lifecycle.AfterContainer;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;

/**
 * Damaged plan files: valid files cut short, with bytes flipped, values of the wrong JSON type, huge
 * and non-finite numbers, deep nesting, duplicate keys, enormous arrays, and plain random bytes.
 *
 * <p>Every file must read to either a valid plan or located problems (each with a message and a
 * place: a JSON pointer that exists in the file, an object id, or the file's name), never an
 * exception and never an internal error, within a generous guard against a hang. Valid results must
 * write and read back, and the small ones must run.
 */
class FileFuzzTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final String FILE_NAME = "mutant.bay.json";
    private static final String HOLE = "@@HOLE@@";

    /** Problems about the text itself, located where parsing stopped (which may not be in the tree). */
    private static final Set<String> TEXT_KINDS = Set.of("syntax", "truncated", "duplicate-key", "not-a-number",
            "too-deep", "too-long", "too-large", "not-utf8", "empty", "io");

    /** The valid files mutated: the example, the demo, and generated plans in both unit systems. */
    private static final List<String> BASES = List.of(
            read(Path.of("plans", "examples", "two-bay.bay.json")),
            read(Path.of("plans", "harbourview-offices.bay.json")),
            PlanFiles.write(RegularPlan.generate(new RegularPlan.Spec("Generated (SI)", "si", List.of(8.0, 9.5),
                    List.of(7.5), List.of(4.2, 3.8), false, 2.5, new LoadValues(2700, 500, 2400, 0, 0, 720),
                    new LoadValues(1500, 300, 0, 960, 1200, 0), new LoadValues(5800, 0, 0, 0, 0, 0)))),
            PlanFiles.write(RegularPlan.generate(new RegularPlan.Spec("Generated (US)", "us", List.of(9.144),
                    List.of(9.144, 6.096), List.of(4.2672), true, 3.048, new LoadValues(2681, 479, 2394, 0, 0, 718),
                    new LoadValues(958, 0, 0, 958, 0, 0), LoadValues.ZERO))));

    private static final Path DIR;

    static {
        try {
            DIR = Files.createTempDirectory("baywright-file-fuzz");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static final Map<String, int[]> OUTCOMES = new TreeMap<>();
    private static final AtomicInteger RUNS = new AtomicInteger();

    // ------------------------------------------------------------------ mutations

    @Property(tries = 200)
    void truncated(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double at) {
        byte[] b = bytes(base);
        int n = (int) (at * b.length);
        check("truncated", java.util.Arrays.copyOf(b, n));
    }

    @Property(tries = 200)
    void bytesFlipped(@ForAll("bases") int base, @ForAll @Size(min = 1, max = 8) List<@DoubleRange(min = 0, max = 1,
            maxIncluded = false) Double> where, @ForAll @IntRange(min = 1, max = 255) int mask) {
        byte[] b = bytes(base);
        int m = mask;
        for (double w : where) {
            int i = (int) (w * b.length);
            b[i] ^= (byte) m;
            m = (m * 31 + 7) & 0xFF | 1;
        }
        check("bytes flipped", b);
    }

    @Property(tries = 200)
    void wrongJsonType(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll("values") JsonNode replacement) {
        JsonNode root = tree(base);
        replace(root, pick(root, which), replacement.deepCopy());
        check("wrong type", text(root));
    }

    /**
     * A {@code null} in every position of every base file, on every run: deterministic, so a position
     * that once crashed the reader ({@code "levels": null}) cannot hide behind the random draw above.
     * The schema-wide rule (null reads as absent) is {@code io.NullFieldsTest}; this one also runs what
     * still reads.
     */
    @Example
    void nullInEveryPosition() {
        for (int base = 0; base < BASES.size(); base++) {
            JsonNode root = tree(base);
            List<String> pointers = new ArrayList<>();
            walk(root, "", (p, n) -> {
                if (!p.isEmpty()) {
                    pointers.add(p);
                }
            });
            for (String pointer : pointers) {
                JsonNode mutant = tree(base);
                replace(mutant, pointer, NODES.nullNode());
                check("null everywhere", text(mutant));
            }
        }
    }

    @Property(tries = 150)
    void hugeNumbers(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll("hugeTokens") String token) {
        check("huge number", withToken(base, which, token));
    }

    @Property(tries = 100)
    void notANumber(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll("nanTokens") String token) {
        check("NaN or Infinity", withToken(base, which, token));
    }

    @Property(tries = 24)
    void deepNesting(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll @IntRange(min = 0, max = 5) int shape) {
        int depth = 10_000;
        String deep = switch (shape) {
            case 0 -> "[".repeat(depth) + "]".repeat(depth);
            case 1 -> "{\"a\":".repeat(depth) + "1" + "}".repeat(depth);
            case 2 -> "[".repeat(depth);
            case 3 -> "[{\"x\":".repeat(depth / 2) + "null" + "}]".repeat(depth / 2);
            default -> null;
        };
        if (shape == 4) {
            check("deep nesting", "[".repeat(depth) + "]".repeat(depth));
        } else if (shape == 5) {
            check("deep nesting", "{\"format\": \"baywright-plan\", \"version\": 1, \"grid\": " + "[".repeat(depth)
                    + "]".repeat(depth) + "}");
        } else {
            check("deep nesting", withToken(base, which, deep));
        }
    }

    @Property(tries = 150)
    void randomBytes(@ForAll @Size(max = 3000) byte[] random, @ForAll boolean jsonAlphabet) {
        if (jsonAlphabet) {
            String alphabet = "{}[]\",: \n0123456789.eE+-truefalsnul\\\"ftpsfkip";
            StringBuilder b = new StringBuilder();
            for (byte x : random) {
                b.append(alphabet.charAt((x & 0xFF) % alphabet.length()));
            }
            check("random bytes", b.toString());
        } else {
            check("random bytes", random);
        }
    }

    @Property(tries = 100)
    void duplicateKeys(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll boolean sameValue) {
        JsonNode root = tree(base);
        List<String> objects = new ArrayList<>();
        walk(root, "", (p, n) -> {
            if (n.isObject() && n.size() > 0) {
                objects.add(p);
            }
        });
        String at = objects.get((int) (which * objects.size()));
        ObjectNode o = (ObjectNode) root.at(at);
        Iterator<String> names = o.fieldNames();
        String key = names.next();
        o.set("__dup__", sameValue ? o.get(key).deepCopy() : NODES.textNode("other"));
        check("duplicate key", text(root).replace("\"__dup__\"", JSON.valueToTree(key).toString()));
    }

    @Property(tries = 12)
    void enormousArrays(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll @IntRange(min = 0, max = 3) int fill) {
        JsonNode root = tree(base);
        List<String> arrays = new ArrayList<>();
        walk(root, "", (p, n) -> {
            if (n.isArray()) {
                arrays.add(p);
            }
        });
        ArrayNode a = (ArrayNode) root.at(arrays.get((int) (which * arrays.size())));
        JsonNode first = a.isEmpty() ? NODES.numberNode(1) : a.get(0);
        a.removeAll();
        int n = 100_000;
        for (int i = 0; i < n; i++) {
            a.add(switch (fill) {
                case 0 -> numbered(first.deepCopy(), i);
                case 1 -> NODES.nullNode();
                case 2 -> NODES.numberNode(i);
                default -> NODES.textNode(i + "ft");
            });
        }
        check("enormous array", text(root));
    }

    @Property(tries = 8)
    void enormousText(@ForAll("bases") int base, @ForAll @DoubleRange(min = 0, max = 1, maxIncluded = false) double which,
            @ForAll boolean asKey) {
        JsonNode root = tree(base);
        String huge = "x".repeat(asKey ? 20_000 : 2_000_000);
        if (asKey) {
            ((ObjectNode) root).put(huge, 1);
            check("enormous text", text(root));
        } else {
            replace(root, pick(root, which), NODES.textNode(huge));
            check("enormous text", text(root));
        }
    }

    /** A copy of a list item with its own id, label and name (so that it is not simply a duplicate). */
    private static JsonNode numbered(JsonNode item, int i) {
        if (item instanceof ObjectNode o) {
            for (String key : List.of("id", "label", "name")) {
                if (o.path(key).isTextual()) {
                    o.put(key, o.get(key).asText() + "-" + i);
                }
            }
        }
        return item;
    }

    // ------------------------------------------------------------------ the check of one file

    private static void check(String kind, String text) {
        check(kind, text.getBytes(StandardCharsets.UTF_8));
    }

    private static void check(String kind, byte[] content) {
        Path file = DIR.resolve(FILE_NAME);
        PlanReadResult r = Guard.call("reading a file (" + kind + ")", () -> {
            Files.write(file, content);
            return PlanFiles.read(file);
        });
        assertNotNull(r);
        JsonNode lenient = lenient(content);
        for (Problem p : r.problems()) {
            assertFalse(p.kind().equals("internal"), () -> "an internal error: " + p);
            assertFalse(p.message().isBlank(), () -> "a problem without a message: " + p);
            assertTrue(p.message().length() <= 2_001, () -> "a message too long to read: " + p.message().length()
                    + " characters, starting " + p.message().substring(0, 200));
            boolean fileLevel = p.message().contains(file.toString());
            assertTrue(!p.location().isEmpty() || !p.objectId().isEmpty() || fileLevel, () -> "a problem without a place: " + p);
            if (!p.location().isEmpty()) {
                JsonPointer ptr = assertDoesNotThrow(() -> JsonPointer.compile(p.location()),
                        () -> "not a JSON pointer: " + p);
                if (lenient != null && !TEXT_KINDS.contains(p.kind())) {
                    JsonNode parent = lenient.at(ptr.head());
                    boolean there = !lenient.at(ptr).isMissingNode();
                    assertTrue(there || p.kind().equals("missing-field") && !parent.isMissingNode(),
                            () -> "the pointer of " + p + " is not in the file");
                }
            }
        }
        if (r.ok()) {
            Plan plan = r.plan().get();
            PlanReadResult again = PlanFiles.read(PlanFiles.write(plan), "rewritten");
            assertTrue(again.ok(), () -> "a plan read from a file writes and reads back: " + again.problems());
            if (content.length < 8_000) {
                RunResult run = Guard.call("running a mutated plan", () -> PlanRun.run(plan, CATALOG));
                if (run.takedown() != null) {
                    RunChecks.problemsAreLocated(run);
                    RunChecks.equilibrium(run);
                }
                RUNS.incrementAndGet();
            }
        } else {
            assertTrue(r.plan().isEmpty() && !r.errors().isEmpty(), () -> "rejected without an error: " + r.problems());
        }
        count(kind, r.ok());
    }

    /** The file as a tree when it parses at all (duplicate keys allowed, the last wins), else null. */
    private static JsonNode lenient(byte[] content) {
        try {
            JsonNode n = JSON.readTree(content);
            return n == null || n.isMissingNode() ? null : n;
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    private static synchronized void count(String kind, boolean valid) {
        int[] c = OUTCOMES.computeIfAbsent(kind, k -> new int[2]);
        c[valid ? 1 : 0]++;
    }

    @AfterContainer
    static void summary() throws IOException {
        int rejected = OUTCOMES.values().stream().mapToInt(c -> c[0]).sum();
        int valid = OUTCOMES.values().stream().mapToInt(c -> c[1]).sum();
        StringBuilder detail = new StringBuilder();
        OUTCOMES.forEach((k, c) -> detail.append(detail.length() == 0 ? "" : ", ").append(k).append(' ')
                .append(c[0]).append('/').append(c[1]));
        System.out.println(String.format(Locale.ROOT, "%,d mutated files: %,d rejected with located problems, %,d still valid"
                + " (%,d of them run); rejected/valid by mutation: %s", rejected + valid, rejected, valid, RUNS.get(), detail));
        try (Stream<Path> s = Files.walk(DIR)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    // ------------------------------------------------------------------ generators and tree helpers

    @Provide
    Arbitrary<Integer> bases() {
        return Arbitraries.integers().between(0, BASES.size() - 1);
    }

    @Provide
    Arbitrary<JsonNode> values() {
        return Arbitraries.of(NODES.textNode("text"), NODES.textNode(""), NODES.textNode("30ft"), NODES.textNode("50psf"),
                NODES.numberNode(42), NODES.numberNode(-1), NODES.numberNode(0), NODES.numberNode(3.5), NODES.booleanNode(true),
                NODES.booleanNode(false), NODES.nullNode(), NODES.arrayNode(), NODES.objectNode(),
                NODES.arrayNode().add(1).add(2), NODES.arrayNode().add("0ft").add("0ft"), NODES.objectNode().put("a", 1),
                NODES.objectNode().put("id", "X"));
    }

    @Provide
    Arbitrary<String> hugeTokens() {
        return Arbitraries.of("1e308", "1e400", "-1e400", "1e-400", "1.7976931348623157e308", "123456789012345678901234567890",
                "9".repeat(99), "1" + "0".repeat(200), "2147483648", "-2147483649", "9223372036854775808", "0.0000000000000000000001",
                "-0", "1E+999999999", "\"1e400ft\"", "\"1e308ft\"", "\"-1e308m\"", "\"99999999999999999999999psf\"",
                "\"-1e400kip\"", "\"1e-400m\"", "\"1e15ft\"", "\"" + "9".repeat(400) + "ft\"", "\"1e308ksi\"", "\"0.5e-320m\"",
                "\"1e99999kPa\"");
    }

    @Provide
    Arbitrary<String> nanTokens() {
        return Arbitraries.of("NaN", "-NaN", "Infinity", "-Infinity", "+Infinity", "+1", "01", ".5", "1.", "0x10",
                "\"NaNft\"", "\"Infinityft\"", "\"-Infinity psf\"", "\"nan m\"", "\"∞ft\"", "\"NaN\"", "\"Infinity\"",
                "\"1/0 ft\"", "\"0/0ft\"");
    }

    private static String withToken(int base, double which, String token) {
        JsonNode root = tree(base);
        replace(root, pick(root, which), NODES.textNode(HOLE));
        return text(root).replace("\"" + HOLE + "\"", token);
    }

    /** The pointer of a node of the tree (not the root), chosen by a fraction. */
    private static String pick(JsonNode root, double which) {
        List<String> pointers = new ArrayList<>();
        walk(root, "", (p, n) -> {
            if (!p.isEmpty()) {
                pointers.add(p);
            }
        });
        return pointers.get((int) (which * pointers.size()));
    }

    private static void replace(JsonNode root, String pointer, JsonNode value) {
        JsonPointer ptr = JsonPointer.compile(pointer);
        JsonNode parent = root.at(ptr.head());
        String last = ptr.last().getMatchingProperty();
        if (parent.isArray()) {
            ((ArrayNode) parent).set(ptr.last().getMatchingIndex(), value);
        } else {
            ((ObjectNode) parent).set(last, value);
        }
    }

    private interface Visitor {
        void visit(String pointer, JsonNode node);
    }

    private static void walk(JsonNode n, String pointer, Visitor v) {
        v.visit(pointer, n);
        if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                walk(n.get(i), pointer + "/" + i, v);
            }
        } else if (n.isObject()) {
            n.properties().forEach(e -> walk(e.getValue(), pointer + "/" + e.getKey().replace("~", "~0")
                    .replace("/", "~1"), v));
        }
    }

    private static JsonNode tree(int base) {
        try {
            return JSON.readTree(BASES.get(base));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String text(JsonNode root) {
        try {
            return JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static byte[] bytes(int base) {
        return BASES.get(base).getBytes(StandardCharsets.UTF_8);
    }

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
