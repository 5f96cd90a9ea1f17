package org.baywright.cli;

import java.nio.file.Path;
import org.baywright.plan.Problem;

/**
 * The one line a problem gets on standard error: {@code FILE: error: LOCATION (ID): message}, see
 * {@code docs/cli-contract.md}. Whatever the file holds, the line stays one line: control characters
 * (a line break inside an id, say) are shown as {@code \n}, {@code \t} or {@code \u001B}, and very long
 * locations and ids are shortened.
 */
final class ProblemLines {
    /** Longest location or id shown whole. */
    static final int LONGEST_PART = 120;

    private ProblemLines() {
    }

    static String line(Path file, Problem p) {
        String source = file.toString();
        StringBuilder b = new StringBuilder(source).append(": ")
                .append(p.severity() == Problem.Severity.ERROR ? "error" : "warning").append(": ");
        String location = clip(p.location());
        String id = clip(p.objectId());
        b.append(location);
        if (!id.isEmpty()) {
            b.append(location.isEmpty() ? "" : " ").append('(').append(id).append(')');
        }
        if (!location.isEmpty() || !id.isEmpty()) {
            b.append(": ");
        }
        return oneLine(b.append(withoutSource(p.message(), source)).toString());
    }

    /** A file-level message repeats the file name the line already starts with: drop it. */
    private static String withoutSource(String message, String source) {
        if (message.startsWith(source + ": ")) {
            return message.substring(source.length() + 2);
        }
        if (message.startsWith(source + " at line ")) {
            return message.substring(source.length() + 1);
        }
        return message;
    }

    private static String clip(String s) {
        return s.length() <= LONGEST_PART ? s : s.substring(0, LONGEST_PART - 1) + "…";
    }

    /** The text with every control character written as an escape, so that it cannot break the line. */
    static String oneLine(String s) {
        StringBuilder b = null;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029') {
                if (b == null) {
                    b = new StringBuilder(s.length() + 16).append(s, 0, i);
                }
                b.append(switch (c) {
                    case '\n' -> "\\n";
                    case '\r' -> "\\r";
                    case '\t' -> "\\t";
                    default -> String.format(java.util.Locale.ROOT, "\\u%04X", (int) c);
                });
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? s : b.toString();
    }
}
