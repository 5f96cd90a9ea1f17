package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.baywright.calc.Caution;
import org.baywright.design.MemberStatus;
import org.baywright.load.LoadCase;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.GridLine;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

class FramingPlanDrawingTest {
    private static final DrawingOptions A3 = DrawingOptions.defaults().withPaper(Paper.ISO_A3).withDate("2025-03-14");

    private static FramingPlanDrawing small(DrawingOptions o) {
        return FramingPlanDrawing.of(DrawingSamples.small(), "Level 2", o);
    }

    private static List<MemberResult> smallMembers() {
        return DrawingSamples.small().takedown().members().get("typical");
    }

    private static MemberResult member(String id) {
        return smallMembers().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    private static List<Primitive.Text> texts(FramingPlanDrawing d, Layer layer) {
        return d.texts().stream().filter(t -> t.layer() == layer).toList();
    }

    private static double paperDistance(FramingPlanDrawing d, Primitive.Text t, double x, double y) {
        Pt a = d.viewport().toPaper(t.at());
        Pt b = d.viewport().toPaper(new Pt(x, y));
        return Math.hypot(a.x() - b.x(), a.y() - b.y());
    }

    /** The member label of a text at the member's midpoint: its size, within a few millimetres on paper. */
    private static Primitive.Text sizeLabelOf(FramingPlanDrawing d, MemberResult m, String text) {
        double mx = (m.start().x() + m.end().x()) / 2;
        double my = (m.start().y() + m.end().y()) / 2;
        return texts(d, Layer.MEMBER_LABELS).stream().filter(t -> t.text().equals(text))
                .filter(t -> paperDistance(d, t, mx, my) < 3 * d.paper().textSize()).findFirst().orElse(null);
    }

    @Test
    void everyMemberHasItsSizeWrittenAlongItReadably() {
        FramingPlanDrawing d = small(A3);
        List<Executable> checks = new ArrayList<>();
        for (MemberResult m : smallMembers()) {
            if (m.design() == null || m.design().section() == null) {
                continue;
            }
            checks.add(() -> {
                String expected = sizeLabelText(m);
                Primitive.Text t = sizeLabelOf(d, m, expected);
                assertNotNull(t, m.id() + ": no label " + expected + " at its midpoint");
                double angle = Math.toDegrees(Math.atan2(m.end().y() - m.start().y(), m.end().x() - m.start().x()));
                double readable = angle > 90 ? angle - 180 : angle <= -90 ? angle + 180 : angle;
                assertEquals(readable, t.rotation(), 1e-9, m.id() + " label rotation");
            });
        }
        assertFalse(checks.isEmpty());
        checks.add(() -> assertTrue(d.texts().stream().allMatch(t -> t.rotation() > -90 && t.rotation() <= 90),
                "every text reads from the left or from below"));
        assertAll(checks);
    }

    @Test
    void fixedSizesAreBracketedAndOthersAreNot() {
        FramingPlanDrawing d = small(A3);
        assertAll(
                () -> assertEquals(MemberStatus.FIXED_SIZE, member("G-2-BC").status()),
                () -> assertNotNull(sizeLabelOf(d, member("G-2-BC"), "[W24X104]")),
                () -> assertNotNull(sizeLabelOf(d, member("G-1-AB"), "[W8X10]"), "a failing fixed size keeps its brackets"),
                () -> assertNotNull(sizeLabelOf(d, member("G-1-BC"), member("G-1-BC").section())),
                () -> assertEquals(2, texts(d, Layer.MEMBER_LABELS).stream().filter(t -> t.text().startsWith("[")).count()));
    }

    @Test
    void anOverstressedMemberHasADashedHeavyOutlineAndItsRatioMarked() {
        FramingPlanDrawing d = small(A3);
        MemberResult g = member("G-1-AB");
        assertEquals(MemberStatus.OVERSTRESSED, g.status());
        List<Primitive.Path> outlines = d.layer(Layer.MEMBERS).stream().filter(Primitive.Path.class::isInstance)
                .map(Primitive.Path.class::cast).filter(p -> p.outline() != null).toList();
        assertEquals(1, outlines.size(), "only the overstressed member is outlined");
        Primitive.Path o = outlines.get(0);
        double ymin = o.points().stream().mapToDouble(Pt::y).min().orElseThrow();
        double ymax = o.points().stream().mapToDouble(Pt::y).max().orElseThrow();
        double xmin = o.points().stream().mapToDouble(Pt::x).min().orElseThrow();
        double xmax = o.points().stream().mapToDouble(Pt::x).max().orElseThrow();
        assertAll(
                () -> assertTrue(o.outline().isDashed(), "dashed"),
                () -> assertTrue(o.outline().width() >= 0.6, "heavy: " + o.outline().width()),
                () -> assertTrue(ymin < g.start().y() && ymax > g.start().y(), "around the member"),
                () -> assertEquals(g.start().x(), xmin, 1e-9),
                () -> assertEquals(g.end().x(), xmax, 1e-9),
                () -> assertTrue(texts(d, Layer.MEMBER_LABELS).stream()
                        .anyMatch(t -> t.text().equals(String.format(Locale.ROOT, "%.2f over", g.maxRatio())))));
    }

    @Test
    void bandsAreColouredByRatioOnTheCividisMap() {
        FramingPlanDrawing d = small(A3);
        List<Primitive.Path> bands = d.layer(Layer.MEMBERS).stream().filter(Primitive.Path.class::isInstance)
                .map(Primitive.Path.class::cast).filter(p -> p.fill() != null).toList();
        List<Executable> checks = new ArrayList<>();
        for (MemberResult m : smallMembers()) {
            if (!Double.isFinite(m.maxRatio())) {
                continue;
            }
            double mx = (m.start().x() + m.end().x()) / 2;
            double my = (m.start().y() + m.end().y()) / 2;
            checks.add(() -> {
                Primitive.Path band = bands.stream().filter(b -> {
                    double cx = b.points().stream().mapToDouble(Pt::x).average().orElseThrow();
                    double cy = b.points().stream().mapToDouble(Pt::y).average().orElseThrow();
                    return Math.hypot(cx - mx, cy - my) < 1e-6;
                }).findFirst().orElse(null);
                assertNotNull(band, m.id() + " band");
                assertEquals(Cividis.at(Math.min(1, m.maxRatio())), band.fill(), m.id());
                assertTrue(texts(d, Layer.MEMBER_LABELS).stream()
                        .anyMatch(t -> t.text().startsWith(String.format(Locale.ROOT, "%.2f", m.maxRatio()))), m.id() + " ratio");
            });
        }
        assertEquals(smallMembers().size() - 1, checks.size(), "all but the unsupported member are banded");
        assertAll(checks);
    }

    @Test
    void anUnsupportedMemberIsLabelledAndItsBareEndCrossed() {
        FramingPlanDrawing d = small(A3);
        MemberResult stub = member("B-stub");
        assertEquals(MemberStatus.UNSUPPORTED, stub.status());
        List<Primitive.Line> lines = d.layer(Layer.MEMBERS).stream().filter(Primitive.Line.class::isInstance)
                .map(Primitive.Line.class::cast).toList();
        long crossingAtEnd = lines.stream().filter(l -> Math.abs((l.from().x() + l.to().x()) / 2 - stub.end().x()) < 1e-9
                && Math.abs((l.from().y() + l.to().y()) / 2 - stub.end().y()) < 1e-9).count();
        long crossingAtStart = lines.stream().filter(l -> Math.abs((l.from().x() + l.to().x()) / 2 - stub.start().x()) < 1e-9
                && Math.abs((l.from().y() + l.to().y()) / 2 - stub.start().y()) < 1e-9 && l.from().x() != l.to().x()
                && l.from().y() != l.to().y()).count();
        Primitive.Line centre = lines.stream().filter(l -> l.from().equals(new Pt(stub.start().x(), stub.start().y()))
                && l.to().equals(new Pt(stub.end().x(), stub.end().y()))).findFirst().orElseThrow();
        assertAll(
                () -> assertNotNull(sizeLabelOf(d, stub, "UNSUPPORTED")),
                () -> assertEquals(2, crossingAtEnd, "× at the end with nothing under it"),
                () -> assertEquals(0, crossingAtStart, "no × at the end that bears on a girder"),
                () -> assertTrue(centre.pen().isDashed(), "drawn dash-dot"));
    }

    @Test
    void factoredReactionsAreTheGoverningLrfdCombination() {
        FramingPlanDrawing d = small(A3.withReactions(ReactionMode.FACTORED));
        List<Executable> checks = new ArrayList<>();
        for (MemberResult m : smallMembers()) {
            if (m.design() == null) {
                continue;
            }
            for (double[] r : List.of(m.startReaction(), m.endReaction())) {
                double[] c = Component.byCase(r);
                double dead = c[LoadCase.D.ordinal()];
                double live = c[LoadCase.L.ordinal()];
                // floor members: 1.4D or 1.2D + 1.6L (ASCE 7-16 §2.3.1), whichever is larger
                double kips = Units.KIPS.fromSi(Math.max(1.4 * dead, 1.2 * dead + 1.6 * live));
                String expected = "R=" + UnitSystem.threeFigures(kips) + "k";
                checks.add(() -> assertTrue(texts(d, Layer.MEMBER_LABELS).stream().anyMatch(t -> t.text().equals(expected)),
                        m.id() + " reaction " + expected));
            }
        }
        assertEquals(2 * (smallMembers().size() - 1), checks.size());
        assertAll(checks);
    }

    @Test
    void eachReactionIsWrittenNearItsOwnEnd() {
        FramingPlanDrawing d = small(A3.withReactions(ReactionMode.SERVICE));
        List<Primitive.Text> reactions = texts(d, Layer.MEMBER_LABELS).stream().filter(t -> t.text().startsWith("R=")).toList();
        List<Executable> checks = new ArrayList<>();
        for (MemberResult m : smallMembers()) {
            if (m.design() == null) {
                continue;
            }
            for (int end = 0; end < 2; end++) {
                Point at = end == 0 ? m.start() : m.end();
                double[] c = Component.byCase(end == 0 ? m.startReaction() : m.endReaction());
                String expected = "R=" + UnitSystem.threeFigures(Units.KIPS.fromSi(c[LoadCase.D.ordinal()])) + "D+"
                        + UnitSystem.threeFigures(Units.KIPS.fromSi(c[LoadCase.L.ordinal()])) + "L";
                // of the reaction labels along this member (parallel to it, beside its span), the one nearest this end
                double rotation = sizeLabelOf(d, m, sizeLabelText(m)).rotation();
                Primitive.Text nearest = reactions.stream().filter(t -> t.rotation() == rotation && besideSpan(m, t.at()))
                        .min(Comparator.comparingDouble(t -> paperDistance(d, t, at.x(), at.y()))).orElseThrow();
                String which = m.id() + (end == 0 ? " start" : " end");
                checks.add(() -> assertEquals(expected, nearest.text(), which));
                checks.add(() -> assertTrue(paperDistance(d, nearest, at.x(), at.y()) < 8 * d.paper().textSize(), which));
            }
        }
        assertAll(checks);
    }

    /** True when a point projects onto the member between its ends. */
    private static boolean besideSpan(MemberResult m, Pt p) {
        double dx = m.end().x() - m.start().x();
        double dy = m.end().y() - m.start().y();
        double s = ((p.x() - m.start().x()) * dx + (p.y() - m.start().y()) * dy) / (dx * dx + dy * dy);
        return s > 0 && s < 1;
    }

    private static String sizeLabelText(MemberResult m) {
        return m.status() == MemberStatus.FIXED_SIZE || m.id().equals("G-1-AB") ? "[" + m.section() + "]" : m.section();
    }

    @Test
    void aMemberDrawnRightToLeftIsLabelledReadingFromTheLeft() {
        FramingPlanDrawing d = small(A3);
        MemberResult skew = member("B-skew");
        assertTrue(skew.end().x() < skew.start().x(), "drawn towards the west");
        double reading = Math.toDegrees(Math.atan2(skew.start().y() - skew.end().y(), skew.start().x() - skew.end().x()));
        Primitive.Text label = sizeLabelOf(d, skew, skew.section());
        assertNotNull(label);
        assertEquals(reading, label.rotation(), 1e-9);
        assertTrue(reading > -90 && reading < 0, "reads downhill to the right: " + reading);
    }

    @Test
    void serviceReactionsListDeadAndLiveSeparately() {
        FramingPlanDrawing d = small(A3.withReactions(ReactionMode.SERVICE));
        MemberResult g = member("G-2-AB");
        double[] c = Component.byCase(g.startReaction());
        String expected = "R=" + UnitSystem.threeFigures(Units.KIPS.fromSi(c[LoadCase.D.ordinal()])) + "D+"
                + UnitSystem.threeFigures(Units.KIPS.fromSi(c[LoadCase.L.ordinal()])) + "L";
        assertAll(
                () -> assertTrue(c[LoadCase.L.ordinal()] > 0),
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().equals(expected)), expected),
                () -> assertTrue(d.texts().stream().noneMatch(t -> t.text().matches("R=[0-9.,]+k")), "no factored reactions"));
    }

    @Test
    void asdReactionsAreServiceCombinations() {
        Plan p = DrawingSamples.smallPlan();
        DesignSettings s = p.settings();
        Plan asd = new Plan(p.name(), p.units(), new DesignSettings("asd", s.fy(), s.liveDeflection(), s.totalDeflection(),
                s.beamSeries(), s.girderSeries(), s.columnSeries(), s.maxBeamDepth(), s.spliceEvery(), s.liveLoadReduction(),
                s.partitionAsDead(), s.girderAreaDelivered(), s.catalog()), p.grid(), p.levels(), p.floors(), p.columns());
        RunResult run = PlanRun.run(asd);
        FramingPlanDrawing d = FramingPlanDrawing.of(run, "Level 2", A3);
        MemberResult g = run.takedown().members().get("typical").stream().filter(m -> m.id().equals("G-2-AB")).findFirst()
                .orElseThrow();
        double[] c = Component.byCase(g.startReaction());
        String expected = String.format(Locale.ROOT, "R=%.1fk", Units.KIPS.fromSi(c[LoadCase.D.ordinal()] + c[LoadCase.L.ordinal()]));
        assertAll(
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().equals(expected)), expected),
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().startsWith("AISC 360-16 ASD"))));
    }

    @Test
    void gridLinesHaveBubblesAtBothEndsAndDimensionsInFeetAndInches() {
        FramingPlanDrawing d = small(A3);
        Plan p = DrawingSamples.small().plan();
        List<Primitive.Circle> bubbles = d.layer(Layer.GRID).stream().filter(Primitive.Circle.class::isInstance)
                .map(Primitive.Circle.class::cast).toList();
        List<String> dims = texts(d, Layer.DIMENSIONS).stream().map(Primitive.Text::text).toList();
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(2 * p.grid().size(), bubbles.size()));
        for (GridLine g : p.grid()) {
            checks.add(() -> assertEquals(2, texts(d, Layer.GRID).stream().filter(t -> t.text().equals(g.label())).count(),
                    "grid " + g.label()));
        }
        checks.add(() -> assertEquals(List.of("30'-0\"", "25'-0\"", "55'-0\"", "28'-0\""), dims));
        assertAll(checks);
    }

    @Test
    void siDrawingsDimensionInMillimetresAndUseMetricScalesAndKilonewtons() {
        FramingPlanDrawing d = small(A3.withUnits(UnitSystem.SI));
        assertAll(
                () -> assertEquals(List.of("9144", "7620", "16764", "8534"),
                        texts(d, Layer.DIMENSIONS).stream().map(Primitive.Text::text).toList()),
                () -> assertTrue(d.scale().label().startsWith("1:"), d.scale().label()),
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().matches("R=[0-9.]+kN"))),
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().equals("D 2.68, SD 0.48, L 5.99 kPa"))));
    }

    @Test
    void columnsAreFilledSquaresWithMarkAndSection() {
        FramingPlanDrawing d = small(A3);
        RunResult run = DrawingSamples.small();
        List<Primitive.Path> squares = d.layer(Layer.COLUMNS).stream().map(Primitive.Path.class::cast).toList();
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(run.takedown().columns().size(), squares.size()));
        for (var c : run.takedown().columns()) {
            String section = c.tiers().get(0).section();
            checks.add(() -> assertTrue(squares.stream().anyMatch(s -> s.fill() != null && Math.abs(s.points().stream()
                    .mapToDouble(Pt::x).average().orElseThrow() - c.at().x()) < 1e-9
                    && Math.abs(s.points().stream().mapToDouble(Pt::y).average().orElseThrow() - c.at().y()) < 1e-9), c.id()));
            checks.add(() -> assertTrue(texts(d, Layer.MEMBER_LABELS).stream().anyMatch(t -> t.text().equals(c.id()) && t.bold())));
            checks.add(() -> assertTrue(texts(d, Layer.MEMBER_LABELS).stream().anyMatch(t -> t.text().equals(section))));
        }
        assertAll(checks);
    }

    @Test
    void openingsAreCrossHatchedAndAreaLoadsHatchedOtherwiseAndTagged() {
        FramingPlanDrawing d = small(A3);
        List<Primitive.Path> openings = d.layer(Layer.OPENINGS).stream().map(Primitive.Path.class::cast).toList();
        List<Primitive.Path> loads = d.layer(Layer.AREA_LOADS).stream().map(Primitive.Path.class::cast).toList();
        List<String> tags = texts(d, Layer.TAGS).stream().map(Primitive.Text::text).toList();
        List<Primitive.Path> boxes = d.layer(Layer.TAGS).stream().filter(Primitive.Path.class::isInstance)
                .map(Primitive.Path.class::cast).toList();
        List<Primitive.Line> members = d.layer(Layer.MEMBERS).stream().filter(Primitive.Line.class::isInstance)
                .map(Primitive.Line.class::cast).filter(l -> l.pen().width() >= 0.3).toList();
        assertAll(
                () -> assertEquals(1, openings.size()),
                () -> assertEquals(Hatch.Pattern.CROSS, openings.get(0).hatch().pattern()),
                () -> assertEquals(2, loads.size(), "the floor-wide load is not outlined, the patches are"),
                () -> assertTrue(loads.stream().allMatch(l -> l.hatch() != null && l.hatch().pattern() != Hatch.Pattern.CROSS)),
                () -> assertTrue(loads.stream().allMatch(l -> l.outline().isDashed())),
                () -> assertEquals(List.of("OPENING", "OP-stair", "AREA LOAD AL-plant", "D 56, SD 10, L 125 psf",
                        "AREA LOAD AL-files", "L 100 psf"), tags),
                () -> assertTrue(d.texts().stream().anyMatch(t -> t.text().contains("AL-floor")), "floor load in the notes"),
                // AL-files is crossed by the skewed beam: its tag sits outside with a leader to a dot inside
                () -> assertEquals(1, d.layer(Layer.TAGS).stream().filter(Primitive.Line.class::isInstance).count()),
                () -> assertEquals(1, d.layer(Layer.TAGS).stream().filter(Primitive.Circle.class::isInstance).count()),
                () -> assertEquals(3, boxes.size()),
                () -> {
                    for (Primitive.Path b : boxes) {
                        double[] r = {b.points().get(0).x(), b.points().get(0).y(), b.points().get(2).x(), b.points().get(2).y()};
                        for (Primitive.Line l : members) {
                            assertTrue(!PlanPicture.segmentMeetsBox(l.from().x(), l.from().y(), l.to().x(), l.to().y(), r),
                                    "a tag hides a member line from " + l.from() + " to " + l.to());
                        }
                    }
                });
    }

    @Test
    void theTitleBlockCarriesProjectLevelDateVersionBasisAndTheCaution() {
        FramingPlanDrawing d = small(A3);
        List<Primitive.Text> tb = texts(d, Layer.TITLE_BLOCK);
        String all = String.join(" ", tb.stream().map(Primitive.Text::text).toList());
        assertAll(
                () -> assertTrue(all.contains(Caution.TEXT), "caution, whole"),
                () -> assertTrue(all.contains("Drawing test bay")),
                () -> assertTrue(all.contains("Level 2 — framing plan")),
                () -> assertTrue(all.contains("2025-03-14")),
                () -> assertTrue(all.contains("Baywright 0.0-test")),
                () -> assertTrue(all.contains("AISC 360-16 LRFD")),
                () -> assertTrue(all.contains("Catalog: " + DrawingSamples.small().catalogName())),
                () -> assertTrue(all.contains(d.scale().label())),
                () -> assertTrue(tb.stream().allMatch(t -> t.space() == Space.PAPER)));
    }

    @Test
    void withoutADateTheDateFieldIsEmpty() {
        FramingPlanDrawing d = small(A3.withDate(null));
        assertTrue(d.texts().stream().noneMatch(t -> t.text().matches(".*\\d{4}-\\d{2}-\\d{2}.*")));
        assertTrue(texts(d, Layer.TITLE_BLOCK).stream().anyMatch(t -> t.text().equals("DATE")));
    }

    @Test
    void northArrowScaleBarAndColourRampAreInTheLegend() {
        FramingPlanDrawing d = small(A3);
        List<String> legend = texts(d, Layer.LEGEND).stream().map(Primitive.Text::text).toList();
        long rampSteps = d.layer(Layer.LEGEND).stream().filter(Primitive.Path.class::isInstance).map(Primitive.Path.class::cast)
                .filter(p -> p.fill() != null && p.outline() == null).map(Primitive.Path::fill).distinct().count();
        assertAll(
                () -> assertTrue(legend.contains("N")),
                () -> assertTrue(legend.contains("SCALE " + d.scale().label())),
                () -> assertTrue(legend.stream().anyMatch(s -> s.endsWith(" ft"))),
                () -> assertTrue(legend.containsAll(List.of("0.0", "0.2", "0.4", "0.6", "0.8", "1.0"))),
                () -> assertTrue(rampSteps >= 20, "ramp colours: " + rampSteps));
    }

    @Test
    void thePlanFitsInsideTheDrawingAreaAtAStandardScale() {
        for (Paper paper : Paper.values()) {
            FramingPlanDrawing d = FramingPlanDrawing.of(DrawingSamples.demo(), "Level 3", A3.withPaper(paper));
            double panelLeft = d.layer(Layer.SHEET).stream().filter(Primitive.Line.class::isInstance)
                    .map(Primitive.Line.class::cast).mapToDouble(l -> l.from().x()).max().orElseThrow();
            List<Executable> checks = new ArrayList<>();
            checks.add(() -> assertTrue(DrawingScale.US.contains(d.scale()), paper + ": " + d.scale()));
            for (Primitive p : d.primitives()) {
                if (p.space() != Space.PLAN) {
                    continue;
                }
                for (Pt q : points(p)) {
                    Pt on = d.toPaper(p, q);
                    checks.add(() -> assertTrue(on.x() > 0 && on.x() < panelLeft && on.y() > 0 && on.y() < paper.height(),
                            paper + ": " + p.layer() + " at " + on));
                }
            }
            assertAll(checks);
        }
    }

    private static List<Pt> points(Primitive p) {
        if (p instanceof Primitive.Line l) {
            return List.of(l.from(), l.to());
        }
        if (p instanceof Primitive.Path s) {
            return s.points();
        }
        if (p instanceof Primitive.Circle c) {
            return List.of(c.centre());
        }
        return List.of(((Primitive.Text) p).at());
    }

    @Test
    void anotherLevelOfATypicalLayoutDrawsTheSameMembersWithItsOwnTitle() {
        FramingPlanDrawing l3 = FramingPlanDrawing.of(DrawingSamples.demo(), "Level 3", A3);
        FramingPlanDrawing l4 = FramingPlanDrawing.of(DrawingSamples.demo(), "Level 4", A3);
        assertAll(
                () -> assertEquals(l3.layer(Layer.MEMBERS), l4.layer(Layer.MEMBERS)),
                () -> assertEquals("typical", l4.floorId()),
                () -> assertTrue(l4.texts().stream().anyMatch(t -> t.text().equals("LEVEL 4 FRAMING PLAN"))),
                () -> assertTrue(l4.texts().stream().anyMatch(t -> t.text().contains("used at Level 3, Level 4"))));
    }

    @Test
    void anUnknownLevelIsRefusedWithTheLevelsListed() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FramingPlanDrawing.of(DrawingSamples.demo(), "Level 9", A3));
        assertEquals("no level \"Level 9\" in plan \"Harbourview Offices (demo)\"; its levels are: Level 2, Level 3, Level 4, Roof",
                e.getMessage());
    }

    @Test
    void theModelIsImmutable() {
        FramingPlanDrawing d = small(A3);
        assertThrows(UnsupportedOperationException.class, () -> d.primitives().clear());
        assertThrows(UnsupportedOperationException.class, () -> d.texts().clear());
    }
}
