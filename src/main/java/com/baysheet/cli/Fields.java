package com.baysheet.cli;

import com.baysheet.engine.InputError;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.Iterator;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Reading one JSON object of a member description: each value by its path (support.span, strips[0].width),
 * so that every refusal names the field the user wrote. Unknown fields are refused, never ignored.
 */
final class Fields {
    private final JsonNode node;
    private final String path;

    Fields(JsonNode node, String path, Set<String> allowed) {
        if (node == null || !node.isObject()) throw new InputError(name(path), node == null ? "nothing" : node.toString(), "must be an object");
        this.node = node;
        this.path = path;
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String f = it.next();
            if (!allowed.contains(f)) throw new InputError(child(f), f, "is not a known field (known: " + String.join(", ", sorted(allowed)) + ")");
        }
    }

    String child(String f) { return path.isEmpty() ? f : path + "." + f; }

    boolean has(String f) { return node.hasNonNull(f); }

    JsonNode node(String f) { return node.get(f); }

    double number(String f) {
        JsonNode v = node.get(f);
        if (v == null || v.isNull()) throw new InputError(child(f), "nothing", "is required");
        if (!v.isNumber()) throw new InputError(child(f), v.toString(), "must be a number");
        return v.doubleValue();
    }

    double number(String f, double otherwise) { return has(f) ? number(f) : otherwise; }

    int integer(String f, int otherwise) {
        if (!has(f)) return otherwise;
        JsonNode v = node.get(f);
        if (!v.canConvertToExactIntegral() || !v.isNumber()) throw new InputError(child(f), v.toString(), "must be a whole number");
        return v.intValue();
    }

    String text(String f) {
        JsonNode v = node.get(f);
        if (v == null || v.isNull()) throw new InputError(child(f), "nothing", "is required");
        if (!v.isTextual()) throw new InputError(child(f), v.toString(), "must be text");
        return v.asText();
    }

    String text(String f, String otherwise) { return has(f) ? text(f) : otherwise; }

    boolean flag(String f, boolean otherwise) {
        if (!has(f)) return otherwise;
        JsonNode v = node.get(f);
        if (!v.isBoolean()) throw new InputError(child(f), v.toString(), "must be true or false");
        return v.booleanValue();
    }

    /** The elements of an optional array field, empty when absent. */
    Iterable<JsonNode> array(String f) {
        if (!has(f)) return java.util.List.of();
        JsonNode v = node.get(f);
        if (!v.isArray()) throw new InputError(child(f), v.toString(), "must be an array");
        return v;
    }

    /**
     * Builds an engine value, renaming the field of any refusal to its path in the input
     * (the engine says "width"; the user wrote strips[0].width).
     */
    static <T> T at(String path, Supplier<T> build) {
        try {
            return build.get();
        } catch (InputError e) {
            if (e.field().startsWith(path)) throw e;
            String suffix = " (got " + e.value() + ")";
            String problem = e.problem().endsWith(suffix) ? e.problem().substring(0, e.problem().length() - suffix.length()) : e.problem();
            throw new InputError(path.isEmpty() ? e.field() : path + "." + e.field(), e.value(), problem);
        }
    }

    private static String name(String path) { return path.isEmpty() ? "input" : path; }

    private static java.util.List<String> sorted(Set<String> s) { return s.stream().sorted().toList(); }
}
