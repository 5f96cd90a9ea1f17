package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.Point;
import org.baywright.plan.Problem;
import org.baywright.units.UnitSystem;

/**
 * Live loads below the value ASCE 7-16 Table 4.3-1 gives for the occupancy an area load names (storage
 * 125 or 250 psf, a passenger-vehicle garage 40 psf): a warning, since the table's uniform loads are
 * minimums, but the engineer may have a documented reason (a lighter use agreed with the owner, a
 * concentrated-load case that governs instead). An area load with no live load (dead load only) is not warned.
 */
final class OccupancyLoads {
    private OccupancyLoads() {
    }

    /** Rounding slack of a typed value against the table's, Pa (well under 0.1 psf). */
    private static final double SLACK = 1.0;

    /** One warning per area load whose live load (roof live load on a roof) is below its occupancy's table value. */
    static List<Problem> check(Floor floor, UnitSystem units) {
        List<Problem> out = new ArrayList<>();
        for (AreaLoad a : floor.areaLoads()) {
            LiveLoadUse use = a.use();
            double min = use.tableMinimum();
            double live = Math.max(a.values().live(), a.values().roofLive());
            if (!(min > 0) || !(live > 0) || live + SLACK >= min) {
                continue;
            }
            List<Point> at = a.outline().vertices().isEmpty() ? List.of() : List.of(centre(a));
            out.add(new Problem(Problem.Severity.WARNING, "below-table-live-load", "floor " + floor.id(), a.id(),
                    "load area " + a.id() + " (" + use.words().toLowerCase(java.util.Locale.ROOT) + ") carries live load "
                            + units.areaLoadText(live) + ", less than the " + units.areaLoadText(min)
                            + " ASCE 7-16 Table 4.3-1 gives for that occupancy; raise it, or record the reason in the plan's notes",
                    at));
        }
        return out;
    }

    private static Point centre(AreaLoad a) {
        double x = 0;
        double y = 0;
        List<Point> ps = a.outline().vertices();
        for (Point p : ps) {
            x += p.x();
            y += p.y();
        }
        return new Point(x / ps.size(), y / ps.size());
    }
}
