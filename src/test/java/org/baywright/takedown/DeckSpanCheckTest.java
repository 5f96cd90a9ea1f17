package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.geometry.DeckSpan;
import org.baywright.geometry.TributaryAnalysis;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Framing;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The deck's span and overhang between and beyond the members that carry it, measured along its span,
 * and infill that frames the column lines (issue 10 item 2, issue 12 item 4). Every expected length is
 * the plan's own geometry (COMPUTED by hand from the grid below); the limits are the deck's defaults
 * (15 ft span, 2 ft overhang: common practice for a 3 in composite deck, unshored) unless a case sets
 * them.
 */
class DeckSpanCheckTest {

    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double PSF = Units.PSF.toSi(1);
    /** Rounding of feet converted to metres and back: far below a drawing's precision. */
    private static final double EPS = 1e-6;

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    /**
     * One level, 2 × 1 bays of 30 ft (grid A, B, C at x = 0, 30, 60 ft; 1, 2 at y = 0, 30 ft), girders on
     * 1 and 2, column-line beams on A, B, C, infill beams along y at {@code spacing}; the deck spans along
     * x onto the beams; D = L = 50 psf.
     */
    private static Plan regular(double spacing, double bay) {
        return RegularPlan.generate(new RegularPlan.Spec("deck", "us", List.of(ft(bay), ft(bay)), List.of(ft(30)),
                List.of(ft(13)), true, ft(spacing), new LoadValues(50 * PSF, 0, 50 * PSF, 0, 0, 0), LoadValues.ZERO,
                LoadValues.ZERO));
    }

    private static Plan withFloor(Plan plan, UnaryOperator<Floor> change) {
        List<Floor> floors = plan.floors().stream().map(change).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns());
    }

    private static Floor with(Floor f, Polygon slab, List<Deck> decks, List<Member> members) {
        return new Floor(f.id(), f.name(), f.roof(), slab, decks, members, f.infills(), f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads());
    }

    /** The regular plan without its column-line beams (B-A-12, B-B-12, B-C-12): what a user drawing infill gets. */
    private static Plan bareColumnLines(double spacing) {
        return withFloor(regular(spacing, 30), f -> with(f, f.slabEdge(), f.decks(),
                f.members().stream().filter(m -> !m.id().startsWith("B-")).toList()));
    }

    private static List<Problem> problems(Plan plan, String kind) {
        return PlanRun.run(plan, CATALOG).takedown().problems().stream().filter(p -> p.kind().equals(kind)).toList();
    }

    private static List<DeckSpan> spans(Plan plan) {
        Floor f = plan.floors().get(0);
        return TributaryAnalysis.compute(f, Framing.members(plan, f), Takedown.GRID).deckSpans();
    }

    private static double longestSpan(Plan plan) {
        return spans(plan).stream().filter(s -> !s.overhang()).mapToDouble(DeckSpan::length).max().orElse(0);
    }

    // ------------------------------------------------------------------ infill frames the column lines

    @Test
    void infillAtTenFeetLeavesNoDeckSpanLongerThanTenFeet() {
        // issue 10 item 2: infill at 10 ft in two 30 ft bays with the column lines bare placed beams at
        // x = 10, 20, 40, 50 ft only, so the deck spanned 20 ft across line B and overhung 10 ft at A and C
        Plan plan = bareColumnLines(10);
        List<Member> members = Framing.members(plan, plan.floors().get(0));
        List<Double> lineA = onLine(members, 0);
        List<Double> lineB = onLine(members, ft(30));
        List<Double> lineC = onLine(members, ft(60));
        assertAll(() -> assertEquals(1, lineA.size(), () -> "one beam on line A: " + members),
                () -> assertEquals(1, lineB.size(), () -> "one beam on line B, shared by both bays: " + members),
                () -> assertEquals(1, lineC.size(), () -> "one beam on line C: " + members),
                () -> assertEquals(ft(10), longestSpan(plan), EPS, "the spacing typed is the longest deck span"),
                () -> assertTrue(spans(plan).stream().noneMatch(DeckSpan::overhang), () -> "no overhang: " + spans(plan)),
                () -> assertEquals(List.of(), PlanRun.run(plan, CATALOG).takedown().problems()));
    }

    @Test
    void infillDoesNotDoubleAMemberAlreadyOnTheColumnLine() {
        // the regular plan draws its column-line beams; infill adds none beside them
        Plan plan = regular(10, 30);
        Floor f = plan.floors().get(0);
        List<Member> members = Framing.members(plan, f);
        assertAll(() -> assertEquals(f.members().size() + 4, members.size(), () -> members.toString()),
                () -> assertEquals(1, onLine(members, ft(30)).size()),
                () -> assertEquals(ft(10), longestSpan(plan), EPS));
    }

    @Test
    void theRegularPlanOfNewFramesEveryColumnLine() {
        // the plan `new` writes: 10 ft spacing in 30 ft bays, the deck spans 10 ft everywhere
        assertAll(() -> assertEquals(ft(10), longestSpan(regular(10, 30)), EPS),
                () -> assertEquals(List.of(), problems(regular(10, 30), DeckChecks.DECK_SPAN)),
                () -> assertEquals(List.of(), problems(regular(10, 30), DeckChecks.DECK_OVERHANG)),
                () -> assertEquals(List.of(), problems(regular(10, 30), DeckChecks.DECK_CANTILEVER)));
    }

    /** The x of every member lying along the line x = {@code x}. */
    private static List<Double> onLine(List<Member> members, double x) {
        List<Double> out = new ArrayList<>();
        for (Member m : members) {
            if (Math.abs(m.start().x() - x) < 1e-6 && Math.abs(m.end().x() - x) < 1e-6) {
                out.add(x);
            }
        }
        return out;
    }

    // ------------------------------------------------------------------ span

    @Test
    void aDeckSpanningFurtherThanItsLimitIsALocatedProblem() {
        // 40 ft bays at 20 ft spacing: one beam at mid-bay, so the deck spans 20 ft > 15 ft (default)
        Plan plan = regular(20, 40);
        List<Problem> p = problems(plan, DeckChecks.DECK_SPAN);
        assertAll(() -> assertEquals(4, p.size(), () -> p.toString()),
                () -> assertTrue(p.stream().allMatch(q -> q.objectId().equals("DK-1"))),
                () -> assertTrue(p.stream().allMatch(q -> q.location().equals("floor typical"))),
                () -> assertTrue(p.get(0).message().contains("spans 20'-0\""), p.get(0).message()),
                () -> assertTrue(p.get(0).message().contains("allows 15'-0\""), p.get(0).message()),
                () -> assertEquals(2, p.get(0).where().size()),
                () -> assertEquals(ft(20), p.get(0).where().get(0).distance(p.get(0).where().get(1)), EPS),
                () -> assertEquals(p.get(0).where().get(0).y(), p.get(0).where().get(1).y(), EPS,
                        "drawn along the deck's span (x)"));
    }

    @Test
    void theDecksOwnLimitGovernsTheSpan() {
        // the same 10 ft spacing passes with the default limit and fails with a deck rated for 8 ft
        Plan plan = withFloor(regular(10, 30), f -> with(f, f.slabEdge(),
                f.decks().stream().map(d -> d.withLimits(ft(8), ft(2))).toList(), f.members()));
        List<Problem> p = problems(plan, DeckChecks.DECK_SPAN);
        assertAll(() -> assertEquals(6, p.size(), () -> p.toString()),
                () -> assertTrue(p.get(0).message().contains("allows 8'-0\""), p.get(0).message()));
    }

    // ------------------------------------------------------------------ overhang

    /** The regular plan with its slab edge and deck reaching {@code beyond} past grid line A (x < 0). */
    private static Plan overhangingA(double beyond, double maxOverhang) {
        Polygon slab = Polygon.rectangle(-ft(beyond), 0, ft(60), ft(30));
        return withFloor(regular(10, 30), f -> with(f, slab,
                List.of(new Deck("DK-1", slab, 0, Deck.DEFAULT_MAX_SPAN, ft(maxOverhang))), f.members()));
    }

    @Test
    void anOverhangLongerThanTheDecksLimitIsALocatedProblem() {
        // 3 ft beyond the beam on A, a 10 ft span behind it: longer than 2 ft (default)
        List<Problem> p = problems(overhangingA(3, 2), DeckChecks.DECK_OVERHANG);
        assertAll(() -> assertEquals(1, p.size(), () -> p.toString()),
                () -> assertTrue(p.get(0).message().contains("overhangs 3'-0\" beyond member B-A-12"), p.get(0).message()),
                () -> assertEquals(new Point(0, p.get(0).where().get(0).y()), p.get(0).where().get(0)),
                () -> assertEquals(-ft(3), p.get(0).where().get(1).x(), EPS),
                () -> assertEquals(List.of(), problems(overhangingA(3, 2), DeckChecks.DECK_CANTILEVER)),
                () -> assertEquals(List.of(), problems(overhangingA(1.5, 2), DeckChecks.DECK_OVERHANG), "1'-6\" ≤ 2'-0\""),
                () -> assertEquals(List.of(), problems(overhangingA(3, 4), DeckChecks.DECK_OVERHANG), "the deck's own 4 ft"));
    }

    /**
     * A balcony 6 ft deep south of grid 1, its own deck spanning north–south onto girders G-1-AB and
     * G-1-BC only, with nothing south of it: the deck cantilevers with no span behind it (issue 12 item 4,
     * the demo's balcony before it is framed).
     */
    private static Plan balcony(double maxOverhang) {
        Polygon slab = new Polygon(List.of(new Point(0, -ft(6)), new Point(ft(60), -ft(6)), new Point(ft(60), ft(30)),
                new Point(0, ft(30))));
        Polygon balcony = Polygon.rectangle(0, -ft(6), ft(60), 0);
        return withFloor(regular(10, 30), f -> {
            List<Deck> decks = new ArrayList<>(f.decks());
            decks.add(new Deck("DK-BAL", balcony, 90, Deck.DEFAULT_MAX_SPAN, ft(maxOverhang)));
            return with(f, slab, decks, f.members());
        });
    }

    @Test
    void aDeckCantileveringWithNoSpanBehindItIsALocatedProblemWhateverItsLimit() {
        List<Problem> p = problems(balcony(2), DeckChecks.DECK_CANTILEVER);
        List<Problem> allowed = problems(balcony(8), DeckChecks.DECK_CANTILEVER);
        assertAll(() -> assertEquals(2, p.size(), () -> p.toString()),
                () -> assertTrue(p.stream().allMatch(q -> q.objectId().equals("DK-BAL"))),
                () -> assertTrue(p.get(0).message().contains("cantilevers 6'-0\" beyond member G-1-"), p.get(0).message()),
                () -> assertTrue(p.get(0).message().contains("no span behind it"), p.get(0).message()),
                () -> assertTrue(p.get(0).message().contains("longer than the 2'-0\""), p.get(0).message()),
                () -> assertEquals(ft(6), p.get(0).where().get(0).distance(p.get(0).where().get(1)), EPS),
                () -> assertEquals(2, allowed.size(), "a longer limit does not make a backspan"),
                () -> assertFalse(allowed.get(0).message().contains("longer than"), allowed.get(0).message()));
    }

    @Test
    void theSameBalconyAsPartOfTheFloorDeckHasItsSpanBehindIt() {
        // one deck spanning north–south over floor and balcony, onto the girders on 1 and 2 (30 ft apart,
        // so this deck is given a 30 ft span): the 6 ft beyond girder 1 has that span behind it
        Polygon slab = new Polygon(List.of(new Point(0, -ft(6)), new Point(ft(60), -ft(6)), new Point(ft(60), ft(30)),
                new Point(0, ft(30))));
        Plan plan = withFloor(regular(10, 30), f -> with(f, slab,
                List.of(new Deck("DK-1", slab, 90, ft(30), ft(8))), f.members()));
        assertAll(() -> assertEquals(List.of(), problems(plan, DeckChecks.DECK_CANTILEVER)),
                () -> assertEquals(List.of(), problems(plan, DeckChecks.DECK_OVERHANG), "6 ft ≤ the deck's 8 ft"),
                () -> assertEquals(ft(6), spans(plan).stream().filter(DeckSpan::overhang).mapToDouble(DeckSpan::length)
                        .max().orElse(0), EPS));
    }

    /** The floor's deck drawn as two outlines meeting at x = 25 ft (mid-bay, on no member), spanning at the angles given. */
    private static Plan splitDeck(double west, double east) {
        return withFloor(regular(10, 30), f -> with(f, f.slabEdge(), List.of(
                new Deck("DK-W", Polygon.rectangle(0, 0, ft(25), ft(30)), west),
                new Deck("DK-E", Polygon.rectangle(ft(25), 0, ft(60), ft(30)), east)), f.members()));
    }

    @Test
    void aDeckDrawnInTwoOutlinesWithOneSpanDirectionIsOneDeck() {
        // same direction: continuous over the joint, the beams at 20 and 30 ft carry a 10 ft span across it
        Plan same = splitDeck(0, 0);
        Plan turned = splitDeck(0, 90);
        List<DeckSpan> across = spans(same).stream().filter(s -> !s.overhang() && Math.abs(s.length() - ft(10)) < EPS
                && s.memberA().equals("IF-AB-12/2") && s.memberB().equals("B-B-12")).toList();
        assertAll(() -> assertEquals(ft(10), longestSpan(same), EPS),
                () -> assertEquals(1, across.size(), () -> spans(same).toString()),
                () -> assertEquals("DK-W", across.get(0).deckId(), "given to the deck holding its middle (x = 25 ft)"),
                () -> assertEquals(List.of(), problems(same, DeckChecks.DECK_OVERHANG)),
                () -> assertEquals(List.of(), problems(same, DeckChecks.DECK_CANTILEVER)),
                // turned east deck: the west deck ends at 25 ft, 5 ft beyond the beam at 20 ft (a span behind it)
                () -> assertEquals(1, problems(turned, DeckChecks.DECK_OVERHANG).stream()
                        .filter(p -> p.objectId().equals("DK-W")).count(), () -> problems(turned, DeckChecks.DECK_OVERHANG).toString()));
    }

    @Test
    void membersDrawnOnTheLineAreNotDoubledWhenTheyOnlyPartlyCoverIt() {
        // a member along line B over the first 10 ft of the bay: a member is already there, so none is added
        Plan plan = withFloor(bareColumnLines(10), f -> {
            List<Member> ms = new ArrayList<>(f.members());
            ms.add(new Member("B-PART", org.baywright.plan.MemberKind.BEAM, new Point(ft(30), 0), new Point(ft(30), ft(10)),
                    Optional.empty()));
            return with(f, f.slabEdge(), f.decks(), ms);
        });
        List<Member> members = Framing.members(plan, plan.floors().get(0));
        assertEquals(1, onLine(members, ft(30)).size(), () -> members.toString());
    }

    // ------------------------------------------------------------------ the plans in plans/

    @Test
    void everyPlanInPlansStillLoadsAndOnlyTheDemosBalconyMayBeFlagged() throws java.io.IOException {
        // the deck limits are new, optional fields: every plan file reads with the defaults and runs.
        // The demo's balcony deck cantilevers from the girders on grid 1 with nothing behind it
        // (issue 12 item 4): that is flagged until the demo is reworked with cantilevered beams and
        // backspans, and nothing else on it is (after the rework, nothing at all).
        List<java.nio.file.Path> files;
        try (var walk = java.nio.file.Files.walk(java.nio.file.Path.of("plans"))) {
            files = walk.filter(f -> f.toString().endsWith(".bay.json")).sorted().toList();
        }
        List<org.junit.jupiter.api.function.Executable> checks = new ArrayList<>();
        checks.add(() -> assertTrue(files.size() >= 2, files::toString));
        for (java.nio.file.Path f : files) {
            var read = org.baywright.io.PlanFiles.read(f);
            checks.add(() -> assertTrue(read.ok(), () -> f + ": " + read.problems()));
            if (!read.ok()) {
                continue;
            }
            List<Problem> deck = PlanRun.run(read.plan().orElseThrow(), CATALOG).takedown().problems().stream()
                    .filter(DeckChecks::isSegment).toList();
            if (f.getFileName().toString().startsWith("harbourview")) {
                checks.add(() -> assertTrue(deck.stream().allMatch(p -> p.kind().equals(DeckChecks.DECK_CANTILEVER)
                        && p.objectId().equals("DK-balcony")), () -> f + ": " + deck));
            } else {
                checks.add(() -> assertEquals(List.of(), deck, f.toString()));
            }
        }
        assertAll(checks);
    }
}
