package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * A deck's span and overhang limits in the plan file (docs/plan-format.md, "decks"): optional lengths,
 * the defaults (15 ft, 2 ft: common practice) where absent, written only when they differ.
 */
class DeckLimitsFileTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String DECK = "/floors/0/decks/0";

    private static Deck firstDeck(Plan p) {
        return p.floors().get(0).decks().get(0);
    }

    private static PlanReadResult readWith(String span, String overhang) throws Exception {
        ObjectNode root = (ObjectNode) JSON.readTree(PlanFiles.write(SamplePlans.twoBay()));
        ObjectNode deck = (ObjectNode) root.at(DECK);
        if (span != null) {
            deck.put("maxSpan", span);
        }
        if (overhang != null) {
            deck.put("maxOverhang", overhang);
        }
        return PlanFiles.read(JSON.writeValueAsString(root), "deck limits");
    }

    @Test
    void aFileWithoutLimitsReadsTheDefaultsAndIsWrittenAsBefore() throws Exception {
        PlanReadResult r = readWith(null, null);
        Deck d = firstDeck(r.plan().orElseThrow());
        String written = PlanFiles.write(r.plan().orElseThrow());
        assertAll(() -> assertEquals(List.of(), r.problems()),
                () -> assertEquals(Units.FT_.toSi(15), d.maxSpan(), 1e-12),
                () -> assertEquals(Units.FT_.toSi(2), d.maxOverhang(), 1e-12),
                () -> assertFalse(written.contains("maxSpan") || written.contains("maxOverhang"), written));
    }

    @Test
    void limitsTheUserGaveAreReadAndWrittenBack() throws Exception {
        PlanReadResult r = readWith("12ft", "1ft 6in");
        Plan plan = r.plan().orElseThrow();
        PlanReadResult again = PlanFiles.read(PlanFiles.write(plan), "again");
        assertAll(() -> assertEquals(List.of(), r.problems()),
                () -> assertEquals(Units.FT_.toSi(12), firstDeck(plan).maxSpan(), 1e-9),
                () -> assertEquals(Units.FT_.toSi(1.5), firstDeck(plan).maxOverhang(), 1e-9),
                () -> assertEquals(firstDeck(plan).maxSpan(), firstDeck(again.plan().orElseThrow()).maxSpan(), 1e-9),
                () -> assertEquals(firstDeck(plan).maxOverhang(), firstDeck(again.plan().orElseThrow()).maxOverhang(), 1e-9));
    }

    @Test
    void aLimitThatIsNotAPositiveLengthIsALocatedProblem() throws Exception {
        PlanReadResult zero = readWith("0ft", null);
        PlanReadResult text = readWith(null, "wide");
        assertAll(() -> assertFalse(zero.ok()),
                () -> assertTrue(zero.errors().stream().anyMatch(p -> p.kind().equals("out-of-range")
                        && p.location().equals(DECK + "/maxSpan")), () -> zero.problems().toString()),
                () -> assertFalse(text.ok()),
                () -> assertTrue(text.errors().stream().map(Problem::location).anyMatch((DECK + "/maxOverhang")::equals),
                        () -> text.problems().toString()));
    }

    @Test
    void everyDeckOfTheSamplePlanHasTheDefaults() {
        for (Floor f : SamplePlans.twoBay().floors()) {
            for (Deck d : f.decks()) {
                assertTrue(d.defaultLimits(), d.id());
            }
        }
    }
}
