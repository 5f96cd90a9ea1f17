package org.baywright.takedown;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.baywright.geometry.DeckSpan;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Problem;
import org.baywright.units.UnitSystem;

/**
 * The deck's own check, per floor layout: each span between the members that carry a deck and each
 * overhang beyond them (measured along the span by the geometry, {@link DeckSpan}) against the deck's
 * limits ({@link Deck#maxSpan()}, {@link Deck#maxOverhang()}: the deck maker's tables, or the defaults),
 * and every overhang with no span behind it, whatever its length: deck cantilevering beyond a member
 * with nothing on the other side to hold it down (the member would need to resist it in torsion, which
 * is not checked). Each is a located problem whose place is the span or overhang itself, as a segment
 * (its two ends, plan coordinates).
 *
 * <p>Known limitations: spans are centre line to centre line (member widths are not subtracted, which
 * errs on the safe side); decks are checked one by one, so where two decks with the same span direction
 * meet away from a member, each is taken to end there.
 */
public final class DeckChecks {
    /** A span or overhang is longer than its limit when it exceeds it by more than this fraction (rounding of files). */
    static final double SLACK = 1e-6;

    /** Span longer than the deck's limit. */
    public static final String DECK_SPAN = "deck-span";
    /** Overhang longer than the deck's limit. */
    public static final String DECK_OVERHANG = "deck-overhang";
    /** Overhang with no span behind it: nothing resists the cantilever. */
    public static final String DECK_CANTILEVER = "deck-cantilever";

    private DeckChecks() {
    }

    /** True for a problem of this check: its place is a segment (two points) to draw as a line, not as marks. */
    public static boolean isSegment(Problem p) {
        return p.where().size() == 2 && (p.kind().equals(DECK_SPAN) || p.kind().equals(DECK_OVERHANG)
                || p.kind().equals(DECK_CANTILEVER));
    }

    /**
     * The problems of one floor layout's decks.
     *
     * @param spans the spans and overhangs the geometry measured on {@code floor}
     */
    public static List<Problem> check(Floor floor, List<DeckSpan> spans, UnitSystem units) {
        Map<String, Deck> decks = new HashMap<>();
        for (Deck d : floor.decks()) {
            decks.putIfAbsent(d.id(), d);
        }
        String where = "floor " + floor.id();
        List<Problem> out = new ArrayList<>();
        for (DeckSpan s : spans) {
            Deck d = decks.get(s.deckId());
            double maxSpan = d == null ? Deck.DEFAULT_MAX_SPAN : d.maxSpan();
            double maxOverhang = d == null ? Deck.DEFAULT_MAX_OVERHANG : d.maxOverhang();
            String deck = d == null ? "the slab of floor " + floor.id() : "deck " + s.deckId();
            String from = units.pointText(s.from().x(), s.from().y());
            String to = units.pointText(s.to().x(), s.to().y());
            String len = units.lengthText(s.length());
            List<org.baywright.plan.Point> at = List.of(s.from(), s.to());
            if (!s.overhang()) {
                if (s.length() > maxSpan * (1 + SLACK)) {
                    out.add(new Problem(Problem.Severity.ERROR, DECK_SPAN, where, s.deckId(), deck + " spans " + len
                            + " between members " + s.memberA() + " and " + s.memberB() + ", from " + from + " to " + to
                            + "; it allows " + units.lengthText(maxSpan) + " (maxSpan, from the deck maker's tables)"
                            + "; add a member between them or choose a deck that spans further", at));
                }
            } else if (!s.backspan()) {
                if (s.length() > Takedown.TOLERANCE) {
                    out.add(new Problem(Problem.Severity.ERROR, DECK_CANTILEVER, where, s.deckId(), deck + " cantilevers "
                            + len + " beyond member " + s.memberA() + ", from " + from + " to its edge at " + to
                            + ", with no span behind it: no member on the other side holds the cantilever down"
                            + (s.length() > maxOverhang * (1 + SLACK) ? ", and it is longer than the "
                                    + units.lengthText(maxOverhang) + " the deck allows (maxOverhang)" : "")
                            + "; frame it with cantilevered beams and backspans, or add a member at its edge", at));
                }
            } else if (s.length() > maxOverhang * (1 + SLACK)) {
                out.add(new Problem(Problem.Severity.ERROR, DECK_OVERHANG, where, s.deckId(), deck + " overhangs " + len
                        + " beyond member " + s.memberA() + ", from " + from + " to its edge at " + to + "; it allows "
                        + units.lengthText(maxOverhang) + " (maxOverhang, from the deck maker's tables)"
                        + "; add a member nearer the edge or choose a deck that cantilevers further", at));
            }
        }
        return out;
    }
}
