package com.baysheet.engine;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Reading one JSON object of user input (an API body, a member description for the command line, demo data):
 * each value by its path (support.span, strips[0].width), so that every refusal is an {@link InputError} naming
 * the field the user wrote. A value that is absent and a value that is null are the same: not given.
 */
public final class JsonFields {
    private final JsonNode node;
    private final String path;

    private JsonFields(JsonNode node, String path) {
        if (node == null || !node.isObject()) throw new InputError(name(path), node == null || node.isMissingNode() ? "nothing" : node.toString(), "must be an object");
        this.node = node;
        this.path = path;
    }

    /** An object whose other fields are ignored (the API takes back what it sent, ids and versions included). */
    public static JsonFields of(JsonNode node) { return new JsonFields(node, ""); }

    /** An object at {@code path} in which a field not in {@code allowed} is refused, never ignored. */
    public static JsonFields strict(JsonNode node, String path, Set<String> allowed) {
        JsonFields f = new JsonFields(node, path);
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String n = it.next();
            if (!allowed.contains(n))
                throw new InputError(f.child(n), n, "is not a known field (known: " + String.join(", ", allowed.stream().sorted().toList()) + ")");
        }
        return f;
    }

    /** The field's name as the user wrote it: its path in the input. */
    public String child(String f) { return path.isEmpty() ? f : path + "." + f; }

    public boolean has(String f) { return node.hasNonNull(f); }

    /** The raw value, null where absent. */
    public JsonNode node(String f) { return node.get(f); }

    /** A nested object, whose fields are named by their path below this one; other fields are ignored. */
    public JsonFields object(String f) { return new JsonFields(node.get(f), child(f)); }

    public double number(String f) {
        JsonNode v = required(f);
        if (!v.isNumber()) throw new InputError(child(f), v.toString(), "must be a number");
        return v.doubleValue();
    }

    public double number(String f, double otherwise) { return has(f) ? number(f) : otherwise; }

    /** An integer that fits an int: 2, not 2.0 or 1.5 (never rounded), not 2^40 (which would wrap). */
    public int integer(String f) {
        JsonNode v = required(f);
        if (!v.isIntegralNumber() || !v.canConvertToInt())
            throw new InputError(child(f), v.toString(), "must be a whole number");
        return v.intValue();
    }

    public int integer(String f, int otherwise) { return has(f) ? integer(f) : otherwise; }

    /** Required text: absent, null or blank is refused. */
    public String text(String f) {
        JsonNode v = required(f);
        if (!v.isTextual()) throw new InputError(child(f), v.toString(), "must be text");
        if (v.asText().isBlank()) throw new InputError(child(f), "\"\"", "is required");
        return v.asText();
    }

    /** Optional text, returned as given (blank included); {@code otherwise} where absent or null. */
    public String text(String f, String otherwise) {
        if (!has(f)) return otherwise;
        JsonNode v = node.get(f);
        if (!v.isTextual()) throw new InputError(child(f), v.toString(), "must be text");
        return v.asText();
    }

    public boolean flag(String f, boolean otherwise) {
        if (!has(f)) return otherwise;
        JsonNode v = node.get(f);
        if (!v.isBoolean()) throw new InputError(child(f), v.toString(), "must be true or false");
        return v.booleanValue();
    }

    /** The elements of an optional array field, empty when absent. */
    public Iterable<JsonNode> array(String f) {
        if (!has(f)) return List.of();
        JsonNode v = node.get(f);
        if (!v.isArray()) throw new InputError(child(f), v.toString(), "must be an array");
        return v;
    }

    /**
     * Builds an engine value, renaming the field of any refusal to its path in the input
     * (the engine says "width"; the user wrote strips[0].width).
     */
    public static <T> T at(String path, Supplier<T> build) {
        try {
            return build.get();
        } catch (InputError e) {
            if (e.field().startsWith(path)) throw e;
            String suffix = " (got " + e.value() + ")";
            String problem = e.problem().endsWith(suffix) ? e.problem().substring(0, e.problem().length() - suffix.length()) : e.problem();
            throw new InputError(path.isEmpty() ? e.field() : path + "." + e.field(), e.value(), problem);
        }
    }

    private JsonNode required(String f) {
        if (!has(f)) throw new InputError(child(f), "nothing", "is required");
        return node.get(f);
    }

    private static String name(String path) { return path.isEmpty() ? "input" : path; }
}
