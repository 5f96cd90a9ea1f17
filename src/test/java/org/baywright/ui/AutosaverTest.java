package org.baywright.ui;

import static org.baywright.ui.RecoveryPlans.renamed;
import static org.baywright.ui.RecoveryPlans.text;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import org.baywright.plan.Plan;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The autosave timer and writer, without JavaFX: a direct executor stands in for the UI thread. */
class AutosaverTest {
    /** Generous: a guard against a hang, not a speed target. */
    private static final Duration PATIENCE = Duration.ofSeconds(60);
    private static final Duration LONG = Duration.ofHours(1);

    private final List<Autosaver> open = new ArrayList<>();
    private final List<String> reports = Collections.synchronizedList(new ArrayList<>());
    private final AtomicReference<Optional<Autosaver.Snapshot>> unsaved = new AtomicReference<>(Optional.empty());

    @AfterEach
    void closeAll() {
        open.forEach(Autosaver::close);
    }

    private Autosaver autosaver(RecoveryStore.Slot slot, Duration interval) {
        Autosaver a = new Autosaver(slot, interval, Runnable::run, unsaved::get, reports::add);
        open.add(a);
        return a;
    }

    private static RecoveryStore.Slot slot(Path dir) throws Exception {
        return new RecoveryStore(dir).open().newDocument();
    }

    private static void await(String what, BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + PATIENCE.toNanos();
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                throw new AssertionError("not within " + PATIENCE.toSeconds() + " s: " + what);
            }
            Thread.sleep(10);
        }
    }

    private static boolean holds(RecoveryStore.Slot slot, Plan p) {
        try {
            return Files.exists(slot.planFile()) && text(p).equals(text(slot.planFile()));
        } catch (java.io.IOException e) {
            return false;
        }
    }

    @Test
    void theIntervalComesFromTheSystemPropertyText() {
        List<String> warnings = new ArrayList<>();
        assertAll(
                () -> assertEquals(Autosaver.DEFAULT_INTERVAL, Autosaver.intervalFrom(null, warnings::add)),
                () -> assertEquals(Duration.ofSeconds(60), Autosaver.DEFAULT_INTERVAL),
                () -> assertEquals(Autosaver.DEFAULT_INTERVAL, Autosaver.intervalFrom("  ", warnings::add)),
                () -> assertEquals(Duration.ofSeconds(15), Autosaver.intervalFrom("15", warnings::add)),
                () -> assertEquals(Duration.ofMillis(2500), Autosaver.intervalFrom(" 2.5 ", warnings::add)),
                () -> assertEquals(Duration.ofMillis(250), Autosaver.intervalFrom(".25", warnings::add)),
                () -> assertEquals(List.of(), warnings));
        for (String bad : List.of("abc", "0", "-5", "1e3", "NaN", "Infinity", "60s", "90000", "0x10")) {
            warnings.clear();
            assertEquals(Autosaver.DEFAULT_INTERVAL, Autosaver.intervalFrom(bad, warnings::add), bad);
            assertEquals(1, warnings.size(), bad);
            assertTrue(warnings.get(0).startsWith(Autosaver.INTERVAL_PROPERTY + ": \"" + bad + "\" is not a number of seconds"),
                    warnings.get(0));
        }
    }

    @Test
    void aNonPositiveIntervalIsRefused(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        assertThrows(IllegalArgumentException.class,
                () -> new Autosaver(slot, Duration.ZERO, Runnable::run, Optional::empty, m -> { }));
    }

    @Test
    void unsavedWorkIsWrittenAtTheIntervalAndFollowsTheEdits(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        Plan first = renamed(RecoveryPlans.twoBay(), "first edit");
        Plan second = renamed(RecoveryPlans.twoBay(), "second edit");
        Path original = dir.resolve("original.bay.json");
        Autosaver a = autosaver(slot, Duration.ofMillis(40));
        a.start();
        Thread.sleep(120);
        assertFalse(slot.exists(), "nothing unsaved, nothing written");
        unsaved.set(Optional.of(new Autosaver.Snapshot(first, original)));
        await("the first edit is autosaved", () -> holds(slot, first));
        unsaved.set(Optional.of(new Autosaver.Snapshot(second, original)));
        await("the second edit is autosaved", () -> holds(slot, second));
        RecoveryStore.Entry e = new RecoveryStore(dir).findLeftOver(null).entries().stream().findFirst().orElse(null);
        assertEquals(null, e, "the session is still running");
        assertEquals(List.of(), reports);
    }

    @Test
    void theSameSnapshotIsWrittenOnce(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        Autosaver a = autosaver(slot, LONG);
        unsaved.set(Optional.of(new Autosaver.Snapshot(RecoveryPlans.twoBay(), null)));
        a.saveNow();
        a.saveNow();
        assertTrue(a.flush(PATIENCE));
        assertEquals(1, a.writes());
        unsaved.set(Optional.of(new Autosaver.Snapshot(renamed(RecoveryPlans.twoBay(), "changed"), null)));
        a.saveNow();
        assertTrue(a.flush(PATIENCE));
        assertEquals(2, a.writes());
    }

    @Test
    void aDiscardAfterAQueuedWriteLeavesNothing(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        Autosaver a = autosaver(slot, LONG);
        unsaved.set(Optional.of(new Autosaver.Snapshot(RecoveryPlans.demo(), null)));
        a.saveNow();     // queued on the writer
        unsaved.set(Optional.empty());
        a.discard();     // the user saved: queued after the write, so it wins
        assertTrue(a.flush(PATIENCE));
        assertFalse(slot.exists());
        assertFalse(Files.exists(slot.recordFile()));
        // and once discarded, the same plan unsaved again is written again (not taken for "already there")
        unsaved.set(Optional.of(new Autosaver.Snapshot(RecoveryPlans.demo(), null)));
        a.saveNow();
        assertTrue(a.flush(PATIENCE));
        assertTrue(holds(slot, RecoveryPlans.demo()));
    }

    @Test
    void whatFollowsAWriteRunsOnlyOnceItIsOnDisk(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        Autosaver a = autosaver(slot, LONG);
        Plan p = renamed(RecoveryPlans.twoBay(), "then");
        List<Boolean> seen = Collections.synchronizedList(new ArrayList<>());
        unsaved.set(Optional.of(new Autosaver.Snapshot(p, null)));
        a.saveNow(() -> seen.add(holds(slot, p)));
        assertTrue(a.flush(PATIENCE));
        assertEquals(List.of(true), seen);
        unsaved.set(Optional.empty());
        a.saveNow(() -> seen.add(false));
        assertTrue(a.flush(PATIENCE));
        assertEquals(List.of(true), seen, "nothing unsaved: nothing written, nothing follows");
    }

    @Test
    void aFailedAutosaveIsReportedAndTheNextGoodOneToo(@TempDir Path dir) throws Exception {
        Path folder = dir.resolve("recovery");
        RecoveryStore.Slot slot = slot(folder);
        Autosaver a = autosaver(slot, LONG);
        // the folder is replaced by a file: nothing can be written into it
        Files.list(folder).forEach(f -> f.toFile().delete());
        Files.delete(folder);
        Files.writeString(folder, "in the way");
        unsaved.set(Optional.of(new Autosaver.Snapshot(RecoveryPlans.twoBay(), null)));
        a.saveNow();
        assertTrue(a.flush(PATIENCE));
        assertEquals(1, reports.size(), () -> reports.toString());
        assertTrue(reports.get(0).startsWith("Autosave failed: " + slot.planFile()), reports.get(0));
        assertEquals(0, a.writes());
        Files.delete(folder);
        a.saveNow();
        assertTrue(a.flush(PATIENCE));
        assertEquals("Autosave works again.", reports.get(reports.size() - 1));
        assertTrue(holds(slot, RecoveryPlans.twoBay()));
    }

    @Test
    void afterCloseNothingMoreIsWritten(@TempDir Path dir) throws Exception {
        RecoveryStore.Slot slot = slot(dir);
        Autosaver a = autosaver(slot, Duration.ofMillis(20));
        a.start();
        a.close();
        unsaved.set(Optional.of(new Autosaver.Snapshot(RecoveryPlans.twoBay(), null)));
        a.saveNow();
        Thread.sleep(100);
        assertFalse(slot.exists());
        assertEquals(0, a.writes());
    }
}
