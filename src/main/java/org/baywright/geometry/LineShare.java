package org.baywright.geometry;

/**
 * The part of a line load that one member receives, as a linearly varying load along the member.
 *
 * <p>For {@code s0 < s1} the member carries, per metre of its own length, the line load's value
 * (N/m) times a factor varying linearly from {@code f0} to {@code f1} on {@code [s0, s1]}. A portion
 * lying along the member has {@code f0 = f1 = 1}; a portion carried by the deck has the lever-rule
 * fraction times the ratio of the portion's length to the length of member it maps onto.
 *
 * <p>When the portion runs along the span direction of the deck, every point of it maps to the same
 * position of the member. Such a share is <em>concentrated</em>: {@code s0 == s1}, {@code f0 == f1},
 * and the member carries a point force of the line load's value times {@code f0}, which is then a
 * length in metres ({@link #isConcentrated()}, {@link #force(double)}).
 */
public record LineShare(String memberId, double s0, double s1, double f0, double f1) {

    /** True when this share is a point force at {@code s0} rather than a distributed load. */
    public boolean isConcentrated() {
        return s0 == s1;
    }

    /** The total force this share puts on the member for a line load of {@code value} N/m, N. */
    public double force(double value) {
        return isConcentrated() ? value * f0 : value * 0.5 * (f0 + f1) * (s1 - s0);
    }
}
