package org.baywright.plan;

import java.util.List;
import java.util.Optional;

/**
 * A floor layout: its slab edge, decks, framing, openings and loads. Levels refer to layouts by id, so
 * a typical floor is drawn once and repeats.
 *
 * @param slabEdge the slab outline (may overhang the grid or be notched)
 * @param roof true for a roof: its ordinary roof live load reduces by ASCE 7-16 §4.8.2; occupancy loads on it
 *     (floor live, or roof live with a use other than ordinary) are floor live load reduced by §4.7 (§4.8.3)
 * @param composite how its members work with the slab its decks carry (files without it: non-composite)
 */
public record Floor(String id, String name, boolean roof, Polygon slabEdge, List<Deck> decks, List<Member> members,
        List<Infill> infills, List<Opening> openings, List<AreaLoad> areaLoads, List<LineLoad> lineLoads,
        List<PointLoadItem> pointLoads, CompositeFloor composite) {
    public Floor {
        composite = composite == null ? CompositeFloor.NONE : composite;
        decks = List.copyOf(decks);
        members = List.copyOf(members);
        infills = List.copyOf(infills);
        openings = List.copyOf(openings);
        areaLoads = List.copyOf(areaLoads);
        lineLoads = List.copyOf(lineLoads);
        pointLoads = List.copyOf(pointLoads);
    }

    /** A non-composite floor layout (bare steel). */
    public Floor(String id, String name, boolean roof, Polygon slabEdge, List<Deck> decks, List<Member> members,
            List<Infill> infills, List<Opening> openings, List<AreaLoad> areaLoads, List<LineLoad> lineLoads,
            List<PointLoadItem> pointLoads) {
        this(id, name, roof, slabEdge, decks, members, infills, openings, areaLoads, lineLoads, pointLoads, CompositeFloor.NONE);
    }

    /** This layout working with its slab as {@code c} says. */
    public Floor withComposite(CompositeFloor c) {
        return new Floor(id, name, roof, slabEdge, decks, members, infills, openings, areaLoads, lineLoads, pointLoads, c);
    }

    /** This layout with other decks. */
    public Floor withDecks(List<Deck> d) {
        return new Floor(id, name, roof, slabEdge, d, members, infills, openings, areaLoads, lineLoads, pointLoads, composite);
    }

    /** True when any of its decks describes a slab. */
    public boolean hasSlab() {
        return decks.stream().anyMatch(d -> d.slab() != null);
    }

    public Optional<Member> member(String memberId) {
        return members.stream().filter(m -> m.id().equals(memberId)).findFirst();
    }
}
