package org.baywright.report.drawing;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.baywright.run.RunResult;

/** Writes a level's framing plan to a file, the format chosen by the file name's extension. */
public final class DrawingExport {
    private DrawingExport() {
    }

    /** The formats, by file name extension. */
    public enum Format {
        SVG, PNG, PDF
    }

    /**
     * Draws a level of a run and writes it as SVG, PNG or PDF according to {@code out}'s extension.
     *
     * @throws IllegalArgumentException for an extension other than .svg, .png or .pdf, or a level the
     *     plan does not have (the message lists its levels)
     * @throws IOException when the file cannot be written
     */
    public static void write(RunResult run, String levelName, Path out, DrawingOptions opts) throws IOException {
        Format format = format(out);
        DrawingOptions o = opts == null ? DrawingOptions.defaults() : opts;
        FramingPlanDrawing d = FramingPlanDrawing.of(run, levelName, o);
        switch (format) {
            case SVG -> SvgRenderer.write(d, out);
            case PNG -> PngRenderer.write(d, o.dpi(), out);
            case PDF -> PdfRenderer.write(d, out);
            default -> throw new IllegalStateException(format.name());
        }
    }

    /** The format a file name asks for. */
    public static Format format(Path out) {
        Path name = out.getFileName();
        String n = name == null ? "" : name.toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".svg")) {
            return Format.SVG;
        }
        if (n.endsWith(".png")) {
            return Format.PNG;
        }
        if (n.endsWith(".pdf")) {
            return Format.PDF;
        }
        throw new IllegalArgumentException("cannot tell the drawing format of \"" + out + "\": the file name must end in"
                + " .svg, .png or .pdf");
    }
}
