package org.baywright.takedown;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;

/**
 * The weight of the slabs a floor's decks describe, as area loads over those decks: each slab's weight
 * (from its geometry, or the user's value) as dead load in place before the concrete hardens
 * ({@link Component#D_WET}), with the floor's construction live load ({@link Component#CONSTRUCTION})
 * over the same area. A deck without a slab described adds nothing: its slab is whatever dead load the
 * area loads give.
 */
final class SlabLoads {
    /** Marks the id of a slab's area load; a plan's own ids may not use it (two characters no reader accepts in an id). */
    static final String SUFFIX = " \u00b7slab";

    private SlabLoads() {
    }

    /** The area-load id of the slab on deck {@code d}. */
    static String id(Deck d) {
        return d.id() + SUFFIX;
    }

    /** The components of each slab's area load, by its id (empty when no deck describes a slab). */
    static Map<String, double[]> components(Floor f) {
        Map<String, double[]> out = new LinkedHashMap<>();
        for (Deck d : f.decks()) {
            if (d.slab() != null) {
                double[] q = new double[Component.values().length];
                q[Component.D_WET.ordinal()] = SlabDesign.weight(d.slab());
                q[Component.CONSTRUCTION.ordinal()] = f.composite().constructionLive();
                out.put(id(d), q);
            }
        }
        return out;
    }

    /** The floor with one area load over each deck that describes its slab (the floor itself when none does). */
    static Floor withSlabs(Floor f) {
        if (!f.hasSlab()) {
            return f;
        }
        List<AreaLoad> loads = new ArrayList<>(f.areaLoads());
        for (Deck d : f.decks()) {
            if (d.slab() != null) {
                loads.add(new AreaLoad(id(d), d.outline(), new LoadValues(SlabDesign.weight(d.slab()), 0, 0, 0, 0, 0),
                        LiveLoadUse.ORDINARY));
            }
        }
        return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(), loads,
                f.lineLoads(), f.pointLoads(), f.composite());
    }
}
