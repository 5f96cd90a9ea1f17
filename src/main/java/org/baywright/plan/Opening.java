package org.baywright.plan;

/** A hole in the slab (stair, shaft, atrium): it carries no deck load. */
public record Opening(String id, Polygon outline) {
}
