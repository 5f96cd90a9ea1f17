package org.baywright.report.drawing;

import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;

/**
 * Writes the sample drawings of {@code docs/drawing.md} from the demo plan: Level 3 as a PNG straight into
 * {@code docs/images/}, and Level 2 as a PDF into {@code target/} to be turned into a PNG with poppler:
 * {@code pdftoppm -png -r 80 -singlefile target/framing-plan-level-2.pdf docs/images/framing-plan-level-2-pdf}.
 * Run from the project folder after a deliberate change to the drawing's look.
 */
public final class DocsImages {
    private DocsImages() {
    }

    public static void main(String[] args) throws Exception {
        Plan plan = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        RunResult run = PlanRun.run(plan);
        DrawingOptions opts = DrawingOptions.defaults().withPaper(Paper.ARCH_D).withDate("2025-03-14").withDpi(100);
        Files.createDirectories(Path.of("docs/images"));
        Files.createDirectories(Path.of("target"));
        DrawingExport.write(run, "Level 3", Path.of("docs/images/framing-plan-level-3.png"), opts);
        DrawingExport.write(run, "Level 2", Path.of("target/framing-plan-level-2.pdf"),
                opts.withReactions(ReactionMode.SERVICE));
        System.out.println("wrote docs/images/framing-plan-level-3.png and target/framing-plan-level-2.pdf");
    }
}
