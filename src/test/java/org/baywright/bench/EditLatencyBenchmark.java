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
 * <p>{@code bench/run-edit-latency [PLAN] [EDITS]} (default: the demo plan, 200 edits after 20 warm-up edits).
 */
public final class EditLatencyBenchmark {
    private EditLatencyBenchmark() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args.length > 0 ? args[0] : "plans/harbourview-offices.bay.json");
        int edits = args.length > 1 ? Integer.parseInt(args[1]) : 200;
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
}
