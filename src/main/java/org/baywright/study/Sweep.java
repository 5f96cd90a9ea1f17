package org.baywright.study;

import java.util.List;

/** One parameter of a study and the values it takes, in order. */
public record Sweep(Parameter parameter, List<Setting> values) {
    public Sweep {
        values = List.copyOf(values);
        if (values.isEmpty()) {
            throw new IllegalArgumentException(parameter.key() + ": no values");
        }
        for (Setting s : values) {
            if (s.parameter() != parameter) {
                throw new IllegalArgumentException(parameter.key() + ": a value of " + s.parameter().key() + " in its list");
            }
        }
    }
}
