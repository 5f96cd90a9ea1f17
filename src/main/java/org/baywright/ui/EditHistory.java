package org.baywright.ui;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;
import java.util.Optional;

/**
 * Undo and redo over immutable states (plans are values, so an edit is the next value). Each step keeps
 * a short label ("Infill bay B–C/2–3") for the Edit menu. The oldest steps are dropped beyond the limit.
 *
 * @param <T> the state type, immutable
 */
final class EditHistory<T> {
    private record Step<T>(T state, String label) {
    }

    private final int limit;
    private final Deque<Step<T>> undo = new ArrayDeque<>();
    private final Deque<Step<T>> redo = new ArrayDeque<>();
    private T current;

    EditHistory(int limit) {
        if (limit < 1) {
            throw new IllegalArgumentException("the undo limit must be at least 1");
        }
        this.limit = limit;
    }

    /** Starts over from a state (a plan just opened): nothing to undo or redo. */
    void reset(T state) {
        undo.clear();
        redo.clear();
        current = state;
    }

    /** Records an edit that led from the current state to {@code next}. */
    void push(T next, String label) {
        Objects.requireNonNull(next, "next");
        undo.push(new Step<>(current, label));
        while (undo.size() > limit) {
            undo.removeLast();
        }
        redo.clear();
        current = next;
    }

    /** The state before the last edit, which becomes current; empty when there is nothing to undo. */
    Optional<T> undo() {
        Step<T> s = undo.poll();
        if (s == null) {
            return Optional.empty();
        }
        redo.push(new Step<>(current, s.label()));
        current = s.state();
        return Optional.of(current);
    }

    /** The state of the last undone edit, which becomes current; empty when there is nothing to redo. */
    Optional<T> redo() {
        Step<T> s = redo.poll();
        if (s == null) {
            return Optional.empty();
        }
        undo.push(new Step<>(current, s.label()));
        current = s.state();
        return Optional.of(current);
    }

    boolean canUndo() {
        return !undo.isEmpty();
    }

    boolean canRedo() {
        return !redo.isEmpty();
    }

    /** Label of the edit undo would revert, or empty. */
    String undoLabel() {
        return undo.isEmpty() ? "" : undo.peek().label();
    }

    /** Label of the edit redo would repeat, or empty. */
    String redoLabel() {
        return redo.isEmpty() ? "" : redo.peek().label();
    }

    T current() {
        return current;
    }
}
