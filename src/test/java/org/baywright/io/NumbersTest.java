package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NumbersTest {
    @ParameterizedTest
    @CsvSource({
        "30.000000000000004, 30",
        "0.30000000000000004, 0.3",
        "-0.0, 0",
        "0, 0",
        "1.5e-7, 1.5e-7",
        "1e10, 1e10",
        "123456789012, 1.23456789e11",
        "-2.394, -2.394",
        "0.0001, 0.0001",
        "0.00001234, 1.234e-5",
        "2.99999999999, 3",
        "344.73786465, 344.7378647"})
    void formatsShortAndExact(double value, String text) {
        assertEquals(text, Numbers.format(value));
    }

    @Test
    void formattingWhatWasParsedGivesTheSameText() {
        Random random = new Random(20240607L);
        for (int i = 0; i < 20_000; i++) {
            double v = (random.nextDouble() - 0.3) * Math.pow(10, random.nextInt(24) - 12);
            String once = Numbers.format(v);
            double back = Double.parseDouble(once);
            assertEquals(once, Numbers.format(back), () -> "value " + v);
            assertTrue(Math.abs(back - v) <= 5.000001e-10 * Math.abs(v), () -> "value " + v + " written " + once);
        }
    }

    @Test
    void nonFiniteNumbersCannotBeWritten() {
        assertThrows(IllegalArgumentException.class, () -> Numbers.format(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Numbers.format(Double.POSITIVE_INFINITY));
    }
}
