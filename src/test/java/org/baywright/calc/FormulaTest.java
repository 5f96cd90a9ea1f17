package org.baywright.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.junit.jupiter.api.Test;

class FormulaTest {
    @Test
    void evaluatesTheSheetNotation() {
        Map<String, Double> v = Map.of("a", 2.0, "b", 3.0, "Lb", 4.0);
        assertEquals(8.0, Formula.evaluate("a·(b + 1)", v), 1e-15);
        assertEquals(2.0 / 3.0, Formula.evaluate("a/b", v), 1e-15);
        assertEquals(9.0, Formula.evaluate("b²", v), 1e-15);
        assertEquals(Math.sqrt(2), Formula.evaluate("√(a)", v), 1e-15);
        assertEquals(Math.PI * Math.PI, Formula.evaluate("π²", v), 1e-12);
        assertEquals(-1.0, Formula.evaluate("a − b", v), 1e-15);
        assertEquals(Math.pow(0.658, 2.0 / 3.0), Formula.evaluate("0.658^(a/b)", v), 1e-15);
        assertEquals(2.0, Formula.evaluate("min(max(a, 1), b)", v), 1e-15);
        assertEquals(14.0, Formula.evaluate("a·[b + Lb]", v), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> Formula.evaluate("a·c", v));
        assertThrows(IllegalArgumentException.class, () -> Formula.evaluate("a·(b", v));
    }

    @Test
    void substitutesValues() {
        assertEquals("Fy · Zx", Formula.substitute("Fy·Zx", s -> null));
        assertEquals("50 ksi · 101 in³", Formula.substitute("Fy·Zx", s -> s.equals("Fy") ? "50 ksi" : "101 in³"));
    }
}
