package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import org.baywright.report.drawing.Layer;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.Pt;
import org.baywright.report.drawing.Space;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * The canvas's member labels in the trade's plan notation for composite members: the size label the plan
 * picture lays out ({@code W16X26}) becomes {@code W16X26 (16) c=3/4"} (studs and camber, {@link
 * Readouts#planNotation}). A label is matched to its member by its text and by lying beside that member's
 * mid-span (labels sit there, clear of the member's band); a longer label that would not fit along its
 * member at the zoom shown keeps the size alone, as the picture leaves out labels that do not fit.
 *
 * <p>A longer label must not cover another label's knock-out (column marks and sections, ratios, grid
 * bubbles); where it would, the size stays alone, as the picture leaves out a label that meets another.
 *
 * <p>Known limitations: the widths are estimated from the font's usual proportions, scaled from the size
 * label's own knock-out. When the picture itself writes the notation (the framing
 * plan's), the texts no longer equal the bare size and nothing here changes them.
 */
final class CompositeLabels {
    private CompositeLabels() {
    }

    /**
     * The primitives with the size labels of composite members rewritten, and the knock-out under each such
     * label (the ground-coloured box the picture puts just before it) lengthened to match.
     *
     * @param members the members of the level shown, with their results
     * @param metresPerMm the picture's scale: plan metres per paper millimetre
     * @param fit true to keep the bare size where the notation, with one and a half text heights to spare at each end (clear of the column marks), would
     *     be longer than its member
     */
    static List<Primitive> apply(List<Primitive> prims, List<MemberResult> members, UnitSystem us, double metresPerMm,
            boolean fit) {
        List<MemberResult> composite = members.stream().filter(m -> m.isComposite() && !m.section().isEmpty()).toList();
        if (composite.isEmpty()) {
            return prims;
        }
        // every knock-out box (the ground-coloured box under a label), to keep a longer label off the others
        List<double[]> boxes = new ArrayList<>();
        for (Primitive p : prims) {
            if (knockOut(p)) {
                boxes.add(bounds(((Primitive.Path) p).points()));
            }
        }
        List<Primitive> out = new ArrayList<>(prims.size());
        int boxAt = -1;
        for (Primitive p : prims) {
            if (knockOut(p)) {
                boxAt++;
            }
            if (p instanceof Primitive.Text t && t.layer() == Layer.MEMBER_LABELS && t.space() == Space.PLAN) {
                Primitive.Path box = !out.isEmpty() && knockOut(out.get(out.size() - 1))
                        && out.get(out.size() - 1).layer() == Layer.MEMBER_LABELS ? (Primitive.Path) out.get(out.size() - 1) : null;
                Primitive.Text next = rewrite(t, box, composite, us, metresPerMm, fit);
                if (next != t && box != null) {
                    Primitive.Path longer = lengthen(box, t, width(next.text()) / width(t.text()));
                    double[] b = bounds(longer.points());
                    if (fit && overlapsAnother(b, boxes, boxAt)) {
                        next = t;
                    } else {
                        out.set(out.size() - 1, longer);
                        boxes.set(boxAt, b);
                    }
                }
                out.add(next);
            } else {
                out.add(p);
            }
        }
        return out;
    }

    /** A closed four-cornered filled path without outline: the knock-out the picture puts under a label. */
    private static boolean knockOut(Primitive p) {
        return p instanceof Primitive.Path b && b.closed() && b.points().size() == 4 && b.fill() != null && b.outline() == null
                && b.hatch() == null && b.space() == Space.PLAN;
    }

    private static double[] bounds(List<Pt> pts) {
        double[] b = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (Pt p : pts) {
            b[0] = Math.min(b[0], p.x());
            b[1] = Math.min(b[1], p.y());
            b[2] = Math.max(b[2], p.x());
            b[3] = Math.max(b[3], p.y());
        }
        return b;
    }

    private static boolean overlapsAnother(double[] b, List<double[]> boxes, int self) {
        for (int i = 0; i < boxes.size(); i++) {
            double[] o = boxes.get(i);
            if (i != self && b[0] < o[2] && o[0] < b[2] && b[1] < o[3] && o[1] < b[3]) {
                return true;
            }
        }
        return false;
    }

    private static Primitive.Text rewrite(Primitive.Text t, Primitive.Path box, List<MemberResult> composite, UnitSystem us,
            double k, boolean fit) {
        boolean fixed = t.text().startsWith("[") && t.text().endsWith("]");
        String size = fixed ? t.text().substring(1, t.text().length() - 1) : t.text();
        // a label sits within a few text heights of its member's mid-span
        double reach = 4 * t.size() * k;
        MemberResult best = null;
        double bestD = reach;
        for (MemberResult m : composite) {
            if (!m.section().equals(size)) {
                continue;
            }
            double d = Math.hypot(t.at().x() - (m.start().x() + m.end().x()) / 2, t.at().y() - (m.start().y() + m.end().y()) / 2);
            if (d < bestD) {
                best = m;
                bestD = d;
            }
        }
        if (best == null) {
            return t;
        }
        String text = Readouts.planNotation(best, us, fixed);
        // the laid-out width of the size, from its knock-out where there is one, scaled by the estimated widths
        double sizeMm = box != null ? along(box, t) / k : width(t.text()) * t.size();
        double textMm = sizeMm * width(text) / width(t.text());
        if (fit && textMm + 3 * t.size() > best.length() / k) {
            return t;
        }
        return new Primitive.Text(t.layer(), t.space(), t.at(), text, t.size(), t.rotation(), t.anchor(), t.colour(), t.bold());
    }

    /** The length of a knock-out box along its text's direction, plan metres. */
    private static double along(Primitive.Path box, Primitive.Text t) {
        double ux = StrictMath.cos(StrictMath.toRadians(t.rotation()));
        double uy = StrictMath.sin(StrictMath.toRadians(t.rotation()));
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Pt p : box.points()) {
            double a = (p.x() - t.at().x()) * ux + (p.y() - t.at().y()) * uy;
            lo = Math.min(lo, a);
            hi = Math.max(hi, a);
        }
        return hi - lo;
    }

    /** The box stretched along the text's direction about the text's anchor point by {@code scale}. */
    private static Primitive.Path lengthen(Primitive.Path box, Primitive.Text t, double scale) {
        double ux = StrictMath.cos(StrictMath.toRadians(t.rotation()));
        double uy = StrictMath.sin(StrictMath.toRadians(t.rotation()));
        List<Pt> pts = new ArrayList<>();
        for (Pt p : box.points()) {
            double dx = p.x() - t.at().x();
            double dy = p.y() - t.at().y();
            double a = dx * ux + dy * uy;
            pts.add(new Pt(p.x() + ux * a * (scale - 1), p.y() + uy * a * (scale - 1)));
        }
        return new Primitive.Path(box.layer(), box.space(), pts, true, box.outline(), box.fill(), box.hatch());
    }

    /**
     * The estimated advance of a text in text heights, from the usual proportions of a sans-serif face
     * (digits and capitals about 0.56–0.67, spaces and punctuation narrower); only ratios of two such
     * estimates are used.
     */
    static double width(String text) {
        double w = 0;
        for (char c : text.toCharArray()) {
            w += switch (c) {
                case ' ', '/', '[', ']' -> 0.28;
                case '(', ')', '-', '"' -> 0.34;
                case '=' -> 0.58;
                case 'W' -> 0.94;
                case 'X' -> 0.67;
                default -> Character.isDigit(c) ? 0.56 : 0.5;
            };
        }
        return w;
    }
}
