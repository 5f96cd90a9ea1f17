package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End reactions print by one rule for significant figures wherever the package shows them: three
 * significant figures with at least one decimal (common practice: the AISC Manual's tables carry three
 * figures). Before, the member sheet printed four figures with zeros dropped ("7.875", "6.3") and the
 * reaction table one decimal ("7.9"), so a reader saw "D 6.3, L 5.688" side by side.
 */
class ReactionFiguresTest {
    @TempDir
    Path dir;

    @Test
    void theRuleItself() {
        assertAll(
                () -> assertEquals("6.30", UnitSystem.threeFigures(6.3)),
                () -> assertEquals("5.69", UnitSystem.threeFigures(5.688)),
                () -> assertEquals("12.3", UnitSystem.threeFigures(12.34)),
                () -> assertEquals("123.4", UnitSystem.threeFigures(123.4), "at least one decimal"),
                () -> assertEquals("3,709.7", UnitSystem.threeFigures(3709.71), "grouped"),
                () -> assertEquals("10.0", UnitSystem.threeFigures(9.996), "rounding that carries keeps three figures"),
                () -> assertEquals("0.0457", UnitSystem.threeFigures(0.04567)),
                () -> assertEquals("-6.30", UnitSystem.threeFigures(-6.3)));
    }

    /**
     * AISC Design Examples V15.1, Example F.1-1 (FOUND): 35 ft span, wD = 0.45 klf, wL = 0.75 klf. The
     * end reactions are w·L/2 (AISC Manual Table 3-23 case 1): D = 7.875 kip, L = 13.125 kip (COMPUTED),
     * printed to three figures on the member sheet and in the table for connection design alike: 13.1, and
     * 7.88 or 7.87 (7.875 is exactly a half, and the value that comes back from SI may lie a hair either side).
     */
    @Test
    void theSheetAndTheTablePrintTheSameFigures() throws IOException {
        MemberResult m = OneMemberRun.member("B-F1", 35, 0.45, 0.75, "W18X50");
        Path pdf = dir.resolve("package.pdf");
        CalculationPackage.write(OneMemberRun.run(List.of(m)), pdf,
                new PackageOptions(UnitSystem.US, ProjectInfo.named("", LocalDate.of(2025, 3, 14)), 0));
        String all;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            all = String.join(" ", PdfText.pages(doc));
        }
        String text = all;
        assertAll(
                () -> assertTrue(Pattern.compile("start: column C-1 7\\.8[78] 13\\.1 ").matcher(text).find(),
                        "member sheet: D 7.88, L 13.1"),
                () -> assertTrue(Pattern.compile("B-F1 W18X50 start column C-1 7\\.8[78] 13\\.1 ").matcher(text).find(),
                        "reaction table: D 7.88, L 13.1"),
                () -> assertFalse(text.contains("7.875"), "no four-figure reaction"),
                () -> assertFalse(text.contains(" 7.9 "), "no one-decimal reaction"));
    }
}
