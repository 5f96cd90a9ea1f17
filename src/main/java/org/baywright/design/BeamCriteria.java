package org.baywright.design;

import java.util.Objects;
import org.baywright.load.DesignMethod;

/**
 * How a simple-span member is designed.
 *
 * @param selfWeight add each candidate's own weight to the dead load (off only to reproduce published
 *     examples whose dead load already includes it)
 */
public record BeamCriteria(DesignMethod method, Steel steel, Bracing bracing, DeflectionLimits deflection,
        boolean selfWeight) {

    public BeamCriteria {
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(steel, "steel");
        Objects.requireNonNull(bracing, "bracing");
        Objects.requireNonNull(deflection, "deflection");
    }

    /** LRFD, A992, continuous bracing, L/360 and L/240, self-weight on. */
    public static BeamCriteria defaults() {
        return new BeamCriteria(DesignMethod.LRFD, Steel.A992, Bracing.continuous(), DeflectionLimits.FLOOR, true);
    }

    public BeamCriteria withMethod(DesignMethod m) {
        return new BeamCriteria(m, steel, bracing, deflection, selfWeight);
    }

    public BeamCriteria withSteel(Steel s) {
        return new BeamCriteria(method, s, bracing, deflection, selfWeight);
    }

    public BeamCriteria withBracing(Bracing b) {
        return new BeamCriteria(method, steel, b, deflection, selfWeight);
    }

    public BeamCriteria withDeflection(DeflectionLimits d) {
        return new BeamCriteria(method, steel, bracing, d, selfWeight);
    }

    public BeamCriteria withSelfWeight(boolean on) {
        return new BeamCriteria(method, steel, bracing, deflection, on);
    }
}
