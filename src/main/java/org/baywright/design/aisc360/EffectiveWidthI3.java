package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;

/**
 * AISC 360-16 I3.1a: the effective width of the concrete slab of a composite beam, the sum of the
 * effective widths on each side of the beam centreline.
 *
 * <p>Known limitations: the span is the beam's span between supports (simple spans only); the caller
 * supplies the distances to the neighbouring member and the slab edge on each side (a later stage takes
 * them from the tributary geometry). A distance that does not exist on a side (no neighbour, no edge)
 * is passed as {@link Double#POSITIVE_INFINITY} and drops out of the minimum.
 */
public final class EffectiveWidthI3 {
    private static final String CLAUSE_I3_1A = Aisc360.clause("I3.1a");

    private EffectiveWidthI3() {
    }

    /**
     * AISC 360-16 I3.1a: effective width on one side of the beam centreline,
     * b_side = min(L/8, s/2, e) [m].
     *
     * @param span L, the beam span between supports [m]
     * @param toNeighbour s, the distance to the centreline of the adjacent member on that side [m];
     *     {@code +∞} when there is none
     * @param toEdge e, the distance to the edge of the slab on that side [m]; {@code +∞} when the slab
     *     continues beyond the neighbour
     * @param side "left" or "right", for the symbol on the sheet
     */
    public static double side(double span, double toNeighbour, double toEdge, String side, Calc calc) {
        if (!(span > 0) || !Double.isFinite(span)) {
            throw new IllegalArgumentException("effective width: the span must be positive and finite, got " + span);
        }
        if (!(toNeighbour > 0) || !(toEdge >= 0)) {
            throw new IllegalArgumentException("effective width: the distance to the next member must be positive and "
                    + "the distance to the slab edge not negative, got " + toNeighbour + " and " + toEdge);
        }
        boolean n = Double.isFinite(toNeighbour);
        boolean e = Double.isFinite(toEdge);
        double v = span / 8;
        if (n) {
            v = Math.min(v, toNeighbour / 2);
        }
        if (e) {
            v = Math.min(v, toEdge);
        }
        if (calc == null) {
            return v;
        }
        String symbol = "b_" + side;
        Arg l = Arg.of("L", span, Quantity.SPAN_LENGTH);
        Arg s = Arg.of("s", toNeighbour, Quantity.SPAN_LENGTH);
        Arg ed = Arg.of("e", toEdge, Quantity.SPAN_LENGTH);
        if (n && e) {
            return calc.eq(symbol, "min(L/8, s/2, e)", CLAUSE_I3_1A, v, Quantity.SPAN_LENGTH, l, s, ed);
        } else if (n) {
            return calc.eq(symbol, "min(L/8, s/2)", CLAUSE_I3_1A, v, Quantity.SPAN_LENGTH, l, s);
        } else if (e) {
            return calc.eq(symbol, "min(L/8, e)", CLAUSE_I3_1A, v, Quantity.SPAN_LENGTH, l, ed);
        }
        return calc.eq(symbol, "L/8", CLAUSE_I3_1A, v, Quantity.SPAN_LENGTH, l);
    }

    /** AISC 360-16 I3.1a: total effective width, b = b_left + b_right [m]. */
    public static double total(double left, double right, Calc calc) {
        return Calc.eq(calc, "b", "b_left + b_right", CLAUSE_I3_1A, left + right, Quantity.SPAN_LENGTH,
                Arg.of("b_left", left, Quantity.SPAN_LENGTH), Arg.of("b_right", right, Quantity.SPAN_LENGTH));
    }
}
