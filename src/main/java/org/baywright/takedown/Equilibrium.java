package org.baywright.takedown;

/**
 * The equilibrium check of one load case: everything applied to the building against the sum of the
 * foundation reactions.
 *
 * @param loadCase "D", "L", "Lr", "S"
 * @param applied total applied load, N (area, line and point loads and every self-weight)
 * @param reactions sum of the foundation reactions, N
 * @param slack the part of a difference owed to the geometry's grid, N: line load paths are snapped
 *     to the grid of the tributary analysis ({@link Takedown#GRID}), which may lengthen or shorten
 *     each segment by about a grid step, so the load delivered may differ from the load applied
 *     by the load per length times a few grid steps per path point
 */
public record Equilibrium(String loadCase, double applied, double reactions, double slack) {
    /**
     * Relative tolerance of the check: one part per million. The deck load reaches the members through
     * tributary polygons and is applied through the area loads' own overlay, two computations on the
     * 1 µm grid of the geometry; where members coincide or an opening grazes a slab edge they differ by
     * up to about 1e-8 of the load (found by the plan fuzz test: 1.45e-8 of D on a 3 m bay, 0.0003 N).
     * Lost load worth reporting is many orders above this.
     */
    public static final double TOLERANCE = 1e-6;
    /**
     * An absolute floor under the relative tolerance, N: a millinewton. It guards load cases of a few
     * millinewtons (the fuzz test once drew a 0.01 Pa live load, about 0.002 N), where one part per
     * million is below the rounding of the file and of the overlays.
     */
    public static final double FLOOR = 1e-3;

    /** A check with no geometric slack. */
    public Equilibrium(String loadCase, double applied, double reactions) {
        this(loadCase, applied, reactions, 0);
    }

    public boolean holds() {
        double scale = Math.max(Math.abs(applied), Math.abs(reactions));
        return scale == 0 || Math.abs(applied - reactions) <= TOLERANCE * scale + FLOOR + slack;
    }
}
