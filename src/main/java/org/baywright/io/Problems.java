package org.baywright.io;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.baywright.plan.Problem;

/** Collects the problems of one file, in the order they are found. */
final class Problems {
    private final List<Problem> list = new ArrayList<>();
    /** Every problem's location and each of its ancestors, so that "reported here or inside?" costs one look-up. */
    private final Set<String> reached = new HashSet<>();
    private boolean errors;

    void error(String kind, String pointer, String objectId, String message) {
        add(Problem.error(kind, pointer, objectId == null ? "" : objectId, message));
    }

    void warning(String kind, String pointer, String objectId, String message) {
        add(Problem.warning(kind, pointer, objectId == null ? "" : objectId, message));
    }

    /** The number of errors reported so far. */
    int errorCount() {
        int n = 0;
        for (Problem p : list) {
            if (p.severity() == Problem.Severity.ERROR) {
                n++;
            }
        }
        return n;
    }

    void add(Problem problem) {
        Problem p = readable(problem);
        list.add(p);
        errors |= p.severity() == Problem.Severity.ERROR;
        String at = p.location();
        reached.add(at);
        for (int i = at.lastIndexOf('/'); i >= 0; i = at.lastIndexOf('/', i - 1)) {
            if (!reached.add(at.substring(0, i)) || i == 0) {
                break; // the ancestors of an ancestor already recorded are recorded too
            }
        }
    }

    /** Longest run of text without a space kept in a message; longer ones (pasted values) are shortened. */
    static final int LONGEST_WORD = 80;
    /** Longest message kept. */
    static final int LONGEST_MESSAGE = 2000;

    /**
     * The problem with a message a person can read on one screen line or a few: a value of a million
     * characters quoted in a message is shortened to its start and "…".
     */
    static Problem readable(Problem p) {
        String m = p.message();
        if (m.length() <= LONGEST_WORD) {
            return p;
        }
        StringBuilder b = new StringBuilder(Math.min(m.length(), LONGEST_MESSAGE + 1));
        int run = 0;
        for (int i = 0; i < m.length() && b.length() < LONGEST_MESSAGE; i++) {
            char c = m.charAt(i);
            run = Character.isWhitespace(c) ? 0 : run + 1;
            if (run < LONGEST_WORD) {
                b.append(c);
            } else if (run == LONGEST_WORD) {
                if (Character.isHighSurrogate(b.charAt(b.length() - 1))) {
                    b.setLength(b.length() - 1);
                }
                b.append('…');
            }
        }
        if (b.length() >= LONGEST_MESSAGE) {
            b.append('…');
        }
        String shorter = b.toString();
        return shorter.equals(m) ? p : new Problem(p.severity(), p.kind(), p.location(), p.objectId(), shorter, p.where());
    }

    boolean hasErrors() {
        return errors;
    }

    /** True if a problem was already reported at {@code pointer} or inside it. */
    boolean reportedAtOrUnder(String pointer) {
        return reached.contains(pointer);
    }

    List<Problem> all() {
        return List.copyOf(list);
    }
}
