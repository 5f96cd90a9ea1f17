/**
 * Baywright: steel floor framing, from a plan of grid, columns, girders, beams, decks and loads to the
 * lightest adequate rolled sections, the load takedown to the foundations and the reports that go with
 * them. The engine lives in the sub-packages; this package holds only the program's entry point.
 *
 * <p>Entry point: {@link org.baywright.Launcher#main}, the main class of {@code baywright.jar}. With no
 * arguments it opens the editor ({@code ui}, loaded only then); with any argument it is the command line
 * ({@code cli}). It is the one class allowed to know both front ends. The package plan and its
 * dependency rules are in {@code docs/architecture.md}.
 */
package org.baywright;
