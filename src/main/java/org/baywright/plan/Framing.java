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
 *
 * <p>The spacing is measured from the bay's sides, so the deck reaches the spacing the user gave only if
 * something carries it on those sides too: the two grid lines of the bay parallel to the beams (the
 * column lines). An infill therefore also places a <em>line beam</em> on each of those sides, from girder
 * line to girder line, unless a member already lies along that side (a member drawn there, or the line
 * beam of an earlier infill of the floor sharing the side): two beams are never placed on one line. Line
 * beams are named by the side: {@code IF-AB-12/W}, {@code /E} (beams along y) or {@code /S}, {@code /N}
 * (beams along x). Without them an infill at 10 ft in a 30 ft bay would leave the deck spanning 20 ft
 * across the column line between two bays.
 */
public final class Framing {
    private Framing() {
    }

    /** The most beams one infill may generate; a plan asking for more is refused with a located problem. */
    public static final int MAX_INFILL_BEAMS = 1000;

    /**
     * Distance, m, within which a member counts as lying on a bay's side line (1 mm: far below any
     * drawing precision, far above the rounding of coordinates read from a file).
     */
    public static final double ON_LINE = 1e-3;

    /** All members of a floor: explicit ones first, then each infill's beams in order (line beams deduplicated). */
    public static List<Member> members(Plan plan, Floor floor) {
        List<Member> out = new ArrayList<>(floor.members());
        for (Infill inf : floor.infills()) {
            out.addAll(infillBeams(plan, inf, out));
        }
        return out;
    }

    /** The beams one infill generates on its own: its beams and both line beams (empty if its grid lines are unknown). */
    public static List<Member> infillBeams(Plan plan, Infill inf) {
        return infillBeams(plan, inf, List.of());
    }

    /**
     * The beams one infill generates among the members already on the floor: its evenly spaced beams,
     * then a line beam on each side of the bay parallel to them where no member of {@code existing} lies
     * along that side (empty if its grid lines are unknown; validation reports that).
     */
    public static List<Member> infillBeams(Plan plan, Infill inf, List<Member> existing) {
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
        double lo = alongX ? xa : ya;
        double hi = alongX ? xb : yb;
        double[] sides = alongX ? new double[] {ya, yb} : new double[] {xa, xb};
        String[] names = alongX ? new String[] {"S", "N"} : new String[] {"W", "E"};
        for (int k = 0; k < 2; k++) {
            double c = sides[k];
            if (k == 1 && !(c - sides[0] > ON_LINE) || occupied(existing, alongX, c, lo, hi)) {
                continue;
            }
            Point s = alongX ? new Point(lo, c) : new Point(c, lo);
            Point e = alongX ? new Point(hi, c) : new Point(c, hi);
            out.add(new Member(inf.id() + "/" + names[k], MemberKind.BEAM, s, e, Optional.empty()));
        }
        return out;
    }

    /**
     * True when a member lies along the line {@code y = c} ({@code alongX}) or {@code x = c} over part of
     * {@code [lo, hi]} longer than {@link #ON_LINE}.
     */
    private static boolean occupied(List<Member> members, boolean alongX, double c, double lo, double hi) {
        for (Member m : members) {
            double a0 = alongX ? m.start().y() : m.start().x();
            double a1 = alongX ? m.end().y() : m.end().x();
            if (Math.abs(a0 - c) > ON_LINE || Math.abs(a1 - c) > ON_LINE) {
                continue;
            }
            double s0 = alongX ? m.start().x() : m.start().y();
            double s1 = alongX ? m.end().x() : m.end().y();
            double overlap = Math.min(hi, Math.max(s0, s1)) - Math.max(lo, Math.min(s0, s1));
            if (overlap > ON_LINE) {
                return true;
            }
        }
        return false;
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
