/**
 * AISC Design Guide 11, 2nd ed. (2016): the walking-excitation check of low-frequency floors — realistic
 * loads, the transformed moment of inertia with the dynamic concrete modulus, beam (joist) and girder mode
 * frequencies, the combined mode, effective widths and weights, and the peak acceleration against the
 * tolerance limit by occupancy — one static function per equation, each taking SI values and a
 * {@link org.baywright.calc.Calc} that may be {@code null}. Chapter and equation numbers are from memory.
 *
 * <p>Entry points: {@link org.baywright.design.dg11.Walking#check} with a
 * {@link org.baywright.design.dg11.BayVibration} (giving a {@link org.baywright.design.dg11.VibrationResult});
 * {@link org.baywright.design.dg11.Stiffness}, {@link org.baywright.design.dg11.VibrationLoads},
 * {@link org.baywright.design.dg11.Modes} and {@link org.baywright.design.dg11.EffectiveWeights} for the
 * ingredients (docs/vibration-method.md). Depends on {@code calc}, {@code catalog} and {@code units}; never on
 * plans, the takedown, a run, a front end or another design code. The engine layer only: not yet per bay in
 * plans, the editor or the calculation package.
 */
package org.baywright.design.dg11;
