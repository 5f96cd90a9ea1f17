package org.baywright.design;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
import org.baywright.load.LoadCase;

/**
 * The service loads on a simple-span member, by load case, without the member's own weight (the
 * designer adds that per candidate). All loads act downward.
 *
 * <p>The strength checks use these loads (live loads reduced where the standard permits). The
 * deflection checks use them too, unless {@link #withDeflectionLoads} gives other service loads for
 * serviceability: the unreduced live load, which common practice checks deflection under.
 */
public final class BeamLoads {
    private final double span;
    private final Map<LoadCase, SimpleSpan> cases;
    private final Map<LoadCase, SimpleSpan> deflectionCases;
    /** The supports, m from the start: 0 and {@code span} for a simple span, else an overhanging member. */
    private final double supportA;
    private final double supportB;

    private BeamLoads(double span, Map<LoadCase, SimpleSpan> cases, Map<LoadCase, SimpleSpan> deflectionCases) {
        this(span, cases, deflectionCases, 0, span);
    }

    private BeamLoads(double span, Map<LoadCase, SimpleSpan> cases, Map<LoadCase, SimpleSpan> deflectionCases,
            double supportA, double supportB) {
        this.span = span;
        this.cases = cases;
        this.deflectionCases = deflectionCases;
        this.supportA = supportA;
        this.supportB = supportB;
    }

    /**
     * Loads per case on a member of length {@code length} that overhangs its supports at {@code a} and
     * {@code b} (m from its start, {@code 0 ≤ a < b ≤ length}, not both at the ends): designed by
     * {@link OverhangDesigner}. The per-case {@link #of(LoadCase)} spans then only hold the loads; their
     * statics are those of {@link org.baywright.analysis.OverhangSpan}, not of a simple span.
     */
    public static BeamLoads overhanging(double length, double a, double b,
            Map<LoadCase, ? extends List<? extends SpanLoad>> loads) {
        BeamLoads s = of(length, loads);
        if (!(a >= 0 && a < b && b <= length) || (a == 0 && b == length)) {
            throw new IllegalArgumentException("an overhanging member needs supports 0 ≤ a < b ≤ L, not both at its ends; were a = "
                    + a + " m, b = " + b + " m, L = " + length + " m");
        }
        return new BeamLoads(length, s.cases, s.deflectionCases, a, b);
    }

    /** True when the member overhangs a support ({@link #overhanging}). */
    public boolean isOverhanging() {
        return supportA != 0 || supportB != span;
    }

    /** The first support, m from the start (0 for a simple span). */
    public double supportA() {
        return supportA;
    }

    /** The second support, m from the start (the span for a simple span). */
    public double supportB() {
        return supportB;
    }

    /** Loads per case on a span of {@code span} metres; missing cases carry nothing. */
    public static BeamLoads of(double span, Map<LoadCase, ? extends List<? extends SpanLoad>> loads) {
        if (!(span > 0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("span must be a positive length, got " + span);
        }
        Map<LoadCase, SimpleSpan> m = spans(span, loads);
        return new BeamLoads(span, m, m);
    }

    /**
     * The same strength loads with other service loads for the deflection checks (e.g. the live load
     * unreduced); the cases present must be the same.
     */
    public BeamLoads withDeflectionLoads(Map<LoadCase, ? extends List<? extends SpanLoad>> loads) {
        return new BeamLoads(span, cases, spans(span, loads), supportA, supportB);
    }

    /** True when the deflection checks use loads of their own ({@link #withDeflectionLoads}). */
    public boolean separateDeflectionLoads() {
        return deflectionCases != cases;
    }

    /** The statics of one case as the deflection checks take it (an empty span when the case has no load). */
    public SimpleSpan forDeflection(LoadCase c) {
        return deflectionCases.get(c);
    }

    private static Map<LoadCase, SimpleSpan> spans(double span, Map<LoadCase, ? extends List<? extends SpanLoad>> loads) {
        EnumMap<LoadCase, SimpleSpan> m = new EnumMap<>(LoadCase.class);
        for (LoadCase c : LoadCase.values()) {
            List<? extends SpanLoad> l = loads.get(c);
            SimpleSpan s = SimpleSpan.of(span, l == null ? List.of() : l);
            for (SpanLoad x : s.loads()) {
                if (x.total() < 0) {
                    throw new IllegalArgumentException(c.label() + " load " + x + " acts upward; gravity loads act downward");
                }
            }
            m.put(c, s);
        }
        return Collections.unmodifiableMap(m);
    }

    public double span() {
        return span;
    }

    /** The statics of one case (an empty span when the case has no load). */
    public SimpleSpan of(LoadCase c) {
        return cases.get(c);
    }

    /** Cases with any load on them. */
    public java.util.Set<LoadCase> present() {
        java.util.EnumSet<LoadCase> s = java.util.EnumSet.noneOf(LoadCase.class);
        for (Map.Entry<LoadCase, SimpleSpan> e : cases.entrySet()) {
            if (!e.getValue().loads().isEmpty() && e.getValue().totalLoad() != 0) {
                s.add(e.getKey());
            }
        }
        return s;
    }
}
