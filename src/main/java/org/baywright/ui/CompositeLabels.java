package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import org.baywright.report.drawing.Layer;
import org.baywright.report.drawing.Primitive;
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
 * <p>Known limitations: the picture places the labels for the size alone, so the longer notation may
 * reach over a neighbouring ratio at some zooms. When the picture itself writes the notation (the framing
 * plan's), the texts no longer equal the bare size and nothing here changes them.
 */
final class CompositeLabels {
    /** Average advance of the drawing font, as a share of the text size (a conservative estimate for fitting). */
    static final double CHAR_WIDTH = 0.6;

    private CompositeLabels() {
    }

    /**
     * The primitives with the size labels of composite members rewritten.
     *
     * @param members the members of the level shown, with their results
     * @param metresPerMm the picture's scale: plan metres per paper millimetre
     * @param fit true to keep the bare size where the notation would be longer than its member
     */
    static List<Primitive> apply(List<Primitive> prims, List<MemberResult> members, UnitSystem us, double metresPerMm,
            boolean fit) {
        List<MemberResult> composite = members.stream().filter(m -> m.isComposite() && !m.section().isEmpty()).toList();
        if (composite.isEmpty()) {
            return prims;
        }
        List<Primitive> out = new ArrayList<>(prims.size());
        for (Primitive p : prims) {
            out.add(p instanceof Primitive.Text t && t.layer() == Layer.MEMBER_LABELS && t.space() == Space.PLAN
                    ? rewrite(t, composite, us, metresPerMm, fit) : p);
        }
        return out;
    }

    private static Primitive rewrite(Primitive.Text t, List<MemberResult> composite, UnitSystem us, double k, boolean fit) {
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
        if (fit && (text.length() * CHAR_WIDTH + 1) * t.size() > best.length() / k) {
            return t;
        }
        return new Primitive.Text(t.layer(), t.space(), t.at(), text, t.size(), t.rotation(), t.anchor(), t.colour(), t.bold());
    }
}
