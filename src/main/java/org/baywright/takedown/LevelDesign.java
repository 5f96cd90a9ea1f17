package org.baywright.takedown;

import org.baywright.plan.Floor;
import org.baywright.plan.Level;

/**
 * A level with its floor layout and that layout's design.
 *
 * @param floor the layout, or null when the level names one the plan does not have
 * @param design the layout's design, or null with no layout
 */
public record LevelDesign(Level level, Floor floor, FloorDesign design) {
}
