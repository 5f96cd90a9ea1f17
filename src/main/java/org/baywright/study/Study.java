package org.baywright.study;

import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.plan.Plan;
import org.baywright.run.DesignBasis;
import org.baywright.run.PlanRun;
import org.baywright.takedown.FloorCache;

/**
 * Runs a study: every variant is a full run of its plan ({@link PlanRun#run(Plan, Catalog)}: tributary
 * areas, the ordered design and the takedown, every level), spread over a pool of worker threads. A
 * cancel token is checked before each variant starts; a cancelled study returns the variants that
 * finished. Deterministic: the figures do not depend on the number of threads or their timing.
 *
 * <p>Variants often share floor layouts exactly (a column series changes no floor; beam spacings that
 * give the same number of beams in every bay frame a floor alike): a study designs each distinct floor
 * layout once and lets every variant with it reuse the design ({@link FloorCache}). Only designs with
 * every input equal are shared, so each variant's figures are those of its own full run.
 */
public final class Study {
    private Study() {
    }

    /** Runs on all cores with the catalog the base plan names, without progress or cancel. */
    public static StudyResult run(StudySpec spec) {
        return run(spec, catalogOf(spec.base()), Runtime.getRuntime().availableProcessors(), ProgressListener.NONE,
                new CancelToken());
    }

    /**
     * The catalog a plan's settings name (the built-in one when empty), as its run reads it ({@link
     * DesignBasis#catalogOf}).
     *
     * @throws org.baywright.catalog.CatalogException when it cannot be read
     */
    public static Catalog catalogOf(Plan plan) {
        return DesignBasis.catalogOf(plan);
    }

    /**
     * Runs the study.
     *
     * @param parallelism worker threads (≥ 1)
     * @param listener told after each finished variant
     * @param cancel checked before each variant
     */
    public static StudyResult run(StudySpec spec, Catalog catalog, int parallelism, ProgressListener listener,
            CancelToken cancel) {
        long count = spec.count();
        if (count > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("a study of " + count + " variants is too large");
        }
        FloorCache reuse = new FloorCache(catalog);
        return Parallel.run((int) count, i -> runOne(spec, i, catalog, reuse), parallelism, listener, cancel);
    }

    /**
     * Runs one variant; settings that do not fit the plan give a failed result with the reason. Floor
     * designs are shared with the study's other variants through {@code reuse} (null: none); a variant's
     * figures are the same either way.
     */
    static VariantResult runOne(StudySpec spec, int index, Catalog catalog, FloorCache reuse) {
        List<org.baywright.study.Setting> settings = spec.variant(index);
        Plan plan;
        try {
            plan = Variations.apply(spec.base(), settings);
        } catch (IllegalArgumentException e) {
            return VariantResult.failed(index, settings, e.getMessage());
        }
        try {
            return VariantResult.of(index, settings, PlanRun.run(plan, catalog, reuse));
        } catch (RuntimeException e) {
            return VariantResult.failed(index, settings, "the run failed: " + e);
        }
    }
}
