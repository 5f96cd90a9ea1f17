package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The per-piece camber allowance of the cost comparison: a cambered pair costs its steel, its studs and the
 * allowance; a large allowance makes an uncambered (stiffer) pair the cheaper one. The beam is that of AISC
 * Design Examples V15 Example I.1 (45 ft, beams at 10 ft, 3 in deck + 4½ in normal-weight concrete).
 */
class CompositeCamberAllowanceTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static CompositeBeam beam() {
        return CompositeBeam.interior(Units.FT_.toSi(45), Units.FT_.toSi(10), DeckRibs.PERPENDICULAR,
                SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4), Studs.defaults(), Units.PSF.toSi(10), Units.PSF.toSi(100),
                Units.PSF.toSi(20));
    }

    @Test
    void theAllowanceIsAddedToCamberedPiecesOnly() {
        CompositeCriteria plain = CompositeCriteria.defaults();
        CompositeDesign free = new CompositeBeamDesigner(beam(), plain).search(CATALOG, SearchFilter.ALL);
        assertTrue(free.camber() > 0, "the I.1 beam is cambered (about 2 in, CHECK-VALUES §7)");
        double allowance = Units.LBF.toSi(150);
        CompositeDesign priced = new CompositeBeamDesigner(beam(), plain.withCamberAllowance(allowance)).search(CATALOG,
                SearchFilter.ALL);
        double steelAndStuds = priced.section().weight() * Units.FT_.toSi(45) + priced.studs() * plain.studWeight();
        assertEquals(steelAndStuds + (priced.camber() > 0 ? allowance : 0), priced.costWeight(), 1e-6);
        assertTrue(priced.costWeight() >= free.costWeight() - 1e-6, "an allowance never makes the best pair cheaper");
    }

    @Test
    void aLargeAllowanceChoosesAPieceWithoutCamber() {
        CompositeDesign d = new CompositeBeamDesigner(beam(), CompositeCriteria.defaults().withCamberAllowance(Units.LBF.toSi(1e5)))
                .search(CATALOG, SearchFilter.ALL);
        assertEquals(0, d.camber(), 0);
        assertTrue(d.governing().passes());
    }
}
