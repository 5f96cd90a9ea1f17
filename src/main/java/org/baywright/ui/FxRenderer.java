package org.baywright.ui;

import java.io.ByteArrayInputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.baywright.report.drawing.DrawingFonts;
import org.baywright.report.drawing.Hatching;
import org.baywright.report.drawing.Pen;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.Pt;
import org.baywright.report.drawing.Rgb;
import org.baywright.report.drawing.Space;

/**
 * Draws drawing primitives ({@link Primitive}) on a JavaFX canvas: the editor's renderer beside the SVG,
 * PNG and PDF ones, so the canvas shows the picture the sheet prints. Plan positions go through a
 * {@link ViewTransform}; every size (line weight, dash, text height, radius, hatch spacing) is millimetres
 * times {@code pxPerMm}; paper positions are millimetres from the canvas's lower-left corner, y up. Text
 * is set in the drawing font (DejaVu Sans, loaded from the same files the other renderers use).
 */
public final class FxRenderer {
    private static final String FAMILY = "DejaVu Sans";
    private static final Map<Long, Font> FONTS = new HashMap<>();
    private static boolean loaded;

    private FxRenderer() {
    }

    /**
     * Draws primitives in list order (the caller sorts by layer).
     *
     * @param view where plan metres fall on the canvas
     * @param pxPerMm pixels per millimetre of size
     */
    public static void draw(GraphicsContext g, List<Primitive> primitives, ViewTransform view, double pxPerMm) {
        double height = g.getCanvas().getHeight();
        g.save();
        g.setLineCap(StrokeLineCap.BUTT);
        g.setLineJoin(StrokeLineJoin.ROUND);
        g.setTextBaseline(VPos.BASELINE);
        for (Primitive p : primitives) {
            if (p instanceof Primitive.Line l) {
                pen(g, l.pen(), pxPerMm);
                g.strokeLine(x(p, l.from(), view, pxPerMm), y(p, l.from(), view, pxPerMm, height), x(p, l.to(), view, pxPerMm),
                        y(p, l.to(), view, pxPerMm, height));
            } else if (p instanceof Primitive.Path s) {
                path(g, s, view, pxPerMm, height);
            } else if (p instanceof Primitive.Circle c) {
                double cx = x(p, c.centre(), view, pxPerMm);
                double cy = y(p, c.centre(), view, pxPerMm, height);
                double r = c.radius() * pxPerMm;
                if (c.fill() != null) {
                    g.setFill(colour(c.fill()));
                    g.fillOval(cx - r, cy - r, 2 * r, 2 * r);
                }
                if (c.outline() != null) {
                    pen(g, c.outline(), pxPerMm);
                    g.strokeOval(cx - r, cy - r, 2 * r, 2 * r);
                }
            } else if (p instanceof Primitive.Text t) {
                text(g, t, x(p, t.at(), view, pxPerMm), y(p, t.at(), view, pxPerMm, height), pxPerMm);
            }
        }
        g.restore();
    }

    private static double x(Primitive p, Pt at, ViewTransform view, double pxPerMm) {
        return p.space() == Space.PLAN ? view.screenX(at.x()) : at.x() * pxPerMm;
    }

    private static double y(Primitive p, Pt at, ViewTransform view, double pxPerMm, double height) {
        return p.space() == Space.PLAN ? view.screenY(at.y()) : height - at.y() * pxPerMm;
    }

    private static void path(GraphicsContext g, Primitive.Path s, ViewTransform view, double pxPerMm, double height) {
        int n = s.points().size();
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = x(s, s.points().get(i), view, pxPerMm);
            ys[i] = y(s, s.points().get(i), view, pxPerMm, height);
        }
        if (s.fill() != null) {
            g.setFill(colour(s.fill()));
            g.fillPolygon(xs, ys, n);
        }
        if (s.hatch() != null) {
            // hatch in millimetres with y up, as the other renderers do, so the lines lean the same way
            List<Pt> mm = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                mm.add(new Pt(xs[i] / pxPerMm, -ys[i] / pxPerMm));
            }
            pen(g, s.hatch().pen(), pxPerMm);
            for (Pt[] seg : Hatching.segments(mm, s.hatch())) {
                g.strokeLine(seg[0].x() * pxPerMm, -seg[0].y() * pxPerMm, seg[1].x() * pxPerMm, -seg[1].y() * pxPerMm);
            }
        }
        if (s.outline() != null) {
            pen(g, s.outline(), pxPerMm);
            if (s.closed()) {
                g.strokePolygon(xs, ys, n);
            } else {
                g.strokePolyline(xs, ys, n);
            }
        }
    }

    private static void text(GraphicsContext g, Primitive.Text t, double x, double y, double pxPerMm) {
        double size = t.size() * pxPerMm;
        g.setFont(font(t.bold(), size));
        g.setFill(colour(t.colour()));
        double along = t.anchor().along();
        g.setTextAlign(along == 0 ? TextAlignment.LEFT : along == 1 ? TextAlignment.RIGHT : TextAlignment.CENTER);
        double drop = t.anchor().baselineDrop(t.size()) * pxPerMm;
        if (t.rotation() == 0) {
            g.fillText(t.text(), x, y + drop);
            return;
        }
        g.save();
        g.translate(x, y);
        g.rotate(-t.rotation());
        g.fillText(t.text(), 0, drop);
        g.restore();
    }

    private static void pen(GraphicsContext g, Pen pen, double pxPerMm) {
        g.setStroke(colour(pen.colour()));
        g.setLineWidth(pen.width() * pxPerMm);
        if (pen.isDashed()) {
            double[] d = new double[pen.dash().size()];
            for (int i = 0; i < d.length; i++) {
                d[i] = pen.dash().get(i) * pxPerMm;
            }
            g.setLineDashes(d);
        } else {
            g.setLineDashes();
        }
    }

    /** The JavaFX colour of a drawing colour. */
    static Color colour(Rgb c) {
        return Color.rgb(c.r(), c.g(), c.b());
    }

    /** The drawing font at a size in pixels (sizes are cached to a hundredth of a pixel). */
    static synchronized Font font(boolean bold, double px) {
        if (!loaded) {
            Font.loadFont(new ByteArrayInputStream(DrawingFonts.bytes(false)), 12);
            Font.loadFont(new ByteArrayInputStream(DrawingFonts.bytes(true)), 12);
            loaded = true;
        }
        long key = Math.round(px * 100) * 2 + (bold ? 1 : 0);
        if (FONTS.size() > 512) {
            FONTS.clear(); // a long zoom leaves many sizes behind
        }
        return FONTS.computeIfAbsent(key, k -> Font.font(FAMILY, bold ? FontWeight.BOLD : FontWeight.NORMAL, px));
    }
}
