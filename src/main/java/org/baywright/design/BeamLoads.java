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
 */
public final class BeamLoads {
    private final double span;
    private final Map<LoadCase, SimpleSpan> cases;

    private BeamLoads(double span, Map<LoadCase, SimpleSpan> cases) {
        this.span = span;
        this.cases = cases;
    }

    /** Loads per case on a span of {@code span} metres; missing cases carry nothing. */
    public static BeamLoads of(double span, Map<LoadCase, ? extends List<? extends SpanLoad>> loads) {
        if (!(span > 0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("span must be a positive length, got " + span);
        }
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
        return new BeamLoads(span, Collections.unmodifiableMap(m));
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
