package org.baywright.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/**
 * Writes JSON documents built by the engine and the CLI as plain trees (maps with insertion order,
 * lists, strings, numbers, booleans). The only place outside plan files where Jackson is used, so
 * that the rest of the code base does not depend on it.
 */
public final class JsonText {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS);

    private JsonText() {
    }

    /**
     * Serialises a tree. Non-finite numbers are written as {@code null}, since JSON has no NaN or
     * infinity.
     */
    public static String write(Object tree) {
        try {
            return MAPPER.writeValueAsString(sanitize(tree)) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON: " + e.getOriginalMessage(), e);
        }
    }

    private static Object sanitize(Object o) {
        if (o instanceof Double d && !Double.isFinite(d)) {
            return null;
        }
        if (o instanceof java.util.Map<?, ?> m) {
            java.util.LinkedHashMap<Object, Object> out = new java.util.LinkedHashMap<>();
            m.forEach((k, v) -> out.put(k, sanitize(v)));
            return out;
        }
        if (o instanceof java.util.List<?> l) {
            return l.stream().map(JsonText::sanitize).toList();
        }
        return o;
    }
}
