package org.baywright.design;

import java.util.List;
import java.util.Objects;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.design.aisc360.DeckRibs;

/**
 * One simple-span composite member (a beam or a girder) under any simple-span loads: what
 * {@link CompositeBeamDesigner} needs to know of the floor around it and of the loads on it. SI: m, Pa,
 * N, N/m.
 *
 * <p>The loads come in three groups, each without the member's own weight (the designer adds the
 * candidate's weight to the wet load when the criteria say so):
 * <ul>
 * <li>{@code wet}: dead load placed before the concrete hardens (the slab, the deck, and the
 * self-weight of framing members delivered as point loads). Unshored it acts on the bare steel (and
 * stays there), shored on the composite section. In the composite-stage strength combinations it is
 * part of D.</li>
 * <li>{@code construction}: the construction live load on the bare steel (unshored only; L of the
 * construction stage).</li>
 * <li>{@code composite}: the loads on the composite section by load case: D = superimposed dead, L and
 * possibly Lr and S, with {@link BeamLoads#withDeflectionLoads} possibly giving the service loads of
 * the deflection checks (the live load unreduced). L, Lr and S count as live load for the live-load
 * deflection limit, as in {@link BeamDesigner}.</li>
 * </ul>
 *
 * @param span L, support to support
 * @param ribs how the deck ribs run relative to this member
 * @param toNeighbourLeft distance to the next member's centreline on the left (∞ when none)
 * @param toNeighbourRight as on the left
 * @param toEdgeLeft distance to the slab edge on the left (∞ when the slab runs on past the neighbour)
 * @param toEdgeRight as on the left
 * @param slab the slab
 * @param studs the studs
 * @param slabWeight the slab weight per area already decided (computed or the user's) [Pa]: for the
 *     sheet and the result only, the loads come from the lists
 * @param wet wet-concrete stage dead loads (see above)
 * @param construction construction live loads on the bare steel (see above)
 * @param composite loads on the composite section by case, a simple span of length {@code span}
 * @param constructionBracing bracing of the bare steel in the construction stage where the ribs do not
 *     brace it (ribs parallel, solid slab: typically at the framing points); null = the criteria's
 */
public record CompositeMember(double span, DeckRibs ribs, double toNeighbourLeft, double toNeighbourRight,
        double toEdgeLeft, double toEdgeRight, SlabOnDeck slab, Studs studs, double slabWeight,
        List<SpanLoad> wet, List<SpanLoad> construction, BeamLoads composite, Bracing constructionBracing) {

    public CompositeMember {
        Objects.requireNonNull(ribs, "ribs");
        Objects.requireNonNull(slab, "slab");
        Objects.requireNonNull(studs, "studs");
        Objects.requireNonNull(composite, "composite");
        wet = List.copyOf(wet);
        construction = List.copyOf(construction);
        if (!(span > 0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("composite member: the span must be positive, got " + span + " m");
        }
        if (!(slabWeight >= 0) || !Double.isFinite(slabWeight)) {
            throw new IllegalArgumentException("composite member: the slab weight must be ≥ 0, got " + slabWeight + " Pa");
        }
        if (composite.isOverhanging() || composite.span() != span) {
            throw new IllegalArgumentException("composite member: the composite-stage loads must be those of a simple span of "
                    + span + " m, got a span of " + composite.span() + " m" + (composite.isOverhanging() ? ", overhanging" : ""));
        }
        checkLoads("wet", wet, span);
        checkLoads("construction", construction, span);
        if (ribs != DeckRibs.NONE && slab.hr() == 0) {
            throw new IllegalArgumentException("composite member: ribs " + ribs + " need a deck (rib height > 0)");
        }
        if (ribs == DeckRibs.NONE && slab.hr() > 0) {
            throw new IllegalArgumentException("composite member: a slab on deck needs the ribs perpendicular or parallel");
        }
    }

    private static void checkLoads(String group, List<SpanLoad> loads, double span) {
        for (int i = 0; i < loads.size(); i++) {
            SpanLoad l = Objects.requireNonNull(loads.get(i), group + " loads[" + i + "]");
            boolean inside = l instanceof PointLoad p ? p.position() >= 0 && p.position() <= span
                    : l instanceof DistributedLoad d && d.start() >= 0 && d.end() <= span;
            if (!inside) {
                throw new IllegalArgumentException("composite member, " + group + " loads[" + i + "] " + l
                        + " lies outside the span: allowed range is [0, " + span + "] m");
            }
            boolean up = l instanceof DistributedLoad d ? d.wStart() < 0 || d.wEnd() < 0 : l.total() < 0;
            if (up) {
                throw new IllegalArgumentException("composite member, " + group + " load " + l
                        + " acts upward; gravity loads act downward");
            }
        }
    }
}
