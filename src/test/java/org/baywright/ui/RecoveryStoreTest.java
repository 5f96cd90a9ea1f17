package org.baywright.ui;

import static org.baywright.ui.RecoveryPlans.names;
import static org.baywright.ui.RecoveryPlans.renamed;
import static org.baywright.ui.RecoveryPlans.text;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.baywright.plan.Plan;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The recovery folder: what is written, what is offered after a crash, what is deleted and what is kept aside. */
class RecoveryStoreTest {
    private static final Instant T = Instant.parse("2031-05-06T07:08:09Z");

    private static RecoveryStore store(Path dir) {
        return new RecoveryStore(dir, Clock.fixed(T, ZoneOffset.UTC));
    }

    @Test
    void aPlanLeftByAnEndedSessionIsOfferedWithItsOriginAndTime(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        Plan edited = renamed(RecoveryPlans.twoBay(), "Two bays, edited");
        Path original = dir.resolveSibling("somewhere").resolve("two-bay.bay.json");
        RecoveryStore.Session s = store.open();
        RecoveryStore.Slot slot = s.newDocument();
        slot.write(edited, original);
        assertAll(
                () -> assertTrue(Files.exists(s.lockFile()), "the session announces itself"),
                () -> assertEquals(sorted(s.id() + "_1.bay.json", s.id() + "_1.properties", s.id() + ".lock"), names(dir)),
                () -> assertEquals(text(edited), RecoveryPlans.text(slot.planFile()), "the plan file is an ordinary plan file"),
                () -> assertTrue(store(dir).findLeftOver(null).isEmpty(), "a running session's plans are not offered"));

        s.close();
        RecoveryStore.LeftOver found = store(dir).findLeftOver(null);
        assertEquals(1, found.entries().size(), () -> found.toString());
        RecoveryStore.Entry e = found.entries().get(0);
        assertAll(
                () -> assertEquals(text(edited), text(e.plan())),
                () -> assertEquals(original.toAbsolutePath(), e.originalFile()),
                () -> assertEquals(T, e.autosaved()),
                () -> assertEquals(slot.planFile(), e.file()),
                () -> assertEquals(List.of(), found.setAside()));
    }

    @Test
    void aPlanThatNeverHadAFileHasNoOriginal(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        try (RecoveryStore.Session s = store.open()) {
            s.newDocument().write(RecoveryPlans.twoBay(), null);
        }
        RecoveryStore.Entry e = store.findLeftOver(null).entries().get(0);
        assertNull(e.originalFile());
        assertEquals(e.plan().name() + " — not saved — autosaved 2031-05-06 07:08", RecoveryDialog.describe(e, ZoneOffset.UTC),
                "the row of the offer");
    }

    @Test
    void deletingTheSlotLeavesNothingToOffer(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        RecoveryStore.Session s = store.open();
        RecoveryStore.Slot slot = s.newDocument();
        slot.write(RecoveryPlans.twoBay(), null);
        slot.write(renamed(RecoveryPlans.twoBay(), "second autosave"), null);
        assertEquals(sorted(s.id() + "_1.bay.json", s.id() + "_1.properties", s.id() + ".lock"), names(dir),
                "one plan and one record per document: no backup of the previous autosave");
        slot.delete();
        assertFalse(slot.exists());
        s.close();
        assertEquals(List.of(), names(dir), "saved and closed: the folder is empty again");
        assertTrue(store.findLeftOver(null).isEmpty());
    }

    @Test
    void eachDocumentHasItsOwnFiles(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        try (RecoveryStore.Session s = store.open()) {
            s.newDocument().write(renamed(RecoveryPlans.twoBay(), "first"), null);
            s.newDocument().write(renamed(RecoveryPlans.twoBay(), "second"), null);
        }
        assertEquals(List.of("first", "second"),
                store.findLeftOver(null).entries().stream().map(e -> e.plan().name()).sorted().toList());
    }

    @Test
    void twoRunningEditorsDoNotTakeEachOthersPlans(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        RecoveryStore.Session first = store.open();
        RecoveryStore.Session second = store.open();
        first.newDocument().write(renamed(RecoveryPlans.twoBay(), "first's"), null);
        second.newDocument().write(renamed(RecoveryPlans.twoBay(), "second's"), null);
        assertTrue(store.findLeftOver(second).isEmpty(), "the first is running");
        assertTrue(store.findLeftOver(first).isEmpty(), "the second is running");
        second.close();
        assertEquals(List.of("second's"), store.findLeftOver(first).entries().stream().map(e -> e.plan().name()).toList());
        first.close();
    }

    private static List<String> sorted(String... names) {
        return java.util.Arrays.stream(names).sorted().toList();
    }

    /** Writes a lock file as a session of another process would. */
    private static void lock(Path dir, String session, long pid, Instant started) throws Exception {
        Files.writeString(dir.resolve(session + ".lock"), "pid=" + pid + "\n" + (started == null ? "" : "started=" + started + "\n"),
                StandardCharsets.UTF_8);
    }

    /** Autosaved files of a session that is not this process's. */
    private static void leave(RecoveryStore store, String session, Plan plan) throws Exception {
        Path dir = store.dir();
        Files.createDirectories(dir);
        Files.writeString(dir.resolve(session + "_1.bay.json"), text(plan), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve(session + "_1.properties"), "autosaved=" + T + "\n", StandardCharsets.UTF_8);
    }

    @Test
    void aLockWhoseProcessIsGoneIsStale(@TempDir Path dir) throws Exception {
        Process p;
        try {
            p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-version")
                    .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        } catch (java.io.IOException | UnsupportedOperationException e) {
            Assumptions.abort("cannot start a process here: " + e);
            return;
        }
        assertTrue(p.waitFor(120, TimeUnit.SECONDS));
        long gone = p.pid();
        Assumptions.assumeTrue(ProcessHandle.of(gone).map(h -> !h.isAlive()).orElse(true), "the pid was reused at once");
        RecoveryStore store = store(dir);
        String session = gone + "-0000abcd";
        leave(store, session, renamed(RecoveryPlans.twoBay(), "left by a dead editor"));
        lock(dir, session, gone, Instant.parse("2020-01-01T00:00:00Z"));
        assertFalse(store.isRunning(session));
        RecoveryStore.LeftOver found = store.findLeftOver(null);
        assertEquals(List.of("left by a dead editor"), found.entries().stream().map(e -> e.plan().name()).toList());
        assertFalse(Files.exists(dir.resolve(session + ".lock")), "the stale lock is removed");
        assertTrue(Files.exists(dir.resolve(session + "_1.bay.json")), "the plan stays until recovered or discarded");
    }

    @Test
    void aReusedProcessIdDoesNotKeepALockAlive(@TempDir Path dir) throws Exception {
        ProcessHandle self = ProcessHandle.current();
        Assumptions.assumeTrue(self.info().startInstant().isPresent(), "the start time of a process is not known here");
        RecoveryStore store = store(dir);
        String reused = self.pid() + "-00000001";
        String same = self.pid() + "-00000002";
        String unknownStart = self.pid() + "-00000003";
        leave(store, reused, renamed(RecoveryPlans.twoBay(), "reused"));
        leave(store, same, renamed(RecoveryPlans.twoBay(), "same"));
        leave(store, unknownStart, renamed(RecoveryPlans.twoBay(), "unknown start"));
        lock(dir, reused, self.pid(), self.info().startInstant().get().minusSeconds(3600));
        lock(dir, same, self.pid(), self.info().startInstant().get());
        lock(dir, unknownStart, self.pid(), null);
        assertAll(
                () -> assertFalse(store.isRunning(reused), "same id, started an hour earlier: another process"),
                () -> assertTrue(store.isRunning(same)),
                () -> assertTrue(store.isRunning(unknownStart), "a live process with that id and no start time: kept"),
                () -> assertFalse(store.isRunning(self.pid() + "-00000004"), "no lock file at all"));
        assertEquals(List.of("reused"), store.findLeftOver(null).entries().stream().map(e -> e.plan().name()).toList());
    }

    @Test
    void anUnreadableRecoveryFileIsSetAsideAndReported(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        String session = "1-0000dead";
        leave(store, session, RecoveryPlans.twoBay());
        String good = "2-0000beef";
        leave(store, good, renamed(RecoveryPlans.twoBay(), "fine"));
        byte[] torn = text(RecoveryPlans.twoBay()).substring(0, 300).getBytes(StandardCharsets.UTF_8);
        Files.write(dir.resolve(session + "_1.bay.json"), torn);
        Files.writeString(dir.resolve("notes.txt"), "not ours");

        RecoveryStore.LeftOver found = store.findLeftOver(null);
        assertEquals(List.of("fine"), found.entries().stream().map(e -> e.plan().name()).toList(), "the good one is still offered");
        assertEquals(1, found.setAside().size());
        RecoveryStore.SetAside aside = found.setAside().get(0);
        assertAll(
                () -> assertEquals(dir.resolve(session + "_1.bay.json"), aside.file()),
                () -> assertEquals(dir.resolve(session + "_1.unreadable.json"), aside.keptAs()),
                () -> assertArrayEquals(torn, Files.readAllBytes(aside.keptAs()), "kept byte for byte, not deleted"),
                () -> assertFalse(Files.exists(aside.file())),
                () -> assertTrue(Files.exists(dir.resolve(session + "_1.unreadable.properties")), "its record goes with it"),
                () -> assertTrue(aside.reason().contains("cut short") || aside.reason().contains("ends"), aside.reason()),
                () -> assertTrue(aside.message().contains(aside.keptAs().toString()), aside.message()),
                () -> assertTrue(Files.exists(dir.resolve("notes.txt")), "files that are not ours are left alone"));
        RecoveryStore.LeftOver again = store.findLeftOver(null);
        assertEquals(List.of(), again.setAside(), "reported once, then kept quietly");
        assertTrue(Files.exists(aside.keptAs()));
    }

    @Test
    void cutShortWritesOfDeadSessionsAreCleanedUpAndNothingElse(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        String dead = "7-0000aaaa";
        leave(store, dead, RecoveryPlans.twoBay());
        Files.writeString(dir.resolve("." + dead + "_1.bay.json.1f2e3d.tmp"), "{\"format\": \"baywr");
        Files.writeString(dir.resolve("8-0000bbbb_1.properties"), "autosaved=" + T + "\n"); // a record whose plan is gone
        try (RecoveryStore.Session live = store.open()) {
            Path liveTemp = dir.resolve("." + live.id() + "_1.bay.json.abc.tmp");
            Files.writeString(liveTemp, "being written");
            store.findLeftOver(null);
            assertEquals(sorted("." + live.id() + "_1.bay.json.abc.tmp", dead + "_1.bay.json", dead + "_1.properties",
                    live.id() + ".lock"), names(dir), "the live session's files and the dead session's plan stay; "
                    + "its temporary file and the record without a plan go");
        }
    }

    @Test
    void aRecoveryFileIsAlwaysACompletePlan(@TempDir Path dir) throws Exception {
        RecoveryStore store = store(dir);
        Plan a = renamed(RecoveryPlans.demo(), "version A");
        Plan b = renamed(RecoveryPlans.demo(), "version B, a longer name so that the files differ in length too");
        byte[] textA = text(a).getBytes(StandardCharsets.UTF_8);
        byte[] textB = text(b).getBytes(StandardCharsets.UTF_8);
        try (RecoveryStore.Session s = store.open()) {
            RecoveryStore.Slot slot = s.newDocument();
            slot.write(a, null);
            AtomicBoolean done = new AtomicBoolean();
            List<Throwable> failures = new ArrayList<>();
            Thread writer = new Thread(() -> {
                try {
                    for (int i = 0; i < 40; i++) {
                        slot.write(i % 2 == 0 ? b : a, null);
                    }
                } catch (Throwable t) {
                    synchronized (failures) {
                        failures.add(t);
                    }
                } finally {
                    done.set(true);
                }
            });
            writer.start();
            int reads = 0;
            while (!done.get() || reads < 10) {
                byte[] now;
                try {
                    now = Files.readAllBytes(slot.planFile());
                } catch (NoSuchFileException e) {
                    throw new AssertionError("the recovery file vanished during a rewrite (read " + reads + ")", e);
                }
                reads++;
                int n = reads;
                assertTrue(java.util.Arrays.equals(now, textA) || java.util.Arrays.equals(now, textB),
                        () -> "read " + n + ": a torn recovery file of " + now.length + " bytes");
            }
            writer.join();
            assertEquals(List.of(), failures);
            for (String name : names(dir)) {
                assertFalse(name.endsWith(".tmp"), "a temporary file was left: " + names(dir));
            }
        }
    }
}
