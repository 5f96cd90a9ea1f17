package org.baywright.plan;

/**
 * A deck area spanning one way. Each point of it carries its load to the nearest supporting member on
 * each side along the span direction.
 *
 * <p>Its limits come from the deck maker's published tables for the deck chosen (gauge, profile, slab,
 * shored or not); the user enters them. Where the user has not, the defaults below stand in:
 * {@value #DEFAULT_MAX_SPAN_FT} ft span and {@value #DEFAULT_MAX_OVERHANG_FT} ft overhang are common
 * practice for a typical 3 in composite floor deck with a normal-weight slab, unshored (common practice,
 * not a table value: check the maker's tables for the deck actually used).
 *
 * @param id e.g. "DK-1"
 * @param outline the deck area
 * @param spanAngle direction of the deck span (ribs), degrees counter-clockwise from the x axis; 0 = ribs
 *     run east–west (so the deck spans onto north–south members), 90 = ribs run north–south
 * @param maxSpan the longest span allowed between two members carrying the deck, along its span, m
 * @param maxOverhang the longest overhang (cantilever) allowed beyond the last member carrying the deck,
 *     along its span, m; an overhang needs a span behind it whatever its length
 * @param slab the concrete slab it carries, or null when none is described (the slab's weight is then
 *     whatever dead load the area loads give, and no member can act compositely with it)
 */
public record Deck(String id, Polygon outline, double spanAngle, double maxSpan, double maxOverhang, Slab slab) {

    /** Default largest span, ft (common practice: a 3 in composite deck, unshored). */
    public static final double DEFAULT_MAX_SPAN_FT = 15;
    /** Default largest overhang, ft (common practice: a 3 in composite deck cantilever without added framing). */
    public static final double DEFAULT_MAX_OVERHANG_FT = 2;
    /** Default largest span, m (15 ft). */
    public static final double DEFAULT_MAX_SPAN = DEFAULT_MAX_SPAN_FT * 0.3048;
    /** Default largest overhang, m (2 ft). */
    public static final double DEFAULT_MAX_OVERHANG = DEFAULT_MAX_OVERHANG_FT * 0.3048;

    /** A deck with the default limits and no slab described. */
    public Deck(String id, Polygon outline, double spanAngle) {
        this(id, outline, spanAngle, DEFAULT_MAX_SPAN, DEFAULT_MAX_OVERHANG, null);
    }

    /** A deck with these limits and no slab described. */
    public Deck(String id, Polygon outline, double spanAngle, double maxSpan, double maxOverhang) {
        this(id, outline, spanAngle, maxSpan, maxOverhang, null);
    }

    /** This deck with other limits, m. */
    public Deck withLimits(double span, double overhang) {
        return new Deck(id, outline, spanAngle, span, overhang, slab);
    }

    /** This deck carrying another slab (null: none). */
    public Deck withSlab(Slab s) {
        return new Deck(id, outline, spanAngle, maxSpan, maxOverhang, s);
    }

    /** This deck with another outline. */
    public Deck withOutline(Polygon p) {
        return new Deck(id, p, spanAngle, maxSpan, maxOverhang, slab);
    }

    /** This deck spanning at another angle, degrees. */
    public Deck withSpanAngle(double angle) {
        return new Deck(id, outline, angle, maxSpan, maxOverhang, slab);
    }

    /** True when both limits are the defaults (a plan file then leaves them out). */
    public boolean defaultLimits() {
        return maxSpan == DEFAULT_MAX_SPAN && maxOverhang == DEFAULT_MAX_OVERHANG;
    }
}
