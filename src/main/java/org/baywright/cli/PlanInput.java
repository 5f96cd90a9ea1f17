package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.io.PlanFiles;
import org.baywright.io.PlanReadResult;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/** Reads a plan file for a command, printing its problems one per line; writes its main result. */
final class PlanInput {
    private PlanInput() {
    }

    /** The plan, or null after printing the errors that prevent using it. */
    static Plan read(Path file, PrintWriter err) {
        PlanReadResult r = PlanFiles.read(file);
        boolean errors = false;
        for (Problem p : r.problems()) {
            err.println(ProblemLines.line(file, p));
            errors |= p.severity() == Problem.Severity.ERROR;
        }
        return errors || r.plan().isEmpty() ? null : r.plan().get();
    }

    /**
     * Refuses an output file that would overwrite a plan: the plan being read, or any file named like
     * a plan file. Results can be made again; a plan is the user's work.
     */
    static void checkOutput(String option, Path output, Path plan) {
        if (output == null) {
            return;
        }
        boolean same;
        try {
            same = output.toAbsolutePath().normalize().equals(plan.toAbsolutePath().normalize())
                    || Files.exists(output) && Files.exists(plan) && Files.isSameFile(output, plan);
        } catch (IOException | SecurityException e) {
            same = false;
        }
        if (same) {
            throw new BadInputException(option + ": " + output + " is the plan file being read; writing there would "
                    + "destroy the plan. Give another file name");
        }
        if (output.getFileName() != null && output.getFileName().toString().endsWith(PlanFiles.EXTENSION)) {
            throw new BadInputException(option + ": " + output + " is named like a plan file (" + PlanFiles.EXTENSION
                    + "); results are not plans. Give another file name, e.g. ending in .json or .csv");
        }
    }

    /**
     * The result of a command: as JSON to the file named by {@code --json} (or to standard output for
     * "-"), and as text to standard output unless the JSON went there.
     */
    static void writeResult(PrintWriter out, String json, java.util.function.Supplier<String> jsonText,
            java.util.function.Supplier<String> text) throws IOException {
        if (json != null) {
            String t = jsonText.get();
            if (json.equals("-")) {
                out.print(t);
            } else {
                Files.writeString(Path.of(json), t, java.nio.charset.StandardCharsets.UTF_8);
            }
        }
        if (json == null || !json.equals("-")) {
            out.print(text.get());
        }
        out.flush();
    }
}
