package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

/** The faces come from the class path; the regular face alone is enough. */
class FontsTest {
    /** A class loader that sees only some of the font resources. */
    private static ClassLoader only(String... names) {
        return new ClassLoader(null) {
            @Override
            public InputStream getResourceAsStream(String name) {
                for (String n : names) {
                    if (n.equals(name)) {
                        return FontsTest.class.getClassLoader().getResourceAsStream(name);
                    }
                }
                return null;
            }
        };
    }

    @Test
    void theRegularFaceStandsInForAMissingBoldFace() throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PDDocument doc = new PDDocument()) {
            Fonts f = Fonts.load(doc, only(Fonts.REGULAR));
            assertSame(f.regular, f.bold);
            PDPage page = new PDPage();
            doc.addPage(page);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.beginText();
                cs.setFont(f.bold, 10);
                cs.newLineAtOffset(50, 700);
                cs.showText(f.safe("φb·Mn = 378.8 kip-ft, Zx = 101 in³"));
                cs.endText();
            }
            doc.save(out);
        }
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            assertEquals("φb·Mn = 378.8 kip-ft, Zx = 101 in³", new PDFTextStripper().getText(doc).strip());
            assertTrue(doc.getPage(0).getResources().getFont(doc.getPage(0).getResources().getFontNames().iterator().next())
                    .isEmbedded());
        }
    }

    @Test
    void withoutTheRegularFaceThePackageSaysWhatIsMissing() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            IOException e = assertThrows(IOException.class, () -> Fonts.load(doc, only()));
            assertTrue(e.getMessage().contains(Fonts.REGULAR), e.getMessage());
        }
    }

    @Test
    void widthsAddUpGlyphAdvances() throws IOException {
        try (PDDocument doc = new PDDocument()) {
            Fonts f = Fonts.load(doc);
            float ab = f.width(f.regular, 10, "ab");
            assertEquals(f.width(f.regular, 10, "a") + f.width(f.regular, 10, "b"), ab, 1e-4);
            assertEquals(f.regular.getStringWidth("ab") / 100f, ab, 1e-3);
            assertEquals("a?b c", f.safe("a塔b\tc"));
        }
    }
}
