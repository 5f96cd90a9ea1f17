/**
 * AISC 360-16, Specification for Structural Steel Buildings: the clauses Baywright uses — width-to-
 * thickness classification (B4.1), compression by flexural buckling (E3), flexure of doubly symmetric
 * I-shapes (F1 Cb, F2, F3; minor axis F6), shear (G2.1), combined flexure and compression (H1.1), the
 * braced-frame amplifier B1 (Appendix 8, 8.2.1) and composite beams (Chapter I: I2.1b, I3.1a, I3.2a, I3.2c,
 * I3.2d(1), I8.2a, I8.2d and the Commentary's I_LB) — one static function per equation, each taking SI values
 * and a {@link org.baywright.calc.Calc} that may be {@code null}, and recording the equation it
 * evaluates under its clause reference.
 *
 * <p>Entry points: {@link org.baywright.design.aisc360.IShapeFlexure},
 * {@link org.baywright.design.aisc360.IShapeShear} and {@link org.baywright.design.aisc360.IShapeCompression}
 * (a section's strengths, driving the clause classes such as {@link org.baywright.design.aisc360.FlexureF2}),
 * for composite beams {@link org.baywright.design.aisc360.CompositeFlexureI3},
 * {@link org.baywright.design.aisc360.StudStrengthI8}, {@link org.baywright.design.aisc360.EffectiveWidthI3} and
 * {@link org.baywright.design.aisc360.CompositeStiffness} (docs/composite-method.md),
 * {@link org.baywright.design.aisc360.FlexureF6}, {@link org.baywright.design.aisc360.CombinedH1},
 * {@link org.baywright.design.aisc360.AmplificationA8},
 * {@link org.baywright.design.aisc360.ResistanceFactors}, {@link org.baywright.design.aisc360.Aisc360}
 * (reference texts). Depends on {@code calc}, {@code catalog} and {@code units}, and may use {@code load}
 * for the design method (docs/decisions/0001); never on plans, the takedown, a run, a front end or
 * another design code.
 */
package org.baywright.design.aisc360;
