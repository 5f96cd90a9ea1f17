package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.DialogPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** A recovery folder that cannot be made: the editor still starts, and says plainly that autosave is off and why. */
@ExtendWith(ApplicationExtension.class)
class RecoveryOffFxTest {
    @TempDir
    Path dir;

    private BaywrightApp app;
    private Path blocked;

    @Start
    void start(Stage stage) throws Exception {
        Path file = dir.resolve("a-file");
        Files.writeString(file, "in the way");
        blocked = file.resolve("recovery"); // a folder inside a file: cannot be created
        app = new BaywrightApp(new RecoveryStore(blocked), Duration.ofHours(1), List.of(BaywrightApp.DEMO), TaskRunner.direct());
        app.start(stage);
    }

    @AfterEach
    void stop(FxRobot robot) {
        robot.interact(() -> app.stop());
    }

    @Test
    void theEditorStartsAndSaysAutosaveIsOff(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> robot.lookup("Autosave is off").tryQuery().isPresent());
        DialogPane pane = robot.lookup(".dialog-pane").queryAs(DialogPane.class);
        assertTrue(pane.getContentText().contains(blocked.toString()), pane.getContentText());
        assertTrue(pane.getContentText().contains(RecoveryStore.DIR_PROPERTY), pane.getContentText());
        assertEquals(Path.of(BaywrightApp.DEMO), app.model().fileProperty().get(), "the plan opened all the same");
        assertNull(app.recovery());
        robot.clickOn("OK");
        WaitForAsyncUtils.waitForFxEvents();
    }
}
