package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Calc;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.load.LoadCase;
import org.junit.jupiter.api.Test;

/**
 * A cantilever beam with a backspan, checked by hand: backspan l = 30 ft, overhang c = 8 ft, service
 * D = 0.8 klf and L = 1.0 klf on the whole member, LRFD (ASCE 7-16 §2.3.1: 1.4D, 1.2D + 1.6L), A992,
 * top flange braced by the deck, deflection limits L/360 live and L/240 total (IBC Table 1604.3; the tip
 * with l = 2c, the table's footnote), own weight left out so that the figures are the hand's.
 *
 * <p>The expected values are COMPUTED here from the AISC Manual Table 3-23 "beam overhanging one
 * support" formulas (from memory; checked against the exact statics in {@code OverhangSpanValidationTest}),
 * by superposition where a pattern loads one part only:
 * <ul>
 *   <li>live load on the whole member, w = 1.2·0.8 + 1.6·1.0 = 2.56 klf: R1 = w/(2l)·(l² − c²) = 35.67 kips,
 *       R2 = w/(2l)·(l + c)² = 61.61 kips (more than the overhang's load plus half the backspan's,
 *       w·c + w·l/2 = 58.88 kips, by w·c²/(2l): the lever of the overhang),
 *       M over the support = w·c²/2 = 81.92 kip-ft, sagging w/(8l²)·(l + c)²·(l − c)² = 248.5 kip-ft;</li>
 *   <li>live load on the backspan only (2.56 klf there, 0.96 klf on the overhang): R1 = (2.56·30·15 −
 *       0.96·8·4)/30 = 37.376 kips, sagging R1²/(2w) = 272.845 kip-ft — this pattern governs sagging
 *       (ASCE 7-16 §4.3.3), 9.8 % above the whole-member loading;</li>
 *   <li>live load on the overhang only (0.96 klf on the backspan): R1 = (0.96·450 − 2.56·32)/30 = 11.67
 *       kips, still downward: no uplift at the far end.</li>
 *   <li>Tip deflection, live load on the backspan only: upward w_L·c·l³/(24EI) (whole-member case minus
 *       overhang-only case); on the overhang only: downward w_L·c³·(4l + 3c)/(24EI); total with D
 *       everywhere adds w_D·c·(4c²l − l³ + 3c³)/(24EI).</li>
 * </ul>
 * The lightest W shape meeting the governing check (total-load deflection of the tip under D + L on the
 * backspan: I ≥ 1,024 in⁴ to about 0.1 %) is W21X55 (Ix = 1,140 in⁴; W21X50 has 984 in⁴).
 */
class OverhangDesignerValidationTest {
    private static final double IN = 0.0254;
    private static final double FT = 12 * IN;
    private static final double KIP = 4448.2216152605;
    private static final double KLF = KIP / FT;
    private static final double KIPFT = KIP * FT;
    private static final double L = 30 * FT;
    private static final double C = 8 * FT;
    private static final double WD = 0.8 * KLF;
    private static final double WL = 1.0 * KLF;

    private static OverhangDesigner designer() {
        BeamLoads loads = BeamLoads.overhanging(L + C, 0, L, Map.of(
                LoadCase.D, List.<SpanLoad>of(DistributedLoad.full(L + C, WD)),
                LoadCase.L, List.<SpanLoad>of(DistributedLoad.full(L + C, WL))));
        return new OverhangDesigner(loads, BeamCriteria.defaults().withSelfWeight(false));
    }

    private static Check named(List<Check> checks, String name, String noteStart) {
        return checks.stream().filter(c -> c.name().equals(name) && c.note().startsWith(noteStart)).findFirst().orElseThrow();
    }

    @Test
    void handCheckedCantileverWithBackspan() {
        Catalog catalog = CatalogFile.loadDefault();
        BeamDesign d = designer().search(catalog, SearchFilter.ALL);
        Section s = d.section();
        double ei = Steel.A992.e() * s.props().ix();
        List<Check> checks = d.checks();
        double w = 1.2 * WD + 1.6 * WL;
        double wb = 1.2 * WD + 1.6 * WL;
        double r1Back = (wb * L * L / 2 - 1.2 * WD * C * C / 2) / L;
        double tipTotalUp = WL * C * L * L * L / (24 * ei) - WD * C / (24 * ei) * (4 * C * C * L - L * L * L + 3 * C * C * C);
        assertAll(
                () -> assertEquals("W21X55", s.designation(), "lightest W with Ix ≥ 1,024 in⁴ (COMPUTED above)"),
                () -> assertEquals(w * C * C / 2, named(checks, "flexure", "hogging").demand(), 1e-6 * KIPFT,
                        "M over the support = w·c²/2 = 81.92 kip-ft"),
                () -> assertEquals(81.92, named(checks, "flexure", "hogging").demand() / KIPFT, 1e-9),
                () -> assertEquals(8 * FT, named(checks, "flexure", "hogging").lb(), 1e-9, "Lb = the overhang"),
                () -> assertEquals(1.0, named(checks, "flexure", "hogging").cb(), 0, "Cb = 1.0 on the overhang"),
                () -> assertEquals(r1Back * r1Back / (2 * wb), named(checks, "flexure", "sagging").demand(), 1e-6 * KIPFT,
                        "sagging under live load on the backspan only"),
                () -> assertEquals(272.845, named(checks, "flexure", "sagging").demand() / KIPFT, 0.0005, "272.845 kip-ft"),
                () -> assertTrue(named(checks, "flexure", "sagging").note().contains("backspan only"), "the pattern is named"),
                () -> assertEquals(w / (2 * L) * (L * L + C * C), named(checks, "shear", "").demand(), 1e-6 * KIP,
                        "V beside the support, backspan side = w/(2l)·(l² + c²) = 41.13 kips"),
                () -> assertEquals(tipTotalUp, named(checks, "total-load deflection", "tip").demand(), 1e-9,
                        "tip rises under D + L on the backspan only"),
                () -> assertEquals(2 * C / 240, named(checks, "total-load deflection", "tip").capacity(), 1e-12,
                        "l = 2c (IBC Table 1604.3 footnote)"),
                () -> assertEquals(WL * C * L * L * L / (24 * ei) / (2 * C / 360),
                        named(checks, "live-load deflection", "tip").ratio(), 1e-9, "live tip, backspan loaded"),
                () -> assertTrue(d.status() == MemberStatus.SIZED));
    }

    @Test
    void reactionsAndNoUplift() {
        OverhangDesigner o = designer();
        int both = 0;
        var s = o.statics(1, both, 0); // 1.2D + 1.6L, live load on the whole member
        double w = 1.2 * WD + 1.6 * WL;
        double[] min = o.minimumReactions(CatalogFile.loadDefault().find("W21X55").orElseThrow());
        assertAll(
                () -> assertEquals("1.2D + 1.6L", o.combinations().get(1).name()),
                () -> assertEquals(w / (2 * L) * (L * L - C * C), s.reactionA(), 1e-6 * KIP, "R1 = 35.67 kips"),
                () -> assertEquals(w / (2 * L) * (L + C) * (L + C), s.reactionB(), 1e-6 * KIP, "R2 = 61.61 kips"),
                () -> assertEquals(61.61, s.reactionB() / KIP, 0.005),
                () -> assertEquals(w * C + w * L / 2 + w * C * C / (2 * L), s.reactionB(), 1e-6 * KIP,
                        "the support beside the overhang takes w·c²/(2l) more than the overhang plus half the backspan"),
                () -> assertEquals(w * (L + C), s.reactionA() + s.reactionB(), 1e-6 * KIP, "equilibrium"),
                () -> assertEquals((1.2 * WD * L * L / 2 - w * C * C / 2) / L, min[0], 1e-6 * KIP,
                        "least far-end reaction: live load on the overhang only, 11.67 kips, downward on the support"));
    }

    @Test
    void patternedLiveLoadGovernsSagging() {
        // Whole-member live load alone (the behaviour before patterns) gives 248.5 kip-ft; ASCE 7-16 §4.3.3
        // requires the backspan-only pattern, 272.845 kip-ft.
        double w = 1.2 * WD + 1.6 * WL;
        double whole = w / (8 * L * L) * Math.pow(L + C, 2) * Math.pow(L - C, 2);
        Check sag = named(designer().check(CatalogFile.loadDefault().find("W21X55").orElseThrow(), null), "flexure", "sagging");
        assertAll(
                () -> assertEquals(248.50, whole / KIPFT, 0.005, "Table 3-23, uniform load on the whole member"),
                () -> assertTrue(sag.demand() > 1.09 * whole, "the pattern raises the demand by 9.8 %"),
                () -> assertTrue(sag.note().contains("live load on the backspan only")));
    }

    @Test
    void theSheetStatesTheAssumptions() {
        Calc calc = new Calc();
        designer().check(CatalogFile.loadDefault().find("W21X55").orElseThrow(), calc);
        String text = calc.lines().toString();
        assertAll(
                () -> assertTrue(text.contains("Cb = 1.0"), "Cb = 1.0 stated"),
                () -> assertTrue(text.contains("bottom flange"), "bracing assumption stated"),
                () -> assertTrue(text.contains("2 × cantilever length"), "tip limit with l = 2c"),
                () -> assertTrue(text.contains("backspan only"), "governing pattern named"));
    }
}
