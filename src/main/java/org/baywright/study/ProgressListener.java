package org.baywright.study;

/**
 * Told after each variant finishes. Called from the worker threads, one call at a time, with
 * {@code done} increasing by one each call.
 */
@FunctionalInterface
public interface ProgressListener {
    void progress(int done, int total);

    /** A listener that ignores progress. */
    ProgressListener NONE = (done, total) -> { };
}
