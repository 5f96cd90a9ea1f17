package org.baywright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.baywright.plan.Plan;

/**
 * Writes one document's unsaved plan to its {@link RecoveryStore.Slot} at an interval. No JavaFX: the
 * editor passes {@code Platform::runLater} as the UI thread, tests pass a direct executor.
 *
 * <p>Every interval, on the UI thread, it asks the document for a snapshot of its unsaved work (a plan
 * is an immutable value, so taking it is instant) and hands the snapshot to its own background writer
 * thread; the UI thread never waits for the disk. Writes and deletions run in the order they were
 * asked for on the UI thread, so a write taken before a save can never recreate the recovery file
 * after the save deleted it. A snapshot equal to the last one written is not written again.
 *
 * <p>Call {@link #saveNow()}, {@link #saveNow(Runnable)} and {@link #discard()} on the UI thread.
 */
public final class Autosaver implements AutoCloseable {
    /** System property: seconds between autosaves (a positive number). */
    public static final String INTERVAL_PROPERTY = "baywright.autosave.seconds";
    /** The interval when the property is not set. */
    public static final Duration DEFAULT_INTERVAL = Duration.ofSeconds(60);
    /** The longest interval accepted: a day. */
    static final Duration LONGEST = Duration.ofDays(1);

    /**
     * Unsaved work to autosave.
     *
     * @param plan the plan as shown
     * @param originalFile the file it was opened from or last saved to; null when it has none
     */
    public record Snapshot(Plan plan, Path originalFile) {
        public Snapshot {
            Objects.requireNonNull(plan, "plan");
        }
    }

    private final RecoveryStore.Slot slot;
    private final Duration interval;
    private final Executor ui;
    private final Supplier<Optional<Snapshot>> unsaved;
    private final Consumer<String> report;
    private final ScheduledExecutorService timer;
    private final ExecutorService writer;
    private final AtomicLong writes = new AtomicLong();
    /** The snapshot in the slot now (writer thread only). */
    private Snapshot written;
    /** True after a failed write until the next good one (writer thread only). */
    private boolean failing;
    private volatile boolean started;

    /**
     * @param slot where this document's recovery files go
     * @param interval time between autosaves
     * @param ui runs a task on the thread that owns the document (the JavaFX thread in the editor)
     * @param unsaved on the UI thread: the unsaved work, or empty when everything is saved
     * @param report on the UI thread: a message for the user when an autosave fails, and when it works again
     */
    public Autosaver(RecoveryStore.Slot slot, Duration interval, Executor ui, Supplier<Optional<Snapshot>> unsaved,
            Consumer<String> report) {
        this.slot = Objects.requireNonNull(slot, "slot");
        this.interval = Objects.requireNonNull(interval, "interval");
        if (interval.isNegative() || interval.isZero()) {
            throw new IllegalArgumentException("the autosave interval must be positive, not " + interval);
        }
        this.ui = Objects.requireNonNull(ui, "ui");
        this.unsaved = Objects.requireNonNull(unsaved, "unsaved");
        this.report = Objects.requireNonNull(report, "report");
        this.timer = Executors.newSingleThreadScheduledExecutor(r -> daemon(r, "baywright-autosave-timer"));
        this.writer = Executors.newSingleThreadExecutor(r -> daemon(r, "baywright-autosave"));
    }

    private static Thread daemon(Runnable r, String name) {
        Thread t = new Thread(r, name);
        t.setDaemon(true);
        return t;
    }

    /**
     * The interval named by {@value #INTERVAL_PROPERTY}'s value {@code text}: seconds, a positive
     * number up to a day (decimals allowed). Empty or absent gives {@link #DEFAULT_INTERVAL}; anything
     * else gives the default too, and a message to {@code warning} that names the property, the text
     * and what is allowed.
     */
    public static Duration intervalFrom(String text, Consumer<String> warning) {
        if (text == null || text.isBlank()) {
            return DEFAULT_INTERVAL;
        }
        String t = text.trim();
        double seconds = t.matches("[0-9]{1,9}(\\.[0-9]{0,9})?|\\.[0-9]{1,9}") ? Double.parseDouble(t) : Double.NaN;
        if (!(seconds > 0) || seconds > LONGEST.toSeconds()) {
            warning.accept(INTERVAL_PROPERTY + ": \"" + t + "\" is not a number of seconds greater than 0 and at most "
                    + LONGEST.toSeconds() + " (for example 60 or 2.5); autosaving every "
                    + DEFAULT_INTERVAL.toSeconds() + " s");
            return DEFAULT_INTERVAL;
        }
        return Duration.ofNanos(Math.max(1_000_000L, Math.round(seconds * 1e9)));
    }

    /** Starts the timer: the first autosave comes one interval from now. */
    public void start() {
        if (started) {
            return;
        }
        started = true;
        long nanos = interval.toNanos();
        try {
            timer.scheduleWithFixedDelay(() -> ui.execute(this::saveNow), nanos, nanos, TimeUnit.NANOSECONDS);
        } catch (RejectedExecutionException e) {
            // closed already
        }
    }

    /** The interval. */
    public Duration interval() {
        return interval;
    }

    /** The document's recovery files. */
    public RecoveryStore.Slot slot() {
        return slot;
    }

    /** How many autosaves have been written so far. */
    public long writes() {
        return writes.get();
    }

    /** On the UI thread: autosaves the unsaved work now, if there is any (in the background). */
    public void saveNow() {
        saveNow(null);
    }

    /**
     * On the UI thread: autosaves the unsaved work now, then, once it is on disk, runs {@code then} on
     * the writer thread. When there is nothing unsaved, or the write fails, {@code then} does not run.
     */
    public void saveNow(Runnable then) {
        Optional<Snapshot> snapshot = unsaved.get();
        if (snapshot.isEmpty()) {
            return;
        }
        Snapshot s = snapshot.get();
        queue(() -> {
            if (write(s) && then != null) {
                then.run();
            }
        });
    }

    /** On the UI thread: deletes the recovery files (the work was saved, or the user discarded it). */
    public void discard() {
        queue(() -> {
            try {
                slot.delete();
                written = null;
            } catch (IOException e) {
                tell("The autosaved copy " + slot.planFile() + " could not be deleted (" + e.getMessage()
                        + "); it may be offered at the next start.");
            }
        });
    }

    /** Waits until the work queued so far is done; false if {@code timeout} passed first. */
    public boolean flush(Duration timeout) throws InterruptedException {
        CountDownLatch done = new CountDownLatch(1);
        try {
            writer.execute(done::countDown);
        } catch (RejectedExecutionException e) {
            return writer.awaitTermination(timeout.toNanos(), TimeUnit.NANOSECONDS);
        }
        return done.await(timeout.toNanos(), TimeUnit.NANOSECONDS);
    }

    /** Stops the timer, lets queued writes and deletions finish (up to {@code timeout}) and ends the threads. */
    public void close(Duration timeout) {
        timer.shutdownNow();
        writer.shutdown();
        try {
            writer.awaitTermination(timeout.toNanos(), TimeUnit.NANOSECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** {@link #close(Duration)} with ten seconds for queued work. */
    @Override
    public void close() {
        close(Duration.ofSeconds(10));
    }

    private void queue(Runnable task) {
        try {
            writer.execute(task);
        } catch (RejectedExecutionException e) {
            // closed: nothing more is written
        }
    }

    /** Writer thread: true when the slot holds {@code s} afterwards. */
    private boolean write(Snapshot s) {
        if (s.equals(written) && slot.exists()) {
            return true;
        }
        try {
            slot.write(s.plan(), s.originalFile());
            written = s;
            writes.incrementAndGet();
            if (failing) {
                failing = false;
                tell("Autosave works again.");
            }
            return true;
        } catch (IOException | RuntimeException e) {
            written = null;
            failing = true;
            tell("Autosave failed: " + slot.planFile() + " could not be written (" + e.getMessage()
                    + "). The plan is still open here; save it.");
            return false;
        }
    }

    private void tell(String message) {
        try {
            ui.execute(() -> report.accept(message));
        } catch (RuntimeException e) {
            // the UI is gone
        }
    }
}
