package org.baywright.design;

import java.util.List;
import org.baywright.catalog.Section;

/**
 * The design of one simple-span member: the chosen (or checked) section, every check, and the lighter
 * sections rejected on the way.
 *
 * @param section the chosen section; when overstressed, the candidate with the lowest governing ratio
 * @param checks every check of {@code section}
 * @param rejected every lighter candidate rejected, lightest first
 * @param candidates how many sections the filter allowed
 */
public record BeamDesign(MemberStatus status, Section section, List<Check> checks, List<Rejection> rejected,
        int candidates) {

    public BeamDesign {
        checks = List.copyOf(checks);
        rejected = List.copyOf(rejected);
    }

    /** The governing (highest-ratio) check. */
    public Check governing() {
        return Check.governing(checks);
    }

    /** The highest ratio of all checks. */
    public double maxRatio() {
        return governing().ratio();
    }
}
