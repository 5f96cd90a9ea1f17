package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import javafx.stage.Stage;
import org.baywright.plan.Plan;
import org.junit.jupiter.api.AfterEach;
import org.baywright.study.VariantResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** A plan opened as a new document (a study variant) gets a window, an undo history and an autosave of its own. */
@ExtendWith(ApplicationExtension.class)
class NewWindowFxTest {
    @TempDir
    Path dir;

    private BaywrightApp app;
    private Stage first;

    @Start
    void start(Stage stage) {
        first = stage;
        app = new BaywrightApp(new RecoveryStore(dir.resolve("recovery")), Duration.ofMillis(200), List.of(BaywrightApp.DEMO),
                TaskRunner.direct());
        app.start(stage);
    }

    @AfterEach
    void stop(FxRobot robot) {
        robot.interact(() -> {
            app.others.forEach(Stage::hide);
            app.stop();
        });
    }

    @Test
    void aVariantOpensInItsOwnUnsavedWindowAndIsAutosaved(FxRobot robot) throws Exception {
        Plan variant = org.baywright.study.Variations.beamSpacing(app.model().plan(), org.baywright.units.Units.FT_.toSi(8));
        robot.interact(() -> app.openInNewWindow(variant));
        assertEquals(1, app.others.size());
        Stage second = app.others.get(0);
        assertTrue(second.isShowing());
        assertTrue(second.getTitle().contains("(not saved)"), second.getTitle());
        assertTrue(second.getX() > first.getX() && second.getY() > first.getY(),
                "the new window is offset from the first: " + second.getX() + "," + second.getY() + " vs " + first.getX() + ","
                        + first.getY());
        assertTrue(!app.model().dirtyProperty().get(), "the first window's plan is untouched");
        // its own autosave copy appears in the recovery folder
        org.testfx.util.WaitForAsyncUtils.waitFor(60, java.util.concurrent.TimeUnit.SECONDS, () -> {
            try (var files = Files.list(dir.resolve("recovery"))) {
                return files.anyMatch(f -> f.getFileName().toString().endsWith(".bay.json"));
            }
        });
        assertNull(app.recovery() == null ? "autosave is off" : null);
    }

    @Test
    void theStudyTabRunsASweepOfTheOpenPlanAndAPointOpensInANewWindow(FxRobot robot) throws Exception {
        robot.interact(() -> app.window().showTab("Study"));
        StudyPanel panel = app.window().study();
        javafx.scene.control.TextField spacing = robot.lookup("#study-field-beam-spacing")
                .queryAs(javafx.scene.control.TextField.class);
        robot.interact(() -> spacing.setText("8ft,10ft"));
        robot.clickOn("#study-run");
        org.testfx.util.WaitForAsyncUtils.waitFor(180, java.util.concurrent.TimeUnit.SECONDS,
                () -> !panel.runningProperty().get() && panel.result() != null);
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        assertEquals(2, panel.result().variants().size());
        @SuppressWarnings("unchecked")
        javafx.scene.chart.ScatterChart<Number, Number> depth = robot.lookup("#study-chart-depth")
                .queryAs(javafx.scene.chart.ScatterChart.class);
        javafx.scene.Node point = depth.getData().stream().flatMap(x -> x.getData().stream()).findFirst().orElseThrow().getNode();
        robot.clickOn(point);
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, app.others.size(), "the variant opened in a window of its own");
        String title = app.others.get(0).getTitle();
        assertTrue(title.contains("(not saved)"), title);
        VariantResult v = (VariantResult) point.getUserData();
        assertTrue(title.contains(StudyPanelModel.variantName(app.model().plan(), v)), "the title names the variant: " + title);
        assertTrue(title.contains("variant " + (v.index() + 1) + " (beam-spacing "), title);
    }
}
