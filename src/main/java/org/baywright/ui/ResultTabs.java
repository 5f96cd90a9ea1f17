package org.baywright.ui;

import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.baywright.report.Takeoff;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * The result tabs beside the plan: Members (the level's members; picking a row selects the member and
 * the other way round), Takeoff (by size, by kind or by level, with totals) and Calculation (the selected
 * member's sheet). The texts come from {@link Readouts}.
 */
final class ResultTabs {
    private final EditorModel model;
    private final TableView<MemberResult> membersTable = new TableView<>();
    private final TableView<Takeoff.Row> takeoffTable = new TableView<>();
    private final Label takeoffTotals = new Label();
    private final ChoiceBox<Readouts.TakeoffView> takeoffView = new ChoiceBox<>();
    private final TableColumn<Takeoff.Row, String> takeoffFirst = new TableColumn<>("Size");
    private final TableColumn<Takeoff.Row, String> takeoffWeight = new TableColumn<>("Short tons");
    private final TextArea calculation = new TextArea();
    private final Node members;
    private final Node takeoff;
    private final Node sheet;
    /** True while the table follows the model, so that its selection events are not taken for the user's. */
    private boolean syncing;

    ResultTabs(EditorModel model) {
        this.model = model;
        members = membersPanel();
        takeoff = takeoffPanel();
        sheet = calculationPanel();
        model.runProperty().addListener((o, a, b) -> refreshTables());
        model.levelProperty().addListener((o, a, b) -> refreshTables());
        model.selectedProperty().addListener((o, a, b) -> {
            refreshCalculation();
            syncTableSelection();
        });
        model.runProperty().addListener((o, a, b) -> refreshCalculation());
        refreshTables();
    }

    /** The Members tab's content. */
    Node members() {
        return members;
    }

    /** The Takeoff tab's content. */
    Node takeoff() {
        return takeoff;
    }

    /** The Calculation tab's content. */
    Node calculation() {
        return sheet;
    }

    private Node membersPanel() {
        membersTable.setId("members-table");
        membersTable.setPlaceholder(new Label("No members at this level."));
        membersTable.getColumns().setAll(List.of(
                column("Member", 110, MemberResult::id),
                column("Kind", 60, m -> m.kind().name().toLowerCase(Locale.ROOT)),
                column("Section", 80, m -> m.section().isEmpty() ? "—" : m.section()),
                column("Length", 85, m -> UnitSystem.format(m.length(), model.units().length(), 2)),
                column("Ratio", 55, m -> Readouts.ratio(m.maxRatio())),
                column("Status", 95, m -> m.status().label())));
        fitColumns(membersTable);
        membersTable.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && !syncing) {
                model.select(b.id());
            }
        });
        VBox box = new VBox(membersTable);
        VBox.setVgrow(membersTable, Priority.ALWAYS);
        return box;
    }

    private static <S> TableColumn<S, String> column(String name, double width, Function<S, String> value) {
        TableColumn<S, String> c = new TableColumn<>(name);
        c.setPrefWidth(width);
        c.setMinWidth(headerWidth(name));
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }

    /** The width a column needs to show its heading whole, px. */
    static double headerWidth(String name) {
        javafx.scene.text.Text t = new javafx.scene.text.Text(name);
        t.setFont(javafx.scene.text.Font.getDefault());
        return Math.ceil(t.getLayoutBounds().getWidth()) + 22;
    }

    /**
     * Columns that always fit the table's width (no column hides behind a horizontal scroll bar): each
     * at least its heading's width, the last one taking what is left.
     */
    private static void fitColumns(TableView<?> table) {
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
    }

    /** The side panel width that shows every column of the Members table at its preferred width, px. */
    double neededWidth() {
        double sum = 0;
        for (TableColumn<MemberResult, ?> c : membersTable.getColumns()) {
            sum += Math.max(c.getPrefWidth(), c.getMinWidth());
        }
        return sum + 36; // the vertical scroll bar, borders and the tab's padding
    }

    private Node takeoffPanel() {
        takeoffTable.setId("takeoff-table");
        takeoffTable.setPlaceholder(new Label("No run yet."));
        takeoffFirst.setCellValueFactory(d -> new ReadOnlyStringWrapper(d.getValue().item()));
        takeoffFirst.setPrefWidth(110);
        takeoffWeight.setCellValueFactory(d -> new ReadOnlyStringWrapper(Readouts.takeoffWeight(d.getValue().weight(), model.units())));
        takeoffWeight.setPrefWidth(90);
        takeoffFirst.setMinWidth(headerWidth("Size / kind"));
        takeoffWeight.setMinWidth(headerWidth("Short tons"));
        fitColumns(takeoffTable);
        takeoffTable.getColumns().setAll(List.of(takeoffFirst,
                column("Pieces", 60, r -> Integer.toString(r.count())),
                column("Length", 90, r -> UnitSystem.format(r.length(), model.units().length(), 0)),
                takeoffWeight));
        takeoffView.setId("takeoff-view");
        takeoffView.getItems().setAll(Readouts.TakeoffView.values());
        takeoffView.getSelectionModel().select(Readouts.TakeoffView.SIZE);
        takeoffView.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> refreshTakeoff());
        takeoffTotals.setId("takeoff-totals");
        takeoffTotals.setWrapText(true);
        takeoffTotals.setPadding(new Insets(6));
        HBox choice = new HBox(6, new Label("Show"), takeoffView);
        choice.setAlignment(Pos.CENTER_LEFT);
        choice.setPadding(new Insets(4, 4, 0, 4));
        VBox box = new VBox(4, choice, takeoffTable, takeoffTotals);
        VBox.setVgrow(takeoffTable, Priority.ALWAYS);
        return box;
    }

    /** The Takeoff tab's view choice (by size, by kind, by level). */
    ChoiceBox<Readouts.TakeoffView> takeoffView() {
        return takeoffView;
    }

    private Node calculationPanel() {
        calculation.setId("calculation");
        calculation.setEditable(false);
        // wrapped, so no line is cut at any width; the sheet's lines are short and read well wrapped
        calculation.setWrapText(true);
        Styles.with(calculation, Styles.CALCULATION);
        VBox box = new VBox(calculation);
        VBox.setVgrow(calculation, Priority.ALWAYS);
        return box;
    }

    private void refreshTables() {
        syncing = true;
        try {
            membersTable.setItems(FXCollections.observableArrayList(model.currentMembers()));
        } finally {
            syncing = false;
        }
        syncTableSelection();
        refreshTakeoff();
    }

    private void refreshTakeoff() {
        Readouts.TakeoffView view = takeoffView.getValue() == null ? Readouts.TakeoffView.SIZE : takeoffView.getValue();
        takeoffFirst.setText(view.heading());
        takeoffWeight.setText(Readouts.takeoffWeightHeading(model.units()));
        RunResult r = model.run();
        if (r == null || r.takedown() == null) {
            takeoffTable.setItems(FXCollections.observableArrayList());
            takeoffTotals.setText("");
            return;
        }
        Takeoff t = Takeoff.of(r, 0);
        takeoffTable.setItems(FXCollections.observableArrayList(Readouts.takeoffRows(t, view)));
        takeoffTotals.setText(Readouts.takeoffTotals(t, r, model.units()));
    }

    private void syncTableSelection() {
        String id = model.selectedProperty().get();
        syncing = true;
        try {
            if (id == null) {
                membersTable.getSelectionModel().clearSelection();
            } else {
                membersTable.getItems().stream().filter(m -> m.id().equals(id)).findFirst().ifPresent(m -> {
                    membersTable.getSelectionModel().select(m);
                    membersTable.scrollTo(m);
                });
            }
        } finally {
            syncing = false;
        }
    }

    private void refreshCalculation() {
        calculation.setText(Readouts.calculationSheet(model.selectedResult(), model.units()));
    }
}
