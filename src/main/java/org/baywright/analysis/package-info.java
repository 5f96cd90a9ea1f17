/**
 * Statics of one member: reactions, shear, bending moment and deflection of a simply supported span
 * under point loads and linearly varying line loads, computed exactly as piecewise polynomials.
 *
 * <p>Entry point: {@link org.baywright.analysis.SimpleSpan#of}. Load combinations are built with
 * {@link org.baywright.analysis.SimpleSpan#combine}. All values are canonical SI doubles (m, N, N/m,
 * N·m, N·m²); downward load, sagging moment and downward deflection are positive. The package
 * depends only on the JDK.
 */
package org.baywright.analysis;
