package org.baywright.ui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.baywright.calc.CalcFormat;

/**
 * File › Export › Takeoff without its dialogs: the connection allowance the export asks for (the last
 * one used, remembered per user in {@link UserSettings}), reading what was typed, and the write itself
 * ({@link EditorModel#exportTakeoff}: a workbook for {@code .xlsx}, otherwise the CSV table and its
 * totals file). No toolkit needed.
 */
final class TakeoffExport {
    private final EditorModel model;
    private final UserSettings settings;

    TakeoffExport(EditorModel model, UserSettings settings) {
        this.model = model;
        this.settings = settings;
    }

    /** The allowance to offer, as text: the last one used, or 0 the first time. */
    String offeredAllowance() {
        double v = settings.number(UserSettings.TAKEOFF_ALLOWANCE, 0);
        return v >= 0 && v <= 100 ? CalcFormat.sig(v) : "0";
    }

    /**
     * Reads a typed allowance, percent: a number from 0 to 100, a trailing "%" allowed, blank is 0.
     *
     * @throws IllegalArgumentException naming what is wrong
     */
    static double allowance(String typed) {
        String t = typed == null ? "" : typed.trim();
        if (t.endsWith("%")) {
            t = t.substring(0, t.length() - 1).trim();
        }
        if (t.isEmpty()) {
            return 0;
        }
        double v;
        try {
            v = Double.parseDouble(t.replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("the allowance must be a percentage such as 10, not \"" + typed.trim() + "\"");
        }
        if (!(v >= 0 && v <= 100)) {
            throw new IllegalArgumentException("the allowance must be a percentage from 0 to 100, not " + typed.trim());
        }
        return v;
    }

    /** Writes the takeoff with the typed allowance and remembers the allowance; returns the files written. */
    List<Path> write(Path out, String typedAllowance) throws IOException {
        double a = allowance(typedAllowance);
        List<Path> written = model.exportTakeoff(out, a);
        settings.put(UserSettings.TAKEOFF_ALLOWANCE, CalcFormat.sig(a));
        return written;
    }

    /** The status message after a write: the files and the allowance. */
    static String written(List<Path> files, String typedAllowance) {
        StringBuilder b = new StringBuilder("Wrote ");
        for (int i = 0; i < files.size(); i++) {
            b.append(i == 0 ? "" : " and ").append(files.get(i).getFileName());
        }
        return b.append(String.format(Locale.ROOT, " (allowance %s %%)", CalcFormat.sig(allowance(typedAllowance)))).toString();
    }
}
