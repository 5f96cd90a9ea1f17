package org.baywright.geometry;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The tributary areas of one floor and where its point and line loads go.
 *
 * @param members by member id, in the order the members were given: every member that is not
 *     rejected (zero length, duplicate id) has an entry, with zero area when it carries no deck
 * @param loadedArea deck area after clipping, m²: (union of decks ∩ slab edge) − openings
 * @param tributaryArea sum of the members' tributary areas, m²; equals {@code loadedArea} less the
 *     unsupported deck
 * @param problems located problems, in the order found
 * @param pointShares by point load id: the members that receive it (empty when it is not delivered)
 * @param lineShares by line load id: the members that receive it (empty when it is not delivered)
 * @param areaLoadAreas by area load id: the area of its outline lying on the loaded deck, m² (what the
 *     load applies to the structure, independent of how it is shared among members)
 * @param deckSpans per deck, the longest span between each pair of neighbouring supporting members
 *     and the longest overhang beyond each outermost one, along the span (see {@link DeckSpan})
 */
public record FloorTributary(Map<String, MemberTributary> members, double loadedArea, double tributaryArea,
        List<GeometryProblem> problems, Map<String, List<LoadShare>> pointShares,
        Map<String, List<LineShare>> lineShares, Map<String, Double> areaLoadAreas, List<DeckSpan> deckSpans) {

    public FloorTributary {
        members = Collections.unmodifiableMap(new LinkedHashMap<>(members));
        problems = List.copyOf(problems);
        pointShares = copy(pointShares);
        lineShares = copy(lineShares);
        areaLoadAreas = Collections.unmodifiableMap(new LinkedHashMap<>(areaLoadAreas));
        deckSpans = List.copyOf(deckSpans);
    }

    /** The problems of one kind (see the constants of {@link GeometryProblem}). */
    public List<GeometryProblem> problems(String kind) {
        return problems.stream().filter(p -> p.kind().equals(kind)).toList();
    }

    private static <T> Map<String, List<T>> copy(Map<String, List<T>> m) {
        Map<String, List<T>> c = new LinkedHashMap<>();
        m.forEach((k, v) -> c.put(k, List.copyOf(v)));
        return Collections.unmodifiableMap(c);
    }
}
