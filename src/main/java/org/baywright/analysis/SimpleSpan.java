package org.baywright.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * Exact statics of one simply supported, prismatic span: support reactions, shear, bending moment and
 * deflection under point loads and linearly varying line loads.
 *
 * <p>Units are canonical SI: x in m from the left support, forces in N, intensities in N/m,
 * moments in N·m, EI in N·m². Signs: downward load positive, upward reaction positive, shear
 * positive when the part left of a section is pushed up (so {@code V(0+) = R1} when no load sits on
 * the left support), sagging moment positive, downward deflection positive.
 *
 * <p>Method: the span is cut at both supports and at every load position and load end. On each piece
 * the line-load intensity is linear, so, in the local coordinate {@code t = x − x_i}, shear is a
 * quadratic, moment a cubic, slope a quartic and deflection a quintic. The coefficients are found
 * once, on construction, by exact integration from the left support (shear jumps by each point load;
 * moment, slope and deflection are continuous), the unknown end slope being fixed by
 * {@code y(0) = y(L) = 0}. Deflection is stored multiplied by EI, so one span serves every section
 * tried on it. Queries then cost a binary search and a Horner evaluation, without allocation.
 *
 * <p>Invariant checked on construction: the moment computed at the right support is zero and the
 * shear just left of it balances the right reaction, to rounding; a violation throws
 * {@link IllegalStateException}.
 *
 * <p>Known limitations:
 * <ul>
 *   <li>Simple supports only (pin and roller at the ends of the span); no cantilevers, overhangs,
 *       continuity or end moments.</li>
 *   <li>Euler–Bernoulli bending of a prismatic member: constant EI, no shear deformation, small
 *       deflections, no second-order effects.</li>
 *   <li>A point load placed exactly on a support goes straight into that support: it is part of the
 *       reaction but causes no shear or moment in the span.</li>
 *   <li>Query positions may overshoot the span by a relative 1e-9 (rounding of a caller's
 *       arithmetic); they are then clamped to the support. Anything further outside is refused.</li>
 * </ul>
 */
public final class SimpleSpan {
    /**
     * The search for the point of largest deflection stops when a step moves less than this fraction
     * of the span: a few units in the last place of a double, where no further step can help.
     */
    private static final double CONVERGED = 1e-15;


    /** Relative tolerance of the closing check at the right support. */
    private static final double CLOSURE_TOLERANCE = 1e-9;

    private final double length;
    private final List<SpanLoad> loads;
    private final double leftReaction;
    private final double rightReaction;
    /** Breakpoints {@code x_0 = 0 < x_1 < … < x_n = L}. */
    private final double[] xs;
    /** Shear on piece i: {@code vc[3i] + vc[3i+1]·t + vc[3i+2]·t²}; the constant term is V just right of x_i. */
    private final double[] vc;
    /** Moment on piece i: 4 coefficients per piece, lowest degree first. */
    private final double[] mc;
    /** EI × deflection on piece i: 6 coefficients per piece, lowest degree first. */
    private final double[] yc;

    // Lazily computed extremes. Extreme is an immutable record with final fields, so a racy
    // publication is safe: at worst two threads compute the same value.
    private Extreme maxMomentCache;
    private Extreme maxShearCache;
    private Extreme maxEiDeflectionCache;
    private Boolean downwardCache;

    private SimpleSpan(double length, List<SpanLoad> loads, double leftReaction, double rightReaction,
                       double[] xs, double[] vc, double[] mc, double[] yc) {
        this.length = length;
        this.loads = loads;
        this.leftReaction = leftReaction;
        this.rightReaction = rightReaction;
        this.xs = xs;
        this.vc = vc;
        this.mc = mc;
        this.yc = yc;
    }

    /**
     * A simple span of the given length carrying the given loads.
     *
     * @param length span between the supports, m; finite and greater than zero
     * @param loads  the loads, each lying within {@code [0, length]}; may be empty
     * @throws IllegalArgumentException naming the offending load index, field and allowed range
     * @throws NullPointerException     if {@code loads} or one of its elements is null
     */
    public static SimpleSpan of(double length, List<? extends SpanLoad> loads) {
        if (!(length > 0.0) || !Double.isFinite(length)) {
            throw new IllegalArgumentException(
                    "span length must be a finite number of metres greater than 0, was " + length);
        }
        Objects.requireNonNull(loads, "loads");
        for (int i = 0; i < loads.size(); i++) {
            SpanLoad load = loads.get(i);
            if (load == null) {
                throw new NullPointerException("loads[" + i + "] is null");
            }
            if (load instanceof PointLoad p) {
                checkInside(i, "PointLoad", "position", p.position(), length);
            } else if (load instanceof DistributedLoad d) {
                checkInside(i, "DistributedLoad", "start", d.start(), length);
                checkInside(i, "DistributedLoad", "end", d.end(), length);
            }
        }
        return build(length, List.copyOf(loads));
    }

    private static void checkInside(int index, String type, String field, double value, double length) {
        if (value < 0.0 || value > length) {
            throw new IllegalArgumentException("loads[" + index + "] (" + type + ")." + field + " = " + value
                    + " m is outside the span: allowed range is [0, " + length + "] m");
        }
    }

    private static SimpleSpan build(double length, List<SpanLoad> loads) {
        // 1. Breakpoints.
        double[] raw = new double[2 + 2 * loads.size()];
        int count = 0;
        raw[count++] = 0.0;
        raw[count++] = length;
        for (SpanLoad load : loads) {
            if (load instanceof PointLoad p) {
                raw[count++] = p.position();
            } else if (load instanceof DistributedLoad d) {
                raw[count++] = d.start();
                raw[count++] = d.end();
            }
        }
        Arrays.sort(raw, 0, count);
        double[] xs = new double[count];
        int n = 0;
        for (int k = 0; k < count; k++) {
            if (n == 0 || raw[k] != xs[n - 1]) {
                xs[n++] = raw[k] == 0.0 ? 0.0 : raw[k]; // fold −0.0 into 0.0
            }
        }
        xs = Arrays.copyOf(xs, n);
        int pieces = n - 1;

        // 2. Point loads at breakpoints, line-load intensity and slope on pieces, reactions, scale.
        double[] pointAt = new double[n];
        double[] q0 = new double[pieces];
        double[] q1 = new double[pieces];
        double r1 = 0.0;
        double r2 = 0.0;
        double scale = 0.0;
        for (SpanLoad load : loads) {
            if (load instanceof PointLoad p) {
                double a = p.position();
                double f = p.force();
                pointAt[Arrays.binarySearch(xs, a == 0.0 ? 0.0 : a)] += f;
                r1 += f * (length - a) / length;
                r2 += f * a / length;
                scale += Math.abs(f);
            } else if (load instanceof DistributedLoad d) {
                double s = d.start();
                double e = d.end();
                double ws = d.wStart();
                double we = d.wEnd();
                double len = e - s;
                // ∫ q·(L − x) dx and ∫ q·x dx over [s, e] for linear q, divided by L.
                r1 += len * (ws * (2.0 * (length - s) + (length - e)) + we * ((length - s) + 2.0 * (length - e)))
                        / (6.0 * length);
                r2 += len * (ws * (2.0 * s + e) + we * (s + 2.0 * e)) / (6.0 * length);
                scale += 0.5 * (Math.abs(ws) + Math.abs(we)) * len;
                int from = Arrays.binarySearch(xs, s == 0.0 ? 0.0 : s);
                int to = Arrays.binarySearch(xs, e);
                double slope = d.slope();
                for (int k = from; k < to; k++) {
                    q0[k] += d.intensityAt(xs[k]);
                    q1[k] += slope;
                }
            }
        }

        // 3. Integrate piece by piece from the left support, with zero slope at x = 0 for now.
        double[] vc = new double[3 * pieces];
        double[] mc = new double[4 * pieces];
        double[] yc = new double[6 * pieces];
        double v = r1 - pointAt[0];
        double m = 0.0;
        double s = 0.0; // EI × slope
        double y = 0.0; // EI × deflection
        for (int k = 0; k < pieces; k++) {
            double h = xs[k + 1] - xs[k];
            double a = q0[k];
            double b = q1[k];
            vc[3 * k] = v;
            vc[3 * k + 1] = -a;
            vc[3 * k + 2] = -b / 2.0;
            mc[4 * k] = m;
            mc[4 * k + 1] = v;
            mc[4 * k + 2] = -a / 2.0;
            mc[4 * k + 3] = -b / 6.0;
            // EI·y'' = −M, so EI·y = y0 + s0·t − m·t²/2 − v·t³/6 + a·t⁴/24 + b·t⁵/120.
            yc[6 * k] = y;
            yc[6 * k + 1] = s;
            yc[6 * k + 2] = -m / 2.0;
            yc[6 * k + 3] = -v / 6.0;
            yc[6 * k + 4] = a / 24.0;
            yc[6 * k + 5] = b / 120.0;
            double vEnd = v - h * (a + h * b / 2.0);
            double mEnd = m + h * (v - h * (a / 2.0 + h * b / 6.0));
            double sEnd = s - h * (m + h * (v / 2.0 - h * (a / 6.0 + h * b / 24.0)));
            double yEnd = Polynomials.evalAt(yc, 6 * k, 6, h);
            v = vEnd - pointAt[k + 1];
            m = mEnd;
            s = sEnd;
            y = yEnd;
        }
        // m is now M(L), which must vanish; v is the shear just right of x = L before the right
        // reaction acts, which must equal −R2.
        if (Math.abs(m) > CLOSURE_TOLERANCE * scale * length || Math.abs(v + r2) > CLOSURE_TOLERANCE * scale) {
            throw new IllegalStateException("statics did not close at the right support: M(L) = " + m
                    + " N·m, unbalanced shear = " + (v + r2) + " N (load scale " + scale + " N)");
        }
        // 4. Rotate so that y(L) = 0: add θ0·x with θ0 = −y(L)/L (times EI).
        double theta0 = -y / length;
        for (int k = 0; k < pieces; k++) {
            yc[6 * k] += theta0 * xs[k];
            yc[6 * k + 1] += theta0;
        }
        return new SimpleSpan(length, loads, r1, r2, xs, vc, mc, yc);
    }

    /** Span between the supports, m. */
    public double length() {
        return length;
    }

    /** The loads, in the order given (unmodifiable). */
    public List<SpanLoad> loads() {
        return loads;
    }

    /** Sum of the resultants of all loads, N (downward positive); equals R1 + R2 to rounding. */
    public double totalLoad() {
        return Pieces.totalLoad(loads);
    }

    /** Reaction at the left support (x = 0), N, upward positive. */
    public double leftReaction() {
        return leftReaction;
    }

    /** Reaction at the right support (x = L), N, upward positive. */
    public double rightReaction() {
        return rightReaction;
    }

    /**
     * Shear force just right of {@code x}, N. At a point load this is the value after the jump; at
     * {@code x = L}, where there is nothing to the right inside the span, it is the value just left
     * of the right support. So {@code shear(0) = R1 − P0} (P0 the point load on the left support, if
     * any) and {@code shear(L) = −R2 + PL}.
     *
     * @param x position from the left support, m, within {@code [0, L]}
     */
    public double shear(double x) {
        int k = piece(x);
        double t = clamp(x) - xs[k];
        return Pieces.shear(vc, k, t);
    }

    /**
     * Bending moment at {@code x}, N·m, sagging positive.
     *
     * @param x position from the left support, m, within {@code [0, L]}
     */
    public double moment(double x) {
        return momentOn(piece(x), x);
    }

    /** The moment at x on piece k (the piece holding x). */
    private double momentOn(int k, double x) {
        double t = clamp(x) - xs[k];
        return Pieces.moment(mc, k, t);
    }

    /**
     * Deflection at {@code x}, m, downward positive.
     *
     * @param x  position from the left support, m, within {@code [0, L]}
     * @param ei flexural stiffness E·I, N·m²; finite and greater than zero
     */
    public double deflection(double x, double ei) {
        checkStiffness(ei);
        int k = piece(x);
        return Polynomials.evalAt(yc, 6 * k, 6, clamp(x) - xs[k]) / ei;
    }

    /**
     * The bending moment of largest magnitude and the first x (from the left) where it is reached. The value is signed:
     * for loads that all act downward it is the maximum sagging (positive) moment; if uplift makes a
     * hogging moment larger in magnitude, that negative value is returned. Found exactly from the
     * values at every breakpoint and at every zero of the shear inside a piece (roots of a quadratic).
     * A design check compares {@link Extreme#magnitude()}.
     */
    public Extreme maxMoment() {
        Extreme cached = maxMomentCache;
        if (cached == null) {
            cached = findMaxMoment();
            maxMomentCache = cached;
        }
        return cached;
    }

    private Extreme findMaxMoment() {
        double best = 0.0;
        double where = 0.0;
        double[] roots = new double[2];
        for (int k = 0; k < xs.length - 1; k++) {
            double h = xs[k + 1] - xs[k];
            double end = Pieces.moment(mc, k, h);
            if (Math.abs(mc[4 * k]) > Math.abs(best)) {
                best = mc[4 * k];
                where = xs[k];
            }
            int found = Polynomials.quadraticRoots(vc[3 * k], vc[3 * k + 1], vc[3 * k + 2], roots);
            for (int r = 0; r < found; r++) {
                double t = roots[r];
                if (t > 0.0 && t < h) {
                    double value = Pieces.moment(mc, k, t);
                    if (Math.abs(value) > Math.abs(best)) {
                        best = value;
                        where = xs[k] + t;
                    }
                }
            }
            if (Math.abs(end) > Math.abs(best)) {
                best = end;
                where = xs[k + 1];
            }
        }
        return new Extreme(best, where);
    }

    /**
     * The largest shear magnitude {@code max |V|}, N (non-negative), and the first x (from the left) where it
     * occurs. Both sides of every point load are considered, and the interior extreme of a piece
     * where the line-load intensity passes through zero.
     */
    public Extreme maxShear() {
        Extreme cached = maxShearCache;
        if (cached == null) {
            cached = findMaxShear();
            maxShearCache = cached;
        }
        return cached;
    }

    private Extreme findMaxShear() {
        double best = 0.0;
        double where = 0.0;
        for (int k = 0; k < xs.length - 1; k++) {
            double h = xs[k + 1] - xs[k];
            double c0 = vc[3 * k];
            double c1 = vc[3 * k + 1];
            double c2 = vc[3 * k + 2];
            if (Math.abs(c0) > best) {
                best = Math.abs(c0);
                where = xs[k];
            }
            if (c2 != 0.0) {
                double t = -c1 / (2.0 * c2);
                if (t > 0.0 && t < h) {
                    double value = Math.abs(c0 + t * (c1 + t * c2));
                    if (value > best) {
                        best = value;
                        where = xs[k] + t;
                    }
                }
            }
            double end = Math.abs(c0 + h * (c1 + h * c2));
            if (end > best) {
                best = end;
                where = xs[k + 1];
            }
        }
        return new Extreme(best, where);
    }

    /**
     * The deflection of largest magnitude, m (signed, downward positive), and where it occurs: the
     * candidates are the breakpoints and every real root of the quartic slope inside a piece,
     * isolated through the roots of its derivatives and refined by bisection to rounding. The
     * position does not depend on EI and is computed once per span.
     *
     * @param ei flexural stiffness E·I, N·m²; finite and greater than zero
     */
    public Extreme maxDeflection(double ei) {
        checkStiffness(ei);
        Extreme cached = maxEiDeflectionCache;
        if (cached == null) {
            cached = findMaxEiDeflection();
            maxEiDeflectionCache = cached;
        }
        return new Extreme(cached.value() / ei, cached.position());
    }

    private Extreme findMaxEiDeflection() {
        double best = 0.0;
        double where = 0.0;
        double[] slope = new double[5];
        double[] poly = new double[6];
        for (int k = 0; k < xs.length - 1; k++) {
            double h = xs[k + 1] - xs[k];
            System.arraycopy(yc, 6 * k, poly, 0, 6);
            for (int j = 1; j < 6; j++) {
                slope[j - 1] = j * poly[j];
            }
            for (double t : Polynomials.signChangeRoots(slope, 0.0, h)) {
                double value = Polynomials.eval(poly, t);
                if (Math.abs(value) > Math.abs(best)) {
                    best = value;
                    where = xs[k] + t;
                }
            }
            double end = Polynomials.eval(poly, h);
            if (Math.abs(end) > Math.abs(best)) {
                best = end;
                where = xs[k + 1];
            }
        }
        return new Extreme(best, where);
    }

    /**
     * The largest moment magnitude with a uniform load {@code w} (N/m) added over the whole span,
     * as {@code out[0]} (signed, N·m) and {@code out[1]} (x, m). Exact, like {@link #maxMoment()}, and
     * without building a new span or allocating: the lightest-section search calls it for every
     * candidate's self-weight.
     *
     * @param out an array of length ≥ 2 to receive value and position
     */
    public void maxMomentWithUniform(double w, double[] out) {
        double best = 0.0;
        double where = 0.0;
        double l = length;
        for (int k = 0; k < xs.length - 1; k++) {
            double x0 = xs[k];
            double h = xs[k + 1] - x0;
            double v0 = vc[3 * k] + w * (l / 2.0 - x0);
            double v1 = vc[3 * k + 1] - w;
            double v2 = vc[3 * k + 2];
            double m0 = mc[4 * k] + w * x0 * (l - x0) / 2.0;
            double m1 = mc[4 * k + 1] + w * (l - 2.0 * x0) / 2.0;
            double m2 = mc[4 * k + 2] - w / 2.0;
            double m3 = mc[4 * k + 3];
            if (Math.abs(m0) > Math.abs(best)) {
                best = m0;
                where = x0;
            }
            // zeros of the shear v0 + v1·t + v2·t² inside the piece
            if (v2 == 0.0) {
                if (v1 != 0.0) {
                    double t = -v0 / v1;
                    if (t > 0.0 && t < h) {
                        double value = m0 + t * (m1 + t * (m2 + t * m3));
                        if (Math.abs(value) > Math.abs(best)) {
                            best = value;
                            where = x0 + t;
                        }
                    }
                }
            } else {
                double disc = v1 * v1 - 4.0 * v2 * v0;
                if (disc >= 0.0) {
                    double sq = Math.sqrt(disc);
                    double q = -0.5 * (v1 + Math.copySign(sq, v1));
                    double ta = q / v2;
                    double tb = q != 0.0 ? v0 / q : ta;
                    for (int r = 0; r < 2; r++) {
                        double t = r == 0 ? ta : tb;
                        if (t > 0.0 && t < h) {
                            double value = m0 + t * (m1 + t * (m2 + t * m3));
                            if (Math.abs(value) > Math.abs(best)) {
                                best = value;
                                where = x0 + t;
                            }
                        }
                    }
                }
            }
            double end = m0 + h * (m1 + h * (m2 + h * m3));
            if (Math.abs(end) > Math.abs(best)) {
                best = end;
                where = xs[k + 1];
            }
        }
        out[0] = best;
        out[1] = where;
    }

    /**
     * EI times the largest deflection with a uniform load {@code w} (N/m) added over the whole span,
     * as {@code out[0]} (N·m³, downward positive) and {@code out[1]} (x, m).
     *
     * <p>When every load of this span acts downward and {@code w ≥ 0}, the deflected shape is concave
     * with a single maximum where the slope vanishes; that zero is found by a Newton iteration
     * safeguarded by bisection, to rounding, without allocating. Otherwise the general method of
     * {@link #maxDeflection(double)} is applied to the span with the uniform load added.
     */
    public void maxEiDeflectionWithUniform(double w, double[] out) {
        if (w < 0.0 || !allDownward()) {
            Extreme e = plus(of(length, List.of(DistributedLoad.full(length, w)))).maxDeflection(1.0);
            out[0] = e.value();
            out[1] = e.position();
            return;
        }
        double lo = 0.0;
        double hi = length;
        if (eiSlope(lo, w) <= 0.0) {
            out[0] = eiDeflection(lo, w);
            out[1] = lo;
            return;
        }
        if (eiSlope(hi, w) >= 0.0) {
            out[0] = eiDeflection(hi, w);
            out[1] = hi;
            return;
        }
        double x = 0.5 * (lo + hi);
        for (int i = 0; i < 100; i++) {
            int k = piece(x); // one look-up for the slope and the moment at x
            double s = eiSlope(k, x, w);
            if (s == 0.0) {
                break;
            }
            if (s > 0.0) {
                lo = x;
            } else {
                hi = x;
            }
            double curvature = -(momentOn(k, x) + w * x * (length - x) / 2.0); // EI·y'' = −M
            double next = curvature < 0.0 ? x - s / curvature : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) <= CONVERGED * length || hi - lo <= CONVERGED * length) {
                x = next;
                break;
            }
            x = next;
        }
        out[0] = eiDeflection(x, w);
        out[1] = x;
    }

    private boolean allDownward() {
        Boolean d = downwardCache;
        if (d == null) {
            boolean ok = true;
            for (SpanLoad l : loads) {
                if (l instanceof PointLoad p && p.force() < 0.0) {
                    ok = false;
                } else if (l instanceof DistributedLoad dl && (dl.wStart() < 0.0 || dl.wEnd() < 0.0)) {
                    ok = false;
                }
            }
            d = ok;
            downwardCache = d;
        }
        return d;
    }

    /** EI × slope at x with a uniform load w added: d/dx of EI·y. */
    private double eiSlope(double x, double w) {
        return eiSlope(piece(x), x, w);
    }

    /** {@link #eiSlope(double, double)} with the piece of x already known. */
    private double eiSlope(int k, double x, double w) {
        double t = clamp(x) - xs[k];
        double s = Pieces.eiSlope(yc, k, t);
        double l = length;
        return s + w * (l * l * l - 6.0 * l * x * x + 4.0 * x * x * x) / 24.0;
    }

    /** EI × deflection at x with a uniform load w added. */
    private double eiDeflection(double x, double w) {
        int k = piece(x);
        double l = length;
        return Polynomials.evalAt(yc, 6 * k, 6, clamp(x) - xs[k]) + w * x * (l * l * l - 2.0 * l * x * x + x * x * x) / 24.0;
    }

    /**
     * This span with all loads of {@code other} added (superposition).
     *
     * @throws IllegalArgumentException if the lengths differ
     */
    public SimpleSpan plus(SimpleSpan other) {
        Objects.requireNonNull(other, "other");
        if (other.length != length) {
            throw new IllegalArgumentException("cannot add spans of different lengths: " + length + " m and "
                    + other.length + " m");
        }
        List<SpanLoad> all = new ArrayList<>(loads.size() + other.loads.size());
        all.addAll(loads);
        all.addAll(other.loads);
        return build(length, List.copyOf(all));
    }

    /**
     * This span with every load multiplied by {@code factor}. Reactions, shear, moment and deflection
     * scale exactly; nothing is solved again.
     *
     * @param factor finite; zero and negative factors are allowed
     */
    public SimpleSpan scaled(double factor) {
        Polynomials.checkFactor(factor);
        List<SpanLoad> scaledLoads = new ArrayList<>(loads.size());
        for (SpanLoad load : loads) {
            scaledLoads.add(load.scaled(factor));
        }
        return new SimpleSpan(length, List.copyOf(scaledLoads), leftReaction * factor, rightReaction * factor,
                xs, times(vc, factor), times(mc, factor), times(yc, factor));
    }

    /**
     * The linear combination {@code Σ factors[i] · spans[i]}, e.g. a load combination 1.2D + 1.6L of
     * the spans of each load case. Loads with a factor of exactly zero are left out.
     *
     * @throws IllegalArgumentException if there are no spans, the counts differ, a factor is not
     *                                  finite or the spans do not all have the same length
     */
    public static SimpleSpan combine(double[] factors, SimpleSpan... spans) {
        Objects.requireNonNull(factors, "factors");
        Objects.requireNonNull(spans, "spans");
        if (spans.length == 0) {
            throw new IllegalArgumentException("combine needs at least one span");
        }
        if (factors.length != spans.length) {
            throw new IllegalArgumentException("combine: factors has " + factors.length
                    + " entries but spans has " + spans.length);
        }
        double length = Objects.requireNonNull(spans[0], "spans[0]").length;
        List<SpanLoad> all = new ArrayList<>();
        for (int i = 0; i < spans.length; i++) {
            SimpleSpan span = Objects.requireNonNull(spans[i], "spans[" + i + "]");
            if (!Double.isFinite(factors[i])) {
                throw new IllegalArgumentException("combine: factors[" + i + "] must be finite, was " + factors[i]);
            }
            if (span.length != length) {
                throw new IllegalArgumentException("combine: spans[" + i + "] has length " + span.length
                        + " m, expected " + length + " m like spans[0]");
            }
            if (factors[i] != 0.0) {
                for (SpanLoad load : span.loads) {
                    all.add(load.scaled(factors[i]));
                }
            }
        }
        return build(length, List.copyOf(all));
    }

    @Override
    public String toString() {
        return "SimpleSpan[length=" + length + " m, loads=" + loads + "]";
    }

    private static double[] times(double[] a, double f) {
        double[] r = new double[a.length];
        for (int k = 0; k < a.length; k++) {
            r[k] = a[k] * f;
        }
        return r;
    }

    private static void checkStiffness(double ei) {
        if (!(ei > 0.0) || !Double.isFinite(ei)) {
            throw new IllegalArgumentException("EI must be a finite number of N·m² greater than 0, was " + ei);
        }
    }

    private double clamp(double x) {
        return Pieces.clamp(x, length);
    }

    /** Index of the piece holding x: {@code xs[k] <= x < xs[k+1]}, the last piece for x = L. */
    private int piece(double x) {
        return Pieces.piece(xs, length, x, "span");
    }
}
