package org.baywright.ui;

import static org.baywright.ui.RecoveryPlans.text;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.study.Variations;
import org.baywright.units.Units;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Work survives a crash: a child JVM opens a plan in an editor model, makes an edit and autosaves at a
 * short interval (set by the system property, as a user would), and is killed. A new store then finds
 * the recovery file, and its plan is the edited plan.
 */
class AutosaveAfterKillTest {
    /** A guard against a hang, not a speed target. */
    private static final long PATIENCE_SECONDS = 120;

    /** The edit the child makes: beams of every infill at most 7.5 ft apart. */
    static Plan edit(Plan p) {
        return Variations.beamSpacing(p, Units.FT_.toSi(7.5));
    }

    /** The child: an editor model with autosave, the demo plan from args[1], recovery folder args[0]. */
    public static final class Editor {
        private Editor() {
        }

        public static void main(String[] args) throws Exception {
            Path dir = Path.of(args[0]);
            Path planFile = Path.of(args[1]);
            Duration every = Autosaver.intervalFrom(System.getProperty(Autosaver.INTERVAL_PROPERTY),
                    m -> System.err.println("warning: " + m));
            ExecutorService ui = Executors.newSingleThreadExecutor(); // the child's "UI thread": the model lives there
            ui.submit(() -> {
                EditorModel model = new EditorModel(EditorRecoveryTest.NO_RUNS);
                if (!model.open(planFile).opened()) {
                    throw new IllegalStateException("the plan did not open");
                }
                EditorRecovery recovery = new EditorRecovery(model, new RecoveryStore(dir).open(), every, ui);
                recovery.start();
                model.apply(edit(model.plan()), "beams at 7.5 ft");
                return null;
            }).get();
            System.out.println("edited");
            System.out.flush();
            Thread.sleep(Long.MAX_VALUE); // until killed
        }
    }

    @Test
    void aKilledEditorsEditIsFoundByTheNextStore(@TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("recovery");
        Path planFile = tmp.resolve("harbourview.bay.json");
        PlanFiles.write(RecoveryPlans.demo(), planFile);
        Plan edited = edit(RecoveryPlans.demo());
        assertFalse(text(edited).equals(text(RecoveryPlans.demo())), "the edit changes the plan file");
        Path log = tmp.resolve("child.log");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child;
        try {
            child = new ProcessBuilder(java, "-Xmx512m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC",
                    "-D" + Autosaver.INTERVAL_PROPERTY + "=0.2", "-cp", System.getProperty("java.class.path"),
                    Editor.class.getName(), dir.toString(), planFile.toString())
                    .redirectError(ProcessBuilder.Redirect.appendTo(log.toFile())).start();
        } catch (IOException | UnsupportedOperationException | SecurityException e) {
            Assumptions.abort("cannot start a child JVM here: " + e);
            return;
        }
        try {
            BlockingQueue<String> lines = new LinkedBlockingQueue<>();
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
                    for (String line; (line = r.readLine()) != null; ) {
                        lines.add(line);
                    }
                } catch (IOException e) {
                    // killed
                }
                lines.add("<end>");
            });
            reader.setDaemon(true);
            reader.start();
            String first = lines.poll(PATIENCE_SECONDS, TimeUnit.SECONDS);
            assertEquals("edited", first, () -> "the child did not make its edit\n" + tail(log));
            // the record is written after the plan: once it is there, one autosave is complete
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(PATIENCE_SECONDS);
            while (RecoveryPlans.names(dir).stream().noneMatch(n -> n.endsWith("_1.properties"))) {
                assertTrue(child.isAlive(), () -> "the child died\n" + tail(log));
                if (System.nanoTime() > deadline) {
                    // a guard against a hang, not a speed target
                    org.junit.jupiter.api.Assertions.fail("no autosave within " + PATIENCE_SECONDS + " s: " + names(dir)
                            + "\n" + tail(log));
                }
                Thread.sleep(20);
            }
        } finally {
            child.destroyForcibly();
        }
        assertTrue(child.waitFor(PATIENCE_SECONDS, TimeUnit.SECONDS), "the child did not die");
        List<String> before = RecoveryPlans.names(dir);
        assertTrue(before.stream().anyMatch(n -> n.endsWith(".lock")), "the killed editor left its lock: " + before);

        RecoveryStore.LeftOver found = new RecoveryStore(dir).findLeftOver(null);
        assertEquals(1, found.entries().size(), () -> found + " in " + before);
        RecoveryStore.Entry e = found.entries().get(0);
        assertEquals(text(edited), text(e.plan()), "the recovered plan is the edited plan");
        assertEquals(planFile.toAbsolutePath(), e.originalFile());
        assertEquals(List.of(), found.setAside());
        assertTrue(RecoveryPlans.names(dir).stream().noneMatch(n -> n.endsWith(".lock")), "the stale lock is cleared");
    }

    private static List<String> names(Path dir) {
        try {
            return RecoveryPlans.names(dir);
        } catch (IOException e) {
            return List.of(e.toString());
        }
    }

    private static String tail(Path log) {
        try {
            String text = Files.exists(log) ? Files.readString(log) : "";
            return text.substring(Math.max(0, text.length() - 3000));
        } catch (IOException e) {
            return "(" + e + ")";
        }
    }
}
