package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Plan;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The plan setting {@code connectionEccentricity}: how far beyond the column face a reaction acts (default 3 in,
 * common practice). A file without it reads as before with the default; the writer leaves it out at the default.
 */
class ConnectionEccentricityTest {
    private static String demo() throws java.io.IOException {
        return Files.readString(Path.of("plans", "harbourview-offices.bay.json"));
    }

    private static String withSetting(String text, String value) {
        return text.replaceFirst("\"settings\": \\{", "\"settings\": {\n    \"connectionEccentricity\": " + value + ",");
    }

    @Test
    void aFileWithoutTheKeyTakesTheDefaultAndIsWrittenWithoutIt() throws Exception {
        String text = demo();
        Plan p = PlanFiles.read(text, "demo").plan().orElseThrow();
        assertAll(
                () -> assertFalse(text.contains("connectionEccentricity")),
                () -> assertEquals(Units.IN.toSi(3), p.settings().connectionEccentricity(), 1e-12, "3 in, common practice"),
                () -> assertEquals(DesignSettings.DEFAULT_CONNECTION_ECCENTRICITY, p.settings().connectionEccentricity()),
                () -> assertFalse(PlanFiles.write(p).contains("connectionEccentricity")));
    }

    @Test
    void aGivenValueIsReadAndWrittenBack() throws Exception {
        Plan p = PlanFiles.read(withSetting(demo(), "\"4.5in\""), "demo").plan().orElseThrow();
        String out = PlanFiles.write(p);
        Plan again = PlanFiles.read(out, "again").plan().orElseThrow();
        assertAll(
                () -> assertEquals(Units.IN.toSi(4.5), p.settings().connectionEccentricity(), 1e-12),
                () -> assertTrue(out.contains("\"connectionEccentricity\""), "written when not the default"),
                () -> assertEquals(p.settings().connectionEccentricity(), again.settings().connectionEccentricity(), 1e-9));
    }

    @Test
    void outOfRangeIsALocatedProblem() throws Exception {
        PlanReadResult r = PlanFiles.read(withSetting(demo(), "\"30in\""), "demo");
        assertAll(
                () -> assertTrue(r.plan().isEmpty()),
                () -> assertTrue(r.problems().stream().anyMatch(p -> p.kind().equals("out-of-range")
                        && p.location().equals("/settings/connectionEccentricity")), r.problems().toString()));
    }
}
