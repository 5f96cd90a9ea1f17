package org.baywright.io;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Problem;

/** Collects the problems of one file, in the order they are found. */
final class Problems {
    private final List<Problem> list = new ArrayList<>();

    void error(String kind, String pointer, String objectId, String message) {
        list.add(Problem.error(kind, pointer, objectId == null ? "" : objectId, message));
    }

    void add(Problem p) {
        list.add(p);
    }

    boolean hasErrors() {
        return list.stream().anyMatch(p -> p.severity() == Problem.Severity.ERROR);
    }

    /** True if a problem was already reported at {@code pointer} or inside it. */
    boolean reportedAtOrUnder(String pointer) {
        return list.stream().anyMatch(p -> p.location().equals(pointer) || p.location().startsWith(pointer + "/"));
    }

    List<Problem> all() {
        return List.copyOf(list);
    }
}
