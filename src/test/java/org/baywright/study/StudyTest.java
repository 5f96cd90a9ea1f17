package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.GridLine;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The study engine against separate runs, the optimiser against an exhaustive sweep, cancelling. */
class StudyTest {
    static final Catalog CATALOG = CatalogFile.loadDefault();

    static Plan regular(double bayX, double spacing, boolean alongY, int storeys) {
        return RegularPlan.generate(new RegularPlan.Spec("study test", "us", Collections.nCopies(3, Units.FT_.toSi(bayX)),
                Collections.nCopies(2, Units.FT_.toSi(30)), Collections.nCopies(storeys, Units.FT_.toSi(13)), alongY,
                Units.FT_.toSi(spacing), new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(10), Units.PSF.toSi(50), 0, 0,
                        Units.PSF.toSi(15)),
                new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(15), 0, Units.PSF.toSi(20), 0, 0),
                new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0)));
    }

    static Sweep sweep(String text) {
        return SweepText.parse("--vary", text, UnitSystem.US);
    }

    @Test
    void aSweepGivesTheNumbersOfSeparateRunsOfHandBuiltVariants() {
        StudySpec spec = new StudySpec(regular(30, 10, true, 2), List.of(sweep("bay-x=25ft,35ft"),
                sweep("beam-spacing=8ft..12ft:2ft")));
        StudyResult r = Study.run(spec, CATALOG, 2, ProgressListener.NONE, new CancelToken());
        assertEquals(6, r.variants().size());
        assertFalse(r.cancelled());
        double[] bays = {25, 25, 25, 35, 35, 35};
        double[] spacings = {8, 10, 12, 8, 10, 12};
        for (int i = 0; i < 6; i++) {
            Plan byHand = regular(bays[i], spacings[i], true, 2);
            assertEquals(byHand, spec.plan(i), "variant " + i + " is the plan built by hand");
            VariantResult expected = VariantResult.of(i, spec.variant(i), PlanRun.run(byHand));
            VariantResult got = r.variants().get(i);
            assertEquals(expected, got, "variant " + i);
            assertEquals(PlanRun.run(byHand).takedown().steelWeight(), got.steelWeight(), 0.0);
            assertTrue(got.sound(), got.toString());
            assertTrue(got.girderDepth() > 0 && got.beamDepth() > 0);
        }
        // pieces by hand, 25 ft bays with beams at 8 ft max: per level 3 lines × 3 girders + 4 lines × 2 column-line
        // beams + 6 bays × 3 infill beams (25/8 → 4 spaces) = 35; 2 levels = 70; 12 columns of one tier = 12
        assertEquals(82, r.variants().get(0).pieces());
    }

    @Test
    void turningTheBeamsMatchesAPlanGeneratedWithTheOtherDirection() {
        StudySpec spec = new StudySpec(regular(30, 10, true, 1), List.of(sweep("beam-direction=x")));
        StudyResult r = Study.run(spec, CATALOG, 1, ProgressListener.NONE, new CancelToken());
        VariantResult byHand = VariantResult.of(0, spec.variant(0), PlanRun.run(regular(30, 10, false, 1)));
        VariantResult got = r.variants().get(0);
        assertEquals(byHand.steelWeight(), got.steelWeight(), 1e-6 * byHand.steelWeight());
        assertEquals(byHand.pieces(), got.pieces());
        assertEquals(byHand.beamDepth(), got.beamDepth(), 0.0);
        assertEquals(byHand.girderDepth(), got.girderDepth(), 0.0);
    }

    @Test
    void theOptimiserFindsTheMinimumOfAnExhaustiveSweep() {
        Plan base = regular(30, 10, true, 1);
        double limit = Units.IN.toSi(21);
        Objective obj = Objective.parse("--objective", "weight+pieces:150lb");
        List<Double> spacings = Optimiser.range(Units.FT_.toSi(5), Units.FT_.toSi(15), Units.FT_.toSi(1));
        Optimiser.Optimum o = Optimiser.optimise(base, limit, obj, spacings, 3, CATALOG, 2, ProgressListener.NONE,
                new CancelToken());
        StudySpec exhaustive = new StudySpec(Variations.maxDepth(base, limit), List.of(sweep("beam-direction=x,y"),
                sweep("beam-spacing=5ft..15ft:1ft")));
        StudyResult all = Study.run(exhaustive, CATALOG, 2, ProgressListener.NONE, new CancelToken());
        assertEquals(22, all.variants().size());
        assertEquals(22, o.candidates());
        assertTrue(o.runs() < o.candidates(), "spacings framing alike run once: " + o.runs());
        double min = Double.POSITIVE_INFINITY;
        for (VariantResult v : all.variants()) {
            if (v.sound() && v.structuralDepth() <= limit + 1e-9) {
                min = Math.min(min, obj.score(v));
            }
        }
        assertTrue(Double.isFinite(min), "some layout fits 21 in");
        assertEquals(3, o.best().size());
        assertEquals(min, obj.score(o.best().get(0)), 0.0);
        assertTrue(obj.score(o.best().get(1)) >= min && obj.score(o.best().get(2)) >= obj.score(o.best().get(1)));
        assertEquals(obj.score(all.best(obj, limit, 1).get(0)), obj.score(o.best().get(0)), 0.0);
        // the weight objective alone can pick a different layout, never a heavier one
        Optimiser.Optimum w = Optimiser.optimise(base, limit, Objective.weight(), spacings, 1, CATALOG, 2,
                ProgressListener.NONE, new CancelToken());
        assertTrue(w.best().get(0).steelWeight() <= o.best().get(0).steelWeight());
    }

    @Test
    void cancellingAfterTheFirstVariantStopsTheWork() {
        StudySpec spec = new StudySpec(regular(30, 10, true, 1), List.of(sweep("beam-spacing=6ft..15ft:1ft"),
                sweep("beam-direction=x,y")));
        CancelToken token = new CancelToken();
        AtomicInteger calls = new AtomicInteger();
        List<Integer> seen = Collections.synchronizedList(new ArrayList<>());
        StudyResult r = Study.run(spec, CATALOG, 2, (done, total) -> {
            calls.incrementAndGet();
            seen.add(done);
            token.cancel();
        }, token);
        assertEquals(20, r.total());
        assertTrue(r.variants().size() < r.total(), "finished " + r.variants().size());
        assertTrue(r.variants().size() >= 1);
        assertTrue(r.cancelled());
        assertEquals(r.variants().size(), calls.get());
        for (int i = 0; i < seen.size(); i++) {
            assertEquals(i + 1, seen.get(i));
        }
    }

    @Test
    void progressCountsEveryVariantOnce() {
        StudySpec spec = new StudySpec(regular(30, 10, true, 1), List.of(sweep("method=lrfd,asd"), sweep("beam-count=1..3:1")));
        List<Integer> seen = Collections.synchronizedList(new ArrayList<>());
        StudyResult r = Study.run(spec, CATALOG, 2, (done, total) -> seen.add(done), new CancelToken());
        assertEquals(List.of(1, 2, 3, 4, 5, 6), seen);
        assertEquals(6, r.variants().size());
        // ASD and LRFD differ; more beams per bay means more pieces
        assertTrue(r.variants().get(0).pieces() < r.variants().get(2).pieces());
        assertTrue(r.variants().get(0).steelWeight() != r.variants().get(3).steelWeight());
    }

    @Test
    void theVariantsAreTheCartesianProductFirstSweepSlowest() {
        StudySpec spec = new StudySpec(regular(30, 10, true, 1), List.of(sweep("beam-direction=x,y"), sweep("beam-count=1,2,3")));
        assertEquals(6, spec.count());
        List<String> labels = spec.variants().stream().map(v -> v.get(0).label() + v.get(1).label()).toList();
        assertEquals(List.of("x1", "x2", "x3", "y1", "y2", "y3"), labels);
        assertEquals(GridLine.Axis.X, spec.plan(0).floors().get(0).infills().get(0).direction());
    }
}
