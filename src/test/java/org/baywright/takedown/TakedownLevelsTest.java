package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.load.LoadCase;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * A floor layout used at several levels whose columns differ: each level's own design must be the one
 * reported for it. Checked by equilibrium (common practice, CHECK-VALUES §9 rule 3: the foundations carry
 * the applied load plus all framing self-weight), computed by hand from the plan and the reported steel.
 */
class TakedownLevelsTest {

    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    /**
     * Two 30 × 30 ft bays side by side, one floor layout at two levels. A 60 ft girder G-1 runs along
     * y = 0 over the middle column C-B1, which stops at Level 2. At Level 2 the beam on grid B bears on
     * C-B1; at Level 3 it bears on G-1, which must then carry it. The deck spans the 30 ft between the
     * beams, so it is given a 30 ft span limit (this test is about levels, not the deck's span).
     */
    private static Plan plan() {
        double w = ft(30);
        double d = ft(30);
        Polygon slab = Polygon.rectangle(0, 0, 2 * w, d);
        List<Member> members = List.of(
                new Member("G-1", MemberKind.GIRDER, new Point(0, 0), new Point(2 * w, 0), Optional.empty()),
                new Member("G-2", MemberKind.GIRDER, new Point(0, d), new Point(2 * w, d), Optional.empty()),
                new Member("B-A", MemberKind.BEAM, new Point(0, 0), new Point(0, d), Optional.empty()),
                new Member("B-B", MemberKind.BEAM, new Point(w, 0), new Point(w, d), Optional.empty()),
                new Member("B-C", MemberKind.BEAM, new Point(2 * w, 0), new Point(2 * w, d), Optional.empty()));
        Floor floor = new Floor("typical", "Typical", false, slab, List.of(new Deck("DK", slab, 0).withLimits(w, Deck.DEFAULT_MAX_OVERHANG)), members, List.of(),
                List.of(), List.of(new AreaLoad("AL", slab, new LoadValues(Units.PSF.toSi(50), 0, Units.PSF.toSi(50), 0, 0, 0),
                        LiveLoadUse.ORDINARY)), List.of(), List.of());
        List<Column> columns = List.of(new Column("C-A1", new Point(0, 0), "A-1", "", Optional.empty()),
                new Column("C-B1", new Point(w, 0), "B-1", "Level 2", Optional.empty()),
                new Column("C-C1", new Point(2 * w, 0), "C-1", "", Optional.empty()),
                new Column("C-A2", new Point(0, d), "A-2", "", Optional.empty()),
                new Column("C-B2", new Point(w, d), "B-2", "", Optional.empty()),
                new Column("C-C2", new Point(2 * w, d), "C-2", "", Optional.empty()));
        return new Plan("stopped column", "us", DesignSettings.defaults(), List.of(),
                List.of(new Level("Level 2", ft(13), ft(13), "typical"), new Level("Level 3", ft(26), ft(13), "typical")),
                List.of(floor), columns);
    }

    private static MemberResult member(TakedownResult t, String level, String id) {
        return t.members().get(t.levelFloors().get(level)).stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void eachLevelReportsItsOwnDesign() {
        TakedownResult t = PlanRun.run(plan(), CATALOG).takedown();
        // hand calculation: 50 psf D over 60 × 30 ft at two levels
        double areaDead = Units.PSF.toSi(50) * 2 * ft(60) * ft(30);
        double foundations = t.columns().stream().mapToDouble(c -> c.foundation()[LoadCase.D.ordinal()]).sum();
        assertAll(() -> assertEquals(List.of(), t.problems()),
                () -> assertNotEquals(t.levelFloors().get("Level 2"), t.levelFloors().get("Level 3")),
                () -> assertEquals("column C-B1", member(t, "Level 2", "B-B").startSupport()),
                () -> assertEquals("member G-1", member(t, "Level 3", "B-B").startSupport()),
                // G-1 carries half of B-B at Level 3 and nothing at Level 2
                () -> assertTrue(member(t, "Level 3", "G-1").steelWeight() > member(t, "Level 2", "G-1").steelWeight()),
                // the steel reported is the steel the foundations carry (a regression: Level 3 used to show
                // Level 2's members, and the reported steel weight missed Level 3's heavier girder)
                () -> assertEquals(foundations, areaDead + t.steelWeight(), 1e-9 * foundations));
    }
}
