package org.baywright.takedown;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.plan.StudPlacement;
import org.baywright.units.Units;

/** Plans for the bay tests. */
public final class BayPlans {
    private BayPlans() {
    }

    static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    static double in(double v) {
        return Units.IN.toSi(v);
    }

    static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    /**
     * The slab of the Designer's Handbook example (Brockenbrough &amp; Merritt, 4th ed., 2006, §6 p. 6.26, as
     * CHECK-VALUES §6 Table 6 restates it): 3.5 in of concrete on a 1.5 in deck whose ribs hold 1 in of
     * concrete on average (rib width 4 in at 6 in pitch: 1.5 × 4/6 = 1 in; d_e = 3.5 + 1.5/2 = 4.25 in as the
     * handbook has), 2 psf deck; E_c = 2,136 ksi, which is w_c = 115 pcf with f′c = 3 ksi (115^1.5·√3 = 2,136.0,
     * COMPUTED); the slab's weight as the handbook's D = 46.7 psf less its 4 psf of ceiling and services (given,
     * so 42.7 psf).
     */
    public static Slab handbookSlab() {
        return new Slab(in(1.5), in(4), in(6), psf(2), in(3.5), Units.PCF.toSi(115), Units.KSI.toSi(3), in(0.75),
                Units.KSI.toSi(65), 1, StudPlacement.WEAK, psf(42.7));
    }

    /**
     * The handbook example's floor (same source): 180 × 90 ft, 30 × 30 ft bays (grid A–G at 30 ft, 1–4 at
     * 30 ft), beams spanning north–south at 10 ft (W21X44, two per bay, drawn as members), girders W24X55 on
     * the numbered lines, beams on the lettered lines between columns (not in any bay), the deck spanning
     * east–west across the beams; 4 psf superimposed dead load (the handbook's ceiling and services), 50 psf live
     * load for the design; one level.
     *
     * @param slab the deck's slab, or null for none
     */
    public static Plan handbookFloor(Slab slab) {
        int nx = 6;
        int ny = 3;
        double bay = ft(30);
        List<GridLine> grid = new ArrayList<>();
        for (int i = 0; i <= nx; i++) {
            grid.add(new GridLine(RegularPlan.letters(i), GridLine.Axis.X, i * bay));
        }
        for (int j = 0; j <= ny; j++) {
            grid.add(new GridLine(Integer.toString(j + 1), GridLine.Axis.Y, j * bay));
        }
        List<Column> columns = new ArrayList<>();
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i <= nx; i++) {
                String g = RegularPlan.letters(i) + (j + 1);
                columns.add(new Column("C-" + g, new Point(i * bay, j * bay), RegularPlan.letters(i) + "-" + (j + 1), "",
                        Optional.empty()));
            }
        }
        List<Member> members = new ArrayList<>();
        for (int j = 0; j <= ny; j++) {
            for (int i = 0; i < nx; i++) {
                members.add(new Member("G-" + (j + 1) + "-" + RegularPlan.letters(i) + RegularPlan.letters(i + 1),
                        MemberKind.GIRDER, new Point(i * bay, j * bay), new Point((i + 1) * bay, j * bay), Optional.of("W24X55")));
            }
        }
        for (int i = 0; i <= nx; i++) {
            for (int j = 0; j < ny; j++) {
                members.add(new Member("B-" + RegularPlan.letters(i) + "-" + (j + 1) + (j + 2), MemberKind.BEAM,
                        new Point(i * bay, j * bay), new Point(i * bay, (j + 1) * bay), Optional.empty()));
            }
        }
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                for (int k = 1; k <= 2; k++) {
                    double x = i * bay + k * ft(10);
                    members.add(new Member("J-" + RegularPlan.letters(i) + RegularPlan.letters(i + 1) + "-" + (j + 1) + (j + 2)
                            + "-" + k, MemberKind.BEAM, new Point(x, j * bay), new Point(x, (j + 1) * bay), Optional.of("W21X44")));
                }
            }
        }
        Polygon edge = Polygon.rectangle(0, 0, nx * bay, ny * bay);
        Deck deck = new Deck("DK-1", edge, 0).withSlab(slab);
        // a slab described loads the floor itself (takedown.SlabLoads); without one the area load carries it
        LoadValues loads = new LoadValues(slab == null ? psf(42.7) : 0, psf(4), psf(50), 0, 0, psf(15));
        Floor floor = new Floor("typical", "Typical floor", false, edge, List.of(deck), members, List.of(), List.of(),
                List.of(new AreaLoad("AL-office", edge, loads, LiveLoadUse.ORDINARY)), List.of(), List.of());
        return new Plan("Handbook bay", "us", DesignSettings.defaults(), grid,
                List.of(new Level("Level 2", ft(14), ft(14), "typical")), List.of(floor), columns);
    }

    /**
     * A regular plan ({@link RegularPlan}): {@code nx} × {@code ny} bays of 30 × 35 ft, beams at most 10 ft apart,
     * office loads, two storeys (a floor and the roof).
     */
    public static Plan regular(int nx, int ny, boolean beamsAlongY) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (int i = 0; i < nx; i++) {
            xs.add(ft(30));
        }
        for (int j = 0; j < ny; j++) {
            ys.add(ft(35));
        }
        return RegularPlan.generate(new RegularPlan.Spec("Regular", "us", xs, ys, List.of(ft(14), ft(13)), beamsAlongY,
                ft(10), RegularPlan.OFFICE_FLOOR, new LoadValues(psf(15), psf(10), 0, psf(20), 0, 0), LoadValues.ZERO));
    }

    /** {@code plan} with every deck of every layout carrying {@code slab}. */
    public static Plan withSlab(Plan plan, Slab slab) {
        List<Floor> floors = plan.floors().stream()
                .map(f -> f.withDecks(f.decks().stream().map(d -> d.withSlab(slab)).toList())).toList();
        return new Plan(plan.name(), plan.units(), plan.settings(), plan.grid(), plan.levels(), floors, plan.columns(),
                plan.notes());
    }
}
