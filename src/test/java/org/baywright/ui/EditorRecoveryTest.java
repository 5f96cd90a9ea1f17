package org.baywright.ui;

import static org.baywright.ui.RecoveryPlans.renamed;
import static org.baywright.ui.RecoveryPlans.text;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Autosave tied to the editor model through its properties (plain JUnit: the model's properties need
 * no toolkit; a direct executor is the UI thread).
 */
class EditorRecoveryTest {
    private static final Duration PATIENCE = Duration.ofSeconds(60);

    /** Runs nothing: these tests are about files, not about designing the plan. */
    static final TaskRunner NO_RUNS = new TaskRunner() {
        @Override
        public <T> void submit(Supplier<T> work, Consumer<T> done, Consumer<Throwable> failed) {
        }
    };

    private record Setup(RecoveryStore store, EditorModel model, EditorRecovery recovery, Path file) {
        RecoveryStore.Slot slot() {
            return recovery.autosaver().slot();
        }

        void flush() throws InterruptedException {
            assertTrue(recovery.autosaver().flush(PATIENCE));
        }
    }

    private static Setup setup(Path dir) throws Exception {
        Path file = dir.resolve("plans").resolve("two-bay.bay.json");
        Files.createDirectories(file.getParent());
        PlanFiles.write(RecoveryPlans.twoBay(), file);
        RecoveryStore store = new RecoveryStore(dir.resolve("recovery"));
        EditorModel model = new EditorModel(NO_RUNS);
        assertTrue(model.open(file).opened());
        EditorRecovery recovery = new EditorRecovery(model, store.open(), Duration.ofHours(1), Runnable::run);
        return new Setup(store, model, recovery, file);
    }

    @Test
    void anEditIsAutosavedWithItsFileAndSavingDeletesTheCopy(@TempDir Path dir) throws Exception {
        Setup s = setup(dir);
        s.recovery().saveNow();
        s.flush();
        assertFalse(s.slot().exists(), "nothing unsaved yet");
        Plan edited = renamed(s.model().plan(), "two bays, edited");
        s.model().apply(edited, "rename");
        s.recovery().saveNow();
        s.flush();
        assertEquals(text(edited), text(s.slot().planFile()));
        s.model().save();
        s.flush();
        assertAll(
                () -> assertFalse(s.slot().exists(), "saved: no recovery file"),
                () -> assertFalse(Files.exists(s.slot().recordFile())),
                () -> assertEquals(text(edited), text(s.file())));
        s.recovery().close(true);
    }

    @Test
    void undoingBackToTheSavedPlanDeletesTheCopy(@TempDir Path dir) throws Exception {
        Setup s = setup(dir);
        s.model().apply(renamed(s.model().plan(), "edited"), "rename");
        s.recovery().saveNow();
        s.flush();
        assertTrue(s.slot().exists());
        s.model().undo();
        s.flush();
        assertFalse(s.slot().exists());
        s.recovery().close(true);
    }

    @Test
    void aCleanCloseDeletesEverythingEvenWithChangesDiscarded(@TempDir Path dir) throws Exception {
        Setup s = setup(dir);
        s.model().apply(renamed(s.model().plan(), "edited, then discarded"), "rename");
        s.recovery().saveNow();
        s.flush();
        assertTrue(s.slot().exists());
        s.recovery().close(true); // the user chose "Discard changes"
        assertEquals(List.of(), RecoveryPlans.names(s.store().dir()));
    }

    @Test
    void anUncleanEndKeepsALastCopyForTheNextStart(@TempDir Path dir) throws Exception {
        Setup s = setup(dir);
        Plan edited = renamed(s.model().plan(), "edited, never autosaved by the timer");
        s.model().apply(edited, "rename");
        s.recovery().close(false);
        RecoveryStore.LeftOver found = new RecoveryStore(s.store().dir()).findLeftOver(null);
        assertEquals(1, found.entries().size());
        assertEquals(text(edited), text(found.entries().get(0).plan()));
        assertEquals(s.file().toAbsolutePath(), found.entries().get(0).originalFile());
    }

    @Test
    void recoveringShowsThePlanUnsavedAndMovesTheCopyIntoThisSession(@TempDir Path dir) throws Exception {
        Setup earlier = setup(dir);
        Plan lost = renamed(earlier.model().plan(), "work from the crashed session");
        earlier.model().apply(lost, "rename");
        earlier.recovery().saveNow();
        earlier.flush();
        earlier.recovery().session().close(); // as if its process had died: the lock is gone, the copy stays

        Setup now = setup(dir);
        RecoveryStore.Entry entry = now.store().findLeftOver(now.recovery().session()).entries().get(0);
        now.recovery().recover(entry);
        now.flush();
        assertAll(
                () -> assertSame(entry.plan(), now.model().plan()),
                () -> assertTrue(now.model().dirtyProperty().get(), "recovered work counts as unsaved"),
                () -> assertEquals(earlier.file().toAbsolutePath(), now.model().fileProperty().get()),
                () -> assertFalse(Files.exists(entry.file()), "the earlier copy is gone once this session's copy is written"),
                () -> assertEquals(text(lost), text(now.slot().planFile())),
                () -> assertTrue(now.store().findLeftOver(now.recovery().session()).isEmpty(), "nothing is offered twice"));
        // saving writes to the original file and the recovery copy goes
        now.model().save();
        now.flush();
        assertEquals(text(lost), text(earlier.file()));
        assertFalse(now.slot().exists());
        now.recovery().close(true);
    }
}
