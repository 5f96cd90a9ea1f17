package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.BayResult;
import org.junit.jupiter.api.Test;

/**
 * The vibration column of a study: each variant's worst bay ratio is its own run's (AISC DG11 walking check of
 * {@link RunResult#bays()}), the "meets vibration" test follows it, and a plan without a slab has no value.
 */
class StudyVibrationTest {
    private static Plan demo() {
        return PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
    }

    /** The worst ratio of the run's bays that meet or exceed (not outside the method, not unchecked), by hand. */
    private static double worst(RunResult run) {
        double w = Double.NaN;
        for (BayResult b : run.bays()) {
            if (b.status().equals("meets") || b.status().equals("exceeds")) {
                w = Double.isNaN(w) ? b.ratio() : Math.max(w, b.ratio());
            }
        }
        return w;
    }

    @Test
    void eachVariantsVibrationRatioIsItsOwnRunsWorstBay() {
        StudySpec spec = new StudySpec(demo(), List.of(StudyTest.sweep("method=lrfd,asd")));
        StudyResult r = Study.run(spec, StudyTest.CATALOG, 2, ProgressListener.NONE, new CancelToken());
        assertEquals(2, r.variants().size());
        for (VariantResult v : r.variants()) {
            RunResult own = PlanRun.run(Variations.apply(spec.base(), v.settings()), StudyTest.CATALOG, null);
            double expected = worst(own);
            boolean exceeds = own.bays().stream().anyMatch(b -> b.status().equals("exceeds"));
            assertAll(() -> assertTrue(v.vibrationChecked()),
                    () -> assertEquals(expected, v.vibrationRatio(), 0.0, "variant " + (v.index() + 1)),
                    () -> assertEquals(!exceeds, v.meetsVibration(), "variant " + (v.index() + 1)));
        }
        // the demo's worst bay, B-C/3-4 beside the atrium, exceeds the office limit: a_p/g 0.712 % > 0.5 %
        assertFalse(r.variants().get(0).meetsVibration());
    }

    @Test
    void aPlanWithoutASlabHasNoVibrationValueAndIsNotFilteredOut() {
        Plan bare = StudyTest.regular(30, 10, true, 1);
        VariantResult v = VariantResult.of(0, List.of(), PlanRun.run(bare, StudyTest.CATALOG, null));
        assertAll(() -> assertFalse(v.vibrationChecked()), () -> assertTrue(Double.isNaN(v.vibrationRatio())),
                () -> assertTrue(v.meetsVibration()));
    }
}
