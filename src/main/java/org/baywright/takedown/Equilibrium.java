package org.baywright.takedown;

/**
 * The equilibrium check of one load case: everything applied to the building against the sum of the
 * foundation reactions.
 *
 * @param loadCase "D", "L", "Lr", "S"
 * @param applied total applied load, N (area, line and point loads and every self-weight)
 * @param reactions sum of the foundation reactions, N
 */
public record Equilibrium(String loadCase, double applied, double reactions) {
    /** Relative tolerance of the check. */
    public static final double TOLERANCE = 1e-9;

    public boolean holds() {
        double scale = Math.max(Math.abs(applied), Math.abs(reactions));
        return scale == 0 || Math.abs(applied - reactions) <= TOLERANCE * scale;
    }
}
