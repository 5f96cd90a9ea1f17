package org.baywright.plan;

/**
 * A load per floor area over a polygon of the slab.
 *
 * @param id e.g. "AL-office"
 * @param outline where it acts
 * @param values per case, Pa
 * @param use how live-load reduction treats it (ASCE 7-16 §4.7)
 */
public record AreaLoad(String id, Polygon outline, LoadValues values, LiveLoadUse use) {
}
