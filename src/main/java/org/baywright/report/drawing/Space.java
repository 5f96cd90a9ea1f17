package org.baywright.report.drawing;

/** The coordinate space of a primitive's positions. */
public enum Space {
    /** Plan metres, mapped onto the paper by the drawing's viewport. */
    PLAN,
    /** Paper millimetres from the sheet's lower-left corner, y up (title block, legend, notes). */
    PAPER
}
