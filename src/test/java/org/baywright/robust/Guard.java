package org.baywright.robust;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;

/**
 * A generous guard against a hang: runs one case on a worker thread and fails it if it has not
 * finished after {@value #SECONDS} seconds. Not a speed target: a case that needs a tenth of that is
 * already far too slow to notice otherwise.
 */
final class Guard {
    /** Seconds one case may take before it counts as hung. */
    static final int SECONDS = 60;

    private static final ExecutorService WORKER = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "robust-guard");
        t.setDaemon(true);
        return t;
    });

    private Guard() {
    }

    /** The value of {@code task}; anything it throws (exception or error) is rethrown as an AssertionError. */
    static <T> T call(String what, Callable<T> task) {
        Future<T> f = WORKER.submit(task);
        try {
            return f.get(SECONDS, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            f.cancel(true);
            throw new AssertionError(what + ": still running after " + SECONDS + " s (hung?)");
        } catch (ExecutionException e) {
            throw new AssertionError(what + " threw " + e.getCause(), e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError(what + ": interrupted", e);
        }
    }
}
