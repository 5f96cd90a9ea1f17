/**
 * Bay studies: variations of a plan (bay widths, beam spacing and direction, design settings), swept as
 * the cartesian product of typed ranges, every variant a full run spread over worker threads with
 * progress and cancel; Pareto fronts of weight against depth or piece count, and an optimiser that
 * searches beam spacing and direction for an objective within a depth limit.
 *
 * <p>Entry points: {@code Study.run(spec, ...)} giving a {@code StudyResult}, {@code StudySpec},
 * {@code SweepText} (sweeps as users type them), {@code Variations}, {@code Pareto}, {@code Optimiser}.
 * Depends on {@code run} and the engine below it, and on {@code report} for a run's counts and highest
 * ratio; never on {@code io} or a front end.
 */
package org.baywright.study;
