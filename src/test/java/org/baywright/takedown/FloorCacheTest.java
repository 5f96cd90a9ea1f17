package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.report.RunSummary;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.study.Variations;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Floor designs shared between runs: every run through a cache equals a separate run without one (the
 * whole run summary and every member's rejected sections), floors are shared exactly when their inputs
 * are equal, the budget bounds what is kept, and concurrent requests compute a design once.
 */
class FloorCacheTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static Plan demo() {
        return PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow();
    }

    /** The run as a value tree, plus each member's rejected sections and their governing ratios. */
    private static List<Object> picture(RunResult r) {
        List<Object> out = new ArrayList<>();
        out.add(RunSummary.json(r, UnitSystem.SI));
        r.takedown().members().forEach((floor, ms) -> ms.forEach(m -> {
            if (m.design() != null) {
                m.design().rejected().forEach(x -> out.add(m.id() + " " + x.section().designation() + " " + x.governing()));
            }
        }));
        return out;
    }

    private static void assertSameRun(Plan p, FloorCache cache, String what) {
        assertEquals(picture(PlanRun.run(p, CATALOG)), picture(PlanRun.run(p, CATALOG, cache)), what);
    }

    @Test
    void variantsThatShareNoFloorWithTheSeriesChangedShareEveryFloor() {
        Plan demo = demo();
        FloorCache cache = new FloorCache(CATALOG);
        assertSameRun(demo, cache, "the demo");
        long floors = cache.misses();
        assertEquals(3, floors, "level 2, the typical floor and the roof");
        // the column series reaches no floor: all three are reused
        assertSameRun(Variations.columnSeries(demo, List.of("W12", "W14")), cache, "W12 and W14 columns");
        assertEquals(3, cache.hits());
        assertEquals(3, cache.misses());
        // a depth limit reaches every floor: nothing is reused
        assertSameRun(Variations.maxDepth(demo, Units.IN.toSi(21)), cache, "21 in deep at most");
        assertEquals(3, cache.hits());
        assertEquals(6, cache.misses());
    }

    @Test
    void spacingsThatFrameAlikeShareTheirFloorsAndOthersDoNot() {
        Plan demo = demo();
        FloorCache cache = new FloorCache(CATALOG);
        // the demo's beams run north-south in bays 30 ft wide: at 10, 12 and 14 ft every infill has three spaces
        for (double ft : new double[] {10, 12, 14}) {
            assertSameRun(Variations.beamSpacing(demo, Units.FT_.toSi(ft)), cache, "beams at " + ft + " ft");
        }
        assertEquals(3, cache.misses());
        assertEquals(6, cache.hits());
        assertSameRun(Variations.beamSpacing(demo, Units.FT_.toSi(15)), cache, "beams at 15 ft: two spaces");
        assertEquals(6, cache.misses());
    }

    @Test
    void aRunWithAnotherCatalogDoesNotUseTheCache() {
        Plan demo = demo();
        FloorCache cache = new FloorCache(CatalogFile.loadDefault()); // equal content, another catalog
        assertSameRun(demo, cache, "the demo");
        assertEquals(0, cache.hits() + cache.misses());
    }

    @Test
    void aSmallBudgetKeepsOnlyTheNewestDesignAndResultsStayTheSame() {
        Plan demo = demo();
        FloorCache cache = new FloorCache(CATALOG, 1);
        assertSameRun(demo, cache, "the demo");
        assertSameRun(demo, cache, "the demo again");
        assertEquals(1, cache.size());
        assertTrue(cache.hits() <= 1, "at most the floor designed last is still kept: " + cache.hits());
    }

    @Test
    void threadsAskingForTheSameDesignAtOnceComputeItOnce() throws Exception {
        FloorCache cache = new FloorCache(CATALOG);
        FloorDesign design = new FloorDesign(List.of(), java.util.Map.of(), java.util.Map.of(), java.util.Map.of(), 1.0,
                java.util.Map.of(), List.of());
        AtomicInteger computed = new AtomicInteger();
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<FloorDesign>> got = new ArrayList<>();
            for (int i = 0; i < 4; i++) {
                got.add(pool.submit(() -> cache.get("the same floor", () -> {
                    computed.incrementAndGet();
                    try {
                        release.await(10, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    return design;
                })));
            }
            while (cache.hits() + cache.misses() < 4) {
                Thread.onSpinWait();
            }
            release.countDown();
            for (Future<FloorDesign> f : got) {
                assertSame(design, f.get(10, TimeUnit.SECONDS));
            }
        } finally {
            pool.shutdownNow();
        }
        assertAll(() -> assertEquals(1, computed.get()), () -> assertEquals(1, cache.misses()),
                () -> assertEquals(3, cache.hits()));
    }

    @Test
    void aFailedDesignIsNotKept() {
        FloorCache cache = new FloorCache(CATALOG);
        IllegalStateException boom = new IllegalStateException("boom");
        try {
            cache.get("k", () -> {
                throw boom;
            });
        } catch (IllegalStateException e) {
            assertSame(boom, e);
        }
        assertEquals(0, cache.size());
    }
}
