package org.baywright.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.report.drawing.DrawingOptions;
import org.baywright.report.drawing.FramingPlanDrawing;
import org.baywright.report.drawing.Layer;
import org.baywright.report.drawing.MemberLabels;
import org.baywright.report.drawing.Paper;
import org.baywright.report.drawing.Primitive;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The reports of a run the takedown designs compositely: a regular plan of 2 × 2 bays, 30 ft × 45 ft,
 * beams at 10 ft, two floors with the typical slab (3 in deck, 4½ in normal-weight concrete, ¾ in studs:
 * {@link Slab#typical()}) and a roof without one. The JSON, the takeoff and the framing plan must tell
 * the same studs, camber and weights as the members.
 */
class CompositeReportsTest {
    private static RunResult run;

    @BeforeAll
    static void design() {
        double ft = 0.3048;
        double psf = 4.4482216152605 / (ft * ft);
        Plan base = RegularPlan.generate(new RegularPlan.Spec("composite bays", "us", List.of(30 * ft, 30 * ft),
                List.of(45 * ft, 45 * ft), List.of(13 * ft, 13 * ft), true, 10 * ft, new LoadValues(50 * psf, 10 * psf, 100 * psf, 0, 0, 0),
                new LoadValues(40 * psf, 10 * psf, 0, 20 * psf, 0, 0), LoadValues.ZERO));
        run = PlanRun.run(RegularPlan.withSlab(base, Slab.typical(), CompositeMode.COMPOSITE, 0), CatalogFile.loadDefault());
    }

    @SuppressWarnings("unchecked")
    @Test
    void jsonTakeoffAndTotalsAgree() {
        Map<String, Object> json = RunSummary.json(run, UnitSystem.US);
        Map<String, Object> totals = (Map<String, Object>) json.get("totals");
        int studs = 0;
        int cambered = 0;
        List<String> missing = new ArrayList<>();
        for (Object o : (List<Object>) json.get("members")) {
            Map<String, Object> m = (Map<String, Object>) o;
            Map<String, Object> c = (Map<String, Object>) m.get("composite");
            if (c != null) {
                studs += (Integer) c.get("studs");
                cambered += ((Number) c.get("camber")).doubleValue() > 0 ? 1 : 0;
            } else if (!"Roof".equalsIgnoreCase(String.valueOf(m.get("level"))) && !String.valueOf(m.get("floor")).equals("roof")) {
                missing.add(String.valueOf(m.get("id")));
            }
        }
        Takeoff t = Takeoff.of(run, 0);
        CompositeTotals ct = CompositeTotals.of(run.takedown());
        int s = studs;
        int c = cambered;
        assertAll("a composite run",
                () -> assertTrue(missing.isEmpty(), "floor members without composite: " + missing),
                () -> assertTrue(s > 0),
                () -> assertEquals(s, totals.get("studs")),
                () -> assertEquals(c, totals.get("camberedPieces")),
                () -> assertEquals(s, t.studs(), "the takeoff counts the same studs"),
                () -> assertEquals(c, t.camberedPieces()),
                () -> assertEquals(ct.nonCompositeWeight(), t.nonCompositeTotal(), 1e-9 * t.total()),
                () -> assertTrue(t.nonCompositeTotal() > t.total(), "composite action saves steel"),
                () -> assertTrue(RunSummary.text(run, UnitSystem.US).contains("headed studs")));
    }

    /** The package of the run: one composite section per sheet of composite members, and the statement on the cover. */
    @Test
    void thePackageHasACompositeSectionOnEachCompositeSheet(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws java.io.IOException {
        java.nio.file.Path pdf = dir.resolve("composite.pdf");
        org.baywright.report.pdf.CalculationPackage.write(run, pdf, new org.baywright.report.pdf.PackageOptions(UnitSystem.US,
                org.baywright.report.pdf.ProjectInfo.named("composite bays", java.time.LocalDate.of(2026, 12, 2)), 0));
        String text;
        try (var doc = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        int sections = text.split("Composite section \\(AISC 360-16 Chapter I\\)", -1).length - 1;
        int sheets = text.split("Written on the plan as ", -1).length - 1;
        assertAll("package",
                () -> assertTrue(sections > 0, "composite sections"),
                () -> assertEquals(sections, sheets, "each with its plan notation"),
                () -> assertTrue(text.contains("Composite design: "), "the statement on the cover"),
                () -> assertTrue(text.contains("Studs and camber"), "the takeoff's studs and camber table"));
    }

    @Test
    void theFramingPlanWritesStudsAndCamberOnEveryCompositeMember() {
        String level = run.plan().levels().get(0).name();
        FramingPlanDrawing d = FramingPlanDrawing.of(run, level, DrawingOptions.defaults().withPaper(Paper.ANSI_B).withDate("2026-12-02"));
        List<String> labels = d.texts().stream().filter(x -> x.layer() == Layer.MEMBER_LABELS).map(Primitive.Text::text).toList();
        String floor = run.takedown().levelFloors().get(level);
        List<String> missing = new ArrayList<>();
        for (MemberResult m : run.takedown().members().get(floor)) {
            if (m.isComposite() && m.design() != null && m.design().section() != null) {
                String part = MemberLabels.studsAndCamber(m, UnitSystem.US);
                if (labels.stream().noneMatch(l -> l.contains(m.section()) && l.endsWith(part))) {
                    missing.add(m.id() + " " + part);
                }
            }
        }
        assertTrue(missing.isEmpty(), "labels missing: " + missing + " in " + labels);
    }
}
