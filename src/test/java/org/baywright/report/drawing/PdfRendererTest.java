package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.baywright.calc.Caution;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

class PdfRendererTest {

    /**
     * The page's text as PDFBox extracts it. Sorting by position makes the stripper group characters by
     * writing direction, so labels written along vertical members come out whole (in stream order it
     * breaks rotated lines into fragments); poppler's pdftotext reads them whole either way.
     */
    private static String text(PDDocument doc) throws Exception {
        PDFTextStripper stripper = new PDFTextStripper();
        stripper.setSortByPosition(true);
        return stripper.getText(doc);
    }

    private static Set<String> sections(RunResult run, String floor) {
        Set<String> s = new TreeSet<>();
        for (MemberResult m : run.takedown().members().get(floor)) {
            if (!m.section().isEmpty()) {
                s.add(m.section());
            }
        }
        return s;
    }

    @Test
    void everyMemberSizeOfTheDemoLevelIsExtractableText() throws Exception {
        FramingPlanDrawing d = FramingPlanDrawing.of(DrawingSamples.demo(), "Level 3", DrawingOptions.defaults());
        byte[] pdf = PdfRenderer.render(d);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String text = text(doc);
            String words = text.replaceAll("\\s+", " ");
            Set<String> sizes = sections(DrawingSamples.demo(), "typical");
            List<Executable> checks = new ArrayList<>();
            checks.add(() -> assertTrue(sizes.size() >= 4, "sizes: " + sizes));
            for (String s : sizes) {
                checks.add(() -> assertTrue(text.contains(s), s));
            }
            checks.add(() -> assertTrue(words.contains(Caution.TEXT), "the caution, whole"));
            checks.add(() -> assertTrue(words.contains("LEVEL 3 FRAMING PLAN")));
            checks.add(() -> assertTrue(words.contains("Harbourview Offices (demo)")));
            assertAll(checks);
        }
    }

    @Test
    void theSmallPlanKeepsItsMarksInText() throws Exception {
        byte[] pdf = PdfRenderer.render(SvgRendererTest.goldenDrawing());
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String text = text(doc);
            List<Executable> checks = new ArrayList<>();
            for (MemberResult m : DrawingSamples.small().takedown().members().get("typical")) {
                if (!m.section().isEmpty()) {
                    checks.add(() -> assertTrue(text.contains(m.section()), m.id() + " " + m.section()));
                }
            }
            checks.add(() -> assertTrue(text.contains("[W24X104]")));
            checks.add(() -> assertTrue(text.contains("UNSUPPORTED")));
            checks.add(() -> assertTrue(text.contains("over")));
            assertAll(checks);
        }
    }

    @Test
    void thePageIsTheSheetAndTheFontIsEmbedded() throws Exception {
        FramingPlanDrawing d = SvgRendererTest.goldenDrawing();
        try (PDDocument doc = Loader.loadPDF(PdfRenderer.render(d))) {
            PDPage page = doc.getPage(0);
            List<PDFont> fonts = new ArrayList<>();
            for (COSName n : page.getResources().getFontNames()) {
                fonts.add(page.getResources().getFont(n));
            }
            assertAll(
                    () -> assertEquals(1, doc.getNumberOfPages()),
                    () -> assertEquals(420 / 25.4 * 72, page.getMediaBox().getWidth(), 0.01),
                    () -> assertEquals(297 / 25.4 * 72, page.getMediaBox().getHeight(), 0.01),
                    () -> assertEquals(2, fonts.size(), "regular and bold"),
                    () -> assertTrue(fonts.stream().allMatch(PDFont::isEmbedded), "embedded"),
                    () -> assertTrue(fonts.stream().allMatch(f -> f.getName().contains("DejaVuSans")), "DejaVu Sans"),
                    () -> assertEquals(d.title(), doc.getDocumentInformation().getTitle()));
        }
    }
}
