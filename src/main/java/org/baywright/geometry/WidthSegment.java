package org.baywright.geometry;

/**
 * One straight piece of a tributary width profile along a member, measured from the member's start.
 * On {@code [s0, s1]} an area load {@code q} (Pa) delivers {@code q·w(s)} N/m, with {@code w} varying
 * linearly from {@code w0} to {@code w1} (m).
 *
 * @param s0 start of the piece along the member, m ({@code s0 < s1})
 * @param s1 end of the piece along the member, m
 * @param w0 tributary width at {@code s0}, m
 * @param w1 tributary width at {@code s1}, m
 */
public record WidthSegment(double s0, double s1, double w0, double w1) {

    /** ∫ w ds over the piece, m²: the deck area this piece delivers. */
    public double area() {
        return 0.5 * (w0 + w1) * (s1 - s0);
    }

    /** The width at {@code s}, interpolated linearly (not clamped to the piece). */
    public double widthAt(double s) {
        if (s == s0) {
            return w0;
        }
        if (s == s1) {
            return w1;
        }
        return w0 + (s - s0) / (s1 - s0) * (w1 - w0);
    }
}
