package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.OverhangSpan;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Section;
import org.baywright.design.Bracing;
import org.baywright.geometry.FloorTributary;
import org.baywright.geometry.LineShare;
import org.baywright.geometry.LoadShare;
import org.baywright.geometry.MemberTributary;
import org.baywright.geometry.WidthSegment;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.PointLoadItem;

/**
 * The service loads on one member, by component and unreduced: the deck's area loads through its
 * tributary widths, the line and point loads it receives, and the reactions of the members framing
 * into it; with the deck area those loads come from.
 *
 * @param byComponent the loads by {@link Component} ordinal
 * @param l0 the largest live intensity received per component, Pa (for ASCE 7-16 §4.7.3)
 * @param ownArea the deck area it carries directly, m²
 * @param deliveredArea the deck area whose load it receives: its own and what frames into it, m²
 * @param startShare the part of the delivered area that passes on at the start end
 * @param bracePoints positions of the members framing in, as fractions of the span (interior ones only)
 * @param wetOwnWeight the member's own weight is dead load in place before the concrete hardens
 *     ({@link Component#D_WET}: a floor whose decks describe their slab), else plain dead load
 */
record MemberLoads(List<List<SpanLoad>> byComponent, double[] l0, double ownArea, double deliveredArea, double startShare,
        List<Double> bracePoints, boolean wetOwnWeight) {
    /** A load piece shorter than this along the span (m, a nanometre) has no length and carries nothing. */
    static final double NO_LENGTH = 1e-9;

    private static final int NC = Component.values().length;

    /** A member's reaction arriving on the member that supports it. */
    record Incoming(double position, double[] reaction, double area, double[] l0) {
    }

    /** Assembles the loads of member {@code m} of {@code floor}. */
    static MemberLoads of(Member m, Floor floor, FloorTributary trib, List<Incoming> incoming, boolean partitionAsDead,
            Map<String, double[]> slabs) {
        return of(m, floor, trib, incoming, partitionAsDead, slabs, 0, m.length());
    }

    /**
     * Assembles the loads of member {@code m} on supports at {@code a} and {@code b} (m from its start;
     * 0 and its length for a simple span, else an overhanging member): the area passed to each support
     * follows the statics of the member on those supports.
     */
    static MemberLoads of(Member m, Floor floor, FloorTributary trib, List<Incoming> incoming, boolean partitionAsDead,
            Map<String, double[]> slabs, double a, double b) {
        double span = m.length();
        List<List<SpanLoad>> comp = new ArrayList<>();
        for (int c = 0; c < NC; c++) {
            comp.add(new ArrayList<>());
        }
        List<SpanLoad> areaFlow = new ArrayList<>();
        double[] l0 = new double[NC];
        MemberTributary mt = trib.members().get(m.id());
        double own = mt == null ? 0 : mt.area();
        if (mt != null) {
            deck(mt, floor, span, partitionAsDead, slabs, comp, areaFlow, l0);
        }
        lineLoads(m, floor, trib, span, partitionAsDead, comp);
        pointLoads(m, floor, trib, span, partitionAsDead, comp);
        List<Double> bracePoints = new ArrayList<>();
        double incomingArea = 0;
        for (Incoming i : incoming) {
            double s = clamp(i.position(), span);
            for (int c = 0; c < NC; c++) {
                if (i.reaction()[c] != 0) {
                    comp.get(c).add(new PointLoad(s, i.reaction()[c]));
                }
                l0[c] = Math.max(l0[c], i.l0()[c]);
            }
            if (i.area() != 0) {
                areaFlow.add(new PointLoad(s, i.area()));
            }
            incomingArea += i.area();
            if (s > Takedown.TOLERANCE && s < span - Takedown.TOLERANCE) {
                bracePoints.add(s / span);
            }
        }
        double at = own + incomingArea;
        double share;
        if (a == 0 && b == span) {
            share = at > 0 ? SimpleSpan.of(span, areaFlow).leftReaction() / at : 0.5;
        } else {
            // an overhanging member: the area goes to its two supports by the lever rule (kept within [0, 1])
            share = at > 0 ? Math.max(0, Math.min(1, OverhangSpan.of(span, a, b, areaFlow).reactionA() / at)) : 0.5;
        }
        return new MemberLoads(comp, l0, own, at, share, bracePoints, !slabs.isEmpty());
    }

    /** The deck: its width profile into the area flow, each area load through its widths by component. */
    private static void deck(MemberTributary mt, Floor floor, double span, boolean partitionAsDead, Map<String, double[]> slabs,
            List<List<SpanLoad>> comp, List<SpanLoad> areaFlow, double[] l0) {
        for (WidthSegment w : mt.widths()) {
            if (clamp(w.s1(), span) - clamp(w.s0(), span) <= NO_LENGTH) {
                continue;
            }
            areaFlow.add(new DistributedLoad(clamp(w.s0(), span), clamp(w.s1(), span), w.w0(), w.w1()));
        }
        for (AreaLoad al : floor.areaLoads()) {
            List<WidthSegment> segs = mt.areaLoadWidths().get(al.id());
            if (segs == null || segs.isEmpty()) {
                continue;
            }
            double[] slab = slabs.get(al.id());
            double[] q = slab != null ? slab : ServiceLoads.split(al.values(), al.use(), partitionAsDead, l0);
            for (WidthSegment w : segs) {
                if (clamp(w.s1(), span) - clamp(w.s0(), span) <= NO_LENGTH) {
                    continue;
                }
                for (int c = 0; c < NC; c++) {
                    if (q[c] != 0) {
                        comp.get(c).add(new DistributedLoad(clamp(w.s0(), span), clamp(w.s1(), span), w.w0() * q[c],
                                w.w1() * q[c]));
                    }
                }
            }
        }
    }

    private static void lineLoads(Member m, Floor floor, FloorTributary trib, double span, boolean partitionAsDead,
            List<List<SpanLoad>> comp) {
        for (LineLoad ll : floor.lineLoads()) {
            for (LineShare sh : trib.lineShares().getOrDefault(ll.id(), List.of())) {
                if (!sh.memberId().equals(m.id())) {
                    continue;
                }
                double[] q = ServiceLoads.concentrated(ll.values(), partitionAsDead);
                for (int c = 0; c < NC; c++) {
                    if (q[c] == 0) {
                        continue;
                    }
                    if (sh.isConcentrated()) {
                        comp.get(c).add(new PointLoad(clamp(sh.s0(), span), sh.force(q[c])));
                    } else if (clamp(sh.s1(), span) - clamp(sh.s0(), span) > NO_LENGTH) {
                        comp.get(c).add(new DistributedLoad(clamp(sh.s0(), span), clamp(sh.s1(), span), sh.f0() * q[c],
                                sh.f1() * q[c]));
                    }
                }
            }
        }
    }

    private static void pointLoads(Member m, Floor floor, FloorTributary trib, double span, boolean partitionAsDead,
            List<List<SpanLoad>> comp) {
        for (PointLoadItem pl : floor.pointLoads()) {
            for (LoadShare sh : trib.pointShares().getOrDefault(pl.id(), List.of())) {
                if (!sh.memberId().equals(m.id())) {
                    continue;
                }
                double[] q = ServiceLoads.concentrated(pl.values(), partitionAsDead);
                for (int c = 0; c < NC; c++) {
                    if (q[c] != 0) {
                        comp.get(c).add(new PointLoad(clamp(sh.s(), span), sh.fraction() * q[c]));
                    }
                }
            }
        }
    }

    /**
     * The lateral bracing of the compression flange: continuous for beams and for girders that carry
     * deck directly with nothing framing in; else at the members framing in, or unbraced between the
     * supports when nothing frames in and no deck bears on it.
     */
    Bracing bracing(MemberKind kind) {
        if (kind == MemberKind.GIRDER && bracePoints.isEmpty() && ownArea == 0) {
            return Bracing.equalSegments(1);
        }
        return kind == MemberKind.BEAM || bracePoints.isEmpty() && ownArea > 0 ? Bracing.continuous()
                : Bracing.atFractions(bracePoints.stream().distinct().mapToDouble(Double::doubleValue).toArray());
    }

    /** A member's end reactions by component, N. */
    record Reactions(double[] start, double[] end) {
    }

    /** End reactions by component: the loads unreduced, the section's own weight in D (none without a section). */
    Reactions reactions(double span, Section section) {
        double[] r0 = new double[NC];
        double[] r1 = new double[NC];
        for (int c = 0; c < NC; c++) {
            if (byComponent.get(c).isEmpty()) {
                continue;
            }
            SimpleSpan s = SimpleSpan.of(span, byComponent.get(c));
            r0[c] = s.leftReaction();
            r1[c] = s.rightReaction();
        }
        double sw = section == null ? 0 : section.weight() * span / 2;
        int own = wetOwnWeight ? Component.D_WET.ordinal() : Component.D.ordinal();
        r0[own] += sw;
        r1[own] += sw;
        return new Reactions(r0, r1);
    }

    /**
     * Reactions of an overhanging member at its supports {@code a} and {@code b} by component (the
     * statics of {@link OverhangSpan}): {@code start} at a, {@code end} at b; own weight in D.
     */
    Reactions reactions(double span, Section section, double a, double b) {
        double[] r0 = new double[NC];
        double[] r1 = new double[NC];
        for (int c = 0; c < NC; c++) {
            List<SpanLoad> l = new ArrayList<>(byComponent.get(c));
            if (c == (wetOwnWeight ? Component.D_WET : Component.D).ordinal() && section != null) {
                l.add(DistributedLoad.full(span, section.weight()));
            }
            if (l.isEmpty()) {
                continue;
            }
            OverhangSpan s = OverhangSpan.of(span, a, b, l);
            r0[c] = s.reactionA();
            r1[c] = s.reactionB();
        }
        return new Reactions(r0, r1);
    }

    private static double clamp(double s, double span) {
        return Math.max(0, Math.min(span, s));
    }
}
