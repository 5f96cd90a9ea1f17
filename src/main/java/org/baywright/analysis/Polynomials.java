package org.baywright.analysis;

import java.util.Arrays;

/**
 * Small polynomial tools for the piecewise statics of {@link SimpleSpan}: Horner evaluation and
 * isolation of the real roots of a polynomial of low degree on a closed interval.
 *
 * <p>Coefficients are stored lowest degree first: {@code c[0] + c[1]·t + c[2]·t² + …}.
 *
 * <p>Root isolation works by recursion on the derivative: between two consecutive real roots of
 * {@code p'} the polynomial {@code p} is monotonic, so it has at most one root there, which is
 * found by bisection to the last representable bit. Roots where {@code p} changes sign are
 * reported, which is what a search for extremes needs; a root of even multiplicity (a touch without
 * crossing) is reported only if {@code p} evaluates to exactly zero there, which does no harm to
 * such a search.
 *
 * <p>Known limitations: a root whose sign change is smaller than the rounding noise of evaluating
 * {@code p} may be missed or moved within that noise; for the well-scaled local polynomials of a
 * span piece this changes an extreme value only at the level of rounding.
 */
final class Polynomials {

    private static final int MAX_BISECTIONS = 200;

    private Polynomials() {
    }

    /** Value of {@code c} at {@code t} by Horner's rule. */
    static double eval(double[] c, double t) {
        double r = 0.0;
        for (int k = c.length - 1; k >= 0; k--) {
            r = r * t + c[k];
        }
        return r;
    }

    /** Value at {@code t} of the {@code count} coefficients of {@code c} starting at {@code from}. */
    static double evalAt(double[] c, int from, int count, double t) {
        double r = 0.0;
        for (int k = from + count - 1; k >= from; k--) {
            r = r * t + c[k];
        }
        return r;
    }

    /**
     * Real roots of {@code c0 + c1·t + c2·t²}, written to {@code out} (length ≥ 2) by the
     * cancellation-free form of the quadratic formula; returns how many (0, 1 or 2). A polynomial
     * that is identically zero has no isolated roots and returns 0.
     */
    static int quadraticRoots(double c0, double c1, double c2, double[] out) {
        if (c2 == 0.0) {
            if (c1 == 0.0) {
                return 0;
            }
            out[0] = -c0 / c1;
            return 1;
        }
        double disc = c1 * c1 - 4.0 * c2 * c0;
        if (disc < 0.0) {
            return 0;
        }
        double q = -0.5 * (c1 + Math.copySign(Math.sqrt(disc), c1));
        if (q == 0.0) { // c1 = 0 and c0 = 0: double root at t = 0
            out[0] = 0.0;
            return 1;
        }
        out[0] = q / c2;
        out[1] = c0 / q;
        return 2;
    }

    /** Coefficients of the derivative of {@code c}. */
    static double[] derivative(double[] c) {
        if (c.length <= 1) {
            return new double[0];
        }
        double[] d = new double[c.length - 1];
        for (int k = 1; k < c.length; k++) {
            d[k - 1] = k * c[k];
        }
        return d;
    }

    /**
     * The sign-changing real roots of {@code c} strictly inside {@code (lo, hi)}, ascending
     * (see the class comment for roots of even multiplicity).
     */
    static double[] signChangeRoots(double[] c, double lo, double hi) {
        int degree = c.length - 1;
        while (degree >= 0 && c[degree] == 0.0) {
            degree--;
        }
        if (degree <= 0) {
            return new double[0];
        }
        if (degree == 1) {
            double t = -c[0] / c[1];
            return t > lo && t < hi ? new double[] {t} : new double[0];
        }
        double[] trimmed = degree == c.length - 1 ? c : Arrays.copyOf(c, degree + 1);
        double[] critical = signChangeRoots(derivative(trimmed), lo, hi);
        double[] roots = new double[critical.length + 1];
        int n = 0;
        double a = lo;
        double fa = eval(trimmed, a);
        for (int i = 0; i <= critical.length; i++) {
            double b = i < critical.length ? critical[i] : hi;
            double fb = eval(trimmed, b);
            if (fb == 0.0) {
                if (b < hi && fa != 0.0) {
                    roots[n++] = b;
                }
            } else if (fa != 0.0 && (fa < 0.0) != (fb < 0.0)) {
                roots[n++] = bisect(trimmed, a, fa, b);
            }
            a = b;
            fa = fb;
        }
        return Arrays.copyOf(roots, n);
    }

    /** Root of a polynomial that changes sign once on {@code [a, b]}, {@code fa = p(a) != 0}. */
    private static double bisect(double[] c, double a, double fa, double b) {
        boolean negativeAtA = fa < 0.0;
        for (int i = 0; i < MAX_BISECTIONS; i++) {
            double m = 0.5 * (a + b);
            if (m <= a || m >= b) {
                break;
            }
            double fm = eval(c, m);
            if (fm == 0.0) {
                return m;
            }
            if ((fm < 0.0) == negativeAtA) {
                a = m;
            } else {
                b = m;
            }
        }
        return 0.5 * (a + b);
    }

    /** Throws a clear message when a scale factor is NaN or infinite. */
    static double checkFactor(double factor) {
        if (!Double.isFinite(factor)) {
            throw new IllegalArgumentException("scale factor must be a finite number, was " + factor);
        }
        return factor;
    }
}
