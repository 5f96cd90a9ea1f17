package org.baywright.takedown;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;
import org.baywright.catalog.Catalog;

/**
 * Floor designs shared between the runs of closely related plans, such as the variants of a study: two
 * variants that differ only in what does not reach a floor layout (the column series, a bay width
 * along the other axis for a floor without infills there, beam spacings that give the same beams) design
 * that layout once.
 *
 * <p>A design is reused only when every input it reads is equal — the layout with its infills expanded
 * into the beams they generate, the columns present and their positions, the rules that concern
 * floors ({@link FloorRules}: method, steel, deflection limits, section filters, live-load rules), and
 * this cache's catalog (a run with another catalog does not use the cache) — so a
 * run gives the same result with or without it. The design of a floor is a pure function of those
 * inputs; equal inputs give equal designs.
 *
 * <p>Thread-safe. When several threads need the same design at once, one computes it and the others
 * wait for it. The designs kept are bounded by their size, counted in member designs and the lighter
 * sections each rejected (about half a kilobyte each; a floor of 55 members with their rejections counts
 * about 3,000): beyond the budget the least recently used designs are dropped. A design that failed
 * with an exception is not kept.
 */
public final class FloorCache {
    /** Default budget: member designs and rejected sections kept (some 60 MB; about 50 floors of the demo). */
    public static final int DEFAULT_BUDGET = 150_000;

    private final Catalog catalog;
    private final long budget;
    private final LinkedHashMap<Object, FutureTask<FloorDesign>> entries = new LinkedHashMap<>(64, 0.75f, true);
    private final Map<Object, Long> sizes = new java.util.HashMap<>();
    private long kept;
    private long hits;
    private long misses;

    /** A cache for runs with {@code catalog}, with the {@link #DEFAULT_BUDGET}. */
    public FloorCache(Catalog catalog) {
        this(catalog, DEFAULT_BUDGET);
    }

    /**
     * A cache for runs with {@code catalog}.
     *
     * @param budget how many member designs and rejected sections to keep (≥ 1); the most recent design
     *     is kept even when it alone is larger
     */
    public FloorCache(Catalog catalog, long budget) {
        if (catalog == null) {
            throw new IllegalArgumentException("a floor cache needs the catalog of its runs");
        }
        if (budget < 1) {
            throw new IllegalArgumentException("a floor cache budget must be at least 1, not " + budget);
        }
        this.catalog = catalog;
        this.budget = budget;
    }

    /** The catalog of the runs this cache serves. */
    public Catalog catalog() {
        return catalog;
    }

    /** Designs taken from the cache so far (including those waited for). */
    public synchronized long hits() {
        return hits;
    }

    /** Designs computed so far. */
    public synchronized long misses() {
        return misses;
    }

    /** Floor designs kept now. */
    public synchronized int size() {
        return entries.size();
    }

    /** The design of {@code key}: kept, being computed by another thread, or computed here by {@code design}. */
    public FloorDesign get(Object key, Supplier<FloorDesign> design) {
        FutureTask<FloorDesign> task;
        boolean mine = false;
        synchronized (this) {
            task = entries.get(key);
            if (task == null) {
                task = new FutureTask<>(design::get);
                entries.put(key, task);
                mine = true;
                misses++;
            } else {
                hits++;
            }
        }
        if (mine) {
            task.run();
        }
        try {
            FloorDesign d = task.get();
            if (mine) {
                synchronized (this) {
                    if (entries.get(key) == task) {
                        long size = size(d);
                        sizes.put(key, size);
                        kept += size;
                        trim(key);
                    }
                }
            }
            return d;
        } catch (ExecutionException e) {
            synchronized (this) {
                if (entries.remove(key, task)) {
                    Long size = sizes.remove(key);
                    kept -= size == null ? 0 : size;
                }
            }
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return design.get(); // not waiting any longer: do the work here
        }
    }

    /** The size of a design in the budget's units: its member designs and the sections they rejected. */
    static long size(FloorDesign d) {
        long n = 1;
        for (MemberResult m : d.members()) {
            n += 1 + (m.design() == null ? 0 : m.design().rejected().size());
        }
        return n;
    }

    /** Drops the least recently used finished designs while over budget, never {@code newest}. */
    private void trim(Object newest) {
        Iterator<Map.Entry<Object, FutureTask<FloorDesign>>> it = entries.entrySet().iterator();
        while (kept > budget && it.hasNext()) {
            Map.Entry<Object, FutureTask<FloorDesign>> e = it.next();
            Long size = sizes.get(e.getKey());
            if (size != null && e.getKey() != newest) {
                it.remove();
                sizes.remove(e.getKey());
                kept -= size;
            }
        }
    }
}
