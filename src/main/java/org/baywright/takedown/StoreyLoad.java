package org.baywright.takedown;

/**
 * The axial load in a column in the storey below one level.
 *
 * @param level the level at the top of the storey
 * @param unreduced axial force by {@link org.baywright.load.LoadCase} ordinal (D, L, Lr, S), N, with
 *     live loads unreduced; D includes all self-weight above the storey's base
 * @param reduced the same with live and roof live reduced (ASCE 7-16 §4.7, §4.8)
 * @param reductionArea cumulative A_T of the floors above, with roofs carrying occupancy live load L
 *     (reduced as floors, ASCE 7-16 §4.8.3); other roofs excluded (roof live load reduces by its own
 *     area, §4.8.2), m²
 * @param roofArea cumulative area of the roofs above that carry no occupancy live load, m² (the A_T of
 *     roof live load)
 * @param floorsSupported floors with live load supported
 * @param required required strength (Pu or Pa), N
 * @param available available strength of the tier's section, N
 * @param ratio the storey's ratio: the larger of the axial ratio (required / available) and the interaction
 *     ratio of AISC 360-16 H1.1
 * @param combination governing combination of the axial check
 * @param interaction the combined axial and flexure check (AISC 360-16 H1.1, moments from the reactions'
 *     eccentricities amplified by B1) in its governing combination and live-load pattern; null with no section
 */
public record StoreyLoad(String level, double storeyHeight, double[] unreduced, double[] reduced,
        double reductionArea, double roofArea, int floorsSupported, double required, double available, double ratio,
        String combination, org.baywright.design.ColumnDesigner.Interaction interaction) {

    /** A storey with the axial check alone (no interaction recorded). */
    public StoreyLoad(String level, double storeyHeight, double[] unreduced, double[] reduced, double reductionArea,
            double roofArea, int floorsSupported, double required, double available, double ratio, String combination) {
        this(level, storeyHeight, unreduced, reduced, reductionArea, roofArea, floorsSupported, required, available, ratio,
                combination, null);
    }

    /** Everything delivered from above, floors and roofs, m². */
    public double deliveredArea() {
        return reductionArea + roofArea;
    }
}
