package org.baywright.design.aisc360;

/**
 * How the slab meets the steel beam, as AISC 360-16 I3.2c and I8.2a distinguish it: a solid slab (no
 * deck), or formed steel deck whose ribs run perpendicular or parallel to the beam.
 */
public enum DeckRibs {
    /** Solid slab, studs welded directly to the steel shape. */
    NONE,
    /** Deck ribs perpendicular to the beam (typically infill beams): concrete below the top of the deck is neglected (I3.2c(2)). */
    PERPENDICULAR,
    /** Deck ribs parallel to the beam (typically girders): concrete in the ribs is included in A_c (I3.2c(3)). */
    PARALLEL
}
