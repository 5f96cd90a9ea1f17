package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
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
        Path takeoff = dir.resolve("takeoff.csv");
        Path schedule = dir.resolve("columns.csv");
        m.exportDrawing(svg);
        m.exportPackage(pdf);
        m.exportTakeoff(takeoff, 10);
        m.exportSchedule(schedule);
        assertTrue(Files.readString(svg).contains("Level 3"), "the drawing is of the selected level");
        assertTrue(Files.size(pdf) > 100_000, "calculation package");
        assertTrue(Files.readString(takeoff).startsWith("section,level,kind,pieces,length[ft],weight[lb]\n"));
        assertTrue(Files.readString(dir.resolve("takeoff-totals.csv")).contains("connections and miscellaneous allowance,10.0,%"),
                "the totals with the allowance beside the table");
        Path xlsx = dir.resolve("takeoff.xlsx");
        m.exportTakeoff(xlsx, 10);
        assertTrue(Files.size(xlsx) > 3_000, "the workbook");
        assertTrue(Files.readString(schedule).startsWith("column,grid,position,level,section"));
    }

    @Test
    void nothingToExportBeforeAPlanIsDesigned(@TempDir Path dir) {
        EditorModel m = new EditorModel(TaskRunner.direct());
        assertThrows(IllegalStateException.class, () -> m.exportSchedule(dir.resolve("x.csv")));
    }
}
