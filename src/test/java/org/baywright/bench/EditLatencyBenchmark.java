package org.baywright.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.baywright.plan.GridLine;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.ui.EditorModel;
import org.baywright.ui.TaskRunner;
import org.baywright.units.Units;

/**
 * Edit-to-result latency of the editor on a plan: the time from an edit (a grid line moved by a foot
 * and back, as a user drags it) to its run result delivered to the window, measured by the editor
 * model itself. Runs synchronously (no toolkit), so it is the work a live edit costs, without the
 * hand-over to the JavaFX thread (well under a millisecond). A benchmark: it reports, it asserts nothing.
 *
 * <p>{@code mvn -B -q -Pbench -Dbench=edit-latency -Dbench.args="[--window] [PLAN [EDITS]]"} (default:
 * the demo plan, 200 edits after 20 warm-up edits). With {@code --window} the whole editor runs
 * (headless, Monocle): each edit is made on the JavaFX thread, runs on the editor's background thread,
 * and its time ends when the result has been shown — the canvas redrawn, the panels and the status bar
 * refreshed.
 */
public final class EditLatencyBenchmark {
    private EditLatencyBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        List<String> a = new ArrayList<>(List.of(args));
        boolean inWindow = a.remove("--window");
        Path file = Path.of(a.size() > 0 ? a.get(0) : "plans/harbourview-offices.bay.json");
        int edits = a.size() > 1 ? Integer.parseInt(a.get(1)) : 200;
        if (inWindow) {
            window(file, edits);
            return;
        }
        EditorModel model = new EditorModel(TaskRunner.direct());
        if (!model.open(file).opened()) {
            throw new IllegalStateException("could not open " + file);
        }
        Plan p = model.plan();
        GridLine line = PlanEdits.lines(p, GridLine.Axis.X).get(1);
        double ft = Units.FT_.toSi(1);
        int warm = 20;
        for (int i = 0; i < warm + edits; i++) {
            double to = line.offset() + (i % 2 == 0 ? ft : 0);
            model.edit(q -> PlanEdits.moveGridLine(q, line.label(), to), "move " + line.label());
        }
        List<Double> all = model.latencies();
        List<Double> ms = new ArrayList<>(all.subList(Math.max(0, all.size() - edits), all.size()));
        Collections.sort(ms);
        double median = ms.get(ms.size() / 2);
        double p95 = ms.get((int) Math.ceil(0.95 * ms.size()) - 1);
        System.out.printf(Locale.ROOT, "%s: %d edits (grid line %s moved 1 ft and back), %d members at %d levels%n", file,
                ms.size(), line.label(), model.run().takedown().members().values().stream().mapToInt(List::size).sum(),
                p.levels().size());
        System.out.printf(Locale.ROOT, "edit to result: median %.1f ms, p95 %.1f ms, max %.1f ms%n", median, p95,
                ms.get(ms.size() - 1));
    }

    /** The same edits in the whole editor window, headless: edit, background run, result shown. */
    private static void window(Path file, int edits) throws Exception {
        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        java.util.concurrent.CountDownLatch up = new java.util.concurrent.CountDownLatch(1);
        javafx.application.Platform.startup(up::countDown);
        up.await();
        EditorModel[] holder = new EditorModel[1];
        onFx(() -> {
            EditorModel m = new EditorModel(TaskRunner.background());
            org.baywright.ui.MainWindow w = new org.baywright.ui.MainWindow(m, () -> { });
            javafx.stage.Stage stage = new javafx.stage.Stage();
            stage.setScene(new javafx.scene.Scene(w.root(), 1280, 800));
            stage.show();
            w.open(file);
            holder[0] = m;
        });
        EditorModel model = holder[0];
        waitFor(model, 1);
        GridLine line = PlanEdits.lines(model.plan(), GridLine.Axis.X).get(1);
        double base = line.offset();
        double ft = Units.FT_.toSi(1);
        int warm = 20;
        for (int i = 0; i < warm + edits; i++) {
            int shown = model.latencies().size();
            double to = base + (i % 2 == 0 ? ft : 0);
            onFx(() -> model.edit(q -> PlanEdits.moveGridLine(q, line.label(), to), "move " + line.label()));
            waitFor(model, shown + 1);
        }
        List<Double> all = model.latencies();
        List<Double> ms = new ArrayList<>(all.subList(Math.max(0, all.size() - edits), all.size()));
        Collections.sort(ms);
        System.out.printf(Locale.ROOT, "%s in the editor window (headless): %d edits (grid line %s moved 1 ft and back)%n",
                file, ms.size(), line.label());
        System.out.printf(Locale.ROOT, "edit to result shown (run, canvas, panels, status bar): median %.1f ms, p95 %.1f ms,"
                + " max %.1f ms%n", ms.get(ms.size() / 2), ms.get((int) Math.ceil(0.95 * ms.size()) - 1), ms.get(ms.size() - 1));
        javafx.application.Platform.exit();
    }

    private static void onFx(Runnable r) throws InterruptedException {
        java.util.concurrent.CountDownLatch done = new java.util.concurrent.CountDownLatch(1);
        javafx.application.Platform.runLater(() -> {
            try {
                r.run();
            } finally {
                done.countDown();
            }
        });
        done.await();
    }

    private static void waitFor(EditorModel model, int results) throws InterruptedException {
        long until = System.nanoTime() + 120_000_000_000L;
        while (model.latencies().size() < results) {
            if (System.nanoTime() > until) {
                throw new IllegalStateException("no run result after two minutes");
            }
            Thread.sleep(1);
        }
    }
}
