package org.baywright.ui;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.baywright.plan.Problem;

/**
 * The Baywright editor. Opens the plan named as the first argument; with none, the demo plan
 * ({@value #DEMO} in the working folder, else the copy built into the jar), already run.
 *
 * <p>Unsaved work is autosaved to the recovery folder ({@link RecoveryStore}, {@link EditorRecovery});
 * at start, plans autosaved by an editor that did not end normally are offered ({@link RecoveryDialog}).
 */
public final class BaywrightApp extends Application {
    /** The demo plan, relative to the project folder. */
    public static final String DEMO = "plans/harbourview-offices.bay.json";
    /** The demo plan inside the jar. */
    static final String DEMO_RESOURCE = "/org/baywright/ui/demo/harbourview-offices.bay.json";

    private final RecoveryStore store;
    private final Duration interval;
    private final List<String> args;
    private final TaskRunner runner;

    private EditorModel model;
    private MainWindow window;
    private Stage stage;
    private EditorRecovery recovery;
    private Duration every;
    /** True once the user has answered for unsaved changes on the way out (saved, discarded, or there were none). */
    private boolean answered;

    /** The editor as launched: recovery folder and autosave interval from the system properties. */
    public BaywrightApp() {
        this(null, null, null, null);
    }

    /**
     * An editor with its recovery folder, autosave interval, arguments and run executor given (tests);
     * a null takes what {@link #BaywrightApp()} takes.
     */
    BaywrightApp(RecoveryStore store, Duration interval, List<String> args, TaskRunner runner) {
        this.store = store;
        this.interval = interval;
        this.args = args;
        this.runner = runner;
    }

    @Override
    public void start(Stage stage) {
        this.stage = stage;
        model = new EditorModel(runner != null ? runner : TaskRunner.background());
        window = new MainWindow(model, () -> {
            answered = true; // MainWindow's Exit asks about unsaved changes before it calls this
            stage.close();
        });
        // 1440 × 900, or less on a smaller screen
        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getVisualBounds();
        Scene scene = new Scene(window.root(), Math.min(1440, screen.getWidth()), Math.min(900, screen.getHeight()));
        stage.setScene(scene);
        stage.titleProperty().bind(javafx.beans.binding.Bindings.createStringBinding(window::title,
                model.planProperty(), model.fileProperty()));
        stage.setOnCloseRequest(e -> {
            if (window.confirmDiscard()) {
                answered = true;
            } else {
                e.consume();
            }
        });
        window.setNewWindowOpener(this::openInNewWindow);
        stage.show();
        List<String> named = args != null ? args : getParameters() == null ? List.of() : getParameters().getRaw();
        openFirst(window, model, named.isEmpty() ? null : Path.of(named.get(0)));
        startRecovery();
    }

    /** Starts autosaving, then looks for work left by earlier sessions in the background and offers it. */
    private void startRecovery() {
        RecoveryStore s = store != null ? store : new RecoveryStore(RecoveryStore.defaultDir());
        Duration every = interval != null ? interval
                : Autosaver.intervalFrom(System.getProperty(Autosaver.INTERVAL_PROPERTY), w -> {
                    System.err.println("baywright: " + w);
                    model.messageProperty().set(w);
                });
        this.every = every;
        RecoveryStore.Session session;
        try {
            session = s.open();
        } catch (IOException | RuntimeException e) {
            String why = "The recovery folder " + s.dir() + " cannot be used (" + e + "), so unsaved changes are not"
                    + " autosaved in this session: save often, or start Baywright with -D" + RecoveryStore.DIR_PROPERTY
                    + "=<a folder you can write to>.";
            System.err.println("baywright: " + why);
            javafx.scene.control.Alert a = new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.WARNING, why);
            a.initOwner(stage);
            a.setTitle("Baywright");
            a.setHeaderText("Autosave is off");
            a.show();
            return;
        }
        recovery = new EditorRecovery(model, session, every, Platform::runLater);
        recovery.start();
        Thread scan = new Thread(() -> {
            RecoveryStore.LeftOver found = s.findLeftOver(session);
            if (!found.isEmpty()) {
                Platform.runLater(() -> offer(found));
            }
        }, "baywright-recovery-scan");
        scan.setDaemon(true);
        scan.start();
    }

    private void offer(RecoveryStore.LeftOver found) {
        if (recovery == null || recovery.session().isClosed()) {
            return;
        }
        RecoveryDialog.show(stage, found, entry -> {
            if (!window.confirmDiscard()) {
                return false;
            }
            recovery.recover(entry);
            return true;
        }, entry -> {
            try {
                recovery.discard(entry);
                return true;
            } catch (IOException e) {
                model.messageProperty().set(entry.file() + " could not be deleted: " + e.getMessage());
                return false;
            }
        });
    }

    /**
     * Ends autosaving: after a clean close the recovery file is deleted, otherwise a last autosave is
     * kept for the next start; the session's lock file goes either way.
     */
    @Override
    public void stop() {
        if (recovery != null) {
            recovery.close(answered);
        }
    }

    /** The editor's model (tests). */
    EditorModel model() {
        return model;
    }

    /** The main window (tests). */
    MainWindow window() {
        return window;
    }

    /** The autosave of the open document; null when autosave is off (tests). */
    EditorRecovery recovery() {
        return recovery;
    }

    /**
     * Opens a plan in a window of its own as a new, unsaved document (a study variant), with its own
     * undo history and, when autosave is on, its own recovery copy in this session.
     */
    void openInNewWindow(org.baywright.plan.Plan plan) {
        Stage s = new Stage();
        EditorModel m = new EditorModel(runner != null ? runner : TaskRunner.background());
        boolean[] clean = {false};
        MainWindow w = new MainWindow(m, () -> {
            clean[0] = true;
            s.close();
        });
        w.setNewWindowOpener(this::openInNewWindow);
        s.setScene(new Scene(w.root(), stage.getScene().getWidth(), stage.getScene().getHeight()));
        // beside the first window, not hidden exactly on top of it; each further one a step further
        double step = 36 * (others.size() + 1);
        s.setX(stage.getX() + step);
        s.setY(stage.getY() + step);
        s.titleProperty().bind(javafx.beans.binding.Bindings.createStringBinding(w::title, m.planProperty(), m.fileProperty()));
        s.setOnCloseRequest(e -> {
            if (w.confirmDiscard()) {
                clean[0] = true;
            } else {
                e.consume();
            }
        });
        s.show();
        m.openUnsaved(plan, "Opened " + plan.name() + " as a new plan; save it to keep it.");
        if (recovery != null && !recovery.session().isClosed()) {
            EditorRecovery r = new EditorRecovery(m, recovery.session(), every, Platform::runLater);
            r.start();
            s.setOnHidden(e -> r.close(clean[0]));
        }
        others.add(s);
    }

    /** Windows opened besides the first (tests). */
    final List<Stage> others = new java.util.ArrayList<>();

    /** Opens the named plan, or the demo when none is named. */
    static void openFirst(MainWindow window, EditorModel model, Path file) {
        if (file != null) {
            window.open(file);
            return;
        }
        Path demo = Path.of(DEMO);
        if (Files.isRegularFile(demo)) {
            window.open(demo);
            return;
        }
        try (InputStream in = BaywrightApp.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in != null) {
                model.openText(new String(in.readAllBytes(), StandardCharsets.UTF_8), "harbourview-offices.bay.json");
            }
        } catch (IOException e) {
            model.problems().setAll(List.of(Problem.error("io", "", "", "the built-in demo plan could not be read: " + e.getMessage())));
        }
    }

    public static void main(String[] args) {
        StartupLog.quietClasspathNotice();
        launch(args);
    }
}
