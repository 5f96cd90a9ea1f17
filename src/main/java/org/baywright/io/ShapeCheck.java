package org.baywright.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;

/**
 * The first reading stage: checks a JSON tree against the document records of {@link PlanDocument}
 * (keys, required keys, JSON types, number ranges), reporting every mismatch as a located problem, and
 * returns a cleaned copy that binds to those records without error: unknown keys are dropped, values
 * of the wrong type become absent ({@code null} inside lists, so list positions and pointers stay
 * right). The meaning of the values (units, ranges, references) is checked by {@link PlanAssembler}.
 */
final class ShapeCheck {
    /** Larger plain numbers are refused: no dimensionless value of a plan comes near. */
    static final double HUGE = 1e15;

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final Problems problems;

    ShapeCheck(Problems problems) {
        this.problems = problems;
    }

    /**
     * Checks the file's root object (without its {@code format} and {@code version}, checked before)
     * against {@code type}; returns the cleaned tree.
     */
    ObjectNode root(ObjectNode root, Class<? extends Record> type) {
        ObjectNode checked = record(root, type, "", "", "");
        return checked == null ? NODES.objectNode() : checked;
    }

    /** A cleaned copy of {@code node}, or null when it is not of {@code type} (reported). */
    private JsonNode value(JsonNode node, Type type, String pointer, String label, Dimension quantity, String id) {
        if (type instanceof ParameterizedType p && p.getRawType() == List.class) {
            return list(node, p.getActualTypeArguments()[0], pointer, label, quantity, id);
        }
        if (type instanceof Class<?> c && c.isRecord()) {
            @SuppressWarnings("unchecked")
            Class<? extends Record> r = (Class<? extends Record>) c;
            return record(node, r, pointer, label, id);
        }
        if (type == String.class) {
            if (node.isTextual()) {
                return node;
            }
            if (quantity != null && node.isNumber()) {
                problems.error("wrong-type", pointer, id, label + ": a quantity is text with its unit, not the bare number "
                        + node.asText() + "; use " + Quantities.accepted(quantity));
            } else {
                wrongType(pointer, id, label, quantity != null ? "text with a unit (" + Quantities.accepted(quantity) + ")"
                        : "text in quotes", node);
            }
            return null;
        }
        if (type == Integer.class) {
            if (node.isIntegralNumber() && node.canConvertToInt()) {
                return node;
            }
            if (node.isIntegralNumber()) {
                problems.error("out-of-range", pointer, id, label + ": " + clip(node.asText()) + " is far too large");
            } else {
                wrongType(pointer, id, label, "a whole number", node);
            }
            return null;
        }
        if (type == Double.class) {
            if (!node.isNumber()) {
                wrongType(pointer, id, label, "a plain number", node);
                return null;
            }
            double d = node.doubleValue();
            if (!Double.isFinite(d) || Math.abs(d) > HUGE) {
                problems.error("out-of-range", pointer, id, label + ": " + clip(node.asText())
                        + " is far too large; numbers must be finite and at most 1e15 in size");
                return null;
            }
            return NODES.numberNode(d);
        }
        if (type == Boolean.class) {
            if (node.isBoolean()) {
                return node;
            }
            wrongType(pointer, id, label, "true or false", node);
            return null;
        }
        throw new IllegalStateException("no JSON shape for " + type);
    }

    private ArrayNode list(JsonNode node, Type element, String pointer, String label, Dimension quantity, String id) {
        if (!node.isArray()) {
            wrongType(pointer, id, label, listDescription(element, quantity), node);
            return null;
        }
        ArrayNode out = NODES.arrayNode(node.size());
        for (int i = 0; i < node.size(); i++) {
            JsonNode e = node.get(i);
            String p = Pointers.child(pointer, i);
            String l = label + "[" + i + "]";
            JsonNode c;
            if (e.isNull()) {
                wrongType(p, id, l, elementDescription(element, quantity), e);
                c = null;
            } else {
                c = value(e, element, p, l, quantity, id);
            }
            out.add(c == null ? NODES.nullNode() : c);
        }
        return out;
    }

    private ObjectNode record(JsonNode node, Class<? extends Record> type, String pointer, String label, String parentId) {
        Shape shape = SHAPES.get(type);
        String what = shape.phrase;
        if (!node.isObject()) {
            wrongType(pointer, parentId, label.isEmpty() ? "the file" : label, "an object { … } (" + what + ")", node);
            return null;
        }
        String id = identity(node, type, parentId, pointer);
        RecordComponent[] components = shape.components;
        List<String> names = shape.names;
        for (Map.Entry<String, JsonNode> field : node.properties()) {
            String key = field.getKey();
            if (!names.contains(key) && !(type == PlanDocument.PlanDoc.class && isCheckedEarlier(key))) {
                String hint = closest(key, names);
                problems.error("unknown-field", Pointers.child(pointer, key), id, "unknown field \"" + clip(key) + "\" in "
                        + what + (hint == null ? "" : " (did you mean \"" + hint + "\"?)") + "; the fields of "
                        + what + " are " + String.join(", ", names));
            }
        }
        ObjectNode out = NODES.objectNode();
        for (RecordComponent c : components) {
            String key = c.getName();
            if (type == PlanDocument.PlanDoc.class && isCheckedEarlier(key)) {
                continue;
            }
            JsonNode v = node.get(key);
            String p = Pointers.child(pointer, key);
            if (v == null || v.isNull()) {
                if (c.isAnnotationPresent(PlanDocument.Required.class)) {
                    problems.error("missing-field", p, id, "missing required field \"" + key + "\" of " + what
                            + (v == null ? "" : " (it is null)"));
                }
                continue;
            }
            PlanDocument.QuantityOf q = c.getAnnotation(PlanDocument.QuantityOf.class);
            JsonNode checked = value(v, c.getGenericType(), p, key, q == null ? null : q.value(), id);
            if (checked != null) {
                out.set(key, checked);
            }
        }
        return out;
    }

    /** What is known of a document record's type, worked out once: plans can hold many thousands of objects. */
    private record Shape(String phrase, RecordComponent[] components, List<String> names) {
    }

    private static final ClassValue<Shape> SHAPES = new ClassValue<>() {
        @Override
        protected Shape computeValue(Class<?> type) {
            RecordComponent[] components = type.getRecordComponents();
            List<String> names = new ArrayList<>();
            for (RecordComponent c : components) {
                names.add(c.getName());
            }
            return new Shape(phrase(type), components, List.copyOf(names));
        }
    };

    private static boolean isCheckedEarlier(String key) {
        return key.equals("format") || key.equals("version");
    }

    /** The id an object is known by in messages: its id, a grid line's label or a level's name. */
    private static String identity(JsonNode node, Class<?> type, String parentId, String pointer) {
        if (pointer.isEmpty() || !pointer.substring(pointer.lastIndexOf('/') + 1).chars().allMatch(Character::isDigit)) {
            return parentId; // not an item of a list
        }
        String key = type == PlanDocument.GridLineDoc.class ? "label" : type == PlanDocument.LevelDoc.class ? "name" : "id";
        JsonNode v = node.get(key);
        return v != null && v.isTextual() && !v.asText().isBlank() ? v.asText() : parentId;
    }

    private void wrongType(String pointer, String id, String label, String expected, JsonNode got) {
        problems.error("wrong-type", pointer, id, label + ": expected " + expected + ", got " + describe(got));
    }

    private static String listDescription(Type element, Dimension quantity) {
        if (quantity != null && element == String.class) {
            return "a point [x, y] of two lengths, e.g. [\"0ft\", \"30ft\"]";
        }
        if (quantity != null) {
            return "a list of points [[x, y], …], e.g. [[\"0ft\", \"0ft\"], [\"30ft\", \"0ft\"], [\"30ft\", \"20ft\"]]";
        }
        return element == String.class ? "a list of text values [\"…\", …]" : "a list [ … ] of objects";
    }

    private static String elementDescription(Type element, Dimension quantity) {
        if (element == String.class) {
            return quantity != null ? "text with a unit (" + Quantities.accepted(quantity) + ")" : "text in quotes";
        }
        if (quantity != null) {
            return "a point [x, y]";
        }
        return element instanceof Class<?> c && c.isRecord() ? "an object { … }" : "a value";
    }

    static String describe(JsonNode v) {
        if (v.isTextual()) {
            return "\"" + clip(v.asText()) + "\"";
        }
        if (v.isNumber()) {
            return "the number " + clip(v.asText());
        }
        if (v.isBoolean()) {
            return v.asText();
        }
        if (v.isArray()) {
            return "a list";
        }
        if (v.isObject()) {
            return "an object";
        }
        return "null";
    }

    /** Long text shortened for messages. */
    static String clip(String s) {
        return s.length() <= 60 ? s : s.substring(0, 57) + "…";
    }

    /** "MemberDoc" → "member", "AreaLoadDoc" → "area load". */
    static String noun(Class<?> type) {
        String n = type.getSimpleName().replaceFirst("Doc$", "");
        return n.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
    }

    /** How messages name an object of a document record: "a member", "the settings". */
    static String phrase(Class<?> type) {
        if (type == PlanDocument.PlanDoc.class) {
            return "the plan";
        }
        if (type == PlanDocument.SettingsDoc.class) {
            return "the settings";
        }
        if (type == PlanDocument.DeflectionDoc.class) {
            return "the deflection limits";
        }
        return article(noun(type));
    }

    static String article(String noun) {
        return ("aeiou".indexOf(noun.charAt(0)) >= 0 ? "an " : "a ") + noun;
    }

    /** The allowed name closest to a mistyped one (case or up to two edits), or null. */
    static String closest(String key, List<String> names) {
        String best = null;
        int bestDistance = 3;
        for (String n : names) {
            int d = n.equalsIgnoreCase(key) ? 0 : distance(key.toLowerCase(Locale.ROOT), n.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = n;
                bestDistance = d;
            }
        }
        return best;
    }

    private static int distance(String a, String b) {
        if (Math.abs(a.length() - b.length()) > 2 || a.length() > 100) {
            return Integer.MAX_VALUE;
        }
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
