package org.baywright.report;

import java.util.Locale;
import org.baywright.load.LoadCase;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.StoreyLoad;
import org.baywright.units.UnitSystem;

/**
 * The column schedule as CSV: one row per column per storey (top first), with the tier's section, the
 * axial load per case with live load unreduced and reduced, the required and available strength and
 * the ratio; then one row per column for the foundation reaction.
 */
public final class ColumnSchedule {
    private ColumnSchedule() {
    }

    public static String csv(RunResult run, UnitSystem us) {
        String f = us.force().symbol();
        String a = us.floorArea().symbol().replace("²", "2");
        StringBuilder b = new StringBuilder();
        b.append("column,grid,position,level,section,storey height[").append(us.length().symbol()).append("],D[").append(f)
                .append("],L unreduced[").append(f).append("],L reduced[").append(f).append("],Lr unreduced[").append(f)
                .append("],Lr reduced[").append(f).append("],S[").append(f).append("],reduction area[").append(a)
                .append("],floors supported,required[").append(f).append("],available[").append(f)
                .append("],ratio,combination\n");
        if (run.takedown() == null) {
            return b.toString();
        }
        for (ColumnResult c : run.takedown().columns()) {
            for (int t = c.tiers().size() - 1; t >= 0; t--) {
                ColumnTier tier = c.tiers().get(t);
                for (int s = tier.storeys().size() - 1; s >= 0; s--) {
                    StoreyLoad st = tier.storeys().get(s);
                    b.append(Takeoff.csvText(c.id())).append(',').append(Takeoff.csvText(c.grid())).append(',')
                            .append(Takeoff.csvText(c.position())).append(',').append(Takeoff.csvText(st.level())).append(',')
                            .append(tier.section()).append(',').append(n(us.length().fromSi(st.storeyHeight()))).append(',')
                            .append(n(us.force().fromSi(st.unreduced()[LoadCase.D.ordinal()]))).append(',')
                            .append(n(us.force().fromSi(st.unreduced()[LoadCase.L.ordinal()]))).append(',')
                            .append(n(us.force().fromSi(st.reduced()[LoadCase.L.ordinal()]))).append(',')
                            .append(n(us.force().fromSi(st.unreduced()[LoadCase.LR.ordinal()]))).append(',')
                            .append(n(us.force().fromSi(st.reduced()[LoadCase.LR.ordinal()]))).append(',')
                            .append(n(us.force().fromSi(st.unreduced()[LoadCase.S.ordinal()]))).append(',')
                            .append(n(us.floorArea().fromSi(st.reductionArea()))).append(',').append(st.floorsSupported())
                            .append(',').append(n(us.force().fromSi(st.required()))).append(',')
                            .append(n(us.force().fromSi(st.available()))).append(',')
                            .append(String.format(Locale.ROOT, "%.3f", st.ratio())).append(',')
                            .append(Takeoff.csvText(st.combination())).append('\n');
                }
            }
            b.append(Takeoff.csvText(c.id())).append(',').append(Takeoff.csvText(c.grid())).append(',')
                    .append(Takeoff.csvText(c.position())).append(",foundation,,,")
                    .append(n(us.force().fromSi(c.foundation()[LoadCase.D.ordinal()]))).append(',')
                    .append(n(us.force().fromSi(c.foundation()[LoadCase.L.ordinal()]))).append(',')
                    .append(n(us.force().fromSi(c.foundationReduced()[LoadCase.L.ordinal()]))).append(',')
                    .append(n(us.force().fromSi(c.foundation()[LoadCase.LR.ordinal()]))).append(',')
                    .append(n(us.force().fromSi(c.foundationReduced()[LoadCase.LR.ordinal()]))).append(',')
                    .append(n(us.force().fromSi(c.foundation()[LoadCase.S.ordinal()]))).append(",,,,,,\n");
        }
        return b.toString();
    }

    private static String n(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
