package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.chart.ScatterChart;
import javafx.scene.chart.XYChart;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.stage.Stage;
import org.baywright.calc.Caution;
import org.baywright.io.PlanFiles;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.Plan;
import org.baywright.study.Pareto;
import org.baywright.study.StudyResult;
import org.baywright.study.VariantResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The Study panel, headless (Monocle): a sweep typed into the fields runs in the background to the
 * end; the charts hold one point per variant; the front is marked and undominated; hovering a point
 * shows its figures; clicking it opens the variant's plan; bad values are reported beside their fields
 * with nothing lost; Cancel stops a long study short of its total without an exception.
 */
@ExtendWith(ApplicationExtension.class)
class StudyPanelFxTest {
    private Plan plan;
    private StudyPanel panel;
    private final List<Plan> opened = Collections.synchronizedList(new ArrayList<>());

    @Start
    void start(Stage stage) {
        plan = PlanFiles.read(Path.of("plans", "examples", "two-bay.bay.json")).plan().orElseThrow();
        panel = new StudyPanel(() -> plan, opened::add);
        stage.setScene(new Scene(panel, 1240, 780));
        stage.show();
    }

    private void type(FxRobot robot, String key, String text) {
        TextField f = robot.lookup("#study-field-" + key).queryAs(TextField.class);
        robot.interact(() -> f.setText(text));
    }

    private void runAndWait(FxRobot robot) throws Exception {
        robot.clickOn("#study-run");
        WaitForAsyncUtils.waitFor(120, TimeUnit.SECONDS, () -> !panel.runningProperty().get() && panel.result() != null);
        WaitForAsyncUtils.waitForFxEvents();
    }

    @SuppressWarnings("unchecked")
    private static ScatterChart<Number, Number> chart(FxRobot robot, String id) {
        return robot.lookup(id).queryAs(ScatterChart.class);
    }

    private static int points(ScatterChart<Number, Number> chart) {
        return chart.getData().stream().mapToInt(s -> s.getData().size()).sum();
    }

    private static String text(FxRobot robot, String id) {
        return robot.lookup(id).queryAs(Label.class).getText();
    }

    @Test
    void aSweepRunsToTheEndAndItsPointsOpenTheirPlans(FxRobot robot) throws Exception {
        type(robot, "beam-spacing", "6ft..12ft:2ft");
        type(robot, "beam-direction", "x,y");
        runAndWait(robot);
        StudyResult r = panel.result();
        assertEquals(8, r.total(), "4 spacings × 2 directions");
        assertEquals(8, r.variants().size());
        assertFalse(r.cancelled());
        assertEquals("8 / 8 variants", text(robot, "#study-progress-text"));
        assertTrue(r.variants().stream().allMatch(StudyPanelModel::plotted), r.variants().toString());

        ScatterChart<Number, Number> depth = chart(robot, "#study-chart-depth");
        ScatterChart<Number, Number> across = chart(robot, "#study-chart-across");
        XYChart.Series<Number, Number> front = depth.getData().get(1);
        assertAll(
                () -> assertEquals(8, points(depth), "one point per variant against depth"),
                () -> assertEquals(8, points(across), "one point per variant across the spacing"),
                () -> assertEquals("Pareto front", front.getName()),
                () -> assertFalse(front.getData().isEmpty(), "the front has points"),
                () -> assertEquals(front.getData().size(), robot.lookup(".study-front-point").queryAll().size()),
                () -> assertEquals(8, ((TableView<?>) robot.lookup("#study-table").query()).getItems().size()),
                () -> assertEquals(Caution.TEXT, text(robot, "#study-caution")));
        // the front as drawn, over the sound variants (the front's ground; those with problems are a series of
        // their own): no sound point is both lighter and shallower than a front point, and every other sound
        // point is beaten by some front point (checked on the plotted numbers)
        assertEquals(r.sound().size(), depth.getData().get(0).getData().size() + front.getData().size());
        assertEquals(r.variants().size() - r.sound().size(), depth.getData().get(2).getData().size());
        List<XYChart.Data<Number, Number>> all = new ArrayList<>();
        all.addAll(depth.getData().get(0).getData());
        all.addAll(front.getData());
        for (XYChart.Data<Number, Number> f : front.getData()) {
            for (XYChart.Data<Number, Number> o : all) {
                assertFalse(Pareto.dominates(o, f, d -> d.getYValue().doubleValue(), d -> d.getXValue().doubleValue()),
                        "a front point is dominated");
            }
        }
        for (XYChart.Data<Number, Number> o : depth.getData().get(0).getData()) {
            assertTrue(front.getData().stream().anyMatch(f -> Pareto.dominates(f, o, d -> d.getYValue().doubleValue(),
                    d -> d.getXValue().doubleValue())), "a point off the front is beaten by the front");
        }

        // hovering a front point shows its figures in a tooltip
        Node point = front.getData().get(0).getNode();
        VariantResult v = (VariantResult) point.getUserData();
        Tooltip tip = (Tooltip) point.getProperties().get("javafx.scene.control.Tooltip");
        assertNotNull(tip, "a tooltip is installed");
        assertTrue(tip.getText().startsWith("Variant " + (v.index() + 1)), tip.getText());
        assertTrue(tip.getText().contains("lb/ft² of floor") && tip.getText().contains("beam-spacing"), tip.getText());
        robot.moveTo(point);
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, tip::isShowing);

        // clicking it opens that variant's plan
        robot.clickOn(point);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, opened.size());
        Plan p = opened.get(0);
        assertEquals(panel.setup().spec().plan(v.index()), p);
        double spacing = v.settings().get(0).number();
        GridLine.Axis direction = v.settings().get(1).label().equals("x") ? GridLine.Axis.X : GridLine.Axis.Y;
        for (Infill inf : p.floors().get(0).infills()) {
            assertEquals(spacing, inf.maxSpacing(), 1e-12, "every infill has the variant's spacing");
            assertEquals(direction, inf.direction());
        }
        assertEquals(Units.FT_.toSi(6 + 2 * (v.index() / 2)), spacing, 1e-9, "the spacing of variant " + (v.index() + 1));

        // across the direction instead: two categories, still one point per variant
        @SuppressWarnings("unchecked")
        ComboBox<String> acrossBox = robot.lookup("#study-across").queryAs(ComboBox.class);
        robot.interact(() -> acrossBox.setValue("Beam direction"));
        assertEquals(8, points(across));
        assertEquals("Beam direction", across.getXAxis().getLabel());
    }

    @Test
    void badValuesAreReportedBesideTheirFieldsAndKept(FxRobot robot) {
        type(robot, "beam-spacing", "6ft..3ft:1ft");
        type(robot, "bay-x", "30ft;30ft;30ft");
        type(robot, "beam-direction", "x,y");
        robot.clickOn("#study-run");
        WaitForAsyncUtils.waitForFxEvents();
        Label spacing = robot.lookup("#study-error-beam-spacing").queryAs(Label.class);
        Label bays = robot.lookup("#study-error-bay-x").queryAs(Label.class);
        Label direction = robot.lookup("#study-error-beam-direction").queryAs(Label.class);
        assertAll(
                () -> assertTrue(spacing.isVisible()),
                () -> assertEquals("Beam spacing \"6ft..3ft:1ft\": the end of the range (3ft) is below its start (6ft)."
                        + " Accepted: " + StudyPanelModel.field("beam-spacing").accepted() + ".", spacing.getText()),
                () -> assertTrue(bays.isVisible()),
                () -> assertTrue(bays.getText().startsWith("Bay widths along x \"30ft;30ft;30ft\": ")
                        && bays.getText().contains("3 bay widths given but the plan has 2 bays"), bays.getText()),
                () -> assertFalse(direction.isVisible(), "a good field shows nothing"),
                () -> assertEquals("6ft..3ft:1ft", robot.lookup("#study-field-beam-spacing").queryAs(TextField.class).getText()),
                () -> assertEquals("30ft;30ft;30ft", robot.lookup("#study-field-bay-x").queryAs(TextField.class).getText()),
                () -> assertFalse(panel.runningProperty().get()),
                () -> assertNull(panel.result(), "nothing ran"));
    }

    @Test
    void cancelStopsALongStudyShortOfItsTotal(FxRobot robot) throws Exception {
        robot.interact(() -> plan = PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow());
        // every variant a different building: nothing is shared between them
        type(robot, "bay-x", "25ft..40ft:0.5ft");
        type(robot, "bay-y", "30ft..40ft:1ft");
        type(robot, "beam-count", "2..5:1");
        type(robot, "method", "lrfd,asd");
        robot.clickOn("#study-run");
        WaitForAsyncUtils.waitFor(120, TimeUnit.SECONDS, () -> !text(robot, "#study-progress-text").startsWith("0 /"));
        robot.clickOn("#study-cancel");
        WaitForAsyncUtils.waitFor(120, TimeUnit.SECONDS, () -> !panel.runningProperty().get());
        WaitForAsyncUtils.waitForFxEvents();
        StudyResult r = panel.result();
        assertNotNull(r, "the study ended with a result, not an exception");
        assertEquals(31 * 11 * 4 * 2, r.total());
        assertTrue(r.cancelled());
        assertTrue(r.variants().size() >= 1 && r.variants().size() < r.total(), r.variants().size() + " of " + r.total());
        String progress = text(robot, "#study-progress-text");
        assertEquals(StudyPanelModel.progress(r.variants().size(), r.total()) + " (cancelled)", progress);
        assertEquals(r.variants().size(), points(chart(robot, "#study-chart-depth")), "the finished variants are drawn");
        assertFalse(robot.lookup("#study-error").queryAs(Label.class).isVisible(), "no error");
    }
}
