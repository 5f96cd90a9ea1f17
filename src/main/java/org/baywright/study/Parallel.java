package org.baywright.study;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import java.util.function.IntFunction;

/** Runs numbered variants on a pool of workers, with progress and cancel between variants. */
final class Parallel {
    private Parallel() {
    }

    static StudyResult run(int total, IntFunction<VariantResult> task, int parallelism, ProgressListener listener,
            CancelToken cancel) {
        VariantResult[] results = new VariantResult[total];
        Object lock = new Object();
        int[] done = {0};
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, parallelism));
        try {
            List<Future<?>> futures = new ArrayList<>(total);
            for (int i = 0; i < total; i++) {
                int index = i;
                futures.add(pool.submit(() -> {
                    if (cancel.isCancelled()) {
                        return;
                    }
                    VariantResult r = task.apply(index);
                    synchronized (lock) {
                        results[index] = r;
                        done[0]++;
                        listener.progress(done[0], total);
                    }
                }));
            }
            for (Future<?> f : futures) {
                try {
                    f.get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    cancel.cancel();
                    break;
                } catch (ExecutionException e) {
                    cancel.cancel();
                    throw new IllegalStateException("study stopped: " + e.getCause(), e.getCause());
                }
            }
        } finally {
            pool.shutdownNow();
        }
        List<VariantResult> finished = new ArrayList<>();
        synchronized (lock) {
            for (VariantResult r : results) {
                if (r != null) {
                    finished.add(r);
                }
            }
        }
        return new StudyResult(finished, total, finished.size() < total);
    }
}
