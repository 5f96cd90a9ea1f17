package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.List;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;

/**
 * A table drawn across the text width: a bold header row on a shaded band, repeated at the top of
 * each page the table runs onto; cells wrap within their column; a row is never split across pages.
 */
final class Table {
    /** Horizontal alignment of a column. */
    enum Align {
        LEFT, RIGHT, CENTRE
    }

    private record Column(String header, float weight, Align align) {
    }

    private record Row(String[] cells, boolean bold, boolean shaded, Rgb color, boolean spans) {
    }

    private final List<Column> columns = new ArrayList<>();
    private final List<Row> rows = new ArrayList<>();
    private float fontSize = 7.4f;
    private float totalWidth = -1;

    Table col(String header, float weight, Align align) {
        columns.add(new Column(header, weight, align));
        return this;
    }

    Table left(String header, float weight) {
        return col(header, weight, Align.LEFT);
    }

    Table right(String header, float weight) {
        return col(header, weight, Align.RIGHT);
    }

    Table fontSize(float size) {
        this.fontSize = size;
        return this;
    }

    /** Draws the table this wide instead of the full text width. */
    Table width(float w) {
        this.totalWidth = w;
        return this;
    }

    Table row(String... cells) {
        rows.add(new Row(pad(cells), false, false, null, false));
        return this;
    }

    /** A row in bold on a shaded band (a total, a group title). */
    Table strong(String... cells) {
        rows.add(new Row(pad(cells), true, true, null, false));
        return this;
    }

    /** A row in a colour (e.g. a failing check). */
    Table colored(Rgb color, String... cells) {
        rows.add(new Row(pad(cells), false, false, color, false));
        return this;
    }

    /** A bold row on a shaded band whose text runs across all columns (a group title). */
    Table group(String text) {
        String[] c = pad(new String[0]);
        c[0] = text;
        rows.add(new Row(c, true, true, null, true));
        return this;
    }

    int size() {
        return rows.size();
    }

    private String[] pad(String[] cells) {
        String[] c = new String[columns.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = i < cells.length && cells[i] != null ? cells[i] : "";
        }
        return c;
    }

    void draw(PageFlow f) {
        Style regular = new Style(f.fonts.regular, fontSize, Rgb.TEXT, fontSize * 1.28f);
        Style boldStyle = new Style(f.fonts.bold, fontSize, Rgb.TEXT, fontSize * 1.28f);
        float pad = 2.5f;
        float[] widths = widths(f);
        // header and first row together
        List<List<String>> head = wrapRow(f, boldStyle, headers(), widths, pad);
        float headH = height(head, boldStyle, pad);
        float firstH = rows.isEmpty() ? 0 : height(wrapRow(f, regular, rows.get(0).cells(), widths, pad), regular, pad);
        f.ensure(headH + firstH);
        drawRow(f, boldStyle, head, widths, pad, headH, Rgb.SHADE, Align.LEFT, true);
        for (Row r : rows) {
            Style st = r.bold() ? boldStyle : regular;
            if (r.color() != null) {
                st = st.withColor(r.color());
            }
            float[] w = widths;
            if (r.spans()) {
                w = new float[widths.length];
                w[0] = sum(widths);
            }
            List<List<String>> cells = wrapRow(f, st, r.cells(), w, pad);
            float h = height(cells, st, pad);
            if (!f.fits(h)) {
                f.newPage();
                drawRow(f, boldStyle, head, widths, pad, headH, Rgb.SHADE, Align.LEFT, true);
            }
            drawRow(f, st, cells, w, pad, h, r.shaded() ? Rgb.SHADE : null, r.spans() ? Align.LEFT : null, false);
        }
        f.gap(4);
    }

    private String[] headers() {
        String[] h = new String[columns.size()];
        for (int i = 0; i < h.length; i++) {
            h[i] = columns.get(i).header();
        }
        return h;
    }

    private float[] widths(PageFlow f) {
        float sum = 0;
        for (Column c : columns) {
            sum += c.weight();
        }
        float total = totalWidth > 0 ? totalWidth : f.width();
        float[] w = new float[columns.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = total * columns.get(i).weight() / sum;
        }
        return w;
    }

    private static List<List<String>> wrapRow(PageFlow f, Style s, String[] cells, float[] widths, float pad) {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < cells.length; i++) {
            out.add(f.wrap(s, cells[i], widths[i] - 2 * pad));
        }
        return out;
    }

    private static float height(List<List<String>> cells, Style s, float pad) {
        int n = 1;
        for (List<String> c : cells) {
            n = Math.max(n, c.size());
        }
        return n * s.leading() + 2 * pad - 1;
    }

    private void drawRow(PageFlow f, Style s, List<List<String>> cells, float[] widths, float pad, float h, Rgb shade,
            Align force, boolean header) {
        float x = f.left();
        float top = f.y();
        if (shade != null) {
            f.fillRect(x, top - h, sum(widths), h, shade);
        }
        for (int i = 0; i < cells.size(); i++) {
            Align a = force != null ? force : columns.get(i).align();
            if (header && columns.get(i).align() == Align.RIGHT) {
                a = Align.RIGHT;
            }
            float base = top - pad - s.size();
            for (String line : cells.get(i)) {
                switch (a) {
                    case RIGHT -> f.textRight(s, x + widths[i] - pad, base, line);
                    case CENTRE -> f.textCentre(s, x + widths[i] / 2, base, line);
                    default -> f.text(s, x + pad, base, line);
                }
                base -= s.leading();
            }
            x += widths[i];
        }
        f.line(f.left(), top - h, f.left() + sum(widths), top - h, header ? 0.6f : 0.3f, header ? Rgb.GREY : Rgb.RULE);
        f.y(top - h);
    }

    private static float sum(float[] w) {
        float s = 0;
        for (float v : w) {
            s += v;
        }
        return s;
    }
}
