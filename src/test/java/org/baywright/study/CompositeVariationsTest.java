package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.Slab;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The composite parameters of a study: composite action on or off, the concrete above the deck and its unit
 * weight, on the demo plan with its slabs taken away and one described on its typical floor only (Slab.typical: 3 in deck, 4½ in of
 * 145 pcf concrete, common practice).
 */
class CompositeVariationsTest {
    private static final Plan DEMO = VariationsTest.DEMO;

    /** The demo with the typical slab on every deck of its typical floor, that floor bare steel. */
    private static Plan withSlab() {
        Plan p = noSlab();
        for (Deck d : DEMO.floor("typical").orElseThrow().decks()) {
            p = PlanEdits.setSlab(p, "typical", d.id(), Slab.typical());
        }
        return PlanEdits.setComposite(p, "typical", org.baywright.plan.CompositeFloor.NONE);
    }

    /** The demo with no slab described anywhere. */
    private static Plan noSlab() {
        Plan p = DEMO;
        for (Floor f : DEMO.floors()) {
            for (Deck d : f.decks()) {
                p = PlanEdits.setSlab(p, f.id(), d.id(), null);
            }
        }
        return p;
    }

    private static Sweep sweep(String text) {
        return SweepText.parse("--vary", text, UnitSystem.US);
    }

    @Test
    void compositeOnOffSetsEveryLayoutWithASlabAndNoOther() {
        Plan base = withSlab();
        Plan on = Variations.apply(base, Setting.composite(true));
        Plan off = Variations.apply(on, Setting.composite(false));
        assertAll(() -> assertEquals(CompositeMode.COMPOSITE, on.floor("typical").orElseThrow().composite().mode()),
                () -> assertEquals(base.floor("roof").orElseThrow(), on.floor("roof").orElseThrow(), "no slab: untouched"),
                () -> assertEquals(base.floor("level2").orElseThrow(), on.floor("level2").orElseThrow(), "no slab: untouched"),
                () -> assertEquals(CompositeMode.NON_COMPOSITE, off.floor("typical").orElseThrow().composite().mode()),
                () -> assertEquals(base.floor("typical").orElseThrow().composite().constructionLive(),
                        on.floor("typical").orElseThrow().composite().constructionLive(), "construction live load kept"));
        var e = assertThrows(IllegalArgumentException.class, () -> Variations.apply(noSlab(), Setting.composite(true)));
        assertTrue(e.getMessage().startsWith("composite: no deck of the plan carries a slab"), e.getMessage());
    }

    /**
     * Topping and concrete change every slab and nothing else; 5.5 in over a 3 in deck is an 8.5 in slab. The
     * slab weight follows (w_c·(t_c + h_r·w_r/pitch) + w_deck, CHECK-VALUES §10, common practice): 110 pcf ×
     * (4.5 + 1.5) in / 12 + 2.5 psf = 57.5 psf.
     */
    @Test
    void toppingAndConcreteChangeEverySlab() {
        Plan base = withSlab();
        Plan thick = Variations.apply(base, sweep("topping=5.5in").values().get(0));
        Plan light = Variations.apply(base, sweep("concrete=110pcf").values().get(0));
        Floor t = thick.floor("typical").orElseThrow();
        Floor l = light.floor("typical").orElseThrow();
        assertAll(() -> assertTrue(t.decks().stream().allMatch(d -> Math.abs(d.slab().thickness() - Units.IN.toSi(8.5)) < 1e-12)),
                () -> assertEquals(base.floor("typical").orElseThrow().members(), t.members()),
                () -> assertEquals(base.floor("roof").orElseThrow(), thick.floor("roof").orElseThrow()),
                () -> assertEquals(57.5, Units.PSF.fromSi(org.baywright.takedown.SlabDesign.weight(l.decks().get(0).slab())), 1e-9),
                () -> assertEquals(Units.IN.toSi(4.5), l.decks().get(0).slab().topping(), 1e-12, "topping kept"));
        assertThrows(IllegalArgumentException.class, () -> Variations.apply(noSlab(), sweep("topping=5in").values().get(0)));
    }

    @Test
    void sweepTextReadsTheCompositeParameters() {
        Sweep c = sweep("composite=on,off");
        Sweep t = sweep("topping=3.5in..5.5in:1in");
        Sweep d = sweep("concrete=110pcf,145pcf");
        assertAll(() -> assertEquals(List.of("on", "off"), c.values().stream().map(Setting::label).toList()),
                () -> assertEquals(List.of("3.5in", "4.5in", "5.5in"), t.values().stream().map(Setting::label).toList()),
                () -> assertEquals(Units.IN.toSi(4.5), t.values().get(1).number(), 1e-12),
                () -> assertEquals(Units.PCF.toSi(110), d.values().get(0).number(), 1e-9),
                () -> assertEquals("17.5kN/m³", SweepText.parse("--vary", "concrete=17kN/m3..18kN/m3:0.5kN/m3", UnitSystem.SI)
                        .values().get(1).label()));
        var e = assertThrows(IllegalArgumentException.class, () -> sweep("composite=maybe"));
        assertTrue(e.getMessage().contains("\"maybe\" is not on or off"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> sweep("concrete=145ft"));
        assertThrows(IllegalArgumentException.class, () -> sweep("composite=on..off:1"));
    }

    /** A study over them names every variant's values; the slab's weight is dead load, so a thicker topping takes more steel. */
    @Test
    void aStudyOverToppingReportsItsValues() {
        StudySpec spec = new StudySpec(Variations.apply(withSlab(), Setting.composite(false)),
                List.of(sweep("topping=2.5in,6.5in")));
        StudyResult r = Study.run(spec, StudyTest.CATALOG, 1, ProgressListener.NONE, new CancelToken());
        assertEquals(List.of("topping=2.5in", "topping=6.5in"),
                r.variants().stream().map(v -> v.settings().get(0).toString()).toList());
        assertTrue(r.variants().get(1).steelWeight() > r.variants().get(0).steelWeight(),
                "4 in more concrete (48 psf at 145 pcf) needs more steel: " + r.variants());
    }
}
