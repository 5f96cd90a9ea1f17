package org.baywright.plan;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

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
 * @param deflectionLiveReduced check deflection under the live load as reduced for strength (true) or
 *     unreduced (false, the default: common practice checks serviceability under unreduced live load)
 * @param roofCeilings what the members of each roof floor layout carry below them, by floor id (IBC Table
 *     1604.3 roof rows); a roof layout not listed takes {@link RoofCeiling#DEFAULT}
 * @param connectionEccentricity how far beyond the column face a beam or girder reaction acts, m: the column
 *     moment is the reaction times d/2 + this (a connection to a flange) or tw/2 + this (to the web); default
 *     3 in, common practice
 * @param composite the plan-wide rules of composite design (minimum degree, stud weight, camber)
 * @param vibration the inputs of the floor-vibration check (use, fit-out or damping, vibration live load)
 */
public record DesignSettings(String method, double fy, double liveDeflection, double totalDeflection,
        List<String> beamSeries, List<String> girderSeries, List<String> columnSeries, double maxBeamDepth,
        int spliceEvery, boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered,
        String catalog, boolean deflectionLiveReduced, Map<String, RoofCeiling> roofCeilings,
        double connectionEccentricity, CompositeRules composite, VibrationSettings vibration) {
    /** The default distance from the column face to a reaction: 3 in (common practice). */
    public static final double DEFAULT_CONNECTION_ECCENTRICITY = 3 * 0.0254;

    public DesignSettings {
        beamSeries = List.copyOf(beamSeries);
        girderSeries = List.copyOf(girderSeries);
        columnSeries = List.copyOf(columnSeries);
        roofCeilings = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(roofCeilings));
        composite = composite == null ? CompositeRules.DEFAULT : composite;
        vibration = vibration == null ? VibrationSettings.defaults() : vibration;
    }

    /** The settings with the default vibration inputs. */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog,
            boolean deflectionLiveReduced, Map<String, RoofCeiling> roofCeilings, double connectionEccentricity,
            CompositeRules composite) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings,
                connectionEccentricity, composite, null);
    }

    /** The same settings with other vibration inputs. */
    public DesignSettings withVibration(VibrationSettings v) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced,
                roofCeilings, connectionEccentricity, composite, v);
    }

    /** The settings with the default composite rules. */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog,
            boolean deflectionLiveReduced, Map<String, RoofCeiling> roofCeilings, double connectionEccentricity) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings,
                connectionEccentricity, CompositeRules.DEFAULT);
    }

    /** The same settings with other composite rules. */
    public DesignSettings withComposite(CompositeRules rules) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced,
                roofCeilings, connectionEccentricity, rules, vibration);
    }

    /** The settings with every roof at the default ceiling ({@link RoofCeiling#DEFAULT}). */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog,
            boolean deflectionLiveReduced) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, Map.of(),
                DEFAULT_CONNECTION_ECCENTRICITY);
    }

    /** The settings with these roof ceilings and the default connection eccentricity. */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog,
            boolean deflectionLiveReduced, Map<String, RoofCeiling> roofCeilings) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings,
                DEFAULT_CONNECTION_ECCENTRICITY);
    }

    /** The settings with every roof at the default ceiling and this connection eccentricity, m. */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog,
            boolean deflectionLiveReduced, double connectionEccentricity) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, Map.of(),
                connectionEccentricity);
    }

    /** What the members of roof floor layout {@code floorId} carry below them: as set, else the default. */
    public RoofCeiling roofCeiling(String floorId) {
        return roofCeilings.getOrDefault(floorId, RoofCeiling.DEFAULT);
    }

    /** The same settings with the ceiling under the members of roof floor layout {@code floorId}. */
    public DesignSettings withRoofCeiling(String floorId, RoofCeiling ceiling) {
        Map<String, RoofCeiling> m = new LinkedHashMap<>(roofCeilings);
        m.put(floorId, ceiling);
        return withRoofCeilings(m);
    }

    /** The same settings with these roof ceilings, by floor id. */
    public DesignSettings withRoofCeilings(Map<String, RoofCeiling> ceilings) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced,
                ceilings, connectionEccentricity, composite, vibration);
    }

    /** The settings with deflection checked under unreduced live load (the default). */
    public DesignSettings(String method, double fy, double liveDeflection, double totalDeflection, List<String> beamSeries,
            List<String> girderSeries, List<String> columnSeries, double maxBeamDepth, int spliceEvery,
            boolean liveLoadReduction, boolean partitionAsDead, boolean girderAreaDelivered, String catalog) {
        this(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, false);
    }

    /** LRFD, 50 ksi, L/360 and L/240, any beam series, W14 columns spliced every two levels, reduction on. */
    public static DesignSettings defaults() {
        return new DesignSettings("lrfd", org.baywright.units.Units.KSI.toSi(50), 360, 240, List.of(), List.of(), List.of("W14"), 0, 2, true,
                false, true, "");
    }

    /** The same settings with another design method ("lrfd" or "asd"). */
    public DesignSettings withMethod(String newMethod) {
        return new DesignSettings(newMethod, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with another yield stress, Pa. */
    public DesignSettings withFy(double newFy) {
        return new DesignSettings(method, newFy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with other deflection limits (span ratios, 0 = off). */
    public DesignSettings withDeflection(double live, double total) {
        return new DesignSettings(method, fy, live, total, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery,
                liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with other series allowed for beams and for girders (empty = all). */
    public DesignSettings withBeamSeries(List<String> beams, List<String> girders) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beams, girders, columnSeries, maxBeamDepth,
                spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with other series allowed for columns. */
    public DesignSettings withColumnSeries(List<String> series) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, series, maxBeamDepth,
                spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with another depth limit for beams and girders, m (0 = none). */
    public DesignSettings withMaxBeamDepth(double depth) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries, depth,
                spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with column splices every {@code levels} levels. */
    public DesignSettings withSpliceEvery(int levels) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, levels, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /**
     * The same settings with other live-load options.
     *
     * @param reduce apply ASCE 7-16 §4.7 / §4.8
     * @param partitionsAsDead carry the partition allowance as dead load
     * @param girderDelivered a girder's A_T is the area whose load it receives (else half the bay each side)
     */
    public DesignSettings withLiveLoad(boolean reduce, boolean partitionsAsDead, boolean girderDelivered) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, reduce, partitionsAsDead, girderDelivered, catalog, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /**
     * The same settings with deflection checked under reduced (true) or unreduced (false) live load.
     */
    public DesignSettings withDeflectionLiveReduced(boolean reduced) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, reduced, roofCeilings, connectionEccentricity, composite, vibration);
    }

    /** The same settings with another distance from the column face to a reaction, m. */
    public DesignSettings withConnectionEccentricity(double a) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, catalog, deflectionLiveReduced,
                roofCeilings, a, composite, vibration);
    }

    /** The same settings with another catalog file (empty: the built-in W shapes). */
    public DesignSettings withCatalog(String file) {
        return new DesignSettings(method, fy, liveDeflection, totalDeflection, beamSeries, girderSeries, columnSeries,
                maxBeamDepth, spliceEvery, liveLoadReduction, partitionAsDead, girderAreaDelivered, file, deflectionLiveReduced, roofCeilings, connectionEccentricity, composite, vibration);
    }
}
