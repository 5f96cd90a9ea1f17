package org.baywright.ui;

import org.baywright.catalog.CatalogFile;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.Studs;
import org.baywright.takedown.CompositeResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.Units;

/**
 * A hand-made composite result for the editor's tests: AISC Design Examples V15, Example I.1 (45 ft span,
 * beams at 10 ft, 3 in deck + 4½ in of 145 pcf concrete, f′c 4 ksi, ¾ in studs one per rib, weak), W21X50
 * with 23 studs per half span, checked by the engine's own {@link CompositeBeamDesigner}. CHECK-VALUES §7
 * gives b_eff = 120 in, Q_n = 17.2 kips, 46 studs and a camber of about 2 in for it.
 */
final class CompositeFixture {
    private CompositeFixture() {
    }

    /** The DE I.1 beam, W21X50 with 46 studs. */
    static CompositeDesign exampleI1() {
        return designer().check(CatalogFile.loadDefault().find("W21X50").orElseThrow(), 23, null);
    }

    static CompositeBeamDesigner designer() {
        SlabOnDeck slab = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        CompositeBeam beam = CompositeBeam.interior(Units.FT_.toSi(45), Units.FT_.toSi(10), DeckRibs.PERPENDICULAR, slab,
                Studs.defaults(), Units.PSF.toSi(10), Units.PSF.toSi(100), Units.PSF.toSi(20)).withSlabWeight(Units.PSF.toSi(83));
        return new CompositeBeamDesigner(beam, CompositeCriteria.defaults().withSelfWeight(false));
    }

    /**
     * {@code m} as a composite member: its own (bare-steel) design stays its design, so its size label is
     * unchanged, and it carries the DE I.1 composite design (46 studs, camber 2 in) with {@code m}'s design as
     * the bare-steel alternative.
     */
    static MemberResult composite(MemberResult m) {
        CompositeResult c = new CompositeResult(exampleI1(), designer(), m.design(), "perpendicular", false, "DK-1");
        return new MemberResult(m.id(), m.floor(), m.kind(), m.start(), m.end(), m.length(), m.status(), m.design(),
                m.tributaryArea(), m.reductionArea(), m.kll(), m.liveFactor(), m.roofLiveFactor(), m.startReaction(),
                m.endReaction(), m.startSupport(), m.endSupport(), m.tributary(), m.loads(), m.criteria(), c);
    }
}
