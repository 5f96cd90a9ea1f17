package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.geometry.Point2D;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;
import javafx.scene.text.TextAlignment;
import org.baywright.design.MemberStatus;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Member;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.report.drawing.Cividis;
import org.baywright.report.drawing.Rgb;
import org.baywright.takedown.MemberResult;

/**
 * The plan view: grid, slab edge, openings, columns and members coloured by their demand/capacity
 * ratio. Scroll zooms about the cursor; middle-drag or space + drag pans; a click picks a member.
 * All plan ↔ pixel arithmetic goes through {@link ViewTransform}.
 */
public final class PlanCanvas extends Region {
    /** Pixels left around the plan by Zoom to fit (room for the grid bubbles). */
    static final double FIT_MARGIN = 70;
    private static final double BUBBLE_R = 12;
    private static final double GRID_OVERRUN = 26;
    /** Height of the legend strip along the bottom of the view, px. */
    static final double LEGEND_H = 30;

    static final Color BACKGROUND = Color.web("#f6f5f1");
    private static final Color SLAB_FILL = Color.web("#e4e2da");
    private static final Color SLAB_EDGE = Color.web("#56565a");
    private static final Color GRID = Color.web("#7d8591");
    private static final Color INK = Color.web("#1d1f22");
    private static final Color NOT_DESIGNED = Color.web("#9a9a9a");
    private static final Color SELECTION = Color.rgb(214, 92, 40, 0.6);

    private final EditorModel model;
    private final Canvas canvas = new Canvas();
    private ViewTransform view = ViewTransform.identity();
    private boolean followFit = true;
    private boolean spaceDown;
    private boolean panning;
    private double lastX;
    private double lastY;

    public PlanCanvas(EditorModel model) {
        this.model = model;
        setId("plan-canvas");
        getChildren().add(canvas);
        setFocusTraversable(true);
        setMinSize(200, 150);
        model.planProperty().addListener((o, a, b) -> {
            followFit = true;
            zoomToFit();
        });
        model.runProperty().addListener((o, a, b) -> redraw());
        model.levelProperty().addListener((o, a, b) -> {
            if (followFit) {
                zoomToFit();
            } else {
                redraw();
            }
        });
        model.selectedProperty().addListener((o, a, b) -> redraw());
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, e -> panning = false);
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.SPACE) {
                spaceDown = true;
                e.consume();
            }
        });
        addEventFilter(KeyEvent.KEY_RELEASED, e -> {
            if (e.getCode() == KeyCode.SPACE) {
                spaceDown = false;
                e.consume();
            }
        });
    }

    @Override
    protected void layoutChildren() {
        double w = getWidth();
        double h = getHeight();
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            if (followFit) {
                zoomToFit();
                return;
            }
            redraw();
        }
    }

    /** The current plan ↔ pixel mapping (pixels are this node's local coordinates). */
    public ViewTransform transform() {
        return view;
    }

    /** Replaces the view (e.g. restoring a saved view); stops following the window size. */
    public void setTransform(ViewTransform t) {
        view = t;
        followFit = false;
        redraw();
    }

    /** Shows the whole plan: grid, slab edge and members of the current level. */
    public void zoomToFit() {
        double[] b = bounds();
        view = b == null ? ViewTransform.identity().panBy(getWidth() / 2, getHeight() / 2)
                : ViewTransform.fit(b[0], b[1], b[2], b[3], Math.max(1, getWidth()),
                        Math.max(1, getHeight() - LEGEND_H), FIT_MARGIN);
        followFit = true;
        redraw();
    }

    /** [minX, minY, maxX, maxY] of what is drawn, or null for an empty plan. */
    double[] bounds() {
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
        double[] gx = gridRange(p, GridLine.Axis.X);
        double[] gy = gridRange(p, GridLine.Axis.Y);
        double minX = gx == null ? Double.POSITIVE_INFINITY : gx[0];
        double maxX = gx == null ? Double.NEGATIVE_INFINITY : gx[1];
        double minY = gy == null ? Double.POSITIVE_INFINITY : gy[0];
        double maxY = gy == null ? Double.NEGATIVE_INFINITY : gy[1];
        for (Point q : pts) {
            minX = Math.min(minX, q.x());
            maxX = Math.max(maxX, q.x());
            minY = Math.min(minY, q.y());
            maxY = Math.max(maxY, q.y());
        }
        return Double.isFinite(minX) && Double.isFinite(minY) ? new double[] {minX, minY, maxX, maxY} : null;
    }

    private static double[] gridRange(Plan p, GridLine.Axis axis) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (GridLine g : p.grid()) {
            if (g.axis() == axis) {
                lo = Math.min(lo, g.offset());
                hi = Math.max(hi, g.offset());
            }
        }
        return lo <= hi ? new double[] {lo, hi} : null;
    }

    // ---- interaction --------------------------------------------------------------------------

    private void pressed(MouseEvent e) {
        requestFocus();
        lastX = e.getX();
        lastY = e.getY();
        if (e.getButton() == MouseButton.MIDDLE || e.getButton() == MouseButton.PRIMARY && spaceDown) {
            panning = true;
            return;
        }
        if (e.getButton() == MouseButton.PRIMARY) {
            model.select(memberAt(e.getX(), e.getY()).orElse(null));
        }
    }

    private void dragged(MouseEvent e) {
        if (panning) {
            view = view.panBy(e.getX() - lastX, e.getY() - lastY);
            followFit = false;
            lastX = e.getX();
            lastY = e.getY();
            redraw();
        }
    }

    private void scrolled(ScrollEvent e) {
        if (e.getDeltaY() == 0) {
            return;
        }
        view = view.zoomAt(e.getX(), e.getY(), Math.pow(1.0025, e.getDeltaY()));
        followFit = false;
        redraw();
        e.consume();
    }

    /** The id of the member under a canvas point, within {@link PlanHits#TOLERANCE_PX}. */
    public Optional<String> memberAt(double x, double y) {
        Point2D w = view.toWorld(x, y);
        List<PlanHits.Segment> segs = model.currentMembers().stream()
                .map(m -> new PlanHits.Segment(m.id(), m.start(), m.end())).toList();
        return PlanHits.nearest(segs, w.getX(), w.getY(), view.toWorldLength(PlanHits.TOLERANCE_PX))
                .map(PlanHits.Segment::id);
    }

    // ---- drawing ------------------------------------------------------------------------------

    /** Draws everything again. */
    public void redraw() {
        GraphicsContext g = canvas.getGraphicsContext2D();
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        g.setLineDashes();
        g.setFill(BACKGROUND);
        g.fillRect(0, 0, w, h);
        Plan p = model.plan();
        if (p == null) {
            g.setFill(GRID);
            g.setFont(Font.font(14));
            g.setTextAlign(TextAlignment.CENTER);
            g.fillText("No plan open. Use File › Open…", w / 2, h / 2);
            return;
        }
        Optional<Floor> floor = model.currentFloor();
        floor.ifPresent(f -> drawSlab(g, f));
        drawGrid(g, p);
        floor.ifPresent(f -> f.openings().forEach(o -> drawOpening(g, o)));
        List<MemberResult> results = model.currentMembers();
        if (results.isEmpty()) {
            floor.ifPresent(f -> f.members().forEach(m -> drawUnrun(g, m)));
        } else {
            model.selectedResult().ifPresent(m -> drawSelection(g, m));
            results.forEach(m -> drawMember(g, m));
            results.forEach(m -> labelMember(g, m));
        }
        for (Column c : model.currentColumns()) {
            drawColumn(g, c);
        }
        drawLegend(g, w, h);
    }

    private void polygonPath(GraphicsContext g, Polygon poly) {
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

    private void drawSlab(GraphicsContext g, Floor f) {
        polygonPath(g, f.slabEdge());
        g.setFill(SLAB_FILL);
        g.fill();
        g.setStroke(SLAB_EDGE);
        g.setLineWidth(1.5);
        g.setLineDashes();
        g.stroke();
    }

    private void drawOpening(GraphicsContext g, Opening o) {
        g.save();
        polygonPath(g, o.outline());
        g.setFill(BACKGROUND);
        g.fill();
        g.clip();
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (Point q : o.outline().vertices()) {
            minX = Math.min(minX, view.screenX(q.x()));
            maxX = Math.max(maxX, view.screenX(q.x()));
            minY = Math.min(minY, view.screenY(q.y()));
            maxY = Math.max(maxY, view.screenY(q.y()));
        }
        g.setStroke(SLAB_EDGE);
        g.setLineWidth(0.8);
        double step = 8;
        for (double d = minX - (maxY - minY); d < maxX; d += step) {
            g.strokeLine(d, maxY, d + (maxY - minY), minY);
        }
        g.restore();
        polygonPath(g, o.outline());
        g.setStroke(SLAB_EDGE);
        g.setLineWidth(1.2);
        g.stroke();
        Point2D c = centre(o.outline());
        g.setFont(Font.font(null, FontWeight.NORMAL, 11));
        halo(g, o.id(), c.getX(), c.getY(), TextAlignment.CENTER, SLAB_EDGE);
    }

    private Point2D centre(Polygon poly) {
        double x = 0;
        double y = 0;
        for (Point q : poly.vertices()) {
            x += view.screenX(q.x());
            y += view.screenY(q.y());
        }
        int n = Math.max(1, poly.vertices().size());
        return new Point2D(x / n, y / n);
    }

    private void drawGrid(GraphicsContext g, Plan p) {
        double[] b = bounds();
        if (b == null) {
            return;
        }
        double left = view.screenX(b[0]) - GRID_OVERRUN;
        double right = view.screenX(b[2]) + GRID_OVERRUN;
        double top = view.screenY(b[3]) - GRID_OVERRUN;
        double bottom = view.screenY(b[1]) + GRID_OVERRUN;
        g.setFont(Font.font(null, FontWeight.BOLD, 12));
        for (GridLine line : p.grid()) {
            g.setStroke(GRID);
            g.setLineWidth(1);
            g.setLineDashes(14, 4, 3, 4);
            if (line.axis() == GridLine.Axis.X) {
                double x = view.screenX(line.offset());
                g.strokeLine(x, top, x, bottom);
                // bubbles stay in view when the plan's edge is scrolled away
                bubble(g, line.label(), x, Math.max(top - BUBBLE_R, BUBBLE_R + 3));
            } else {
                double y = view.screenY(line.offset());
                g.strokeLine(left, y, right, y);
                bubble(g, line.label(), Math.max(left - BUBBLE_R, BUBBLE_R + 3), y);
            }
        }
        g.setLineDashes();
    }

    private void bubble(GraphicsContext g, String label, double cx, double cy) {
        g.setLineDashes();
        g.setFill(Color.WHITE);
        g.fillOval(cx - BUBBLE_R, cy - BUBBLE_R, 2 * BUBBLE_R, 2 * BUBBLE_R);
        g.setStroke(GRID.darker());
        g.setLineWidth(1.2);
        g.strokeOval(cx - BUBBLE_R, cy - BUBBLE_R, 2 * BUBBLE_R, 2 * BUBBLE_R);
        g.setFill(INK);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(label, cx, cy);
        g.setTextBaseline(VPos.BASELINE);
    }

    private void drawColumn(GraphicsContext g, Column c) {
        double s = Math.max(8, Math.min(18, view.scale() * 0.36));
        double x = view.screenX(c.at().x());
        double y = view.screenY(c.at().y());
        g.setFill(INK);
        g.fillRect(x - s / 2, y - s / 2, s, s);
    }

    /** The ratio colour of a member: cividis over 0–1; grey when not designed. */
    static Color colourOf(MemberResult m) {
        if (Double.isNaN(m.maxRatio())) {
            return NOT_DESIGNED;
        }
        Rgb c = Cividis.at(m.maxRatio());
        return Color.rgb(c.r(), c.g(), c.b());
    }

    private static boolean designed(MemberResult m) {
        return m.status() != MemberStatus.UNSUPPORTED && m.status() != MemberStatus.NOT_RUN && !Double.isNaN(m.maxRatio());
    }

    private void drawSelection(GraphicsContext g, MemberResult m) {
        g.setLineDashes();
        g.setLineCap(StrokeLineCap.ROUND);
        g.setStroke(SELECTION);
        g.setLineWidth(16);
        g.strokeLine(view.screenX(m.start().x()), view.screenY(m.start().y()), view.screenX(m.end().x()), view.screenY(m.end().y()));
        g.setLineCap(StrokeLineCap.SQUARE);
    }

    private void drawMember(GraphicsContext g, MemberResult m) {
        double x0 = view.screenX(m.start().x());
        double y0 = view.screenY(m.start().y());
        double x1 = view.screenX(m.end().x());
        double y1 = view.screenY(m.end().y());
        boolean girder = m.kind() == org.baywright.plan.MemberKind.GIRDER;
        double width = girder ? 4.5 : 3;
        g.setLineCap(StrokeLineCap.BUTT);
        if (!designed(m)) {
            g.setLineDashes(5, 4);
            g.setStroke(NOT_DESIGNED);
            g.setLineWidth(2);
            g.strokeLine(x0, y0, x1, y1);
        } else if (m.status() == MemberStatus.OVERSTRESSED) {
            g.setLineDashes(14, 6);
            g.setStroke(INK);
            g.setLineWidth(width + 5);
            g.strokeLine(x0, y0, x1, y1);
            g.setStroke(colourOf(m));
            g.setLineWidth(width + 2);
            g.strokeLine(x0, y0, x1, y1);
        } else {
            g.setLineDashes();
            g.setStroke(INK);
            g.setLineWidth(width + 2);
            g.strokeLine(x0, y0, x1, y1);
            g.setStroke(colourOf(m));
            g.setLineWidth(width);
            g.strokeLine(x0, y0, x1, y1);
        }
        g.setLineDashes();
    }

    /** The text along a member: its size and ratio, or its status when it has none. */
    static String label(MemberResult m) {
        if (!designed(m)) {
            return m.id() + " " + m.status().label();
        }
        return (m.section().isEmpty() ? "no section" : m.section()) + "  " + Readouts.ratio(m.maxRatio());
    }

    private void labelMember(GraphicsContext g, MemberResult m) {
        double x0 = view.screenX(m.start().x());
        double y0 = view.screenY(m.start().y());
        double x1 = view.screenX(m.end().x());
        double y1 = view.screenY(m.end().y());
        double len = Math.hypot(x1 - x0, y1 - y0);
        String text = label(m);
        Font font = Font.font(null, m.status() == MemberStatus.OVERSTRESSED ? FontWeight.BOLD : FontWeight.NORMAL, 11);
        double tw = textWidth(text, font);
        if (len < tw + 16) {
            return;
        }
        double angle = Math.toDegrees(Math.atan2(y1 - y0, x1 - x0));
        if (angle > 90.01) {
            angle -= 180;
        } else if (angle <= -89.99) {
            angle += 180;
        }
        g.save();
        g.translate((x0 + x1) / 2, (y0 + y1) / 2);
        g.rotate(angle);
        g.setFont(font);
        halo(g, text, 0, -6, TextAlignment.CENTER, INK);
        g.restore();
    }

    private static double textWidth(String s, Font f) {
        Text t = new Text(s);
        t.setFont(f);
        return t.getLayoutBounds().getWidth();
    }

    private static void halo(GraphicsContext g, String text, double x, double y, TextAlignment align, Color ink) {
        g.setTextAlign(align);
        g.setLineDashes();
        g.setStroke(Color.rgb(246, 245, 241, 0.9));
        g.setLineWidth(3.5);
        g.strokeText(text, x, y);
        g.setFill(ink);
        g.fillText(text, x, y);
    }

    private void drawUnrun(GraphicsContext g, Member m) {
        g.setLineDashes(5, 4);
        g.setStroke(NOT_DESIGNED);
        g.setLineWidth(2);
        g.strokeLine(view.screenX(m.start().x()), view.screenY(m.start().y()), view.screenX(m.end().x()), view.screenY(m.end().y()));
        g.setLineDashes();
    }

    private void drawLegend(GraphicsContext g, double w, double h) {
        double y = h - LEGEND_H;
        g.setFill(Color.web("#ecebe6"));
        g.fillRect(0, y, w, LEGEND_H);
        g.setStroke(Color.web("#c9c7bf"));
        g.setLineWidth(1);
        g.setLineDashes();
        g.strokeLine(0, y + 0.5, w, y + 0.5);
        double mid = y + LEGEND_H / 2;
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
        for (int i = 0; i < barW; i++) {
            Rgb c = Cividis.at(i / (barW - 1));
            g.setFill(Color.rgb(c.r(), c.g(), c.b()));
            g.fillRect(x + i, mid - 6, 1.5, 12);
        }
        g.setStroke(INK);
        g.strokeRect(x, mid - 6, barW, 12);
        g.setFill(INK);
        g.fillText("1.0", x + barW + 6, mid);
        x += barW + 44;
        g.setLineDashes(14, 6);
        g.setStroke(INK);
        g.setLineWidth(9);
        g.strokeLine(x, mid, x + 40, mid);
        Rgb top = Cividis.at(1);
        g.setStroke(Color.rgb(top.r(), top.g(), top.b()));
        g.setLineWidth(6);
        g.strokeLine(x, mid, x + 40, mid);
        g.setLineDashes();
        g.fillText("over 1.0: overstressed", x + 48, mid);
        x += 48 + 150;
        g.setLineDashes(5, 4);
        g.setStroke(NOT_DESIGNED);
        g.setLineWidth(2);
        g.strokeLine(x, mid, x + 40, mid);
        g.setLineDashes();
        g.fillText("unsupported / not run", x + 48, mid);
        g.setTextBaseline(VPos.BASELINE);
    }

    /** The canvas itself (for snapshots). */
    Canvas canvas() {
        return canvas;
    }
}
