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
 *
 * <p>The plan's content (grid and bubbles, dimensions, slab, openings, area loads, members coloured by
 * ratio with sizes, ratios and reactions, columns) is built once by {@link
 * org.baywright.report.drawing.PlanPicture}: the sheet ({@code SheetBuilder}) lays it out in the sheet
 * style, and the editor's canvas draws the same primitives in the screen style through its JavaFX
 * renderer, so the canvas and the printed plan always show the same plan. The optional bay layer
 * ({@link org.baywright.report.drawing.BayMarks}, {@link org.baywright.report.drawing.DrawingOptions#bays()}) writes
 * each checked bay's floor-vibration result at its centre; the calculation package turns it on when the run has bays.
 */
package org.baywright.report.drawing;
