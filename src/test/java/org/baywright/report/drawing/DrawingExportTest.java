package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DrawingExportTest {
    private static final DrawingOptions OPTS = DrawingOptions.defaults().withPaper(Paper.ISO_A3).withDpi(40);

    @TempDir
    Path dir;

    private static byte[] head(Path p, int n) throws Exception {
        return Arrays.copyOf(Files.readAllBytes(p), n);
    }

    @Test
    void theExtensionChoosesTheFormat() throws Exception {
        Path svg = dir.resolve("l2.svg");
        Path png = dir.resolve("l2.png");
        Path pdf = dir.resolve("L2.PDF");
        DrawingExport.write(DrawingSamples.small(), "Level 2", svg, OPTS);
        DrawingExport.write(DrawingSamples.small(), "Level 2", png, OPTS);
        DrawingExport.write(DrawingSamples.small(), "Level 2", pdf, OPTS);
        assertAll(
                () -> assertEquals(SvgRenderer.render(FramingPlanDrawing.of(DrawingSamples.small(), "Level 2", OPTS)),
                        Files.readString(svg, StandardCharsets.UTF_8)),
                () -> assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G'}, head(png, 4)),
                () -> assertArrayEquals("%PDF".getBytes(StandardCharsets.US_ASCII), head(pdf, 4)));
    }

    @Test
    void anUnknownExtensionIsRefusedBeforeAnythingIsWritten() {
        Path out = dir.resolve("plan.jpg");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DrawingExport.write(DrawingSamples.small(), "Level 2", out, OPTS));
        assertAll(
                () -> assertEquals("cannot tell the drawing format of \"" + out + "\": the file name must end in .svg, .png or"
                        + " .pdf", e.getMessage()),
                () -> assertFalse(Files.exists(out)));
        assertThrows(IllegalArgumentException.class, () -> DrawingExport.format(Path.of("plan")));
    }

    @Test
    void anUnknownLevelIsRefusedWithTheLevelsListed() {
        Path out = dir.resolve("x.svg");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DrawingExport.write(DrawingSamples.small(), "Level 7", out, OPTS));
        assertAll(
                () -> assertTrue(e.getMessage().contains("no level \"Level 7\""), e.getMessage()),
                () -> assertTrue(e.getMessage().endsWith("its levels are: Level 2, Roof"), e.getMessage()),
                () -> assertFalse(Files.exists(out)));
    }

    @Test
    void nullOptionsMeanTheDefaults() throws Exception {
        Path out = dir.resolve("d.svg");
        DrawingExport.write(DrawingSamples.small(), "Roof", out, null);
        String svg = Files.readString(out, StandardCharsets.UTF_8);
        assertAll(
                () -> assertTrue(svg.contains("width=\"914.4mm\""), "ARCH D for a US plan"),
                () -> assertTrue(svg.contains(">ROOF FRAMING PLAN<")));
    }
}
