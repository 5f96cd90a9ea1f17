package org.baywright.report.drawing;

import java.util.List;
import org.baywright.units.UnitSystem;

/**
 * A drawing scale: one unit on paper represents {@code denominator} units on the plan.
 *
 * @param label as printed: {@code 1/8" = 1'-0"} or {@code 1:100}
 */
public record DrawingScale(int denominator, String label) {
    /** Architectural scales, largest first. */
    static final List<DrawingScale> US = List.of(
            new DrawingScale(24, "1/2\" = 1'-0\""),
            new DrawingScale(32, "3/8\" = 1'-0\""),
            new DrawingScale(48, "1/4\" = 1'-0\""),
            new DrawingScale(64, "3/16\" = 1'-0\""),
            new DrawingScale(96, "1/8\" = 1'-0\""),
            new DrawingScale(128, "3/32\" = 1'-0\""),
            new DrawingScale(192, "1/16\" = 1'-0\""),
            new DrawingScale(384, "1/32\" = 1'-0\""),
            new DrawingScale(768, "1/64\" = 1'-0\""));
    /** Metric scales, largest first. */
    static final List<DrawingScale> SI = List.of(
            new DrawingScale(20, "1:20"), new DrawingScale(50, "1:50"), new DrawingScale(100, "1:100"),
            new DrawingScale(125, "1:125"), new DrawingScale(200, "1:200"), new DrawingScale(250, "1:250"),
            new DrawingScale(500, "1:500"), new DrawingScale(1000, "1:1000"), new DrawingScale(2000, "1:2000"));

    public DrawingScale {
        if (denominator <= 0) {
            throw new IllegalArgumentException("scale denominator must be positive");
        }
    }

    /** Paper millimetres per plan metre. */
    public double mmPerMetre() {
        return 1000.0 / denominator;
    }

    /**
     * The largest standard scale of the unit system at which a plan of {@code width} × {@code height}
     * metres fits in {@code availW} × {@code availH} paper millimetres; beyond the list, 1:n with n a
     * multiple of 500 (US: of 1200, i.e. 1" = 100'-0" steps).
     */
    static DrawingScale fit(UnitSystem units, double width, double height, double availW, double availH) {
        List<DrawingScale> list = units == UnitSystem.SI ? SI : US;
        for (DrawingScale s : list) {
            if (width * s.mmPerMetre() <= availW + 1e-9 && height * s.mmPerMetre() <= availH + 1e-9) {
                return s;
            }
        }
        double need = Math.max(width * 1000 / Math.max(availW, 1e-9), height * 1000 / Math.max(availH, 1e-9));
        if (units == UnitSystem.SI) {
            int n = (int) (Math.ceil(need / 500) * 500);
            return new DrawingScale(n, "1:" + n);
        }
        int feetPerInch = (int) Math.ceil(need / 1200) * 100;
        return new DrawingScale(feetPerInch * 12, "1\" = " + feetPerInch + "'-0\"");
    }
}
