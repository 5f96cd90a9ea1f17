package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.baywright.catalog.Section;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.StoreyLoad;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The column pages of the demo's package show the moment derivation (reactions, eccentricities, live-load
 * pattern, split) and the AISC 360-16 H1.1 interaction, line for line as the column design records them.
 */
class ColumnMomentPagesTest {
    @TempDir
    static Path dir;

    @Test
    void theColumnSheetShowsTheMomentsAndTheInteraction() throws IOException {
        Plan plan = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        RunResult run = PlanRun.run(plan);
        Path pdf = dir.resolve("demo.pdf");
        CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, new ProjectInfo("", "BW-1", "", "", "", "", "A",
                LocalDate.of(2026, 12, 2)), 10));
        String all;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            all = String.join(" ", PdfText.pages(doc));
        }
        ColumnResult c = run.takedown().columns().stream().filter(x -> x.grid().equals("D-1")).findFirst().orElseThrow();
        ColumnTier tier = c.tiers().get(0);
        StoreyLoad worst = tier.storeys().stream().max((a, b) -> Double.compare(a.interaction().ratio(), b.interaction().ratio()))
                .orElseThrow();
        Section s = run.basis().catalog().find(tier.section()).orElseThrow();
        Calc calc = new Calc();
        run.basis().columnDesigner().record(worst.interaction(), s, worst.interaction().pc(), calc);
        String folded = CalculationPackageTest.stripReferences(all, calc.lines());
        List<String> expected = calc.lines().stream().filter(l -> l.kind() == CalcLine.Kind.EQUATION)
                .filter(l -> l.symbol().startsWith("e_") || l.symbol().startsWith("H1") || l.symbol().startsWith("M_"))
                .map(l -> CalculationPackageTest.mainText(l, UnitSystem.US)).toList();
        assertAll(
                () -> assertTrue(all.contains("Column moments and interaction"), "the part"),
                () -> assertTrue(all.contains(c.id() + ", storey below"), "the sheet of " + c.id()),
                () -> assertTrue(expected.size() >= 4, expected.toString()),
                () -> expected.forEach(t -> assertTrue(folded.contains(t), "missing: " + t)));
    }
}
