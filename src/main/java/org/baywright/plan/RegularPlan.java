package org.baywright.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Generates a regular plan, the architect's starting point: an orthogonal grid of bays, columns at
 * every intersection, girders along one set of grid lines, column-line beams along the other, infill
 * beams in every bay at a maximum spacing, one deck spanning onto the beams, one area load over the
 * slab, an edge line load for cladding, and levels of a typical floor topped by a roof.
 *
 * <p>Beams "along y" span north–south: girders then run east–west on the numbered grid lines and the
 * deck spans east–west onto the beams.
 */
public final class RegularPlan {
    // The office defaults of a new plan, written once: the `new` command's option defaults (as text) and the
    // editor's new floors (OFFICE_FLOOR, PlanEdits.OFFICE_FLOOR) both come from here.

    /** Slab on metal deck, dead load (common practice). */
    public static final String OFFICE_DEAD = "50psf";
    /** Ceiling, services and finishes, superimposed dead load (common practice). */
    public static final String OFFICE_SUPERIMPOSED = "15psf";
    /** Office live load, ASCE 7-16 Table 4.3-1. */
    public static final String OFFICE_LIVE = "50psf";
    /** Partition allowance, ASCE 7-16 §4.3.2: not less than 15 psf where partitions may be moved and L0 ≤ 80 psf. */
    public static final String OFFICE_PARTITION = "15psf";
    /** §4.3.2: no partition allowance is required where the live load is this or more (80 psf), Pa. */
    public static final double PARTITION_NOT_REQUIRED_LIVE = org.baywright.units.Units.PSF.toSi(80);
    /** Ordinary flat roof live load, ASCE 7-16 Table 4.3-1. */
    public static final String ROOF_LIVE = "20psf";
    /** Snow: none unless given (the site's ground snow load decides it, ASCE 7-16 Chapter 7). */
    public static final String SNOW = "0psf";
    /** Cladding edge load: none unless given (the facade decides it). */
    public static final String EDGE_LOAD = "0klf";

    /** The floor loads of a new office plan (the values above, SI). */
    public static final LoadValues OFFICE_FLOOR = new LoadValues(psf(OFFICE_DEAD), psf(OFFICE_SUPERIMPOSED),
            psf(OFFICE_LIVE), 0, 0, psf(OFFICE_PARTITION));

    private RegularPlan() {
    }

    private static double psf(String text) {
        return org.baywright.units.Quantities.parse("office default", text, org.baywright.units.Dimension.AREA_LOAD);
    }

    /**
     * What to generate (SI).
     *
     * @param baysX bay widths west to east, m
     * @param baysY bay depths south to north, m
     * @param storeys storey heights bottom to top, m; the last level is the roof
     * @param beamsAlongY true: beams span north–south
     * @param beamSpacing largest spacing of infill beams, m
     * @param floorLoads area load on typical floors, Pa
     * @param roofLoads area load on the roof, Pa
     * @param edgeLoad cladding line load on the slab edge of every level, N/m (0 = none)
     */
    public record Spec(String name, String units, List<Double> baysX, List<Double> baysY, List<Double> storeys,
            boolean beamsAlongY, double beamSpacing, LoadValues floorLoads, LoadValues roofLoads, LoadValues edgeLoad) {
    }

    /** Builds the plan. */
    public static Plan generate(Spec spec) {
        List<GridLine> grid = new ArrayList<>();
        List<Double> xs = cumulative(spec.baysX());
        List<Double> ys = cumulative(spec.baysY());
        for (int i = 0; i < xs.size(); i++) {
            grid.add(new GridLine(letters(i), GridLine.Axis.X, xs.get(i)));
        }
        for (int j = 0; j < ys.size(); j++) {
            grid.add(new GridLine(Integer.toString(j + 1), GridLine.Axis.Y, ys.get(j)));
        }
        double w = xs.get(xs.size() - 1);
        double d = ys.get(ys.size() - 1);
        Polygon slab = Polygon.rectangle(0, 0, w, d);

        List<Column> columns = new ArrayList<>();
        for (int j = 0; j < ys.size(); j++) {
            for (int i = 0; i < xs.size(); i++) {
                String label = letters(i) + (j + 1);
                columns.add(new Column("C-" + label, new Point(xs.get(i), ys.get(j)), letters(i) + "-" + (j + 1), "",
                        Optional.empty()));
            }
        }
        List<Member> members = new ArrayList<>();
        // girders along the lines the beams frame into; column-line beams along the others
        for (int j = 0; j < ys.size(); j++) {
            for (int i = 0; i + 1 < xs.size(); i++) {
                String id = (spec.beamsAlongY() ? "G-" : "B-") + (j + 1) + "-" + letters(i) + letters(i + 1);
                members.add(new Member(id, spec.beamsAlongY() ? MemberKind.GIRDER : MemberKind.BEAM,
                        new Point(xs.get(i), ys.get(j)), new Point(xs.get(i + 1), ys.get(j)), Optional.empty()));
            }
        }
        for (int i = 0; i < xs.size(); i++) {
            for (int j = 0; j + 1 < ys.size(); j++) {
                String id = (spec.beamsAlongY() ? "B-" : "G-") + letters(i) + "-" + (j + 1) + (j + 2);
                members.add(new Member(id, spec.beamsAlongY() ? MemberKind.BEAM : MemberKind.GIRDER,
                        new Point(xs.get(i), ys.get(j)), new Point(xs.get(i), ys.get(j + 1)), Optional.empty()));
            }
        }
        List<Infill> infills = new ArrayList<>();
        for (int i = 0; i + 1 < xs.size(); i++) {
            for (int j = 0; j + 1 < ys.size(); j++) {
                infills.add(new Infill("IF-" + letters(i) + letters(i + 1) + "-" + (j + 1) + (j + 2), letters(i), letters(i + 1),
                        Integer.toString(j + 1), Integer.toString(j + 2), spec.beamsAlongY() ? GridLine.Axis.Y : GridLine.Axis.X, 0,
                        spec.beamSpacing()));
            }
        }
        // the deck spans across the beams
        List<Deck> decks = List.of(new Deck("DK-1", slab, spec.beamsAlongY() ? 0 : 90));
        List<Point> perimeter = new ArrayList<>(slab.vertices());
        perimeter.add(slab.vertices().get(0));
        List<LineLoad> edge = spec.edgeLoad().isZero() ? List.of()
                : List.of(new LineLoad("LL-edge", perimeter, spec.edgeLoad()));
        Floor typical = new Floor("typical", "Typical floor", false, slab, decks, members, infills, List.of(),
                List.of(new AreaLoad("AL-floor", slab, spec.floorLoads(), LiveLoadUse.ORDINARY)), edge, List.of());
        Floor roof = new Floor("roof", "Roof", true, slab, decks, members, infills, List.of(),
                List.of(new AreaLoad("AL-roof", slab, spec.roofLoads(), LiveLoadUse.ORDINARY)), edge, List.of());
        List<Level> levels = new ArrayList<>();
        double elevation = 0;
        int n = spec.storeys().size();
        for (int k = 0; k < n; k++) {
            elevation += spec.storeys().get(k);
            boolean top = k == n - 1 && n > 1;
            levels.add(new Level(top ? "Roof" : "Level " + (k + 2), elevation, spec.storeys().get(k), top ? "roof" : "typical"));
        }
        List<Floor> floors = n > 1 ? List.of(typical, roof) : List.of(typical);
        return new Plan(spec.name(), spec.units(), DesignSettings.defaults(), grid, levels, floors, columns);
    }

    /**
     * The plan with the slab {@code slab} described on every deck of its floors (not its roofs, whose deck
     * carries no concrete) and those floors working with it as {@code mode} says, unshored, 20 psf
     * construction live load. Their area loads' dead load becomes {@code otherDead} (Pa): the slab's own weight
     * now comes from its description.
     */
    public static Plan withSlab(Plan plan, Slab slab, CompositeMode mode, double otherDead) {
        List<Floor> floors = new ArrayList<>();
        for (Floor f : plan.floors()) {
            if (f.roof()) {
                floors.add(f);
                continue;
            }
            List<Deck> decks = f.decks().stream().map(d -> d.withSlab(slab)).toList();
            List<AreaLoad> loads = f.areaLoads().stream().map(a -> new AreaLoad(a.id(), a.outline(),
                    new LoadValues(otherDead, a.values().superimposed(), a.values().live(), a.values().roofLive(), a.values().snow(),
                            a.values().partition()), a.use())).toList();
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), decks, f.members(), f.infills(), f.openings(), loads,
                    f.lineLoads(), f.pointLoads(), CompositeFloor.DEFAULT.withMode(mode)));
        }
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(),
                plan.notes());
    }

    private static List<Double> cumulative(List<Double> bays) {
        List<Double> out = new ArrayList<>();
        double x = 0;
        out.add(0.0);
        for (double b : bays) {
            x += b;
            out.add(x);
        }
        return out;
    }

    /** Grid letters as drafters use them: A … Z, then AA, AB …; I and O are skipped (common practice). */
    public static String letters(int i) {
        String alphabet = "ABCDEFGHJKLMNPQRSTUVWXYZ";
        StringBuilder sb = new StringBuilder();
        int n = i;
        do {
            sb.insert(0, alphabet.charAt(n % alphabet.length()));
            n = n / alphabet.length() - 1;
        } while (n >= 0);
        return sb.toString();
    }
}
