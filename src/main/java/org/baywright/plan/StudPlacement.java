package org.baywright.plan;

/**
 * Where a headed stud sits in a deck rib that crosses the member (AISC 360-16 I8.2a, the factor R_p):
 * on the side of the rib nearer the member's mid-span (strong) or farther from it (weak). Weak is the
 * usual assumption when the detailer does not control it (common practice).
 */
public enum StudPlacement {
    WEAK, STRONG
}
