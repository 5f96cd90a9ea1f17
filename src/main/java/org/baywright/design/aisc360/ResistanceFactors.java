package org.baywright.design.aisc360;

/** Resistance and safety factors of AISC 360-16 used by Baywright. */
public final class ResistanceFactors {
    private ResistanceFactors() {
    }

    /** Flexure, F1(a): φb = 0.90. */
    public static final double PHI_B = 0.90;
    /** Flexure, F1(a): Ωb = 1.67. */
    public static final double OMEGA_B = 1.67;
    /** Shear of rolled I-shapes under G2.1(a): φv = 1.00. */
    public static final double PHI_V_ROLLED = 1.00;
    /** Shear of rolled I-shapes under G2.1(a): Ωv = 1.50. */
    public static final double OMEGA_V_ROLLED = 1.50;
    /** Shear, G1: φv = 0.90. */
    public static final double PHI_V = 0.90;
    /** Shear, G1: Ωv = 1.67. */
    public static final double OMEGA_V = 1.67;
    /** Compression, E1: φc = 0.90. */
    public static final double PHI_C = 0.90;
    /** Compression, E1: Ωc = 1.67. */
    public static final double OMEGA_C = 1.67;
}
