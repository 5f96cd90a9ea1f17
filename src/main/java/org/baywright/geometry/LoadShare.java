package org.baywright.geometry;

/**
 * The part of a concentrated load that one member receives.
 *
 * @param memberId the receiving member
 * @param s where it acts, along the member from its start, m
 * @param fraction share of the load's value, 0 &lt; fraction ≤ 1; the shares of one load add up to 1
 */
public record LoadShare(String memberId, double s, double fraction) {
}
