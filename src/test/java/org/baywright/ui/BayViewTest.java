package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.plan.Point;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;
import org.junit.jupiter.api.Test;

/**
 * View › Floor vibration without the toolkit, on the demo plan: the bays of a level are the run's own, each
 * bay's outline holds its centre and its members' mid-points lie on or inside it, and the Properties rows of a
 * picked bay are its check's values.
 */
class BayViewTest {
    private final EditorModel model = new EditorModel(TaskRunner.direct());

    private BayResult worst() {
        return model.run().bays().stream().filter(BayResult::checked)
                .max(java.util.Comparator.comparingDouble(BayResult::ratio)).orElseThrow();
    }

    @Test
    void outlinesHoldTheirBaysAndTheirBeams() {
        assertTrue(model.open(Path.of(BaywrightApp.DEMO)).opened());
        BayResult w = worst();
        model.levelProperty().set(w.levels().get(0));
        List<BayResult> here = model.currentBays();
        assertTrue(here.contains(w));
        for (BayResult b : here) {
            Bay bay = b.bay();
            assertEquals(b, BayView.at(here, bay.centre().x(), bay.centre().y()).orElseThrow(), bay.id());
            for (var m : model.currentMembers()) {
                if (bay.beams().contains(m.id())) {
                    Point mid = new Point((m.start().x() + m.end().x()) / 2, (m.start().y() + m.end().y()) / 2);
                    assertTrue(BayView.contains(bay, mid.x(), mid.y()), bay.id() + " holds its beam " + m.id());
                }
            }
            List<Point> o = BayView.outline(bay);
            double area = 0;
            for (int i = 0; i < 4; i++) {
                Point a = o.get(i);
                Point c = o.get((i + 1) % 4);
                area += a.x() * c.y() - c.x() * a.y();
            }
            assertEquals(bay.beamSpan() * bay.width(), area / 2, 1e-6, "outline area L_j × width, counter-clockwise");
            assertFalse(BayView.contains(bay, bay.centre().x() + bay.beamSpan() + bay.width(), bay.centre().y()));
        }
    }

    /** A picked bay's Properties rows are its check's own values, with the method line. */
    @Test
    void aPickedBaysPropertiesAreItsValues() {
        assertTrue(model.open(Path.of(BaywrightApp.DEMO)).opened());
        PropertiesViewModel vm = new PropertiesViewModel(model);
        BayResult w = worst();
        model.levelProperty().set(w.levels().get(0));
        model.showVibrationProperty().set(true);
        model.selectedBayProperty().set(w.bay().id());
        var r = w.result();
        assertAll(() -> assertEquals(w.bay().id(), vm.value("Bay").orElseThrow()),
                () -> assertEquals(String.join(", ", w.levels()), vm.value("Levels").orElseThrow()),
                () -> assertEquals("exceeds", vm.value("Status").orElseThrow(), "the demo's worst bay exceeds (0.712 %)"),
                () -> assertEquals(BayView.percent(r.apg()), vm.value("ap/g").orElseThrow()),
                () -> assertEquals(BayView.hz(r.fn()), vm.value("fn").orElseThrow()),
                () -> assertEquals(BayView.ratio(r.ratio()), vm.value("Ratio").orElseThrow()),
                () -> assertTrue(vm.value("Wj").isPresent() && vm.value("Bg").isPresent() && vm.value("β, damping").isPresent()),
                () -> assertTrue(vm.items().stream().anyMatch(i -> i instanceof PropertiesViewModel.Note n
                        && n.text().contains("Design Guide 11")), "the method line"));
        model.select("nothing");
        model.selectAll(List.of(model.currentMembers().get(0).id()), false);
        assertEquals(null, model.selectedBayProperty().get(), "picking a member drops the bay");
    }
}
