/**
 * Loads as the standard treats them, independent of any plan: the gravity load cases, the ASCE 7-16
 * Chapter 2 load combinations for LRFD and ASD, the design method, and live-load reduction of floors
 * (§4.7) and ordinary roofs (§4.8.2) with the element factors of Table 4.7-1.
 *
 * <p>Entry points: {@code Combinations}, {@code LiveLoadReduction}, {@code LoadCase},
 * {@code DesignMethod}. Depends on {@code units} and {@code calc} only (reductions record their
 * equations on the calculation sheet); it knows nothing of plans, sections or design.
 */
package org.baywright.load;
