/**
 * The pipeline: runs the stages of a plan in order — catalog, tributary areas, support graph, member
 * design in order, columns, foundations, equilibrium — and returns one immutable run result that
 * carries the design basis the run used and its provenance (catalog, Baywright version), beside the
 * takedown and every located problem. Front ends, reports and studies start runs here rather than
 * calling the stages themselves.
 *
 * <p>Entry points: {@code PlanRun.run(plan)} (the catalog the plan's settings name),
 * {@code PlanRun.run(plan, catalog[, floorCache])}, giving a {@code RunResult}. Depends on the engine
 * ({@code takedown}, {@code catalog}, {@code plan} and below); never on {@code report}, {@code io},
 * {@code study} or a front end.
 */
package org.baywright.run;
