package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EditorModelTest {
    static final Path DEMO = Path.of(BaywrightApp.DEMO);

    private static EditorModel demo() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(DEMO).opened());
        return m;
    }

    @Test
    void openingRunsThePlanAndShowsTheFirstLevel() {
        EditorModel m = demo();
        assertAll(
                () -> assertNotNull(m.run()),
                () -> assertNotNull(m.run().takedown()),
                () -> assertEquals(List.of("Level 2", "Level 3", "Level 4", "Roof"), m.levelNames()),
                () -> assertEquals("Level 2", m.levelProperty().get()),
                () -> assertEquals("level2", m.currentFloor().orElseThrow().id()),
                () -> assertFalse(m.currentMembers().isEmpty()),
                () -> assertFalse(m.currentColumns().isEmpty()),
                () -> assertFalse(m.runningProperty().get()),
                () -> assertEquals(DEMO, m.fileProperty().get()));
    }

    @Test
    void selectionFollowsTheLevel() {
        EditorModel m = demo();
        MemberResult g = m.currentMembers().get(0);
        m.select(g.id());
        assertEquals(g.id(), m.selectedResult().orElseThrow().id());
        m.levelProperty().set("Roof");
        boolean onRoof = m.currentMembers().stream().anyMatch(r -> r.id().equals(g.id()));
        assertEquals(onRoof, m.selectedResult().isPresent(), "kept only where the member exists");
        m.select("no-such-member");
        assertTrue(m.selectedResult().isEmpty());
    }

    @Test
    void aBrokenFileIsNotOpenedAndTheCurrentPlanStays(@TempDir Path dir) throws Exception {
        EditorModel m = demo();
        Plan before = m.plan();
        Path bad = dir.resolve("bad.bay.json");
        Files.writeString(bad, "{\"format\": \"baywright-plan\", \"version\": 1, \"name\": 3}");
        EditorModel.OpenResult r = m.open(bad);
        assertAll(
                () -> assertFalse(r.opened()),
                () -> assertFalse(r.problems().isEmpty()),
                () -> assertSame(before, m.plan()),
                () -> assertEquals(DEMO, m.fileProperty().get()));
        EditorModel.OpenResult missing = m.open(dir.resolve("missing.bay.json"));
        assertTrue(missing.problems().get(0).message().contains("no such file"));
        assertSame(before, m.plan());
    }

    @Test
    void saveAsWritesAFileThatReadsBack(@TempDir Path dir) throws Exception {
        EditorModel m = demo();
        Path out = dir.resolve("copy.bay.json");
        m.saveAs(out);
        assertEquals(out, m.fileProperty().get());
        assertEquals(PlanFiles.write(m.plan()), Files.readString(out));
        m.save();
        assertTrue(PlanFiles.read(out).ok());
    }

    @Test
    void openTextHasNoFileAndAStaleRunIsDropped() throws Exception {
        List<Runnable> pending = new java.util.ArrayList<>();
        TaskRunner later = new TaskRunner() {
            @Override
            public <T> void submit(java.util.function.Supplier<T> work, java.util.function.Consumer<T> done,
                    java.util.function.Consumer<Throwable> failed) {
                pending.add(() -> done.accept(work.get()));
            }
        };
        EditorModel m = new EditorModel(later);
        String json = Files.readString(DEMO);
        assertTrue(m.openText(json, "demo").opened());
        assertTrue(m.runningProperty().get());
        assertNull(m.fileProperty().get());
        assertTrue(m.openText(json, "demo again").opened());
        Plan second = m.plan();
        pending.get(0).run(); // the first plan's run ends late
        assertNull(m.run(), "a run of a plan no longer shown is dropped");
        pending.get(1).run();
        assertSame(second, m.run().plan());
        assertFalse(m.runningProperty().get());
    }

    @Test
    void aQueuedRunOfAnOlderEditIsSkippedAndOnlyTheLatestIsShown() throws Exception {
        List<Runnable> pending = new java.util.ArrayList<>();
        int[] ran = {0};
        TaskRunner later = new TaskRunner() {
            @Override
            public <T> void submit(java.util.function.Supplier<T> work, java.util.function.Consumer<T> done,
                    java.util.function.Consumer<Throwable> failed) {
                pending.add(() -> {
                    T r = work.get();
                    if (r != null) {
                        ran[0]++;
                    }
                    done.accept(r);
                });
            }
        };
        EditorModel m = new EditorModel(later);
        assertTrue(m.openText(Files.readString(DEMO), "demo").opened());
        pending.remove(0).run();
        ran[0] = 0;
        // three quick edits: the first two are stale before their turn comes
        for (double d : new double[] {0.3, 0.6, 0.9}) {
            m.edit(p -> org.baywright.plan.PlanEdits.moveGridLine(p, "B", p.gridLine("B").orElseThrow().offset() + d), "move B");
        }
        assertEquals(3, pending.size());
        Plan latest = m.plan();
        pending.forEach(Runnable::run);
        assertEquals(1, ran[0], "only the latest edit's run did any work");
        assertSame(latest, m.run().plan());
        assertEquals(2, m.latencies().size(), "a latency for each result shown: the opening run and the latest edit");
    }
}
