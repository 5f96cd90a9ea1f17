package org.baywright.units;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Quantities in problem messages: in the plan's unit system, grouped like the rest of the output, never
 * in scientific notation. Conversions: 1 ft = 0.3048 m, 1 kip = 4,448.2216 N (exact definitions,
 * common practice).
 */
class MessageTextTest {
    @Test
    void lengthsAndPoints() {
        assertAll(
                () -> assertEquals("30'-0\"", UnitSystem.US.lengthText(9.144)),
                () -> assertEquals("5'-8 1/4\"", UnitSystem.US.lengthText(1.733)),
                () -> assertEquals("9.144 m", UnitSystem.SI.lengthText(9.144)),
                () -> assertEquals("(30'-0\", 0'-0\")", UnitSystem.US.pointText(9.144, 0)),
                () -> assertEquals("(9.144 m, 0.000 m)", UnitSystem.SI.pointText(9.144, 0)));
    }

    @Test
    void areas() {
        double ft2 = 0.3048 * 0.3048;
        assertAll(
                () -> assertEquals("6,300 ft²", UnitSystem.US.areaText(6300 * ft2)),
                () -> assertEquals("585 m²", UnitSystem.SI.areaText(585.3)),
                () -> assertEquals("58.5 m²", UnitSystem.SI.areaText(58.53)),
                () -> assertEquals("12.5 ft²", UnitSystem.US.areaText(12.5 * ft2)),
                () -> assertEquals("0.000096 m²", UnitSystem.SI.areaText(9.595e-5), "a sliver is not 0"),
                () -> assertEquals("0 m²", UnitSystem.SI.areaText(0)));
    }

    @Test
    void forcesAndTolerances() {
        assertAll(
                () -> assertEquals("3,709.7 kip", UnitSystem.US.forceText(3709.71 * 4448.2216152605)),
                () -> assertEquals("66.6 kN", UnitSystem.SI.forceText(66616.6)),
                () -> assertEquals("0.001 mm", UnitSystem.SI.toleranceText(1e-6)),
                () -> assertEquals("0.000039 in", UnitSystem.US.toleranceText(1e-6)));
    }
}
