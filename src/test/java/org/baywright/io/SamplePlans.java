package org.baywright.io;

import java.util.List;
import java.util.Optional;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.GridLine.Axis;
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
import org.baywright.units.Units;

/** Hand-built plans for the plan-file tests. */
final class SamplePlans {
    private SamplePlans() {
    }

    private static double ft(double feet) {
        return Units.FT_.toSi(feet);
    }

    private static Point pt(double xFt, double yFt) {
        return new Point(ft(xFt), ft(yFt));
    }

    private static Polygon rect(double x0, double y0, double x1, double y1) {
        return Polygon.rectangle(ft(x0), ft(y0), ft(x1), ft(y1));
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    private static double kip(double v) {
        return Units.KIPS.toSi(v);
    }

    /**
     * The plan of {@code plans/examples/two-bay.bay.json}: two 30 ft × 30 ft bays, a typical floor and
     * a roof, infill beams spanning north–south onto girders on lines 1 and 2.
     */
    static Plan twoBay() {
        List<GridLine> grid = List.of(new GridLine("A", Axis.X, 0), new GridLine("B", Axis.X, ft(30)),
                new GridLine("C", Axis.X, ft(60)), new GridLine("1", Axis.Y, 0), new GridLine("2", Axis.Y, ft(30)));
        List<Level> levels = List.of(new Level("Level 2", ft(14), ft(14), "typical"),
                new Level("Roof", ft(27), ft(13), "roof"));
        Floor typical = new Floor("typical", "Typical floor", false, rect(0, 0, 60, 30),
                List.of(new Deck("DK-1", rect(0, 0, 60, 30), 0)),
                framing(Optional.of("W18X35")),
                List.of(new Infill("IF-AB-12", "A", "B", "1", "2", Axis.Y, 2, 0),
                        new Infill("IF-BC-12", "B", "C", "1", "2", Axis.Y, 0, ft(10))),
                List.of(new Opening("OP-stair", rect(40, 20, 50, 28))),
                List.of(new AreaLoad("AL-office", rect(0, 0, 60, 30),
                                new LoadValues(psf(56), psf(10), psf(50), 0, 0, psf(15)), LiveLoadUse.ORDINARY),
                        new AreaLoad("AL-files", rect(0, 20, 20, 30), new LoadValues(0, 0, psf(75), 0, 0, 0),
                                LiveLoadUse.NOT_REDUCIBLE)),
                List.of(new LineLoad("LL-cladding", List.of(pt(0, 0), pt(60, 0)),
                        new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0))),
                List.of(new PointLoadItem("PL-safe", pt(20, 12), new LoadValues(kip(5), 0, kip(8), 0, 0, 0))));
        Floor roof = new Floor("roof", "Roof", true, rect(0, 0, 60, 30),
                List.of(new Deck("DK-R", rect(0, 0, 60, 30), 0)),
                framing(Optional.empty()),
                List.of(new Infill("IF-AB-12", "A", "B", "1", "2", Axis.Y, 0, ft(8)),
                        new Infill("IF-BC-12", "B", "C", "1", "2", Axis.Y, 0, ft(8))),
                List.of(),
                List.of(new AreaLoad("AL-roof", rect(0, 0, 60, 30),
                        new LoadValues(psf(20), psf(5), 0, psf(20), psf(25), 0), LiveLoadUse.ORDINARY)),
                List.of(),
                List.of(new PointLoadItem("PL-fan", pt(50, 15), new LoadValues(kip(3), 0, 0, 0, 0, 0))));
        List<Column> columns = List.of(
                new Column("C-A1", pt(0, 0), "A-1", "", Optional.empty()),
                new Column("C-B1", pt(30, 0), "B-1", "", Optional.empty()),
                new Column("C-C1", pt(60, 0), "C-1", "", Optional.empty()),
                new Column("C-A2", pt(0, 30), "A-2", "", Optional.empty()),
                new Column("C-B2", pt(30, 30), "B-2", "Roof", Optional.of("W14X48")),
                new Column("C-C2", pt(60, 30), "C-2", "", Optional.empty()));
        return new Plan("Two-bay example", "us", DesignSettings.defaults(), grid, levels, List.of(typical, roof), columns);
    }

    private static List<Member> framing(Optional<String> interiorBeam) {
        return List.of(
                new Member("G-1-AB", MemberKind.GIRDER, pt(0, 0), pt(30, 0), Optional.empty()),
                new Member("G-1-BC", MemberKind.GIRDER, pt(30, 0), pt(60, 0), Optional.empty()),
                new Member("G-2-AB", MemberKind.GIRDER, pt(0, 30), pt(30, 30), Optional.empty()),
                new Member("G-2-BC", MemberKind.GIRDER, pt(30, 30), pt(60, 30), Optional.empty()),
                new Member("B-A-12", MemberKind.BEAM, pt(0, 0), pt(0, 30), Optional.empty()),
                new Member("B-B-12", MemberKind.BEAM, pt(30, 0), pt(30, 30), interiorBeam),
                new Member("B-C-12", MemberKind.BEAM, pt(60, 0), pt(60, 30), Optional.empty()));
    }

    /**
     * A plan using every object kind and every option away from its default, with values that are
     * not round in either unit system, negative coordinates and names needing JSON escapes.
     */
    static Plan rich(String units) {
        DesignSettings settings = new DesignSettings("asd", 345e6, 0, 480, List.of("W16", "W18", "W21"), List.of("W24"),
                List.of("W12", "W14"), 0.6096, 3, false, true, false, "catalogs/house \"shapes\".csv");
        List<GridLine> grid = List.of(new GridLine("A", Axis.X, -1.2345678901234), new GridLine("B", Axis.X, 7.3),
                new GridLine("C.5", Axis.X, 13.987654321), new GridLine("1", Axis.Y, 0),
                new GridLine("2", Axis.Y, 8.5344), new GridLine("3", Axis.Y, 19.050000000001));
        List<Level> levels = List.of(new Level("Level 2", 4.2672, 4.2672, "f2"), new Level("Level 3", 8.1, 3.8328, "f2"),
                new Level("Penthouse roof", 12.000000001, 3.900000001, "roof"));
        Polygon slab = new Polygon(List.of(new Point(-2.0, -0.5), new Point(15.1, -0.5), new Point(15.1, 19.5),
                new Point(6.1, 19.5), new Point(6.1, 12.25), new Point(-2.0, 12.25)));
        Floor f2 = new Floor("f2", "Typical — office ☂", false, slab,
                List.of(new Deck("DK-1", Polygon.rectangle(-2, -0.5, 7.3, 12.25), 90),
                        new Deck("DK-2", Polygon.rectangle(7.3, -0.5, 15.1, 19.5), 33.33333333333)),
                List.of(new Member("G-A-12", MemberKind.GIRDER, new Point(-1.2345678901234, 0), new Point(-1.2345678901234, 8.5344),
                                Optional.of("W24X55")),
                        new Member("B-1", MemberKind.BEAM, new Point(-1.2345678901234, 4.1), new Point(7.3, 4.1), Optional.empty()),
                        new Member("B/slash~tilde", MemberKind.BEAM, new Point(7.3, 1e-7), new Point(13.987654321, 1e-7),
                                Optional.empty())),
                List.of(new Infill("IF-1", "A", "B", "1", "2", Axis.X, 3, 0),
                        new Infill("IF-2", "B", "C.5", "2", "3", Axis.Y, 0, 2.7432)),
                List.of(new Opening("OP-shaft", Polygon.rectangle(9, 10, 11.5, 12.75))),
                List.of(new AreaLoad("AL-1", slab, new LoadValues(2681.3, 478.8, 2394, 0, 0, 718.2), LiveLoadUse.ORDINARY),
                        new AreaLoad("AL-2", Polygon.rectangle(0, 0, 3, 3), new LoadValues(0, 0, 4788, 0, 0, 0),
                                LiveLoadUse.ASSEMBLY),
                        new AreaLoad("AL-3", Polygon.rectangle(3, 0, 6, 3), new LoadValues(0, 0, 1915.2, 0, 0, 0),
                                LiveLoadUse.GARAGE),
                        new AreaLoad("AL-4", Polygon.rectangle(6, 0, 7, 3), new LoadValues(100, 0, 6000, 0, 0, 0),
                                LiveLoadUse.NOT_REDUCIBLE)),
                List.of(new LineLoad("LL-1", List.of(new Point(-2, -0.5), new Point(15.1, -0.5), new Point(15.1, 19.5)),
                        new LoadValues(5837.5, 1000.000001, 0, 0, 0, 0))),
                List.of(new PointLoadItem("PL-1", new Point(2.5, 3.75), new LoadValues(22241.108076, 1, 35585.77, 0, 0, 4448.2))));
        Floor roof = new Floor("roof", "", true, Polygon.rectangle(-2, -0.5, 15.1, 19.5),
                List.of(new Deck("DK-R", Polygon.rectangle(-2, -0.5, 15.1, 19.5), -15.5)),
                List.of(new Member("G-R", MemberKind.GIRDER, new Point(0, 0), new Point(0, 8.5344), Optional.empty())),
                List.of(),
                List.of(),
                List.of(new AreaLoad("AL-R", Polygon.rectangle(-2, -0.5, 15.1, 19.5),
                        new LoadValues(957.6, 239.4, 0, 957.6, 1436.4, 0), LiveLoadUse.ORDINARY)),
                List.of(new LineLoad("LL-parapet", List.of(new Point(-2, 19.5), new Point(15.1, 19.5)),
                        new LoadValues(1459.4, 0, 0, 0, 2918.8, 0))),
                List.of(new PointLoadItem("PL-unit", new Point(4, 4), new LoadValues(13344.66, 0, 0, 0, 0, 0))));
        List<Column> columns = List.of(
                new Column("C-A1", new Point(-1.2345678901234, 0), "A-1", "", Optional.empty()),
                new Column("C-B2", new Point(7.3, 8.5344), "B-2", "Level 3", Optional.of("W14X90")),
                new Column("C-x", new Point(12.5, 0.25), "", "Penthouse roof", Optional.empty()));
        return new Plan("Rich \"test\" plan\n2nd line", units, settings, grid, levels, List.of(f2, roof), columns);
    }
}
