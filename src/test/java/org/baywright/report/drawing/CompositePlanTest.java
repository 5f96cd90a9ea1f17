package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import org.baywright.report.CompositeRuns;
import org.baywright.run.RunResult;
import org.junit.jupiter.api.Test;

/**
 * The framing plan of a floor with composite members ({@link CompositeRuns}: two AISC Design Examples
 * V15 Example I.1 beams, W21X50 with 46 studs and 2 in of camber, and one bare W18X50): the plan
 * notation on each member and the slab and stud notes.
 */
class CompositePlanTest {
    private static final DrawingOptions A3 = DrawingOptions.defaults().withPaper(Paper.ISO_A3).withDate("2025-03-14");

    private static List<String> texts(FramingPlanDrawing d, Layer layer) {
        return d.texts().stream().filter(t -> t.layer() == layer).map(Primitive.Text::text).toList();
    }

    @Test
    void compositeMembersShowStudsAndCamber() {
        RunResult run = CompositeRuns.mixed();
        FramingPlanDrawing d = FramingPlanDrawing.of(run, "Level 2", A3);
        List<String> labels = texts(d, Layer.MEMBER_LABELS);
        String notes = String.join(" ", texts(d, Layer.NOTES));
        assertAll("composite plan",
                // the fixture's members are fixed at their sections, so sizes are bracketed
                () -> assertTrue(labels.stream().filter(s -> s.equals("[W21X50] (46) c=2\"")).count() == 2, labels.toString()),
                () -> assertTrue(labels.contains("[W18X50]"), "a bare member keeps its plain size: " + labels),
                () -> assertTrue(notes.contains("SLAB AND STUDS"), notes),
                () -> assertTrue(notes.contains("3\" composite deck"), notes),
                () -> assertTrue(notes.contains("4 1/2\" of concrete above the deck"), notes),
                () -> assertTrue(notes.contains("145 pcf"), notes),
                () -> assertTrue(notes.contains("f'c = 4 ksi"), notes),
                () -> assertTrue(notes.contains("3/4\" dia. headed studs"), notes),
                () -> assertTrue(notes.contains("weak position"), notes),
                () -> assertTrue(notes.contains("Unshored") && notes.contains("20 psf"), notes));
    }

    @Test
    void bareSteelPlansHaveNoSlabNotes() {
        RunResult run = CompositeRuns.run(List.of(CompositeRuns.bare("B-3", 0)), 1);
        FramingPlanDrawing d = FramingPlanDrawing.of(run, "Level 2", A3);
        assertFalse(texts(d, Layer.NOTES).stream().collect(Collectors.joining(" ")).contains("SLAB AND STUDS"));
    }

    /** On the screen, a composite member too short at the zoom for its studs and camber shows its size alone. */
    @Test
    void theScreenFallsBackToTheSizeWhereTheFullLabelDoesNotFit() {
        RunResult run = CompositeRuns.mixed();
        PlanPicture screen = PlanPicture.forPlan(run.plan(), "Level 2", run,
                PlanPicture.Style.screen(org.baywright.units.UnitSystem.US, 2.5, false, Rgb.WHITE));
        // 45 ft = 13.7 m: about 137 mm long at 0.1 m per mm, about 20 mm at 0.69 m per mm
        List<String> near = PlanPictureTest.texts(screen.build(0.1), Layer.MEMBER_LABELS);
        List<String> far = PlanPictureTest.texts(screen.build(0.69), Layer.MEMBER_LABELS);
        assertAll("screen",
                () -> assertTrue(near.contains("[W21X50] (46) c=2\""), near.toString()),
                () -> assertTrue(far.contains("[W21X50]") && !far.contains("[W21X50] (46) c=2\""), far.toString()));
    }
}
