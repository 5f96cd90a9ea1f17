package org.baywright.design;

import org.baywright.units.Units;

/**
 * Structural steel material for design.
 *
 * @param name e.g. "ASTM A992"
 * @param fy specified minimum yield stress, Pa
 * @param e modulus of elasticity, Pa
 */
public record Steel(String name, double fy, double e) {

    /** ASTM A992, Fy = 50 ksi; E = 29,000 ksi (AISC 360-16 B2/Symbols; ASTM A992). */
    public static final Steel A992 = new Steel("ASTM A992", Units.KSI.toSi(50), Units.KSI.toSi(29000));

    public Steel {
        if (!(fy > 0) || !Double.isFinite(fy)) {
            throw new IllegalArgumentException("Fy must be positive, got " + fy);
        }
        if (!(e > 0) || !Double.isFinite(e)) {
            throw new IllegalArgumentException("E must be positive, got " + e);
        }
        if (fy >= e) {
            throw new IllegalArgumentException("Fy must be less than E");
        }
    }

    /** The same steel with another yield stress. */
    public Steel withFy(double newFy) {
        return new Steel(newFy == fy ? name : "Fy " + Math.round(Units.KSI.fromSi(newFy) * 10) / 10.0 + " ksi", newFy, e);
    }
}
