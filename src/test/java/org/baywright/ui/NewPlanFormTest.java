package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The New dialog's fields, read without a toolkit. */
class NewPlanFormTest {
    @Test
    void fieldsAreReadInTheChosenUnits() {
        assertEquals(new NewPlanForm.NewPlan("Pier 4", UnitSystem.US, 3, Units.FT_.toSi(13)),
                NewPlanForm.read(" Pier 4 ", NewPlanForm.US, " 3", "13"));
        assertEquals(new NewPlanForm.NewPlan("New building", UnitSystem.SI, 1, 4.2), NewPlanForm.read("  ", NewPlanForm.SI, "1", "4.2"));
        assertEquals(Units.FT_.toSi(12.5), NewPlanForm.read("x", NewPlanForm.SI, "2", "12'-6\"").storeyHeight(), 1e-12,
                "a unit typed wins over the units chosen");
    }

    @Test
    void aWrongFieldIsNamed() {
        for (String n : new String[] {"0", "201", "two", "", "1.5"}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> NewPlanForm.read("x", NewPlanForm.US, n, "13ft"));
            assertTrue(e.getMessage().startsWith("Levels: \"" + n + "\""), e.getMessage());
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> NewPlanForm.read("x", NewPlanForm.US, "2", "-3"));
        assertTrue(e.getMessage().startsWith("storey height"), e.getMessage());
        assertEquals(200, NewPlanForm.read("x", NewPlanForm.US, "200", "13ft").levels());
    }

    @Test
    void theDialogStartsInThePlansUnits() {
        assertEquals(NewPlanForm.SI, NewPlanForm.unitChoice(UnitSystem.SI));
        assertEquals(NewPlanForm.US, NewPlanForm.unitChoice(UnitSystem.US));
        assertEquals(4.0, NewPlanForm.read("x", NewPlanForm.unitChoice(UnitSystem.SI), "1", NewPlanForm.defaultStorey(UnitSystem.SI))
                .storeyHeight(), 1e-12);
        assertEquals(Units.FT_.toSi(13), NewPlanForm.read("x", NewPlanForm.US, "1", NewPlanForm.defaultStorey(UnitSystem.US))
                .storeyHeight(), 1e-12);
    }
}
