package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The per-check functions of {@link BeamDesigner} (flexure per unbraced segment and combination, shear
 * per combination, live- and total-load deflection), each on its own: the statics they use are the
 * textbook simple-span formulas (common practice: M = wL²/8 at midspan, V = wL/2 at the supports,
 * Δ = 5wL⁴/(384EI)), the strengths the AISC 360-16 equations named beside each assertion; and the
 * checks of a section are exactly the governing results of these functions.
 */
class BeamChecksTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double SPAN = Units.FT_.toSi(30);
    private static final double WD = Units.KLF.toSi(0.8);
    private static final double WL = Units.KLF.toSi(1.2);
    private static final double REL = 1e-12;

    private static Section section(String name) {
        return CATALOG.find(name).orElseThrow();
    }

    private static BeamLoads uniform() {
        return BeamLoads.of(SPAN, Map.of(LoadCase.D, List.of(DistributedLoad.full(SPAN, WD)),
                LoadCase.L, List.of(DistributedLoad.full(SPAN, WL))));
    }

    private static BeamDesigner designer(BeamLoads loads, DesignMethod m, Bracing b, boolean selfWeight) {
        return new BeamDesigner(loads, BeamCriteria.defaults().withMethod(m).withBracing(b).withSelfWeight(selfWeight));
    }

    private static void near(List<Executable> out, String what, double expected, double actual) {
        out.add(() -> assertEquals(expected, actual, REL * Math.abs(expected), what));
    }

    @Test
    void flexureOfABracedUniformSpanIsWlSquaredOverEightAgainstPhiMp() {
        Section s = section("W18X50");
        BeamDesigner d = designer(uniform(), DesignMethod.LRFD, Bracing.continuous(), false);
        LoadCombination c = d.combinations().get(1);
        Check f = d.flexure(s, 1, 0, null);
        double fy = Steel.A992.fy();
        List<Executable> a = new ArrayList<>();
        // ASCE 7-16 §2.3.1 (2): 1.2D + 1.6L (from memory); M = wL²/8 (common practice)
        near(a, "Mu", (1.2 * WD + 1.6 * WL) * SPAN * SPAN / 8, f.demand());
        near(a, "x of Mu: midspan", SPAN / 2, f.position());
        // AISC 360-16 Eq. F2-1 and F1: φb·Mp = 0.90·Fy·Zx for a compact, continuously braced W18X50
        near(a, "φb·Mn", 0.9 * fy * s.props().zx(), f.capacity());
        near(a, "ratio", f.demand() / f.capacity(), f.ratio());
        a.add(() -> assertEquals(c, f.loadCombination(), "the check carries the combination it was computed under"));
        a.add(() -> assertEquals("1.2D + 1.6L", f.combination()));
        a.add(() -> assertEquals(0, f.lb(), "continuous bracing: Lb = 0"));
        a.add(() -> assertNull(f.segment(), "no unbraced segment under continuous bracing"));
        // ASCE 7-16 §2.3.1 (1): 1.4D alone, M = wL²/8
        near(a, "Mu under 1.4D", 1.4 * WD * SPAN * SPAN / 8, d.flexure(s, 0, 0, null).demand());
        assertAll(a);
    }

    @Test
    void flexureCarriesItsUnbracedSegment() {
        Section s = section("W18X50");
        BeamDesigner d = designer(uniform(), DesignMethod.LRFD, Bracing.equalSegments(3), false);
        Check middle = d.flexure(s, 1, 1, null);
        Check end = d.flexure(s, 1, 0, null);
        List<Executable> a = new ArrayList<>();
        a.add(() -> assertEquals(1, middle.segment().index()));
        a.add(() -> assertEquals(3, middle.segment().count()));
        near(a, "start of the middle third", SPAN / 3, middle.segment().start());
        near(a, "end of the middle third", 2 * SPAN / 3, middle.segment().end());
        near(a, "Lb of the middle third", SPAN / 3, middle.lb());
        a.add(() -> assertEquals("segment 2 of 3", middle.note()));
        // common practice: a uniform load's moment at the third point is 8/9 of the midspan moment
        near(a, "Mu at the end of the first third", 8.0 / 9 * (1.2 * WD + 1.6 * WL) * SPAN * SPAN / 8, end.demand());
        near(a, "x of Mu in the first third", SPAN / 3, end.position());
        // AISC Manual Table 3-1 (from memory): Cb = 1.01 for the middle third of a uniformly loaded span
        a.add(() -> assertEquals(1.01, middle.cb(), 0.005, "Cb of the middle third"));
        // the section's flexure check is the worst segment under the worst combination
        Check governing = check(d.check(s, null), "flexure");
        a.add(() -> assertEquals(middle, governing, "the middle third governs a uniform load"));
        assertAll(a);
    }

    @Test
    void shearIsTheLargerEndReaction() {
        Section s = section("W18X50");
        double x = Units.FT_.toSi(8);
        double p = Units.KIPS.toSi(20);
        BeamLoads loads = BeamLoads.of(SPAN, Map.of(LoadCase.D, List.<SpanLoad>of(DistributedLoad.full(SPAN, WD)),
                LoadCase.L, List.<SpanLoad>of(new PointLoad(x, p))));
        BeamDesigner d = designer(loads, DesignMethod.ASD, Bracing.continuous(), false);
        Check v = d.shear(s, 1, null);
        List<Executable> a = new ArrayList<>();
        // ASCE 7-16 §2.4.1 (2): D + L (from memory); reactions by statics (common practice)
        near(a, "Va at the left support", WD * SPAN / 2 + p * (SPAN - x) / SPAN, v.demand());
        a.add(() -> assertEquals(0, v.position(), "the point load is nearer the left support"));
        a.add(() -> assertEquals("left support", v.note()));
        // AISC 360-16 Eq. G2-1 with Cv1 = 1 (G2.1(a)) and Ωv = 1.50: Vn/Ωv = 0.6·Fy·d·tw/1.5
        near(a, "Vn/Ωv", 0.6 * Steel.A992.fy() * s.depth() * s.dims().tw() / 1.5, v.capacity());
        a.add(() -> assertEquals("D + L", v.combination()));
        assertAll(a);
    }

    @Test
    void deflectionsAreFiveWlFourthOverThreeEightyFourEi() {
        Section s = section("W16X26");
        BeamDesigner d = designer(uniform(), DesignMethod.LRFD, Bracing.continuous(), true);
        double ei = Steel.A992.e() * s.props().ix();
        double l4 = SPAN * SPAN * SPAN * SPAN;
        Check live = d.liveDeflection(s, null);
        Check total = d.totalDeflection(s, null);
        List<Executable> a = new ArrayList<>();
        // common practice: Δ = 5wL⁴/(384EI) at midspan; limits L/360 and L/240 (IBC Table 1604.3, from memory)
        near(a, "live Δ", 5 * WL * l4 / (384 * ei), live.demand());
        near(a, "live Δ allowed", SPAN / 360, live.capacity());
        near(a, "total Δ with own weight", 5 * (WD + WL + s.weight()) * l4 / (384 * ei), total.demand());
        near(a, "total Δ allowed", SPAN / 240, total.capacity());
        a.add(() -> assertEquals(SPAN / 2, live.position(), 1e-6 * SPAN, "x of live Δ"));
        a.add(() -> assertEquals("L", live.combination()));
        a.add(() -> assertEquals("D + L + self-weight", total.combination()));
        a.add(() -> assertEquals(1.0, total.loadCombination().factor(LoadCase.D)));
        BeamDesigner off = new BeamDesigner(uniform(), BeamCriteria.defaults().withDeflection(new DeflectionLimits(0, 0)));
        a.add(() -> assertNull(off.liveDeflection(s, null), "no live-load check without a limit"));
        a.add(() -> assertNull(off.totalDeflection(s, null), "no total-load check without a limit"));
        assertAll(a);
    }

    @Test
    void theChecksOfASectionAreTheGoverningResultsOfTheCheckFunctions() {
        BeamLoads loads = BeamLoads.of(SPAN, Map.of(
                LoadCase.D, List.<SpanLoad>of(DistributedLoad.full(SPAN, WD), new PointLoad(Units.FT_.toSi(11), Units.KIPS.toSi(5))),
                LoadCase.L, List.<SpanLoad>of(DistributedLoad.uniform(Units.FT_.toSi(4), Units.FT_.toSi(22), WL))));
        List<Executable> a = new ArrayList<>();
        for (String name : List.of("W18X50", "W14X90", "W21X48", "W8X10")) {
            Section s = section(name);
            for (DesignMethod m : DesignMethod.values()) {
                for (Bracing b : List.of(Bracing.continuous(), Bracing.equalSegments(1), Bracing.equalSegments(4))) {
                    BeamDesigner d = designer(loads, m, b, true);
                    int segments = b.boundaries().length - 1;
                    Check worstFlexure = null;
                    Check worstShear = null;
                    for (int c = 0; c < d.combinations().size(); c++) {
                        for (int g = 0; g < segments; g++) {
                            Check f = d.flexure(s, c, g, null);
                            if (worstFlexure == null || f.ratio() > worstFlexure.ratio()) {
                                worstFlexure = f;
                            }
                        }
                        Check v = d.shear(s, c, null);
                        if (worstShear == null || v.ratio() > worstShear.ratio()) {
                            worstShear = v;
                        }
                    }
                    List<Check> expected = List.of(worstFlexure, worstShear, d.liveDeflection(s, null), d.totalDeflection(s, null));
                    List<Check> checks = d.check(s, null);
                    String where = name + " " + m + " " + b.describe();
                    a.add(() -> assertEquals(expected, checks, where));
                }
            }
        }
        assertAll(a);
    }

    @Test
    void recordingACheckChangesNothingAndPrintsItsCombination() {
        Section s = section("W21X48");
        BeamDesigner d = designer(uniform(), DesignMethod.LRFD, Bracing.equalSegments(2), true);
        Calc calc = new Calc();
        Check recorded = d.flexure(s, 1, 0, calc);
        List<CalcLine> lines = calc.lines();
        assertAll(
                () -> assertEquals(d.flexure(s, 1, 0, null), recorded),
                () -> assertEquals(CalcLine.Kind.HEADING, lines.get(0).kind()),
                () -> assertEquals("Flexure under 1.2D + 1.6L (ASCE 7-16 §2.3.1 (2)), unbraced segment 1 of 2", lines.get(0).text()),
                () -> assertEquals(recorded.ratio(), lines.get(lines.size() - 1).value(), "the last line is the ratio"),
                () -> assertEquals(d.shear(s, 0, null), d.shear(s, 0, new Calc())));
    }

    @Test
    void passesIsRatioWithinOneUpToTheTolerance() {
        assertAll(
                () -> assertTrue(Check.passes(1.0)),
                () -> assertTrue(Check.passes(1.0 + Check.RATIO_TOLERANCE / 2), "rounding noise passes"),
                () -> assertFalse(Check.passes(1.0 + 2 * Check.RATIO_TOLERANCE)),
                () -> assertFalse(Check.passes(1.001)),
                () -> assertFalse(Check.passes(Double.NaN), "a ratio that is not a number does not pass"),
                () -> assertFalse(Check.passes(Double.POSITIVE_INFINITY)));
    }

    private static Check check(List<Check> checks, String name) {
        return checks.stream().filter(c -> c.name().equals(name)).findFirst().orElseThrow();
    }
}
