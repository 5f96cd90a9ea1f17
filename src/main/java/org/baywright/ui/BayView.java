package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.plan.Point;
import org.baywright.run.RunResult;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;

/**
 * What View › Floor vibration shows of the bays of a level, without the toolkit: which bays, their outlines
 * (the rectangle spanned by their beams and girders), which bay lies under a plan point, and the texts written in
 * a bay and on hover. The values are the run's own ({@link RunResult#bays()}).
 */
public final class BayView {
    /** The method line written with a bay's values. */
    public static final String METHOD = "AISC Design Guide 11, 2nd ed. (2016): walking, low-frequency floors";

    private BayView() {
    }

    /** The bay checks of the floor layout the level uses, in the run's order; empty before a run. */
    public static List<BayResult> of(RunResult run, String level) {
        if (run == null || level == null) {
            return List.of();
        }
        return run.bays().stream().filter(b -> b.levels().contains(level)).toList();
    }

    /**
     * The bay's outline: the rectangle centred on {@link Bay#centre()}, {@link Bay#beamSpan()} long along the
     * beams ({@link Bay#beamAngle()}) and {@link Bay#width()} wide along the girders; corners counter-clockwise.
     */
    public static List<Point> outline(Bay bay) {
        double a = Math.toRadians(bay.beamAngle());
        double ux = Math.cos(a) * bay.beamSpan() / 2;
        double uy = Math.sin(a) * bay.beamSpan() / 2;
        double vx = -Math.sin(a) * bay.width() / 2;
        double vy = Math.cos(a) * bay.width() / 2;
        Point c = bay.centre();
        List<Point> out = new ArrayList<>(4);
        out.add(new Point(c.x() - ux - vx, c.y() - uy - vy));
        out.add(new Point(c.x() + ux - vx, c.y() + uy - vy));
        out.add(new Point(c.x() + ux + vx, c.y() + uy + vy));
        out.add(new Point(c.x() - ux + vx, c.y() - uy + vy));
        return out;
    }

    /** Whether the plan point (x, y) lies inside the bay's outline (edges included). */
    public static boolean contains(Bay bay, double x, double y) {
        double a = Math.toRadians(bay.beamAngle());
        double dx = x - bay.centre().x();
        double dy = y - bay.centre().y();
        double along = dx * Math.cos(a) + dy * Math.sin(a);
        double across = -dx * Math.sin(a) + dy * Math.cos(a);
        double eps = 1e-9;
        return Math.abs(along) <= bay.beamSpan() / 2 + eps && Math.abs(across) <= bay.width() / 2 + eps;
    }

    /** The bay under the plan point, the smallest when outlines overlap; empty when none. */
    public static Optional<BayResult> at(List<BayResult> bays, double x, double y) {
        return bays.stream().filter(b -> contains(b.bay(), x, y))
                .min(java.util.Comparator.comparingDouble(b -> b.bay().beamSpan() * b.bay().width()));
    }

    /** The two lines written in a bay: f_n and a_p/g, or the status of a bay not checked. */
    public static List<String> label(BayResult b) {
        VibrationResult r = b.result();
        if (r == null) {
            return List.of(BayResult.NOT_CHECKED);
        }
        return List.of("fn " + hz(r.fn()), "ap/g " + percent(r.apg()));
    }

    /** The hover text: id, f_n, a_p/g, limit, ratio and status. */
    public static String hover(BayResult b) {
        VibrationResult r = b.result();
        if (r == null) {
            return "Bay " + b.bay().id() + "\n" + (b.note().isEmpty() ? BayResult.NOT_CHECKED : b.note());
        }
        return "Bay " + b.bay().id() + "\nfn = " + hz(r.fn()) + "\nap/g = " + percent(r.apg()) + "  (limit "
                + percent(r.limit()) + ")\nratio " + ratio(r.ratio()) + ": " + b.status();
    }

    /** A frequency, two decimals ({@code 5.12 Hz}). */
    public static String hz(double f) {
        return String.format(Locale.ROOT, "%.2f Hz", f);
    }

    /** A fraction of g as a percentage, three decimals ({@code 0.712 %}). */
    public static String percent(double fractionOfG) {
        return String.format(Locale.ROOT, "%.3f %%", fractionOfG * 100);
    }

    /** A ratio, two decimals; "—" for NaN. */
    public static String ratio(double r) {
        return Double.isNaN(r) ? "—" : String.format(Locale.ROOT, "%.2f", r);
    }
}
