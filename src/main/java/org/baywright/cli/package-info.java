/**
 * The command line (picocli): {@code beam}, {@code catalog}, {@code new}, {@code check}, {@code design},
 * {@code bay} (one bay's floor-vibration check) and {@code study}, with located one-line problems on standard error, the exit codes of
 * {@code docs/cli-contract.md} (0 all sized, 1 overstressed or unsupported, 2 bad input) and the caution
 * in the help. Commands read and check their options and files, call the engine, {@code io},
 * {@code report} and {@code study}, and print; the engineering stays in the engine.
 *
 * <p>{@code beam --composite} reads its slab, stud and criteria options in {@code CompositeOptions} (a
 * mixin of {@code BeamCommand}) and runs and prints {@code design.CompositeBeamDesigner} in
 * {@code CompositeRun}.
 *
 * <p>Entry point: {@code BaywrightCommand.execute(args)}, called by {@code org.baywright.Launcher}.
 * May depend on everything but {@code ui}; nothing but the launcher depends on it.
 */
package org.baywright.cli;
