package org.baywright.ui;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.application.Platform;

/**
 * Where long work (a plan run) happens. The app runs it on a background thread and delivers the result
 * on the JavaFX thread; tests use {@link #direct()}, which runs it at once on the calling thread.
 */
public interface TaskRunner {

    /** Does {@code work}, then passes its result to {@code done} or its failure to {@code failed}. */
    <T> void submit(Supplier<T> work, Consumer<T> done, Consumer<Throwable> failed);

    /** Runs everything synchronously on the calling thread. */
    static TaskRunner direct() {
        return new TaskRunner() {
            @Override
            public <T> void submit(Supplier<T> work, Consumer<T> done, Consumer<Throwable> failed) {
                T result;
                try {
                    result = work.get();
                } catch (RuntimeException | Error e) {
                    failed.accept(e);
                    return;
                }
                done.accept(result);
            }
        };
    }

    /** One daemon worker thread; results come back on the JavaFX application thread. */
    static TaskRunner background() {
        ExecutorService pool = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "baywright-run");
            t.setDaemon(true);
            return t;
        });
        return new TaskRunner() {
            @Override
            public <T> void submit(Supplier<T> work, Consumer<T> done, Consumer<Throwable> failed) {
                pool.execute(() -> {
                    try {
                        T result = work.get();
                        Platform.runLater(() -> done.accept(result));
                    } catch (RuntimeException | Error e) {
                        Platform.runLater(() -> failed.accept(e));
                    }
                });
            }
        };
    }
}
