package org.baywright.ui;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.baywright.plan.Problem;

/**
 * The Baywright editor. Opens the plan named as the first argument; with none, the demo plan
 * ({@value #DEMO} in the working folder, else the copy built into the jar), already run.
 */
public final class BaywrightApp extends Application {
    /** The demo plan, relative to the project folder. */
    public static final String DEMO = "plans/harbourview-offices.bay.json";
    /** The demo plan inside the jar. */
    static final String DEMO_RESOURCE = "/org/baywright/ui/demo/harbourview-offices.bay.json";

    @Override
    public void start(Stage stage) {
        EditorModel model = new EditorModel(TaskRunner.background());
        MainWindow window = new MainWindow(model, stage::close);
        Scene scene = new Scene(window.root(), 1440, 900);
        stage.setScene(scene);
        stage.titleProperty().bind(javafx.beans.binding.Bindings.createStringBinding(window::title,
                model.planProperty(), model.fileProperty()));
        stage.setOnCloseRequest(e -> {
            if (!window.confirmDiscard()) {
                e.consume();
            }
        });
        stage.show();
        List<String> args = getParameters().getRaw();
        openFirst(window, model, args.isEmpty() ? null : Path.of(args.get(0)));
    }

    /** Opens the named plan, or the demo when none is named. */
    static void openFirst(MainWindow window, EditorModel model, Path file) {
        if (file != null) {
            window.open(file);
            return;
        }
        Path demo = Path.of(DEMO);
        if (Files.isRegularFile(demo)) {
            window.open(demo);
            return;
        }
        try (InputStream in = BaywrightApp.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in != null) {
                model.openText(new String(in.readAllBytes(), StandardCharsets.UTF_8), "harbourview-offices.bay.json");
            }
        } catch (IOException e) {
            model.problems().setAll(List.of(Problem.error("io", "", "", "the built-in demo plan could not be read: " + e.getMessage())));
        }
    }

    public static void main(String[] args) {
        launch(args);
    }
}
