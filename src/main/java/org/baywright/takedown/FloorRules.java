package org.baywright.takedown;

import org.baywright.units.UnitSystem;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.SearchFilter;
import org.baywright.design.Steel;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadRules;

/**
 * Everything the design of a floor layout reads besides the layout, its columns and the catalog: part of
 * the key under which a {@link FloorCache} keeps a floor design (the column series and splices are not
 * here, because they reach no floor).
 *
 * @param beams the sections a beam may be
 * @param girders the sections a girder may be
 * @param units the plan's unit system, in which the floor's problems are written (so it is part of the key)
 */
public record FloorRules(DesignMethod method, Steel steel, DeflectionLimits deflection, SearchFilter beams,
        SearchFilter girders, LiveLoadRules liveLoad, UnitSystem units) {
}
