package org.baywright.demo;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Comparator;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.event.Event;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.baywright.takedown.BayResult;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;

/**
 * Takes {@code docs/images/editor-vibration.png} from the real window (under Xvfb, with
 * {@code docs/images/make-editor-shots}): the demo with View › Floor vibration on, at the level of its worst bay,
 * that bay picked (its check in Properties) and the pointer over it (the hover box).
 */
public final class VibrationScreenshots {
    private VibrationScreenshots() {
    }

    public static void main(String[] args) {
        Application.launch(Shots.class, args);
    }

    /** The application that takes the shot. */
    public static final class Shots extends Application {
        private static final Path OUT = Path.of("docs/images");

        @Override
        public void start(Stage stage) throws Exception {
            ShotWindow shot = ShotWindow.open(stage);
            EditorModel model = shot.model();
            MainWindow window = shot.window();
            Scene scene = shot.scene();
            window.open(Path.of("plans/harbourview-offices.bay.json"));
            BayResult worst = model.run().bays().stream().filter(BayResult::checked)
                    .max(Comparator.comparingDouble(BayResult::ratio)).orElseThrow();
            model.levelProperty().set(worst.levels().get(0));
            model.showVibrationProperty().set(true);
            window.canvas().zoomToFit();
            model.selectedBayProperty().set(worst.bay().id());
            var c = worst.bay().centre();
            double a = Math.toRadians(worst.bay().beamAngle());
            double along = 0.3 * worst.bay().beamSpan();
            double across = -worst.bay().width() / 2 + worst.bay().spacing() / 2;
            var p = window.canvas().transform().toScreen(c.x() + along * Math.cos(a) - across * Math.sin(a),
                    c.y() + along * Math.sin(a) + across * Math.cos(a));
            var q = window.canvas().localToScene(p);
            Event.fireEvent(window.canvas(), new MouseEvent(MouseEvent.MOUSE_MOVED, q.getX(), q.getY(), 0, 0,
                    MouseButton.NONE, 0, false, false, false, false, false, false, false, false, false, false, null));
            shoot(scene.getRoot(), "editor-vibration.png");
            Platform.exit();
        }

        private static void shoot(Node node, String name) throws IOException {
            node.applyCss();
            if (node instanceof javafx.scene.Parent parent) {
                parent.layout();
            }
            WritableImage img = node.snapshot(null, null);
            File out = OUT.resolve(name).toFile();
            ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", out);
            System.out.println("wrote " + out);
        }
    }
}
