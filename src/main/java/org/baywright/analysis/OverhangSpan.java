package org.baywright.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * Exact statics of one prismatic member on two supports that may overhang either or both of them:
 * supports at {@code x = a} and {@code x = b} ({@code 0 ≤ a < b ≤ L}); the parts {@code [0, a]} and
 * {@code [b, L]} are cantilevers (overhangs) and {@code [a, b]} is the backspan. With {@code a = 0}
 * and {@code b = L} it is a simple span. This is the general case of the AISC Steel Construction
 * Manual, Table 3-23, "beam overhanging one support" (and both supports) diagrams, for any point
 * loads and piecewise-linear line loads.
 *
 * <p>Units and signs as {@link SimpleSpan}: x in m from the member's start, downward load positive,
 * upward reaction positive, shear positive when the part left of a section is pushed up, sagging
 * moment positive (so the moment over a support carrying an overhang is negative, hogging), downward
 * deflection positive.
 *
 * <p>Method: the reactions follow from equilibrium (moments about the first support); they then act as
 * upward point loads at {@code a} and {@code b}. The member is cut at its ends, the supports and every
 * load position and end; on each piece shear, moment and EI × deflection are polynomials (degrees 2,
 * 3, 5) integrated exactly from the free start ({@code V = M = 0} there, before any point load at
 * {@code x = 0}). The two constants of the deflection (offset and rotation) are fixed by
 * {@code y(a) = y(b) = 0}.
 *
 * <p>Invariant checked on construction: the moment at {@code x = L} is zero and the shear there
 * balances, to rounding; a violation throws {@link IllegalStateException}.
 *
 * <p>Known limitations: Euler–Bernoulli bending of a prismatic member (constant EI, no shear
 * deformation, small deflections); rigid supports; the extremes of deflection are found by sampling
 * each piece and refining the zero of the slope by bisection, to a relative 1e-12 of the length.
 */
public final class OverhangSpan {
    private static final double CLOSURE_TOLERANCE = 1e-9;
    private static final int SAMPLES = 16;

    private final double length;
    private final double a;
    private final double b;
    private final List<SpanLoad> loads;
    private final double ra;
    private final double rb;
    private final double[] xs;
    private final double[] vc;
    private final double[] mc;
    private final double[] yc;
    /** Point loads (downward) and reactions (upward, negative here) at each breakpoint. */
    private final double[] pointAt;

    private OverhangSpan(double length, double a, double b, List<SpanLoad> loads, double ra, double rb, double[] xs,
            double[] vc, double[] mc, double[] yc, double[] pointAt) {
        this.length = length;
        this.a = a;
        this.b = b;
        this.loads = loads;
        this.ra = ra;
        this.rb = rb;
        this.xs = xs;
        this.vc = vc;
        this.mc = mc;
        this.yc = yc;
        this.pointAt = pointAt;
    }

    /**
     * A member of length {@code length} on supports at {@code a} and {@code b}, carrying {@code loads}.
     *
     * @param length the member's length, m; finite and greater than zero
     * @param a      the first support, m from the start; {@code 0 ≤ a < b}
     * @param b      the second support, m; {@code a < b ≤ length}
     * @param loads  loads lying within {@code [0, length]}
     * @throws IllegalArgumentException naming the bad value and the allowed range
     */
    public static OverhangSpan of(double length, double a, double b, List<? extends SpanLoad> loads) {
        if (!(length > 0.0) || !Double.isFinite(length)) {
            throw new IllegalArgumentException("member length must be a finite number of metres greater than 0, was " + length);
        }
        if (!(a >= 0.0 && a < b && b <= length)) {
            throw new IllegalArgumentException("supports must satisfy 0 ≤ a < b ≤ L (L = " + length + " m), were a = " + a
                    + " m, b = " + b + " m");
        }
        Objects.requireNonNull(loads, "loads");
        for (int i = 0; i < loads.size(); i++) {
            SpanLoad l = Objects.requireNonNull(loads.get(i), "loads[" + i + "]");
            double lo = l instanceof PointLoad p ? p.position() : ((DistributedLoad) l).start();
            double hi = l instanceof PointLoad p ? p.position() : ((DistributedLoad) l).end();
            if (lo < 0.0 || hi > length) {
                throw new IllegalArgumentException("loads[" + i + "] = " + l + " lies outside the member: allowed range is [0, "
                        + length + "] m");
            }
        }
        return build(length, a, b, List.copyOf(loads));
    }

    private static OverhangSpan build(double length, double a, double b, List<SpanLoad> loads) {
        double[] raw = new double[4 + 2 * loads.size()];
        int count = 0;
        raw[count++] = 0.0;
        raw[count++] = a;
        raw[count++] = b;
        raw[count++] = length;
        for (SpanLoad l : loads) {
            if (l instanceof PointLoad p) {
                raw[count++] = p.position();
            } else if (l instanceof DistributedLoad d) {
                raw[count++] = d.start();
                raw[count++] = d.end();
            }
        }
        Arrays.sort(raw, 0, count);
        double[] xs = new double[count];
        int n = 0;
        for (int k = 0; k < count; k++) {
            double x = raw[k] == 0.0 ? 0.0 : raw[k];
            if (n == 0 || x != xs[n - 1]) {
                xs[n++] = x;
            }
        }
        xs = Arrays.copyOf(xs, n);
        int pieces = n - 1;
        double[] pointAt = new double[n];
        double[] q0 = new double[pieces];
        double[] q1 = new double[pieces];
        double total = 0.0;
        double momentAboutA = 0.0;
        double scale = 0.0;
        for (SpanLoad l : loads) {
            if (l instanceof PointLoad p) {
                pointAt[Arrays.binarySearch(xs, p.position() == 0.0 ? 0.0 : p.position())] += p.force();
                total += p.force();
                momentAboutA += p.force() * (p.position() - a);
                scale += Math.abs(p.force());
            } else if (l instanceof DistributedLoad d) {
                double s = d.start();
                double e = d.end();
                double f = d.total();
                // centroid of a trapezoid from s to e with end intensities ws, we
                double ws = d.wStart();
                double we = d.wEnd();
                double centroid = ws + we == 0.0 ? 0.5 * (s + e)
                        : s + (e - s) * (ws + 2.0 * we) / (3.0 * (ws + we));
                total += f;
                momentAboutA += f * (centroid - a);
                scale += 0.5 * (Math.abs(ws) + Math.abs(we)) * (e - s);
                int from = Arrays.binarySearch(xs, s == 0.0 ? 0.0 : s);
                int to = Arrays.binarySearch(xs, e);
                for (int k = from; k < to; k++) {
                    q0[k] += d.intensityAt(xs[k]);
                    q1[k] += d.slope();
                }
            }
        }
        double rb = momentAboutA / (b - a);
        double ra = total - rb;
        pointAt[Arrays.binarySearch(xs, a)] -= ra;
        pointAt[Arrays.binarySearch(xs, b)] -= rb;
        scale += Math.abs(ra) + Math.abs(rb);

        double[] vc = new double[3 * pieces];
        double[] mc = new double[4 * pieces];
        double[] yc = new double[6 * pieces];
        double v = -pointAt[0];
        double m = 0.0;
        double s = 0.0;
        double y = 0.0;
        for (int k = 0; k < pieces; k++) {
            double h = xs[k + 1] - xs[k];
            double qa = q0[k];
            double qb = q1[k];
            vc[3 * k] = v;
            vc[3 * k + 1] = -qa;
            vc[3 * k + 2] = -qb / 2.0;
            mc[4 * k] = m;
            mc[4 * k + 1] = v;
            mc[4 * k + 2] = -qa / 2.0;
            mc[4 * k + 3] = -qb / 6.0;
            yc[6 * k] = y;
            yc[6 * k + 1] = s;
            yc[6 * k + 2] = -m / 2.0;
            yc[6 * k + 3] = -v / 6.0;
            yc[6 * k + 4] = qa / 24.0;
            yc[6 * k + 5] = qb / 120.0;
            double vEnd = v - h * (qa + h * qb / 2.0);
            double mEnd = m + h * (v - h * (qa / 2.0 + h * qb / 6.0));
            double sEnd = s - h * (m + h * (v / 2.0 - h * (qa / 6.0 + h * qb / 24.0)));
            double yEnd = Polynomials.evalAt(yc, 6 * k, 6, h);
            v = vEnd - pointAt[k + 1];
            m = mEnd;
            s = sEnd;
            y = yEnd;
        }
        if (Math.abs(m) > CLOSURE_TOLERANCE * Math.max(scale, 1e-300) * length
                || Math.abs(v) > CLOSURE_TOLERANCE * Math.max(scale, 1e-300)) {
            throw new IllegalStateException("statics did not close at the end of the member: M(L) = " + m
                    + " N·m, unbalanced shear = " + v + " N (load scale " + scale + " N)");
        }
        // y(x) = y0 + θ0·x + particular(x), with y(a) = y(b) = 0
        OverhangSpan raw0 = new OverhangSpan(length, a, b, loads, ra, rb, xs, vc, mc, yc, pointAt);
        double pa = raw0.eiDeflection(a);
        double pb = raw0.eiDeflection(b);
        double theta0 = -(pb - pa) / (b - a);
        double y0 = -pa - theta0 * a;
        for (int k = 0; k < pieces; k++) {
            yc[6 * k] += y0 + theta0 * xs[k];
            yc[6 * k + 1] += theta0;
        }
        return raw0;
    }

    /** The member's length, m. */
    public double length() {
        return length;
    }

    /** The first support, m from the start. */
    public double supportA() {
        return a;
    }

    /** The second support, m from the start. */
    public double supportB() {
        return b;
    }

    /** The backspan between the supports, m. */
    public double backspan() {
        return b - a;
    }

    /** The overhang beyond the first support (at the start), m; 0 when none. */
    public double startOverhang() {
        return a;
    }

    /** The overhang beyond the second support (at the end), m; 0 when none. */
    public double endOverhang() {
        return length - b;
    }

    public List<SpanLoad> loads() {
        return loads;
    }

    /** Sum of the loads, N. */
    public double totalLoad() {
        return Pieces.totalLoad(loads);
    }

    /** Reaction at the first support, N, upward positive (negative: the support holds the member down). */
    public double reactionA() {
        return ra;
    }

    /** Reaction at the second support, N, upward positive. */
    public double reactionB() {
        return rb;
    }

    /** Shear just right of x, N (at x = L, just left of it). */
    public double shear(double x) {
        int k = piece(x);
        double t = clamp(x) - xs[k];
        return Pieces.shear(vc, k, t);
    }

    /** Shear just left of x, N (at x = 0, just right of it). */
    public double shearLeft(double x) {
        double c = clamp(x);
        int k = piece(c);
        if (c == xs[k] && k > 0) {
            k--;
        }
        double t = c - xs[k];
        return Pieces.shear(vc, k, t);
    }

    /** Bending moment at x, N·m, sagging positive. */
    public double moment(double x) {
        int k = piece(x);
        double t = clamp(x) - xs[k];
        return Pieces.moment(mc, k, t);
    }

    /** Deflection at x, m, downward positive, for flexural stiffness {@code ei} (N·m²). */
    public double deflection(double x, double ei) {
        if (!(ei > 0.0) || !Double.isFinite(ei)) {
            throw new IllegalArgumentException("EI must be a finite number of N·m² greater than 0, was " + ei);
        }
        return eiDeflection(x) / ei;
    }

    private double eiDeflection(double x) {
        int k = piece(x);
        return Polynomials.evalAt(yc, 6 * k, 6, clamp(x) - xs[k]);
    }

    private double eiSlope(int k, double t) {
        return Pieces.eiSlope(yc, k, t);
    }

    /** The largest shear magnitude anywhere on the member, N, and where (either side of each breakpoint). */
    public Extreme maxShear() {
        double best = 0.0;
        double where = 0.0;
        for (int k = 0; k < xs.length - 1; k++) {
            double h = xs[k + 1] - xs[k];
            double v0 = vc[3 * k];
            double v1 = Pieces.shear(vc, k, h);
            if (Math.abs(v0) > best) {
                best = Math.abs(v0);
                where = xs[k];
            }
            if (Math.abs(v1) > best) {
                best = Math.abs(v1);
                where = xs[k + 1];
            }
        }
        return new Extreme(best, where);
    }

    /**
     * The most positive (sagging, {@code hogging = false}) or most negative ({@code hogging = true})
     * moment on {@code [from, to]}, signed, and where; 0 at {@code from} when there is none of that sign.
     * Exact: breakpoints and zeros of the shear.
     */
    public Extreme extremeMoment(double from, double to, boolean hogging) {
        double best = 0.0;
        double where = from;
        double[] roots = new double[2];
        for (int k = 0; k < xs.length - 1; k++) {
            double x0 = Math.max(xs[k], from);
            double x1 = Math.min(xs[k + 1], to);
            if (x1 < x0) {
                continue;
            }
            double[] cand = new double[4];
            int nc = 0;
            cand[nc++] = x0;
            cand[nc++] = x1;
            int found = Polynomials.quadraticRoots(vc[3 * k], vc[3 * k + 1], vc[3 * k + 2], roots);
            for (int r = 0; r < found; r++) {
                double x = xs[k] + roots[r];
                if (x > x0 && x < x1) {
                    cand[nc++] = x;
                }
            }
            for (int i = 0; i < nc; i++) {
                double t = cand[i] - xs[k];
                double mm = Pieces.moment(mc, k, t);
                if (hogging ? mm < best : mm > best) {
                    best = mm;
                    where = cand[i];
                }
            }
        }
        return new Extreme(best, where);
    }

    /**
     * EI times the deflection of largest magnitude on {@code [from, to]} (signed, downward positive), and
     * where: ends, breakpoints and the zeros of the slope (sampled, then bisected).
     */
    public Extreme extremeEiDeflection(double from, double to) {
        double best = 0.0;
        double where = from;
        for (int k = 0; k < xs.length - 1; k++) {
            double x0 = Math.max(xs[k], from);
            double x1 = Math.min(xs[k + 1], to);
            if (x1 < x0) {
                continue;
            }
            double t0 = x0 - xs[k];
            double t1 = x1 - xs[k];
            double prevT = t0;
            double prevS = eiSlope(k, t0);
            for (int i = 0; i <= SAMPLES; i++) {
                double t = t0 + (t1 - t0) * i / SAMPLES;
                double yv = Polynomials.evalAt(yc, 6 * k, 6, t);
                if (Math.abs(yv) > Math.abs(best)) {
                    best = yv;
                    where = xs[k] + t;
                }
                double sl = eiSlope(k, t);
                if (i > 0 && (sl > 0) != (prevS > 0) && sl != 0 && prevS != 0) {
                    double lo = prevT;
                    double hi = t;
                    boolean loPos = prevS > 0;
                    for (int it = 0; it < 60 && hi - lo > 1e-12 * length; it++) {
                        double mid = 0.5 * (lo + hi);
                        if ((eiSlope(k, mid) > 0) == loPos) {
                            lo = mid;
                        } else {
                            hi = mid;
                        }
                    }
                    double tm = 0.5 * (lo + hi);
                    double ym = Polynomials.evalAt(yc, 6 * k, 6, tm);
                    if (Math.abs(ym) > Math.abs(best)) {
                        best = ym;
                        where = xs[k] + tm;
                    }
                }
                prevT = t;
                prevS = sl;
            }
        }
        return new Extreme(best, where);
    }

    /** This member with {@code more} loads added (same length and supports). */
    public OverhangSpan plus(List<? extends SpanLoad> more) {
        List<SpanLoad> all = new ArrayList<>(loads.size() + more.size());
        all.addAll(loads);
        all.addAll(more);
        return of(length, a, b, all);
    }

    /** The linear combination {@code Σ factors[i] · loads[i]} on this member's geometry. */
    public static OverhangSpan combine(double length, double a, double b, double[] factors, List<List<SpanLoad>> loads) {
        List<SpanLoad> all = new ArrayList<>();
        for (int i = 0; i < factors.length; i++) {
            if (factors[i] != 0.0) {
                for (SpanLoad l : loads.get(i)) {
                    all.add(l.scaled(factors[i]));
                }
            }
        }
        return of(length, a, b, all);
    }

    @Override
    public String toString() {
        return "OverhangSpan[length=" + length + " m, supports at " + a + " m and " + b + " m, loads=" + loads + "]";
    }

    private double clamp(double x) {
        return Pieces.clamp(x, length);
    }

    /** Index of the piece holding x: {@code xs[k] <= x < xs[k+1]}, the last piece for x = L. */
    private int piece(double x) {
        return Pieces.piece(xs, length, x, "member");
    }
}
