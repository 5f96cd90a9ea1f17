package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.baywright.calc.Caution;
import org.baywright.design.MemberStatus;
import org.baywright.io.JsonText;
import org.baywright.load.DesignMethod;
import org.baywright.plan.Plan;
import org.baywright.report.ColumnSchedule;
import org.baywright.report.drawing.DrawingExport;
import org.baywright.report.drawing.DrawingOptions;
import org.baywright.report.drawing.ReactionMode;
import org.baywright.report.pdf.CalculationPackage;
import org.baywright.report.pdf.PackageOptions;
import org.baywright.report.pdf.ProjectInfo;
import org.baywright.report.RunSummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code baywright design}: run a plan. */
@Command(name = "design", mixinStandardHelpOptions = true,
        description = {"Run a plan: tributary areas, the load takedown and the sizing of every beam, girder and column.",
            "Prints a summary; --json writes the full result (see docs/design-output.md).",
            "Exit code: 0 everything sized; 1 some member overstressed or unsupported; 2 bad input."},
        footer = {"", Caution.TEXT})
public final class DesignCommand implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(paramLabel = "PLAN.bay.json")
    Path file;

    @Option(names = "--method", paramLabel = "lrfd|asd", description = "Override the plan's design method.")
    String method;

    @Option(names = "--units", paramLabel = "us|si", description = "Units of the output (default: the plan's).")
    String units;

    @Option(names = "--json", paramLabel = "OUT|-", description = "Write the full result as JSON to a file, or - for standard output.")
    String json;

    @Option(names = "--report", paramLabel = "FILE.pdf", description = "Write the calculation package (PDF): design basis, loads, a sheet per member group, column schedule, foundations, takeoff.")
    Path report;

    @Option(names = "--drawing", paramLabel = "FILE.svg|png|pdf", description = "Write the framing plan of a level (the format follows the extension).")
    Path drawing;

    @Option(names = "--level", paramLabel = "NAME", description = "The level drawn by --drawing (default: the first level).")
    String level;

    @Option(names = "--reactions", paramLabel = "factored|service", defaultValue = "factored", description = "End reactions on the drawing (default ${DEFAULT-VALUE}).")
    String reactions;

    @Option(names = "--takeoff", paramLabel = "FILE.xlsx|FILE.csv", description = "Write the steel takeoff: a workbook (.xlsx) with one sheet per table (size × level × kind, by size, by level, by kind, totals), or a CSV of size × level × kind rows with the totals in FILE-totals.csv.")
    Path takeoff;

    @Option(names = "--schedule", paramLabel = "FILE.csv", description = "Write the column schedule (tiers, axial loads per level and case, foundation reactions) as CSV.")
    Path schedule;

    @Option(names = "--allowance", paramLabel = "PERCENT", defaultValue = "0", description = "Connection and miscellaneous steel allowance added to the takeoff, in percent (default ${DEFAULT-VALUE}), shown separately.")
    double allowance;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Plan plan = PlanInput.read(file, err);
        if (plan == null) {
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        PlanInput.checkOutput("--json", json == null || json.equals("-") ? null : Path.of(json), file);
        PlanInput.checkOutput("--takeoff", takeoff, file);
        PlanInput.checkOutput("--schedule", schedule, file);
        if (method != null) {
            DesignMethod m = DesignMethod.parse(method);
            if (m == null) {
                throw new BadInputException("--method: \"" + method + "\" is not a design method; use lrfd or asd");
            }
            plan = org.baywright.study.Variations.method(plan, m.name().toLowerCase(Locale.ROOT));
        }
        UnitSystem asked = units == null ? null : UnitSystem.parse(units);
        if (units != null && asked == null) {
            throw new BadInputException("--units: \"" + units + "\" is not a unit system; use us or si");
        }
        if (!(allowance >= 0 && allowance <= 100)) {
            throw new BadInputException("--allowance: " + allowance + " is not allowed; use a percentage from 0 to 100");
        }
        RunResult r = PlanRun.run(plan);
        UnitSystem us = asked != null ? asked : r.basis().units();
        if (r.takedown() != null) {
            if (takeoff != null) {
                TakeoffOutput.write(r, allowance, us, takeoff, err);
            }
            if (schedule != null) {
                Files.writeString(schedule, ColumnSchedule.csv(r, us), StandardCharsets.UTF_8);
            }
            if (drawing != null) {
                String lv = level != null ? level : plan.levels().get(0).name();
                if (plan.levels().stream().noneMatch(l -> l.name().equals(lv))) {
                    throw new BadInputException("--level: \"" + lv + "\" is not a level of the plan; levels: "
                            + String.join(", ", plan.levels().stream().map(org.baywright.plan.Level::name).toList()));
                }
                DrawingOptions opts = DrawingOptions.defaults().withUnits(us);
                opts = switch (reactions.trim().toLowerCase(Locale.ROOT)) {
                    case "factored" -> opts.withReactions(ReactionMode.FACTORED);
                    case "service" -> opts.withReactions(ReactionMode.SERVICE);
                    default -> throw new BadInputException("--reactions: \"" + reactions + "\" is not allowed; use factored or service");
                };
                opts = opts.withDate(java.time.LocalDate.now().toString());
                try {
                    DrawingExport.write(r, lv, drawing, opts);
                } catch (IllegalArgumentException e) {
                    throw new BadInputException("--drawing: " + e.getMessage(), e);
                }
                err.println("wrote " + drawing + ": framing plan of " + lv);
            }
            if (report != null) {
                var summary = CalculationPackage.write(r, report, PackageOptions.of(us)
                        .withProject(ProjectInfo.named(plan.name(), java.time.LocalDate.now())).withAllowance(allowance));
                err.println("wrote " + report + ": " + summary.pages() + " pages");
            }
        }
        PlanInput.writeResult(out, json, () -> JsonText.write(RunSummary.json(r, us)), () -> TakeoffOutput.withSummaryLine(RunSummary.text(r, us), r, allowance, us));
        for (org.baywright.plan.Problem p : r.problems()) {
            err.println(ProblemLines.line(file, p)); // also in the summary; standard error has them one per line
        }
        out.flush();
        if (r.takedown() == null) {
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        var counts = RunSummary.statusCounts(r.takedown());
        boolean bad = counts.get(MemberStatus.OVERSTRESSED) > 0 || counts.get(MemberStatus.UNSUPPORTED) > 0
                || r.problems().stream().anyMatch(p -> p.severity() == org.baywright.plan.Problem.Severity.ERROR);
        return bad ? BaywrightCommand.EXIT_OVERSTRESSED : BaywrightCommand.EXIT_OK;
    }
}
