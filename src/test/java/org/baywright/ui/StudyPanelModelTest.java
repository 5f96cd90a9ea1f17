package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.baywright.io.PlanFiles;
import org.baywright.plan.GridLine;
import org.baywright.plan.Plan;
import org.baywright.study.Objective;
import org.baywright.study.Parameter;
import org.baywright.study.Setting;
import org.baywright.study.StudyResult;
import org.baywright.study.VariantResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The Study panel's checking and figures, without a toolkit. */
class StudyPanelModelTest {
    private static final Plan TWO_BAY = PlanFiles.read(Path.of("plans", "examples", "two-bay.bay.json")).plan().orElseThrow();

    private static StudyPanelModel.Checked check(Map<String, String> texts) {
        return StudyPanelModel.check(TWO_BAY, texts);
    }

    @Test
    void fieldsReadLikeTheCommandLine() {
        StudyPanelModel.Checked c = check(Map.of("beam-spacing", "6ft..12ft:2ft", "beam-direction", " x,y ",
                "depth-limit", "21in", "objective", "weight+pieces:150lb", "bay-y", ""));
        assertTrue(c.ok(), c.errors().toString());
        StudyPanelModel.Setup s = c.setup();
        assertAll(
                () -> assertEquals(List.of(Parameter.BEAM_SPACING, Parameter.BEAM_DIRECTION), s.parameters(),
                        "panel order; the empty field is not varied"),
                () -> assertEquals(8, s.count()),
                () -> assertEquals(List.of("6ft", "8ft", "10ft", "12ft"),
                        s.spec().sweeps().get(0).values().stream().map(Setting::label).toList()),
                () -> assertEquals(Units.IN.toSi(21), s.depthLimit(), 1e-12),
                () -> assertEquals(Units.IN.toSi(21), s.spec().base().settings().maxBeamDepth(), 1e-12,
                        "members are sized within the limit"),
                () -> assertEquals(new Objective(Units.LBF.toSi(150)).pieceCost(), s.objective().pieceCost(), 1e-9),
                () -> assertEquals(UnitSystem.US, s.units()));
    }

    @Test
    void badFieldsAreLocatedAndSayWhatIsAccepted() {
        StudyPanelModel.Checked c = check(Map.of("beam-spacing", "6ft..3ft:1ft", "bay-x", "30ft;30ft;30ft",
                "beam-count", "two", "beam-direction", "x,z", "depth-limit", "2 yards", "objective", "cheapest",
                "method", "lrfd"));
        assertFalse(c.ok());
        assertNull(c.setup());
        Map<String, String> e = c.errors();
        assertAll(
                () -> assertEquals("Beam spacing \"6ft..3ft:1ft\": the end of the range (3ft) is below its start (6ft). Accepted: "
                        + StudyPanelModel.field("beam-spacing").accepted() + ".", e.get("beam-spacing")),
                () -> assertTrue(e.get("bay-x").startsWith("Bay widths along x \"30ft;30ft;30ft\": ")
                        && e.get("bay-x").contains("the plan has 2 bays"), e.get("bay-x")),
                () -> assertTrue(e.get("beam-count").startsWith("Beams per bay: \"two\" ") && e.get("beam-count")
                        .contains("not a whole number") && e.get("beam-count").contains("Accepted: whole numbers"), e.get("beam-count")),
                () -> assertTrue(e.get("beam-direction").contains("\"z\" is not a direction; use x or y"), e.get("beam-direction")),
                () -> assertTrue(e.get("depth-limit").startsWith("Structural depth limit: \"2 yards\" ")
                        && e.get("depth-limit").contains("; use "), e.get("depth-limit")),
                () -> assertTrue(e.get("objective").contains("\"cheapest\" is not an objective"), e.get("objective")),
                () -> assertFalse(e.containsKey("method"), "a good field has no message"));
    }

    @Test
    void aStudyNeedsAPlanAValueAndAModestSize() {
        assertTrue(StudyPanelModel.check(null, Map.of("beam-count", "1")).errors().get("").startsWith("Open a plan first"));
        assertTrue(check(Map.of()).errors().get("").startsWith("Give values to at least one parameter"));
        // 61 × 100 = 6,100 variants is over the panel's limit of 5,000
        StudyPanelModel.Checked big = check(Map.of("bay-x", "20ft..50ft:0.5ft", "beam-count", "1..100:1"));
        assertTrue(big.errors().get("").contains("6,100 variants"), big.errors().toString());
    }

    @Test
    void figuresAreInThePlansUnits() {
        // 1 lb/ft² is 4.4482216152605 N / 0.09290304 m² = 47.880259 Pa; 1 kg/m² is 9.80665 Pa
        assertEquals(1.0, StudyPanelModel.perArea(4.4482216152605 / 0.09290304, UnitSystem.US), 1e-9);
        assertEquals(1.0, StudyPanelModel.perArea(9.80665, UnitSystem.SI), 1e-9);
        assertEquals(2000.0, StudyPanelModel.weight(2000 * 4.4482216152605, UnitSystem.US), 1e-9);
        assertEquals(24.0, StudyPanelModel.depth(0.6096, UnitSystem.US), 1e-12);
        assertEquals(610.0, StudyPanelModel.depth(0.610, UnitSystem.SI), 1e-9);
        assertEquals("12 / 400 variants", StudyPanelModel.progress(12, 400));
        assertEquals("1,200 / 4,000 variants", StudyPanelModel.progress(1200, 4000));
    }

    /** Made-up results of a study of spacing × direction, to check axes, series and texts. */
    private static StudyResult made(StudyPanelModel.Setup s) {
        List<VariantResult> vs = new java.util.ArrayList<>();
        for (int i = 0; i < s.count(); i++) {
            double w = 400 + 10 * i;
            vs.add(new VariantResult(i, s.spec().variant(i), w * 100, 100, w, 0.4 + 0.01 * (i % 3), 0.5, 20 + i, 0.9,
                    0, 0, 0, ""));
        }
        return new StudyResult(vs, s.count(), false);
    }

    /**
     * The vibration column, filter and chart marks: made-up variants whose worst bay ratios are 0.8, 1.2 and none
     * (NaN). The filter keeps only the checked variant that meets; the chart marks the one over 1.0 in a series of
     * its own; the cell shows two decimals or a dash (values from a run are compared in StudyVibrationTest).
     */
    @Test
    void vibrationColumnFilterAndChartMarks() {
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "8ft..12ft:2ft")).setup();
        double[] vib = {0.8, 1.2, Double.NaN};
        List<VariantResult> vs = new java.util.ArrayList<>();
        for (int i = 0; i < 3; i++) {
            vs.add(new VariantResult(i, s.spec().variant(i), 40000 + 1000 * i, 100, 400 + 10 * i, 0.4, 0.5, 20, 0.9, 0, 0, 0,
                    "", null, "", vib[i]));
        }
        StudyResult r = new StudyResult(vs, 3, false);
        var all = StudyPanelModel.depthSeries(s, r, false);
        var meets = StudyPanelModel.depthSeries(s, r, true);
        assertAll(() -> assertTrue(StudyPanelModel.vibrationStudied(r)),
                () -> assertEquals("0.80", StudyPanelModel.vibration(vs.get(0))),
                () -> assertEquals("—", StudyPanelModel.vibration(vs.get(2))),
                () -> assertEquals(List.of(true, false, false),
                        vs.stream().map(v -> StudyPanelModel.shown(v, true)).toList()),
                () -> assertEquals(List.of(vs.get(1)), all.get(StudyPanelModel.DepthSeries.VIBRATION).stream()
                        .map(StudyPanelModel.DepthPoint::variant).toList()),
                () -> assertEquals(1, meets.get(StudyPanelModel.DepthSeries.BEAM).size()),
                () -> assertFalse(meets.containsKey(StudyPanelModel.DepthSeries.VIBRATION)),
                () -> assertFalse(StudyPanelModel.vibrationStudied(made(s))),
                () -> assertTrue(StudyPanelModel.describe(vs.get(1), UnitSystem.US, false).contains("floor vibration 1.20")));
    }

    @Test
    void axesAreNumericForOneNumberAndCategoriesOtherwise() {
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "6ft..12ft:2ft", "beam-direction", "x,y",
                "bay-x", "30ft;25ft,60ft")).setup();
        StudyResult r = made(s);
        StudyPanelModel.XAxis spacing = StudyPanelModel.xAxis(s, Parameter.BEAM_SPACING);
        StudyPanelModel.XAxis direction = StudyPanelModel.xAxis(s, Parameter.BEAM_DIRECTION);
        StudyPanelModel.XAxis bays = StudyPanelModel.xAxis(s, Parameter.BAY_X);
        VariantResult v = r.variants().get(5); // bay-x 30ft;25ft, spacing 10ft, direction y
        assertAll(
                () -> assertTrue(spacing.numeric()),
                () -> assertEquals("Beam spacing (ft)", spacing.title()),
                () -> assertEquals(10.0, StudyPanelModel.x(s, v, Parameter.BEAM_SPACING), 1e-9),
                () -> assertFalse(direction.numeric()),
                () -> assertEquals(List.of("x", "y"), direction.categories()),
                () -> assertEquals(1.0, StudyPanelModel.x(s, v, Parameter.BEAM_DIRECTION)),
                () -> assertFalse(bays.numeric(), "a value with a width per bay is a category"),
                () -> assertEquals(List.of("30ft;25ft", "60ft"), bays.categories()),
                () -> assertEquals(0.0, StudyPanelModel.x(s, v, Parameter.BAY_X)));
    }

    @Test
    void seriesGroupEveryPlottedVariantOnce() {
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "6ft..12ft:2ft", "beam-direction", "x,y")).setup();
        StudyResult r = made(s);
        assertEquals(Parameter.BEAM_DIRECTION, StudyPanelModel.defaultGroup(s, Parameter.BEAM_SPACING));
        Map<String, List<VariantResult>> byDirection = StudyPanelModel.series(s, r, Parameter.BEAM_SPACING,
                Parameter.BEAM_DIRECTION);
        assertEquals(List.of("beam-direction x", "beam-direction y"), List.copyOf(byDirection.keySet()));
        assertEquals(4, byDirection.get("beam-direction x").size());
        assertEquals(8, byDirection.values().stream().mapToInt(List::size).sum());
        assertEquals(8, StudyPanelModel.series(s, r, Parameter.BEAM_SPACING, null).get("Variants").size());
    }

    @Test
    void theDepthChartShowsBeamsAndGirdersApartAndMarksVariantsOverTheLimit() {
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "6ft..12ft:2ft", "depth-limit", "18in")).setup();
        // a spacing sweep: the beams change (deeper at wider spacing), the girder stays; the last is over 18 in
        List<VariantResult> vs = new java.util.ArrayList<>();
        double in = Units.IN.toSi(1);
        double[] beams = {12 * in, 14 * in, 16 * in, 18.5 * in};
        for (int i = 0; i < 4; i++) {
            vs.add(new VariantResult(i, s.spec().variant(i), 1000 * (4 - i), 100, 10 * (4 - i), beams[i], 17 * in, 40 - i, 0.9,
                    i == 2 ? 1 : 0, i == 2 ? 1 : 0, 0, ""));
        }
        StudyResult r = new StudyResult(vs, 4, false);
        Map<StudyPanelModel.DepthSeries, List<StudyPanelModel.DepthPoint>> series = StudyPanelModel.depthSeries(s, r);
        List<Double> beamX = series.get(StudyPanelModel.DepthSeries.BEAM).stream().map(StudyPanelModel.DepthPoint::depth).toList();
        List<Double> girderX = series.get(StudyPanelModel.DepthSeries.GIRDER).stream().map(StudyPanelModel.DepthPoint::depth)
                .toList();
        assertAll(
                () -> assertEquals(12, beamX.get(0), 1e-9),
                () -> assertEquals(18.5, beamX.get(3), 1e-9),
                () -> assertEquals(4, new java.util.HashSet<>(beamX).size(), "the sweep shows in the beams' depths"),
                () -> assertEquals(List.of(17.0, 17.0, 17.0, 17.0), girderX.stream().map(x -> Math.rint(x * 1e9) / 1e9).toList()),
                () -> assertTrue(StudyPanelModel.tooDeep(s, vs.get(3))),
                () -> assertFalse(StudyPanelModel.tooDeep(s, vs.get(2)), "17 in is within 18 in"),
                () -> assertEquals(List.of(vs.get(3)), series.get(StudyPanelModel.DepthSeries.TOO_DEEP).stream()
                        .map(StudyPanelModel.DepthPoint::variant).toList()),
                () -> assertEquals(18.5, series.get(StudyPanelModel.DepthSeries.TOO_DEEP).get(0).depth(), 1e-9,
                        "at the structural depth"),
                () -> assertEquals(List.of(vs.get(2)), series.get(StudyPanelModel.DepthSeries.PROBLEMS).stream()
                        .map(StudyPanelModel.DepthPoint::variant).toList()),
                () -> assertTrue(series.values().stream().noneMatch(List::isEmpty), "only series with points"));
        // without a limit nothing is over it, and the series is not there
        StudyPanelModel.Setup free = check(Map.of("beam-spacing", "6ft..12ft:2ft")).setup();
        assertFalse(StudyPanelModel.depthSeries(free, r).containsKey(StudyPanelModel.DepthSeries.TOO_DEEP));
        assertEquals("Two bay — variant 4 (beam-spacing 12ft)".replace("Two bay", TWO_BAY.name()),
                StudyPanelModel.variantName(TWO_BAY, vs.get(3)));
        assertEquals(StudyPanelModel.variantName(TWO_BAY, vs.get(3)), StudyPanelModel.named(TWO_BAY, TWO_BAY, vs.get(3)).name());
    }

    @Test
    void anEmptyFieldIsNotUsedAndItsPromptReadsAsAnExample() {
        for (StudyPanelModel.Field f : StudyPanelModel.FIELDS) {
            assertTrue(f.prompt(UnitSystem.US).startsWith("e.g. "), f.prompt(UnitSystem.US));
            assertTrue(f.prompt(UnitSystem.SI).startsWith("e.g. "), f.prompt(UnitSystem.SI));
        }
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "8ft", "depth-limit", "", "objective", " ")).setup();
        assertEquals(0, s.depthLimit(), "no depth limit when its field is empty");
        assertEquals(Objective.weight(), s.objective(), "weight alone when the objective is empty");
    }

    @Test
    void theTooltipAndTheSummaryGiveTheVariantsFigures() {
        StudyPanelModel.Setup s = check(Map.of("beam-spacing", "6ft..12ft:2ft", "beam-direction", "x,y")).setup();
        StudyResult r = made(s);
        VariantResult v = r.variants().get(0);
        String tip = StudyPanelModel.describe(v, UnitSystem.US, true);
        assertTrue(tip.startsWith("Variant 1 (on the weight–depth front)\nbeam-spacing 6ft, beam-direction x\n"), tip);
        assertTrue(tip.contains(String.format(java.util.Locale.ROOT, "%.2f lb/ft² of floor",
                StudyPanelModel.perArea(400, UnitSystem.US))), tip);
        assertTrue(tip.contains("20 pieces; highest ratio 0.90"), tip);
        String sum = StudyPanelModel.summary(s, r);
        assertTrue(sum.startsWith("8 of 8 variants run; 8 sized without problems. Best for weight: variant 1 "), sum);
        assertEquals(GridLine.Axis.X, s.spec().plan(0).floors().get(0).infills().get(0).direction());
    }
}
