package org.baywright.design.dg11;

/**
 * Direction of the deck ribs to a member, for its transformed moment of inertia: ribs perpendicular to
 * the member (usually the beams) add nothing, only the concrete above the deck counts; ribs parallel
 * (usually the girders) add the concrete in them over the rib fraction (DG11 2nd ed. §3.2, from memory).
 * A solid slab has no ribs ({@code hr = 0}), so either value gives the same.
 */
public enum Ribs {
    PERPENDICULAR, PARALLEL;

    /** The share of the rib zone that counts: 0 perpendicular, the slab's rib fraction parallel. */
    public double concreteShare(VibrationSlab slab) {
        return slab.ribShare(this);
    }
}
