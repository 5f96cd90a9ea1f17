package org.baywright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.SearchFilter;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.Studs;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.load.LoadCase;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.Slab;
import org.baywright.run.RunResult;
import org.baywright.takedown.Component;
import org.baywright.takedown.CompositeResult;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.Units;

/**
 * Runs assembled by hand with composite members, for the report tests, until the takedown designs
 * composite floors itself. The composite members are AISC Design Examples V15, Example I.1: a 45 ft
 * beam at 10 ft, unshored, 3 in deck with 4½ in of normal-weight concrete (145 pcf, f′c = 4 ksi), ¾ in
 * studs one per rib in the weak position, superimposed dead 10 psf, live 100 psf, construction live
 * 20 psf, the slab taken as 83 psf (75 psf slab + 8 psf beam, as the example does; see
 * {@code CompositeBeamDesignerValidationTest}). The bare-steel member is Example F.1-1 (35 ft W18X50).
 */
public final class CompositeRuns {
    public static final Catalog CATALOG = CatalogFile.loadDefault();
    /** The span of Example I.1, m. */
    public static final double SPAN = Units.FT_.toSi(45);
    /** The beam spacing of Example I.1, m. */
    public static final double SPACING = Units.FT_.toSi(10);

    private CompositeRuns() {
    }

    /** The Example I.1 beam as the composite designer sees it. */
    public static CompositeBeam exampleI1() {
        SlabOnDeck slab = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        return CompositeBeam.interior(SPAN, SPACING, DeckRibs.PERPENDICULAR, slab, Studs.defaults(),
                Units.PSF.toSi(10), Units.PSF.toSi(100), Units.PSF.toSi(20)).withSlabWeight(Units.PSF.toSi(83));
    }

    /** The designer of Example I.1 (own weight in the 83 psf, as the example takes it). */
    public static CompositeBeamDesigner designerI1() {
        return new CompositeBeamDesigner(exampleI1(), CompositeCriteria.defaults().withSelfWeight(false));
    }

    /** Example I.1 checked at W21X50 with 23 studs per half span (46 studs), as the example chooses. */
    public static CompositeDesign w21x50() {
        return designerI1().check(CATALOG.find("W21X50").orElseThrow(), 23, null);
    }

    /** Example I.1 sized by the search. */
    public static CompositeDesign searched() {
        return designerI1().search(CATALOG, SearchFilter.ALL);
    }

    /** A composite member {@code id} at y = {@code y} with the design {@code d} of Example I.1. */
    public static MemberResult composite(String id, double y, CompositeDesign d) {
        CompositeBeamDesigner designer = designerI1();
        BeamLoads loads = BeamLoads.of(SPAN, Map.<LoadCase, List<? extends SpanLoad>>of(
                LoadCase.D, List.of(DistributedLoad.full(SPAN, Units.KLF.toSi(0.93))),
                LoadCase.L, List.of(DistributedLoad.full(SPAN, Units.KLF.toSi(1.0)))));
        BeamCriteria criteria = BeamCriteria.defaults().withSelfWeight(false);
        BeamDesign bare = new BeamDesigner(loads, criteria).search(CATALOG, SearchFilter.ALL);
        BeamDesign seen = new BeamDesign(d.status(), d.section(), d.checks(), d.rejected(), d.alternatives().size());
        double[] r = new double[Component.values().length];
        r[Component.D.ordinal()] = Units.KLF.toSi(0.93) * SPAN / 2;
        r[Component.L_ORDINARY.ordinal()] = Units.KLF.toSi(1.0) * SPAN / 2;
        return new MemberResult(id, "f1", MemberKind.BEAM, new Point(0, y), new Point(SPAN, y), SPAN, d.status(), seen,
                SPACING * SPAN, SPACING * SPAN, 2, 1, 1, r.clone(), r.clone(), "member G-1", "member G-2", List.of(), loads,
                criteria, new CompositeResult(d, designer, bare, "perpendicular", false, "DK-1"));
    }

    /** A bare-steel member: Example F.1-1, 35 ft W18X50 (D 0.45 klf with its own weight, L 0.75 klf). */
    public static MemberResult bare(String id, double y) {
        double span = Units.FT_.toSi(35);
        BeamLoads loads = BeamLoads.of(span, Map.<LoadCase, List<? extends SpanLoad>>of(
                LoadCase.D, List.of(DistributedLoad.full(span, Units.KLF.toSi(0.45))),
                LoadCase.L, List.of(DistributedLoad.full(span, Units.KLF.toSi(0.75)))));
        BeamCriteria criteria = BeamCriteria.defaults().withSelfWeight(false);
        BeamDesign design = new BeamDesigner(loads, criteria).checkFixed(CATALOG.find("W18X50").orElseThrow());
        double[] r = new double[Component.values().length];
        r[Component.D.ordinal()] = Units.KLF.toSi(0.45) * span / 2;
        r[Component.L_ORDINARY.ordinal()] = Units.KLF.toSi(0.75) * span / 2;
        return new MemberResult(id, "f1", MemberKind.BEAM, new Point(0, y), new Point(span, y), span, design.status(), design,
                0, 0, 2, 1, 1, r.clone(), r.clone(), "column C-1", "column C-2", List.of(), loads, criteria);
    }

    /** Example I.1's slab as a plan describes it (the 83 psf of the example given as the weight). */
    public static Slab slab() {
        return Slab.typical().withWeightOverride(Units.PSF.toSi(83));
    }

    /**
     * A run of one level holding {@code members}, on a floor whose deck carries {@link #slab()} and which
     * is composite, unshored, 20 psf construction live load; {@code levels} levels share the floor.
     */
    public static RunResult run(List<MemberResult> members, int levels) {
        Polygon outline = Polygon.rectangle(0, -SPACING, SPAN, SPACING * members.size());
        Floor floor = new Floor("f1", "Example floor", false, outline, List.of(new Deck("DK-1", outline, 90).withSlab(slab())),
                members.stream().map(m -> new Member(m.id(), m.kind(), m.start(), m.end(), Optional.of(m.section()))).toList(),
                List.of(), List.of(), List.of(), List.of(), List.of(), CompositeFloor.DEFAULT);
        List<Level> lv = new ArrayList<>();
        Map<String, String> levelFloors = new java.util.LinkedHashMap<>();
        for (int i = 0; i < levels; i++) {
            lv.add(new Level("Level " + (i + 2), Units.FT_.toSi(14 * (i + 1)), Units.FT_.toSi(14), "f1"));
            levelFloors.put("Level " + (i + 2), "f1");
        }
        Plan plan = new Plan("Example I.1 floor", "us", DesignSettings.defaults(), List.of(), lv, List.of(floor), List.of());
        TakedownResult t = new TakedownResult(Map.of("f1", members), levelFloors, List.of(), List.of(), List.of(),
                levels * SPAN * SPACING * members.size());
        return new RunResult(plan, t, List.of(), CATALOG.name(), "test build", 0);
    }

    /** Two composite Example I.1 beams (W21X50, 46 studs) and one bare W18X50, on one level. */
    public static RunResult mixed() {
        CompositeDesign d = w21x50();
        return run(List.of(composite("B-1", 0, d), composite("B-2", SPACING, d), bare("B-3", 2 * SPACING)), 1);
    }
}
