package org.baywright.analysis;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Behaviour of {@link SimpleSpan}: the laws of statics it must obey for any load set, superposition,
 * symmetry, the shear-jump convention and input validation. Expected values come from statics
 * (equilibrium ΣFy = 0, ΣM = 0, dM/dx = V, EI·y'' = −M, linearity), which is common practice;
 * each check names the law it relies on.
 */
class SimpleSpanTest {

    private static final double EI = 4.2e7; // N·m², arbitrary

    /** A span length and a load set on it, for the property tests. */
    record Case(double length, List<SpanLoad> loads) {
        SimpleSpan span() {
            return SimpleSpan.of(length, loads);
        }

        /** Σ|load|, N: the scale that rounding errors are measured against. */
        double scale() {
            double s = 0.0;
            for (SpanLoad load : loads) {
                s += load instanceof DistributedLoad d
                        ? 0.5 * (Math.abs(d.wStart()) + Math.abs(d.wEnd())) * d.length()
                        : Math.abs(load.total());
            }
            return Math.max(s, 1.0);
        }

        /** x of every load position and load end: where V jumps or changes law. */
        List<Double> breakpoints() {
            List<Double> xs = new ArrayList<>();
            for (SpanLoad load : loads) {
                if (load instanceof PointLoad p) {
                    xs.add(p.position());
                } else if (load instanceof DistributedLoad d) {
                    xs.add(d.start());
                    xs.add(d.end());
                }
            }
            return xs;
        }
    }

    @Provide
    Arbitrary<Case> cases() {
        return Arbitraries.doubles().between(0.5, 40.0).flatMap(length ->
                load(length).list().ofMinSize(0).ofMaxSize(8).map(loads -> new Case(length, loads)));
    }

    private static Arbitrary<SpanLoad> load(double length) {
        Arbitrary<Double> fraction = Arbitraries.doubles().between(0.0, 1.0);
        Arbitrary<SpanLoad> point = Combinators.combine(fraction, Arbitraries.doubles().between(-2e5, 2e5))
                .as((f, p) -> new PointLoad(f * length, p));
        Arbitrary<SpanLoad> line = Combinators.combine(fraction, fraction,
                        Arbitraries.doubles().between(-5e4, 5e4), Arbitraries.doubles().between(-5e4, 5e4))
                .filter((a, b, w1, w2) -> Math.abs(a - b) > 1e-6)
                .as((a, b, w1, w2) -> new DistributedLoad(Math.min(a, b) * length, Math.max(a, b) * length, w1, w2));
        return Arbitraries.oneOf(point, line);
    }

    private static double[] samples(double length, int n) {
        double[] xs = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            xs[i] = length * i / n;
        }
        xs[n] = length;
        return xs;
    }

    // ------------------------------------------------------------------------------------------
    // Laws of statics for random load mixes.
    // ------------------------------------------------------------------------------------------

    @Property(tries = 300)
    void reactionsBalanceTheLoads(@ForAll("cases") Case c) {
        SimpleSpan span = c.span();
        double tol = 1e-12 * c.scale();
        double sum = 0.0; // Σ load × lever arm about x = 0
        for (SpanLoad load : c.loads()) {
            if (load instanceof PointLoad p) {
                sum += p.force() * p.position();
            } else if (load instanceof DistributedLoad d) {
                // resultant of a trapezoid = uniform part + triangular part, each at its centroid
                double len = d.length();
                sum += d.wStart() * len * (d.start() + len / 2.0)
                        + 0.5 * (d.wEnd() - d.wStart()) * len * (d.start() + 2.0 * len / 3.0);
            }
        }
        double momentAboutLeft = sum;
        double l = c.length();
        assertAll(
                // statics ΣFy = 0 (common practice)
                () -> assertEquals(span.totalLoad(), span.leftReaction() + span.rightReaction(), tol * 10),
                // statics ΣM about the left support = 0 (common practice)
                () -> assertEquals(momentAboutLeft, span.rightReaction() * l, tol * l * 10),
                // a simple support carries no moment and does not move (common practice)
                () -> assertEquals(0.0, span.moment(0.0), tol * l),
                () -> assertEquals(0.0, span.moment(l), 1e-10 * c.scale() * l),
                () -> assertEquals(0.0, span.deflection(0.0, EI), 1e-15),
                () -> assertEquals(0.0, span.deflection(l, EI), 1e-10 * c.scale() * l * l * l / EI));
    }

    @Property(tries = 200)
    void shearIsTheDerivativeOfMomentAndMomentTheCurvature(@ForAll("cases") Case c) {
        SimpleSpan span = c.span();
        double l = c.length();
        double h = 1e-4 * l;
        double maxSlope = 0.0; // bound on |q'|, N/m²
        double maxIntensity = 0.0; // bound on |q|, N/m
        for (SpanLoad load : c.loads()) {
            if (load instanceof DistributedLoad d) {
                maxSlope += Math.abs(d.slope());
                maxIntensity += Math.max(Math.abs(d.wStart()), Math.abs(d.wEnd()));
            }
        }
        // truncation error of the central differences, M being cubic and y quintic on a piece:
        // h²·|M'''|/6 = h²·|q'|/6 and, to leading order, h²·|y''''|/12 = h²·|q|/(12·EI)
        double vTruncation = h * h * maxSlope / 6.0;
        double curvatureTruncation = h * h * maxIntensity / (12.0 * EI);
        List<Executable> checks = new ArrayList<>();
        for (double x : samples(l, 37)) {
            if (x - 2 * h < 0 || x + 2 * h > l || c.breakpoints().stream().anyMatch(b -> Math.abs(b - x) < 3 * h)) {
                continue;
            }
            // dM/dx = V (common practice); central difference, error O(h²·q') plus rounding
            double dm = (span.moment(x + h) - span.moment(x - h)) / (2 * h);
            checks.add(() -> assertEquals(span.shear(x), dm, 1e-7 * c.scale() + 1.01 * vTruncation,
                    "dM/dx at x = " + x));
            // EI·y'' = −M (common practice); second difference
            double d2y = (span.deflection(x + h, EI) - 2 * span.deflection(x, EI) + span.deflection(x - h, EI)) / (h * h);
            checks.add(() -> assertEquals(-span.moment(x) / EI, d2y,
                    1e-6 * c.scale() * l / EI + 1.01 * curvatureTruncation, "y'' at x = " + x));
        }
        assertAll(checks);
    }

    @Property(tries = 200)
    void extremesBoundEverySampleAndAreAttained(@ForAll("cases") Case c) {
        SimpleSpan span = c.span();
        double l = c.length();
        Extreme m = span.maxMoment();
        Extreme v = span.maxShear();
        Extreme y = span.maxDeflection(EI);
        double mTol = 1e-10 * c.scale() * l;
        double yTol = 1e-10 * c.scale() * l * l * l / EI;
        List<Executable> checks = new ArrayList<>();
        for (double x : samples(l, 401)) {
            // an absolute maximum is not exceeded anywhere (definition)
            checks.add(() -> assertTrue(Math.abs(span.moment(x)) <= m.magnitude() + mTol, "M at " + x));
            checks.add(() -> assertTrue(Math.abs(span.shear(x)) <= v.magnitude() + 1e-10 * c.scale(), "V at " + x));
            checks.add(() -> assertTrue(Math.abs(span.deflection(x, EI)) <= y.magnitude() + yTol, "y at " + x));
        }
        // the reported value is the value at the reported position (definition)
        checks.add(() -> assertEquals(span.moment(m.position()), m.value(), mTol));
        checks.add(() -> assertEquals(span.deflection(y.position(), EI), y.value(), yTol));
        assertAll(checks);
    }

    @Property(tries = 150)
    void superpositionScalingAndCombinationMatchTheMergedLoadSet(
            @ForAll("cases") Case a, @ForAll("cases") Case b) {
        double l = a.length();
        Case bOnA = new Case(l, rescale(b.loads(), b.length(), l));
        double fa = 1.2;
        double fb = -0.7;
        SimpleSpan sa = a.span();
        SimpleSpan sb = bOnA.span();
        List<SpanLoad> merged = new ArrayList<>(a.loads());
        merged.addAll(bOnA.loads());
        List<SpanLoad> factored = new ArrayList<>();
        a.loads().forEach(x -> factored.add(x.scaled(fa)));
        bOnA.loads().forEach(x -> factored.add(x.scaled(fb)));
        // linearity of elastic statics (common practice): the response to a sum is the sum of responses
        assertSameResponse(SimpleSpan.of(l, merged), sa.plus(sb), a.scale() + bOnA.scale());
        assertSameResponse(SimpleSpan.of(l, factored), SimpleSpan.combine(new double[] {fa, fb}, sa, sb),
                a.scale() + bOnA.scale());
        List<SpanLoad> scaledA = new ArrayList<>();
        a.loads().forEach(x -> scaledA.add(x.scaled(-2.5)));
        assertSameResponse(SimpleSpan.of(l, scaledA), sa.scaled(-2.5), 2.5 * a.scale());
    }

    private static List<SpanLoad> rescale(List<SpanLoad> loads, double from, double to) {
        double k = to / from;
        List<SpanLoad> out = new ArrayList<>();
        for (SpanLoad load : loads) {
            if (load instanceof PointLoad p) {
                out.add(new PointLoad(Math.min(p.position() * k, to), p.force()));
            } else if (load instanceof DistributedLoad d) {
                out.add(new DistributedLoad(d.start() * k, Math.min(d.end() * k, to), d.wStart(), d.wEnd()));
            }
        }
        return out;
    }

    private static void assertSameResponse(SimpleSpan expected, SimpleSpan actual, double scale) {
        double l = expected.length();
        double s = Math.max(scale, 1.0);
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(expected.leftReaction(), actual.leftReaction(), 1e-10 * s, "R1"));
        checks.add(() -> assertEquals(expected.rightReaction(), actual.rightReaction(), 1e-10 * s, "R2"));
        checks.add(() -> assertEquals(expected.maxMoment().magnitude(), actual.maxMoment().magnitude(), 1e-10 * s * l, "|M|max"));
        checks.add(() -> assertEquals(expected.maxDeflection(EI).magnitude(), actual.maxDeflection(EI).magnitude(),
                1e-10 * s * l * l * l / EI, "|y|max"));
        for (double x : samples(l, 53)) {
            checks.add(() -> assertEquals(expected.shear(x), actual.shear(x), 1e-9 * s, "V at " + x));
            checks.add(() -> assertEquals(expected.moment(x), actual.moment(x), 1e-10 * s * l, "M at " + x));
            checks.add(() -> assertEquals(expected.deflection(x, EI), actual.deflection(x, EI),
                    1e-10 * s * l * l * l / EI, "y at " + x));
        }
        assertAll(checks);
    }

    @Property(tries = 150)
    void mirroredLoadsGiveMirroredResponse(@ForAll("cases") Case c) {
        double l = c.length();
        List<SpanLoad> mirrored = new ArrayList<>();
        for (SpanLoad load : c.loads()) {
            if (load instanceof PointLoad p) {
                mirrored.add(new PointLoad(l - p.position(), p.force()));
            } else if (load instanceof DistributedLoad d) {
                mirrored.add(new DistributedLoad(l - d.end(), l - d.start(), d.wEnd(), d.wStart()));
            }
        }
        SimpleSpan span = c.span();
        SimpleSpan mirror = SimpleSpan.of(l, mirrored);
        double s = c.scale();
        List<Executable> checks = new ArrayList<>();
        // symmetry of a simple span about midspan (common practice): R1 ↔ R2, M(x) = M'(L − x), y(x) = y'(L − x)
        checks.add(() -> assertEquals(span.leftReaction(), mirror.rightReaction(), 1e-10 * s));
        checks.add(() -> assertEquals(span.maxMoment().magnitude(), mirror.maxMoment().magnitude(), 1e-10 * s * l));
        checks.add(() -> assertEquals(span.maxShear().magnitude(), mirror.maxShear().magnitude(), 1e-10 * s));
        checks.add(() -> assertEquals(span.maxDeflection(EI).magnitude(), mirror.maxDeflection(EI).magnitude(),
                1e-10 * s * l * l * l / EI));
        for (double x : samples(l, 29)) {
            checks.add(() -> assertEquals(span.moment(x), mirror.moment(l - x), 1e-10 * s * l, "M at " + x));
            checks.add(() -> assertEquals(span.deflection(x, EI), mirror.deflection(l - x, EI),
                    1e-10 * s * l * l * l / EI, "y at " + x));
        }
        assertAll(checks);
    }

    // ------------------------------------------------------------------------------------------
    // Specific behaviour.
    // ------------------------------------------------------------------------------------------

    @Test
    void symmetricLoadsPeakAtMidspan() {
        double l = 9.0;
        SimpleSpan span = SimpleSpan.of(l, List.of(
                new DistributedLoad(1.0, 4.0, 2_000.0, 7_000.0),
                new DistributedLoad(5.0, 8.0, 7_000.0, 2_000.0),
                new PointLoad(4.5, 30_000.0)));
        assertAll(
                // symmetry about midspan (common practice)
                () -> assertEquals(span.leftReaction(), span.rightReaction(), 1e-9),
                () -> assertEquals(l / 2.0, span.maxMoment().position(), 1e-12),
                () -> assertEquals(l / 2.0, span.maxDeflection(EI).position(), 1e-6),
                () -> assertEquals(span.moment(2.3), span.moment(l - 2.3), 1e-8),
                () -> assertEquals(span.shear(2.3), -span.shear(l - 2.3), 1e-9));
    }

    @Test
    void shearAtAPointLoadIsTheValueAfterTheJump() {
        SimpleSpan span = SimpleSpan.of(6.0, List.of(new PointLoad(2.0, 9_000.0)));
        assertAll(
                // Table 3-23 Case 8 (CHECK-VALUES.md §5): R1 = Pb/l = 9000·4/6 = 6000 N, R2 = Pa/l = 3000 N
                () -> assertEquals(6_000.0, span.shear(0.0), 1e-9),
                () -> assertEquals(6_000.0, span.shear(Math.nextDown(2.0)), 1e-9),
                // statics: V drops by P at the load, 6000 − 9000 (common practice)
                () -> assertEquals(-3_000.0, span.shear(2.0), 1e-9),
                // documented convention: shear(L) is the value just left of the right support, −R2
                () -> assertEquals(-3_000.0, span.shear(6.0), 1e-9),
                // max |V| = R1 = 6000 N at the left support (Case 8)
                () -> assertEquals(new Extreme(6_000.0, 0.0), span.maxShear()));
    }

    @Test
    void pointLoadsOnTheSupportsGoStraightIntoThem() {
        SimpleSpan span = SimpleSpan.of(5.0, List.of(new PointLoad(0.0, 4_000.0), new PointLoad(5.0, 1_500.0)));
        assertAll(
                // statics: a load over a support is carried by that support alone (common practice)
                () -> assertEquals(4_000.0, span.leftReaction(), 0.0),
                () -> assertEquals(1_500.0, span.rightReaction(), 0.0),
                () -> assertEquals(0.0, span.shear(0.0), 0.0),
                () -> assertEquals(0.0, span.shear(5.0), 0.0),
                () -> assertEquals(0.0, span.moment(2.5), 0.0),
                () -> assertEquals(0.0, span.deflection(2.5, EI), 0.0),
                () -> assertEquals(0.0, span.maxMoment().value(), 0.0));
    }

    @Test
    void noLoadsMeansNothingHappens() {
        SimpleSpan span = SimpleSpan.of(4.0, List.of());
        // an unloaded beam has no reactions, forces or deflection (common practice)
        assertAll(
                () -> assertEquals(0.0, span.leftReaction(), 0.0),
                () -> assertEquals(0.0, span.rightReaction(), 0.0),
                () -> assertEquals(0.0, span.shear(1.0), 0.0),
                () -> assertEquals(0.0, span.moment(1.0), 0.0),
                () -> assertEquals(0.0, span.deflection(1.0, EI), 0.0),
                () -> assertEquals(0.0, span.maxMoment().value(), 0.0),
                () -> assertEquals(0.0, span.maxShear().value(), 0.0),
                () -> assertEquals(0.0, span.maxDeflection(EI).value(), 0.0));
    }

    @Test
    void upliftGivesSignedHoggingExtremes() {
        double l = 8.0;
        double w = -3_000.0; // N/m, upward
        SimpleSpan span = SimpleSpan.of(l, List.of(DistributedLoad.full(l, w)));
        assertAll(
                // Table 3-23 Case 1 (CHECK-VALUES.md §5) with negative w: M = wl²/8 = −24000 N·m
                () -> assertEquals(-24_000.0, span.maxMoment().value(), 1e-8),
                () -> assertEquals(24_000.0, span.maxMoment().magnitude(), 1e-8),
                // Case 1: Δ = 5wl⁴/(384EI), negative = upward
                () -> assertEquals(5.0 * w * Math.pow(l, 4) / (384.0 * EI), span.maxDeflection(EI).value(), 1e-15),
                // Case 1: V = wl/2 in magnitude
                () -> assertEquals(12_000.0, span.maxShear().value(), 1e-9));
    }

    @Test
    void closelySpacedLoadsAndManyPiecesStayExact() {
        double l = 12.0;
        List<PointLoad> loads = new ArrayList<>();
        for (int i = 1; i < 200; i++) {
            loads.add(new PointLoad(l * i / 200.0, 1_000.0 + i)); // 199 loads of different sizes
        }
        loads.add(new PointLoad(6.0 + 1e-12, 5_000.0)); // 1e-12 m from the load at midspan
        SimpleSpan span = SimpleSpan.of(l, loads);
        List<Executable> checks = new ArrayList<>();
        for (double x : new double[] {0.7, 4.03, 6.0, 6.0 + 5e-13, 9.99}) {
            double m = 0.0;
            double y = 0.0;
            for (PointLoad load : loads) {
                double a = load.position();
                double b = l - a;
                double p = load.force();
                // Table 3-23 Case 8 (from memory), superposed: Mx = Pbx/l for x < a, Pa(l − x)/l for x > a
                m += x < a ? p * b * x / l : p * a * (l - x) / l;
                // Table 3-23 Case 8 (from memory): Δx = Pbx(l² − b² − x²)/(6EIl) for x < a, mirrored for x > a
                y += x < a ? p * b * x * (l * l - b * b - x * x) / (6.0 * EI * l)
                        : p * a * (l - x) * (2.0 * l * x - x * x - a * a) / (6.0 * EI * l);
            }
            double mx = m;
            double yx = y;
            checks.add(() -> assertEquals(mx, span.moment(x), 1e-9 * mx, "M at " + x));
            checks.add(() -> assertEquals(yx, span.deflection(x, EI), 1e-9 * yx, "y at " + x));
        }
        // statics ΣFy = 0 (common practice): 199 loads averaging 1100 N plus 5000 N
        checks.add(() -> assertEquals(199 * 1_100.0 + 5_000.0, span.leftReaction() + span.rightReaction(), 1e-8));
        assertAll(checks);
    }

    @Test
    void scalingByZeroGivesAnUnloadedSpan() {
        SimpleSpan span = SimpleSpan.of(5.0, List.of(DistributedLoad.full(5.0, 1_000.0))).scaled(0.0);
        // linearity (common practice): zero load, zero response
        assertAll(
                () -> assertEquals(0.0, span.leftReaction(), 0.0),
                () -> assertEquals(0.0, span.maxMoment().magnitude(), 0.0),
                () -> assertEquals(0.0, span.maxDeflection(EI).magnitude(), 0.0));
    }

    // ------------------------------------------------------------------------------------------
    // Validation messages.
    // ------------------------------------------------------------------------------------------

    private static String message(Executable e) {
        return assertThrows(IllegalArgumentException.class, e).getMessage();
    }

    @Test
    void badInputIsRefusedWithAMessageThatSaysWhere() {
        SimpleSpan span = SimpleSpan.of(6.0, List.of(DistributedLoad.full(6.0, 1.0)));
        List<SpanLoad> wrongPoint = List.of(DistributedLoad.full(6.0, 1.0), new PointLoad(6.5, 10.0));
        List<SpanLoad> wrongLine = List.of(new DistributedLoad(-0.5, 2.0, 1.0, 1.0));
        assertAll(
                () -> assertTrue(message(() -> SimpleSpan.of(0.0, List.of())).contains("span length")),
                () -> assertTrue(message(() -> SimpleSpan.of(-3.0, List.of())).contains("greater than 0")),
                () -> assertTrue(message(() -> SimpleSpan.of(Double.NaN, List.of())).contains("NaN")),
                () -> assertTrue(message(() -> SimpleSpan.of(Double.POSITIVE_INFINITY, List.of())).contains("finite")),
                () -> {
                    String m = message(() -> SimpleSpan.of(6.0, wrongPoint));
                    assertTrue(m.contains("loads[1]") && m.contains("position") && m.contains("6.5")
                            && m.contains("[0, 6.0]"), m);
                },
                () -> {
                    String m = message(() -> SimpleSpan.of(6.0, wrongLine));
                    assertTrue(m.contains("loads[0]") && m.contains("start") && m.contains("[0, 6.0]"), m);
                },
                () -> assertTrue(message(() -> new DistributedLoad(2.0, 2.0, 1.0, 1.0)).contains("less than")),
                () -> assertTrue(message(() -> new DistributedLoad(3.0, 2.0, 1.0, 1.0)).contains("less than")),
                () -> assertTrue(message(() -> new DistributedLoad(0.0, 2.0, Double.NaN, 1.0)).contains("wStart")),
                () -> assertTrue(message(() -> new PointLoad(1.0, Double.POSITIVE_INFINITY)).contains("force")),
                () -> assertTrue(message(() -> new PointLoad(Double.NaN, 1.0)).contains("position")),
                () -> assertTrue(message(() -> span.moment(6.1)).contains("outside the span")),
                () -> assertTrue(message(() -> span.shear(-0.1)).contains("outside the span")),
                () -> assertTrue(message(() -> span.deflection(1.0, 0.0)).contains("EI")),
                () -> assertTrue(message(() -> span.maxDeflection(-1.0)).contains("EI")),
                () -> assertTrue(message(() -> span.scaled(Double.NaN)).contains("factor")),
                () -> assertTrue(message(() -> span.plus(SimpleSpan.of(5.0, List.of()))).contains("different lengths")),
                () -> assertTrue(message(() -> SimpleSpan.combine(new double[] {1.0}, span, span)).contains("factors")),
                () -> assertTrue(message(() -> SimpleSpan.combine(new double[] {1.0, 1.0}, span,
                        SimpleSpan.of(5.0, List.of()))).contains("spans[1]")),
                () -> assertTrue(message(() -> SimpleSpan.combine(new double[0])).contains("at least one")),
                () -> assertThrows(NullPointerException.class,
                        () -> SimpleSpan.of(6.0, java.util.Arrays.asList(new PointLoad(1.0, 1.0), null))));
    }

    @Test
    void positionsARoundingErrorOutsideTheSpanAreClampedToTheSupport() {
        SimpleSpan span = SimpleSpan.of(6.0, List.of(DistributedLoad.full(6.0, 1_000.0)));
        // documented slack of 1e-9 relative; at the support M = 0 (Case 1, Mx = wx(l − x)/2)
        assertEquals(0.0, span.moment(6.0 * (1.0 + 1e-12)), 1e-9);
    }

    @Test
    void loadsAreKeptAndTotalled() {
        List<SpanLoad> loads = List.of(new PointLoad(1.0, 500.0), new DistributedLoad(0.0, 4.0, 100.0, 300.0));
        SimpleSpan span = SimpleSpan.of(4.0, loads);
        assertAll(
                () -> assertEquals(loads, span.loads()),
                // trapezoid resultant (w1 + w2)/2 · length = 200·4 = 800 N, plus 500 N (common practice)
                () -> assertEquals(1_300.0, span.totalLoad(), 1e-12),
                () -> assertThrows(UnsupportedOperationException.class, () -> span.loads().add(new PointLoad(1.0, 1.0))));
    }
}
