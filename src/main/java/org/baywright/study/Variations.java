package org.baywright.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.UnaryOperator;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.plan.Slab;

/**
 * The variations a study applies, each a pure function from a plan to a new plan. They work on any
 * plan, regular or not; a variation that does not fit the plan (three bay widths for a plan of four
 * bays) throws {@link IllegalArgumentException} with a one-line message.
 */
public final class Variations {
    private Variations() {
    }

    /** Tolerance for "lies on a grid line" and equal offsets, m. */
    static final double TOL = 1e-6;

    /** Applies one setting. */
    public static Plan apply(Plan plan, Setting s) {
        return switch (s.parameter()) {
            case BAY_X -> bays(plan, GridLine.Axis.X, s.numbers());
            case BAY_Y -> bays(plan, GridLine.Axis.Y, s.numbers());
            case BEAM_SPACING -> beamSpacing(plan, s.number());
            case BEAM_COUNT -> beamCount(plan, (int) Math.round(s.number()));
            case BEAM_DIRECTION -> beamDirection(plan, s.texts().get(0).equals("x") ? GridLine.Axis.X : GridLine.Axis.Y);
            case METHOD -> method(plan, s.texts().get(0));
            case MAX_DEPTH -> maxDepth(plan, s.number());
            case COLUMN_SERIES -> columnSeries(plan, s.texts());
            case COMPOSITE -> composite(plan, s.texts().get(0).equals("on"));
            case TOPPING -> slabs(plan, "topping", sl -> sl.withTopping(s.number()));
            case CONCRETE -> slabs(plan, "concrete", sl -> sl.withDensity(s.number()));
        };
    }

    /** Applies settings in order. */
    public static Plan apply(Plan plan, List<Setting> settings) {
        Plan p = plan;
        for (Setting s : settings) {
            p = apply(p, s);
        }
        return p;
    }

    /**
     * Sets the bay widths along one axis, moving its grid lines (the first line stays put). Every plan
     * coordinate along that axis is mapped piecewise-linearly between the old and the new grid offsets;
     * beyond the outer lines it moves with the outer line.
     *
     * @param widths one width for every bay, or one per bay (west to east, south to north)
     */
    public static Plan bays(Plan plan, GridLine.Axis axis, List<Double> widths) {
        double[] old = plan.grid().stream().filter(g -> g.axis() == axis).mapToDouble(GridLine::offset).sorted().toArray();
        double[] distinct = distinct(old);
        String key = axis == GridLine.Axis.X ? "bay-x" : "bay-y";
        int bays = distinct.length - 1;
        if (bays < 1) {
            throw new IllegalArgumentException(key + ": the plan has fewer than two grid lines along "
                    + axis.name().toLowerCase(java.util.Locale.ROOT));
        }
        if (widths.size() != 1 && widths.size() != bays) {
            throw new IllegalArgumentException(key + ": " + widths.size() + " bay widths given but the plan has " + bays
                    + " bays along " + axis.name().toLowerCase(java.util.Locale.ROOT) + "; give one width or " + bays);
        }
        double[] now = new double[distinct.length];
        now[0] = distinct[0];
        for (int i = 1; i < now.length; i++) {
            double w = widths.size() == 1 ? widths.get(0) : widths.get(i - 1);
            if (!(w > 0)) {
                throw new IllegalArgumentException(key + ": bay widths must be greater than zero");
            }
            now[i] = now[i - 1] + w;
        }
        Mapping m = new Mapping(distinct, now);
        UnaryOperator<Point> f = axis == GridLine.Axis.X ? p -> new Point(m.map(p.x()), p.y()) : p -> new Point(p.x(), m.map(p.y()));
        List<GridLine> grid = plan.grid().stream()
                .map(g -> g.axis() == axis ? new GridLine(g.label(), g.axis(), m.map(g.offset())) : g).toList();
        List<Column> columns = plan.columns().stream()
                .map(c -> new Column(c.id(), f.apply(c.at()), c.grid(), c.topLevel(), c.fixedSection())).toList();
        List<Floor> floors = plan.floors().stream().map(fl -> mapFloor(fl, f)).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), grid, plan.levels(), floors, columns, plan.notes());
    }

    private static double[] distinct(double[] sorted) {
        double[] out = new double[sorted.length];
        int n = 0;
        for (double v : sorted) {
            if (n == 0 || v - out[n - 1] > TOL) {
                out[n++] = v;
            }
        }
        return Arrays.copyOf(out, n);
    }

    /** Piecewise-linear map from old grid offsets to new ones, shifted with the outer lines beyond them. */
    record Mapping(double[] from, double[] to) {
        double map(double v) {
            int n = from.length;
            if (v <= from[0]) {
                return v + (to[0] - from[0]);
            }
            if (v >= from[n - 1]) {
                return v + (to[n - 1] - from[n - 1]);
            }
            int i = Arrays.binarySearch(from, v);
            if (i >= 0) {
                return to[i];
            }
            int hi = -i - 1;
            int lo = hi - 1;
            // lines closer than TOL count as one: snap to it
            if (Math.abs(v - from[lo]) <= TOL) {
                return to[lo] + (v - from[lo]);
            }
            if (Math.abs(v - from[hi]) <= TOL) {
                return to[hi] + (v - from[hi]);
            }
            return to[lo] + (v - from[lo]) * (to[hi] - to[lo]) / (from[hi] - from[lo]);
        }
    }

    private static Floor mapFloor(Floor fl, UnaryOperator<Point> f) {
        List<Deck> decks = fl.decks().stream().map(d -> new Deck(d.id(), poly(d.outline(), f), d.spanAngle(), d.maxSpan(), d.maxOverhang(), d.slab())).toList();
        List<Member> members = fl.members().stream()
                .map(mb -> new Member(mb.id(), mb.kind(), f.apply(mb.start()), f.apply(mb.end()), mb.fixedSection(), mb.composite(), mb.fixedStuds())).toList();
        List<Opening> openings = fl.openings().stream().map(o -> new Opening(o.id(), poly(o.outline(), f))).toList();
        List<AreaLoad> areas = fl.areaLoads().stream()
                .map(a -> new AreaLoad(a.id(), poly(a.outline(), f), a.values(), a.use())).toList();
        List<LineLoad> lines = fl.lineLoads().stream()
                .map(l -> new LineLoad(l.id(), l.path().stream().map(f).toList(), l.values())).toList();
        List<PointLoadItem> points = fl.pointLoads().stream()
                .map(p -> new PointLoadItem(p.id(), f.apply(p.at()), p.values())).toList();
        return new Floor(fl.id(), fl.name(), fl.roof(), poly(fl.slabEdge(), f), decks, members, fl.infills(), openings, areas,
                lines, points, fl.composite());
    }

    private static Polygon poly(Polygon p, UnaryOperator<Point> f) {
        return new Polygon(p.vertices().stream().map(f).toList());
    }

    /** Every infill spaced at most {@code spacing} apart (its count cleared). */
    public static Plan beamSpacing(Plan plan, double spacing) {
        if (!(spacing > 0)) {
            throw new IllegalArgumentException("beam-spacing must be greater than zero");
        }
        return mapInfills(plan, i -> new Infill(i.id(), i.x0(), i.x1(), i.y0(), i.y1(), i.direction(), 0, spacing));
    }

    /** Every infill with {@code count} beams. */
    public static Plan beamCount(Plan plan, int count) {
        if (count < 1) {
            throw new IllegalArgumentException("beam-count must be at least 1");
        }
        return mapInfills(plan, i -> new Infill(i.id(), i.x0(), i.x1(), i.y0(), i.y1(), i.direction(), count, i.maxSpacing()));
    }

    private static Plan mapInfills(Plan plan, UnaryOperator<Infill> f) {
        List<Floor> floors = plan.floors().stream().map(fl -> new Floor(fl.id(), fl.name(), fl.roof(), fl.slabEdge(), fl.decks(),
                fl.members(), fl.infills().stream().map(f).toList(), fl.openings(), fl.areaLoads(), fl.lineLoads(),
                fl.pointLoads(), fl.composite())).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(), plan.notes());
    }

    /** The deck span angle that spans onto beams running in {@code direction}: 0 onto north–south beams. */
    static double deckAngleOnto(GridLine.Axis direction) {
        return direction == GridLine.Axis.Y ? 0 : 90;
    }

    /** Two span angles closer than this (degrees) are one direction: far below the editor's 5° steps. */
    private static final double SAME_DIRECTION = 1e-6;

    private static boolean sameLine(double a, double b) {
        double d = ((a - b) % 180 + 180) % 180;
        return d < SAME_DIRECTION || 180 - d < SAME_DIRECTION;
    }

    /**
     * Every infill spans in {@code direction}. On each floor, a deck that spanned onto the old infill
     * beams (its angle spans onto them and it covers an infilled bay) is turned to span onto the new ones;
     * a deck at any other angle, or outside every infilled bay (a balcony spanning between its own
     * cantilevered beams), keeps its angle; on a floor without infills every deck is turned. Members
     * lying on a grid line become girders when perpendicular to the new beams and beams when parallel.
     */
    public static Plan beamDirection(Plan plan, GridLine.Axis direction) {
        List<Double> xs = plan.grid().stream().filter(g -> g.axis() == GridLine.Axis.X).map(GridLine::offset).toList();
        List<Double> ys = plan.grid().stream().filter(g -> g.axis() == GridLine.Axis.Y).map(GridLine::offset).toList();
        List<Floor> floors = new ArrayList<>();
        for (Floor fl : plan.floors()) {
            List<GridLine.Axis> old = fl.infills().stream().map(Infill::direction).distinct().toList();
            List<Point> bayCentres = fl.infills().stream().map(i -> bayCentre(plan, i)).filter(java.util.Objects::nonNull).toList();
            List<Deck> decks = fl.decks().stream().map(d -> {
                boolean turn = old.isEmpty() || old.stream().anyMatch(a -> sameLine(d.spanAngle(), deckAngleOnto(a)))
                        && bayCentres.stream().anyMatch(c -> d.outline().contains(c.x(), c.y()));
                return turn ? new Deck(d.id(), d.outline(), deckAngleOnto(direction), d.maxSpan(), d.maxOverhang(), d.slab()) : d;
            }).toList();
            List<Member> members = fl.members().stream().map(m -> {
                boolean northSouth = Math.abs(m.start().x() - m.end().x()) <= TOL && onAny(m.start().x(), xs);
                boolean eastWest = Math.abs(m.start().y() - m.end().y()) <= TOL && onAny(m.start().y(), ys);
                MemberKind k = m.kind();
                if (northSouth && !eastWest) {
                    k = direction == GridLine.Axis.X ? MemberKind.GIRDER : MemberKind.BEAM;
                } else if (eastWest && !northSouth) {
                    k = direction == GridLine.Axis.Y ? MemberKind.GIRDER : MemberKind.BEAM;
                }
                return k == m.kind() ? m : new Member(m.id(), k, m.start(), m.end(), m.fixedSection(), m.composite(), m.fixedStuds());
            }).toList();
            List<Infill> infills = fl.infills().stream()
                    .map(i -> new Infill(i.id(), i.x0(), i.x1(), i.y0(), i.y1(), direction, i.count(), i.maxSpacing())).toList();
            floors.add(new Floor(fl.id(), fl.name(), fl.roof(), fl.slabEdge(), decks, members, infills, fl.openings(),
                    fl.areaLoads(), fl.lineLoads(), fl.pointLoads(), fl.composite()));
        }
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(), plan.notes());
    }

    /** The centre of an infill's bay, or null when a grid line is unknown. */
    private static Point bayCentre(Plan plan, Infill i) {
        var x0 = plan.gridLine(i.x0());
        var x1 = plan.gridLine(i.x1());
        var y0 = plan.gridLine(i.y0());
        var y1 = plan.gridLine(i.y1());
        if (x0.isEmpty() || x1.isEmpty() || y0.isEmpty() || y1.isEmpty()) {
            return null;
        }
        return new Point((x0.get().offset() + x1.get().offset()) / 2, (y0.get().offset() + y1.get().offset()) / 2);
    }

    private static boolean onAny(double v, List<Double> offsets) {
        for (double o : offsets) {
            if (Math.abs(v - o) <= TOL) {
                return true;
            }
        }
        return false;
    }

    /** The design method, "lrfd" or "asd". */
    public static Plan method(Plan plan, String method) {
        return withSettings(plan, plan.settings().withMethod(method));
    }

    /** The actual-depth limit of beams and girders, m (0 = none). */
    public static Plan maxDepth(Plan plan, double depth) {
        return withSettings(plan, plan.settings().withMaxBeamDepth(depth));
    }

    /** The column series allowed. */
    public static Plan columnSeries(Plan plan, List<String> series) {
        return withSettings(plan, plan.settings().withColumnSeries(series));
    }

    /**
     * Composite action on or off: every floor layout whose decks carry a slab becomes composite (its
     * members' own choices apply as on a composite floor) or non-composite (bare steel); shoring and the
     * construction live load are kept. A plan with no slab described cannot vary it.
     */
    public static Plan composite(Plan plan, boolean on) {
        requireSlab(plan, "composite");
        List<Floor> floors = plan.floors().stream().map(f -> !f.hasSlab() ? f
                : f.withComposite(f.composite().withMode(on ? CompositeMode.COMPOSITE : CompositeMode.NON_COMPOSITE))).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(), plan.notes());
    }

    /** Every slab of the plan changed by {@code f} (decks without a slab are left alone). */
    static Plan slabs(Plan plan, String key, UnaryOperator<Slab> f) {
        requireSlab(plan, key);
        List<Floor> floors = plan.floors().stream().map(fl -> !fl.hasSlab() ? fl
                : fl.withDecks(fl.decks().stream().map(d -> d.slab() == null ? d : d.withSlab(f.apply(d.slab()))).toList())).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(), plan.notes());
    }

    private static void requireSlab(Plan plan, String key) {
        if (plan.floors().stream().noneMatch(Floor::hasSlab)) {
            throw new IllegalArgumentException(key + ": no deck of the plan carries a slab; describe one first"
                    + " (editor: Deck tool, then Properties)");
        }
    }

    private static Plan withSettings(Plan plan, DesignSettings s) {
        return new Plan(plan.name(), plan.units(), s, plan.grid(), plan.levels(), plan.floors(), plan.columns(), plan.notes());
    }
}
