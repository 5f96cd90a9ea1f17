package org.baywright.report.drawing;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.baywright.calc.Caution;

/**
 * Writes a drawing as SVG 1.1 text: one group per layer, coordinates in paper millimetres (the view box
 * is the sheet), numbers with at most two decimals and no locale, nothing that depends on the clock, so
 * the same drawing always gives the same bytes.
 */
public final class SvgRenderer {
    private SvgRenderer() {
    }

    /** The SVG document. */
    public static String render(FramingPlanDrawing d) {
        double h = d.paper().height();
        StringBuilder b = new StringBuilder(1 << 16);
        b.append("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"no\"?>\n");
        b.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(Num.mm(d.paper().width()))
                .append("mm\" height=\"").append(Num.mm(h)).append("mm\" viewBox=\"0 0 ").append(Num.mm(d.paper().width()))
                .append(' ').append(Num.mm(h)).append("\">\n");
        b.append("<title>").append(esc(d.title())).append("</title>\n");
        b.append("<desc>").append(esc("Framing plan drawn by Baywright at " + d.scale().label() + " on " + d.paper().label()
                + ". " + Caution.TEXT)).append("</desc>\n");
        b.append("<rect x=\"0\" y=\"0\" width=\"").append(Num.mm(d.paper().width())).append("\" height=\"").append(Num.mm(h))
                .append("\" fill=\"#ffffff\"/>\n");
        b.append("<g font-family=\"").append(DrawingFonts.SVG_FAMILY)
                .append("\" stroke-linecap=\"butt\" stroke-linejoin=\"round\">\n");
        Layer open = null;
        for (Primitive p : d.primitives()) {
            if (p.layer() != open) {
                if (open != null) {
                    b.append("</g>\n");
                }
                open = p.layer();
                b.append("<g id=\"").append(open.id()).append("\">\n");
            }
            primitive(b, d, p, h);
        }
        if (open != null) {
            b.append("</g>\n");
        }
        b.append("</g>\n</svg>\n");
        return b.toString();
    }

    /** Writes the SVG document, UTF-8. */
    public static void write(FramingPlanDrawing d, Path out) throws IOException {
        Files.writeString(out, render(d), StandardCharsets.UTF_8);
    }

    private static void primitive(StringBuilder b, FramingPlanDrawing d, Primitive p, double h) {
        if (p instanceof Primitive.Line l) {
            Pt a = d.toPaper(p, l.from());
            Pt c = d.toPaper(p, l.to());
            b.append("<line x1=\"").append(Num.mm(a.x())).append("\" y1=\"").append(Num.mm(h - a.y())).append("\" x2=\"")
                    .append(Num.mm(c.x())).append("\" y2=\"").append(Num.mm(h - c.y())).append('"');
            stroke(b, l.pen());
            b.append("/>\n");
        } else if (p instanceof Primitive.Path s) {
            path(b, d, s, h);
        } else if (p instanceof Primitive.Circle c) {
            Pt o = d.toPaper(p, c.centre());
            b.append("<circle cx=\"").append(Num.mm(o.x())).append("\" cy=\"").append(Num.mm(h - o.y())).append("\" r=\"")
                    .append(Num.mm(c.radius())).append("\" fill=\"").append(c.fill() == null ? "none" : c.fill().hex())
                    .append('"');
            if (c.outline() == null) {
                b.append(" stroke=\"none\"");
            } else {
                stroke(b, c.outline());
            }
            b.append("/>\n");
        } else if (p instanceof Primitive.Text t) {
            Pt at = TextPlacement.onBaseline(t, d.toPaper(p, t.at()));
            String x = Num.mm(at.x());
            String y = Num.mm(h - at.y());
            b.append("<text x=\"").append(x).append("\" y=\"").append(y).append("\" font-size=\"").append(Num.mm(t.size()))
                    .append('"');
            if (t.bold()) {
                b.append(" font-weight=\"bold\"");
            }
            if (t.anchor().along() == 0.5) {
                b.append(" text-anchor=\"middle\"");
            } else if (t.anchor().along() == 1) {
                b.append(" text-anchor=\"end\"");
            }
            if (t.rotation() != 0) {
                b.append(" transform=\"rotate(").append(Num.mm(-t.rotation())).append(' ').append(x).append(' ').append(y)
                        .append(")\"");
            }
            b.append(" fill=\"").append(t.colour().hex()).append("\">").append(esc(t.text())).append("</text>\n");
        }
    }

    private static void path(StringBuilder b, FramingPlanDrawing d, Primitive.Path s, double h) {
        List<Pt> pts = s.points().stream().map(q -> d.toPaper(s, q)).toList();
        StringBuilder coords = new StringBuilder();
        for (Pt q : pts) {
            if (coords.length() > 0) {
                coords.append(' ');
            }
            coords.append(Num.mm(q.x())).append(',').append(Num.mm(h - q.y()));
        }
        String tag = s.closed() ? "polygon" : "polyline";
        if (s.hatch() == null) {
            b.append('<').append(tag).append(" points=\"").append(coords).append("\" fill=\"")
                    .append(s.fill() == null ? "none" : s.fill().hex()).append('"');
            if (s.outline() == null) {
                b.append(" stroke=\"none\"");
            } else {
                stroke(b, s.outline());
            }
            b.append("/>\n");
            return;
        }
        if (s.fill() != null) {
            b.append("<polygon points=\"").append(coords).append("\" fill=\"").append(s.fill().hex())
                    .append("\" stroke=\"none\"/>\n");
        }
        StringBuilder dd = new StringBuilder();
        for (Pt[] seg : Hatching.segments(pts, s.hatch())) {
            if (dd.length() > 0) {
                dd.append(' ');
            }
            dd.append('M').append(Num.mm(seg[0].x())).append(',').append(Num.mm(h - seg[0].y())).append('L')
                    .append(Num.mm(seg[1].x())).append(',').append(Num.mm(h - seg[1].y()));
        }
        if (dd.length() > 0) {
            b.append("<path d=\"").append(dd).append("\" fill=\"none\"");
            stroke(b, s.hatch().pen());
            b.append("/>\n");
        }
        if (s.outline() != null) {
            b.append("<polygon points=\"").append(coords).append("\" fill=\"none\"");
            stroke(b, s.outline());
            b.append("/>\n");
        }
    }

    private static void stroke(StringBuilder b, Pen pen) {
        b.append(" stroke=\"").append(pen.colour().hex()).append("\" stroke-width=\"").append(Num.mm(pen.width())).append('"');
        if (pen.isDashed()) {
            b.append(" stroke-dasharray=\"");
            for (int i = 0; i < pen.dash().size(); i++) {
                b.append(i == 0 ? "" : ",").append(Num.mm(pen.dash().get(i)));
            }
            b.append('"');
        }
    }

    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&apos;");
                default -> {
                    if (c < 0x20 && c != '\t') {
                        b.append(' ');
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }
}
