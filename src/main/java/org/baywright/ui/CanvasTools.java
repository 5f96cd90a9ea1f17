package org.baywright.ui;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Supplier;
import javafx.geometry.Point2D;
import javafx.scene.input.KeyCode;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.units.UnitSystem;

/**
 * What the canvas tools do with the mouse and keyboard: a small state machine per gesture that turns
 * pointer positions (canvas pixels) into plan edits through {@link EditorModel#edit}. It holds the
 * preview of a gesture in progress (rubber band, outline, snap marker) for the canvas to draw, and
 * knows nothing of drawing itself.
 */
public final class CanvasTools {
    /** Pixels a press must travel to count as a drag rather than a click. */
    static final double DRAG_PX = 4;
    /** Pixels within which a click closes an outline on its first point. */
    static final double CLOSE_PX = 9;
    /** Pixels within which the snap looks for a target. */
    static final double SNAP_PX = 10;

    /** What a gesture in progress is doing. */
    enum Mode {
        IDLE, LINE, BOX, MOVE, GRID_LINE, OUTLINE, PATH, DECK_SPAN, MEASURE, NEW_GRID_LINE
    }

    private final EditorModel model;
    private final Supplier<ViewTransform> view;
    private Mode mode = Mode.IDLE;
    private Snapper.Snap hover;
    private Point2D pressPx;
    private Point anchor;
    private Point current;
    private boolean dragged;
    private final List<Point> outline = new ArrayList<>();
    private String grabbedGrid;
    private String measured = "";

    public CanvasTools(EditorModel model, Supplier<ViewTransform> view) {
        this.model = model;
        this.view = view;
        model.toolProperty().addListener((o, a, b) -> cancel());
        model.planProperty().addListener((o, a, b) -> {
            if (mode != Mode.OUTLINE && mode != Mode.PATH) {
                mode = Mode.IDLE;
            }
        });
        model.levelProperty().addListener((o, a, b) -> cancel());
    }

    // ------------------------------------------------------------------ state for drawing

    public Mode mode() {
        return mode;
    }

    /** The snap under the cursor, when the tool places points. */
    public Optional<Snapper.Snap> hover() {
        return Optional.ofNullable(hover);
    }

    /** The start of a line, box, move or measurement in progress. */
    public Optional<Point> anchor() {
        return Optional.ofNullable(anchor);
    }

    /** Where the gesture in progress is now. */
    public Optional<Point> current() {
        return Optional.ofNullable(current);
    }

    /** The points of an outline or path being clicked. */
    public List<Point> outline() {
        return List.copyOf(outline);
    }

    /** The grid line being dragged, if any. */
    public Optional<String> grabbedGrid() {
        return Optional.ofNullable(grabbedGrid);
    }

    /** The last measurement, as text ("" before any). */
    public String measured() {
        return measured;
    }

    /** Abandons the gesture in progress. */
    public void cancel() {
        mode = Mode.IDLE;
        outline.clear();
        anchor = null;
        current = null;
        grabbedGrid = null;
        dragged = false;
    }

    // ------------------------------------------------------------------ pointer

    private Point world(double x, double y) {
        Point2D w = view.get().toWorld(x, y);
        return new Point(w.getX(), w.getY());
    }

    private Snapper snapper() {
        List<Snapper.Segment> segs = new ArrayList<>();
        model.currentFloor().ifPresent(f -> {
            for (Member m : members(f)) {
                segs.add(new Snapper.Segment(m.start(), m.end()));
            }
        });
        return new Snapper(model.plan(), segs, model.units() == UnitSystem.SI ? Snapper.SI_PRECISION : Snapper.US_PRECISION);
    }

    private Snapper.Snap snap(double x, double y, Point from) {
        return snapper().snap(world(x, y), view.get().toWorldLength(SNAP_PX), from);
    }

    /** The floor's members, infill beams included. */
    private List<Member> members(Floor f) {
        Plan p = model.plan();
        return p == null ? new ArrayList<>(f.members()) : new ArrayList<>(Framing.members(p, f));
    }

    /** The pointer moved with no button down. */
    public void moved(double x, double y) {
        Tool t = model.toolProperty().get();
        hover = t.snaps() ? snap(x, y, mode == Mode.LINE || mode == Mode.OUTLINE || mode == Mode.PATH ? lastPoint() : null) : null;
        if (mode == Mode.LINE || mode == Mode.OUTLINE || mode == Mode.PATH) {
            current = hover == null ? world(x, y) : hover.point();
        }
    }

    private Point lastPoint() {
        if (!outline.isEmpty()) {
            return outline.get(outline.size() - 1);
        }
        return anchor;
    }

    /** A primary-button press. */
    public void pressed(double x, double y, boolean shift, int clicks) {
        pressPx = new Point2D(x, y);
        dragged = false;
        Tool t = model.toolProperty().get();
        Point w = world(x, y);
        switch (t) {
            case SELECT -> pressSelect(x, y, w, shift);
            case GIRDER, BEAM -> {
                Snapper.Snap s = snap(x, y, anchor);
                if (mode == Mode.LINE && anchor != null) {
                    // second click of click–click drawing
                    finishLine(s.point());
                } else {
                    mode = Mode.LINE;
                    anchor = s.point();
                    current = anchor;
                }
            }
            case LOAD_AREA, OPENING -> {
                Snapper.Snap s = snap(x, y, lastPoint());
                if (mode != Mode.OUTLINE) {
                    mode = Mode.OUTLINE;
                    outline.clear();
                    anchor = s.point();
                }
                current = s.point();
            }
            case LINE_LOAD -> {
                Snapper.Snap s = snap(x, y, lastPoint());
                if (mode != Mode.PATH) {
                    mode = Mode.PATH;
                    outline.clear();
                }
                if (clicks >= 2) {
                    finishPath();
                    return;
                }
                if (outline.isEmpty() || outline.get(outline.size() - 1).distance(s.point()) > 1e-9) {
                    outline.add(s.point());
                }
                current = s.point();
            }
            case MEASURE, GRID -> {
                mode = t == Tool.MEASURE ? Mode.MEASURE : Mode.NEW_GRID_LINE;
                anchor = snap(x, y, null).point();
                current = anchor;
            }
            case DECK -> {
                mode = Mode.DECK_SPAN;
                anchor = w;
                current = w;
            }
            default -> {
                // column, infill and point load act on release
            }
        }
    }

    private void pressSelect(double x, double y, Point w, boolean shift) {
        Optional<String> hit = objectAt(x, y);
        if (hit.isPresent()) {
            String id = hit.get();
            if (shift) {
                model.toggleSelected(id);
            } else if (!model.selection().contains(id)) {
                model.select(id);
            } else {
                model.selectedProperty().set(id);
            }
            mode = model.selection().isEmpty() ? Mode.IDLE : Mode.MOVE;
            anchor = snap(x, y, null).point();
            current = anchor;
            return;
        }
        Optional<GridLine> g = gridLineAt(x, y);
        if (g.isPresent()) {
            mode = Mode.GRID_LINE;
            grabbedGrid = g.get().label();
            anchor = w;
            current = w;
            return;
        }
        if (!shift) {
            model.select(null);
        }
        mode = Mode.BOX;
        anchor = w;
        current = w;
    }

    /** The pointer moved with the primary button down. */
    public void dragged(double x, double y) {
        if (pressPx != null && pressPx.distance(x, y) > DRAG_PX) {
            dragged = true;
        }
        Point w = world(x, y);
        Tool t = model.toolProperty().get();
        switch (mode) {
            case LINE, MEASURE, NEW_GRID_LINE -> {
                hover = snap(x, y, anchor);
                current = hover.point();
            }
            case OUTLINE -> {
                hover = snap(x, y, null);
                current = hover.point();
            }
            case MOVE -> {
                hover = snap(x, y, null);
                current = hover.point();
            }
            case BOX, DECK_SPAN -> current = w;
            case GRID_LINE -> current = snapGridDrag(w);
            default -> {
                if (t.snaps()) {
                    hover = snap(x, y, null);
                }
            }
        }
    }

    private Point snapGridDrag(Point w) {
        double precision = model.units() == UnitSystem.SI ? Snapper.SI_PRECISION * 10 : Snapper.US_PRECISION * 3;
        return new Point(Math.round(w.x() / precision) * precision, Math.round(w.y() / precision) * precision);
    }

    /** The primary button was released. */
    public void released(double x, double y) {
        Tool t = model.toolProperty().get();
        Point w = world(x, y);
        String floorId = model.currentFloorId();
        switch (t) {
            case SELECT -> releaseSelect();
            case GIRDER, BEAM -> {
                if (mode == Mode.LINE && dragged) {
                    finishLine(snap(x, y, anchor).point());
                }
                // a click without a drag leaves the line open for a second click
            }
            case LOAD_AREA, OPENING -> {
                if (mode != Mode.OUTLINE) {
                    return;
                }
                Point s = snap(x, y, null).point();
                if (dragged && outline.isEmpty()) {
                    // a dragged rectangle
                    Polygon r = rectangle(anchor, s);
                    outline.clear();
                    mode = Mode.IDLE;
                    addOutline(t, r);
                    return;
                }
                if (outline.size() >= 3 && view.get().toScreen(outline.get(0).x(), outline.get(0).y()).distance(x, y) <= CLOSE_PX) {
                    closeOutline();
                    return;
                }
                if (outline.isEmpty() || outline.get(outline.size() - 1).distance(s) > 1e-9) {
                    outline.add(s);
                }
                current = s;
            }
            case INFILL -> {
                Optional<PlanEdits.Bay> bay = PlanEdits.bayAt(model.plan(), w);
                if (bay.isEmpty()) {
                    model.messageProperty().set("Infill: click inside a bay (between four grid lines).");
                    return;
                }
                PlanEdits.Bay b = bay.get();
                GridLine.Axis dir = model.toolSettings().infillDirection.get();
                model.edit(p -> {
                    ToolValues.InfillSetting s = ToolValues.infill(model.toolSettings().infill.get(), model.units());
                    return PlanEdits.fillBay(p, floorId, b, dir, s.count(), s.spacing());
                }, "Filled bay " + b.x0() + b.x1() + "-" + b.y0() + b.y1());
            }
            case COLUMN -> {
                Point at = snap(x, y, null).point();
                model.edit(p -> PlanEdits.addColumn(p, at), "Added a column");
            }
            case POINT_LOAD -> {
                Point at = snap(x, y, null).point();
                boolean roof = model.currentFloor().map(Floor::roof).orElse(false);
                model.edit(p -> PlanEdits.addPointLoad(p, floorId, at, ToolValues.pointLoad(model.toolSettings(), model.units())),
                        "Added a point load" + (roof ? " on the roof" : ""));
            }
            case DECK -> releaseDeck(w, floorId);
            case MEASURE -> {
                if (anchor != null) {
                    Point b = snap(x, y, anchor).point();
                    measured = measure(anchor, b, model.units());
                    model.messageProperty().set(measured);
                    current = b;
                }
                mode = Mode.IDLE;
            }
            case GRID -> {
                if (mode == Mode.NEW_GRID_LINE && dragged && anchor != null) {
                    Point b = snap(x, y, anchor).point();
                    addGridLine(anchor, b);
                }
                cancel();
            }
            default -> {
            }
        }
        pressPx = null;
    }

    private void releaseSelect() {
        String floorId = model.currentFloorId();
        if (mode == Mode.MOVE && dragged && anchor != null && current != null) {
            double dx = current.x() - anchor.x();
            double dy = current.y() - anchor.y();
            List<String> ids = List.copyOf(model.selection());
            if (Math.hypot(dx, dy) > 1e-9) {
                model.edit(p -> PlanEdits.move(p, floorId, ids, dx, dy),
                        "Moved " + (ids.size() == 1 ? ids.get(0) : ids.size() + " objects"));
            }
        } else if (mode == Mode.GRID_LINE && dragged && grabbedGrid != null && current != null) {
            String label = grabbedGrid;
            GridLine g = model.plan().gridLine(label).orElseThrow();
            double to = g.axis() == GridLine.Axis.X ? current.x() : current.y();
            model.edit(p -> PlanEdits.moveGridLine(p, label, to), "Moved grid line " + label);
        } else if (mode == Mode.BOX && dragged && anchor != null && current != null) {
            model.selectAll(objectsIn(anchor, current), true);
        }
        cancel();
    }

    private void releaseDeck(Point w, String floorId) {
        Optional<Floor> f = model.currentFloor();
        if (f.isEmpty() || anchor == null) {
            cancel();
            return;
        }
        Optional<String> deck = PlanEdits.deckAt(f.get(), anchor);
        if (deck.isEmpty()) {
            model.messageProperty().set("Deck: click inside a deck area.");
            cancel();
            return;
        }
        double angle;
        if (dragged) {
            angle = Math.toDegrees(Math.atan2(w.y() - anchor.y(), w.x() - anchor.x()));
            angle = Math.round(angle / 5) * 5.0;
        } else if (!deck.get().equals(model.selectedProperty().get())) {
            // the first click picks the deck: Properties shows its slab; a second click turns it
            model.select(deck.get());
            model.messageProperty().set("Deck " + deck.get() + ": its slab is in Properties; click it again to turn its span by 90°.");
            cancel();
            return;
        } else {
            double was = f.get().decks().stream().filter(d -> d.id().equals(deck.get())).findFirst().orElseThrow().spanAngle();
            angle = was + 90;
        }
        double a = angle;
        model.edit(p -> PlanEdits.setDeckSpan(p, floorId, deck.get(), a),
                String.format(Locale.ROOT, "Deck %s spans at %.0f°", deck.get(), ((a % 180) + 180) % 180));
        model.select(deck.get());
        cancel();
    }

    private void finishLine(Point end) {
        Point start = anchor;
        MemberKind kind = model.toolProperty().get() == Tool.GIRDER ? MemberKind.GIRDER : MemberKind.BEAM;
        String floorId = model.currentFloorId();
        cancel();
        if (start == null || start.distance(end) < 1e-6) {
            return;
        }
        model.edit(p -> PlanEdits.addMember(p, floorId, kind, start, end),
                "Added " + (kind == MemberKind.GIRDER ? "girder " : "beam ")
                        + PlanEdits.memberIdFor(model.plan(), floorId, kind, start, end));
    }

    private void closeOutline() {
        Tool t = model.toolProperty().get();
        List<Point> pts = List.copyOf(outline);
        cancel();
        addOutline(t, new Polygon(pts));
    }

    private void addOutline(Tool t, Polygon poly) {
        String floorId = model.currentFloorId();
        if (t == Tool.OPENING) {
            model.edit(p -> PlanEdits.addOpening(p, floorId, poly), "Added an opening");
        } else {
            boolean roof = model.currentFloor().map(Floor::roof).orElse(false);
            model.edit(p -> PlanEdits.addAreaLoad(p, floorId, poly, ToolValues.areaLoad(model.toolSettings(), model.units(), roof),
                    model.toolSettings().areaUse.get()), "Added a load area");
        }
    }

    private void finishPath() {
        List<Point> pts = List.copyOf(outline);
        String floorId = model.currentFloorId();
        cancel();
        if (pts.size() < 2) {
            model.messageProperty().set("Line load: click two or more points, then double-click or press Enter.");
            return;
        }
        model.edit(p -> PlanEdits.addLineLoad(p, floorId, pts, ToolValues.lineLoad(model.toolSettings(), model.units())),
                "Added a line load");
    }

    private void addGridLine(Point a, Point b) {
        boolean vertical = Math.abs(b.y() - a.y()) >= Math.abs(b.x() - a.x());
        GridLine.Axis axis = vertical ? GridLine.Axis.X : GridLine.Axis.Y;
        double at = vertical ? a.x() : a.y();
        boolean cols = model.toolSettings().gridColumns.get();
        model.edit(q -> PlanEdits.addGridLine(q, axis, at, cols), "Added a grid line");
    }

    /** A double click (the second press arrives first through {@link #pressed}). */
    public void doubleClicked() {
        if (mode == Mode.PATH) {
            finishPath();
        } else if (mode == Mode.OUTLINE && outline.size() >= 3) {
            closeOutline();
        }
    }

    /** A key with no modifier; true when the tools used it. */
    public boolean key(KeyCode code) {
        switch (code) {
            case ESCAPE -> {
                if (mode != Mode.IDLE) {
                    cancel();
                } else {
                    model.select(null);
                }
                return true;
            }
            case ENTER -> {
                if (mode == Mode.PATH) {
                    finishPath();
                    return true;
                }
                if (mode == Mode.OUTLINE && outline.size() >= 3) {
                    closeOutline();
                    return true;
                }
                return false;
            }
            case BACK_SPACE -> {
                if ((mode == Mode.PATH || mode == Mode.OUTLINE) && !outline.isEmpty()) {
                    outline.remove(outline.size() - 1);
                    return true;
                }
                return false;
            }
            case DELETE -> {
                return model.deleteSelection();
            }
            default -> {
                for (Tool t : Tool.values()) {
                    if (t.key() == code) {
                        model.toolProperty().set(t);
                        return true;
                    }
                }
                return false;
            }
        }
    }

    // ------------------------------------------------------------------ hits

    /**
     * The object under a canvas point: a column, a member (infill beams included), a point load, a
     * line load, then the smallest opening or load area containing it.
     */
    public Optional<String> objectAt(double x, double y) {
        Plan p = model.plan();
        Optional<Floor> f = model.currentFloor();
        if (p == null || f.isEmpty()) {
            return Optional.empty();
        }
        Point w = world(x, y);
        double tol = view.get().toWorldLength(PlanHits.TOLERANCE_PX);
        for (Column c : model.currentColumns()) {
            if (c.at().distance(w) <= tol * 1.5) {
                return Optional.of(c.id());
            }
        }
        List<PlanHits.Segment> segs = new ArrayList<>();
        for (Member m : members(f.get())) {
            segs.add(new PlanHits.Segment(m.id(), m.start(), m.end()));
        }
        Optional<PlanHits.Segment> m = PlanHits.nearest(segs, w.x(), w.y(), tol);
        if (m.isPresent()) {
            return Optional.of(m.get().id());
        }
        for (PointLoadItem q : f.get().pointLoads()) {
            if (q.at().distance(w) <= tol * 1.5) {
                return Optional.of(q.id());
            }
        }
        for (LineLoad l : f.get().lineLoads()) {
            for (int i = 0; i + 1 < l.path().size(); i++) {
                if (PlanHits.distance(w.x(), w.y(), l.path().get(i), l.path().get(i + 1)) <= tol) {
                    return Optional.of(l.id());
                }
            }
        }
        String best = null;
        double bestArea = Double.POSITIVE_INFINITY;
        for (Opening o : f.get().openings()) {
            double a = Math.abs(o.outline().signedArea());
            if (PlanEdits.contains(o.outline(), w) && a < bestArea) {
                best = o.id();
                bestArea = a;
            }
        }
        for (AreaLoad al : f.get().areaLoads()) {
            double a = Math.abs(al.outline().signedArea());
            if (PlanEdits.contains(al.outline(), w) && a < bestArea && !isWholeSlab(f.get(), al)) {
                best = al.id();
                bestArea = a;
            }
        }
        return Optional.ofNullable(best);
    }

    /** The floor-wide load covers everything; it is picked from the Members of nothing, not by clicking. */
    private static boolean isWholeSlab(Floor f, AreaLoad al) {
        return al.outline().equals(f.slabEdge());
    }

    /** The grid line within a few pixels of a canvas point. */
    public Optional<GridLine> gridLineAt(double x, double y) {
        Plan p = model.plan();
        if (p == null) {
            return Optional.empty();
        }
        ViewTransform v = view.get();
        GridLine best = null;
        double bestD = PlanHits.TOLERANCE_PX;
        for (GridLine g : p.grid()) {
            double d = g.axis() == GridLine.Axis.X ? Math.abs(v.screenX(g.offset()) - x) : Math.abs(v.screenY(g.offset()) - y);
            if (d <= bestD) {
                bestD = d;
                best = g;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Every object lying wholly inside the box with corners a and b. */
    List<String> objectsIn(Point a, Point b) {
        double x0 = Math.min(a.x(), b.x());
        double x1 = Math.max(a.x(), b.x());
        double y0 = Math.min(a.y(), b.y());
        double y1 = Math.max(a.y(), b.y());
        java.util.function.Predicate<Point> in = q -> q.x() >= x0 && q.x() <= x1 && q.y() >= y0 && q.y() <= y1;
        List<String> ids = new ArrayList<>();
        Optional<Floor> f = model.currentFloor();
        if (f.isEmpty()) {
            return ids;
        }
        for (Member m : members(f.get())) {
            if (in.test(m.start()) && in.test(m.end())) {
                ids.add(m.id());
            }
        }
        for (Column c : model.currentColumns()) {
            if (in.test(c.at())) {
                ids.add(c.id());
            }
        }
        f.get().openings().stream().filter(o -> o.outline().vertices().stream().allMatch(in)).forEach(o -> ids.add(o.id()));
        f.get().areaLoads().stream().filter(o -> o.outline().vertices().stream().allMatch(in)).forEach(o -> ids.add(o.id()));
        f.get().lineLoads().stream().filter(o -> o.path().stream().allMatch(in)).forEach(o -> ids.add(o.id()));
        f.get().pointLoads().stream().filter(o -> in.test(o.at())).forEach(o -> ids.add(o.id()));
        return ids;
    }

    static Polygon rectangle(Point a, Point b) {
        return Polygon.rectangle(Math.min(a.x(), b.x()), Math.min(a.y(), b.y()), Math.max(a.x(), b.x()), Math.max(a.y(), b.y()));
    }

    /** "Distance 30'-0" (Δx 30'-0", Δy 0")" in the plan's units. */
    static String measure(Point a, Point b, UnitSystem us) {
        double d = a.distance(b);
        return "Distance " + len(d, us) + "  (Δx " + len(Math.abs(b.x() - a.x()), us) + ", Δy " + len(Math.abs(b.y() - a.y()), us) + ")";
    }

    static String len(double m, UnitSystem us) {
        return us == UnitSystem.SI ? String.format(Locale.ROOT, "%.3f m", m) : UnitSystem.feetInches(m, 8);
    }
}
