package org.baywright.ui;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Properties;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/**
 * The folder of autosaved plans: copies of unsaved work, written while the editor runs, so that a crash
 * loses at most one autosave interval. Plain {@code java.nio}, no JavaFX; the editor's timer is
 * {@link Autosaver}.
 *
 * <p>The folder ({@link #defaultDir()}: {@code ~/.baywright/recovery}, or the system property
 * {@value #DIR_PROPERTY}) holds, per running editor (a <em>session</em>), a lock file
 * {@code <session>.lock} naming its process, and per open document two files:
 * <ul>
 *   <li>{@code <session>_<n>.bay.json}, the plan, an ordinary plan file written with
 *       {@link PlanFiles#write(Plan, Path)} (temporary file, forced to disk, atomic rename), so it is
 *       always one complete plan, never a torn one;</li>
 *   <li>{@code <session>_<n>.properties}, where the plan came from ({@code original}, absent when it
 *       had no file) and when it was autosaved ({@code autosaved}, an ISO-8601 instant), written the
 *       same way.</li>
 * </ul>
 * A session is {@code <process id>-<random hex>}. Its lock file holds the process id and the start
 * time of the process; a session counts as running while a process with that id and start time is
 * alive. Plans of sessions that are not running are what {@link #findLeftOver(Session)} offers; a
 * running editor's files are never offered to another one.
 *
 * <p>Known limitations: a recovery folder shared by several computers (a network home folder) cannot
 * tell another computer's running editor from a dead one; its plans would be offered here too (a
 * duplicate, never a loss). Two editors starting at the same moment may both offer the same plan.
 */
public final class RecoveryStore {
    /** System property naming the recovery folder (tests, or a user who wants it elsewhere). */
    public static final String DIR_PROPERTY = "baywright.recovery.dir";

    static final String PLAN_SUFFIX = PlanFiles.EXTENSION;
    static final String RECORD_SUFFIX = ".properties";
    static final String LOCK_SUFFIX = ".lock";
    /** What an unreadable plan is renamed to, instead of {@code .bay.json}: kept, never offered again. */
    static final String SET_ASIDE_SUFFIX = ".unreadable.json";

    private static final Pattern SESSION = Pattern.compile("[0-9]+-[0-9a-f]{8}");
    private static final Pattern PLAN_NAME = Pattern.compile("(" + SESSION.pattern() + ")_([0-9]+)"
            + Pattern.quote(PLAN_SUFFIX));
    private static final Pattern RECORD_NAME = Pattern.compile("(" + SESSION.pattern() + ")_([0-9]+)"
            + Pattern.quote(RECORD_SUFFIX));
    private static final Pattern LOCK_NAME = Pattern.compile("(" + SESSION.pattern() + ")" + Pattern.quote(LOCK_SUFFIX));
    /** Temporary files left by a write that was cut short: {@code .<name>.<hex>.tmp} (see PlanFiles). */
    private static final Pattern TEMP_NAME = Pattern.compile("\\.(" + SESSION.pattern() + ")[._].*\\.tmp");
    /** Start times of the same process read twice may differ by rounding; more than this is another process. */
    private static final Duration START_TOLERANCE = Duration.ofSeconds(2);

    private final Path dir;
    private final Clock clock;

    /** A store in {@code dir}, created when the first session opens. */
    public RecoveryStore(Path dir) {
        this(dir, Clock.systemUTC());
    }

    /** A store whose autosave times come from {@code clock}. */
    public RecoveryStore(Path dir, Clock clock) {
        this.dir = Objects.requireNonNull(dir, "dir").toAbsolutePath();
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /** {@value #DIR_PROPERTY} when set, else {@code .baywright/recovery} in the user's home folder. */
    public static Path defaultDir() {
        String named = System.getProperty(DIR_PROPERTY);
        if (named != null && !named.isBlank()) {
            return Path.of(named.trim());
        }
        return Path.of(System.getProperty("user.home"), ".baywright", "recovery");
    }

    /** The folder. */
    public Path dir() {
        return dir;
    }

    // ---- sessions -------------------------------------------------------------------------------

    /**
     * Starts a session for this process: creates the folder if needed and writes the lock file that
     * tells other editors this one is running. Close the session when the editor ends.
     */
    public Session open() throws IOException {
        Files.createDirectories(dir);
        ProcessHandle self = ProcessHandle.current();
        while (true) {
            String id = self.pid() + "-" + String.format("%08x", ThreadLocalRandom.current().nextInt());
            Path lock = dir.resolve(id + LOCK_SUFFIX);
            if (Files.exists(lock)) {
                continue; // another session of this process drew the same number
            }
            Properties p = new Properties();
            p.setProperty("pid", Long.toString(self.pid()));
            self.info().startInstant().ifPresent(t -> p.setProperty("started", t.toString()));
            writeAtomically(lock, text(p, "Baywright editor running; its autosaved plans are not offered elsewhere"));
            return new Session(id, lock);
        }
    }

    /** A running editor: its lock file and its documents' recovery files. */
    public final class Session implements AutoCloseable {
        private final String id;
        private final Path lock;
        private final AtomicInteger documents = new AtomicInteger();
        private volatile boolean closed;

        private Session(String id, Path lock) {
            this.id = id;
            this.lock = lock;
        }

        /** {@code <process id>-<random hex>}. */
        public String id() {
            return id;
        }

        /** The lock file. */
        public Path lockFile() {
            return lock;
        }

        /** The store of this session. */
        public RecoveryStore store() {
            return RecoveryStore.this;
        }

        /** A place for the recovery files of one more open document (nothing is written yet). */
        public Slot newDocument() {
            return new Slot(id + "_" + documents.incrementAndGet());
        }

        /** Removes the lock file: from now on what this session left behind is offered at the next start. */
        @Override
        public void close() throws IOException {
            closed = true;
            Files.deleteIfExists(lock);
        }

        /** True once {@link #close()} was called. */
        public boolean isClosed() {
            return closed;
        }
    }

    /** The recovery files of one open document. Not thread-safe: use it from one thread at a time. */
    public final class Slot {
        private final String name;

        private Slot(String name) {
            this.name = name;
        }

        /** The autosaved plan file (there only after a write). */
        public Path planFile() {
            return dir.resolve(name + PLAN_SUFFIX);
        }

        /** The record of origin and time beside it. */
        public Path recordFile() {
            return dir.resolve(name + RECORD_SUFFIX);
        }

        /**
         * Writes the plan, then the record of where it came from ({@code original}, null when it had no
         * file) and now. Each file is replaced atomically: a crash at any moment leaves a complete plan
         * (this one or the previous autosave).
         */
        public void write(Plan plan, Path original) throws IOException {
            Objects.requireNonNull(plan, "plan");
            Files.createDirectories(dir);
            PlanFiles.write(plan, planFile());
            Files.deleteIfExists(backupOf(planFile())); // the previous autosave: not needed, and not offered
            Properties p = new Properties();
            if (original != null) {
                p.setProperty("original", original.toAbsolutePath().toString());
            }
            p.setProperty("autosaved", clock.instant().toString());
            writeAtomically(recordFile(), text(p, "Baywright autosave: where the plan beside this file came from"));
        }

        /** Deletes the recovery files (the plan first: a record without a plan is never offered). */
        public void delete() throws IOException {
            deleteDocument(name);
        }

        /** True when an autosaved plan is there. */
        public boolean exists() {
            return Files.exists(planFile());
        }
    }

    // ---- after a crash --------------------------------------------------------------------------

    /**
     * An autosaved plan left by an editor that is no longer running.
     *
     * @param name the document's file name stem, {@code <session>_<n>}
     * @param plan the plan, read and checked
     * @param originalFile the file it was opened from or last saved to; null when it had none
     * @param autosaved when it was written
     * @param file the autosaved plan file
     */
    public record Entry(String name, Plan plan, Path originalFile, Instant autosaved, Path file) {
        public Entry {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(plan, "plan");
            Objects.requireNonNull(autosaved, "autosaved");
            Objects.requireNonNull(file, "file");
        }
    }

    /**
     * An autosaved plan that could not be read: kept under another name, never deleted.
     *
     * @param file where it was
     * @param keptAs where it is now (the same as {@code file} when it could not be renamed)
     * @param reason why it could not be read (the reader's located problems, one per line)
     */
    public record SetAside(Path file, Path keptAs, String reason) {
        /** One sentence for the user. */
        public String message() {
            return file.getFileName() + " could not be read (" + reason + ")"
                    + (keptAs.equals(file) ? " and could not be renamed; it stays in " + file.getParent()
                    : "; it is kept as " + keptAs);
        }
    }

    /** What {@link #findLeftOver(Session)} found: plans to offer, newest first, and unreadable ones set aside. */
    public record LeftOver(List<Entry> entries, List<SetAside> setAside) {
        public LeftOver {
            entries = List.copyOf(entries);
            setAside = List.copyOf(setAside);
        }

        public boolean isEmpty() {
            return entries.isEmpty() && setAside.isEmpty();
        }
    }

    /**
     * The autosaved plans of sessions that are no longer running (not {@code self}, which may be
     * null). A plan file that does not read as a plan is renamed to {@code …}{@value #SET_ASIDE_SUFFIX}
     * (its record beside it) and reported. Lock files of dead sessions and the temporary files of their
     * cut-short writes are removed; nothing else is deleted. Never throws: a folder that cannot be
     * listed gives nothing.
     */
    public LeftOver findLeftOver(Session self) {
        List<Entry> entries = new ArrayList<>();
        List<SetAside> setAside = new ArrayList<>();
        if (!Files.isDirectory(dir)) {
            return new LeftOver(entries, setAside);
        }
        TreeMap<String, Path> plans = new TreeMap<>();
        Set<String> sessions = new HashSet<>();
        List<Path> records = new ArrayList<>();
        List<Path> temps = new ArrayList<>();
        try (DirectoryStream<Path> files = Files.newDirectoryStream(dir)) {
            for (Path f : files) {
                String n = f.getFileName().toString();
                Matcher m;
                if ((m = PLAN_NAME.matcher(n)).matches()) {
                    plans.put(n.substring(0, n.length() - PLAN_SUFFIX.length()), f);
                    sessions.add(m.group(1));
                } else if ((m = LOCK_NAME.matcher(n)).matches()) {
                    sessions.add(m.group(1));
                } else if ((m = RECORD_NAME.matcher(n)).matches()) {
                    records.add(f);
                    sessions.add(m.group(1));
                } else if ((m = TEMP_NAME.matcher(n)).matches()) {
                    temps.add(f);
                    sessions.add(m.group(1));
                }
            }
        } catch (IOException | RuntimeException e) {
            return new LeftOver(entries, setAside);
        }
        Set<String> dead = new HashSet<>();
        for (String s : sessions) {
            if ((self == null || !s.equals(self.id())) && !isRunning(s)) {
                dead.add(s);
            }
        }
        for (var e : plans.entrySet()) {
            String name = e.getKey();
            if (!dead.contains(sessionOf(name))) {
                continue;
            }
            Path file = e.getValue();
            PlanReadResult read = PlanFiles.read(file);
            if (read.ok()) {
                Record r = readRecord(dir.resolve(name + RECORD_SUFFIX), file);
                entries.add(new Entry(name, read.plan().orElseThrow(), r.original(), r.autosaved(), file));
            } else if (Files.exists(file)) {
                setAside.add(setAside(name, file, read.errors()));
            }
        }
        // what dead sessions leave besides their plans: a lock, a record whose plan is gone, cut-short writes
        for (Path r : records) {
            String name = r.getFileName().toString();
            name = name.substring(0, name.length() - RECORD_SUFFIX.length());
            if (dead.contains(sessionOf(name)) && !plans.containsKey(name)) {
                deleteQuietly(r);
            }
        }
        for (Path t : temps) {
            Matcher m = TEMP_NAME.matcher(t.getFileName().toString());
            if (m.matches() && dead.contains(m.group(1))) {
                deleteQuietly(t);
            }
        }
        for (String s : dead) {
            deleteQuietly(dir.resolve(s + LOCK_SUFFIX));
        }
        entries.sort(Comparator.comparing(Entry::autosaved).reversed().thenComparing(Entry::name));
        return new LeftOver(entries, setAside);
    }

    /** Deletes an entry's files, once the user has recovered it elsewhere or chosen to discard it. */
    public void delete(Entry entry) throws IOException {
        deleteDocument(entry.name());
    }

    /**
     * True while the session's lock file names a live process: same process id and, where both are
     * known, the same start time (a process id reused by another program does not count). A missing or
     * unreadable lock file means the session is not running.
     */
    public boolean isRunning(String session) {
        Path lock = dir.resolve(session + LOCK_SUFFIX);
        Properties p = new Properties();
        try (Reader in = Files.newBufferedReader(lock, StandardCharsets.UTF_8)) {
            p.load(in);
        } catch (IOException | IllegalArgumentException e) {
            return false;
        }
        long pid;
        try {
            pid = Long.parseLong(p.getProperty("pid", "").trim());
        } catch (NumberFormatException e) {
            return false;
        }
        Optional<ProcessHandle> handle = ProcessHandle.of(pid);
        if (handle.isEmpty() || !handle.get().isAlive()) {
            return false;
        }
        String started = p.getProperty("started");
        Optional<Instant> actual = handle.get().info().startInstant();
        if (started == null || actual.isEmpty()) {
            return true;
        }
        try {
            Instant recorded = Instant.parse(started.trim());
            return Duration.between(recorded, actual.get()).abs().compareTo(START_TOLERANCE) <= 0;
        } catch (DateTimeParseException e) {
            return true; // a live process with that id, and no way to tell: better not to take its plans
        }
    }

    // ---- helpers --------------------------------------------------------------------------------

    private record Record(Path original, Instant autosaved) {
    }

    /** The record beside a plan; without one (or unreadable), no original file and the plan file's time. */
    private static Record readRecord(Path record, Path plan) {
        Path original = null;
        Instant autosaved = null;
        Properties p = new Properties();
        try (Reader in = Files.newBufferedReader(record, StandardCharsets.UTF_8)) {
            p.load(in);
            String o = p.getProperty("original");
            if (o != null && !o.isBlank()) {
                original = Path.of(o);
            }
            String t = p.getProperty("autosaved");
            if (t != null) {
                autosaved = Instant.parse(t.trim());
            }
        } catch (IOException | RuntimeException e) {
            // no record, or a damaged one: the plan is what matters
        }
        if (autosaved == null) {
            try {
                autosaved = Files.getLastModifiedTime(plan).toInstant();
            } catch (IOException e) {
                autosaved = Instant.EPOCH;
            }
        }
        return new Record(original, autosaved);
    }

    private SetAside setAside(String name, Path file, List<Problem> errors) {
        String reason = errors.isEmpty() ? "unknown reason"
                : errors.stream().limit(3).map(Problem::message).reduce((a, b) -> a + "; " + b).orElse("")
                        + (errors.size() > 3 ? "; and " + (errors.size() - 3) + " more" : "");
        Path keptAs = null;
        for (int i = 1; i < 1000 && keptAs == null; i++) {
            String stem = name + (i == 1 ? "" : "-" + i);
            Path target = dir.resolve(stem + SET_ASIDE_SUFFIX);
            if (Files.exists(target)) {
                continue;
            }
            try {
                Files.move(file, target); // no replace: a rename within the folder
                keptAs = target;
                Path record = dir.resolve(name + RECORD_SUFFIX);
                if (Files.exists(record)) {
                    Files.move(record, dir.resolve(stem + ".unreadable" + RECORD_SUFFIX));
                }
                Files.deleteIfExists(backupOf(file));
            } catch (FileAlreadyExistsException e) {
                // taken meanwhile: try the next name
            } catch (IOException e) {
                break;
            }
        }
        return new SetAside(file, keptAs == null ? file : keptAs, reason);
    }

    private void deleteDocument(String name) throws IOException {
        Files.deleteIfExists(dir.resolve(name + PLAN_SUFFIX));
        Files.deleteIfExists(backupOf(dir.resolve(name + PLAN_SUFFIX)));
        Files.deleteIfExists(dir.resolve(name + RECORD_SUFFIX));
    }

    private static String sessionOf(String documentName) {
        int cut = documentName.lastIndexOf('_');
        return cut < 0 ? documentName : documentName.substring(0, cut);
    }

    private static Path backupOf(Path planFile) {
        return planFile.resolveSibling(planFile.getFileName() + ".bak");
    }

    private static void deleteQuietly(Path f) {
        try {
            Files.deleteIfExists(f);
        } catch (IOException e) {
            // left for next time
        }
    }

    private static String text(Properties p, String comment) {
        StringWriter w = new StringWriter();
        try {
            p.store(w, comment);
        } catch (IOException e) {
            throw new IllegalStateException(e); // a StringWriter does not fail
        }
        return w.toString();
    }

    /** Writes a small text file so that readers see the old or the new content, never part of one. */
    static void writeAtomically(Path target, String content) throws IOException {
        Path temp = target.resolveSibling("." + target.getFileName() + "."
                + Long.toHexString(ThreadLocalRandom.current().nextLong() >>> 1) + ".tmp");
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                ByteBuffer buf = ByteBuffer.wrap(content.getBytes(StandardCharsets.UTF_8));
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                ch.force(true);
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            try {
                Files.deleteIfExists(temp);
            } catch (NoSuchFileException e) {
                // moved
            }
        }
    }
}
