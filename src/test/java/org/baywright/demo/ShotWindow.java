package org.baywright.demo;

import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;
import org.baywright.ui.TaskRunner;

/**
 * The editor window the screenshot programs photograph: the real main window, 1440 × 880, its runs made on the
 * calling thread so a shot shows a finished result.
 *
 * @param model the editor model
 * @param window the main window
 * @param scene its scene
 */
record ShotWindow(EditorModel model, MainWindow window, Scene scene) {

    /** Opens the window on {@code stage}. */
    static ShotWindow open(Stage stage) {
        EditorModel model = new EditorModel(TaskRunner.direct());
        MainWindow window = new MainWindow(model, Platform::exit);
        Scene scene = new Scene(window.root(), 1440, 880);
        stage.setScene(scene);
        stage.setTitle("Baywright");
        stage.show();
        return new ShotWindow(model, window, scene);
    }
}
