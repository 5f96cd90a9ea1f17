package org.baywright.io;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/**
 * What reading a plan file gave: the plan, when the file has no errors, and every problem found
 * (errors and warnings), each located by JSON pointer and object id.
 *
 * @param plan the plan; empty when any error was found
 * @param problems all problems, in the order they were found
 */
public record PlanReadResult(Optional<Plan> plan, List<Problem> problems) {
    public PlanReadResult {
        Objects.requireNonNull(plan, "plan");
        problems = List.copyOf(problems);
    }

    /** True when the plan was read and no problem is an error. */
    public boolean ok() {
        return plan.isPresent() && problems.stream().noneMatch(p -> p.severity() == Problem.Severity.ERROR);
    }

    /** The errors only. */
    public List<Problem> errors() {
        return problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).toList();
    }
}
