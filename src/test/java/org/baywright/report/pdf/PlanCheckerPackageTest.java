package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What a plan checker asks of the package, read back from the PDF's text: a framing plan of each level
 * drawn by the drawing code, the derivation of every area load, and the roof members' deflection rows.
 */
class PlanCheckerPackageTest {
    @TempDir
    static Path dir;
    private static RunResult twoBay;
    private static List<String> pages;

    private static List<String> write(RunResult run, String name) throws IOException {
        Path pdf = dir.resolve(name);
        CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, ProjectInfo.named("Two bays",
                LocalDate.of(2026, 12, 2)), 0));
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return PdfText.pages(doc);
        }
    }

    @BeforeAll
    static void twoBayPackage() throws IOException {
        twoBay = PlanRun.run(PlanFiles.read(Path.of("plans", "examples", "two-bay.bay.json")).plan().orElseThrow());
        pages = write(twoBay, "two-bay.pdf");
    }

    private static List<String> pagesWith(String text) {
        return pages.stream().filter(p -> p.contains(text)).collect(Collectors.toList());
    }

    /** One page per level of the two-bay plan (a roof and Level 2, different layouts), the drawing's texts on it. */
    @Test
    void aFramingPlanOfEachLevel() {
        List<String> roof = pagesWith("Roof framing plan Floor layout");
        List<String> level2 = pagesWith("Level 2 framing plan Floor layout");
        MemberResult girder = twoBay.takedown().members().get("typical").stream()
                .filter(m -> m.id().equals("G-1-AB")).findFirst().orElseThrow();
        assertAll(
                () -> assertTrue(String.join(" ", pages).contains("Framing plans"), "the part"),
                () -> assertEquals(1, roof.size(), "one page for the roof"),
                () -> assertEquals(1, level2.size(), "one page for Level 2"),
                // texts the drawing code writes: the title block, grid bubbles, a member's size
                () -> assertTrue(level2.get(0).contains("Level 2 — framing plan"), "the drawing's title block"),
                () -> assertTrue(level2.get(0).contains(girder.section()), "G-1-AB's size " + girder.section()),
                () -> assertTrue(roof.get(0).contains("Roof — framing plan"), "the roof drawing's title block"));
    }

    /**
     * Levels that share a layout and column sizes share one page whose title names them all: the two-bay
     * plan with a third level on its typical layout and columns spliced only every 10 levels (one tier).
     */
    @Test
    void identicalLevelsShareAPage() throws IOException {
        Plan p = twoBay.plan();
        List<Level> levels = new ArrayList<>(p.levels());
        Level l2 = levels.get(0);
        Level roof = levels.get(1);
        double h = Units.FT_.toSi(13);
        levels.set(1, new Level("Level 3", l2.elevation() + h, h, l2.floor()));
        levels.add(new Level(roof.name(), l2.elevation() + 2 * h, h, roof.floor()));
        Plan three = new Plan(p.name(), p.units(), p.settings().withSpliceEvery(10), p.grid(), levels, p.floors(), p.columns());
        RunResult r3 = PlanRun.run(three);
        List<String> text = write(r3, "three.pdf");
        long shared = text.stream().filter(t -> t.contains("Level 2, Level 3 framing plan Floor layout")).count();
        assertAll(
                () -> assertEquals(1, shared, "one page for Level 2 and Level 3"),
                () -> assertTrue(text.stream().noneMatch(t -> t.contains("Level 2 framing plan Floor layout")),
                        "no page of its own for Level 2"));
    }

    /**
     * The derivation of the two-bay plan's area loads. ASCE 7-16 Table 4.3-1: offices 50 psf (FOUND), the
     * ordinary roof 20 psf (from memory, as the team's check values label it); §4.3.2: a partition
     * allowance of at least 15 psf where partitions may move, not required from 80 psf of live load (FOUND).
     */
    @Test
    void theLoadDerivationOfEachAreaLoad() {
        String all = String.join(" ", pages);
        assertAll(
                () -> assertTrue(all.contains("Load derivation"), "the part"),
                () -> assertTrue(all.contains("Live load L 50 ASCE 7-16 Table 4.3-1: office buildings, offices (50 psf)"),
                        "the office live load and its row"),
                () -> assertTrue(all.contains("Partitions L 15 allowance for partitions that may move, at least 15 psf (ASCE 7-16 §4.3.2)"),
                        "the partition allowance"),
                () -> assertTrue(all.contains("Slab and deck D ") && all.contains("the plan holds no breakdown"),
                        "slab and deck labelled as the plan's one value"),
                () -> assertTrue(all.contains("Roof live load Lr 20 ASCE 7-16 Table 4.3-1: roofs, ordinary flat, pitched and curved (20 psf)"),
                        "the roof live load and its row"),
                () -> assertTrue(all.contains("Snow S"), "a snow row on the roof"));
    }

    @Test
    void theRowsOfTable431ForAValueAndAUse() {
        double psf = 1;
        assertAll(
                () -> assertEquals(List.of("storage, light"), LoadDerivation.rows(125 * psf, LiveLoadUse.ORDINARY, false).stream()
                        .map(LoadDerivation.Row::occupancy).toList(), "125 psf (from memory)"),
                () -> assertEquals(List.of("garages, passenger vehicles only"), LoadDerivation.rows(40, LiveLoadUse.GARAGE, false)
                        .stream().map(LoadDerivation.Row::occupancy).toList(), "40 psf garage (from memory)"),
                () -> assertTrue(LoadDerivation.rows(100, LiveLoadUse.ASSEMBLY, false).stream()
                        .anyMatch(r -> r.occupancy().startsWith("assembly areas")), "100 psf assembly (from memory)"),
                () -> assertTrue(LoadDerivation.rows(55, LiveLoadUse.ORDINARY, false).isEmpty(), "no row carries 55 psf"));
    }

    /**
     * The roof rows of IBC 2018 Table 1604.3 (FOUND, the team's check values §4): the design basis names
     * the roof's row and each roof member's sheet prints its limits with it; the steel dead-load footnote
     * is described, not quoted, as the user's choice.
     */
    @Test
    void roofDeflectionRowsInTheBasisAndOnTheSheets() {
        String all = String.join(" ", pages);
        // a member sheet's facts: "Deflection limits" beside its floor layout's label
        long roofSheets = pages.stream().filter(p -> p.contains("Live reduction") && p.contains("Deflection limits")
                && p.contains("\"roof\" Roof (Roof)")).count();
        long withRow = pages.stream().filter(p -> p.contains("Live reduction") && p.contains("Deflection limits")
                && p.contains("\"roof\" Roof (Roof)")
                // the fact may wrap in its column, so its parts are looked for separately
                && p.contains("L/240 live, L/180 total (IBC Table 1604.3,") && p.contains("non-plaster ceiling)")).count();
        assertAll(
                () -> assertTrue(all.contains("Roof deflection criteria"), "the design basis row"),
                () -> assertTrue(all.contains("roof members supporting a non-plaster ceiling (the default"), "the default named"),
                () -> assertTrue(roofSheets > 0, "the roof has sheets"),
                () -> assertEquals(roofSheets, withRow, "every roof sheet prints the roof row"),
                () -> assertTrue(all.contains("from memory, not quoted"), "the footnote is not quoted as the code's words"));
    }
}
