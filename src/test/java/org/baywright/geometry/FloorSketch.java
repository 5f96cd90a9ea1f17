package org.baywright.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;

/** A small mutable builder of test floors; coordinates are given in a unit (feet or metres) and stored in metres. */
final class FloorSketch {
    /** 1 ft = 0.3048 m exactly (international foot). */
    static final double FT = 0.3048;

    private final double unit;
    private Polygon slab;
    private final List<Deck> decks = new ArrayList<>();
    private final List<Member> members = new ArrayList<>();
    private final List<Opening> openings = new ArrayList<>();
    private final List<AreaLoad> areaLoads = new ArrayList<>();
    private final List<LineLoad> lineLoads = new ArrayList<>();
    private final List<PointLoadItem> pointLoads = new ArrayList<>();

    private FloorSketch(double unit) {
        this.unit = unit;
    }

    static FloorSketch inFeet() {
        return new FloorSketch(FT);
    }

    static FloorSketch inMetres() {
        return new FloorSketch(1.0);
    }

    Point p(double x, double y) {
        return new Point(x * unit, y * unit);
    }

    /** A polygon from x, y pairs. */
    Polygon poly(double... xy) {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i + 1 < xy.length; i += 2) {
            pts.add(p(xy[i], xy[i + 1]));
        }
        return new Polygon(pts);
    }

    Polygon rect(double x0, double y0, double x1, double y1) {
        return poly(x0, y0, x1, y0, x1, y1, x0, y1);
    }

    FloorSketch slab(Polygon p) {
        slab = p;
        return this;
    }

    FloorSketch deck(String id, Polygon outline, double spanAngle) {
        decks.add(new Deck(id, outline, spanAngle));
        return this;
    }

    FloorSketch girder(String id, double x0, double y0, double x1, double y1) {
        members.add(new Member(id, MemberKind.GIRDER, p(x0, y0), p(x1, y1), Optional.empty()));
        return this;
    }

    FloorSketch beam(String id, double x0, double y0, double x1, double y1) {
        members.add(new Member(id, MemberKind.BEAM, p(x0, y0), p(x1, y1), Optional.empty()));
        return this;
    }

    FloorSketch opening(String id, Polygon outline) {
        openings.add(new Opening(id, outline));
        return this;
    }

    FloorSketch areaLoad(String id, Polygon outline) {
        areaLoads.add(new AreaLoad(id, outline, new LoadValues(0, 0, 2400, 0, 0, 0), LiveLoadUse.ORDINARY));
        return this;
    }

    FloorSketch lineLoad(String id, double... xy) {
        List<Point> pts = new ArrayList<>();
        for (int i = 0; i + 1 < xy.length; i += 2) {
            pts.add(p(xy[i], xy[i + 1]));
        }
        lineLoads.add(new LineLoad(id, pts, new LoadValues(1000, 0, 0, 0, 0, 0)));
        return this;
    }

    FloorSketch pointLoad(String id, double x, double y) {
        pointLoads.add(new PointLoadItem(id, p(x, y), new LoadValues(1000, 0, 0, 0, 0, 0)));
        return this;
    }

    List<Member> members() {
        return List.copyOf(members);
    }

    Floor floor() {
        return new Floor("F1", "test floor", false, slab, decks, members, List.of(), openings, areaLoads, lineLoads,
                pointLoads);
    }

    FloorTributary compute() {
        return TributaryAnalysis.compute(floor(), members, 1e-6);
    }

    /** A regular bay: girders along y = 0 and y = depth (parallel to a span along x), beams at the given x. */
    static FloorSketch bay(double width, double depth, double... beamXs) {
        FloorSketch s = inFeet();
        s.slab(s.rect(0, 0, width, depth));
        s.girder("G-S", 0, 0, width, 0);
        s.girder("G-N", 0, depth, width, depth);
        for (double x : beamXs) {
            s.beam("B-" + fmt(x), x, 0, x, depth);
        }
        return s;
    }

    static String fmt(double x) {
        return x == Math.rint(x) ? Long.toString((long) x) : Double.toString(x);
    }

    static double[] range(double from, double to, double step) {
        int n = (int) Math.round((to - from) / step) + 1;
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = from + i * step;
        }
        return Arrays.copyOf(out, n);
    }
}
