package org.baywright.report;

import java.util.List;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;

/**
 * What composite action adds up to over a run, every member counted at every level it occurs (as the
 * steel weight is): studs, composite members, pieces cambered, and the steel weight the same floors
 * would take without composite action (each composite member at its bare-steel design, the rest and the
 * columns as they are).
 *
 * @param members composite members
 * @param studs headed studs on them
 * @param cambered members with a camber specified
 * @param steelWeight the run's steel weight (members and columns), N
 * @param nonCompositeWeight the same without composite action, N
 */
public record CompositeTotals(int members, int studs, int cambered, double steelWeight, double nonCompositeWeight) {

    /** The totals of a run's takedown (all zero for none). */
    public static CompositeTotals of(TakedownResult t) {
        if (t == null) {
            return new CompositeTotals(0, 0, 0, 0, 0);
        }
        int members = 0;
        int studs = 0;
        int cambered = 0;
        double bare = 0;
        for (String floor : t.levelFloors().values()) {
            for (MemberResult m : t.members().getOrDefault(floor, List.of())) {
                bare += m.bareSteelWeight();
                if (m.isComposite()) {
                    members++;
                    studs += m.studs();
                    if (m.camber() > 0) {
                        cambered++;
                    }
                }
            }
        }
        for (ColumnResult c : t.columns()) {
            for (ColumnTier tier : c.tiers()) {
                bare += tier.weight() * tier.length();
            }
        }
        return new CompositeTotals(members, studs, cambered, t.steelWeight(), bare);
    }

    /** Steel saved by composite action, N (negative if the composite floor is heavier). */
    public double saving() {
        return nonCompositeWeight - steelWeight;
    }
}
