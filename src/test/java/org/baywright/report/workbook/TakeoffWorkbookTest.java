package org.baywright.report.workbook;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.baywright.calc.Caution;
import org.baywright.io.PlanFiles;
import org.baywright.report.Takeoff;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The takeoff workbook read back with Apache POI: the sheets, the tidy table as numbers, the totals and the caution. */
class TakeoffWorkbookTest {
    private static RunResult run;

    @BeforeAll
    static void demo() {
        run = PlanRun.run(PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow());
    }

    @Test
    void oneSheetPerTableWithNumberCells() throws Exception {
        Takeoff t = Takeoff.of(run, 10);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        TakeoffWorkbook.write(t, UnitSystem.US, "Harbourview", out);
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()))) {
            List<String> names = new ArrayList<>();
            wb.forEach(s -> names.add(s.getSheetName()));
            assertEquals(TakeoffWorkbook.SHEETS, names);
            Sheet items = wb.getSheet("Items");
            assertEquals(List.of("Section", "Level", "Kind", "Pieces", "Length [ft]", "Weight [lb]"), texts(items.getRow(0), 6));
            assertEquals(t.lines().size(), items.getLastRowNum());
            double pounds = 0;
            int pieces = 0;
            for (int r = 1; r <= items.getLastRowNum(); r++) {
                pounds += items.getRow(r).getCell(5).getNumericCellValue();
                pieces += (int) items.getRow(r).getCell(3).getNumericCellValue();
            }
            double lb = t.total() / Units.NEWTONS_PER_POUND;
            double sum = pounds;
            int count = pieces;
            Sheet bySize = wb.getSheet("By size");
            Sheet totals = wb.getSheet("Totals");
            StringBuilder all = new StringBuilder();
            totals.forEach(row -> row.forEach(c -> all.append(c.toString()).append(' ')));
            assertAll(
                    () -> assertEquals(lb, sum, 1e-6 * lb, "the weights are numbers that add up to the total"),
                    () -> assertEquals(t.pieces(), count),
                    () -> assertEquals(t.bySection().size(), bySize.getLastRowNum()),
                    () -> assertEquals(1, items.getPaneInformation().getHorizontalSplitPosition(),
                            "the header row is frozen"),
                    () -> assertTrue(all.toString().contains("total with allowance"), all::toString),
                    () -> assertTrue(all.toString().contains(Caution.TEXT), "the caution is in the workbook"));
        }
    }

    @Test
    void writesThroughATemporaryFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("takeoff.xlsx");
        TakeoffWorkbook.write(Takeoff.of(run, 0), UnitSystem.SI, "Harbourview", file);
        try (var files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList(), "only the workbook is left");
        }
        try (XSSFWorkbook wb = new XSSFWorkbook(Files.newInputStream(file))) {
            assertEquals("Weight [kg]", wb.getSheet("Items").getRow(0).getCell(5).getStringCellValue());
        }
    }

    /** A run with composite members (AISC DE V15 Example I.1 beams, 46 studs, 2 in camber) adds studs and camber columns. */
    @Test
    void compositeRunsListStudsAndCamber() throws Exception {
        Takeoff t = Takeoff.of(org.baywright.report.CompositeRuns.mixed(), 0);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        TakeoffWorkbook.write(t, UnitSystem.US, "Example I.1", out);
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()))) {
            Sheet items = wb.getSheet("Items");
            int studs = 0;
            for (int r = 1; r <= items.getLastRowNum(); r++) {
                studs += (int) items.getRow(r).getCell(6).getNumericCellValue();
            }
            int sum = studs;
            StringBuilder all = new StringBuilder();
            wb.getSheet("Totals").forEach(row -> row.forEach(c -> all.append(c.toString()).append(' ')));
            assertAll("composite workbook",
                    () -> assertEquals(List.of("Section", "Level", "Kind", "Pieces", "Length [ft]", "Weight [lb]", "Studs", "Camber [in]"),
                            texts(items.getRow(0), 8)),
                    () -> assertEquals(92, sum, "46 studs on each of two beams"),
                    () -> assertTrue(all.toString().contains("headed studs 92.0"), all.toString()),
                    () -> assertTrue(all.toString().contains("cambered pieces 2.0"), all.toString()));
        }
    }

    private static List<String> texts(Row row, int n) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(row.getCell(i).getStringCellValue());
        }
        return out;
    }
}
