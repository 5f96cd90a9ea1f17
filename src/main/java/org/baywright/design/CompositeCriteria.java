package org.baywright.design;

import java.util.Objects;
import org.baywright.load.DesignMethod;
import org.baywright.units.Units;

/**
 * How a composite beam is designed.
 *
 * @param method LRFD or ASD
 * @param steel the beam's steel
 * @param minDegree least degree of composite action, ΣQ_n over the full composite force (0.25: AISC
 *     360-16 Commentary I3.2d recommends at least 25 %; common practice)
 * @param studWeight the steel weight one stud is worth in the cost comparison [N] (10 lb: common practice)
 * @param camber the camber rule (unshored beams)
 * @param deflection deflection limits (IBC Table 1604.3 by default: L/360 live, L/240 total; 0 = off)
 * @param shored true when the beam is shored during construction: everything acts on the composite
 *     section, no construction-stage check and no camber
 * @param constructionBracing bracing of the bare steel during construction where the deck does not
 *     brace it (ribs parallel to the beam, solid slab on forms): typically at the framing points. With
 *     the ribs perpendicular the deck braces the top flange (Lb = 0).
 * @param selfWeight add the candidate's own weight to the dead load (off only to reproduce published
 *     examples whose dead load includes an assumed beam weight)
 * @param camberAllowance the steel weight a cambered piece is worth in the cost comparison [N] (default 0)
 */
public record CompositeCriteria(DesignMethod method, Steel steel, double minDegree, double studWeight, CamberRule camber,
        DeflectionLimits deflection, boolean shored, Bracing constructionBracing, boolean selfWeight, double camberAllowance) {

    /** Criteria without a camber allowance. */
    public CompositeCriteria(DesignMethod method, Steel steel, double minDegree, double studWeight, CamberRule camber,
            DeflectionLimits deflection, boolean shored, Bracing constructionBracing, boolean selfWeight) {
        this(method, steel, minDegree, studWeight, camber, deflection, shored, constructionBracing, selfWeight, 0);
    }

    public CompositeCriteria {
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(steel, "steel");
        Objects.requireNonNull(camber, "camber");
        Objects.requireNonNull(deflection, "deflection");
        Objects.requireNonNull(constructionBracing, "constructionBracing");
        if (!(minDegree >= 0 && minDegree <= 1)) {
            throw new IllegalArgumentException("the minimum degree of composite action must lie in [0, 1], got " + minDegree);
        }
        if (!(camberAllowance >= 0) || !Double.isFinite(camberAllowance)) {
            throw new IllegalArgumentException("the equivalent weight of a cambered piece must be ≥ 0, got " + camberAllowance);
        }
        if (!(studWeight >= 0) || !Double.isFinite(studWeight)) {
            throw new IllegalArgumentException("the equivalent weight of a stud must be ≥ 0, got " + studWeight);
        }
    }

    /** LRFD, A992, 25 % minimum, 10 lb per stud, the default camber rule, L/360 and L/240, unshored, braced at the ends only where the deck does not brace, self-weight on. */
    public static CompositeCriteria defaults() {
        return new CompositeCriteria(DesignMethod.LRFD, Steel.A992, 0.25, Units.LBF.toSi(10),
                CamberRule.defaults(), DeflectionLimits.FLOOR, false, Bracing.equalSegments(1), true);
    }

    public CompositeCriteria withMethod(DesignMethod m) {
        return new CompositeCriteria(m, steel, minDegree, studWeight, camber, deflection, shored, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withMinDegree(double d) {
        return new CompositeCriteria(method, steel, d, studWeight, camber, deflection, shored, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withStudWeight(double w) {
        return new CompositeCriteria(method, steel, minDegree, w, camber, deflection, shored, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withCamber(CamberRule c) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, c, deflection, shored, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withDeflection(DeflectionLimits d) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, camber, d, shored, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withShored(boolean s) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, camber, deflection, s, constructionBracing, selfWeight, camberAllowance);
    }

    public CompositeCriteria withConstructionBracing(Bracing b) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, camber, deflection, shored, b, selfWeight, camberAllowance);
    }

    public CompositeCriteria withCamberAllowance(double w) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, camber, deflection, shored, constructionBracing, selfWeight, w);
    }

    public CompositeCriteria withSelfWeight(boolean on) {
        return new CompositeCriteria(method, steel, minDegree, studWeight, camber, deflection, shored, constructionBracing, on, camberAllowance);
    }
}
