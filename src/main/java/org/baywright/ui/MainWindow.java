package org.baywright.ui;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import javafx.application.Platform;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Separator;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.baywright.calc.Caution;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Problem;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;

/**
 * The main window's contents: menus, tool bar, plan canvas, Properties, Problems and the status bar,
 * all reading one {@link EditorModel}.
 */
public final class MainWindow {
    /** The canvas tools, in tool-bar order. Only Select works in this version. */
    public static final List<String> TOOLS = List.of("Select", "Grid", "Girder", "Beam", "Infill", "Column", "Deck",
            "Load area", "Opening", "Line load", "Point load", "Measure");

    private final EditorModel model;
    private final Runnable exit;
    private final BorderPane root = new BorderPane();
    private final PlanCanvas canvas;
    private final GridPane properties = new GridPane();
    private final Label statusWeight = new Label();
    private final Label statusArea = new Label();
    private final Label statusRatio = new Label();
    private final Label statusMessage = new Label();
    private final ComboBox<String> levels = new ComboBox<>();

    public MainWindow(EditorModel model, Runnable exit) {
        this.model = model;
        this.exit = exit;
        this.canvas = new PlanCanvas(model);
        root.setId("baywright-main");
        root.setTop(new VBox(menus(), tools()));
        SplitPane across = new SplitPane(canvas, propertiesPanel());
        across.setDividerPositions(0.77);
        SplitPane.setResizableWithParent(across.getItems().get(1), false);
        SplitPane down = new SplitPane(across, problemsPanel());
        down.setOrientation(Orientation.VERTICAL);
        down.setDividerPositions(0.84);
        root.setCenter(down);
        root.setBottom(statusBar());
        model.runProperty().addListener((o, a, b) -> refreshStatus());
        model.selectedProperty().addListener((o, a, b) -> refreshProperties());
        model.runProperty().addListener((o, a, b) -> refreshProperties());
        model.levelProperty().addListener((o, a, b) -> refreshProperties());
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
        refreshStatus();
        refreshProperties();
    }

    /** The root node of the window. */
    public Parent root() {
        return root;
    }

    /** The plan view. */
    public PlanCanvas canvas() {
        return canvas;
    }

    /** The window title for the open plan. */
    public String title() {
        if (model.plan() == null) {
            return "Baywright";
        }
        Path f = model.fileProperty().get();
        return "Baywright — " + model.plan().name() + (f == null ? " (not saved)" : " — " + f.getFileName());
    }

    // ---- menus and tools ----------------------------------------------------------------------

    private MenuBar menus() {
        MenuItem open = item("Open…", "Shortcut+O", this::chooseAndOpen);
        MenuItem save = item("Save", "Shortcut+S", this::save);
        MenuItem saveAs = item("Save As…", "Shortcut+Shift+S", this::saveAs);
        MenuItem quit = item("Exit", null, () -> {
            if (confirmDiscard()) {
                exit.run();
            }
        });
        save.disableProperty().bind(model.planProperty().isNull());
        saveAs.disableProperty().bind(model.planProperty().isNull());
        Menu export = new Menu("Export", null,
                item("Framing plan of this level…", null, () -> export("Export the framing plan", "level.pdf",
                        new String[] {"*.pdf", "*.svg", "*.png"}, model::exportDrawing)),
                item("Calculation package…", null, () -> export("Export the calculation package", "calculations.pdf",
                        new String[] {"*.pdf"}, model::exportPackage)),
                item("Takeoff…", null, () -> export("Export the takeoff", "takeoff.csv", new String[] {"*.csv"},
                        p -> model.exportTakeoff(p, 0))),
                item("Column schedule…", null, () -> export("Export the column schedule", "columns.csv",
                        new String[] {"*.csv"}, model::exportSchedule)));
        export.setId("menu-export");
        export.disableProperty().bind(model.runProperty().isNull());
        Menu file = new Menu("File", null, open, save, saveAs, new SeparatorMenuItem(), export, new SeparatorMenuItem(), quit);
        MenuItem undo = item("Undo", "Shortcut+Z", model::undo);
        MenuItem redo = item("Redo", "Shortcut+Shift+Z", model::redo);
        undo.disableProperty().bind(model.canUndoProperty().not());
        redo.disableProperty().bind(model.canRedoProperty().not());
        Menu edit = new Menu("Edit", null, undo, redo);
        MenuItem fit = item("Zoom to fit", "Shortcut+0", canvas::zoomToFit);
        fit.setId("menu-zoom-fit");
        MenuItem rerun = item("Run again", "F5", model::rerun);
        Menu view = new Menu("View", null, fit, rerun);
        Menu help = new Menu("Help", null, item("About Baywright", null, this::about));
        MenuBar bar = new MenuBar(file, edit, view, help);
        bar.setId("menu-bar");
        return bar;
    }

    private static MenuItem item(String text, String keys, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (keys != null) {
            m.setAccelerator(KeyCombination.keyCombination(keys));
        }
        m.setOnAction(e -> action.run());
        return m;
    }

    private ToolBar tools() {
        ToolBar bar = new ToolBar();
        bar.setId("tool-bar");
        ToggleGroup group = new ToggleGroup();
        for (String name : TOOLS) {
            ToggleButton b = new ToggleButton(name);
            b.setToggleGroup(group);
            b.setId("tool-" + name.toLowerCase(Locale.ROOT).replace(' ', '-'));
            if (name.equals("Select")) {
                b.setSelected(true);
                b.setTooltip(new Tooltip("Select: click a member to see its properties. "
                        + "Scroll to zoom, middle-drag or hold Space and drag to pan."));
                bar.getItems().add(b);
            } else {
                b.setDisable(true);
                // a disabled control shows no tooltip, so the tooltip sits on a wrapper
                StackPane wrap = new StackPane(b);
                Tooltip.install(wrap, new Tooltip(name + ": coming"));
                bar.getItems().add(wrap);
            }
        }
        group.selectedToggleProperty().addListener((o, a, b) -> {
            if (b == null) {
                group.selectToggle(a); // one tool is always active
            }
        });
        Button fit = new Button("Zoom to fit");
        fit.setId("zoom-fit");
        fit.setOnAction(e -> canvas.zoomToFit());
        levels.setId("level-selector");
        levels.setPromptText("level");
        Label levelLabel = new Label("Level");
        bar.getItems().addAll(new Separator(Orientation.VERTICAL), fit, new Separator(Orientation.VERTICAL),
                levelLabel, levels);
        return bar;
    }

    // ---- panels -------------------------------------------------------------------------------

    private Node propertiesPanel() {
        Label title = new Label("Properties");
        title.getStyleClass().add("panel-title");
        title.setStyle("-fx-font-weight: bold; -fx-font-size: 13px;");
        properties.setId("properties");
        properties.setHgap(10);
        properties.setVgap(4);
        ColumnConstraints c0 = new ColumnConstraints();
        c0.setMinWidth(Region.USE_PREF_SIZE);
        ColumnConstraints c1 = new ColumnConstraints();
        c1.setHgrow(Priority.ALWAYS);
        properties.getColumnConstraints().setAll(c0, c1);
        VBox box = new VBox(8, title, properties);
        box.setPadding(new Insets(10));
        ScrollPane scroll = new ScrollPane(box);
        scroll.setFitToWidth(true);
        scroll.setMinWidth(240);
        scroll.setPrefWidth(320);
        return scroll;
    }

    private void refreshProperties() {
        properties.getChildren().clear();
        var sel = model.selectedResult();
        if (sel.isEmpty()) {
            Label hint = new Label(model.run() == null ? "Running…" : "Click a member on the plan to see its size, ratios and reactions.");
            hint.setWrapText(true);
            hint.setId("prop-hint");
            properties.add(hint, 0, 0, 2, 1);
            return;
        }
        int row = 0;
        for (Readouts.Row r : Readouts.member(sel.get(), model.units())) {
            Label k = new Label(r.label());
            k.setStyle("-fx-text-fill: #4a4d52;");
            Label v = new Label(r.value());
            v.setWrapText(true);
            v.setId("prop-" + r.label().trim().toLowerCase(Locale.ROOT).replace(' ', '-'));
            properties.add(k, 0, row);
            properties.add(v, 1, row);
            row++;
        }
    }

    private Node problemsPanel() {
        Label title = new Label("Problems");
        title.setStyle("-fx-font-weight: bold; -fx-font-size: 13px;");
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
        list.getSelectionModel().selectedItemProperty().addListener((o, a, p) -> {
            if (p != null && model.currentMembers().stream().anyMatch(m -> m.id().equals(p.objectId()))) {
                model.select(p.objectId());
            }
        });
        Label count = new Label();
        count.textProperty().bind(javafx.beans.binding.Bindings.size(model.problems()).asString("(%d)"));
        HBox head = new HBox(6, title, count);
        head.setAlignment(Pos.CENTER_LEFT);
        VBox box = new VBox(4, head, list);
        VBox.setVgrow(list, Priority.ALWAYS);
        box.setPadding(new Insets(6, 10, 6, 10));
        box.setMinHeight(80);
        return box;
    }

    private Node statusBar() {
        statusWeight.setId("status-weight");
        statusArea.setId("status-area");
        statusRatio.setId("status-ratio");
        statusMessage.setId("status-message");
        statusMessage.textProperty().bind(model.messageProperty());
        Region spring = new Region();
        HBox.setHgrow(spring, Priority.ALWAYS);
        HBox line = new HBox(18, statusWeight, statusArea, statusRatio, spring, statusMessage);
        line.setAlignment(Pos.CENTER_LEFT);
        Label caution = new Label(Caution.TEXT);
        caution.setId("caution");
        caution.setWrapText(true);
        caution.setStyle("-fx-text-fill: #5b4a1e; -fx-font-size: 11px;");
        VBox bar = new VBox(3, line, caution);
        bar.setPadding(new Insets(5, 10, 6, 10));
        bar.setStyle("-fx-background-color: #ecebe6; -fx-border-color: #c9c7bf; -fx-border-width: 1 0 0 0;");
        return bar;
    }

    private void refreshStatus() {
        RunResult r = model.run();
        statusWeight.setText(Readouts.steelWeight(r, model.units()));
        statusArea.setText(Readouts.weightPerArea(r, model.units()));
        statusRatio.setText(Readouts.highestRatio(r));
    }

    // ---- actions ------------------------------------------------------------------------------

    private Window window() {
        return root.getScene() == null ? null : root.getScene().getWindow();
    }

    private void chooseAndOpen() {
        if (!confirmDiscard()) {
            return;
        }
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Open plan");
        chooser.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("Baywright plans", "*" + PlanFiles.EXTENSION),
                new FileChooser.ExtensionFilter("All files", "*.*"));
        Path f = model.fileProperty().get();
        if (f != null && f.toAbsolutePath().getParent() != null) {
            chooser.setInitialDirectory(f.toAbsolutePath().getParent().toFile());
        }
        File chosen = chooser.showOpenDialog(window());
        if (chosen != null) {
            open(chosen.toPath());
        }
    }

    /**
     * Opens a plan file; a file with errors is not opened, the current plan stays and a dialog lists
     * the located problems. Returns whether the file was opened.
     */
    public boolean open(Path file) {
        EditorModel.OpenResult r = model.open(file);
        if (!r.opened()) {
            showProblems(file, r.problems());
        }
        return r.opened();
    }

    private void showProblems(Path file, List<Problem> problems) {
        Alert a = new Alert(Alert.AlertType.ERROR);
        a.initOwner(window());
        a.setTitle("Baywright");
        a.setHeaderText(file.getFileName() + " was not opened"
                + (model.plan() == null ? "." : "; the current plan stays open."));
        TextArea text = new TextArea(problems.stream().map(Problem::toString).collect(Collectors.joining("\n")));
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(Math.min(14, Math.max(4, problems.size() + 1)));
        text.setPrefColumnCount(70);
        text.setId("open-problems");
        a.getDialogPane().setContent(new VBox(6, new Label(problems.size() == 1 ? "1 problem:" : problems.size() + " problems:"), text));
        a.show();
    }

    /**
     * Asks before unsaved changes would be lost: Save (then go on if it was saved), Discard, or Cancel.
     * True when it is fine to go on.
     */
    public boolean confirmDiscard() {
        if (!model.dirtyProperty().get()) {
            return true;
        }
        ButtonType saveIt = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard changes", ButtonBar.ButtonData.NO);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The plan has changes that are not saved.", saveIt, discard,
                ButtonType.CANCEL);
        a.initOwner(window());
        a.setTitle("Baywright");
        a.setHeaderText("Save the changes to " + model.plan().name() + "?");
        ButtonType answer = a.showAndWait().orElse(ButtonType.CANCEL);
        if (answer == saveIt) {
            save();
            return !model.dirtyProperty().get();
        }
        return answer == discard;
    }

    private void save() {
        if (model.fileProperty().get() == null) {
            saveAs();
            return;
        }
        try {
            model.save();
        } catch (IOException | RuntimeException e) {
            error("The plan was not saved", e);
        }
    }

    private void saveAs() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Save plan as");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Baywright plans", "*" + PlanFiles.EXTENSION));
        Path f = model.fileProperty().get();
        chooser.setInitialFileName(f == null ? "plan" + PlanFiles.EXTENSION : f.getFileName().toString());
        File chosen = chooser.showSaveDialog(window());
        if (chosen == null) {
            return;
        }
        try {
            model.saveAs(chosen.toPath());
        } catch (IOException | RuntimeException e) {
            error("The plan was not saved", e);
        }
    }

    /** An export that writes one file. */
    @FunctionalInterface
    interface Exporter {
        void write(Path out) throws IOException;
    }

    private void export(String title, String name, String[] patterns, Exporter exporter) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle(title);
        chooser.setInitialFileName(name);
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter(String.join(", ", patterns), patterns));
        File chosen = chooser.showSaveDialog(window());
        if (chosen == null) {
            return;
        }
        try {
            exporter.write(chosen.toPath());
            model.messageProperty().set("Wrote " + chosen.getName());
        } catch (IOException | RuntimeException e) {
            error("Nothing was exported", e);
        }
    }

    private void error(String header, Exception e) {
        Alert a = new Alert(Alert.AlertType.ERROR, String.valueOf(e.getMessage()));
        a.initOwner(window());
        a.setTitle("Baywright");
        a.setHeaderText(header);
        a.show();
    }

    /** The About text: name, version, what it is, and the caution. */
    public static String aboutText() {
        return "Baywright " + PlanRun.version() + "\n\n"
                + "Steel floor framing: tributary areas, load takedown and AISC 360 member sizing.\n"
                + "Open source under the Apache License 2.0.\n\n" + Caution.TEXT;
    }

    private void about() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(window());
        a.setTitle("About Baywright");
        a.setHeaderText("Baywright");
        Label body = new Label(aboutText());
        body.setWrapText(true);
        body.setMaxWidth(460);
        body.setId("about-text");
        a.getDialogPane().setContent(body);
        a.show();
    }

    /** Exits the JavaFX application (the default for the Exit item). */
    public static void exitApp() {
        Platform.exit();
    }
}
