package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.geometry.Point2D;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.stage.Stage;
import org.baywright.calc.Caution;
import org.baywright.design.MemberStatus;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The main window, headless (Monocle), with the demo plan and a synchronous run. */
@ExtendWith(ApplicationExtension.class)
class MainWindowFxTest {
    private EditorModel model;
    private MainWindow window;

    @Start
    void start(Stage stage) {
        model = new EditorModel(TaskRunner.direct());
        window = new MainWindow(model, stage::close);
        stage.setScene(new Scene(window.root(), 1200, 740));
        stage.show();
        assertTrue(window.open(Path.of(BaywrightApp.DEMO)));
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    @Test
    void statusBarShowsTheWeightAndTheCaution(FxRobot robot) {
        assertAll(
                () -> assertTrue(text(robot, "#status-weight").matches("Steel [0-9,]+ lb .*"), text(robot, "#status-weight")),
                () -> assertTrue(text(robot, "#status-area").contains("lb/ft²")),
                () -> assertTrue(text(robot, "#status-ratio").startsWith("Highest ratio 0.") || text(robot, "#status-ratio").startsWith("Highest ratio 1.")),
                () -> assertEquals(Caution.TEXT, text(robot, "#caution")),
                () -> assertTrue(MainWindow.aboutText().contains(Caution.TEXT)));
    }

    @Test
    void thePlanToolsAreAwayOnTheStudyTab(FxRobot robot) {
        Node select = robot.lookup("#tool-select").query();
        assertTrue(shown(select), "the tools are on the Plan tab");
        robot.interact(() -> window.showTab("Study"));
        assertFalse(shown(select), "no plan tools on the Study tab");
        robot.interact(() -> window.showTab("Plan"));
        assertTrue(shown(select));
    }

    /** Shown: the node and every node above it visible. */
    private static boolean shown(Node n) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (!p.isVisible()) {
                return false;
            }
        }
        return true;
    }

    @Test
    void everyToolIsOnTheToolBarAndItsKeyPicksIt(FxRobot robot) {
        for (Tool t : Tool.values()) {
            ToggleButton b = robot.lookup("#" + t.buttonId()).queryAs(ToggleButton.class);
            assertEquals(t.label(), b.getText());
            assertFalse(b.isDisabled(), t.label());
        }
        robot.clickOn(window.canvas().localToScreen(new Point2D(5, 5)));
        for (Tool t : Tool.values()) {
            robot.type(t.key());
            WaitForAsyncUtils.waitForFxEvents();
            assertEquals(t, model.toolProperty().get(), "key " + t.key());
            assertTrue(robot.lookup("#" + t.buttonId()).queryAs(ToggleButton.class).isSelected(), t.label());
        }
        robot.clickOn("#tool-select");
        assertEquals(Tool.SELECT, model.toolProperty().get());
    }

    @Test
    void clickingAMemberShowsItsSectionInProperties(FxRobot robot) {
        MemberResult target = model.currentMembers().stream()
                .filter(m -> m.status() == MemberStatus.SIZED && m.length() > 8)
                .findFirst().orElseThrow();
        PlanCanvas canvas = window.canvas();
        double mx = (target.start().x() + target.end().x()) / 2;
        double my = (target.start().y() + target.end().y()) / 2;
        Point2D local = canvas.transform().toScreen(mx, my);
        assertEquals(java.util.Optional.of(target.id()), canvas.memberAt(local.getX(), local.getY()),
                "the hit test finds the member at its own midpoint");
        Point2D onScreen = canvas.localToScreen(local);
        robot.clickOn(onScreen);
        WaitForAsyncUtils.waitForFxEvents();
        assertAll(
                () -> assertEquals(target.id(), model.selectedProperty().get()),
                () -> assertEquals(target.id(), text(robot, "#prop-member")),
                () -> assertEquals(target.section(), text(robot, "#prop-section")),
                () -> assertEquals("sized", text(robot, "#prop-status")));
        // clicking empty background clears the selection
        robot.clickOn(canvas.localToScreen(new Point2D(5, 5)));
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(robot.lookup("#prop-section").tryQuery().isPresent());
    }

    @Test
    void zoomToFitRestoresTheWholePlanAfterZoomingIn(FxRobot robot) {
        PlanCanvas canvas = window.canvas();
        ViewTransform fitted = canvas.transform();
        double[] b = canvas.bounds();
        assertTrue(fitted.screenX(b[0]) >= PlanCanvas.FIT_MARGIN - 1e-6);
        assertTrue(fitted.screenX(b[2]) <= canvas.getWidth() - PlanCanvas.FIT_MARGIN + 1e-6);
        assertTrue(fitted.screenY(b[3]) >= PlanCanvas.FIT_MARGIN - 1e-6);
        assertTrue(fitted.screenY(b[1]) <= canvas.getHeight() - PlanCanvas.FIT_MARGIN + 1e-6);

        robot.interact(() -> canvas.setTransform(fitted.zoomAt(200, 200, 3).panBy(40, -25)));
        assertNotEquals(fitted, canvas.transform());
        Node fit = robot.lookup("#zoom-fit").query();
        robot.clickOn(fit);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(fitted, canvas.transform());
    }

    @Test
    void levelSelectorChangesTheLevelShown(FxRobot robot) {
        @SuppressWarnings("unchecked")
        javafx.scene.control.ComboBox<String> levels = robot.lookup("#level-selector").queryAs(javafx.scene.control.ComboBox.class);
        assertEquals("Level 2", levels.getValue());
        robot.interact(() -> levels.setValue("Roof"));
        assertEquals("Roof", model.levelProperty().get());
        assertEquals("roof", model.currentFloor().orElseThrow().id());
    }

    @Test
    void undoAndRedoFromTheEditMenuAndTheUnsavedChangesPrompt(FxRobot robot) {
        org.baywright.plan.Plan original = model.plan();
        robot.interact(() -> model.apply(org.baywright.study.Variations.beamSpacing(original,
                org.baywright.units.Units.FT_.toSi(7.5)), "beams at 7.5 ft"));
        assertTrue(model.dirtyProperty().get());
        robot.clickOn("Edit").clickOn("Undo");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(original, model.plan(), "Edit > Undo restores the plan exactly");
        robot.clickOn("Edit").clickOn("Redo");
        WaitForAsyncUtils.waitForFxEvents();
        assertNotEquals(original, model.plan());
        // Exit with unsaved changes asks first; Cancel keeps everything
        robot.clickOn("File").clickOn("Exit");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("Save the changes to " + original.name() + "?").tryQuery().isPresent(),
                "the prompt names the plan");
        robot.clickOn(robot.lookup("Cancel").match(org.testfx.util.NodeQueryUtils.isVisible()).<Node>query());
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(model.dirtyProperty().get(), "nothing was lost");
        assertNotEquals(original, model.plan(), "the edited plan is still open");
    }

    /** Typing a load's live load in Properties and pressing Enter is one undoable edit; Ctrl+Z takes it back. */
    @Test
    void aLoadsValueIsTypedInPropertiesAndUndone(FxRobot robot) {
        var area = model.currentFloor().orElseThrow().areaLoads().get(0);
        robot.interact(() -> model.select(area.id()));
        javafx.scene.control.TextField live = robot.lookup("#edit-live").queryAs(javafx.scene.control.TextField.class);
        assertTrue(live.getPromptText() == null || live.getPromptText().isEmpty(), "no grey example value");
        robot.clickOn(live);
        robot.interact(() -> live.selectAll());
        robot.write("125psf");
        robot.type(javafx.scene.input.KeyCode.ENTER);
        var now = model.currentFloor().orElseThrow().areaLoads().get(0);
        assertEquals(org.baywright.units.Units.PSF.toSi(125), now.values().live(), 1e-6);
        javafx.scene.control.ComboBox<org.baywright.plan.LiveLoadUse> use = robot.lookup("#edit-use").query();
        assertEquals(area.use(), use.getValue());
        assertEquals(area.use().label(), use.getConverter().toString(use.getValue()), "the use in the trade's words");
        robot.press(javafx.scene.input.KeyCode.CONTROL).press(javafx.scene.input.KeyCode.Z)
                .release(javafx.scene.input.KeyCode.Z).release(javafx.scene.input.KeyCode.CONTROL);
        assertEquals(area.values().live(), model.currentFloor().orElseThrow().areaLoads().get(0).values().live(), 1e-9);
    }

    private javafx.scene.control.MenuItem menuItem(String id) {
        return MenuItems.find(window.root(), id);
    }

    /**
     * Design › Roof members carry sets the IBC Table 1604.3 roof row of every roof layout, and Design ›
     * Deflection under live load the live load of the deflection checks; both undoable edits the run follows.
     */
    @Test
    void theRoofCeilingAndTheDeflectionLiveLoadAreDesignMenuChoices(FxRobot robot) {
        String roof = model.plan().floors().stream().filter(f -> f.roof()).findFirst().orElseThrow().id();
        assertEquals(org.baywright.plan.RoofCeiling.DEFAULT, model.plan().settings().roofCeiling(roof));
        assertTrue(((javafx.scene.control.RadioMenuItem) menuItem("menu-roof-non-plaster")).isSelected());
        robot.interact(() -> menuItem("menu-roof-plaster").fire());
        assertEquals(org.baywright.plan.RoofCeiling.PLASTER, model.plan().settings().roofCeiling(roof));
        var roofMember = model.run().takedown().members().get(roof).get(0);
        assertEquals(360, roofMember.criteria().deflection().live(), 1e-9, "the run takes the plaster row: L/360 under live load");
        robot.interact(() -> menuItem("menu-deflection-reduced").fire());
        assertTrue(model.plan().settings().deflectionLiveReduced());
        robot.interact(model::undo);
        robot.interact(model::undo);
        assertFalse(model.plan().settings().deflectionLiveReduced());
        assertEquals(org.baywright.plan.RoofCeiling.DEFAULT, model.plan().settings().roofCeiling(roof));
        assertTrue(((javafx.scene.control.RadioMenuItem) menuItem("menu-roof-non-plaster")).isSelected(), "the menu follows undo");
    }
}
