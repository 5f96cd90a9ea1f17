package org.baywright.design.aisc360;

/**
 * Position of a headed stud in a deck rib perpendicular to the beam, AISC 360-16 I8.2a (R_p): the
 * distance e_mid-ht from the edge of the stud shank to the mid-height of the rib web, measured in the
 * load-bearing direction (towards the point of maximum moment).
 */
public enum StudPosition {
    /** e_mid-ht &lt; 2 in: R_p = 0.6. */
    WEAK,
    /** e_mid-ht ≥ 2 in: R_p = 0.75. */
    STRONG
}
