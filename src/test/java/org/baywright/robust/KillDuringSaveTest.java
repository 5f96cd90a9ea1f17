package org.baywright.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Saving is safe against a crash: a child JVM saves a large plan over and over, alternating two
 * versions, and is killed at random moments (before, during and between saves). After every kill
 * the plan file must hold one complete version, byte for byte, the backup too, and no leftover
 * temporary file may carry the plan file extension.
 */
class KillDuringSaveTest {
    private static final int KILLS = 5;
    private static final String NAME = "tower.bay.json";

    /** The large plan saved: 30 × 30 bays, 40 levels; {@code version} changes the name and the loads. */
    static Plan plan(int version) {
        double dead = 2700 + 100 * version;
        return RegularPlan.generate(new RegularPlan.Spec("Save test, version " + version, version % 2 == 0 ? "us" : "si",
                Collections.nCopies(30, 9.0), Collections.nCopies(30, 8.5), Collections.nCopies(40, 4.0), true, 3.0,
                new LoadValues(dead, 500, 2400, 0, 0, 700), new LoadValues(dead / 2, 300, 0, 1000, 1200, 0),
                new LoadValues(6000 + version, 0, 0, 0, 0, 0)));
    }

    /** The child: saves version 0 and version 1 of the plan to the file named in args[0], alternately, until killed. */
    public static final class Saver {
        private Saver() {
        }

        public static void main(String[] args) throws IOException {
            Path target = Path.of(args[0]);
            Plan[] plans = {plan(0), plan(1)};
            System.out.println("ready");
            System.out.flush();
            for (int i = 0; ; i++) {
                long t0 = System.nanoTime();
                System.out.println("saving " + i);
                System.out.flush();
                PlanFiles.write(plans[i % 2], target);
                System.out.println("saved " + i + " " + (System.nanoTime() - t0) / 1_000_000);
                System.out.flush();
            }
        }
    }

    @Test
    void aKilledSaveLeavesTheOldOrTheNewPlan(@TempDir Path dir) throws Exception {
        Path target = dir.resolve(NAME);
        Path backup = dir.resolve(NAME + ".bak");
        Path log = dir.resolve("saver.log");
        byte[][] versions = {PlanFiles.write(plan(0)).getBytes(StandardCharsets.UTF_8),
            PlanFiles.write(plan(1)).getBytes(StandardCharsets.UTF_8)};
        long seed = new Random().nextLong();
        Random random = new Random(seed);
        String javaCommand = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        int killedDuringFileWork = 0;
        List<Long> roundMillis = new ArrayList<>();
        int round = 0;
        // a few extra rounds, killing at once, when no kill has yet landed inside a save's file operations
        for (; round < KILLS || killedDuringFileWork == 0 && round < KILLS + 4; round++) {
            long roundStart = System.nanoTime();
            String where = "round " + round + " (seed " + seed + ")";
            List<String> before = names(dir);
            Process child;
            try {
                // a quick-starting child: compiled code of the first tier only, one garbage collector thread
                child = new ProcessBuilder(javaCommand, "-Xmx768m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp",
                        System.getProperty("java.class.path"), Saver.class.getName(), target.toString())
                        .redirectError(ProcessBuilder.Redirect.appendTo(log.toFile())).start();
            } catch (IOException | UnsupportedOperationException | SecurityException e) {
                Assumptions.abort("cannot start a child JVM here: " + e);
                return;
            }
            try {
                BlockingQueue<String> lines = new LinkedBlockingQueue<>();
                Thread reader = new Thread(() -> {
                    try (BufferedReader r = new BufferedReader(new InputStreamReader(child.getInputStream(),
                            StandardCharsets.UTF_8))) {
                        for (String line; (line = r.readLine()) != null; ) {
                            lines.add(line);
                        }
                    } catch (IOException e) {
                        // the child was killed
                    }
                    lines.add("<end>");
                });
                reader.setDaemon(true);
                reader.start();
                String first = lines.poll(Guard.SECONDS, TimeUnit.SECONDS);
                if (first == null || !first.equals("ready")) {
                    Assumptions.abort("the child JVM did not start (" + first + "); cannot test here");
                }
                if (round == 0) {
                    // the first child completes a save, so that there is an old plan to keep, then dies at a random moment
                    long millis = 0;
                    for (String line = ""; !line.startsWith("saved "); ) {
                        line = lines.poll(Guard.SECONDS, TimeUnit.SECONDS);
                        assertTrue(line != null && !line.equals("<end>"), where + ": the child stopped saving: " + line + "\n"
                                + tail(log));
                        millis = line.startsWith("saved ") ? Long.parseLong(line.substring(line.lastIndexOf(' ') + 1)) : 0;
                    }
                    Thread.sleep(random.nextInt((int) Math.max(1, Math.min(millis, 2000))));
                } else {
                    // later ones die while the file operations are under way: once the temporary file is there
                    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(Guard.SECONDS);
                    while (names(dir).stream().noneMatch(n -> n.endsWith(".tmp") && !before.contains(n))) {
                        assertTrue(withinHangGuard(deadline) && child.isAlive(), where + ": no save started\n" + tail(log));
                        Thread.sleep(1);
                    }
                    Thread.sleep(round < KILLS ? random.nextInt(25) : 0);
                }
                boolean saving = names(dir).stream().anyMatch(n -> n.endsWith(".tmp") && !before.contains(n));
                child.destroyForcibly();
                assertTrue(child.waitFor(Guard.SECONDS, TimeUnit.SECONDS), where + ": the child did not die");
                killedDuringFileWork += saving ? 1 : 0;
            } finally {
                child.destroyForcibly();
            }
            if (!Files.exists(target)) {
                assertEquals(0, round, where + ": the plan file is gone after a killed save");
                continue; // killed before the very first save finished: nothing to lose yet
            }
            byte[] now = Files.readAllBytes(target);
            assertTrue(Arrays.equals(now, versions[0]) || Arrays.equals(now, versions[1]),
                    where + ": the plan file is torn (" + now.length + " bytes; the versions have " + versions[0].length
                            + " and " + versions[1].length + ")");
            if (Files.exists(backup)) {
                byte[] bak = Files.readAllBytes(backup);
                assertTrue(Arrays.equals(bak, versions[0]) || Arrays.equals(bak, versions[1]),
                        where + ": the backup is torn (" + bak.length + " bytes)");
            }
            for (String file : names(dir)) {
                assertFalse(file.endsWith(PlanFiles.EXTENSION) && !file.equals(NAME),
                        where + ": a leftover file looks like a plan: " + file + " in " + names(dir));
            }
            roundMillis.add((System.nanoTime() - roundStart) / 1_000_000);
        }
        // the file left by the last kill reads as a plan, and saving over it (past any leftovers) still works
        PlanReadResult r = PlanFiles.read(target);
        assertTrue(r.ok(), () -> "the plan file after the kills: " + r.problems());
        PlanFiles.write(plan(2), target);
        assertTrue(Arrays.equals(Files.readAllBytes(target), PlanFiles.write(plan(2)).getBytes(StandardCharsets.UTF_8)));
        System.out.println("KillDuringSaveTest: " + round + " kills, " + killedDuringFileWork + " of them with a temporary "
                + "file of the save present; files left: " + names(dir) + "; ms per round " + roundMillis);
        // on a very fast file system (a RAM disk) the file operations may be over before a kill arrives
        Assumptions.assumeTrue(killedDuringFileWork > 0, "no kill landed during the file operations of a save (seed " + seed
                + "): every file was whole, but the moment that matters was not tested here");
    }

    /** The end of the child's standard error, for a failure message. */
    private static String tail(Path log) {
        try {
            String text = Files.exists(log) ? Files.readString(log) : "";
            return text.substring(Math.max(0, text.length() - 3000));
        } catch (IOException e) {
            return "(" + e + ")";
        }
    }

    private static List<String> names(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            List<String> out = new ArrayList<>(s.map(p -> p.getFileName().toString()).sorted().toList());
            return out;
        }
    }

    /** A guard against a hang (minutes, not a speed target): false once the deadline has passed. */
    private static boolean withinHangGuard(long deadlineNanos) {
        return System.nanoTime() < deadlineNanos;
    }
}
