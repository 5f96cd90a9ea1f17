package org.baywright.ui;

import static org.baywright.ui.RecoveryPlans.renamed;
import static org.baywright.ui.RecoveryPlans.text;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.stage.Stage;
import org.baywright.plan.Plan;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Start-up with autosaved work from an editor that did not end normally (headless, Monocle): the
 * editor opens the plan named as its argument as always, then offers the recovery file; one unreadable
 * copy is reported as set aside.
 */
@ExtendWith(ApplicationExtension.class)
class RecoveryFxTest {
    /** A guard against a hang, not a speed target. */
    private static final long PATIENCE_SECONDS = 60;

    @TempDir
    Path dir;

    private BaywrightApp app;
    private Stage stage;
    private Plan lost;
    private Path original;
    private Path leftFile;
    private Path unreadable;

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        RecoveryStore store = new RecoveryStore(dir.resolve("recovery"));
        // an earlier session autosaved an edit of a saved plan, then ended without closing its session cleanly
        lost = renamed(RecoveryPlans.twoBay(), "Two bays, edited before the crash");
        original = dir.resolve("two-bay.bay.json");
        Files.copy(RecoveryPlans.TWO_BAY, original);
        RecoveryStore.Session earlier = store.open();
        RecoveryStore.Slot slot = earlier.newDocument();
        slot.write(lost, original);
        RecoveryStore.Slot broken = earlier.newDocument();
        broken.write(RecoveryPlans.twoBay(), null);
        Files.writeString(broken.planFile(), "{\"format\": \"baywright-plan\", \"vers", StandardCharsets.UTF_8);
        earlier.close();
        leftFile = slot.planFile();
        unreadable = broken.planFile();

        // the plan named on the command line opens as always; the offer comes beside it
        app = new BaywrightApp(store, Duration.ofHours(1), List.of(BaywrightApp.DEMO), TaskRunner.direct());
        app.start(stage);
    }

    @AfterEach
    void stop(FxRobot robot) {
        robot.interact(() -> app.stop());
    }

    private ListView<?> offered(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(PATIENCE_SECONDS, TimeUnit.SECONDS, () -> robot.lookup("#recovery-list").tryQuery().isPresent());
        return robot.lookup("#recovery-list").queryAs(ListView.class);
    }

    @Test
    void theOfferListsTheLeftPlanAndReportsTheUnreadableOne(FxRobot robot) throws Exception {
        ListView<?> list = offered(robot);
        assertEquals(1, list.getItems().size());
        RecoveryStore.Entry e = (RecoveryStore.Entry) list.getItems().get(0);
        String aside = robot.lookup("#recovery-set-aside").queryAs(Label.class).getText();
        assertAll(
                () -> assertEquals(lost.name(), e.plan().name()),
                () -> assertTrue(RecoveryDialog.describe(e, java.time.ZoneId.systemDefault()).contains(original.toString())),
                () -> assertTrue(aside.contains(unreadable.getFileName().toString()) && aside.contains("kept as"), aside),
                () -> assertFalse(Files.exists(unreadable), "set aside under another name"),
                () -> assertEquals(Path.of(BaywrightApp.DEMO), app.model().fileProperty().get(), "the named plan is open"),
                () -> assertEquals(text(RecoveryPlans.demo()), text(app.model().plan())),
                () -> assertFalse(app.model().dirtyProperty().get()));
        robot.clickOn("#recovery-later");
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void recoverShowsTheRecoveredPlanAsUnsaved(FxRobot robot) throws Exception {
        offered(robot);
        robot.clickOn("#recovery-recover");
        WaitForAsyncUtils.waitForFxEvents();
        assertAll(
                () -> assertEquals(text(lost), text(app.model().plan()), "the recovered plan is shown"),
                () -> assertTrue(app.model().dirtyProperty().get(), "and counts as unsaved"),
                () -> assertEquals(original.toAbsolutePath(), app.model().fileProperty().get(), "Save writes to its original file"),
                () -> assertTrue(stage.getTitle().contains(lost.name()), stage.getTitle()),
                () -> assertFalse(robot.lookup("#recovery-list").tryQuery().isPresent(), "the offer is closed"));
        RecoveryStore.Slot own = app.recovery().autosaver().slot();
        WaitForAsyncUtils.waitFor(PATIENCE_SECONDS, TimeUnit.SECONDS, () -> !Files.exists(leftFile) && own.exists());
        assertEquals(text(lost), text(own.planFile()), "this session keeps its own autosaved copy at once");
    }

    @Test
    void laterKeepsTheCopyForTheNextStart(FxRobot robot) throws Exception {
        offered(robot);
        robot.clickOn("#recovery-later");
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(robot.lookup("#recovery-list").tryQuery().isPresent());
        assertFalse(app.model().dirtyProperty().get());
        assertTrue(Files.exists(leftFile));
        RecoveryStore again = new RecoveryStore(dir.resolve("recovery"));
        assertEquals(List.of(lost.name()), again.findLeftOver(app.recovery().session()).entries().stream()
                .map(x -> x.plan().name()).toList(), "offered again next time");
    }

    @Test
    void discardDeletesTheCopy(FxRobot robot) throws Exception {
        ListView<?> list = offered(robot);
        robot.clickOn("#recovery-discard");
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(Files.exists(leftFile));
        assertTrue(list.getItems().isEmpty());
        robot.clickOn("#recovery-later"); // the report of the unreadable copy stays until dismissed
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(robot.lookup("#recovery-list").tryQuery().isPresent());
        assertFalse(app.model().dirtyProperty().get(), "the demo plan is untouched");
    }

    @Test
    void closingWithDiscardChangesDeletesThisSessionsAutosave(FxRobot robot) throws Exception {
        offered(robot);
        robot.clickOn("#recovery-later");
        WaitForAsyncUtils.waitForFxEvents();
        Plan edited = renamed(app.model().plan(), "edited in this session");
        robot.interact(() -> app.model().apply(edited, "rename"));
        robot.interact(() -> app.recovery().saveNow());
        RecoveryStore.Slot own = app.recovery().autosaver().slot();
        WaitForAsyncUtils.waitFor(PATIENCE_SECONDS, TimeUnit.SECONDS, own::exists);
        assertEquals(text(edited), text(own.planFile()));
        // the window's close box: the unsaved-changes question, answered "Discard changes"
        javafx.application.Platform.runLater(() -> stage.fireEvent(
                new javafx.stage.WindowEvent(stage, javafx.stage.WindowEvent.WINDOW_CLOSE_REQUEST)));
        // wait for the question's button to be on screen (a lookup may find it before its window shows)
        WaitForAsyncUtils.waitFor(PATIENCE_SECONDS, TimeUnit.SECONDS,
                () -> robot.lookup("Discard changes").match(org.testfx.util.NodeQueryUtils.isVisible()).tryQuery().isPresent()
                        && robot.lookup("Discard changes").match(org.testfx.util.NodeQueryUtils.isVisible()).query()
                                .getScene().getWindow().isShowing());
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn(robot.lookup("Discard changes").match(org.testfx.util.NodeQueryUtils.isVisible()).<javafx.scene.Node>query());
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> app.stop()); // what the toolkit calls once the last window has closed
        assertAll(
                () -> assertFalse(stage.isShowing()),
                () -> assertFalse(own.exists(), "a clean close leaves no recovery file"),
                () -> assertFalse(Files.exists(app.recovery().session().lockFile()), "and no lock"),
                () -> assertTrue(Files.exists(leftFile), "the earlier session's work, kept for later, is untouched"));
    }
}
