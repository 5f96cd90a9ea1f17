package org.baywright.report.pdf;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;

/**
 * The contents pages: every part and sheet with the page it starts on, each line a link to its page.
 * They are laid out after the body (whose page numbers are then known) and moved behind the cover.
 */
final class Contents {
    private Contents() {
    }

    /**
     * Appends contents pages to the document and returns them.
     *
     * @param body the pages before the contents are inserted
     * @param coverPages how many of them precede the contents
     * @param contentsPages how many contents pages to allow for in the page numbers
     */
    static List<PDPage> pages(Context cx, Fonts fonts, PDRectangle paper, List<PDPage> body, int coverPages,
            int contentsPages) {
        PageFlow f = new PageFlow(cx.flow.doc, fonts, paper);
        f.runningTitle("Contents");
        f.newPage();
        List<PDPage> out = new ArrayList<>();
        out.add(f.page());
        f.text(f.h1, f.left(), f.y() - f.h1.size(), "Contents");
        f.y(f.y() - f.h1.leading() - 2);
        f.line(f.left(), f.y() + 3, f.right(), f.y() + 3, 0.8f, Rgb.ACCENT);
        f.y(f.y() - 8);
        Style num = f.body;
        float numW = 30;
        for (Context.Mark m : cx.marks) {
            int idx = indexOf(body, m.page());
            int page = idx + 1 + (idx >= coverPages ? contentsPages : 0);
            Style s = m.level() == 0 ? f.bold : f.small;
            float indent = m.level() == 0 ? 0 : 14;
            if (m.level() == 0) {
                f.gap(3);
            }
            List<String> t = f.wrap(s, m.title(), f.width() - indent - numW - 10);
            List<String> detail = m.detail().isEmpty() ? List.of() : f.wrap(f.smallGrey, m.detail(), f.width() - 28 - numW);
            float h = t.size() * s.leading() + detail.size() * f.smallGrey.leading();
            f.ensure(Math.min(h, 4 * s.leading()));
            if (out.get(out.size() - 1) != f.page()) {
                out.add(f.page());
            }
            float top = f.y();
            PDPage on = f.page();
            for (int i = 0; i < t.size(); i++) {
                f.ensure(s.leading());
                float base = f.y() - s.size();
                f.text(s, f.left() + indent, base, t.get(i));
                if (i == t.size() - 1) {
                    float end = f.left() + indent + f.textWidth(s, t.get(i)) + 4;
                    String p = Integer.toString(page);
                    float pw = f.textWidth(num, p);
                    f.dashed(true);
                    f.line(end, base + 0.5f, f.right() - pw - 4, base + 0.5f, 0.5f, Rgb.RULE);
                    f.dashed(false);
                    f.textRight(num, f.right(), base, p);
                }
                f.y(f.y() - s.leading());
            }
            for (String d : detail) {
                f.ensure(f.smallGrey.leading());
                f.text(f.smallGrey, f.left() + 28, f.y() - f.smallGrey.size(), d);
                f.y(f.y() - f.smallGrey.leading());
            }
            if (on == f.page()) {
                try {
                    on.getAnnotations().add(CalculationPackage.link(f.left(), f.y(), f.width(), top - f.y(), m.page()));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
            if (out.get(out.size() - 1) != f.page()) {
                out.add(f.page());
            }
        }
        f.close();
        return out;
    }

    private static int indexOf(List<PDPage> pages, PDPage p) {
        for (int i = 0; i < pages.size(); i++) {
            if (pages.get(i).getCOSObject() == p.getCOSObject()) {
                return i;
            }
        }
        throw new IllegalStateException("a contents entry points at a page outside the body");
    }
}
