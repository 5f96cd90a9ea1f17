package org.baywright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/** Reads a plan file for a command, printing its problems one per line. */
final class PlanInput {
    private PlanInput() {
    }

    /** The plan, or null after printing the errors that prevent using it. */
    static Plan read(Path file, PrintWriter err) {
        PlanReadResult r = PlanFiles.read(file);
        boolean errors = false;
        for (Problem p : r.problems()) {
            err.println(file + ": " + p);
            errors |= p.severity() == Problem.Severity.ERROR;
        }
        return errors || r.plan().isEmpty() ? null : r.plan().get();
    }
}
