package org.baywright.ui;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;
import javafx.stage.Window;
import org.baywright.plan.Plan;

/**
 * The main window: puts its parts together around one {@link EditorModel} — menus ({@link MainMenus}),
 * tool bar ({@link ToolBarView}) and tool options ({@link ToolOptionsBar}), the plan canvas, the side
 * tabs (Properties from {@link PropertiesViewModel} through {@link PropertiesPanel}; Members, Takeoff and
 * Calculation from {@link ResultTabs}), the Study tab, the Problems panel ({@link ProblemsPanel}) and the
 * status bar ({@link StatusBar}). File actions and dialogs are {@link FileActions}'. The look is the
 * stylesheet {@code baywright.css}.
 */
public final class MainWindow {
    /** The canvas tools' names, in tool-bar order. */
    public static final List<String> TOOLS = java.util.Arrays.stream(Tool.values()).map(Tool::label).toList();

    private final EditorModel model;
    private final BorderPane root = new BorderPane();
    private final PlanCanvas canvas;
    private final FileActions files;
    private final PropertiesViewModel properties;
    private final TabPane sideTabs = new TabPane();
    private final TabPane centreTabs = new TabPane();
    private final StudyPanel study;
    private final UserSettings settings;
    private final SplitPane across;
    /** Opens a plan in a new window (set by the application; by default the plan replaces this one). */
    private Consumer<Plan> newWindow;

    public MainWindow(EditorModel model, Runnable exit) {
        this(model, exit, RecentFiles.standard());
    }

    public MainWindow(EditorModel model, Runnable exit, RecentFiles recent) {
        this(model, exit, recent, UserSettings.standard());
    }

    /** A window whose per-user choices (side panel width, export folder, allowance) are kept in {@code settings}. */
    public MainWindow(EditorModel model, Runnable exit, RecentFiles recent, UserSettings settings) {
        this.model = model;
        this.settings = settings;
        this.canvas = new PlanCanvas(model);
        this.files = new FileActions(model, recent, settings, this::window, exit);
        this.properties = new PropertiesViewModel(model);
        root.setId("baywright-main");
        root.getStylesheets().add(Styles.sheet());
        MainMenus menus = new MainMenus(model, files, canvas, this::showTab, this::window);
        Node toolBar = new ToolBarView(model, canvas).node();
        Node toolOptions = new ToolOptionsBar(model).node();
        root.setTop(new VBox(menus.bar(), toolBar, toolOptions));
        ResultTabs results = new ResultTabs(model);
        sideTabs.setId("side-tabs");
        sideTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        sideTabs.getTabs().addAll(tab("Properties", new PropertiesPanel(properties).node()), tab("Members", results.members()),
                tab("Takeoff", results.takeoff()), tab("Calculation", results.calculation()));
        across = new SplitPane(canvas, sideTabs);
        sideWidth(results);
        SplitPane down = new SplitPane(across, new ProblemsPanel(model).node());
        down.setOrientation(Orientation.VERTICAL);
        down.setDividerPositions(0.84);
        // the plan and the Study panel share the middle of the window: its charts want the whole width
        study = new StudyPanel(model::plan, this::openAsNewDocument);
        centreTabs.setId("centre-tabs");
        centreTabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        centreTabs.getTabs().addAll(tab("Plan", down), tab("Study", study));
        root.setCenter(centreTabs);
        // the plan's tools act on the plan: they are away while the Study tab is shown
        centreTabs.getSelectionModel().selectedIndexProperty().addListener((o, a, i) -> {
            boolean plan = i.intValue() == 0;
            for (Node n : List.of(toolBar, toolOptions)) {
                n.setVisible(plan);
                n.setManaged(plan);
            }
        });
        root.setBottom(new StatusBar(model).node());
    }

    /** The side panel's narrowest and widest start, px. */
    static final double SIDE_MIN = 360;
    static final double SIDE_MAX = 900;

    /**
     * Sizes the side panel on start: the width the user last left it at, or else the width its tables
     * need to show every column; it keeps its width when the window is resized, and the width it has
     * when the window closes is remembered.
     */
    private void sideWidth(ResultTabs results) {
        double wanted = Math.max(SIDE_MIN, Math.min(SIDE_MAX, settings.number(UserSettings.SIDE_WIDTH, results.neededWidth())));
        sideTabs.setMinWidth(280);
        SplitPane.setResizableWithParent(sideTabs, false);
        across.setDividerPositions(0.7);
        boolean[] placed = {false};
        across.widthProperty().addListener((o, a, w) -> {
            if (!placed[0] && w.doubleValue() > 0) {
                placed[0] = true;
                across.setDividerPositions(Math.max(0.3, 1 - wanted / w.doubleValue()));
            }
        });
        root.sceneProperty().addListener((o, a, scene) -> {
            if (scene != null) {
                scene.windowProperty().addListener((o2, a2, win) -> {
                    if (win != null) {
                        win.addEventHandler(javafx.stage.WindowEvent.WINDOW_HIDING, e -> rememberSideWidth());
                    }
                });
            }
        });
    }

    /** Remembers the side panel's width for the next start. */
    void rememberSideWidth() {
        double w = sideTabs.getWidth();
        if (w > 0) {
            settings.put(UserSettings.SIDE_WIDTH, Long.toString(Math.round(w)));
        }
    }

    private static Tab tab(String name, Node content) {
        Tab t = new Tab(name, content);
        t.setId("tab-" + name.toLowerCase(Locale.ROOT));
        return t;
    }

    /** How "open as a new document" works: the application opens a window of its own. */
    public void setNewWindowOpener(Consumer<Plan> opener) {
        this.newWindow = opener;
    }

    /** Opens a plan as a new document: in a new window when the application allows it, else here after asking. */
    public void openAsNewDocument(Plan plan) {
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

    /** Adds a tab to the side panel. */
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

    /** What the Properties panel shows for the selection. */
    public PropertiesViewModel properties() {
        return properties;
    }

    /** The window title for the open plan. */
    public String title() {
        if (model.plan() == null) {
            return "Baywright";
        }
        Path f = model.fileProperty().get();
        return "Baywright — " + model.plan().name() + (f == null ? " (not saved)" : " — " + f.getFileName());
    }

    private Window window() {
        return root.getScene() == null ? null : root.getScene().getWindow();
    }

    /**
     * Opens a plan file; a file with errors is not opened, the current plan stays and a dialog lists
     * the located problems. Returns whether the file was opened.
     */
    public boolean open(Path file) {
        return files.open(file);
    }

    /**
     * Asks before unsaved changes would be lost: Save (then go on if it was saved), Discard, or Cancel.
     * True when it is fine to go on.
     */
    public boolean confirmDiscard() {
        return files.confirmDiscard();
    }

    /** Starts a new plan from the New dialog's texts; an error names the field. */
    void newPlan(String name, String units, String levelCount, String storey) {
        files.newPlan(name, units, levelCount, storey);
    }

    /** The About text: name, version, what it is, and the caution. */
    public static String aboutText() {
        return HelpDialogs.aboutText();
    }

    /** Exits the JavaFX application (the default for the Exit item). */
    public static void exitApp() {
        Platform.exit();
    }
}
