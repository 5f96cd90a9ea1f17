package org.baywright.ui;

import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.baywright.plan.Problem;

/**
 * The Problems panel under the plan: the file's warnings and the run's located problems with their
 * count; picking one shows it on the plan ({@link EditorModel#showProblem}).
 */
final class ProblemsPanel {
    private final VBox node;

    ProblemsPanel(EditorModel model) {
        Label title = Styles.with(new Label("Problems"), Styles.PANEL_TITLE);
        ListView<Problem> list = new ListView<>(model.problems());
        list.setId("problems");
        list.setPlaceholder(new Label("No problems."));
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(Problem p, boolean empty) {
                super.updateItem(p, empty);
                setText(empty || p == null ? null : p.toString());
            }
        });
        list.getSelectionModel().selectedItemProperty().addListener((o, a, p) -> model.showProblem(p));
        Label count = new Label();
        count.textProperty().bind(Bindings.size(model.problems()).asString("(%d)"));
        HBox head = new HBox(6, title, count);
        head.setAlignment(Pos.CENTER_LEFT);
        node = new VBox(4, head, list);
        VBox.setVgrow(list, Priority.ALWAYS);
        node.setPadding(new Insets(6, 10, 6, 10));
        node.setMinHeight(80);
    }

    /** The panel's node. */
    Node node() {
        return node;
    }
}
