package org.baywright.demo;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.Deck;
import org.baywright.plan.MemberKind;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Slab;
import org.baywright.ui.EditorModel;
import org.baywright.ui.MainWindow;
import org.baywright.ui.Tool;

/**
 * Takes the composite-floor screenshots in {@code docs/images/} from the real window (under Xvfb, with
 * {@code docs/images/make-editor-shots}): the demo's Level 2 (a composite floor; a plan without a slab is given the
 * typical one), first with the deck picked by the Deck tool (its slab in Properties), then with a composite
 * beam selected (studs and camber on the canvas, its composite design in Properties).
 */
public final class CompositeScreenshots {
    private CompositeScreenshots() {
    }

    public static void main(String[] args) {
        Application.launch(Shots.class, args);
    }

    /** The application that takes the shots. */
    public static final class Shots extends Application {
        private static final Path OUT = Path.of("docs/images");

        @Override
        public void start(Stage stage) throws Exception {
            ShotWindow shot = ShotWindow.open(stage);
            EditorModel model = shot.model();
            MainWindow window = shot.window();
            Scene scene = shot.scene();
            window.open(Path.of("plans/harbourview-offices.bay.json"));
            String floor = model.currentFloorId();
            // the demo is a composite floor; a plan without a slab gets the typical one
            for (Deck d : model.currentFloor().orElseThrow().decks()) {
                if (d.slab() == null) {
                    model.edit(p -> PlanEdits.setSlab(p, floor, d.id(), Slab.typical()), "Slab on " + d.id());
                }
            }
            if (model.currentFloor().orElseThrow().composite().mode() != org.baywright.plan.CompositeMode.COMPOSITE) {
                model.edit(p -> PlanEdits.setComposite(p, floor, CompositeFloor.DEFAULT), "Composite floor");
            }
            window.canvas().zoomToFit();

            // 1. the Deck tool with the main deck picked: its slab in Properties
            model.toolProperty().set(Tool.DECK);
            model.select(model.currentFloor().orElseThrow().decks().get(0).id());
            shoot(scene.getRoot(), "editor-slab.png");

            // 2. a composite beam selected: plan notation on the canvas, its composite design in Properties
            model.toolProperty().set(Tool.SELECT);
            String beam = model.currentMembers().stream().filter(m -> m.kind() == MemberKind.BEAM && m.isComposite()
                    && m.camber() > 0 && !m.id().contains("/")).findFirst()
                    .or(() -> model.currentMembers().stream().filter(m -> m.isComposite()).findFirst()).orElseThrow().id();
            model.select(beam);
            // closer in, on the west bays, where the labels have room for studs and camber
            var bay = window.canvas().transform().toScreen(org.baywright.units.Units.FT_.toSi(40), org.baywright.units.Units.FT_.toSi(55));
            window.canvas().setTransform(window.canvas().transform().zoomAt(bay.getX(), bay.getY(), 1.7));
            shoot(scene.getRoot(), "editor-composite.png");
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
