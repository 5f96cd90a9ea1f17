package org.baywright.design.aisc360;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.calc.Calc;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.Steel;
import org.baywright.load.DesignMethod;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Combined axial compression and flexure, AISC 360-16 H1.1 ({@link CombinedH1}), minor-axis flexure F6
 * ({@link FlexureF6}) and the braced-frame amplifier B1 of Appendix 8 ({@link AmplificationA8}).
 */
class CombinedValidationTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double FY = Steel.A992.fy();
    private static final double E = Steel.A992.e();
    private static final double KIP = Units.KIPS.toSi(1);
    private static final double KIP_FT = Units.KIPS.toSi(1) * Units.FT_.toSi(1);

    /**
     * AISC Design Examples V15.0, Example H.1A (from memory): W14X99, A992, L = 14 ft, K = 1, Pu = 400
     * kips, Mux = 250 kip-ft, Muy = 80 kip-ft (second-order moments given), Cb = 1.0. The example reads
     * φcPn = 1,130 kips (Manual Table 4-1a), φbMnx = 642 kip-ft and φbMny = 311 kip-ft (Manual Table
     * 3-10 / 3-4, noncompact flanges about the minor axis, F6-2), Pr/Pc = 0.354 ≥ 0.2 → Eq. H1-1a =
     * 0.928. Tolerance: the example's three figures (0.5 %) on the strengths, ±0.003 on the ratio.
     */
    @Test
    void designExampleH1aW14x99() {
        Section s = CATALOG.find("W14X99").orElseThrow();
        double l = Units.FT_.toSi(14);
        double pc = DesignMethod.LRFD.available(IShapeCompression.strength(s, FY, E, l, l, null).pn(), ResistanceFactors.PHI_C,
                ResistanceFactors.OMEGA_C);
        double mcx = DesignMethod.LRFD.available(IShapeFlexure.mn(IShapeFlexure.constants(s, FY, E, null), l, 1.0, null),
                ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
        double mcy = DesignMethod.LRFD.available(FlexureF6.mn(s, FY, E, null), ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
        double ratio = CombinedH1.ratio(400 * KIP, pc, 250 * KIP_FT, mcx, 80 * KIP_FT, mcy, null);
        assertAll(
                () -> assertEquals(1130, pc / KIP, 0.005 * 1130, "φcPn, Example H.1A (from memory)"),
                () -> assertEquals(642, mcx / KIP_FT, 0.005 * 642, "φbMnx, Example H.1A (from memory)"),
                () -> assertEquals(311, mcy / KIP_FT, 0.005 * 311, "φbMny, Example H.1A (from memory)"),
                () -> assertEquals(0.928, ratio, 0.003, "Eq. H1-1a, Example H.1A (from memory)"));
    }

    /**
     * F6 for W14X99 by hand (COMPUTED from the AISC Shapes Database v15.0 values Zy = 83.6 in³, Sy = 55.2 in³,
     * bf/2tf = 9.34, from memory): Mp = min(50·83.6, 1.6·50·55.2) = 4,180 kip-in (Eq. F6-1); λpf = 9.15,
     * λrf = 24.1 → noncompact; Mn = 4,180 − (4,180 − 0.7·50·55.2)·(9.34 − 9.15)/(24.08 − 9.15) = 4,151 kip-in
     * (Eq. F6-2). A compact-flange shape (W14X90 is noncompact too; W14X109, bf/2tf = 8.49) has Mn = Mp.
     * Tolerance 0.5 % (the tabulated properties' three figures).
     */
    @Test
    void minorAxisFlexureF6() {
        Section w99 = CATALOG.find("W14X99").orElseThrow();
        Section w109 = CATALOG.find("W14X109").orElseThrow();
        double kipIn = Units.KIPS.toSi(1) * Units.IN.toSi(1);
        double mp109 = FlexureF6.mp(FY, w109.props().zy(), w109.props().sy(), null);
        assertAll(
                () -> assertEquals(4180, FlexureF6.mp(FY, w99.props().zy(), w99.props().sy(), null) / kipIn, 0.005 * 4180, "Eq. F6-1"),
                () -> assertEquals(4151, FlexureF6.mn(w99, FY, E, null) / kipIn, 0.005 * 4151, "Eq. F6-2"),
                () -> assertEquals(mp109, FlexureF6.mn(w109, FY, E, null), 1e-9 * mp109, "compact flanges: Mn = Mp (F6.1)"),
                () -> assertEquals(Math.min(FY * 3.0, 1.6 * FY * 1.0),
                        FlexureF6.mp(FY, 3.0, 1.0, null), 1e-9, "the 1.6·Fy·Sy cap of Eq. F6-1"));
    }

    /**
     * B1 by Appendix 8 (COMPUTED by hand): W14X99, L = 14 ft = 168 in, E = 29,000 ksi. Strong axis, Ix = 1,110
     * in⁴: Pe1 = π²·29,000·1,110/168² = 11,256 kips (Eq. A-8-5); M1/M2 = −0.5 (single curvature) → Cm = 0.8
     * (Eq. A-8-4); Pr = 400 kips, α = 1 → B1 = 0.8/(1 − 400/11,256) = 0.829 → 1.0 (Eq. A-8-3). Weak axis, Iy =
     * 402 in⁴: Pe1 = 4,077 kips; uniform single curvature Cm = 1.0 → B1 = 1/(1 − 400/4,077) = 1.109; ASD with
     * Pr = 250 kips and α = 1.6 gives the same 1.109. Reverse curvature M1/M2 = +1 gives Cm = 0.2.
     */
    @Test
    void b1OfAMemberInABracedFrame() {
        Section s = CATALOG.find("W14X99").orElseThrow();
        double l = Units.IN.toSi(168);
        double pex = AmplificationA8.pe1(E, s.props().ix(), l, null);
        double pey = AmplificationA8.pe1(E, s.props().iy(), l, null);
        double m = 100 * KIP_FT;
        assertAll(
                () -> assertEquals(11256, pex / KIP, 0.005 * 11256, "Eq. A-8-5, strong axis (COMPUTED, Ix three figures)"),
                () -> assertEquals(4077, pey / KIP, 0.005 * 4077, "Eq. A-8-5, weak axis (COMPUTED)"),
                () -> assertEquals(0.8, AmplificationA8.cm(-0.5 * m, m, null), 1e-12, "Eq. A-8-4, single curvature"),
                () -> assertEquals(0.2, AmplificationA8.cm(m, m, null), 1e-12, "Eq. A-8-4, reverse curvature"),
                () -> assertEquals(0.6, AmplificationA8.cm(0, m, null), 1e-12, "Eq. A-8-4, one end pinned"),
                () -> assertEquals(1.0, AmplificationA8.b1(0.8, 1.0, 400 * KIP, pex, null), 1e-12, "B1 ≥ 1, Eq. A-8-3"),
                () -> assertEquals(1.109, AmplificationA8.b1(1.0, AmplificationA8.alpha(DesignMethod.LRFD), 400 * KIP, pey, null),
                        0.003, "Eq. A-8-3, LRFD (COMPUTED)"),
                () -> assertEquals(1.109, AmplificationA8.b1(1.0, AmplificationA8.alpha(DesignMethod.ASD), 250 * KIP, pey, null),
                        0.003, "Eq. A-8-3, ASD α = 1.6 (COMPUTED)"),
                () -> assertEquals(Double.POSITIVE_INFINITY, AmplificationA8.b1(1.0, 1.0, 1.01 * pey, pey, null),
                        "beyond Pe1 the member buckles in the plane of bending"));
    }

    /** The branch of H1.1: Eq. H1-1b below Pr/Pc = 0.2, H1-1a from it on (AISC 360-16 H1.1(a), (b)). */
    @Test
    void h1BranchesAtPrOverPcOfTwoTenths() {
        Calc calc = new Calc();
        double b = CombinedH1.ratio(19, 100, 30, 100, 10, 100, calc);
        double a = CombinedH1.ratio(20, 100, 30, 100, 10, 100, null);
        assertAll(
                () -> assertEquals(0.19 / 2 + 0.4, b, 1e-12, "Eq. H1-1b"),
                () -> assertEquals(0.2 + 8.0 / 9.0 * 0.4, a, 1e-12, "Eq. H1-1a"),
                () -> assertTrue(calc.lines().stream().anyMatch(l -> l.reference().endsWith("Eq. H1-1b")), "recorded"));
    }
}
