package org.baywright.load;

/** Whether, and under which clause, a floor live load may be reduced (ASCE 7-16 §4.7.2–4.7.5). */
public enum ReducibleUse {
    /** Ordinary reducible floor live load (offices, corridors, residential…): §4.7.2, and §4.7.3 above 100 psf. */
    ORDINARY,
    /** Assembly use: not reduced when L0 ≤ 100 psf (§4.7.5); above that, as a heavy live load (§4.7.3). */
    ASSEMBLY,
    /** Passenger-vehicle garage: not reduced, except by up to 20 % for members supporting two or more floors (§4.7.4). */
    GARAGE,
    /**
     * Heavy live load: storage (light or heavy) whatever its value, or any load over 100 psf; not reduced on a
     * member supporting one floor, and by at most 20 % on one supporting two or more (§4.7.3).
     */
    HEAVY,
    /** Live load the user excludes from reduction for any other reason: never reduced. */
    NOT_REDUCIBLE
}
