package org.baywright.report.workbook;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.baywright.calc.Caution;
import org.baywright.report.Takeoff;
import org.baywright.units.UnitSystem;

/**
 * The steel takeoff as an Office Open XML workbook (.xlsx), one sheet per table: the tidy table (size ×
 * level × kind), by size, by level, by kind, and the totals with the caution. Numbers are number cells
 * (weights whole, lengths to 0.01 ft or 0.001 m), headers carry their units, the header row is frozen
 * and filtered, so an estimator can sort, filter and pivot at once. A run with composite members adds
 * studs and camber to the items and the studs, cambered pieces and weight without composite action to
 * the totals.
 *
 * <p>The format is written by Apache POI; this class only lays the tables out.
 */
public final class TakeoffWorkbook {
    /** The sheet names, in order. */
    public static final List<String> SHEETS = List.of("Items", "By size", "By level", "By kind", "Totals");

    private TakeoffWorkbook() {
    }

    /** Writes the workbook to {@code file}, through a temporary file so a failed write leaves no half file. */
    public static void write(Takeoff t, UnitSystem us, String title, Path file) throws IOException {
        Path tmp = file.toAbsolutePath().resolveSibling("." + file.getFileName() + ".tmp-" + ProcessHandle.current().pid());
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                write(t, us, title, out);
            }
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** Writes the workbook to a stream (left open). */
    public static void write(Takeoff t, UnitSystem us, String title, OutputStream out) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            Styles st = new Styles(wb, us);
            String lu = unit(us.length().symbol());
            String wu = Takeoff.weightUnit(us);

            Sheet items = wb.createSheet(SHEETS.get(0));
            boolean comp = t.composite();
            String cu = unit(us.smallLength().symbol());
            if (comp) {
                header(items, st, "Section", "Level", "Kind", "Pieces", "Length [" + lu + "]", "Weight [" + wu + "]", "Studs",
                        "Camber [" + cu + "]");
            } else {
                header(items, st, "Section", "Level", "Kind", "Pieces", "Length [" + lu + "]", "Weight [" + wu + "]");
            }
            int r = 1;
            for (Takeoff.Line l : t.lines()) {
                Row row = items.createRow(r++);
                text(row, 0, l.section());
                text(row, 1, l.level());
                text(row, 2, l.kind());
                number(row, 3, l.pieces(), st.count);
                number(row, 4, us.length().fromSi(l.length()), st.length);
                number(row, 5, Takeoff.weightIn(l.weight(), us), st.weight);
                if (comp) {
                    number(row, 6, l.studs(), st.count);
                    number(row, 7, us.smallLength().fromSi(l.camber()), st.decimal);
                }
            }
            finish(items, comp ? 8 : 6, r);

            groupSheet(wb.createSheet(SHEETS.get(1)), st, "Section", t.bySection(), us, lu, wu);
            groupSheet(wb.createSheet(SHEETS.get(2)), st, "Level", t.byLevel(), us, lu, wu);
            groupSheet(wb.createSheet(SHEETS.get(3)), st, "Kind", t.byKind(), us, lu, wu);

            Sheet totals = wb.createSheet(SHEETS.get(4));
            header(totals, st, "Quantity", "Value", "Unit");
            r = 1;
            for (Takeoff.Total x : t.totals(us)) {
                Row row = totals.createRow(r++);
                text(row, 0, x.quantity());
                boolean whole = x.value().indexOf('.') < 0;
                number(row, 1, x.number(), whole ? st.weight : st.decimal);
                text(row, 2, x.unit());
            }
            r++;
            text(totals.createRow(r++), 0, title);
            Row caution = totals.createRow(r);
            Cell c = caution.createCell(0);
            c.setCellValue(Caution.TEXT);
            c.setCellStyle(st.wrap);
            totals.addMergedRegion(new CellRangeAddress(r, r, 0, 2));
            caution.setHeightInPoints(60);
            finish(totals, 3, 1 + t.totals(us).size());
            totals.setColumnWidth(0, Math.max(totals.getColumnWidth(0), 40 * 256));
            wb.write(out);
        }
    }

    private static void groupSheet(Sheet s, Styles st, String what, List<Takeoff.Row> rows, UnitSystem us, String lu,
            String wu) {
        header(s, st, what, "Pieces", "Length [" + lu + "]", "Weight [" + wu + "]");
        int r = 1;
        for (Takeoff.Row x : rows) {
            Row row = s.createRow(r++);
            text(row, 0, x.item());
            number(row, 1, x.count(), st.count);
            number(row, 2, us.length().fromSi(x.length()), st.length);
            number(row, 3, Takeoff.weightIn(x.weight(), us), st.weight);
        }
        finish(s, 4, r);
    }

    private static void header(Sheet s, Styles st, String... names) {
        Row row = s.createRow(0);
        for (int i = 0; i < names.length; i++) {
            Cell c = row.createCell(i);
            c.setCellValue(names[i]);
            c.setCellStyle(st.header);
        }
    }

    private static void finish(Sheet s, int columns, int rows) {
        s.createFreezePane(0, 1);
        if (rows > 1) {
            s.setAutoFilter(new CellRangeAddress(0, rows - 1, 0, columns - 1));
        }
        for (int i = 0; i < columns; i++) {
            s.setColumnWidth(i, 16 * 256);
        }
    }

    private static void text(Row row, int col, String v) {
        row.createCell(col).setCellValue(v);
    }

    private static void number(Row row, int col, double v, CellStyle style) {
        Cell c = row.createCell(col);
        c.setCellValue(v);
        c.setCellStyle(style);
    }

    private static String unit(String symbol) {
        return symbol.replace("²", "2");
    }

    /** The few cell styles, made once per workbook (a workbook holds a limited number of styles). */
    private static final class Styles {
        final CellStyle header;
        final CellStyle count;
        final CellStyle length;
        final CellStyle weight;
        final CellStyle decimal;
        final CellStyle wrap;

        Styles(XSSFWorkbook wb, UnitSystem us) {
            Font bold = wb.createFont();
            bold.setBold(true);
            header = wb.createCellStyle();
            header.setFont(bold);
            var format = wb.createDataFormat();
            count = wb.createCellStyle();
            count.setDataFormat(format.getFormat("0"));
            length = wb.createCellStyle();
            length.setDataFormat(format.getFormat(us == UnitSystem.US ? "#,##0.00" : "#,##0.000"));
            weight = wb.createCellStyle();
            weight.setDataFormat(format.getFormat("#,##0"));
            decimal = wb.createCellStyle();
            decimal.setDataFormat(format.getFormat("#,##0.00"));
            wrap = wb.createCellStyle();
            wrap.setWrapText(true);
        }
    }
}
