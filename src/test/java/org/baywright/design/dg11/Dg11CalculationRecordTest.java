package org.baywright.design.dg11;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.calc.Formula;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The walking check's sheet prints the formulas it executes: every equation line recorded by
 * {@link Walking#check} and the ingredient functions evaluates, with its recorded inputs, to its recorded
 * result; the recorded check gives the same result as the unrecorded one; every line renders in both unit
 * systems and cites DG11 (2nd ed.).
 */
class Dg11CalculationRecordTest {

    @Test
    void everyRecordedEquationEvaluatesToItsResult() {
        List<Executable> checks = new ArrayList<>();
        BayVibration handbook = Dg11ValidationTest.handbookBay();
        double ft = Units.FT_.toSi(1);
        List<BayVibration> bays = List.of(handbook,
                handbook.withFloor(45 * ft, 60 * ft),                                   // both widths capped
                handbook.withGirder(handbook.girder().withContinuous(true)).withBeta(0.02),
                handbook.withBeam(handbook.beam().withIt(handbook.beam().it() / 4)),       // soft: below 3 Hz
                handbook.withBeam(new VibrationMember(10 * ft, 10 * ft, handbook.beam().it() * 4, handbook.beam().weight(), false))
                        .withGirder(new VibrationMember(12 * ft, 10 * ft, handbook.girder().it() * 3,
                                handbook.girder().weight(), false)));                   // stiff: outside the method
        int equations = 0;
        for (BayVibration bay : bays) {
            Calc calc = new Calc();
            VibrationResult recorded = Walking.check(bay, calc);
            checks.add(() -> assertEquals(Walking.check(bay, null), recorded, "recorded = unrecorded"));
            equations += verify(calc, bay.toString(), checks);
        }
        // the ingredients
        Calc calc = new Calc();
        Section s = CatalogFile.loadDefault().find("W24X55").orElseThrow();
        VibrationSlab slab = VibrationSlab.us(3.5, 1.5, 0.5, 2136);
        for (Ribs ribs : Ribs.values()) {
            Stiffness.transformedInertia(s, slab, ribs, 30 * ft, 30 * ft, Units.KSI.toSi(29000), calc);
        }
        Stiffness.dynamicModulus(slab.ec(), calc);
        Stiffness.ds(slab.de(), 10.06, calc);
        double wa = VibrationLoads.areaWeight(Units.PSF.toSi(46.7), Units.PSF.toSi(4), Units.PSF.toSi(11), calc);
        double wj = VibrationLoads.beamWeight(wa, 10 * ft, Units.PLF.toSi(44), calc);
        VibrationLoads.girderWeight(wj, 10 * ft, 30 * ft, Units.PLF.toSi(55), calc);
        Modes.closedForm(wj, 30 * ft, Units.KSI.toSi(29000), Units.IN4.toSi(843.2), calc);
        equations += verify(calc, "ingredients", checks);
        assertTrue(equations > 80, "equations verified: " + equations);
        assertAll(checks);
    }

    private static int verify(Calc calc, String where, List<Executable> checks) {
        int n = 0;
        for (CalcLine line : calc.lines()) {
            checks.add(() -> assertTrue(!CalcFormat.render(line, UnitSystem.US).isEmpty()
                    && !CalcFormat.render(line, UnitSystem.SI).isEmpty(), where));
            if (line.kind() != CalcLine.Kind.EQUATION) {
                continue;
            }
            n++;
            checks.add(() -> assertTrue(line.reference().startsWith("AISC DG11 2nd ed."), line.reference()));
            Map<String, Double> v = new HashMap<>();
            for (Arg a : line.args()) {
                v.put(a.symbol(), a.value());
            }
            double got = Formula.evaluate(line.formula(), v);
            checks.add(() -> assertEquals(line.value(), got, 1e-9 * Math.max(1e-30, Math.abs(line.value())),
                    where + ": " + line.symbol() + " = " + line.formula()));
        }
        return n;
    }

    /** The handbook bay's sheet, printed in US units, reads as the handbook's chain does. */
    @Test
    void theHandbookSheetShowsTheChain() {
        Calc calc = new Calc();
        Walking.check(Dg11ValidationTest.handbookBay(), calc);
        StringBuilder sheet = new StringBuilder();
        for (CalcLine line : calc.lines()) {
            sheet.append(CalcFormat.render(line, UnitSystem.US)).append('\n');
        }
        String text = sheet.toString();
        assertAll("handbook sheet",
                () -> assertTrue(text.contains("f_n = 0.18 · √(g / (Δj + Δg′)) = 0.18 · √(386.1 in / (0.4467 in + 0.246 in)) = 4.25 "),
                        text),
                () -> assertTrue(text.contains("AISC DG11 2nd ed. Eq. 4-1"), text),
                () -> assertTrue(text.contains("Δg′ = max(Lg / Bj, 0.5) · Δg = max(30 ft / 32.91 ft, 0.5) · 0.2699 in = 0.246 in"), text),
                () -> assertTrue(text.contains("adjacent span ≥ 0.7 × span"), text),
                () -> assertTrue(text.contains("→ exceeds"), text));
    }
}
