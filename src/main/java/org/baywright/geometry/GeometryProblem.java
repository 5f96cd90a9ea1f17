package org.baywright.geometry;

import java.util.List;
import org.baywright.plan.Point;

/**
 * Something wrong with a floor's geometry, located so that a drawing can show it.
 *
 * @param kind one of the constants of this record, e.g. {@value #UNSUPPORTED_DECK}
 * @param objectId the id of the plan object at fault (deck, opening, member, load; the floor id for the
 *     slab edge). For {@value #OVERLAP} it is one of the two objects (the later deck, which gives up the
 *     overlap, or the first of two members) and the message names both.
 * @param message what is wrong, for a person
 * @param where the place: an outline (polygon vertices), a segment's ends or a single point, plan
 *     coordinates, m; empty when the problem has no place (a failed invariant)
 */
public record GeometryProblem(String kind, String objectId, String message, List<Point> where) {

    /** Part of a deck has no supporting member on either side along its span; its load is not delivered. */
    public static final String UNSUPPORTED_DECK = "unsupported-deck";
    /** Two decks, or two members' tributary areas, cover the same area. */
    public static final String OVERLAP = "overlap";
    /** The tributary areas do not add up to the loaded area (an internal invariant failed). */
    public static final String COVERAGE = "coverage";
    /** A polygon with fewer than three distinct vertices, or thinner than the tolerance; it is ignored. */
    public static final String DEGENERATE_POLYGON = "degenerate-polygon";
    /** A polygon whose boundary crosses or touches itself; it is repaired (JTS GeometryFixer) and used. */
    public static final String SELF_INTERSECTION = "self-intersection";
    /** A member shorter than the tolerance; it is ignored. */
    public static final String ZERO_LENGTH_MEMBER = "zero-length-member";
    /** Two members with the same id; the later one is ignored. */
    public static final String DUPLICATE_MEMBER = "duplicate-member";
    /** Two members lie on top of each other; the deck between them is split at their common line. */
    public static final String COINCIDENT_MEMBERS = "coincident-members";
    /** Part of an area load lies outside the decks and slab edge; that part delivers nothing. */
    public static final String AREA_LOAD_OFF_DECK = "area-load-off-deck";
    /** A point load on no member and no deck (outside the slab, or in an opening); it is not delivered. */
    public static final String POINT_LOAD_OFF_DECK = "point-load-off-deck";
    /** A point load on unsupported deck; it is not delivered. */
    public static final String POINT_LOAD_UNSUPPORTED = "point-load-unsupported";
    /** Part of a line load lies on no member and no deck; that part is not delivered. */
    public static final String LINE_LOAD_OFF_DECK = "line-load-off-deck";
    /** Part of a line load lies on unsupported deck; that part is not delivered. */
    public static final String LINE_LOAD_UNSUPPORTED = "line-load-unsupported";
    /** A line load path with fewer than two distinct points; it is ignored. */
    public static final String DEGENERATE_LINE = "degenerate-line";
    /** An input number the analysis cannot use (tolerance, span angle); a default replaces it. */
    public static final String BAD_INPUT = "bad-input";
    /** The geometry engine failed on an object; the object is skipped. Please report it. */
    public static final String INTERNAL = "internal";

    public GeometryProblem {
        where = List.copyOf(where);
    }
}
