package org.baywright.demo;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import org.baywright.io.PlanFiles;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.plan.Slab;
import org.baywright.plan.Floor;
import org.baywright.plan.Infill;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.plan.RegularPlan;
import org.baywright.units.Units;

/**
 * Builds the demo plan {@code plans/harbourview-offices.bay.json}: an invented four-storey office
 * building used for demonstrations (all numbers are the scenario's own, not from any published
 * example). Run its main to regenerate the file after a deliberate change.
 *
 * <p>Harbourview Offices: 4 × 3 bays of 30 ft × 35 ft, beams north–south at no more than 10 ft;
 * Level 2 carries a file-storage zone (125 psf) in the north-east bay D–E/3–4; Levels 3 and 4 have a double-height
 * atrium open in bay B–C/2–3; a balcony 6 ft deep overhangs the south face between grid lines B
 * and D (it tapered from 8 ft at B to 4 ft at D until its framing was reworked: with beams square to
 * grid 1, a sloping edge leaves slivers of deck past the beam tips); cladding on every slab edge; the roof carries two rooftop
 * units.
 *
 * <p>The balcony is framed with cantilevered beams and backspans: in bays B–C and C–D the north–south
 * beams of the bays 1–2 (on grid lines B, C, D and the infill lines at 10 ft) run from the grid-2
 * girders across grid 1 (the girders G-1-BC and G-1-CD, or the columns on B, C and D) to the balcony
 * edge, so each is a 35 ft backspan with a 6 ft overhang. The balcony deck spans east–west
 * between them and stops at the beams on B and D: it has no overhang of its own.
 */
public final class HarbourviewDemo {
    private HarbourviewDemo() {
    }

    static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    /**
     * The demo's floor slab: 3 in composite deck (6 in average rib width at 12 in pitch, 2.5 psf) with 3½ in of
     * normal-weight concrete above it (145 pcf, f′c 4 ksi), ¾ in studs one per rib, weak position: about 63 psf.
     */
    public static Slab slab() {
        return Slab.typical().withTopping(Units.IN.toSi(3.5));
    }

    /** The demo building: composite floors (the floors act with their slab, unshored; the roof is bare steel). */
    public static Plan plan() {
        return plan(CompositeMode.COMPOSITE);
    }

    /**
     * The demo building with its floors' members acting with the slab as {@code mode} says: composite (the demo)
     * or non-composite (the same building and slab in bare steel, the comparison example).
     */
    public static Plan plan(CompositeMode mode) {
        Plan bare = barePlan();
        List<Floor> floors = new ArrayList<>();
        for (Floor f : bare.floors()) {
            if (f.roof()) {
                floors.add(f);
                continue;
            }
            // the slab's weight now comes from its description: the area loads keep no dead load of their own
            List<AreaLoad> loads = f.areaLoads().stream().map(a -> new AreaLoad(a.id(), a.outline(), new LoadValues(0,
                    a.values().superimposed(), a.values().live(), a.values().roofLive(), a.values().snow(), a.values().partition()),
                    a.use())).toList();
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks().stream().map(d -> d.withSlab(slab())).toList(),
                    f.members(), f.infills(), f.openings(), loads, f.lineLoads(), f.pointLoads(),
                    CompositeFloor.DEFAULT.withMode(mode)));
        }
        return new Plan(mode == CompositeMode.COMPOSITE ? bare.name() : bare.name().replace("(demo)", "(demo, bare steel)"),
                bare.units(), bare.settings(), bare.grid(), bare.levels(), floors, bare.columns(), bare.notes());
    }

    /** The building as first drawn: the slab as a 56 psf dead load, no slab described, bare steel. */
    static Plan barePlan() {
        Plan base = RegularPlan.generate(new RegularPlan.Spec("Harbourview Offices (demo)", "us",
                Collections.nCopies(4, ft(30)), Collections.nCopies(3, ft(35)), List.of(ft(14), ft(13), ft(13), ft(13)), true,
                ft(10), new LoadValues(psf(56), psf(10), psf(50), 0, 0, psf(15)),
                new LoadValues(psf(56), psf(15), 0, psf(20), 0, 0), new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0)));
        Floor typical = base.floor("typical").orElseThrow();
        Floor roof = base.floor("roof").orElseThrow();

        // slab edge with the balcony: south face between B (x = 30 ft) and D (x = 90 ft)
        Polygon slab = new Polygon(List.of(new Point(0, 0), new Point(ft(30), 0), new Point(ft(30), ft(-6)),
                new Point(ft(90), ft(-6)), new Point(ft(90), 0), new Point(ft(120), 0), new Point(ft(120), ft(105)),
                new Point(0, ft(105))));
        Polygon grid = Polygon.rectangle(0, 0, ft(120), ft(105));
        Polygon balcony = new Polygon(List.of(new Point(ft(30), ft(-6)), new Point(ft(90), ft(-6)), new Point(ft(90), 0),
                new Point(ft(30), 0)));
        List<Deck> decks = List.of(new Deck("DK-main", grid, 0), new Deck("DK-balcony", balcony, 0));
        List<Point> perimeter = new ArrayList<>(slab.vertices());
        perimeter.add(slab.vertices().get(0));
        List<LineLoad> cladding = List.of(new LineLoad("LL-cladding", perimeter, new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0)));
        LoadValues officeLoads = new LoadValues(psf(56), psf(10), psf(50), 0, 0, psf(15));
        AreaLoad office = new AreaLoad("AL-office", slab, officeLoads, LiveLoadUse.ORDINARY);

        List<Member> typicalMembers = balconyFraming(typical.members());
        List<Member> roofMembers = balconyFraming(roof.members());

        // Level 2: file storage in bay D–E / 3–4 (light storage, ASCE 7-16 Table 4.3-1: 125 psf, no partitions)
        Polygon officeL2 = new Polygon(List.of(new Point(0, 0), new Point(ft(30), 0), new Point(ft(30), ft(-6)),
                new Point(ft(90), ft(-6)), new Point(ft(90), 0), new Point(ft(120), 0), new Point(ft(120), ft(70)),
                new Point(ft(90), ft(70)), new Point(ft(90), ft(105)), new Point(0, ft(105))));
        AreaLoad storage = new AreaLoad("AL-storage", Polygon.rectangle(ft(90), ft(70), ft(120), ft(105)),
                new LoadValues(psf(56), psf(10), psf(125), 0, 0, 0), LiveLoadUse.ORDINARY);
        Floor level2 = new Floor("level2", "Level 2 (storage zone)", false, slab, decks, typicalMembers,
                withoutBalconyBays(typical.infills()),
                List.of(), List.of(new AreaLoad("AL-office", officeL2, officeLoads, LiveLoadUse.ORDINARY), storage), cladding,
                List.of());

        // Levels 3–4: atrium open in bay B–C / 2–3; no infill there
        List<Infill> infills = new ArrayList<>();
        for (Infill i : typical.infills()) {
            if (!i.id().equals("IF-BC-23") && !BALCONY_BAYS.contains(i.id())) {
                infills.add(i);
            }
        }
        Opening atrium = new Opening("OP-atrium", Polygon.rectangle(ft(30), ft(35), ft(60), ft(70)));
        Floor atriumFloor = new Floor("typical", "Typical floor with atrium", false, slab, decks, typicalMembers, infills,
                List.of(atrium), List.of(office), cladding, List.of());

        // Roof: two rooftop units (dead load 6 kip each, on the deck)
        List<PointLoadItem> units = List.of(
                new PointLoadItem("PL-RTU-1", new Point(ft(45), ft(20)), new LoadValues(Units.KIPS.toSi(6), 0, 0, 0, 0, 0)),
                new PointLoadItem("PL-RTU-2", new Point(ft(75), ft(85)), new LoadValues(Units.KIPS.toSi(6), 0, 0, 0, 0, 0)));
        AreaLoad roofLoad = new AreaLoad("AL-roof", slab, new LoadValues(psf(56), psf(15), 0, psf(20), 0, 0), LiveLoadUse.ORDINARY);
        Floor roofFloor = new Floor("roof", "Roof", true, slab, decks, roofMembers, withoutBalconyBays(roof.infills()), List.of(),
                List.of(roofLoad), cladding, units);

        List<Level> levels = List.of(
                new Level("Level 2", ft(14), ft(14), "level2"),
                new Level("Level 3", ft(27), ft(13), "typical"),
                new Level("Level 4", ft(40), ft(13), "typical"),
                new Level("Roof", ft(53), ft(13), "roof"));
        List<Column> columns = new ArrayList<>(base.columns());
        return new Plan(base.name(), "us", base.settings(), base.grid(), levels, List.of(level2, atriumFloor, roofFloor),
                columns.stream().map(c -> new Column(c.id(), c.at(), c.grid(), c.topLevel(), Optional.empty())).toList());
    }

    /** The infills of the bays whose beams now cantilever over grid 1 (drawn one by one instead). */
    private static final List<String> BALCONY_BAYS = List.of("IF-BC-12", "IF-CD-12");

    private static List<Infill> withoutBalconyBays(List<Infill> infills) {
        return infills.stream().filter(i -> !BALCONY_BAYS.contains(i.id())).toList();
    }

    /** y of the balcony edge at x (ft): 6 ft south of grid 1 from B to D. */
    private static double balconyEdge(double xFt) {
        return -6;
    }

    /**
     * The framing of bays B–D / 1–2 with the balcony: the beams on B, C and D and at the 10 ft infill lines
     * run from grid 2 past grid 1 to the balcony edge (beams overhanging grid 1).
     */
    private static List<Member> balconyFraming(List<Member> members) {
        List<Member> out = new ArrayList<>();
        for (Member m : members) {
            switch (m.id()) {
                case "B-B-12", "B-C-12", "B-D-12" -> {
                    double x = Units.FT_.fromSi(m.start().x());
                    out.add(new Member(m.id(), MemberKind.BEAM, new Point(ft(x), ft(35)), new Point(ft(x), ft(balconyEdge(x))),
                            Optional.empty()));
                }
                default -> out.add(m);
            }
        }
        int n = 1;
        for (double x : new double[] {40, 50, 70, 80}) {
            String bay = x < 60 ? "BC" : "CD";
            out.add(new Member("B-" + bay + "-12-" + (n++ % 2 == 1 ? "a" : "b"), MemberKind.BEAM, new Point(ft(x), ft(35)),
                    new Point(ft(x), ft(balconyEdge(x))), Optional.empty()));
        }
        return out;
    }

    /** Writes the demo, and beside it in plans/examples/ the same building in bare steel. */
    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "plans/harbourview-offices.bay.json");
        PlanFiles.write(plan(), out);
        Path bare = Path.of(args.length > 1 ? args[1] : "plans/examples/harbourview-offices-bare-steel.bay.json");
        PlanFiles.write(plan(CompositeMode.NON_COMPOSITE), bare);
        System.out.println("wrote " + out + " and " + bare);
    }
}
