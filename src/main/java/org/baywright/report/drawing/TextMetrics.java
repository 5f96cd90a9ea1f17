package org.baywright.report.drawing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.fontbox.ttf.CmapLookup;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;

/**
 * Advance widths of the drawing font, read from the shipped TrueType files (no kerning), so that text is
 * laid out identically whatever renders it.
 */
final class TextMetrics {
    private static final double[][] WIDTHS = new double[2][];
    private static final double[] MISSING = new double[2];

    private TextMetrics() {
    }

    /** Width of a line of text at a text size, paper mm. */
    static double width(String text, double size, boolean bold) {
        double[] w = table(bold);
        double sum = 0;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            sum += cp < w.length ? w[cp] : MISSING[bold ? 1 : 0];
            i += Character.charCount(cp);
        }
        return sum * size;
    }

    /** Breaks a paragraph into lines no wider than {@code maxWidth} (a word longer than that stands alone). */
    static List<String> wrap(String paragraph, double size, boolean bold, double maxWidth) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : paragraph.trim().split("\\s+")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && width(candidate, size, bold) > maxWidth) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    private static synchronized double[] table(boolean bold) {
        int k = bold ? 1 : 0;
        if (WIDTHS[k] == null) {
            try (TrueTypeFont font = new TTFParser().parse(new RandomAccessReadBuffer(DrawingFonts.bytes(bold)))) {
                double em = font.getUnitsPerEm();
                CmapLookup cmap = font.getUnicodeCmapLookup();
                double[] w = new double[0x2400];
                for (int cp = 0; cp < w.length; cp++) {
                    int gid = cmap.getGlyphId(cp);
                    w[cp] = gid == 0 ? 0 : font.getAdvanceWidth(gid) / em;
                }
                MISSING[k] = font.getAdvanceWidth(0) / em;
                WIDTHS[k] = w;
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read the drawing font", e);
            }
        }
        return WIDTHS[k];
    }
}
