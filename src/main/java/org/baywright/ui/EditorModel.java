package org.baywright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * The state of the main window, without any controls: the open plan and its file, the latest run, the
 * level shown and the selected member. Runs go through a {@link TaskRunner}; a run that finishes after
 * a newer plan was opened is dropped.
 *
 * <p>Properties are JavaFX observable values (from {@code javafx.base}, which needs no toolkit), so the
 * model is tested with plain JUnit and bound by the window.
 */
public final class EditorModel {
    private final TaskRunner runner;
    private final ObjectProperty<Plan> plan = new SimpleObjectProperty<>(this, "plan");
    private final ObjectProperty<Path> file = new SimpleObjectProperty<>(this, "file");
    private final ObjectProperty<RunResult> run = new SimpleObjectProperty<>(this, "run");
    private final StringProperty level = new SimpleStringProperty(this, "level");
    private final StringProperty selected = new SimpleStringProperty(this, "selected");
    private final BooleanProperty running = new SimpleBooleanProperty(this, "running");
    private final StringProperty message = new SimpleStringProperty(this, "message", "");
    private final ObservableList<Problem> problems = FXCollections.observableArrayList();
    private final javafx.collections.ObservableSet<String> selection = FXCollections.observableSet(new java.util.LinkedHashSet<>());
    private final ObjectProperty<Tool> tool = new SimpleObjectProperty<>(this, "tool", Tool.SELECT);
    private final ToolSettings toolSettings = new ToolSettings();
    private final BooleanProperty showReactions = new SimpleBooleanProperty(this, "showReactions");
    private final BooleanProperty showTributary = new SimpleBooleanProperty(this, "showTributary");
    private final BooleanProperty showVibration = new SimpleBooleanProperty(this, "showVibration");
    /** The bay picked on the canvas while View › Floor vibration is on (its id), or null. */
    private final StringProperty selectedBay = new SimpleStringProperty(this, "selectedBay");
    private final javafx.beans.property.IntegerProperty opened = new javafx.beans.property.SimpleIntegerProperty(this, "opened");
    private final ObjectProperty<Problem> shownProblem = new SimpleObjectProperty<>(this, "shownProblem");
    /** Milliseconds from each edit to its run on screen, newest last (at most {@value #LATENCY_KEPT}). */
    private final java.util.ArrayDeque<Double> latencies = new java.util.ArrayDeque<>();
    static final int LATENCY_KEPT = 500;
    private List<Problem> fileProblems = List.of();
    private final EditHistory<Plan> history = new EditHistory<>(200);
    private final BooleanProperty dirty = new SimpleBooleanProperty(this, "dirty");
    private final BooleanProperty canUndo = new SimpleBooleanProperty(this, "canUndo");
    private final BooleanProperty canRedo = new SimpleBooleanProperty(this, "canRedo");
    /** The plan as last saved or opened, to tell whether there are unsaved changes. */
    private Plan savedPlan;
    /** Read by the run thread to skip a stale run: volatile. */
    private volatile long generation;
    /** The runs of the document shown, with its floor designs kept for the next edit; a new one per document. */
    private DocumentRuns runs = new DocumentRuns();

    public EditorModel(TaskRunner runner) {
        this.runner = Objects.requireNonNull(runner, "runner");
        level.addListener((o, was, now) -> selectedBay.set(null));
        showVibration.addListener((o, was, now) -> {
            if (!now) {
                selectedBay.set(null);
            }
        });
        selection.addListener((javafx.collections.SetChangeListener<String>) c -> {
            if (!selection.isEmpty()) {
                selectedBay.set(null);
            }
        });
        level.addListener((o, was, now) -> {
            String id = selected.get();
            if (id != null && currentMembers().stream().noneMatch(m -> m.id().equals(id))) {
                selected.set(null);
            }
            selection.clear();
        });
        selected.addListener((o, was, now) -> {
            if (now == null) {
                selection.clear();
            } else if (!selection.contains(now)) {
                selection.clear();
                selection.add(now);
            }
        });
    }

    /** What opening a file gave: whether the plan was taken, and the file's problems (errors and warnings). */
    public record OpenResult(boolean opened, List<Problem> problems) {
        public OpenResult {
            problems = List.copyOf(problems);
        }
    }

    /**
     * Opens a plan file and runs it. A file with errors is not opened: the current plan stays and the
     * errors are returned for the caller to show.
     */
    public OpenResult open(Path path) {
        return take(PlanFiles.read(path), path);
    }

    /** Opens plan text that has no file (the built-in demo); Save then asks for a file. */
    public OpenResult openText(String json, String sourceName) {
        return take(PlanFiles.read(json, sourceName), null);
    }

    private OpenResult take(PlanReadResult read, Path path) {
        if (!read.ok()) {
            return new OpenResult(false, read.problems());
        }
        setPlan(read.plan().orElseThrow(), path, read.problems());
        return new OpenResult(true, read.problems());
    }

    /** Shows a plan (already read) and starts its run. */
    public void setPlan(Plan p, Path path, List<Problem> warnings) {
        Objects.requireNonNull(p, "plan");
        fileProblems = List.copyOf(warnings);
        selected.set(null);
        selection.clear();
        run.set(null);
        file.set(path);
        // the level first, so that whoever redraws on the new plan sees a level of it
        String keep = level.get();
        boolean has = p.levels().stream().anyMatch(l -> l.name().equals(keep));
        level.set(has ? keep : p.levels().isEmpty() ? null : p.levels().get(0).name());
        plan.set(p);
        toolSettings.defaultsFor(units());
        opened.set(opened.get() + 1);
        history.reset(p);
        runs = new DocumentRuns();
        savedPlan = p;
        updateEditState();
        problems.setAll(fileProblems);
        rerun();
    }

    /**
     * Shows a plan recovered from an autosave: it runs like an opened plan but counts as unsaved, so
     * closing it asks first. {@code path} is the file it was autosaved from (null when it had none).
     */
    public void openRecovered(Plan p, Path path) {
        setPlan(p, path, List.of());
        savedPlan = null;
        updateEditState();
        message.set("Recovered unsaved work; save it to keep it.");
    }

    /**
     * Shows a plan that has no file yet as a new document (a study variant): it runs, counts as unsaved
     * and Save asks for a file.
     */
    public void openUnsaved(Plan p, String note) {
        setPlan(p, null, List.of());
        savedPlan = null;
        updateEditState();
        message.set(note);
    }

    // ---- edits, undo and redo: a plan is a value, an edit is the next value --------------------

    /** Applies an edit (the edited plan) with a label for the Edit menu, and runs it. */
    public void apply(Plan edited, String label) {
        Objects.requireNonNull(edited, "edited");
        if (plan.get() == null || edited.equals(plan.get())) {
            return;
        }
        history.push(edited, label);
        showEdited(edited);
    }

    /** Undoes the last edit; false when there is nothing to undo. */
    public boolean undo() {
        return history.undo().map(p -> {
            showEdited(p);
            return true;
        }).orElse(false);
    }

    /** Redoes the last undone edit; false when there is nothing to redo. */
    public boolean redo() {
        return history.redo().map(p -> {
            showEdited(p);
            return true;
        }).orElse(false);
    }

    private void showEdited(Plan p) {
        plan.set(p);
        // keep what is still there selected
        Optional<Floor> f = currentFloor();
        selection.removeIf(id -> !exists(p, f, id));
        if (selected.get() != null && !exists(p, f, selected.get())) {
            selected.set(null);
        }
        updateEditState();
        rerun();
    }

    private static boolean exists(Plan p, Optional<Floor> f, String id) {
        if (p.columns().stream().anyMatch(c -> c.id().equals(id))) {
            return true;
        }
        if (f.isEmpty()) {
            return false;
        }
        Floor fl = f.get();
        String base = id.contains("/") ? id.substring(0, id.indexOf('/')) : id;
        return fl.members().stream().anyMatch(m -> m.id().equals(id)) || fl.infills().stream().anyMatch(i -> i.id().equals(base))
                || fl.openings().stream().anyMatch(o -> o.id().equals(id)) || fl.areaLoads().stream().anyMatch(a -> a.id().equals(id))
                || fl.lineLoads().stream().anyMatch(l -> l.id().equals(id)) || fl.pointLoads().stream().anyMatch(q -> q.id().equals(id))
                || fl.decks().stream().anyMatch(d -> d.id().equals(id));
    }

    /**
     * Applies an edit given as a function of the current plan. An edit the plan refuses (an
     * {@link IllegalArgumentException} from {@link org.baywright.plan.PlanEdits}) changes nothing and
     * its reason becomes the message; returns whether the plan changed.
     */
    public boolean edit(java.util.function.UnaryOperator<Plan> change, String label) {
        Plan p = plan.get();
        if (p == null) {
            message.set("No plan is open: use File › New or File › Open.");
            return false;
        }
        Plan next;
        try {
            next = change.apply(p);
        } catch (IllegalArgumentException e) {
            message.set("Not done: " + e.getMessage() + ".");
            return false;
        }
        if (next.equals(p)) {
            return false;
        }
        apply(next, label);
        message.set(label + ".");
        return true;
    }

    /** The id of the floor layout at the current level. */
    public String currentFloorId() {
        return currentFloor().map(Floor::id).orElse(null);
    }

    /** The objects selected on the canvas (members, columns, loads, openings), the primary one first. */
    public javafx.collections.ObservableSet<String> selection() {
        return selection;
    }

    /** Adds an object to the selection, or takes it out when it is in (shift-click). */
    public void toggleSelected(String id) {
        if (selection.contains(id)) {
            selection.remove(id);
            if (id.equals(selected.get())) {
                selected.set(selection.isEmpty() ? null : selection.iterator().next());
            }
        } else {
            selection.add(id);
            if (selected.get() == null) {
                selected.set(id);
            }
        }
    }

    /** Selects several objects at once (a box selection); the first is the primary. */
    public void selectAll(java.util.Collection<String> ids, boolean add) {
        if (!add) {
            selected.set(null);
            selection.clear();
        }
        selection.addAll(ids);
        if (selected.get() == null && !selection.isEmpty()) {
            selected.set(selection.iterator().next());
        }
    }

    /** Deletes the selected objects (one undoable edit). */
    public boolean deleteSelection() {
        if (selection.isEmpty()) {
            return false;
        }
        List<String> ids = List.copyOf(selection);
        String floorId = currentFloorId();
        return edit(p -> org.baywright.plan.PlanEdits.delete(p, floorId, ids),
                ids.size() == 1 ? "Deleted " + ids.get(0) : "Deleted " + ids.size() + " objects");
    }

    public ObjectProperty<Tool> toolProperty() {
        return tool;
    }

    /** The options of the drawing tools (grid spacings, infill spacing, load values…). */
    public ToolSettings toolSettings() {
        return toolSettings;
    }

    /** Whether the canvas writes end reactions at member ends. */
    public BooleanProperty showReactionsProperty() {
        return showReactions;
    }

    /** Whether the canvas shades the members' tributary areas. */
    public BooleanProperty showTributaryProperty() {
        return showTributary;
    }

    /** Whether the canvas tints each bay by its floor-vibration ratio (View › Floor vibration). */
    public BooleanProperty showVibrationProperty() {
        return showVibration;
    }

    /** The id of the bay picked on the canvas (View › Floor vibration on, no member under the pointer), or null. */
    public StringProperty selectedBayProperty() {
        return selectedBay;
    }

    /** The floor-vibration checks of the bays of the current level, empty before a run. */
    public List<org.baywright.takedown.BayResult> currentBays() {
        return BayView.of(run.get(), level.get());
    }

    /** The check of the picked bay at the current level, if one is picked. */
    public Optional<org.baywright.takedown.BayResult> selectedBayResult() {
        String id = selectedBay.get();
        return id == null ? Optional.empty() : currentBays().stream().filter(b -> b.bay().id().equals(id)).findFirst();
    }

    /** Counts documents shown (opened, new, recovered); edits do not change it. */
    public javafx.beans.property.ReadOnlyIntegerProperty openedProperty() {
        return opened;
    }

    /** The problem picked in the Problems panel, drawn highlighted on the canvas. */
    public ObjectProperty<Problem> shownProblemProperty() {
        return shownProblem;
    }

    /**
     * Shows a problem picked in the Problems panel: it is drawn highlighted, and the member (at this
     * level) or column it names is selected. Null shows none.
     */
    public void showProblem(Problem p) {
        shownProblem.set(p);
        if (p != null && !p.objectId().isEmpty() && (currentMembers().stream().anyMatch(m -> m.id().equals(p.objectId()))
                || plan() != null && plan().columns().stream().anyMatch(c -> c.id().equals(p.objectId())))) {
            select(p.objectId());
        }
    }

    /** The floor designs kept for this document's next run (null before its first run; tests). */
    org.baywright.takedown.FloorCache floorCache() {
        return runs.cache();
    }

    /** Edit-to-screen times of the latest runs, ms, oldest first. */
    public List<Double> latencies() {
        synchronized (latencies) {
            return List.copyOf(latencies);
        }
    }

    /** Starts a new, empty plan (the caller asks about unsaved changes first). */
    public void newPlan(String name, UnitSystem units, int levels, double storeyHeight) {
        setPlan(org.baywright.plan.PlanEdits.blank(name, units == UnitSystem.SI ? "si" : "us", levels, storeyHeight), null,
                List.of());
        message.set("New plan: type the grid spacings (Grid tool) to start.");
    }

    private void updateEditState() {
        dirty.set(plan.get() != null && !plan.get().equals(savedPlan));
        canUndo.set(history.canUndo());
        canRedo.set(history.canRedo());
    }

    /** True while the plan differs from the one last opened or saved. */
    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo;
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo;
    }

    /** Label of the edit undo would revert ("" when none). */
    public String undoLabel() {
        return history.undoLabel();
    }

    /** Runs the current plan again. */
    public void rerun() {
        Plan p = plan.get();
        if (p == null) {
            return;
        }
        long gen = ++generation;
        long started = System.nanoTime();
        running.set(true);
        message.set("Running…");
        DocumentRuns runs = this.runs;
        runner.submit(() -> generation == gen ? runs.run(p) : null, r -> {
            if (gen == generation && r != null) {
                running.set(false);
                run.set(r);
                List<Problem> all = new ArrayList<>(fileProblems);
                all.addAll(r.problems());
                problems.setAll(all);
                message.set(r.takedown() == null ? "The plan could not be run; see Problems." : "Run complete.");
                // after every listener has redrawn (canvas, panels, status bar)
                synchronized (latencies) {
                    latencies.addLast((System.nanoTime() - started) / 1e6);
                    if (latencies.size() > LATENCY_KEPT) {
                        latencies.removeFirst();
                    }
                }
            }
        }, e -> {
            if (gen == generation) {
                running.set(false);
                message.set("The run failed: " + e);
            }
        });
    }

    /**
     * Does work off the window's thread (an export being written) with the runner the runs use, then
     * reports on the window's thread; in tests the runner does it at once.
     */
    public <T> void background(java.util.function.Supplier<T> work, java.util.function.Consumer<T> done,
            java.util.function.Consumer<Throwable> failed) {
        runner.submit(work, done, failed);
    }

    /** Writes the plan to its file. */
    public void save() throws IOException {
        Path f = file.get();
        if (f == null) {
            throw new IllegalStateException("the plan has no file yet; use Save As");
        }
        PlanFiles.write(plan.get(), f);
        savedPlan = plan.get();
        updateEditState();
        message.set("Saved " + f.getFileName() + ".");
    }

    /** Writes the plan to a new file, which becomes its file. */
    public void saveAs(Path f) throws IOException {
        Objects.requireNonNull(f, "file");
        if (plan.get() == null) {
            throw new IllegalStateException("no plan is open");
        }
        PlanFiles.write(plan.get(), f);
        file.set(f);
        savedPlan = plan.get();
        updateEditState();
        message.set("Saved " + f.getFileName() + ".");
    }

    /** The level names, bottom to top. */
    // ---- exports: the same entry points as the command line's design --drawing/--report/--takeoff/--schedule

    /** Writes the framing plan of the current level; the format follows the extension (.svg, .png, .pdf). */
    public void exportDrawing(Path out) throws java.io.IOException {
        RunResult r = requireRun();
        String lv = levelProperty().get();
        org.baywright.report.drawing.DrawingExport.write(r, lv, out,
                org.baywright.report.drawing.DrawingOptions.defaults().withUnits(units())
                        .withDate(java.time.LocalDate.now().toString()));
    }

    /** Writes the calculation package (PDF). */
    public void exportPackage(Path out) throws java.io.IOException {
        RunResult r = requireRun();
        org.baywright.report.pdf.CalculationPackage.write(r, out, org.baywright.report.pdf.PackageOptions.of(units())
                .withProject(org.baywright.report.pdf.ProjectInfo.named(r.plan().name(), java.time.LocalDate.now())));
    }

    /**
     * Writes the steel takeoff with a connection allowance in percent, as the command line's
     * {@code design --takeoff} does ({@link org.baywright.report.workbook.TakeoffFiles}): a name ending in
     * {@code .xlsx} gets a workbook (one sheet per table); any other name gets the tidy size × level ×
     * kind table as CSV and the totals beside it in {@code NAME-totals.csv}. Returns the files written.
     */
    public List<Path> exportTakeoff(Path out, double allowancePercent) throws java.io.IOException {
        RunResult r = requireRun();
        org.baywright.report.workbook.TakeoffFiles.write(org.baywright.report.Takeoff.of(r, allowancePercent), units(),
                r.plan().name(), out);
        return org.baywright.report.workbook.TakeoffFiles.workbook(out) ? List.of(out)
                : List.of(out, org.baywright.report.workbook.TakeoffFiles.totalsFile(out));
    }

    /** Writes the column schedule (CSV). */
    public void exportSchedule(Path out) throws java.io.IOException {
        java.nio.file.Files.writeString(out, org.baywright.report.ColumnSchedule.csv(requireRun(), units()),
                java.nio.charset.StandardCharsets.UTF_8);
    }

    private RunResult requireRun() {
        RunResult r = run();
        if (r == null || r.takedown() == null) {
            throw new IllegalStateException("the plan has not been designed yet; nothing to export");
        }
        return r;
    }

    public List<String> levelNames() {
        Plan p = plan.get();
        return p == null ? List.of() : p.levels().stream().map(Level::name).toList();
    }

    /** The floor layout at the current level. */
    public Optional<Floor> currentFloor() {
        Plan p = plan.get();
        if (p == null || level.get() == null) {
            return Optional.empty();
        }
        return p.levels().stream().filter(l -> l.name().equals(level.get())).findFirst()
                .flatMap(l -> p.floor(l.floor()));
    }

    /** The designed members at the current level (infill beams included), empty before a run. */
    public List<MemberResult> currentMembers() {
        RunResult r = run.get();
        if (r == null || r.takedown() == null || level.get() == null) {
            return List.of();
        }
        String floor = r.takedown().levelFloors().get(level.get());
        return floor == null ? List.of() : r.takedown().members().getOrDefault(floor, List.of());
    }

    /** The columns that pass through or stop at the current level. */
    public List<Column> currentColumns() {
        Plan p = plan.get();
        if (p == null || level.get() == null) {
            return List.of();
        }
        List<String> names = levelNames();
        int here = names.indexOf(level.get());
        return p.columns().stream().filter(c -> {
            int top = c.topLevel() == null || c.topLevel().isBlank() ? names.size() - 1 : names.indexOf(c.topLevel());
            return top < 0 || here <= top;
        }).toList();
    }

    /** The result of the selected member at the current level. */
    public Optional<MemberResult> selectedResult() {
        String id = selected.get();
        return id == null ? Optional.empty() : currentMembers().stream().filter(m -> m.id().equals(id)).findFirst();
    }

    /** Selects a member by id (null clears the selection). */
    public void select(String memberId) {
        selected.set(memberId);
    }

    /** The unit system the plan is written in. */
    public UnitSystem units() {
        Plan p = plan.get();
        return p == null ? UnitSystem.US : org.baywright.run.DesignBasis.unitsOf(p);
    }

    public ReadOnlyObjectProperty<Plan> planProperty() {
        return plan;
    }

    public ReadOnlyObjectProperty<Path> fileProperty() {
        return file;
    }

    public ReadOnlyObjectProperty<RunResult> runProperty() {
        return run;
    }

    public StringProperty levelProperty() {
        return level;
    }

    public StringProperty selectedProperty() {
        return selected;
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return running;
    }

    public StringProperty messageProperty() {
        return message;
    }

    /** The file's warnings and the run's problems, in that order. */
    public ObservableList<Problem> problems() {
        return problems;
    }

    public Plan plan() {
        return plan.get();
    }

    public RunResult run() {
        return run.get();
    }
}
