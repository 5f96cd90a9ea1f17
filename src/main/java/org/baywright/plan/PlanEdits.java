package org.baywright.plan;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.UnaryOperator;

/**
 * The edits a user makes to a plan, each a function from a plan to the next plan. The editor's tools
 * call these and push the result on its undo history; nothing here knows of the screen, so every edit
 * is tested without a display.
 *
 * <p>Ids of new objects follow the plan's own scheme: members between two grid intersections are
 * named after the grid ({@code G-1-AB}, {@code B-A-12}), other objects get the next free number of
 * their prefix ({@code AL-3}, {@code OP-1}).
 *
 * <p>Known limitations: grid edits work on orthogonal grids (the only kind a plan has); polygons that
 * are exactly the old grid's rectangle are taken to "follow the grid" and become the new grid's
 * rectangle, every other point is stretched with the grid lines on either side of it.
 */
public final class PlanEdits {
    /**
     * Two grid lines, or a member's two ends, closer than this (m) are in the same place: 10 mm, below
     * any spacing the trade draws and above the pointer's snapping rounding (1 in or 10 mm steps).
     */
    static final double SAME_PLACE = 0.01;
    /** An outline enclosing less than this (m², 10 × 10 mm) encloses nothing: a slip of the pointer. */
    static final double MIN_OUTLINE_AREA = 1e-4;

    /** Two coordinates closer than this are the same position, m (a micrometre). */
    public static final double SAME = 1e-6;
    /**
     * Floor loads a new plan starts with, an office floor: slab on metal deck 50 psf and ceiling and
     * services 15 psf (common practice), office live load 50 psf (ASCE 7-16 Table 4.3-1) and the
     * partition allowance 15 psf (ASCE 7-16 §4.3.2). The user changes them in the plan. The same
     * values as the {@code new} command's defaults: both are {@link RegularPlan#OFFICE_FLOOR}.
     */
    public static final LoadValues OFFICE_FLOOR = RegularPlan.OFFICE_FLOOR;
    /** The floor layout of a new plan. */
    public static final String NEW_FLOOR = "typical";

    private PlanEdits() {
    }

    // ------------------------------------------------------------------ a new plan

    /**
     * An empty plan: one floor layout used by {@code levels} levels of the given storey height, the
     * default design basis, no grid yet. Typing a grid gives it a slab, a deck, the floor loads and
     * columns.
     */
    public static Plan blank(String name, String units, int levels, double storeyHeight) {
        if (levels < 1) {
            throw new IllegalArgumentException("a plan needs at least one level, got " + levels);
        }
        if (!(storeyHeight > 0)) {
            throw new IllegalArgumentException("the storey height must be positive, got " + storeyHeight);
        }
        List<Level> ls = new ArrayList<>();
        for (int k = 0; k < levels; k++) {
            ls.add(new Level("Level " + (k + 2), storeyHeight * (k + 1), storeyHeight, NEW_FLOOR));
        }
        Floor f = new Floor(NEW_FLOOR, "Typical floor", false, new Polygon(List.of()), List.of(), List.of(), List.of(),
                List.of(), List.of(), List.of(), List.of());
        return new Plan(name, units, DesignSettings.defaults(), List.of(), ls, List.of(f), List.of());
    }

    // ------------------------------------------------------------------ the grid

    /**
     * The grid set from bay spacings, west to east ({@code x}) and south to north ({@code y}); a null
     * list keeps that direction as it is. Existing lines keep their labels and move to their new
     * offsets, and everything on the plan moves with them (see the class note); lines beyond the new
     * count are removed with what lies beyond the last line kept; new lines get the next labels, and
     * a column at each new intersection when {@code columnsAtNewIntersections}. A floor with no slab
     * yet gets the grid's rectangle as its slab, a deck spanning east–west and the floor loads given.
     */
    public static Plan withGrid(Plan p, List<Double> spacingsX, List<Double> spacingsY,
            boolean columnsAtNewIntersections, LoadValues newFloorLoads) {
        for (List<Double> s : java.util.Arrays.asList(spacingsX, spacingsY)) {
            if (s != null) {
                for (double d : s) {
                    if (!(d > SAME)) {
                        throw new IllegalArgumentException("every bay spacing must be positive, got " + d + " m");
                    }
                }
            }
        }
        List<GridLine> oldX = lines(p, GridLine.Axis.X);
        List<GridLine> oldY = lines(p, GridLine.Axis.Y);
        List<GridLine> newX = spacingsX == null ? oldX : relabel(oldX, spacingsX, GridLine.Axis.X);
        List<GridLine> newY = spacingsY == null ? oldY : relabel(oldY, spacingsY, GridLine.Axis.Y);
        return regrid(p, oldX, oldY, newX, newY, columnsAtNewIntersections, newFloorLoads);
    }

    /** The plan on a new grid; lines are matched by position in their axis (see {@link #withGrid}). */
    private static Plan regrid(Plan p, List<GridLine> oldX, List<GridLine> oldY, List<GridLine> newX,
            List<GridLine> newY, boolean columnsAtNewIntersections, LoadValues newFloorLoads) {
        double[] oldRect = rect(oldX, oldY);
        double[] newRect = rect(newX, newY);
        Stretch sx = Stretch.of(oldX, newX);
        Stretch sy = Stretch.of(oldY, newY);
        Set<String> removed = new HashSet<>();
        oldX.stream().skip(newX.size()).forEach(g -> removed.add(g.label()));
        oldY.stream().skip(newY.size()).forEach(g -> removed.add(g.label()));
        // what lies beyond the last line kept goes when lines are removed
        double keepX = newX.size() >= oldX.size() ? Double.POSITIVE_INFINITY
                : newX.isEmpty() ? Double.NEGATIVE_INFINITY : oldX.get(newX.size() - 1).offset();
        double keepY = newY.size() >= oldY.size() ? Double.POSITIVE_INFINITY
                : newY.isEmpty() ? Double.NEGATIVE_INFINITY : oldY.get(newY.size() - 1).offset();
        final double limX = keepX + SAME;
        final double limY = keepY + SAME;
        java.util.function.Predicate<Point> kept = q -> q.x() <= limX && q.y() <= limY;
        UnaryOperator<Point> move = q -> new Point(sx.apply(q.x()), sy.apply(q.y()));
        UnaryOperator<Polygon> movePoly = poly -> {
            if (oldRect != null && newRect != null && isRect(poly, oldRect)) {
                return Polygon.rectangle(newRect[0], newRect[1], newRect[2], newRect[3]);
            }
            List<Point> vs = new ArrayList<>();
            for (Point q : poly.vertices()) {
                vs.add(move.apply(new Point(Math.min(q.x(), limX), Math.min(q.y(), limY))));
            }
            return new Polygon(vs);
        };

        List<GridLine> grid = new ArrayList<>(newX);
        grid.addAll(newY);
        List<Floor> floors = new ArrayList<>();
        for (Floor f : p.floors()) {
            List<Member> members = f.members().stream().filter(m -> kept.test(m.start()) && kept.test(m.end()))
                    .map(m -> new Member(m.id(), m.kind(), move.apply(m.start()), move.apply(m.end()), m.fixedSection(), m.composite(), m.fixedStuds()))
                    .toList();
            List<Infill> infills = f.infills().stream().filter(i -> !removed.contains(i.x0()) && !removed.contains(i.x1())
                    && !removed.contains(i.y0()) && !removed.contains(i.y1())).toList();
            List<Deck> decks = f.decks().stream().map(d -> new Deck(d.id(), movePoly.apply(d.outline()), d.spanAngle(), d.maxSpan(), d.maxOverhang(), d.slab()))
                    .filter(d -> area(d.outline()) > SAME).toList();
            List<Opening> openings = f.openings().stream().filter(o -> o.outline().vertices().stream().allMatch(kept))
                    .map(o -> new Opening(o.id(), movePoly.apply(o.outline()))).toList();
            List<AreaLoad> areaLoads = f.areaLoads().stream()
                    .map(a -> new AreaLoad(a.id(), movePoly.apply(a.outline()), a.values(), a.use()))
                    .filter(a -> area(a.outline()) > SAME).toList();
            List<LineLoad> lineLoads = f.lineLoads().stream().filter(l -> l.path().stream().allMatch(kept))
                    .map(l -> new LineLoad(l.id(), l.path().stream().map(move).toList(), l.values())).toList();
            List<PointLoadItem> pointLoads = f.pointLoads().stream().filter(q -> kept.test(q.at()))
                    .map(q -> new PointLoadItem(q.id(), move.apply(q.at()), q.values())).toList();
            Polygon slab = f.slabEdge();
            if (slab.vertices().isEmpty() && newRect != null) {
                slab = Polygon.rectangle(newRect[0], newRect[1], newRect[2], newRect[3]);
                if (decks.isEmpty()) {
                    decks = List.of(new Deck("DK-1", slab, 0));
                }
                if (areaLoads.isEmpty() && newFloorLoads != null && !newFloorLoads.isZero()) {
                    areaLoads = List.of(new AreaLoad("AL-floor", slab, newFloorLoads, LiveLoadUse.ORDINARY));
                }
            } else if (!slab.vertices().isEmpty()) {
                slab = movePoly.apply(slab);
            }
            floors.add(new Floor(f.id(), f.name(), f.roof(), slab, decks, members, infills, openings, areaLoads, lineLoads,
                    pointLoads, f.composite()));
        }
        List<Column> columns = new ArrayList<>();
        for (Column c : p.columns()) {
            if (kept.test(c.at())) {
                columns.add(new Column(c.id(), move.apply(c.at()), c.grid(), c.topLevel(), c.fixedSection()));
            }
        }
        if (columnsAtNewIntersections) {
            Set<String> oldLabels = new HashSet<>();
            p.grid().forEach(g -> oldLabels.add(g.label()));
            Set<String> ids = new HashSet<>();
            columns.forEach(c -> ids.add(c.id()));
            for (GridLine gy : newY) {
                for (GridLine gx : newX) {
                    if (oldLabels.contains(gx.label()) && oldLabels.contains(gy.label())) {
                        continue;
                    }
                    Point at = new Point(gx.offset(), gy.offset());
                    if (columns.stream().anyMatch(c -> c.at().distance(at) < SAME)) {
                        continue;
                    }
                    String id = unique("C-" + gx.label() + gy.label(), ids);
                    ids.add(id);
                    columns.add(new Column(id, at, gx.label() + "-" + gy.label(), "", Optional.empty()));
                }
            }
        }
        return new Plan(p.name(), p.units(), p.settings(), grid, p.levels(), floors, columns, p.notes());
    }

    /** Moves one grid line to a new offset; everything on the plan stretches with it (see the class note). */
    public static Plan moveGridLine(Plan p, String label, double offset) {
        GridLine g = p.gridLine(label).orElseThrow(() -> new IllegalArgumentException("there is no grid line " + label));
        List<GridLine> same = lines(p, g.axis());
        int k = same.indexOf(g);
        double lo = k > 0 ? same.get(k - 1).offset() : Double.NEGATIVE_INFINITY;
        double hi = k + 1 < same.size() ? same.get(k + 1).offset() : Double.POSITIVE_INFINITY;
        if (!(offset > lo + SAME && offset < hi - SAME)) {
            throw new IllegalArgumentException("grid line " + label + " must stay between its neighbours");
        }
        List<GridLine> moved = same.stream().map(x -> x == g ? new GridLine(x.label(), x.axis(), offset) : x).toList();
        List<GridLine> xs = lines(p, GridLine.Axis.X);
        List<GridLine> ys = lines(p, GridLine.Axis.Y);
        return g.axis() == GridLine.Axis.X ? regrid(p, xs, ys, moved, ys, false, null)
                : regrid(p, xs, ys, xs, moved, false, null);
    }

    /**
     * Adds one grid line at an offset. After the last line it takes the next label (and, with
     * {@code columns}, a column at each new intersection, as {@link #withGrid}); before the first or
     * between two lines it takes an intermediate label as drafters write them (common practice): the
     * lower neighbour's label with ".5", or ".1", ".2"… when that is taken. Nothing else moves. A line
     * before the first is refused (it would relabel the grid): type the spacings from a new first line.
     */
    public static Plan addGridLine(Plan p, GridLine.Axis axis, double offset, boolean columns) {
        List<GridLine> same = lines(p, axis);
        if (same.stream().anyMatch(g -> Math.abs(g.offset() - offset) < SAME_PLACE)) {
            throw new IllegalArgumentException("there is a grid line there already");
        }
        if (same.isEmpty() || offset > same.get(same.size() - 1).offset()) {
            List<Double> spacings = new ArrayList<>();
            for (int i = 1; i < same.size(); i++) {
                spacings.add(same.get(i).offset() - same.get(i - 1).offset());
            }
            if (same.isEmpty()) {
                List<GridLine> grid = new ArrayList<>(p.grid());
                grid.add(new GridLine(axis == GridLine.Axis.X ? "A" : "1", axis, offset));
                return new Plan(p.name(), p.units(), p.settings(), grid, p.levels(), p.floors(), p.columns(), p.notes());
            }
            spacings.add(offset - same.get(same.size() - 1).offset());
            return axis == GridLine.Axis.X ? withGrid(p, spacings, null, columns, null) : withGrid(p, null, spacings, columns, null);
        }
        Set<String> used = new HashSet<>();
        p.grid().forEach(g -> used.add(g.label()));
        String base = same.get(0).label();
        for (GridLine g : same) {
            if (g.offset() < offset) {
                base = g.label();
            }
        }
        if (offset < same.get(0).offset()) {
            throw new IllegalArgumentException("a drawn grid line goes after grid line " + same.get(0).label()
                    + "; to start the grid further out, type its spacings");
        }
        String label = base + ".5";
        for (int k = 1; used.contains(label) && k < 10; k++) {
            label = base + "." + k;
        }
        if (used.contains(label)) {
            throw new IllegalArgumentException("no free label for a grid line there; type the spacings instead");
        }
        List<GridLine> grid = new ArrayList<>(p.grid());
        grid.add(new GridLine(label, axis, offset));
        return new Plan(p.name(), p.units(), p.settings(), grid, p.levels(), p.floors(), p.columns(), p.notes());
    }

    /** The grid lines of one axis, by offset. */
    public static List<GridLine> lines(Plan p, GridLine.Axis axis) {
        return p.grid().stream().filter(g -> g.axis() == axis)
                .sorted(java.util.Comparator.comparingDouble(GridLine::offset)).toList();
    }

    private static List<GridLine> relabel(List<GridLine> old, List<Double> spacings, GridLine.Axis axis) {
        double start = old.isEmpty() ? 0 : old.get(0).offset();
        List<GridLine> out = new ArrayList<>();
        Set<String> used = new HashSet<>();
        old.forEach(g -> used.add(g.label()));
        double at = start;
        int n = spacings.size() + 1;
        int fresh = 0;
        for (int i = 0; i < n; i++) {
            String label;
            if (i < old.size()) {
                label = old.get(i).label();
            } else {
                do {
                    label = axis == GridLine.Axis.X ? RegularPlan.letters(old.size() + fresh)
                            : Integer.toString(old.size() + fresh + 1);
                    fresh++;
                } while (used.contains(label));
                used.add(label);
            }
            out.add(new GridLine(label, axis, at));
            if (i < spacings.size()) {
                at += spacings.get(i);
            }
        }
        return out;
    }

    private static double[] rect(List<GridLine> xs, List<GridLine> ys) {
        if (xs.size() < 2 || ys.size() < 2) {
            return null;
        }
        return new double[] {xs.get(0).offset(), ys.get(0).offset(), xs.get(xs.size() - 1).offset(),
                ys.get(ys.size() - 1).offset()};
    }

    private static boolean isRect(Polygon poly, double[] r) {
        if (poly.vertices().size() != 4) {
            return false;
        }
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (Point q : poly.vertices()) {
            boolean cornerX = Math.abs(q.x() - r[0]) < SAME || Math.abs(q.x() - r[2]) < SAME;
            boolean cornerY = Math.abs(q.y() - r[1]) < SAME || Math.abs(q.y() - r[3]) < SAME;
            if (!cornerX || !cornerY) {
                return false;
            }
            minX = Math.min(minX, q.x());
            minY = Math.min(minY, q.y());
            maxX = Math.max(maxX, q.x());
            maxY = Math.max(maxY, q.y());
        }
        return maxX - minX > SAME && maxY - minY > SAME;
    }

    /** A piecewise-linear map of one coordinate through old → new grid offsets; a shift beyond the ends. */
    private record Stretch(double[] from, double[] to) {
        static Stretch of(List<GridLine> old, List<GridLine> now) {
            int n = Math.min(old.size(), now.size());
            double[] a = new double[n];
            double[] b = new double[n];
            for (int i = 0; i < n; i++) {
                a[i] = old.get(i).offset();
                b[i] = now.get(i).offset();
            }
            return new Stretch(a, b);
        }

        double apply(double v) {
            int n = from.length;
            if (n == 0) {
                return v;
            }
            if (v <= from[0]) {
                return v + to[0] - from[0];
            }
            if (v >= from[n - 1]) {
                return v + to[n - 1] - from[n - 1];
            }
            for (int i = 0; i + 1 < n; i++) {
                if (v <= from[i + 1]) {
                    double t = (v - from[i]) / (from[i + 1] - from[i]);
                    return to[i] + t * (to[i + 1] - to[i]);
                }
            }
            return v;
        }
    }

    // ------------------------------------------------------------------ bays and members

    /** A rectangular bay between two pairs of neighbouring grid lines. */
    public record Bay(String x0, String x1, String y0, String y1, double minX, double minY, double maxX, double maxY) {
        public double width(GridLine.Axis direction) {
            return direction == GridLine.Axis.X ? maxY - minY : maxX - minX;
        }
    }

    /** The bay a point lies in, if any. */
    public static Optional<Bay> bayAt(Plan p, Point q) {
        List<GridLine> xs = lines(p, GridLine.Axis.X);
        List<GridLine> ys = lines(p, GridLine.Axis.Y);
        for (int i = 0; i + 1 < xs.size(); i++) {
            if (q.x() < xs.get(i).offset() || q.x() > xs.get(i + 1).offset()) {
                continue;
            }
            for (int j = 0; j + 1 < ys.size(); j++) {
                if (q.y() >= ys.get(j).offset() && q.y() <= ys.get(j + 1).offset()) {
                    return Optional.of(new Bay(xs.get(i).label(), xs.get(i + 1).label(), ys.get(j).label(),
                            ys.get(j + 1).label(), xs.get(i).offset(), ys.get(j).offset(), xs.get(i + 1).offset(),
                            ys.get(j + 1).offset()));
                }
            }
        }
        return Optional.empty();
    }

    /**
     * Fills a bay with infill beams spanning in {@code direction}, by count (≥ 1) or, with count 0, at a
     * largest spacing; an infill already in that bay is replaced.
     */
    public static Plan fillBay(Plan p, String floorId, Bay bay, GridLine.Axis direction, int count, double maxSpacing) {
        if (count < 0 || count == 0 && !(maxSpacing > 0)) {
            throw new IllegalArgumentException("infill needs a beam count of 1 or more, or a spacing greater than zero");
        }
        return editFloor(p, floorId, f -> {
            List<Infill> infills = new ArrayList<>();
            String id = "IF-" + bay.x0() + bay.x1() + "-" + bay.y0() + bay.y1();
            for (Infill i : f.infills()) {
                if (sameBay(i, bay)) {
                    id = i.id();
                } else {
                    infills.add(i);
                }
            }
            infills.add(new Infill(id, bay.x0(), bay.x1(), bay.y0(), bay.y1(), direction, count, count > 0 ? 0 : maxSpacing));
            return withInfills(f, infills);
        });
    }

    private static boolean sameBay(Infill i, Bay b) {
        return i.x0().equals(b.x0()) && i.x1().equals(b.x1()) && i.y0().equals(b.y0()) && i.y1().equals(b.y1());
    }

    /**
     * Adds a member from {@code a} to {@code b}. Named after the grid when both ends are on one grid line
     * at intersections ({@code G-1-AB}), else the next free number ({@code G-4}).
     */
    public static Plan addMember(Plan p, String floorId, MemberKind kind, Point a, Point b) {
        if (a.distance(b) < SAME_PLACE) {
            throw new IllegalArgumentException("a member needs two different ends (at least 10 mm apart)");
        }
        return editFloor(p, floorId, f -> {
            String prefix = kind == MemberKind.GIRDER ? "G" : "B";
            Set<String> ids = floorIds(f);
            String id = gridName(p, prefix, a, b).filter(n -> !ids.contains(n)).orElseGet(() -> next(prefix, ids));
            List<Member> ms = new ArrayList<>(f.members());
            ms.add(new Member(id, kind, a, b, Optional.empty()));
            return withMembers(f, ms);
        });
    }

    /** The id a new member would get (as {@link #addMember}). */
    public static String memberIdFor(Plan p, String floorId, MemberKind kind, Point a, Point b) {
        String prefix = kind == MemberKind.GIRDER ? "G" : "B";
        Set<String> ids = floorIds(p.floor(floorId).orElseThrow());
        return gridName(p, prefix, a, b).filter(n -> !ids.contains(n)).orElseGet(() -> next(prefix, ids));
    }

    private static Optional<String> gridName(Plan p, String prefix, Point a, Point b) {
        Optional<String[]> ga = intersection(p, a);
        Optional<String[]> gb = intersection(p, b);
        if (ga.isEmpty() || gb.isEmpty()) {
            return Optional.empty();
        }
        String[] s = ga.get();
        String[] e = gb.get();
        if (s[1].equals(e[1]) && !s[0].equals(e[0])) {
            boolean forward = a.x() < b.x();
            return Optional.of(prefix + "-" + s[1] + "-" + (forward ? s[0] + e[0] : e[0] + s[0]));
        }
        if (s[0].equals(e[0]) && !s[1].equals(e[1])) {
            boolean forward = a.y() < b.y();
            return Optional.of(prefix + "-" + s[0] + "-" + (forward ? s[1] + e[1] : e[1] + s[1]));
        }
        return Optional.empty();
    }

    /** The grid labels [x, y] of the intersection at a point, if it is one. */
    public static Optional<String[]> intersection(Plan p, Point q) {
        String lx = null;
        String ly = null;
        for (GridLine g : p.grid()) {
            if (g.axis() == GridLine.Axis.X && Math.abs(g.offset() - q.x()) < SAME) {
                lx = g.label();
            } else if (g.axis() == GridLine.Axis.Y && Math.abs(g.offset() - q.y()) < SAME) {
                ly = g.label();
            }
        }
        return lx != null && ly != null ? Optional.of(new String[] {lx, ly}) : Optional.empty();
    }

    /** Adds a column at a point (named after its grid intersection when it is on one). */
    public static Plan addColumn(Plan p, Point at) {
        if (p.columns().stream().anyMatch(c -> c.at().distance(at) < SAME)) {
            throw new IllegalArgumentException("there is a column there already");
        }
        Set<String> ids = new HashSet<>();
        p.columns().forEach(c -> ids.add(c.id()));
        Optional<String[]> g = intersection(p, at);
        String id = g.map(s -> unique("C-" + s[0] + s[1], ids)).orElseGet(() -> next("C", ids));
        List<Column> cs = new ArrayList<>(p.columns());
        cs.add(new Column(id, at, g.map(s -> s[0] + "-" + s[1]).orElse(""), "", Optional.empty()));
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), p.floors(), cs, p.notes());
    }

    /** Sets the span direction of one deck area, degrees counter-clockwise from x, folded into [0, 180). */
    public static Plan setDeckSpan(Plan p, String floorId, String deckId, double angle) {
        double a = ((angle % 180) + 180) % 180;
        return editFloor(p, floorId, f -> {
            if (f.decks().stream().noneMatch(d -> d.id().equals(deckId))) {
                throw new IllegalArgumentException("floor " + floorId + " has no deck " + deckId);
            }
            List<Deck> ds = f.decks().stream().map(d -> d.id().equals(deckId) ? new Deck(d.id(), d.outline(), a, d.maxSpan(), d.maxOverhang(), d.slab()) : d).toList();
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), ds, f.members(), f.infills(), f.openings(),
                    f.areaLoads(), f.lineLoads(), f.pointLoads(), f.composite());
        });
    }

    /**
     * Gives a deck area a slab (profile, concrete, studs), or takes it away ({@code slab} null: the deck
     * carries no slab described, its weight comes from the area loads and no member acts with it).
     *
     * @throws IllegalArgumentException when the floor has no such deck
     */
    public static Plan setSlab(Plan p, String floorId, String deckId, Slab slab) {
        return editFloor(p, floorId, f -> {
            if (f.decks().stream().noneMatch(d -> d.id().equals(deckId))) {
                throw new IllegalArgumentException("floor " + floorId + " has no deck " + deckId);
            }
            return f.withDecks(f.decks().stream().map(d -> d.id().equals(deckId) ? d.withSlab(slab) : d).toList());
        });
    }

    /**
     * Sets how the members of a floor layout act with its slab: composite, non-composite or per member;
     * shored or not; the construction live load.
     */
    public static Plan setComposite(Plan p, String floorId, CompositeFloor composite) {
        if (composite == null) {
            throw new IllegalArgumentException("floor " + floorId + ": the composite setting is required");
        }
        return editFloor(p, floorId, f -> f.withComposite(composite));
    }

    /**
     * A member's own choice of composite action: true or false, or empty to follow its floor. Infill beams
     * follow their floor.
     */
    public static Plan setMemberComposite(Plan p, String floorId, String memberId, Optional<Boolean> composite) {
        return editMember(p, floorId, memberId, "its composite action", m -> m.withComposite(composite));
    }

    /** Fixes a member's stud count (empty: searched); a count below zero is refused. */
    public static Plan setFixedStuds(Plan p, String floorId, String memberId, java.util.OptionalInt studs) {
        if (studs.isPresent() && studs.getAsInt() < 0) {
            throw new IllegalArgumentException(memberId + ": a stud count is a whole number 0 or more, not " + studs.getAsInt());
        }
        return editMember(p, floorId, memberId, "its studs", m -> m.withFixedStuds(studs));
    }

    private static Plan editMember(Plan p, String floorId, String id, String what, UnaryOperator<Member> edit) {
        return editFloor(p, floorId, f -> {
            if (f.member(id).isEmpty()) {
                throw new IllegalArgumentException(id.contains("/")
                        ? id + " is an infill beam; " + what + " follow its bay. Draw it as a beam to choose them"
                        : "floor " + floorId + " has no member " + id);
            }
            return withMembers(f, f.members().stream().map(m -> m.id().equals(id) ? edit.apply(m) : m).toList());
        });
    }

    /** The id of the deck area under a point (the last one drawn wins), if any. */
    public static Optional<String> deckAt(Floor f, Point q) {
        for (int i = f.decks().size() - 1; i >= 0; i--) {
            if (contains(f.decks().get(i).outline(), q)) {
                return Optional.of(f.decks().get(i).id());
            }
        }
        return Optional.empty();
    }

    /** Point in polygon by the even–odd rule (boundary points may fall either way). */
    public static boolean contains(Polygon poly, Point q) {
        return poly.contains(q.x(), q.y());
    }

    // ------------------------------------------------------------------ openings and loads

    /** Adds an opening (a polygon of three or more points). */
    public static Plan addOpening(Plan p, String floorId, Polygon outline) {
        requireArea(outline, "an opening");
        return editFloor(p, floorId, f -> {
            List<Opening> os = new ArrayList<>(f.openings());
            os.add(new Opening(next("OP", floorIds(f)), outline));
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), os,
                    f.areaLoads(), f.lineLoads(), f.pointLoads(), f.composite());
        });
    }

    /** Adds an area load (a polygon of three or more points). */
    public static Plan addAreaLoad(Plan p, String floorId, Polygon outline, LoadValues values, LiveLoadUse use) {
        requireArea(outline, "a load area");
        if (values.isZero()) {
            throw new IllegalArgumentException("a load area needs a load: every value is zero");
        }
        return editFloor(p, floorId, f -> {
            List<AreaLoad> as = new ArrayList<>(f.areaLoads());
            as.add(new AreaLoad(next("AL", floorIds(f)), outline, values, use));
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    as, f.lineLoads(), f.pointLoads(), f.composite());
        });
    }

    /** Adds a line load along a path of two or more points (load per length). */
    public static Plan addLineLoad(Plan p, String floorId, List<Point> path, LoadValues values) {
        if (path.size() < 2) {
            throw new IllegalArgumentException("a line load needs two or more points");
        }
        if (values.isZero()) {
            throw new IllegalArgumentException("a line load needs a load: every value is zero");
        }
        return editFloor(p, floorId, f -> {
            List<LineLoad> ls = new ArrayList<>(f.lineLoads());
            ls.add(new LineLoad(next("LL", floorIds(f)), path, values));
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    f.areaLoads(), ls, f.pointLoads(), f.composite());
        });
    }

    /** Adds a point load (forces). */
    public static Plan addPointLoad(Plan p, String floorId, Point at, LoadValues values) {
        if (values.isZero()) {
            throw new IllegalArgumentException("a point load needs a load: every value is zero");
        }
        return editFloor(p, floorId, f -> {
            List<PointLoadItem> ps = new ArrayList<>(f.pointLoads());
            ps.add(new PointLoadItem(next("PL", floorIds(f)), at, values));
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    f.areaLoads(), f.lineLoads(), ps, f.composite());
        });
    }

    private static void requireArea(Polygon outline, String what) {
        if (outline.vertices().size() < 3 || area(outline) < MIN_OUTLINE_AREA) {
            throw new IllegalArgumentException(what + " needs three or more points enclosing an area");
        }
    }

    private static double area(Polygon poly) {
        return poly.vertices().size() < 3 ? 0 : Math.abs(poly.signedArea());
    }

    // ------------------------------------------------------------------ selection edits

    /**
     * Moves objects of a floor (members, openings, loads, decks) and columns by (dx, dy). Infill beams
     * belong to their bay and do not move on their own.
     */
    public static Plan move(Plan p, String floorId, Collection<String> ids, double dx, double dy) {
        UnaryOperator<Point> mv = q -> new Point(q.x() + dx, q.y() + dy);
        UnaryOperator<Polygon> mvp = poly -> new Polygon(poly.vertices().stream().map(mv).toList());
        Plan edited = editFloor(p, floorId, f -> new Floor(f.id(), f.name(), f.roof(), f.slabEdge(),
                f.decks().stream().map(d -> ids.contains(d.id()) ? new Deck(d.id(), mvp.apply(d.outline()), d.spanAngle(), d.maxSpan(), d.maxOverhang(), d.slab()) : d)
                        .toList(),
                f.members().stream().map(m -> ids.contains(m.id())
                        ? new Member(m.id(), m.kind(), mv.apply(m.start()), mv.apply(m.end()), m.fixedSection(), m.composite(), m.fixedStuds()) : m).toList(),
                f.infills(),
                f.openings().stream().map(o -> ids.contains(o.id()) ? new Opening(o.id(), mvp.apply(o.outline())) : o).toList(),
                f.areaLoads().stream().map(a -> ids.contains(a.id())
                        ? new AreaLoad(a.id(), mvp.apply(a.outline()), a.values(), a.use()) : a).toList(),
                f.lineLoads().stream().map(l -> ids.contains(l.id())
                        ? new LineLoad(l.id(), l.path().stream().map(mv).toList(), l.values()) : l).toList(),
                f.pointLoads().stream().map(q -> ids.contains(q.id())
                        ? new PointLoadItem(q.id(), mv.apply(q.at()), q.values()) : q).toList(), f.composite()));
        List<Column> cs = edited.columns().stream().map(c -> ids.contains(c.id())
                ? new Column(c.id(), mv.apply(c.at()), "", c.topLevel(), c.fixedSection()) : c).toList();
        return new Plan(edited.name(), edited.units(), edited.settings(), edited.grid(), edited.levels(), edited.floors(), cs, edited.notes());
    }

    /**
     * Deletes objects by id: members, infills (an infill beam's id, {@code IF-…/2}, deletes its whole
     * infill), decks, openings, loads on the floor, and columns.
     */
    public static Plan delete(Plan p, String floorId, Collection<String> ids) {
        Set<String> gone = new HashSet<>(ids);
        for (String id : ids) {
            int slash = id.indexOf('/');
            if (slash > 0) {
                gone.add(id.substring(0, slash));
            }
        }
        Plan edited = editFloor(p, floorId, f -> new Floor(f.id(), f.name(), f.roof(), f.slabEdge(),
                f.decks().stream().filter(d -> !gone.contains(d.id())).toList(),
                f.members().stream().filter(m -> !gone.contains(m.id())).toList(),
                f.infills().stream().filter(i -> !gone.contains(i.id())).toList(),
                f.openings().stream().filter(o -> !gone.contains(o.id())).toList(),
                f.areaLoads().stream().filter(a -> !gone.contains(a.id())).toList(),
                f.lineLoads().stream().filter(l -> !gone.contains(l.id())).toList(),
                f.pointLoads().stream().filter(q -> !gone.contains(q.id())).toList(), f.composite()));
        return new Plan(edited.name(), edited.units(), edited.settings(), edited.grid(), edited.levels(), edited.floors(),
                edited.columns().stream().filter(c -> !gone.contains(c.id())).toList(), edited.notes());
    }

    /** Sets (or, with an empty section, clears) the fixed size of a member of a floor or of a column. */
    public static Plan setFixedSection(Plan p, String floorId, String id, Optional<String> section) {
        Optional<String> s = section.map(x -> x.trim().toUpperCase(Locale.ROOT)).filter(x -> !x.isEmpty());
        if (p.columns().stream().anyMatch(c -> c.id().equals(id))) {
            return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), p.floors(), p.columns().stream()
                    .map(c -> c.id().equals(id) ? new Column(c.id(), c.at(), c.grid(), c.topLevel(), s) : c).toList(), p.notes());
        }
        return editFloor(p, floorId, f -> {
            if (f.member(id).isEmpty()) {
                throw new IllegalArgumentException(id.contains("/")
                        ? id + " is an infill beam; its size follows its bay. Draw it as a beam to fix its size"
                        : "floor " + floorId + " has no member " + id);
            }
            return withMembers(f, f.members().stream()
                    .map(m -> m.id().equals(id) ? new Member(m.id(), m.kind(), m.start(), m.end(), s, m.composite(), m.fixedStuds()) : m).toList());
        });
    }

    // ------------------------------------------------------------------ levels and load values

    /**
     * Renames a level and sets the height of the storey below it; the elevations of that level and every
     * level above move by the change of height, and a column whose top level was the old name keeps it under
     * the new one.
     *
     * @throws IllegalArgumentException for an unknown level, a blank or duplicate name, or a height that is
     *     not positive
     */
    public static Plan setLevel(Plan p, String level, String newName, double storeyHeight) {
        String name = newName == null ? "" : newName.trim();
        int at = -1;
        for (int i = 0; i < p.levels().size(); i++) {
            if (p.levels().get(i).name().equals(level)) {
                at = i;
            }
        }
        if (at < 0) {
            throw new IllegalArgumentException("the plan has no level " + level);
        }
        if (name.isEmpty()) {
            throw new IllegalArgumentException("level " + level + ": a level needs a name");
        }
        if (!name.equals(level) && p.levels().stream().anyMatch(l -> l.name().equals(name))) {
            throw new IllegalArgumentException("level " + level + ": another level is already called " + name);
        }
        if (!(storeyHeight > 0) || !Double.isFinite(storeyHeight)) {
            throw new IllegalArgumentException("level " + level + ": the storey height must be a positive length");
        }
        double delta = storeyHeight - p.levels().get(at).storeyHeight();
        List<Level> ls = new ArrayList<>();
        for (int i = 0; i < p.levels().size(); i++) {
            Level l = p.levels().get(i);
            ls.add(i < at ? l : new Level(i == at ? name : l.name(), l.elevation() + delta,
                    i == at ? storeyHeight : l.storeyHeight(), l.floor()));
        }
        List<Column> cs = p.columns().stream().map(c -> c.topLevel().equals(level)
                ? new Column(c.id(), c.at(), c.grid(), name, c.fixedSection()) : c).toList();
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), ls, p.floors(), cs, p.notes());
    }

    /**
     * Sets the values of a load area, line load or point load of a floor, and a load area's use (null keeps
     * it).
     *
     * @throws IllegalArgumentException when the floor has no load with that id
     */
    public static Plan setLoadValues(Plan p, String floorId, String id, LoadValues values, LiveLoadUse use) {
        return editFloor(p, floorId, f -> {
            boolean found = f.areaLoads().stream().anyMatch(a -> a.id().equals(id))
                    || f.lineLoads().stream().anyMatch(l -> l.id().equals(id))
                    || f.pointLoads().stream().anyMatch(q -> q.id().equals(id));
            if (!found) {
                throw new IllegalArgumentException("floor " + floorId + " has no load " + id);
            }
            return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    f.areaLoads().stream().map(a -> a.id().equals(id)
                            ? new AreaLoad(a.id(), a.outline(), values, use == null ? a.use() : use) : a).toList(),
                    f.lineLoads().stream().map(l -> l.id().equals(id) ? new LineLoad(l.id(), l.path(), values) : l).toList(),
                    f.pointLoads().stream().map(q -> q.id().equals(id) ? new PointLoadItem(q.id(), q.at(), values) : q)
                            .toList(), f.composite());
        });
    }

    /** The plan in another unit system (values are SI either way; only what the user reads changes). */
    public static Plan withUnits(Plan p, String units) {
        return new Plan(p.name(), units, p.settings(), p.grid(), p.levels(), p.floors(), p.columns(), p.notes());
    }

    /**
     * The plan with deflection checked under the live load {@code "unreduced"} (the default, common practice)
     * or as {@code "reduced"} for strength.
     */
    public static Plan withDeflectionLiveLoad(Plan p, String which) {
        boolean reduced = switch (which.toLowerCase(Locale.ROOT)) {
            case "reduced" -> true;
            case "unreduced" -> false;
            default -> throw new IllegalArgumentException("deflection live load is \"reduced\" or \"unreduced\", not " + which);
        };
        return new Plan(p.name(), p.units(), p.settings().withDeflectionLiveReduced(reduced), p.grid(), p.levels(), p.floors(),
                p.columns(), p.notes());
    }

    /** The plan with every roof floor layout's members carrying {@code ceiling} (IBC Table 1604.3 roof rows). */
    public static Plan withRoofCeiling(Plan p, RoofCeiling ceiling) {
        DesignSettings s = p.settings();
        for (Floor f : p.floors()) {
            if (f.roof()) {
                s = s.withRoofCeiling(f.id(), ceiling);
            }
        }
        return new Plan(p.name(), p.units(), s, p.grid(), p.levels(), p.floors(), p.columns(), p.notes());
    }

    /** The plan designed by another method ("lrfd" or "asd"). */
    public static Plan withMethod(Plan p, String method) {
        return new Plan(p.name(), p.units(), p.settings().withMethod(method), p.grid(), p.levels(),
                p.floors(), p.columns(), p.notes());
    }

    // ------------------------------------------------------------------ helpers

    private static Plan editFloor(Plan p, String floorId, UnaryOperator<Floor> edit) {
        boolean found = false;
        List<Floor> fs = new ArrayList<>();
        for (Floor f : p.floors()) {
            if (f.id().equals(floorId)) {
                fs.add(edit.apply(f));
                found = true;
            } else {
                fs.add(f);
            }
        }
        if (!found) {
            throw new IllegalArgumentException("the plan has no floor layout " + floorId);
        }
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), fs, p.columns(), p.notes());
    }

    private static Floor withMembers(Floor f, List<Member> ms) {
        return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), ms, f.infills(), f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads(), f.composite());
    }

    private static Floor withInfills(Floor f, List<Infill> is) {
        return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), is, f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads(), f.composite());
    }

    private static Set<String> floorIds(Floor f) {
        Set<String> ids = new HashSet<>();
        f.members().forEach(m -> ids.add(m.id()));
        f.infills().forEach(i -> ids.add(i.id()));
        f.decks().forEach(d -> ids.add(d.id()));
        f.openings().forEach(o -> ids.add(o.id()));
        f.areaLoads().forEach(a -> ids.add(a.id()));
        f.lineLoads().forEach(l -> ids.add(l.id()));
        f.pointLoads().forEach(q -> ids.add(q.id()));
        return ids;
    }

    private static String next(String prefix, Set<String> ids) {
        int n = 1;
        while (ids.contains(prefix + "-" + n)) {
            n++;
        }
        return prefix + "-" + n;
    }

    private static String unique(String wanted, Set<String> ids) {
        if (!ids.contains(wanted)) {
            return wanted;
        }
        int n = 2;
        while (ids.contains(wanted + "-" + n)) {
            n++;
        }
        return wanted + "-" + n;
    }
}
