package org.baywright.load;

/**
 * How a run treats live load.
 *
 * @param reduce apply live-load reduction (ASCE 7-16 §4.7 floor live, §4.8 roof live)
 * @param partitionAsDead carry the partition allowance (§4.3.2) as dead load instead of reducible live load
 * @param girderAreaDelivered a girder's A_T is the deck area whose load it actually receives (true, the
 *     conservative default) or, where larger, half the bay on each side (false)
 * @param deflectionReduced check beam deflections under the live load as reduced for strength (true) or
 *     under the unreduced live load (false; common practice for serviceability, the default)
 */
public record LiveLoadRules(boolean reduce, boolean partitionAsDead, boolean girderAreaDelivered, boolean deflectionReduced) {

    /** The rules with deflection checked under unreduced live load (the default). */
    public LiveLoadRules(boolean reduce, boolean partitionAsDead, boolean girderAreaDelivered) {
        this(reduce, partitionAsDead, girderAreaDelivered, false);
    }

    /** True when beam deflections are checked under live load larger than the strength design's (reduction on, deflection unreduced). */
    public boolean deflectionUnreduced() {
        return reduce && !deflectionReduced;
    }
}
