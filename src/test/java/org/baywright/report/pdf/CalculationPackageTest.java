package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Caution;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.report.Takeoff;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;

/**
 * The calculation package of the demo plan, read back with PDFBox's text extraction: everything a
 * checking engineer needs is in it, where the contents says it is, in embedded fonts, with the caution
 * on every page.
 */
class CalculationPackageTest {
    @TempDir
    static Path dir;

    static RunResult run;
    static PackageSummary summary;
    static List<String> pages;
    static String all;
    static Path pdf;

    @BeforeAll
    static void writeDemo() throws IOException {
        Plan plan = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
        run = PlanRun.run(plan);
        pdf = dir.resolve("harbourview.pdf");
        ProjectInfo project = new ProjectInfo("", "BW-0042", "Harbourview Holdings", "Harbour Road", "A. Designer",
                "B. Checker", "A", LocalDate.of(2025, 3, 14));
        summary = CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, project, 10));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            pages = PdfText.pages(doc);
        }
        all = String.join(" ", pages);
    }

    @Test
    void everyMemberAndColumnSizeAndIdIsPrinted() {
        List<Executable> checks = new ArrayList<>();
        int members = 0;
        for (List<MemberResult> ms : run.takedown().members().values()) {
            for (MemberResult m : ms) {
                members++;
                checks.add(() -> assertTrue(all.contains(m.id()), "member id " + m.id()));
                checks.add(() -> assertTrue(all.contains(m.section()), m.id() + " section " + m.section()));
            }
        }
        for (ColumnResult c : run.takedown().columns()) {
            checks.add(() -> assertTrue(all.contains(c.id()), "column " + c.id()));
            for (ColumnTier t : c.tiers()) {
                checks.add(() -> assertTrue(all.contains(t.section()), c.id() + " tier " + t.section()));
            }
        }
        assertTrue(members > 100, "the demo has " + members + " member designs");
        assertAll(checks);
    }

    @Test
    void theCoverStatesTheDesignBasis() {
        String cover = pages.get(0);
        assertAll(
                () -> assertTrue(cover.contains("AISC 360-16"), cover),
                () -> assertTrue(cover.contains("ASCE 7-16"), cover),
                () -> assertTrue(cover.contains("Specification for Structural Steel Buildings")),
                () -> assertTrue(cover.contains("Minimum Design Loads and Associated Criteria")),
                () -> assertTrue(cover.contains("1.2D + 1.6L"), "combinations"),
                () -> assertTrue(cover.contains("§4.7") && cover.contains("§4.8"), "live-load reduction clauses"),
                () -> assertTrue(cover.contains("L/360") && cover.contains("L/240") && cover.contains("IBC Table 1604.3"),
                        "deflection criteria and their source"),
                () -> assertTrue(cover.contains(run.catalogName()), "catalog " + run.catalogName()),
                () -> assertTrue(cover.contains("Baywright " + run.version()), "program version"),
                () -> assertTrue(cover.contains("2025-03-14"), "date"),
                () -> assertTrue(cover.contains("BW-0042") && cover.contains("Harbourview Holdings"), "project data"),
                () -> assertTrue(cover.contains(run.plan().name())));
    }

    @Test
    void everyPageCarriesTheCautionAndItsNumber() {
        int n = pages.size();
        List<Executable> checks = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String p = pages.get(i);
            String label = "Page " + (i + 1) + " of " + n;
            checks.add(() -> assertTrue(p.contains(Caution.TEXT), label + " lacks the caution"));
            checks.add(() -> assertTrue(p.contains(label), label + " lacks its number"));
        }
        assertAll(checks);
    }

    @Test
    void pageCountAndContentsAgreeWithThePages() {
        assertEquals(pages.size(), summary.pages());
        assertFalse(summary.contents().isEmpty());
        String contents = pages.get(1);
        assertTrue(contents.startsWith("Contents") || contents.contains(" Contents "), contents);
        List<Executable> checks = new ArrayList<>();
        int last = 0;
        for (PackageSummary.Entry e : summary.contents()) {
            int page = e.page();
            assertTrue(page >= last, "contents in page order: " + e);
            last = page;
            checks.add(() -> assertTrue(page >= 1 && page <= pages.size(), e.toString()));
            checks.add(() -> assertTrue(pages.get(page - 1).contains(e.title()), "page " + page + " should show " + e.title()));
            // the contents pages list the title followed by its page number
            checks.add(() -> assertTrue(contentsText().contains(e.title() + " " + page), "contents line " + e.title() + " " + page));
        }
        assertAll(checks);
        for (String part : List.of("Design basis", "Load summary", "Takedown summary", "Member sheets", "Column schedule",
                "Column strengths", "Foundation reactions", "Steel takeoff", "Problems reported by the run")) {
            assertTrue(summary.contents().stream().anyMatch(e -> e.level() == 0 && e.title().contains(part)), part);
        }
    }

    private static String contentsText() {
        StringBuilder b = new StringBuilder();
        for (String p : pages) {
            if (p.contains("Contents")) {
                b.append(p).append(' ');
            }
        }
        return b.toString();
    }

    @Test
    void identicalMembersShareASheet() {
        int designed = 0;
        int groups = 0;
        for (String floor : MemberGroups.floorOrder(run)) {
            List<MemberResult> ms = run.takedown().members().get(floor);
            designed += (int) ms.stream().filter(MemberGroups::designed).count();
            groups += MemberGroups.of(floor, ms).size();
        }
        assertEquals(designed, summary.membersOnSheets(), "every designed member is on a sheet");
        assertEquals(groups, summary.memberSheets());
        assertTrue(summary.memberSheets() * 3 < summary.membersOnSheets(),
                summary.memberSheets() + " sheets for " + summary.membersOnSheets() + " members");
        // a sheet lists the ids of its members on its first page
        List<Executable> checks = new ArrayList<>();
        for (PackageSummary.Entry e : summary.contents()) {
            if (e.level() == 1 && e.title().contains(" members)")) {
                String p = pages.get(e.page() - 1);
                checks.add(() -> assertTrue(p.contains("Members: "), e.title()));
            }
        }
        assertFalse(checks.isEmpty());
        assertAll(checks);
    }

    @Test
    void theTakeoffShowsTonsTonnesAndTheAllowanceApart() {
        Takeoff t = Takeoff.of(run, 10);
        String total = String.format(java.util.Locale.ROOT, "%,.0f", t.total() / org.baywright.units.Units.NEWTONS_PER_POUND);
        String allowance = String.format(java.util.Locale.ROOT, "%,.0f",
                t.allowance() / org.baywright.units.Units.NEWTONS_PER_POUND);
        String tons = String.format(java.util.Locale.ROOT, "%,.2f", Takeoff.shortTons(t.grandTotal()));
        String tonnes = String.format(java.util.Locale.ROOT, "%,.2f", Takeoff.tonnes(t.grandTotal()));
        assertAll(
                () -> assertTrue(all.contains("Members and columns " + total), total),
                () -> assertTrue(all.contains("miscellaneous steel, 10 % " + allowance), allowance),
                () -> assertTrue(all.contains("Total with allowance"), "grand total"),
                () -> assertTrue(all.contains(tons) && all.contains(tonnes), tons + " / " + tonnes),
                () -> assertTrue(all.contains("lb/ft² without the allowance"), "weight per floor area"));
    }

    @Test
    void fontsAreEmbedded() throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            Set<String> names = new HashSet<>();
            for (PDPage p : doc.getPages()) {
                PDResources r = p.getResources();
                for (COSName n : r.getFontNames()) {
                    PDFont font = r.getFont(n);
                    names.add(font.getName());
                    assertTrue(font.isEmbedded(), font.getName() + " is not embedded");
                }
            }
            assertTrue(names.stream().anyMatch(n -> n.contains("DejaVuSans")), names.toString());
            assertTrue(names.stream().anyMatch(n -> n.contains("Bold")), names.toString());
        }
    }

    @Test
    void theCalculationLinesAreTheEngineRecord() {
        // the first member sheet prints, line for line, the record its member's calculation() returns
        // (the framing plans before the sheets are contents entries too)
        PackageSummary.Entry first = summary.contents().stream().filter(e -> e.level() == 1 && !e.title().endsWith("framing plan"))
                .findFirst().orElseThrow();
        String floor = MemberGroups.floorOrder(run).get(0);
        MemberResult m = MemberGroups.of(floor, run.takedown().members().get(floor)).get(0).first();
        assertTrue(first.title().contains(m.section()), first.title());
        // the sheet runs to the page before the next entry (a composite member's sheet takes several pages)
        int next = summary.contents().stream().filter(e -> e.page() > first.page()).mapToInt(PackageSummary.Entry::page).min()
                .orElse(pages.size());
        StringBuilder sheetText = new StringBuilder();
        for (int k = first.page() - 1; k < Math.max(next, first.page() + 1) && k < pages.size(); k++) {
            sheetText.append(pages.get(k)).append(' ');
        }
        String sheet = stripReferences(sheetText.toString(), m.calculation().lines());
        String raw = PdfText.fold(sheetText.toString());
        List<Executable> checks = new ArrayList<>();
        for (CalcLine l : m.calculation().lines()) {
            String text = mainText(l, UnitSystem.US);
            // a line whose clause wraps in the right-hand column comes out of the text extraction interleaved
            // with the clause's lines: then its words are found in order
            checks.add(() -> assertTrue(sheet.contains(text) || PdfText.inOrder(raw, text), "missing: " + text));
        }
        assertTrue(checks.size() > 20);
        assertAll(checks);
    }

    /** The rendered line without its trailing clause (printed in the right-hand column). */
    static String mainText(CalcLine l, UnitSystem us) {
        String full = CalcFormat.render(l, us);
        String suffix = "  (" + l.reference() + ")";
        return PdfText.fold(!l.reference().isEmpty() && full.endsWith(suffix) ? full.substring(0, full.length() - suffix.length())
                : full);
    }

    /** The text with every clause reference removed, longest first, so wrapped lines join up again. */
    static String stripReferences(String text, List<CalcLine> lines) {
        List<String> refs = lines.stream().map(CalcLine::reference).filter(r -> !r.isEmpty()).distinct()
                .sorted(Comparator.comparingInt(String::length).reversed()).toList();
        String t = text;
        for (String r : refs) {
            t = t.replace(r, " ");
        }
        return PdfText.fold(t);
    }

    @Test
    void siPackagesUseA4AndSiUnits() throws IOException {
        Path si = dir.resolve("si.pdf");
        PackageSummary s = CalculationPackage.write(run, si, new PackageOptions(UnitSystem.SI,
                ProjectInfo.named("Harbourview SI", LocalDate.of(2025, 3, 14)), 0));
        try (PDDocument doc = Loader.loadPDF(si.toFile())) {
            PDRectangle box = doc.getPage(0).getMediaBox();
            assertEquals(PDRectangle.A4.getWidth(), box.getWidth(), 0.01);
            assertEquals(PDRectangle.A4.getHeight(), box.getHeight(), 0.01);
            List<String> text = PdfText.pages(doc);
            assertEquals(s.pages(), text.size());
            String t = String.join(" ", text);
            assertTrue(t.contains("Fy = 344.7 MPa"), "steel in MPa");
            assertTrue(t.contains(" kN·m"), "moments in kN·m");
            assertTrue(t.contains("Tonnes"), "tonnes");
            assertFalse(t.contains(" kip-ft"), "no US units in an SI package");
        }
    }
}
