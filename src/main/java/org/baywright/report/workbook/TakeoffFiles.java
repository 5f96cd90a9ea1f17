package org.baywright.report.workbook;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.baywright.report.Takeoff;
import org.baywright.units.UnitSystem;

/**
 * Writes a takeoff where the user asked for it, the same from the command line and the editor: a name
 * ending in {@code .xlsx} gets the workbook; any other name the tidy size × level × kind table as CSV,
 * with the totals beside it in {@code NAME-totals.csv} (a tidy table holds one kind of row).
 */
public final class TakeoffFiles {
    private TakeoffFiles() {
    }

    /** True for a name that asks for a workbook. */
    public static boolean workbook(Path file) {
        return file.getFileName() != null && file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".xlsx");
    }

    /** The totals file beside a CSV takeoff: {@code takeoff.csv} → {@code takeoff-totals.csv}. */
    public static Path totalsFile(Path csv) {
        String name = csv.getFileName().toString();
        String stem = name.toLowerCase(Locale.ROOT).endsWith(".csv") ? name.substring(0, name.length() - 4) : name;
        return csv.resolveSibling(stem + "-totals.csv");
    }

    /**
     * Writes the takeoff; returns one line per file written, saying what it holds (for the CLI's
     * "wrote" lines and the editor's status).
     */
    public static List<String> write(Takeoff t, UnitSystem us, String title, Path file) throws IOException {
        if (workbook(file)) {
            TakeoffWorkbook.write(t, us, title, file);
            return List.of(file + ": takeoff workbook (" + String.join(", ", TakeoffWorkbook.SHEETS) + ")");
        }
        Files.writeString(file, t.csv(us), StandardCharsets.UTF_8);
        Path totals = totalsFile(file);
        Files.writeString(totals, t.totalsCsv(us), StandardCharsets.UTF_8);
        return List.of(file + ": takeoff, " + t.lines().size() + " rows of size × level × kind"
                + (t.composite() ? " with studs and camber (" + t.studs() + " studs, " + t.camberedPieces() + " pieces cambered)" : ""),
                totals + ": takeoff totals");
    }
}
