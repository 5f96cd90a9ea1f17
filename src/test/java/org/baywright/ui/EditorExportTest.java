package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.baywright.report.Takeoff;
import org.baywright.report.workbook.TakeoffWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** File ▸ Export: the editor writes the same deliverables as {@code design --drawing/--report/--takeoff/--schedule}. */
class EditorExportTest {
    @Test
    void exportsEveryDeliverableOfTheOpenPlan(@TempDir Path dir) throws Exception {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(EditorModelTest.DEMO).opened());
        m.levelProperty().set("Level 3");
        Path svg = dir.resolve("level-3.svg");
        Path pdf = dir.resolve("calc.pdf");
        Path schedule = dir.resolve("columns.csv");
        m.exportDrawing(svg);
        m.exportPackage(pdf);
        m.exportSchedule(schedule);
        assertTrue(Files.readString(svg).contains("Level 3"), "the drawing is of the selected level");
        assertTrue(Files.size(pdf) > 100_000, "calculation package");
        assertTrue(Files.readString(schedule).startsWith("column,grid,position,level,section"));
    }

    @Test
    void aCsvTakeoffIsTheTidyTableWithItsTotalsBeside(@TempDir Path dir) throws Exception {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(EditorModelTest.DEMO).opened());
        Path csv = dir.resolve("takeoff.csv");
        List<Path> written = m.exportTakeoff(csv, 10);
        Path totals = dir.resolve("takeoff-totals.csv");
        assertEquals(List.of(csv, totals), written);
        Takeoff t = Takeoff.of(m.run(), 10);
        assertAll(
                () -> assertEquals(t.csv(m.units()), Files.readString(csv), "the same table as design --takeoff"),
                () -> assertTrue(Files.readString(csv).startsWith("section,level,kind,pieces,length[ft],weight[lb]")),
                () -> assertTrue(Files.readString(totals).contains("\nconnections and miscellaneous allowance,10.0,%\n"),
                        Files.readString(totals)));
    }

    @Test
    void anXlsxTakeoffIsAWorkbookWithASheetPerTable(@TempDir Path dir) throws Exception {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(EditorModelTest.DEMO).opened());
        Path xlsx = dir.resolve("takeoff.xlsx");
        assertEquals(List.of(xlsx), m.exportTakeoff(xlsx, 5));
        try (InputStream in = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            assertEquals(TakeoffWorkbook.SHEETS.size(), wb.getNumberOfSheets());
            for (int i = 0; i < wb.getNumberOfSheets(); i++) {
                assertEquals(TakeoffWorkbook.SHEETS.get(i), wb.getSheetName(i));
            }
            assertEquals(Takeoff.of(m.run(), 5).lines().size(), wb.getSheet("Items").getLastRowNum(), "a row per line under the header");
        }
        assertTrue(Files.list(dir).noneMatch(p -> p.getFileName().toString().endsWith(".csv")), "no CSV beside a workbook");
    }

    @Test
    void theTakeoffAllowanceIsAskedForAndRememberedPerUser(@TempDir Path dir) throws Exception {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertTrue(m.open(EditorModelTest.DEMO).opened());
        UserSettings settings = new UserSettings(dir.resolve("home/settings.properties"));
        TakeoffExport first = new TakeoffExport(m, settings);
        assertEquals("0", first.offeredAllowance(), "nothing remembered yet");
        first.write(dir.resolve("a.csv"), "7.5 %");
        assertTrue(Files.readString(dir.resolve("a-totals.csv")).contains("\nconnections and miscellaneous allowance,7.5,%\n"));
        // a later session (a new object on the same file) offers the last allowance used
        assertEquals("7.5", new TakeoffExport(m, new UserSettings(dir.resolve("home/settings.properties"))).offeredAllowance());
        assertAll(
                () -> assertEquals(0, TakeoffExport.allowance(" ")),
                () -> assertEquals(12, TakeoffExport.allowance("12%")),
                () -> assertThrows(IllegalArgumentException.class, () -> TakeoffExport.allowance("ten")),
                () -> assertThrows(IllegalArgumentException.class, () -> TakeoffExport.allowance("120")),
                () -> assertThrows(IllegalArgumentException.class, () -> first.write(dir.resolve("b.csv"), "-3")));
        assertTrue(Files.notExists(dir.resolve("b.csv")), "a refused allowance writes nothing");
        assertEquals("7.5", first.offeredAllowance(), "a refused allowance is not remembered");
    }

    @Test
    void theSettingsFileFollowsTheTestHome() {
        // surefire moves the recent-files list under target/test-home; the settings go beside it
        Path recent = Path.of(System.getProperty(RecentFiles.PROPERTY));
        assertEquals(recent.toAbsolutePath().resolveSibling("settings.properties"), UserSettings.standard().file());
    }

    @Test
    void nothingToExportBeforeAPlanIsDesigned(@TempDir Path dir) {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertThrows(IllegalStateException.class, () -> m.exportSchedule(dir.resolve("x.csv")));
        assertThrows(IllegalStateException.class, () -> m.exportTakeoff(dir.resolve("x.csv"), 0));
    }
}
