package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CividisTest {
    @Test
    void endsAreThePublishedColours() {
        // the first and last entries of the published 256-entry map: (0, 0.135112, 0.304751), (0.995737, 0.909344, 0.217772)
        assertAll(
                () -> assertEquals(new Rgb(0, 34, 78), Cividis.at(0)),
                () -> assertEquals(new Rgb(254, 232, 56), Cividis.at(1)),
                () -> assertEquals(Cividis.at(0), Cividis.at(-3)),
                () -> assertEquals(Cividis.at(1), Cividis.at(7)),
                () -> assertEquals(Cividis.at(0), Cividis.at(Double.NaN)));
    }

    @Test
    void lightnessRisesSteadilySoThatOrderReadsWithoutHue() {
        double last = -1;
        for (int i = 0; i <= 100; i++) {
            double l = Cividis.at(i / 100.0).luminance();
            assertTrue(l > last, "luminance must rise at t = " + i / 100.0);
            last = l;
        }
    }
}
