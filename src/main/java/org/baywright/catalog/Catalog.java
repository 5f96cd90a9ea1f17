package org.baywright.catalog;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * An ordered set of sections. Sections are kept in search order: lightest nominal weight first;
 * equal weights by smaller actual depth d (the shallower floor), then by designation. This order is
 * the tie-break of the lightest-section search.
 */
public final class Catalog {
    /** Search order: weight, then actual depth, then designation. */
    public static final Comparator<Section> SEARCH_ORDER = Comparator.comparingDouble(Section::weight)
            .thenComparingDouble(Section::depth)
            .thenComparing(Section::designation);

    private final String name;
    private final String source;
    private final List<Section> sections;
    private final Map<String, Section> byDesignation;

    public Catalog(String name, String source, List<Section> sections) {
        this.name = name;
        this.source = source;
        List<Section> sorted = new ArrayList<>(sections);
        sorted.sort(SEARCH_ORDER);
        this.sections = List.copyOf(sorted);
        Map<String, Section> map = new LinkedHashMap<>();
        for (Section s : this.sections) {
            if (map.put(s.designation(), s) != null) {
                throw new IllegalArgumentException(source + ": designation " + s.designation() + " appears twice");
            }
        }
        for (Section s : this.sections) {
            if (!s.siDesignation().isEmpty() && map.putIfAbsent(s.siDesignation(), s) != null
                    && map.get(s.siDesignation()) != s) {
                throw new IllegalArgumentException(source + ": designation " + s.siDesignation() + " appears twice");
            }
        }
        this.byDesignation = map;
    }

    /** The catalog's name from its file, e.g. "W shapes, ASTM A6 (US customary)". */
    public String name() {
        return name;
    }

    /** Where it was read from (a path, or the built-in resource). */
    public String source() {
        return source;
    }

    /** All sections in search order. */
    public List<Section> sections() {
        return sections;
    }

    public int size() {
        return sections.size();
    }

    /** Finds a section by designation, in any case and spacing ({@code w18x50}), or by its SI designation where the catalog gives one. */
    public Optional<Section> find(String designation) {
        return Optional.ofNullable(byDesignation.get(Section.normalize(designation)));
    }

    /** A catalog of the sections that pass the filter, same order. */
    public Catalog filter(Predicate<Section> keep) {
        return new Catalog(name, source, sections.stream().filter(keep).toList());
    }
}
