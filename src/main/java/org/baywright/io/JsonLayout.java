package org.baywright.io;

import com.fasterxml.jackson.core.io.JsonStringEncoder;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.Iterator;
import java.util.Map;

/**
 * Lays out a JSON tree as the text of a plan file: two-space indentation, keys in the tree's order,
 * {@code "\n"} line ends on every platform, and a value kept on one line when that line stays within
 * {@value #WIDTH} characters (points, short objects), otherwise one member per line. Numbers are
 * written by {@link Numbers#format}. The layout depends only on the tree, so equal trees give equal
 * bytes.
 */
final class JsonLayout {
    static final int WIDTH = 100;
    private static final String INDENT = "  ";

    private JsonLayout() {
    }

    static String write(JsonNode root) {
        StringBuilder b = new StringBuilder();
        expanded(b, root, 0);
        return b.append('\n').toString();
    }

    private static void value(StringBuilder b, JsonNode n, int depth, int lineSoFar) {
        if (n.isContainerNode() && !n.isEmpty()) {
            int start = b.length();
            if (!compact(b, n, start + WIDTH - lineSoFar - 1)) {
                b.setLength(start); // too long for one line: lay it out over several
                expanded(b, n, depth);
            }
        } else {
            b.append(compact(n));
        }
    }

    /**
     * Appends the one-line form of {@code n}, giving up (false) as soon as the text would pass
     * position {@code end} of {@code b}: a large list is not written out whole only to be found too long.
     */
    private static boolean compact(StringBuilder b, JsonNode n, int end) {
        if (n.isObject()) {
            b.append('{');
            Iterator<Map.Entry<String, JsonNode>> it = n.properties().iterator();
            while (it.hasNext() && b.length() <= end) {
                Map.Entry<String, JsonNode> e = it.next();
                b.append(string(e.getKey())).append(": ");
                if (!compact(b, e.getValue(), end)) {
                    return false;
                }
                if (it.hasNext()) {
                    b.append(", ");
                }
            }
            return b.append('}').length() <= end;
        }
        if (n.isArray()) {
            b.append('[');
            for (int i = 0; i < n.size() && b.length() <= end; i++) {
                b.append(i > 0 ? ", " : "");
                if (!compact(b, n.get(i), end)) {
                    return false;
                }
            }
            return b.append(']').length() <= end;
        }
        return b.append(compact(n)).length() <= end;
    }

    private static void expanded(StringBuilder b, JsonNode n, int depth) {
        if (!n.isContainerNode() || n.isEmpty()) {
            b.append(compact(n));
            return;
        }
        String inner = INDENT.repeat(depth + 1);
        boolean object = n.isObject();
        b.append(object ? '{' : '[').append('\n');
        if (object) {
            Iterator<Map.Entry<String, JsonNode>> it = n.properties().iterator();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                String key = string(e.getKey()) + ": ";
                b.append(inner).append(key);
                value(b, e.getValue(), depth + 1, inner.length() + key.length());
                b.append(it.hasNext() ? ",\n" : "\n");
            }
        } else {
            for (int i = 0; i < n.size(); i++) {
                b.append(inner);
                value(b, n.get(i), depth + 1, inner.length());
                b.append(i + 1 < n.size() ? ",\n" : "\n");
            }
        }
        b.append(INDENT.repeat(depth)).append(object ? '}' : ']');
    }

    /** The value on one line: {@code {"a": 1, "b": ["x", "y"]}}. */
    static String compact(JsonNode n) {
        if (n.isObject()) {
            StringBuilder b = new StringBuilder("{");
            Iterator<Map.Entry<String, JsonNode>> it = n.properties().iterator();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                b.append(string(e.getKey())).append(": ").append(compact(e.getValue()));
                if (it.hasNext()) {
                    b.append(", ");
                }
            }
            return b.append('}').toString();
        }
        if (n.isArray()) {
            StringBuilder b = new StringBuilder("[");
            for (int i = 0; i < n.size(); i++) {
                b.append(i > 0 ? ", " : "").append(compact(n.get(i)));
            }
            return b.append(']').toString();
        }
        if (n.isTextual()) {
            return string(n.asText());
        }
        if (n.isIntegralNumber()) {
            return n.asText();
        }
        if (n.isNumber()) {
            return Numbers.format(n.doubleValue());
        }
        if (n.isBoolean() || n.isNull()) {
            return n.asText();
        }
        throw new IllegalArgumentException("cannot lay out a " + n.getNodeType() + " node");
    }

    private static String string(String s) {
        return "\"" + new String(JsonStringEncoder.getInstance().quoteAsString(s)) + "\"";
    }
}
