package org.baywright.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.catalog.Catalog;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.study.CancelToken;
import org.baywright.study.ProgressListener;
import org.baywright.study.Study;
import org.baywright.study.StudyResult;
import org.baywright.study.StudySpec;
import org.baywright.study.SweepText;
import org.baywright.units.UnitSystem;

/**
 * Variants per second of a study of the demo plan on all cores: beam spacing × bay width × beam
 * direction, every variant a full run. Measured on the full four-level demo and on a one-level version
 * of it (its first level only). A benchmark main, not a test: {@code bench/run-study [VARIANTS]}.
 * Prints figures; asserts nothing.
 */
public final class StudyBenchmark {
    private StudyBenchmark() {
    }

    public static void main(String[] args) {
        int target = args.length > 0 ? Integer.parseInt(args[0]) : 1000;
        int threads = args.length > 1 ? Integer.parseInt(args[1]) : Runtime.getRuntime().availableProcessors();
        Plan demo = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        Level first = demo.levels().get(0);
        Plan oneLevel = new Plan(demo.name() + " (one level)", demo.units(), demo.settings(), demo.grid(), List.of(first),
                demo.floors().stream().filter(f -> f.id().equals(first.floor())).toList(), demo.columns());
        Catalog catalog = Study.catalogOf(demo);
        System.out.printf(Locale.ROOT, "threads %d (cores %d)%n", threads, Runtime.getRuntime().availableProcessors());
        for (Plan p : List.of(oneLevel, demo)) {
            StudySpec spec = spec(p, target);
            // warm up (the JIT) on a short study of the same plan
            Study.run(spec(p, 40), catalog, threads, ProgressListener.NONE, new CancelToken());
            long t0 = System.nanoTime();
            StudyResult r = Study.run(spec, catalog, threads, ProgressListener.NONE, new CancelToken());
            double s = (System.nanoTime() - t0) / 1e9;
            System.out.printf(Locale.ROOT, "%s (%d levels): %d variants in %.2f s = %.1f variants/s; %d sound; "
                    + "time for 1,000 variants %.1f s%n", p.name(), p.levels().size(), r.variants().size(), s,
                    r.variants().size() / s, r.sound().size(), 1000 / (r.variants().size() / s));
        }
    }

    /** Spacing 6–15 ft (10) × both directions × bay-x widths until about {@code target} variants. */
    static StudySpec spec(Plan p, int target) {
        int widths = Math.max(1, target / 20);
        List<String> xs = new ArrayList<>();
        for (int i = 0; i < widths; i++) {
            xs.add(String.format(Locale.ROOT, "%.2fft", 25 + 15.0 * i / Math.max(1, widths - 1)));
        }
        UnitSystem us = UnitSystem.US;
        return new StudySpec(p, List.of(SweepText.parse("--vary", "bay-x=" + String.join(",", xs), us),
                SweepText.parse("--vary", "beam-direction=x,y", us),
                SweepText.parse("--vary", "beam-spacing=6ft..15ft:1ft", us)));
    }
}
