package org.baywright.report.pdf;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

/** Text of a PDF page by page, white space runs folded into one space. */
final class PdfText {
    private PdfText() {
    }

    static List<String> pages(PDDocument doc) throws IOException {
        List<String> out = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper();
        for (int p = 1; p <= doc.getNumberOfPages(); p++) {
            s.setStartPage(p);
            s.setEndPage(p);
            out.add(fold(s.getText(doc)));
        }
        return out;
    }

    static String fold(String s) {
        return s.replaceAll("\\s+", " ").trim();
    }
}
