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
    private static final Color PREVIEW = Color.web("#c2410c");
    private static final Color LOAD = Color.web("#8b3a62");
    private static final Color PROBLEM = Color.web("#b91c1c");
    private static final Color DECK = Color.web("#6f6a5d");
    private static final Color REACTION = Color.web("#24507a");

    private final EditorModel model;
    private final Canvas canvas = new Canvas();
    /** Gesture previews and the snap marker, drawn apart so the cursor never redraws the plan. */
    private final Canvas overlay = new Canvas();
    private final CanvasTools tools;
    private ViewTransform view = ViewTransform.identity();
    private boolean followFit = true;
    private boolean spaceDown;
    private boolean panning;
    private double lastX;
    private double lastY;

    public PlanCanvas(EditorModel model) {
        this.model = model;
        this.tools = new CanvasTools(model, () -> view);
        setId("plan-canvas");
        overlay.setMouseTransparent(true);
        getChildren().addAll(canvas, overlay);
        setFocusTraversable(true);
        setMinSize(200, 150);
        model.openedProperty().addListener((o, a, b) -> {
            followFit = true;
            zoomToFit();
        });
        model.planProperty().addListener((o, a, b) -> {
            if (followFit) {
                zoomToFit();
            } else {
                redraw();
            }
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
        model.selection().addListener((javafx.collections.SetChangeListener<String>) c -> redraw());
        model.showReactionsProperty().addListener((o, a, b) -> redraw());
        model.showTributaryProperty().addListener((o, a, b) -> redraw());
        model.shownProblemProperty().addListener((o, a, b) -> redraw());
        model.toolProperty().addListener((o, a, b) -> {
            setCursor(b == Tool.SELECT ? javafx.scene.Cursor.DEFAULT : javafx.scene.Cursor.CROSSHAIR);
            drawOverlay();
        });
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, e -> {
            tools.moved(e.getX(), e.getY());
            drawOverlay();
        });
        addEventHandler(MouseEvent.MOUSE_EXITED, e -> {
            if (tools.mode() == CanvasTools.Mode.IDLE) {
                overlay.getGraphicsContext2D().clearRect(0, 0, overlay.getWidth(), overlay.getHeight());
            }
        });
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
        addEventHandler(KeyEvent.KEY_PRESSED, e -> {
            if (e.isShortcutDown() || e.isAltDown() || e.isControlDown() || e.isMetaDown()) {
                return;
            }
            if (e.getCode() == KeyCode.F) {
                zoomToFit();
                e.consume();
                return;
            }
            if (tools.key(e.getCode())) {
                e.consume();
                drawOverlay();
            }
        });
    }

    /** The drawing tools' state (for tests and the tool options bar). */
    public CanvasTools tools() {
        return tools;
    }

    @Override
    protected void layoutChildren() {
        double w = getWidth();
        double h = getHeight();
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            overlay.setWidth(w);
            overlay.setHeight(h);
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
            tools.pressed(e.getX(), e.getY(), e.isShiftDown(), e.getClickCount());
            if (e.getClickCount() == 2) {
                tools.doubleClicked();
            }
            drawOverlay();
        } else if (e.getButton() == MouseButton.SECONDARY) {
            tools.cancel();
            drawOverlay();
        }
    }

    private void dragged(MouseEvent e) {
        if (panning) {
            view = view.panBy(e.getX() - lastX, e.getY() - lastY);
            followFit = false;
            lastX = e.getX();
            lastY = e.getY();
            redraw();
            return;
        }
        if (e.getButton() == MouseButton.PRIMARY) {
            tools.dragged(e.getX(), e.getY());
            drawOverlay();
        }
    }

    private void released(MouseEvent e) {
        if (panning) {
            panning = false;
            return;
        }
        if (e.getButton() == MouseButton.PRIMARY) {
            tools.released(e.getX(), e.getY());
            drawOverlay();
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
            g.fillText("No plan open. Use File › New or File › Open…", w / 2, h / 2);
            drawOverlay();
            return;
        }
        Optional<Floor> floor = model.currentFloor();
        floor.ifPresent(f -> drawSlab(g, f));
        List<MemberResult> results = model.currentMembers();
        if (model.showTributaryProperty().get()) {
            drawTributary(g, results);
        }
        floor.ifPresent(f -> f.areaLoads().stream().filter(a -> !a.outline().equals(f.slabEdge())).forEach(a -> drawAreaLoad(g, a)));
        floor.ifPresent(f -> f.decks().forEach(d -> drawDeckSpan(g, d)));
        drawGrid(g, p);
        drawDimensions(g, p);
        floor.ifPresent(f -> f.openings().forEach(o -> drawOpening(g, o)));
        drawSelectedOutlines(g, floor);
        if (results.isEmpty()) {
            floor.ifPresent(f -> {
                List<Member> all = new ArrayList<>(f.members());
                f.infills().forEach(i -> all.addAll(org.baywright.plan.Framing.infillBeams(p, i)));
                all.stream().filter(m -> model.selection().contains(m.id())).forEach(m -> drawSelectionLine(g, m.start(), m.end()));
                all.forEach(m -> drawUnrun(g, m));
            });
        } else {
            results.stream().filter(m -> model.selection().contains(m.id())).forEach(m -> drawSelectionLine(g, m.start(), m.end()));
            results.forEach(m -> drawMember(g, m));
            results.forEach(m -> labelMember(g, m));
            if (model.showReactionsProperty().get()) {
                results.forEach(m -> drawReactions(g, m));
            }
        }
        floor.ifPresent(f -> {
            f.lineLoads().forEach(l -> drawLineLoad(g, l));
            f.pointLoads().forEach(q -> drawPointLoad(g, q));
        });
        for (Column c : model.currentColumns()) {
            drawColumn(g, c);
        }
        drawProblems(g);
        drawLegend(g, w, h);
        drawOverlay();
    }

    // ---- loads, decks, tributary areas, reactions, problems ------------------------------------

    private void drawAreaLoad(GraphicsContext g, org.baywright.plan.AreaLoad a) {
        polygonPath(g, a.outline());
        g.setFill(Color.rgb(139, 58, 98, 0.10));
        g.fill();
        g.setStroke(LOAD);
        g.setLineWidth(1.2);
        g.setLineDashes(7, 4);
        g.stroke();
        g.setLineDashes();
        Point2D c = centre(a.outline());
        g.setFont(Font.font(null, FontWeight.NORMAL, 11));
        halo(g, a.id() + "  " + Readouts.areaLoad(a.values(), model.units()), c.getX(), c.getY(), TextAlignment.CENTER, LOAD);
    }

    private void drawDeckSpan(GraphicsContext g, org.baywright.plan.Deck d) {
        if (d.outline().vertices().size() < 3) {
            return;
        }
        Point2D c = centre(d.outline());
        double r = 26;
        double a = Math.toRadians(d.spanAngle());
        // screen y grows downwards
        double ux = Math.cos(a);
        double uy = -Math.sin(a);
        double x0 = c.getX() - ux * r;
        double y0 = c.getY() - uy * r + 22;
        double x1 = c.getX() + ux * r;
        double y1 = c.getY() + uy * r + 22;
        g.setStroke(DECK);
        g.setLineWidth(1.6);
        g.setLineDashes();
        g.strokeLine(x0, y0, x1, y1);
        arrowHead(g, x1, y1, ux, uy, 7);
        arrowHead(g, x0, y0, -ux, -uy, 7);
        g.setFont(Font.font(null, FontWeight.NORMAL, 10));
        halo(g, d.id() + " span", c.getX(), c.getY() + 40, TextAlignment.CENTER, DECK);
    }

    private static void arrowHead(GraphicsContext g, double x, double y, double ux, double uy, double size) {
        double px = -uy;
        double py = ux;
        g.strokeLine(x, y, x - ux * size + px * size * 0.55, y - uy * size + py * size * 0.55);
        g.strokeLine(x, y, x - ux * size - px * size * 0.55, y - uy * size - py * size * 0.55);
    }

    private void drawTributary(GraphicsContext g, List<MemberResult> results) {
        int i = 0;
        for (MemberResult m : results) {
            if (m.tributary() == null || m.tributary().isEmpty()) {
                continue;
            }
            Color c = (i++ % 2 == 0) ? Color.rgb(70, 110, 170, 0.16) : Color.rgb(200, 150, 60, 0.18);
            boolean sel = model.selection().contains(m.id());
            for (Polygon poly : m.tributary()) {
                polygonPath(g, poly);
                g.setFill(sel ? Color.rgb(214, 92, 40, 0.30) : c);
                g.fill();
                g.setStroke(Color.rgb(60, 60, 70, 0.35));
                g.setLineWidth(0.6);
                g.stroke();
            }
        }
    }

    private void drawReactions(GraphicsContext g, MemberResult m) {
        if (m.startReaction() == null || m.status() == MemberStatus.NOT_RUN) {
            return;
        }
        double x0 = view.screenX(m.start().x());
        double y0 = view.screenY(m.start().y());
        double x1 = view.screenX(m.end().x());
        double y1 = view.screenY(m.end().y());
        double len = Math.hypot(x1 - x0, y1 - y0);
        Font font = Font.font(null, FontWeight.NORMAL, 9.5);
        String a = Readouts.compactReactions(m.startReaction(), model.units());
        String b = Readouts.compactReactions(m.endReaction(), model.units());
        double need = textWidth(a, font) + textWidth(b, font) + 24;
        if (len < need) {
            return;
        }
        // along the member, below it (the size is above), each near its own end
        double angle = Math.toDegrees(Math.atan2(y1 - y0, x1 - x0));
        boolean flipped = angle > 90.01 || angle <= -89.99;
        if (flipped) {
            angle += angle > 0 ? -180 : 180;
            String t = a;
            a = b;
            b = t;
        }
        g.save();
        g.translate((x0 + x1) / 2, (y0 + y1) / 2);
        g.rotate(angle);
        g.setFont(font);
        halo(g, a, -len / 2 + 6, 13, TextAlignment.LEFT, REACTION);
        halo(g, b, len / 2 - 6, 13, TextAlignment.RIGHT, REACTION);
        g.restore();
    }

    private void drawLineLoad(GraphicsContext g, org.baywright.plan.LineLoad l) {
        boolean sel = model.selection().contains(l.id());
        g.setStroke(sel ? SELECTION : LOAD);
        g.setLineWidth(sel ? 6 : 2.2);
        g.setLineDashes(sel ? new double[0] : new double[] {2, 3});
        g.beginPath();
        for (int i = 0; i < l.path().size(); i++) {
            Point q = l.path().get(i);
            if (i == 0) {
                g.moveTo(view.screenX(q.x()), view.screenY(q.y()));
            } else {
                g.lineTo(view.screenX(q.x()), view.screenY(q.y()));
            }
        }
        g.stroke();
        g.setLineDashes();
        Point q = l.path().get(0);
        g.setFont(Font.font(null, FontWeight.NORMAL, 10));
        halo(g, l.id() + " " + Readouts.lineLoad(l.values(), model.units()), view.screenX(q.x()) + 6, view.screenY(q.y()) - 8,
                TextAlignment.LEFT, LOAD);
    }

    private void drawPointLoad(GraphicsContext g, org.baywright.plan.PointLoadItem q) {
        double x = view.screenX(q.at().x());
        double y = view.screenY(q.at().y());
        boolean sel = model.selection().contains(q.id());
        if (sel) {
            g.setFill(SELECTION);
            g.fillOval(x - 12, y - 12, 24, 24);
        }
        g.setStroke(LOAD);
        g.setLineWidth(1.8);
        g.setLineDashes();
        g.strokeOval(x - 7, y - 7, 14, 14);
        g.strokeLine(x - 5, y - 5, x + 5, y + 5);
        g.strokeLine(x - 5, y + 5, x + 5, y - 5);
        g.setFont(Font.font(null, FontWeight.NORMAL, 10));
        halo(g, q.id() + " " + Readouts.force(q.values(), model.units()), x + 10, y - 8, TextAlignment.LEFT, LOAD);
    }

    private void drawSelectedOutlines(GraphicsContext g, Optional<Floor> floor) {
        if (floor.isEmpty() || model.selection().isEmpty()) {
            return;
        }
        g.setStroke(SELECTION);
        g.setLineWidth(5);
        g.setLineDashes();
        for (Opening o : floor.get().openings()) {
            if (model.selection().contains(o.id())) {
                polygonPath(g, o.outline());
                g.stroke();
            }
        }
        for (org.baywright.plan.AreaLoad a : floor.get().areaLoads()) {
            if (model.selection().contains(a.id())) {
                polygonPath(g, a.outline());
                g.stroke();
            }
        }
    }

    private void drawProblems(GraphicsContext g) {
        org.baywright.plan.Problem shown = model.shownProblemProperty().get();
        String here = model.currentFloorId();
        for (org.baywright.plan.Problem pr : model.problems()) {
            if (pr.location().startsWith("floor ") && here != null && !pr.location().equals("floor " + here)
                    && !pr.location().startsWith("floor " + here + " ")) {
                continue; // drawn on the levels of its own floor layout
            }
            boolean hot = pr.equals(shown);
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
                g.setTextAlign(TextAlignment.CENTER);
                g.fillText("!", x, y + 4);
            }
        }
    }

    /** Dimension strings between neighbouring grid lines, outside the bubbles. */
    private void drawDimensions(GraphicsContext g, Plan p) {
        double[] b = bounds();
        if (b == null) {
            return;
        }
        g.setFont(Font.font(null, FontWeight.NORMAL, 10.5));
        g.setStroke(GRID);
        g.setLineWidth(0.8);
        g.setLineDashes();
        double top = Math.max(view.screenY(b[3]) - GRID_OVERRUN - 2 * BUBBLE_R - 14, 2 * BUBBLE_R + 20);
        List<GridLine> xs = org.baywright.plan.PlanEdits.lines(p, GridLine.Axis.X);
        for (int i = 0; i + 1 < xs.size(); i++) {
            double x0 = view.screenX(xs.get(i).offset());
            double x1 = view.screenX(xs.get(i + 1).offset());
            g.strokeLine(x0, top, x1, top);
            g.strokeLine(x0, top - 4, x0, top + 4);
            g.strokeLine(x1, top - 4, x1, top + 4);
            String t = CanvasTools.len(xs.get(i + 1).offset() - xs.get(i).offset(), model.units());
            if (Math.abs(x1 - x0) > textWidth(t, Font.font(10.5)) + 6) {
                halo(g, t, (x0 + x1) / 2, top - 4, TextAlignment.CENTER, GRID.darker());
            }
        }
        double left = Math.max(view.screenX(b[0]) - GRID_OVERRUN - 2 * BUBBLE_R - 14, 2 * BUBBLE_R + 20);
        List<GridLine> ys = org.baywright.plan.PlanEdits.lines(p, GridLine.Axis.Y);
        for (int j = 0; j + 1 < ys.size(); j++) {
            double y0 = view.screenY(ys.get(j).offset());
            double y1 = view.screenY(ys.get(j + 1).offset());
            g.strokeLine(left, y0, left, y1);
            g.strokeLine(left - 4, y0, left + 4, y0);
            g.strokeLine(left - 4, y1, left + 4, y1);
            String t = CanvasTools.len(ys.get(j + 1).offset() - ys.get(j).offset(), model.units());
            if (Math.abs(y1 - y0) > textWidth(t, Font.font(10.5)) + 6) {
                g.save();
                g.translate(left - 4, (y0 + y1) / 2);
                g.rotate(-90);
                halo(g, t, 0, 0, TextAlignment.CENTER, GRID.darker());
                g.restore();
            }
        }
    }

    // ---- the overlay: snap marker and gesture previews -----------------------------------------

    /** Draws the gesture in progress and the snap marker. */
    void drawOverlay() {
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
                    polygonPath(g, r);
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
        tools.hover().ifPresent(s -> drawSnapMarker(g, s));
    }

    private void drawSnapMarker(GraphicsContext g, Snapper.Snap s) {
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
        if (model.selection().contains(c.id())) {
            g.setFill(SELECTION);
            g.fillOval(x - s, y - s, 2 * s, 2 * s);
        }
        g.setFill(c.fixedSection().isPresent() ? Color.web("#3b3f46") : INK);
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

    private void drawSelectionLine(GraphicsContext g, Point a, Point b) {
        g.setLineDashes();
        g.setLineCap(StrokeLineCap.ROUND);
        g.setStroke(SELECTION);
        g.setLineWidth(16);
        g.strokeLine(view.screenX(a.x()), view.screenY(a.y()), view.screenX(b.x()), view.screenY(b.y()));
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
        if (model.showReactionsProperty().get()) {
            g.setFill(REACTION);
            g.fillText("end reactions, service, unreduced: " + (model.units() == org.baywright.units.UnitSystem.SI ? "kN" : "kip"),
                    x + 48 + 140, mid);
        }
        g.setTextBaseline(VPos.BASELINE);
    }

    /** The canvas itself (for snapshots). */
    Canvas canvas() {
        return canvas;
    }
}
