package org.baywright.ui;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.Objects;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.plan.Plan;
import org.baywright.run.DesignBasis;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.FloorCache;

/**
 * The runs of one open document: each run goes through one {@link FloorCache}, so an edit designs again
 * only the floor layouts whose inputs it changed (a floor whose inputs are all equal to an earlier run's
 * is reused, and the result is the same as a fresh run's).
 *
 * <p>The catalog the plan's settings name is read once and kept while the setting, and for a catalog
 * file its size and time of change, stay the same; a new catalog starts a new cache (a cache serves
 * one catalog). A catalog that cannot be read gives the run {@link PlanRun#run(Plan)} gives, with its
 * located problem. Runs happen one at a time on the editor's run thread; the methods are synchronized
 * all the same.
 */
final class DocumentRuns {
    private final long budget;
    private CatalogKey key;
    private Catalog catalog;
    private FloorCache cache;

    /** Runs with the floor cache's default budget. */
    DocumentRuns() {
        this(FloorCache.DEFAULT_BUDGET);
    }

    /** Runs whose cache keeps at most {@code budget} member designs and rejected sections. */
    DocumentRuns(long budget) {
        this.budget = budget;
    }

    /** Runs a plan, reusing the floor designs of earlier runs of this document whose inputs are equal. */
    synchronized RunResult run(Plan plan) {
        Catalog c;
        try {
            c = catalogOf(plan);
        } catch (CatalogException | InvalidPathException e) {
            return PlanRun.run(plan); // the run with the catalog's located problem
        }
        return PlanRun.run(plan, c, cache);
    }

    /** The floor cache of the latest run (null before the first); tests read its hits and misses. */
    synchronized FloorCache cache() {
        return cache;
    }

    private Catalog catalogOf(Plan plan) {
        CatalogKey now = CatalogKey.of(plan.settings().catalog());
        if (!now.equals(key) || catalog == null) {
            catalog = DesignBasis.catalogOf(plan); // the one place a plan's catalog is read
            cache = new FloorCache(catalog, budget);
            key = now;
        }
        return catalog;
    }

    /** What tells one catalog from another: the setting and, for a file, its size and time of change. */
    private record CatalogKey(String name, long size, long modified) {
        static CatalogKey of(String setting) {
            String name = setting == null ? "" : setting.trim().isEmpty() ? "" : setting;
            if (name.isEmpty()) {
                return new CatalogKey("", 0, 0);
            }
            try {
                Path f = Path.of(name);
                return new CatalogKey(name, Files.size(f), Files.getLastModifiedTime(f).toMillis());
            } catch (java.io.IOException | InvalidPathException | SecurityException e) {
                return new CatalogKey(name, -1, -1); // read below, which reports why it cannot be
            }
        }

        CatalogKey {
            Objects.requireNonNull(name, "name");
        }
    }
}
