package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import javafx.scene.Scene;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import org.baywright.report.drawing.Anchor;
import org.baywright.report.drawing.Layer;
import org.baywright.report.drawing.Pen;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.Pt;
import org.baywright.report.drawing.Rgb;
import org.baywright.report.drawing.Space;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The JavaFX renderer puts each kind of primitive where its space says, in its colour and size (pixels of a snapshot). */
@ExtendWith(ApplicationExtension.class)
class FxRendererFxTest {
    private static final Rgb RED = new Rgb(200, 0, 0);
    private static final Rgb BLUE = new Rgb(0, 0, 200);
    private static final Rgb GREEN = new Rgb(0, 160, 0);

    @Start
    void start(Stage stage) {
        stage.setScene(new Scene(new Pane(), 40, 40));
        stage.show();
    }

    @Test
    void linesFillsCirclesAndTextLandWhereTheirSpacesPutThem(FxRobot robot) {
        // 10 px per plan metre, the plan origin at the canvas's lower-left corner; 4 px per millimetre of size
        ViewTransform view = new ViewTransform(10, 0, 100);
        List<Primitive> ps = List.of(
                // plan square 1–4 m: pixels x 10–40, y 60–90 (plan y is up, pixels down)
                new Primitive.Path(Layer.MEMBERS, Space.PLAN, List.of(new Pt(1, 1), new Pt(4, 1), new Pt(4, 4), new Pt(1, 4)),
                        true, null, RED, null),
                // a 1 mm line at plan x = 6 m: 4 px wide about pixel x 60
                new Primitive.Line(Layer.GRID, Space.PLAN, new Pt(6, 0), new Pt(6, 10), Pen.solid(1.0, BLUE)),
                // a dashed line at plan y = 9 m (pixel y 10): 2 mm on, 2 mm off = 8 px on, 8 px off from x 0
                new Primitive.Line(Layer.GRID, Space.PLAN, new Pt(0, 9), new Pt(20, 9), Pen.dashed(1.0, BLUE, 2, 2)),
                // a 2 mm disc at plan (10, 5): radius 8 px about pixel (100, 50)
                new Primitive.Circle(Layer.COLUMNS, Space.PLAN, new Pt(10, 5), 2.0, null, GREEN),
                // paper text 35 mm right and 5 mm up from the lower-left corner: from pixel x 140, baseline at y 80
                new Primitive.Text(Layer.MEMBER_LABELS, Space.PAPER, new Pt(35, 5), "WWW", 5, 0, Anchor.START_BASELINE,
                        Rgb.BLACK, true),
                // plan text turned 90°, centred on (17, 5) m: reads upwards in a column about pixel x 170
                new Primitive.Text(Layer.MEMBER_LABELS, Space.PLAN, new Pt(17, 5), "HHHH", 3, 90, Anchor.MIDDLE_CENTRE,
                        Rgb.BLACK, false));
        WritableImage[] shot = new WritableImage[1];
        robot.interact(() -> {
            Canvas c = new Canvas(200, 100);
            GraphicsContext g = c.getGraphicsContext2D();
            g.setFill(Color.WHITE);
            g.fillRect(0, 0, 200, 100);
            FxRenderer.draw(g, ps, view, 4);
            shot[0] = c.snapshot(null, null);
        });
        PixelReader px = shot[0].getPixelReader();
        assertAll(
                () -> assertColour(RED, px, 25, 75, "inside the square"),
                () -> assertColour(Rgb.WHITE, px, 25, 55, "above the square"),
                () -> assertColour(Rgb.WHITE, px, 45, 75, "right of the square"),
                () -> assertColour(BLUE, px, 60, 50, "on the line"),
                () -> assertColour(Rgb.WHITE, px, 64, 50, "beside the line (it is 4 px wide)"),
                () -> assertColour(BLUE, px, 4, 10, "first dash"),
                () -> assertColour(Rgb.WHITE, px, 12, 10, "first gap"),
                () -> assertColour(BLUE, px, 20, 10, "second dash"),
                () -> assertColour(GREEN, px, 100, 50, "centre of the disc"),
                () -> assertColour(GREEN, px, 106, 50, "inside its radius"),
                () -> assertColour(Rgb.WHITE, px, 111, 50, "outside its radius"),
                () -> assertTrue(dark(px, 140, 62, 195, 80) > 40, "the paper text is written right of x 140, above y 80"),
                () -> assertEquals(0, dark(px, 140, 81, 195, 99), "nothing of it below its baseline"),
                () -> assertTrue(dark(px, 163, 20, 171, 80) > 20, "the turned text stands in a column left of x 171"),
                () -> assertEquals(0, dark(px, 150, 0, 160, 58), "and nothing of it lies across"));
    }

    private static void assertColour(Rgb want, PixelReader px, int x, int y, String where) {
        Color c = px.getColor(x, y);
        double d = Math.abs(c.getRed() * 255 - want.r()) + Math.abs(c.getGreen() * 255 - want.g())
                + Math.abs(c.getBlue() * 255 - want.b());
        assertTrue(d < 30, where + ": pixel (" + x + ", " + y + ") is " + c + ", expected " + want.hex());
    }

    /** Pixels darker than mid-grey in a rectangle. */
    private static int dark(PixelReader px, int x0, int y0, int x1, int y1) {
        int n = 0;
        for (int y = y0; y <= y1; y++) {
            for (int x = x0; x <= x1; x++) {
                if (px.getColor(x, y).getBrightness() < 0.5) {
                    n++;
                }
            }
        }
        return n;
    }
}
