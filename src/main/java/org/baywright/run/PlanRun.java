package org.baywright.run;

import java.util.ArrayList;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.takedown.FloorCache;
import org.baywright.takedown.Takedown;
import org.baywright.takedown.TakedownResult;

/** The pipeline: plan → catalog → tributary areas, ordered design and takedown → an immutable run result. */
public final class PlanRun {
    private PlanRun() {
    }

    /** Runs a plan with the catalog its settings name (the built-in one when empty). */
    public static RunResult run(Plan plan) {
        List<Problem> problems = new ArrayList<>();
        Catalog catalog;
        try {
            String c = plan.settings().catalog();
            catalog = c == null || c.isBlank() ? CatalogFile.loadDefault() : CatalogFile.read(java.nio.file.Path.of(c));
        } catch (CatalogException e) {
            problems.add(Problem.error("catalog", "/settings/catalog", "", e.getMessage()));
            return new RunResult(plan, null, problems, "", version(), 0);
        } catch (java.nio.file.InvalidPathException e) {
            problems.add(Problem.error("catalog", "/settings/catalog", "", "catalog: \"" + e.getInput().replaceAll("\\p{Cntrl}", "?")
                    + "\" is not a usable file name (" + e.getReason() + ")"));
            return new RunResult(plan, null, problems, "", version(), 0);
        }
        return run(plan, catalog);
    }

    /** Runs a plan with a given catalog. */
    public static RunResult run(Plan plan, Catalog catalog) {
        return run(plan, catalog, null);
    }

    /**
     * Runs a plan with a given catalog, sharing floor designs with other runs through {@code reuse}
     * (null: none). The result is the same as {@link #run(Plan, Catalog)}'s; a study passes one cache to
     * all its variants.
     */
    public static RunResult run(Plan plan, Catalog catalog, FloorCache reuse) {
        long t0 = System.nanoTime();
        TakedownResult t = Takedown.run(plan, catalog, reuse);
        double ms = (System.nanoTime() - t0) / 1e6;
        return new RunResult(plan, t, List.of(), catalog.name(), version(), ms);
    }

    /** Baywright's version from the jar manifest, or "development build". */
    public static String version() {
        String v = PlanRun.class.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }
}
