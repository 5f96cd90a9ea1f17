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
import org.baywright.io.PlanFiles;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The end-reaction table for connection design and the statements a plan checker asks for, in the package. */
class CheckerPagesTest {
    private static RunResult run;

    @BeforeAll
    static void demo() {
        run = PlanRun.run(PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow());
    }

    /**
     * A floor member with dead and live load only: the largest LRFD reaction is max(1.4D, 1.2D + 1.6L)
     * and the ASD one D + L (ASCE 7-16 §2.3.1 combinations 1 and 2, §2.4.1 combination 2). The
     * service values are the member's own unreduced reactions.
     */
    @Test
    void factoredReactionsFollowTheAsce7Combinations() {
        String typical = run.takedown().levelFloors().get("Level 3");
        List<MemberResult> ms = run.takedown().members().get(typical);
        MemberResult beam = ms.stream().filter(m -> m.design() != null).filter(m -> {
            double[] c = Component.byCase(m.startReaction());
            return c[LoadCase.LR.ordinal()] == 0 && c[LoadCase.S.ordinal()] == 0 && c[LoadCase.L.ordinal()] > 0;
        }).findFirst().orElseThrow();
        double[] byCase = Component.byCase(beam.startReaction());
        double d = byCase[LoadCase.D.ordinal()];
        double l = byCase[LoadCase.L.ordinal()];
        CheckerPages.EndReaction lrfd = CheckerPages.reactions(List.of(beam), DesignMethod.LRFD).get(0);
        CheckerPages.EndReaction asd = CheckerPages.reactions(List.of(beam), DesignMethod.ASD).get(0);
        assertAll(
                () -> assertEquals("start", lrfd.end()),
                () -> assertEquals(beam.startSupport(), lrfd.support()),
                () -> assertEquals(Math.max(1.4 * d, 1.2 * d + 1.6 * l), lrfd.factored(), 1e-9 * lrfd.factored()),
                () -> assertEquals(1.2 * d + 1.6 * l > 1.4 * d ? "1.2D + 1.6L" : "1.4D", lrfd.combination()),
                () -> assertEquals(d + l, asd.factored(), 1e-9 * asd.factored()),
                () -> assertEquals(2 * ms.stream().filter(m -> m.design() != null && m.design().section() != null).count(),
                        CheckerPages.reactions(ms, DesignMethod.LRFD).size(), "two ends of every designed member"));
    }

    @Test
    void thePackageCarriesTheReactionsTheStatementsAndTheApprovalBlock(@TempDir Path dir) throws IOException {
        Path pdf = dir.resolve("checker.pdf");
        CalculationPackage.write(run, pdf, new PackageOptions(UnitSystem.US, ProjectInfo.named("Harbourview",
                LocalDate.of(2026, 12, 2)), 0));
        String all;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            all = String.join(" ", PdfText.pages(doc));
        }
        String typical = run.takedown().levelFloors().get("Level 3");
        MemberResult first = run.takedown().members().get(typical).stream().filter(m -> m.design() != null)
                .min(java.util.Comparator.comparing(MemberResult::id)).orElseThrow();
        CheckerPages.EndReaction r = CheckerPages.reactions(List.of(first), DesignMethod.LRFD).get(0);
        String ru = UnitSystem.US.forceNumber(r.factored());
        String text = all;
        assertAll(
                () -> assertTrue(text.contains("End reactions for connection design"), "the part"),
                () -> assertTrue(text.contains(first.id() + " " + first.section() + " start " + first.startSupport()),
                        "a row per member end: " + first.id()),
                () -> assertTrue(text.contains(ru + " " + r.combination()), "the factored reaction " + ru + " kip"),
                () -> assertTrue(text.contains("Statements for review"), "the statements"),
                () -> assertTrue(text.contains("lateral force-resisting system"), "lateral system by others"),
                () -> assertTrue(text.contains("leaning columns in a braced frame"), "columns as leaning columns"),
                () -> assertTrue(text.replace("\n", " ").contains("moments of the beam and girder reactions at 3 in beyond the column face"),
                        "the column moments and the eccentricity the design took (connectionEccentricity default, 3 in)"),
                () -> assertFalse(text.contains("axial load only"), "the statement matches the column design (H1.1)"),
                () -> assertTrue(text.replace("\n", " ").contains("checked against the limits the plan gives for each deck"),
                        "the deck span check"),
                () -> assertTrue(text.contains("Floor vibration from walking"), "what is not checked"),
                () -> assertTrue(text.contains("with the live load unreduced (common practice for serviceability"),
                        "which live load the deflections use (the demo's default)"),
                () -> assertTrue(text.contains("Engineer of record") && text.contains("Signature and seal"), "the block"));
    }
}
