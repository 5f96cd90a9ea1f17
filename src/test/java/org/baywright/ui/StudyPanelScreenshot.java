package org.baywright.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.scene.control.TextField;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;

/**
 * Writes {@code docs/images/study-panel.png}: the Study panel on the demo plan after a study of bay
 * width × beam direction × beam spacing, rendered headless (Monocle) and saved with ImageIO. Not a test;
 * run from the project folder after a deliberate change to the panel's look:
 * <pre>
 * java -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw -Dheadless.geometry=1600x1000-32 \
 *     -cp "target/test-classes:target/classes:$(cat target/test-classpath.txt)" org.baywright.ui.StudyPanelScreenshot
 * </pre>
 */
public final class StudyPanelScreenshot {
    private StudyPanelScreenshot() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "docs/images/study-panel.png");
        Plan plan = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        CountDownLatch started = new CountDownLatch(1);
        Platform.startup(started::countDown);
        started.await();
        AtomicReference<StudyPanel> panel = new AtomicReference<>();
        AtomicReference<Stage> stage = new AtomicReference<>();
        Platform.runLater(() -> {
            StudyPanel p = new StudyPanel(() -> plan, x -> { });
            Stage s = new Stage();
            s.setScene(new Scene(p, 1480, 900));
            s.show();
            Map<String, String> values = Map.of("bay-x", "25ft..40ft:5ft", "beam-direction", "x,y", "beam-spacing",
                    "6ft..15ft:1ft", "depth-limit", "24in");
            values.forEach((k, v) -> ((TextField) p.lookup("#study-field-" + k)).setText(v));
            panel.set(p);
            stage.set(s);
            javafx.scene.control.Button run = (javafx.scene.control.Button) p.lookup("#study-run");
            run.requestFocus();
            run.fire();
        });
        long until = System.nanoTime() + TimeUnit.MINUTES.toNanos(10);
        while (System.nanoTime() < until && (panel.get() == null || panel.get().result() == null)) {
            Thread.sleep(200);
        }
        CountDownLatch shot = new CountDownLatch(1);
        AtomicReference<WritableImage> image = new AtomicReference<>();
        Platform.runLater(() -> {
            panel.get().layout();
            image.set(stage.get().getScene().snapshot(null));
            shot.countDown();
        });
        shot.await();
        Files.createDirectories(out.toAbsolutePath().getParent());
        ImageIO.write(SwingFXUtils.fromFXImage(image.get(), null), "png", out.toFile());
        System.out.println("wrote " + out);
        Platform.exit();
    }
}
