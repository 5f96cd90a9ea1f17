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
import org.baywright.calc.CalcLine;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The printed formula is the executed formula: every equation line the engine records evaluates, with
 * the recorded inputs, to the recorded result; and the recorded sheet agrees with the check values the
 * search computes without a recorder.
 */
class CalculationRecordTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    @Test
    void everyRecordedEquationEvaluatesToItsResult() {
        List<Executable> checks = new ArrayList<>();
        int equations = 0;
        for (String name : List.of("W18X50", "W21X48", "W14X90", "W16X26", "W24X55", "W8X10", "W44X335", "W6X8.5")) {
            Section s = CATALOG.find(name).orElseThrow();
            for (Bracing b : List.of(Bracing.continuous(), Bracing.equalSegments(1), Bracing.equalSegments(2),
                    Bracing.equalSegments(3), Bracing.equalSegments(7))) {
                for (DesignMethod m : DesignMethod.values()) {
                    Calc calc = new Calc();
                    BeamDesigner d = designer(m, b);
                    List<Check> plain = d.check(s, null);
                    List<Check> recorded = d.check(s, calc);
                    checks.add(() -> assertEquals(plain, recorded, name + " " + m + " " + b.describe()));
                    equations += verify(calc, name, checks);
                }
            }
            for (DesignMethod m : DesignMethod.values()) {
                // an overhanging beam (cantilever with a backspan): its sheet, from the same functions
                double len = Units.FT_.toSi(38);
                OverhangDesigner o = new OverhangDesigner(BeamLoads.overhanging(len, 0, Units.FT_.toSi(30), Map.of(
                        LoadCase.D, List.of(DistributedLoad.full(len, Units.KLF.toSi(0.8)), new PointLoad(len, Units.KIPS.toSi(2))),
                        LoadCase.L, List.of(DistributedLoad.full(len, Units.KLF.toSi(1.0))))),
                        BeamCriteria.defaults().withMethod(m));
                Calc calc = new Calc();
                List<Check> plain = o.check(s, null);
                List<Check> recorded = o.check(s, calc);
                checks.add(() -> assertEquals(plain, recorded, name + " " + m + " overhang"));
                equations += verify(calc, name + " overhang", checks);
            }
            Calc col = new Calc();
            IShapeCompression.strength(s, Steel.A992.fy(), Steel.A992.e(), Units.FT_.toSi(14), Units.FT_.toSi(14), col);
            equations += verify(col, name + " column", checks);
        }
        assertTrue(equations > 500, "equations verified: " + equations);
        assertAll(checks);
    }

    private static int verify(Calc calc, String where, List<Executable> checks) {
        return org.baywright.calc.CalcRecordChecks.equationsEvaluate(calc, where, checks);
    }

    private static BeamDesigner designer(DesignMethod m, Bracing b) {
        double span = Units.FT_.toSi(30);
        Map<LoadCase, List<org.baywright.analysis.SpanLoad>> loads = Map.of(
                LoadCase.D, List.of(DistributedLoad.full(span, Units.KLF.toSi(0.6)), new PointLoad(Units.FT_.toSi(11), Units.KIPS.toSi(5))),
                LoadCase.L, List.of(DistributedLoad.uniform(Units.FT_.toSi(4), Units.FT_.toSi(22), Units.KLF.toSi(0.9))));
        return new BeamDesigner(BeamLoads.of(span, loads), BeamCriteria.defaults().withMethod(m).withBracing(b));
    }
}
