/**
 * The framing plan drawing: one immutable drawing model per level ({@link
 * org.baywright.report.drawing.FramingPlanDrawing}), built from a run result, and three headless
 * renderers of it (SVG text, PNG through Java2D, PDF through PDFBox with an embedded font).
 *
 * <p>The model holds primitives in two spaces: the plan, in metres (x east, y north), and the paper, in
 * millimetres from the sheet's lower-left corner (y up). Sizes of every primitive (line weights, dash
 * lengths, text heights, hatch spacing, circle radii) are paper millimetres in both spaces, so a
 * drawing reads the same at any scale. The {@link org.baywright.report.drawing.Viewport} maps the plan
 * onto the paper.
 */
package org.baywright.report.drawing;
