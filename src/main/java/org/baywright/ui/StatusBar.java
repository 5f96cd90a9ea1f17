package org.baywright.ui;

import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.baywright.calc.Caution;
import org.baywright.run.RunResult;

/**
 * The status bar: steel weight, weight per floor area, highest ratio and the latest message on one
 * line, and the caution under it (always shown).
 */
final class StatusBar {
    private final EditorModel model;
    private final Label weight = new Label();
    private final Label area = new Label();
    private final Label ratio = new Label();
    private final VBox node;

    StatusBar(EditorModel model) {
        this.model = model;
        weight.setId("status-weight");
        area.setId("status-area");
        ratio.setId("status-ratio");
        Label message = new Label();
        message.setId("status-message");
        message.textProperty().bind(model.messageProperty());
        Region spring = new Region();
        HBox.setHgrow(spring, Priority.ALWAYS);
        HBox line = new HBox(18, weight, area, ratio, spring, message);
        line.setAlignment(Pos.CENTER_LEFT);
        Label caution = Styles.with(new Label(Caution.TEXT), Styles.CAUTION);
        caution.setId("caution");
        caution.setWrapText(true);
        node = Styles.with(new VBox(3, line, caution), Styles.STATUS_BAR);
        node.setPadding(new Insets(5, 10, 6, 10));
        model.runProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    /** The bar's node. */
    Node node() {
        return node;
    }

    private void refresh() {
        RunResult r = model.run();
        weight.setText(Readouts.steelWeight(r, model.units()));
        area.setText(Readouts.weightPerArea(r, model.units()));
        ratio.setText(Readouts.highestRatio(r));
    }
}
