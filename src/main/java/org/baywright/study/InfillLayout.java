package org.baywright.study;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.Member;
import org.baywright.plan.Plan;

/**
 * The infill beams a plan actually places, read back from the beams its infills generate: a spacing
 * typed as a maximum becomes a whole number of beams per bay, so the actual spacing is what the
 * architect compares across a spacing sweep.
 *
 * @param largestSpacing the largest distance between neighbouring infill beams, or between a beam and the
 *     side of its bay, over every infill of every floor, m (NaN when the plan has no infill)
 * @param fewestBeams the fewest beams any infill places in its bay (0 when none)
 * @param mostBeams the most beams any infill places in its bay (0 when none)
 */
public record InfillLayout(double largestSpacing, int fewestBeams, int mostBeams) {
    /** A plan with no infill. */
    public static final InfillLayout NONE = new InfillLayout(Double.NaN, 0, 0);

    /** Measures every infill of every floor of the plan. */
    public static InfillLayout of(Plan plan) {
        double largest = Double.NaN;
        int fewest = Integer.MAX_VALUE;
        int most = 0;
        for (Floor f : plan.floors()) {
            for (Infill inf : f.infills()) {
                double[] sides = sides(plan, inf);
                if (sides == null) {
                    continue;
                }
                boolean alongX = inf.direction() == GridLine.Axis.X;
                List<Double> at = new ArrayList<>();
                for (Member m : Framing.infillBeams(plan, inf)) {
                    double c = alongX ? m.start().y() : m.start().x();
                    if (c > sides[0] + Variations.TOL && c < sides[1] - Variations.TOL) {
                        at.add(c);
                    }
                }
                at.sort(Double::compare);
                double previous = sides[0];
                double gap = 0;
                for (double c : at) {
                    gap = Math.max(gap, c - previous);
                    previous = c;
                }
                gap = Math.max(gap, sides[1] - previous);
                largest = Double.isNaN(largest) ? gap : Math.max(largest, gap);
                fewest = Math.min(fewest, at.size());
                most = Math.max(most, at.size());
            }
        }
        return Double.isNaN(largest) ? NONE : new InfillLayout(largest, fewest, most);
    }

    /** The bay's sides across the beams (low, high), m; null when a grid line is unknown. */
    private static double[] sides(Plan plan, Infill inf) {
        boolean alongX = inf.direction() == GridLine.Axis.X;
        var a = plan.gridLine(alongX ? inf.y0() : inf.x0());
        var b = plan.gridLine(alongX ? inf.y1() : inf.x1());
        if (a.isEmpty() || b.isEmpty()) {
            return null;
        }
        double lo = Math.min(a.get().offset(), b.get().offset());
        double hi = Math.max(a.get().offset(), b.get().offset());
        return hi > lo ? new double[] {lo, hi} : null;
    }

    /** True when the plan has infill. */
    public boolean present() {
        return !Double.isNaN(largestSpacing);
    }

    /** Beams per bay as text: "3", or "2–3" when the bays differ; empty when there is no infill. */
    public String beamsPerBay() {
        if (!present()) {
            return "";
        }
        return fewestBeams == mostBeams ? Integer.toString(mostBeams) : fewestBeams + "–" + mostBeams;
    }
}
