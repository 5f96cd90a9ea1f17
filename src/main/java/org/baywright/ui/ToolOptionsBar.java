package org.baywright.ui;

import java.util.List;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.layout.HBox;
import org.baywright.plan.GridLine;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.units.UnitSystem;

/**
 * The bar under the tool bar with the current tool's options (grid spacings, infill spacing and
 * direction, load values), bound to the model's {@link ToolSettings}; rebuilt when the tool changes.
 */
final class ToolOptionsBar {
    private final EditorModel model;
    private final HBox bar = new HBox(8);

    ToolOptionsBar(EditorModel model) {
        this.model = model;
        bar.setId("tool-options");
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 10, 4, 10));
        Styles.with(bar, Styles.TOOL_OPTIONS);
        model.toolProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    /** The bar's node. */
    Node node() {
        return bar;
    }

    private void refresh() {
        var children = bar.getChildren();
        children.clear();
        Tool t = model.toolProperty().get();
        ToolSettings s = model.toolSettings();
        children.add(Styles.with(new Label(t.label()), Styles.TOOL_NAME));
        switch (t) {
            case GRID -> {
                fillGridFields();
                TextField x = field("grid-x", s.gridX, 190, "e.g. 3@30ft");
                TextField y = field("grid-y", s.gridY, 190, "e.g. 25'-6\" 30' 30'");
                CheckBox cols = new CheckBox("columns at new intersections");
                cols.selectedProperty().bindBidirectional(s.gridColumns);
                Button apply = new Button("Apply");
                apply.setId("grid-apply");
                apply.setDefaultButton(true);
                apply.setOnAction(e -> applyGrid());
                x.setOnAction(e -> applyGrid());
                y.setOnAction(e -> applyGrid());
                children.addAll(new Label("Bays west–east (lines A, B…)"), x, new Label("south–north (lines 1, 2…)"), y, cols,
                        apply);
            }
            case INFILL -> {
                TextField f = field("infill-spacing", s.infill, 90);
                ToggleButton dir = new ToggleButton();
                dir.setId("infill-direction");
                Runnable label = () -> dir.setText(s.infillDirection.get() == GridLine.Axis.Y
                        ? "beams span south–north" : "beams span west–east");
                label.run();
                dir.setOnAction(e -> {
                    s.infillDirection.set(s.infillDirection.get() == GridLine.Axis.Y ? GridLine.Axis.X : GridLine.Axis.Y);
                    label.run();
                });
                children.addAll(new Label("Largest spacing (a length) or number of beams"), f, dir, hint("then click a bay"));
            }
            case LOAD_AREA -> {
                ComboBox<LiveLoadUse> use = UseList.of(s.areaUse.get());
                use.setMaxWidth(260);
                use.valueProperty().bindBidirectional(s.areaUse);
                use.setId("area-use");
                children.addAll(new Label("Superimposed dead"), field("area-sd", s.areaSd, 80),
                        new Label("Live (roof live on a roof)"), field("area-live", s.areaLive, 80),
                        new Label("Use"), use, hint("drag a rectangle, or click corners; an empty field is no load"));
            }
            case LINE_LOAD -> children.addAll(new Label("Dead per length"), field("line-dead", s.lineDead, 80),
                    new Label("Live per length"), field("line-live", s.lineLive, 80),
                    hint("click points; double-click or Enter to finish; an empty field is no load"));
            case POINT_LOAD -> children.addAll(new Label("Dead"), field("point-dead", s.pointDead, 80),
                    new Label("Live"), field("point-live", s.pointLive, 80),
                    hint("click where it acts; an empty field is no load"));
            default -> children.add(hint(t.hint()));
        }
    }

    /** A field whose grey text is plainly an example of the syntax ("e.g. 3@30ft"), never a value. */
    private static TextField field(String id, StringProperty value, double width, String example) {
        if (!example.startsWith("e.g. ")) {
            throw new IllegalArgumentException("grey text must read as an example: " + example);
        }
        TextField f = field(id, value, width);
        f.setPromptText(example);
        return f;
    }

    /** A value field with no grey example text: it holds a value or is plainly empty. */
    private static TextField field(String id, StringProperty value, double width) {
        TextField f = new TextField();
        f.setId(id);
        f.textProperty().bindBidirectional(value);
        f.setPrefWidth(width);
        return f;
    }

    private static Label hint(String text) {
        Label l = Styles.with(new Label(text), Styles.QUIET);
        l.setWrapText(true);
        return l;
    }

    /** Shows the current grid's spacings in the Grid fields. */
    private void fillGridFields() {
        Plan p = model.plan();
        if (p == null) {
            return;
        }
        ToolSettings s = model.toolSettings();
        s.gridX.set(ToolValues.spacingText(PlanEdits.lines(p, GridLine.Axis.X), model.units()));
        s.gridY.set(ToolValues.spacingText(PlanEdits.lines(p, GridLine.Axis.Y), model.units()));
    }

    /** Applies the typed grid spacings (one undoable edit). */
    private void applyGrid() {
        ToolSettings s = model.toolSettings();
        UnitSystem us = model.units();
        boolean cols = s.gridColumns.get();
        model.edit(p -> {
            List<Double> xs = s.gridX.get() == null || s.gridX.get().isBlank() ? null
                    : ToolValues.spacings("bays west–east", s.gridX.get(), us);
            List<Double> ys = s.gridY.get() == null || s.gridY.get().isBlank() ? null
                    : ToolValues.spacings("bays south–north", s.gridY.get(), us);
            return PlanEdits.withGrid(p, xs, ys, cols, PlanEdits.OFFICE_FLOOR);
        }, "Grid set");
    }
}
