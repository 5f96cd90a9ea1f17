package org.baywright.calc;

import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/** How a value on a calculation sheet is printed: which unit each unit system uses for it. */
public enum Quantity {
    /** Spans, unbraced lengths: ft or m. */
    SPAN_LENGTH,
    /** Section dimensions, radii of gyration, deflections: in or mm. */
    SECTION_LENGTH,
    FORCE,
    MOMENT,
    STRESS,
    LINE_LOAD,
    AREA_LOAD,
    /** Cross-section area: in² or mm². */
    AREA,
    /** Floor or tributary area: ft² or m². */
    FLOOR_AREA,
    SECTION_MODULUS,
    INERTIA,
    WARPING,
    /** A pure number (ratio, factor, slenderness). */
    NUMBER;

    /** The unit this quantity is printed in under {@code system}. */
    public Unit unit(UnitSystem system) {
        return switch (this) {
            case SPAN_LENGTH -> system.length();
            case SECTION_LENGTH -> system.smallLength();
            case FORCE -> system.force();
            case MOMENT -> system.moment();
            case STRESS -> system.stress();
            case LINE_LOAD -> system.lineLoad();
            case AREA_LOAD -> system.areaLoad();
            case AREA -> system.area();
            case FLOOR_AREA -> system.floorArea();
            case SECTION_MODULUS -> system.sectionModulus();
            case INERTIA -> system.inertia();
            case WARPING -> system.warping();
            case NUMBER -> Units.ONE;
        };
    }
}
