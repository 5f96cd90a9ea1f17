package org.baywright.robust;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.baywright.plan.Problem;
import org.baywright.run.RunResult;
import org.baywright.takedown.Equilibrium;

/** What every run of a valid plan must satisfy, whatever the plan. */
final class RunChecks {
    /** Problems that say some load does not reach the foundations (and so excuse an equilibrium miss). */
    static final Set<String> LOSES_LOAD = Set.of("unsupported-deck", "point-load-off-deck", "point-load-unsupported",
            "line-load-off-deck", "line-load-unsupported", "unsupported-member", "support-cycle", "zero-length-member",
            "duplicate-member", "degenerate-polygon", "degenerate-line", "unknown-floor", "too-many-beams");

    /** Problems that only a fault of the engine produces: never expected from a valid plan. */
    static final Set<String> ENGINE_FAULTS = Set.of("internal", "coverage", "bad-input");

    private RunChecks() {
    }

    /** Every problem has a message and a place, and none is an engine fault or a leaked exception. */
    static void problemsAreLocated(RunResult r) {
        for (Problem p : r.problems()) {
            assertFalse(p.message().isBlank(), () -> "a problem without a message: " + p);
            assertTrue(!p.location().isBlank() || !p.objectId().isBlank(), () -> "a problem without a place: " + p);
            assertFalse(ENGINE_FAULTS.contains(p.kind()), () -> "an engine fault on a valid plan: " + p);
            assertFalse(p.message().contains("Exception"), () -> "an exception shown as a problem: " + p);
        }
    }

    /**
     * Every load case balances, unless a problem reports load that does not reach a column; load is
     * never created.
     */
    static void equilibrium(RunResult r) {
        List<Equilibrium> eq = r.takedown().equilibrium();
        assertEquals(4, eq.size());
        boolean explained = r.problems().stream().anyMatch(p -> LOSES_LOAD.contains(p.kind()));
        for (Equilibrium e : eq) {
            assertTrue(Double.isFinite(e.applied()) && Double.isFinite(e.reactions()), e::toString);
            if (!explained) {
                assertTrue(e.holds(), () -> "equilibrium fails with no problem to explain it: " + e + "; problems "
                        + r.problems());
            } else {
                assertTrue(e.reactions() <= e.applied() * (1 + Equilibrium.TOLERANCE) + e.slack() + Equilibrium.FLOOR,
                        () -> "reactions exceed the load: " + e);
            }
        }
    }

    /** True when some load case does not balance. */
    static boolean losesLoad(RunResult r) {
        return !r.takedown().equilibrium().stream().allMatch(Equilibrium::holds);
    }
}
