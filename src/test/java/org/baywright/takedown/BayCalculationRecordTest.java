package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.CalcLine;
import org.baywright.plan.Slab;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * A bay's calculation sheet ({@link BayResult#calculation()}) prints what the run executed: every equation line
 * evaluates, with its recorded inputs, to its recorded value; every line renders in US and SI; the sheet's a_p/g
 * and f_n are the run's.
 */
class BayCalculationRecordTest {

    @Test
    void everyLineOfEveryBaysSheetEvaluatesToItsValue() {
        List<BayResult> bays = new ArrayList<>();
        // the handbook floor (slab weight given) and a regular plan with the typical slab (weight from geometry)
        bays.addAll(PlanRun.run(BayPlans.handbookFloor(BayPlans.handbookSlab())).bays());
        RunResult regular = PlanRun.run(BayPlans.withSlab(BayPlans.regular(2, 2, false), Slab.typical()));
        bays.addAll(regular.bays().stream().filter(BayResult::checked).toList());
        List<Executable> checks = new ArrayList<>();
        int equations = 0;
        for (BayResult b : bays) {
            Calc calc = b.calculation();
            String where = b.bay().floor() + " " + b.bay().id();
            double fn = Double.NaN;
            double apg = Double.NaN;
            for (CalcLine line : calc.lines()) {
                checks.add(() -> assertTrue(!CalcFormat.render(line, UnitSystem.US).isEmpty()
                        && !CalcFormat.render(line, UnitSystem.SI).isEmpty(), where));
                if (line.kind() != CalcLine.Kind.EQUATION) {
                    continue;
                }
                equations++;
                checks.add(org.baywright.calc.CalcRecordChecks.check(line, where));
                if ("f_n".equals(line.symbol())) {
                    fn = line.value();
                }
                if ("a_p/g".equals(line.symbol())) {
                    apg = line.value();
                }
            }
            double f = fn;
            double a = apg;
            checks.add(() -> assertEquals(b.result().fn(), f, 0, where + ": the sheet's f_n is the run's"));
            checks.add(() -> assertEquals(b.result().apg(), a, 0, where + ": the sheet's a_p/g is the run's"));
        }
        assertTrue(bays.size() >= 22, "bays: " + bays.size());
        assertTrue(equations > 22 * 25, "equations: " + equations);
        assertAll(checks);
    }
}
