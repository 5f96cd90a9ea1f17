package org.baywright.takedown;

import org.baywright.calc.Calc;
import org.baywright.design.BeamDesign;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeDesign;

/**
 * The composite design of one floor member (AISC 360-16 Chapter I) with what it is compared against.
 *
 * @param design the composite design: section, studs, b_eff, ΣQ_n, PNA, I_LB, camber, every check
 * @param designer the designer that made it, to record the calculation sheet from the same equations
 * @param bare the bare-steel design of the same member under the same loads, for comparison (the
 *     weight the floor would take without composite action); null when not designed
 * @param ribs how the deck ribs run relative to the member: "perpendicular" or "parallel"
 * @param shored true when the floor is shored while the concrete hardens
 * @param deck the id of the deck whose slab the member acts with
 */
public record CompositeResult(CompositeDesign design, CompositeBeamDesigner designer, BeamDesign bare, String ribs,
        boolean shored, String deck) {

    /** Studs on the whole member (0 when none). */
    public int studs() {
        return design.section() == null ? 0 : design.studs();
    }

    /** Camber specified, m (0 for none). */
    public double camber() {
        return design.section() == null ? 0 : design.camber();
    }

    /** True when camber is specified. */
    public boolean cambered() {
        return camber() > 0;
    }

    /** Degree of composite action ΣQ_n / min(0.85 f′c A_c, A_s F_y), NaN when not designed. */
    public double degree() {
        return design.flexure() == null ? Double.NaN : design.flexure().degree();
    }

    /** Steel weight of the bare-steel design per length, N/m (NaN when none). */
    public double bareWeightPerLength() {
        return bare == null || bare.section() == null ? Double.NaN : bare.section().weight();
    }

    /** The calculation sheet of the composite design, recorded from the same equations; null when not designed. */
    public Calc calculation() {
        if (design.section() == null) {
            return null;
        }
        Calc calc = new Calc();
        designer.check(design.section(), design.studsPerHalf(), calc);
        return calc;
    }
}
