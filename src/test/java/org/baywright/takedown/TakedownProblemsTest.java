package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.UnaryOperator;
import java.util.stream.Collectors;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.MemberStatus;
import org.baywright.load.LoadCase;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Plans with something wrong: the takedown reports a located problem naming the object, keeps going for
 * the rest of the building, and its equilibrium check shows load that does not reach a foundation.
 * Expected values are hand calculations written beside each case (half the beam spacing each side,
 * common practice, CHECK-VALUES §9 rule 1).
 */
class TakedownProblemsTest {

    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double DEAD = Units.PSF.toSi(50);
    private static final double LIVE = Units.PSF.toSi(50);

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    /**
     * One level, 2 × 1 bays of 30 ft, beams along y at 10 ft (infill beams at x = 10, 20, 40, 50 ft),
     * girders on grid lines 1 (y = 0) and 2 (y = 30 ft), column-line beams on A, B, C; D = L = 50 psf.
     */
    private static Plan building() {
        return RegularPlan.generate(new RegularPlan.Spec("problems", "us", List.of(ft(30), ft(30)), List.of(ft(30)),
                List.of(ft(13)), true, ft(10), new LoadValues(DEAD, 0, LIVE, 0, 0, 0), LoadValues.ZERO, LoadValues.ZERO));
    }

    /** The plan with its only floor layout changed. */
    private static Plan withFloor(Plan plan, UnaryOperator<Floor> change) {
        List<Floor> floors = plan.floors().stream().map(change).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns());
    }

    private static Floor withMembers(Floor f, List<Member> members) {
        return new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), members, f.infills(), f.openings(), f.areaLoads(),
                f.lineLoads(), f.pointLoads());
    }

    private static List<Member> plus(List<Member> members, Member... more) {
        List<Member> out = new ArrayList<>(members);
        out.addAll(List.of(more));
        return out;
    }

    private static List<Problem> ofKind(List<Problem> problems, String kind) {
        return problems.stream().filter(p -> p.kind().equals(kind)).toList();
    }

    private static Set<String> kinds(List<Problem> problems) {
        return problems.stream().map(Problem::kind).collect(Collectors.toCollection(TreeSet::new));
    }

    private static MemberResult member(TakedownResult t, String id) {
        return t.members().values().stream().flatMap(List::stream).filter(m -> m.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no result for member " + id));
    }

    private static Equilibrium equilibrium(TakedownResult t, LoadCase lc) {
        return t.equilibrium().stream().filter(e -> e.loadCase().equals(lc.symbol())).findFirst().orElseThrow();
    }

    @Test
    void theUnbrokenBuildingHasNoProblems() {
        // the baseline the other cases change: if this failed, the others would prove nothing
        TakedownResult t = PlanRun.run(building(), CATALOG).takedown();
        assertAll(() -> assertEquals(List.of(), t.problems()),
                () -> assertTrue(t.equilibrium().stream().allMatch(Equilibrium::holds)));
    }

    // ------------------------------------------------------------------ an end in the middle of nowhere

    /** A beam at x = 15 ft from girder G-1-AB (y = 0) to (15 ft, 20 ft), where nothing passes. */
    private static Plan danglingBeam() {
        Member stray = new Member("B-STRAY", MemberKind.BEAM, new Point(ft(15), 0), new Point(ft(15), ft(20)), Optional.empty());
        return withFloor(building(), f -> withMembers(f, plus(f.members(), stray)));
    }

    @Test
    void aBeamEndingInMidAirIsUnsupportedAndTheRestIsDesigned() {
        TakedownResult t = PlanRun.run(danglingBeam(), CATALOG).takedown();
        List<Problem> unsupported = ofKind(t.problems(), "unsupported-member");
        MemberResult stray = member(t, "B-STRAY");
        assertAll(() -> assertEquals(1, unsupported.size(), () -> t.problems().toString()),
                () -> assertEquals("B-STRAY", unsupported.get(0).objectId()),
                () -> assertEquals(Problem.Severity.ERROR, unsupported.get(0).severity()),
                // located at the free end
                () -> assertEquals(List.of(new Point(ft(15), ft(20))), unsupported.get(0).where()),
                () -> assertEquals(MemberStatus.UNSUPPORTED, stray.status()),
                () -> assertEquals("", stray.section()),
                // the supported end still finds the girder it rests on
                () -> assertEquals("member G-1-AB", stray.startSupport()),
                () -> assertEquals("", stray.endSupport()),
                // everything else is sized, and every column designed
                () -> assertTrue(t.members().values().stream().flatMap(List::stream).filter(m -> !m.id().equals("B-STRAY"))
                        .allMatch(m -> m.status() == MemberStatus.SIZED && !m.section().isEmpty())),
                () -> assertEquals(6, t.columns().size()),
                () -> assertTrue(t.columns().stream().allMatch(c -> c.tiers().stream()
                        .allMatch(tier -> tier.status() == MemberStatus.SIZED && !tier.section().isEmpty()))),
                () -> assertEquals(Set.of("equilibrium", "unsupported-member"), kinds(t.problems())));
    }

    @Test
    void loadOnAnUnsupportedBeamIsMissingFromTheFoundations() {
        TakedownResult t = PlanRun.run(danglingBeam(), CATALOG).takedown();
        // Hand calculation: B-STRAY (x = 15 ft) lies between the infill beams at x = 10 and 20 ft, so it
        // takes the deck strip 12.5…17.5 ft wide 5 ft over its 20 ft length: 100 ft², which never reaches
        // a column. The deck beyond its free end (y > 20 ft) still spans onto the beams at 10 and 20 ft.
        double lostArea = Units.FT2.toSi(100);
        Equilibrium d = equilibrium(t, LoadCase.D);
        Equilibrium l = equilibrium(t, LoadCase.L);
        List<Problem> eq = ofKind(t.problems(), "equilibrium");
        assertAll(() -> assertFalse(d.holds()),
                () -> assertFalse(l.holds()),
                () -> assertEquals(2, eq.size(), () -> eq.toString()),
                () -> assertTrue(eq.stream().anyMatch(p -> p.location().equals("load case D"))),
                () -> assertTrue(eq.stream().anyMatch(p -> p.location().equals("load case L"))),
                () -> assertEquals(DEAD * lostArea, d.applied() - d.reactions(), 1e-6 * d.applied()),
                () -> assertEquals(LIVE * lostArea, l.applied() - l.reactions(), 1e-6 * l.applied()),
                // the other cases carry nothing and balance
                () -> assertTrue(equilibrium(t, LoadCase.LR).holds()),
                () -> assertTrue(equilibrium(t, LoadCase.S).holds()));
    }

    @Test
    void aBeamBearingOnAnUnsupportedBeamLosesItsLoadToo() {
        // a short beam from the column-line beam on grid A (x = 0) to the stray beam's interior: it is
        // supported and designed, but its reaction lands on a member that is not
        Member stray = new Member("B-STRAY", MemberKind.BEAM, new Point(ft(15), 0), new Point(ft(15), ft(20)), Optional.empty());
        Member feeder = new Member("B-FEED", MemberKind.BEAM, new Point(0, ft(10)), new Point(ft(15), ft(10)), Optional.empty());
        Plan plan = withFloor(building(), f -> withMembers(f, plus(f.members(), stray, feeder)));
        TakedownResult t = PlanRun.run(plan, CATALOG).takedown();
        MemberResult feed = member(t, "B-FEED");
        assertAll(() -> assertEquals(MemberStatus.SIZED, feed.status()),
                () -> assertEquals("member B-STRAY", feed.endSupport()),
                () -> assertEquals(List.of("B-STRAY"), ofKind(t.problems(), "unsupported-member").stream()
                        .map(Problem::objectId).toList()),
                // the feeder's own weight is applied and lost with the rest
                () -> assertFalse(equilibrium(t, LoadCase.D).holds()));
    }

    // ------------------------------------------------------------------ support cycles

    @Test
    void twoBeamsEachEndingOnTheOthersInteriorAreASupportCycle() {
        // In bay A–B along y = 15 ft, away from every column, parallel to the deck span (so they carry no
        // deck): P runs from the infill beam at x = 10 ft to x = 16 ft, Q from the infill beam at x = 20 ft
        // to x = 14 ft. P's end lies inside Q and Q's end inside P: each needs the other designed first.
        Member p = new Member("B-P", MemberKind.BEAM, new Point(ft(10), ft(15)), new Point(ft(16), ft(15)), Optional.empty());
        Member q = new Member("B-Q", MemberKind.BEAM, new Point(ft(20), ft(15)), new Point(ft(14), ft(15)), Optional.empty());
        Plan plan = withFloor(building(), f -> withMembers(f, plus(f.members(), p, q)));
        TakedownResult t = PlanRun.run(plan, CATALOG).takedown();
        List<Problem> cycle = ofKind(t.problems(), "support-cycle");
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(Set.of("B-P", "B-Q"), cycle.stream().map(Problem::objectId).collect(Collectors.toSet()),
                () -> t.problems().toString()));
        checks.add(() -> assertEquals(2, cycle.size()));
        for (Problem pr : cycle) {
            // each message names the whole loop, and only the loop
            checks.add(() -> assertTrue(pr.message().contains("(B-P, B-Q)"), pr.message()));
            checks.add(() -> assertFalse(pr.where().isEmpty()));
        }
        checks.add(() -> assertEquals(MemberStatus.UNSUPPORTED, member(t, "B-P").status()));
        checks.add(() -> assertEquals(MemberStatus.UNSUPPORTED, member(t, "B-Q").status()));
        // the beams the loop bears on, and the girders under them, are not part of it: they are designed
        for (String id : List.of("IF-AB-12/1", "IF-AB-12/2", "G-1-AB", "G-2-AB")) {
            checks.add(() -> assertEquals(MemberStatus.SIZED, member(t, id).status(), id));
        }
        checks.add(() -> assertTrue(t.members().values().stream().flatMap(List::stream)
                .filter(m -> !m.id().equals("B-P") && !m.id().equals("B-Q")).allMatch(m -> m.status() == MemberStatus.SIZED)));
        // the loop lies along the deck span, so it carries no deck: nothing is lost
        checks.add(() -> assertEquals(Set.of("support-cycle"), kinds(t.problems())));
        checks.add(() -> assertTrue(t.equilibrium().stream().allMatch(Equilibrium::holds)));
        assertAll(checks);
    }

    @Test
    void aPinwheelOfFourMembersIsOneLoop() {
        // Pinwheel framing around a 10 ft square: each member starts on a column and ends inside the next.
        // M1 (0,10)→(20,10) ends inside M2; M2 (20,0)→(20,20) ends inside M3; M3 (30,20)→(10,20) ends
        // inside M4; M4 (10,30)→(10,10) ends inside M1 (coordinates in ft).
        double[][] cols = {{0, 10}, {20, 0}, {30, 20}, {10, 30}};
        double[][] ends = {{20, 10}, {20, 20}, {10, 20}, {10, 10}};
        List<Member> members = new ArrayList<>();
        List<Column> columns = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            Point c = new Point(ft(cols[i][0]), ft(cols[i][1]));
            columns.add(new Column("C-" + (i + 1), c, "", "", Optional.empty()));
            members.add(new Member("M" + (i + 1), MemberKind.BEAM, c, new Point(ft(ends[i][0]), ft(ends[i][1])), Optional.empty()));
        }
        // a member bearing on the loop (M1's interior at x = 5 ft) from a fifth column: designed, its reaction lost
        Point c5 = new Point(ft(5), 0);
        columns.add(new Column("C-5", c5, "", "", Optional.empty()));
        members.add(new Member("M5", MemberKind.BEAM, c5, new Point(ft(5), ft(10)), Optional.empty()));
        Polygon slab = Polygon.rectangle(0, 0, ft(30), ft(30));
        Floor floor = new Floor("pinwheel", "Pinwheel", false, slab, List.of(), members, List.of(), List.of(), List.of(),
                List.of(), List.of());
        Plan plan = new Plan("pinwheel", "us", DesignSettings.defaults(), List.of(), List.of(new Level("Level 2", ft(13), ft(13),
                "pinwheel")), List.of(floor), columns);
        TakedownResult t = PlanRun.run(plan, CATALOG).takedown();
        List<Problem> cycle = ofKind(t.problems(), "support-cycle");
        assertAll(() -> assertEquals(List.of("M1", "M2", "M3", "M4"), cycle.stream().map(Problem::objectId).sorted().toList(),
                        () -> t.problems().toString()),
                () -> assertTrue(cycle.stream().allMatch(p -> p.message().contains("(M1, M2, M3, M4)")), () -> cycle.toString()),
                () -> assertEquals(MemberStatus.SIZED, member(t, "M5").status()),
                () -> assertEquals("member M1", member(t, "M5").endSupport()),
                // M5's own weight reaches M1 and goes no further: D does not balance
                () -> assertFalse(equilibrium(t, LoadCase.D).holds()),
                () -> assertEquals(member(t, "M5").endReaction()[Component.D.ordinal()],
                        equilibrium(t, LoadCase.D).applied() - equilibrium(t, LoadCase.D).reactions(),
                        1e-9 * equilibrium(t, LoadCase.D).applied()));
    }

    // ------------------------------------------------------------------ deck with nothing under it

    @Test
    void deckBeyondTheEndsOfTheBeamsIsUnsupported() {
        // slab and deck run 10 ft north of grid line 2 (y = 30 ft); the beams span north–south and end
        // on the girder at y = 30 ft, which runs along the deck span: the strip y = 30…40 ft has no
        // support on either side along the span
        Polygon slab = Polygon.rectangle(0, 0, ft(60), ft(40));
        Plan plan = withFloor(building(), f -> new Floor(f.id(), f.name(), f.roof(), slab, List.of(new Deck("DK-1", slab, 0)),
                f.members(), f.infills(), f.openings(),
                List.of(new AreaLoad("AL-floor", slab, new LoadValues(DEAD, 0, LIVE, 0, 0, 0), LiveLoadUse.ORDINARY)),
                f.lineLoads(), f.pointLoads()));
        TakedownResult t = PlanRun.run(plan, CATALOG).takedown();
        List<Problem> deck = ofKind(t.problems(), "unsupported-deck");
        // hand calculation: the strip is 60 ft × 10 ft = 600 ft², all of its load lost
        double lostArea = Units.FT2.toSi(600);
        Equilibrium d = equilibrium(t, LoadCase.D);
        assertAll(() -> assertFalse(deck.isEmpty(), () -> t.problems().toString()),
                () -> assertTrue(deck.stream().allMatch(p -> !p.where().isEmpty())),
                () -> assertTrue(deck.stream().flatMap(p -> p.where().stream()).allMatch(p -> p.y() >= ft(30) - 1e-6),
                        () -> deck.toString()),
                () -> assertEquals(Set.of("equilibrium", "unsupported-deck"), kinds(t.problems())),
                () -> assertEquals(DEAD * lostArea, d.applied() - d.reactions(), 1e-6 * d.applied()),
                () -> assertTrue(t.members().values().stream().flatMap(List::stream).allMatch(m -> m.status() == MemberStatus.SIZED)));
    }

    // ------------------------------------------------------------------ fixed sizes

    /** The building with column-line beam B-B-12 (30 ft, 10 ft of deck, A_T 300 ft²) fixed to a size. */
    private static Plan fixed(String section) {
        return withFloor(building(), f -> withMembers(f, f.members().stream()
                .map(m -> m.id().equals("B-B-12") ? new Member(m.id(), m.kind(), m.start(), m.end(), Optional.of(section)) : m)
                .toList()));
    }

    @Test
    void aFixedSizeThatFailsIsOverstressedAndStillCarriesItsLoad() {
        // hand calculation in this test: 10 ft of deck at D = L = 50 psf on 30 ft, L reduced ×0.8624
        // (A_T 300 ft²): wu = 1.2 × (0.50 + 0.01) + 1.6 × 0.431 = 1.30 klf, Mu = 1.30 × 30² / 8 = 146 kip-ft;
        // a W8X10 (Zx = 8.87 in³, the project catalog) gives φMp = 0.9 × 50 × 8.87 / 12 = 33 kip-ft: ratio ≈ 4.4
        TakedownResult t = PlanRun.run(fixed("W8X10"), CATALOG).takedown();
        MemberResult b = member(t, "B-B-12");
        List<Problem> over = ofKind(t.problems(), "overstressed");
        assertAll(() -> assertEquals(MemberStatus.OVERSTRESSED, b.status()),
                () -> assertEquals("W8X10", b.section()),
                () -> assertTrue(b.maxRatio() > 4, "ratio " + b.maxRatio()),
                () -> assertEquals(List.of("B-B-12"), over.stream().map(Problem::objectId).toList(), () -> t.problems().toString()),
                () -> assertTrue(over.get(0).message().contains("W8X10"), over.get(0).message()),
                () -> assertEquals(Set.of("overstressed"), kinds(t.problems())),
                // an overstressed member still delivers its load: nothing is lost
                () -> assertTrue(t.equilibrium().stream().allMatch(Equilibrium::holds)));
    }

    @Test
    void aFixedSizeThatPassesIsKept() {
        // the counterpart of the case above, so that it is the size and not the fixing that fails
        TakedownResult t = PlanRun.run(fixed("W24X68"), CATALOG).takedown();
        MemberResult b = member(t, "B-B-12");
        assertAll(() -> assertEquals(MemberStatus.FIXED_SIZE, b.status()),
                () -> assertEquals("W24X68", b.section()),
                () -> assertEquals(List.of(), t.problems()));
    }

    @Test
    void anUnknownFixedSectionIsReportedAndTheMemberSized() {
        TakedownResult t = PlanRun.run(fixed("W99X999"), CATALOG).takedown();
        TakedownResult free = PlanRun.run(building(), CATALOG).takedown();
        MemberResult b = member(t, "B-B-12");
        List<Problem> unknown = ofKind(t.problems(), "unknown-section");
        assertAll(() -> assertEquals(List.of("B-B-12"), unknown.stream().map(Problem::objectId).toList(), () -> t.problems().toString()),
                () -> assertTrue(unknown.get(0).message().contains("W99X999"), unknown.get(0).message()),
                () -> assertEquals(MemberStatus.SIZED, b.status()),
                // sized exactly as if no size had been given
                () -> assertEquals(member(free, "B-B-12").section(), b.section()),
                () -> assertFalse(b.section().isEmpty()),
                () -> assertEquals(Set.of("unknown-section"), kinds(t.problems())));
    }
}
