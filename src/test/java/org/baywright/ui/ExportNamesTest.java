package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The names and folder File › Export offers. */
class ExportNamesTest {
    @Test
    void namesComeFromThePlanAndTheLevel() {
        Path file = Path.of("plans", "harbourview-offices.bay.json");
        assertAll(
                () -> assertEquals("harbourview-offices-level-3.pdf", ExportNames.name("Harbourview Offices", file, "Level 3", null, "pdf")),
                () -> assertEquals("harbourview-offices-calculations.pdf",
                        ExportNames.name("Harbourview Offices", file, null, "calculations", ".pdf")),
                () -> assertEquals("harbourview-offices-takeoff.xlsx", ExportNames.name("x", file, null, "takeoff", ".xlsx")),
                // a plan without a file is named by its name
                () -> assertEquals("quai-sud-b-roof.svg", ExportNames.name("Quai Sud — B", null, "Roof", null, "SVG")),
                () -> assertEquals("plan-level-1.png", ExportNames.name("  ", null, "Level 1", null, ".png")),
                () -> assertEquals("depot-2-columns.csv", ExportNames.name("Dépôt #2", null, "", "columns", ".csv")),
                () -> assertEquals("warehouse-level-2.pdf", ExportNames.name("ignored", Path.of("Warehouse.json"), "Level 2", null, ".pdf")));
    }

    @Test
    void theFolderIsThePlansElseTheLastExportsElseNone(@TempDir Path dir) throws Exception {
        Path plans = Files.createDirectories(dir.resolve("plans"));
        Path out = Files.createDirectories(dir.resolve("out"));
        Path planFile = plans.resolve("a.bay.json");
        assertAll(
                () -> assertEquals(Optional.of(plans.toAbsolutePath()), ExportNames.folder(planFile, out.toString())),
                () -> assertEquals(Optional.of(out), ExportNames.folder(null, out.toString())),
                () -> assertEquals(Optional.empty(), ExportNames.folder(null, dir.resolve("gone").toString())),
                () -> assertEquals(Optional.of(out), ExportNames.folder(dir.resolve("gone/a.bay.json"), out.toString())),
                () -> assertEquals(Optional.empty(), ExportNames.folder(null, null)));
    }
}
