package org.baywright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code baywright check}: validate a plan file. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Validate a plan file: the file itself (format, fields, units, ranges, references), then the "
            + "framing (supports, support cycles, tributary coverage, equilibrium).",
            "Prints one line per problem.",
            "Exit code: 0 no errors; 1 the framing has errors; 2 the file cannot be read."})
public final class CheckCommand implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(paramLabel = "PLAN.bay.json")
    Path file;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Plan plan = PlanInput.read(file, err);
        if (plan == null) {
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        RunResult r = PlanRun.run(plan);
        int errors = 0;
        for (Problem p : r.problems()) {
            if (p.kind().equals("overstressed")) {
                continue; // sizing is for 'design'; check reports the framing
            }
            err.println(ProblemLines.line(file, p));
            if (p.severity() == Problem.Severity.ERROR) {
                errors++;
            }
        }
        out.println(file + ": " + (errors == 0 ? "no errors" : errors + " error(s)"));
        return errors == 0 ? BaywrightCommand.EXIT_OK : BaywrightCommand.EXIT_OVERSTRESSED;
    }
}
