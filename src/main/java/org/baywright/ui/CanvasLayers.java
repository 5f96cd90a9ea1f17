package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.paint.CycleMethod;
import javafx.scene.paint.LinearGradient;
import javafx.scene.paint.Stop;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Plan;
import org.baywright.plan.Framing;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Opening;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;
import org.baywright.takedown.DeckChecks;
import org.baywright.report.drawing.Cividis;
import org.baywright.report.drawing.Rgb;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * The editor's own layers around the plan picture: under it, the tributary areas and the selection;
 * over it, the problem markers and the legend strip. The plan itself is {@link FxRenderer} drawing the
 * report's {@link org.baywright.report.drawing.PlanPicture}.
 */
final class CanvasLayers {
    static final Color SELECTION = Color.rgb(214, 92, 40, 0.55);
    private static final Color PROBLEM = Color.web("#b91c1c");
    private static final Color INK = Color.web("#1d1f22");
    private static final Color REACTION = Color.web("#24507a");

    private CanvasLayers() {
    }

    /** The layer under the plan: the ground, tributary areas (when shown) and the selection. */
    static void under(GraphicsContext g, EditorModel model, ViewTransform view, Color ground) {
        double w = g.getCanvas().getWidth();
        double h = g.getCanvas().getHeight();
        g.setLineDashes();
        g.setFill(ground);
        g.fillRect(0, 0, w, h);
        if (model.plan() == null) {
            g.setFill(Color.web("#7d8591"));
            g.setFont(Font.font(14));
            g.setTextAlign(TextAlignment.CENTER);
            g.fillText("No plan open. Use File › New or File › Open…", w / 2, h / 2);
            return;
        }
        List<MemberResult> results = model.currentMembers();
        Set<String> sel = model.selection();
        if (model.showTributaryProperty().get()) {
            int i = 0;
            for (MemberResult m : results) {
                if (m.tributary() == null || m.tributary().isEmpty()) {
                    continue;
                }
                Color c = (i++ % 2 == 0) ? Color.rgb(70, 110, 170, 0.16) : Color.rgb(200, 150, 60, 0.18);
                for (Polygon poly : m.tributary()) {
                    CanvasOverlay.polygonPath(g, poly, view);
                    g.setFill(sel.contains(m.id()) ? Color.rgb(214, 92, 40, 0.30) : c);
                    g.fill();
                    g.setStroke(Color.rgb(60, 60, 70, 0.35));
                    g.setLineWidth(0.6);
                    g.stroke();
                }
            }
        }
        if (model.showVibrationProperty().get()) {
            vibration(g, model, view);
        }
        if (sel.isEmpty()) {
            return;
        }
        Optional<Floor> floor = model.currentFloor();
        g.setLineCap(StrokeLineCap.ROUND);
        g.setStroke(SELECTION);
        if (results.isEmpty()) {
            floor.ifPresent(f -> Framing.members(model.plan(), f).stream().filter(m -> sel.contains(m.id()))
                    .forEach(m -> selectionLine(g, view, m.start(), m.end(), 18)));
        } else {
            results.stream().filter(m -> sel.contains(m.id())).forEach(m -> selectionLine(g, view, m.start(), m.end(), 18));
        }
        floor.ifPresent(f -> {
            g.setLineWidth(6);
            for (Opening o : f.openings()) {
                if (sel.contains(o.id())) {
                    CanvasOverlay.polygonPath(g, o.outline(), view);
                    g.stroke();
                }
            }
            for (org.baywright.plan.Deck d : f.decks()) {
                if (sel.contains(d.id())) {
                    // a deck picked with the Deck tool: its outline
                    CanvasOverlay.polygonPath(g, d.outline(), view);
                    g.stroke();
                }
            }
            for (AreaLoad a : f.areaLoads()) {
                if (sel.contains(a.id())) {
                    CanvasOverlay.polygonPath(g, a.outline(), view);
                    g.stroke();
                }
            }
            for (LineLoad l : f.lineLoads()) {
                for (int i = 0; sel.contains(l.id()) && i + 1 < l.path().size(); i++) {
                    selectionLine(g, view, l.path().get(i), l.path().get(i + 1), 10);
                }
            }
            g.setFill(SELECTION);
            for (PointLoadItem q : f.pointLoads()) {
                if (sel.contains(q.id())) {
                    disc(g, view, q.at(), 14);
                }
            }
        });
        for (Column c : model.currentColumns()) {
            if (sel.contains(c.id())) {
                disc(g, view, c.at(), 16);
            }
        }
        g.setLineCap(StrokeLineCap.SQUARE);
    }

    /**
     * View › Floor vibration, under the plan: each bay of the level tinted by its ratio ({@link VibrationScale});
     * bays that exceed the limit cross-hatched with a heavy dashed outline, bays not checked grey. The values are
     * written over the plan ({@link #vibrationLabels}).
     */
    static void vibration(GraphicsContext g, EditorModel model, ViewTransform view) {
        for (org.baywright.takedown.BayResult b : model.currentBays()) {
            List<Point> corners = BayView.outline(b.bay());
            double[] xs = new double[4];
            double[] ys = new double[4];
            for (int i = 0; i < 4; i++) {
                xs[i] = view.screenX(corners.get(i).x());
                ys[i] = view.screenY(corners.get(i).y());
            }
            Rgb fill = VibrationScale.at(b.ratio());
            g.setFill(FxRenderer.colour(fill));
            g.fillPolygon(xs, ys, 4);
            boolean exceeds = b.checked() && b.ratio() > 1;
            if (exceeds) {
                hatch(g, xs, ys);
            }
            g.setStroke(exceeds ? FxRenderer.colour(VibrationScale.EXCEEDS_INK) : Color.rgb(255, 255, 255, 0.9));
            g.setLineWidth(exceeds ? 3 : 1.5);
            g.setLineDashes(exceeds ? new double[] {10, 5} : null);
            g.strokePolygon(xs, ys, 4);
            g.setLineDashes();
        }
    }

    /**
     * Over the plan, with View › Floor vibration on: f_n and a_p/g of each bay on a small plate of the bay's colour
     * at its centre (above the member labels, which would otherwise hide them), the picked bay outlined in the
     * selection colour, and the key of the bay colours.
     */
    static void vibrationLabels(GraphicsContext g, EditorModel model, ViewTransform view, double w, double h) {
        model.selectedBayResult().ifPresent(b -> {
            List<Point> corners = BayView.outline(b.bay());
            double[] xs = new double[4];
            double[] ys = new double[4];
            for (int i = 0; i < 4; i++) {
                xs[i] = view.screenX(corners.get(i).x());
                ys[i] = view.screenY(corners.get(i).y());
            }
            g.setStroke(SELECTION);
            g.setLineWidth(5);
            g.setLineDashes();
            g.strokePolygon(xs, ys, 4);
        });
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.CENTER);
        double size = 10.5;
        g.setFont(Font.font(null, FontWeight.BOLD, size));
        for (org.baywright.takedown.BayResult b : model.currentBays()) {
            Rgb fill = VibrationScale.at(b.ratio());
            double cx = view.screenX(b.bay().centre().x());
            double cy = view.screenY(b.bay().centre().y());
            List<String> lines = BayView.label(b);
            int longest = lines.stream().mapToInt(String::length).max().orElse(0);
            double pw = longest * size * 0.56 + 8;
            double ph = lines.size() * (size + 3) + 4;
            g.setFill(FxRenderer.colour(fill));
            g.fillRect(cx - pw / 2, cy - ph / 2, pw, ph);
            boolean exceeds = b.checked() && b.ratio() > 1;
            g.setStroke(exceeds ? FxRenderer.colour(VibrationScale.EXCEEDS_INK) : INK);
            g.setLineWidth(exceeds ? 2 : 0.8);
            g.strokeRect(cx - pw / 2, cy - ph / 2, pw, ph);
            g.setFill(FxRenderer.colour(VibrationScale.textOn(fill)));
            for (int i = 0; i < lines.size(); i++) {
                g.fillText(lines.get(i), cx, cy + (i - (lines.size() - 1) / 2.0) * (size + 3));
            }
        }
        g.setTextBaseline(VPos.BASELINE);
        vibrationKey(g, w - 372, h - 30);
    }

    /** The hover box of a bay: its text lines on a pale plate beside the pointer, kept inside the view. */
    static void hoverBox(GraphicsContext g, String text, double x, double y, double w, double h) {
        String[] lines = text.split("\n");
        double size = 12;
        double lineH = size + 4;
        int longest = 0;
        for (String l : lines) {
            longest = Math.max(longest, l.length());
        }
        double bw = longest * size * 0.6 + 16;
        double bh = lines.length * lineH + 10;
        double bx = Math.min(x + 16, w - bw - 4);
        double by = Math.min(y + 16, h - bh - 4);
        g.setFill(Color.rgb(255, 255, 250, 0.95));
        g.fillRect(bx, by, bw, bh);
        g.setStroke(FxRenderer.colour(VibrationScale.EXCEEDS_INK));
        g.setLineWidth(1);
        g.setLineDashes();
        g.strokeRect(bx + 0.5, by + 0.5, bw, bh);
        g.setFill(INK);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        for (int i = 0; i < lines.length; i++) {
            g.setFont(i == 0 ? Font.font(null, FontWeight.BOLD, size) : Font.font(size));
            g.fillText(lines[i], bx + 8, by + 5 + i * lineH);
        }
        g.setTextBaseline(VPos.BASELINE);
    }

    /** Diagonal hatch inside a convex quadrilateral (the bays that exceed the limit). */
    private static void hatch(GraphicsContext g, double[] xs, double[] ys) {
        g.save();
        g.beginPath();
        g.moveTo(xs[0], ys[0]);
        for (int i = 1; i < 4; i++) {
            g.lineTo(xs[i], ys[i]);
        }
        g.closePath();
        g.clip();
        double minX = Math.min(Math.min(xs[0], xs[1]), Math.min(xs[2], xs[3]));
        double maxX = Math.max(Math.max(xs[0], xs[1]), Math.max(xs[2], xs[3]));
        double minY = Math.min(Math.min(ys[0], ys[1]), Math.min(ys[2], ys[3]));
        double maxY = Math.max(Math.max(ys[0], ys[1]), Math.max(ys[2], ys[3]));
        g.setStroke(Color.rgb(255, 255, 255, 0.55));
        g.setLineWidth(1.5);
        double h = maxY - minY;
        for (double x = minX - h; x < maxX; x += 9) {
            g.strokeLine(x, maxY, x + h, minY);
        }
        g.restore();
    }

    private static void selectionLine(GraphicsContext g, ViewTransform view, Point a, Point b, double width) {
        g.setLineWidth(width);
        g.strokeLine(view.screenX(a.x()), view.screenY(a.y()), view.screenX(b.x()), view.screenY(b.y()));
    }

    private static void disc(GraphicsContext g, ViewTransform view, Point at, double r) {
        g.fillOval(view.screenX(at.x()) - r, view.screenY(at.y()) - r, 2 * r, 2 * r);
    }

    /** The layer over the plan: problem markers (the one picked in the Problems panel larger) and the legend. */
    static void over(GraphicsContext g, EditorModel model, ViewTransform view, double legendHeight) {
        double w = g.getCanvas().getWidth();
        double h = g.getCanvas().getHeight();
        g.clearRect(0, 0, w, h);
        if (model.plan() == null) {
            return;
        }
        Problem shown = model.shownProblemProperty().get();
        String here = model.currentFloorId();
        g.setTextAlign(TextAlignment.CENTER);
        for (Problem pr : model.problems()) {
            if (pr.location().startsWith("floor ") && here != null && !pr.location().equals("floor " + here)
                    && !pr.location().startsWith("floor " + here + " ")) {
                continue; // drawn on the levels of its own floor layout
            }
            boolean hot = pr.equals(shown);
            if (DeckChecks.isSegment(pr)) {
                // a deck span or overhang: the reach itself, from the member to the member or edge
                Point a = pr.where().get(0);
                Point b = pr.where().get(1);
                g.setStroke(PROBLEM);
                g.setLineWidth(hot ? 3 : 2);
                g.setLineDashes(8, 4);
                g.strokeLine(view.screenX(a.x()), view.screenY(a.y()), view.screenX(b.x()), view.screenY(b.y()));
                g.setLineDashes();
            }
            for (Point q : pr.where()) {
                double x = view.screenX(q.x());
                double y = view.screenY(q.y());
                double r = hot ? 15 : 9;
                g.setLineDashes(4, 3);
                g.setStroke(PROBLEM);
                g.setLineWidth(hot ? 3 : 1.8);
                g.strokeOval(x - r, y - r, 2 * r, 2 * r);
                g.setLineDashes();
                g.setFill(PROBLEM);
                g.setFont(Font.font(null, FontWeight.BOLD, hot ? 13 : 11));
                g.fillText("!", x, y + 4);
            }
        }
        if (model.showVibrationProperty().get()) {
            vibrationLabels(g, model, view, w, h - legendHeight);
        }
        legend(g, model, w, h, legendHeight);
    }

    private static void legend(GraphicsContext g, EditorModel model, double w, double h, double legendHeight) {
        double y = h - legendHeight;
        g.setFill(Color.web("#ecebe6"));
        g.fillRect(0, y, w, legendHeight);
        g.setStroke(Color.web("#c9c7bf"));
        g.setLineWidth(1);
        g.setLineDashes();
        g.strokeLine(0, y + 0.5, w, y + 0.5);
        double mid = y + legendHeight / 2;
        double x = 12;
        g.setTextBaseline(VPos.CENTER);
        g.setTextAlign(TextAlignment.LEFT);
        g.setFont(Font.font(null, FontWeight.BOLD, 11));
        g.setFill(INK);
        g.fillText("Demand / capacity", x, mid);
        x += 118;
        g.setFont(Font.font(11));
        g.fillText("0", x, mid);
        x += 12;
        double barW = 150;
        List<Stop> stops = new ArrayList<>();
        for (int i = 0; i <= 15; i++) {
            stops.add(new Stop(i / 15.0, FxRenderer.colour(Cividis.at(i / 15.0))));
        }
        g.setFill(new LinearGradient(x, 0, x + barW, 0, false, CycleMethod.NO_CYCLE, stops));
        g.fillRect(x, mid - 6, barW, 12);
        g.setStroke(INK);
        g.strokeRect(x, mid - 6, barW, 12);
        g.setFill(INK);
        g.fillText("1.0", x + barW + 6, mid);
        x += barW + 44;
        Rgb top = Cividis.at(1);
        g.setFill(FxRenderer.colour(top));
        g.fillRect(x, mid - 4, 40, 8);
        g.setLineDashes(9.6, 4.8);
        g.setStroke(INK);
        g.setLineWidth(2.5);
        g.strokeRect(x, mid - 4, 40, 8);
        g.setLineDashes();
        g.setFill(INK);
        g.fillText("over 1.0: overstressed", x + 48, mid);
        x += 48 + 150;
        g.setLineDashes(16, 4, 3.2, 4);
        g.setLineWidth(1.3);
        g.strokeLine(x, mid, x + 40, mid);
        g.setLineDashes();
        g.fillText("unsupported / not run", x + 48, mid);
        if (model.showReactionsProperty().get()) {
            g.setFill(REACTION);
            g.fillText("end reactions R, service, unreduced: " + (model.units() == UnitSystem.SI ? "kN" : "kip"),
                    x + 48 + 140, mid);
        }
        g.setTextBaseline(VPos.BASELINE);
    }

    /** The key of View › Floor vibration, a plate at (x, y) just above the legend strip: the bay scale, the exceeds mark and grey. */
    private static void vibrationKey(GraphicsContext g, double x, double y) {
        g.setFill(Color.web("#ecebe6"));
        g.fillRect(x, y, 366, 24);
        g.setStroke(Color.web("#c9c7bf"));
        g.setLineWidth(1);
        g.strokeRect(x + 0.5, y + 0.5, 366, 24);
        double mid = y + 12;
        x += 8;
        g.setTextBaseline(VPos.CENTER);
        g.setTextAlign(TextAlignment.LEFT);
        g.setFont(Font.font(null, FontWeight.BOLD, 11));
        g.setFill(INK);
        g.fillText("Bays", x, mid);
        x += 34;
        g.setFont(Font.font(11));
        g.fillText("0", x, mid);
        x += 12;
        double barW = 80;
        List<Stop> stops = new ArrayList<>();
        for (int i = 0; i <= 12; i++) {
            stops.add(new Stop(i / 12.0, FxRenderer.colour(VibrationScale.at(i / 12.0 * VibrationScale.FULL))));
        }
        g.setFill(new LinearGradient(x, 0, x + barW, 0, false, CycleMethod.NO_CYCLE, stops));
        g.fillRect(x, mid - 6, barW, 12);
        g.setStroke(INK);
        g.setLineWidth(1);
        g.strokeRect(x, mid - 6, barW, 12);
        g.setFill(INK);
        g.fillText("1.5", x + barW + 6, mid);
        x += barW + 28;
        double[] xs = {x, x + 30, x + 30, x};
        double[] ys = {mid - 6, mid - 6, mid + 6, mid + 6};
        g.setFill(FxRenderer.colour(VibrationScale.at(1.2)));
        g.fillPolygon(xs, ys, 4);
        hatch(g, xs, ys);
        g.setStroke(FxRenderer.colour(VibrationScale.EXCEEDS_INK));
        g.setLineWidth(2);
        g.setLineDashes(6, 3);
        g.strokePolygon(xs, ys, 4);
        g.setLineDashes();
        g.setFill(INK);
        g.fillText("exceeds", x + 36, mid);
        x += 84;
        g.setFill(FxRenderer.colour(VibrationScale.NOT_CHECKED));
        g.fillRect(x, mid - 6, 30, 12);
        g.setFill(INK);
        g.fillText("not checked", x + 36, mid);
        g.setTextBaseline(VPos.BASELINE);
    }

    /** [minX, minY, maxX, maxY] of the current level's grid, slab edge, members and columns, or null for an empty plan. */
    static double[] bounds(EditorModel model) {
        Plan p = model.plan();
        if (p == null) {
            return null;
        }
        List<Point> pts = new ArrayList<>();
        model.currentFloor().ifPresent(f -> {
            pts.addAll(f.slabEdge().vertices());
            f.members().forEach(m -> {
                pts.add(m.start());
                pts.add(m.end());
            });
        });
        p.columns().forEach(c -> pts.add(c.at()));
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (GridLine g : p.grid()) {
            if (g.axis() == GridLine.Axis.X) {
                minX = Math.min(minX, g.offset());
                maxX = Math.max(maxX, g.offset());
            } else {
                minY = Math.min(minY, g.offset());
                maxY = Math.max(maxY, g.offset());
            }
        }
        for (Point q : pts) {
            minX = Math.min(minX, q.x());
            maxX = Math.max(maxX, q.x());
            minY = Math.min(minY, q.y());
            maxY = Math.max(maxY, q.y());
        }
        return Double.isFinite(minX) && Double.isFinite(minY) ? new double[] {minX, minY, maxX, maxY} : null;
    }
}
