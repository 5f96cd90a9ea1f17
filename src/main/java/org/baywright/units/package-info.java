/**
 * Units of measure: every value inside Baywright is a {@code double} in one canonical SI system (m, N,
 * Pa, N/m, N·m, kg/m); this package reads quantities as users type them, US customary or SI
 * ({@code 35ft}, {@code 30'-6"}, {@code 250mm}, {@code 0.45klf}, {@code 50ksi}), and names the unit each
 * {@link org.baywright.units.UnitSystem} prints. A bare number is refused as ambiguous.
 *
 * <p>Entry points: {@link org.baywright.units.Quantities} (parsing, with a located
 * {@link org.baywright.units.UnitParseException}), {@link org.baywright.units.Units} (the units and exact
 * conversion factors), {@link org.baywright.units.UnitSystem}. Depends on the JDK only; every other
 * package may use it.
 */
package org.baywright.units;
