package org.baywright.report.drawing;

import java.util.List;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/**
 * The framing plan of one level as an immutable drawing: every primitive on one sheet, in drawing order
 * (sorted by {@link Layer}). Renderers turn it into SVG, PNG or PDF without deciding anything about its
 * content.
 *
 * @param project the project name
 * @param levelName the level drawn
 * @param floorId the floor layout at that level
 * @param paper the sheet
 * @param units the unit system of the labels
 * @param scale the drawing scale, chosen as the largest standard scale that fits
 * @param viewport where the plan sits on the sheet
 * @param primitives everything drawn, sorted by layer
 */
public record FramingPlanDrawing(String project, String levelName, String floorId, Paper paper, UnitSystem units,
        DrawingScale scale, Viewport viewport, List<Primitive> primitives) {

    public FramingPlanDrawing {
        primitives = List.copyOf(primitives);
    }

    /**
     * Builds the framing plan of a level of a run.
     *
     * @throws IllegalArgumentException when the plan has no such level (the message lists its levels) or
     *     the run produced no results to draw
     */
    public static FramingPlanDrawing of(RunResult run, String levelName, DrawingOptions options) {
        return new SheetBuilder(run, levelName, options == null ? DrawingOptions.defaults() : options).build();
    }

    /** The drawing's title, e.g. "Harbourview Offices — Level 3 framing plan". */
    public String title() {
        return project + " — " + levelName + " framing plan";
    }

    /** Paper position of a point of a primitive, mm. */
    public Pt toPaper(Primitive p, Pt at) {
        return p.space() == Space.PLAN ? viewport.toPaper(at) : at;
    }

    /** Every text primitive, in drawing order. */
    public List<Primitive.Text> texts() {
        return primitives.stream().filter(Primitive.Text.class::isInstance).map(Primitive.Text.class::cast).toList();
    }

    /** The primitives of one layer, in drawing order. */
    public List<Primitive> layer(Layer layer) {
        return primitives.stream().filter(p -> p.layer() == layer).toList();
    }
}
