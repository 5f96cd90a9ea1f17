package org.baywright.geometry;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;

/**
 * Where point and line loads go: straight to a member they lie on, otherwise through the deck by the
 * lever rule along its span between the two supports on either side (all to the outer support on an
 * overhang).
 *
 * <p>Line loads are cut wherever the supports on either side may change: at the strip lines of the
 * deck decomposition and where the path crosses a deck edge or a supporting member. Between two cuts
 * the two supports are fixed; when they are parallel the lever fractions are linear along the path
 * and the shares exact, otherwise the piece is halved until linear interpolation of the fraction is
 * within 1e-6 (at most 2^10 parts). The fractions of the two supports always add up to one, so the
 * total delivered equals the total applied whatever the subdivision.
 */
final class LoadPlacement {
    private static final double FRACTION_ACCURACY = 1e-6;
    private static final int MAX_HALVINGS = 10;

    private final List<PlacedMember> members;
    private final List<DeckContext> decks;
    private final double tol;
    private final List<GeometryProblem> problems;
    /** The plan's unit system: lengths in problems are written in it. */
    private final org.baywright.units.UnitSystem units;

    LoadPlacement(List<PlacedMember> members, List<DeckContext> decks, double tol, List<GeometryProblem> problems,
            org.baywright.units.UnitSystem units) {
        this.members = members;
        this.decks = decks;
        this.tol = tol;
        this.problems = problems;
        this.units = units;
    }

    // ---------------------------------------------------------------- point loads

    List<LoadShare> point(PointLoadItem item, Point at) {
        PlacedMember best = null;
        double bestS = 0;
        double bestD = Double.POSITIVE_INFINITY;
        boolean bestInterior = false;
        for (PlacedMember m : members) {
            double s = m.project(at);
            double d = m.at(s).distance(at);
            if (d > tol) {
                continue;
            }
            boolean interior = s > tol && s < m.length() - tol;
            if (best == null || interior && !bestInterior || interior == bestInterior && d < bestD) {
                best = m;
                bestS = s;
                bestD = d;
                bestInterior = interior;
            }
        }
        if (best != null) {
            return List.of(new LoadShare(best.id(), bestS, 1.0));
        }
        for (DeckContext deck : decks) {
            double u = deck.frame().u(at);
            double v = deck.frame().v(at);
            DeckLayout.Location loc = deck.locate(u, v);
            if (loc == null) {
                continue;
            }
            List<DeckLayout.Support> s = loc.piece().supports();
            if (s.isEmpty()) {
                problems.add(new GeometryProblem(GeometryProblem.POINT_LOAD_UNSUPPORTED, item.id(),
                        "point load " + item.id() + " is on deck " + deck.deckId()
                                + " that no member supports along its span; it is not delivered", List.of(at)));
                return List.of();
            }
            List<LoadShare> out = new ArrayList<>();
            double[] f = lever(s, u, loc.v());
            for (int i = 0; i < s.size(); i++) {
                if (f[i] > 0) {
                    PlacedMember m = members.get(s.get(i).member());
                    out.add(new LoadShare(m.id(), deck.along(m, loc.v()), f[i]));
                }
            }
            return out;
        }
        problems.add(new GeometryProblem(GeometryProblem.POINT_LOAD_OFF_DECK, item.id(),
                "point load " + item.id() + " is on no member and on no deck (outside the slab or in an opening);"
                        + " it is not delivered", List.of(at)));
        return List.of();
    }

    /** Lever-rule fractions of the supports of a piece for a load at {@code u}, read at {@code v}. */
    private double[] lever(List<DeckLayout.Support> s, double u, double v) {
        int n = s.size();
        double[] f = new double[n];
        double first = s.get(0).line().at(v);
        double last = s.get(n - 1).line().at(v);
        if (u <= first) {
            f[0] = 1;
            return f;
        }
        if (u >= last) {
            f[n - 1] = 1;
            return f;
        }
        for (int i = 0; i + 1 < n; i++) {
            double a = s.get(i).line().at(v);
            double b = s.get(i + 1).line().at(v);
            if (u >= a && u <= b) {
                double gap = b - a;
                if (gap <= tol) {
                    f[i] = 1;
                } else {
                    f[i] = (b - u) / gap;
                    f[i + 1] = (u - a) / gap;
                }
                return f;
            }
        }
        f[n - 1] = 1; // unreachable for ordered supports; keeps the load whole
        return f;
    }

    // ---------------------------------------------------------------- line loads

    List<LineShare> line(LineLoad load, List<Point> path) {
        List<LineShare> out = new ArrayList<>();
        int usable = 0;
        for (int i = 0; i + 1 < path.size(); i++) {
            Point p0 = path.get(i);
            Point p1 = path.get(i + 1);
            double len = p0.distance(p1);
            if (len <= tol) {
                continue;
            }
            usable++;
            List<double[]> remaining = new ArrayList<>();
            remaining.add(new double[] {0, 1});
            for (PlacedMember m : members) {
                double[] along = alongMember(m, p0, p1, len);
                if (along == null) {
                    continue;
                }
                for (double[] part : intersect(remaining, along[0], along[1])) {
                    if ((part[1] - part[0]) * len <= tol) {
                        continue;
                    }
                    double sa = m.project(lerp(p0, p1, part[0]));
                    double sb = m.project(lerp(p0, p1, part[1]));
                    out.add(new LineShare(m.id(), Math.min(sa, sb), Math.max(sa, sb), 1, 1));
                }
                remaining = subtract(remaining, along[0], along[1]);
            }
            List<double[]> unsupported = new ArrayList<>();
            for (DeckContext deck : decks) {
                if (remaining.isEmpty()) {
                    break;
                }
                remaining = onDeck(deck, p0, p1, len, remaining, out, unsupported);
            }
            report(load, p0, p1, len, merge(unsupported), GeometryProblem.LINE_LOAD_UNSUPPORTED,
                    "lies on deck that no member supports along its span");
            report(load, p0, p1, len, merge(remaining), GeometryProblem.LINE_LOAD_OFF_DECK,
                    "lies on no member and on no deck (outside the slab or in an opening)");
        }
        if (usable == 0) {
            problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_LINE, load.id(),
                    "line load " + load.id() + " has no segment longer than the tolerance; it is ignored", path));
        }
        return mergeShares(out);
    }

    private void report(LineLoad load, Point p0, Point p1, double len, List<double[]> parts, String kind, String what) {
        for (double[] part : parts) {
            double l = (part[1] - part[0]) * len;
            if (l > tol) {
                problems.add(new GeometryProblem(kind, load.id(), String.format(java.util.Locale.ROOT,
                        "%s of line load %s %s; that part is not delivered", units.lengthText(l), load.id(), what),
                        List.of(lerp(p0, p1, part[0]), lerp(p0, p1, part[1]))));
            }
        }
    }

    /** The parameter range of segment p0–p1 lying along member m (within the tolerance), or null. */
    private double[] alongMember(PlacedMember m, Point p0, Point p1, double len) {
        if (Math.abs(m.offset(p0)) > tol || Math.abs(m.offset(p1)) > tol) {
            return null;
        }
        double dx = (m.b().x() - m.a().x()) / m.length();
        double dy = (m.b().y() - m.a().y()) / m.length();
        double s0 = (p0.x() - m.a().x()) * dx + (p0.y() - m.a().y()) * dy;
        double s1 = (p1.x() - m.a().x()) * dx + (p1.y() - m.a().y()) * dy;
        if (s1 == s0) {
            return null;
        }
        double ta = (0 - s0) / (s1 - s0);
        double tb = (m.length() - s0) / (s1 - s0);
        double lo = Math.max(0, Math.min(ta, tb));
        double hi = Math.min(1, Math.max(ta, tb));
        return hi > lo ? new double[] {lo, hi} : null;
    }

    /** Delivers the parts of p0–p1 in {@code remaining} that lie on this deck; returns what is left. */
    private List<double[]> onDeck(DeckContext deck, Point p0, Point p1, double len, List<double[]> remaining,
            List<LineShare> out, List<double[]> unsupported) {
        SpanFrame fr = deck.frame();
        double u0 = fr.u(p0);
        double v0 = fr.v(p0);
        double du = fr.u(p1) - u0;
        double dv = fr.v(p1) - v0;
        DeckLayout layout = deck.layout();
        List<double[]> left = new ArrayList<>();
        for (double[] part : remaining) {
            List<Double> ts = new ArrayList<>();
            ts.add(part[0]);
            ts.add(part[1]);
            if (dv != 0) {
                for (DeckLayout.Strip s : layout.strips) {
                    ts.add((s.va() - v0) / dv);
                    ts.add((s.vb() - v0) / dv);
                }
            }
            for (FrameLine l : layout.lines) {
                double den = du - l.slope() * dv;
                if (den != 0) {
                    ts.add((l.at(v0) - u0) / den);
                }
            }
            double[] cuts = ts.stream().mapToDouble(Double::doubleValue)
                    .filter(t -> t >= part[0] && t <= part[1]).sorted().distinct().toArray();
            for (int k = 0; k + 1 < cuts.length; k++) {
                double a = cuts[k];
                double b = cuts[k + 1];
                double tm = 0.5 * (a + b);
                DeckLayout.Location loc = deck.locate(u0 + tm * du, v0 + tm * dv);
                if (loc == null) {
                    left.add(new double[] {a, b});
                    continue;
                }
                List<DeckLayout.Support> s = loc.piece().supports();
                if (s.isEmpty()) {
                    unsupported.add(new double[] {a, b});
                    continue;
                }
                double um = u0 + tm * du;
                double vm = loc.v();
                DeckLayout.Support lo = null;
                DeckLayout.Support hi = null;
                for (DeckLayout.Support sup : s) {
                    double p = sup.line().at(vm);
                    if (p <= um) {
                        lo = sup;
                    } else if (hi == null) {
                        hi = sup;
                    }
                }
                Segment seg = new Segment(deck, u0, v0, du, dv, len);
                if (lo == null || hi == null) {
                    emit(seg, lo != null ? lo : hi, a, b, 1, 1, out);
                } else {
                    pair(seg, lo, hi, a, b, 0, out);
                }
            }
        }
        return merge(left);
    }

    /** A line-load segment in a deck frame. */
    private record Segment(DeckContext deck, double u0, double v0, double du, double dv, double len) {
        double u(double t) {
            return u0 + t * du;
        }

        double v(double t) {
            return v0 + t * dv;
        }
    }

    private void pair(Segment seg, DeckLayout.Support lo, DeckLayout.Support hi, double a, double b, int depth,
            List<LineShare> out) {
        double fa = fraction(seg, lo, hi, a);
        double fb = fraction(seg, lo, hi, b);
        boolean parallel = lo.line().slope() == hi.line().slope();
        if (!parallel && depth < MAX_HALVINGS) {
            double m = 0.5 * (a + b);
            if (Math.abs(fraction(seg, lo, hi, m) - 0.5 * (fa + fb)) > FRACTION_ACCURACY) {
                pair(seg, lo, hi, a, m, depth + 1, out);
                pair(seg, lo, hi, m, b, depth + 1, out);
                return;
            }
        }
        emit(seg, lo, a, b, fa, fb, out);
        emit(seg, hi, a, b, 1 - fa, 1 - fb, out);
    }

    /** The lever-rule share of the left support {@code lo} for the load at parameter t. */
    private double fraction(Segment seg, DeckLayout.Support lo, DeckLayout.Support hi, double t) {
        double v = seg.v(t);
        double pl = lo.line().at(v);
        double pr = hi.line().at(v);
        double gap = pr - pl;
        if (gap <= tol) {
            return 0.5;
        }
        return Math.max(0, Math.min(1, (pr - seg.u(t)) / gap));
    }

    private void emit(Segment seg, DeckLayout.Support sup, double a, double b, double fa, double fb,
            List<LineShare> out) {
        if (fa == 0 && fb == 0) {
            return;
        }
        PlacedMember m = members.get(sup.member());
        double sa = seg.deck().along(m, seg.v(a));
        double sb = seg.deck().along(m, seg.v(b));
        double l = (b - a) * seg.len();
        if (Math.abs(sb - sa) <= tol) {
            double force = 0.5 * l * (fa + fb);
            double s = 0.5 * (sa + sb);
            out.add(new LineShare(m.id(), s, s, force, force));
        } else {
            double k = l / Math.abs(sb - sa);
            out.add(sa < sb ? new LineShare(m.id(), sa, sb, fa * k, fb * k)
                    : new LineShare(m.id(), sb, sa, fb * k, fa * k));
        }
    }

    // ---------------------------------------------------------------- small helpers

    private static Point lerp(Point p0, Point p1, double t) {
        return new Point(p0.x() + t * (p1.x() - p0.x()), p0.y() + t * (p1.y() - p0.y()));
    }

    private static List<double[]> intersect(List<double[]> parts, double lo, double hi) {
        List<double[]> out = new ArrayList<>();
        for (double[] p : parts) {
            double a = Math.max(p[0], lo);
            double b = Math.min(p[1], hi);
            if (b > a) {
                out.add(new double[] {a, b});
            }
        }
        return out;
    }

    private static List<double[]> subtract(List<double[]> parts, double lo, double hi) {
        List<double[]> out = new ArrayList<>();
        for (double[] p : parts) {
            if (hi <= p[0] || lo >= p[1]) {
                out.add(p);
                continue;
            }
            if (lo > p[0]) {
                out.add(new double[] {p[0], lo});
            }
            if (hi < p[1]) {
                out.add(new double[] {hi, p[1]});
            }
        }
        return out;
    }

    /** Sorts and joins touching parameter ranges. */
    private static List<double[]> merge(List<double[]> parts) {
        List<double[]> sorted = new ArrayList<>(parts);
        sorted.sort((x, y) -> Double.compare(x[0], y[0]));
        List<double[]> out = new ArrayList<>();
        for (double[] p : sorted) {
            if (!out.isEmpty() && out.get(out.size() - 1)[1] >= p[0]) {
                double[] last = out.get(out.size() - 1);
                last[1] = Math.max(last[1], p[1]);
            } else {
                out.add(new double[] {p[0], p[1]});
            }
        }
        return out;
    }

    /** Joins consecutive distributed shares of one member that continue each other on a straight line. */
    private static List<LineShare> mergeShares(List<LineShare> shares) {
        List<LineShare> out = new ArrayList<>();
        for (LineShare s : shares) {
            if (!out.isEmpty()) {
                LineShare p = out.get(out.size() - 1);
                if (p.memberId().equals(s.memberId()) && !p.isConcentrated() && !s.isConcentrated()
                        && p.s1() == s.s0() && continues(p, s)) {
                    out.set(out.size() - 1, new LineShare(p.memberId(), p.s0(), s.s1(), p.f0(), s.f1()));
                    continue;
                }
            }
            out.add(s);
        }
        return out;
    }

    /**
     * Two shares whose ends differ by less than this fraction of their size continue one another: a few
     * units in the last place of a double, the rounding left by splitting one line at a point.
     */
    private static final double CONTINUES = 1e-12;

    private static boolean continues(LineShare p, LineShare s) {
        double scale = Math.max(Math.max(Math.abs(p.f0()), Math.abs(p.f1())), Math.max(Math.abs(s.f0()), Math.abs(s.f1())));
        double eps = CONTINUES * Math.max(scale, Double.MIN_NORMAL);
        if (Math.abs(p.f1() - s.f0()) > eps) {
            return false;
        }
        double t = (p.s1() - p.s0()) / (s.s1() - p.s0());
        double joint = p.f0() + t * (s.f1() - p.f0());
        return Math.abs(joint - p.f1()) <= eps;
    }
}
