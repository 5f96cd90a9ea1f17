package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Comparator;
import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Label;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import org.baywright.report.drawing.Rgb;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * View › Floor vibration in the window, headless (Monocle), on the demo plan (a composite floor whose worst bay,
 * B-C/3-4 beside the atrium, exceeds the office limit): the menu item (its selected state, as a click on it sets it) tints the bays, the pointer over a bay shows
 * its values, and a click picks it into Properties.
 */
@ExtendWith(ApplicationExtension.class)
class VibrationViewFxTest {
    private EditorModel model;
    private MainWindow window;
    private BayResult worst;

    @Start
    void start(Stage stage) {
        model = new EditorModel(TaskRunner.direct());
        window = new MainWindow(model, stage::close);
        stage.setScene(new Scene(window.root(), 1200, 740));
        stage.show();
        assertTrue(window.open(Path.of(BaywrightApp.DEMO)));
        worst = model.run().bays().stream().filter(BayResult::checked).max(Comparator.comparingDouble(BayResult::ratio))
                .orElseThrow();
        model.levelProperty().set(worst.levels().get(0));
    }

    /** A point of the bay away from its members and its text: a quarter of the way between a girder and the first beam. */
    private Point2D quiet(Bay bay) {
        double a = Math.toRadians(bay.beamAngle());
        double along = 0.3 * bay.beamSpan();
        double across = -bay.width() / 2 + bay.spacing() / 4;
        double x = bay.centre().x() + along * Math.cos(a) - across * Math.sin(a);
        double y = bay.centre().y() + along * Math.sin(a) + across * Math.cos(a);
        var local = window.canvas().transform().toScreen(x, y);
        return new Point2D(local.getX(), local.getY());
    }

    private Color pixel(FxRobot robot, Point2D local) {
        WritableImage[] img = new WritableImage[1];
        robot.interact(() -> img[0] = window.canvas().snapshot(null, null));
        return img[0].getPixelReader().getColor((int) Math.round(local.getX()), (int) Math.round(local.getY()));
    }

    private static double distance(Color c, Rgb r) {
        return Math.sqrt(Math.pow(c.getRed() * 255 - r.r(), 2) + Math.pow(c.getGreen() * 255 - r.g(), 2)
                + Math.pow(c.getBlue() * 255 - r.b(), 2));
    }

    @Test
    void theMenuTintsTheBaysHoverShowsTheValuesAndAClickPicksTheBay(FxRobot robot) {
        CheckMenuItem item = (CheckMenuItem) MenuItems.find(window.root(), "menu-vibration");
        assertFalse(item.isSelected(), "off by default");
        Point2D at = quiet(worst.bay());
        Color before = pixel(robot, at);
        robot.interact(() -> item.setSelected(!item.isSelected()));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(model.showVibrationProperty().get());
        Color after = pixel(robot, at);
        Rgb expected = VibrationScale.at(worst.ratio());
        assertAll(() -> assertNotEquals(before, after, "the layer draws"),
                () -> assertTrue(distance(after, expected) < distance(before, expected),
                        "towards the bay's own colour " + expected.hex() + ": " + after));

        robot.moveTo(window.canvas().localToScreen(at));
        WaitForAsyncUtils.waitForFxEvents();
        String hover = window.canvas().bayHover();
        assertAll(() -> assertTrue(hover != null && hover.contains(worst.bay().id()), String.valueOf(hover)),
                () -> assertTrue(hover.contains(BayView.percent(worst.result().apg())), hover),
                () -> assertTrue(hover.contains(BayView.hz(worst.result().fn())), hover),
                () -> assertTrue(hover.contains("exceeds"), hover));

        robot.clickOn(window.canvas().localToScreen(at));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(worst.bay().id(), model.selectedBayProperty().get());
        assertAll(() -> assertEquals(worst.bay().id(), robot.lookup("#prop-bay").queryAs(Label.class).getText()),
                () -> assertEquals("exceeds", robot.lookup("#prop-status").queryAs(Label.class).getText()),
                () -> assertEquals(BayView.percent(worst.result().apg()), robot.lookup("#prop-ap-g").queryAs(Label.class).getText()),
                () -> assertEquals(BayView.hz(worst.result().fn()), robot.lookup("#prop-fn").queryAs(Label.class).getText()));

        robot.interact(() -> item.setSelected(!item.isSelected()));
        WaitForAsyncUtils.waitForFxEvents();
        assertAll(() -> assertNull(model.selectedBayProperty().get(), "switching the view off drops the bay"),
                () -> assertEquals(before, pixel(robot, at), "and the tint"));
    }
}
