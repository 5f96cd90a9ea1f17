package org.baywright.geometry;

import org.baywright.plan.Point;

/**
 * How far a one-way deck reaches between or beyond the members that carry it, measured along its span
 * direction from the same one-way decomposition that makes the tributary areas: in each strip across
 * the span, between neighbouring supporting members of a piece of continuous deck (a span), and from
 * the outermost supporting member of a piece to the deck's edge (an overhang: a slab edge, an opening,
 * the end of the deck). Lengths are centre line to centre line (members have no width here). For each
 * deck the longest of each span (pair of members) and of each overhang (member and side) is kept.
 *
 * @param deckId the deck (the floor's id for a floor without decks)
 * @param overhang true for an overhang, false for a span between two members
 * @param length the span or overhang along the span direction, m
 * @param from plan point on the first member (the supporting member of an overhang)
 * @param to plan point on the second member, or on the deck's edge for an overhang
 * @param memberA id of the first member (the supporting member of an overhang)
 * @param memberB id of the second member; empty for an overhang
 * @param backspan for an overhang: true when the deck continues past the supporting member onto at
 *     least one more member (a span behind it), false when that member is the only support of this piece
 *     of deck, so nothing resists the cantilever; always true for a span
 */
public record DeckSpan(String deckId, boolean overhang, double length, Point from, Point to, String memberA,
        String memberB, boolean backspan) {
}
