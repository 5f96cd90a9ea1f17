package org.baywright.takedown;

import org.baywright.load.LoadCase;

/**
 * The load components the takedown carries separately from member to member. Live load is split by how
 * it may be reduced, because each member reduces it by its own tributary area (ASCE 7-16 §4.7): the
 * reactions passed on are always unreduced.
 */
public enum Component {
    /** Dead and superimposed dead load, with the self-weight of the framing (on floors without a slab described). */
    D(LoadCase.D),
    /**
     * Dead load in place before the concrete hardens, on a floor whose decks describe their slab: the slab and
     * deck (worked out from the slab's geometry) and the framing's own weight. Dead load (D) in every
     * combination; kept apart because an unshored composite member carries it on the bare steel.
     */
    D_WET(LoadCase.D),
    /** Ordinary reducible floor live load (L0 ≤ 100 psf), including a partition allowance carried as live. */
    L_ORDINARY(LoadCase.L),
    /**
     * Heavy live load: over 100 psf, or storage whatever its value; reduced only for members supporting two or
     * more floors, by at most 20 % (§4.7.3).
     */
    L_HEAVY(LoadCase.L),
    /** Assembly live load of 100 psf or less: not reduced (§4.7.5). */
    L_ASSEMBLY(LoadCase.L),
    /** Passenger-vehicle garage live load: 20 % for two or more floors only (§4.7.4). */
    L_GARAGE(LoadCase.L),
    /** Live load the user marked not reducible. */
    L_FIXED(LoadCase.L),
    /**
     * Live load of a line or point load: not a uniformly distributed live load of Table 4.3-1, so never
     * reduced (ASCE 7-16 §4.7.1 permits reducing only those); nor does it make a roof count as a floor.
     */
    L_CONCENTRATED(LoadCase.L),
    /** Roof live load (§4.8). */
    LR(LoadCase.LR),
    /**
     * Roof live load of a line or point load: not a uniformly distributed roof live load, so not reduced
     * (ASCE 7-16 §4.8.1 permits reducing only those).
     */
    LR_CONCENTRATED(LoadCase.LR),
    /** Snow. */
    S(LoadCase.S),
    /**
     * Construction live load on the bare steel while the concrete is placed (ASCE/SEI 37): only for the
     * construction stage of unshored composite members; in no combination of the finished floor, so it
     * belongs to no load case and reaches no column.
     */
    CONSTRUCTION(null);

    private final LoadCase loadCase;

    Component(LoadCase c) {
        this.loadCase = c;
    }

    /** The load case of the combinations this component belongs to (null for {@link #CONSTRUCTION}). */
    public LoadCase loadCase() {
        return loadCase;
    }

    /** How live-load reduction treats this component (meaningful for live components). */
    public org.baywright.load.ReducibleUse reducibleUse() {
        return switch (this) {
            case L_ASSEMBLY -> org.baywright.load.ReducibleUse.ASSEMBLY;
            case L_GARAGE -> org.baywright.load.ReducibleUse.GARAGE;
            case L_FIXED, L_CONCENTRATED -> org.baywright.load.ReducibleUse.NOT_REDUCIBLE;
            case L_HEAVY -> org.baywright.load.ReducibleUse.HEAVY;
            default -> org.baywright.load.ReducibleUse.ORDINARY;
        };
    }

    /** True for the live-load components. */
    public boolean isLive() {
        return loadCase == LoadCase.L;
    }

    /** Adds an array of component values into a per-case array (indexed by {@link LoadCase#ordinal()}). */
    public static double[] byCase(double[] components) {
        double[] out = new double[LoadCase.values().length];
        for (Component c : values()) {
            if (c.loadCase != null) {
                out[c.loadCase.ordinal()] += components[c.ordinal()];
            }
        }
        return out;
    }
}
