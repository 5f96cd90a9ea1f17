/**
 * The domain model of a building: grid lines, levels, floor layouts (slab edge, decks with their span
 * direction, girders and beams, infill bays, openings, area, line and point loads), column lines and the
 * design settings, all immutable records. An edit is a function from one plan to the next, so undo is
 * a list of values; located {@link org.baywright.plan.Problem}s are the common currency of every stage
 * that finds something wrong.
 *
 * <p>Entry points: {@link org.baywright.plan.Plan}, {@link org.baywright.plan.PlanEdits} (the editor's
 * edits), {@link org.baywright.plan.Framing} (infills expanded into beams),
 * {@link org.baywright.plan.RegularPlan} (the regular-plan generator), {@link org.baywright.plan.Problem}.
 * Depends on the JDK and {@code units} only: it knows nothing of files, geometry libraries, design or
 * the screen.
 */
package org.baywright.plan;
