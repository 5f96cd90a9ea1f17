/**
 * The calculation package as a PDF (PDFBox, embedded fonts): cover with the design basis and the
 * caution, linked contents, load and takedown summaries, one sheet per group of identical members with
 * load, shear and moment diagrams and every check as formula = substitution = result (clause), the
 * the floor-vibration check of every bay when the run has bays (AISC DG11: a table, then one sheet per distinct
 * bay printing its calculation record), the column schedule, foundation reactions and the takeoff. Sheets are recorded from the same equation
 * functions the search evaluates.
 *
 * <p>Entry point: {@link org.baywright.report.pdf.CalculationPackage}, with
 * {@link org.baywright.report.pdf.PackageOptions} and {@link org.baywright.report.pdf.ProjectInfo} as
 * inputs and {@link org.baywright.report.pdf.PackageSummary} as result. Depends on {@code report},
 * {@code run} and the engine (including {@code design.aisc360} and {@code analysis} for the sheets) and
 * PDFBox; never on JavaFX or a front end.
 */
package org.baywright.report.pdf;
