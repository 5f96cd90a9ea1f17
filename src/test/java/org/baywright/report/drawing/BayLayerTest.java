package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.io.PlanFiles;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The framing plan's bay layer on the demo (a composite floor whose run checks its bays for walking): off by
 * default, and when on, each checked bay's f_n and a_p/g (the run's own numbers) written inside the bay near its
 * centre, clear of the beams and of the members' labels, exceeding bays marked in a colour of their own.
 */
class BayLayerTest {
    static RunResult run;
    static final String LEVEL = "Level 3"; // the level whose layout has the demo's worst bay (B-C/3-4)
    static final DrawingOptions B = DrawingOptions.defaults().withPaper(Paper.ANSI_B).withDate("2025-03-14");

    @BeforeAll
    static void runDemo() {
        run = PlanRun.run(PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow());
    }

    private static List<BayResult> bays() {
        return run.bays().stream().filter(b -> b.levels().contains(LEVEL) && b.checked()).toList();
    }

    @Test
    void offByDefaultSoExistingDrawingsAreUnchanged() {
        FramingPlanDrawing d = FramingPlanDrawing.of(run, LEVEL, B);
        assertAll(
                () -> assertTrue(d.layer(Layer.BAYS).isEmpty()),
                () -> assertTrue(d.texts().stream().noneMatch(t -> t.text().contains("FLOOR VIBRATION"))));
    }

    @Test
    void aRunWithoutBaysDrawsTheSameWithTheLayerOn() {
        RunResult bare = PlanRun.run(PlanFiles.read(Path.of("plans/examples/two-bay.bay.json")).plan().orElseThrow());
        assertTrue(bare.bays().isEmpty(), "the two-bay example describes no slab");
        assertEquals(FramingPlanDrawing.of(bare, "Level 2", B).primitives(),
                FramingPlanDrawing.of(bare, "Level 2", B.withBays(true)).primitives());
    }

    @Test
    void eachCheckedBayHasItsNumbersInsideItNearItsCentre() {
        FramingPlanDrawing d = FramingPlanDrawing.of(run, LEVEL, B.withBays(true));
        List<Primitive.Text> texts = d.layer(Layer.BAYS).stream().filter(Primitive.Text.class::isInstance)
                .map(Primitive.Text.class::cast).toList();
        List<Executable> checks = new ArrayList<>();
        assertFalse(bays().isEmpty());
        for (BayResult b : bays()) {
            Bay bay = b.bay();
            String fn = String.format(Locale.ROOT, "f_n %.2f Hz", b.result().fn());
            String apg = String.format(Locale.ROOT, "a_p/g %.3f %%", b.result().apg() * 100);
            List<Primitive.Text> mine = texts.stream().filter(t -> inside(bay, t.at())).toList();
            checks.add(() -> assertEquals(List.of(fn, apg), mine.stream().map(Primitive.Text::text).toList(), bay.id()));
            checks.add(() -> {
                // the pair's midpoint: within a quarter span of the centre along the beams, between two beams across
                double mx = (mine.get(0).at().x() + mine.get(1).at().x()) / 2;
                double my = (mine.get(0).at().y() + mine.get(1).at().y()) / 2;
                double[] la = local(bay, mx, my);
                assertTrue(Math.abs(la[0]) <= bay.beamSpan() / 4 + 1e-6, bay.id() + " along " + la[0]);
                double fromBeam = Math.abs(Math.IEEEremainder(la[1] + bay.width() / 2, bay.spacing()));
                assertEquals(bay.spacing() / 2, fromBeam, 1e-6, bay.id() + ": midway between beams");
            });
        }
        assertAll(checks);
    }

    @Test
    void exceedingBaysAreMarkedInAColourOfTheirOwn() {
        FramingPlanDrawing d = FramingPlanDrawing.of(run, LEVEL, B.withBays(true));
        List<BayResult> exceeding = bays().stream().filter(b -> b.result().status() == VibrationStatus.EXCEEDS).toList();
        assertFalse(exceeding.isEmpty(), "the demo's worst bay (B-C/3-4) is on Level 3 and exceeds");
        List<Primitive.Path> diamonds = d.layer(Layer.BAYS).stream().filter(Primitive.Path.class::isInstance)
                .map(Primitive.Path.class::cast).toList();
        assertEquals(exceeding.size(), diamonds.size(), "one diamond per exceeding bay");
        List<Executable> checks = new ArrayList<>();
        for (BayResult b : exceeding) {
            checks.add(() -> assertTrue(diamonds.stream().anyMatch(p -> inside(b.bay(), p.points().get(0))), b.bay().id()));
        }
        for (Primitive p : d.layer(Layer.BAYS)) {
            if (p instanceof Primitive.Text t) {
                checks.add(() -> assertTrue(t.bold() == (t.colour() == BayMarks.EXCEEDS), t.text()));
            }
        }
        // not a colour of the demand/capacity map (cividis, 0 to 1): at least 60 apart in RGB from every step of it
        for (Rgb c : List.of(BayMarks.INK, BayMarks.EXCEEDS)) {
            for (int i = 0; i <= 100; i++) {
                Rgb m = Cividis.at(i / 100.0);
                double dist = Math.sqrt(Math.pow(c.r() - m.r(), 2) + Math.pow(c.g() - m.g(), 2) + Math.pow(c.b() - m.b(), 2));
                int k = i;
                checks.add(() -> assertTrue(dist > 60, c.hex() + " near cividis " + k + " %"));
            }
        }
        assertTrue(d.texts().stream().anyMatch(t -> t.text().equals("FLOOR VIBRATION (AISC DG11)")), "its note");
        assertAll(checks);
    }

    @Test
    void theBayTextsOverlapNoMemberLabel() {
        FramingPlanDrawing d = FramingPlanDrawing.of(run, LEVEL, B.withBays(true));
        List<double[]> labels = d.texts().stream().filter(t -> t.layer() == Layer.MEMBER_LABELS).map(t -> box(d, t)).toList();
        List<Executable> checks = new ArrayList<>();
        for (Primitive p : d.layer(Layer.BAYS)) {
            if (p instanceof Primitive.Text t) {
                double[] a = box(d, t);
                checks.add(() -> assertTrue(labels.stream().noneMatch(b -> overlap(a, b)), t.text() + " overlaps a member label"));
                // and it lies wholly inside its bay
                Bay bay = bays().stream().map(BayResult::bay).filter(x -> inside(x, t.at())).findFirst().orElseThrow();
                for (Pt corner : List.of(new Pt(a[0], a[1]), new Pt(a[2], a[1]), new Pt(a[0], a[3]), new Pt(a[2], a[3]))) {
                    checks.add(() -> assertTrue(inside(bay, d.viewport().toPlan(corner)), t.text() + " runs out of " + bay.id()));
                }
            }
        }
        assertFalse(checks.isEmpty());
        assertAll(checks);
    }

    /** The paper box of a text turned by 0 or ±90 degrees (the demo's members run along x or y): x0, y0, x1, y1. */
    private static double[] box(FramingPlanDrawing d, Primitive.Text t) {
        Pt at = d.toPaper(t, t.at());
        double w = TextMetrics.width(t.text(), t.size(), t.bold());
        double h = Anchor.CAP_HEIGHT * t.size();
        double a0 = -t.anchor().along() * w;
        double c0 = -t.anchor().across() * h;
        if (Math.abs(t.rotation()) < 1e-9) {
            return new double[] {at.x() + a0, at.y() + c0, at.x() + a0 + w, at.y() + c0 + h};
        }
        assertEquals(90, Math.abs(t.rotation()), 1e-9, "a text along x or y: " + t.text());
        return new double[] {at.x() - c0 - h, at.y() + a0, at.x() - c0, at.y() + a0 + w};
    }

    private static boolean overlap(double[] a, double[] b) {
        return a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];
    }

    /** A plan point in the bay's axes: along the beams and across them, from the bay's centre (m). */
    private static double[] local(Bay bay, double x, double y) {
        double a = Math.toRadians(bay.beamAngle());
        double dx = x - bay.centre().x();
        double dy = y - bay.centre().y();
        return new double[] {dx * Math.cos(a) + dy * Math.sin(a), -dx * Math.sin(a) + dy * Math.cos(a)};
    }

    private static boolean inside(Bay bay, Pt p) {
        double[] l = local(bay, p.x(), p.y());
        return Math.abs(l[0]) < bay.beamSpan() / 2 && Math.abs(l[1]) < bay.width() / 2;
    }
}
