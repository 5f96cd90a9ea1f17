package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** Composite members in a run: the floor of a regular plan with a slab described on its deck. */
class CompositeTakedownTest {
    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    static Plan plan(CompositeMode mode) {
        Plan base = RegularPlan.generate(new RegularPlan.Spec("composite bay", "us", List.of(ft(30), ft(30)), List.of(ft(45), ft(45)),
                List.of(ft(13), ft(13)), true, ft(10), new LoadValues(psf(50), psf(10), psf(100), 0, 0, 0),
                new LoadValues(psf(40), psf(10), 0, psf(20), 0, 0), LoadValues.ZERO));
        return RegularPlan.withSlab(base, Slab.typical(), mode, 0);
    }

    private static MemberResult member(RunResult r, String id) {
        return r.takedown().members().get("typical").stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void everyFloorMemberActsWithTheSlabAndPassesAndTheBareSteelComparisonIsTheNonCompositeRun() {
        RunResult r = PlanRun.run(plan(CompositeMode.COMPOSITE), CatalogFile.loadDefault());
        RunResult bare = PlanRun.run(plan(CompositeMode.NON_COMPOSITE), CatalogFile.loadDefault());
        assertTrue(r.problems().isEmpty(), r.problems().toString()); // equilibrium included
        double steel = 0;
        double bareSteel = 0;
        for (MemberResult m : r.takedown().members().get("typical")) {
            assertNotNull(m.composite(), m.id());
            assertTrue(m.studs() > 0 && m.studs() % 2 == 0, m.id() + " studs " + m.studs());
            assertTrue(m.maxRatio() <= 1 + 1e-9, m.id() + " ratio " + m.maxRatio());
            steel += m.steelWeight();
            bareSteel += m.bareSteelWeight();
        }
        double bareRun = bare.takedown().members().get("typical").stream().mapToDouble(MemberResult::steelWeight).sum();
        assertEquals(bareRun, bareSteel, 1e-9 * bareRun, "the bare-steel comparison is the non-composite run");
        assertTrue(steel < 0.8 * bareSteel, "composite action saves steel: " + steel + " vs " + bareSteel + " N");
        for (MemberResult m : bare.takedown().members().get("typical")) {
            assertNull(m.composite(), m.id());
        }
        // the roof's deck carries no slab: bare steel
        for (MemberResult m : r.takedown().members().get("roof")) {
            assertNull(m.composite(), m.id());
        }
    }

    @Test
    void effectiveWidthComesFromThePlanGeometryOnEachSide() {
        RunResult r = PlanRun.run(plan(CompositeMode.COMPOSITE), CatalogFile.loadDefault());
        double in = 0.0254;
        // interior infill beam, 45 ft span at 10 ft: b = 2 × min(L/8 = 67.5 in, s/2 = 60 in) = 120 in
        // (AISC 360-16 I3.1a; AISC Design Examples V15 Example I.1: b = 120 in)
        CompositeResult interior = member(r, "IF-AB-12/1").composite();
        assertEquals(120, interior.design().beff() / in, 1e-6);
        assertEquals("perpendicular", interior.ribs());
        // edge beam on the slab edge (no overhang): the interior side only, 60 in (I3.1a(c): distance to the edge = 0)
        assertEquals(60, member(r, "B-A-12").composite().design().beff() / in, 1e-6);
        // interior girder, 30 ft span, deck ribs along it: L/8 = 45 in each side (neighbours 45 ft away) → 90 in
        CompositeResult girder = member(r, "G-2-AB").composite();
        assertEquals(90, girder.design().beff() / in, 1e-6);
        assertEquals("parallel", girder.ribs());
        // edge girder: 45 in, one side
        assertEquals(45, member(r, "G-1-AB").composite().design().beff() / in, 1e-6);
    }

    @Test
    void perMemberModeMakesOnlyTheMarkedMembersComposite() {
        Plan p = plan(CompositeMode.PER_MEMBER);
        RunResult r = PlanRun.run(p, CatalogFile.loadDefault());
        for (MemberResult m : r.takedown().members().get("typical")) {
            assertNull(m.composite(), m.id());
        }
        org.baywright.plan.Floor f = p.floor("typical").orElseThrow();
        List<org.baywright.plan.Member> ms = f.members().stream()
                .map(m -> m.id().equals("G-2-AB") ? m.withComposite(java.util.Optional.of(true)) : m).toList();
        org.baywright.plan.Floor marked = new org.baywright.plan.Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), ms,
                f.infills(), f.openings(), f.areaLoads(), f.lineLoads(), f.pointLoads(), f.composite());
        Plan q = new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(),
                p.floors().stream().map(x -> x.id().equals("typical") ? marked : x).toList(), p.columns(), p.notes());
        RunResult rq = PlanRun.run(q, CatalogFile.loadDefault());
        assertNotNull(member(rq, "G-2-AB").composite());
        assertNull(member(rq, "G-1-AB").composite());
    }

    @Test
    void aSolidSlabOnFormsActsWithTheMembersWithoutRibs() {
        // a 5 in solid slab (rib height 0): studs welded to the flange, no rib reduction (AISC 360-16 I8.2a, R_g = R_p = 1.0
        // with the studs welded directly to the shape)
        Slab solid = new Slab(0, Units.IN.toSi(6), Units.IN.toSi(12), 0, Units.IN.toSi(5), Units.PCF.toSi(145), Units.KSI.toSi(4),
                Units.IN.toSi(0.75), Units.KSI.toSi(65), 1, org.baywright.plan.StudPlacement.WEAK, Double.NaN);
        Plan base = RegularPlan.generate(new RegularPlan.Spec("solid", "us", List.of(ft(30), ft(30)), List.of(ft(30)),
                List.of(ft(13), ft(13)), true, ft(10), new LoadValues(0, psf(10), psf(50), 0, 0, psf(15)),
                new LoadValues(psf(40), psf(10), 0, psf(20), 0, 0), LoadValues.ZERO));
        RunResult r = PlanRun.run(RegularPlan.withSlab(base, solid, CompositeMode.COMPOSITE, 0), CatalogFile.loadDefault());
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        MemberResult beam = member(r, "IF-AB-12/1");
        assertEquals("solid slab", beam.composite().ribs());
        assertTrue(beam.studs() > 0 && beam.maxRatio() <= 1 + 1e-9);
        // the slab's weight: 5 in at 145 pcf = 60.4 psf (common practice: unit weight × thickness)
        assertEquals(60.42, Units.PSF.fromSi(SlabDesign.weight(solid)), 0.01);
    }
}
