package org.baywright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Caution;
import org.baywright.design.dg11.BayVibration;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.io.JsonText;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.VibrationSettings;
import org.baywright.report.BaySummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayChecks;
import org.baywright.takedown.BayResult;
import org.baywright.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code baywright bay}: the floor-vibration check of one bay of a plan, with its calculation. */
@Command(name = "bay", mixinStandardHelpOptions = true,
        description = {"Check one bay of a plan for floor vibration from walking (AISC Design Guide 11, 2nd ed., low-frequency floors).",
            "Prints what the plan gives the bay (spans, spacing, floor extents, slab, realistic loads, continuity), the result, and the calculation: each equation as formula, substitution and result, with its reference.",
            "A bay is named by its grid lines, lettered then numbered: B-C/2-3.",
            "Bays are checked where the deck describes a slab, for offices (a_o/g = 0.5 %), a paper office's damping and 11 psf of live load.",
            "Exit code: 0 the bay meets the limit, is above 9 Hz or is not checked; 1 it exceeds the limit; 2 bad input."},
        footer = {"", Caution.TEXT})
public final class BayCommand implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(paramLabel = "PLAN.bay.json")
    Path file;

    @Option(names = "--level", required = true, paramLabel = "NAME", description = "The level the bay is on.")
    String level;

    @Option(names = "--bay", required = true, paramLabel = "ID", description = "The bay, by its grid lines (e.g. B-C/2-3) or, off the grid, by the members carrying its beams.")
    String bayId;

    @Option(names = "--units", paramLabel = "us|si", description = "Units of the output (default: the plan's).")
    String units;

    @Option(names = "--json", description = "Print the check as JSON (the design output's bays[] entry with the calculation).")
    boolean json;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Plan plan = PlanInput.read(file, err);
        if (plan == null) {
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        UnitSystem asked = units == null ? null : UnitSystem.parse(units);
        if (units != null && asked == null) {
            throw new BadInputException("--units: \"" + units + "\" is not a unit system; use us or si");
        }
        Level lv = plan.levels().stream().filter(l -> l.name().equals(level)).findFirst()
                .or(() -> plan.levels().stream().filter(l -> l.name().equalsIgnoreCase(level.trim())).findFirst())
                .orElseThrow(() -> new BadInputException("--level: \"" + level + "\" is not a level of the plan; levels: "
                        + String.join(", ", plan.levels().stream().map(Level::name).toList())));
        RunResult r = PlanRun.run(plan);
        if (r.takedown() == null) {
            for (org.baywright.plan.Problem p : r.problems()) {
                err.println(ProblemLines.line(file, p));
            }
            return BaywrightCommand.EXIT_BAD_INPUT;
        }
        List<BayResult> all = r.bays().isEmpty() ? BayChecks.of(plan, r.takedown(), PlanRun.vibrationSettings(plan)) : r.bays();
        List<BayResult> here = all.stream().filter(b -> b.levels().contains(lv.name())).toList();
        String want = bayId.trim().toLowerCase(Locale.ROOT);
        BayResult b = here.stream().filter(x -> x.bay().id().toLowerCase(Locale.ROOT).equals(want)).findFirst()
                .orElseThrow(() -> new BadInputException("--bay: \"" + bayId + "\" is not a bay of " + lv.name() + "; "
                        + (here.isEmpty() ? "it has none (a bay is a panel whose beams rest on girders at both ends)"
                                : "bays: " + String.join(", ", here.stream().map(x -> x.bay().id()).toList()))));
        UnitSystem us = asked != null ? asked : r.basis().units();
        Calc sheet = b.calculation();
        if (json) {
            Map<String, Object> o = BaySummary.bay(b, lv.name(), us);
            List<String> lines = new ArrayList<>();
            if (sheet != null) {
                for (CalcLine line : sheet.lines()) {
                    lines.add(CalcFormat.render(line, us));
                }
            }
            o.put("calculation", lines);
            o.put("caution", Caution.TEXT);
            out.print(JsonText.write(o));
        } else {
            printText(out, b, lv.name(), us);
            if (sheet != null) {
                BeamCommand.printSheet(out, sheet, us);
            } else {
                out.println();
                out.println(Caution.TEXT);
            }
        }
        out.flush();
        return b.checked() && b.result().status() == VibrationStatus.EXCEEDS ? BaywrightCommand.EXIT_OVERSTRESSED
                : BaywrightCommand.EXIT_OK;
    }

    private static void printText(PrintWriter out, BayResult r, String level, UnitSystem us) {
        Bay bay = r.bay();
        out.println("Bay " + bay.id() + " at " + level + " (floor layout " + bay.floor()
                + "): floor vibration from walking, AISC DG11 2nd ed., low-frequency floors");
        out.println("Beams: " + String.join(", ", bay.beams()) + "; " + bay.beam() + " checked (" + bay.beamSection().designationIn(us)
                + "), span " + us.lengthText(bay.beamSpan()) + ", spacing " + us.lengthText(bay.spacing())
                + continuity(bay.beamSpan(), bay.beamAdjacentSpan(), us));
        for (Bay.BayGirder g : bay.girders()) {
            out.println("Carried by " + g.id() + " (" + g.section().designationIn(us) + "), span " + us.lengthText(g.span())
                    + ", carrying " + us.lengthText(g.carriedWidth()) + " of floor" + (g.bothSides() ? "" : " (an edge girder)")
                    + continuity(g.span(), g.adjacentSpan(), us)
                    + (g.id().equals(r.girder()) ? "; governs" : ""));
        }
        out.println("Floor: " + extent(bay.floorWidth(), us) + " across the beams, " + extent(bay.floorLength(), us)
                + " along them; " + (bay.edge() ? "edge bay (a side along the beams at the slab edge: C_j = 1.0)" : "interior bay"));
        if (!r.checked()) {
            out.println("Status: " + r.note());
            return;
        }
        BayVibration v = r.inputs().vibration();
        VibrationSettings s = r.settings();
        out.println("Use: " + s.use().name().toLowerCase(Locale.ROOT).replace('_', ' ') + " (a_o/g = "
                + CalcFormat.sig(v.limit() * 100) + " %); damping β = " + CalcFormat.sig(v.beta()) + " ("
                + (Double.isNaN(s.damping()) ? s.effectiveFitOut().name().toLowerCase(Locale.ROOT).replace('_', ' ') : "given")
                + "); slab " + us.areaLoadText(r.inputs().slabWeight()) + ", superimposed dead " + us.areaLoadText(r.superimposed())
                + ", vibration live load " + us.areaLoadText(r.inputs().live()));
        out.println("Result: " + r.result().summary());
    }

    private static String continuity(double span, double adjacent, UnitSystem us) {
        if (!(adjacent > 0)) {
            return "; no span continues it";
        }
        boolean yes = adjacent >= 0.7 * span;
        return "; the span in line is " + us.lengthText(adjacent) + (yes ? " ≥ 0.7 × span: continuous" : " < 0.7 × span: not continuous");
    }

    private static String extent(double metres, UnitSystem us) {
        return Double.isFinite(metres) ? us.lengthText(metres) : "unbounded";
    }
}
