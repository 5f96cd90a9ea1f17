package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.MemberStatus;
import org.baywright.load.LoadCase;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Level;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.function.Executable;

/**
 * Invariants of the takedown over random regular buildings: 1–4 bays each way of 15–45 ft, 1–4
 * levels, beams either way at 6–15 ft, random dead, superimposed, live, roof live, snow and partition
 * loads, an optional edge load, optional openings inside bays, optional point loads on the deck and
 * random design settings.
 *
 * <p>What must hold whatever the plan (none of it is a design value; each is a law the run must obey):
 * the run completes; equilibrium holds for every load case, both as the run reports it and as this
 * test recomputes it from the plan alone (every load applied, by hand: area × intensity over the slab
 * less the openings, perimeter × edge load, the point loads, plus the steel the run chose); no member
 * is left unsupported; the steel weighs something; the same plan gives the same results twice; and
 * more load never makes any member or column lighter.
 */
class TakedownPropertyTest {

    private static final Catalog CATALOG = CatalogFile.loadDefault();
    /** Problems that report what a design found, not a broken invariant. */
    private static final java.util.Set<String> DESIGN_OUTCOMES = java.util.Set.of("overstressed", DeckChecks.DECK_SPAN,
            DeckChecks.DECK_OVERHANG, DeckChecks.DECK_CANTILEVER);

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    private static double kips(double v) {
        return Units.KIPS.toSi(v);
    }

    // ------------------------------------------------------------------ the random building

    /** An opening as fractions of one bay: bay (i, j) counted from the south-west, rectangle u0…u1 × v0…v1. */
    record OpeningSpec(int bayI, int bayJ, double u0, double v0, double u1, double v1) {
    }

    /** A point load on the deck as fractions of the slab, in kips; {@code onGrid} moves it onto the nearest grid line x. */
    record PointSpec(double fx, double fy, double dead, double live, boolean onGrid) {
    }

    /** Geometry of the building. */
    record Shape(List<Double> baysXFt, List<Double> baysYFt, List<Double> storeysFt, boolean beamsAlongY, double spacingFt) {
    }

    /** Loads in psf (and klf for the edge). */
    record Loads(double d, double sd, double l, double partition, double roofD, double roofSd, double lr, double snow,
            double edgeKlf) {
    }

    /** Design settings varied. */
    record Basis(String method, boolean reduction, boolean partitionAsDead, boolean delivered) {
    }

    /** One random case. */
    record Case(Shape shape, Loads loads, Basis basis, List<OpeningSpec> openings, List<PointSpec> points) {
        Plan plan() {
            Plan base = RegularPlan.generate(new RegularPlan.Spec("property", "us",
                    shape.baysXFt().stream().map(TakedownPropertyTest::ft).toList(),
                    shape.baysYFt().stream().map(TakedownPropertyTest::ft).toList(),
                    shape.storeysFt().stream().map(TakedownPropertyTest::ft).toList(), shape.beamsAlongY(),
                    ft(shape.spacingFt()),
                    new LoadValues(psf(loads.d()), psf(loads.sd()), psf(loads.l()), 0, 0, psf(loads.partition())),
                    new LoadValues(psf(loads.roofD()), psf(loads.roofSd()), 0, psf(loads.lr()), psf(loads.snow()), 0),
                    new LoadValues(Units.KLF.toSi(loads.edgeKlf()), 0, 0, 0, 0, 0)));
            List<Opening> holes = new ArrayList<>();
            Set<List<Integer>> bays = new HashSet<>();
            for (int k = 0; k < openings.size(); k++) {
                OpeningSpec o = openings.get(k);
                // at most one opening per bay, so that openings never overlap
                if (bays.add(List.of(bayIndex(base, GridLine.Axis.X, o.bayI()), bayIndex(base, GridLine.Axis.Y, o.bayJ())))) {
                    holes.add(new Opening("OP-" + k, openingOutline(base, o)));
                }
            }
            List<PointLoadItem> pts = new ArrayList<>();
            for (int k = 0; k < points.size(); k++) {
                PointSpec p = points.get(k);
                double x = p.fx() * width(base);
                if (p.onGrid()) { // on a girder or column-line beam (or the slab edge)
                    double x0 = x;
                    x = offsets(base, GridLine.Axis.X).stream().min((a, b) -> Double.compare(Math.abs(a - x0), Math.abs(b - x0)))
                            .orElseThrow();
                }
                Point at = new Point(x, p.fy() * depth(base));
                if (holes.stream().anyMatch(h -> inside(h.outline(), at))) {
                    continue; // a load in an opening has nothing to stand on; not this test's subject
                }
                pts.add(new PointLoadItem("P-" + k, at, new LoadValues(kips(p.dead()), 0, kips(p.live()), 0, 0, 0)));
            }
            List<Floor> floors = new ArrayList<>();
            for (Floor f : base.floors()) {
                floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), holes,
                        f.areaLoads(), f.lineLoads(), f.roof() ? List.of() : pts));
            }
            DesignSettings s = base.settings();
            DesignSettings settings = s.withMethod(basis.method())
                    .withLiveLoad(basis.reduction(), basis.partitionAsDead(), basis.delivered());
            return new Plan(base.name(), base.units(), settings, base.grid(), base.levels(), floors, base.columns());
        }
    }

    /** The bay a random index falls in: indices beyond the last bay mean the last bay. */
    private static int bayIndex(Plan plan, GridLine.Axis axis, int index) {
        return Math.min(index, offsets(plan, axis).size() - 2);
    }

    private static Polygon openingOutline(Plan plan, OpeningSpec o) {
        List<Double> xs = offsets(plan, GridLine.Axis.X);
        List<Double> ys = offsets(plan, GridLine.Axis.Y);
        int i = bayIndex(plan, GridLine.Axis.X, o.bayI());
        int j = bayIndex(plan, GridLine.Axis.Y, o.bayJ());
        double w = xs.get(i + 1) - xs.get(i);
        double d = ys.get(j + 1) - ys.get(j);
        return Polygon.rectangle(xs.get(i) + Math.min(o.u0(), o.u1()) * w, ys.get(j) + Math.min(o.v0(), o.v1()) * d,
                xs.get(i) + Math.max(o.u0(), o.u1()) * w, ys.get(j) + Math.max(o.v0(), o.v1()) * d);
    }

    private static List<Double> offsets(Plan plan, GridLine.Axis axis) {
        return plan.grid().stream().filter(g -> g.axis() == axis).map(GridLine::offset).sorted().toList();
    }

    private static double width(Plan plan) {
        List<Double> xs = offsets(plan, GridLine.Axis.X);
        return xs.get(xs.size() - 1);
    }

    private static double depth(Plan plan) {
        List<Double> ys = offsets(plan, GridLine.Axis.Y);
        return ys.get(ys.size() - 1);
    }

    private static boolean inside(Polygon rect, Point p) {
        double x0 = rect.vertices().stream().mapToDouble(Point::x).min().orElseThrow();
        double x1 = rect.vertices().stream().mapToDouble(Point::x).max().orElseThrow();
        double y0 = rect.vertices().stream().mapToDouble(Point::y).min().orElseThrow();
        double y1 = rect.vertices().stream().mapToDouble(Point::y).max().orElseThrow();
        return p.x() >= x0 && p.x() <= x1 && p.y() >= y0 && p.y() <= y1;
    }

    @Provide
    Arbitrary<Case> cases() {
        Arbitrary<Double> bay = Arbitraries.doubles().between(15, 45).ofScale(2);
        Arbitrary<Double> storey = Arbitraries.doubles().between(10, 16).ofScale(1);
        Arbitrary<Shape> shape = Combinators.combine(bay.list().ofMinSize(1).ofMaxSize(4), bay.list().ofMinSize(1).ofMaxSize(4),
                storey.list().ofMinSize(1).ofMaxSize(4), Arbitraries.of(true, false),
                Arbitraries.doubles().between(6, 15).ofScale(2)).as(Shape::new);
        Arbitrary<Double> edge = Arbitraries.oneOf(Arbitraries.just(0.0), Arbitraries.doubles().between(0.1, 1.0).ofScale(3));
        Arbitrary<Loads> loads = Combinators.combine(
                Arbitraries.doubles().between(20, 100).ofScale(1), // D: slab and deck
                Arbitraries.doubles().between(0, 30).ofScale(1), // SD
                Arbitraries.doubles().between(0, 125).ofScale(1), // L, up to heavy storage
                Arbitraries.doubles().between(0, 20).ofScale(1), // partition
                Arbitraries.doubles().between(15, 80).ofScale(1), // roof D
                Arbitraries.doubles().between(0, 20).ofScale(1), // roof SD
                Arbitraries.doubles().between(0, 30).ofScale(1), // Lr
                Arbitraries.doubles().between(0, 40).ofScale(1)) // S
                .flatAs((d, sd, l, p, rd, rsd, lr, s) -> edge.map(e -> new Loads(d, sd, l, p, rd, rsd, lr, s, e)));
        Arbitrary<Basis> basis = Combinators.combine(Arbitraries.of("lrfd", "asd"), Arbitraries.of(true, false),
                Arbitraries.of(true, false), Arbitraries.of(true, false)).as(Basis::new);
        Arbitrary<Double> frac = Arbitraries.doubles().between(0.05, 0.95).ofScale(3);
        Arbitrary<OpeningSpec> opening = Combinators.combine(Arbitraries.integers().between(0, 3),
                Arbitraries.integers().between(0, 3), frac, frac, frac, frac).as(OpeningSpec::new)
                .filter(o -> Math.abs(o.u1() - o.u0()) > 0.05 && Math.abs(o.v1() - o.v0()) > 0.05);
        Arbitrary<PointSpec> point = Combinators.combine(Arbitraries.doubles().between(0.01, 0.99).ofScale(4),
                Arbitraries.doubles().between(0.01, 0.99).ofScale(4), Arbitraries.doubles().between(0, 10).ofScale(2),
                Arbitraries.doubles().between(0, 10).ofScale(2), Arbitraries.of(false, false, true)).as(PointSpec::new);
        return Combinators.combine(shape, loads, basis, opening.list().ofMaxSize(2),
                point.list().ofMaxSize(3)).as(Case::new);
    }

    // ------------------------------------------------------------------ invariants

    @Property(tries = 120)
    void everyRandomBuildingIsFramedAndInEquilibrium(@ForAll("cases") Case c) {
        Plan plan = c.plan();
        RunResult run = PlanRun.run(plan, CATALOG); // must not throw
        TakedownResult t = run.takedown();
        assertNotNull(t, () -> "no takedown; problems " + run.problems());
        List<Executable> checks = new ArrayList<>();

        // 1. the run's own equilibrium check, every load case
        for (Equilibrium e : t.equilibrium()) {
            checks.add(() -> assertTrue(e.holds(), "equilibrium " + e));
        }
        checks.add(() -> assertEquals(LoadCase.values().length, t.equilibrium().size()));

        // 2. every member designed: sized or overstressed, never unsupported; only design outcomes are
        //    problems: overstress, and the deck's span and overhang checks (a random opening is not framed,
        //    so the deck may overhang into it or cantilever beside it)
        for (Map.Entry<String, List<MemberResult>> f : t.members().entrySet()) {
            for (MemberResult m : f.getValue()) {
                checks.add(() -> assertTrue(m.status() == MemberStatus.SIZED || m.status() == MemberStatus.OVERSTRESSED,
                        f.getKey() + " / " + m.id() + ": " + m.status()));
                checks.add(() -> assertFalse(m.section().isEmpty(), f.getKey() + " / " + m.id() + " has no section"));
            }
        }
        checks.add(() -> assertEquals(List.of(), run.problems().stream().filter(p -> !DESIGN_OUTCOMES.contains(p.kind()))
                .map(Problem::toString).toList()));
        checks.add(() -> assertTrue(t.steelWeight() > 0, "steel weight " + t.steelWeight()));

        // 3. equilibrium recomputed from the plan by hand: Σ foundation reactions per case = everything applied
        Hand hand = Hand.of(plan);
        double[] reactions = new double[LoadCase.values().length];
        for (ColumnResult col : t.columns()) {
            for (int k = 0; k < reactions.length; k++) {
                reactions[k] += col.foundation()[k];
            }
        }
        double dead = reactions[LoadCase.D.ordinal()];
        checks.add(() -> assertTrue(dead >= hand.areaDead() - hand.slack()[LoadCase.D.ordinal()],
                "Σ foundation D " + dead + " < applied area dead load " + hand.areaDead()));
        for (LoadCase lc : LoadCase.values()) {
            double a = hand.applied()[lc.ordinal()] + (lc == LoadCase.D ? t.steelWeight() : 0);
            checks.add(() -> assertEquals(a, reactions[lc.ordinal()], hand.slack()[lc.ordinal()] + 1e-9 * a, lc.symbol()));
        }

        // 4. A_T is conserved: every square foot of loaded deck reaches exactly one column, so the columns'
        //    cumulative A_T at the foundations adds up to the loaded floor area of all levels (openings out)
        double columnArea = t.columns().stream().mapToDouble(col -> col.tiers().get(0).storeys().get(0).deliveredArea()).sum();
        checks.add(() -> assertEquals(hand.deckArea(), columnArea, hand.deckSlack() + 1e-9 * hand.deckArea(),
                "Σ column A_T at the foundations"));
        assertAll(checks);
    }

    /**
     * Everything a plan applies, from the plan alone.
     *
     * @param applied per load case (D without the steel): area loads over the slab less the openings
     *     (rectangles inside the slab, one per bay, so they do not overlap), line loads over their length,
     *     point loads
     * @param slack per load case, what the geometry's snapping of coordinates to its 1e-6 m grid may move:
     *     intensity × 1e-6 m × the perimeters of slab and openings
     * @param areaDead the area dead load alone (D, SD and a partition carried as dead), N
     * @param deckArea loaded deck area of all levels, m²
     * @param deckSlack the same snapping allowance on it, m²
     */
    record Hand(double[] applied, double[] slack, double areaDead, double deckArea, double deckSlack) {
        static Hand of(Plan plan) {
            double[] applied = new double[LoadCase.values().length];
            double[] slack = new double[LoadCase.values().length];
            double areaDead = 0;
            double deckArea = 0;
            double deckSlack = 0;
            boolean partitionAsDead = plan.settings().partitionAsDead();
            for (Level lv : plan.levels()) {
                Floor f = plan.floor(lv.floor()).orElseThrow();
                double area = Math.abs(f.slabEdge().signedArea());
                double snap = 1e-6 * perimeter(f.slabEdge());
                for (Opening o : f.openings()) {
                    area -= Math.abs(o.outline().signedArea());
                    snap += 1e-6 * perimeter(o.outline());
                }
                deckArea += area;
                deckSlack += snap;
                for (var al : f.areaLoads()) {
                    LoadValues v = al.values();
                    areaDead += (v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0)) * area;
                    add(applied, v, area, partitionAsDead);
                    add(slack, v, snap, partitionAsDead);
                }
                for (var ll : f.lineLoads()) {
                    double len = 0;
                    for (int k = 0; k + 1 < ll.path().size(); k++) {
                        len += ll.path().get(k).distance(ll.path().get(k + 1));
                    }
                    add(applied, ll.values(), len, partitionAsDead);
                }
                for (PointLoadItem p : f.pointLoads()) {
                    add(applied, p.values(), 1, partitionAsDead);
                }
            }
            return new Hand(applied, slack, areaDead, deckArea, deckSlack);
        }

        private static double perimeter(Polygon p) {
            double len = 0;
            List<Point> v = p.vertices();
            for (int i = 0; i < v.size(); i++) {
                len += v.get(i).distance(v.get((i + 1) % v.size()));
            }
            return len;
        }
    }

    private static void add(double[] out, LoadValues v, double scale, boolean partitionAsDead) {
        out[LoadCase.D.ordinal()] += (v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0)) * scale;
        out[LoadCase.L.ordinal()] += (v.live() + (partitionAsDead ? 0 : v.partition())) * scale;
        out[LoadCase.LR.ordinal()] += v.roofLive() * scale;
        out[LoadCase.S.ordinal()] += v.snow() * scale;
    }

    // ------------------------------------------------------------------ determinism

    /**
     * Two runs of one plan agree bit for bit on every design, reaction, column load and problem. Two
     * quantities are compared to 1e-12 only: the loaded floor area and the applied load of the equilibrium
     * check, which come from the geometry's polygonised deck faces; JTS's polygoniser keeps its graph in
     * identity-hashed sets, so the order of a face's holes, and with it the last bit of the face's area,
     * can change from run to run (reported; the members' tributary areas are not affected).
     */
    @Property(tries = 25)
    void theSamePlanGivesTheSameResults(@ForAll("cases") Case c) {
        Plan plan = c.plan();
        RunResult one = PlanRun.run(plan, CATALOG);
        RunResult two = PlanRun.run(plan, CATALOG);
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertEquals(fingerprint(one), fingerprint(two)));
        checks.add(() -> assertEquals(one.takedown().floorArea(), two.takedown().floorArea(), 1e-12 * one.takedown().floorArea()));
        for (int k = 0; k < one.takedown().equilibrium().size(); k++) {
            double a = one.takedown().equilibrium().get(k).applied();
            double b = two.takedown().equilibrium().get(k).applied();
            checks.add(() -> assertEquals(a, b, 1e-12 * Math.abs(a)));
        }
        assertAll(checks);
    }

    /** Every result of a run but the two named above, numbers in full precision (Double.toString tells any two doubles apart). */
    static String fingerprint(RunResult r) {
        StringBuilder b = new StringBuilder();
        TakedownResult t = r.takedown();
        b.append(t.levelFloors()).append('\n');
        for (Map.Entry<String, List<MemberResult>> f : t.members().entrySet()) {
            for (MemberResult m : f.getValue()) {
                b.append(f.getKey()).append(' ').append(m.id()).append(' ').append(m.status()).append(' ').append(m.section())
                        .append(' ').append(m.maxRatio()).append(' ').append(m.tributaryArea()).append(' ')
                        .append(m.reductionArea()).append(' ').append(m.kll()).append(' ').append(m.liveFactor()).append(' ')
                        .append(java.util.Arrays.toString(m.startReaction())).append(java.util.Arrays.toString(m.endReaction()))
                        .append(' ').append(m.startSupport()).append(' ').append(m.endSupport()).append(' ')
                        .append(m.tributary()).append('\n');
            }
        }
        for (ColumnResult c : t.columns()) {
            b.append(c.id()).append(' ').append(c.kll()).append(' ').append(c.position()).append(' ')
                    .append(java.util.Arrays.toString(c.foundation())).append(java.util.Arrays.toString(c.foundationReduced()));
            for (ColumnTier tier : c.tiers()) {
                b.append(" [").append(tier.section()).append(' ').append(tier.status());
                for (StoreyLoad s : tier.storeys()) {
                    b.append(' ').append(s.level()).append(java.util.Arrays.toString(s.unreduced()))
                            .append(java.util.Arrays.toString(s.reduced())).append(s.reductionArea()).append(' ')
                            .append(s.required()).append(' ').append(s.combination());
                }
                b.append(']');
            }
            b.append('\n');
        }
        t.equilibrium().forEach(e -> b.append(e.loadCase()).append(' ').append(e.reactions()).append(' ').append(e.holds())
                .append('\n'));
        r.problems().forEach(p -> b.append(p).append('\n'));
        b.append(t.steelWeight());
        return b.toString();
    }

    // ------------------------------------------------------------------ monotonicity of the search

    /** A small fixed building: 2 × 1 bays of 30 × 25 ft, two levels, beams along y at 10 ft, an edge load. */
    private static Plan small(double k) {
        return RegularPlan.generate(new RegularPlan.Spec("monotone", "us", List.of(ft(30), ft(30)), List.of(ft(25)),
                List.of(ft(14), ft(13)), true, ft(10),
                new LoadValues(psf(50), psf(10), psf(50), 0, 0, psf(15)).scaled(k),
                new LoadValues(psf(40), psf(10), 0, psf(20), psf(25), 0).scaled(k),
                new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0).scaled(k)));
    }

    /** Steel weight per length of every member (by floor and id) and every column tier (by column and tier). */
    private static Map<String, Double> weights(TakedownResult t) {
        Map<String, Double> out = new LinkedHashMap<>();
        t.members().forEach((f, ms) -> ms.forEach(m -> out.put(f + " / " + m.id(), m.steelWeight() / m.length())));
        for (ColumnResult c : t.columns()) {
            for (int i = 0; i < c.tiers().size(); i++) {
                out.put(c.id() + " tier " + i, c.tiers().get(i).weight());
            }
        }
        return out;
    }

    @Property(tries = 30)
    void moreLoadNeverMakesAMemberLighter(@ForAll @DoubleRange(min = 0.5, max = 3.0) double a,
            @ForAll @DoubleRange(min = 0.5, max = 3.0) double b) {
        double lo = Math.min(a, b);
        double hi = Math.max(a, b);
        TakedownResult light = PlanRun.run(small(lo), CATALOG).takedown();
        TakedownResult heavy = PlanRun.run(small(hi), CATALOG).takedown();
        // the search is meaningful only where it found a section; the fixed plan is chosen so that it always does
        assertEquals(List.of(), heavy.problems(), "the fixed plan must size at every scale");
        Map<String, Double> wl = weights(light);
        Map<String, Double> wh = weights(heavy);
        assertEquals(wl.keySet(), wh.keySet());
        List<Executable> checks = new ArrayList<>();
        for (String id : wl.keySet()) {
            checks.add(() -> assertTrue(wh.get(id) >= wl.get(id), String.format(Locale.ROOT,
                    "%s: %.1f N/m at ×%.3f but %.1f N/m at ×%.3f", id, wl.get(id), lo, wh.get(id), hi)));
        }
        checks.add(() -> assertTrue(heavy.steelWeight() >= light.steelWeight()));
        assertAll(checks);
    }
}
