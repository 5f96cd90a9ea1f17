package org.baywright.ui;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.Plan;

/** Plans and file helpers for the autosave and recovery tests. */
final class RecoveryPlans {
    static final Path TWO_BAY = Path.of("plans", "examples", "two-bay.bay.json");

    private RecoveryPlans() {
    }

    /** The small example plan. */
    static Plan twoBay() {
        return read(TWO_BAY);
    }

    /** The demo plan. */
    static Plan demo() {
        return read(Path.of(BaywrightApp.DEMO));
    }

    static Plan read(Path file) {
        PlanReadResult r = PlanFiles.read(file);
        if (!r.ok()) {
            throw new AssertionError(file + " does not read: " + r.problems());
        }
        return r.plan().orElseThrow();
    }

    /** The same plan under another name: an edit whose result is easy to recognise. */
    static Plan renamed(Plan p, String name) {
        return new Plan(name, p.units(), p.settings(), p.grid(), p.levels(), p.floors(), p.columns());
    }

    /** The plan as its file text: two plans with the same text are the same plan for every reader. */
    static String text(Plan p) {
        return PlanFiles.write(p);
    }

    static String text(Path file) throws java.io.IOException {
        return Files.readString(file, StandardCharsets.UTF_8);
    }

    /** The file names in a folder, sorted. */
    static List<String> names(Path dir) throws java.io.IOException {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
