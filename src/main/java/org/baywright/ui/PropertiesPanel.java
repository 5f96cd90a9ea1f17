package org.baywright.ui;

import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The Properties panel: lays out the items of a {@link PropertiesViewModel} in two columns, labels and
 * values; the fixed-size field hands what is typed back to the view-model.
 */
final class PropertiesPanel {
    private final PropertiesViewModel vm;
    private final GridPane grid = new GridPane();
    private final ScrollPane node;

    PropertiesPanel(PropertiesViewModel vm) {
        this.vm = vm;
        Label title = Styles.with(new Label("Properties"), Styles.PANEL_TITLE);
        grid.setId("properties");
        grid.setHgap(10);
        grid.setVgap(4);
        ColumnConstraints c0 = new ColumnConstraints();
        c0.setMinWidth(Region.USE_PREF_SIZE);
        ColumnConstraints c1 = new ColumnConstraints();
        c1.setHgrow(Priority.ALWAYS);
        grid.getColumnConstraints().setAll(c0, c1);
        VBox box = new VBox(8, title, grid);
        box.setPadding(new Insets(10));
        node = new ScrollPane(box);
        node.setFitToWidth(true);
        node.setMinWidth(240);
        node.setPrefWidth(320);
        vm.itemsProperty().addListener((o, a, b) -> layOut(b));
        layOut(vm.items());
    }

    /** The panel's node. */
    ScrollPane node() {
        return node;
    }

    private void layOut(List<PropertiesViewModel.Item> items) {
        grid.getChildren().clear();
        int row = 0;
        for (PropertiesViewModel.Item item : items) {
            if (item instanceof PropertiesViewModel.Row r) {
                Label v = new Label(r.value());
                v.setWrapText(true);
                v.setId(r.id());
                grid.add(Styles.with(new Label(r.label()), Styles.PROPERTY_LABEL), 0, row);
                grid.add(v, 1, row);
            } else if (item instanceof PropertiesViewModel.Note n) {
                Label note = new Label(n.text());
                note.setWrapText(true);
                note.setId(n.id());
                grid.add(note, 0, row, 2, 1);
            } else if (item instanceof PropertiesViewModel.FixedSize f) {
                fixedSize(f, row);
            } else if (item instanceof PropertiesViewModel.Field f) {
                field(f, row);
            } else if (item instanceof PropertiesViewModel.UseChoice u) {
                use(u, row);
            } else if (item instanceof PropertiesViewModel.Choice c) {
                choice(c, row);
            }
            row++;
        }
    }

    /**
     * An editable value: Enter or leaving the field applies it (one undoable edit); no grey example text, so
     * an empty field means no value.
     */
    private void field(PropertiesViewModel.Field f, int row) {
        TextField text = new TextField(f.current());
        text.setId(f.id());
        text.setPrefColumnCount(9);
        text.setOnAction(e -> vm.setField(f, text.getText()));
        text.focusedProperty().addListener((o, was, now) -> {
            if (was && !now && !text.getText().trim().equals(f.current())) {
                vm.setField(f, text.getText());
            }
        });
        grid.add(Styles.with(new Label(f.label()), Styles.PROPERTY_LABEL), 0, row);
        grid.add(text, 1, row);
    }

    /** One of a few options (slab on or off, stud position, composite action, shoring): picking one is an edit. */
    private void choice(PropertiesViewModel.Choice c, int row) {
        javafx.scene.control.ComboBox<String> box = new javafx.scene.control.ComboBox<>(
                javafx.collections.FXCollections.observableArrayList(c.kind().options()));
        box.setValue(c.current());
        box.setId(c.id());
        box.valueProperty().addListener((o, a, b) -> {
            if (b != null && !b.equals(c.current()) && !vm.setChoice(c, b)) {
                // refused (the message says why): the list shows the plan's value again
                javafx.application.Platform.runLater(() -> box.setValue(c.current()));
            }
        });
        grid.add(Styles.with(new Label(c.label()), Styles.PROPERTY_LABEL), 0, row);
        grid.add(box, 1, row);
    }

    /** The use of a load area: the occupancy in the trade's words with its ASCE 7 clause. */
    private void use(PropertiesViewModel.UseChoice u, int row) {
        javafx.scene.control.ComboBox<org.baywright.plan.LiveLoadUse> box = UseList.of(u.current());
        box.setId("edit-use");
        box.valueProperty().addListener((o, a, b) -> {
            if (b != null && b != u.current()) {
                vm.setUse(u, b);
            }
        });
        grid.add(Styles.with(new Label("Use"), Styles.PROPERTY_LABEL), 0, row);
        grid.add(box, 1, row);
    }

    /** The fixed-size field: a designation makes the member checked, not searched; blank clears it. */
    private void fixedSize(PropertiesViewModel.FixedSize f, int row) {
        TextField size = new TextField(f.current());
        size.setId("fixed-size");
        size.setPromptText("lightest adequate");
        size.setPrefColumnCount(9);
        Button set = new Button("Set");
        set.setId("fixed-size-set");
        set.setMinWidth(Region.USE_PREF_SIZE);
        set.setOnAction(e -> vm.setFixedSize(f, size.getText()));
        size.setOnAction(e -> vm.setFixedSize(f, size.getText()));
        grid.add(Styles.with(new Label("Fixed size"), Styles.PROPERTY_LABEL), 0, row);
        grid.add(new HBox(6, size, set), 1, row);
    }
}
