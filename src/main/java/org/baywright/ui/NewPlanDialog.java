package org.baywright.ui;

import java.util.function.Consumer;
import javafx.collections.FXCollections;
import javafx.event.ActionEvent;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import org.baywright.units.UnitSystem;

/**
 * File › New: a name, the units, the number of levels and the storey height. OK reads them with
 * {@link NewPlanForm}; a wrong field keeps the dialog open with its message.
 */
final class NewPlanDialog {
    private NewPlanDialog() {
    }

    /** Shows the dialog (not waiting); {@code create} gets the settings when OK is pressed with good fields. */
    static void show(Window owner, UnitSystem current, Consumer<NewPlanForm.NewPlan> create) {
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle("New plan");
        d.setHeaderText("A new, empty plan. Type the grid spacings next (Grid tool).");
        d.getDialogPane().getStylesheets().add(Styles.sheet());
        TextField name = new TextField(NewPlanForm.DEFAULT_NAME);
        name.setId("new-name");
        ComboBox<String> units = new ComboBox<>(FXCollections.observableArrayList(NewPlanForm.UNIT_CHOICES));
        units.setValue(NewPlanForm.unitChoice(current));
        units.setId("new-units");
        TextField levelCount = new TextField("1");
        levelCount.setId("new-levels");
        TextField storey = new TextField(NewPlanForm.defaultStorey(current));
        storey.setId("new-storey");
        Label error = Styles.with(new Label(), Styles.FIELD_ERROR);
        error.setWrapText(true);
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.addRow(0, new Label("Project name"), name);
        g.addRow(1, new Label("Units"), units);
        g.addRow(2, new Label("Levels (typical floors)"), levelCount);
        g.addRow(3, new Label("Storey height"), storey);
        g.add(error, 0, 4, 2, 1);
        d.getDialogPane().setContent(g);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        Button ok = (Button) d.getDialogPane().lookupButton(ButtonType.OK);
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            try {
                create.accept(NewPlanForm.read(name.getText(), units.getValue(), levelCount.getText(), storey.getText()));
            } catch (IllegalArgumentException x) {
                error.setText(x.getMessage());
                e.consume();
            }
        });
        d.show();
    }
}
