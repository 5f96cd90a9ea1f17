package org.baywright.ui;

import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;
import java.util.Properties;

/**
 * Small choices remembered per user between sessions (the last takeoff allowance, the last export
 * folder, the width of the side panel), as {@code key=value} lines in
 * {@code ~/.baywright/settings.properties}. The file is {@value #PROPERTY} when that system property is
 * set; otherwise, when the recent-files list is moved ({@link RecentFiles#PROPERTY}, as tests do), it
 * sits beside that list. A file that cannot be read or written is simply empty: it never stops the
 * editor.
 */
public final class UserSettings {
    /** System property naming the settings file. */
    public static final String PROPERTY = "baywright.settings.file";

    /** The connection allowance last used for a takeoff export, percent. */
    public static final String TAKEOFF_ALLOWANCE = "takeoff.allowance";
    /** The folder an export last went to. */
    public static final String EXPORT_FOLDER = "export.folder";
    /** The width of the side panel, px. */
    public static final String SIDE_WIDTH = "side.width";

    private final Path store;

    public UserSettings(Path store) {
        this.store = store;
    }

    /** The settings at their usual place. */
    public static UserSettings standard() {
        String named = System.getProperty(PROPERTY);
        if (named != null && !named.isBlank()) {
            return new UserSettings(Path.of(named));
        }
        String recent = System.getProperty(RecentFiles.PROPERTY);
        if (recent != null && !recent.isBlank()) {
            return new UserSettings(Path.of(recent).toAbsolutePath().resolveSibling("settings.properties"));
        }
        return new UserSettings(Path.of(System.getProperty("user.home"), ".baywright", "settings.properties"));
    }

    /** The file the settings live in. */
    public Path file() {
        return store;
    }

    /** The value of a key, if it was set. */
    public Optional<String> get(String key) {
        return Optional.ofNullable(load().getProperty(key)).filter(s -> !s.isBlank());
    }

    /** A number, or {@code fallback} when it is missing or not a finite number. */
    public double number(String key, double fallback) {
        try {
            double v = get(key).map(Double::parseDouble).orElse(fallback);
            return Double.isFinite(v) ? v : fallback;
        } catch (NumberFormatException e) {
            return fallback;
        }
    }

    /** Sets a key (null removes it) and writes the file. */
    public void put(String key, String value) {
        Properties p = load();
        if (value == null) {
            p.remove(key);
        } else {
            p.setProperty(key, value);
        }
        try {
            Files.createDirectories(store.toAbsolutePath().getParent());
            Path tmp = store.toAbsolutePath().resolveSibling(store.getFileName() + ".tmp");
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                p.store(w, "Baywright: choices remembered between sessions");
            }
            Files.move(tmp, store, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException | RuntimeException e) {
            // a setting we cannot keep is not worth stopping for
        }
    }

    private Properties load() {
        Properties p = new Properties();
        if (Files.isRegularFile(store)) {
            try (Reader r = Files.newBufferedReader(store, StandardCharsets.UTF_8)) {
                p.load(r);
            } catch (IOException | RuntimeException e) {
                return new Properties();
            }
        }
        return p;
    }
}
