package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.baywright.calc.Caution;
import org.baywright.design.MemberStatus;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Level;
import org.baywright.plan.LoadValues;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/** Lays out one level's framing plan sheet. All distances named {@code …Mm} are paper millimetres. */
final class SheetBuilder {
    private static final Rgb HATCH_INK = new Rgb(120, 120, 120);
    private static final Rgb CAPTION_INK = new Rgb(90, 90, 90);
    private static final Pen GRID_PEN = Pen.dashed(0.18, Rgb.GREY, 7, 1.2, 1.2, 1.2);
    private static final Pen THIN = Pen.solid(0.18, Rgb.INK);
    private static final Pen FRAME = Pen.solid(0.7, Rgb.INK);
    private static final Pen SLAB_PEN = Pen.solid(0.5, Rgb.INK);
    private static final Pen OPENING_PEN = Pen.solid(0.35, Rgb.INK);
    private static final Pen AREA_LOAD_PEN = Pen.dashed(0.3, Rgb.INK, 3, 1.5);
    private static final Hatch OPENING_HATCH = new Hatch(Hatch.Pattern.CROSS, 2.0, Pen.solid(0.13, HATCH_INK));
    private static final Hatch AREA_LOAD_HATCH = new Hatch(Hatch.Pattern.BACK_DIAGONAL, 3.5, Pen.solid(0.13, HATCH_INK));
    private static final Pen OVER_PEN = Pen.dashed(0.7, Rgb.INK, 2.4, 1.2);
    private static final double GIRDER_WEIGHT = 0.5;
    private static final double BEAM_WEIGHT = 0.3;
    private static final double GIRDER_BAND = 1.1;
    private static final double BEAM_BAND = 0.8;

    private final RunResult run;
    private final Plan plan;
    private final Level level;
    private final Floor floor;
    private final List<MemberResult> members;
    private final DrawingOptions options;
    private final UnitSystem units;
    private final Paper paper;
    private final DesignMethod method;
    private final double t;
    private final List<Primitive> out = new ArrayList<>();
    /** Boxes already taken by labels, plan metres {minX, minY, maxX, maxY}. */
    private final List<double[]> taken = new ArrayList<>();
    /** Member lines already drawn, plan metres {x0, y0, x1, y1, half band width}. */
    private final List<double[]> lines = new ArrayList<>();

    private Viewport viewport;
    private DrawingScale scale;
    /** Plan metres per paper millimetre. */
    private double k;
    private double minX;
    private double minY;
    private double maxX;
    private double maxY;

    SheetBuilder(RunResult run, String levelName, DrawingOptions options) {
        this.run = run;
        this.plan = run.plan();
        Optional<Level> lv = plan.levels().stream().filter(l -> l.name().equals(levelName)).findFirst();
        if (lv.isEmpty()) {
            throw new IllegalArgumentException("no level \"" + levelName + "\" in plan \"" + plan.name() + "\"; its levels are: "
                    + String.join(", ", plan.levels().stream().map(Level::name).toList()));
        }
        if (run.takedown() == null) {
            throw new IllegalArgumentException("plan \"" + plan.name() + "\" has problems that prevent a run, so there is no"
                    + " framing to draw; fix them first (baywright check)");
        }
        this.level = lv.get();
        String floorId = run.takedown().levelFloors().getOrDefault(levelName, level.floor());
        this.floor = plan.floor(floorId).orElseThrow(
                () -> new IllegalArgumentException("level \"" + levelName + "\" refers to a floor layout \"" + floorId
                        + "\" that the plan does not have"));
        this.members = run.takedown().members().getOrDefault(floorId, List.of());
        this.options = options;
        UnitSystem u = options.units() != null ? options.units() : UnitSystem.parse(plan.units());
        this.units = u == null ? UnitSystem.US : u;
        this.paper = options.paper() != null ? options.paper() : this.units == UnitSystem.SI ? Paper.ISO_A1 : Paper.ARCH_D;
        DesignMethod m = run.basis().method();
        this.method = m == null ? DesignMethod.LRFD : m;
        this.t = paper.textSize();
    }

    FramingPlanDrawing build() {
        double w = paper.width();
        double h = paper.height();
        double margin = w > 500 ? 12 : 8;
        double panelW = Math.max(95, Math.min(160, 0.19 * w));
        double panelX = w - margin - panelW;
        double viewTitleH = 6 * t;
        double ax0 = margin + 4;
        double ax1 = panelX - 4;
        double ay0 = margin + 4 + viewTitleH;
        double ay1 = h - margin - 4;

        extents();
        double ann = annotationMm();
        double bw = Math.max(maxX - minX, 1e-3);
        double bh = Math.max(maxY - minY, 1e-3);
        scale = DrawingScale.fit(units, bw, bh, ax1 - ax0 - 2 * ann, ay1 - ay0 - 2 * ann);
        viewport = new Viewport(scale.denominator(), new Pt((minX + maxX) / 2, (minY + maxY) / 2),
                new Pt((ax0 + ax1) / 2, (ay0 + ay1) / 2));
        k = viewport.metresPerMm();

        grid();
        slab();
        members();
        columns();
        dimensions();
        openingsAndAreaLoads();

        sheet(w, h, margin, panelX);
        viewTitle(ax0, margin + 4);
        double y = northAndScale(panelX + 4, w - margin - 4, h - margin - 4);
        y = legend(panelX + 4, w - margin - 4, y - 2 * t);
        double titleTop = titleBlock(panelX, w - margin, margin);
        notes(panelX + 4, w - margin - 4, y - 1.5 * t, titleTop);

        List<Primitive> sorted = new ArrayList<>(out);
        sorted.sort(Comparator.comparingInt(p -> p.layer().ordinal()));
        return new FramingPlanDrawing(plan.name(), level.name(), floor.id(), paper, units, scale, viewport, sorted);
    }

    // ---------------------------------------------------------------- extents and scale

    private void extents() {
        minX = Double.POSITIVE_INFINITY;
        minY = Double.POSITIVE_INFINITY;
        maxX = Double.NEGATIVE_INFINITY;
        maxY = Double.NEGATIVE_INFINITY;
        if (floor.slabEdge() != null) {
            floor.slabEdge().vertices().forEach(this::include);
        }
        for (MemberResult m : members) {
            include(m.start());
            include(m.end());
        }
        for (Opening o : floor.openings()) {
            o.outline().vertices().forEach(this::include);
        }
        for (AreaLoad a : floor.areaLoads()) {
            a.outline().vertices().forEach(this::include);
        }
        for (ColumnResult c : columnsHere()) {
            include(c.at());
        }
        for (GridLine g : plan.grid()) {
            if (g.axis() == GridLine.Axis.X) {
                minX = Math.min(minX, g.offset());
                maxX = Math.max(maxX, g.offset());
            } else {
                minY = Math.min(minY, g.offset());
                maxY = Math.max(maxY, g.offset());
            }
        }
        if (!Double.isFinite(minX)) {
            minX = 0;
            maxX = 1;
        }
        if (!Double.isFinite(minY)) {
            minY = 0;
            maxY = 1;
        }
    }

    private void include(Point p) {
        minX = Math.min(minX, p.x());
        minY = Math.min(minY, p.y());
        maxX = Math.max(maxX, p.x());
        maxY = Math.max(maxY, p.y());
    }

    /** Distance from the plan's extents to the outer edge of the grid bubbles, mm. */
    private double annotationMm() {
        return gridExtensionMm() + 2 * bubbleRadiusMm() + 0.5 * t;
    }

    private double gridExtensionMm() {
        return 7.4 * t;
    }

    private double bubbleRadiusMm() {
        return 1.7 * t;
    }

    // ---------------------------------------------------------------- grid and dimensions

    private void grid() {
        double ext = gridExtensionMm() * k;
        double r = bubbleRadiusMm();
        for (GridLine g : plan.grid()) {
            Pt a;
            Pt b;
            if (g.axis() == GridLine.Axis.X) {
                a = new Pt(g.offset(), minY - ext);
                b = new Pt(g.offset(), maxY + ext);
            } else {
                a = new Pt(minX - ext, g.offset());
                b = new Pt(maxX + ext, g.offset());
            }
            out.add(new Primitive.Line(Layer.GRID, Space.PLAN, a, b, GRID_PEN));
            double dx = g.axis() == GridLine.Axis.X ? 0 : r * k;
            double dy = g.axis() == GridLine.Axis.X ? r * k : 0;
            for (Pt c : List.of(new Pt(a.x() - dx, a.y() - dy), new Pt(b.x() + dx, b.y() + dy))) {
                out.add(new Primitive.Circle(Layer.GRID, Space.PLAN, c, r, Pen.solid(0.35, Rgb.INK), Rgb.WHITE));
                taken.add(new double[] {c.x() - r * k, c.y() - r * k, c.x() + r * k, c.y() + r * k});
                out.add(new Primitive.Text(Layer.GRID, Space.PLAN, c, g.label(), fitBubble(g.label(), 1.3 * t, r), 0,
                        Anchor.MIDDLE_CENTRE, Rgb.INK, true));
            }
        }
    }

    private static double fitBubble(String label, double size, double r) {
        double wdt = TextMetrics.width(label, size, true);
        return wdt <= 1.5 * r ? size : size * 1.5 * r / wdt;
    }

    private void dimensions() {
        List<Double> xs = plan.grid().stream().filter(g -> g.axis() == GridLine.Axis.X).map(GridLine::offset).distinct()
                .sorted().toList();
        List<Double> ys = plan.grid().stream().filter(g -> g.axis() == GridLine.Axis.Y).map(GridLine::offset).distinct()
                .sorted().toList();
        if (xs.size() >= 2) {
            dimensionRow(xs, maxY + 3.2 * t * k, true);
            if (xs.size() >= 3) {
                dimensionRow(List.of(xs.get(0), xs.get(xs.size() - 1)), maxY + 6.0 * t * k, true);
            }
        }
        if (ys.size() >= 2) {
            dimensionRow(ys, minX - 3.2 * t * k, false);
            if (ys.size() >= 3) {
                dimensionRow(List.of(ys.get(0), ys.get(ys.size() - 1)), minX - 6.0 * t * k, false);
            }
        }
    }

    /** A chain of dimensions along x at height {@code at} (horizontal) or along y at x = {@code at}. */
    private void dimensionRow(List<Double> stations, double at, boolean horizontal) {
        double over = 1.5 * k;
        double first = stations.get(0);
        double last = stations.get(stations.size() - 1);
        out.add(new Primitive.Line(Layer.DIMENSIONS, Space.PLAN, pt(horizontal, first - over, at), pt(horizontal, last + over, at),
                THIN));
        double tick = 1.1 * k;
        for (double s : stations) {
            Pt c = pt(horizontal, s, at);
            out.add(new Primitive.Line(Layer.DIMENSIONS, Space.PLAN, c.plus(-tick, -tick), c.plus(tick, tick),
                    Pen.solid(0.35, Rgb.INK)));
        }
        for (int i = 0; i + 1 < stations.size(); i++) {
            double mid = (stations.get(i) + stations.get(i + 1)) / 2;
            String text = lengthText(stations.get(i + 1) - stations.get(i));
            Pt p = horizontal ? new Pt(mid, at + 0.7 * k) : new Pt(at - 0.7 * k, mid);
            label(Layer.DIMENSIONS, p, text, 0.9 * t, horizontal ? 0 : 90, Anchor.MIDDLE_BASELINE, false);
        }
    }

    private static Pt pt(boolean horizontal, double along, double at) {
        return horizontal ? new Pt(along, at) : new Pt(at, along);
    }

    /** A dimension as drafters write it: 30'-0" (to 1/16") or 9144 (mm). */
    String lengthText(double metres) {
        if (units == UnitSystem.SI) {
            return String.format(Locale.ROOT, "%d", Math.round(metres * 1000));
        }
        return UnitSystem.feetInches(metres, 16);
    }

    // ---------------------------------------------------------------- slab, openings, area loads

    private void slab() {
        if (floor.slabEdge() != null && floor.slabEdge().vertices().size() >= 3) {
            out.add(new Primitive.Path(Layer.SLAB, Space.PLAN, pts(floor.slabEdge()), true, SLAB_PEN, null, null));
        }
    }

    private void openingsAndAreaLoads() {
        for (Opening o : floor.openings()) {
            if (o.outline().vertices().size() < 3) {
                continue;
            }
            out.add(new Primitive.Path(Layer.OPENINGS, Space.PLAN, pts(o.outline()), true, OPENING_PEN, null, OPENING_HATCH));
            tag(o.outline(), List.of("OPENING", o.id()));
        }
        AreaLoad base = floorLoad();
        for (AreaLoad a : floor.areaLoads()) {
            if (a == base || a.outline().vertices().size() < 3) {
                continue;
            }
            out.add(new Primitive.Path(Layer.AREA_LOADS, Space.PLAN, pts(a.outline()), true, AREA_LOAD_PEN, null,
                    AREA_LOAD_HATCH));
            tag(a.outline(), List.of("AREA LOAD " + a.id(), loadText(a.values())));
        }
    }

    /** The floor-wide area load: the largest, when it covers at least half the slab; null if there is none. */
    AreaLoad floorLoad() {
        double slabArea = floor.slabEdge() == null ? 0 : Math.abs(floor.slabEdge().signedArea());
        AreaLoad best = null;
        for (AreaLoad a : floor.areaLoads()) {
            if (best == null || Math.abs(a.outline().signedArea()) > Math.abs(best.outline().signedArea())) {
                best = a;
            }
        }
        return best != null && Math.abs(best.outline().signedArea()) >= 0.5 * slabArea - 1e-9 ? best : null;
    }

    /** Service load intensities, e.g. "D 56, SD 10, L 125 psf". */
    String loadText(LoadValues v) {
        List<String> parts = new ArrayList<>();
        String[] names = {"D", "SD", "L", "Lr", "S", "partitions"};
        double[] vals = {v.dead(), v.superimposed(), v.live(), v.roofLive(), v.snow(), v.partition()};
        for (int i = 0; i < names.length; i++) {
            if (Math.abs(vals[i]) > 1e-9) {
                parts.add(names[i] + " " + areaLoadNumber(vals[i]));
            }
        }
        return parts.isEmpty() ? "no load" : String.join(", ", parts) + " " + units.areaLoad().symbol();
    }

    private String areaLoadNumber(double pa) {
        double v = units.areaLoad().fromSi(pa);
        if (units == UnitSystem.SI) {
            return String.format(Locale.ROOT, "%.2f", v);
        }
        return Math.abs(v - Math.rint(v)) < 0.05 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    /**
     * A boxed note for a polygon: inside it where the box covers no label or member line; otherwise just
     * outside it with a leader to a dot inside, where box and leader cover the fewest; failing both, inside
     * where it covers the fewest.
     */
    private void tag(Polygon poly, List<String> text) {
        double size = 0.8 * t;
        double pad = 0.6 * t;
        double lineH = 1.35 * size;
        double wMm = 0;
        for (int i = 0; i < text.size(); i++) {
            wMm = Math.max(wMm, TextMetrics.width(text.get(i), size, i == 0));
        }
        double bw = (wMm + 2 * pad) * k;
        double bh = (text.size() * lineH + 2 * pad - (lineH - Anchor.CAP_HEIGHT * size)) * k;
        double[] box = bbox(poly);
        Pt centre = new Pt((box[0] + box[2]) / 2, (box[1] + box[3]) / 2);
        double span = Math.max(1e-9, box[2] - box[0] + box[3] - box[1]);
        int n = 16;
        // points inside the polygon, clear of member lines: where a leader may end
        List<Pt> targets = new ArrayList<>();
        Pt best = null;
        Pt bestTarget = null;
        double bestScore = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= n; i++) {
            for (int j = 0; j <= n; j++) {
                Pt c = new Pt(box[0] + (box[2] - box[0]) * i / n, box[1] + (box[3] - box[1]) * j / n);
                if (!contains(poly, c)) {
                    continue;
                }
                if (overlaps(new double[] {c.x() - k, c.y() - k, c.x() + k, c.y() + k}) == 0) {
                    targets.add(c);
                }
                double[] r = {c.x() - bw / 2, c.y() - bh / 2, c.x() + bw / 2, c.y() + bh / 2};
                boolean inside = contains(poly, new Pt(r[0], r[1])) && contains(poly, new Pt(r[2], r[1]))
                        && contains(poly, new Pt(r[0], r[3])) && contains(poly, new Pt(r[2], r[3]));
                int hits = overlaps(r);
                double score = (inside && hits == 0 ? 0 : 100) + 10 * hits + StrictMath.hypot(c.x() - centre.x(),
                        c.y() - centre.y()) / span;
                if (score < bestScore - 1e-12) {
                    bestScore = score;
                    best = c;
                    bestTarget = null;
                }
            }
        }
        // outside, with a leader
        double gx = bw / 2 + 3 * k;
        double gy = bh / 2 + 3 * k;
        for (int i = 0; i <= n && !targets.isEmpty(); i++) {
            for (int j = 0; j <= n; j++) {
                Pt c = new Pt(box[0] - gx + (box[2] - box[0] + 2 * gx) * i / n, box[1] - gy + (box[3] - box[1] + 2 * gy) * j / n);
                double[] r = {c.x() - bw / 2, c.y() - bh / 2, c.x() + bw / 2, c.y() + bh / 2};
                if (r[0] < box[2] && box[0] < r[2] && r[1] < box[3] && box[1] < r[3]) {
                    continue;
                }
                Pt target = targets.stream().min(Comparator.comparingDouble(
                        q -> StrictMath.hypot(q.x() - c.x(), q.y() - c.y()))).orElseThrow();
                Pt from = boxExit(c, bw, bh, target);
                double score = 3 + 10 * overlaps(r) + 4 * crossings(from, target)
                        + StrictMath.hypot(target.x() - from.x(), target.y() - from.y()) / span;
                if (score < bestScore - 1e-12) {
                    bestScore = score;
                    best = c;
                    bestTarget = target;
                }
            }
        }
        if (best == null) {
            best = centre; // a sliver too thin to sample: tag its middle
        }
        double[] r = {best.x() - bw / 2, best.y() - bh / 2, best.x() + bw / 2, best.y() + bh / 2};
        if (bestTarget != null) {
            out.add(new Primitive.Line(Layer.TAGS, Space.PLAN, boxExit(best, bw, bh, bestTarget), bestTarget, THIN));
            out.add(new Primitive.Circle(Layer.TAGS, Space.PLAN, bestTarget, 0.35, null, Rgb.INK));
        }
        out.add(new Primitive.Path(Layer.TAGS, Space.PLAN, List.of(new Pt(r[0], r[1]), new Pt(r[2], r[1]), new Pt(r[2], r[3]),
                new Pt(r[0], r[3])), true, THIN, Rgb.WHITE, null));
        double y = r[3] - pad * k;
        for (int i = 0; i < text.size(); i++) {
            out.add(new Primitive.Text(Layer.TAGS, Space.PLAN, new Pt(r[0] + pad * k, y), text.get(i), size, 0,
                    Anchor.START_TOP, Rgb.INK, i == 0));
            y -= lineH * k;
        }
        taken.add(r);
    }

    /** Where the ray from a box's centre towards a point leaves the box. */
    private static Pt boxExit(Pt c, double bw, double bh, Pt toward) {
        double dx = toward.x() - c.x();
        double dy = toward.y() - c.y();
        double s = Math.min(dx == 0 ? Double.POSITIVE_INFINITY : bw / 2 / Math.abs(dx),
                dy == 0 ? Double.POSITIVE_INFINITY : bh / 2 / Math.abs(dy));
        s = Math.min(s, 1);
        return new Pt(c.x() + s * dx, c.y() + s * dy);
    }

    /** How many member lines a segment crosses. */
    private int crossings(Pt a, Pt b) {
        int n = 0;
        for (double[] l : lines) {
            if (segmentsCross(a.x(), a.y(), b.x(), b.y(), l[0], l[1], l[2], l[3])) {
                n++;
            }
        }
        return n;
    }

    static boolean segmentsCross(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy) {
        double d1 = cross(cx, cy, dx, dy, ax, ay);
        double d2 = cross(cx, cy, dx, dy, bx, by);
        double d3 = cross(ax, ay, bx, by, cx, cy);
        double d4 = cross(ax, ay, bx, by, dx, dy);
        return ((d1 > 0) != (d2 > 0)) && ((d3 > 0) != (d4 > 0));
    }

    private static double cross(double ox, double oy, double px, double py, double qx, double qy) {
        return (px - ox) * (qy - oy) - (py - oy) * (qx - ox);
    }

    /** How many labels and member lines a box would cover. */
    private int overlaps(double[] r) {
        int n = 0;
        for (double[] o : taken) {
            if (r[0] < o[2] && o[0] < r[2] && r[1] < o[3] && o[1] < r[3]) {
                n++;
            }
        }
        for (double[] l : lines) {
            if (segmentMeetsBox(l[0], l[1], l[2], l[3], new double[] {r[0] - l[4], r[1] - l[4], r[2] + l[4], r[3] + l[4]})) {
                n++;
            }
        }
        return n;
    }

    /** Liang–Barsky: does the segment (x0, y0)–(x1, y1) meet the box {minX, minY, maxX, maxY}? */
    static boolean segmentMeetsBox(double x0, double y0, double x1, double y1, double[] box) {
        double dx = x1 - x0;
        double dy = y1 - y0;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x0 - box[0], box[2] - x0, y0 - box[1], box[3] - y0};
        double lo = 0;
        double hi = 1;
        for (int i = 0; i < 4; i++) {
            if (p[i] == 0) {
                if (q[i] < 0) {
                    return false;
                }
            } else {
                double r = q[i] / p[i];
                if (p[i] < 0) {
                    lo = Math.max(lo, r);
                } else {
                    hi = Math.min(hi, r);
                }
            }
        }
        return lo <= hi;
    }

    private static double[] bbox(Polygon p) {
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Point v : p.vertices()) {
            b[0] = Math.min(b[0], v.x());
            b[1] = Math.min(b[1], v.y());
            b[2] = Math.max(b[2], v.x());
            b[3] = Math.max(b[3], v.y());
        }
        return b;
    }

    /** Even–odd point-in-polygon test. */
    static boolean contains(Polygon poly, Pt p) {
        boolean in = false;
        List<Point> v = poly.vertices();
        for (int i = 0, j = v.size() - 1; i < v.size(); j = i++) {
            Point a = v.get(i);
            Point b = v.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }

    private static List<Pt> pts(Polygon p) {
        return p.vertices().stream().map(v -> new Pt(v.x(), v.y())).toList();
    }

    // ---------------------------------------------------------------- members

    private void members() {
        for (MemberResult m : members) {
            member(m);
        }
    }

    private void member(MemberResult m) {
        Pt a = new Pt(m.start().x(), m.start().y());
        Pt b = new Pt(m.end().x(), m.end().y());
        double dx = b.x() - a.x();
        double dy = b.y() - a.y();
        double len = StrictMath.hypot(dx, dy);
        if (len < 1e-9) {
            return;
        }
        // read from the left, or from below for a vertical member
        boolean flip = dx < -1e-9 * len || (Math.abs(dx) <= 1e-9 * len && dy < 0);
        Pt r0 = flip ? b : a;
        Pt r1 = flip ? a : b;
        double ux = (r1.x() - r0.x()) / len;
        double uy = (r1.y() - r0.y()) / len;
        double nx = -uy;
        double ny = ux;
        double rot = StrictMath.toDegrees(StrictMath.atan2(uy, ux));
        boolean girder = m.kind() == MemberKind.GIRDER;
        double weight = girder ? GIRDER_WEIGHT : BEAM_WEIGHT;
        double half = girder ? GIRDER_BAND : BEAM_BAND;
        boolean sized = m.design() != null && m.design().section() != null;
        MemberStatus status = m.status();
        double hk = half * k;
        List<Pt> band = List.of(new Pt(r0.x() + nx * hk, r0.y() + ny * hk), new Pt(r1.x() + nx * hk, r1.y() + ny * hk),
                new Pt(r1.x() - nx * hk, r1.y() - ny * hk), new Pt(r0.x() - nx * hk, r0.y() - ny * hk));
        if (sized && Double.isFinite(m.maxRatio())) {
            out.add(new Primitive.Path(Layer.MEMBERS, Space.PLAN, band, true, null, ratioColour(m.maxRatio()), null));
        }
        if (status == MemberStatus.OVERSTRESSED) {
            out.add(new Primitive.Path(Layer.MEMBERS, Space.PLAN, band, true, OVER_PEN, null, null));
        }
        boolean undesigned = status == MemberStatus.UNSUPPORTED || status == MemberStatus.NOT_RUN;
        Pen centre = undesigned ? Pen.dashed(weight, Rgb.INK, 4, 1, 0.8, 1) : Pen.solid(weight, Rgb.INK);
        out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, a, b, centre));
        if (status == MemberStatus.UNSUPPORTED) {
            if (m.startSupport() == null || m.startSupport().isEmpty()) {
                cross(a);
            }
            if (m.endSupport() == null || m.endSupport().isEmpty()) {
                cross(b);
            }
        }
        lines.add(new double[] {a.x(), a.y(), b.x(), b.y(), hk});

        // labels: size above (on the left of the reading direction), ratio and reactions below
        double lenMm = len / k;
        // clear of the band, and of the dashed outline of an overstressed member
        double offMm = half + 0.45 * t + (status == MemberStatus.OVERSTRESSED ? 0.45 : 0);
        Pt mid = new Pt((a.x() + b.x()) / 2, (a.y() + b.y()) / 2);
        String sizeText = sizeLabel(m);
        Pt above = new Pt(mid.x() + nx * offMm * k, mid.y() + ny * offMm * k);
        label(above, sizeText, t, rot, Anchor.MIDDLE_BASELINE);

        double small = 0.8 * t;
        double endMm = 1.5 * t;
        String ratio = sized && Double.isFinite(m.maxRatio()) ? ratioText(m.maxRatio()) : null;
        String[] reactions = sized ? reactionTexts(flip ? m.endReaction() : m.startReaction(),
                flip ? m.startReaction() : m.endReaction()) : null;
        Pt below = new Pt(mid.x() - nx * offMm * k, mid.y() - ny * offMm * k);
        double gap = 0.8 * t;
        double ratioW = ratio == null ? 0 : TextMetrics.width(ratio, small, false);
        double reactW = reactions == null ? 0
                : TextMetrics.width(reactions[0], small, false) + TextMetrics.width(reactions[1], small, false);
        boolean ratioBelow = ratio != null && reactW + ratioW + 2 * endMm + 2 * gap <= lenMm;
        if (ratio != null) {
            if (ratioBelow) {
                label(below, ratio, small, rot, Anchor.MIDDLE_TOP);
            } else {
                double shift = (TextMetrics.width(sizeText, t, false) / 2 + 0.6 * t) * k;
                label(new Pt(above.x() + ux * shift, above.y() + uy * shift), ratio, small, rot, Anchor.START_BASELINE);
            }
        }
        if (reactions != null) {
            double e = endMm * k;
            label(new Pt(r0.x() + ux * e - nx * offMm * k, r0.y() + uy * e - ny * offMm * k), reactions[0], small, rot,
                    Anchor.START_TOP);
            label(new Pt(r1.x() - ux * e - nx * offMm * k, r1.y() - uy * e - ny * offMm * k), reactions[1], small, rot,
                    Anchor.END_TOP);
        }
    }

    private void cross(Pt p) {
        double c = 0.6 * t * k;
        Pen pen = Pen.solid(0.35, Rgb.INK);
        out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, p.plus(-c, -c), p.plus(c, c), pen));
        out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, p.plus(-c, c), p.plus(c, -c), pen));
    }

    /** A label on the plan, on a white knock-out so that grid lines and hatching do not run through it. */
    private void label(Pt at, String text, double size, double rot, Anchor anchor) {
        label(Layer.MEMBER_LABELS, at, text, size, rot, anchor, false);
    }

    private void label(Layer layer, Pt at, String text, double size, double rot, Anchor anchor, boolean bold) {
        List<Pt> box = textOutline(at, text, size, rot, anchor, bold, 0.1 * t);
        out.add(new Primitive.Path(layer, Space.PLAN, box, true, null, Rgb.WHITE, null));
        out.add(new Primitive.Text(layer, Space.PLAN, at, text, size, rot, anchor, Rgb.INK, bold));
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Pt p : box) {
            b[0] = Math.min(b[0], p.x());
            b[1] = Math.min(b[1], p.y());
            b[2] = Math.max(b[2], p.x());
            b[3] = Math.max(b[3], p.y());
        }
        taken.add(b);
    }

    /** The rectangle a text covers on the plan (from below the baseline to the top of the capitals), grown by a margin, mm. */
    private List<Pt> textOutline(Pt at, String text, double size, double rot, Anchor anchor, boolean bold, double marginMm) {
        double wdt = TextMetrics.width(text, size, bold) * k;
        double g = marginMm * k;
        double cap = Anchor.CAP_HEIGHT * size * k;
        double desc = 0.2 * size * k;
        double c = StrictMath.cos(StrictMath.toRadians(rot));
        double s = StrictMath.sin(StrictMath.toRadians(rot));
        double x0 = -anchor.along() * wdt - g;
        double x1 = x0 + wdt + 2 * g;
        double base = -anchor.baselineDrop(size) * k;
        double y0 = base - desc - g;
        double y1 = base + cap + g;
        List<Pt> pts = new ArrayList<>();
        for (double[] l : new double[][] {{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}}) {
            pts.add(new Pt(at.x() + l[0] * c - l[1] * s, at.y() + l[0] * s + l[1] * c));
        }
        return pts;
    }

    /** The size as written along a member: W21X44, [W21X44] when fixed in the plan. */
    String sizeLabel(MemberResult m) {
        boolean sized = m.design() != null && m.design().section() != null;
        if (!sized) {
            return switch (m.status()) {
                case UNSUPPORTED -> "UNSUPPORTED";
                case NOT_RUN -> "NOT RUN";
                default -> "NO SIZE PASSES";
            };
        }
        boolean fixed = m.status() == MemberStatus.FIXED_SIZE
                || floor.member(m.id()).flatMap(org.baywright.plan.Member::fixedSection).isPresent();
        return fixed ? "[" + m.section() + "]" : m.section();
    }

    static String ratioText(double ratio) {
        String r = String.format(Locale.ROOT, "%.2f", ratio);
        return ratio > 1.0 + 1e-9 ? r + " over" : r;
    }

    /** The colour of a demand/capacity ratio: cividis over 0–1, the top colour beyond. */
    static Rgb ratioColour(double ratio) {
        return Cividis.at(Math.max(0, Math.min(1, ratio)));
    }

    /** The texts of the reactions at the reading start and end. */
    String[] reactionTexts(double[] start, double[] end) {
        double[] s = Component.byCase(start);
        double[] e = Component.byCase(end);
        if (options.reactions() == ReactionMode.FACTORED) {
            Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
            for (LoadCase c : LoadCase.values()) {
                if (Math.abs(s[c.ordinal()]) > 1e-6 || Math.abs(e[c.ordinal()]) > 1e-6) {
                    present.add(c);
                }
            }
            List<LoadCombination> combos = Combinations.gravity(method, present);
            return new String[] {"R=" + forceText(governing(s, combos)) + forceSuffix(),
                "R=" + forceText(governing(e, combos)) + forceSuffix()};
        }
        return new String[] {serviceText(s), serviceText(e)};
    }

    /** The largest combined reaction of a set of combinations, N. */
    static double governing(double[] byCase, List<LoadCombination> combos) {
        return Math.max(0, Combinations.governing(byCase, combos).value());
    }

    private String serviceText(double[] byCase) {
        StringBuilder b = new StringBuilder("R=");
        boolean any = false;
        for (LoadCase c : LoadCase.values()) {
            double v = byCase[c.ordinal()];
            if (c == LoadCase.D || Math.abs(units.force().fromSi(v)) >= 0.05) {
                if (any) {
                    b.append('+');
                }
                b.append(forceText(v)).append(c.symbol());
                any = true;
            }
        }
        return b.toString();
    }

    private String forceText(double newtons) {
        double v = units.force().fromSi(newtons);
        return Math.abs(v) >= 99.95 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    private String forceSuffix() {
        return units == UnitSystem.SI ? "kN" : "k";
    }

    // ---------------------------------------------------------------- columns

    private List<ColumnResult> columnsHere() {
        List<ColumnResult> here = new ArrayList<>();
        for (ColumnResult c : run.takedown().columns()) {
            if (tierAt(c) != null) {
                here.add(c);
            }
        }
        return here;
    }

    private ColumnTier tierAt(ColumnResult c) {
        for (ColumnTier tier : c.tiers()) {
            if (tier.levels().contains(level.name())) {
                return tier;
            }
        }
        return null;
    }

    private void columns() {
        double side = 1.3 * t;
        double hs = side / 2 * k;
        for (ColumnResult c : columnsHere()) {
            Pt p = new Pt(c.at().x(), c.at().y());
            out.add(new Primitive.Path(Layer.COLUMNS, Space.PLAN, List.of(p.plus(-hs, -hs), p.plus(hs, -hs), p.plus(hs, hs),
                    p.plus(-hs, hs)), true, null, Rgb.INK, null));
            taken.add(new double[] {p.x() - hs, p.y() - hs, p.x() + hs, p.y() + hs});
            ColumnTier tier = tierAt(c);
            boolean fixed = plan.columns().stream().filter(pc -> pc.id().equals(c.id())).findFirst()
                    .flatMap(Column::fixedSection).isPresent();
            String section = tier.section().isEmpty() ? "NO SIZE PASSES"
                    : fixed ? "[" + tier.section() + "]" : tier.section();
            if (tier.status() == MemberStatus.OVERSTRESSED && !tier.section().isEmpty()) {
                section += " over";
            }
            double small = 0.8 * t;
            double gx = (side / 2 + 0.35 * t) * k;
            Pt low = new Pt(p.x() - gx, p.y() + gx);
            Pt high = new Pt(low.x(), low.y() + 1.3 * small * k);
            label(Layer.MEMBER_LABELS, low, section, small, 0, Anchor.END_BASELINE, false);
            label(Layer.MEMBER_LABELS, high, c.id(), small, 0, Anchor.END_BASELINE, true);
        }
    }

    // ---------------------------------------------------------------- sheet, legend, notes, title block

    private void sheet(double w, double h, double margin, double panelX) {
        out.add(new Primitive.Path(Layer.SHEET, Space.PAPER, List.of(new Pt(margin, margin), new Pt(w - margin, margin),
                new Pt(w - margin, h - margin), new Pt(margin, h - margin)), true, FRAME, null, null));
        out.add(new Primitive.Line(Layer.SHEET, Space.PAPER, new Pt(panelX, margin), new Pt(panelX, h - margin),
                Pen.solid(0.5, Rgb.INK)));
    }

    private void viewTitle(double x, double bottom) {
        String title = level.name().toUpperCase(Locale.ROOT) + " FRAMING PLAN";
        double big = 1.8 * t;
        double baseline = bottom + 2.6 * t;
        text(Layer.SHEET, new Pt(x + 2, baseline), title, big, Anchor.START_BASELINE, true);
        double tw = TextMetrics.width(title, big, true);
        out.add(new Primitive.Line(Layer.SHEET, Space.PAPER, new Pt(x + 2, baseline - 0.5 * t), new Pt(x + 2 + tw,
                baseline - 0.5 * t), Pen.solid(0.5, Rgb.INK)));
        List<String> sharing = plan.levels().stream().filter(l -> floorIdOf(l).equals(floor.id())).map(Level::name).toList();
        String layout = "SCALE " + scale.label() + " — floor layout \"" + floor.id() + "\""
                + (floor.name() == null || floor.name().isBlank() ? "" : " (" + floor.name() + ")")
                + (sharing.size() > 1 ? ", used at " + String.join(", ", sharing) : "");
        text(Layer.SHEET, new Pt(x + 2, baseline - 2.0 * t), layout, 0.9 * t, Anchor.START_BASELINE, false);
    }

    private String floorIdOf(Level l) {
        return run.takedown().levelFloors().getOrDefault(l.name(), l.floor());
    }

    /** North arrow and scale bar at the top of the panel; returns the y below them. */
    private double northAndScale(double x0, double x1, double top) {
        double r = 2.6 * t;
        double cx = x0 + r + 0.5 * t;
        double cy = top - 1.6 * t - r;
        out.add(new Primitive.Circle(Layer.LEGEND, Space.PAPER, new Pt(cx, cy), r, Pen.solid(0.35, Rgb.INK), null));
        Pt tip = new Pt(cx, cy + 0.82 * r);
        Pt notch = new Pt(cx, cy - 0.35 * r);
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(tip, new Pt(cx - 0.42 * r, cy - 0.75 * r), notch), true,
                Pen.solid(0.25, Rgb.INK), Rgb.INK, null));
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(tip, notch, new Pt(cx + 0.42 * r, cy - 0.75 * r)), true,
                Pen.solid(0.25, Rgb.INK), Rgb.WHITE, null));
        text(Layer.LEGEND, new Pt(cx, cy + r + 0.45 * t), "N", 1.2 * t, Anchor.MIDDLE_BASELINE, true);

        // scale bar: four equal steps
        double bx0 = cx + r + 3 * t;
        double avail = x1 - bx0 - 2 * t;
        double[] steps = units == UnitSystem.SI ? new double[] {0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500}
                : new double[] {1, 2, 5, 10, 20, 25, 50, 100, 200, 500};
        double unitM = units == UnitSystem.SI ? 1 : Units.FT_.toSi(1);
        double step = steps[0];
        for (double s : steps) {
            if (4 * s * unitM * scale.mmPerMetre() <= avail) {
                step = s;
            }
        }
        double segMm = step * unitM * scale.mmPerMetre();
        double barH = 0.6 * t;
        double by = cy - 0.2 * t;
        text(Layer.LEGEND, new Pt(bx0, by + barH + 0.8 * t), "SCALE " + scale.label(), 0.8 * t, Anchor.START_BASELINE, true);
        for (int i = 0; i < 4; i++) {
            double xa = bx0 + i * segMm;
            out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(xa, by), new Pt(xa + segMm, by),
                    new Pt(xa + segMm, by + barH), new Pt(xa, by + barH)), true, Pen.solid(0.18, Rgb.INK),
                    i % 2 == 0 ? Rgb.INK : Rgb.WHITE, null));
        }
        String unit = units == UnitSystem.SI ? "m" : "ft";
        for (int i = 0; i <= 4; i++) {
            String label = trim(step * i) + (i == 4 ? " " + unit : "");
            text(Layer.LEGEND, new Pt(bx0 + i * segMm, by - 0.4 * t), label, 0.7 * t, Anchor.MIDDLE_TOP, false);
        }
        return cy - r - 0.8 * t;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", v);
    }

    /** The legend; returns the y below it. */
    private double legend(double x0, double x1, double top) {
        double size = 0.8 * t;
        double sampleW = 9 * t;
        double tx = x0 + sampleW + 1.2 * t;
        double textW = x1 - tx;
        double y = top;
        text(Layer.LEGEND, new Pt(x0, y), "LEGEND", t, Anchor.START_TOP, true);
        y -= 2.2 * t;
        String forceUnit = units.force().symbol();
        String reactionSample;
        String reactionText;
        if (options.reactions() == ReactionMode.FACTORED) {
            reactionSample = "R=" + (units == UnitSystem.SI ? "107kN" : "24.1k");
            reactionText = "End reaction, " + forceUnit + ": " + method.name() + ", the largest of the ASCE 7-16 "
                    + (method == DesignMethod.LRFD ? "§2.3.1 combinations (1.2D + 1.6L on a floor)"
                            : "§2.4.1 combinations (D + L on a floor)")
                    + "; self-weight in D, live load unreduced";
        } else {
            reactionSample = "R=8.1D+6.0L";
            reactionText = "End reactions, " + forceUnit + ": service loads by case (D, L, Lr, S); self-weight in D,"
                    + " live load unreduced";
        }
        Object[][] rows = {
            {"girder", "Girder: size along the member, demand/capacity ratio below it"},
            {"beam", "Beam"},
            {"fixed", "Size fixed in the plan (checked, not searched)"},
            {"over", "Overstressed: no size passes, or the fixed size fails; ratio marked \"over\""},
            {"unsupported", "Unsupported member; × at an end with no column or member to bear on"},
            {"column", "Column: mark, and section of the tier below this level"},
            {"reaction", reactionText},
            {"grid", "Grid line"},
            {"slab", "Slab edge"},
            {"opening", "Opening (no deck)"},
            {"areaload", "Area load other than the floor load, tagged with its service loads"},
        };
        for (Object[] row : rows) {
            String key = (String) row[0];
            List<String> lines = TextMetrics.wrap((String) row[1], size, false, textW);
            double rowH = Math.max(1.9 * t, lines.size() * 1.3 * size + 0.6 * t);
            double cy = y - rowH / 2;
            sample(key, x0, x0 + sampleW, cy, reactionSample);
            double ly = cy + (lines.size() - 1) * 1.3 * size / 2;
            for (String l : lines) {
                text(Layer.LEGEND, new Pt(tx, ly), l, size, Anchor.START_CENTRE, false);
                ly -= 1.3 * size;
            }
            y -= rowH;
        }
        // colour ramp
        y -= 0.8 * t;
        text(Layer.LEGEND, new Pt(x0, y), "DEMAND/CAPACITY RATIO (cividis colour map)", size, Anchor.START_TOP, true);
        y -= 1.8 * t;
        double rampW = Math.min(x1 - x0 - 2 * t, 50 * t);
        double rampH = 1.2 * t;
        int n = 40;
        for (int i = 0; i < n; i++) {
            double xa = x0 + rampW * i / n;
            double xb = x0 + rampW * (i + 1) / n + (i + 1 < n ? 0.2 : 0); // overlap the next step: no seams
            out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(xa, y - rampH), new Pt(xb, y - rampH),
                    new Pt(xb, y), new Pt(xa, y)), true, null, Cividis.at((i + 0.5) / n), null));
        }
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(x0, y - rampH), new Pt(x0 + rampW, y - rampH),
                new Pt(x0 + rampW, y), new Pt(x0, y)), true, Pen.solid(0.18, Rgb.INK), null, null));
        for (int i = 0; i <= 5; i++) {
            double xt = x0 + rampW * i / 5;
            out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, new Pt(xt, y - rampH), new Pt(xt, y - rampH - 0.5 * t), THIN));
            text(Layer.LEGEND, new Pt(xt, y - rampH - 0.7 * t), String.format(Locale.ROOT, "%.1f", i / 5.0), 0.7 * t,
                    Anchor.MIDDLE_TOP, false);
        }
        y -= rampH + 2.2 * t;
        for (String l : TextMetrics.wrap("Each member's band takes the colour of its highest ratio; over 1.0 it keeps the"
                + " top colour and gets the dashed heavy outline.", size, false, x1 - x0)) {
            text(Layer.LEGEND, new Pt(x0, y), l, size, Anchor.START_TOP, false);
            y -= 1.3 * size;
        }
        return y;
    }

    private void sample(String key, double x0, double x1, double cy, String reactionSample) {
        Pt a = new Pt(x0, cy);
        Pt b = new Pt(x1, cy);
        switch (key) {
            case "fixed" -> text(Layer.LEGEND, new Pt((x0 + x1) / 2, cy), "[W16X26]", 0.8 * t, Anchor.MIDDLE_CENTRE, false);
            case "girder", "beam", "over" -> {
                boolean g = key.equals("girder");
                double half = g ? GIRDER_BAND : BEAM_BAND;
                double ratio = switch (key) {
                    case "girder" -> 0.92;
                    case "beam" -> 0.55;
                    default -> 1.2;
                };
                List<Pt> band = List.of(new Pt(x0, cy - half), new Pt(x1, cy - half), new Pt(x1, cy + half), new Pt(x0, cy + half));
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, band, true, key.equals("over") ? OVER_PEN : null,
                        ratioColour(ratio), null));
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, Pen.solid(g ? GIRDER_WEIGHT : BEAM_WEIGHT, Rgb.INK)));
            }
            case "unsupported" -> {
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, Pen.dashed(BEAM_WEIGHT, Rgb.INK, 4, 1, 0.8, 1)));
                double c = 0.6 * t;
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, b.plus(-c, -c), b.plus(c, c), Pen.solid(0.35, Rgb.INK)));
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, b.plus(-c, c), b.plus(c, -c), Pen.solid(0.35, Rgb.INK)));
            }
            case "column" -> {
                double hs = 0.65 * t;
                Pt c = new Pt((x0 + x1) / 2, cy);
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(c.plus(-hs, -hs), c.plus(hs, -hs), c.plus(hs, hs),
                        c.plus(-hs, hs)), true, null, Rgb.INK, null));
            }
            case "reaction" -> text(Layer.LEGEND, new Pt(x0, cy), reactionSample, 0.8 * t, Anchor.START_CENTRE, false);
            case "grid" -> out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, GRID_PEN));
            case "slab" -> out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, SLAB_PEN));
            case "opening", "areaload" -> {
                double hh = 0.8 * t;
                List<Pt> box = List.of(new Pt(x0, cy - hh), new Pt(x1, cy - hh), new Pt(x1, cy + hh), new Pt(x0, cy + hh));
                boolean op = key.equals("opening");
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, box, true, op ? OPENING_PEN : AREA_LOAD_PEN, null,
                        op ? OPENING_HATCH : AREA_LOAD_HATCH));
            }
            default -> throw new IllegalStateException(key);
        }
    }

    private void notes(double x0, double x1, double top, double floorOfNotes) {
        double size = 0.8 * t;
        List<String> notes = new ArrayList<>();
        AreaLoad base = floorLoad();
        notes.add(base == null ? "No floor-wide area load on this layout; every area load is outlined and tagged."
                : "Floor load " + base.id() + " (not hatched): " + loadText(base.values()) + ".");
        int[] counts = new int[MemberStatus.values().length];
        for (MemberResult m : members) {
            counts[m.status().ordinal()]++;
        }
        StringBuilder c = new StringBuilder(members.size() + " members on this layout: ");
        List<String> parts = new ArrayList<>();
        for (MemberStatus s : MemberStatus.values()) {
            if (counts[s.ordinal()] > 0) {
                parts.add(counts[s.ordinal()] + " " + s.label());
            }
        }
        c.append(parts.isEmpty() ? "none" : String.join(", ", parts)).append('.');
        notes.add(c.toString());
        notes.add("Sizes: the lightest adequate section for strength (AISC 360-16) and deflection; ratios are the highest"
                + " demand/capacity of all checks.");
        notes.add("Dimensions between grid lines in " + (units == UnitSystem.SI ? "millimetres" : "feet and inches") + ".");
        double y = top;
        if (y - 3 * t < floorOfNotes) {
            return;
        }
        text(Layer.NOTES, new Pt(x0, y), "NOTES", t, Anchor.START_TOP, true);
        y -= 2.0 * t;
        for (int i = 0; i < notes.size(); i++) {
            List<String> lines = TextMetrics.wrap(notes.get(i), size, false, x1 - x0 - 2.2 * t);
            for (int j = 0; j < lines.size(); j++) {
                if (y - 1.3 * size < floorOfNotes) {
                    return;
                }
                if (j == 0) {
                    text(Layer.NOTES, new Pt(x0, y), (i + 1) + ".", size, Anchor.START_TOP, false);
                }
                text(Layer.NOTES, new Pt(x0 + 2.2 * t, y), lines.get(j), size, Anchor.START_TOP, false);
                y -= 1.3 * size;
            }
            y -= 0.4 * size;
        }
    }

    /** The title block at the bottom of the panel, bottom up; returns its top. */
    private double titleBlock(double x0, double x1, double bottom) {
        double pad = 0.6 * t;
        double inner = x1 - x0 - 2 * pad;
        double small = 0.8 * t;
        double y = bottom;

        // caution
        List<String> caution = TextMetrics.wrap(Caution.TEXT, small, true, inner);
        y = row(x0, x1, y, caution, small, true, null);
        // program
        y = row(x0, x1, y, List.of("Baywright " + run.version()), small, false, "PROGRAM");
        // design basis
        DesignSettings s = plan.settings();
        List<String> basis = new ArrayList<>();
        basis.add("AISC 360-16 " + method.name() + ", ASCE 7-16 load combinations; Fy = " + stressText(s.fy()));
        basis.add("Catalog: " + run.catalogName());
        basis.add("Live-load reduction (ASCE 7-16 §4.7, §4.8): " + (s.liveLoadReduction() ? "applied" : "not applied"));
        basis.add("Deflection limits: " + (s.liveDeflection() > 0 ? "L/" + trim(s.liveDeflection()) + " live" : "live off")
                + ", " + (s.totalDeflection() > 0 ? "L/" + trim(s.totalDeflection()) + " total" : "total off"));
        List<String> wrapped = new ArrayList<>();
        for (String l : basis) {
            wrapped.addAll(TextMetrics.wrap(l, small, false, inner));
        }
        y = row(x0, x1, y, wrapped, small, false, "DESIGN BASIS");
        // date and units; scale and sheet
        String date = options.date() == null || options.date().isBlank() ? " " : options.date().trim();
        y = twoCells(x0, x1, y, "DATE", date, "UNITS", units == UnitSystem.SI ? "SI (m, mm, kN, kPa)"
                : "US customary (ft, in, kip, psf)", small);
        y = twoCells(x0, x1, y, "SCALE", scale.label(), "SHEET", paper.label() + ", landscape", small);
        // drawing
        List<String> drawing = TextMetrics.wrap(level.name() + " — framing plan", 1.2 * t, true, inner);
        y = row(x0, x1, y, drawing, 1.2 * t, true, "DRAWING");
        List<String> project = TextMetrics.wrap(plan.name() == null || plan.name().isBlank() ? "(unnamed project)"
                : plan.name(), 1.5 * t, true, inner);
        y = row(x0, x1, y, project, 1.5 * t, true, "PROJECT");
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, y), new Pt(x1, y), Pen.solid(0.5, Rgb.INK)));
        return y;
    }

    /** One full-width row of the title block above {@code y}; returns its top. */
    private double row(double x0, double x1, double y, List<String> lines, double size, boolean bold, String caption) {
        double pad = 0.6 * t;
        double cap = 0.6 * t;
        double lineH = 1.3 * size;
        double h = pad + (caption == null ? 0 : cap * 1.4) + lines.size() * lineH + pad - (lineH - Anchor.CAP_HEIGHT * size);
        double top = y + h;
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, top), new Pt(x1, top), THIN));
        double ty = top - pad;
        if (caption != null) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), caption, cap, 0, Anchor.START_TOP,
                    CAPTION_INK, false));
            ty -= cap * 1.4;
        }
        for (String l : lines) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), l, size, 0, Anchor.START_TOP,
                    Rgb.INK, bold));
            ty -= lineH;
        }
        return top;
    }

    private double twoCells(double x0, double x1, double y, String cap1, String v1, String cap2, String v2, double size) {
        double pad = 0.6 * t;
        double cap = 0.6 * t;
        double h = pad + cap * 1.4 + Anchor.CAP_HEIGHT * size + pad;
        double top = y + h;
        double xm = (x0 + x1) / 2;
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, top), new Pt(x1, top), THIN));
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm, y), new Pt(xm, top), THIN));
        double ty = top - pad;
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), cap1, cap, 0, Anchor.START_TOP,
                CAPTION_INK, false));
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm + pad, ty), cap2, cap, 0, Anchor.START_TOP,
                CAPTION_INK, false));
        ty -= cap * 1.4;
        if (!v1.isBlank()) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), v1, size, 0, Anchor.START_TOP,
                    Rgb.INK, false));
        }
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm + pad, ty), v2, size, 0, Anchor.START_TOP,
                Rgb.INK, false));
        return top;
    }

    private String stressText(double pa) {
        double v = units.stress().fromSi(pa);
        return (Math.abs(v - Math.rint(v)) < 0.05 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v))
                + " " + units.stress().symbol();
    }

    private void text(Layer layer, Pt at, String s, double size, Anchor anchor, boolean bold) {
        out.add(new Primitive.Text(layer, Space.PAPER, at, s, size, 0, anchor, Rgb.INK, bold));
    }
}
