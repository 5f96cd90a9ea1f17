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

    /**
     * True when the words of {@code words} occur in {@code text} in this order, each at most a wrapped
     * clause (120 characters) after the previous one: a calculation line whose clause wraps in the
     * right-hand column comes out of the text extraction interleaved with the clause's lines.
     */
    static boolean inOrder(String text, String words) {
        String[] w = words.split(" ");
        int from = text.indexOf(w[0]);
        while (from >= 0) {
            int at = from + w[0].length();
            boolean all = true;
            for (int i = 1; i < w.length && all; i++) {
                int next = text.indexOf(w[i], at);
                if (next < 0 || next - at > 120) {
                    all = false;
                } else {
                    at = next + w[i].length();
                }
            }
            if (all) {
                return true;
            }
            from = text.indexOf(w[0], from + 1);
        }
        return false;
    }
}
