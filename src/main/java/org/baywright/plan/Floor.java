package org.baywright.plan;

import java.util.List;
import java.util.Optional;

/**
 * A floor layout: its slab edge, decks, framing, openings and loads. Levels refer to layouts by id, so
 * a typical floor is drawn once and repeats.
 *
 * @param slabEdge the slab outline (may overhang the grid or be notched)
 * @param roof true for a roof: live load is roof live load and reduces by §4.8
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
