package org.baywright.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.RandomGenerator;
import org.baywright.bench.TakedownBenchmark;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.JsonText;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.report.RunSummary;
import org.baywright.run.PlanRun;
import org.baywright.units.UnitSystem;
import net.jqwik.api.Example;

/**
 * Results do not change by accident. The full {@code design --json} result (members, sections, ratios,
 * reactions, column loads, foundations, equilibrium, problems) of every plan in {@code plans/}, of the
 * 20-storey benchmark building and of 300 random plans from the fuzz generator is reduced to a
 * SHA-256 fingerprint and compared with {@code src/test/resources/fingerprints/results.tsv}.
 *
 * <p>Numbers are rounded to 10 significant figures before hashing, so a refactoring that only
 * reorders floating-point arithmetic (a change in the 16th digit) keeps its fingerprint, while any
 * change an engineer could see does not. The program version is left out.
 *
 * <p>The random plans come from {@link PlanFuzzTest#recipes()} drawn with a fixed seed; they are keyed
 * by the fingerprint of the plan file itself, so a change to the generator shows as "plan not in the
 * table" rather than as a changed result.
 *
 * <p>When results change on purpose: run with {@code -Dfingerprints.write=true}, say in the commit
 * why, and add a line to the table's header. Each run leaves the canonical JSON of every result in
 * {@code target/fingerprints/} for a diff against an earlier run.
 */
class ResultFingerprintTest {
    static final Path TABLE = Path.of("src/test/resources/fingerprints/results.tsv");
    static final Path DUMP = Path.of("target/fingerprints");
    static final int RANDOM_PLANS = 300;
    static final long SEED = 20261202L;
    private static final MathContext DIGITS = new MathContext(10);
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    /** A named plan for the table. */
    record Case(String name, Plan plan) {
    }

    static List<Case> cases() throws IOException {
        List<Case> out = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("plans"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(PlanFiles.EXTENSION)).sorted().toList()) {
                out.add(new Case(p.toString().replace('\\', '/'), PlanFiles.read(p).plan().orElseThrow()));
            }
        }
        out.add(new Case("benchmark-tower", TakedownBenchmark.building()));
        Arbitrary<PlanFuzzTest.Recipe> recipes = new PlanFuzzTest().recipes();
        RandomGenerator<PlanFuzzTest.Recipe> generator = recipes.generator(1000);
        Random random = new Random(SEED);
        for (int i = 0; i < RANDOM_PLANS; i++) {
            Plan plan = PlanFuzzTest.build(generator.next(random).value());
            out.add(new Case("random-" + i + "-" + sha(PlanFiles.write(plan)).substring(0, 16), plan));
        }
        return out;
    }

    /** The canonical text of a plan's result: the JSON output, numbers to 10 significant figures, no version. */
    static String canonical(Plan plan) {
        UnitSystem us = UnitSystem.parse(plan.units());
        Map<String, Object> json = new LinkedHashMap<>(RunSummary.json(PlanRun.run(plan, CATALOG), us));
        json.remove("program");
        return JsonText.write(round(json));
    }

    private static Object round(Object o) {
        if (o instanceof Map<?, ?> m) {
            // a map with no order of its own (Map.of) is written with its keys sorted
            Map<Object, Object> r = m instanceof LinkedHashMap || m instanceof java.util.SortedMap ? new LinkedHashMap<>()
                    : new java.util.TreeMap<>();
            m.forEach((k, v) -> r.put(k, round(v)));
            return r;
        }
        if (o instanceof List<?> l) {
            return l.stream().map(ResultFingerprintTest::round).toList();
        }
        if (o instanceof double[] a) {
            return java.util.Arrays.stream(a).mapToObj(ResultFingerprintTest::round).toList();
        }
        if (o instanceof Double d) {
            if (!Double.isFinite(d) || d == 0) {
                return d == 0 ? 0.0 : d.toString();
            }
            return new BigDecimal(d).round(DIGITS).stripTrailingZeros().toString();
        }
        if (o instanceof Float f) {
            return round((double) f);
        }
        return o;
    }

    static String sha(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    @Example
    void resultsAreTheRecordedOnes() throws IOException {
        List<Case> cases = cases();
        Map<String, String> actual = new LinkedHashMap<>();
        Files.createDirectories(DUMP);
        for (Case c : cases) {
            String text = canonical(c.plan());
            actual.put(c.name(), sha(text));
            Files.writeString(DUMP.resolve(c.name().replace('/', '_') + ".json"), text);
        }
        if (Boolean.getBoolean("fingerprints.write")) {
            List<String> header = Files.exists(TABLE) ? Files.readAllLines(TABLE).stream().filter(l -> l.startsWith("#"))
                    .toList() : List.of("# Result fingerprints (ResultFingerprintTest): name, SHA-256 of the canonical result.",
                    "# Changed on purpose only; each change gets a line here with its date and reason.");
            List<String> lines = new ArrayList<>(header);
            actual.forEach((k, v) -> lines.add(k + "\t" + v));
            Files.createDirectories(TABLE.getParent());
            Files.write(TABLE, lines);
            return;
        }
        assertTrue(Files.exists(TABLE), "no fingerprint table at " + TABLE + "; write it with -Dfingerprints.write=true");
        Map<String, String> expected = new LinkedHashMap<>();
        for (String line : Files.readAllLines(TABLE)) {
            if (!line.isBlank() && !line.startsWith("#")) {
                String[] f = line.split("\t");
                expected.put(f[0], f[1]);
            }
        }
        List<String> missing = actual.keySet().stream().filter(k -> !expected.containsKey(k)).toList();
        if (!missing.isEmpty()) {
            fail(missing.size() + " plans are not in the table (a new plan in plans/, or the fuzz generator changed): "
                    + missing.subList(0, Math.min(5, missing.size())));
        }
        List<String> changed = new ArrayList<>();
        actual.forEach((k, v) -> {
            if (!v.equals(expected.get(k))) {
                changed.add(k);
            }
        });
        assertEquals(List.of(), changed.subList(0, Math.min(10, changed.size())), changed.size() + " of " + actual.size() + " results changed; their JSON is in "
                + DUMP + " (compare with a run of the previous commit)");
        assertEquals(expected.size(), actual.size(), "every plan in the table was run");
    }
}
