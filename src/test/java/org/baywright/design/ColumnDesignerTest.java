package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.ColumnDesigner.StoreyDemand;
import org.baywright.design.ColumnDesigner.TierDemand;
import org.baywright.design.ColumnDesigner.TierDesign;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Column tiers: the lightest candidate that passes, the weight of the tiers above in D, fixed sections,
 * no candidates. Strengths come from the engine's own E3 function (validated in IShapeCompression's
 * tests); the combinations 1.2D + 1.6L and D + L are those of ASCE 7-16 §2.3.1 and §2.4.1.
 */
class ColumnDesignerTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double H = Units.FT_.toSi(13);

    private static StoreyDemand storey(String level, double deadKip, double liveKip) {
        double[] loads = new double[LoadCase.values().length];
        loads[LoadCase.D.ordinal()] = Units.KIPS.toSi(deadKip);
        loads[LoadCase.L.ordinal()] = Units.KIPS.toSi(liveKip);
        return new StoreyDemand(level, H, loads, loads.clone());
    }

    @Test
    void aTierTakesTheLightestW14ThatPassesAndRejectsEveryLighterOne() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W14"));
        TierDesign t = d.design(List.of(new TierDemand(List.of(storey("Level 2", 300, 200)))), Optional.empty()).get(0);
        double pu = 1.2 * (Units.KIPS.toSi(300) + t.weight() * H) + 1.6 * Units.KIPS.toSi(200);
        double phiPn = 0.9 * IShapeCompression.strength(t.section(), Steel.A992.fy(), Steel.A992.e(), H, H, null).pn();
        assertAll(
                () -> assertEquals(MemberStatus.SIZED, t.status()),
                () -> assertEquals("W14", t.section().series()),
                () -> assertEquals(pu, t.storeys().get(0).required(), 1e-6 * pu, "1.2D + 1.6L with the column's own weight"),
                () -> assertEquals(phiPn, t.storeys().get(0).available(), 1e-9 * phiPn),
                () -> assertTrue(t.maxRatio() <= 1),
                () -> assertTrue(!t.rejected().isEmpty(), "lighter W14 shapes were tried"),
                () -> t.rejected().forEach(r -> assertTrue(Double.parseDouble(r.substring(r.indexOf(' ') + 1)) > 1, r)));
    }

    @Test
    void theWeightOfTheTierAboveIsInTheDeadLoadOfTheTierBelow() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.ASD, List.of("W14"));
        List<TierDesign> tiers = d.design(List.of(new TierDemand(List.of(storey("Level 2", 200, 100))),
                new TierDemand(List.of(storey("Level 3", 100, 50)))), Optional.empty());
        TierDesign bottom = tiers.get(0);
        TierDesign top = tiers.get(1);
        double expected = Units.KIPS.toSi(200) + top.weight() * H + bottom.weight() * H;
        assertAll(
                () -> assertEquals(expected, bottom.storeys().get(0).unreduced()[LoadCase.D.ordinal()], 1e-9 * expected),
                () -> assertEquals(expected + Units.KIPS.toSi(100), bottom.storeys().get(0).required(), 1e-9 * expected,
                        "ASD: D + L governs"),
                () -> assertEquals("D + L", bottom.storeys().get(0).combination()));
    }

    @Test
    void aFixedSectionIsCheckedAndOneThatIsNotACandidateIsIgnored() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W14"));
        List<TierDemand> one = List.of(new TierDemand(List.of(storey("Level 2", 100, 50))));
        TierDesign fixed = d.design(one, Optional.of("W14X90")).get(0);
        TierDesign tooSmall = d.design(List.of(new TierDemand(List.of(storey("Level 2", 2000, 1500)))),
                Optional.of("W14X61")).get(0);
        TierDesign notAllowed = d.design(one, Optional.of("W12X50")).get(0);
        assertAll(
                () -> assertEquals(MemberStatus.FIXED_SIZE, fixed.status()),
                () -> assertEquals("W14X90", fixed.section().designation()),
                () -> assertEquals(List.of(), fixed.rejected()),
                () -> assertEquals(MemberStatus.OVERSTRESSED, tooSmall.status()),
                () -> assertEquals("W14X61", tooSmall.section().designation()),
                () -> assertTrue(!d.allows("W12X50")),
                () -> assertEquals(MemberStatus.SIZED, notAllowed.status()),
                () -> assertEquals("W14", notAllowed.section().series()));
    }

    @Test
    void withNoCandidateTheTierCarriesItsLoadsWithoutASection() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W99"));
        TierDesign t = d.design(List.of(new TierDemand(List.of(storey("Level 2", 100, 50)))), Optional.empty()).get(0);
        assertAll(
                () -> assertNull(t.section()),
                () -> assertEquals(MemberStatus.OVERSTRESSED, t.status()),
                () -> assertEquals(0, t.weight()),
                () -> assertEquals(Units.KIPS.toSi(100), t.storeys().get(0).unreduced()[LoadCase.D.ordinal()], 1e-6),
                () -> assertTrue(Double.isNaN(t.storeys().get(0).available())));
    }
}
