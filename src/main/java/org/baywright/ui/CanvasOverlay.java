package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.baywright.plan.GridLine;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;

/**
 * The canvas's top layer: the gesture in progress (line, outline, box, move, grid line, deck span) and
 * the snap marker. Drawn on its own canvas, so a pointer move redraws this alone, never the plan.
 */
final class CanvasOverlay {
    static final Color PREVIEW = Color.web("#c2410c");

    private CanvasOverlay() {
    }

    /** Draws the gesture in progress and the snap marker. */
    static void draw(Canvas overlay, EditorModel model, CanvasTools tools, ViewTransform view) {
        GraphicsContext g = overlay.getGraphicsContext2D();
        g.clearRect(0, 0, overlay.getWidth(), overlay.getHeight());
        if (model.plan() == null) {
            return;
        }
        g.setLineDashes();
        g.setStroke(PREVIEW);
        g.setFill(PREVIEW);
        g.setLineWidth(2);
        Optional<Point> a = tools.anchor();
        Optional<Point> c = tools.current();
        switch (tools.mode()) {
            case LINE, MEASURE, NEW_GRID_LINE -> {
                if (a.isPresent() && c.isPresent()) {
                    double x0 = view.screenX(a.get().x());
                    double y0 = view.screenY(a.get().y());
                    double x1 = view.screenX(c.get().x());
                    double y1 = view.screenY(c.get().y());
                    g.setLineDashes(tools.mode() == CanvasTools.Mode.LINE ? new double[0] : new double[] {6, 4});
                    g.strokeLine(x0, y0, x1, y1);
                    g.setLineDashes();
                    g.setFont(Font.font(null, FontWeight.BOLD, 11));
                    halo(g, CanvasTools.len(a.get().distance(c.get()), model.units()), (x0 + x1) / 2 + 8, (y0 + y1) / 2 - 8,
                            TextAlignment.LEFT, PREVIEW);
                }
            }
            case OUTLINE, PATH -> {
                List<Point> pts = new ArrayList<>(tools.outline());
                if (pts.isEmpty() && a.isPresent() && c.isPresent()) {
                    // a rectangle being dragged
                    Polygon r = CanvasTools.rectangle(a.get(), c.get());
                    polygonPath(g, r, view);
                    g.setFill(Color.rgb(194, 65, 12, 0.12));
                    g.fill();
                    g.stroke();
                } else {
                    c.ifPresent(pts::add);
                    g.beginPath();
                    for (int i = 0; i < pts.size(); i++) {
                        double x = view.screenX(pts.get(i).x());
                        double y = view.screenY(pts.get(i).y());
                        if (i == 0) {
                            g.moveTo(x, y);
                        } else {
                            g.lineTo(x, y);
                        }
                    }
                    g.stroke();
                    for (Point q : tools.outline()) {
                        g.fillRect(view.screenX(q.x()) - 3, view.screenY(q.y()) - 3, 6, 6);
                    }
                }
            }
            case BOX -> {
                if (a.isPresent() && c.isPresent()) {
                    double x0 = view.screenX(Math.min(a.get().x(), c.get().x()));
                    double x1 = view.screenX(Math.max(a.get().x(), c.get().x()));
                    double y0 = view.screenY(Math.max(a.get().y(), c.get().y()));
                    double y1 = view.screenY(Math.min(a.get().y(), c.get().y()));
                    g.setFill(Color.rgb(60, 100, 170, 0.10));
                    g.fillRect(x0, y0, x1 - x0, y1 - y0);
                    g.setStroke(Color.web("#3c64aa"));
                    g.setLineWidth(1);
                    g.setLineDashes(5, 3);
                    g.strokeRect(x0, y0, x1 - x0, y1 - y0);
                }
            }
            case MOVE -> {
                if (a.isPresent() && c.isPresent()) {
                    double dx = c.get().x() - a.get().x();
                    double dy = c.get().y() - a.get().y();
                    g.setLineDashes(6, 4);
                    model.currentFloor().ifPresent(f -> f.members().stream().filter(m -> model.selection().contains(m.id()))
                            .forEach(m -> g.strokeLine(view.screenX(m.start().x() + dx), view.screenY(m.start().y() + dy),
                                    view.screenX(m.end().x() + dx), view.screenY(m.end().y() + dy))));
                    g.setLineDashes();
                    g.setFont(Font.font(null, FontWeight.BOLD, 11));
                    halo(g, "move " + CanvasTools.len(Math.hypot(dx, dy), model.units()), view.screenX(c.get().x()) + 12,
                            view.screenY(c.get().y()) + 18, TextAlignment.LEFT, PREVIEW);
                }
            }
            case GRID_LINE -> {
                if (c.isPresent() && tools.grabbedGrid().isPresent()) {
                    model.plan().gridLine(tools.grabbedGrid().get()).ifPresent(gl -> {
                        g.setLineDashes(10, 5);
                        if (gl.axis() == GridLine.Axis.X) {
                            double x = view.screenX(c.get().x());
                            g.strokeLine(x, 0, x, overlay.getHeight());
                            halo(g, gl.label() + " → " + CanvasTools.len(c.get().x() - gl.offset(), model.units()), x + 6, 60,
                                    TextAlignment.LEFT, PREVIEW);
                        } else {
                            double y = view.screenY(c.get().y());
                            g.strokeLine(0, y, overlay.getWidth(), y);
                            halo(g, gl.label() + " → " + CanvasTools.len(c.get().y() - gl.offset(), model.units()), 60, y - 6,
                                    TextAlignment.LEFT, PREVIEW);
                        }
                    });
                }
            }
            case DECK_SPAN -> {
                if (a.isPresent() && c.isPresent()) {
                    double x0 = view.screenX(a.get().x());
                    double y0 = view.screenY(a.get().y());
                    double x1 = view.screenX(c.get().x());
                    double y1 = view.screenY(c.get().y());
                    double len = Math.hypot(x1 - x0, y1 - y0);
                    if (len > 3) {
                        g.strokeLine(x0, y0, x1, y1);
                        arrowHead(g, x1, y1, (x1 - x0) / len, (y1 - y0) / len, 9);
                    }
                }
            }
            default -> {
            }
        }
        tools.hover().ifPresent(s -> drawSnapMarker(g, s, view));
    }

    private static void drawSnapMarker(GraphicsContext g, Snapper.Snap s, ViewTransform view) {
        double x = view.screenX(s.point().x());
        double y = view.screenY(s.point().y());
        g.setLineDashes();
        g.setStroke(PREVIEW);
        g.setLineWidth(2);
        double r = 7;
        switch (s.kind()) {
            case INTERSECTION, COLUMN -> g.strokeRect(x - r, y - r, 2 * r, 2 * r);
            case END -> g.strokeOval(x - r, y - r, 2 * r, 2 * r);
            case MIDPOINT -> g.strokePolygon(new double[] {x - r, x + r, x}, new double[] {y + r * 0.8, y + r * 0.8, y - r}, 3);
            case PERPENDICULAR -> {
                g.strokeLine(x - r, y + r, x + r, y + r);
                g.strokeLine(x - r, y + r, x - r, y - r);
                g.strokeRect(x - r, y + r - 5, 5, 5);
            }
            case ON_GRID -> {
                g.strokeLine(x - r, y - r, x + r, y + r);
                g.strokeLine(x - r, y + r, x + r, y - r);
            }
            case FREE -> {
                g.setLineWidth(1);
                g.strokeLine(x - r, y, x + r, y);
                g.strokeLine(x, y - r, x, y + r);
            }
        }
        if (s.kind() != Snapper.Kind.FREE) {
            g.setFont(Font.font(null, FontWeight.NORMAL, 10));
            halo(g, s.kind().label(), x + 11, y - 10, TextAlignment.LEFT, PREVIEW);
        }
    }


    /** A closed plan polygon as the current path. */
    static void polygonPath(GraphicsContext g, Polygon poly, ViewTransform view) {
        g.beginPath();
        boolean first = true;
        for (Point q : poly.vertices()) {
            if (first) {
                g.moveTo(view.screenX(q.x()), view.screenY(q.y()));
                first = false;
            } else {
                g.lineTo(view.screenX(q.x()), view.screenY(q.y()));
            }
        }
        g.closePath();
    }

    static void arrowHead(GraphicsContext g, double x, double y, double ux, double uy, double size) {
        double px = -uy;
        double py = ux;
        g.strokeLine(x, y, x - ux * size + px * size * 0.55, y - uy * size + py * size * 0.55);
        g.strokeLine(x, y, x - ux * size - px * size * 0.55, y - uy * size - py * size * 0.55);
    }

    /** Text with a pale halo, readable over line work. */
    static void halo(GraphicsContext g, String text, double x, double y, TextAlignment align, Color ink) {
        g.setTextAlign(align);
        g.setLineDashes();
        g.setStroke(Color.rgb(246, 245, 241, 0.9));
        g.setLineWidth(3.5);
        g.strokeText(text, x, y);
        g.setFill(ink);
        g.fillText(text, x, y);
    }
}
