package org.baywright.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.function.Executable;

/** Checks that a calculation record says what it computed: each equation, evaluated from its printed arguments, gives its value. */
public final class CalcRecordChecks {
    private CalcRecordChecks() {
    }

    /**
     * Adds to {@code checks} one check per equation of {@code calc} (its formula evaluated with its arguments equals
     * its value, to 1e-9 relative), labelled with {@code where}; returns the number of equations.
     */
    public static int equationsEvaluate(Calc calc, String where, List<Executable> checks) {
        int n = 0;
        for (CalcLine line : calc.lines()) {
            if (line.kind() != CalcLine.Kind.EQUATION) {
                continue;
            }
            n++;
            checks.add(check(line, where));
        }
        return n;
    }

    /** The check of one equation line. */
    public static Executable check(CalcLine line, String where) {
        Map<String, Double> v = new HashMap<>();
        for (Arg a : line.args()) {
            v.put(a.symbol(), a.value());
        }
        double got = Formula.evaluate(line.formula(), v);
        return () -> assertEquals(line.value(), got, 1e-9 * Math.max(1e-30, Math.abs(line.value())),
                where + ": " + line.symbol() + " = " + line.formula());
    }
}
