package org.baywright.design.aisc360;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Section;
import org.baywright.catalog.SectionProperties;

/**
 * Axial compressive strength of a rolled doubly symmetric I-shape by flexural buckling about both
 * axes, AISC 360-16 E3.
 *
 * <p>Known limitations: shapes with slender elements for compression (Table B4.1a) need E7, which is
 * not implemented: {@link #strength} reports them as {@code slender} with NaN strength, and a
 * search excludes them. Torsional buckling (E4) does not govern doubly symmetric W shapes with
 * Lcz ≤ Lcy and is not checked.
 */
public final class IShapeCompression {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_E2 = Aisc360.clause("E2");
    private static final String CLAUSE_E3 = Aisc360.clause("E3");
    private static final String CLAUSE_TABLE_B4_1A = Aisc360.clause("Table B4.1a");

    private IShapeCompression() {
    }

    /**
     * @param pn nominal strength (NaN when slender)
     * @param governingAxis "x" or "y"
     * @param slender true if an element is slender for compression (E7 needed)
     */
    public record Strength(double pn, double fcr, double slenderness, String governingAxis, boolean slender) {
    }

    /** Whether a flange or the web is slender for compression at this Fy (Table B4.1a Cases 1 and 5). */
    public static boolean hasSlenderElement(Section s, double fy, double e, Calc calc) {
        double lrf = Slenderness.lambdaRfCompression(e, fy, calc);
        double lrw = Slenderness.lambdaRwCompression(e, fy, calc);
        boolean sf = s.bfOver2tf() > lrf;
        boolean sw = s.hOverTw() > lrw;
        if (calc != null) {
            Calc.branch(calc, "bf/2tf = " + CalcFormat.sig(s.bfOver2tf()) + (sf ? " > " : " ≤ ") + "λr = " + CalcFormat.sig(lrf)
                + "; h/tw = " + CalcFormat.sig(s.hOverTw()) + (sw ? " > " : " ≤ ") + "λr = " + CalcFormat.sig(lrw)
                + (sf || sw ? " → slender element: E7 applies (not implemented)" : " → no slender elements: E3 applies"),
                    CLAUSE_TABLE_B4_1A);
        }
        return sf || sw;
    }

    /** Pn for effective lengths Lcx and Lcy (K·L about each axis). */
    public static Strength strength(Section s, double fy, double e, double lcx, double lcy, Calc calc) {
        if (hasSlenderElement(s, fy, e, calc)) {
            return new Strength(Double.NaN, Double.NaN, Double.NaN, "-", true);
        }
        SectionProperties p = s.props();
        double sx = lcx / p.rx();
        double sy = lcy / p.ry();
        if (calc != null) {
            calc.eq("Lcx/rx", "Lcx/rx", CLAUSE_E2, sx, Quantity.NUMBER,
                    Arg.of("Lcx", lcx, Quantity.SPAN_LENGTH), Arg.of("rx", p.rx(), Quantity.SECTION_LENGTH));
            calc.eq("Lcy/ry", "Lcy/ry", CLAUSE_E2, sy, Quantity.NUMBER,
                    Arg.of("Lcy", lcy, Quantity.SPAN_LENGTH), Arg.of("ry", p.ry(), Quantity.SECTION_LENGTH));
        }
        boolean yGoverns = sy >= sx;
        double lc = yGoverns ? lcy : lcx;
        double r = yGoverns ? p.ry() : p.rx();
        Calc.branch(calc, (yGoverns ? "Lcy/ry ≥ Lcx/rx → buckling about the y-axis governs"
                : "Lcx/rx > Lcy/ry → buckling about the x-axis governs"), CLAUSE_E3);
        double fe = CompressionE3.fe(e, lc, r, calc);
        double fcr = CompressionE3.fcr(fy, fe, e, lc / r, calc);
        double pn = CompressionE3.pn(fcr, p.a(), calc);
        return new Strength(pn, fcr, lc / r, yGoverns ? "y" : "x", false);
    }
}
