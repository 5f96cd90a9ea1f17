package org.baywright.design.dg11;

/**
 * A beam (joist) or girder of a bay as the walking check sees it.
 *
 * @param span L [m]
 * @param spacing beams: the beam spacing S (D_j = I_j/S, W_j spread over S); girders: the girder spacing, used
 *        only for the effective slab width of I_t when built from ingredients ({@link Stiffness#transformedInertia})
 *        — the check itself takes D_g = I_g/L_j [m]
 * @param it transformed moment of inertia with the dynamic modulus ({@link Stiffness#transformedInertia}) [m⁴]
 * @param weight realistic weight per length it supports, its own weight included ({@link VibrationLoads}) [N/m]
 * @param continuous whether an adjacent span is at least 0.7 of this span ({@link EffectiveWeights#continuous}):
 *        its effective weight is increased by 50 %
 */
public record VibrationMember(double span, double spacing, double it, double weight, boolean continuous) {

    public VibrationMember {
        if (!(span > 0) || !(spacing > 0) || !(it > 0) || !(weight > 0)) {
            throw new IllegalArgumentException("vibration member: span, spacing, I_t and weight must be positive, got L = "
                    + span + ", S = " + spacing + ", I_t = " + it + ", w = " + weight);
        }
    }

    public VibrationMember withIt(double value) {
        return new VibrationMember(span, spacing, value, weight, continuous);
    }

    public VibrationMember withWeight(double value) {
        return new VibrationMember(span, spacing, it, value, continuous);
    }

    public VibrationMember withContinuous(boolean value) {
        return new VibrationMember(span, spacing, it, weight, value);
    }
}
