package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import org.baywright.report.Takeoff;
import org.baywright.report.workbook.TakeoffFiles;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/** {@code design --takeoff}: the takeoff files ({@link TakeoffFiles}) and the takeoff line of the summary. */
final class TakeoffOutput {
    private TakeoffOutput() {
    }

    /** Writes the takeoff and says what was written on {@code err}. */
    static void write(RunResult run, double allowancePercent, UnitSystem us, Path file, PrintWriter err) throws IOException {
        for (String line : TakeoffFiles.write(Takeoff.of(run, allowancePercent), us, run.plan().name(), file)) {
            err.println("wrote " + line);
        }
    }

    /** The run's text summary with the takeoff line (if any) after its steel weight line. */
    static String withSummaryLine(String summary, RunResult run, double allowancePercent, UnitSystem us) {
        String line = summaryLine(run, allowancePercent, us);
        int at = summary.indexOf("Steel weight:");
        if (line.isEmpty() || at < 0) {
            return summary + line;
        }
        int end = summary.indexOf('\n', at);
        return end < 0 ? summary + System.lineSeparator() + line : summary.substring(0, end + 1) + line + summary.substring(end + 1);
    }

    /**
     * The summary's takeoff line when an allowance is asked for: the bare weight, the allowance and the
     * total with it (the summary's steel weight line is the bare weight); empty without an allowance.
     */
    static String summaryLine(RunResult run, double allowancePercent, UnitSystem us) {
        if (run.takedown() == null || allowancePercent == 0) {
            return "";
        }
        Takeoff t = Takeoff.of(run, allowancePercent);
        boolean usc = us == UnitSystem.US;
        String wu = Takeoff.weightUnit(us);
        double tons = usc ? Takeoff.shortTons(t.grandTotal()) : Takeoff.tonnes(t.grandTotal());
        return String.format(Locale.US, "Takeoff: %,.0f %s members and columns + %s %% allowance %,.0f %s = %,.0f %s (%.1f %s)\n",
                Takeoff.weightIn(t.total(), us), wu, org.baywright.calc.CalcFormat.sig(allowancePercent),
                Takeoff.weightIn(t.allowance(), us), wu, Takeoff.weightIn(t.grandTotal(), us), wu, tons,
                usc ? "short tons" : "tonnes");
    }
}
