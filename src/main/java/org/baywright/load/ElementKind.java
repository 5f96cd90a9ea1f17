package org.baywright.load;

/**
 * The kinds of structural element of ASCE 7-16 Table 4.7-1, each with its live-load element factor
 * K_LL. (The table number is given from memory: it is Table 4.7-1 in the 2016 edition as far as we
 * know, Table 4-2 in the 2005 and 2010 editions; the factors are the same in every edition.)
 */
public enum ElementKind {
    /** Interior column: K_LL = 4. */
    INTERIOR_COLUMN(4),
    /** Exterior column without cantilever slabs, corner columns without cantilever slabs included: K_LL = 4. */
    EXTERIOR_COLUMN(4),
    /** Edge column with cantilever slabs: K_LL = 3. */
    EDGE_COLUMN_WITH_CANTILEVER_SLAB(3),
    /** Corner column with cantilever slabs: K_LL = 2. */
    CORNER_COLUMN_WITH_CANTILEVER_SLAB(2),
    /** Interior beam: K_LL = 2. */
    INTERIOR_BEAM(2),
    /** Edge beam without cantilever slabs: K_LL = 2. */
    EDGE_BEAM(2),
    /** Edge beam with cantilever slabs: K_LL = 1. */
    EDGE_BEAM_WITH_CANTILEVER_SLAB(1),
    /** Cantilever beam: K_LL = 1. */
    CANTILEVER_BEAM(1),
    /** One-way slab: K_LL = 1 (its tributary area is limited by §4.7.6). */
    ONE_WAY_SLAB(1),
    /** Two-way slab: K_LL = 1. */
    TWO_WAY_SLAB(1),
    /**
     * Any member not listed, including members without provision for continuous shear transfer
     * normal to their span: K_LL = 1.
     */
    OTHER(1);

    private final double kll;

    ElementKind(double kll) {
        this.kll = kll;
    }

    /** ASCE 7-16 Table 4.7-1 (table number from memory): the live-load element factor K_LL of this element. */
    public double kll() {
        return kll;
    }
}
