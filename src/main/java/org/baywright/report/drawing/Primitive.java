package org.baywright.report.drawing;

import java.util.List;

/**
 * One element of a drawing. Positions are in the primitive's {@link Space}; every size (line weight,
 * text height, radius, hatch spacing) is paper millimetres.
 */
public sealed interface Primitive permits Primitive.Line, Primitive.Path, Primitive.Text, Primitive.Circle {

    Layer layer();

    Space space();

    /** A straight line. */
    record Line(Layer layer, Space space, Pt from, Pt to, Pen pen) implements Primitive {
    }

    /**
     * A polyline or polygon.
     *
     * @param closed true for a polygon
     * @param outline the outline's pen, or null for none
     * @param fill the fill colour (closed paths only), or null for none
     * @param hatch hatching inside (closed paths only), or null for none
     */
    record Path(Layer layer, Space space, List<Pt> points, boolean closed, Pen outline, Rgb fill, Hatch hatch)
            implements Primitive {
        public Path {
            points = List.copyOf(points);
            if (points.size() < 2) {
                throw new IllegalArgumentException("a path needs at least two points");
            }
            if (!closed && (fill != null || hatch != null)) {
                throw new IllegalArgumentException("only a closed path can be filled or hatched");
            }
            if (outline == null && fill == null && hatch == null) {
                throw new IllegalArgumentException("a path needs an outline, a fill or a hatch");
            }
        }
    }

    /**
     * A single line of text.
     *
     * @param at the anchor point
     * @param size text height (the font size, em), paper mm
     * @param rotation degrees counter-clockwise on the paper, in (-90, 90] for text that reads from the left
     *     or from below
     */
    record Text(Layer layer, Space space, Pt at, String text, double size, double rotation, Anchor anchor, Rgb colour,
            boolean bold) implements Primitive {
        public Text {
            if (text.isEmpty() || text.contains("\n")) {
                throw new IllegalArgumentException("a text primitive is one non-empty line, got \"" + text + "\"");
            }
            if (!(size > 0)) {
                throw new IllegalArgumentException("text size must be positive");
            }
        }
    }

    /**
     * A circle.
     *
     * @param radius paper mm
     * @param outline pen, or null
     * @param fill colour, or null
     */
    record Circle(Layer layer, Space space, Pt centre, double radius, Pen outline, Rgb fill) implements Primitive {
        public Circle {
            if (!(radius > 0)) {
                throw new IllegalArgumentException("radius must be positive");
            }
            if (outline == null && fill == null) {
                throw new IllegalArgumentException("a circle needs an outline or a fill");
            }
        }
    }
}
