package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.CompositeRules;
import org.baywright.plan.Floor;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.plan.StudPlacement;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The slab, the composite setting and the member's composite choices in the plan file. */
class CompositePlanFileTest {
    private static Plan plan(String units) {
        Plan base = RegularPlan.generate(new RegularPlan.Spec("slab file", units, List.of(Units.FT_.toSi(30)),
                List.of(Units.FT_.toSi(40)), List.of(Units.FT_.toSi(13), Units.FT_.toSi(13)), true, Units.FT_.toSi(10),
                new LoadValues(0, Units.PSF.toSi(15), Units.PSF.toSi(50), 0, 0, Units.PSF.toSi(15)),
                new LoadValues(Units.PSF.toSi(20), Units.PSF.toSi(10), 0, Units.PSF.toSi(20), 0, 0), LoadValues.ZERO));
        Slab light = new Slab(Units.IN.toSi(2), Units.IN.toSi(5), Units.IN.toSi(12), Units.PSF.toSi(2), Units.IN.toSi(3.25),
                Units.PCF.toSi(110), Units.KSI.toSi(3.5), Units.IN.toSi(0.75), Units.KSI.toSi(65), 2, StudPlacement.STRONG,
                Units.PSF.toSi(42));
        Plan p = RegularPlan.withSlab(base, light, CompositeMode.PER_MEMBER, 0);
        Floor f = p.floor("typical").orElseThrow();
        List<Member> ms = f.members().stream().map(m -> m.id().startsWith("G-") ? m.withFixedSection(Optional.of("W21X44"))
                .withComposite(Optional.of(true)).withFixedStuds(OptionalInt.of(20)) : m).toList();
        Floor g = new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), ms, f.infills(), f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads(), new CompositeFloor(CompositeMode.PER_MEMBER, true, Units.PSF.toSi(25)));
        return new Plan(p.name(), p.units(), p.settings().withComposite(new CompositeRules(0.5, Units.LBF.toSi(12), false, 0.75,
                Units.LBF.toSi(30))), p.grid(), p.levels(), p.floors().stream().map(x -> x.id().equals("typical") ? g : x).toList(),
                p.columns(), p.notes());
    }

    @Test
    void everyCompositeFieldSurvivesTheFileInBothUnitSystems() {
        for (String units : List.of("us", "si")) {
            Plan p = plan(units);
            String text = PlanFiles.write(p);
            PlanReadResult r = PlanFiles.read(text, "slab");
            assertTrue(r.plan().isPresent(), r.problems().toString());
            Plan back = r.plan().get();
            Floor f = back.floor("typical").orElseThrow();
            Slab s = f.decks().get(0).slab();
            Slab was = p.floor("typical").orElseThrow().decks().get(0).slab();
            Member g = f.members().stream().filter(m -> m.id().startsWith("G-")).findFirst().orElseThrow();
            assertAll(units,
                    () -> assertEquals(was.ribHeight(), s.ribHeight(), 1e-9),
                    () -> assertEquals(was.ribWidth(), s.ribWidth(), 1e-9),
                    () -> assertEquals(was.topping(), s.topping(), 1e-9),
                    () -> assertEquals(was.density(), s.density(), 1e-6 * was.density()),
                    () -> assertEquals(was.fc(), s.fc(), 1e-6 * was.fc()),
                    () -> assertEquals(was.weightOverride(), s.weightOverride(), 1e-6 * was.weightOverride()),
                    () -> assertEquals(2, s.studsPerRib()),
                    () -> assertEquals(StudPlacement.STRONG, s.studPosition()),
                    () -> assertEquals(CompositeMode.PER_MEMBER, f.composite().mode()),
                    () -> assertTrue(f.composite().shored()),
                    () -> assertEquals(25, Units.PSF.fromSi(f.composite().constructionLive()), 1e-6),
                    () -> assertEquals(Optional.of(true), g.composite()),
                    () -> assertEquals(OptionalInt.of(20), g.fixedStuds()),
                    () -> assertEquals(0.5, back.settings().composite().minDegree(), 0),
                    () -> assertFalse(back.settings().composite().camber()),
                    () -> assertEquals(12, Units.LBF.fromSi(back.settings().composite().studWeight()), 1e-6),
                    // the roof's deck has no slab and the roof stays bare steel
                    () -> assertEquals(null, back.floor("roof").orElseThrow().decks().get(0).slab()),
                    () -> assertEquals(CompositeFloor.NONE, back.floor("roof").orElseThrow().composite()));
            // writing what was read gives the same text
            assertEquals(text, PlanFiles.write(back));
        }
    }

    @Test
    void aFileWithoutTheSettingReadsAsBareSteel() {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("old", "us", List.of(Units.FT_.toSi(30)), List.of(Units.FT_.toSi(30)),
                List.of(Units.FT_.toSi(13)), true, Units.FT_.toSi(10), new LoadValues(Units.PSF.toSi(50), 0, Units.PSF.toSi(50), 0, 0, 0),
                LoadValues.ZERO, LoadValues.ZERO));
        String text = PlanFiles.write(p);
        assertFalse(text.contains("\"composite\""), text);
        assertFalse(text.contains("\"slab\""), text);
        Floor f = PlanFiles.read(text, "old").plan().orElseThrow().floor("typical").orElseThrow();
        assertEquals(CompositeMode.NON_COMPOSITE, f.composite().mode());
    }

    private static List<Problem> problems(String from, String to) {
        String text = PlanFiles.write(plan("us"));
        assertTrue(text.contains(from), from);
        return PlanFiles.read(text.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to)),
                "bad").problems();
    }

    private static void located(List<Problem> ps, String location, String words) {
        assertTrue(ps.stream().anyMatch(p -> p.location().equals(location) && p.message().contains(words)),
                location + " / " + words + " in " + ps);
    }

    @Test
    void wrongValuesAreRefusedWithTheirFieldAndWhatIsAllowed() {
        // f'c outside the range of AISC 360-16 I1.3 (3 to 10 ksi for the strength rules)
        located(problems("\"fc\": \"3.5ksi\"", "\"fc\": \"2ksi\""), "/floors/0/decks/0/slab/fc", "3 to 10 ksi");
        located(problems("\"perRib\": 2", "\"perRib\": 4"), "/floors/0/decks/0/slab/studs/perRib", "1, 2 or 3");
        located(problems("\"position\": \"strong\"", "\"position\": \"middle\""), "/floors/0/decks/0/slab/studs/position",
                "\"weak\" or \"strong\"");
        located(problems("\"action\": \"per-member\"", "\"action\": \"sometimes\""), "/floors/0/composite/action", "per-member");
        located(problems("\"concrete\": \"110pcf\"", "\"concrete\": \"110\""), "/floors/0/decks/0/slab/concrete", "pcf");
        located(problems("\"ribWidth\": \"5in\"", "\"ribWidth\": \"14in\""), "/floors/0/decks/0/slab/ribWidth", "pitch");
        located(problems("\"studs\": 20", "\"studs\": -2"), "/floors/0/members/0/studs", "0 to 400");
    }
}
