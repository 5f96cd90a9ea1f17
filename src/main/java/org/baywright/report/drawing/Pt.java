package org.baywright.report.drawing;

/** A point of the drawing: metres in plan space, millimetres in paper space; y is up in both. */
public record Pt(double x, double y) {
    public Pt plus(double dx, double dy) {
        return new Pt(x + dx, y + dy);
    }
}
