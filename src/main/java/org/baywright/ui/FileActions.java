package org.baywright.ui;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Supplier;
import java.util.stream.Collectors;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuItem;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Problem;

/**
 * The File menu's actions and their dialogs: New, Open (and Open Recent), Save, Save As, the exports,
 * Exit, and the question before unsaved changes would be lost. Errors become dialogs, never stack
 * traces.
 */
final class FileActions {
    /** An export that writes one file. */
    @FunctionalInterface
    interface Exporter {
        void write(Path out) throws IOException;
    }

    private final EditorModel model;
    private final RecentFiles recent;
    private final Supplier<Window> owner;
    private final Runnable exit;
    private final TakeoffExport takeoff;
    private final UserSettings settings;

    /**
     * @param owner the window dialogs belong to (null while the window is not shown)
     * @param exit what Exit does once unsaved changes are answered for
     */
    FileActions(EditorModel model, RecentFiles recent, UserSettings settings, Supplier<Window> owner, Runnable exit) {
        this.model = model;
        this.takeoff = new TakeoffExport(model, settings);
        this.settings = settings;
        this.recent = recent;
        this.owner = owner;
        this.exit = exit;
        model.fileProperty().addListener((o, a, b) -> {
            if (b != null) {
                recent.add(b);
            }
        });
    }

    /** File › New: asks for a name, the units and the number of levels, then starts an empty plan. */
    void newPlan() {
        if (confirmDiscard()) {
            NewPlanDialog.show(owner.get(), model.units(), this::start);
        }
    }

    /** Starts a new plan from the New dialog's texts; an error names the field. */
    void newPlan(String name, String units, String levelCount, String storey) {
        start(NewPlanForm.read(name, units, levelCount, storey));
    }

    private void start(NewPlanForm.NewPlan p) {
        model.newPlan(p.name(), p.units(), p.levels(), p.storeyHeight());
        model.toolProperty().set(Tool.GRID);
    }

    /** File › Open: asks first about unsaved changes, then for a file. */
    void chooseAndOpen() {
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
        File chosen = chooser.showOpenDialog(owner.get());
        if (chosen != null) {
            open(chosen.toPath());
        }
    }

    /**
     * Opens a plan file; a file with errors is not opened, the current plan stays and a dialog lists
     * the located problems. Returns whether the file was opened.
     */
    boolean open(Path file) {
        EditorModel.OpenResult r = model.open(file);
        if (!r.opened()) {
            showProblems(file, r.problems());
        } else {
            recent.add(file);
        }
        return r.opened();
    }

    private void showProblems(Path file, List<Problem> problems) {
        Alert a = alert(Alert.AlertType.ERROR, "Baywright", file.getFileName() + " was not opened"
                + (model.plan() == null ? "." : "; the current plan stays open."));
        TextArea text = new TextArea(problems.stream().map(Problem::toString).collect(Collectors.joining("\n")));
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefRowCount(Math.min(14, Math.max(4, problems.size() + 1)));
        text.setPrefColumnCount(70);
        text.setId("open-problems");
        a.getDialogPane().setContent(new VBox(6, new Label(problems.size() == 1 ? "1 problem:" : problems.size() + " problems:"),
                text));
        a.show();
    }

    /** File › Open Recent: fills the submenu with the recent plans as it opens. */
    void fillRecent(Menu menu) {
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

    /**
     * Asks before unsaved changes would be lost: Save (then go on if it was saved), Discard, or Cancel.
     * True when it is fine to go on.
     */
    boolean confirmDiscard() {
        if (!model.dirtyProperty().get()) {
            return true;
        }
        ButtonType saveIt = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType discard = new ButtonType("Discard changes", ButtonBar.ButtonData.NO);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "The plan has changes that are not saved.", saveIt, discard,
                ButtonType.CANCEL);
        a.initOwner(owner.get());
        a.setTitle("Baywright");
        a.setHeaderText("Save the changes to " + model.plan().name() + "?");
        ButtonType answer = a.showAndWait().orElse(ButtonType.CANCEL);
        if (answer == saveIt) {
            save();
            return !model.dirtyProperty().get();
        }
        return answer == discard;
    }

    /** File › Exit: asks about unsaved changes first. */
    void exit() {
        if (confirmDiscard()) {
            exit.run();
        }
    }

    /** File › Save: to the plan's file, or Save As when it has none. */
    void save() {
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

    /** File › Save As. */
    void saveAs() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Save plan as");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Baywright plans", "*" + PlanFiles.EXTENSION));
        Path f = model.fileProperty().get();
        chooser.setInitialFileName(f == null ? "plan" + PlanFiles.EXTENSION : f.getFileName().toString());
        File chosen = chooser.showSaveDialog(owner.get());
        if (chosen == null) {
            return;
        }
        try {
            model.saveAs(chosen.toPath());
        } catch (IOException | RuntimeException e) {
            error("The plan was not saved", e);
        }
    }

    /**
     * File › Export › …: asks for the file, starting in the plan's folder (else the last export's)
     * with a name from the plan and, for a level's export, the level; then writes it off the window's
     * thread, so the window (the plan behind the dialog) stays drawn while a long export is written.
     *
     * @param level the level the export is of, or null
     * @param what the name's last word ("calculations"), or null
     * @param extension the offered name's extension
     */
    void export(String title, String level, String what, String extension, String[] patterns, Exporter exporter) {
        FileChooser chooser = chooser(title, level, what, extension);
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter(String.join(", ", patterns), patterns));
        File chosen = chooser.showSaveDialog(owner.get());
        if (chosen == null) {
            return;
        }
        write(chosen.toPath(), () -> {
            exporter.write(chosen.toPath());
            return "Wrote " + chosen.getName();
        });
    }

    /** A save dialog in the export folder with the offered name. */
    private FileChooser chooser(String title, String level, String what, String extension) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle(title);
        Path planFile = model.fileProperty().get();
        String planName = model.plan() == null ? "" : model.plan().name();
        chooser.setInitialFileName(ExportNames.name(planName, planFile, level, what, extension));
        ExportNames.folder(planFile, settings.get(UserSettings.EXPORT_FOLDER).orElse(null))
                .ifPresent(d -> chooser.setInitialDirectory(d.toFile()));
        return chooser;
    }

    /** What an export does once its file is chosen; returns the status message. */
    @FunctionalInterface
    private interface Write {
        String run() throws IOException;
    }

    /** Writes in the background, remembers the folder, and reports in the status bar or an error dialog. */
    private void write(Path out, Write w) {
        Path folder = out.toAbsolutePath().getParent();
        if (folder != null) {
            settings.put(UserSettings.EXPORT_FOLDER, folder.toString());
        }
        model.messageProperty().set("Writing " + out.getFileName() + "…");
        model.background(() -> {
            try {
                return w.run();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, done -> model.messageProperty().set(done), e -> {
            model.messageProperty().set("Nothing was exported.");
            error("Nothing was exported", e instanceof java.io.UncheckedIOException u ? u.getCause()
                    : e instanceof Exception x ? x : new RuntimeException(e));
        });
    }

    /**
     * File › Export › Takeoff: asks for the connection allowance (the last one used is offered), then
     * for the file: a workbook (.xlsx, one sheet per table) or CSV (the size × level × kind table, with
     * the totals beside it in NAME-totals.csv).
     */
    void exportTakeoff() {
        Dialog<String> ask = new Dialog<>();
        ask.initOwner(owner.get());
        ask.setTitle("Export the takeoff");
        ask.setHeaderText("Connection and miscellaneous steel allowance");
        TextField percent = new TextField(takeoff.offeredAllowance());
        percent.setId("takeoff-allowance");
        percent.setPrefColumnCount(6);
        Label error = Styles.with(new Label(), Styles.FIELD_ERROR);
        error.setWrapText(true);
        Label note = Styles.with(new Label("Added to the member and column weight and shown on its own line; 0 for none."),
                Styles.QUIET);
        note.setWrapText(true);
        VBox content = new VBox(8, new HBox(6, new Label("Allowance"), percent, new Label("%")), note, error);
        content.setPrefWidth(380);
        ask.getDialogPane().setContent(content);
        ask.getDialogPane().getStylesheets().add(Styles.sheet());
        ask.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        ask.getDialogPane().lookupButton(ButtonType.OK).addEventFilter(javafx.event.ActionEvent.ACTION, e -> {
            try {
                TakeoffExport.allowance(percent.getText());
            } catch (IllegalArgumentException x) {
                error.setText(x.getMessage() + ".");
                e.consume();
            }
        });
        ask.setResultConverter(b -> b == ButtonType.OK ? percent.getText() : null);
        javafx.application.Platform.runLater(percent::requestFocus);
        String typed = ask.showAndWait().orElse(null);
        if (typed == null) {
            return;
        }
        FileChooser chooser = chooser("Export the takeoff", null, "takeoff", ".xlsx");
        FileChooser.ExtensionFilter xlsx = new FileChooser.ExtensionFilter("Workbook, one sheet per table (*.xlsx)", "*.xlsx");
        FileChooser.ExtensionFilter csv = new FileChooser.ExtensionFilter("CSV table, totals in NAME-totals.csv (*.csv)", "*.csv");
        chooser.getExtensionFilters().addAll(xlsx, csv);
        File chosen = chooser.showSaveDialog(owner.get());
        if (chosen == null) {
            return;
        }
        Path out = withExtension(chosen.toPath(), chooser.getSelectedExtensionFilter() == csv ? ".csv" : ".xlsx");
        write(out, () -> TakeoffExport.written(takeoff.write(out, typed), typed));
    }

    /** The chosen name, with {@code ext} added when it has neither .csv nor .xlsx. */
    static Path withExtension(Path p, String ext) {
        String n = p.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        return n.endsWith(".csv") || n.endsWith(".xlsx") ? p : p.resolveSibling(p.getFileName() + ext);
    }

    private void error(String header, Exception e) {
        Alert a = alert(Alert.AlertType.ERROR, "Baywright", header);
        a.setContentText(String.valueOf(e.getMessage()));
        a.show();
    }

    private Alert alert(Alert.AlertType type, String title, String header) {
        Alert a = new Alert(type);
        a.initOwner(owner.get());
        a.setTitle(title);
        a.setHeaderText(header);
        return a;
    }
}
