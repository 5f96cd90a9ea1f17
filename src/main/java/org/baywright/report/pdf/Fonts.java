package org.baywright.report.pdf;

import java.io.IOException;
import java.io.InputStream;
import java.util.HashMap;
import java.util.Map;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The two faces the package is set in, embedded (subset) from TrueType files on the class path:
 * {@code fonts/DejaVuSans.ttf} and, if present, {@code fonts/DejaVuSans-Bold.ttf} (the regular face
 * stands in for bold when the bold file is absent). Text is passed through {@link #safe(String)} so
 * a character the font lacks prints as {@code ?} instead of failing the whole package.
 */
final class Fonts {
    static final String REGULAR = "fonts/DejaVuSans.ttf";
    static final String BOLD = "fonts/DejaVuSans-Bold.ttf";

    final PDFont regular;
    final PDFont bold;
    private final Map<Integer, Boolean> known = new HashMap<>();

    private Fonts(PDFont regular, PDFont bold) {
        this.regular = regular;
        this.bold = bold;
    }

    static Fonts load(PDDocument doc) throws IOException {
        return load(doc, Fonts.class.getClassLoader());
    }

    /** Loads the faces from the resources of {@code cl}. */
    static Fonts load(PDDocument doc, ClassLoader cl) throws IOException {
        PDFont regular = load(doc, cl, REGULAR);
        if (regular == null) {
            throw new IOException("the font resource " + REGULAR + " is missing from the class path");
        }
        PDFont bold = load(doc, cl, BOLD);
        return new Fonts(regular, bold == null ? regular : bold);
    }

    private static PDFont load(PDDocument doc, ClassLoader cl, String resource) throws IOException {
        byte[] bytes;
        try (InputStream in = cl.getResourceAsStream(resource)) {
            if (in == null) {
                return null;
            }
            bytes = in.readAllBytes();
        }
        TrueTypeFont ttf = new TTFParser().parse(new RandomAccessReadBuffer(bytes));
        // No glyph substitution (ligatures): it costs a regular expression per string shown, and
        // plain glyphs keep the extracted text identical to the text written.
        ttf.setEnableGsub(false);
        return PDType0Font.load(doc, ttf, true);
    }

    /** The text with control characters turned into spaces and characters without a glyph into {@code ?}. */
    String safe(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            if (Character.isISOControl(cp) || Character.isWhitespace(cp)) {
                b.append(' ');
            } else if (has(cp)) {
                b.appendCodePoint(cp);
            } else {
                b.append('?');
            }
        });
        return b.toString();
    }

    private boolean has(int cp) {
        Boolean k = known.get(cp);
        if (k == null) {
            boolean ok;
            try {
                String s = new String(Character.toChars(cp));
                regular.getStringWidth(s);
                bold.getStringWidth(s);
                ok = true;
            } catch (IllegalArgumentException | IOException e) {
                ok = false;
            }
            k = ok;
            known.put(cp, k);
        }
        return k;
    }

    private final Map<PDFont, Map<Integer, Float>> advances = new HashMap<>();

    /**
     * Width of {@code text} (already safe) in points: the sum of the glyph advances, each asked of the
     * font once and cached (asking PDFBox for a whole string's width decodes it again every time).
     */
    float width(PDFont font, float size, String text) {
        Map<Integer, Float> adv = advances.computeIfAbsent(font, k -> new HashMap<>());
        float sum = 0;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            i += Character.charCount(cp);
            Float w = adv.get(cp);
            if (w == null) {
                try {
                    w = font.getStringWidth(new String(Character.toChars(cp)));
                } catch (IOException | IllegalArgumentException e) {
                    w = 0f;
                }
                adv.put(cp, w);
            }
            sum += w;
        }
        return sum / 1000f * size;
    }
}
