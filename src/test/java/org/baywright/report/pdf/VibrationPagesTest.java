package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.calc.CalcLine;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.report.BaySummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.BayResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;

/**
 * The part "Floor vibration (AISC DG11)" of the demo's calculation package, read back with PDFBox: every bay in the
 * table with the run's own numbers, one sheet per distinct bay printing the bay's calculation record, the
 * statements naming the check; and a plan without a slab gets none of it.
 */
class VibrationPagesTest {
    @TempDir
    static Path dir;

    static RunResult run;
    static PackageSummary summary;
    static List<String> pages;

    @BeforeAll
    static void writeDemo() throws IOException {
        Plan plan = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        run = PlanRun.run(plan);
        Path pdf = dir.resolve("harbourview.pdf");
        ProjectInfo project = new ProjectInfo("", "BW-0042", "Harbourview Holdings", "Harbour Road", "A. Designer",
                "B. Checker", "A", LocalDate.of(2025, 3, 14));
        summary = CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, project, 10));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            pages = PdfText.pages(doc);
        }
    }

    private static PackageSummary.Entry part() {
        return summary.contents().stream().filter(e -> e.level() == 0 && e.title().endsWith(VibrationPages.TITLE))
                .findFirst().orElseThrow(() -> new AssertionError("no part " + VibrationPages.TITLE + " in the contents"));
    }

    /** The text of the pages from an entry's page to the page before the next entry. */
    private static String from(PackageSummary.Entry e) {
        int next = summary.contents().stream().filter(x -> x.page() > e.page()).mapToInt(PackageSummary.Entry::page).min()
                .orElse(pages.size() + 1);
        StringBuilder b = new StringBuilder();
        for (int k = e.page() - 1; k < Math.max(next - 1, e.page()) && k < pages.size(); k++) {
            b.append(pages.get(k)).append(' ');
        }
        return b.toString();
    }

    @Test
    void theDemoHasBaysAndThePartListsEveryOne() {
        // the demo: 38 bays, 25 meet, 3 exceed, 10 not checked (the roof), as the run's summary line counts them
        assertTrue(BaySummary.present(run));
        String table = from(part());
        List<Executable> checks = new ArrayList<>();
        for (BayResult b : run.bays()) {
            String levels = String.join(", ", b.levels());
            VibrationResult v = b.result();
            // each row: id, levels, then the run's own f_n, a_p/g, limit, ratio and status
            String row = v == null ? b.bay().id() + " " + levels
                    : b.bay().id() + " " + levels + " " + String.format(Locale.ROOT, "%.2f %.3f %.3f", v.fn(), v.apg() * 100,
                            v.limit() * 100) + " " + Fmt.ratio(v.ratio()) + " " + b.status();
            checks.add(() -> assertTrue(table.contains(row), "row: " + row));
        }
        assertEquals(run.bays().size(), checks.size());
        assertTrue(checks.size() >= 19, "the demo has " + checks.size() + " bays by layout");
        assertAll(checks);
    }

    @Test
    void theWorstBayIsInTheTableAndOnItsSheetWithTheRunsNumbers() {
        BayResult worst = BaySummary.worst(run.bays()).orElseThrow();
        VibrationResult v = worst.result();
        assertEquals(VibrationStatus.EXCEEDS, v.status(), "the demo's worst bay exceeds the office limit");
        // the office limit: a_o/g = 0.5 % (AISC DG11 2nd ed. Table 4-1, from memory)
        assertEquals(0.005, v.limit(), 1e-12);
        String table = from(part());
        String fn = String.format(Locale.ROOT, "%.2f", v.fn());
        String apg = String.format(Locale.ROOT, "%.3f", v.apg() * 100);
        assertTrue(table.contains(worst.bay().id() + " " + String.join(", ", worst.levels()) + " " + fn + " " + apg + " 0.500 "
                + Fmt.ratio(v.ratio()) + " exceeds"), table);
        // the summary line under the part's introduction names it too
        assertTrue(PdfText.fold(table).contains(PdfText.fold(BaySummary.line(run))), "summary line");
    }

    @Test
    void oneSheetPerDistinctBayNamingTheBaysThatShareIt() {
        List<VibrationPages.Group> groups = VibrationPages.groups(run.bays(), UnitSystem.US);
        List<PackageSummary.Entry> sheets = summary.contents().stream().filter(e -> e.level() == 1
                && e.title().matches("\\d+\\.\\d+ Bay .*")).toList();
        assertEquals(groups.size(), sheets.size(), "one sheet per group");
        long checked = run.bays().stream().filter(BayResult::checked).count();
        assertEquals(checked, groups.stream().mapToInt(g -> g.bays().size()).sum(), "every checked bay on one sheet");
        assertTrue(groups.size() < checked, "some bays share a sheet");
        List<Executable> checks = new ArrayList<>();
        for (int i = 0; i < groups.size(); i++) {
            VibrationPages.Group g = groups.get(i);
            String title = sheets.get(i).title();
            String text = PdfText.fold(from(sheets.get(i)));
            for (BayResult b : g.bays()) {
                checks.add(() -> assertTrue(text.contains(b.bay().id() + " (" + String.join(", ", b.levels()) + ")"),
                        "sheet " + title + " names " + b.bay().id()));
                // bays sharing a sheet give the same numbers
                checks.add(() -> assertEquals(g.first().result().apg(), b.result().apg(), 0, b.bay().id()));
                checks.add(() -> assertEquals(g.first().result().fn(), b.result().fn(), 0, b.bay().id()));
            }
        }
        assertAll(checks);
    }

    @Test
    void theWorstBaysSheetPrintsItsCalculationRecordLineForLine() {
        BayResult worst = BaySummary.worst(run.bays()).orElseThrow();
        List<VibrationPages.Group> groups = VibrationPages.groups(run.bays(), UnitSystem.US);
        int at = 0;
        while (!groups.get(at).bays().contains(worst)) {
            at++;
        }
        List<PackageSummary.Entry> sheets = summary.contents().stream().filter(e -> e.level() == 1
                && e.title().matches("\\d+\\.\\d+ Bay .*")).toList();
        String sheetText = from(sheets.get(at));
        List<CalcLine> lines = groups.get(at).first().calculation().lines();
        String sheet = CalculationPackageTest.stripReferences(sheetText, lines);
        String raw = PdfText.fold(sheetText);
        List<Executable> checks = new ArrayList<>();
        for (CalcLine l : worst.calculation().lines()) {
            if (l.kind() == CalcLine.Kind.HEADING && groups.get(at).first() != worst) {
                continue; // the headings name the printed bay's own members
            }
            String text = CalculationPackageTest.mainText(l, UnitSystem.US);
            checks.add(() -> assertTrue(sheet.contains(text) || PdfText.inOrder(raw, text), "missing: " + text));
        }
        assertTrue(checks.size() > 20, checks.size() + " lines");
        assertAll(checks);
    }

    @Test
    void theStatementsNameTheCheckItsLimitAndWhatItLeavesOut() {
        String all = String.join(" ", pages);
        assertAll(
                () -> assertTrue(all.contains("Floor vibration from walking is checked for every bay"), "what it is"),
                () -> assertTrue(all.contains("a_o/g = 0.5 % for offices"), "the limit used"),
                () -> assertTrue(all.contains("rhythmic excitation") && all.contains("sensitive equipment"), "not checked"),
                () -> assertFalse(all.contains("Floor vibration from walking, ponding of roofs"),
                        "no longer listed as not checked"),
                () -> assertTrue(pages.stream().limit(8).anyMatch(p -> p.contains("AISC DG11 2nd ed. Ch. 4")),
                        "a row of the design basis"));
    }

    @Test
    void aPlanWithoutASlabHasNoVibrationPart() throws IOException {
        Plan plan = PlanFiles.read(Path.of("plans/examples/two-bay.bay.json")).plan().orElseThrow();
        RunResult bare = PlanRun.run(plan);
        assertFalse(BaySummary.present(bare), "the two-bay example describes no slab");
        Path pdf = dir.resolve("two-bay.pdf");
        PackageSummary s = CalculationPackage.write(bare, pdf, new PackageOptions(UnitSystem.US, ProjectInfo.named("", LocalDate.of(2025, 3, 14)), 10));
        List<String> text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = PdfText.pages(doc);
        }
        String all = String.join(" ", text);
        assertAll(
                () -> assertTrue(s.contents().stream().noneMatch(e -> e.title().contains("vibration"))),
                () -> assertFalse(all.contains("DG11")),
                () -> assertTrue(all.contains("Floor vibration from walking, ponding of roofs"), "still listed as not checked"));
    }
}
