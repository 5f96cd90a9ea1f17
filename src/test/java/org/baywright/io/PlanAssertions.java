package org.baywright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.lang.reflect.RecordComponent;
import java.util.List;
import java.util.Optional;

/** Compares plans value by value, doubles to a relative tolerance, naming the first difference. */
final class PlanAssertions {
    private PlanAssertions() {
    }

    static void assertClose(Object expected, Object actual, double relative) {
        compare(expected, actual, relative, "plan");
    }

    private static void compare(Object e, Object a, double tol, String path) {
        if (e == null || a == null) {
            assertEquals(e, a, path);
        } else if (e instanceof Double d) {
            double x = (Double) a;
            // NaN stands for "not given" (a damping ratio, a slab weight): the same on both sides
            if (!(Math.abs(d - x) <= tol * Math.abs(d)) && !(Double.isNaN(d) && Double.isNaN(x))) {
                fail(path + ": expected " + d + " but was " + x);
            }
        } else if (e instanceof Record r) {
            assertEquals(r.getClass(), a.getClass(), path);
            for (RecordComponent c : r.getClass().getRecordComponents()) {
                try {
                    compare(c.getAccessor().invoke(r), c.getAccessor().invoke(a), tol, path + "." + c.getName());
                } catch (ReflectiveOperationException ex) {
                    throw new AssertionError(ex);
                }
            }
        } else if (e instanceof List<?> l) {
            List<?> m = (List<?>) a;
            assertEquals(l.size(), m.size(), path + " size");
            for (int i = 0; i < l.size(); i++) {
                compare(l.get(i), m.get(i), tol, path + "[" + i + "]");
            }
        } else if (e instanceof Optional<?> o) {
            Optional<?> p = (Optional<?>) a;
            assertEquals(o.isPresent(), p.isPresent(), path + " present");
            if (o.isPresent()) {
                compare(o.get(), p.get(), tol, path);
            }
        } else {
            assertEquals(e, a, path);
        }
    }
}
