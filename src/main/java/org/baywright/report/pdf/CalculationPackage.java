package org.baywright.report.pdf;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationLink;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDBorderStyleDictionary;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.destination.PDPageFitWidthDestination;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.outline.PDDocumentOutline;
import org.apache.pdfbox.pdmodel.interactive.documentnavigation.outline.PDOutlineItem;
import org.baywright.calc.Caution;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/**
 * The calculation package of a run as a PDF that a checking engineer can follow line by line: cover
 * with the design basis and the caution, contents, design basis, load summary, takedown summary, a
 * calculation sheet per group of identical members, the floor-vibration check of every bay when the run has bays,
 * column schedule and strengths, foundation
 * reactions, steel takeoff and the problems of the run. Every page carries the caution and its
 * number in the footer. Fonts are embedded.
 *
 * <p>The calculation lines are printed from the record the design engine writes while it checks a
 * section ({@link org.baywright.takedown.MemberResult#calculation()}), rendered by
 * {@link org.baywright.calc.CalcFormat}: the formulas printed are those executed.
 */
public final class CalculationPackage {
    private CalculationPackage() {
    }

    /**
     * Writes the package of {@code run} to {@code pdf} (replacing it).
     *
     * @return the page count and the contents with page numbers
     * @throws IOException if the file cannot be written or the font cannot be read
     */
    public static PackageSummary write(RunResult run, Path pdf, PackageOptions options) throws IOException {
        Objects.requireNonNull(run, "run");
        Objects.requireNonNull(pdf, "pdf");
        Objects.requireNonNull(options, "options");
        try (PDDocument doc = new PDDocument()) {
            PackageSummary summary = build(doc, run, options);
            Path parent = pdf.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            doc.save(pdf.toFile());
            return summary;
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private static PackageSummary build(PDDocument doc, RunResult run, PackageOptions options) throws IOException {
        Fonts fonts = Fonts.load(doc);
        PDRectangle paper = options.units() == UnitSystem.US ? PDRectangle.LETTER : PDRectangle.A4;
        PageFlow f = new PageFlow(doc, fonts, paper);
        Context cx = new Context(run, options, f);
        Map<COSDictionary, String> titles = new IdentityHashMap<>();

        FrontMatter.cover(cx);
        int coverPages = doc.getNumberOfPages();
        FrontMatter.basis(cx);
        CheckerPages.statements(cx);
        int[] sheets = {0, 0};
        if (run.takedown() != null) {
            PlanPages.write(cx);
            Summaries.loads(cx);
            LoadDerivation.write(cx);
            Summaries.takedown(cx);
            sheets = MemberSheets.write(cx);
            VibrationPages.write(cx);
            CheckerPages.endReactions(cx);
            ColumnPages.write(cx);
            TakeoffPages.write(cx);
        }
        Summaries.problems(cx);
        f.close();
        collectTitles(doc, f.titles(), titles);

        // contents: laid out once to count its pages, then again with the final page numbers
        List<PDPage> body = new ArrayList<>();
        doc.getPages().forEach(body::add);
        List<PDPage> trial = Contents.pages(cx, fonts, paper, body, coverPages, 1);
        int guess = trial.size();
        for (PDPage p : trial) {
            doc.removePage(p);
        }
        List<PDPage> contents = Contents.pages(cx, fonts, paper, body, coverPages, guess);
        int k = contents.size();
        PDPage after = body.get(coverPages - 1);
        for (PDPage p : contents) {
            doc.getPages().remove(p);
        }
        for (int i = k - 1; i >= 0; i--) {
            doc.getPages().insertAfter(contents.get(i), after);
            titles.put(contents.get(i).getCOSObject(), "Contents");
        }
        List<PDPage> all = new ArrayList<>();
        doc.getPages().forEach(all::add);

        decorate(doc, cx, fonts, all, titles);
        outline(doc, cx, all);
        info(doc, cx);

        List<PackageSummary.Entry> entries = new ArrayList<>();
        for (Context.Mark m : cx.marks) {
            entries.add(new PackageSummary.Entry(m.level(), m.title(), pageNumber(all, m.page())));
        }
        return new PackageSummary(all.size(), entries, sheets[0], sheets[1]);
    }

    /** The running title of each page the body flow started, keyed by the page's dictionary. */
    private static void collectTitles(PDDocument doc, List<String> flowTitles, Map<COSDictionary, String> out) {
        int i = 0;
        for (PDPage p : doc.getPages()) {
            if (i < flowTitles.size()) {
                out.put(p.getCOSObject(), flowTitles.get(i));
            }
            i++;
        }
    }

    /** 1-based number of a page in the final order. */
    static int pageNumber(List<PDPage> all, PDPage page) {
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).getCOSObject() == page.getCOSObject()) {
                return i + 1;
            }
        }
        throw new IllegalStateException("page not in the document");
    }

    /** Header (project, running title) and footer (caution, program, page number) on every page. */
    private static void decorate(PDDocument doc, Context cx, Fonts fonts, List<PDPage> pages, Map<COSDictionary, String> titles)
            throws IOException {
        int n = pages.size();
        Style head = new Style(fonts.bold, 7.5f, Rgb.TEXT, 9f);
        Style headGrey = new Style(fonts.regular, 7.5f, Rgb.GREY, 9f);
        Style foot = new Style(fonts.regular, 6.4f, Rgb.GREY, 7.7f);
        Style page = new Style(fonts.bold, 8f, Rgb.TEXT, 9f);
        String program = "Baywright " + cx.run.version() + "  ·  " + FrontMatter.date(cx)
                + (cx.options.project().number().isEmpty() ? "" : "  ·  job " + cx.options.project().number())
                + (cx.options.project().revision().isEmpty() ? "" : "  ·  rev. " + cx.options.project().revision());
        for (int i = 0; i < n; i++) {
            PDPage p = pages.get(i);
            PageDecorator d = new PageDecorator(fonts);
            try (PDPageContentStream cs = new PDPageContentStream(doc, p, PDPageContentStream.AppendMode.APPEND, true, true)) {
                d.cs = cs;
                float w = p.getMediaBox().getWidth();
                float h = p.getMediaBox().getHeight();
                float l = PageFlow.MARGIN_X;
                float r = w - PageFlow.MARGIN_X;
                float top = h - PageFlow.MARGIN_TOP + 6;
                if (i > 0) {
                    d.text(head, l, top, cx.projectName());
                    float room = r - l - d.width(head, cx.projectName()) - 24;
                    String t = d.fit(headGrey, titles.getOrDefault(p.getCOSObject(), ""), room);
                    d.text(headGrey, r - d.width(headGrey, t), top, t);
                    d.line(l, top - 4, r, top - 4, 0.5f, Rgb.RULE);
                }
                float fy = PageFlow.FOOTER;
                d.line(l, fy + 4, r, fy + 4, 0.5f, Rgb.RULE);
                String pn = "Page " + (i + 1) + " of " + n;
                float pnw = d.width(page, pn);
                List<String> lines = d.wrap(foot, Caution.TEXT, r - l - pnw - 20);
                float base = fy - 4;
                for (String line : lines) {
                    d.text(foot, l, base, line);
                    base -= foot.leading();
                }
                d.text(foot, l, base, program);
                d.text(page, r - pnw, fy - 5, pn);
            }
        }
    }

    /** Draws on a page after the flow has finished with it. */
    private static final class PageDecorator {
        final Fonts fonts;
        PDPageContentStream cs;

        PageDecorator(Fonts fonts) {
            this.fonts = fonts;
        }

        float width(Style s, String t) {
            return fonts.width(s.font(), s.size(), fonts.safe(t));
        }

        /** {@code t} as it fits in {@code room} points on one line: whole words, then "…" where cut. */
        String fit(Style s, String t, float room) {
            if (width(s, t) <= room) {
                return t;
            }
            String cut = t;
            while (!cut.isEmpty() && width(s, cut + " …") > room) {
                int sp = cut.lastIndexOf(' ');
                cut = sp > 0 ? cut.substring(0, sp) : cut.substring(0, cut.length() - 1);
            }
            return cut.replaceAll("[\\s,(]+$", "") + " …";
        }

        void text(Style s, float x, float y, String t) throws IOException {
            cs.beginText();
            cs.setFont(s.font(), s.size());
            cs.setNonStrokingColor(s.color().r(), s.color().g(), s.color().b());
            cs.newLineAtOffset(x, y);
            cs.showText(fonts.safe(t));
            cs.endText();
        }

        void line(float x0, float y0, float x1, float y1, float w, Rgb c) throws IOException {
            cs.setLineWidth(w);
            cs.setStrokingColor(c.r(), c.g(), c.b());
            cs.moveTo(x0, y0);
            cs.lineTo(x1, y1);
            cs.stroke();
        }

        List<String> wrap(Style s, String text, float width) {
            List<String> out = new ArrayList<>();
            StringBuilder line = new StringBuilder();
            for (String word : fonts.safe(text).split(" +")) {
                String cand = line.length() == 0 ? word : line + " " + word;
                if (line.length() > 0 && width(s, cand) > width) {
                    out.add(line.toString());
                    line.setLength(0);
                    line.append(word);
                } else {
                    line.setLength(0);
                    line.append(cand);
                }
            }
            if (line.length() > 0) {
                out.add(line.toString());
            }
            return out;
        }
    }

    /** Bookmarks: parts, and the sheets within them. */
    private static void outline(PDDocument doc, Context cx, List<PDPage> all) {
        PDDocumentOutline o = new PDDocumentOutline();
        doc.getDocumentCatalog().setDocumentOutline(o);
        PDOutlineItem cover = item("Cover", all.get(0));
        o.addLast(cover);
        PDOutlineItem part = null;
        for (Context.Mark m : cx.marks) {
            PDOutlineItem it = item(m.title(), m.page());
            if (m.level() == 0 || part == null) {
                o.addLast(it);
                part = it;
            } else {
                part.addLast(it);
            }
        }
    }

    private static PDOutlineItem item(String title, PDPage page) {
        PDOutlineItem it = new PDOutlineItem();
        it.setTitle(title);
        PDPageFitWidthDestination d = new PDPageFitWidthDestination();
        d.setPage(page);
        it.setDestination(d);
        return it;
    }

    private static void info(PDDocument doc, Context cx) {
        PDDocumentInformation i = doc.getDocumentInformation();
        i.setTitle("Calculation package: " + cx.projectName());
        i.setCreator("Baywright " + cx.run.version());
        i.setSubject("Steel floor framing, " + FrontMatter.AISC + " and " + FrontMatter.ASCE);
        java.util.Calendar c = java.util.Calendar.getInstance(java.util.TimeZone.getTimeZone("UTC"));
        c.clear();
        c.set(cx.options.project().date().getYear(), cx.options.project().date().getMonthValue() - 1,
                cx.options.project().date().getDayOfMonth());
        i.setCreationDate(c);
    }

    /** A link rectangle on a contents page to a target page. */
    static PDAnnotationLink link(float x, float y, float w, float h, PDPage target) {
        PDAnnotationLink a = new PDAnnotationLink();
        a.setRectangle(new PDRectangle(x, y, w, h));
        PDBorderStyleDictionary b = new PDBorderStyleDictionary();
        b.setWidth(0);
        a.setBorderStyle(b);
        PDPageFitWidthDestination d = new PDPageFitWidthDestination();
        d.setPage(target);
        a.setDestination(d);
        return a;
    }
}
