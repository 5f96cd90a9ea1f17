package org.baywright.run;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.takedown.BayResult;
import org.baywright.takedown.TakedownResult;

/**
 * The result of one run of a plan, with its provenance.
 *
 * @param takedown null when the plan had errors that prevent a run
 * @param catalogName the catalog used (empty when none could be read)
 * @param version Baywright's version
 * @param milliseconds wall time of the run (for information only)
 * @param basis the design basis the run used: method, steel, catalog, criteria
 * @param bays the floor-vibration check of every bay of every floor layout (AISC DG11), empty when no floor of the
 *     plan describes a slab
 * @param sizedForVibration the members stiffened so that bays meet the walking-vibration limit, on floors sized for
 *     it ({@link VibrationSizing}); empty otherwise
 */
public record RunResult(Plan plan, TakedownResult takedown, List<Problem> validation, String catalogName, String version,
        double milliseconds, DesignBasis basis, List<BayResult> bays, List<VibrationSizing.Change> sizedForVibration) {

    public RunResult {
        bays = bays == null ? List.of() : List.copyOf(bays);
        sizedForVibration = sizedForVibration == null ? List.of() : List.copyOf(sizedForVibration);
    }

    /** A result with bay checks and nothing stiffened for vibration. */
    public RunResult(Plan plan, TakedownResult takedown, List<Problem> validation, String catalogName, String version,
            double milliseconds, DesignBasis basis, List<BayResult> bays) {
        this(plan, takedown, validation, catalogName, version, milliseconds, basis, bays, List.of());
    }

    /** A result without bay checks. */
    public RunResult(Plan plan, TakedownResult takedown, List<Problem> validation, String catalogName, String version,
            double milliseconds, DesignBasis basis) {
        this(plan, takedown, validation, catalogName, version, milliseconds, basis, List.of());
    }

    /**
     * A result assembled without a run (tests, examples): the basis is the plan's, without a catalog.
     */
    public RunResult(Plan plan, TakedownResult takedown, List<Problem> validation, String catalogName, String version,
            double milliseconds) {
        this(plan, takedown, validation, catalogName, version, milliseconds, DesignBasis.of(plan, null));
    }

    /** Every problem: validation first, then those of the takedown. */
    public List<Problem> problems() {
        List<Problem> all = new ArrayList<>(validation);
        if (takedown != null) {
            all.addAll(takedown.problems());
        }
        return all;
    }
}
