package org.baywright.demo;

import java.io.File;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;
import org.baywright.ui.TaskRunner;

/**
 * Writes a PNG of the editor's plan canvas on a plan, headless (Monocle), to look at the canvas without a
 * display: {@code java -cp … org.baywright.demo.CanvasSnapshot OUT.png [PLAN] [LEVEL] [reactions] [tributary] [zoom=F]}.
 */
public final class CanvasSnapshot {
    private CanvasSnapshot() {
    }

    public static void main(String[] args) throws Exception {
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        Path out = Path.of(args.length > 0 ? args[0] : "target/canvas.png");
        Path plan = Path.of(args.length > 1 ? args[1] : "plans/harbourview-offices.bay.json");
        String level = args.length > 2 ? args[2] : null;
        boolean reactions = java.util.Arrays.asList(args).contains("reactions");
        boolean tributary = java.util.Arrays.asList(args).contains("tributary");
        double zoom = java.util.Arrays.stream(args).filter(x -> x.startsWith("zoom=")).mapToDouble(x -> Double.parseDouble(
                x.substring(5))).findFirst().orElse(1);
        CountDownLatch up = new CountDownLatch(1);
        Platform.startup(up::countDown);
        up.await();
        CountDownLatch done = new CountDownLatch(1);
        Exception[] failed = new Exception[1];
        Platform.runLater(() -> {
            try {
                EditorModel model = new EditorModel(TaskRunner.direct());
                MainWindow window = new MainWindow(model, () -> { });
                Stage stage = new Stage();
                stage.setScene(new Scene(window.root(), 1440, 880));
                stage.show();
                window.open(plan);
                if (level != null && !level.equals("-")) {
                    model.levelProperty().set(level);
                }
                model.showReactionsProperty().set(reactions);
                model.showTributaryProperty().set(tributary);
                window.canvas().applyCss();
                window.canvas().layout();
                window.canvas().zoomToFit();
                if (zoom != 1) {
                    var c = window.canvas();
                    c.setTransform(c.transform().zoomAt(c.getWidth() * 0.35, c.getHeight() * 0.4, zoom));
                }
                File f = out.toFile();
                ImageIO.write(SwingFXUtils.fromFXImage(window.canvas().snapshot(null, null), null), "png", f);
                System.out.println("wrote " + f);
            } catch (Exception e) {
                failed[0] = e;
            } finally {
                done.countDown();
            }
        });
        done.await();
        Platform.exit();
        if (failed[0] != null) {
            throw failed[0];
        }
    }
}
