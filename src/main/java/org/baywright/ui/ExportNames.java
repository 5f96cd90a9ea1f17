package org.baywright.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.text.Normalizer;
import java.util.Locale;
import java.util.Optional;

/**
 * The file names and the folder an export offers: names made from the plan and, for what belongs to
 * one level, the level ({@code harbourview-offices-level-3.pdf}); the folder is the plan's own when
 * it has a file, else the folder the last export went to. Plain text work, no toolkit.
 */
final class ExportNames {
    private ExportNames() {
    }

    /**
     * A name part for a file: lower case, letters and digits with single dashes between words,
     * accents dropped ("Harbourview Offices" → "harbourview-offices"); "plan" when nothing is left.
     */
    static String slug(String text) {
        String s = text == null ? "" : Normalizer.normalize(text, Normalizer.Form.NFD).replaceAll("\\p{M}+", "");
        s = s.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        return s.isEmpty() ? "plan" : s;
    }

    /**
     * The stem every export of a plan starts with: its file's name without {@code .bay.json} (or any
     * other extension) when it has a file, else its name.
     */
    static String stem(String planName, Path planFile) {
        if (planFile != null && planFile.getFileName() != null) {
            String n = planFile.getFileName().toString();
            String lower = n.toLowerCase(Locale.ROOT);
            if (lower.endsWith(".bay.json")) {
                n = n.substring(0, n.length() - ".bay.json".length());
            } else if (n.lastIndexOf('.') > 0) {
                n = n.substring(0, n.lastIndexOf('.'));
            }
            return slug(n);
        }
        return slug(planName);
    }

    /**
     * The offered name: the plan's stem, the level (when the export is of one level), what it is
     * (when it says more than the extension), and the extension: {@code harbourview-offices-level-3.pdf},
     * {@code harbourview-offices-calculations.pdf}.
     *
     * @param level the level's name, or null for an export of the whole plan
     * @param what e.g. "calculations", "takeoff"; null or blank for none
     * @param extension with or without its dot
     */
    static String name(String planName, Path planFile, String level, String what, String extension) {
        StringBuilder b = new StringBuilder(stem(planName, planFile));
        if (level != null && !level.isBlank()) {
            b.append('-').append(slug(level));
        }
        if (what != null && !what.isBlank()) {
            b.append('-').append(slug(what));
        }
        String ext = extension.startsWith(".") ? extension : "." + extension;
        return b.append(ext.toLowerCase(Locale.ROOT)).toString();
    }

    /**
     * The folder an export dialog starts in: the plan's folder when it has a file, else the folder the
     * last export went to, when either still exists; empty leaves the dialog's own choice.
     */
    static Optional<Path> folder(Path planFile, String lastExportFolder) {
        if (planFile != null) {
            Path parent = planFile.toAbsolutePath().getParent();
            if (parent != null && Files.isDirectory(parent)) {
                return Optional.of(parent);
            }
        }
        if (lastExportFolder != null && !lastExportFolder.isBlank()) {
            try {
                Path last = Path.of(lastExportFolder);
                if (Files.isDirectory(last)) {
                    return Optional.of(last);
                }
            } catch (RuntimeException e) {
                return Optional.empty();
            }
        }
        return Optional.empty();
    }
}
