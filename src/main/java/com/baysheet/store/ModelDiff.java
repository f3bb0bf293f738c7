package com.baysheet.store;

import com.baysheet.project.Model;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/**
 * What a change did to a project's model, for its audit entry: the model before and after as JSON trees
 * (project settings, the levels as entered, and the building), compared leaf by leaf, each difference written
 * {@code path: old → new} ({@code levels[2].name: "L3" → "Level 3"}), at most {@link #MAX_CHANGES} of
 * them and then how many more. Version numbers and times are left out: the entry states them already.
 */
final class ModelDiff {
    static final int MAX_CHANGES = 12;
    private static final int MAX_VALUE = 80;
    private static final Set<String> SKIPPED = Set.of("version", "updatedAt", "createdAt", "catalogueVersion", "firmVersion");
    private static final ObjectMapper JSON = new ObjectMapper().disable(SerializationFeature.FAIL_ON_EMPTY_BEANS);

    private ModelDiff() {}

    /** The differences, or "" when the model is the same (a change of nothing but its version). */
    static String between(Model before, Model after) {
        try {
            return listed(before, after);
        } catch (IllegalArgumentException e) {
            // a model Jackson cannot write must not stop the save it describes: the entry says the list is missing
            return "changed: (differences not listed: " + e.getMessage() + ")";
        }
    }

    private static String listed(Model before, Model after) {
        List<String> out = new ArrayList<>();
        int[] total = {0};
        walk("project", tree(before.project()), tree(after.project()), out, total);
        walk("levels", tree(before.levels()), tree(after.levels()), out, total);
        walk("building", building(before.building(), after.building()), building(after.building(), before.building()), out, total);
        if (total[0] == 0) return "";
        return "changed: " + String.join("; ", out) + (total[0] > out.size() ? "; and " + (total[0] - out.size()) + " more" : "");
    }

    private static JsonNode tree(Object o) {
        return JSON.valueToTree(o);
    }

    /**
     * {@code b}'s tree as {@link #tree} writes it, but each level equal to {@code other}'s level at its place written as
     * a placeholder that compares equal: an edit of one level of a tall building writes only that level's bays.
     */
    private static JsonNode building(Building b, Building other) {
        ObjectNode t = WITHOUT_LEVELS.valueToTree(b);
        ArrayNode levels = t.putArray("levels");
        for (int k = 0; k < b.levels().size(); k++) {
            Level l = b.levels().get(k);
            levels.add(k < other.levels().size() && l.equals(other.levels().get(k)) ? SAME : JSON.valueToTree(l));
        }
        return t;
    }

    /** A building written without its levels (added one by one by {@link #building}). */
    @JsonIgnoreProperties("levels")
    private abstract static class NoLevels {}

    private static final ObjectMapper WITHOUT_LEVELS = JSON.copy().addMixIn(Building.class, NoLevels.class);
    private static final JsonNode SAME = JSON.getNodeFactory().textNode("(same level)");

    private static void walk(String path, JsonNode a, JsonNode b, List<String> out, int[] total) {
        if (a != null && b != null && a.equals(b)) return;
        if (a != null && b != null && a.isObject() && b.isObject()) {
            Set<String> names = new TreeSet<>();
            a.fieldNames().forEachRemaining(names::add);
            b.fieldNames().forEachRemaining(names::add);
            for (String n : names)
                if (!SKIPPED.contains(n)) walk(path + "." + n, a.get(n), b.get(n), out, total);
            return;
        }
        if (a != null && b != null && a.isArray() && b.isArray()) {
            for (int i = 0; i < Math.max(a.size(), b.size()); i++) walk(path + "[" + i + "]", a.get(i), b.get(i), out, total);
            return;
        }
        total[0]++;
        if (out.size() < MAX_CHANGES) out.add(path + ": " + shown(a) + " → " + shown(b));
    }

    private static String shown(JsonNode n) {
        if (n == null || n.isMissingNode()) return "(none)";
        String s = n.toString();
        return s.length() > MAX_VALUE ? s.substring(0, MAX_VALUE) + "…" : s;
    }
}
