package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.baywright.report.Takeoff;
import org.baywright.report.workbook.TakeoffWorkbook;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/** {@code design --takeoff}: the takeoff as a workbook or as two tidy CSV tables, and its line in the summary. */
final class TakeoffOutput {
    private TakeoffOutput() {
    }

    /** True for a name that asks for a workbook. */
    static boolean workbook(Path file) {
        return file.getFileName() != null && file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".xlsx");
    }

    /**
     * The file the totals go to beside a CSV takeoff: {@code takeoff.csv} → {@code takeoff-totals.csv}
     * (a tidy table holds one kind of row, so the totals are a table of their own).
     */
    static Path totalsFile(Path csv) {
        String name = csv.getFileName().toString();
        String stem = name.toLowerCase(Locale.ROOT).endsWith(".csv") ? name.substring(0, name.length() - 4) : name;
        return csv.resolveSibling(stem + "-totals.csv");
    }

    /** Writes the takeoff and says what was written on {@code err}. */
    static void write(RunResult run, double allowancePercent, UnitSystem us, Path file, PrintWriter err) throws IOException {
        Takeoff t = Takeoff.of(run, allowancePercent);
        if (workbook(file)) {
            TakeoffWorkbook.write(t, us, run.plan().name(), file);
            err.println("wrote " + file + ": takeoff workbook (" + String.join(", ", TakeoffWorkbook.SHEETS) + ")");
            return;
        }
        Files.writeString(file, t.csv(us), StandardCharsets.UTF_8);
        Path totals = totalsFile(file);
        Files.writeString(totals, t.totalsCsv(us), StandardCharsets.UTF_8);
        err.println("wrote " + file + ": takeoff, " + t.lines().size() + " rows of size × level × kind");
        err.println("wrote " + totals + ": takeoff totals");
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
