package org.baywright.plan;

import java.util.Optional;

/**
 * A simply supported framing member on a floor. Its ends find their supports by position: a column at
 * the end point, or another member passing through it (beam onto girder, beam onto beam, girder onto
 * girder).
 *
 * @param id unique within the floor, e.g. "G-A-1-2" or "B-12"
 * @param fixedSection a size the user chose (checked, not searched), if any
 */
public record Member(String id, MemberKind kind, Point start, Point end, Optional<String> fixedSection) {
    public double length() {
        return start.distance(end);
    }
}
