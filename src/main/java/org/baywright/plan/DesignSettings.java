package org.baywright.plan;

import java.util.List;

/**
 * The design basis of a plan.
 *
 * @param method "lrfd" or "asd"
 * @param fy yield stress, Pa
 * @param liveDeflection L/n limit under live load (0 = off)
 * @param totalDeflection L/n limit under total load (0 = off)
 * @param beamSeries nominal-depth series allowed for beams (empty = all)
 * @param girderSeries for girders (empty = all)
 * @param columnSeries for columns (default W14)
 * @param maxBeamDepth actual depth limit for beams and girders, m (0 = none)
 * @param spliceEvery column tiers: a splice every this many levels (default 2)
 * @param liveLoadReduction apply ASCE 7-16 §4.7 / §4.8
 * @param partitionAsDead carry the partition allowance as dead load instead of reducible live load
 * @param girderAreaDelivered for a girder's A_T use the area whose load it actually receives (true,
 *     the default and conservative) or half the bay on each side (false)
 * @param catalog catalog file, or empty for the built-in W shapes
 */
public record DesignSettings(String method, double fy, double liveDeflection, double totalDeflection,
        List<String> beamSeries, List<String> girderSeries, List<String> columnSeries, double maxBeamDepth,
        int spliceEvery, boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered,
        String catalog) {
    public DesignSettings {
        beamSeries = List.copyOf(beamSeries);
        girderSeries = List.copyOf(girderSeries);
        columnSeries = List.copyOf(columnSeries);
    }

    /** LRFD, 50 ksi, L/360 and L/240, any beam series, W14 columns spliced every two levels, reduction on. */
    public static DesignSettings defaults() {
        return new DesignSettings("lrfd", org.baywright.units.Units.KSI.toSi(50), 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, true,
                false, true, "");
    }
}
