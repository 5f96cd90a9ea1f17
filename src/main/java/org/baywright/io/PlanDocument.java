package org.baywright.io;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import java.util.List;
import org.baywright.units.Dimension;

/**
 * The document objects of a plan file, one record per JSON object. They mirror the file exactly:
 * the record component names are the JSON keys, their order is the written key order, quantities are
 * the text the file holds ({@code "30ft"}), points are {@code [x, y]} pairs and polygons lists of
 * points. A {@code null} component means the key is absent (or {@code null}) in the file.
 *
 * <p>The shape check ({@link ShapeCheck}) derives the allowed keys, the required keys and the JSON
 * types from these records, so this file is the single list of the format's fields.
 */
final class PlanDocument {
    private PlanDocument() {
    }

    /** A key that must be present and not {@code null}. */
    @Retention(RetentionPolicy.RUNTIME)
    @Target(ElementType.RECORD_COMPONENT)
    @interface Required {
    }

    /** Text holding a quantity of this dimension (or points and polygons of such quantities). */
    @Retention(RetentionPolicy.RUNTIME)
    @Target(ElementType.RECORD_COMPONENT)
    @interface QuantityOf {
        Dimension value();
    }

    /** The whole file. {@code format} and {@code version} are checked before the rest. */
    record PlanDoc(String format, Integer version, String name, String notes, @Required String units, SettingsDoc settings,
            List<GridLineDoc> grid, List<LevelDoc> levels, List<FloorDoc> floors, List<ColumnDoc> columns) {
    }

    /** The design basis; every key is optional and defaults to {@code DesignSettings.defaults()}. */
    record SettingsDoc(String method, @QuantityOf(Dimension.STRESS) String fy, DeflectionDoc deflection, String deflectionLiveLoad,
            List<String> beamSeries, List<String> girderSeries, List<String> columnSeries,
            @JsonInclude(JsonInclude.Include.ALWAYS) @QuantityOf(Dimension.LENGTH) String maxBeamDepth,
            Integer spliceEvery, Boolean liveLoadReduction, String partition, String girderArea, String catalog,
            @QuantityOf(Dimension.LENGTH) String connectionEccentricity, CompositeRulesDoc composite, VibrationDoc vibration) {
    }

    /** The inputs of the floor-vibration check (AISC DG11); every key optional. */
    record VibrationDoc(String use, String fitOut, Double damping, @QuantityOf(Dimension.AREA_LOAD) String live) {
    }

    /** The plan-wide rules of composite design; every key optional. */
    record CompositeRulesDoc(Double minDegree, @QuantityOf(Dimension.FORCE) String studWeight, Boolean camber,
            Double camberShare, @QuantityOf(Dimension.FORCE) String camberAllowance) {
    }

    /** Deflection limits as span/deflection ratios; 0 switches a check off. */
    record DeflectionDoc(Double live, Double total) {
    }

    /** A grid line: a label and exactly one of {@code x} (a line of constant x) or {@code y}. */
    record GridLineDoc(@Required String label, @QuantityOf(Dimension.LENGTH) String x,
            @QuantityOf(Dimension.LENGTH) String y) {
    }

    record LevelDoc(@Required String name, @Required @QuantityOf(Dimension.LENGTH) String elevation,
            @Required @QuantityOf(Dimension.LENGTH) String storeyHeight, @Required String floor) {
    }

    record FloorDoc(@Required String id, String name, Boolean roof, String ceiling, CompositeFloorDoc composite,
            @Required @QuantityOf(Dimension.LENGTH) List<List<String>> slabEdge, List<DeckDoc> decks,
            List<MemberDoc> members, List<InfillDoc> infills, List<OpeningDoc> openings, List<AreaLoadDoc> areaLoads,
            List<LineLoadDoc> lineLoads, List<PointLoadDoc> pointLoads) {
    }

    record DeckDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<List<String>> outline,
            @Required Double spanAngle, @QuantityOf(Dimension.LENGTH) String maxSpan,
            @QuantityOf(Dimension.LENGTH) String maxOverhang, SlabDoc slab) {
    }

    /** How a floor's members work with its slab; absent: non-composite (bare steel). */
    record CompositeFloorDoc(@Required String action, String shoring,
            @QuantityOf(Dimension.AREA_LOAD) String constructionLive, String vibration) {
    }

    /** The slab a deck carries: profile, concrete, studs; {@code weight} overrides the computed weight. */
    record SlabDoc(@Required @QuantityOf(Dimension.LENGTH) String ribHeight, @QuantityOf(Dimension.LENGTH) String ribWidth,
            @QuantityOf(Dimension.LENGTH) String ribPitch, @QuantityOf(Dimension.AREA_LOAD) String deckWeight,
            @Required @QuantityOf(Dimension.LENGTH) String topping, @Required @QuantityOf(Dimension.UNIT_WEIGHT) String concrete,
            @Required @QuantityOf(Dimension.STRESS) String fc, @QuantityOf(Dimension.AREA_LOAD) String weight, StudsDoc studs) {
    }

    /** The headed studs; every key optional (¾ in, 65 ksi, one per rib, weak position). */
    record StudsDoc(@QuantityOf(Dimension.LENGTH) String diameter, @QuantityOf(Dimension.STRESS) String fu, Integer perRib,
            String position) {
    }

    record MemberDoc(@Required String id, @Required String kind,
            @Required @QuantityOf(Dimension.LENGTH) List<String> start,
            @Required @QuantityOf(Dimension.LENGTH) List<String> end, String section, Boolean composite, Integer studs) {
    }

    /** Infill beams of one bay: exactly one of {@code count} or {@code maxSpacing}. */
    record InfillDoc(@Required String id, @Required BayDoc bay, @Required String direction, Integer count,
            @QuantityOf(Dimension.LENGTH) String maxSpacing) {
    }

    /** A bay by its grid lines: two x-line labels and two y-line labels. */
    record BayDoc(@Required List<String> x, @Required List<String> y) {
    }

    record OpeningDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<List<String>> outline) {
    }

    record AreaLoadDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<List<String>> outline,
            @QuantityOf(Dimension.AREA_LOAD) String dead, @QuantityOf(Dimension.AREA_LOAD) String superimposed,
            @QuantityOf(Dimension.AREA_LOAD) String live, @QuantityOf(Dimension.AREA_LOAD) String roofLive,
            @QuantityOf(Dimension.AREA_LOAD) String snow, @QuantityOf(Dimension.AREA_LOAD) String partition,
            String use) {
    }

    record LineLoadDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<List<String>> path,
            @QuantityOf(Dimension.LINE_LOAD) String dead, @QuantityOf(Dimension.LINE_LOAD) String superimposed,
            @QuantityOf(Dimension.LINE_LOAD) String live, @QuantityOf(Dimension.LINE_LOAD) String roofLive,
            @QuantityOf(Dimension.LINE_LOAD) String snow, @QuantityOf(Dimension.LINE_LOAD) String partition) {
    }

    record PointLoadDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<String> at,
            @QuantityOf(Dimension.FORCE) String dead, @QuantityOf(Dimension.FORCE) String superimposed,
            @QuantityOf(Dimension.FORCE) String live, @QuantityOf(Dimension.FORCE) String roofLive,
            @QuantityOf(Dimension.FORCE) String snow, @QuantityOf(Dimension.FORCE) String partition) {
    }

    record ColumnDoc(@Required String id, @Required @QuantityOf(Dimension.LENGTH) List<String> at, String grid,
            String topLevel, String section) {
    }
}
