package org.baywright.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.baywright.design.CompositeDesign;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The {@code composite} object of {@code design --json} ({@link RunSummary#json}) on AISC Design
 * Examples V15, Example I.1 (inputs and expected values as restated in CHECK-VALUES §7), built by hand
 * ({@link CompositeRuns}): W21X50 with 23 studs per half span.
 */
class RunSummaryCompositeTest {

    @SuppressWarnings("unchecked")
    private static Map<String, Object> member(Map<String, Object> json, String id) {
        for (Object o : (List<Object>) json.get("members")) {
            Map<String, Object> m = (Map<String, Object>) o;
            if (m.get("id").equals(id)) {
                return m;
            }
        }
        throw new AssertionError("no member " + id);
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> map(Object o) {
        return (Map<String, Object>) o;
    }

    private static double num(Map<String, Object> m, String key) {
        return ((Number) m.get(key)).doubleValue();
    }

    @Test
    void exampleI1InUsUnits() {
        RunResult run = CompositeRuns.mixed();
        MemberResult b1 = run.takedown().members().get("f1").get(0);
        CompositeDesign d = b1.composite().design();
        Map<String, Object> json = RunSummary.json(run, UnitSystem.US);
        Map<String, Object> c = map(member(json, "B-1").get("composite"));
        assertAll("Example I.1 composite object",
                // CHECK-VALUES §7 "I.1 effective width": b_eff = min(span/8, half spacing) per side = 5 ft, 120 in (FOUND)
                () -> assertEquals(120, num(c, "beff"), 0.01),
                () -> assertEquals(60, num(c, "beffLeft"), 0.01),
                () -> assertEquals(60, num(c, "beffRight"), 0.01),
                // CHECK-VALUES §7 "Stud strength": ¾ in stud, one per rib, weak position: 17.2 kips (COMPUTED; Table 3-21 from memory)
                () -> assertEquals(17.2, num(c, "qn"), 0.05),
                () -> assertEquals(Units.KIPS.fromSi(d.qn()), num(c, "qn"), 1e-9),
                // 46 studs in all, 23 per half span (I.1, from memory + COMPUTED)
                () -> assertEquals(46, c.get("studs")),
                () -> assertEquals(23, c.get("studsPerHalf")),
                () -> assertEquals(23 * num(c, "qn"), num(c, "sumQn"), 1e-6),
                // ΣQn = 396 kips lies between BFL (386 kips, I.1) and A_s·F_y = 735 kips: the PNA is in the top flange
                // (Manual Table 3-19 locations, CHECK-VALUES §7)
                () -> assertEquals("top flange", c.get("pna")),
                () -> assertEquals(num(c, "sumQn") / 735, num(c, "degree"), 0.005),
                // CHECK-VALUES §7 "I.1 lower-bound I": I_LB = 2,521 in⁴ at ΣQn = 386 kips (COMPUTED); 396 kips a little more
                () -> assertTrue(num(c, "ILB") > 2521 && num(c, "ILB") < 1.03 * 2521, "ILB " + c.get("ILB")),
                () -> assertEquals(Units.IN4.fromSi(d.ilb()), num(c, "ILB"), 1e-6),
                // CHECK-VALUES §4 "Camber example": 80 % of 2.68 in rounded down to ¼ in: 2 in (COMPUTED, rule from memory)
                () -> assertEquals(2.0, num(c, "camber"), 1e-9),
                // CHECK-VALUES §7 "I.1 construction stage": 333.1 / 412.5 kip-ft (COMPUTED)
                () -> assertEquals(333.1 / 412.5, num(c, "constructionRatio"), 0.002),
                () -> assertEquals("perpendicular", c.get("ribs")),
                () -> assertEquals(false, c.get("shored")),
                () -> assertEquals(b1.composite().bare().section().designation(), c.get("bareSection")),
                () -> assertTrue(num(c, "bareWeight") > 50, "the bare beam is heavier than W21X50: " + c.get("bareSection")),
                () -> assertEquals(Units.IN4.symbol(), map(json.get("units")).get("inertia")));
    }

    @Test
    void totalsCountStudsCamberAndTheBareWeight() {
        RunResult run = CompositeRuns.mixed();
        Map<String, Object> totals = map(RunSummary.json(run, UnitSystem.US).get("totals"));
        List<MemberResult> ms = run.takedown().members().get("f1");
        double bareLb = Units.LBF.fromSi(ms.get(0).bareSteelWeight() + ms.get(1).bareSteelWeight() + ms.get(2).steelWeight());
        assertAll("totals",
                () -> assertEquals(92, totals.get("studs"), "46 + 46"),
                () -> assertEquals(2, totals.get("camberedPieces")),
                () -> assertEquals(2, totals.get("compositeMembers")),
                // W21X50: 50 lb/ft × 45 ft × 2 + W18X50 × 35 ft (nominal weights)
                () -> assertEquals(50 * 45 * 2 + 50 * 35, num(totals, "steelWeight"), 1.0),
                () -> assertEquals(bareLb, num(totals, "steelWeightNonComposite"), 1e-6 * bareLb),
                () -> assertTrue(num(totals, "steelWeightNonComposite") > num(totals, "steelWeight")));
    }

    @Test
    void siUnitsAndNoCompositeKeysOnBareMembers() {
        RunResult run = CompositeRuns.mixed();
        Map<String, Object> json = RunSummary.json(run, UnitSystem.SI);
        Map<String, Object> c = map(member(json, "B-1").get("composite"));
        assertAll("SI",
                () -> assertEquals(3048, num(c, "beff"), 0.5), // 120 in = 3,048 mm
                () -> assertEquals(50.8, num(c, "camber"), 1e-6), // 2 in = 50.8 mm
                () -> assertFalse(member(json, "B-3").containsKey("composite"), "a bare member has none"));
    }

    @Test
    void aRunWithoutCompositeMembersHasNoneOfTheNewKeys() {
        RunResult run = CompositeRuns.run(List.of(CompositeRuns.bare("B-3", 0)), 1);
        Map<String, Object> json = RunSummary.json(run, UnitSystem.US);
        assertAll("bare steel",
                () -> assertNull(map(json.get("units")).get("inertia")),
                () -> assertFalse(map(json.get("totals")).containsKey("studs")),
                () -> assertFalse(map(json.get("totals")).containsKey("steelWeightNonComposite")),
                () -> assertFalse(member(json, "B-3").containsKey("composite")));
    }
}
