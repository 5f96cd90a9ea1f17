package org.baywright.plan;

/**
 * What the members of a roof carry below them, which chooses their deflection limits: the roof rows of
 * IBC Table 1604.3 (roof members supporting a plaster or stucco ceiling, a non-plaster ceiling, or no
 * ceiling). A plan setting per roof floor layout ({@link DesignSettings#roofCeiling(String)}).
 */
public enum RoofCeiling {
    /** A plaster or stucco ceiling hangs from the roof members (the strictest roof row). */
    PLASTER,
    /**
     * A ceiling other than plaster or stucco (suspended acoustical tile, gypsum board on a grid…): the
     * default, because a suspended non-plaster ceiling is what an office or retail roof usually carries
     * (common practice), and it is the middle row, stricter than a roof with no ceiling.
     */
    NON_PLASTER,
    /** No ceiling: exposed roof structure (warehouses, canopies). */
    NONE;

    /** The roof ceiling when a plan says nothing. */
    public static final RoofCeiling DEFAULT = NON_PLASTER;
}
