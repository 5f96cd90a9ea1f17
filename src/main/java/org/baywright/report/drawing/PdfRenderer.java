package org.baywright.report.drawing;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.util.Matrix;
import org.baywright.calc.Caution;

/**
 * Writes a drawing as a one-page vector PDF with PDFBox: lines, fills and hatching as paths, text in the
 * embedded drawing font (a subset of DejaVu Sans), so the PDF looks the same on any machine and its text
 * can be searched and extracted.
 */
public final class PdfRenderer {
    private static final float PT_PER_MM = (float) (72 / 25.4);

    private PdfRenderer() {
    }

    /** The PDF file's bytes. */
    public static byte[] render(FramingPlanDrawing d) throws IOException {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        write(d, bytes);
        return bytes.toByteArray();
    }

    /** Writes the PDF file. */
    public static void write(FramingPlanDrawing d, Path out) throws IOException {
        try (OutputStream os = Files.newOutputStream(out)) {
            write(d, os);
        }
    }

    /** Writes the PDF to a stream (left open). */
    public static void write(FramingPlanDrawing d, OutputStream out) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage(new PDRectangle(pt(d.paper().width()), pt(d.paper().height())));
            doc.addPage(page);
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(d.title());
            info.setCreator("Baywright");
            info.setSubject(Caution.TEXT);
            PDType0Font regular = PDType0Font.load(doc, new ByteArrayInputStream(DrawingFonts.bytes(false)), true);
            PDType0Font bold = PDType0Font.load(doc, new ByteArrayInputStream(DrawingFonts.bytes(true)), true);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.setLineCapStyle(0);
                cs.setLineJoinStyle(1);
                for (Primitive p : d.primitives()) {
                    draw(cs, d, p, regular, bold);
                }
            }
            doc.save(out);
        }
    }

    /**
     * Draws {@code d} on a page of another document: its whole sheet scaled by {@code scale} with the
     * sheet's lower-left corner at ({@code x}, {@code y}) points. The calculation package prints each
     * level's framing plan this way, from the same primitives as the exported drawing.
     *
     * @param fonts the drawing fonts loaded into that document ({@link #fonts(PDDocument)})
     */
    public static void drawOn(PDPageContentStream cs, FramingPlanDrawing d, float x, float y, float scale, PDType0Font[] fonts)
            throws IOException {
        cs.saveGraphicsState();
        cs.transform(new Matrix(scale, 0, 0, scale, x, y));
        cs.setLineCapStyle(0);
        cs.setLineJoinStyle(1);
        for (Primitive p : d.primitives()) {
            draw(cs, d, p, fonts[0], fonts[1]);
        }
        cs.restoreGraphicsState();
    }

    /** The drawing fonts (regular, bold) loaded once into {@code doc}, embedded as subsets. */
    public static PDType0Font[] fonts(PDDocument doc) throws IOException {
        return new PDType0Font[] {PDType0Font.load(doc, new ByteArrayInputStream(DrawingFonts.bytes(false)), true),
            PDType0Font.load(doc, new ByteArrayInputStream(DrawingFonts.bytes(true)), true)};
    }

    /** Sheet width or height in points. */
    public static float points(double mm) {
        return pt(mm);
    }

    private static float pt(double mm) {
        return (float) (mm * PT_PER_MM);
    }

    private static void draw(PDPageContentStream cs, FramingPlanDrawing d, Primitive p, PDType0Font regular, PDType0Font bold)
            throws IOException {
        if (p instanceof Primitive.Line l) {
            Pt a = d.toPaper(p, l.from());
            Pt b = d.toPaper(p, l.to());
            pen(cs, l.pen());
            cs.moveTo(pt(a.x()), pt(a.y()));
            cs.lineTo(pt(b.x()), pt(b.y()));
            cs.stroke();
        } else if (p instanceof Primitive.Path s) {
            List<Pt> pts = s.points().stream().map(q -> d.toPaper(p, q)).toList();
            if (s.fill() != null) {
                cs.setNonStrokingColor(s.fill().r() / 255f, s.fill().g() / 255f, s.fill().b() / 255f);
                trace(cs, pts, true);
                cs.fill();
            }
            if (s.hatch() != null) {
                pen(cs, s.hatch().pen());
                for (Pt[] seg : Hatching.segments(pts, s.hatch())) {
                    cs.moveTo(pt(seg[0].x()), pt(seg[0].y()));
                    cs.lineTo(pt(seg[1].x()), pt(seg[1].y()));
                }
                cs.stroke();
            }
            if (s.outline() != null) {
                pen(cs, s.outline());
                trace(cs, pts, s.closed());
                cs.stroke();
            }
        } else if (p instanceof Primitive.Circle c) {
            Pt o = d.toPaper(p, c.centre());
            if (c.fill() != null) {
                cs.setNonStrokingColor(c.fill().r() / 255f, c.fill().g() / 255f, c.fill().b() / 255f);
                circle(cs, o, c.radius());
                cs.fill();
            }
            if (c.outline() != null) {
                pen(cs, c.outline());
                circle(cs, o, c.radius());
                cs.stroke();
            }
        } else if (p instanceof Primitive.Text t) {
            PDType0Font f = t.bold() ? bold : regular;
            double widthMm = f.getStringWidth(t.text()) / 1000.0 * t.size();
            Pt start = TextPlacement.baselineStart(t, d.toPaper(p, t.at()), widthMm);
            cs.beginText();
            cs.setFont(f, pt(t.size()));
            cs.setNonStrokingColor(t.colour().r() / 255f, t.colour().g() / 255f, t.colour().b() / 255f);
            cs.setTextMatrix(Matrix.getRotateInstance(Math.toRadians(t.rotation()), pt(start.x()), pt(start.y())));
            cs.showText(t.text());
            cs.endText();
        }
    }

    private static void trace(PDPageContentStream cs, List<Pt> pts, boolean closed) throws IOException {
        cs.moveTo(pt(pts.get(0).x()), pt(pts.get(0).y()));
        for (int i = 1; i < pts.size(); i++) {
            cs.lineTo(pt(pts.get(i).x()), pt(pts.get(i).y()));
        }
        if (closed) {
            cs.closePath();
        }
    }

    private static void circle(PDPageContentStream cs, Pt o, double r) throws IOException {
        double kappa = 0.5522847498 * r;
        float x = pt(o.x());
        float y = pt(o.y());
        float rr = pt(r);
        float kk = pt(kappa);
        cs.moveTo(x + rr, y);
        cs.curveTo(x + rr, y + kk, x + kk, y + rr, x, y + rr);
        cs.curveTo(x - kk, y + rr, x - rr, y + kk, x - rr, y);
        cs.curveTo(x - rr, y - kk, x - kk, y - rr, x, y - rr);
        cs.curveTo(x + kk, y - rr, x + rr, y - kk, x + rr, y);
        cs.closePath();
    }

    private static void pen(PDPageContentStream cs, Pen pen) throws IOException {
        cs.setStrokingColor(pen.colour().r() / 255f, pen.colour().g() / 255f, pen.colour().b() / 255f);
        cs.setLineWidth(pt(pen.width()));
        float[] dash = new float[pen.dash().size()];
        for (int i = 0; i < dash.length; i++) {
            dash[i] = pt(pen.dash().get(i));
        }
        cs.setLineDashPattern(dash, 0);
    }
}
