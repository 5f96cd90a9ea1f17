package org.baywright.design;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.load.LoadCase;

/**
 * One simple-span composite beam under uniform loads: what the designer needs to know of the floor
 * around it ({@link #member()} gives the same beam as the general {@link CompositeMember}). SI: m, Pa (area loads), N/m (line loads).
 *
 * <p>The line loads are the area loads times {@code tributaryWidth}; the slab's weight is computed
 * from {@link SlabOnDeck#weight} unless {@code slabWeightOverride} is a number.
 *
 * @param span L, support to support
 * @param ribs how the deck ribs run relative to this beam
 * @param toNeighbourLeft distance to the next member's centreline on the left (∞ when none)
 * @param toNeighbourRight as on the left
 * @param toEdgeLeft distance to the slab edge on the left (∞ when the slab runs on past the neighbour)
 * @param toEdgeRight as on the left
 * @param tributaryWidth width of floor whose load the beam carries
 * @param slab the slab
 * @param studs the studs
 * @param superimposedDead superimposed dead load (ceiling, services, finishes) [Pa], composite stage
 * @param live live load [Pa], composite stage
 * @param constructionLive construction live load [Pa] on the bare steel (20 psf common practice; ASCE/SEI 37)
 * @param slabWeightOverride the slab's weight per area [Pa] when the user overrides the computed one; NaN otherwise
 */
public record CompositeBeam(double span, DeckRibs ribs, double toNeighbourLeft, double toNeighbourRight, double toEdgeLeft,
        double toEdgeRight, double tributaryWidth, SlabOnDeck slab, Studs studs, double superimposedDead, double live,
        double constructionLive, double slabWeightOverride) {

    public CompositeBeam {
        Objects.requireNonNull(ribs, "ribs");
        Objects.requireNonNull(slab, "slab");
        Objects.requireNonNull(studs, "studs");
        if (!(span > 0) || !Double.isFinite(span) || !(tributaryWidth > 0) || !Double.isFinite(tributaryWidth)) {
            throw new IllegalArgumentException("composite beam: span and tributary width must be positive, got " + span
                    + " m and " + tributaryWidth + " m");
        }
        if (!(superimposedDead >= 0) || !(live >= 0) || !(constructionLive >= 0)) {
            throw new IllegalArgumentException("composite beam: loads must be ≥ 0");
        }
        if (ribs != DeckRibs.NONE && slab.hr() == 0) {
            throw new IllegalArgumentException("composite beam: ribs " + ribs + " need a deck (rib height > 0)");
        }
        if (ribs == DeckRibs.NONE && slab.hr() > 0) {
            throw new IllegalArgumentException("composite beam: a slab on deck needs the ribs perpendicular or parallel");
        }
    }

    /**
     * An interior beam: members at {@code spacing} on both sides, no slab edge near, the tributary width
     * equal to the spacing.
     */
    public static CompositeBeam interior(double span, double spacing, DeckRibs ribs, SlabOnDeck slab, Studs studs,
            double superimposedDead, double live, double constructionLive) {
        double inf = Double.POSITIVE_INFINITY;
        return new CompositeBeam(span, ribs, spacing, spacing, inf, inf, spacing, slab, studs, superimposedDead, live,
                constructionLive, Double.NaN);
    }

    /** The slab weight per area used [Pa]: the override when given, else {@link SlabOnDeck#weight} of the slab. */
    public double slabWeight() {
        return Double.isNaN(slabWeightOverride) ? slab.weight(null) : slabWeightOverride;
    }

    /**
     * The same beam as a {@link CompositeMember}: full-span uniform loads, each area load times the
     * tributary width: the slab's weight as {@code wet}, the construction live load as
     * {@code construction}, the superimposed dead load as D and the live load as L on the composite
     * section; the criteria's construction bracing.
     */
    public CompositeMember member() {
        double w = slabWeight();
        List<SpanLoad> wet = List.of(DistributedLoad.full(span, w * tributaryWidth));
        List<SpanLoad> cl = List.of(DistributedLoad.full(span, constructionLive * tributaryWidth));
        BeamLoads composite = BeamLoads.of(span, Map.of(LoadCase.D, List.of(DistributedLoad.full(span, superimposedDead * tributaryWidth)),
                LoadCase.L, List.of(DistributedLoad.full(span, live * tributaryWidth))));
        return new CompositeMember(span, ribs, toNeighbourLeft, toNeighbourRight, toEdgeLeft, toEdgeRight, slab, studs, w, wet,
                cl, composite, null);
    }

    /** The same beam with the slab weight given by the user [Pa]. */
    public CompositeBeam withSlabWeight(double w) {
        return new CompositeBeam(span, ribs, toNeighbourLeft, toNeighbourRight, toEdgeLeft, toEdgeRight, tributaryWidth,
                slab, studs, superimposedDead, live, constructionLive, w);
    }

    /** The same beam with other studs. */
    public CompositeBeam withStuds(Studs s) {
        return new CompositeBeam(span, ribs, toNeighbourLeft, toNeighbourRight, toEdgeLeft, toEdgeRight, tributaryWidth,
                slab, s, superimposedDead, live, constructionLive, slabWeightOverride);
    }
}
