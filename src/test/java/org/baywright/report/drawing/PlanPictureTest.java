package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.baywright.load.DesignMethod;
import org.baywright.plan.Level;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;

/** The plan picture: the plan part of every sheet is the picture, and the screen's style only leaves labels out. */
class PlanPictureTest {
    private static final Set<Layer> PLAN_LAYERS = EnumSet.of(Layer.GRID, Layer.SLAB, Layer.AREA_LOADS, Layer.OPENINGS,
            Layer.MEMBERS, Layer.DECKS, Layer.LOADS, Layer.COLUMNS, Layer.MEMBER_LABELS, Layer.DIMENSIONS, Layer.TAGS);

    @Test
    void thePlanOnEverySheetIsThePictureAtTheSheetsScale() {
        RunResult run = DrawingSamples.demo();
        for (Level level : run.plan().levels()) {
            FramingPlanDrawing sheet = FramingPlanDrawing.of(run, level.name(), DrawingOptions.defaults());
            List<Primitive> planPart = sheet.primitives().stream().filter(p -> PLAN_LAYERS.contains(p.layer())).toList();
            PlanPicture picture = PlanPicture.forPlan(run.plan(), level.name(), run,
                    PlanPicture.Style.sheet(sheet.units(), sheet.paper().textSize(), ReactionMode.FACTORED, DesignMethod.LRFD));
            List<Primitive> built = picture.build(sheet.viewport().metresPerMm());
            assertFalse(built.isEmpty());
            assertEquals(planPart, built, level.name());
        }
    }

    @Test
    void theScreenStyleLeavesLabelsOutButDrawsTheSameMembers() {
        RunResult run = DrawingSamples.demo();
        String level = run.plan().levels().get(0).name();
        PlanPicture sheet = PlanPicture.forPlan(run.plan(), level, run,
                PlanPicture.Style.sheet(UnitSystem.US, 2.5, ReactionMode.SERVICE, null));
        PlanPicture screen = PlanPicture.forPlan(run.plan(), level, run,
                PlanPicture.Style.screen(UnitSystem.US, 2.5, true, new Rgb(246, 245, 241)));
        // a small scale (far out): the sheet writes every label, the screen only those that fit
        double k = 0.2;
        List<Primitive> a = sheet.build(k);
        List<Primitive> b = screen.build(k);
        List<String> sheetTexts = texts(a, Layer.MEMBER_LABELS);
        List<String> screenTexts = texts(b, Layer.MEMBER_LABELS);
        assertAll(
                () -> assertEquals(bands(a), bands(b), "the same members in the same colours"),
                () -> assertTrue(screenTexts.size() < sheetTexts.size(), screenTexts.size() + " of " + sheetTexts.size()),
                () -> assertTrue(sheetTexts.containsAll(screenTexts), "every label shown is one the sheet writes"),
                () -> assertEquals(List.of(), b.stream().filter(p -> p instanceof Primitive.Path s && s.fill() != null
                        && s.fill().equals(Rgb.WHITE)).toList(), "knock-outs take the screen's ground colour"));
    }

    @Test
    void withoutARunThePlansMembersAreDrawnAsNotRun() {
        RunResult run = DrawingSamples.demo();
        String level = run.plan().levels().get(0).name();
        PlanPicture bare = PlanPicture.forPlan(run.plan(), level, null,
                PlanPicture.Style.screen(UnitSystem.US, 2.5, false, Rgb.WHITE));
        List<Primitive> members = bare.build(0.05).stream().filter(p -> p.layer() == Layer.MEMBERS).toList();
        assertFalse(members.isEmpty());
        assertTrue(members.stream().allMatch(p -> p instanceof Primitive.Line l && l.pen().isDashed()),
                "dashed centre lines, no ratio bands");
        assertEquals(run.takedown().members().get(run.takedown().levelFloors().get(level)).size(), members.size(),
                "one line for every member, infill beams included");
    }

    static List<String> texts(List<Primitive> ps, Layer layer) {
        return ps.stream().filter(p -> p.layer() == layer && p instanceof Primitive.Text).map(p -> ((Primitive.Text) p).text())
                .toList();
    }

    static List<Rgb> bands(List<Primitive> ps) {
        return ps.stream().filter(p -> p.layer() == Layer.MEMBERS && p instanceof Primitive.Path s && s.fill() != null)
                .map(p -> ((Primitive.Path) p).fill()).toList();
    }
}
