package org.baywright.ui;

import javafx.collections.FXCollections;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Separator;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;

/**
 * The tool bar: one toggle per {@link Tool} (one is always active), Zoom to fit, the level selector and
 * the floor layout that edits at this level go to.
 */
final class ToolBarView {
    private final ToolBar bar = new ToolBar();

    ToolBarView(EditorModel model, PlanCanvas canvas) {
        bar.setId("tool-bar");
        ToggleGroup group = new ToggleGroup();
        for (Tool t : Tool.values()) {
            ToggleButton b = new ToggleButton(t.label());
            b.setToggleGroup(group);
            b.setUserData(t);
            b.setId(t.buttonId());
            b.setTooltip(new Tooltip(t.label() + "  (key " + t.key().getName() + ")\n" + t.hint()));
            b.setSelected(model.toolProperty().get() == t);
            bar.getItems().add(b);
        }
        group.selectedToggleProperty().addListener((o, a, b) -> {
            if (b == null) {
                group.selectToggle(a); // one tool is always active
            } else {
                model.toolProperty().set((Tool) b.getUserData());
            }
        });
        model.toolProperty().addListener((o, a, t) -> group.getToggles().stream().filter(x -> x.getUserData() == t)
                .findFirst().ifPresent(group::selectToggle));
        Button fit = new Button("Zoom to fit");
        fit.setId("zoom-fit");
        fit.setOnAction(e -> canvas.zoomToFit());
        ComboBox<String> levels = new ComboBox<>();
        levels.setId("level-selector");
        levels.setPromptText("level");
        model.planProperty().addListener((o, a, b) -> {
            levels.setItems(FXCollections.observableArrayList(model.levelNames()));
            levels.setValue(model.levelProperty().get());
        });
        levels.valueProperty().addListener((o, a, b) -> {
            if (b != null) {
                model.levelProperty().set(b);
            }
        });
        model.levelProperty().addListener((o, a, b) -> levels.setValue(b));
        Label layout = Styles.with(new Label(), Styles.QUIET);
        layout.setId("floor-layout");
        Runnable sayLayout = () -> layout.setText(layoutText(model));
        model.levelProperty().addListener((o, a, b) -> sayLayout.run());
        model.planProperty().addListener((o, a, b) -> sayLayout.run());
        sayLayout.run();
        bar.getItems().addAll(new Separator(Orientation.VERTICAL), fit, new Separator(Orientation.VERTICAL),
                new Label("Level"), levels, layout);
    }

    /** The bar's node. */
    Node node() {
        return bar;
    }

    /** Which floor layout edits go to, and how many levels share it: {@code edits go to layout "Typical" (2 levels)}. */
    static String layoutText(EditorModel model) {
        return model.currentFloor().map(f -> {
            long n = model.plan().levels().stream().filter(l -> l.floor().equals(f.id())).count();
            return "edits go to layout \"" + f.name() + "\"" + (n > 1 ? " (" + n + " levels)" : "");
        }).orElse("");
    }
}
