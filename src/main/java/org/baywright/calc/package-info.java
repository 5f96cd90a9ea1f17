/**
 * The calculation record: what a calculation sheet prints, line by line — equations as
 * {@code symbol = formula = substituted numbers = result [unit] (reference)}, branches with their
 * evidence, values obtained otherwise, headings and notes. Design-equation functions take a
 * {@link org.baywright.calc.Calc} that may be {@code null}: the section search passes null and pays
 * nothing, a report passes a recorder and gets the sheet from the same call.
 *
 * <p>Entry points: {@link org.baywright.calc.Calc} (recording), {@link org.baywright.calc.CalcLine},
 * {@link org.baywright.calc.Formula} (the sheet's formula notation, evaluated in tests so the printed
 * formula is the executed one), {@link org.baywright.calc.CalcFormat} (text rendering),
 * {@link org.baywright.calc.Caution} (the caution printed with every result). Depends on {@code units}
 * only.
 */
package org.baywright.calc;
