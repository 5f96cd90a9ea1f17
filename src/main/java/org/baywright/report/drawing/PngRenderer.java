package org.baywright.report.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Stroke;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;

/** Renders a drawing to a raster image with Java2D, antialiased, headless (no display needed). */
public final class PngRenderer {
    private static Font regular;
    private static Font bold;

    private PngRenderer() {
    }

    /** The sheet as an RGB image at a resolution, dots per inch. */
    public static BufferedImage render(FramingPlanDrawing d, int dpi) {
        double s = dpi / 25.4;
        int w = (int) Math.round(d.paper().width() * s);
        int h = (int) Math.round(d.paper().height() * s);
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            Mapper m = new Mapper(s, d.paper().height());
            for (Primitive p : d.primitives()) {
                draw(g, d, p, m);
            }
        } finally {
            g.dispose();
        }
        return img;
    }

    /** Writes the sheet as a PNG file. */
    public static void write(FramingPlanDrawing d, int dpi, Path out) throws IOException {
        if (!ImageIO.write(render(d, dpi), "png", out.toFile())) {
            throw new IOException("no PNG writer available in this Java runtime");
        }
    }

    /** Paper mm (y up) to image pixels (y down). */
    private record Mapper(double s, double paperHeight) {
        double x(Pt p) {
            return p.x() * s;
        }

        double y(Pt p) {
            return (paperHeight - p.y()) * s;
        }
    }

    private static void draw(Graphics2D g, FramingPlanDrawing d, Primitive p, Mapper m) {
        if (p instanceof Primitive.Line l) {
            Pt a = d.toPaper(p, l.from());
            Pt b = d.toPaper(p, l.to());
            stroke(g, l.pen(), m);
            g.draw(new Line2D.Double(m.x(a), m.y(a), m.x(b), m.y(b)));
        } else if (p instanceof Primitive.Path s) {
            List<Pt> pts = s.points().stream().map(q -> d.toPaper(p, q)).toList();
            Path2D.Double path = new Path2D.Double();
            path.moveTo(m.x(pts.get(0)), m.y(pts.get(0)));
            for (int i = 1; i < pts.size(); i++) {
                path.lineTo(m.x(pts.get(i)), m.y(pts.get(i)));
            }
            if (s.closed()) {
                path.closePath();
            }
            if (s.fill() != null) {
                g.setColor(colour(s.fill()));
                g.fill(path);
            }
            if (s.hatch() != null) {
                stroke(g, s.hatch().pen(), m);
                for (Pt[] seg : Hatching.segments(pts, s.hatch())) {
                    g.draw(new Line2D.Double(m.x(seg[0]), m.y(seg[0]), m.x(seg[1]), m.y(seg[1])));
                }
            }
            if (s.outline() != null) {
                stroke(g, s.outline(), m);
                g.draw(path);
            }
        } else if (p instanceof Primitive.Circle c) {
            Pt o = d.toPaper(p, c.centre());
            double r = c.radius() * m.s();
            Ellipse2D.Double e = new Ellipse2D.Double(m.x(o) - r, m.y(o) - r, 2 * r, 2 * r);
            if (c.fill() != null) {
                g.setColor(colour(c.fill()));
                g.fill(e);
            }
            if (c.outline() != null) {
                stroke(g, c.outline(), m);
                g.draw(e);
            }
        } else if (p instanceof Primitive.Text t) {
            Font f = font(t.bold()).deriveFont((float) (t.size() * m.s()));
            g.setFont(f);
            g.setColor(colour(t.colour()));
            double widthMm = f.getStringBounds(t.text(), g.getFontRenderContext()).getWidth() / m.s();
            Pt start = TextPlacement.baselineStart(t, d.toPaper(p, t.at()), widthMm);
            AffineTransform saved = g.getTransform();
            g.translate(m.x(start), m.y(start));
            g.rotate(-Math.toRadians(t.rotation()));
            g.drawString(t.text(), 0f, 0f);
            g.setTransform(saved);
        }
    }

    private static void stroke(Graphics2D g, Pen pen, Mapper m) {
        g.setColor(colour(pen.colour()));
        float w = (float) (pen.width() * m.s());
        Stroke st;
        if (pen.isDashed()) {
            float[] dash = new float[pen.dash().size()];
            for (int i = 0; i < dash.length; i++) {
                dash[i] = (float) (pen.dash().get(i) * m.s());
            }
            st = new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
        } else {
            st = new BasicStroke(w, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
        }
        g.setStroke(st);
    }

    private static Color colour(Rgb c) {
        return new Color(c.r(), c.g(), c.b());
    }

    private static synchronized Font font(boolean isBold) {
        if (isBold ? bold == null : regular == null) {
            try {
                Font f = Font.createFont(Font.TRUETYPE_FONT, new ByteArrayInputStream(DrawingFonts.bytes(isBold)));
                if (isBold) {
                    bold = f;
                } else {
                    regular = f;
                }
            } catch (FontFormatException e) {
                throw new IllegalStateException("the drawing font is not a usable TrueType font", e);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return isBold ? bold : regular;
    }
}
