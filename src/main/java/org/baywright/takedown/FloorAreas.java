package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import org.baywright.geometry.FloorTributary;
import org.baywright.geometry.GeometryProblem;
import org.baywright.geometry.TributaryAnalysis;
import org.baywright.plan.Problem;

/**
 * The second stage, per floor layout: the tributary areas of its members (one-way deck along the span
 * direction), with the geometry's coverage problems located on the floor and the decks' span and
 * overhang checks ({@link DeckChecks}).
 */
public record FloorAreas(FloorTributary tributary, List<Problem> problems) {
    public FloorAreas {
        problems = List.copyOf(problems);
    }

    /**
     * Computes the tributary areas of a layout's members on the grid {@link Takedown#GRID}, with the
     * problems' quantities in {@code units}.
     */
    public static FloorAreas of(FloorInput in, org.baywright.units.UnitSystem units) {
        FloorTributary trib = TributaryAnalysis.compute(in.designFloor(), in.members(), Takedown.GRID, units);
        List<Problem> problems = new ArrayList<>();
        for (GeometryProblem g : trib.problems()) {
            problems.add(new Problem(Problem.Severity.ERROR, g.kind(), "floor " + in.floor().id(), g.objectId(), g.message(),
                    g.where()));
        }
        problems.addAll(DeckChecks.check(in.floor(), trib.deckSpans(), units));
        return new FloorAreas(trib, problems);
    }
}
