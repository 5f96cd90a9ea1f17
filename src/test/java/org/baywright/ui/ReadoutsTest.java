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
        // a bare-steel member's rows: the demo framed in bare steel (composite rows: CompositeReadoutsTest)
        m.open(CompositeReadoutsTest.BARE);
        MemberResult g = m.currentMembers().stream().filter(r -> !r.section().isEmpty()).findFirst().orElseThrow();
        List<Readouts.Row> rows = Readouts.member(g, UnitSystem.US);
        List<String> labels = rows.stream().map(Readouts.Row::label).toList();
        assertAll(
                () -> assertEquals(g.id(), rows.get(0).value()),
                () -> assertEquals(g.section(), value(rows, "Section")),
                () -> assertEquals(g.status().label(), value(rows, "Status")),
                () -> assertTrue(labels.contains("  flexure"), labels.toString()),
                () -> assertTrue(value(rows, "Start reaction, service").matches("(?s)D [0-9.]+ kip.*"),
                        value(rows, "Start reaction, service")));
    }

    @Test
    void theTakeoffSaysShortTonsOrTonnesAndHasAViewPerLevel() {
        EditorModel m = new EditorModel(TaskRunner.direct());
        m.open(EditorModelTest.DEMO);
        org.baywright.report.Takeoff t = org.baywright.report.Takeoff.of(m.run(), 0);
        String us = Readouts.takeoffTotals(t, m.run(), UnitSystem.US);
        String si = Readouts.takeoffTotals(t, m.run(), UnitSystem.SI);
        // 1 short ton = 2,000 lb; 1 tonne = 1,000 kg (common practice)
        double tons = t.total() / org.baywright.units.Units.NEWTONS_PER_POUND / 2000;
        assertAll(
                () -> assertEquals("Short tons", Readouts.takeoffWeightHeading(UnitSystem.US)),
                () -> assertEquals("Tonnes", Readouts.takeoffWeightHeading(UnitSystem.SI)),
                () -> assertEquals(tons, Double.parseDouble(Readouts.takeoffWeight(t.total(), UnitSystem.US)), 0.005),
                () -> assertTrue(us.startsWith(String.format(java.util.Locale.ROOT, "Total %.2f short tons (", tons)), us),
                () -> assertTrue(si.contains(" tonnes ("), si),
                () -> assertTrue(!us.matches("(?s).*\\d tons.*"), "no bare tons: " + us),
                () -> assertEquals(t.byLevel(), Readouts.takeoffRows(t, Readouts.TakeoffView.LEVEL)),
                () -> assertEquals(m.plan().levels().stream().map(org.baywright.plan.Level::name).toList(),
                        Readouts.takeoffRows(t, Readouts.TakeoffView.LEVEL).stream().map(r -> r.item()).toList()),
                () -> assertEquals(t.bySection(), Readouts.takeoffRows(t, Readouts.TakeoffView.SIZE)),
                () -> assertEquals(t.byKind(), Readouts.takeoffRows(t, Readouts.TakeoffView.KIND)));
    }

    private static String value(List<Readouts.Row> rows, String label) {
        return rows.stream().filter(r -> r.label().equals(label)).findFirst().orElseThrow().value();
    }
}
