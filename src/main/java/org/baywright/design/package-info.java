/**
 * Member design: the beam and column designers, the checks they keep (demand, capacity, ratio,
 * governing combination, clause) and the lightest-section search, which adds each candidate's own
 * weight and records one line for every lighter section it rejects. The designers drive a design
 * code's clause functions ({@code design.aisc360}) on the loads and sections handed to them; the order
 * in which members are designed, and where their loads come from, belong to {@code takedown}.
 *
 * <p>Entry points: {@code BeamDesigner} ({@code search} over a catalog, {@code checkFixed} for a given
 * section, {@code check} with a calculation record for the sheet), with {@code BeamLoads},
 * {@code BeamCriteria} and {@code SearchFilter} as inputs and {@code BeamDesign} / {@code Check} as
 * results. Column design moves here from {@code takedown} (whichever package holds it, it sizes column
 * tiers by AISC 360-16 E3 on the axial loads the takedown sums). May depend on {@code analysis},
 * {@code catalog}, {@code calc}, {@code load}, {@code units}, the design-code packages and the plan's
 * model records a designer is handed; never on {@code geometry}, {@code takedown} (which depends on it),
 * {@code run}, {@code io}, {@code report}, {@code study} or a front end.
 */
package org.baywright.design;
