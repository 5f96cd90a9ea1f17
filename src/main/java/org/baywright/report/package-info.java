/**
 * What leaves the engineer's desk, written from a run result: the result as a plain tree for JSON and
 * as a text summary, the steel takeoff and the column schedule as CSV; the framing plan drawing
 * ({@code report.drawing}) and the calculation package ({@code report.pdf}) are its sub-packages. The
 * text summary, the drawing and the calculation package carry the caution.
 *
 * <p>Entry points: {@link org.baywright.report.RunSummary}, {@link org.baywright.report.Takeoff},
 * {@link org.baywright.report.ColumnSchedule}. Depends on {@code run} and the engine below it; never on
 * JavaFX, {@code io}, {@code study} or a front end (the caller turns the JSON tree into text with
 * {@code io}).
 */
package org.baywright.report;
