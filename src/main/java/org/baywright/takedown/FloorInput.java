package org.baywright.takedown;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.LineLoad;
import org.baywright.plan.Member;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;

/**
 * A floor layout ready for design: the members drawn with those its infills generate, the infills left
 * out, and the columns present under it (in the plan's order).
 *
 * @param leftOut infills that would generate more than {@link Framing#MAX_INFILL_BEAMS} beams (a plan
 *     built in code; files are checked on reading), reported and left out instead of exhausting memory
 */
public record FloorInput(Floor floor, List<Member> members, List<Problem> leftOut, List<Column> columns) {
    public FloorInput {
        members = List.copyOf(members);
        leftOut = List.copyOf(leftOut);
        columns = List.copyOf(columns);
    }

    /** Expands {@code floor}'s infills and picks the columns in {@code present}. */
    public static FloorInput of(Plan plan, Floor floor, Set<String> present) {
        List<Member> out = new ArrayList<>(floor.members());
        List<Problem> left = new ArrayList<>();
        for (Infill inf : floor.infills()) {
            int n = Framing.beamCount(inf, bayWidth(plan, inf));
            if (n > Framing.MAX_INFILL_BEAMS) {
                left.add(Problem.error("too-many-beams", "floor " + floor.id(), inf.id(), "infill " + inf.id()
                        + " would generate " + n + " beams; an infill has at most " + Framing.MAX_INFILL_BEAMS
                        + " beams (give a smaller count or a larger maxSpacing); it was left out"));
                continue;
            }
            out.addAll(Framing.infillBeams(plan, inf, out));
        }
        List<Column> columns = plan.columns().stream().filter(c -> present.contains(c.id())).toList();
        return new FloorInput(floor, out, left, columns);
    }

    /**
     * The layout the design reads: as drawn, with the weight of each slab a deck describes as an area load over
     * that deck ({@link SlabLoads}).
     */
    public Floor designFloor() {
        return SlabLoads.withSlabs(floor);
    }

    /** The members by id (of two with the same id, the later). */
    public Map<String, Member> byId() {
        Map<String, Member> out = new HashMap<>();
        for (Member m : members) {
            out.put(m.id(), m);
        }
        return out;
    }

    /** The width of an infill's bay across its beams, m (0 when a grid line is unknown). */
    private static double bayWidth(Plan plan, Infill inf) {
        boolean alongX = inf.direction() == GridLine.Axis.X;
        Optional<GridLine> a = plan.gridLine(alongX ? inf.y0() : inf.x0());
        Optional<GridLine> b = plan.gridLine(alongX ? inf.y1() : inf.x1());
        return a.isPresent() && b.isPresent() ? Math.abs(b.get().offset() - a.get().offset()) : 0;
    }

    /**
     * Every input a floor design reads besides the catalog (which a {@link FloorCache} holds): the layout
     * with its members expanded (the infills as the beams they generate, not as drawn), the infills left
     * out, the columns present with their positions and the rules. Equal keys give equal designs.
     */
    public Object key(FloorRules rules) {
        Floor f = floor;
        return new Key(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), members, leftOut, f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads(), columns, rules, f.composite());
    }

    private record Key(String id, String name, boolean roof, Polygon slabEdge, List<Deck> decks, List<Member> members,
            List<Problem> leftOut, List<Opening> openings, List<AreaLoad> areaLoads, List<LineLoad> lineLoads,
            List<PointLoadItem> pointLoads, List<Column> columns, FloorRules rules, org.baywright.plan.CompositeFloor composite) {
    }
}
