package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.stage.Stage;
import org.baywright.design.MemberStatus;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The drawing gestures end to end, headless: a new plan, a typed 2 × 2 grid, girders and beams dragged
 * between columns, a bay filled with infill beams, a load area dragged, each followed by a run whose
 * sizes and steel weight the test reads back; then undo and redo, saving and opening, and a broken
 * file that leaves the plan alone. The run is synchronous here ({@link TaskRunner#direct()}).
 */
@ExtendWith(ApplicationExtension.class)
class EditorGesturesFxTest {
    private static final double FT = Units.FT_.toSi(1);

    private EditorModel model;
    private MainWindow window;
    @TempDir
    Path dir;

    @Start
    void start(Stage stage) {
        model = new EditorModel(TaskRunner.direct());
        window = new MainWindow(model, stage::close, new RecentFiles(Path.of(System.getProperty("java.io.tmpdir"),
                "baywright-gestures-recent.txt")));
        stage.setScene(new Scene(window.root(), 1280, 800));
        stage.show();
    }

    /** Closes the dialogs a test left open, so the next test starts with one window. */
    @org.junit.jupiter.api.AfterEach
    void closeDialogs(FxRobot robot) {
        robot.interact(() -> new ArrayList<>(javafx.stage.Window.getWindows()).stream()
                .filter(w -> w instanceof Stage s && s.getOwner() != null).forEach(javafx.stage.Window::hide));
    }

    /** Replaces a text field's text by typing, as a user does: select all, then type. */
    private static void typeInto(FxRobot robot, String id, String text) {
        robot.clickOn(id);
        robot.press(KeyCode.CONTROL, KeyCode.A).release(KeyCode.A, KeyCode.CONTROL);
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(text, robot.lookup(id).queryAs(javafx.scene.control.TextField.class).getText(), id);
    }

    /** A menu of this test's window (earlier tests' windows may still answer a plain text lookup). */
    private javafx.scene.Node menu(FxRobot robot, String name) {
        return robot.from(window.root()).lookup(name).query();
    }

    /** A menu item of the window's menu bar, by id, searched through submenus. */
    private javafx.scene.control.MenuItem menuItem(String id) {
        return MenuItems.find(window.root(), id);
    }

    private Point2D screen(double x, double y) {
        PlanCanvas c = window.canvas();
        return c.localToScreen(c.transform().toScreen(x, y));
    }

    private double steel() {
        return model.run().takedown().steelWeight();
    }

    private MemberResult member(String id) {
        return model.currentMembers().stream().filter(m -> m.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no member " + id + " in " + model.currentMembers()));
    }

    private void drag(FxRobot robot, double x0, double y0, double x1, double y1) {
        robot.drag(screen(x0, y0), MouseButton.PRIMARY).moveTo(screen((x0 + x1) / 2, (y0 + y1) / 2)).dropTo(screen(x1, y1));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void newPlanWithTypedGrid(FxRobot robot) {
        robot.interact(() -> window.newPlan("Gesture test", "US customary", "1", "13ft"));
        assertEquals(Tool.GRID, model.toolProperty().get(), "a new plan starts in the Grid tool");
        typeInto(robot, "#grid-x", "2@30");
        typeInto(robot, "#grid-y", "2@30'");
        robot.clickOn("#grid-apply");
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> window.canvas().zoomToFit());
    }

    @Test
    void typeAGridDragFramingFillABayDrawALoadAreaThenUndoRedoSaveAndOpen(FxRobot robot) throws Exception {
        newPlanWithTypedGrid(robot);
        Plan p = model.plan();
        assertAll("typing 2@30 both ways gives a 2 × 2 grid with columns and a slab",
                () -> assertEquals(List.of(0.0, 30 * FT, 60 * FT), PlanEdits.lines(p, GridLine.Axis.X).stream().map(GridLine::offset).toList()),
                () -> assertEquals(List.of("A", "B", "C"), PlanEdits.lines(p, GridLine.Axis.X).stream().map(GridLine::label).toList()),
                () -> assertEquals(List.of("1", "2", "3"), PlanEdits.lines(p, GridLine.Axis.Y).stream().map(GridLine::label).toList()),
                () -> assertEquals(9, p.columns().size()),
                () -> assertEquals(3600 * FT * FT, Math.abs(model.currentFloor().orElseThrow().slabEdge().signedArea()), 1e-6));
        List<Plan> history = new ArrayList<>();
        history.add(model.plan());

        // girders along lines 1 and 2, beams along lines A and B, dragged between the columns
        robot.clickOn("#tool-girder");
        drag(robot, 0, 0, 30 * FT, 0);
        drag(robot, 0, 30 * FT, 30 * FT, 30 * FT);
        robot.clickOn("#tool-beam");
        drag(robot, 0, 0, 0, 30 * FT);
        drag(robot, 30 * FT, 0, 30 * FT, 30 * FT);
        Floor f = model.currentFloor().orElseThrow();
        assertEquals(List.of("G-1-AB", "G-2-AB", "B-A-12", "B-B-12"), f.members().stream().map(m -> m.id()).toList(),
                "each drag snapped to the grid intersections and named the member after them");
        assertEquals(MemberKind.GIRDER, f.member("G-1-AB").orElseThrow().kind());
        history.add(model.plan());
        double framed = steel();
        assertTrue(framed > 0);

        // infill: beams at 10 ft at most in bay A–B / 1–2
        robot.clickOn("#tool-infill");
        typeInto(robot, "#infill-spacing", "10ft");
        robot.clickOn(screen(15 * FT, 15 * FT));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, model.currentFloor().orElseThrow().infills().size());
        MemberResult infill = member("IF-AB-12/1");
        MemberResult second = member("IF-AB-12/2");
        assertAll(() -> assertEquals(MemberStatus.SIZED, infill.status()),
                () -> assertEquals(30 * FT, infill.length(), 1e-9),
                () -> assertEquals(10 * FT, infill.start().x(), 1e-9, "two beams at 10 ft: a 30 ft bay in three"),
                () -> assertEquals(20 * FT, second.start().x(), 1e-9),
                () -> assertEquals(MemberStatus.SIZED, member("G-1-AB").status()));
        double filled = steel();
        assertTrue(filled > framed, "the infill beams add steel: " + filled + " > " + framed);
        String statusBefore = robot.lookup("#status-weight").queryAs(Label.class).getText();
        String beamBefore = infill.section();
        history.add(model.plan());

        // a heavy load area dragged over the middle third of the bay
        robot.clickOn("#tool-load-area");
        typeInto(robot, "#area-live", "250psf");
        drag(robot, 5 * FT, 5 * FT, 25 * FT, 25 * FT);
        Floor loaded = model.currentFloor().orElseThrow();
        assertEquals(1, loaded.areaLoads().stream().filter(a -> !a.id().equals("AL-floor")).count());
        double heavier = steel();
        assertTrue(heavier > filled, "250 psf over the bay needs more steel: " + heavier + " > " + filled);
        assertNotEquals(statusBefore, robot.lookup("#status-weight").queryAs(Label.class).getText(),
                "the status bar shows the new weight");
        assertTrue(member("IF-AB-12/1").design().section().weight() >= infill.design().section().weight(),
                "the infill beam is no lighter than " + beamBefore);
        history.add(model.plan());

        // undo back to the typed grid, then redo to the end: each step exact
        int edits = 0;
        while (model.canUndoProperty().get()) {
            robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
            WaitForAsyncUtils.waitForFxEvents();
            edits++;
        }
        assertEquals(1 + 4 + 1 + 1, edits, "grid, four members, infill and load area are one edit each");
        assertFalse(model.canUndoProperty().get());
        robot.clickOn(menu(robot, "Edit")).clickOn("Redo");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(history.get(0), model.plan(), "redo of the grid gives the typed grid exactly");
        while (model.canRedoProperty().get()) {
            robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.Z).release(KeyCode.Z, KeyCode.SHIFT, KeyCode.CONTROL);
            WaitForAsyncUtils.waitForFxEvents();
        }
        assertEquals(history.get(history.size() - 1), model.plan(), "redo to the end gives the loaded plan exactly");
        assertEquals(heavier, steel(), 1e-9 * heavier);

        // save and open again: the same plan, the same steel
        Path file = dir.resolve("gestures.bay.json");
        robot.interact(() -> {
            try {
                model.saveAs(file);
            } catch (java.io.IOException e) {
                throw new AssertionError(e);
            }
        });
        assertFalse(model.dirtyProperty().get());
        Plan saved = model.plan();
        robot.interact(() -> assertTrue(window.open(file)));
        // the file keeps ten significant digits of feet: the plan read back writes the same text
        assertEquals(org.baywright.io.PlanFiles.write(saved), org.baywright.io.PlanFiles.write(model.plan()),
                "the plan read back is the plan saved");
        assertFalse(model.dirtyProperty().get());
        assertEquals(heavier, steel(), 1e-6 * heavier);
        Plan reopened = model.plan();

        // a broken file is not opened: a dialog lists the problems and the plan stays
        Path broken = dir.resolve("broken.bay.json");
        Files.writeString(broken, Files.readString(file, StandardCharsets.UTF_8).replace("\"format\"", "\"formt\""),
                StandardCharsets.UTF_8);
        robot.interact(() -> assertFalse(window.open(broken)));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(reopened, model.plan(), "the open plan is untouched");
        assertTrue(robot.lookup("#open-problems").tryQuery().isPresent(), "the located problems are shown");
        String shown = robot.lookup("#open-problems").queryAs(javafx.scene.control.TextArea.class).getText();
        assertTrue(shown.contains("formt"), shown);
    }

    @Test
    void selectMoveAndDeleteAreUndoable(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        robot.clickOn("#tool-girder");
        drag(robot, 0, 0, 30 * FT, 0);
        Plan drawn = model.plan();
        // select it, drag it north by 10 ft (the grab point snaps to its midpoint), then delete it
        robot.clickOn("#tool-select");
        robot.clickOn(screen(15 * FT, 0));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("G-1-AB", model.selectedProperty().get());
        drag(robot, 15 * FT, 0, 15 * FT, 10 * FT);
        var moved = model.currentFloor().orElseThrow().member("G-1-AB").orElseThrow();
        assertEquals(10 * FT, moved.start().y(), 0.03, "moved 10 ft north (to the snapping precision)");
        robot.type(KeyCode.DELETE);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(model.currentFloor().orElseThrow().members().isEmpty());
        robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
        robot.press(KeyCode.CONTROL, KeyCode.Z).release(KeyCode.Z, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(drawn, model.plan(), "two undos give back the girder where it was drawn");
    }

    @Test
    void draggingAGridLineMovesWhatIsOnIt(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        robot.clickOn("#tool-girder");
        drag(robot, 0, 0, 30 * FT, 0);
        robot.clickOn("#tool-select");
        // grab line B away from any member or column and drag it 5 ft east
        drag(robot, 30 * FT, 45 * FT, 35 * FT, 45 * FT);
        Plan p = model.plan();
        assertEquals(35 * FT, p.gridLine("B").orElseThrow().offset(), 0.02);
        assertEquals(p.gridLine("B").orElseThrow().offset(), model.currentFloor().orElseThrow().member("G-1-AB").orElseThrow()
                .end().x(), 1e-9, "the girder's end follows its grid line");
        assertEquals(60 * FT, p.gridLine("C").orElseThrow().offset(), 1e-9, "the next line stays");
    }

    @Test
    void measureAndSnapMarker(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        robot.clickOn("#tool-measure");
        robot.moveTo(screen(30 * FT + 0.1, 30 * FT - 0.1));
        WaitForAsyncUtils.waitForFxEvents();
        var hover = window.canvas().tools().hover().orElseThrow();
        assertEquals(Snapper.Kind.INTERSECTION, hover.kind(), "near B-2 the cursor snaps to the intersection");
        drag(robot, 0, 0, 30 * FT, 30 * FT);
        assertTrue(model.messageProperty().get().startsWith("Distance 42'-5"), model.messageProperty().get());
    }

    @Test
    void unitsAndMethodMenusAreUndoableEdits(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        robot.interact(() -> menuItem("menu-units-si").fire());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(UnitSystem.SI, model.units());
        assertTrue(robot.lookup("#status-area").queryAs(Label.class).getText().contains("kg/m²"),
                robot.lookup("#status-area").queryAs(Label.class).getText());
        robot.interact(() -> menuItem("menu-method-asd").fire());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("asd", model.plan().settings().method());
        robot.interact(model::undo);
        robot.interact(model::undo);
        assertEquals(UnitSystem.US, model.units());
        assertEquals("lrfd", model.plan().settings().method());
    }

    @Test
    void aFixedSizeIsSetInPropertiesAndAnUnsupportedBeamIsAProblemLinkedToTheCanvas(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        robot.clickOn("#tool-girder");
        drag(robot, 0, 0, 30 * FT, 0);
        robot.clickOn("#tool-select");
        robot.clickOn(screen(15 * FT, 0));
        WaitForAsyncUtils.waitForFxEvents();
        String lightest = member("G-1-AB").section();
        typeInto(robot, "#fixed-size", "w27x94");
        robot.clickOn("#fixed-size-set");
        WaitForAsyncUtils.waitForFxEvents();
        assertAll(() -> assertEquals(java.util.Optional.of("W27X94"),
                        model.currentFloor().orElseThrow().member("G-1-AB").orElseThrow().fixedSection()),
                () -> assertEquals("W27X94", member("G-1-AB").section()),
                () -> assertEquals(MemberStatus.FIXED_SIZE, member("G-1-AB").status()),
                () -> assertNotEquals("W27X94", lightest, "the lightest adequate size was another"));

        // a beam drawn in the middle of a bay, touching nothing: located problems, drawn and linked
        robot.clickOn("#tool-beam");
        drag(robot, 40 * FT, 40 * FT, 50 * FT, 50 * FT);
        var problem = model.problems().stream().filter(p -> p.kind().equals("unsupported-member")).findFirst()
                .orElseThrow(() -> new AssertionError(model.problems().toString()));
        assertEquals("B-1", problem.objectId());
        assertFalse(problem.where().isEmpty(), "the problem says where it is");
        @SuppressWarnings("unchecked")
        javafx.scene.control.ListView<org.baywright.plan.Problem> list = robot.lookup("#problems")
                .queryAs(javafx.scene.control.ListView.class);
        robot.interact(() -> list.getSelectionModel().select(problem));
        assertEquals(problem, model.shownProblemProperty().get());
        assertEquals("B-1", model.selectedProperty().get(), "picking the problem selects its member");
    }

    @Test
    void theOtherToolsByClicking(FxRobot robot) {
        newPlanWithTypedGrid(robot);
        // Deck: the first click picks the deck (its slab in Properties), the next turns the span by 90°
        robot.clickOn("#tool-deck");
        robot.clickOn(screen(45 * FT, 45 * FT));
        assertEquals(0, model.currentFloor().orElseThrow().decks().get(0).spanAngle(), 1e-9);
        assertEquals(model.currentFloor().orElseThrow().decks().get(0).id(), model.selectedProperty().get());
        robot.clickOn(screen(45 * FT, 45 * FT));
        assertEquals(90, model.currentFloor().orElseThrow().decks().get(0).spanAngle(), 1e-9);
        // Opening: four corners, then the first again closes it
        robot.clickOn("#tool-opening");
        double[][] corners = {{35, 35}, {45, 35}, {45, 50}, {35, 50}, {35, 35}};
        for (double[] c : corners) {
            robot.clickOn(screen(c[0] * FT, c[1] * FT));
        }
        WaitForAsyncUtils.waitForFxEvents();
        var openings = model.currentFloor().orElseThrow().openings();
        assertEquals(1, openings.size());
        // free points: the robot clicks whole pixels (about 0.1 ft here), then the point rounds to the inch
        assertEquals(150 * FT * FT, Math.abs(openings.get(0).outline().signedArea()), 3 * FT * FT, "10 ft × 15 ft");
        assertEquals(4, openings.get(0).outline().vertices().size());
        // Line load: three points, Enter finishes
        robot.clickOn("#tool-line-load");
        robot.clickOn(screen(0, 5 * FT)).clickOn(screen(0, 25 * FT)).clickOn(screen(10 * FT, 25 * FT));
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        var line = model.currentFloor().orElseThrow().lineLoads();
        assertEquals(1, line.size());
        assertEquals(3, line.get(0).path().size());
        // Point load and Column: one click each
        robot.clickOn("#tool-point-load");
        robot.clickOn(screen(15 * FT, 45 * FT));
        robot.clickOn("#tool-column");
        robot.clickOn(screen(15 * FT, 15 * FT));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, model.currentFloor().orElseThrow().pointLoads().size());
        assertEquals(10, model.plan().columns().size(), "nine at the intersections and one placed");
        // Esc abandons an outline half drawn
        robot.clickOn("#tool-load-area");
        robot.clickOn(screen(5 * FT, 5 * FT)).clickOn(screen(10 * FT, 5 * FT));
        robot.type(KeyCode.ESCAPE);
        assertEquals(CanvasTools.Mode.IDLE, window.canvas().tools().mode());
        assertEquals(1, model.currentFloor().orElseThrow().areaLoads().size(), "only the floor load");
    }
}
