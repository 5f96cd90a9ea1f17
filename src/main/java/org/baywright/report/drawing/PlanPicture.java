package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.baywright.design.MemberStatus;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;

/**
 * The drawn content of one level's plan — grid lines and bubbles, dimensions, slab edge, openings, area
 * loads, members banded by their demand/capacity ratio with sizes, ratios and end reactions, columns with
 * marks and sections — as {@link Primitive}s, built once for everything that shows the plan: the printed
 * sheet ({@link SheetBuilder}) and the editor's canvas. Positions are plan metres; every size is "paper"
 * millimetres, which the sheet prints at its scale and the canvas shows at a fixed number of pixels per
 * millimetre. The layout depends on the scale ({@code k}, plan metres per millimetre): labels sit a number
 * of millimetres off their members, so {@link #build(double)} is called again when the scale changes.
 *
 * <p>What differs between the sheet and the screen is a {@link Style}: the lettering height, the
 * reactions shown, the ground colour behind labels, whether labels that do not fit (longer than their
 * member, or over an earlier label) are left out, whether deck spans and line and point loads are drawn
 * (the sheet does not show them yet), and a compact annotation (smaller bubbles, dimension rows closer to
 * the plan) for the screen's narrow margin. The sheet's style draws exactly what the sheet printed before
 * the picture was taken out of {@link SheetBuilder} (its golden file is unchanged).
 *
 * <p>Known limitations: on the screen a label that does not fit is left out, never moved (which label
 * gives way follows the building order: members, loads, dimensions, column marks, tags); tags of openings
 * and area loads avoid labels and member lines, not each other's leaders. {@link #build(double)} is
 * synchronized: one picture lays out one scale at a time.
 */
public final class PlanPicture {
    static final Rgb HATCH_INK = new Rgb(120, 120, 120);
    static final Pen GRID_PEN = Pen.dashed(0.18, Rgb.GREY, 7, 1.2, 1.2, 1.2);
    static final Pen THIN = Pen.solid(0.18, Rgb.INK);
    static final Pen SLAB_PEN = Pen.solid(0.5, Rgb.INK);
    static final Pen OPENING_PEN = Pen.solid(0.35, Rgb.INK);
    static final Pen AREA_LOAD_PEN = Pen.dashed(0.3, Rgb.INK, 3, 1.5);
    static final Hatch OPENING_HATCH = new Hatch(Hatch.Pattern.CROSS, 2.0, Pen.solid(0.13, HATCH_INK));
    static final Hatch AREA_LOAD_HATCH = new Hatch(Hatch.Pattern.BACK_DIAGONAL, 3.5, Pen.solid(0.13, HATCH_INK));
    static final Pen OVER_PEN = Pen.dashed(0.7, Rgb.INK, 2.4, 1.2);
    static final double GIRDER_WEIGHT = 0.5;
    static final double BEAM_WEIGHT = 0.3;
    static final double GIRDER_BAND = 1.1;
    static final double BEAM_BAND = 0.8;
    /** Ink of line loads, point loads and their tags (screen only so far). */
    static final Rgb LOAD_INK = new Rgb(139, 58, 98);
    /** Ink of deck span arrows (screen only so far). */
    static final Rgb DECK_INK = new Rgb(111, 106, 93);

    /**
     * How the picture is lettered and what it shows.
     *
     * @param units unit system of every label
     * @param textSize the lettering height of member sizes, mm (the sheet's {@link Paper#textSize()})
     * @param reactions the end reactions written along members, or null for none
     * @param method the design method of factored reactions (unused otherwise; may then be null)
     * @param ground the colour under the drawing: label knock-outs, bubbles and tag boxes are filled with it
     * @param fitLabels true to leave out member labels longer than their member (the screen at small zoom)
     * @param loadsAndDecks true to draw deck span arrows, line loads and point loads
     * @param compact true for smaller bubbles and dimension rows closer to the plan (the screen, where the
     *     margin around the plan is small)
     */
    public record Style(UnitSystem units, double textSize, ReactionMode reactions, DesignMethod method, Rgb ground,
            boolean fitLabels, boolean loadsAndDecks, boolean compact) {
        public Style {
            if (units == null || ground == null) {
                throw new IllegalArgumentException("a plan picture needs units and a ground colour");
            }
            if (!(textSize > 0)) {
                throw new IllegalArgumentException("text size must be positive");
            }
            if (reactions == ReactionMode.FACTORED && method == null) {
                throw new IllegalArgumentException("factored reactions need a design method");
            }
        }

        /** The printed sheet's: white paper, every label, no deck spans or line and point loads. */
        public static Style sheet(UnitSystem units, double textSize, ReactionMode reactions, DesignMethod method) {
            return new Style(units, textSize, reactions, method, Rgb.WHITE, false, false, false);
        }

        /** The screen's: service reactions when asked for, labels that fit, decks and loads drawn. */
        public static Style screen(UnitSystem units, double textSize, boolean reactions, Rgb ground) {
            return new Style(units, textSize, reactions ? ReactionMode.SERVICE : null, null, ground, true, true, true);
        }
    }

    /** A column drawn at this level: its mark, and the section text under it (null when not designed). */
    record ColumnMark(String id, Point at, String section) {
    }

    private final Plan plan;
    private final Floor floor;
    private final List<MemberResult> members;
    /** Members of a plan that has not been run, drawn as not run. */
    private final List<Member> unrun;
    private final List<ColumnMark> columns;
    private final Style style;
    private final UnitSystem units;
    private final double t;

    private List<Primitive> out;
    /** Boxes already taken by labels, plan metres {minX, minY, maxX, maxY}. */
    private List<double[]> taken;
    /** Member lines already drawn, plan metres {x0, y0, x1, y1, half band width}. */
    private List<double[]> lines;
    /** Plan metres per paper millimetre. */
    private double k;
    private double minX;
    private double minY;
    private double maxX;
    private double maxY;

    PlanPicture(Plan plan, Floor floor, List<MemberResult> members, List<Member> unrun, List<ColumnMark> columns,
            Style style) {
        this.plan = plan;
        this.floor = floor;
        this.members = List.copyOf(members);
        this.unrun = List.copyOf(unrun);
        this.columns = List.copyOf(columns);
        this.style = style;
        this.units = style.units();
        this.t = style.textSize();
        measure();
    }

    /**
     * The picture of a level of a plan with the results of a run when there are any (the editor's: the
     * run may be of an earlier version of the plan while the next one runs). Without results, the plan's
     * members are drawn as not run and its columns by their marks alone. An unknown level draws the grid
     * alone.
     */
    public static PlanPicture forPlan(Plan plan, String levelName, RunResult run, Style style) {
        Optional<Level> level = plan.levels().stream().filter(l -> l.name().equals(levelName)).findFirst();
        boolean results = run != null && run.takedown() != null;
        String floorId = level.map(l -> results ? run.takedown().levelFloors().getOrDefault(l.name(), l.floor()) : l.floor())
                .orElse(null);
        Floor floor = floorId == null ? null : plan.floor(floorId).orElse(null);
        if (floor == null) {
            floor = new Floor("", "", false, null, List.of(), List.of(), List.of(), List.of(), List.of(), List.of(), List.of());
        }
        List<MemberResult> designed = results ? run.takedown().members().getOrDefault(floor.id(), List.of()) : List.of();
        List<Member> bare = results || level.isEmpty() ? List.of() : Framing.members(plan, floor);
        List<ColumnMark> cols;
        if (results && level.isPresent()) {
            cols = columnMarks(plan, run.takedown().columns(), levelName);
        } else {
            List<String> names = plan.levels().stream().map(Level::name).toList();
            int here = names.indexOf(levelName);
            cols = level.isEmpty() ? List.of() : plan.columns().stream().filter(c -> {
                int top = c.topLevel() == null || c.topLevel().isBlank() ? names.size() - 1 : names.indexOf(c.topLevel());
                return top < 0 || here <= top;
            }).map(c -> new ColumnMark(c.id(), c.at(), null)).toList();
        }
        return new PlanPicture(plan, floor, designed, bare, cols, style);
    }

    /** The columns designed at a level, with the section of the tier there. */
    static List<ColumnMark> columnMarks(Plan plan, List<ColumnResult> results, String levelName) {
        List<ColumnMark> here = new ArrayList<>();
        for (ColumnResult c : results) {
            ColumnTier tier = null;
            for (ColumnTier ti : c.tiers()) {
                if (ti.levels().contains(levelName)) {
                    tier = ti;
                    break;
                }
            }
            if (tier == null) {
                continue;
            }
            boolean fixed = plan.columns().stream().filter(pc -> pc.id().equals(c.id())).findFirst()
                    .flatMap(Column::fixedSection).isPresent();
            String section = tier.section().isEmpty() ? "NO SIZE PASSES"
                    : fixed ? "[" + tier.section() + "]" : tier.section();
            if (tier.status() == MemberStatus.OVERSTRESSED && !tier.section().isEmpty()) {
                section += " over";
            }
            here.add(new ColumnMark(c.id(), c.at(), section));
        }
        return here;
    }

    /** The style it is drawn in. */
    public Style style() {
        return style;
    }

    /** [minX, minY, maxX, maxY] of the drawn plan objects (grid, slab, members, openings, loads, columns), m. */
    public double[] extents() {
        return new double[] {minX, minY, maxX, maxY};
    }

    /** Distance from the plan's extents to the outer edge of the grid bubbles, mm. */
    public double annotationMm() {
        return gridExtensionMm() + 2 * bubbleRadiusMm() + (style.compact() ? 0 : 0.5 * t);
    }

    /**
     * The picture at a scale: every primitive, sorted by {@link Layer} (drawing order). Each call lays the
     * labels out afresh.
     *
     * @param metresPerMm plan metres per paper millimetre
     */
    public synchronized List<Primitive> build(double metresPerMm) {
        if (!(metresPerMm > 0) || Double.isInfinite(metresPerMm)) {
            throw new IllegalArgumentException("scale must be positive, got " + metresPerMm);
        }
        k = metresPerMm;
        out = new ArrayList<>();
        taken = new ArrayList<>();
        lines = new ArrayList<>();
        grid();
        slab();
        drawMembers();
        if (style.loadsAndDecks()) {
            decksAndLoads(); // before the columns' marks: on the screen a label that meets an earlier one is left out
        }
        if (style.fitLabels()) {
            dimensions(); // on the screen the dimensions go before the columns' marks, which give way to them
            drawColumns();
        } else {
            drawColumns();
            dimensions();
        }
        openingsAndAreaLoads();
        List<Primitive> sorted = new ArrayList<>(out);
        sorted.sort(Comparator.comparingInt(p -> p.layer().ordinal()));
        out = null;
        taken = null;
        lines = null;
        return List.copyOf(sorted);
    }

    // ---------------------------------------------------------------- extents

    private void measure() {
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
        for (Member m : unrun) {
            include(m.start());
            include(m.end());
        }
        for (Opening o : floor.openings()) {
            o.outline().vertices().forEach(this::include);
        }
        for (AreaLoad a : floor.areaLoads()) {
            a.outline().vertices().forEach(this::include);
        }
        for (ColumnMark c : columns) {
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

    private double gridExtensionMm() {
        return (style.compact() ? 4.2 : 7.4) * t;
    }

    private double bubbleRadiusMm() {
        return (style.compact() ? 1.0 : 1.7) * t;
    }

    /** Distance of the first and second dimension rows from the plan's extents, mm. */
    private double dimensionRowMm(int row) {
        return style.compact() ? (row == 0 ? 2.0 : 3.1) * t : (row == 0 ? 3.2 : 6.0) * t;
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
                out.add(new Primitive.Circle(Layer.GRID, Space.PLAN, c, r, Pen.solid(0.35, Rgb.INK), style.ground()));
                taken.add(new double[] {c.x() - r * k, c.y() - r * k, c.x() + r * k, c.y() + r * k});
                out.add(new Primitive.Text(Layer.GRID, Space.PLAN, c, g.label(), fitBubble(g.label(), (style.compact() ? 0.95 : 1.3) * t, r), 0,
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
            dimensionRow(xs, maxY + dimensionRowMm(0) * k, true);
            if (xs.size() >= 3) {
                dimensionRow(List.of(xs.get(0), xs.get(xs.size() - 1)), maxY + dimensionRowMm(1) * k, true);
            }
        }
        if (ys.size() >= 2) {
            dimensionRow(ys, minX - dimensionRowMm(0) * k, false);
            if (ys.size() >= 3) {
                dimensionRow(List.of(ys.get(0), ys.get(ys.size() - 1)), minX - dimensionRowMm(1) * k, false);
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
            if (style.fitLabels() && TextMetrics.width(text, 0.9 * t, false) * k > stations.get(i + 1) - stations.get(i)) {
                continue;
            }
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
        return loadText(v, units.areaLoad(), this::areaLoadNumber);
    }

    private static String loadText(LoadValues v, Unit unit, java.util.function.DoubleFunction<String> number) {
        List<String> parts = new ArrayList<>();
        String[] names = {"D", "SD", "L", "Lr", "S", "partitions"};
        double[] vals = {v.dead(), v.superimposed(), v.live(), v.roofLive(), v.snow(), v.partition()};
        for (int i = 0; i < names.length; i++) {
            if (Math.abs(vals[i]) > 1e-9) {
                parts.add(names[i] + " " + number.apply(vals[i]));
            }
        }
        return parts.isEmpty() ? "no load" : String.join(", ", parts) + " " + unit.symbol();
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
        // only labels and lines near the polygon can meet a candidate box or leader: count against those
        double mx = bw + 4 * k;
        double my = bh + 4 * k;
        double[] near = {box[0] - mx, box[1] - my, box[2] + mx, box[3] + my};
        List<double[]> nearTaken = new ArrayList<>();
        for (double[] o : taken) {
            if (o[0] <= near[2] && near[0] <= o[2] && o[1] <= near[3] && near[1] <= o[3]) {
                nearTaken.add(o);
            }
        }
        List<double[]> nearLines = new ArrayList<>();
        for (double[] l : lines) {
            if (segmentMeetsBox(l[0], l[1], l[2], l[3], new double[] {near[0] - l[4], near[1] - l[4], near[2] + l[4],
                near[3] + l[4]})) {
                nearLines.add(l);
            }
        }
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
                if (overlaps(new double[] {c.x() - k, c.y() - k, c.x() + k, c.y() + k}, nearTaken, nearLines) == 0) {
                    targets.add(c);
                }
                double[] r = {c.x() - bw / 2, c.y() - bh / 2, c.x() + bw / 2, c.y() + bh / 2};
                boolean inside = contains(poly, new Pt(r[0], r[1])) && contains(poly, new Pt(r[2], r[1]))
                        && contains(poly, new Pt(r[0], r[3])) && contains(poly, new Pt(r[2], r[3]));
                int hits = overlaps(r, nearTaken, nearLines);
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
                Pt target = null;
                double closest = Double.POSITIVE_INFINITY;
                for (Pt q : targets) {
                    double d = StrictMath.hypot(q.x() - c.x(), q.y() - c.y());
                    if (d < closest) {
                        closest = d;
                        target = q;
                    }
                }
                Pt from = boxExit(c, bw, bh, target);
                double score = 3 + 10 * overlaps(r, nearTaken, nearLines) + 4 * crossings(from, target, nearLines)
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
                new Pt(r[0], r[3])), true, THIN, style.ground(), null));
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
    private static int crossings(Pt a, Pt b, List<double[]> lines) {
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
    private static int overlaps(double[] r, List<double[]> taken, List<double[]> lines) {
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
        return poly.contains(p.x(), p.y());
    }

    private static List<Pt> pts(Polygon p) {
        return p.vertices().stream().map(v -> new Pt(v.x(), v.y())).toList();
    }

    // ---------------------------------------------------------------- members

    private void drawMembers() {
        for (MemberResult m : members) {
            member(m);
        }
        for (Member m : unrun) {
            Pt a = new Pt(m.start().x(), m.start().y());
            Pt b = new Pt(m.end().x(), m.end().y());
            double weight = m.kind() == MemberKind.GIRDER ? GIRDER_WEIGHT : BEAM_WEIGHT;
            out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, a, b, Pen.dashed(weight, Rgb.INK, 4, 1, 0.8, 1)));
            lines.add(new double[] {a.x(), a.y(), b.x(), b.y(), weight / 2 * k});
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
        // an overhanging member: its reactions are at its supports, and the overhang is marked
        Pt s0 = r0;
        Pt s1 = r1;
        if (m.overhangs()) {
            double fa = m.loads().supportA() / len;
            double fb = m.loads().supportB() / len;
            Pt pa = new Pt(a.x() + dx * fa, a.y() + dy * fa);
            Pt pb = new Pt(a.x() + dx * fb, a.y() + dy * fb);
            s0 = flip ? pb : pa;
            s1 = flip ? pa : pb;
            overhangMarks(m, a, b, pa, pb, dx / len, dy / len);
        }

        // labels: size above (on the left of the reading direction), ratio and reactions below
        double lenMm = len / k;
        // clear of the band, and of the dashed outline of an overstressed member
        double offMm = half + 0.45 * t + (status == MemberStatus.OVERSTRESSED ? 0.45 : 0);
        Pt mid = new Pt((a.x() + b.x()) / 2, (a.y() + b.y()) / 2);
        String sizeText = sizeLabel(m);
        Pt above = new Pt(mid.x() + nx * offMm * k, mid.y() + ny * offMm * k);
        double sizeW = TextMetrics.width(sizeText, t, false);
        boolean fits = !style.fitLabels() || sizeW + t <= lenMm;
        if (!fits && m.isComposite()) {
            // on the screen at small zoom: the size alone where its studs and camber do not fit
            sizeText = bareSizeLabel(m);
            sizeW = TextMetrics.width(sizeText, t, false);
            fits = sizeW + t <= lenMm;
        }
        if (fits) {
            fits = label(above, sizeText, t, rot, Anchor.MIDDLE_BASELINE);
        }

        double small = 0.8 * t;
        double endMm = 1.5 * t;
        String ratio = sized && Double.isFinite(m.maxRatio()) ? ratioText(m.maxRatio()) : null;
        String[] reactions = sized && style.reactions() != null ? reactionTexts(flip ? m.endReaction() : m.startReaction(),
                flip ? m.startReaction() : m.endReaction()) : null;
        Pt below = new Pt(mid.x() - nx * offMm * k, mid.y() - ny * offMm * k);
        double gap = 0.8 * t;
        double ratioW = ratio == null ? 0 : TextMetrics.width(ratio, small, false);
        double reactW = reactions == null ? 0
                : TextMetrics.width(reactions[0], small, false) + TextMetrics.width(reactions[1], small, false);
        if (style.fitLabels() && reactions != null && reactW + 2 * endMm + gap > lenMm) {
            reactions = null;
            reactW = 0;
        }
        boolean ratioBelow = ratio != null && reactW + ratioW + 2 * endMm + 2 * gap <= lenMm;
        if (ratio != null) {
            if (ratioBelow) {
                label(below, ratio, small, rot, Anchor.MIDDLE_TOP);
            } else if (!style.fitLabels() || fits && sizeW + 1.2 * t + 2 * ratioW + t <= lenMm) {
                double shift = (sizeW / 2 + 0.6 * t) * k;
                label(new Pt(above.x() + ux * shift, above.y() + uy * shift), ratio, small, rot, Anchor.START_BASELINE);
            }
        }
        if (reactions != null) {
            double e = endMm * k;
            label(new Pt(s0.x() + ux * e - nx * offMm * k, s0.y() + uy * e - ny * offMm * k), reactions[0], small, rot,
                    Anchor.START_TOP);
            label(new Pt(s1.x() - ux * e - nx * offMm * k, s1.y() - uy * e - ny * offMm * k), reactions[1], small, rot,
                    Anchor.END_TOP);
        }
    }

    /**
     * The marks of a member overhanging a support (our own symbol): a small filled wedge under the member
     * at the support it passes over, its point on the member, and a bar across each free end.
     */
    private void overhangMarks(MemberResult m, Pt a, Pt b, Pt pa, Pt pb, double ux, double uy) {
        double len = m.length();
        double h = 0.9 * t * k;
        Pen pen = Pen.solid(0.35, Rgb.INK);
        double nx = -uy;
        double ny = ux;
        // the support passed over: a at the start overhang's end, b at the end overhang's start
        List<Pt> passed = new ArrayList<>();
        if (m.loads().supportA() > 0) {
            passed.add(pa);
        }
        if (m.loads().supportB() < len) {
            passed.add(pb);
        }
        for (Pt p : passed) {
            out.add(new Primitive.Path(Layer.MEMBERS, Space.PLAN, List.of(p, new Pt(p.x() - nx * h + ux * h * 0.6,
                    p.y() - ny * h + uy * h * 0.6), new Pt(p.x() - nx * h - ux * h * 0.6, p.y() - ny * h - uy * h * 0.6)), true,
                    pen, Rgb.INK, null));
        }
        double bar = 0.8 * t * k;
        if (m.loads().supportA() > 0) {
            out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, a.plus(-nx * bar, -ny * bar), a.plus(nx * bar, ny * bar), pen));
        }
        if (m.loads().supportB() < len) {
            out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, b.plus(-nx * bar, -ny * bar), b.plus(nx * bar, ny * bar), pen));
        }
    }

    private void cross(Pt p) {
        double c = 0.6 * t * k;
        Pen pen = Pen.solid(0.35, Rgb.INK);
        out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, p.plus(-c, -c), p.plus(c, c), pen));
        out.add(new Primitive.Line(Layer.MEMBERS, Space.PLAN, p.plus(-c, c), p.plus(c, -c), pen));
    }

    /** A label on the plan, on a knock-out of the ground colour so that grid lines and hatching do not run through it. */
    private boolean label(Pt at, String text, double size, double rot, Anchor anchor) {
        return label(Layer.MEMBER_LABELS, at, text, size, rot, anchor, false);
    }

    private boolean label(Layer layer, Pt at, String text, double size, double rot, Anchor anchor, boolean bold) {
        return label(layer, at, text, size, rot, anchor, bold, Rgb.INK);
    }

    /** Places a label; with {@link Style#fitLabels()} one that would cover an earlier label is left out (returns false). */
    private boolean label(Layer layer, Pt at, String text, double size, double rot, Anchor anchor, boolean bold, Rgb ink) {
        List<Pt> box = textOutline(at, text, size, rot, anchor, bold, 0.1 * t);
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Pt p : box) {
            b[0] = Math.min(b[0], p.x());
            b[1] = Math.min(b[1], p.y());
            b[2] = Math.max(b[2], p.x());
            b[3] = Math.max(b[3], p.y());
        }
        if (style.fitLabels()) {
            for (double[] o : taken) {
                if (b[0] < o[2] && o[0] < b[2] && b[1] < o[3] && o[1] < b[3]) {
                    return false;
                }
            }
        }
        out.add(new Primitive.Path(layer, Space.PLAN, box, true, null, style.ground(), null));
        out.add(new Primitive.Text(layer, Space.PLAN, at, text, size, rot, anchor, ink, bold));
        taken.add(b);
        return true;
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

    /**
     * The size as written along a member: W21X44, [W21X44] when fixed in the plan; a composite member
     * adds its studs and camber ({@link MemberLabels}): W16X26 (16) c=3/4".
     */
    String sizeLabel(MemberResult m) {
        String size = bareSizeLabel(m);
        return m.isComposite() && m.design() != null && m.design().section() != null
                ? MemberLabels.size(size, m.studs(), m.camber(), units) : size;
    }

    private String bareSizeLabel(MemberResult m) {
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

    /** A ratio as written below a member: 0.87, or 1.12 over. */
    public static String ratioText(double ratio) {
        String r = String.format(Locale.ROOT, "%.2f", ratio);
        return !org.baywright.design.Check.passes(ratio) ? r + " over" : r;
    }

    /** The colour of a demand/capacity ratio: cividis over 0–1, the top colour beyond. */
    public static Rgb ratioColour(double ratio) {
        return Cividis.at(Math.max(0, Math.min(1, ratio)));
    }

    /** The texts of the reactions at the reading start and end. */
    String[] reactionTexts(double[] start, double[] end) {
        double[] s = Component.byCase(start);
        double[] e = Component.byCase(end);
        if (style.reactions() == ReactionMode.FACTORED) {
            Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
            for (LoadCase c : LoadCase.values()) {
                if (Math.abs(s[c.ordinal()]) > 1e-6 || Math.abs(e[c.ordinal()]) > 1e-6) {
                    present.add(c);
                }
            }
            List<LoadCombination> combos = Combinations.gravity(style.method(), present);
            return new String[] {"R=" + forceText(SheetBuilder.governing(s, combos)) + forceSuffix(),
                "R=" + forceText(SheetBuilder.governing(e, combos)) + forceSuffix()};
        }
        return new String[] {serviceText(s), serviceText(e)};
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

    /** A force in a tag: the reports' one rule ({@link UnitSystem#forceNumber}). */
    private String forceText(double newtons) {
        return units.forceNumber(newtons);
    }

    private String forceSuffix() {
        return units == UnitSystem.SI ? "kN" : "k";
    }

    // ---------------------------------------------------------------- columns

    private void drawColumns() {
        double side = 1.3 * t;
        double hs = side / 2 * k;
        for (ColumnMark c : columns) {
            Pt p = new Pt(c.at().x(), c.at().y());
            out.add(new Primitive.Path(Layer.COLUMNS, Space.PLAN, List.of(p.plus(-hs, -hs), p.plus(hs, -hs), p.plus(hs, hs),
                    p.plus(-hs, hs)), true, null, Rgb.INK, null));
            taken.add(new double[] {p.x() - hs, p.y() - hs, p.x() + hs, p.y() + hs});
            double small = 0.8 * t;
            double gx = (side / 2 + 0.35 * t) * k;
            Pt low = new Pt(p.x() - gx, p.y() + gx);
            Pt high = new Pt(low.x(), low.y() + 1.3 * small * k);
            if (c.section() != null) {
                label(Layer.MEMBER_LABELS, low, c.section(), small, 0, Anchor.END_BASELINE, false);
            }
            label(Layer.MEMBER_LABELS, c.section() != null ? high : low, c.id(), small, 0, Anchor.END_BASELINE, true);
        }
    }

    // ---------------------------------------------------------------- decks, line and point loads

    private void decksAndLoads() {
        for (Deck d : floor.decks()) {
            if (d.outline().vertices().size() < 3) {
                continue;
            }
            double[] box = bbox(d.outline());
            Pt c = new Pt((box[0] + box[2]) / 2, (box[1] + box[3]) / 2 - 2.2 * t * k);
            double a = StrictMath.toRadians(d.spanAngle());
            double r = 2.6 * t * k;
            Pt p0 = new Pt(c.x() - StrictMath.cos(a) * r, c.y() - StrictMath.sin(a) * r);
            Pt p1 = new Pt(c.x() + StrictMath.cos(a) * r, c.y() + StrictMath.sin(a) * r);
            Pen pen = Pen.solid(0.4, DECK_INK);
            out.add(new Primitive.Line(Layer.DECKS, Space.PLAN, p0, p1, pen));
            arrowHead(p1, StrictMath.cos(a), StrictMath.sin(a), pen);
            arrowHead(p0, -StrictMath.cos(a), -StrictMath.sin(a), pen);
            label(Layer.DECKS, new Pt(c.x(), c.y() - 1.6 * t * k), d.id() + " span", 0.8 * t, 0, Anchor.MIDDLE_TOP, false,
                    DECK_INK);
        }
        for (LineLoad l : floor.lineLoads()) {
            List<Pt> path = l.path().stream().map(q -> new Pt(q.x(), q.y())).toList();
            if (path.size() >= 2) {
                out.add(new Primitive.Path(Layer.LOADS, Space.PLAN, path, false, Pen.dashed(0.55, LOAD_INK, 0.5, 0.75), null,
                        null));
            }
            Pt q = path.get(0);
            label(Layer.LOADS, new Pt(q.x() + 0.6 * t * k, q.y() + 0.6 * t * k), l.id() + " "
                    + loadText(l.values(), units.lineLoad(), v -> number(units.lineLoad().fromSi(v))), 0.8 * t, 0,
                    Anchor.START_BASELINE, false, LOAD_INK);
        }
        for (PointLoadItem q : floor.pointLoads()) {
            Pt p = new Pt(q.at().x(), q.at().y());
            double r = 0.7 * t;
            Pen pen = Pen.solid(0.45, LOAD_INK);
            out.add(new Primitive.Circle(Layer.LOADS, Space.PLAN, p, r, pen, null));
            double c = 0.5 * t * k;
            out.add(new Primitive.Line(Layer.LOADS, Space.PLAN, p.plus(-c, -c), p.plus(c, c), pen));
            out.add(new Primitive.Line(Layer.LOADS, Space.PLAN, p.plus(-c, c), p.plus(c, -c), pen));
            label(Layer.LOADS, new Pt(p.x() + 1.0 * t * k, p.y() + 0.8 * t * k), q.id() + " "
                    + loadText(q.values(), units.force(), v -> number(units.force().fromSi(v))), 0.8 * t, 0,
                    Anchor.START_BASELINE, false, LOAD_INK);
        }
    }

    private static String number(double v) {
        return Math.abs(v) >= 10 ? String.format(Locale.ROOT, "%.1f", v) : String.format(Locale.ROOT, "%.2f", v);
    }

    private void arrowHead(Pt tip, double ux, double uy, Pen pen) {
        double s = 0.7 * t * k;
        double px = -uy;
        double py = ux;
        out.add(new Primitive.Line(Layer.DECKS, Space.PLAN, tip, new Pt(tip.x() - ux * s + px * s * 0.55,
                tip.y() - uy * s + py * s * 0.55), pen));
        out.add(new Primitive.Line(Layer.DECKS, Space.PLAN, tip, new Pt(tip.x() - ux * s - px * s * 0.55,
                tip.y() - uy * s - py * s * 0.55), pen));
    }
}
