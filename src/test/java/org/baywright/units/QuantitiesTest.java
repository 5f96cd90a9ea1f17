package org.baywright.units;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantitiesTest {
    // Exact definitions (common practice; NIST SP 811 Appendix B): 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N.
    private static final double IN = 0.0254;
    private static final double FT = 0.3048;
    private static final double LBF = 4.4482216152605;

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "35ft | 10.668",
        "35 ft | 10.668",
        "420in | 10.668",
        "30'-6\" | 9.2964",
        "30' 6\" | 9.2964",
        "30'6\" | 9.2964",
        "30' | 9.144",
        "6\" | 0.1524",
        "30'-6 1/2\" | 9.3091",
        "30ft 6in | 9.2964",
        "10.5m | 10.5",
        "250mm | 0.25",
        "25cm | 0.25",
        ".5m | 0.5",
        "1e3mm | 1.0"})
    void lengths(String text, double metres) {
        assertEquals(metres, Quantities.length("span", text), 1e-12 + 1e-9 * metres);
    }

    @Test
    void loadsForcesStresses() {
        assertAll(
                () -> assertEquals(0.45 * 1000 * LBF / FT, Quantities.lineLoad("dead", "0.45klf"), 1e-9),
                () -> assertEquals(450 * LBF / FT, Quantities.lineLoad("dead", "450plf"), 1e-9),
                () -> assertEquals(6500, Quantities.lineLoad("dead", "6.5kN/m"), 1e-9),
                () -> assertEquals(50 * LBF / (FT * FT), Quantities.areaLoad("live", "50psf"), 1e-9),
                () -> assertEquals(2400, Quantities.areaLoad("live", "2.4kPa"), 1e-9),
                () -> assertEquals(12000 * LBF, Quantities.force("P", "12kip"), 1e-9),
                () -> assertEquals(50000, Quantities.force("P", "50kN"), 1e-9),
                () -> assertEquals(50000 * LBF / (IN * IN), Quantities.stress("Fy", "50ksi"), 1e-3),
                () -> assertEquals(345e6, Quantities.stress("Fy", "345MPa"), 1e-3),
                // 50 ksi = 344.7 MPa (common practice conversion)
                () -> assertEquals(344.7, Units.MPA.fromSi(Quantities.stress("Fy", "50ksi")), 0.05),
                // 1 psf = 47.88 Pa; 50 psf = 2.394 kPa (common practice)
                () -> assertEquals(2.394, Units.KPA.fromSi(Quantities.areaLoad("L", "50psf")), 5e-4));
    }

    @Test
    void errorsNameFieldTextAndAcceptedForms() {
        UnitParseException e = assertThrows(UnitParseException.class, () -> Quantities.length("--span", "35 yd"));
        assertAll(
                () -> assertTrue(e.getMessage().startsWith("--span: \"35 yd\""), e.getMessage()),
                () -> assertTrue(e.getMessage().contains("35ft"), e.getMessage()),
                () -> assertEquals("--span", e.field()));
        UnitParseException bare = assertThrows(UnitParseException.class, () -> Quantities.length("--span", "35"));
        assertTrue(bare.getMessage().contains("has no unit"), bare.getMessage());
        UnitParseException wrongKind = assertThrows(UnitParseException.class, () -> Quantities.lineLoad("--dead", "50psf"));
        assertTrue(wrongKind.getMessage().contains("not a unit of line load"), wrongKind.getMessage());
        assertThrows(UnitParseException.class, () -> Quantities.length("x", ""));
        assertThrows(UnitParseException.class, () -> Quantities.length("x", "abc"));
        assertThrows(UnitParseException.class, () -> Quantities.length("x", "1e400m"));
        assertThrows(UnitParseException.class, () -> Quantities.parsePositive("x", "-3ft", Dimension.LENGTH));
        assertThrows(UnitParseException.class, () -> Quantities.parsePositive("x", "0ft", Dimension.LENGTH));
        assertThrows(UnitParseException.class, () -> Quantities.parseNonNegative("x", "-1klf", Dimension.LINE_LOAD));
    }

    @Test
    void formatsFeetAndInches() {
        assertAll(
                () -> assertEquals("30'-6\"", UnitSystem.feetInches(9.2964, 16)),
                () -> assertEquals("35'-0\"", UnitSystem.feetInches(10.668, 16)),
                () -> assertEquals("30'-6 1/2\"", UnitSystem.feetInches(Quantities.length("x", "30'-6 1/2\""), 16)),
                () -> assertEquals("0'-11 15/16\"", UnitSystem.feetInches(Quantities.length("x", "11.9375in"), 16)));
    }

    @Test
    void weightPerLengthInBothSystems() {
        double w = Quantities.lineLoad("w", "50plf");
        assertEquals(50, UnitSystem.US.weightPerLength(w), 1e-9);
        // 50 lb/ft = 74.41 kg/m (AISC Shapes Database v15.0 lists W18X50 as W460X74 in SI; common practice)
        assertEquals(74.41, UnitSystem.SI.weightPerLength(w), 0.01);
    }
}
