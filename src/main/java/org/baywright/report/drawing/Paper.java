package org.baywright.report.drawing;

import java.util.Locale;

/** Sheet sizes, always landscape, with the text height the sheet is lettered at. */
public enum Paper {
    /** ARCH D, 36 × 24 in. */
    ARCH_D("ARCH D", 914.4, 609.6, 2.5),
    /** ARCH C, 24 × 18 in. */
    ARCH_C("ARCH C", 609.6, 457.2, 2.2),
    /** ANSI B (tabloid), 17 × 11 in. */
    ANSI_B("ANSI B", 431.8, 279.4, 1.8),
    /** ISO A1, 841 × 594 mm. */
    ISO_A1("ISO A1", 841, 594, 2.5),
    /** ISO A2, 594 × 420 mm. */
    ISO_A2("ISO A2", 594, 420, 2.2),
    /** ISO A3, 420 × 297 mm. */
    ISO_A3("ISO A3", 420, 297, 1.8);

    private final String label;
    private final double width;
    private final double height;
    private final double textSize;

    Paper(String label, double width, double height, double textSize) {
        this.label = label;
        this.width = width;
        this.height = height;
        this.textSize = textSize;
    }

    /** As printed, e.g. "ARCH D". */
    public String label() {
        return label;
    }

    /** Landscape width, mm. */
    public double width() {
        return width;
    }

    /** Landscape height, mm. */
    public double height() {
        return height;
    }

    /** The basic lettering height of the sheet (member sizes), mm. */
    public double textSize() {
        return textSize;
    }

    /** Parses "arch-d", "ARCH D", "a1", "iso-a3", "ansi-b", "tabloid"… (any case); null otherwise. */
    public static Paper parse(String text) {
        if (text == null) {
            return null;
        }
        String t = text.trim().toLowerCase(Locale.ROOT).replace(" ", "").replace("-", "").replace("_", "");
        return switch (t) {
            case "archd", "d" -> ARCH_D;
            case "archc", "c" -> ARCH_C;
            case "ansib", "b", "tabloid", "ledger", "11x17" -> ANSI_B;
            case "isoa1", "a1" -> ISO_A1;
            case "isoa2", "a2" -> ISO_A2;
            case "isoa3", "a3" -> ISO_A3;
            default -> null;
        };
    }
}
