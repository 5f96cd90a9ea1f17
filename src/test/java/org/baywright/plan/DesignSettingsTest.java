package org.baywright.plan;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Each copy method changes its own fields and keeps every other one. */
class DesignSettingsTest {
    private static final DesignSettings D = DesignSettings.defaults();

    /** The defaults with one group of fields replaced, built field by field. */
    private static DesignSettings expected(String method, double fy, double live, double total, List<String> beams,
            List<String> girders, List<String> columns, double depth, int splice, boolean reduce, boolean partitions,
            boolean delivered, String catalog) {
        return new DesignSettings(method, fy, live, total, beams, girders, columns, depth, splice, reduce, partitions, delivered,
                catalog);
    }

    @Test
    void eachCopyChangesOnlyItsOwnFields() {
        assertAll(
                () -> assertEquals(expected("asd", D.fy(), 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, true, false, true, ""),
                        D.withMethod("asd")),
                () -> assertEquals(expected("lrfd", 345e6, 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, true, false, true, ""),
                        D.withFy(345e6)),
                () -> assertEquals(expected("lrfd", D.fy(), 480, 0, List.of(), List.of(), List.of("W14"), 0, 2, true, false, true, ""),
                        D.withDeflection(480, 0)),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of("W16"), List.of("W24"), List.of("W14"), 0, 2, true, false,
                        true, ""), D.withBeamSeries(List.of("W16"), List.of("W24"))),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of(), List.of(), List.of("W12", "W14"), 0, 2, true, false,
                        true, ""), D.withColumnSeries(List.of("W12", "W14"))),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of(), List.of(), List.of("W14"), 0.6, 2, true, false, true, ""),
                        D.withMaxBeamDepth(0.6)),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of(), List.of(), List.of("W14"), 0, 3, true, false, true, ""),
                        D.withSpliceEvery(3)),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, false, true, false, ""),
                        D.withLiveLoad(false, true, false)),
                () -> assertEquals(expected("lrfd", D.fy(), 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, true, false, true,
                        "house.csv"), D.withCatalog("house.csv")));
    }
}
