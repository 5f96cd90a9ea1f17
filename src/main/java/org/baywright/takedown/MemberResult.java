package org.baywright.takedown;

import java.util.List;
import org.baywright.design.BeamDesign;
import org.baywright.design.MemberStatus;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Point;

/**
 * The design of one floor member in a run.
 *
 * @param floor the floor layout id (members of a typical floor are designed once for all its levels)
 * @param design the design, or null when the member was not designed (unsupported, in a support cycle)
 * @param tributaryArea the deck area it carries directly, m²
 * @param reductionArea A_T for live-load reduction: the area whose load it receives, m²
 * @param kll live-load element factor used (ASCE 7-16 Table 4.7-1)
 * @param liveFactor reduction factor applied to its ordinary floor live load L, ASCE 7-16 §4.7 (1 = none)
 * @param roofLiveFactor reduction factor applied to its roof live load Lr, ASCE 7-16 §4.8.2: R1·R2, or
 *     12 psf / L0 where that minimum governed (1 = none, or no roof live load)
 * @param startReaction reactions at the start end by component, unreduced, self-weight in D, N; for a
 *     member that overhangs a support ({@link #overhangs()}), at its first support
 * @param endReaction reactions at the end, N; for an overhanging member, at its second support
 * @param startSupport id of what supports the start ("column C-A1", "member G-1"), or empty
 * @param endSupport id of what supports the end, or empty
 * @param tributary the tributary polygons for drawing
 * @param loads the service loads the member was designed for (live loads reduced), for calculation
 *     sheets; null when not designed
 * @param criteria the design criteria used; null when not designed
 * @param composite the composite design when the member acts with its slab (then {@code design} is that
 *     design seen as a beam design: its section, status, checks and rejections), else null
 */
public record MemberResult(String id, String floor, MemberKind kind, Point start, Point end, double length,
        MemberStatus status, BeamDesign design, double tributaryArea, double reductionArea, double kll,
        double liveFactor, double roofLiveFactor, double[] startReaction, double[] endReaction, String startSupport, String endSupport,
        List<org.baywright.plan.Polygon> tributary, org.baywright.design.BeamLoads loads,
        org.baywright.design.BeamCriteria criteria, CompositeResult composite) {

    /** A bare-steel member. */
    public MemberResult(String id, String floor, MemberKind kind, Point start, Point end, double length,
            MemberStatus status, BeamDesign design, double tributaryArea, double reductionArea, double kll,
            double liveFactor, double roofLiveFactor, double[] startReaction, double[] endReaction, String startSupport,
            String endSupport, List<org.baywright.plan.Polygon> tributary, org.baywright.design.BeamLoads loads,
            org.baywright.design.BeamCriteria criteria) {
        this(id, floor, kind, start, end, length, status, design, tributaryArea, reductionArea, kll, liveFactor, roofLiveFactor,
                startReaction, endReaction, startSupport, endSupport, tributary, loads, criteria, null);
    }

    /** True when the member acts compositely with its slab. */
    public boolean isComposite() {
        return composite != null;
    }

    /** Studs on the member (0 when not composite). */
    public int studs() {
        return composite == null ? 0 : composite.studs();
    }

    /** Camber specified, m (0 when none). */
    public double camber() {
        return composite == null ? 0 : composite.camber();
    }

    /**
     * Steel weight the member would have without composite action, N: the bare-steel design's for a
     * composite member, else its own.
     */
    public double bareSteelWeight() {
        if (composite == null) {
            return steelWeight();
        }
        double w = composite.bareWeightPerLength();
        return Double.isNaN(w) ? 0 : w * length;
    }

    /**
     * Records the calculation sheet of this member's section, from the same equations the run used.
     * Returns null when the member was not designed.
     */
    public org.baywright.calc.Calc calculation() {
        if (design == null || design.section() == null || loads == null) {
            return null;
        }
        if (composite != null) {
            return composite.calculation();
        }
        org.baywright.calc.Calc calc = new org.baywright.calc.Calc();
        if (loads.isOverhanging()) {
            new org.baywright.design.OverhangDesigner(loads, criteria).check(design.section(), calc);
        } else {
            new org.baywright.design.BeamDesigner(loads, criteria).check(design.section(), calc);
        }
        return calc;
    }

    /** True when the member overhangs a support (a cantilever with a backspan). */
    public boolean overhangs() {
        return loads != null && loads.isOverhanging();
    }

    /** The chosen section designation, or empty. */
    public String section() {
        return design == null || design.section() == null ? "" : design.section().designation();
    }

    /** Steel weight of the member, N (nominal weight × length), 0 when not designed. */
    public double steelWeight() {
        return design == null || design.section() == null ? 0 : design.section().weight() * length;
    }

    /** Highest demand/capacity ratio (NaN when not designed). */
    public double maxRatio() {
        return design == null || design.section() == null ? Double.NaN : design.maxRatio();
    }
}
