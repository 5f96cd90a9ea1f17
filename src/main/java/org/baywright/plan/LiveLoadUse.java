package org.baywright.plan;

/** What an area load's live load is, for live-load reduction (ASCE 7-16 §4.7.3–4.7.5). */
public enum LiveLoadUse {
    /** Ordinary reducible floor live load (offices, corridors…). */
    ORDINARY,
    /** Places of public assembly: not reduced when L0 ≤ 100 psf (§4.7.5). */
    ASSEMBLY,
    /** Passenger-vehicle garage: not reduced, except 20 % for members supporting two or more floors (§4.7.4). */
    GARAGE,
    /** Loads the user excludes from reduction for any other reason. */
    NOT_REDUCIBLE
}
