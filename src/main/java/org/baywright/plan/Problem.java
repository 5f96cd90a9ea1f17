package org.baywright.plan;

import java.util.List;

/**
 * A located problem: what is wrong, where, and what is allowed. Produced by plan-file reading, plan
 * validation, geometry and the takedown; shown by the CLI one per line and drawn by the editor.
 *
 * @param severity ERROR stops what depends on the object; WARNING informs
 * @param kind a short stable code, e.g. "unknown-field", "unsupported-member", "overlap"
 * @param location where in the file or plan: a JSON pointer ({@code /floors/0/members/3/end}) or a
 *     plan path ({@code floor typical / member B-12}); may be empty
 * @param objectId the id of the object concerned (member, column, load…), may be empty
 * @param message one readable sentence naming the field, the value and what is allowed
 * @param where plan points to draw (may be empty)
 */
public record Problem(Severity severity, String kind, String location, String objectId, String message, List<Point> where) {
    public Problem {
        where = List.copyOf(where);
    }

    /** How serious a problem is. */
    public enum Severity {
        ERROR, WARNING
    }

    public static Problem error(String kind, String location, String objectId, String message) {
        return new Problem(Severity.ERROR, kind, location, objectId, message, List.of());
    }

    public static Problem warning(String kind, String location, String objectId, String message) {
        return new Problem(Severity.WARNING, kind, location, objectId, message, List.of());
    }

    /** One line: {@code error: floors/0/members/3 (B-12): end: … }. */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(severity == Severity.ERROR ? "error" : "warning").append(": ");
        if (!location.isEmpty()) {
            b.append(location);
        }
        if (!objectId.isEmpty()) {
            b.append(location.isEmpty() ? "" : " ").append('(').append(objectId).append(')');
        }
        if (!location.isEmpty() || !objectId.isEmpty()) {
            b.append(": ");
        }
        return b.append(message).toString();
    }
}
