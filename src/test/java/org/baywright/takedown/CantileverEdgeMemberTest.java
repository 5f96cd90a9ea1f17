package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * K_LL of edge members carrying a cantilever slab (ASCE 7-16 Table 4.7-1: "edge beams with cantilever
 * slabs" K_LL = 1; CHECK-VALUES §3, FOUND), decided from the member's own tributary area. On the plan
 * {@code src/test/resources/plans/balcony-deck-cantilever.bay.json} (the demo building as it was before its
 * balcony was framed with cantilevered beams: kept here because the demo no longer has a deck
 * cantilevering past a girder) the girders along grid 1 between B and D carry the balcony deck, which
 * spans north–south onto them and cantilevers up to 8 ft beyond the grid to the slab edge; the main deck
 * spans east–west, along them. Their midpoints lie on the boundary between the two decks.
 *
 * <p>Expected, COMPUTED: G-1-BC delivered A_T = 560 ft² (read from the run); K_LL = 1 → K_LL·A_T =
 * 560 ft² ≥ 400 → Eq. 4.7-1 factor 0.25 + 15/√560 = 0.8839 (0.884 to the three figures the sheet prints).
 * With K_LL = 2 it would have been 0.25 + 15/√1120 = 0.6982. An interior girder of the same floor keeps
 * K_LL = 2.
 */
class CantileverEdgeMemberTest {

    private static final double SQFT = Units.FT2.toSi(1);

    @Test
    void girdersCarryingTheBalconyAreEdgeMembersWithACantileverSlab() {
        TakedownResult t = PlanRun.run(PlanFiles.read(Path.of("src", "test", "resources", "plans", "balcony-deck-cantilever.bay.json")).plan().orElseThrow(),
                CatalogFile.loadDefault()).takedown();
        var members = t.members().get(t.levelFloors().get("Level 2"));
        MemberResult bc = members.stream().filter(m -> m.id().equals("G-1-BC")).findFirst().orElseThrow();
        MemberResult cd = members.stream().filter(m -> m.id().equals("G-1-CD")).findFirst().orElseThrow();
        MemberResult interior = members.stream().filter(m -> m.id().equals("G-2-BC")).findFirst().orElseThrow();
        assertAll(
                () -> assertEquals(1, bc.kll()),
                () -> assertEquals(1, cd.kll()),
                () -> assertEquals(560, bc.reductionArea() / SQFT, 0.5),
                () -> assertEquals(0.884, bc.liveFactor(), 5e-4),
                () -> assertEquals(0.25 + 15 / Math.sqrt(bc.reductionArea() / SQFT), bc.liveFactor(), 1e-12),
                () -> assertEquals(2, interior.kll()));
    }
}
