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
import javafx.scene.control.CheckBox;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputDialog;
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
    /** The canvas tools' names, in tool-bar order. */
    public static final List<String> TOOLS = java.util.Arrays.stream(Tool.values()).map(Tool::label).toList();

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
    private final HBox toolOptions = new HBox(8);
    private final RecentFiles recent;
    private final TableView<org.baywright.takedown.MemberResult> membersTable = new TableView<>();
    private final TableView<org.baywright.report.Takeoff.Row> takeoffTable = new TableView<>();
    private final Label takeoffTotals = new Label();
    private final TextArea calculation = new TextArea();
    private final TabPane sideTabs = new TabPane();
    private final StudyPanel study;
    private final TabPane centreTabs = new TabPane();
    private boolean syncingTable;
    /** Opens a plan in a new window (set by the application; by default the plan replaces this one). */
    private java.util.function.Consumer<org.baywright.plan.Plan> newWindow;

    public MainWindow(EditorModel model, Runnable exit) {
        this(model, exit, RecentFiles.standard());
    }

    public MainWindow(EditorModel model, Runnable exit, RecentFiles recent) {
        this.model = model;
        this.exit = exit;
        this.recent = recent;
        this.canvas = new PlanCanvas(model);
        root.setId("baywright-main");
        toolOptions.setId("tool-options");
        toolOptions.setAlignment(Pos.CENTER_LEFT);
        toolOptions.setPadding(new Insets(4, 10, 4, 10));
        toolOptions.setStyle("-fx-background-color: #f1efe8; -fx-border-color: #d6d3c8; -fx-border-width: 0 0 1 0;");
        root.setTop(new VBox(menus(), tools(), toolOptions));
        sideTabs.setId("side-tabs");
        sideTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        sideTabs.getTabs().addAll(tab("Properties", propertiesPanel()), tab("Members", membersPanel()),
                tab("Takeoff", takeoffPanel()), tab("Calculation", calculationPanel()));
        SplitPane across = new SplitPane(canvas, sideTabs);
        across.setDividerPositions(0.77);
        SplitPane.setResizableWithParent(across.getItems().get(1), false);
        SplitPane down = new SplitPane(across, problemsPanel());
        down.setOrientation(Orientation.VERTICAL);
        down.setDividerPositions(0.84);
        // the plan and the Study panel share the middle of the window: its charts want the whole width
        study = new StudyPanel(model::plan, this::openAsNewDocument);
        Tab planTab = tab("Plan", down);
        Tab studyTab = tab("Study", study);
        centreTabs.setId("centre-tabs");
        centreTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        centreTabs.getTabs().addAll(planTab, studyTab);
        root.setCenter(centreTabs);
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
        model.toolProperty().addListener((o, a, b) -> refreshToolOptions());
        model.runProperty().addListener((o, a, b) -> refreshTables());
        model.levelProperty().addListener((o, a, b) -> refreshTables());
        model.selectedProperty().addListener((o, a, b) -> {
            refreshCalculation();
            syncTableSelection();
        });
        model.runProperty().addListener((o, a, b) -> refreshCalculation());
        model.planProperty().addListener((o, a, b) -> refreshProperties());
        model.selection().addListener((javafx.collections.SetChangeListener<String>) c -> refreshProperties());
        model.fileProperty().addListener((o, a, b) -> {
            if (b != null) {
                recent.add(b);
            }
        });
        refreshStatus();
        refreshProperties();
        refreshToolOptions();
        refreshTables();
    }

    private static Tab tab(String name, Node content) {
        Tab t = new Tab(name, content);
        t.setId("tab-" + name.toLowerCase(Locale.ROOT));
        return t;
    }

    /** How "open as a new document" works: the application opens a window of its own. */
    public void setNewWindowOpener(java.util.function.Consumer<org.baywright.plan.Plan> opener) {
        this.newWindow = opener;
    }

    /** Opens a plan as a new document: in a new window when the application allows it, else here after asking. */
    public void openAsNewDocument(org.baywright.plan.Plan plan) {
        if (newWindow != null) {
            newWindow.accept(plan);
        } else if (confirmDiscard()) {
            model.openUnsaved(plan, "Opened " + plan.name() + " as a new plan; save it to keep it.");
        }
    }

    /**
     * Shows a tab by its name: the middle's Plan or Study, or the side panel's Properties, Members,
     * Takeoff or Calculation.
     */
    public void showTab(String name) {
        for (TabPane pane : List.of(centreTabs, sideTabs)) {
            pane.getTabs().stream().filter(t -> t.getText().equals(name)).findFirst().ifPresent(t -> {
                pane.getSelectionModel().select(t);
                if (pane == sideTabs) {
                    centreTabs.getSelectionModel().select(0);
                }
            });
        }
    }

    /** Adds a tab to the side panel (the Study panel lives there). */
    public void addSideTab(String name, Node content) {
        sideTabs.getTabs().add(tab(name, content));
    }

    /** The root node of the window. */
    public Parent root() {
        return root;
    }

    /** The Study panel (sweeps of the open plan). */
    public StudyPanel study() {
        return study;
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
        MenuItem newPlan = item("New…", "Shortcut+N", this::newPlan);
        MenuItem open = item("Open…", "Shortcut+O", this::chooseAndOpen);
        Menu openRecent = new Menu("Open Recent");
        openRecent.setId("menu-recent");
        openRecent.getItems().add(new MenuItem("(none)"));
        openRecent.setOnShowing(e -> fillRecent(openRecent));
        MenuItem save = item("Save", "Shortcut+S", this::save);
        MenuItem saveAs = item("Save As…", "Shortcut+Shift+S", this::saveAs);
        MenuItem quit = item("Exit", "Shortcut+Q", () -> {
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
        Menu file = new Menu("File", null, newPlan, open, openRecent, save, saveAs, new SeparatorMenuItem(), export,
                new SeparatorMenuItem(), quit);
        MenuItem undo = item("Undo", "Shortcut+Z", model::undo);
        MenuItem redo = item("Redo", "Shortcut+Shift+Z", model::redo);
        MenuItem redoY = item("Redo (again)", "Shortcut+Y", model::redo);
        redoY.setVisible(false);
        undo.disableProperty().bind(model.canUndoProperty().not());
        redo.disableProperty().bind(model.canRedoProperty().not());
        MenuItem delete = item("Delete selection   (Delete)", null, model::deleteSelection);
        delete.setId("menu-delete");
        Menu edit = new Menu("Edit", null, undo, redo, redoY, new SeparatorMenuItem(), delete);
        MenuItem fit = item("Zoom to fit", "Shortcut+0", canvas::zoomToFit);
        fit.setId("menu-zoom-fit");
        CheckMenuItem reactions = new CheckMenuItem("End reactions");
        reactions.setId("menu-reactions");
        reactions.setAccelerator(KeyCombination.keyCombination("Shortcut+R"));
        reactions.selectedProperty().bindBidirectional(model.showReactionsProperty());
        CheckMenuItem tributary = new CheckMenuItem("Tributary areas");
        tributary.setId("menu-tributary");
        tributary.setAccelerator(KeyCombination.keyCombination("Shortcut+T"));
        tributary.selectedProperty().bindBidirectional(model.showTributaryProperty());
        MenuItem rerun = item("Run again", "F5", model::rerun);
        MenuItem showPlan = item("Plan", "Shortcut+1", () -> showTab("Plan"));
        MenuItem showStudy = item("Study", "Shortcut+2", () -> showTab("Study"));
        Menu view = new Menu("View", null, showPlan, showStudy, new SeparatorMenuItem(), fit, new SeparatorMenuItem(), reactions,
                tributary, new SeparatorMenuItem(), rerun);
        Menu design = new Menu("Design", null, unitsMenu(), methodMenu());
        design.setId("menu-design");
        Menu help = new Menu("Help", null, item("Tools and keys", "F1", this::keysHelp), item("About Baywright", null, this::about));
        MenuBar bar = new MenuBar(file, edit, view, design, help);
        bar.setId("menu-bar");
        return bar;
    }

    private Menu unitsMenu() {
        return choiceMenu("Units", p -> p.units(), org.baywright.plan.PlanEdits::withUnits,
                new Choice("US customary (ft, kip, psf)", "menu-units-us", "us", "Units: US customary"),
                new Choice("SI (m, kN, kPa)", "menu-units-si", "si", "Units: SI"));
    }

    private Menu methodMenu() {
        return choiceMenu("Design method", p -> p.settings().method(), org.baywright.plan.PlanEdits::withMethod,
                new Choice("LRFD", "menu-method-lrfd", "lrfd", "Design method: LRFD"),
                new Choice("ASD", "menu-method-asd", "asd", "Design method: ASD"));
    }

    /** One choice of a radio menu: its text, node id, the plan value it sets and the edit's label. */
    private record Choice(String text, String id, String value, String label) {
    }

    /** A radio menu whose choices are undoable plan edits, kept in step with the plan shown. */
    private Menu choiceMenu(String title, java.util.function.Function<org.baywright.plan.Plan, String> current,
            java.util.function.BiFunction<org.baywright.plan.Plan, String, org.baywright.plan.Plan> set, Choice... choices) {
        ToggleGroup g = new ToggleGroup();
        List<RadioMenuItem> items = new java.util.ArrayList<>();
        for (Choice c : choices) {
            RadioMenuItem item = new RadioMenuItem(c.text());
            item.setId(c.id());
            item.setToggleGroup(g);
            item.setOnAction(e -> model.edit(p -> set.apply(p, c.value()), c.label()));
            items.add(item);
        }
        Runnable sync = () -> {
            String now = model.plan() == null ? choices[0].value() : current.apply(model.plan());
            for (int i = 0; i < choices.length; i++) {
                items.get(i).setSelected(choices[i].value().equalsIgnoreCase(now));
            }
        };
        model.planProperty().addListener((o, a, b) -> sync.run());
        sync.run();
        return new Menu(title, null, items.toArray(new MenuItem[0]));
    }

    private void fillRecent(Menu menu) {
        menu.getItems().clear();
        List<Path> files = recent.list();
        if (files.isEmpty()) {
            MenuItem none = new MenuItem("(none)");
            none.setDisable(true);
            menu.getItems().add(none);
            return;
        }
        for (Path f : files) {
            MenuItem m = new MenuItem(f.getFileName() + "   " + (f.getParent() == null ? "" : f.getParent()));
            m.setOnAction(e -> {
                if (confirmDiscard()) {
                    open(f);
                }
            });
            menu.getItems().add(m);
        }
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
        levels.setId("level-selector");
        levels.setPromptText("level");
        Label levelLabel = new Label("Level");
        Label layout = new Label();
        layout.setId("floor-layout");
        layout.setStyle("-fx-text-fill: #5d5f63;");
        Runnable sayLayout = () -> layout.setText(model.currentFloor().map(f -> {
            long n = model.plan().levels().stream().filter(l -> l.floor().equals(f.id())).count();
            return "edits go to layout \"" + f.name() + "\"" + (n > 1 ? " (" + n + " levels)" : "");
        }).orElse(""));
        model.levelProperty().addListener((o, a, b) -> sayLayout.run());
        model.planProperty().addListener((o, a, b) -> sayLayout.run());
        sayLayout.run();
        bar.getItems().addAll(new Separator(Orientation.VERTICAL), fit, new Separator(Orientation.VERTICAL),
                levelLabel, levels, layout);
        return bar;
    }

    // ---- tool options ---------------------------------------------------------------------------

    private void refreshToolOptions() {
        toolOptions.getChildren().clear();
        Tool t = model.toolProperty().get();
        ToolSettings s = model.toolSettings();
        Label name = new Label(t.label());
        name.setStyle("-fx-font-weight: bold;");
        toolOptions.getChildren().add(name);
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
                toolOptions.getChildren().addAll(new Label("Bays west–east (lines A, B…)"), x,
                        new Label("south–north (lines 1, 2…)"), y, cols, apply);
            }
            case INFILL -> {
                TextField f = field("infill-spacing", s.infill, 90, "10ft or 3");
                ToggleButton dir = new ToggleButton();
                dir.setId("infill-direction");
                Runnable label = () -> dir.setText(s.infillDirection.get() == org.baywright.plan.GridLine.Axis.Y
                        ? "beams span south–north" : "beams span west–east");
                label.run();
                dir.setOnAction(e -> {
                    s.infillDirection.set(s.infillDirection.get() == org.baywright.plan.GridLine.Axis.Y
                            ? org.baywright.plan.GridLine.Axis.X : org.baywright.plan.GridLine.Axis.Y);
                    label.run();
                });
                toolOptions.getChildren().addAll(new Label("Largest spacing, or number of beams"), f, dir,
                        hint("then click a bay"));
            }
            case LOAD_AREA -> {
                ComboBox<org.baywright.plan.LiveLoadUse> use = new ComboBox<>(FXCollections.observableArrayList(
                        org.baywright.plan.LiveLoadUse.values()));
                use.valueProperty().bindBidirectional(s.areaUse);
                use.setId("area-use");
                toolOptions.getChildren().addAll(new Label("Superimposed dead"), field("area-sd", s.areaSd, 80, "15psf"),
                        new Label("Live (roof live on a roof)"), field("area-live", s.areaLive, 80, "100psf"),
                        new Label("Use"), use, hint("drag a rectangle, or click corners"));
            }
            case LINE_LOAD -> toolOptions.getChildren().addAll(new Label("Dead per length"),
                    field("line-dead", s.lineDead, 80, "0.5klf"), new Label("Live per length"),
                    field("line-live", s.lineLive, 80, ""), hint("click points; double-click or Enter to finish"));
            case POINT_LOAD -> toolOptions.getChildren().addAll(new Label("Dead"), field("point-dead", s.pointDead, 80, "5kip"),
                    new Label("Live"), field("point-live", s.pointLive, 80, ""), hint("click where it acts"));
            default -> toolOptions.getChildren().add(hint(t.hint()));
        }
    }

    private static TextField field(String id, javafx.beans.property.StringProperty value, double width, String prompt) {
        TextField f = new TextField();
        f.setId(id);
        f.textProperty().bindBidirectional(value);
        f.setPrefWidth(width);
        f.setPromptText(prompt);
        return f;
    }

    private static Label hint(String text) {
        Label l = new Label(text);
        l.setStyle("-fx-text-fill: #5d5f63;");
        l.setWrapText(true);
        return l;
    }

    /** Shows the current grid's spacings in the Grid fields (when the user has typed none). */
    private void fillGridFields() {
        org.baywright.plan.Plan p = model.plan();
        if (p == null) {
            return;
        }
        ToolSettings s = model.toolSettings();
        s.gridX.set(spacingText(org.baywright.plan.PlanEdits.lines(p, org.baywright.plan.GridLine.Axis.X)));
        s.gridY.set(spacingText(org.baywright.plan.PlanEdits.lines(p, org.baywright.plan.GridLine.Axis.Y)));
    }

    private String spacingText(List<org.baywright.plan.GridLine> lines) {
        List<String> parts = new java.util.ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            double d = lines.get(i).offset() - lines.get(i - 1).offset();
            parts.add(model.units() == org.baywright.units.UnitSystem.SI ? String.format(Locale.ROOT, "%.3fm", d) : feetText(d));
        }
        return String.join(" ", parts);
    }

    /** A spacing as typed text: 30' or 25'-6" when whole inches, else decimal feet. */
    static String feetText(double metres) {
        double inches = metres / 0.0254;
        long whole = Math.round(inches);
        if (Math.abs(inches - whole) < 1e-6) {
            long ft = whole / 12;
            long in = whole % 12;
            return in == 0 ? ft + "'" : ft + "'-" + in + "\"";
        }
        return String.format(Locale.ROOT, "%.4fft", metres / 0.3048);
    }

    /** Applies the typed grid spacings (one undoable edit). */
    void applyGrid() {
        ToolSettings s = model.toolSettings();
        org.baywright.units.UnitSystem us = model.units();
        boolean cols = s.gridColumns.get();
        model.edit(p -> {
            List<Double> xs = s.gridX.get() == null || s.gridX.get().isBlank() ? null
                    : ToolValues.spacings("bays west–east", s.gridX.get(), us);
            List<Double> ys = s.gridY.get() == null || s.gridY.get().isBlank() ? null
                    : ToolValues.spacings("bays south–north", s.gridY.get(), us);
            return org.baywright.plan.PlanEdits.withGrid(p, xs, ys, cols, org.baywright.plan.PlanEdits.OFFICE_FLOOR);
        }, "Grid set");
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
        String id = model.selectedProperty().get();
        var sel = model.selectedResult();
        int row = 0;
        if (model.selection().size() > 1) {
            Label many = new Label(model.selection().size() + " objects selected: " + String.join(", ", model.selection()));
            many.setWrapText(true);
            many.setId("prop-many");
            properties.add(many, 0, row++, 2, 1);
        }
        if (sel.isPresent()) {
            for (Readouts.Row r : Readouts.member(sel.get(), model.units())) {
                addRow(r.label(), r.value(), row++);
            }
            var m = sel.get();
            if (m.design() != null && !m.design().rejected().isEmpty()) {
                // the heaviest rejected sections are the informative ones: the last before the one chosen
                var rejected = m.design().rejected();
                var near = new java.util.ArrayList<>(rejected.subList(Math.max(0, rejected.size() - 4), rejected.size()));
                java.util.Collections.reverse(near);
                addRow("Lighter, rejected", near.stream()
                        .map(x -> x.section().designation() + ": " + x.governing().name() + " " + Readouts.ratio(x.governing().ratio()))
                        .collect(Collectors.joining("\n")) + (rejected.size() > 4 ? "\n(" + (rejected.size() - 4) + " lighter)" : ""),
                        row++);
            }
            if (m.id().contains("/")) {
                Label note = new Label("An infill beam: its spacing and direction belong to its bay (Infill tool). Delete"
                        + " removes the whole infill.");
                note.setWrapText(true);
                properties.add(note, 0, row++, 2, 1);
            } else {
                row = fixedSizeRow(m.id(), model.currentFloor().flatMap(f -> f.member(m.id())).flatMap(x -> x.fixedSection()), row);
            }
            return;
        }
        if (id != null && model.plan() != null) {
            var col = model.plan().columns().stream().filter(c -> c.id().equals(id)).findFirst();
            if (col.isPresent()) {
                addRow("Column", col.get().id(), row++);
                addRow("Grid", col.get().grid().isEmpty() ? "off grid" : col.get().grid(), row++);
                addRow("Top level", col.get().topLevel().isEmpty() ? "roof (top of building)" : col.get().topLevel(), row++);
                var result = model.run() == null || model.run().takedown() == null ? java.util.Optional.<org.baywright.takedown.ColumnResult>empty()
                        : model.run().takedown().columns().stream().filter(c -> c.id().equals(id)).findFirst();
                if (result.isPresent()) {
                    for (var t : result.get().tiers()) {
                        addRow("Tier " + t.levels().get(0) + (t.levels().size() > 1 ? "–" + t.levels().get(t.levels().size() - 1) : ""),
                                t.section() + "  " + Readouts.ratio(t.maxRatio()), row++);
                    }
                    addRow("Foundation", Readouts.reactions(result.get().foundation(), model.units()), row++);
                }
                row = fixedSizeRow(id, col.get().fixedSection(), row);
                return;
            }
            var f = model.currentFloor();
            if (f.isPresent()) {
                for (var a : f.get().areaLoads()) {
                    if (a.id().equals(id)) {
                        addRow("Load area", a.id(), row++);
                        addRow("Loads", Readouts.areaLoad(a.values(), model.units()), row++);
                        addRow("Use", a.use().name().toLowerCase(Locale.ROOT).replace('_', ' '), row++);
                        addRow("Area", org.baywright.units.UnitSystem.format(Math.abs(a.outline().signedArea()),
                                model.units().floorArea(), 0), row++);
                        return;
                    }
                }
                for (var o : f.get().openings()) {
                    if (o.id().equals(id)) {
                        addRow("Opening", o.id(), row++);
                        addRow("Area", org.baywright.units.UnitSystem.format(Math.abs(o.outline().signedArea()),
                                model.units().floorArea(), 0), row++);
                        return;
                    }
                }
                for (var l : f.get().lineLoads()) {
                    if (l.id().equals(id)) {
                        addRow("Line load", l.id(), row++);
                        addRow("Loads", Readouts.lineLoad(l.values(), model.units()), row++);
                        return;
                    }
                }
                for (var q : f.get().pointLoads()) {
                    if (q.id().equals(id)) {
                        addRow("Point load", q.id(), row++);
                        addRow("Loads", Readouts.force(q.values(), model.units()), row++);
                        return;
                    }
                }
            }
        }
        if (row == 0) {
            Label hint = new Label(model.plan() == null ? "No plan open." : model.run() == null ? "Running…"
                    : "Click a member, column, load or opening on the plan to see it here.");
            hint.setWrapText(true);
            hint.setId("prop-hint");
            properties.add(hint, 0, 0, 2, 1);
        }
    }

    private void addRow(String label, String value, int row) {
        Label k = new Label(label);
        k.setStyle("-fx-text-fill: #4a4d52;");
        Label v = new Label(value);
        v.setWrapText(true);
        v.setId("prop-" + label.trim().toLowerCase(Locale.ROOT).replace(' ', '-'));
        properties.add(k, 0, row);
        properties.add(v, 1, row);
    }

    /** The fixed-size field: a designation makes the member checked, not searched; blank clears it. */
    private int fixedSizeRow(String id, java.util.Optional<String> fixed, int row) {
        TextField size = new TextField(fixed.orElse(""));
        size.setId("fixed-size");
        size.setPromptText("lightest adequate");
        size.setPrefColumnCount(9);
        Button set = new Button("Set");
        set.setId("fixed-size-set");
        set.setMinWidth(Region.USE_PREF_SIZE);
        String floorId = model.currentFloorId();
        Runnable apply = () -> {
            String text = size.getText() == null ? "" : size.getText().trim();
            model.edit(p -> org.baywright.plan.PlanEdits.setFixedSection(p, floorId, id, java.util.Optional.of(text)),
                    text.isEmpty() ? id + ": lightest adequate size" : id + ": fixed size " + text.toUpperCase(Locale.ROOT));
        };
        set.setOnAction(e -> apply.run());
        size.setOnAction(e -> apply.run());
        Label k = new Label("Fixed size");
        k.setStyle("-fx-text-fill: #4a4d52;");
        properties.add(k, 0, row);
        properties.add(new HBox(6, size, set), 1, row);
        return row + 1;
    }

    // ---- Members, Takeoff and Calculation panels ---------------------------------------------------

    private Node membersPanel() {
        membersTable.setId("members-table");
        membersTable.setPlaceholder(new Label("No members at this level."));
        membersTable.getColumns().setAll(List.of(
                column("Member", 110, org.baywright.takedown.MemberResult::id),
                column("Kind", 60, m -> m.kind().name().toLowerCase(Locale.ROOT)),
                column("Section", 80, m -> m.section().isEmpty() ? "—" : m.section()),
                column("Length", 80, m -> org.baywright.units.UnitSystem.format(m.length(), model.units().length(), 2)),
                column("Ratio", 50, m -> Readouts.ratio(m.maxRatio())),
                column("Status", 90, m -> m.status().label())));
        membersTable.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && !syncingTable) {
                model.select(b.id());
            }
        });
        VBox box = new VBox(membersTable);
        VBox.setVgrow(membersTable, Priority.ALWAYS);
        return box;
    }

    private <S> TableColumn<S, String> column(String name, double width, java.util.function.Function<S, String> value) {
        TableColumn<S, String> c = new TableColumn<>(name);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new javafx.beans.property.ReadOnlyStringWrapper(value.apply(d.getValue())));
        return c;
    }

    private Node takeoffPanel() {
        takeoffTable.setId("takeoff-table");
        takeoffTable.setPlaceholder(new Label("No run yet."));
        takeoffTable.getColumns().setAll(List.of(
                column("Size / kind", 120, org.baywright.report.Takeoff.Row::item),
                column("Pieces", 55, r -> Integer.toString(r.count())),
                column("Length", 80, r -> org.baywright.units.UnitSystem.format(r.length(), model.units().length(), 0)),
                column("Weight", 90, r -> model.units() == org.baywright.units.UnitSystem.US
                        ? String.format(Locale.ROOT, "%.2f tons", org.baywright.report.Takeoff.shortTons(r.weight()))
                        : String.format(Locale.ROOT, "%.2f t", org.baywright.report.Takeoff.tonnes(r.weight())))));
        takeoffTotals.setId("takeoff-totals");
        takeoffTotals.setWrapText(true);
        takeoffTotals.setPadding(new Insets(6));
        VBox box = new VBox(4, takeoffTable, takeoffTotals);
        VBox.setVgrow(takeoffTable, Priority.ALWAYS);
        return box;
    }

    private Node calculationPanel() {
        calculation.setId("calculation");
        calculation.setEditable(false);
        calculation.setWrapText(false);
        calculation.setStyle("-fx-font-family: 'DejaVu Sans Mono', monospace; -fx-font-size: 11px;");
        VBox box = new VBox(calculation);
        VBox.setVgrow(calculation, Priority.ALWAYS);
        return box;
    }

    private void refreshTables() {
        syncingTable = true;
        try {
            membersTable.setItems(FXCollections.observableArrayList(model.currentMembers()));
        } finally {
            syncingTable = false;
        }
        syncTableSelection();
        var r = model.run();
        if (r == null || r.takedown() == null) {
            takeoffTable.setItems(FXCollections.observableArrayList());
            takeoffTotals.setText("");
            return;
        }
        var t = org.baywright.report.Takeoff.of(r, 0);
        List<org.baywright.report.Takeoff.Row> rows = new java.util.ArrayList<>(t.bySection());
        rows.addAll(t.byKind());
        takeoffTable.setItems(FXCollections.observableArrayList(rows));
        takeoffTotals.setText("Total " + String.format(Locale.ROOT, "%.2f short tons (%.2f t)",
                org.baywright.report.Takeoff.shortTons(t.total()), org.baywright.report.Takeoff.tonnes(t.total()))
                + "\n" + Readouts.weightPerArea(r, model.units()) + "\nSections first, then by kind (beams, girders, columns)."
                + " File › Export › Takeoff writes the CSV with levels and an allowance.");
    }

    private void syncTableSelection() {
        String id = model.selectedProperty().get();
        syncingTable = true;
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
            syncingTable = false;
        }
    }

    private void refreshCalculation() {
        var sel = model.selectedResult();
        if (sel.isEmpty()) {
            calculation.setText("Select a member to see its calculation sheet: the equations the run used, with"
                    + " their numbers and clauses.\n\n" + Caution.TEXT);
            return;
        }
        var calc = sel.get().calculation();
        if (calc == null) {
            calculation.setText(sel.get().id() + " was not designed (" + sel.get().status().label() + ").");
            return;
        }
        StringBuilder b = new StringBuilder(sel.get().id() + "  " + sel.get().section() + "\n\n");
        for (var line : calc.lines()) {
            b.append(org.baywright.calc.CalcFormat.render(line, model.units())).append('\n');
        }
        b.append('\n').append(Caution.TEXT);
        calculation.setText(b.toString());
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
            model.shownProblemProperty().set(p);
            if (p != null && !p.objectId().isEmpty() && (model.currentMembers().stream().anyMatch(m -> m.id().equals(p.objectId()))
                    || model.plan() != null && model.plan().columns().stream().anyMatch(c -> c.id().equals(p.objectId())))) {
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
        } else {
            recent.add(file);
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

    /** File › New: asks for a name, the units and the number of levels, then starts an empty plan. */
    private void newPlan() {
        if (!confirmDiscard()) {
            return;
        }
        javafx.scene.control.Dialog<ButtonType> d = new javafx.scene.control.Dialog<>();
        d.initOwner(window());
        d.setTitle("New plan");
        d.setHeaderText("A new, empty plan. Type the grid spacings next (Grid tool).");
        TextField name = new TextField("New building");
        name.setId("new-name");
        ComboBox<String> units = new ComboBox<>(FXCollections.observableArrayList("US customary", "SI"));
        units.setValue(model.units() == org.baywright.units.UnitSystem.SI ? "SI" : "US customary");
        units.setId("new-units");
        TextField levelCount = new TextField("1");
        levelCount.setId("new-levels");
        TextField storey = new TextField(model.units() == org.baywright.units.UnitSystem.SI ? "4m" : "13ft");
        storey.setId("new-storey");
        Label error = new Label();
        error.setStyle("-fx-text-fill: #b91c1c;");
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
        ok.addEventFilter(javafx.event.ActionEvent.ACTION, e -> {
            try {
                newPlan(name.getText(), units.getValue(), levelCount.getText(), storey.getText());
            } catch (IllegalArgumentException x) {
                error.setText(x.getMessage());
                e.consume();
            }
        });
        d.show();
    }

    /** Starts a new plan from the New dialog's texts; an error names the field. */
    void newPlan(String name, String units, String levelCount, String storey) {
        org.baywright.units.UnitSystem us = "SI".equals(units) ? org.baywright.units.UnitSystem.SI
                : org.baywright.units.UnitSystem.US;
        int n;
        try {
            n = Integer.parseInt(levelCount.trim());
        } catch (NumberFormatException x) {
            n = -1;
        }
        if (n < 1 || n > 200) {
            throw new IllegalArgumentException("Levels: \"" + levelCount + "\" is not a whole number from 1 to 200");
        }
        double h = ToolValues.length("storey height", storey, us);
        model.newPlan(name == null || name.isBlank() ? "New building" : name.trim(), us, n, h);
        model.toolProperty().set(Tool.GRID);
    }

    private void keysHelp() {
        StringBuilder b = new StringBuilder();
        for (Tool t : Tool.values()) {
            b.append(t.key().getName()).append("  ").append(t.label()).append(" — ").append(t.hint()).append("\n");
        }
        b.append("\nDelete  remove the selection     Esc  cancel / clear selection     Enter  finish an outline or path\n")
                .append("Backspace  take back the last point     F  zoom to fit     Space + drag or middle drag  pan\n")
                .append("Scroll  zoom at the cursor     Ctrl+Z / Ctrl+Shift+Z  undo / redo     Ctrl+R  end reactions\n")
                .append("Ctrl+T  tributary areas     F5  run again     Ctrl+N/O/S  new, open, save");
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(window());
        a.setTitle("Baywright");
        a.setHeaderText("Tools and keys");
        TextArea text = new TextArea(b.toString());
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefColumnCount(80);
        text.setPrefRowCount(18);
        a.getDialogPane().setContent(text);
        a.show();
    }

    /** Exits the JavaFX application (the default for the Exit item). */
    public static void exitApp() {
        Platform.exit();
    }
}
