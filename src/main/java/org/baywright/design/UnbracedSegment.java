package org.baywright.design;

/**
 * One unbraced segment of a member's compression flange: the part between two adjacent brace points
 * (AISC 360-16 F1, the unbraced length Lb).
 *
 * @param index 0 for the segment that starts at the member's start, counting along the member
 * @param count how many segments the bracing makes
 * @param start where the segment starts along the member, m
 * @param end where it ends, m
 */
public record UnbracedSegment(int index, int count, double start, double end) {

    /** The unbraced length Lb, m. */
    public double length() {
        return end - start;
    }

    /** "segment 2 of 3", as notes print it. */
    public String label() {
        return "segment " + (index + 1) + " of " + count;
    }
}
