package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.calc.CalcLine;
import org.baywright.design.CompositeDesign;
import org.baywright.report.CompositeRuns;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The composite section of a member sheet, on AISC Design Examples V15 Example I.1 (CHECK-VALUES §7):
 * W21X50 with 46 studs, b_eff = 120 in (60 in each side), Q_n = 17.2 kips, camber 2 in; built by hand
 * ({@link CompositeRuns}).
 */
class CompositeSheetTest {
    @TempDir
    Path dir;

    private List<String> write(RunResult run) throws IOException {
        return write(run, UnitSystem.US);
    }

    private List<String> write(RunResult run, UnitSystem us) throws IOException {
        Path pdf = dir.resolve("package.pdf");
        PackageSummary s = CalculationPackage.write(run, pdf,
                new PackageOptions(us, ProjectInfo.named("", LocalDate.of(2025, 3, 14)), 0));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertEquals(s.pages(), doc.getNumberOfPages());
            return PdfText.pages(doc);
        }
    }

    @Test
    void theCompositeSectionAppearsWithItsNumbers() throws IOException {
        RunResult run = CompositeRuns.mixed();
        MemberResult b1 = run.takedown().members().get("f1").get(0);
        List<String> pages = write(run);
        int at = -1;
        for (int i = 0; i < pages.size(); i++) {
            if (pages.get(i).contains(CompositeSection.HEADING)) {
                at = i;
                break;
            }
        }
        assertTrue(at > 0, "a composite section");
        String sheet = PdfText.fold(pages.get(at) + " " + pages.get(at + 1) + " " + pages.get(at + 2));
        String all = PdfText.fold(String.join(" ", pages));
        long sections = pages.stream().filter(p -> p.contains(CompositeSection.HEADING)).count();
        assertAll("Example I.1 sheet",
                // one sheet for B-1 and B-2 (same section, studs and camber), none for the bare W18X50
                () -> assertEquals(1, sections, "one composite section"),
                () -> assertTrue(all.contains("[W21X50] (46) c=2\" beams, span 45 ft (2 members)")
                        || all.contains("W21X50 (46) c=2\" beams, span 45 ft (2 members)"), "the sheet title"),
                () -> assertTrue(sheet.contains("b_eff,left = 60 in"), "b_eff left (I3.1a: 5 ft a side)"),
                () -> assertTrue(sheet.contains("b_eff,right = 60 in"), "b_eff right"),
                () -> assertTrue(sheet.contains("120 in = 60 in left + 60 in right"), "b_eff total, 120 in"),
                () -> assertTrue(sheet.matches(".*\\b17\\.2\\d? kip per stud.*"), "Qn, Table 3-21 17.2 kips (from memory)"),
                () -> assertTrue(sheet.contains("23 between each support and midspan, 46 on the member"), "stud layout"),
                () -> assertTrue(sheet.contains("PNA (top flange)"), "the PNA on the sketch"),
                () -> assertTrue(sheet.contains("I_LB ="), "I_LB"),
                () -> assertTrue(sheet.contains("Commentary Eqs. C-I3-1, C-I3-2"), "its clause"),
                () -> assertTrue(sheet.contains("I8.2a, Eq. I8-1"), "the stud clause"),
                () -> assertTrue(all.contains("Composite design: 2 beams and girders act with the concrete slab"), "the statement"),
                () -> assertTrue(all.contains("composite beams Chapter I"), "the standards table"),
                () -> assertTrue(all.contains("Members on a floor whose deck carries a described slab act with it"),
                        "the statements for review"),
                () -> assertFalse(all.contains("no composite action with the slab is counted"), "no longer said"));
    }

    /** Every equation of the composite calculation is printed, as the bare sheets print theirs. */
    @Test
    void theCalculationLinesArePrinted() throws IOException {
        RunResult run = CompositeRuns.mixed();
        MemberResult b1 = run.takedown().members().get("f1").get(0);
        String all = PdfText.fold(String.join(" ", write(run)));
        // a line whose clause wraps in the right-hand column comes out of the text extraction interleaved with
        // it: look for the line's words in order
        List<org.junit.jupiter.api.function.Executable> checks = new java.util.ArrayList<>();
        for (CalcLine l : b1.calculation().lines()) {
            String text = CalculationPackageTest.mainText(l, UnitSystem.US);
            checks.add(() -> assertTrue(PdfText.inOrder(all, text), "missing: " + text));
        }
        assertTrue(checks.size() > 20, "the composite sheet records its equations");
        assertAll(checks);
    }

    @Test
    void membersWithOtherStudsOrCamberHaveTheirOwnSheet() {
        CompositeDesign d = CompositeRuns.w21x50();
        CompositeDesign more = CompositeRuns.designerI1().check(d.section(), 24, null);
        MemberResult a = CompositeRuns.composite("B-1", 0, d);
        MemberResult b = CompositeRuns.composite("B-2", 0, d);
        MemberResult c = CompositeRuns.composite("B-3", 0, more);
        assertAll("grouping",
                () -> assertTrue(MemberGroups.same(a, b)),
                () -> assertFalse(MemberGroups.same(a, c), "46 against 48 studs"),
                () -> assertFalse(MemberGroups.sameComposite(a, CompositeRuns.bare("B-4", 0))));
    }

    /** In SI the sketch and the table read in millimetres: 60 in = 1,524 mm a side (exact conversion). */
    @Test
    void siSheetsReadInMillimetres() throws IOException {
        String all = PdfText.fold(String.join(" ", write(CompositeRuns.mixed(), UnitSystem.SI)));
        assertAll("SI",
                () -> assertTrue(all.contains("b_eff,left = 1524 mm"), "b_eff left"),
                () -> assertTrue(all.contains("c=51 mm"), "camber 2 in = 50.8 mm, whole millimetres"));
    }
}
