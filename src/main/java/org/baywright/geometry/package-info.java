/**
 * Plan geometry for one-way decks: tributary areas of the members, width profiles of the load they
 * receive, where point, line and area loads go, and the coverage checks behind them. This is the only
 * package that uses JTS; JTS types never appear in its public signatures, which speak in
 * {@link org.baywright.plan.Point}, {@link org.baywright.plan.Polygon} and this package's records.
 *
 * <p>Entry point: {@link org.baywright.geometry.TributaryAnalysis#compute}. All values are SI: metres,
 * square metres; a width times a load in Pa gives N/m.
 *
 * <h2>Rules</h2>
 * <ul>
 *   <li><b>Half-way rule along the span.</b> Between two neighbouring supports the deck splits at their
 *       midpoint, measured along the deck's span direction (not by Euclidean nearness: a Voronoi
 *       diagram of the members would give a two-way pattern at member ends, wrong for a one-way deck).
 *       Deck beyond the outermost support (an overhang, a balcony) goes to that support.</li>
 *   <li><b>Continuous deck only.</b> Supports are neighbours only along continuous deck. Deck on the far
 *       side of an opening or a notch, along the span, is carried by the supports on its own side, or is
 *       unsupported; it never reaches a member across the gap. Where the deck between two supports is
 *       continuous, or the opening is framed by members along its edges, this is the plain half-way
 *       rule; where it is not, it is the only load path the deck has.</li>
 *   <li><b>Unsupported deck.</b> Deck with no supporting member on either side along its span is
 *       reported ({@value org.baywright.geometry.GeometryProblem#UNSUPPORTED_DECK}, with its outline) and
 *       delivers nothing.</li>
 *   <li><b>Several decks.</b> Each deck spans in its own direction. A member on the edge between two
 *       decks carries from both. Where decks overlap, the first one listed carries the overlap and an
 *       {@value org.baywright.geometry.GeometryProblem#OVERLAP} problem is reported. A floor with no
 *       decks is one deck: its slab edge, spanning along x, with the floor's id.</li>
 *   <li><b>Area loads.</b> Each area load's width profile on a member is that of the member's tributary
 *       area ∩ the load's outline. A part of the load outside every deck or outside the slab edge is
 *       reported as {@value org.baywright.geometry.GeometryProblem#AREA_LOAD_OFF_DECK} with that part's
 *       outline, because it is most likely a drawing error. A part over an opening is not reported
 *       (openings carry no load by definition, and a load area drawn over a whole floor is normal), and
 *       a part over unsupported deck is covered by the unsupported-deck problem.</li>
 *   <li><b>Point loads.</b> A point within the tolerance of a member goes wholly to it, at its position;
 *       where two members meet, the one the point is inside of wins over one it is at the end of (a load
 *       at a beam's end on a girder goes to the girder). Otherwise the lever rule between the supports
 *       on either side along the span, all to the outer support on an overhang.</li>
 *   <li><b>Deck spans.</b> The same decomposition measures, along the span, each span between
 *       neighbouring supports and each overhang beyond the outermost one
 *       ({@link org.baywright.geometry.DeckSpan}, on {@link org.baywright.geometry.FloorTributary#deckSpans()});
 *       decks of one span direction that meet are measured as one deck. Limits are not checked here.</li>
 *   <li><b>Line loads.</b> Portions lying along a member (within the tolerance) go to it with factor 1.
 *       The rest is cut where the supports on either side may change and shared by the lever rule. A
 *       portion running along the span maps onto a single point of each member: its share is a point
 *       force, marked by {@code s0 == s1} (see {@link org.baywright.geometry.LineShare}).</li>
 * </ul>
 *
 * <h2>Robustness</h2>
 * Coordinates are snapped to the tolerance grid; outlines are noded together by snap-rounding, so deck
 * regions share their edges exactly. Polygons are checked with JTS {@code IsValidOp}: a self-crossing
 * outline is repaired (JTS {@code GeometryFixer}) and reported where it crosses; an outline with no area
 * is reported and ignored. Members shorter than the tolerance and repeated member ids are reported and
 * ignored. No input makes the analysis throw: an unexpected failure on one object becomes an
 * {@value org.baywright.geometry.GeometryProblem#INTERNAL} problem and the rest is still computed.
 *
 * <h2>Invariants</h2>
 * Checked on every run and reported as {@value org.baywright.geometry.GeometryProblem#COVERAGE} or
 * {@value org.baywright.geometry.GeometryProblem#OVERLAP}: Σ member areas + unsupported deck = loaded
 * area; ∫ w ds = area for every member and in total (relative 1e-9); no two members' tributary areas
 * overlap.
 */
package org.baywright.geometry;
