package org.baywright.takedown;

import java.util.List;
import org.baywright.design.MemberStatus;

/**
 * A column tier: the levels between two splices, one section.
 *
 * @param levels the levels whose storeys the tier spans, bottom first
 * @param section designation, or empty when none passes (overstressed)
 * @param weight weight per length of the section, N/m
 * @param storeys the axial loads of each storey of the tier, bottom first
 * @param rejected lighter sections rejected, with their governing ratio
 */
public record ColumnTier(List<String> levels, String section, double weight, MemberStatus status,
        List<StoreyLoad> storeys, double length, List<String> rejected) {
    /** Highest ratio of the tier's storeys. */
    public double maxRatio() {
        return storeys.stream().mapToDouble(StoreyLoad::ratio).max().orElse(Double.NaN);
    }
}
