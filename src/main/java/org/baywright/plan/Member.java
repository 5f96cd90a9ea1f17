package org.baywright.plan;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * A simply supported framing member on a floor. Its ends find their supports by position: a column at
 * the end point, or another member passing through it (beam onto girder, beam onto beam, girder onto
 * girder).
 *
 * @param id unique within the floor, e.g. "G-A-1-2" or "B-12"
 * @param fixedSection a size the user chose (checked, not searched), if any
 * @param composite the member's own choice of acting with the slab, where it differs from its floor's
 *     ({@link CompositeFloor#composite}); empty to follow the floor
 * @param fixedStuds a stud count the user chose for the member (with a fixed section), if any
 */
public record Member(String id, MemberKind kind, Point start, Point end, Optional<String> fixedSection,
        Optional<Boolean> composite, OptionalInt fixedStuds) {
    public Member {
        composite = composite == null ? Optional.empty() : composite;
        fixedStuds = fixedStuds == null ? OptionalInt.empty() : fixedStuds;
    }

    /** A member following its floor's composite setting, studs not fixed. */
    public Member(String id, MemberKind kind, Point start, Point end, Optional<String> fixedSection) {
        this(id, kind, start, end, fixedSection, Optional.empty(), OptionalInt.empty());
    }

    /** This member with another fixed section (empty: sized), its other choices kept. */
    public Member withFixedSection(Optional<String> s) {
        return new Member(id, kind, start, end, s, composite, fixedStuds);
    }

    /** This member with its own composite choice (empty: as the floor says). */
    public Member withComposite(Optional<Boolean> c) {
        return new Member(id, kind, start, end, fixedSection, c, fixedStuds);
    }

    /** This member with a fixed stud count (empty: searched). */
    public Member withFixedStuds(OptionalInt n) {
        return new Member(id, kind, start, end, fixedSection, composite, n);
    }

    public double length() {
        return start.distance(end);
    }
}
