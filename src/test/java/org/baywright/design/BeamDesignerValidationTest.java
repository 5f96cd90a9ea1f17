package org.baywright.design;

import static org.baywright.design.Deviations.DB_RADIUS;
import static org.baywright.design.Deviations.THREE_FIGURES;
import static org.baywright.design.Deviations.holds;
import static org.junit.jupiter.api.Assertions.assertAll;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.IShapeFlexure;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The beam designer ({@link BeamDesigner}) on the AISC Design Examples of CHECK-VALUES §1 (F.1-1A/B,
 * F.1-2A/B, F.1-3A/B, F.4, G.1A) and the self-weight note of §5: the section the search selects, the
 * demands from the statics of the span, the unbraced length and Cb of the governing segment, and the
 * available strengths φRn or Rn/Ω.
 *
 * <p>The examples take the dead load as given (CHECK-VALUES §5, "Self-weight effect", and traps item
 * 10), so self-weight is off unless a test says otherwise.
 *
 * <p>Tolerances, by source: values the Design Examples print to three figures, 0.5 %
 * ({@link Deviations#THREE_FIGURES}); CHECK-VALUES four-figure values of demands (pure statics of the
 * given loads), within half a unit of the last digit ({@link Deviations#printed}); four-figure values
 * of LTB strengths, which the guide computed with the database's three-figure ry and rts, 0.5 %
 * ({@link Deviations#DB_RADIUS}).
 */
class BeamDesignerValidationTest {
    private static final Deviations F1 = new Deviations("Designer: F.1-1A/B (W18X50, braced)");
    private static final Deviations F1_LTB = new Deviations("Designer: F.1-2, F.1-3, unbraced (LTB, Cb)");
    private static final Deviations F4 = new Deviations("Designer: F.4 (W24X55)");
    private static final Deviations G1 = new Deviations("Designer: G.1A (W24X62 shear)");

    private static final double SPAN_F1 = Units.FT_.toSi(35);
    private static Catalog catalog;

    @BeforeAll
    static void load() {
        catalog = CatalogFile.loadDefault();
    }

    @AfterAll
    static void report() {
        F1.report();
        F1_LTB.report();
        F4.report();
        G1.report();
    }

    // ------------------------------------------------------------------------------------------
    // helpers
    // ------------------------------------------------------------------------------------------

    /** Uniform D and L over a simple span (klf). */
    private static BeamLoads uniform(double span, double deadKlf, double liveKlf) {
        return BeamLoads.of(span, Map.of(
                LoadCase.D, List.of(DistributedLoad.full(span, Units.KLF.toSi(deadKlf))),
                LoadCase.L, List.of(DistributedLoad.full(span, Units.KLF.toSi(liveKlf)))));
    }

    /** AISC DE Ex. F.1 loads: 35 ft, D = 0.45 klf, L = 0.75 klf (CHECK-VALUES §1, FOUND). */
    private static BeamLoads exampleF1Loads() {
        return uniform(SPAN_F1, 0.45, 0.75);
    }

    /** Live-load deflection L/360, total-load deflection off, self-weight off (as the examples). */
    private static BeamCriteria exampleCriteria(DesignMethod method, Bracing bracing) {
        return BeamCriteria.defaults().withMethod(method).withBracing(bracing)
                .withDeflection(new DeflectionLimits(360, 0)).withSelfWeight(false);
    }

    /** d ≤ 18 in, as Ex. F.1-1A limits the depth. */
    private static SearchFilter depthAtMost18in() {
        return new SearchFilter(0, Units.IN.toSi(18), Set.of(), Set.of());
    }

    private static Check check(BeamDesign d, String name) {
        return d.checks().stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no \"" + name + "\" check in " + d.checks()));
    }

    private static Section section(String designation) {
        return catalog.find(designation).orElseThrow(() -> new AssertionError("no " + designation + " in the catalog"));
    }

    private static double kipFt(double newtonMetres) {
        return Units.KIP_FT.fromSi(newtonMetres);
    }

    private static double kips(double newtons) {
        return Units.KIPS.fromSi(newtons);
    }

    private static double ft(double metres) {
        return Units.FT_.fromSi(metres);
    }

    private static double in(double metres) {
        return Units.IN.fromSi(metres);
    }

    private static String name(BeamDesign d) {
        return d.section() == null ? "(none)" : d.section().designation();
    }

    // ------------------------------------------------------------------------------------------
    // F.1-1A / F.1-1B: continuously braced, selection by live-load deflection and flexure
    // ------------------------------------------------------------------------------------------

    @Test
    void exampleF11ALrfdSearch() {
        BeamDesigner designer = new BeamDesigner(exampleF1Loads(), exampleCriteria(DesignMethod.LRFD, Bracing.continuous()));
        BeamDesign d = designer.search(catalog, depthAtMost18in());
        Check flex = check(d, "flexure");
        Check live = check(d, "live-load deflection");
        Section w18x50 = section("W18X50");
        List<Rejection> rej = d.rejected();
        Rejection last = rej.isEmpty() ? null : rej.get(rej.size() - 1);
        assertAll("AISC DE Ex. F.1-1A, LRFD search (d ≤ 18 in, L/360, self-weight off)",
                holds("status sized, got " + d.status(), d.status() == MemberStatus.SIZED),
                // AISC DE V15.1 Ex. F.1-1A; CHECK-VALUES §1: select W18x50, FOUND
                holds("selects W18X50, got " + name(d), "W18X50".equals(name(d))),
                holds("flexure under 1.2D + 1.6L, got " + flex.combination(), flex.combination().contains("1.6L")),
                // AISC DE V15.1 Ex. F.1-1A; CHECK-VALUES §1: Mu = 266 kip-ft, FOUND (three figures)
                F1.near("Mu [kip-ft] (example)", 266, kipFt(flex.demand()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-1A: Mu = 266.4 kip-ft, COMPUTED (1.74 k/ft × 35² / 8)
                F1.printed("Mu [kip-ft] (computed)", 266.4, kipFt(flex.demand())),
                // Table 3-23 Case 1 (CHECK-VALUES §5): M at midspan, 17.5 ft, COMPUTED
                F1.printed("x of Mu [ft]", 17.5, ft(flex.position())),
                // AISC DE V15.1 Ex. F.1-1B; CHECK-VALUES §1: φbMn = 379 kip-ft, FOUND (three figures)
                F1.near("φbMn [kip-ft] (example)", 379, kipFt(flex.capacity()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-1B: φbMn = 378.8 kip-ft, COMPUTED
                F1.printed("φbMn [kip-ft] (computed)", 378.8, kipFt(flex.capacity())),
                // CHECK-VALUES §4 Table 4: allowable LL deflection at 35 ft = 1.167 in, COMPUTED (AISC rounds to 1.17)
                F1.printed("Δallow, L/360 [in]", 1.167, in(live.capacity())),
                // CHECK-VALUES §1 F.1-1A: resulting ΔLL = 1.09 in for the W18x50, COMPUTED
                F1.printed("ΔLL [in]", 1.09, in(live.demand())),
                // CHECK-VALUES §1 F.1-1A: required Ix = 748.5 in⁴ with unrounded Δ = 1.1667 in, COMPUTED
                // (the example prints 746 in⁴ from Δ rounded to 1.17 in, FOUND). Ireq = (Δ/Δallow)·Ix.
                F1.printed("Ireq [in⁴] = ratio × Ix", 748.5,
                        live.ratio() * Units.IN4.fromSi(w18x50.props().ix())),
                // The example selects by Ireq: the heaviest rejected candidate fails on live-load deflection
                holds("the last rejected candidate fails on live-load deflection, got "
                        + (last == null ? "none" : last.section() + " on " + last.governing().name()),
                        last != null && last.governing().name().equals("live-load deflection")));
    }

    @Test
    void exampleF11BAsdSearch() {
        BeamDesigner designer = new BeamDesigner(exampleF1Loads(), exampleCriteria(DesignMethod.ASD, Bracing.continuous()));
        BeamDesign d = designer.search(catalog, depthAtMost18in());
        Check flex = check(d, "flexure");
        assertAll("AISC DE Ex. F.1-1B, ASD search",
                // AISC DE V15.1 Ex. F.1-1A/B; CHECK-VALUES §1: W18x50, FOUND
                holds("selects W18X50, got " + name(d), "W18X50".equals(name(d))),
                holds("flexure under D + L, got " + flex.combination(), flex.combination().contains("L")),
                // AISC DE V15.1 Ex. F.1-1A; CHECK-VALUES §1: Ma = 184 kip-ft, FOUND (three figures)
                F1.near("Ma [kip-ft] (example)", 184, kipFt(flex.demand()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-1A: Ma = 183.8 kip-ft, COMPUTED (1.20 k/ft × 35² / 8)
                F1.printed("Ma [kip-ft] (computed)", 183.8, kipFt(flex.demand())),
                // AISC DE V15.1 Ex. F.1-1B; CHECK-VALUES §1: Mn/Ωb = 252 kip-ft, FOUND + COMPUTED 252.0
                F1.printed("Mn/Ωb [kip-ft]", 252.0, kipFt(flex.capacity())));
    }

    /**
     * CHECK-VALUES §5 "Self-weight effect (W18x50 of §1)", COMPUTED: adding the W18X50's 50 lb/ft
     * raises Mu from 266.4 to 275.6 kip-ft and Ma from 183.8 to 191.4 kip-ft; the selection stays
     * W18X50 (strength is not what governs it).
     */
    @Test
    void exampleF11WithSelfWeight() {
        BeamDesign lrfd = new BeamDesigner(exampleF1Loads(),
                exampleCriteria(DesignMethod.LRFD, Bracing.continuous()).withSelfWeight(true))
                .search(catalog, depthAtMost18in());
        BeamDesign asd = new BeamDesigner(exampleF1Loads(),
                exampleCriteria(DesignMethod.ASD, Bracing.continuous()).withSelfWeight(true))
                .search(catalog, depthAtMost18in());
        assertAll("AISC DE Ex. F.1-1 with the beam's own weight added",
                holds("LRFD selects W18X50, got " + name(lrfd), "W18X50".equals(name(lrfd))),
                holds("ASD selects W18X50, got " + name(asd), "W18X50".equals(name(asd))),
                // CHECK-VALUES §5: Mu 266.4 → 275.6 kip-ft with self-weight, COMPUTED
                F1.printed("Mu with self-weight [kip-ft]", 275.6, kipFt(check(lrfd, "flexure").demand())),
                // CHECK-VALUES §5: Ma 183.8 → 191.4 kip-ft with self-weight, COMPUTED
                F1.printed("Ma with self-weight [kip-ft]", 191.4, kipFt(check(asd, "flexure").demand())));
    }

    // ------------------------------------------------------------------------------------------
    // F.1-2, F.1-3 and the unbraced span: LTB with Cb from the designer's moment diagram
    // ------------------------------------------------------------------------------------------

    private static BeamDesign w18x50(DesignMethod method, int segments) {
        return new BeamDesigner(exampleF1Loads(), exampleCriteria(method, Bracing.equalSegments(segments)))
                .checkFixed(section("W18X50"));
    }

    /** AISC DE Ex. F.1-2A/B: W18X50 braced at the third points, Lb = 11.67 ft (CHECK-VALUES §1 "F.1-2A/B"). */
    @Test
    void exampleF12ThirdPointBracing() {
        Check lrfd = check(w18x50(DesignMethod.LRFD, 3), "flexure");
        Check asd = check(w18x50(DesignMethod.ASD, 3), "flexure");
        assertAll("AISC DE Ex. F.1-2A/B, W18X50, third-point bracing",
                // CHECK-VALUES §1 F.1-2A/B: Lb = 11.67 ft (35/3), FOUND in the example statement
                F1_LTB.printed("Lb [ft]", 11.67, ft(lrfd.lb())),
                // AISC DE Ex. F.1-2A; CHECK-VALUES §1: Cb (middle segment) = 1.01, MEMORY (from memory)
                F1_LTB.printed("Cb (example)", 1.01, lrfd.cb()),
                // CHECK-VALUES §1 F.1-2A/B: 1.014 exact, COMPUTED
                F1_LTB.printed("Cb (computed)", 1.014, lrfd.cb()),
                // the middle segment governs: its maximum is the midspan moment, 266.4 kip-ft (COMPUTED, as F.1-1A)
                F1_LTB.printed("Mu in the governing segment [kip-ft]", 266.4, kipFt(lrfd.demand())),
                // AISC DE Ex. F.1-2A; CHECK-VALUES §1: φbMn = 306 kip-ft, MEMORY (from memory) + COMPUTED
                F1_LTB.near("φbMn [kip-ft] (example)", 306, kipFt(lrfd.capacity()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-2A/B: Mn = 340.5 kip-ft, COMPUTED with DB ry, rts (DB radius)
                F1_LTB.near("Mn [kip-ft] (computed)", 340.5, kipFt(lrfd.capacity() / ResistanceFactors.PHI_B), DB_RADIUS),
                // AISC DE Ex. F.1-2B; CHECK-VALUES §1: Mn/Ωb = 204 kip-ft (203.9), MEMORY + COMPUTED
                F1_LTB.near("Mn/Ωb [kip-ft]", 204, kipFt(asd.capacity()), THREE_FIGURES),
                F1_LTB.printed("Cb, ASD (computed)", 1.014, asd.cb()));
    }

    /** AISC DE Ex. F.1-3A/B: W18X50 braced at midspan, Lb = 17.5 ft > Lr (CHECK-VALUES §1 "F.1-3A/B"). */
    @Test
    void exampleF13MidspanBracing() {
        Check lrfd = check(w18x50(DesignMethod.LRFD, 2), "flexure");
        Check asd = check(w18x50(DesignMethod.ASD, 2), "flexure");
        IShapeFlexure.Constants k = IShapeFlexure.constants(section("W18X50"), Steel.A992.fy(), Steel.A992.e(), null);
        double mn = lrfd.capacity() / ResistanceFactors.PHI_B;
        assertAll("AISC DE Ex. F.1-3A/B, W18X50, midspan bracing",
                // CHECK-VALUES §1 F.1-3A/B: Lb = 17.5 ft, FOUND in the example statement
                F1_LTB.printed("Lb [ft]", 17.5, ft(lrfd.lb())),
                holds("Lb > Lr: elastic LTB (F2-3)", lrfd.lb() > k.lr()),
                // AISC DE Ex. F.1-3A; CHECK-VALUES §1: Cb = 1.30, MEMORY (from memory)
                F1_LTB.printed("Cb (example)", "1.30", lrfd.cb()),
                // CHECK-VALUES §1 F.1-3A/B: 1.299 exact, COMPUTED
                F1_LTB.printed("Cb (computed)", 1.299, lrfd.cb()),
                // CHECK-VALUES §1 F.1-3A/B: Fcr = 43.1 ksi, MEMORY + COMPUTED (three figures; Fcr = Mn/Sx)
                F1_LTB.near("Fcr [ksi]", 43.1, Units.KSI.fromSi(mn / k.sx()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-3A/B: Mn = Fcr·Sx = 319.5 kip-ft, COMPUTED with DB rts (DB radius)
                F1_LTB.near("Mn [kip-ft] (computed)", 319.5, kipFt(mn), DB_RADIUS),
                // AISC DE Ex. F.1-3A; CHECK-VALUES §1: φbMn = 288 kip-ft, MEMORY (from memory) + COMPUTED
                F1_LTB.near("φbMn [kip-ft]", 288, kipFt(lrfd.capacity()), THREE_FIGURES),
                // CHECK-VALUES §1 F.1-3B: Mn/Ωb = 191 kip-ft (the AISC text prints 192 after rounding Fcr to
                // 43.2 ksi; MEMORY + COMPUTED). 191.3 computed, so 191 at three figures.
                F1_LTB.near("Mn/Ωb [kip-ft]", 191, kipFt(asd.capacity()), THREE_FIGURES));
    }

    /**
     * CHECK-VALUES §1 "W18x50 unbraced over the full 35 ft span", F2-3/F2-4, COMPUTED: Cb = 1.136,
     * φbMn = 94.1 kip-ft (82.8 with Cb = 1.0), Mn/Ωb = 62.6 kip-ft. LTB strengths: DB radius (0.5 %).
     */
    @Test
    void w18x50UnbracedFullSpan() {
        Check lrfd = check(w18x50(DesignMethod.LRFD, 1), "flexure");
        Check asd = check(w18x50(DesignMethod.ASD, 1), "flexure");
        IShapeFlexure.Constants k = IShapeFlexure.constants(section("W18X50"), Steel.A992.fy(), Steel.A992.e(), null);
        double mnCb1 = IShapeFlexure.mn(k, SPAN_F1, 1.0, null);
        assertAll("W18X50 braced at the supports only, 35 ft",
                F1_LTB.printed("Lb [ft]", 35.0, ft(lrfd.lb())),
                // CHECK-VALUES §1: Cb = 1.136 (UDL, braced at the ends), COMPUTED
                F1_LTB.printed("Cb", 1.136, lrfd.cb()),
                // CHECK-VALUES §1: φbMn = 94.1 kip-ft, COMPUTED with DB rts (DB radius)
                F1_LTB.near("φbMn [kip-ft]", 94.1, kipFt(lrfd.capacity()), DB_RADIUS),
                // CHECK-VALUES §1: φbMn = 82.8 kip-ft with Cb = 1.0, COMPUTED (DB radius)
                F1_LTB.near("φbMn, Cb = 1 [kip-ft]", 82.8, kipFt(ResistanceFactors.PHI_B * mnCb1), DB_RADIUS),
                // CHECK-VALUES §1: Mn/Ωb = 62.6 kip-ft, COMPUTED (DB radius)
                F1_LTB.near("Mn/Ωb [kip-ft]", 62.6, kipFt(asd.capacity()), DB_RADIUS),
                holds("the 35 ft unbraced W18X50 is overstressed (Mu = 266 kip-ft > φbMn)",
                        w18x50(DesignMethod.LRFD, 1).status() == MemberStatus.OVERSTRESSED));
    }

    /**
     * Cb of a midspan point load from the designer's own moment diagram: 1.316 braced at the supports
     * only, 1.667 braced at the load (CHECK-VALUES §1 "Cb, other cases", COMPUTED; Manual Table 3-1
     * 1.32 and 1.67 are MEMORY).
     */
    @Test
    void midspanPointLoadCb() {
        BeamLoads loads = BeamLoads.of(SPAN_F1, Map.of(LoadCase.L,
                List.of(new PointLoad(SPAN_F1 / 2, Units.KIPS.toSi(10)))));
        Check ends = check(new BeamDesigner(loads, exampleCriteria(DesignMethod.LRFD, Bracing.equalSegments(1)))
                .checkFixed(section("W18X50")), "flexure");
        Check atLoad = check(new BeamDesigner(loads, exampleCriteria(DesignMethod.LRFD, Bracing.equalSegments(2)))
                .checkFixed(section("W18X50")), "flexure");
        assertAll("Cb of a midspan point load through the designer",
                // CHECK-VALUES §1 "Cb, other cases": midspan point load braced at ends only, 1.316, COMPUTED
                F1_LTB.printed("Cb, braced at the supports", 1.316, ends.cb()),
                // CHECK-VALUES §1 "Cb, other cases": braced at the load point, 1.667, COMPUTED
                F1_LTB.printed("Cb, braced at the load", 1.667, atLoad.cb()),
                // Table 3-23 Case 7 (CHECK-VALUES §5): M = PL/4 = 1.6 × 10 × 35/4 = 140.0 kip-ft factored, COMPUTED
                F1_LTB.printed("Mu = 1.6·P·L/4 [kip-ft]", 140.0, kipFt(ends.demand())));
    }

    // ------------------------------------------------------------------------------------------
    // F.4: selection by moment of inertia
    // ------------------------------------------------------------------------------------------

    /**
     * AISC DE V15.0 Ex. F.4 (CHECK-VALUES §1 "Design Example F.4", MEMORY + COMPUTED): 30 ft, D = 0.8
     * klf, L = 2.0 klf, ΔLL ≤ 1.0 in (L/360), continuously braced → W24X55. Run with and without
     * self-weight: the selection is governed by Ix either way.
     */
    @Test
    void exampleF4SelectionByStiffness() {
        double span = Units.FT_.toSi(30);
        BeamLoads loads = uniform(span, 0.8, 2.0);
        BeamDesign lrfd = new BeamDesigner(loads, exampleCriteria(DesignMethod.LRFD, Bracing.continuous()))
                .search(catalog, SearchFilter.ALL);
        BeamDesign asd = new BeamDesigner(loads, exampleCriteria(DesignMethod.ASD, Bracing.continuous()))
                .search(catalog, SearchFilter.ALL);
        BeamDesign withSelfWeight = new BeamDesigner(loads,
                exampleCriteria(DesignMethod.LRFD, Bracing.continuous()).withSelfWeight(true)).search(catalog, SearchFilter.ALL);
        Check live = check(lrfd, "live-load deflection");
        List<Rejection> rej = lrfd.rejected();
        Rejection last = rej.isEmpty() ? null : rej.get(rej.size() - 1);
        assertAll("AISC DE Ex. F.4",
                // AISC DE V15.0 Ex. F.4; CHECK-VALUES §1: W24x55, MEMORY (from memory) + COMPUTED
                holds("LRFD selects W24X55, got " + name(lrfd), "W24X55".equals(name(lrfd))),
                holds("ASD selects W24X55, got " + name(asd), "W24X55".equals(name(asd))),
                holds("with self-weight, still W24X55, got " + name(withSelfWeight), "W24X55".equals(name(withSelfWeight))),
                // CHECK-VALUES §1 F.4: Mu = 468 kip-ft (4.16 × 30² / 8 = 468.0), MEMORY + COMPUTED
                F4.printed("Mu [kip-ft]", 468.0, kipFt(check(lrfd, "flexure").demand())),
                // CHECK-VALUES §1 F.4: φbMn = 503 kip-ft, MEMORY (from memory), three figures
                F4.near("φbMn [kip-ft]", 503, kipFt(check(lrfd, "flexure").capacity()), THREE_FIGURES),
                // CHECK-VALUES §1 F.4: Ma = 315 kip-ft (2.8 × 30² / 8 = 315.0), MEMORY + COMPUTED
                F4.printed("Ma [kip-ft]", 315.0, kipFt(check(asd, "flexure").demand())),
                // CHECK-VALUES §1 F.4: Mn/Ωb = 334 kip-ft, MEMORY (from memory), three figures
                F4.near("Mn/Ωb [kip-ft]", 334, kipFt(check(asd, "flexure").capacity()), THREE_FIGURES),
                // CHECK-VALUES §4 Table 4: 30 ft floor beam, LL limit 1.00 in, COMPUTED
                F4.printed("Δallow [in]", "1.00", in(live.capacity())),
                // CHECK-VALUES §1 F.4: Ireq = 1,257 in⁴, MEMORY + COMPUTED; Ireq = (Δ/Δallow)·Ix of the W24X55
                F4.printed("Ireq [in⁴]", "1257", live.ratio() * Units.IN4.fromSi(section("W24X55").props().ix())),
                holds("the last rejected candidate fails on live-load deflection, got "
                        + (last == null ? "none" : last.section() + " on " + last.governing().name()),
                        last != null && last.governing().name().equals("live-load deflection")));
    }

    // ------------------------------------------------------------------------------------------
    // G.1A: shear demand and strength through the designer
    // ------------------------------------------------------------------------------------------

    /**
     * AISC DE Ex. G.1A (CHECK-VALUES §1 "Design Example G.1A", MEMORY + COMPUTED): W24X62 with end
     * shears VD = 48 kips, VL = 145 kips. The example gives the shears, not a span; a uniform load on a
     * 20 ft span with those reactions (wD = 4.8, wL = 14.5 klf) reproduces them: the support shear of
     * a simple span is its reaction whatever the span.
     */
    @Test
    void exampleG1AShear() {
        double span = Units.FT_.toSi(20);
        BeamLoads loads = uniform(span, 2 * 48.0 / 20, 2 * 145.0 / 20);
        BeamCriteria lrfdCriteria = exampleCriteria(DesignMethod.LRFD, Bracing.continuous());
        Check lrfd = check(new BeamDesigner(loads, lrfdCriteria).checkFixed(section("W24X62")), "shear");
        Check asd = check(new BeamDesigner(loads, lrfdCriteria.withMethod(DesignMethod.ASD))
                .checkFixed(section("W24X62")), "shear");
        assertAll("AISC DE Ex. G.1A, W24X62",
                // AISC DE Ex. G.1A; CHECK-VALUES §1: Vu = 290 kips, MEMORY (from memory), three figures
                G1.near("Vu [kips] (example)", 290, kips(lrfd.demand()), THREE_FIGURES),
                // CHECK-VALUES §1 G.1A: Vu = 289.6 kips (1.2 × 48 + 1.6 × 145), COMPUTED
                G1.printed("Vu [kips] (computed)", 289.6, kips(lrfd.demand())),
                // CHECK-VALUES §1 G.1A: φvVn = 306 kips, MEMORY (from memory), three figures; 305.7 COMPUTED
                G1.near("φvVn [kips] (example)", 306, kips(lrfd.capacity()), THREE_FIGURES),
                G1.printed("φvVn [kips] (computed)", 305.7, kips(lrfd.capacity())),
                holds("clause G2.1(a), got " + lrfd.clause(), lrfd.clause().endsWith("G2.1(a)")),
                // CHECK-VALUES §1 G.1A: Va = 193 kips (48 + 145), MEMORY + COMPUTED
                G1.printed("Va [kips]", "193", kips(asd.demand())),
                // CHECK-VALUES §1 G.1A: Vn/Ωv = 204 kips, MEMORY (from memory); 203.8 COMPUTED
                G1.near("Vn/Ωv [kips] (example)", 204, kips(asd.capacity()), THREE_FIGURES),
                G1.printed("Vn/Ωv [kips] (computed)", 203.8, kips(asd.capacity())),
                holds("φvVn ≥ Vu", lrfd.ratio() <= 1.0));
    }
}
