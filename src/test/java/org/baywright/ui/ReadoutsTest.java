package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;

class ReadoutsTest {
    @Test
    void statusTextsBeforeAndAfterARun() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        m.open(EditorModelTest.DEMO);
        assertAll(
                () -> assertEquals("Steel —", Readouts.steelWeight(null, UnitSystem.US)),
                () -> assertTrue(Readouts.steelWeight(m.run(), UnitSystem.US).matches("Steel [0-9,]+ lb \\([0-9.]+ short tons\\)"),
                        Readouts.steelWeight(m.run(), UnitSystem.US)),
                () -> assertTrue(Readouts.steelWeight(m.run(), UnitSystem.SI).matches("Steel [0-9,]+ kg \\([0-9.]+ t\\)")),
                () -> assertTrue(Readouts.weightPerArea(m.run(), UnitSystem.US).matches("[0-9.]+ lb/ft² of floor")),
                () -> assertTrue(Readouts.highestRatio(m.run()).matches("Highest ratio [0-9]\\.[0-9]{2}")),
                () -> assertEquals("—", Readouts.ratio(Double.NaN)),
                () -> assertEquals("0.88", Readouts.ratio(0.8751)));
    }

    @Test
    void memberRowsNameSectionStatusRatiosAndReactions() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        m.open(EditorModelTest.DEMO);
        MemberResult g = m.currentMembers().stream().filter(r -> !r.section().isEmpty()).findFirst().orElseThrow();
        List<Readouts.Row> rows = Readouts.member(g, UnitSystem.US);
        List<String> labels = rows.stream().map(Readouts.Row::label).toList();
        assertAll(
                () -> assertEquals(g.id(), rows.get(0).value()),
                () -> assertEquals(g.section(), value(rows, "Section")),
                () -> assertEquals(g.status().label(), value(rows, "Status")),
                () -> assertTrue(labels.contains("  flexure"), labels.toString()),
                () -> assertTrue(value(rows, "Start reaction").matches("D [0-9.]+ kip.*"), value(rows, "Start reaction")));
    }

    private static String value(List<Readouts.Row> rows, String label) {
        return rows.stream().filter(r -> r.label().equals(label)).findFirst().orElseThrow().value();
    }
}
