package org.baywright.ui;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.chart.NumberAxis;
import javafx.scene.chart.ScatterChart;
import javafx.scene.chart.XYChart;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.Duration;
import javafx.util.StringConverter;
import org.baywright.calc.Caution;
import org.baywright.plan.Plan;
import org.baywright.study.CancelToken;
import org.baywright.study.Parameter;
import org.baywright.study.Study;
import org.baywright.study.StudyResult;
import org.baywright.study.VariantResult;
import org.baywright.units.UnitSystem;

/**
 * The Study panel: sweeps of the open plan and their charts. The user types values per parameter in the
 * command line's syntax ({@code 6ft..15ft:1ft}, {@code x,y}); Run checks them (a located message beside
 * any field at fault, the text left as typed) and runs the study off the JavaFX thread with a progress
 * bar, the count done and a Cancel button. The results are two charts and a table in the plan's units:
 * steel per floor area across a chosen parameter (series by another), and steel per floor area against
 * structural depth with the Pareto front marked by its own shape and colour. Hovering a point shows the
 * variant's figures; clicking it (or double-clicking a table row) opens that variant's plan as a new
 * document.
 *
 * <p>Hosting: a node of its own, independent of {@link MainWindow}:
 * <pre>{@code
 * StudyPanel study = new StudyPanel(model::plan, plan -> openAsNewDocument(plan));
 * }</pre>
 * {@code currentPlan} is asked for the plan when Run is pressed (null: "open a plan first");
 * {@code openAsNewDocument} is called on the JavaFX thread with a variant's plan. The study runs on
 * {@code background} (by default a daemon thread of the panel's own) with all cores as workers; every
 * update of the panel happens on the JavaFX thread. {@link #dispose()} cancels a running study.
 */
public final class StudyPanel extends BorderPane {
    private final Supplier<Plan> currentPlan;
    private final Consumer<Plan> openAsNewDocument;
    private final Executor background;
    private final int threads;

    private final Map<String, TextField> fields = new LinkedHashMap<>();
    private final Map<String, Label> errors = new LinkedHashMap<>();
    private final Label generalError = new Label();
    private final Button run = new Button("Run study");
    private final Button cancel = new Button("Cancel");
    private final ProgressBar progress = new ProgressBar(0);
    private final Label progressText = new Label();
    private final Label summary = new Label();
    private final ComboBox<String> across = new ComboBox<>();
    private final ComboBox<String> groupBy = new ComboBox<>();
    private final NumberAxis acrossX = new NumberAxis();
    private final NumberAxis acrossY = new NumberAxis();
    private final ScatterChart<Number, Number> acrossChart = new ScatterChart<>(acrossX, acrossY);
    private final NumberAxis depthX = new NumberAxis();
    private final NumberAxis depthY = new NumberAxis();
    private final ScatterChart<Number, Number> depthChart = new ScatterChart<>(depthX, depthY);
    private final TableView<VariantResult> table = new TableView<>();
    private final Label frontNote = new Label("Each variant is drawn twice: at its deepest beam and at its deepest girder."
            + " Pareto front: no other variant is both lighter and shallower.");
    private final Button open = new Button("Open as new plan");
    /** Shows only the variants whose bays all meet the floor-vibration limit (AISC DG11 walking). */
    private final javafx.scene.control.CheckBox meetsVibration = new javafx.scene.control.CheckBox("Meets floor vibration");
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(false);

    private StudyPanelModel.Setup setup;
    private StudyResult result;
    private CancelToken token;
    private boolean updating;

    /** A panel that runs its studies on a daemon thread of its own. */
    public StudyPanel(Supplier<Plan> currentPlan, Consumer<Plan> openAsNewDocument) {
        this(currentPlan, openAsNewDocument, Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "baywright-study");
            t.setDaemon(true);
            return t;
        }));
    }

    /**
     * A panel that runs its studies on {@code background} (each study is one task; the task itself
     * spreads the variants over all cores).
     */
    public StudyPanel(Supplier<Plan> currentPlan, Consumer<Plan> openAsNewDocument, Executor background) {
        this.currentPlan = currentPlan;
        this.openAsNewDocument = openAsNewDocument;
        this.background = background;
        this.threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        setId("study-panel");
        getStylesheets().add(StudyPanel.class.getResource("study-panel.css").toExternalForm());
        ScrollPane inputs = new ScrollPane(inputs());
        inputs.setFitToWidth(true);
        inputs.setMinWidth(300);
        inputs.setPrefWidth(360);
        setLeft(inputs);
        setCenter(results());
        running.addListener((o, a, b) -> refreshButtons());
        refreshButtons();
        showResult();
    }

    // ---- layout -------------------------------------------------------------------------------

    private Node inputs() {
        Label title = new Label("Study");
        title.setStyle("-fx-font-weight: bold; -fx-font-size: 13px;");
        Label hint = new Label("Vary the open plan: give values to any parameters, as a range A..B:STEP or a list "
                + "a,b,c (lengths with their unit). Every combination is a full run.");
        hint.setWrapText(true);
        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(2);
        ColumnConstraints c0 = new ColumnConstraints();
        c0.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        ColumnConstraints c1 = new ColumnConstraints();
        c1.setHgrow(Priority.ALWAYS);
        grid.getColumnConstraints().setAll(c0, c1);
        int row = 0;
        for (StudyPanelModel.Field f : StudyPanelModel.FIELDS) {
            Label label = new Label(f.label());
            TextField text = new TextField();
            text.setId("study-field-" + f.key());
            text.setPromptText(f.prompt(UnitSystem.US));
            Tooltip.install(text, new Tooltip(f.label() + ": " + f.accepted()));
            text.setOnAction(e -> start());
            Label error = new Label();
            error.setId("study-error-" + f.key());
            error.getStyleClass().add("study-error");
            error.setWrapText(true);
            error.setManaged(false);
            error.setVisible(false);
            fields.put(f.key(), text);
            errors.put(f.key(), error);
            if (f.key().equals(StudyPanelModel.DEPTH_LIMIT)) {
                Label settings = new Label("Study settings");
                settings.setStyle("-fx-font-weight: bold;");
                GridPane.setMargin(settings, new Insets(8, 0, 2, 0));
                grid.add(settings, 0, row++, 2, 1);
            }
            grid.add(label, 0, row);
            grid.add(text, 1, row++);
            grid.add(error, 0, row++, 2, 1);
        }
        generalError.setId("study-error");
        generalError.getStyleClass().add("study-error");
        generalError.setWrapText(true);
        run.setId("study-run");
        run.setDefaultButton(false);
        run.setOnAction(e -> start());
        cancel.setId("study-cancel");
        cancel.setOnAction(e -> cancel());
        HBox buttons = new HBox(8, run, cancel);
        progress.setId("study-progress");
        progress.setMaxWidth(Double.MAX_VALUE);
        progressText.setId("study-progress-text");
        summary.setId("study-summary");
        summary.setWrapText(true);
        Label caution = new Label(Caution.TEXT);
        caution.setId("study-caution");
        caution.setWrapText(true);
        caution.setStyle("-fx-text-fill: #5b4a1e; -fx-font-size: 11px;");
        VBox box = new VBox(8, title, hint, grid, generalError, buttons, progress, progressText, summary, caution);
        box.setPadding(new Insets(10));
        return box;
    }

    private Node results() {
        acrossChart.setId("study-chart-across");
        acrossChart.getStyleClass().add("study-chart");
        acrossChart.setAnimated(false);
        acrossChart.setTitle("Steel per floor area across a parameter");
        acrossX.setForceZeroInRange(false);
        acrossY.setForceZeroInRange(false);
        across.setId("study-across");
        groupBy.setId("study-group");
        across.valueProperty().addListener((o, a, b) -> {
            if (!updating) {
                refreshGroups();
                drawAcross();
            }
        });
        groupBy.valueProperty().addListener((o, a, b) -> {
            if (!updating) {
                drawAcross();
            }
        });
        HBox choose = new HBox(6, new Label("Across"), across, new Label("Series by"), groupBy);
        choose.setAlignment(Pos.CENTER_LEFT);
        VBox left = new VBox(4, choose, acrossChart);
        VBox.setVgrow(acrossChart, Priority.ALWAYS);

        depthChart.setId("study-chart-depth");
        depthChart.getStyleClass().addAll("study-chart", "study-depth-chart");
        depthChart.setAnimated(false);
        depthChart.setTitle("Steel per floor area against structural depth");
        depthX.setForceZeroInRange(false);
        depthY.setForceZeroInRange(false);
        frontNote.setId("study-front-note");
        frontNote.setStyle("-fx-font-size: 11px;");
        frontNote.setWrapText(true);
        VBox right = new VBox(4, frontNote, depthChart);
        VBox.setVgrow(depthChart, Priority.ALWAYS);

        SplitPane charts = new SplitPane(left, right);
        charts.setDividerPositions(0.5);
        table.setId("study-table");
        table.setPlaceholder(new Label("Run a study to see its variants here."));
        table.setRowFactory(t -> {
            TableRow<VariantResult> r = new TableRow<>();
            r.setOnMouseClicked(e -> {
                if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2 && !r.isEmpty()) {
                    openVariant(r.getItem());
                }
            });
            return r;
        });
        open.setId("study-open");
        open.disableProperty().bind(table.getSelectionModel().selectedItemProperty().isNull());
        open.setOnAction(e -> {
            VariantResult v = table.getSelectionModel().getSelectedItem();
            if (v != null) {
                openVariant(v);
            }
        });
        Label tableNote = new Label("Sorted by steel per floor area; front D: weight–depth, P: weight–pieces."
                + " Double-click a row to open it.");
        tableNote.setStyle("-fx-font-size: 11px;");
        meetsVibration.setId("study-meets-vibration");
        meetsVibration.setDisable(true);
        meetsVibration.setOnAction(e -> {
            drawAcross();
            drawDepth();
            fillTable();
        });
        HBox tableBar = new HBox(8, open, meetsVibration, tableNote);
        tableBar.setAlignment(Pos.CENTER_LEFT);
        VBox bottom = new VBox(4, tableBar, table);
        VBox.setVgrow(table, Priority.ALWAYS);
        bottom.setPadding(new Insets(4, 6, 4, 6));
        SplitPane all = new SplitPane(charts, bottom);
        all.setOrientation(Orientation.VERTICAL);
        all.setDividerPositions(0.62);
        return all;
    }

    // ---- running ----------------------------------------------------------------------------

    /** True while a study runs. */
    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /** The last study's result (partial when cancelled), or null. */
    public StudyResult result() {
        return result;
    }

    /** The last study's setup, or null. */
    public StudyPanelModel.Setup setup() {
        return setup;
    }

    /** Cancels a running study (the panel is going away). */
    public void dispose() {
        cancel();
    }

    private void refreshButtons() {
        run.setDisable(running.get());
        cancel.setDisable(!running.get());
    }

    private Map<String, String> texts() {
        Map<String, String> t = new LinkedHashMap<>();
        fields.forEach((k, f) -> t.put(k, f.getText()));
        return t;
    }

    /** Checks the fields and, when they are fine, runs the study in the background. */
    private void start() {
        if (running.get()) {
            return;
        }
        Plan plan = currentPlan.get();
        StudyPanelModel.Checked checked = StudyPanelModel.check(plan, texts());
        errors.forEach((k, l) -> show(l, checked.errors().get(k)));
        show(generalError, checked.errors().get(""));
        if (!checked.ok()) {
            return;
        }
        StudyPanelModel.Setup s = checked.setup();
        UnitSystem us = s.units();
        for (StudyPanelModel.Field f : StudyPanelModel.FIELDS) {
            fields.get(f.key()).setPromptText(f.prompt(us));
        }
        CancelToken t = new CancelToken();
        token = t;
        setup = s;
        result = null;
        running.set(true);
        int total = s.count();
        progress.setProgress(0);
        progressText.setText(StudyPanelModel.progress(0, total));
        summary.setText("Running " + total + (total == 1 ? " variant" : " variants") + "…");
        showResult();
        AtomicInteger latest = new AtomicInteger();
        AtomicBoolean posted = new AtomicBoolean();
        background.execute(() -> {
            try {
                StudyResult r = Study.run(s.spec(), Study.catalogOf(s.spec().base()), threads, (done, all) -> {
                    latest.set(done);
                    if (!posted.getAndSet(true)) { // at most one progress update waiting on the FX thread
                        Platform.runLater(() -> {
                            posted.set(false);
                            if (token == t) {
                                int d = latest.get();
                                progress.setProgress((double) d / all);
                                progressText.setText(StudyPanelModel.progress(d, all));
                            }
                        });
                    }
                }, t);
                Platform.runLater(() -> finished(t, s, r));
            } catch (RuntimeException | Error e) {
                Platform.runLater(() -> failed(t, e));
            }
        });
    }

    private void cancel() {
        CancelToken t = token;
        if (t != null && running.get()) {
            t.cancel();
            cancel.setDisable(true);
            summary.setText("Cancelling: the variants being run finish first…");
        }
    }

    private void finished(CancelToken t, StudyPanelModel.Setup s, StudyResult r) {
        if (token != t) {
            return;
        }
        result = r;
        running.set(false);
        int done = r.variants().size();
        progress.setProgress(r.total() == 0 ? 1 : (double) done / r.total());
        progressText.setText(StudyPanelModel.progress(done, r.total()) + (r.cancelled() ? " (cancelled)" : ""));
        summary.setText(StudyPanelModel.summary(s, r));
        showResult();
    }

    private void failed(CancelToken t, Throwable e) {
        if (token != t) {
            return;
        }
        running.set(false);
        progressText.setText("Stopped");
        show(generalError, "The study could not run: " + e.getMessage());
        summary.setText("");
    }

    private static void show(Label l, String message) {
        boolean on = message != null && !message.isEmpty();
        l.setText(on ? message : "");
        l.setVisible(on);
        l.setManaged(on);
    }

    // ---- results ------------------------------------------------------------------------------

    private void showResult() {
        updating = true;
        try {
            List<String> keys = setup == null ? List.of() : setup.parameters().stream().map(Parameter::key).toList();
            String keep = across.getValue();
            across.setItems(FXCollections.observableArrayList(keys.stream().map(k -> StudyPanelModel.field(k).label()).toList()));
            across.setValue(keep != null && across.getItems().contains(keep) ? keep : across.getItems().isEmpty() ? null
                    : across.getItems().get(0));
            refreshGroups();
        } finally {
            updating = false;
        }
        meetsVibration.setDisable(!StudyPanelModel.vibrationStudied(result));
        if (meetsVibration.isDisable()) {
            meetsVibration.setSelected(false);
        }
        drawAcross();
        drawDepth();
        fillTable();
    }

    private Parameter acrossParameter() {
        return parameterOf(across.getValue());
    }

    private Parameter parameterOf(String label) {
        if (label == null || setup == null) {
            return null;
        }
        for (Parameter p : setup.parameters()) {
            if (StudyPanelModel.field(p.key()).label().equals(label)) {
                return p;
            }
        }
        return null;
    }

    private static final String NO_GROUP = "none";

    private void refreshGroups() {
        boolean was = updating;
        updating = true;
        try {
            Parameter x = acrossParameter();
            List<String> items = new ArrayList<>(List.of(NO_GROUP));
            if (x != null) {
                StudyPanelModel.groups(setup, x).forEach(p -> items.add(StudyPanelModel.field(p.key()).label()));
            }
            groupBy.setItems(FXCollections.observableArrayList(items));
            Parameter d = x == null ? null : StudyPanelModel.defaultGroup(setup, x);
            groupBy.setValue(d == null ? NO_GROUP : StudyPanelModel.field(d.key()).label());
        } finally {
            updating = was;
        }
    }

    private void drawAcross() {
        acrossChart.getData().clear();
        Parameter x = acrossParameter();
        if (result == null || x == null) {
            acrossX.setLabel("");
            acrossY.setLabel("");
            return;
        }
        UnitSystem us = setup.units();
        StudyPanelModel.XAxis axis = StudyPanelModel.xAxis(setup, x);
        acrossX.setLabel(axis.title());
        acrossY.setLabel("Steel per floor area (" + StudyPanelModel.perAreaUnit(us) + ")");
        if (axis.numeric()) {
            acrossX.setAutoRanging(true);
            acrossX.setTickLabelFormatter(null);
        } else {
            acrossX.setAutoRanging(false);
            acrossX.setLowerBound(-0.5);
            acrossX.setUpperBound(axis.categories().size() - 0.5);
            acrossX.setTickUnit(1);
            acrossX.setMinorTickVisible(false);
            acrossX.setTickLabelFormatter(new StringConverter<>() {
                @Override
                public String toString(Number n) {
                    double v = n.doubleValue();
                    int i = (int) Math.round(v);
                    return Math.abs(v - i) < 1e-9 && i >= 0 && i < axis.categories().size() ? axis.categories().get(i) : "";
                }

                @Override
                public Number fromString(String s) {
                    return axis.categories().indexOf(s);
                }
            });
        }
        Set<Integer> front = StudyPanelModel.depthFront(result);
        Map<String, List<VariantResult>> groups = StudyPanelModel.series(setup, result, x, parameterOf(groupBy.getValue()));
        for (Map.Entry<String, List<VariantResult>> e : groups.entrySet()) {
            XYChart.Series<Number, Number> series = new XYChart.Series<>();
            series.setName(e.getKey());
            for (VariantResult v : e.getValue()) {
                if (!StudyPanelModel.shown(v, meetsVibration.isSelected())) {
                    continue;
                }
                XYChart.Data<Number, Number> d = new XYChart.Data<>(StudyPanelModel.x(setup, v, x),
                        StudyPanelModel.perArea(v.weightPerArea(), us));
                d.setExtraValue(v);
                series.getData().add(d);
            }
            acrossChart.getData().add(series);
            decorate(series, front, "study-across-point");
        }
    }

    private void drawDepth() {
        depthChart.getData().clear();
        // the note says what the chart shows: nothing before a run
        frontNote.setVisible(result != null);
        frontNote.setManaged(result != null);
        if (result == null) {
            depthX.setLabel("");
            depthY.setLabel("");
            return;
        }
        UnitSystem us = setup.units();
        depthX.setLabel("Depth d of the deepest beam and girder (" + us.smallLength().symbol() + ")"
                + (setup.depthLimit() > 0 ? String.format(Locale.ROOT, ", limit %.1f %s",
                        StudyPanelModel.depth(setup.depthLimit(), us), us.smallLength().symbol()) : ""));
        depthY.setLabel("Steel per floor area (" + StudyPanelModel.perAreaUnit(us) + ")");
        Set<Integer> front = StudyPanelModel.depthFront(result);
        for (Map.Entry<StudyPanelModel.DepthSeries, List<StudyPanelModel.DepthPoint>> e
                : StudyPanelModel.depthSeries(setup, result, meetsVibration.isSelected()).entrySet()) {
            XYChart.Series<Number, Number> series = new XYChart.Series<>();
            series.setName(e.getKey().label());
            String style = "study-depth-" + e.getKey().name().toLowerCase(Locale.ROOT).replace('_', '-');
            for (StudyPanelModel.DepthPoint p : e.getValue()) {
                XYChart.Data<Number, Number> d = new XYChart.Data<>(p.depth(), p.perArea());
                d.setExtraValue(p.variant());
                // the point's node made here, with its style, so that the legend's marker copies it
                javafx.scene.layout.StackPane node = new javafx.scene.layout.StackPane();
                node.getStyleClass().addAll("study-point", style);
                d.setNode(node);
                series.getData().add(d);
            }
            depthChart.getData().add(series);
            decorate(series, front, style);
        }
        styleLegend();
        Platform.runLater(this::styleLegend);
    }

    /**
     * Gives each legend marker of the depth chart its series' style (the chart copies only its own
     * classes), so every entry shows the marker its points have.
     */
    private void styleLegend() {
        Map<String, String> styles = new LinkedHashMap<>();
        for (StudyPanelModel.DepthSeries k : StudyPanelModel.DepthSeries.values()) {
            styles.put(k.label(), "study-depth-" + k.name().toLowerCase(Locale.ROOT).replace('_', '-'));
        }
        for (Node n : depthChart.lookupAll(".chart-legend-item")) {
            if (n instanceof Label item && item.getGraphic() != null && styles.containsKey(item.getText())
                    && !item.getGraphic().getStyleClass().contains(styles.get(item.getText()))) {
                item.getGraphic().getStyleClass().add(styles.get(item.getText()));
            }
        }
    }

    /** Tooltips, clicks and style classes on the points of a series already in its chart. */
    private void decorate(XYChart.Series<Number, Number> series, Set<Integer> front, String styleClass) {
        UnitSystem us = setup.units();
        for (XYChart.Data<Number, Number> d : series.getData()) {
            VariantResult v = (VariantResult) d.getExtraValue();
            Consumer<Node> wire = node -> {
                node.getStyleClass().addAll("study-point", styleClass);
                node.setUserData(v);
                Tooltip tip = new Tooltip(StudyPanelModel.describe(v, us, front.contains(v.index()),
                        result == null ? java.util.OptionalInt.empty() : result.sameFloorAs(v)));
                tip.setShowDelay(Duration.millis(150));
                tip.setShowDuration(Duration.seconds(30));
                Tooltip.install(node, tip);
                node.setOnMouseClicked(e -> {
                    if (e.getButton() == MouseButton.PRIMARY) {
                        openVariant(v);
                    }
                });
            };
            if (d.getNode() != null) {
                wire.accept(d.getNode());
            } else {
                d.nodeProperty().addListener((o, a, b) -> {
                    if (b != null) {
                        wire.accept(b);
                    }
                });
            }
        }
    }

    private void fillTable() {
        table.getColumns().clear();
        if (result == null) {
            table.getItems().clear();
            return;
        }
        UnitSystem us = setup.units();
        Set<Integer> depthFront = StudyPanelModel.depthFront(result);
        Set<Integer> piecesFront = StudyPanelModel.piecesFront(result);
        String small = us.smallLength().symbol();
        table.getColumns().add(column("#", v -> v.index() + 1));
        for (int i = 0; i < setup.parameters().size(); i++) {
            int k = i;
            TableColumn<VariantResult, Object> c = new TableColumn<>(setup.parameters().get(i).key());
            c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(cd.getValue().settings().get(k).label()));
            c.setComparator((a, b) -> Integer.compare(labelIndex(k, a), labelIndex(k, b)));
            table.getColumns().add(c);
        }
        if (result.variants().stream().anyMatch(v -> v.infill().present())) {
            table.getColumns().add(column("Spacing (" + us.length().symbol() + ")",
                    v -> round(us.length().fromSi(v.infill().largestSpacing()), 2)));
            table.getColumns().add(column("Beams/bay", v -> v.infill().present() ? v.infill().beamsPerBay() : "—"));
        }
        table.getColumns().add(column("Steel (" + StudyPanelModel.weightUnit(us) + ")",
                v -> round(StudyPanelModel.weight(v.steelWeight(), us), 0)));
        table.getColumns().add(column(StudyPanelModel.perAreaUnit(us), v -> round(StudyPanelModel.perArea(v.weightPerArea(), us), 2)));
        table.getColumns().add(column("Beam d (" + small + ")", v -> round(StudyPanelModel.depth(v.beamDepth(), us), 1)));
        table.getColumns().add(column("Girder d (" + small + ")", v -> round(StudyPanelModel.depth(v.girderDepth(), us), 1)));
        table.getColumns().add(column("Pieces", VariantResult::pieces));
        table.getColumns().add(column("Ratio", v -> round(v.maxRatio(), 2)));
        if (StudyPanelModel.vibrationStudied(result)) {
            table.getColumns().add(column("Vibration", v -> v.vibrationChecked() ? round(v.vibrationRatio(), 2) : "—"));
        }
        table.getColumns().add(column("Problems", v -> v.message().isEmpty() ? (Object) v.problems() : "not run"));
        table.getColumns().add(column("Front", v -> (depthFront.contains(v.index()) ? "D" : "")
                + (piecesFront.contains(v.index()) ? "P" : "")));
        StudyResult shown = result;
        table.getColumns().add(column("Same as", v -> {
            var same = shown.sameFloorAs(v);
            return same.isPresent() ? "#" + (same.getAsInt() + 1) : "";
        }));
        if (setup.depthLimit() > 0) {
            table.getColumns().add(column("Depth limit", v -> StudyPanelModel.tooDeep(setup, v) ? "exceeded" : "within"));
        }
        List<VariantResult> rows = new ArrayList<>(result.variants().stream()
                .filter(v -> StudyPanelModel.shown(v, meetsVibration.isSelected())).toList());
        rows.sort(java.util.Comparator.comparingDouble((VariantResult v) -> Double.isNaN(v.weightPerArea())
                ? Double.POSITIVE_INFINITY : v.weightPerArea()).thenComparingInt(VariantResult::index));
        table.setItems(FXCollections.observableArrayList(rows));
    }

    private int labelIndex(int sweep, Object label) {
        List<String> labels = setup.spec().sweeps().get(sweep).values().stream().map(org.baywright.study.Setting::label).toList();
        return labels.indexOf(String.valueOf(label));
    }

    /** A number for a cell: shown rounded with thousands separated, sorted by its value; a dash when not a number. */
    private static Object round(double v, int decimals) {
        return Double.isFinite(v) ? new Figure(v, decimals) : "—";
    }

    /** A figure of the table. */
    private record Figure(double value, int decimals) implements Comparable<Figure> {
        @Override
        public int compareTo(Figure o) {
            return Double.compare(value, o.value);
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "%,." + decimals + "f", value);
        }
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private static TableColumn<VariantResult, Object> column(String title, Function<VariantResult, Object> value) {
        TableColumn<VariantResult, Object> c = new TableColumn<>(title);
        c.setCellValueFactory(cd -> new ReadOnlyObjectWrapper<>(value.apply(cd.getValue())));
        c.setComparator((a, b) -> {
            if (a instanceof Comparable ca && b != null && a.getClass() == b.getClass()) {
                return ca.compareTo(b);
            }
            return a instanceof Comparable ? -1 : b instanceof Comparable ? 1 : 0;
        });
        c.setStyle(title.equals("#") ? "-fx-alignment: CENTER-RIGHT;" : "");
        return c;
    }

    private void openVariant(VariantResult v) {
        if (setup == null) {
            return;
        }
        Plan plan;
        try {
            plan = setup.spec().plan(v.index());
        } catch (IllegalArgumentException e) {
            show(generalError, "Variant " + (v.index() + 1) + " cannot be opened: " + e.getMessage());
            return;
        }
        openAsNewDocument.accept(StudyPanelModel.named(plan, setup.spec().base(), v));
        summary.setText(String.format(Locale.ROOT, "Opened variant %d (%s) as a new plan. %s", v.index() + 1,
                StudyPanelModel.values(v), result == null ? "" : StudyPanelModel.summary(setup, result)));
    }
}
