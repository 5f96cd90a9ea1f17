/**
 * The load takedown of a plan: on each floor layout, tributary areas from {@code geometry}, a support
 * graph built from member and column positions, the members designed in its topological order (each
 * after all the members framing into it, its reactions then passed on unreduced per load component),
 * column lines summed level over level from the top level down to the foundations, and the checks that every
 * member is supported, that the graph has no cycle and that applied load equals the foundation reactions
 * per load case.
 *
 * <p>Entry points: {@code Takedown.run(plan, catalog[, floorCache])}, giving a {@code TakedownResult}
 * (member and column results, foundation reactions, {@code Equilibrium}, located problems);
 * {@code FloorCache} shares floor designs between related runs. Depends on the engine packages below it
 * ({@code plan}, {@code geometry}, {@code design} and its code packages, {@code analysis},
 * {@code catalog}, {@code load}, {@code units}); never on {@code run}, {@code report}, {@code io},
 * {@code study} or a front end.
 *
 * <p>After the takedown, {@code Bays} finds the bays of each designed floor layout and {@code BayChecks}
 * checks each for floor vibration from walking ({@code design.dg11}), giving a {@code BayResult} per bay.
 */
package org.baywright.takedown;
