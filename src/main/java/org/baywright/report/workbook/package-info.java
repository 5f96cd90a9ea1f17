/**
 * Workbooks (.xlsx) of a run's results for estimators: the steel takeoff, one sheet per table
 * ({@link org.baywright.report.workbook.TakeoffWorkbook}).
 *
 * <p>The only package that uses Apache POI, which writes the format; the tables themselves come from
 * {@code report} ({@code Takeoff}). May depend on {@code report}, {@code calc} and {@code units}; never
 * on JavaFX.
 */
package org.baywright.report.workbook;
