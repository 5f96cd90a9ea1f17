package org.baywright.ui;

import java.util.List;
import org.baywright.units.UnitSystem;

/**
 * The New dialog's fields read as a new plan's settings: a name (blank: "New building"), the unit
 * system, the number of typical levels (1 to {@value #MAX_LEVELS}) and the storey height (a bare number
 * is in the chosen units). Plain code, no toolkit.
 */
public final class NewPlanForm {
    /** The unit choices as the dialog lists them. */
    public static final String US = "US customary";
    public static final String SI = "SI";
    public static final List<String> UNIT_CHOICES = List.of(US, SI);
    static final int MAX_LEVELS = 200;
    static final String DEFAULT_NAME = "New building";

    private NewPlanForm() {
    }

    /** A new plan's settings, read and checked; the storey height in metres. */
    public record NewPlan(String name, UnitSystem units, int levels, double storeyHeight) {
    }

    /** The unit choice that stands for a unit system. */
    public static String unitChoice(UnitSystem us) {
        return us == UnitSystem.SI ? SI : US;
    }

    /** The storey height the dialog starts with: 13 ft in a US plan, 4 m in an SI plan. */
    public static String defaultStorey(UnitSystem us) {
        return us == UnitSystem.SI ? "4m" : "13ft";
    }

    /**
     * Reads the fields.
     *
     * @throws IllegalArgumentException naming the field that is wrong
     */
    public static NewPlan read(String name, String units, String levelCount, String storey) {
        UnitSystem us = SI.equals(units) ? UnitSystem.SI : UnitSystem.US;
        int n;
        try {
            n = Integer.parseInt(levelCount == null ? "" : levelCount.trim());
        } catch (NumberFormatException x) {
            n = -1;
        }
        if (n < 1 || n > MAX_LEVELS) {
            throw new IllegalArgumentException("Levels: \"" + levelCount + "\" is not a whole number from 1 to " + MAX_LEVELS);
        }
        double h = ToolValues.length("storey height", storey, us);
        return new NewPlan(name == null || name.isBlank() ? DEFAULT_NAME : name.trim(), us, n, h);
    }
}
