package org.baywright.takedown;

import java.util.List;
import org.baywright.catalog.Section;
import org.baywright.plan.Point;

/**
 * A bay of a floor layout as the floor-vibration check sees it: a panel bounded by the members that carry
 * its infill beams (girders, or beams carrying beams) and, across them, by the girders' ends (column lines),
 * with the beams in it. Found by {@link Bays} from the designed members. SI: m, N/m.
 *
 * @param id by grid lines ({@code B-C/2-3}: the lettered lines west and east, then the numbered lines south and
 *     north) where the bay's sides lie on grid lines, else by the ids of the members carrying its beams
 *     ({@code G-7/G-9})
 * @param floor the key of the floor layout's members in the run ({@link TakedownResult#members()})
 * @param beams the ids of the bay's beams, in order across the bay
 * @param beam the beam the check uses: the most flexible of the bay (largest L⁴/I)
 * @param beamSection its section
 * @param beamSpan its span L_j
 * @param spacing the beam spacing S: the bay's width along the girders over the number of beams plus one
 * @param beamAdjacentSpan the span of the beam continuing in line beyond either end of {@code beam} (the longer),
 *     or 0 for none
 * @param girders the members carrying the bay's beams (one or two)
 * @param centre the centre of the bay in plan
 * @param beamAngle direction of the beams, degrees counter-clockwise from the x axis (0 to 180)
 * @param width the bay's width along the girders (across the beams)
 * @param floorWidth the slab's extent across the beams through the bay's centre (B_j ≤ ⅔ of it)
 * @param floorLength the slab's extent along the beams through the bay's centre (B_g ≤ ⅔ of it)
 * @param edge true when a side of the bay parallel to its beams lies at the slab edge (then C_j = 1.0)
 */
public record Bay(String id, String floor, List<String> beams, String beam, Section beamSection, double beamSpan,
        double spacing, double beamAdjacentSpan, List<BayGirder> girders, Point centre, double beamAngle, double width,
        double floorWidth, double floorLength, boolean edge) {

    public Bay {
        beams = List.copyOf(beams);
        girders = List.copyOf(girders);
    }

    /**
     * A member carrying the beams of a bay.
     *
     * @param id the member's id
     * @param section its section
     * @param span its span L_g
     * @param carriedWidth the width of floor it carries across it: half the span of the beams framing into it
     *     from each side (L_j for an interior girder with equal bays either side)
     * @param adjacentSpan the span of the girder continuing in line beyond either end (the longer), or 0 for none
     * @param bothSides true when beams frame into it from both sides (an interior girder), false for an edge girder
     */
    public record BayGirder(String id, Section section, double span, double carriedWidth, double adjacentSpan,
            boolean bothSides) {
    }

    /** The ids of every member of the bay: its beams, then the members carrying them. */
    public List<String> members() {
        java.util.List<String> out = new java.util.ArrayList<>(beams);
        girders.forEach(g -> out.add(g.id()));
        return out;
    }
}
