package org.baywright.design;

import java.util.List;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.CompositeFlexureI3;

/**
 * The design (or check) of one composite member (beam or girder): the section, the studs, the composite properties, every
 * check, and what the search rejected. SI: m, N, N·m, m⁴.
 *
 * @param status sized, fixed size (checked and passes) or overstressed
 * @param section the chosen or checked section (when overstressed, the best candidate; null if none)
 * @param studsPerHalf studs between each support and midspan, spaced uniformly over the half span
 * @param studs studs on the beam, 2 × {@code studsPerHalf}
 * @param qn strength of one stud Q_n (I8-1)
 * @param sumQn ΣQ_n of the composite flexure: Q_n × the studs between the nearer support and the point of
 *     maximum moment (studsPerHalf × Q_n when that point is at midspan)
 * @param beff effective width b (I3.1a)
 * @param beffLeft effective width on the left
 * @param beffRight effective width on the right
 * @param slabWeight slab weight per area used [Pa]
 * @param flexure the plastic stress distribution (C, a, d1, PNA, M_n, degree of composite action)
 * @param ilb lower-bound moment of inertia I_LB
 * @param itr full transformed moment of inertia I_tr
 * @param preDeflection deflection of the bare steel under the wet loads and its own weight (0 when shored)
 * @param camber camber specified (0 for none)
 * @param constructionRatio the construction stage's governing ratio (0 when shored)
 * @param checks every check: composite flexure, studs at point loads (with point loads, I8.2c), construction
 *     flexure and shear, shear, live- and total-load deflection
 * @param rejected lighter sections rejected, lightest first, each with the check that failed
 * @param alternatives every section that passed in the search with its least studs, by cost
 * @param costWeight steel weight of the beam plus studs × the equivalent stud weight [N]
 * @param evaluations (section, stud count) evaluations the search made
 */
public record CompositeDesign(MemberStatus status, Section section, int studsPerHalf, int studs, double qn, double sumQn,
        double beff, double beffLeft, double beffRight, double slabWeight, CompositeFlexureI3.Result flexure, double ilb,
        double itr, double preDeflection, double camber, double constructionRatio, List<Check> checks,
        List<Rejection> rejected, List<Alternative> alternatives, double costWeight, long evaluations) {

    public CompositeDesign {
        checks = List.copyOf(checks);
        rejected = List.copyOf(rejected);
        alternatives = List.copyOf(alternatives);
    }

    /** A section that passes with its least stud count, and its cost-equivalent weight [N]. */
    public record Alternative(Section section, int studs, double costWeight) {
    }

    /** The governing (highest-ratio) check. */
    public Check governing() {
        return Check.governing(checks);
    }

    /** The check of that name, or null. */
    public Check check(String name) {
        for (Check c : checks) {
            if (c.name().equals(name)) {
                return c;
            }
        }
        return null;
    }
}
