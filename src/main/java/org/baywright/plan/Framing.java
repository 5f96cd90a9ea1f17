package org.baywright.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Expands a floor layout into its members: the members drawn explicitly plus the beams each
 * {@link Infill} generates.
 *
 * <p>An infill fills the bay between grid lines x0–x1 and y0–y1 with beams spanning in its direction,
 * evenly spaced across the bay: {@code count} beams at spacing (bay width)/(count + 1), or, by maximum
 * spacing, the fewest beams whose spacing does not exceed it. Generated ids are the infill's id with
 * the beam's number, e.g. {@code IF-AB-12/1}.
 */
public final class Framing {
    private Framing() {
    }

    /** The most beams one infill may generate; a plan asking for more is refused with a located problem. */
    public static final int MAX_INFILL_BEAMS = 1000;

    /** All members of a floor: explicit ones first, then infill beams in order. */
    public static List<Member> members(Plan plan, Floor floor) {
        List<Member> out = new ArrayList<>(floor.members());
        for (Infill inf : floor.infills()) {
            out.addAll(infillBeams(plan, inf));
        }
        return out;
    }

    /** The beams one infill generates (empty if its grid lines are unknown; validation reports that). */
    public static List<Member> infillBeams(Plan plan, Infill inf) {
        Optional<GridLine> gx0 = plan.gridLine(inf.x0());
        Optional<GridLine> gx1 = plan.gridLine(inf.x1());
        Optional<GridLine> gy0 = plan.gridLine(inf.y0());
        Optional<GridLine> gy1 = plan.gridLine(inf.y1());
        if (gx0.isEmpty() || gx1.isEmpty() || gy0.isEmpty() || gy1.isEmpty()) {
            return List.of();
        }
        double xa = Math.min(gx0.get().offset(), gx1.get().offset());
        double xb = Math.max(gx0.get().offset(), gx1.get().offset());
        double ya = Math.min(gy0.get().offset(), gy1.get().offset());
        double yb = Math.max(gy0.get().offset(), gy1.get().offset());
        boolean alongX = inf.direction() == GridLine.Axis.X;
        double width = alongX ? yb - ya : xb - xa;
        int n = beamCount(inf, width);
        List<Member> out = new ArrayList<>(n);
        for (int i = 1; i <= n; i++) {
            double c = (alongX ? ya : xa) + width * i / (n + 1);
            Point s = alongX ? new Point(xa, c) : new Point(c, ya);
            Point e = alongX ? new Point(xb, c) : new Point(c, yb);
            out.add(new Member(inf.id() + "/" + i, MemberKind.BEAM, s, e, Optional.empty()));
        }
        return out;
    }

    /**
     * Relative slack when a bay is a whole number of spacings: plan files keep ten significant digits
     * (and US files convert feet to metres), so a bay of exactly two spacings may read back a few parts
     * in 10⁹ either side of 2. One part per million is far below any drawing tolerance.
     */
    static final double WHOLE_SPACINGS_SLACK = 1e-6;

    /** Number of beams: the count, or the fewest with spacing ≤ maxSpacing (to {@link #WHOLE_SPACINGS_SLACK}). */
    public static int beamCount(Infill inf, double bayWidth) {
        if (inf.count() > 0) {
            return inf.count();
        }
        if (!(inf.maxSpacing() > 0) || !(bayWidth > 0)) {
            return 0;
        }
        return Math.max(0, (int) Math.ceil(bayWidth / inf.maxSpacing() - WHOLE_SPACINGS_SLACK) - 1);
    }
}
