package org.baywright.ui;

import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.baywright.plan.GridLine;
import org.baywright.plan.LiveLoadUse;

/**
 * The options of the drawing tools, as the user typed them (text in the plan's units; read with
 * {@link ToolValues} when a tool acts). Blank fields mean zero.
 */
public final class ToolSettings {
    /** Grid: bay spacings west to east (lettered lines). */
    public final StringProperty gridX = new SimpleStringProperty(this, "gridX", "");
    /** Grid: bay spacings south to north (numbered lines). */
    public final StringProperty gridY = new SimpleStringProperty(this, "gridY", "");
    /** Grid: put a column at every new intersection. */
    public final BooleanProperty gridColumns = new SimpleBooleanProperty(this, "gridColumns", true);
    /** Infill: a largest spacing ("10ft") or a number of beams ("3"). */
    public final StringProperty infill = new SimpleStringProperty(this, "infill", "10ft");
    /** Infill: the direction the beams span. */
    public final ObjectProperty<GridLine.Axis> infillDirection = new SimpleObjectProperty<>(this, "infillDirection",
            GridLine.Axis.Y);
    /** Load area: superimposed dead load. */
    public final StringProperty areaSd = new SimpleStringProperty(this, "areaSd", "");
    /** Load area: live (or, on a roof, roof live) load. */
    public final StringProperty areaLive = new SimpleStringProperty(this, "areaLive", "100psf");
    /** Load area: the use, for live-load reduction. */
    public final ObjectProperty<LiveLoadUse> areaUse = new SimpleObjectProperty<>(this, "areaUse", LiveLoadUse.ORDINARY);
    /** Line load: dead load per length. */
    public final StringProperty lineDead = new SimpleStringProperty(this, "lineDead", "0.5klf");
    /** Line load: live load per length. */
    public final StringProperty lineLive = new SimpleStringProperty(this, "lineLive", "");
    /** Point load: dead load. */
    public final StringProperty pointDead = new SimpleStringProperty(this, "pointDead", "5kip");
    /** Point load: live load. */
    public final StringProperty pointLive = new SimpleStringProperty(this, "pointLive", "");

    /**
     * Puts the untouched defaults in the plan's units: a value the user typed stays as typed (both unit
     * systems are read either way).
     */
    public void defaultsFor(org.baywright.units.UnitSystem us) {
        boolean si = us == org.baywright.units.UnitSystem.SI;
        swap(infill, "10ft", "3m", si);
        swap(areaLive, "100psf", "5kPa", si);
        swap(lineDead, "0.5klf", "7kN/m", si);
        swap(pointDead, "5kip", "20kN", si);
    }

    private static void swap(StringProperty p, String us, String si, boolean toSi) {
        if (toSi && us.equals(p.get())) {
            p.set(si);
        } else if (!toSi && si.equals(p.get())) {
            p.set(us);
        }
    }
}
