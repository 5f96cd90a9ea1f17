package org.baywright.report.pdf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.baywright.plan.Level;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * No text of the calculation package runs off its page: a heading of a floor layout used on many
 * levels (found by a new user: "…(Level 2, Leve") wraps, and the running title in the page header is
 * shortened to fit beside the project name.
 */
class PageBoundsTest {
    @Test
    void everyGlyphIsInsideThePage(@TempDir Path dir) throws IOException {
        // an invented eight-storey building: one typical layout on seven levels with long names
        List<Double> storeys = java.util.Collections.nCopies(8, Units.FT_.toSi(13));
        Plan p = RegularPlan.generate(new RegularPlan.Spec("Bounds check tower with a rather long project name", "us",
                List.of(Units.FT_.toSi(30), Units.FT_.toSi(30)), List.of(Units.FT_.toSi(30)), storeys, true, Units.FT_.toSi(10),
                new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(10), Units.PSF.toSi(50), 0, 0, Units.PSF.toSi(15)),
                new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(15), 0, Units.PSF.toSi(20), 0, 0), LoadValues.ZERO));
        List<Level> renamed = new ArrayList<>();
        for (Level l : p.levels()) {
            renamed.add(new Level(l.name().replace("Level", "Office level"), l.elevation(), l.storeyHeight(), l.floor()));
        }
        Plan plan = new Plan(p.name(), p.units(), p.settings(), p.grid(), renamed, p.floors(), p.columns());
        Path pdf = dir.resolve("bounds.pdf");
        CalculationPackage.write(PlanRun.run(plan), pdf, new PackageOptions(UnitSystem.US,
                ProjectInfo.named(plan.name(), LocalDate.of(2026, 12, 2)), 0));
        List<String> outside = new ArrayList<>();
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper s = new PDFTextStripper() {
                @Override
                protected void writeString(String t, List<TextPosition> glyphs) throws IOException {
                    float w = getCurrentPage().getMediaBox().getWidth();
                    for (TextPosition g : glyphs) {
                        if (g.getXDirAdj() < 0 || g.getXDirAdj() + g.getWidthDirAdj() > w - 20) {
                            outside.add("page " + getCurrentPageNo() + ": \"" + t + "\"");
                            break;
                        }
                    }
                    super.writeString(t, glyphs);
                }
            };
            text = PdfText.fold(s.getText(doc));
        }
        assertEquals(List.of(), outside.stream().distinct().limit(10).toList(), "text beyond the page's 20 pt edge");
        assertTrue(text.contains("Office level 2, Office level 3, Office level 4, Office level 5, Office level 6, "
                + "Office level 7, Office level 8)"), "the whole heading is there, wrapped");
    }
}
