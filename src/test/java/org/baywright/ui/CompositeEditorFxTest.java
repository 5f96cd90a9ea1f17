package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Composite floors in the window, headless (Monocle), on the demo plan with a synchronous run: a deck's slab
 * is picked with the Deck tool and edited in Properties, and a floor is switched composite from its level.
 */
@ExtendWith(ApplicationExtension.class)
class CompositeEditorFxTest {
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

    private Deck deck() {
        return model.currentFloor().orElseThrow().decks().get(0);
    }

    /** Edit › Undo (Ctrl+Z inside a text field undoes the typing, as in any text field). */
    private void undo(FxRobot robot) {
        robot.interact(() -> MenuItems.find(window.root(), "menu-undo").fire());
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void type(FxRobot robot, String id, String text) {
        TextField f = robot.lookup(id).queryAs(TextField.class);
        robot.clickOn(f);
        robot.interact(f::selectAll);
        robot.write(text);
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /**
     * Deck tool: a click inside a deck shows its slab in Properties; switching the slab on, typing a topping
     * (a bare number is inches in a US plan) lands in the plan and undo takes it back; a rib wider than its
     * pitch is refused with a message naming the deck and the field, and the typed text stays in the field.
     */
    @Test
    void aDecksSlabIsSwitchedOnEditedRefusedAndUndone(FxRobot robot) {
        var before = model.plan();
        robot.interact(() -> model.toolProperty().set(Tool.DECK));
        var vs = deck().outline().vertices();
        double[] c = {vs.stream().mapToDouble(v -> v.x()).average().orElseThrow() + 0.3,
            vs.stream().mapToDouble(v -> v.y()).average().orElseThrow() + 0.3};
        Point2D at = window.canvas().localToScreen(window.canvas().transform().toScreen(c[0], c[1]));
        robot.clickOn(at);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(deck().id(), model.selectedProperty().get(), "the first click picks the deck");
        assertTrue(before.equals(model.plan()), "and does not turn it");
        assertEquals(deck().id(), robot.lookup("#prop-deck").queryAs(Label.class).getText());
        ComboBox<String> slab = robot.lookup("#choose-slab").query();
        if (deck().slab() == null) {
            robot.interact(() -> slab.setValue("Concrete on deck"));
            WaitForAsyncUtils.waitForFxEvents();
        }
        assertTrue(deck().slab() != null, "the deck carries a slab");
        var on = model.plan();
        type(robot, "#edit-topping", "5.5");
        assertEquals(Units.IN.toSi(5.5), deck().slab().topping(), 1e-9);
        assertEquals("5.5in", robot.lookup("#edit-topping").queryAs(TextField.class).getText());
        type(robot, "#edit-rib-width", "14in");
        String message = model.messageProperty().get();
        assertAll(() -> assertTrue(message.contains(deck().id()) && message.contains("rib width"), message),
                () -> assertEquals("14in", robot.lookup("#edit-rib-width").queryAs(TextField.class).getText(),
                        "what was typed is kept"),
                () -> assertEquals(Units.IN.toSi(5.5), deck().slab().topping(), 1e-9, "nothing changed"));
        undo(robot);
        assertTrue(on.equals(model.plan()), "undo restores the topping");
    }

    /** With nothing selected the level's Properties switch its floor layout composite, an undoable edit. */
    @Test
    void aFloorIsSwitchedCompositeFromItsLevel(FxRobot robot) {
        robot.interact(() -> model.select(null));
        String floor = model.currentFloorId();
        var before = model.plan();
        ComboBox<String> mode = robot.lookup("#choose-composite-action").query();
        String target = "Composite".equals(mode.getValue()) ? "Per member" : "Composite";
        robot.interact(() -> mode.setValue(target));
        WaitForAsyncUtils.waitForFxEvents();
        CompositeMode expected = target.equals("Composite") ? CompositeMode.COMPOSITE : CompositeMode.PER_MEMBER;
        assertEquals(expected, model.plan().floor(floor).orElseThrow().composite().mode());
        assertEquals(target, robot.lookup("#choose-composite-action").<ComboBox<String>>query().getValue(), "the list follows");
        type(robot, "#edit-construction-live", "25psf");
        assertEquals(Units.PSF.toSi(25), model.plan().floor(floor).orElseThrow().composite().constructionLive(), 1e-6);
        undo(robot);
        undo(robot);
        assertTrue(before.equals(model.plan()), "undone");
    }

    /**
     * A floor with the typical slab on its decks, switched composite: the run designs its members with the
     * slab, the canvas labels them in plan notation (size, studs in brackets, camber: common practice) and a
     * composite member's Properties list its composite design and the bare-steel section for comparison.
     */
    @Test
    void compositeMembersAreLabelledWithStudsAndCamber(FxRobot robot) {
        String floor = model.currentFloorId();
        robot.interact(() -> {
            for (Deck d : model.currentFloor().orElseThrow().decks()) {
                model.edit(p -> org.baywright.plan.PlanEdits.setSlab(p, floor, d.id(), org.baywright.plan.Slab.typical()), "slab");
            }
            model.edit(p -> org.baywright.plan.PlanEdits.setComposite(p, floor, org.baywright.plan.CompositeFloor.DEFAULT),
                    "composite");
        });
        WaitForAsyncUtils.waitForFxEvents();
        var composite = model.currentMembers().stream().filter(m -> m.isComposite() && !m.section().isEmpty()
                && m.length() > 8).toList();
        assertTrue(!composite.isEmpty(), "the run designs members with the slab");
        // closer in, where a label has room for its studs and camber (zoomed out they are left off, as labels that do not fit)
        robot.interact(() -> {
            PlanCanvas canvas = window.canvas();
            Point2D mid = canvas.transform().toScreen(Units.FT_.toSi(40), Units.FT_.toSi(55));
            canvas.setTransform(canvas.transform().zoomAt(mid.getX(), mid.getY(), 2.5));
        });
        WaitForAsyncUtils.waitForFxEvents();
        var labels = window.canvas().content().stream()
                .filter(p -> p instanceof org.baywright.report.drawing.Primitive.Text t
                        && t.layer() == org.baywright.report.drawing.Layer.MEMBER_LABELS)
                .map(p -> ((org.baywright.report.drawing.Primitive.Text) p).text()).toList();
        assertTrue(labels.stream().anyMatch(t -> t.matches("\\[?W\\d+X[\\d.]+]? \\(\\d+\\)( c=.+\")?")),
                "a label in plan notation among " + labels);
        var m = composite.get(0);
        robot.interact(() -> model.select(m.id()));
        WaitForAsyncUtils.waitForFxEvents();
        assertAll(() -> assertTrue(robot.lookup("#prop-effective-width-b-eff").queryAs(Label.class).getText().contains("left"),
                        "b_eff by side"),
                () -> assertEquals(m.studs() + " (" + m.studs() / 2 + " each side of mid-span)",
                        robot.lookup("#prop-studs").queryAs(Label.class).getText()),
                () -> assertTrue(robot.lookup("#prop-composite-action").queryAs(Label.class).getText().endsWith("% of full")),
                () -> assertTrue(robot.lookup("#prop-plastic-neutral-axis").queryAs(Label.class).getText().startsWith("in the ")),
                () -> assertTrue(robot.lookup("#prop-bare-steel-instead").tryQuery().isPresent()),
                () -> assertTrue(robot.lookup("#choose-composite").tryQuery().isPresent(), "the member's own choice"),
                () -> assertTrue(robot.lookup("#edit-fixed-studs").tryQuery().isPresent(), "fixed studs beside the fixed size"));
    }
}
