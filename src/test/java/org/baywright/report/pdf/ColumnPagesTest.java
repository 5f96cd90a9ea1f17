package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The column strength pages print the E3 calculation of the sections the run chose from the run's own
 * catalog, even when that catalog is not the file the plan's settings name (a study or a command line
 * may hand the run another).
 */
class ColumnPagesTest {
    @TempDir
    Path dir;

    @Test
    void strengthsComeFromTheCatalogOfTheRun() throws IOException {
        Catalog builtIn = CatalogFile.loadDefault();
        // the built-in W14 shapes under other names: no catalog file has them
        List<Section> sections = builtIn.sections().stream()
                .map(s -> s.series().equals("W14") ? new Section("X" + s.designation(), s.weight(), s.dims(), s.tabulated()) : s)
                .toList();
        Catalog house = new Catalog("house shapes", "test", sections);
        Plan demo = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        Plan plan = new Plan(demo.name(), demo.units(), demo.settings().withColumnSeries(List.of("XW14")), demo.grid(),
                demo.levels(), demo.floors(), demo.columns());
        RunResult run = PlanRun.run(plan, house);
        Path pdf = dir.resolve("house.pdf");
        CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, ProjectInfo.named("house", LocalDate.of(2025, 3, 14)), 0));
        String all;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            all = String.join(" ", PdfText.pages(doc));
        }
        String strengths = all.substring(all.indexOf("Used in: "));
        assertAll(
                () -> assertTrue(run.takedown().columns().get(0).tiers().get(0).section().startsWith("XW14X"), "sized from the run's catalog"),
                () -> assertTrue(strengths.contains("XW14X"), "the strength pages name the run's sections"),
                () -> assertTrue(strengths.contains("Available strength used in the schedule"), "and print their calculation"),
                () -> assertFalse(strengths.contains("is not in the catalog"), "no section is missing"));
    }
}
