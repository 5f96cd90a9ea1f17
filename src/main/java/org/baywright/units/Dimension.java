package org.baywright.units;

/** The physical kinds of quantity Baywright reads and prints. Canonical SI unit in brackets. */
public enum Dimension {
    /** [m] */
    LENGTH("length"),
    /** [N] */
    FORCE("force"),
    /** [N/m] a distributed load along a member, or weight per length */
    LINE_LOAD("line load"),
    /** [Pa] a load per floor area */
    AREA_LOAD("area load"),
    /** [Pa] a material stress or strength */
    STRESS("stress"),
    /** [N·m] */
    MOMENT("moment"),
    /** [m²] */
    AREA("area"),
    /** [m³] section modulus */
    SECTION_MODULUS("section modulus"),
    /** [m⁴] second moment of area, torsion constant */
    MOMENT_OF_INERTIA("second moment of area"),
    /** [m⁶] warping constant */
    WARPING_CONSTANT("warping constant"),
    /** [kg/m] mass per length */
    MASS_PER_LENGTH("mass per length"),
    /** [N/m³] weight per volume (concrete unit weight) */
    UNIT_WEIGHT("unit weight"),
    /** [-] */
    DIMENSIONLESS("number");

    private final String label;

    Dimension(String label) {
        this.label = label;
    }

    /** A short lower-case description for messages ("line load"). */
    public String label() {
        return label;
    }
}
