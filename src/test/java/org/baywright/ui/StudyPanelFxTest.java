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
import org.baywright.units.UnitSystem;
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
        plan = withDeckOverhang(PlanFiles.read(Path.of("plans", "examples", "two-bay.bay.json")).plan().orElseThrow(),
                org.baywright.units.Units.FT_.toSi(5));
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

    private static XYChart.Series<Number, Number> series(ScatterChart<Number, Number> chart, String name) {
        return chart.getData().stream().filter(x -> x.getName().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no series " + name));
    }

    /**
     * The plan with every deck allowed to overhang {@code overhang}: the example's opening is not framed,
     * so at 6 and 8 ft spacing the deck overhangs up to 4 ft into it, over the 2 ft default; this test is
     * about the panel, which needs variants without problems to draw a Pareto front.
     */
    private static Plan withDeckOverhang(Plan p, double overhang) {
        List<org.baywright.plan.Floor> floors = p.floors().stream().map(f -> new org.baywright.plan.Floor(f.id(), f.name(),
                f.roof(), f.slabEdge(), f.decks().stream().map(d -> d.withLimits(d.maxSpan(), overhang)).toList(), f.members(),
                f.infills(), f.openings(), f.areaLoads(), f.lineLoads(), f.pointLoads())).toList();
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), floors, p.columns());
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
        XYChart.Series<Number, Number> beams = series(depth, "Deepest beam");
        XYChart.Series<Number, Number> girders = series(depth, "Deepest girder");
        XYChart.Series<Number, Number> front = series(depth, "Pareto front");
        UnitSystem us = UnitSystem.US;
        assertAll(
                () -> assertEquals(8, beams.getData().size(), "every variant at its deepest beam"),
                () -> assertEquals(8, girders.getData().size(), "every variant at its deepest girder"),
                () -> assertEquals(8, points(across), "one point per variant across the spacing"),
                () -> assertFalse(front.getData().isEmpty(), "the front has points"),
                () -> assertEquals(8, ((TableView<?>) robot.lookup("#study-table").query()).getItems().size()),
                () -> assertTrue(robot.lookup("#study-front-note").query().isVisible(), "the note comes with the results"),
                () -> assertEquals(Caution.TEXT, text(robot, "#study-caution")));
        for (XYChart.Data<Number, Number> d : beams.getData()) {
            VariantResult v = (VariantResult) d.getExtraValue();
            assertEquals(StudyPanelModel.depth(v.beamDepth(), us), d.getXValue().doubleValue(), 1e-9, "beam depth");
        }
        for (XYChart.Data<Number, Number> d : girders.getData()) {
            VariantResult v = (VariantResult) d.getExtraValue();
            assertEquals(StudyPanelModel.depth(v.girderDepth(), us), d.getXValue().doubleValue(), 1e-9, "girder depth");
        }
        // every legend entry has a marker, styled as its series' points
        for (XYChart.Series<Number, Number> sr : depth.getData()) {
            Label item = depth.lookupAll(".chart-legend-item").stream().map(n -> (Label) n)
                    .filter(l -> l.getText().equals(sr.getName())).findFirst().orElseThrow();
            Node marker = item.getGraphic();
            assertNotNull(marker, sr.getName() + " has a marker");
            String style = sr.getData().get(0).getNode().getStyleClass().stream().filter(c -> c.startsWith("study-depth-"))
                    .findFirst().orElseThrow();
            assertTrue(marker.getStyleClass().contains(style), sr.getName() + ": " + marker.getStyleClass());
        }
        // the front as drawn, at the structural depth: no sound variant is both lighter and shallower than a
        // front point, and every other sound variant is beaten by some front variant
        List<VariantResult> onFront = front.getData().stream().map(d -> (VariantResult) d.getExtraValue()).toList();
        for (XYChart.Data<Number, Number> d : front.getData()) {
            VariantResult f = (VariantResult) d.getExtraValue();
            assertEquals(StudyPanelModel.depth(f.structuralDepth(), us), d.getXValue().doubleValue(), 1e-9);
            for (VariantResult o : r.sound()) {
                assertFalse(Pareto.dominates(o, f, VariantResult::weightPerArea, VariantResult::structuralDepth),
                        "a front point is dominated");
            }
        }
        for (VariantResult o : r.sound()) {
            assertTrue(onFront.contains(o) || onFront.stream().anyMatch(f -> Pareto.dominates(f, o, VariantResult::weightPerArea,
                    VariantResult::structuralDepth)), "a point off the front is beaten by the front");
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
        assertEquals(StudyPanelModel.named(panel.setup().spec().plan(v.index()), plan, v), p, "the variant's plan, named after it");
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
    void beforeARunNothingLooksSet(FxRobot robot) {
        assertFalse(robot.lookup("#study-front-note").query().isVisible(), "no note about a chart with nothing in it");
        for (StudyPanelModel.Field f : StudyPanelModel.FIELDS) {
            TextField t = robot.lookup("#study-field-" + f.key()).queryAs(TextField.class);
            assertEquals("", t.getText(), f.key() + " starts empty");
            assertTrue(t.getPromptText().startsWith("e.g. "), f.key() + ": " + t.getPromptText());
        }
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
        assertEquals(r.variants().size(), chart(robot, "#study-chart-depth").getData().stream().flatMap(x -> x.getData().stream())
                .map(XYChart.Data::getExtraValue).distinct().count(), "the finished variants are drawn");
        assertFalse(robot.lookup("#study-error").queryAs(Label.class).isVisible(), "no error");
    }
}
