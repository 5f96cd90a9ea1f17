package org.baywright.demo;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.baywright.plan.GridLine;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.MemberKind;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;
import org.baywright.ui.Tool;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * Takes the editor screenshots in {@code docs/images/} from the real window (run under Xvfb with
 * {@code docs/images/make-editor-shots}): the demo plan with a girder selected, a small plan being
 * drawn, and the demo's tributary areas with end reactions.
 */
public final class EditorScreenshots {
    private EditorScreenshots() {
    }

    public static void main(String[] args) {
        Application.launch(Shots.class, args);
    }

    /** The application that takes the shots (a main class that is not an Application starts JavaFX from the classpath). */
    public static final class Shots extends Application {
    private static final Path OUT = Path.of("docs/images");

    @Override
    public void start(Stage stage) throws Exception {
        ShotWindow shot = ShotWindow.open(stage);
        EditorModel model = shot.model();
        MainWindow window = shot.window();
        Scene scene = shot.scene();

        // 1. the demo, Level 2, a girder selected
        window.open(Path.of("plans/harbourview-offices.bay.json"));
        String girder = model.currentMembers().stream().filter(m -> m.kind() == MemberKind.GIRDER && m.length() > 9)
                .skip(3).findFirst().orElseThrow().id();
        model.select(girder);
        shoot(scene.getRoot(), "editor-main.png");

        // 2. the demo with tributary areas and end reactions, the canvas alone
        model.showTributaryProperty().set(true);
        model.showReactionsProperty().set(true);
        window.canvas().zoomToFit();
        shoot(window.canvas(), "editor-tributary.png");
        model.showTributaryProperty().set(false);
        model.showReactionsProperty().set(false);

        // 3. a new plan drawn with the tools' edits: 3 × 2 bays, framing, infill, a storage area, an opening
        double ft = Units.FT_.toSi(1);
        model.newPlan("Sketch", UnitSystem.US, 1, 13 * ft);
        String f = PlanEdits.NEW_FLOOR;
        model.edit(p -> PlanEdits.withGrid(p, List.of(30 * ft, 30 * ft, 30 * ft), List.of(30 * ft, 30 * ft), true,
                PlanEdits.OFFICE_FLOOR), "Grid set");
        for (int j = 0; j < 3; j++) {
            for (int i = 0; i < 3; i++) {
                Point a = new Point(i * 30 * ft, j * 30 * ft);
                Point b = new Point((i + 1) * 30 * ft, j * 30 * ft);
                model.edit(p -> PlanEdits.addMember(p, f, MemberKind.GIRDER, a, b), "Added a girder");
            }
        }
        for (int j = 0; j < 2; j++) {
            for (int i = 0; i < 4; i++) {
                Point a = new Point(i * 30 * ft, j * 30 * ft);
                Point b = new Point(i * 30 * ft, (j + 1) * 30 * ft);
                model.edit(p -> PlanEdits.addMember(p, f, MemberKind.BEAM, a, b), "Added a beam");
            }
        }
        for (int j = 0; j < 2; j++) {
            for (int i = 0; i < 3; i++) {
                Point c = new Point((i + 0.5) * 30 * ft, (j + 0.5) * 30 * ft);
                model.edit(p -> PlanEdits.fillBay(p, f, PlanEdits.bayAt(p, c).orElseThrow(), GridLine.Axis.Y, 0, 10 * ft),
                        "Filled a bay");
            }
        }
        model.edit(p -> PlanEdits.addAreaLoad(p, f, Polygon.rectangle(60 * ft, 30 * ft, 90 * ft, 60 * ft),
                new LoadValues(0, 0, Units.PSF.toSi(125), 0, 0, 0), LiveLoadUse.NOT_REDUCIBLE), "Added a load area");
        model.edit(p -> PlanEdits.addOpening(p, f, Polygon.rectangle(40 * ft, 5 * ft, 50 * ft, 18 * ft)), "Added an opening");
        model.toolProperty().set(Tool.INFILL);
        window.canvas().zoomToFit();
        model.select("IF-CD-23/1");
        shoot(scene.getRoot(), "editor-drawing.png");

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
