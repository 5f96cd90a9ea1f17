package org.baywright.geometry;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.baywright.plan.Polygon;

/**
 * The deck area one member carries.
 *
 * @param memberId the member
 * @param area tributary area, m² (after clipping by slab edge and openings)
 * @param polygons the tributary area as non-overlapping simple polygons, plan coordinates, for drawing
 * @param widths the tributary width profile along the member for the whole deck: pieces in increasing
 *     {@code s}, zero-width stretches left out, collinear neighbours merged; ∫ w ds = {@code area}
 * @param areaLoadWidths by area load id, the width profile of (this tributary area ∩ that load's
 *     outline); only loads that reach this member appear
 */
public record MemberTributary(String memberId, double area, List<Polygon> polygons, List<WidthSegment> widths,
        Map<String, List<WidthSegment>> areaLoadWidths) {

    public MemberTributary {
        polygons = List.copyOf(polygons);
        widths = List.copyOf(widths);
        Map<String, List<WidthSegment>> copy = new LinkedHashMap<>();
        areaLoadWidths.forEach((k, v) -> copy.put(k, List.copyOf(v)));
        areaLoadWidths = Collections.unmodifiableMap(copy);
    }

    /** ∫ w ds over {@link #widths()}, m²; equals {@link #area()} to rounding. */
    public double widthIntegral() {
        return integral(widths);
    }

    /** ∫ w ds of a width profile, m². */
    public static double integral(List<WidthSegment> profile) {
        double a = 0;
        for (WidthSegment w : profile) {
            a += w.area();
        }
        return a;
    }
}
