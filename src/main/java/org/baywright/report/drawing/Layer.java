package org.baywright.report.drawing;

/** Drawing layers, in drawing order (earlier layers are drawn first, underneath). */
public enum Layer {
    GRID("grid"),
    SLAB("slab-edge"),
    AREA_LOADS("area-loads"),
    OPENINGS("openings"),
    MEMBERS("members"),
    DECKS("deck-spans"),
    LOADS("line-and-point-loads"),
    COLUMNS("columns"),
    MEMBER_LABELS("member-labels"),
    /** The floor-vibration result of each bay (optional: {@link DrawingOptions#bays()}). */
    BAYS("bay-vibration"),
    DIMENSIONS("dimensions"),
    TAGS("tags"),
    SHEET("sheet"),
    LEGEND("legend"),
    NOTES("notes"),
    TITLE_BLOCK("title-block");

    private final String id;

    Layer(String id) {
        this.id = id;
    }

    /** The layer's name as written into files (an SVG group id). */
    public String id() {
        return id;
    }
}
