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
import org.baywright.calc.Caution;
import org.baywright.plan.Problem;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A member sheet against a published design example, the grouping rule, and packages of unusual runs. */
class MemberSheetTest {
    @TempDir
    Path dir;

    private List<String> write(RunResult run, PackageOptions options) throws IOException {
        Path pdf = dir.resolve("package.pdf");
        PackageSummary s = CalculationPackage.write(run, pdf, options);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertEquals(s.pages(), doc.getNumberOfPages());
            return PdfText.pages(doc);
        }
    }

    private static PackageOptions us() {
        return new PackageOptions(UnitSystem.US, ProjectInfo.named("", LocalDate.of(2025, 3, 14)), 0);
    }

    /**
     * AISC Design Examples V15.1, Example F.1-1B (FOUND): W18X50, Fy = 50 ksi, Zx = 101 in³, 35 ft span,
     * wD = 0.45 klf, wL = 0.75 klf, continuously braced: Mu = 266 kip-ft, Mn = Mp = 5,050 kip-in (421 kip-ft),
     * φbMn = 379 kip-ft. To four figures (as FlexureValidationTest computes them): Mp = 420.8 kip-ft,
     * φb·Mn = 378.8 kip-ft, Mu = 1.74 klf · (35 ft)² / 8 = 266.4 kip-ft.
     */
    @Test
    void theSheetOfExampleF11PrintsItsNumbers() throws IOException {
        MemberResult m = OneMemberRun.member("B-F1", 35, 0.45, 0.75, "W18X50");
        List<String> pages = write(OneMemberRun.run(List.of(m)), us());
        int sheetPage = -1;
        for (int i = 0; i < pages.size(); i++) {
            if (pages.get(i).contains("W18X50 beam, span 35 ft (B-F1)") && pages.get(i).contains("Service loads")) {
                sheetPage = i;
            }
        }
        assertTrue(sheetPage > 0, "the member sheet");
        String sheet = pages.get(sheetPage) + " " + pages.get(sheetPage + 1);
        assertAll(
                () -> assertTrue(sheet.contains("Mp = Fy · Zx = 50 ksi · 101 in³ = 420.8 kip-ft"), "Eq. F2-1 line"),
                () -> assertTrue(sheet.contains("φb·Mn = φb · Mn = 0.9 · 420.8 kip-ft = 378.8 kip-ft"), "available flexure"),
                () -> assertTrue(sheet.contains("Mu = 266.4 kip-ft, x = 17.5 ft"), "required flexure"),
                () -> assertTrue(sheet.contains("flexure 1.2D + 1.6L 266.4 kip-ft 378.8 kip-ft 0.703"), "checks table row"),
                () -> assertTrue(sheet.contains("Mmax = 266.4 kip-ft at x = 17.5 ft"), "moment diagram label"),
                () -> assertTrue(sheet.contains("V(0) = 30.45 kip"), "shear diagram label: 1.74 klf · 35 ft / 2"),
                () -> assertTrue(sheet.contains("wsw = 0 klf"), "no own weight added, as in the example"),
                () -> assertTrue(sheet.contains("The size was fixed in the plan"), "fixed size: no search"),
                () -> assertTrue(sheet.contains(Caution.TEXT)));
    }

    @Test
    void identicalMembersShareASheetAndDifferentOnesDoNot() {
        MemberResult a = OneMemberRun.member("B-1", 35, 0.45, 0.75, "W18X50");
        MemberResult b = OneMemberRun.member("B-2", 35, 0.45, 0.75, "W18X50");
        MemberResult heavier = OneMemberRun.member("B-3", 35, 0.45, 0.76, "W18X50");
        MemberResult shorter = OneMemberRun.member("B-4", 34, 0.45, 0.75, "W18X50");
        MemberResult deeper = OneMemberRun.member("B-5", 35, 0.45, 0.75, "W21X44");
        List<MemberGroups.Group> g = MemberGroups.of("f1", List.of(a, b, heavier, shorter, deeper));
        assertEquals(4, g.size());
        assertEquals(List.of("B-1", "B-2"), g.get(0).ids());
        assertEquals(List.of("B-3"), g.get(1).ids());
    }

    @Test
    void aGroupSheetListsEveryMember() throws IOException {
        List<MemberResult> ms = List.of(OneMemberRun.member("B-1", 35, 0.45, 0.75, "W18X50"),
                OneMemberRun.member("B-2", 35, 0.45, 0.75, "W18X50"), OneMemberRun.member("B-3", 35, 0.45, 0.75, "W18X50"));
        List<String> pages = write(OneMemberRun.run(ms), us());
        String all = String.join(" ", pages);
        assertTrue(all.contains("W18X50 beams, span 35 ft (3 members)"), "one sheet for three");
        assertTrue(all.contains("Members: B-1, B-2, B-3"));
        assertFalse(all.contains("4.2 W18X50"), "no second sheet");
    }

    @Test
    void aRunThatStoppedStillGivesACoverAndItsProblems() throws IOException {
        RunResult ok = OneMemberRun.run(List.of(OneMemberRun.member("B-1", 35, 0.45, 0.75, "W18X50")));
        RunResult stopped = new RunResult(ok.plan(), null,
                List.of(Problem.error("catalog", "/settings/catalog", "", "catalog file missing.csv not found")), "", "test", 0);
        List<String> pages = write(stopped, us());
        String all = String.join(" ", pages);
        assertTrue(pages.get(0).contains(Caution.TEXT));
        assertTrue(all.contains("catalog file missing.csv not found"), "the problem is printed");
        assertFalse(all.contains("Member sheets"), "nothing to print sheets from");
    }

    @Test
    void charactersTheFontLacksPrintAsQuestionMarks() throws IOException {
        RunResult run = OneMemberRun.run(List.of(OneMemberRun.member("B-1", 35, 0.45, 0.75, "W18X50")));
        List<String> pages = write(run, new PackageOptions(UnitSystem.US,
                ProjectInfo.named("Tower 塔 A", LocalDate.of(2025, 3, 14)), 0));
        assertTrue(pages.get(0).contains("Tower ? A"), pages.get(0));
    }

    /**
     * The shear and moment diagrams are drawn under the combination that governs flexure, taken from the
     * flexure check itself. Light dead and heavy live load: 1.2D + 1.6L governs over 1.4D (ASCE 7-16
     * §2.3.1, from memory); heavy dead load alone (live ≈ 0): 1.4D does.
     */
    @Test
    void theDiagramsUseTheCombinationThatGovernsFlexure() {
        MemberResult live = OneMemberRun.member("B-1", 30, 0.4, 1.0, "W18X50");
        MemberResult dead = OneMemberRun.member("B-2", 30, 1.0, 0.01, "W18X50");
        assertAll(
                () -> assertEquals("1.2D + 1.6L", MemberSheets.governingCombination(live).name()),
                () -> assertEquals("1.4D", MemberSheets.governingCombination(dead).name()),
                () -> assertTrue(live.design().checks().stream().anyMatch(
                        c -> c.loadCombination() == MemberSheets.governingCombination(live)), "the flexure check's own combination"));
    }
}
