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
 * @param composite the plan-wide rules of composite design
 * @param vibrationSections the least section of members stiffened for walking vibration, by member id (a run
 *     sizing its bays for vibration sets them, {@code run.PlanRun}); empty otherwise
 */
public record FloorRules(DesignMethod method, Steel steel, DeflectionLimits deflection, SearchFilter beams,
        SearchFilter girders, LiveLoadRules liveLoad, UnitSystem units, org.baywright.plan.CompositeRules composite,
        java.util.Map<String, String> vibrationSections) {
    public FloorRules {
        composite = composite == null ? org.baywright.plan.CompositeRules.DEFAULT : composite;
        vibrationSections = vibrationSections == null ? java.util.Map.of() : java.util.Map.copyOf(vibrationSections);
    }

    /** Rules with the default composite rules. */
    public FloorRules(DesignMethod method, Steel steel, DeflectionLimits deflection, SearchFilter beams, SearchFilter girders,
            LiveLoadRules liveLoad, UnitSystem units) {
        this(method, steel, deflection, beams, girders, liveLoad, units, null, null);
    }

    /** Rules with these composite rules and no member stiffened for vibration. */
    public FloorRules(DesignMethod method, Steel steel, DeflectionLimits deflection, SearchFilter beams, SearchFilter girders,
            LiveLoadRules liveLoad, UnitSystem units, org.baywright.plan.CompositeRules composite) {
        this(method, steel, deflection, beams, girders, liveLoad, units, composite, null);
    }

    /** These rules with members stiffened for walking vibration (member id → least section). */
    public FloorRules withVibrationSections(java.util.Map<String, String> sections) {
        return new FloorRules(method, steel, deflection, beams, girders, liveLoad, units, composite, sections);
    }

    /** The criteria of a composite member of a floor shored ({@code shored}) or not, bracing {@code bracing} where the deck does not brace. */
    public org.baywright.design.CompositeCriteria compositeCriteria(boolean shored, org.baywright.design.Bracing bracing) {
        org.baywright.design.CamberRule def = org.baywright.design.CamberRule.defaults();
        org.baywright.design.CamberRule camber = composite.camber()
                ? new org.baywright.design.CamberRule(composite.camberShare(), def.increment(), def.minimum(), def.minSpan())
                : org.baywright.design.CamberRule.none();
        return new org.baywright.design.CompositeCriteria(method, steel, composite.minDegree(), composite.studWeight(), camber,
                deflection, shored, bracing, true, composite.camberAllowance());
    }
}
