package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** Behaviour of {@link CompositeBeamDesigner}: the search's choice, the stud range, shoring, ribs parallel, the camber rule. */
class CompositeBeamDesignerTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final SlabOnDeck SLAB = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);

    private static CompositeBeam beam(double spanFt, DeckRibs ribs) {
        return CompositeBeam.interior(Units.FT_.toSi(spanFt), Units.FT_.toSi(10), ribs, SLAB, Studs.defaults(),
                Units.PSF.toSi(15), Units.PSF.toSi(80), Units.PSF.toSi(20));
    }

    private static Section section(String d) {
        return CATALOG.find(d).orElseThrow();
    }

    @Test
    void theSearchReturnsTheLeastCostPairAndTheLeastStudsForIt() {
        for (double span : new double[] {24, 32, 40}) {
            for (DeckRibs ribs : new DeckRibs[] {DeckRibs.PERPENDICULAR, DeckRibs.PARALLEL}) {
                CompositeBeamDesigner d = new CompositeBeamDesigner(beam(span, ribs), CompositeCriteria.defaults());
                CompositeDesign r = d.search(CATALOG, SearchFilter.ALL);
                String where = span + " ft, ribs " + ribs + ": " + r.section() + " with " + r.studs();
                assertEquals(MemberStatus.SIZED, r.status(), where);
                assertTrue(r.governing().passes(), where);
                CompositeDesign again = d.check(r.section(), r.studsPerHalf(), null);
                assertEquals(MemberStatus.FIXED_SIZE, again.status(), where + ": the choice checks");
                assertEquals(r.checks(), again.checks(), where);
                if (r.studsPerHalf() > 1) {
                    CompositeDesign fewer = d.check(r.section(), r.studsPerHalf() - 1, null);
                    assertEquals(MemberStatus.OVERSTRESSED, fewer.status(), where + ": one stud fewer per half span must not do");
                }
                for (CompositeDesign.Alternative a : r.alternatives()) {
                    assertTrue(a.costWeight() >= r.costWeight(), where + ": " + a.section() + " costs less");
                }
                for (Rejection j : r.rejected()) {
                    assertTrue(j.section().weight() <= r.section().weight(), where + ": rejected " + j.section() + " is heavier");
                    assertFalse(j.governing().passes(), where + ": rejected " + j.section() + " for a passing check");
                }
                // every section lighter than the choice either was rejected or costs more with its studs
                for (Section s : CATALOG.sections()) {
                    if (s.weight() < r.section().weight()) {
                        boolean listed = r.rejected().stream().anyMatch(j -> j.section().equals(s))
                                || r.alternatives().stream().anyMatch(a -> a.section().equals(s));
                        assertTrue(listed, where + ": lighter " + s + " is neither rejected nor an alternative");
                    }
                }
            }
        }
    }

    @Test
    void withStudsFreeTheSearchPicksTheLightestPassingSteel() {
        CompositeBeamDesigner free = new CompositeBeamDesigner(beam(36, DeckRibs.PERPENDICULAR),
                CompositeCriteria.defaults().withStudWeight(0));
        CompositeDesign r = free.search(CATALOG, SearchFilter.ALL);
        int most = free.maxStudsPerHalf();
        for (Section s : CATALOG.sections()) {
            if (s.weight() < r.section().weight()) {
                assertNotEquals(MemberStatus.FIXED_SIZE, free.check(s, most, null).status(), s + " passes with the most studs");
            }
        }
        // a costly stud never gives more studs than a free one
        CompositeDesign dear = new CompositeBeamDesigner(beam(36, DeckRibs.PERPENDICULAR),
                CompositeCriteria.defaults().withStudWeight(Units.LBF.toSi(100))).search(CATALOG, SearchFilter.ALL);
        assertTrue(dear.studs() <= r.studs() || dear.section().weight() >= r.section().weight(),
                "dear studs: " + dear.section() + " " + dear.studs() + "; free: " + r.section() + " " + r.studs());
    }

    private static void assertNotEquals(Object a, Object b, String m) {
        assertFalse(a.equals(b), m);
    }

    @Test
    void theStudRangeKeepsToTheMinimumDegreeAndTheRibs() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(beam(45, DeckRibs.PERPENDICULAR),
                CompositeCriteria.defaults().withMinDegree(0.5));
        Section w = section("W21X50");
        // 45 ribs at 12 in: 23 per half span (the midspan rib serves both halves), one stud per rib
        assertEquals(23, d.maxStudsPerHalf());
        CompositeDesign r = d.search(CATALOG, SearchFilter.ALL);
        assertTrue(r.flexure().degree() >= 0.5 - 1e-12 || r.flexure().degree() == 1, "degree " + r.flexure().degree());
        // below half of the full composite force (735 kips / 17.2 = 42.7 → 22 studs for 50 %) the layout is refused
        assertEquals(MemberStatus.OVERSTRESSED, d.check(w, 20, null).status());
        assertEquals(MemberStatus.OVERSTRESSED, d.check(w, 24, null).status(), "more studs than ribs");
        // two studs per rib double what fits
        CompositeBeamDesigner two = new CompositeBeamDesigner(beam(45, DeckRibs.PERPENDICULAR).withStuds(Studs.defaults().withPerRib(2)),
                CompositeCriteria.defaults());
        assertEquals(46, two.maxStudsPerHalf());
        assertTrue(two.qn() < d.qn(), "Rg = 0.85 with two studs per rib");
    }

    @Test
    void shoredBeamsHaveNoConstructionStageAndNoCamber() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(beam(40, DeckRibs.PERPENDICULAR),
                CompositeCriteria.defaults().withShored(true));
        CompositeDesign r = d.check(section("W18X35"), 20, null);
        assertAll(() -> assertEquals(0, r.camber()), () -> assertEquals(0, r.preDeflection()),
                () -> assertNull(r.check("construction flexure")),
                () -> assertTrue(r.check("total-load deflection").note().contains("shored")));
        CompositeDesign unshored = new CompositeBeamDesigner(beam(40, DeckRibs.PERPENDICULAR), CompositeCriteria.defaults())
                .check(section("W18X35"), 20, null);
        assertTrue(unshored.check("construction flexure") != null && unshored.camber() > 0);
    }

    @Test
    void ribsParallelLeaveTheBareSteelBracedAsTheCriteriaSay() {
        Section s = section("W18X35");
        CompositeDesign perpendicular = new CompositeBeamDesigner(beam(30, DeckRibs.PERPENDICULAR), CompositeCriteria.defaults())
                .check(s, 15, null);
        CompositeDesign parallel = new CompositeBeamDesigner(beam(30, DeckRibs.PARALLEL), CompositeCriteria.defaults())
                .check(s, 15, null);
        CompositeDesign parallelBraced = new CompositeBeamDesigner(beam(30, DeckRibs.PARALLEL),
                CompositeCriteria.defaults().withConstructionBracing(Bracing.equalSegments(3))).check(s, 15, null);
        double p = perpendicular.check("construction flexure").capacity();
        double q = parallel.check("construction flexure").capacity();
        double q3 = parallelBraced.check("construction flexure").capacity();
        assertTrue(q < q3 && q3 <= p, "φMn: braced by the deck " + p + ", at third points " + q3 + ", at the ends " + q);
        // with the ribs parallel the ribs' concrete counts (I3.2c(3)): more concrete area, parallel studs Rp = 0.75
        assertTrue(parallel.flexure().vc() > perpendicular.flexure().vc());
        assertTrue(parallel.qn() > perpendicular.qn());
    }

    @Test
    void theCamberRule() {
        CamberRule rule = CamberRule.defaults();
        double in = Units.IN.toSi(1);
        double span = Units.FT_.toSi(30);
        assertAll("CHECK-VALUES §4 camber practice (from memory): 80 %, ¼ in steps down, none under ¾ in or on short spans",
                () -> assertEquals(2.0 * in, rule.camber(2.68 * in, span, null), 1e-12),
                () -> assertEquals(0.75 * in, rule.camber(1.0 * in, span, null), 1e-12),
                () -> assertEquals(0, rule.camber(0.9 * in, span, null)),
                () -> assertEquals(1.0 * in, rule.camber(1.25 * in, span, null), 1e-12),
                () -> assertEquals(0, rule.camber(2.0 * in, Units.FT_.toSi(18), null)),
                () -> assertEquals(0, CamberRule.none().camber(4 * in, span, null)));
    }

    @Test
    void badInputIsRefusedWithAReason() {
        assertAll(
                () -> assertThrows(IllegalArgumentException.class, () -> CompositeBeam.interior(Units.FT_.toSi(30),
                        Units.FT_.toSi(10), DeckRibs.NONE, SLAB, Studs.defaults(), 0, 0, 0)),
                () -> assertThrows(IllegalArgumentException.class, () -> SlabOnDeck.us(3, 13, 12, 2.5, 4.5, 145, 4)),
                () -> assertThrows(IllegalArgumentException.class, () -> CompositeCriteria.defaults().withMinDegree(1.5)),
                () -> assertThrows(IllegalArgumentException.class, () -> new CompositeBeamDesigner(beam(30,
                        DeckRibs.PERPENDICULAR), CompositeCriteria.defaults()).check(section("W18X35"), -1, null)));
    }
}
