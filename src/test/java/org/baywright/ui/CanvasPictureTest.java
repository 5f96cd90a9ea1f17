package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.baywright.report.drawing.DrawingOptions;
import org.baywright.report.drawing.FramingPlanDrawing;
import org.baywright.report.drawing.Layer;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.ReactionMode;
import org.baywright.report.drawing.Rgb;
import org.junit.jupiter.api.Test;

/**
 * The canvas and the printed sheet draw the plan from the same builder: on every level of the demo, the
 * members' ratio colours are the sheet's, member by member, and every size, ratio, reaction and column
 * label the canvas writes is one the sheet writes, in the same words.
 */
class CanvasPictureTest {
    @Test
    void theCanvasShowsTheSheetsMembersLabelsAndColoursOnEveryLevelOfTheDemo() {
        EditorModel model = new EditorModel(TaskRunner.direct());
        assertTrue(model.open(Path.of(BaywrightApp.DEMO)).opened());
        model.showReactionsProperty().set(true);
        for (String level : model.levelNames()) {
            model.levelProperty().set(level);
            FramingPlanDrawing sheet = FramingPlanDrawing.of(model.run(), level,
                    DrawingOptions.defaults().withReactions(ReactionMode.SERVICE));
            // the canvas zoomed in three times the sheet's scale, in its own lettering and style
            List<Primitive> canvas = PlanCanvas.picture(model).build(sheet.viewport().metresPerMm() / 3);
            List<Primitive> printed = sheet.primitives();
            List<String> onCanvas = texts(canvas, Layer.MEMBER_LABELS, -1);
            List<String> onSheet = new ArrayList<>(texts(printed, Layer.MEMBER_LABELS, -1));
            double t = sheet.paper().textSize();
            assertAll(level,
                    () -> assertFalse(bands(canvas).isEmpty()),
                    () -> assertEquals(bands(printed), bands(canvas), "ratio colours, member by member"),
                    () -> assertEquals(texts(printed, Layer.MEMBER_LABELS, t), texts(canvas, Layer.MEMBER_LABELS, t),
                            "member sizes, member by member"),
                    () -> assertTrue(onCanvas.stream().allMatch(onSheet::remove),
                            "every label on the canvas is on the sheet: " + onCanvas),
                    () -> assertEquals(texts(printed, Layer.GRID, -1).stream().distinct().toList(),
                            texts(canvas, Layer.GRID, -1).stream().distinct().toList(), "grid bubbles"));
        }
    }

    /** Texts of a layer (of one size, or every size for a negative one), in drawing order. */
    private static List<String> texts(List<Primitive> ps, Layer layer, double size) {
        return ps.stream().filter(p -> p.layer() == layer && p instanceof Primitive.Text t && (size < 0 || t.size() == size))
                .map(p -> ((Primitive.Text) p).text()).toList();
    }

    private static List<Rgb> bands(List<Primitive> ps) {
        return ps.stream().filter(p -> p.layer() == Layer.MEMBERS && p instanceof Primitive.Path s && s.fill() != null)
                .map(p -> ((Primitive.Path) p).fill()).toList();
    }
}
