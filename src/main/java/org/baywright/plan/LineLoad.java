package org.baywright.plan;

import java.util.List;

/**
 * A load per length along a polyline of the plan (cladding on a slab edge, a wall), delivered to the
 * members it lies on or, when it lies on the deck, through the deck's tributary areas.
 *
 * @param values per case, N/m
 */
public record LineLoad(String id, List<Point> path, LoadValues values) {
    public LineLoad {
        path = List.copyOf(path);
    }
}
