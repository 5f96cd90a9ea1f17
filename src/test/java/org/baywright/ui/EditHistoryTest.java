package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import org.baywright.plan.Plan;
import org.baywright.study.Variations;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EditHistoryTest {
    @Test
    void undoAndRedoWalkTheStates() {
        EditHistory<String> h = new EditHistory<>(3);
        h.reset("a");
        h.push("b", "to b");
        h.push("c", "to c");
        assertEquals("to c", h.undoLabel());
        assertEquals(Optional.of("b"), h.undo());
        assertEquals(Optional.of("a"), h.undo());
        assertEquals(Optional.empty(), h.undo());
        assertEquals(Optional.of("b"), h.redo());
        h.push("d", "to d");
        assertFalse(h.canRedo(), "a new edit clears redo");
        assertEquals("d", h.current());
    }

    @Test
    void theOldestStepsAreDroppedBeyondTheLimit() {
        EditHistory<Integer> h = new EditHistory<>(2);
        h.reset(0);
        for (int i = 1; i <= 5; i++) {
            h.push(i, "step " + i);
        }
        assertEquals(Optional.of(4), h.undo());
        assertEquals(Optional.of(3), h.undo());
        assertEquals(Optional.empty(), h.undo());
    }

    @Test
    void undoAndRedoRestoreThePlanExactly(@TempDir Path dir) throws Exception {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(EditorModelTest.DEMO).opened());
        Plan original = m.plan();
        double weight = m.run().takedown().steelWeight();
        m.apply(Variations.beamSpacing(original, Units.FT_.toSi(7.5)), "beams at 7.5 ft");
        assertTrue(m.dirtyProperty().get());
        assertTrue(m.canUndoProperty().get());
        assertNotEquals(weight, m.run().takedown().steelWeight(), "the edit was run");
        assertTrue(m.undo());
        assertEquals(original, m.plan());
        assertEquals(weight, m.run().takedown().steelWeight(), 1e-9 * weight);
        assertFalse(m.dirtyProperty().get(), "back to the plan as opened");
        assertTrue(m.redo());
        assertNotEquals(original, m.plan());
        m.saveAs(dir.resolve("edited.bay.json"));
        assertFalse(m.dirtyProperty().get(), "saved");
        assertFalse(m.redo(), "nothing left to redo");
    }
}
