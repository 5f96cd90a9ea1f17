package org.baywright.ui;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The plans opened or saved lately, newest first, kept in a small text file (one absolute path a
 * line): {@code ~/.baywright/recent-files.txt}, or the file named by the system property
 * {@value #PROPERTY}. A list that cannot be read or written is simply empty; it never stops the editor.
 */
public final class RecentFiles {
    /** System property naming the list's file (tests point it at a temporary folder). */
    public static final String PROPERTY = "baywright.recent.file";
    /** How many plans the list keeps. */
    public static final int KEPT = 8;

    private final Path store;

    public RecentFiles(Path store) {
        this.store = store;
    }

    /** The list at its usual place. */
    public static RecentFiles standard() {
        String named = System.getProperty(PROPERTY);
        return new RecentFiles(named != null && !named.isBlank() ? Path.of(named)
                : Path.of(System.getProperty("user.home"), ".baywright", "recent-files.txt"));
    }

    /** The plans, newest first; files that no longer exist are left out. */
    public List<Path> list() {
        List<Path> out = new ArrayList<>();
        try {
            if (Files.isRegularFile(store)) {
                for (String line : Files.readAllLines(store, StandardCharsets.UTF_8)) {
                    if (!line.isBlank()) {
                        Path p = Path.of(line.trim());
                        if (Files.isRegularFile(p) && !out.contains(p)) {
                            out.add(p);
                        }
                    }
                }
            }
        } catch (IOException | RuntimeException e) {
            return List.of();
        }
        return out.size() > KEPT ? List.copyOf(out.subList(0, KEPT)) : out;
    }

    /** Puts a plan at the top of the list. */
    public void add(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> now = new ArrayList<>(list());
        now.remove(abs);
        now.add(0, abs);
        List<String> lines = now.stream().limit(KEPT).map(Path::toString).toList();
        try {
            Files.createDirectories(store.toAbsolutePath().getParent());
            Path tmp = store.resolveSibling(store.getFileName() + ".tmp");
            Files.write(tmp, lines, StandardCharsets.UTF_8);
            Files.move(tmp, store, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                    java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | RuntimeException e) {
            // a list we cannot keep is not worth stopping for
        }
    }
}
