package org.baywright.report.pdf;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.baywright.plan.Level;
import org.baywright.report.drawing.DrawingOptions;
import org.baywright.report.drawing.FramingPlanDrawing;
import org.baywright.report.drawing.Paper;
import org.baywright.report.drawing.PdfRenderer;
import org.baywright.report.drawing.Primitive;
import org.baywright.report.drawing.ReactionMode;
import org.baywright.units.UnitSystem;

/**
 * The part "Framing plans": the framing plan of each level, drawn by the same code as the exported
 * drawing ({@link FramingPlanDrawing}, rendered by {@link PdfRenderer}), one landscape page per distinct
 * drawing. Levels whose drawings are the same but for the level's name (a typical floor with the same
 * column sizes) share one page, and its title names them all.
 */
final class PlanPages {
    private PlanPages() {
    }

    /** Levels that share one drawing: the first level's drawing and the names of all of them. */
    record Group(FramingPlanDrawing drawing, List<String> levels) {
        /** "Level 3 framing plan" or "Level 3, Level 4 framing plan". */
        String title() {
            return String.join(", ", levels) + " framing plan";
        }
    }

    /** The sheet the package draws on: a size whose lettering stays readable when fitted to the page. */
    static Paper paper(UnitSystem us) {
        return us == UnitSystem.SI ? Paper.ISO_A3 : Paper.ANSI_B;
    }

    /** The drawings of the levels from the top down, levels with the same drawing together. */
    static List<Group> groups(Context cx) {
        DrawingOptions o = DrawingOptions.defaults().withUnits(cx.us).withPaper(paper(cx.us))
                .withReactions(ReactionMode.FACTORED).withDate(FrontMatter.date(cx))
                .withBays(org.baywright.report.BaySummary.present(cx.run));
        Map<String, FramingPlanDrawing> first = new LinkedHashMap<>();
        Map<String, List<String>> names = new LinkedHashMap<>();
        List<Level> levels = cx.run.plan().levels();
        // longest first, so that "Level 2" is not taken out of "Level 20"
        List<String> levelNames = levels.stream().map(Level::name).sorted((x, y) -> y.length() - x.length()).toList();
        for (int i = levels.size() - 1; i >= 0; i--) {
            String name = levels.get(i).name();
            FramingPlanDrawing d = FramingPlanDrawing.of(cx.run, name, o);
            String key = key(d, levelNames);
            first.putIfAbsent(key, d);
            names.computeIfAbsent(key, k -> new ArrayList<>()).add(name);
        }
        List<Group> out = new ArrayList<>();
        // within a group the levels read bottom to top, as the plan lists them
        first.forEach((k, d) -> {
            List<String> n = new ArrayList<>(names.get(k));
            java.util.Collections.reverse(n);
            out.add(new Group(d, n));
        });
        return out;
    }

    /**
     * What a drawing shows, with the names of the plan's levels taken out of its texts (the title block
     * names its level; a note lists the levels that use its layout).
     */
    private static String key(FramingPlanDrawing d, List<String> levelNames) {
        StringBuilder b = new StringBuilder(d.floorId()).append('\n');
        for (Primitive p : d.primitives()) {
            String s = p.toString();
            for (String name : levelNames) {
                s = s.replaceAll("(?i)" + java.util.regex.Pattern.quote(name), "\u0000"); // the view title is in capitals
            }
            b.append(s).append('\n');
        }
        return b.toString();
    }

    /** The part: one page per group, the drawing fitted under its title. */
    static void write(Context cx) {
        List<Group> groups = groups(cx);
        if (groups.isEmpty()) {
            return;
        }
        PageFlow f = cx.flow;
        f.landscape(true);
        cx.part("Framing plans");
        PDType0Font[] fonts;
        try {
            fonts = PdfRenderer.fonts(f.doc);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        boolean firstPage = true;
        for (Group g : groups) {
            if (!firstPage) {
                f.runningTitle("Framing plans: " + g.title());
                f.newPage();
            }
            firstPage = false;
            f.heading2(g.title(), 200);
            cx.mark(g.title(), "floor layout " + g.drawing().floorId());
            f.paragraph(f.small, "Floor layout " + Summaries.floorLabel(cx, g.drawing().floorId()) + ". Member sizes, ratios and"
                    + " the largest factored end reactions as on the exported drawing ("
                    + g.drawing().paper().label() + " sheet, scale " + g.drawing().scale().label() + ", reduced to fit this page)"
                    + (g.levels().size() > 1 ? "; drawn for " + g.drawing().levelName() + ", and the same at the other levels named"
                            + " (same layout, same column sizes)." : "."));
            float sw = PdfRenderer.points(g.drawing().paper().width());
            float sh = PdfRenderer.points(g.drawing().paper().height());
            float room = f.y() - f.bottom();
            float scale = Math.min(f.width() / sw, room / sh);
            float x = f.left() + (f.width() - sw * scale) / 2;
            float y = f.y() - sh * scale;
            try {
                PdfRenderer.drawOn(f.cs(), g.drawing(), x, y, scale, fonts);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            f.y(y);
        }
        f.landscape(false);
    }
}
