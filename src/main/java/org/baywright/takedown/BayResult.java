package org.baywright.takedown;

import java.util.List;
import org.baywright.calc.Calc;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.plan.Slab;
import org.baywright.plan.VibrationSettings;

/**
 * The floor-vibration check from walking (AISC DG11 2nd ed.) of one bay of a floor layout, for every level
 * that uses the layout ({@link BayChecks}).
 *
 * @param bay the bay
 * @param levels the names of the levels using the layout, bottom first
 * @param slab the slab the bay carries, or null when none is described
 * @param superimposed the superimposed dead load at the bay's centre from the area loads [Pa]
 * @param settings the vibration settings the check used
 * @param girder the carrying member that governs (the interior one with the highest ratio), or null when not checked
 * @param inputs what the check was given and worked out before the walking check (null when not checked)
 * @param result the walking check (null when not checked)
 * @param note why the bay was not checked ("no slab described — not checked"), or empty
 */
public record BayResult(Bay bay, List<String> levels, Slab slab, double superimposed, VibrationSettings settings,
        String girder, BayChecks.Inputs inputs, VibrationResult result, String note) {

    /** Label of a bay that was not checked. */
    public static final String NOT_CHECKED = "not checked";

    public BayResult {
        levels = List.copyOf(levels);
        note = note == null ? "" : note;
    }

    /** True when the walking check was made. */
    public boolean checked() {
        return result != null;
    }

    /** "meets", "exceeds", "outside the method" or "not checked". */
    public String status() {
        return result == null ? NOT_CHECKED : result.status().label();
    }

    /** (a_p/g)/(a_o/g), NaN when not checked. */
    public double ratio() {
        return result == null ? Double.NaN : result.ratio();
    }

    /**
     * The calculation sheet of the check, from the same functions the run used: slab, loads, transformed
     * sections, then every step of the walking check; null when not checked.
     */
    public Calc calculation() {
        if (result == null) {
            return null;
        }
        Calc calc = new Calc();
        BayChecks.evaluate(this, girder, calc);
        return calc;
    }
}
