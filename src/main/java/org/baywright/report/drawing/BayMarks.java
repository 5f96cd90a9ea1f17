package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.plan.Point;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;

/**
 * The bay layer of a framing plan ({@link Layer#BAYS}): for each checked bay, two short lines, "f_n 3.71 Hz" and
 * "a_p/g 0.348 %", centred on the bay, turned to read along its beams. They sit midway between two beams (when a
 * beam runs through the bay's centre, half a spacing across from it) and a quarter of the beam span from midspan,
 * where the members' own labels are not. A bay whose a_p/g exceeds the limit is drawn in bold with a solid
 * diamond before its text; the colours (a violet for the layer, a deep magenta for exceeding bays) are our own and
 * are not on the demand/capacity colour map. Bays outside the method (f_n above 9 Hz) say so; bays not checked get
 * nothing.
 */
public final class BayMarks {
    /** Ink of the bay layer's text. */
    public static final Rgb INK = new Rgb(120, 30, 160);
    /** Ink of an exceeding bay's text and its diamond. */
    public static final Rgb EXCEEDS = new Rgb(205, 0, 110);

    private BayMarks() {
    }

    /** Where the layer writes a bay's text: its centre, moved off the beam and the midspan labels. */
    public static Point anchor(Bay bay) {
        double a = Math.toRadians(bay.beamAngle());
        double ux = Math.cos(a);
        double uy = Math.sin(a);
        double across = bay.beams().size() % 2 == 1 ? bay.spacing() / 2 : 0; // n beams odd: one lies on the centre line
        double along = bay.beamSpan() / 4;
        return new Point(bay.centre().x() + along * ux - across * uy, bay.centre().y() + along * uy + across * ux);
    }

    /** The two lines written for a checked bay, or none. */
    public static List<String> lines(BayResult b) {
        VibrationResult v = b.result();
        if (v == null) {
            return List.of();
        }
        String fn = String.format(Locale.ROOT, "f_n %.2f Hz", v.fn());
        if (v.status() == VibrationStatus.OUTSIDE_METHOD) {
            return List.of(fn, "above 9 Hz");
        }
        return List.of(fn + (v.belowThreeHz() ? " (<3)" : ""), String.format(Locale.ROOT, "a_p/g %.3f %%", v.apg() * 100));
    }

    /**
     * The layer's primitives for the given bays (plan space).
     *
     * @param size text height, paper mm
     * @param metresPerMm plan metres per paper millimetre (to size the diamond)
     */
    static List<Primitive> of(List<BayResult> bays, double size, double metresPerMm) {
        List<Primitive> out = new ArrayList<>();
        for (BayResult b : bays) {
            List<String> lines = lines(b);
            if (lines.isEmpty()) {
                continue;
            }
            boolean exceeds = b.result().status() == VibrationStatus.EXCEEDS;
            Rgb ink = exceeds ? EXCEEDS : INK;
            Point c = anchor(b.bay());
            double rot = b.bay().beamAngle() > 90 ? b.bay().beamAngle() - 180 : b.bay().beamAngle();
            double r = Math.toRadians(rot);
            // the lines stacked across the text direction, the pair centred on the anchor
            double step = 1.25 * size * metresPerMm;
            double nx = -Math.sin(r);
            double ny = Math.cos(r);
            for (int i = 0; i < lines.size(); i++) {
                double off = (0.5 - i) * step; // first line above, second below
                out.add(new Primitive.Text(Layer.BAYS, Space.PLAN, new Pt(c.x() + nx * off, c.y() + ny * off), lines.get(i),
                        size, rot, Anchor.MIDDLE_CENTRE, ink, exceeds));
            }
            if (exceeds) {
                // a solid diamond before the lines (on the side where they start reading), between them across
                String longer = lines.get(0).length() >= lines.get(1).length() ? lines.get(0) : lines.get(1);
                double half = 0.5 * TextMetrics.width(longer, size, true) * metresPerMm;
                double d = 0.8 * size * metresPerMm;
                double ux = Math.cos(r);
                double uy = Math.sin(r);
                Pt m = new Pt(c.x() - ux * (half + 1.6 * d), c.y() - uy * (half + 1.6 * d));
                List<Pt> diamond = List.of(new Pt(m.x() + ux * d, m.y() + uy * d), new Pt(m.x() + nx * 1.3 * d, m.y() + ny * 1.3 * d),
                        new Pt(m.x() - ux * d, m.y() - uy * d), new Pt(m.x() - nx * 1.3 * d, m.y() - ny * 1.3 * d));
                out.add(new Primitive.Path(Layer.BAYS, Space.PLAN, diamond, true, null, EXCEEDS, null));
            }
        }
        return out;
    }
}
