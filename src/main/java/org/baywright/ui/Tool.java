package org.baywright.ui;

import java.util.Locale;
import javafx.scene.input.KeyCode;

/** The canvas tools, in tool-bar order, with their one-key shortcuts and what they do. */
public enum Tool {
    SELECT("Select", KeyCode.S, "Click to select, Shift-click to add, drag on empty plan to box-select, drag a selection"
            + " to move it, drag a grid line to move it; Delete removes the selection."),
    GRID("Grid", KeyCode.G, "Type bay spacings in the tool options (e.g. 3@30ft or 25'-6\" 30' 30') and press Apply,"
            + " or drag across the plan to add a grid line where the drag starts (a vertical drag adds a lettered line)."),
    GIRDER("Girder", KeyCode.R, "Drag from one support to another (or click both ends) to add a girder."),
    BEAM("Beam", KeyCode.B, "Drag between supports (or click both ends) to add a beam."),
    INFILL("Infill", KeyCode.I, "Click a bay to fill it with beams at the spacing or count in the tool options;"
            + " the direction button turns them."),
    COLUMN("Column", KeyCode.C, "Click a grid intersection (or any point) to add a column."),
    DECK("Deck", KeyCode.K, "Click a deck area to see and edit its slab in Properties; click it again to turn its span by 90°, or drag inside it"
            + " to set the span direction."),
    LOAD_AREA("Load area", KeyCode.A, "Drag a rectangle, or click the corners and click the first one (or press Enter)"
            + " to close the outline; the values come from the tool options."),
    OPENING("Opening", KeyCode.O, "Drag a rectangle, or click the corners and click the first one (or press Enter) to"
            + " close the outline."),
    LINE_LOAD("Line load", KeyCode.L, "Click the points of the path; double-click or press Enter to finish."),
    POINT_LOAD("Point load", KeyCode.P, "Click where the load acts; the values come from the tool options."),
    MEASURE("Measure", KeyCode.M, "Drag between two points to read the distance.");

    private final String label;
    private final KeyCode key;
    private final String hint;

    Tool(String label, KeyCode key, String hint) {
        this.label = label;
        this.key = key;
        this.hint = hint;
    }

    public String label() {
        return label;
    }

    /** The key that picks this tool (no modifier). */
    public KeyCode key() {
        return key;
    }

    public String hint() {
        return hint;
    }

    /** The node id of the tool's button, e.g. {@code tool-load-area}. */
    public String buttonId() {
        return "tool-" + label.toLowerCase(Locale.ROOT).replace(' ', '-');
    }

    /** Whether the tool places points (and so shows the snap marker). */
    public boolean snaps() {
        return this != SELECT && this != INFILL && this != DECK;
    }
}
