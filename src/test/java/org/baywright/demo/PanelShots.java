package org.baywright.demo;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.stage.Stage;
import javafx.util.Duration;
import javax.imageio.ImageIO;
import org.baywright.plan.MemberKind;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;
import org.baywright.ui.RecentFiles;
import org.baywright.ui.TaskRunner;
import org.baywright.ui.UserSettings;

/**
 * Shots of the side panel's tabs in a 1440 × 900 window with the demo plan (run under Xvfb; the
 * folder is the first argument, /tmp/baywright-shots by default): Properties of a girder, Members,
 * Takeoff, Calculation. For looking at the layout; the one kept goes to docs/images/editor-1440.png.
 */
public final class PanelShots {
    private PanelShots() {
    }

    public static void main(String[] args) {
        Application.launch(Shots.class, args);
    }

    /** The application that takes the shots. */
    public static final class Shots extends Application {
        @Override
        public void start(Stage stage) throws Exception {
            List<String> raw = getParameters().getRaw();
            Path out = Path.of(raw.isEmpty() ? "/tmp/baywright-shots" : raw.get(0));
            Files.createDirectories(out);
            Path home = Files.createTempDirectory("baywright-shots-home");
            EditorModel model = new EditorModel(TaskRunner.direct());
            MainWindow window = new MainWindow(model, Platform::exit, new RecentFiles(home.resolve("recent.txt")),
                    new UserSettings(home.resolve("settings.properties")));
            Scene scene = new Scene(window.root(), 1440, 900);
            stage.setScene(scene);
            stage.setTitle("Baywright");
            stage.show();
            window.open(Path.of("plans/harbourview-offices.bay.json"));
            String girder = model.currentMembers().stream().filter(m -> m.kind() == MemberKind.GIRDER && m.length() > 9)
                    .skip(3).findFirst().orElseThrow().id();
            List<Runnable> steps = new ArrayList<>();
            steps.add(() -> model.select(girder));
            steps.add(() -> shoot(scene, out.resolve("properties.png")));
            steps.add(() -> window.showTab("Members"));
            steps.add(() -> shoot(scene, out.resolve("members.png")));
            steps.add(() -> window.showTab("Takeoff"));
            steps.add(() -> shoot(scene, out.resolve("takeoff.png")));
            steps.add(() -> window.showTab("Calculation"));
            steps.add(() -> shoot(scene, out.resolve("calculation.png")));
            steps.add(() -> window.showTab("Study"));
            steps.add(() -> {
                ((javafx.scene.control.TextField) scene.lookup("#study-field-beam-spacing")).setText("6ft..12ft:2ft");
                ((javafx.scene.control.TextField) scene.lookup("#study-field-beam-direction")).setText("x,y");
                ((javafx.scene.control.TextField) scene.lookup("#study-field-depth-limit")).setText("21in");
                ((javafx.scene.control.Button) scene.lookup("#study-run")).fire();
            });
            Timeline t = new Timeline();
            for (int i = 0; i < steps.size(); i++) {
                Runnable r = steps.get(i);
                t.getKeyFrames().add(new KeyFrame(Duration.millis(800 * (i + 1)), e -> r.run()));
            }
            t.setOnFinished(e -> {
                // the study shot once its run is over
                Timeline wait = new Timeline(new KeyFrame(Duration.millis(500), x -> {
                    if (window.study().result() != null && !window.study().runningProperty().get()) {
                        shoot(scene, out.resolve("study.png"));
                        Platform.exit();
                    }
                }));
                wait.setCycleCount(Timeline.INDEFINITE);
                wait.play();
            });
            t.play();
        }

        private static void shoot(Scene scene, Path file) {
            try {
                File f = file.toFile();
                ImageIO.write(SwingFXUtils.fromFXImage(scene.snapshot(null), null), "png", f);
                System.out.println("wrote " + f);
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }
    }
}
