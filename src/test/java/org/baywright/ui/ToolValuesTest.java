package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.baywright.units.UnitParseException;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the tool options accept: the grid forms the issue names, bare numbers in the plan's units, blanks. */
class ToolValuesTest {
    private static final double FT = Units.FT_.toSi(1);

    @Test
    void gridSpacingsAsTyped() {
        assertAll(
                () -> assertEquals(List.of(30 * FT, 30 * FT, 30 * FT), ToolValues.spacings("x", "3@30'", UnitSystem.US)),
                () -> assertEquals(List.of(25.5 * FT, 30 * FT, 30 * FT), ToolValues.spacings("x", "25'-6\" 30' 30'", UnitSystem.US)),
                () -> assertEquals(List.of(30 * FT, 30 * FT), ToolValues.spacings("x", "2@30", UnitSystem.US), "bare: feet"),
                () -> assertEquals(List.of(9.0, 9.0, 7.5), ToolValues.spacings("x", "2@9 7.5", UnitSystem.SI), "bare: metres"),
                () -> assertEquals(List.of(9.0, 7.5), ToolValues.spacings("x", "9m, 7500mm", UnitSystem.US)));
        UnitParseException e = assertThrows(UnitParseException.class, () -> ToolValues.spacings("bays west–east", "3@thirty",
                UnitSystem.US));
        assertTrue(e.getMessage().startsWith("bays west–east: "), e.getMessage());
        assertThrows(UnitParseException.class, () -> ToolValues.spacings("x", "0@30ft", UnitSystem.US));
        assertThrows(UnitParseException.class, () -> ToolValues.spacings("x", "-30ft", UnitSystem.US));
    }

    @Test
    void infillIsACountOrASpacing() {
        assertEquals(new ToolValues.InfillSetting(3, 0), ToolValues.infill("3", UnitSystem.US));
        assertEquals(10 * FT, ToolValues.infill("10ft", UnitSystem.US).spacing(), 1e-12);
        assertThrows(UnitParseException.class, () -> ToolValues.infill("0", UnitSystem.US));
        assertThrows(UnitParseException.class, () -> ToolValues.infill("ten", UnitSystem.US));
    }

    @Test
    void untouchedDefaultsFollowThePlansUnitsAndTypedValuesStay() {
        ToolSettings s = new ToolSettings();
        s.areaLive.set("80psf");
        s.defaultsFor(UnitSystem.SI);
        assertEquals("3m", s.infill.get());
        assertEquals("80psf", s.areaLive.get(), "typed by the user: kept");
        s.defaultsFor(UnitSystem.US);
        assertEquals("10ft", s.infill.get());
    }

    @Test
    void loadsMayBeBlankButNotNegative() {
        ToolSettings s = new ToolSettings();
        s.areaSd.set("");
        s.areaLive.set("100");
        var floor = ToolValues.areaLoad(s, UnitSystem.US, false);
        assertEquals(100, Units.PSF.fromSi(floor.live()), 1e-9);
        assertEquals(0, floor.superimposed());
        var roof = ToolValues.areaLoad(s, UnitSystem.US, true);
        assertEquals(100, Units.PSF.fromSi(roof.roofLive()), 1e-9, "on a roof the live load is roof live load");
        s.pointDead.set("-5kip");
        assertThrows(UnitParseException.class, () -> ToolValues.pointLoad(s, UnitSystem.US));
    }

    @Test
    void recentFilesKeepTheNewestFirstAndSkipMissingFiles(@TempDir Path dir) throws Exception {
        RecentFiles r = new RecentFiles(dir.resolve("sub/recent.txt"));
        Path a = Files.writeString(dir.resolve("a.bay.json"), "{}");
        Path b = Files.writeString(dir.resolve("b.bay.json"), "{}");
        r.add(a);
        r.add(b);
        r.add(a);
        assertEquals(List.of(a.toAbsolutePath(), b.toAbsolutePath()), r.list());
        Files.delete(b);
        assertEquals(List.of(a.toAbsolutePath()), r.list());
        for (int i = 0; i < 12; i++) {
            r.add(Files.writeString(dir.resolve("p" + i + ".bay.json"), "{}"));
        }
        assertEquals(RecentFiles.KEPT, r.list().size());
    }
    @Test
    void theGridFieldShowsSpacingsThatReadBackAsTheGrid() {
        java.util.List<org.baywright.plan.GridLine> lines = new java.util.ArrayList<>();
        double[] offsets = {0, 30 * FT, 55.5 * FT, 55.5 * FT + Units.IN.toSi(3), 85.5 * FT + 0.01};
        for (int i = 0; i < offsets.length; i++) {
            lines.add(new org.baywright.plan.GridLine(String.valueOf((char) ('A' + i)), org.baywright.plan.GridLine.Axis.X, offsets[i]));
        }
        String us = ToolValues.spacingText(lines, UnitSystem.US);
        assertEquals("30' 25'-6\" 0'-3\" 29.7828ft", us);
        List<Double> back = ToolValues.spacings("x", us, UnitSystem.US);
        for (int i = 1; i < offsets.length; i++) {
            assertEquals(offsets[i] - offsets[i - 1], back.get(i - 1), 1e-4, "spacing " + i);
        }
        String si = ToolValues.spacingText(lines.subList(0, 2), UnitSystem.SI);
        assertEquals("9.144m", si);
        assertEquals("", ToolValues.spacingText(lines.subList(0, 1), UnitSystem.US));
    }
}
