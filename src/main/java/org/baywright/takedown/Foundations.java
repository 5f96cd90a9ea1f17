package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import org.baywright.load.LoadCase;

/**
 * The sixth stage: the reaction of each column line on its foundation (the axial load in its bottom
 * storey, live load unreduced and reduced) and their totals.
 *
 * @param columns the column lines with their foundation reactions, in the plan's order
 * @param total the sum of the unreduced foundation reactions by load case ordinal, N
 */
public record Foundations(List<ColumnResult> columns, double[] total) {
    public Foundations {
        columns = List.copyOf(columns);
    }

    /** The foundations under the column lines. */
    public static Foundations of(ColumnLines lines) {
        List<ColumnResult> columns = new ArrayList<>();
        double[] total = new double[LoadCase.values().length];
        for (ColumnLines.Line line : lines.lines()) {
            List<ColumnTier> tiers = line.tiers();
            StoreyLoad bottom = tiers.isEmpty() || tiers.get(0).storeys().isEmpty() ? null : tiers.get(0).storeys().get(0);
            double[] found = bottom == null ? new double[LoadCase.values().length] : bottom.unreduced();
            double[] foundReduced = bottom == null ? new double[LoadCase.values().length] : bottom.reduced();
            columns.add(new ColumnResult(line.column().id(), line.column().grid(), line.column().at(), line.position().kll(),
                    line.position().description(), tiers, found, foundReduced));
            for (int k = 0; k < total.length; k++) {
                total[k] += found[k];
            }
        }
        return new Foundations(columns, total);
    }
}
