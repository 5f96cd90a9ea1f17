package org.baywright.ui;

import java.util.Arrays;
import java.util.List;

/**
 * What each of the canvas's layers was last drawn from, so that a layer is drawn again only when one of
 * its inputs (the view and the canvas size among them) has changed.
 */
final class LayerMemo {
    private final Object[] drawnFrom;

    LayerMemo(int layers) {
        drawnFrom = new Object[layers];
    }

    /** True, and remembered, when a layer's inputs differ from those it was last drawn from. */
    boolean fresh(int layer, Object... inputs) {
        List<Object> key = Arrays.asList(inputs.clone());
        if (key.equals(drawnFrom[layer])) {
            return false;
        }
        drawnFrom[layer] = key;
        return true;
    }

    /** An input compared by identity (a plan, a run and a picture are values too large to compare on every redraw). */
    static Object id(Object o) {
        return new Id(o);
    }

    private record Id(Object o) {
        @Override
        public boolean equals(Object x) {
            return x instanceof Id i && i.o == o;
        }

        @Override
        public int hashCode() {
            return System.identityHashCode(o);
        }
    }
}
