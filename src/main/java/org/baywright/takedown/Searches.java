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
import org.baywright.design.OverhangDesigner;
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
    private record Key(double span, double a, double b, List<List<SpanLoad>> loads, List<List<SpanLoad>> deflectionLoads, BeamCriteria criteria,
            SearchFilter filter) {
    }

    /** The inputs that fix a composite search: the member (its loads by case as lists), the criteria, filter and fixed choices. */
    private record CompositeKey(double span, org.baywright.design.aisc360.DeckRibs ribs, double nl, double nr, double el,
            double er, org.baywright.design.SlabOnDeck slab, org.baywright.design.Studs studs, double slabWeight,
            List<SpanLoad> wet, List<SpanLoad> construction, List<List<SpanLoad>> loads, List<List<SpanLoad>> deflectionLoads,
            org.baywright.design.Bracing bracing, org.baywright.design.CompositeCriteria criteria, SearchFilter filter,
            Section fixed, int fixedStuds) {
    }

    /** A composite member's design and the designer that made it (for its calculation sheet). */
    record CompositeSized(org.baywright.design.CompositeBeamDesigner designer, org.baywright.design.CompositeDesign design) {
    }

    private final Catalog catalog;
    private final Map<Key, Sized> done = new ConcurrentHashMap<>();
    private final Map<CompositeKey, CompositeSized> compositeDone = new ConcurrentHashMap<>();

    /** Searches in {@code catalog}. */
    public Searches(Catalog catalog) {
        this.catalog = catalog;
    }

    public Catalog catalog() {
        return catalog;
    }

    /**
     * The lightest section of the catalog allowed by {@code filter} for these loads; {@code deflectionLoads}
     * are the service loads of the deflection checks when they differ (live load unreduced), else null.
     */
    Sized search(double span, Map<LoadCase, List<SpanLoad>> caseLoads, Map<LoadCase, List<SpanLoad>> deflectionLoads,
            BeamCriteria criteria, SearchFilter filter) {
        return search(span, 0, span, caseLoads, deflectionLoads, criteria, filter);
    }

    /**
     * As {@link #search(double, Map, Map, BeamCriteria, SearchFilter)} for a member on supports at
     * {@code a} and {@code b} (m from its start): an overhanging member unless they are its ends.
     */
    Sized search(double span, double a, double b, Map<LoadCase, List<SpanLoad>> caseLoads,
            Map<LoadCase, List<SpanLoad>> deflectionLoads, BeamCriteria criteria, SearchFilter filter) {
        Key key = new Key(span, a, b, byCase(caseLoads), deflectionLoads == null ? null : byCase(deflectionLoads), criteria, filter);
        Sized sized = done.get(key);
        if (sized == null) {
            BeamLoads bl = loads(span, a, b, caseLoads, deflectionLoads);
            sized = new Sized(bl, bl.isOverhanging() ? new OverhangDesigner(bl, criteria).search(catalog, filter)
                    : new BeamDesigner(bl, criteria).search(catalog, filter));
            Sized raced = done.putIfAbsent(key, sized);
            sized = raced != null ? raced : sized;
        }
        return sized;
    }

    private static List<List<SpanLoad>> byCase(Map<LoadCase, List<SpanLoad>> caseLoads) {
        List<List<SpanLoad>> byCase = new ArrayList<>();
        for (LoadCase c : LoadCase.values()) {
            byCase.add(List.copyOf(caseLoads.getOrDefault(c, List.of())));
        }
        return byCase;
    }

    private static BeamLoads loads(double span, double a, double b, Map<LoadCase, List<SpanLoad>> caseLoads,
            Map<LoadCase, List<SpanLoad>> deflectionLoads) {
        BeamLoads bl = a == 0 && b == span ? BeamLoads.of(span, caseLoads) : BeamLoads.overhanging(span, a, b, caseLoads);
        return deflectionLoads == null ? bl : bl.withDeflectionLoads(deflectionLoads);
    }

    /**
     * The composite design of a member: the search of (section, studs) of least cost-equivalent weight allowed by
     * {@code filter}, or with {@code fixed} given, the least studs for that section (or the check of
     * {@code fixedStuds} studs on the whole member when ≥ 0).
     */
    CompositeSized composite(org.baywright.design.CompositeMember member, Map<LoadCase, List<SpanLoad>> caseLoads,
            Map<LoadCase, List<SpanLoad>> deflectionLoads, org.baywright.design.CompositeCriteria criteria, SearchFilter filter,
            Section fixed, int fixedStuds) {
        CompositeKey key = new CompositeKey(member.span(), member.ribs(), member.toNeighbourLeft(), member.toNeighbourRight(),
                member.toEdgeLeft(), member.toEdgeRight(), member.slab(), member.studs(), member.slabWeight(), member.wet(),
                member.construction(), byCase(caseLoads), deflectionLoads == null ? null : byCase(deflectionLoads),
                member.constructionBracing(), criteria, filter, fixed, fixedStuds);
        CompositeSized sized = compositeDone.get(key);
        if (sized == null) {
            org.baywright.design.CompositeBeamDesigner d = new org.baywright.design.CompositeBeamDesigner(member, criteria);
            org.baywright.design.CompositeDesign cd;
            if (fixed == null) {
                cd = d.search(catalog, filter);
            } else if (fixedStuds >= 0) {
                cd = d.check(fixed, (fixedStuds + 1) / 2, null);
            } else {
                cd = d.search(new Catalog(catalog.name(), catalog.source(), List.of(fixed)), SearchFilter.ALL);
                if (cd.section() != null && cd.status() == org.baywright.design.MemberStatus.SIZED) {
                    cd = d.check(fixed, cd.studsPerHalf(), null);
                }
            }
            sized = new CompositeSized(d, cd);
            CompositeSized raced = compositeDone.putIfAbsent(key, sized);
            sized = raced != null ? raced : sized;
        }
        return sized;
    }

    /** The check of a fixed section for these loads (deflection loads as for {@link #search}). */
    Sized check(Section fixed, double span, Map<LoadCase, List<SpanLoad>> caseLoads,
            Map<LoadCase, List<SpanLoad>> deflectionLoads, BeamCriteria criteria) {
        return check(fixed, span, 0, span, caseLoads, deflectionLoads, criteria);
    }

    /** The check of a fixed section on supports at {@code a} and {@code b} (an overhanging member unless they are its ends). */
    Sized check(Section fixed, double span, double a, double b, Map<LoadCase, List<SpanLoad>> caseLoads,
            Map<LoadCase, List<SpanLoad>> deflectionLoads, BeamCriteria criteria) {
        BeamLoads bl = loads(span, a, b, caseLoads, deflectionLoads);
        return new Sized(bl, bl.isOverhanging() ? new OverhangDesigner(bl, criteria).checkFixed(fixed)
                : new BeamDesigner(bl, criteria).checkFixed(fixed));
    }
}
