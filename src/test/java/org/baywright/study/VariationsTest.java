package org.baywright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.io.PlanFiles;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The variations on the irregular demo plan. */
class VariationsTest {
    static final Plan DEMO = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();

    static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    static void near(double expectedFt, double metres) {
        assertEquals(ft(expectedFt), metres, 1e-9);
    }

    @Test
    void bayXStretchesEveryCoordinatePiecewise() {
        Plan p = Variations.bays(DEMO, GridLine.Axis.X, List.of(ft(35)));
        near(0, p.gridLine("A").orElseThrow().offset());
        near(35, p.gridLine("B").orElseThrow().offset());
        near(140, p.gridLine("E").orElseThrow().offset());
        near(35, p.gridLine("2").orElseThrow().offset()); // y lines untouched
        Floor roof = p.floor("roof").orElseThrow();
        // RTU-1 at 45 ft lies halfway between B (30) and C (60): halfway between 35 and 70
        Point rtu = roof.pointLoads().stream().filter(l -> l.id().equals("PL-RTU-1")).findFirst().orElseThrow().at();
        near(52.5, rtu.x());
        near(20, rtu.y());
        // the balcony slab edge beyond grid line 1 keeps its y and moves with B and D in x
        Floor l2 = p.floor("level2").orElseThrow();
        assertTrue(l2.slabEdge().vertices().contains(new Point(ft(35), ft(-6))) || l2.slabEdge().vertices().stream()
                .anyMatch(v -> Math.abs(v.x() - ft(35)) < 1e-9 && Math.abs(v.y() - ft(-6)) < 1e-9));
        // (the demo balcony is 6 ft deep since its framing with cantilevered beams; it tapered 8 → 4 ft before)
        assertTrue(l2.slabEdge().vertices().stream().anyMatch(v -> Math.abs(v.x() - ft(105)) < 1e-9 && Math.abs(v.y() - ft(-6)) < 1e-9));
        // members and columns follow
        assertTrue(p.columns().stream().anyMatch(c -> c.id().equals("C-E1") && Math.abs(c.at().x() - ft(140)) < 1e-9));
        var g = l2.member("G-1-DE").orElseThrow();
        near(105, g.start().x());
        near(140, g.end().x());
    }

    @Test
    void aListOfBayWidthsMustFitThePlan() {
        Plan p = Variations.bays(DEMO, GridLine.Axis.Y, List.of(ft(30), ft(40), ft(30)));
        near(70, p.gridLine("3").orElseThrow().offset());
        near(100, p.gridLine("4").orElseThrow().offset());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Variations.bays(DEMO, GridLine.Axis.Y, List.of(ft(30), ft(40))));
        assertTrue(e.getMessage().contains("2 bay widths given but the plan has 3 bays"), e.getMessage());
    }

    @Test
    void beamDirectionTurnsInfillsDecksAndMemberKinds() {
        Plan p = Variations.beamDirection(DEMO, GridLine.Axis.X);
        Floor f = p.floor("typical").orElseThrow();
        assertTrue(f.infills().stream().allMatch(i -> i.direction() == GridLine.Axis.X));
        assertEquals(MemberKind.BEAM, f.member("G-1-AB").orElseThrow().kind());
        assertEquals(MemberKind.GIRDER, f.member("B-A-12").orElseThrow().kind());
        assertEquals(90, deck(f, "DK-main").spanAngle(), 0.0);
        assertEquals(0, deck(f, "DK-balcony").spanAngle(), 0.0, "the balcony spans between its own cantilevered beams");
        // the direction the plan already has changes nothing
        assertTrue(DEMO.equals(Variations.beamDirection(DEMO, GridLine.Axis.Y)));
        // turning back from x turns every deck that spans onto the x beams
        Floor back = Variations.beamDirection(p, GridLine.Axis.Y).floor("typical").orElseThrow();
        assertEquals(0, deck(back, "DK-main").spanAngle(), 0.0);
        assertEquals(MemberKind.GIRDER, back.member("G-1-AB").orElseThrow().kind());
    }

    @Test
    void spacingCountAndSettings() {
        Plan s = Variations.beamSpacing(Variations.beamCount(DEMO, 2), ft(8));
        for (Floor f : s.floors()) {
            for (Infill i : f.infills()) {
                assertEquals(0, i.count());
                assertEquals(ft(8), i.maxSpacing(), 0.0);
            }
        }
        assertTrue(Variations.beamCount(DEMO, 2).floors().stream().flatMap(f -> f.infills().stream()).allMatch(i -> i.count() == 2));
        assertEquals("asd", Variations.method(DEMO, "asd").settings().method());
        assertEquals(0.6, Variations.maxDepth(DEMO, 0.6).settings().maxBeamDepth(), 0.0);
        assertEquals(List.of("W12"), Variations.columnSeries(DEMO, List.of("W12")).settings().columnSeries());
    }

    /**
     * The demo studies without errors across spacings and bay widths. (Turning its beams east–west is not among
     * them: the balcony bays are framed by north–south beams that are the balcony's backspans, so with
     * east–west infill elsewhere the deck there would span 35 ft, which the deck check rightly refuses.)
     */
    @Test
    void theDemoStudiesWithoutErrors() {
        StudySpec spec = new StudySpec(DEMO, List.of(SweepText.parse("--vary", "beam-spacing=8ft,12ft", org.baywright.units.UnitSystem.US),
                SweepText.parse("--vary", "bay-x=35ft", org.baywright.units.UnitSystem.US)));
        StudyResult r = Study.run(spec, StudyTest.CATALOG, 2, ProgressListener.NONE, new CancelToken());
        for (VariantResult v : r.variants()) {
            assertEquals(0, v.errors(), v.toString());
            assertTrue(v.steelWeight() > 0);
        }
    }

    @Test
    void turningTheBeamsLeavesADeckOutsideEveryInfilledBayAsItIs() {
        Plan turned = Variations.beamDirection(DEMO, GridLine.Axis.X);
        int balconies = 0;
        for (Floor f : DEMO.floors()) {
            for (Deck d : f.decks()) {
                Deck after = deck(turned.floor(f.id()).orElseThrow(), d.id());
                if (d.id().contains("balcony")) {
                    balconies++;
                    assertEquals(d.spanAngle(), after.spanAngle(), 0.0, f.id() + " " + d.id() + ": the balcony keeps its span");
                } else {
                    assertEquals(90, after.spanAngle(), 1e-9, f.id() + " " + d.id() + ": the main deck spans onto east–west beams");
                }
            }
        }
        assertTrue(balconies > 0, "the demo has a balcony deck");
    }

    private static Deck deck(Floor f, String id) {
        return f.decks().stream().filter(d -> d.id().equals(id)).findFirst().orElseThrow();
    }
}
