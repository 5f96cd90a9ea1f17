package org.baywright.ui;

import java.io.IOException;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;

/**
 * Autosave for the editor's document: ties an {@link Autosaver} to an {@link EditorModel} through the
 * model's properties alone, so the window needs no calls of its own.
 * <ul>
 *   <li>While {@link EditorModel#dirtyProperty()} is true the plan is autosaved every interval (with
 *       its {@link EditorModel#fileProperty()} as the original file).</li>
 *   <li>When it turns false (saved, or another plan opened after the unsaved-changes question, or
 *       undone back to the saved plan) the recovery file is deleted.</li>
 *   <li>{@link #close(boolean)} at the end: after a clean close (the user saved or chose to discard)
 *       the file is deleted; otherwise a last autosave is written and kept for the next start.</li>
 * </ul>
 * Uses JavaFX observable properties only (no toolkit), so it runs in a plain JVM too.
 */
public final class EditorRecovery implements AutoCloseable {
    private final EditorModel model;
    private final RecoveryStore.Session session;
    private final Autosaver autosaver;
    private final Executor ui;
    private boolean closed;

    /**
     * @param model the document
     * @param session this editor's session in the recovery folder
     * @param interval time between autosaves
     * @param ui runs a task on the model's thread ({@code Platform::runLater} in the editor)
     */
    public EditorRecovery(EditorModel model, RecoveryStore.Session session, Duration interval, Executor ui) {
        this.model = Objects.requireNonNull(model, "model");
        this.session = Objects.requireNonNull(session, "session");
        this.ui = Objects.requireNonNull(ui, "ui");
        this.autosaver = new Autosaver(session.newDocument(), interval, ui, this::unsaved,
                message -> model.messageProperty().set(message));
        model.dirtyProperty().addListener((o, was, dirty) -> {
            if (!dirty) {
                autosaver.discard();
            }
        });
    }

    private Optional<Autosaver.Snapshot> unsaved() {
        if (closed || !model.dirtyProperty().get() || model.plan() == null) {
            return Optional.empty();
        }
        return Optional.of(new Autosaver.Snapshot(model.plan(), model.fileProperty().get()));
    }

    /** Starts autosaving. */
    public void start() {
        autosaver.start();
    }

    /** The autosaver (its slot, its write count). */
    public Autosaver autosaver() {
        return autosaver;
    }

    /** The session. */
    public RecoveryStore.Session session() {
        return session;
    }

    /** On the model's thread: autosaves now if there is unsaved work. */
    public void saveNow() {
        autosaver.saveNow();
    }

    /**
     * On the model's thread: shows a plan left by an earlier session as unsaved work of this one. The
     * earlier copy is deleted only once this session's own autosave of it is on disk, so a crash in
     * between still leaves a copy.
     */
    public void recover(RecoveryStore.Entry entry) {
        model.openRecovered(entry.plan(), entry.originalFile());
        autosaver.saveNow(() -> {
            try {
                session.store().delete(entry);
            } catch (IOException e) {
                ui.execute(() -> model.messageProperty().set("The earlier autosaved copy " + entry.file()
                        + " could not be deleted (" + e.getMessage() + "); it may be offered again."));
            }
        });
    }

    /** Deletes a plan left by an earlier session, at the user's word. */
    public void discard(RecoveryStore.Entry entry) throws IOException {
        session.store().delete(entry);
    }

    /**
     * On the model's thread, when the editor ends. {@code clean}: the user answered for the unsaved
     * changes (saved them or chose to discard them) or there were none, so the recovery file goes;
     * otherwise a last autosave is written and kept. Then the session's lock file is removed.
     */
    public void close(boolean clean) {
        if (closed) {
            return;
        }
        if (clean || !model.dirtyProperty().get()) {
            autosaver.discard();
        } else {
            autosaver.saveNow();
        }
        closed = true;
        autosaver.close();
        try {
            session.close();
        } catch (IOException e) {
            // a lock file left behind names a process that is gone: the next start treats it as stale
        }
    }

    /** {@link #close(boolean)} as an unclean end: unsaved work is kept. */
    @Override
    public void close() {
        close(false);
    }
}
