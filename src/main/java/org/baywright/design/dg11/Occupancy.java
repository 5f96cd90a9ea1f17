package org.baywright.design.dg11;

import org.baywright.units.Units;

/**
 * What a floor is used for, as DG11 (2nd ed.) Table 4-1 lists it (table number and values from memory;
 * CHECK-VALUES §6): the tolerance limit a_o/g, the walking force P_o, and the default live load a
 * vibration analysis uses (realistic, not the design live load: 11 psf for offices, 6 psf for
 * residences, from memory; none for the rest, set one if wanted).
 */
public enum Occupancy {
    /** Offices: a_o/g = 0.5 %. */
    OFFICES("offices", 0.005, Dg11.PO_FLOORS, Units.PSF.toSi(11)),
    /** Residences: 0.5 %. */
    RESIDENCES("residences", 0.005, Dg11.PO_FLOORS, Units.PSF.toSi(6)),
    /** Churches, schools and other quiet areas: 0.5 %. */
    QUIET_AREAS("churches, schools, quiet areas", 0.005, Dg11.PO_FLOORS, 0),
    /** Shopping malls: 1.5 %. */
    SHOPPING_MALLS("shopping malls", 0.015, Dg11.PO_FLOORS, 0),
    /** Indoor footbridges: 1.5 %, P_o = 92 lb. */
    INDOOR_FOOTBRIDGES("indoor footbridges", 0.015, Dg11.PO_FOOTBRIDGES, 0),
    /** Outdoor footbridges: 5 %, P_o = 92 lb. */
    OUTDOOR_FOOTBRIDGES("outdoor footbridges", 0.05, Dg11.PO_FOOTBRIDGES, 0);

    private final String label;
    private final double limit;
    private final double po;
    private final double live;

    Occupancy(String label, double limit, double po, double live) {
        this.label = label;
        this.limit = limit;
        this.po = po;
        this.live = live;
    }

    /** As DG11 names it. */
    public String label() {
        return label;
    }

    /** The tolerance limit a_o/g, a fraction of g. */
    public double limit() {
        return limit;
    }

    /** The walking force P_o [N]. */
    public double po() {
        return po;
    }

    /** The default live load of a vibration analysis [Pa]. */
    public double vibrationLive() {
        return live;
    }
}
