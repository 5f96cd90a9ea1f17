package org.baywright.run;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;
import org.baywright.takedown.TakedownResult;

/**
 * The result of one run of a plan, with its provenance.
 *
 * @param takedown null when the plan had errors that prevent a run
 * @param catalogName the catalog used
 * @param version Baywright's version
 * @param milliseconds wall time of the run (for information only)
 */
public record RunResult(Plan plan, TakedownResult takedown, List<Problem> validation, String catalogName, String version,
        double milliseconds) {

    /** Every problem: validation first, then those of the takedown. */
    public List<Problem> problems() {
        List<Problem> all = new ArrayList<>(validation);
        if (takedown != null) {
            all.addAll(takedown.problems());
        }
        return all;
    }
}
