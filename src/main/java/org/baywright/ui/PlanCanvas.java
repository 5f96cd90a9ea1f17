package org.baywright.ui;

import java.util.List;
import java.util.Optional;
import javafx.animation.PauseTransition;
import javafx.collections.ListChangeListener;
import javafx.collections.SetChangeListener;
import javafx.geometry.Point2D;
import javafx.scene.Cursor;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.util.Duration;
import org.baywright.report.drawing.PlanPicture;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.Rgb;

/**
 * The plan view. The plan itself — grid, dimensions, slab, openings, loads, members banded by ratio with
 * their labels, columns — is the report's {@link PlanPicture}, the same builder the printed sheet uses,
 * drawn by {@link FxRenderer}; it is rebuilt only when the plan, the run, the level or the reactions
 * switch change, and laid out again when a zoom settles (in between, it is magnified). Four stacked
 * canvases keep redraws small: under the plan the tributary areas and the selection
 * ({@link CanvasLayers#under}), then the plan, then problems and the legend ({@link CanvasLayers#over}),
 * and on top the gesture preview and snap marker ({@link CanvasOverlay}), the only one a pointer move
 * redraws. Scroll zooms about the cursor; middle-drag or space + drag pans; a click picks a member. All
 * plan ↔ pixel arithmetic goes through {@link ViewTransform}.
 */
public final class PlanCanvas extends Region {
    /** Screen pixels per drawing millimetre: the plan is lettered as the sheet, seen at about 110 dpi. */
    static final double PX_PER_MM = 4.4;
    /** Lettering height of member sizes, mm (the sheet's on ARCH D and ISO A1). */
    static final double TEXT_MM = 2.5;
    /** Pixels left around the plan by Zoom to fit: room for the dimensions and the grid bubbles (compact style). */
    static final double FIT_MARGIN = 70;
    /** Height of the legend strip along the bottom of the view, px. */
    static final double LEGEND_H = 30;
    static final Color BACKGROUND = Color.web("#f6f5f1");
    private static final Rgb GROUND = new Rgb(246, 245, 241);

    private final EditorModel model;
    private final Canvas under = new Canvas();
    private final Canvas canvas = new Canvas();
    private final Canvas marks = new Canvas();
    /** Gesture previews and the snap marker, drawn apart so the cursor never redraws the plan. */
    private final Canvas overlay = new Canvas();
    private final CanvasTools tools;
    /** Lays the plan out again once a zoom has settled. */
    private final PauseTransition settle = new PauseTransition(Duration.millis(180));
    /** After an edit, how long the picture waits for the edit's run before it is drawn with the previous results. */
    private final PauseTransition awaitRun = new PauseTransition(Duration.millis(150));
    /** True from an edit until its run arrives (or {@link #awaitRun} ends): the picture is not rebuilt twice. */
    private boolean awaitingRun;
    private ViewTransform view = ViewTransform.identity();
    private boolean followFit = true;
    private boolean spaceDown;
    private boolean panning;
    private double lastX;
    private double lastY;
    /** The hover text of the bay under the pointer (View › Floor vibration on, no member there), or null. */
    private String bayHover;
    private double hoverX;
    private double hoverY;

    /** What the under (0), marks (1) and plan (2) canvases were last drawn from. */
    private final LayerMemo drawn = new LayerMemo(3);
    private PlanPicture picture;
    /** What the picture was built from: plan, run, level, reactions shown (compared by identity). */
    private Object[] pictureOf = new Object[4];
    private List<Primitive> laidOut;
    /** The view scale the picture was laid out at, px per metre. */
    private double laidOutScale;

    public PlanCanvas(EditorModel model) {
        this.model = model;
        this.tools = new CanvasTools(model, () -> view);
        setId("plan-canvas");
        for (Canvas c : List.of(under, canvas, marks, overlay)) {
            c.setMouseTransparent(true);
        }
        getChildren().addAll(under, canvas, marks, overlay);
        setFocusTraversable(true);
        setMinSize(200, 150);
        settle.setOnFinished(e -> {
            if (laidOutScale != view.scale()) {
                laidOut = null;
                drawPlan();
            }
        });
        model.openedProperty().addListener((o, a, b) -> {
            followFit = true;
            zoomToFit();
        });
        awaitRun.setOnFinished(e -> {
            awaitingRun = false;
            drawPlan();
        });
        model.planProperty().addListener((o, a, b) -> {
            // an edit of a plan that has run: its own run follows at once, so wait for it rather than
            // building the picture of the new plan with the old results first
            awaitingRun = model.run() != null && a != null && b != null;
            if (awaitingRun) {
                awaitRun.playFromStart();
            }
            fitOrRedraw();
        });
        model.levelProperty().addListener((o, a, b) -> {
            awaitingRun = false;
            fitOrRedraw();
        });
        model.runProperty().addListener((o, a, b) -> {
            awaitingRun = false;
            awaitRun.stop();
            drawUnder();
            drawPlan();
            drawMarks();
        });
        model.problems().addListener((ListChangeListener<Object>) c -> drawMarks());
        model.selectedProperty().addListener((o, a, b) -> drawUnder());
        model.selection().addListener((SetChangeListener<String>) c -> drawUnder());
        model.showReactionsProperty().addListener((o, a, b) -> {
            drawPlan();
            drawMarks();
        });
        model.showTributaryProperty().addListener((o, a, b) -> drawUnder());
        model.showVibrationProperty().addListener((o, a, b) -> {
            bayHover = null;
            drawUnder();
            drawMarks();
            drawOverlay();
        });
        model.selectedBayProperty().addListener((o, a, b) -> drawMarks());
        model.shownProblemProperty().addListener((o, a, b) -> drawMarks());
        model.toolProperty().addListener((o, a, b) -> {
            setCursor(b == Tool.SELECT ? Cursor.DEFAULT : Cursor.CROSSHAIR);
            drawOverlay();
        });
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, e -> {
            tools.moved(e.getX(), e.getY());
            bayHover = bayHoverAt(e.getX(), e.getY());
            hoverX = e.getX();
            hoverY = e.getY();
            drawOverlay();
        });
        addEventHandler(MouseEvent.MOUSE_EXITED, e -> {
            bayHover = null;
            if (tools.mode() == CanvasTools.Mode.IDLE) {
                overlay.getGraphicsContext2D().clearRect(0, 0, overlay.getWidth(), overlay.getHeight());
            }
        });
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventFilter(KeyEvent.KEY_PRESSED, e -> space(e, true));
        addEventFilter(KeyEvent.KEY_RELEASED, e -> space(e, false));
        addEventHandler(KeyEvent.KEY_PRESSED, e -> {
            if (e.isShortcutDown() || e.isAltDown() || e.isControlDown() || e.isMetaDown()) {
                return;
            }
            if (e.getCode() == KeyCode.F) {
                zoomToFit();
                e.consume();
            } else if (tools.key(e.getCode())) {
                e.consume();
                drawOverlay();
            }
        });
    }

    private void space(KeyEvent e, boolean down) {
        if (e.getCode() == KeyCode.SPACE) {
            spaceDown = down;
            e.consume();
        }
    }

    private void fitOrRedraw() {
        if (followFit) {
            zoomToFit();
        } else {
            redraw();
        }
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
            for (Canvas c : List.of(under, canvas, marks, overlay)) {
                c.setWidth(w);
                c.setHeight(h);
            }
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

    /** Shows the whole plan: grid, slab edge and members of the current level, with room for the bubbles. */
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
        return CanvasLayers.bounds(model);
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
            pickBay(e.getX(), e.getY());
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
        drawAll(false);
        settle.playFromStart();
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

    /**
     * The bay under a canvas point while View › Floor vibration is on and no member lies under it, or empty
     * (the smallest outline when several hold the point).
     */
    public Optional<org.baywright.takedown.BayResult> bayAt(double x, double y) {
        if (!model.showVibrationProperty().get() || memberAt(x, y).isPresent()) {
            return Optional.empty();
        }
        Point2D w = view.toWorld(x, y);
        return BayView.at(model.currentBays(), w.getX(), w.getY());
    }

    /** The hover text at a canvas point ({@link BayView#hover}), or null where no bay is under it. */
    String bayHoverAt(double x, double y) {
        return bayAt(x, y).map(BayView::hover).orElse(null);
    }

    /** The hover text shown now, or null (for tests). */
    String bayHover() {
        return bayHover;
    }

    /** A click with the Select tool that picked nothing else picks the bay under it (View › Floor vibration on). */
    private void pickBay(double x, double y) {
        if (model.toolProperty().get() != Tool.SELECT || !model.selection().isEmpty()) {
            model.selectedBayProperty().set(null);
            return;
        }
        model.selectedBayProperty().set(bayAt(x, y).map(b -> b.bay().id()).orElse(null));
    }

    // ---- drawing ------------------------------------------------------------------------------

    /** Draws every layer again (the plan laid out afresh if the zoom changed since). */
    public void redraw() {
        drawAll(true);
    }

    private void drawAll(boolean relayout) {
        if (relayout && laidOutScale != view.scale()) {
            laidOut = null;
        }
        drawUnder();
        drawPlan();
        drawMarks();
        drawOverlay();
    }

    private void drawUnder() {
        // the plan matters only for where selected openings, loads and columns are
        Object planIfSelection = model.selection().isEmpty() ? null : id(model.plan());
        if (fresh(0, planIfSelection, model.plan() == null, id(model.run()), model.levelProperty().get(),
                java.util.Set.copyOf(model.selection()), model.showTributaryProperty().get(),
                model.showVibrationProperty().get())) {
            CanvasLayers.under(under.getGraphicsContext2D(), model, view, BACKGROUND);
        }
    }

    private void drawMarks() {
        if (fresh(1, model.plan() == null, model.currentFloorId(), model.units(), List.copyOf(model.problems()),
                model.shownProblemProperty().get(), model.showReactionsProperty().get(), model.showVibrationProperty().get(),
                model.showVibrationProperty().get() ? id(model.run()) : null, model.levelProperty().get(),
                model.selectedBayProperty().get())) {
            CanvasLayers.over(marks.getGraphicsContext2D(), model, view, LEGEND_H);
        }
    }

    /** Draws the plan picture, building it first when what it shows has changed (not while an edit's run is awaited). */
    private void drawPlan() {
        List<Primitive> prims = awaitingRun && laidOut != null ? laidOut : content();
        double pxPerMm = PX_PER_MM * view.scale() / laidOutScale;
        if (fresh(2, id(prims), pxPerMm)) {
            var g = canvas.getGraphicsContext2D();
            g.clearRect(0, 0, canvas.getWidth(), canvas.getHeight());
            FxRenderer.draw(g, prims, view, pxPerMm);
        }
    }

    /** True when a layer's inputs, the view or the size changed since it was last drawn (then remembered). */
    private boolean fresh(int layer, Object... inputs) {
        Object[] all = java.util.Arrays.copyOf(inputs, inputs.length + 3);
        all[inputs.length] = view;
        all[inputs.length + 1] = getWidth();
        all[inputs.length + 2] = getHeight();
        return drawn.fresh(layer, all);
    }

    private static Object id(Object o) {
        return LayerMemo.id(o);
    }

    /** The laid-out primitives of the current plan, level and run (empty with no plan). */
    List<Primitive> content() {
        Object[] of = {model.plan(), model.run(), model.levelProperty().get(), model.showReactionsProperty().get()};
        if (of[0] == null) {
            picture = null;
            laidOut = null;
            return List.of();
        }
        boolean same = picture != null && of[0] == pictureOf[0] && of[1] == pictureOf[1]
                && java.util.Objects.equals(of[2], pictureOf[2]) && of[3].equals(pictureOf[3]);
        if (!same) {
            picture = picture(model);
            pictureOf = of;
            laidOut = null;
        }
        if (laidOut == null) {
            laidOutScale = view.scale();
            laidOut = picture.build(PX_PER_MM / laidOutScale);
        }
        return laidOut;
    }

    /** The picture of the editor's current plan, level and run, in the screen's style. */
    static PlanPicture picture(EditorModel model) {
        return PlanPicture.forPlan(model.plan(), model.levelProperty().get(), model.run(),
                PlanPicture.Style.screen(model.units(), TEXT_MM, model.showReactionsProperty().get(), GROUND));
    }

    /** Draws the gesture in progress and the snap marker. */
    void drawOverlay() {
        CanvasOverlay.draw(overlay, model, tools, view);
        if (bayHover != null && tools.mode() == CanvasTools.Mode.IDLE) {
            CanvasLayers.hoverBox(overlay.getGraphicsContext2D(), bayHover, hoverX, hoverY, getWidth(), getHeight() - LEGEND_H);
        }
    }

    /** The canvas of the plan picture (for snapshots of the plan alone). */
    Canvas canvas() {
        return canvas;
    }
}
