package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.design.aisc360.StudPosition;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The composite beam's calculation sheet prints the formulas it executes: every equation line recorded
 * by {@link CompositeBeamDesigner#check} (and the Chapter I functions it calls) evaluates, with its
 * recorded inputs, to its recorded result; the recorded check gives the same checks as the unrecorded
 * one; every PNA position, both rib orientations, a solid slab, shored and unshored, LRFD and ASD.
 */
class CompositeCalculationRecordTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    @Test
    void everyRecordedEquationEvaluatesToItsResult() {
        List<Executable> checks = new ArrayList<>();
        int equations = 0;
        SlabOnDeck deck = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        SlabOnDeck narrow = SlabOnDeck.us(2, 2.5, 6, 2.0, 3.25, 110, 3);
        SlabOnDeck solid = SlabOnDeck.solid(Units.IN.toSi(5.5), 145 * org.baywright.design.aisc360.StudStrengthI8.PCF,
                Units.KSI.toSi(4));
        Object[][] beams = {
            {deck, DeckRibs.PERPENDICULAR}, {deck, DeckRibs.PARALLEL}, {narrow, DeckRibs.PARALLEL}, {solid, DeckRibs.NONE}};
        for (Object[] b : beams) {
            for (DesignMethod m : DesignMethod.values()) {
                for (boolean shored : new boolean[] {false, true}) {
                    CompositeBeam beam = CompositeBeam.interior(Units.FT_.toSi(36), Units.FT_.toSi(10), (DeckRibs) b[1],
                            (SlabOnDeck) b[0], Studs.defaults().withPerRib(2).withPosition(StudPosition.STRONG),
                            Units.PSF.toSi(15), Units.PSF.toSi(80), Units.PSF.toSi(20));
                    CompositeBeamDesigner d = new CompositeBeamDesigner(beam, CompositeCriteria.defaults().withMethod(m)
                            .withShored(shored).withConstructionBracing(Bracing.equalSegments(3)));
                    for (String name : List.of("W16X26", "W18X35", "W21X44", "W24X55")) {
                        Section s = CATALOG.find(name).orElseThrow();
                        // 1 stud, a middling count and a full count: the PNA in the web, the flange and the slab
                        for (int n : new int[] {1, 8, 40}) {
                            Calc calc = new Calc();
                            CompositeDesign plain = d.check(s, n, null);
                            CompositeDesign recorded = d.check(s, n, calc);
                            String where = name + " " + b[1] + " " + m + (shored ? " shored" : "") + " n = " + n;
                            checks.add(() -> assertEquals(plain.checks(), recorded.checks(), where));
                            equations += verify(calc, where, checks);
                            // every line renders in both unit systems
                            for (CalcLine line : calc.lines()) {
                                checks.add(() -> assertTrue(!CalcFormat.render(line, UnitSystem.US).isEmpty()
                                        && !CalcFormat.render(line, UnitSystem.SI).isEmpty(), where));
                            }
                        }
                    }
                }
            }
        }
        assertTrue(equations > 1000, "equations verified: " + equations);
        assertAll(checks);
    }

    /**
     * The same for a member under general loads: the girder with point loads at its third points
     * ({@link CompositeMemberTest}), a point load and partial trapezoidal loads, LRFD and ASD, shored and
     * unshored, few and many studs (the I8.2c lines included).
     */
    @Test
    void everyRecordedEquationOfAGeneralMemberEvaluatesToItsResult() {
        List<Executable> checks = new ArrayList<>();
        int equations = 0;
        CompositeMember g = CompositeMemberTest.girder();
        double l = g.span();
        CompositeMember odd = new CompositeMember(l, g.ribs(), g.toNeighbourLeft(), g.toNeighbourRight(), g.toEdgeLeft(),
                g.toEdgeRight(), g.slab(), g.studs(), g.slabWeight(),
                List.of(new PointLoad(0.2 * l, 40e3), new DistributedLoad(0, 0.6 * l, 8e3, 2e3)), List.of(),
                BeamLoads.of(l, Map.of(LoadCase.D, List.of(new DistributedLoad(0.3 * l, l, 1e3, 3e3)),
                        LoadCase.L, List.of(new PointLoad(0.2 * l, 60e3), new PointLoad(0.7 * l, 20e3)),
                        LoadCase.S, List.of(DistributedLoad.full(l, 2e3)))), null);
        for (CompositeMember member : List.of(g, odd)) {
            for (DesignMethod m : DesignMethod.values()) {
                for (boolean shored : new boolean[] {false, true}) {
                    CompositeBeamDesigner d = new CompositeBeamDesigner(member, CompositeCriteria.defaults().withMethod(m)
                            .withShored(shored));
                    for (String name : List.of("W16X26", "W21X44", "W24X55")) {
                        Section s = CATALOG.find(name).orElseThrow();
                        for (int n : new int[] {1, 8, 40}) {
                            Calc calc = new Calc();
                            CompositeDesign plain = d.check(s, n, null);
                            CompositeDesign recorded = d.check(s, n, calc);
                            String where = name + " " + m + (shored ? " shored" : "") + " n = " + n + " " + member.wet();
                            checks.add(() -> assertEquals(plain.checks(), recorded.checks(), where));
                            checks.add(() -> assertTrue(recorded.check("studs at point loads") != null, where));
                            equations += verify(calc, where, checks);
                            for (CalcLine line : calc.lines()) {
                                checks.add(() -> assertTrue(!CalcFormat.render(line, UnitSystem.US).isEmpty()
                                        && !CalcFormat.render(line, UnitSystem.SI).isEmpty(), where));
                            }
                        }
                    }
                }
            }
        }
        assertTrue(equations > 500, "equations verified: " + equations);
        assertAll(checks);
    }

    private static int verify(Calc calc, String where, List<Executable> checks) {
        return org.baywright.calc.CalcRecordChecks.equationsEvaluate(calc, where, checks);
    }

    /** The sheet of DE I.1 (W21X50, 23 studs per half span) prints the steps a checker looks for. */
    @Test
    void theSheetOfExampleI1ShowsEachClause() {
        Calc calc = new Calc();
        new CompositeBeamDesigner(CompositeBeamDesignerValidationTest.exampleI1(),
                CompositeBeamDesignerValidationTest.exampleCriteria()).check(CATALOG.find("W21X50").orElseThrow(), 23, calc);
        StringBuilder sheet = new StringBuilder();
        for (CalcLine line : calc.lines()) {
            sheet.append(CalcFormat.render(line, UnitSystem.US)).append('\n');
        }
        String text = sheet.toString();
        assertAll("DE I.1 sheet",
                () -> assertTrue(text.contains("AISC 360-16 I3.1a"), text),
                () -> assertTrue(text.contains("AISC 360-16 Eq. I8-1"), text),
                () -> assertTrue(text.contains("AISC 360-16 I2.1b"), text),
                () -> assertTrue(text.contains("AISC 360-16 Eq. I3-1a"), text),
                () -> assertTrue(text.contains("AISC 360-16 I3.2a"), text),
                () -> assertTrue(text.contains("C-I3-1"), text),
                () -> assertTrue(text.contains("PNA is in the top flange"), text),
                () -> assertTrue(text.contains("Construction stage"), text),
                () -> assertTrue(text.contains("camber"), text));
    }
}
