package org.baywright.report.pdf;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * Lays content down the pages of a document from top to bottom: wraps text to the width, starts a
 * new page when a block does not fit, and remembers each page's running title for the header drawn
 * at the end. Coordinates are PDF points with the origin at the bottom left of the page.
 *
 * <p>Every call that draws wraps the {@link IOException} of PDFBox in an {@link UncheckedIOException};
 * {@link CalculationPackage} unwraps it again.
 */
final class PageFlow {
    /** A colour as RGB fractions. */
    record Rgb(float r, float g, float b) {
        static final Rgb BLACK = new Rgb(0, 0, 0);
        static final Rgb WHITE_PAGE = new Rgb(1, 1, 1);
        static final Rgb TEXT = new Rgb(0.08f, 0.08f, 0.1f);
        static final Rgb GREY = new Rgb(0.42f, 0.42f, 0.45f);
        static final Rgb RULE = new Rgb(0.72f, 0.72f, 0.75f);
        static final Rgb SHADE = new Rgb(0.92f, 0.93f, 0.95f);
        static final Rgb ACCENT = new Rgb(0.1f, 0.25f, 0.45f);
        static final Rgb FAIL = new Rgb(0.7f, 0.05f, 0.05f);
        static final Rgb CAUTION_FILL = new Rgb(1f, 0.96f, 0.86f);
        static final Rgb CAUTION_EDGE = new Rgb(0.75f, 0.5f, 0.05f);
    }

    /** A font, size, colour and line height. */
    record Style(PDFont font, float size, Rgb color, float leading) {
        Style withColor(Rgb c) {
            return new Style(font, size, c, leading);
        }
    }

    static final float MARGIN_X = 46;
    static final float MARGIN_TOP = 40;
    static final float HEADER = 18;
    static final float FOOTER = 44;

    final PDDocument doc;
    final Fonts fonts;
    final PDRectangle paper;
    final Style body;
    final Style bold;
    final Style small;
    final Style smallGrey;
    final Style h1;
    final Style h2;
    final Style h3;

    private boolean landscape;
    private PDPage page;
    private PDPageContentStream cs;
    private float y;
    private String runningTitle = "";
    /** The cursor this close to the top (points) has drawn nothing yet: a hundredth of a point of float rounding. */
    private static final float AT_TOP = 0.01f;
    private final List<String> titles = new ArrayList<>();

    PageFlow(PDDocument doc, Fonts fonts, PDRectangle paper) {
        this.doc = doc;
        this.fonts = fonts;
        this.paper = paper;
        this.body = new Style(fonts.regular, 8.5f, Rgb.TEXT, 10.9f);
        this.bold = new Style(fonts.bold, 8.5f, Rgb.TEXT, 10.9f);
        this.small = new Style(fonts.regular, 7.2f, Rgb.TEXT, 9.2f);
        this.smallGrey = small.withColor(Rgb.GREY);
        this.h1 = new Style(fonts.bold, 15f, Rgb.ACCENT, 19f);
        this.h2 = new Style(fonts.bold, 11f, Rgb.ACCENT, 14.5f);
        this.h3 = new Style(fonts.bold, 9.2f, Rgb.TEXT, 12.5f);
    }

    // ---- pages -------------------------------------------------------------------------------

    /** The title printed in the header of the pages started from now on. */
    void runningTitle(String t) {
        runningTitle = t;
    }

    /** Portrait or landscape for the pages started from now on. */
    void landscape(boolean on) {
        landscape = on;
    }

    void newPage() {
        close();
        PDRectangle size = landscape ? new PDRectangle(paper.getHeight(), paper.getWidth()) : paper;
        page = new PDPage(size);
        doc.addPage(page);
        try {
            cs = new PDPageContentStream(doc, page);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        titles.add(runningTitle);
        y = top();
    }

    /** Running titles by page, in page order (of the pages this flow started). */
    List<String> titles() {
        return titles;
    }

    PDPage page() {
        return page;
    }

    PDPageContentStream cs() {
        return cs;
    }

    void close() {
        if (cs != null) {
            try {
                cs.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            cs = null;
        }
    }

    float left() {
        return MARGIN_X;
    }

    float right() {
        return pageWidth() - MARGIN_X;
    }

    float width() {
        return right() - left();
    }

    float pageWidth() {
        return page == null ? paper.getWidth() : page.getMediaBox().getWidth();
    }

    float top() {
        float h = page == null ? paper.getHeight() : page.getMediaBox().getHeight();
        return h - MARGIN_TOP - HEADER;
    }

    float bottom() {
        return FOOTER + 14;
    }

    float y() {
        return y;
    }

    void y(float v) {
        y = v;
    }

    /** True when a block of height {@code h} fits below the cursor. */
    boolean fits(float h) {
        return y - h >= bottom();
    }

    /** Starts a new page unless a block of height {@code h} fits below the cursor. */
    void ensure(float h) {
        if (page == null || !fits(h)) {
            newPage();
        }
    }

    /** Moves the cursor down by {@code h}, or to a new page if that runs off the bottom. */
    void gap(float h) {
        if (y - h < bottom()) {
            newPage();
        } else {
            y -= h;
        }
    }

    /** True when the cursor is at the top of a fresh page. */
    boolean atTop() {
        return y >= top() - AT_TOP;
    }

    // ---- drawing primitives ------------------------------------------------------------------

    float textWidth(Style s, String text) {
        return fonts.width(s.font(), s.size(), fonts.safe(text));
    }

    void text(Style s, float x, float baseline, String text) {
        String t = fonts.safe(text);
        if (t.isBlank()) {
            return;
        }
        try {
            cs.beginText();
            cs.setFont(s.font(), s.size());
            color(s.color(), false);
            cs.newLineAtOffset(x, baseline);
            cs.showText(t);
            cs.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void textRight(Style s, float xRight, float baseline, String text) {
        text(s, xRight - textWidth(s, text), baseline, text);
    }

    void textCentre(Style s, float xCentre, float baseline, String text) {
        text(s, xCentre - textWidth(s, text) / 2, baseline, text);
    }

    void color(Rgb c, boolean stroke) {
        try {
            if (stroke) {
                cs.setStrokingColor(c.r(), c.g(), c.b());
            } else {
                cs.setNonStrokingColor(c.r(), c.g(), c.b());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void line(float x0, float y0, float x1, float y1, float w, Rgb c) {
        try {
            cs.setLineWidth(w);
            color(c, true);
            cs.moveTo(x0, y0);
            cs.lineTo(x1, y1);
            cs.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void fillRect(float x, float yBottom, float w, float h, Rgb c) {
        try {
            color(c, false);
            cs.addRect(x, yBottom, w, h);
            cs.fill();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void strokeRect(float x, float yBottom, float w, float h, float lw, Rgb c) {
        try {
            cs.setLineWidth(lw);
            color(c, true);
            cs.addRect(x, yBottom, w, h);
            cs.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A closed polygon, filled and/or outlined (a null colour skips that part). */
    void polygon(float[] xs, float[] ys, Rgb fill, Rgb stroke, float lw) {
        if (xs.length < 2) {
            return;
        }
        try {
            if (fill != null) {
                color(fill, false);
                path(xs, ys, true);
                cs.fill();
            }
            if (stroke != null) {
                cs.setLineWidth(lw);
                color(stroke, true);
                path(xs, ys, false);
                cs.stroke();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** An open polyline. */
    void polyline(float[] xs, float[] ys, Rgb stroke, float lw) {
        try {
            cs.setLineWidth(lw);
            color(stroke, true);
            path(xs, ys, false);
            cs.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void path(float[] xs, float[] ys, boolean close) throws IOException {
        cs.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            cs.lineTo(xs[i], ys[i]);
        }
        if (close) {
            cs.closePath();
        }
    }

    void dashed(boolean on) {
        try {
            cs.setLineDashPattern(on ? new float[] {2.5f, 2f} : new float[0], 0);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    // ---- text flow ---------------------------------------------------------------------------

    /**
     * Splits text into lines no wider than {@code first} (the first line) and {@code rest} (the
     * others), breaking at spaces, and inside a word only when the word alone is too wide.
     */
    List<String> wrap(Style s, String text, float first, float rest) {
        String t = fonts.safe(text).strip();
        List<String> out = new ArrayList<>();
        if (t.isEmpty()) {
            out.add("");
            return out;
        }
        String[] words = t.split(" +");
        StringBuilder line = new StringBuilder();
        for (String w : words) {
            float limit = out.isEmpty() ? first : rest;
            String candidate = line.length() == 0 ? w : line + " " + w;
            if (fonts.width(s.font(), s.size(), candidate) <= limit) {
                line.setLength(0);
                line.append(candidate);
                continue;
            }
            if (line.length() > 0) {
                out.add(line.toString());
                line.setLength(0);
                limit = rest;
            }
            // the word alone: break it if it is still too wide
            String word = w;
            while (fonts.width(s.font(), s.size(), word) > limit && word.length() > 1) {
                int n = word.length() - 1;
                while (n > 1 && fonts.width(s.font(), s.size(), word.substring(0, n)) > limit) {
                    n--;
                }
                out.add(word.substring(0, n));
                word = word.substring(n);
                limit = rest;
            }
            line.append(word);
        }
        if (line.length() > 0) {
            out.add(line.toString());
        }
        return out;
    }

    List<String> wrap(Style s, String text, float w) {
        return wrap(s, text, w, w);
    }

    /** A wrapped paragraph at the left margin (plus {@code indent}), flowing across pages. */
    void paragraph(Style s, String text, float indent) {
        for (String l : wrap(s, text, width() - indent)) {
            lineOf(s, left() + indent, l);
        }
    }

    void paragraph(Style s, String text) {
        paragraph(s, text, 0);
    }

    /** A bulleted paragraph. */
    void bullet(Style s, String text) {
        List<String> lines = wrap(s, text, width() - 12);
        for (int i = 0; i < lines.size(); i++) {
            ensure(s.leading());
            if (i == 0) {
                text(s, left() + 2, y - s.size(), "•");
            }
            text(s, left() + 12, y - s.size(), lines.get(i));
            y -= s.leading();
        }
    }

    /** One line of text at {@code x}, moving the cursor down by the style's leading. */
    void lineOf(Style s, float x, String text) {
        ensure(s.leading());
        text(s, x, y - s.size(), text);
        y -= s.leading();
    }

    /** A level-1 heading: always at the top of a new page. */
    void heading1(String text) {
        runningTitle(text);
        newPage();
        for (String l : wrap(h1, text, width())) { // a long part title (a layout on many levels) wraps
            text(h1, left(), y - h1.size(), l);
            y -= h1.leading();
        }
        y -= 2;
        line(left(), y + 3, right(), y + 3, 0.8f, Rgb.ACCENT);
        y -= 8;
    }

    /** A level-2 heading, kept with at least {@code keep} points of what follows. */
    void heading2(String text, float keep) {
        keptHeading(h2, text, keep, 6, 3);
    }

    /** A level-3 heading, kept with at least {@code keep} points of what follows. */
    void heading3(String text, float keep) {
        keptHeading(h3, text, keep, 4, 1);
    }

    /** A wrapped heading in {@code style}, with a gap before it (unless at the top) and after it. */
    private void keptHeading(Style style, String text, float keep, float before, float after) {
        if (!atTop()) {
            gap(before);
        }
        List<String> lines = wrap(style, text, width());
        ensure(style.leading() * lines.size() + keep);
        for (String l : lines) {
            text(style, left(), y - style.size(), l);
            y -= style.leading();
        }
        y -= after;
    }

    /** Label–value pairs in two columns, the label in bold. */
    void pairs(List<String[]> pairs, float labelWidth) {
        for (String[] p : pairs) {
            List<String> v = wrap(body, p[1], width() - labelWidth);
            ensure(body.leading() * v.size());
            text(bold, left(), y - body.size(), p[0]);
            for (String l : v) {
                text(body, left() + labelWidth, y - body.size(), l);
                y -= body.leading();
            }
        }
    }

    /** Label–value pairs in two columns side by side (label in bold above nothing: "Label  value"). */
    void pairs2(List<String[]> pairs, float labelWidth) {
        float half = (width() - 12) / 2;
        for (int i = 0; i < pairs.size(); i += 2) {
            String[] a = pairs.get(i);
            String[] b = i + 1 < pairs.size() ? pairs.get(i + 1) : null;
            List<String> va = wrap(small, a[1], half - labelWidth);
            List<String> vb = b == null ? List.of() : wrap(small, b[1], half - labelWidth);
            int n = Math.max(va.size(), vb.size());
            Style lab = new Style(fonts.bold, small.size(), Rgb.TEXT, small.leading());
            ensure(n * small.leading());
            float base = y - small.size();
            text(lab, left(), base, a[0]);
            if (b != null) {
                text(lab, left() + half + 12, base, b[0]);
            }
            for (int k = 0; k < n; k++) {
                if (k < va.size()) {
                    text(small, left() + labelWidth, base, va.get(k));
                }
                if (k < vb.size()) {
                    text(small, left() + half + 12 + labelWidth, base, vb.get(k));
                }
                base -= small.leading();
            }
            y -= n * small.leading();
        }
    }
}
