package org.baywright.design;

import static org.baywright.design.Deviations.ROUND_OFF;
import static org.baywright.design.Deviations.THREE_FIGURES;
import static org.baywright.design.Deviations.holds;
import static org.junit.jupiter.api.Assertions.assertAll;

import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.units.Units;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

/**
 * {@link CompositeBeamDesigner} against AISC Design Examples V15, Example I.1, as restated by
 * {@code shared/guide/CHECK-VALUES.md} §7 (and §4 for camber, §10 for slab weights): 45 ft span, beams
 * at 10 ft, unshored, A992, 3 in deck + 4½ in normal-weight concrete (145 pcf), f′c = 4 ksi, ¾ in studs
 * one per rib in the weak position; D: slab 75 psf, beam 8 psf (assumed), miscellaneous 10 psf;
 * L = 100 psf; construction live load 20 psf (the V14 value CHECK-VALUES gives its numbers for).
 *
 * <p>The example puts an assumed beam weight of 8 psf into D (CHECK-VALUES "contradictions" 10); to
 * reproduce it the designer's own-weight term is off and the slab weight is given as 75 + 8 = 83 psf,
 * so that the construction-stage D is 0.83 k/ft and the composite-stage D 0.93 k/ft, as in the example.
 */
class CompositeBeamDesignerValidationTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final Deviations I1 = new Deviations("Composite designer: AISC DE I.1");
    private static final Deviations SLABS = new Deviations("Slab weights, CHECK-VALUES §10");

    @AfterAll
    static void report() {
        I1.report();
        SLABS.report();
    }

    static CompositeBeam exampleI1() {
        SlabOnDeck slab = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        return CompositeBeam.interior(Units.FT_.toSi(45), Units.FT_.toSi(10), DeckRibs.PERPENDICULAR, slab, Studs.defaults(),
                Units.PSF.toSi(10), Units.PSF.toSi(100), Units.PSF.toSi(20)).withSlabWeight(Units.PSF.toSi(83));
    }

    static CompositeCriteria exampleCriteria() {
        return CompositeCriteria.defaults().withSelfWeight(false);
    }

    @Test
    void exampleI1W21x50With46Studs() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(exampleI1(), exampleCriteria());
        Section w = CATALOG.find("W21X50").orElseThrow();
        CompositeDesign r = d.check(w, 23, null);
        Check flex = r.check("composite flexure");
        Check cons = r.check("construction flexure");
        Check live = r.check("live-load deflection");
        assertAll("DE I.1 through the designer, W21X50 with 23 studs per half span",
                // CHECK-VALUES §7 "I.1 effective width": beff = 120 in, FOUND + COMPUTED
                I1.near("beff [in]", 120, Units.IN.fromSi(r.beff()), ROUND_OFF),
                // CHECK-VALUES §7 "Stud strength": 1 stud/rib weak, Qn = 17.2 kips, COMPUTED (Table 3-21 from memory)
                I1.printed("Qn [kips]", 17.2, Units.KIPS.fromSi(r.qn())),
                // CHECK-VALUES §7 "I.1 number of studs": 386/17.2 = 22.4 → 23 per half span → 46 studs, from memory + COMPUTED
                holds("23 per half span are what ΣQn = 386 kips needs", (int) Math.ceil(386 / Units.KIPS.fromSi(r.qn())) == 23),
                holds("46 studs on the beam", r.studs() == 46),
                holds("the 23 ribs per half span hold them", d.maxStudsPerHalf() >= 23),
                // CHECK-VALUES §7 "I.1 inputs": wu = 2.72 k/ft, Mu = 687 kip-ft, FOUND
                I1.near("Mu [kip-ft]", 687, Units.KIP_FT.fromSi(flex.demand()), THREE_FIGURES),
                // with ΣQn = 23 × 17.2 = 396 kips ≥ 386, φbMn ≥ 769 kip-ft (I.1, from memory) and the beam passes
                holds("φbMn ≥ 769 kip-ft", Units.KIP_FT.fromSi(flex.capacity()) >= 769),
                holds("every check passes", r.status() == MemberStatus.FIXED_SIZE),
                // CHECK-VALUES §7 "I.1 construction stage": Mu = 333.1 kip-ft (20 psf) < φbMp = 412.5 kip-ft, COMPUTED
                I1.printed("construction Mu [kip-ft]", 333.1, Units.KIP_FT.fromSi(cons.demand())),
                I1.printed("construction φbMp [kip-ft]", 412.5, Units.KIP_FT.fromSi(cons.capacity())),
                // same row: Δnc(0.83 k/ft) = 2.68 in, COMPUTED
                I1.printed("Δ_pre [in]", 2.68, Units.IN.fromSi(r.preDeflection())),
                // CHECK-VALUES §4 "Camber example": 80 % = 2.1 in → specify 2 in (¼ in below), COMPUTED (rule from memory)
                I1.near("camber [in]", 2.0, Units.IN.fromSi(r.camber()), ROUND_OFF),
                // CHECK-VALUES §7 "I.1 lower-bound I": ΔLL = 1.26 in at ΣQn = 386 kips (COMPUTED); with 396 kips the
                // beam is a little stiffer: within 3 % below, and under L/360 = 1.50 in
                holds("Δ_LL a little under 1.26 in", Units.IN.fromSi(live.demand()) <= 1.26
                        && Units.IN.fromSi(live.demand()) > 0.97 * 1.26),
                I1.near("L/360 [in]", 1.50, Units.IN.fromSi(live.capacity()), ROUND_OFF));
    }

    /** I.1's construction stage with the V15 construction live load, 25 psf (ASCE/SEI 37). */
    @Test
    void exampleI1ConstructionStageAt25Psf() {
        CompositeBeam b = exampleI1();
        CompositeBeam v15 = new CompositeBeam(b.span(), b.ribs(), b.toNeighbourLeft(), b.toNeighbourRight(), b.toEdgeLeft(),
                b.toEdgeRight(), b.tributaryWidth(), b.slab(), b.studs(), b.superimposedDead(), b.live(), Units.PSF.toSi(25),
                b.slabWeightOverride());
        Check cons = new CompositeBeamDesigner(v15, exampleCriteria()).check(CATALOG.find("W21X50").orElseThrow(), 23, null)
                .check("construction flexure");
        assertAll("DE I.1 construction stage, 25 psf",
                // CHECK-VALUES §7 "I.1 construction stage": Mu = 353.4 kip-ft with 25 psf, COMPUTED
                I1.printed("construction Mu [kip-ft] (25 psf)", 353.4, Units.KIP_FT.fromSi(cons.demand())),
                holds("below φbMp = 412.5 kip-ft", cons.passes()));
    }

    /** The search on I.1: a W21X50 carries it; nothing lighter than what the search picks passes. */
    @Test
    void exampleI1Search() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(exampleI1(), exampleCriteria());
        CompositeDesign r = d.search(CATALOG, SearchFilter.ALL);
        CompositeDesign w21 = d.check(CATALOG.find("W21X50").orElseThrow(), 23, null);
        assertAll("DE I.1 search",
                holds("sized", r.status() == MemberStatus.SIZED),
                holds("no heavier than W21X50 (" + r.section() + ")", r.section().weight() <= w21.section().weight()),
                holds("its cost is no more than W21X50 with 46 studs", r.costWeight() <= w21.costWeight()),
                holds("every check of the choice passes", r.governing().passes()),
                holds("one stud fewer fails", r.studsPerHalf() == 1
                        || !d.check(r.section(), r.studsPerHalf() - 1, null).governing().passes()
                        || d.check(r.section(), r.studsPerHalf() - 1, null).status() != MemberStatus.FIXED_SIZE));
    }

    /** CHECK-VALUES §10 Table 10, slab weights by the half-filled rib rule (w_r/pitch = ½), COMPUTED. */
    @Test
    void slabWeightsFromGeometry() {
        assertAll("slab weights",
                // 3 in deck + 4½ in NW, 145 pcf, deck 2.5 psf: 72.5 + 2.5 = 75 psf (AISC DE I.1 uses 75 psf, FOUND + COMPUTED)
                SLABS.near("3 in + 4½ in NW [psf]", 75.0, psf(SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4)), ROUND_OFF),
                // the same at 150 pcf ≈ 77.5 psf
                SLABS.near("3 in + 4½ in NW 150 pcf [psf]", 77.5, psf(SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 150, 4)), ROUND_OFF),
                // 3 in deck + 3¼ in LW 110 pcf, deck 2.5 psf: 43.5 + 2.5 ≈ 46 psf
                SLABS.near("3 in + 3¼ in LW [psf]", 46.0, psf(SlabOnDeck.us(3, 6, 12, 2.5, 3.25, 110, 3)), 0.005),
                // 2 in deck + 3¼ in LW 110 pcf, deck ≈ 2.0 psf: 38.96 + 2.04 ≈ 41 psf (deck weight 2.04 as the guide adds)
                SLABS.near("2 in + 3¼ in LW [psf]", 41.0, psf(SlabOnDeck.us(2, 6, 12, 2.04, 3.25, 110, 3)), 0.005));
    }

    private static double psf(SlabOnDeck s) {
        return Units.PSF.fromSi(s.weight(null));
    }
}
