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
 */
public record Floor(String id, String name, boolean roof, Polygon slabEdge, List<Deck> decks, List<Member> members,
        List<Infill> infills, List<Opening> openings, List<AreaLoad> areaLoads, List<LineLoad> lineLoads,
        List<PointLoadItem> pointLoads) {
    public Floor {
        decks = List.copyOf(decks);
        members = List.copyOf(members);
        infills = List.copyOf(infills);
        openings = List.copyOf(openings);
        areaLoads = List.copyOf(areaLoads);
        lineLoads = List.copyOf(lineLoads);
        pointLoads = List.copyOf(pointLoads);
    }

    public Optional<Member> member(String memberId) {
        return members.stream().filter(m -> m.id().equals(memberId)).findFirst();
    }
}
