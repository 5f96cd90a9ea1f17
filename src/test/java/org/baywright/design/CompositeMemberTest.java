package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * {@link CompositeBeamDesigner} on a {@link CompositeMember}: uniform loads given as load lists give the
 * uniform-beam results, a girder with point loads (hand check of M_u and of the I8.2c stud requirement),
 * and the search's choice as a property over random members with point loads.
 */
class CompositeMemberTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final SlabOnDeck SLAB = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
    private static final double INF = Double.POSITIVE_INFINITY;

    private static Section section(String d) {
        return CATALOG.find(d).orElseThrow();
    }

    private static double kips(double k) {
        return Units.KIPS.toSi(k);
    }

    private static double ft(double f) {
        return Units.FT_.toSi(f);
    }

    // ---- (a) uniform loads as lists ------------------------------------------------------------

    /** The same uniform beam as a member, its loads as lists; {@code split} cuts each load into pieces (the general statics). */
    private static CompositeMember asMember(CompositeBeam b, boolean split) {
        double l = b.span();
        double tw = b.tributaryWidth();
        return new CompositeMember(l, b.ribs(), b.toNeighbourLeft(), b.toNeighbourRight(), b.toEdgeLeft(), b.toEdgeRight(),
                b.slab(), b.studs(), b.slabWeight(), uniform(l, b.slabWeight() * tw, split),
                uniform(l, b.constructionLive() * tw, split),
                BeamLoads.of(l, Map.of(LoadCase.D, uniform(l, b.superimposedDead() * tw, split),
                        LoadCase.L, uniform(l, b.live() * tw, split))), null);
    }

    private static List<SpanLoad> uniform(double l, double w, boolean split) {
        if (!split) {
            return List.of(DistributedLoad.full(l, w));
        }
        // three unequal pieces: breakpoints off midspan, so nothing lines up with the closed form by accident
        return List.of(DistributedLoad.uniform(0, 0.3 * l, w), DistributedLoad.uniform(0.3 * l, 0.55 * l, w),
                DistributedLoad.uniform(0.55 * l, l, w));
    }

    @Test
    void uniformLoadListsReproduceTheUniformBeam() {
        for (double spanFt : new double[] {24, 36, 45}) {
            for (DeckRibs ribs : new DeckRibs[] {DeckRibs.PERPENDICULAR, DeckRibs.PARALLEL}) {
                for (boolean shored : new boolean[] {false, true}) {
                    CompositeBeam b = CompositeBeam.interior(ft(spanFt), ft(10), ribs, SLAB, Studs.defaults(), Units.PSF.toSi(15),
                            Units.PSF.toSi(80), Units.PSF.toSi(20));
                    CompositeCriteria c = CompositeCriteria.defaults().withShored(shored);
                    String where = spanFt + " ft, " + ribs + (shored ? ", shored" : "");
                    CompositeDesign beam = new CompositeBeamDesigner(b, c).search(CATALOG, SearchFilter.ALL);
                    // the same loads as full-span lists: the same path, the same numbers
                    CompositeDesign listed = new CompositeBeamDesigner(asMember(b, false), c).search(CATALOG, SearchFilter.ALL);
                    assertEquals(beam, listed, where);
                    // cut into pieces: general statics, the same choice and the same numbers to rounding
                    CompositeDesign general = new CompositeBeamDesigner(asMember(b, true), c).search(CATALOG, SearchFilter.ALL);
                    assertEquals(beam.section(), general.section(), where);
                    assertEquals(beam.studs(), general.studs(), where);
                    assertEquals(beam.camber(), general.camber(), 1e-12, where);
                    assertEquals(beam.checks().size(), general.checks().size(), where);
                    for (Check x : beam.checks()) {
                        Check y = general.check(x.name());
                        assertNotNull(y, where + ": " + x.name());
                        assertEquals(x.demand(), y.demand(), 1e-9 * Math.abs(x.demand()), where + ": " + x.name());
                        assertEquals(x.capacity(), y.capacity(), 1e-9 * Math.abs(x.capacity()), where + ": " + x.name());
                        assertEquals(x.loadCombination(), y.loadCombination(), where + ": " + x.name());
                    }
                    assertEquals(beam.rejected().size(), general.rejected().size(), where);
                    assertNull(general.check("studs at point loads"), where + ": no point loads, no I8.2c check");
                }
            }
        }
    }

    @Test
    void theGeneralSheetStatesItsStatics() {
        CompositeBeam b = CompositeBeam.interior(ft(36), ft(10), DeckRibs.PERPENDICULAR, SLAB, Studs.defaults(),
                Units.PSF.toSi(15), Units.PSF.toSi(80), Units.PSF.toSi(20));
        Calc uniform = new Calc();
        new CompositeBeamDesigner(b, CompositeCriteria.defaults()).check(section("W18X35"), 15, uniform);
        Calc general = new Calc();
        new CompositeBeamDesigner(asMember(b, true), CompositeCriteria.defaults()).check(section("W18X35"), 15, general);
        assertTrue(text(uniform).contains("w·L²/8"));
        assertFalse(text(general).contains("w·L²/8"));
        assertTrue(text(general).contains("simple span, loads as listed"));
    }

    private static String text(Calc calc) {
        StringBuilder s = new StringBuilder();
        for (CalcLine l : calc.lines()) {
            s.append(l).append('\n');
        }
        return s.toString();
    }

    // ---- (b) a girder with two equal point loads at the third points ---------------------------

    /**
     * A 30 ft girder, deck ribs parallel to it, carrying beams at its third points: per point 15 kips of
     * wet load, 3 kips superimposed dead and 20 kips live (construction live 2 kips), own weight off so
     * the hand numbers stay simple; the bare steel braced by the beams at the third points.
     */
    static CompositeMember girder() {
        double l = ft(30);
        List<SpanLoad> wet = List.of(new PointLoad(ft(10), kips(15)), new PointLoad(ft(20), kips(15)));
        List<SpanLoad> cl = List.of(new PointLoad(ft(10), kips(2)), new PointLoad(ft(20), kips(2)));
        BeamLoads composite = BeamLoads.of(l, Map.of(
                LoadCase.D, List.of(new PointLoad(ft(10), kips(3)), new PointLoad(ft(20), kips(3))),
                LoadCase.L, List.of(new PointLoad(ft(10), kips(20)), new PointLoad(ft(20), kips(20)))));
        return new CompositeMember(l, DeckRibs.PARALLEL, ft(30), ft(30), INF, INF, SLAB, Studs.defaults(), SLAB.weight(null),
                wet, cl, composite, Bracing.equalSegments(3));
    }

    private static CompositeCriteria girderCriteria() {
        return CompositeCriteria.defaults().withSelfWeight(false).withMinDegree(0);
    }

    @Test
    void aGirderWithPointLoadsAtTheThirdPoints() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(girder(), girderCriteria());
        Section w = section("W21X50");
        CompositeDesign eight = d.check(w, 8, null);
        CompositeDesign seven = d.check(w, 7, null);
        Check flex = eight.check("composite flexure");
        Check studs8 = eight.check("studs at point loads");
        Check studs7 = seven.check("studs at point loads");
        double dp = Math.min(studs8.position(), ft(30) - studs8.position());
        assertAll("hand check, AISC 360-16 I8.2c: W21X50 (A = 14.7 in², d = 20.8 in, bf = 6.53 in, tf = 0.535 in), "
                + "b = 2 × 30 ft/8 = 90 in, ribs parallel: Qn = 0.75 × 0.442 in² × 65 ksi = 21.5 kips (I8-1, Rg = 1, Rp = 0.75)",
                // Pu = 1.2 × (15 + 3) + 1.6 × 20 = 53.6 kips; Mu = Pu × 10 ft = 536 kip-ft (constant between the points)
                () -> assertEquals(536, Units.KIP_FT.fromSi(flex.demand()), 1e-9 * 536, "Mu = Pu·L/3"),
                () -> assertEquals(53.6, Units.KIPS.fromSi(eight.check("shear").demand()), 1e-9 * 53.6, "Vu = Pu"),
                () -> assertEquals(21.5, Units.KIPS.fromSi(d.qn()), 0.05, "Qn"),
                // the studs required at the point load: k = 5, C = 107.7 kips, PNA in the web (x_w = 7.11 in,
                // d2 = 1.96 in, a = 0.352 in, d1 = 7.32 in): Mn = 107.7 × 9.285 + 735 × 8.439 = 7,203 kip-in,
                // φMn = 540.2 kip-ft ≥ 536; k = 4, C = 86.2 kips: φMn = 515.8 kip-ft < 536 → 5 studs
                () -> assertEquals(5, studs8.demand(), "studs required between the point load and the support"),
                // 8 studs per half span spaced uniformly over 15 ft: ⌊8 × 10/15⌋ = 5 between the support and the point
                () -> assertEquals(5, studs8.capacity(), "studs available with 8 per half span"),
                () -> assertEquals(ft(10), dp, 1e-9, "the point governing lies 10 ft from its support"),
                () -> assertTrue(studs8.passes(), "5 of 5"),
                // 7 per half span: ⌊7 × 10/15⌋ = 4 < 5
                () -> assertEquals(4, studs7.capacity()),
                () -> assertEquals(5.0 / 4.0, studs7.ratio(), 1e-12),
                () -> assertFalse(studs7.passes()),
                () -> assertEquals(MemberStatus.OVERSTRESSED, seven.status()));
        // the sheet shows the rule and the clause
        Calc calc = new Calc();
        d.check(w, 8, calc);
        String sheet = text(calc);
        assertTrue(sheet.contains("I8.2c") && sheet.contains("point load 1 of 2") && sheet.contains("half span"), sheet);
    }

    @Test
    void theGirderSearchKeepsToI82c() {
        CompositeBeamDesigner d = new CompositeBeamDesigner(girder(), girderCriteria());
        CompositeDesign r = d.search(CATALOG, SearchFilter.ALL);
        assertEquals(MemberStatus.SIZED, r.status());
        Check pts = r.check("studs at point loads");
        assertNotNull(pts);
        assertTrue(pts.passes());
        if (r.studsPerHalf() - 1 >= d.minStudsPerHalf(r.section())) {
            assertFalse(Check.governing(d.check(r.section(), r.studsPerHalf() - 1, null).checks()).passes());
        }
    }

    @Test
    void deflectionLoadsOfTheirOwnTakeTheLiveLoadUnreduced() {
        // the girder's live load reduced to 60 % for strength, unreduced for deflection (as BeamDesigner takes BeamLoads)
        CompositeMember g = girder();
        double l = g.span();
        Map<LoadCase, List<SpanLoad>> strength = Map.of(LoadCase.D, g.composite().of(LoadCase.D).loads(),
                LoadCase.L, List.of(new PointLoad(ft(10), kips(12)), new PointLoad(ft(20), kips(12))));
        Map<LoadCase, List<SpanLoad>> service = Map.of(LoadCase.D, g.composite().of(LoadCase.D).loads(),
                LoadCase.L, g.composite().of(LoadCase.L).loads());
        CompositeMember reduced = new CompositeMember(l, g.ribs(), g.toNeighbourLeft(), g.toNeighbourRight(), g.toEdgeLeft(),
                g.toEdgeRight(), g.slab(), g.studs(), g.slabWeight(), g.wet(), g.construction(),
                BeamLoads.of(l, strength).withDeflectionLoads(service), g.constructionBracing());
        Section w = section("W21X50");
        CompositeDesign full = new CompositeBeamDesigner(g, girderCriteria()).check(w, 10, null);
        CompositeDesign red = new CompositeBeamDesigner(reduced, girderCriteria()).check(w, 10, null);
        assertAll("deflections under the unreduced live load, strength under the reduced one",
                () -> assertEquals(full.check("live-load deflection").demand(), red.check("live-load deflection").demand(),
                        1e-12 * full.check("live-load deflection").demand()),
                () -> assertEquals(full.check("total-load deflection").demand(), red.check("total-load deflection").demand(),
                        1e-12 * full.check("total-load deflection").demand()),
                () -> assertTrue(red.check("live-load deflection").note().contains("unreduced")),
                // 1.2 × 18 + 1.6 × 12 = 40.8 kips at each third point: 408 kip-ft (hand check)
                () -> assertEquals(408, Units.KIP_FT.fromSi(red.check("composite flexure").demand()), 1e-9 * 408));
    }

    @Test
    void membersRefuseLoadsOffTheSpanOrUpward() {
        double l = ft(30);
        BeamLoads none = BeamLoads.of(l, Map.of());
        assertThrows(IllegalArgumentException.class, () -> new CompositeMember(l, DeckRibs.PARALLEL, ft(30), ft(30), INF, INF,
                SLAB, Studs.defaults(), 0, List.of(new PointLoad(ft(31), 1)), List.of(), none, null));
        assertThrows(IllegalArgumentException.class, () -> new CompositeMember(l, DeckRibs.PARALLEL, ft(30), ft(30), INF, INF,
                SLAB, Studs.defaults(), 0, List.of(new DistributedLoad(0, l, 5, -1)), List.of(), none, null));
        assertThrows(IllegalArgumentException.class, () -> new CompositeMember(l, DeckRibs.PARALLEL, ft(30), ft(30), INF, INF,
                SLAB, Studs.defaults(), 0, List.of(), List.of(), BeamLoads.of(ft(20), Map.of()), null));
    }

    // ---- (c) the search's choice, over random members with point loads -------------------------

    record Case(double spanFt, DeckRibs ribs, double wetKlf, List<double[]> points, boolean shored) {
    }

    @Provide
    Arbitrary<Case> members() {
        Arbitrary<double[]> point = Combinators.combine(Arbitraries.doubles().between(0.08, 0.92),
                Arbitraries.doubles().between(1, 12), Arbitraries.doubles().between(0, 3), Arbitraries.doubles().between(0, 14))
                .as((at, wet, sdl, live) -> new double[] {at, wet, sdl, live});
        return Combinators.combine(Arbitraries.doubles().between(18, 42), Arbitraries.of(DeckRibs.PERPENDICULAR, DeckRibs.PARALLEL),
                Arbitraries.doubles().between(0.05, 0.8), point.list().ofMinSize(0).ofMaxSize(3), Arbitraries.of(false, false, true))
                .as(Case::new);
    }

    private static CompositeMember member(Case c) {
        double l = ft(c.spanFt());
        List<SpanLoad> wet = new ArrayList<>(List.of(DistributedLoad.full(l, Units.KLF.toSi(c.wetKlf()))));
        List<SpanLoad> sdl = new ArrayList<>(List.of(DistributedLoad.full(l, Units.KLF.toSi(0.1))));
        List<SpanLoad> live = new ArrayList<>(List.of(new DistributedLoad(0, l, Units.KLF.toSi(0.2), Units.KLF.toSi(0.6))));
        for (double[] p : c.points()) {
            double x = p[0] * l;
            wet.add(new PointLoad(x, kips(p[1])));
            sdl.add(new PointLoad(x, kips(p[2])));
            live.add(new PointLoad(x, kips(p[3])));
        }
        return new CompositeMember(l, c.ribs(), ft(10), ft(10), INF, INF, SLAB, Studs.defaults(), SLAB.weight(null), wet,
                List.of(DistributedLoad.full(l, Units.KLF.toSi(0.2))), BeamLoads.of(l, Map.of(LoadCase.D, sdl, LoadCase.L, live)),
                Bracing.equalSegments(2));
    }

    @Property(tries = 60)
    void theChosenPairPassesAndOneStudFewerDoesNot(@ForAll("members") Case c) {
        CompositeBeamDesigner d = new CompositeBeamDesigner(member(c), CompositeCriteria.defaults().withShored(c.shored()));
        CompositeDesign r = d.search(CATALOG, SearchFilter.ALL);
        if (r.status() != MemberStatus.SIZED) {
            return;
        }
        CompositeDesign again = d.check(r.section(), r.studsPerHalf(), null);
        assertEquals(MemberStatus.FIXED_SIZE, again.status(), c + ": " + r.section() + " with " + r.studs());
        for (Check k : again.checks()) {
            assertTrue(k.passes(), c + ": " + k);
        }
        assertEquals(!c.points().isEmpty(), again.check("studs at point loads") != null, c.toString());
        int fewer = r.studsPerHalf() - 1;
        if (fewer >= d.minStudsPerHalf(r.section())) {
            assertFalse(Check.governing(d.check(r.section(), fewer, null).checks()).passes(),
                    c + ": " + r.section() + " passes with " + fewer + " per half span");
        }
    }
}
