package org.baywright.design;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Formula;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.ColumnDesigner.Face;
import org.baywright.design.ColumnDesigner.FaceReaction;
import org.baywright.design.ColumnDesigner.Interaction;
import org.baywright.design.ColumnDesigner.Joint;
import org.baywright.design.ColumnDesigner.StoreyDemand;
import org.baywright.design.ColumnDesigner.TierDemand;
import org.baywright.design.ColumnDesigner.TierDesign;
import org.baywright.design.aisc360.CombinedH1;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.design.aisc360.IShapeFlexure;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Column moments from the reactions' connection eccentricities, by hand (COMPUTED): e = d/2 + 3 in to a
 * flange (common practice), the floor's moment shared by I/L between the storeys above and below, B1 by
 * AISC 360-16 Appendix 8 (Eq. A-8-3, A-8-4, A-8-5) and the interaction by H1.1 (Eq. H1-1a, H1-1b); pattern
 * live load by ASCE 7-16 §4.3.3; LRFD 1.2D + 1.6L by ASCE 7-16 §2.3.1. Strengths Pc and Mcx come from the
 * engine's E3 and F2 functions (validated against the AISC examples in their own tests).
 */
class ColumnMomentsValidationTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();
    private static final double KIP = Units.KIPS.toSi(1);
    private static final double A = Units.IN.toSi(3);
    private static final double H1 = Units.FT_.toSi(14);
    private static final double H2 = Units.FT_.toSi(13);

    private static double[] loads(double d, double l) {
        double[] v = new double[LoadCase.values().length];
        v[LoadCase.D.ordinal()] = d * KIP;
        v[LoadCase.L.ordinal()] = l * KIP;
        return v;
    }

    private static double pc(Section s, double h) {
        return 0.9 * IShapeCompression.strength(s, Steel.A992.fy(), Steel.A992.e(), h, h, null).pn();
    }

    private static double mcx(Section s, double h) {
        return 0.9 * IShapeFlexure.mn(IShapeFlexure.constants(s, Steel.A992.fy(), Steel.A992.e(), null), h, 1.0, null);
    }

    /**
     * An edge column, two storeys (14 ft below Level 2, 13 ft below Level 3), a girder on its +x face at each
     * level delivering D = 40 kips and L = 30 kips, W14X61 fixed, no live-load reduction. Ru = 1.2·40 + 1.6·30 =
     * 96 kips at each floor; e = d/2 + 3 in; the Level 2 moment splits (1/14)/(1/14 + 1/13) = 13/27 to the storey
     * below and 14/27 to the storey above; Level 3 (the top) gives all of its moment to the storey below. Bottom
     * storey: end moments 13/27·Ru·e at the top and 0 at the pinned base → Cm = 0.6; upper storey: Ru·e at the top
     * and 14/27·Ru·e at the bottom, the same sense → reverse curvature, Cm = 0.6 − 0.4·14/27. Both B1 = 1.
     */
    @Test
    void aOneSidedEdgeColumnByHand() {
        Section s = CATALOG.find("W14X61").orElseThrow();
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W14"), A);
        List<FaceReaction> at = List.of(new FaceReaction("G-1", Face.POS_X, loads(40, 30)));
        double[] two = loads(80, 60);
        double[] one = loads(40, 30);
        StoreyDemand bottom = new StoreyDemand("Level 2", H1, two, two.clone(), new Joint("Level 2", at, H2), Joint.NONE);
        StoreyDemand top = new StoreyDemand("Level 3", H2, one, one.clone(), new Joint("Level 3", at, 0),
                new Joint("Level 2", at, H1));
        TierDesign t = d.design(List.of(new TierDemand(List.of(bottom, top))), Optional.of("W14X61"), true).get(0);
        double w = s.weight();
        double e = s.depth() / 2 + A;
        double ru = 96 * KIP;
        Interaction ib = t.storeys().get(0).interaction();
        Interaction it = t.storeys().get(1).interaction();
        double puB = 1.2 * (80 * KIP + w * (H1 + H2)) + 1.6 * 60 * KIP;
        double puT = 1.2 * (40 * KIP + w * H2) + 1.6 * 30 * KIP;
        double mB = 13.0 / 27.0 * ru * e;
        double mT = ru * e;
        double expectB = puB / pc(s, H1) + 8.0 / 9.0 * mB / mcx(s, H1); // Pu/Pc ≥ 0.2: Eq. H1-1a
        double expectT = puT / (2 * pc(s, H2)) + mT / mcx(s, H2); // Pu/Pc < 0.2: Eq. H1-1b
        assertAll(
                () -> assertEquals(MemberStatus.FIXED_SIZE, t.status()),
                () -> assertEquals(puB, ib.pr(), 1e-9 * puB, "Pu, bottom storey"),
                () -> assertEquals(mB, ib.mrx(), 1e-9 * mB, "Mrx bottom = 13/27·Ru·e, B1 = 1"),
                () -> assertEquals(1.0, ib.b1x(), 1e-12, "B1 = max(0.6/(1 − Pu/Pe1), 1)"),
                () -> assertEquals(0, ib.mry(), 1e-9, "no weak-axis moment"),
                () -> assertEquals("all spans loaded", ib.pattern(), "live load on one side only: removing it lowers the moment"),
                () -> assertTrue(puB / pc(s, H1) >= 0.2),
                () -> assertEquals(expectB, ib.ratio(), 1e-9, "Eq. H1-1a"),
                () -> assertEquals(expectB, t.storeys().get(0).ratio(), 1e-9, "the storey's ratio is the interaction"),
                () -> assertEquals(mT, it.mrx(), 1e-9 * mT, "Mrx top storey = Ru·e (no column above)"),
                () -> assertTrue(puT / pc(s, H2) < 0.2),
                () -> assertEquals(expectT, it.ratio(), 1e-9, "Eq. H1-1b"),
                () -> assertEquals(CombinedH1.ratio(puT, pc(s, H2), mT, mcx(s, H2), 0, 1, null), it.ratio(), 1e-9));
    }

    /**
     * An interior column of one storey (13 ft) with a girder on +x (D 40, L 30 kips) and a beam on −x (D 20, L
     * 15 kips): all spans loaded the net factored reaction is 96 − 48 = 48 kips; with the −x beam's live load
     * removed (ASCE 7-16 §4.3.3) it is 96 − 24 = 72 kips, and Pu drops by 1.6·15 = 24 kips to match.
     */
    @Test
    void patternLiveLoadRemovesTheLiveLoadOfTheSideThatMakesTheMomentLargest() {
        Section s = CATALOG.find("W14X61").orElseThrow();
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W14"), A);
        List<FaceReaction> at = List.of(new FaceReaction("G-1", Face.POS_X, loads(40, 30)),
                new FaceReaction("B-1", Face.NEG_X, loads(20, 15)));
        double[] p = loads(60, 45);
        StoreyDemand st = new StoreyDemand("Roof", H2, p, p.clone(), new Joint("Roof", at, 0), Joint.NONE);
        TierDesign t = d.design(List.of(new TierDemand(List.of(st))), Optional.of("W14X61"), true).get(0);
        Interaction in = t.storeys().get(0).interaction();
        double e = s.depth() / 2 + A;
        double full = 1.2 * (60 * KIP + s.weight() * H2) + 1.6 * 45 * KIP;
        assertAll(
                () -> assertTrue(in.pattern().contains("−x"), in.pattern()),
                () -> assertEquals(72 * KIP * e, in.mrx(), 1e-9 * 72 * KIP * e, "(96 − 24)·e"),
                () -> assertEquals(full - 24 * KIP, in.pr(), 1e-9 * full, "Pu with the −x live load removed"));
    }

    /**
     * The lightest section now answers to the interaction: under a heavy one-sided reaction the column is heavier
     * than the axial load alone would make it (the old, axial-only design chose the lighter one).
     */
    @Test
    void anUnbalancedReactionMakesTheColumnHeavierThanAxialLoadAlone() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.LRFD, List.of("W14"), A);
        List<FaceReaction> at = List.of(new FaceReaction("G-1", Face.POS_X, loads(100, 80)));
        double[] p = loads(300, 250);
        StoreyDemand withMoment = new StoreyDemand("Roof", H1, p, p.clone(), new Joint("Roof", at, 0), Joint.NONE);
        StoreyDemand axialOnly = new StoreyDemand("Roof", H1, p, p.clone());
        TierDesign m = d.design(List.of(new TierDemand(List.of(withMoment))), Optional.empty(), true).get(0);
        TierDesign a = d.design(List.of(new TierDemand(List.of(axialOnly))), Optional.empty(), true).get(0);
        assertAll(
                () -> assertTrue(m.section().weight() > a.section().weight(), m.section() + " vs axial only " + a.section()),
                () -> assertTrue(m.maxRatio() <= 1.0),
                () -> assertTrue(m.storeys().get(0).ratio() > m.storeys().get(0).required() / m.storeys().get(0).available()));
    }

    /** The recorded sheet of a storey reproduces its interaction, and every recorded formula evaluates to its value. */
    @Test
    void theSheetRecordsTheSameCheck() {
        ColumnDesigner d = new ColumnDesigner(CATALOG, Steel.A992, DesignMethod.ASD, List.of("W14"), A);
        List<FaceReaction> top = List.of(new FaceReaction("G-1", Face.POS_X, loads(40, 30)),
                new FaceReaction("B-1", Face.NEG_X, loads(20, 15)), new FaceReaction("B-2", Face.POS_Y, loads(10, 8)));
        double[] p = loads(140, 106);
        StoreyDemand st = new StoreyDemand("Level 3", H2, p, p.clone(), new Joint("Level 3", top, H2), new Joint("Level 2", top, H1));
        TierDesign t = d.design(List.of(new TierDemand(List.of(st))), Optional.empty(), true).get(0);
        Interaction in = t.storeys().get(0).interaction();
        Calc calc = new Calc();
        Interaction again = d.record(in, t.section(), in.pc(), calc);
        int n = 0;
        for (CalcLine l : calc.lines()) {
            if (l.kind() != CalcLine.Kind.EQUATION) {
                continue;
            }
            n++;
            Map<String, Double> v = new HashMap<>();
            for (Arg a : l.args()) {
                v.put(a.symbol(), a.value());
            }
            assertEquals(l.value(), Formula.evaluate(l.formula(), v), 1e-9 * Math.max(1, Math.abs(l.value())), l.symbol() + " = " + l.formula());
        }
        int equations = n;
        assertAll(
                () -> assertEquals(in.ratio(), again.ratio(), 1e-12),
                () -> assertEquals(in.mrx(), again.mrx(), 1e-9),
                () -> assertEquals(in.mry(), again.mry(), 1e-9),
                () -> assertTrue(equations > 15, "equations recorded: " + equations),
                () -> assertTrue(ResistanceFactors.OMEGA_B > 1));
    }
}
