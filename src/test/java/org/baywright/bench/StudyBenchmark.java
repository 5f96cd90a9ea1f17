package org.baywright.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.baywright.catalog.Catalog;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
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
 * of it (its first level only), as a study (variants share the floor designs whose inputs are equal)
 * and, for comparison, as separate runs of every variant's plan on the same number of threads.
 * A benchmark main, not a test:
 * {@code mvn -B -q -Pbench -Dbench=study -Dbench.args="[VARIANTS [THREADS [REPEATS]]]"}. Prints each
 * repeat and the median; asserts nothing. Besides the wall time it prints the CPU time the process used
 * (all its threads, JIT and GC included): on a machine shared with other jobs the wall time swings with
 * their load, the CPU time much less, and CPU time / threads is what the wall time would be on idle cores.
 */
public final class StudyBenchmark {
    private StudyBenchmark() {
    }

    public static void main(String[] args) {
        int target = args.length > 0 ? Integer.parseInt(args[0]) : 1000;
        int threads = args.length > 1 ? Integer.parseInt(args[1]) : Runtime.getRuntime().availableProcessors();
        int repeats = args.length > 2 ? Integer.parseInt(args[2]) : 1;
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
            List<Double> study = new ArrayList<>();
            List<Double> studyCpu = new ArrayList<>();
            List<Double> separate = new ArrayList<>();
            List<Double> separateCpu = new ArrayList<>();
            for (int r = 0; r < repeats; r++) {
                long t0 = System.nanoTime();
                long c0 = cpu();
                StudyResult res = Study.run(spec, catalog, threads, ProgressListener.NONE, new CancelToken());
                double s = (System.nanoTime() - t0) / 1e9;
                double c = (cpu() - c0) / 1e9;
                study.add(s);
                studyCpu.add(c);
                System.out.printf(Locale.ROOT, "%s (%d levels): study of %d variants in %.2f s = %.1f variants/s (CPU %.2f s);"
                        + " %d sound%n", p.name(), p.levels().size(), res.variants().size(), s, res.variants().size() / s, c,
                        res.sound().size());
                t0 = System.nanoTime();
                c0 = cpu();
                int n = separateRuns(spec, catalog, threads);
                s = (System.nanoTime() - t0) / 1e9;
                c = (cpu() - c0) / 1e9;
                separate.add(s);
                separateCpu.add(c);
                System.out.printf(Locale.ROOT, "%s (%d levels): %d separate runs in %.2f s = %.1f runs/s (CPU %.2f s)%n",
                        p.name(), p.levels().size(), n, s, n / s, c);
            }
            System.out.printf(Locale.ROOT, "%s: median of %d: study %.2f s (%.1f variants/s, 1,000 variants in %.1f s, CPU %.2f s);"
                    + " separate runs %.2f s (%.1f runs/s, CPU %.2f s)%n", p.name(), repeats, median(study),
                    spec.count() / median(study), 1000 * median(study) / spec.count(), median(studyCpu), median(separate),
                    spec.count() / median(separate), median(separateCpu));
        }
    }

    /** CPU time of the whole process so far, ns (0 where the JVM does not tell). */
    static long cpu() {
        java.lang.management.OperatingSystemMXBean os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getProcessCpuTime() : 0;
    }

    /** Every variant's plan run on its own (no floor designs shared), on {@code threads} workers. */
    static int separateRuns(StudySpec spec, Catalog catalog, int threads) {
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            // (a filter, so that the count cannot skip the runs)
            return pool.submit(() -> (int) IntStream.range(0, (int) spec.count()).parallel()
                    .mapToObj(i -> PlanRun.run(spec.plan(i), catalog)).filter(r -> r.takedown() != null).count()).join();
        } finally {
            pool.shutdown();
        }
    }

    static double median(List<Double> xs) {
        List<Double> s = new ArrayList<>(xs);
        Collections.sort(s);
        int n = s.size();
        return n % 2 == 1 ? s.get(n / 2) : (s.get(n / 2 - 1) + s.get(n / 2)) / 2;
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
