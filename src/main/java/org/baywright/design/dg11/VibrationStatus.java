package org.baywright.design.dg11;

/** The outcome of the walking check of a bay. */
public enum VibrationStatus {
    /** a_p/g ≤ a_o/g with f_n ≤ 9 Hz. */
    MEETS("meets"),
    /** a_p/g &gt; a_o/g with f_n ≤ 9 Hz. */
    EXCEEDS("exceeds"),
    /** f_n &gt; 9 Hz: the low-frequency method does not apply (DG11 2nd ed. has a high-frequency criterion); not a pass. */
    OUTSIDE_METHOD("outside the method");

    private final String label;

    VibrationStatus(String label) {
        this.label = label;
    }

    /** As a report prints it. */
    public String label() {
        return label;
    }
}
