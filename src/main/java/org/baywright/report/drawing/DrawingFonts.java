package org.baywright.report.drawing;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The drawing font, DejaVu Sans (regular and bold), shipped in {@code src/main/resources/fonts/} with its
 * licence ({@code DejaVu-LICENSE.txt}). Every renderer and the text measurement use these files, so a
 * label measured by the model is the label drawn.
 */
public final class DrawingFonts {
    static final String REGULAR = "/fonts/DejaVuSans.ttf";
    static final String BOLD = "/fonts/DejaVuSans-Bold.ttf";
    /** The font family written into SVG files, with fallbacks for viewers without DejaVu. */
    static final String SVG_FAMILY = "'DejaVu Sans', Verdana, Arial, sans-serif";

    private static byte[] regular;
    private static byte[] bold;

    private DrawingFonts() {
    }

    /** The bytes of the TrueType file. */
    public static synchronized byte[] bytes(boolean isBold) {
        if (isBold) {
            if (bold == null) {
                bold = read(BOLD);
            }
            return bold;
        }
        if (regular == null) {
            regular = read(REGULAR);
        }
        return regular;
    }

    private static byte[] read(String resource) {
        try (InputStream in = DrawingFonts.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the drawing font " + resource + " is missing from the classpath");
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the drawing font " + resource, e);
        }
    }
}
