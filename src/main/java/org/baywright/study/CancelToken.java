package org.baywright.study;

import java.util.concurrent.atomic.AtomicBoolean;

/** Asks a running study to stop; checked between variants (a variant being run finishes). */
public final class CancelToken {
    private final AtomicBoolean cancelled = new AtomicBoolean();

    public void cancel() {
        cancelled.set(true);
    }

    public boolean isCancelled() {
        return cancelled.get();
    }
}
