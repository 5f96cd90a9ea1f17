package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.design.SearchFilter;
import org.baywright.load.LoadCase;

/**
 * The lightest-section searches of one run, each distinct set of inputs searched once: on a regular
 * floor most beams carry exactly the same loads. Thread-safe (floors are designed in parallel).
 */
public final class Searches {
    /** A member's service loads and the design for them. */
    record Sized(BeamLoads loads, BeamDesign design) {
    }

    /**
     * The inputs that fix the outcome of a search: span, service loads by load case, criteria and filter
     * (the catalog is the run's). Equal keys give equal designs.
     */
    private record Key(double span, List<List<SpanLoad>> loads, BeamCriteria criteria, SearchFilter filter) {
    }

    private final Catalog catalog;
    private final Map<Key, Sized> done = new ConcurrentHashMap<>();

    /** Searches in {@code catalog}. */
    public Searches(Catalog catalog) {
        this.catalog = catalog;
    }

    public Catalog catalog() {
        return catalog;
    }

    /** The lightest section of the catalog allowed by {@code filter} for these loads. */
    Sized search(double span, Map<LoadCase, List<SpanLoad>> caseLoads, BeamCriteria criteria, SearchFilter filter) {
        List<List<SpanLoad>> byCase = new ArrayList<>();
        for (LoadCase c : LoadCase.values()) {
            byCase.add(List.copyOf(caseLoads.getOrDefault(c, List.of())));
        }
        Key key = new Key(span, byCase, criteria, filter);
        Sized sized = done.get(key);
        if (sized == null) {
            BeamLoads bl = BeamLoads.of(span, caseLoads);
            sized = new Sized(bl, new BeamDesigner(bl, criteria).search(catalog, filter));
            Sized raced = done.putIfAbsent(key, sized);
            sized = raced != null ? raced : sized;
        }
        return sized;
    }

    /** The check of a fixed section for these loads. */
    Sized check(Section fixed, double span, Map<LoadCase, List<SpanLoad>> caseLoads, BeamCriteria criteria) {
        BeamLoads bl = BeamLoads.of(span, caseLoads);
        return new Sized(bl, new BeamDesigner(bl, criteria).checkFixed(fixed));
    }
}
