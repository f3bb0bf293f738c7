package com.baysheet.engine.reduction;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The floor reduction methods a project may choose instead of its edition's own, read once from the
 * {@code floorMethods} block of engine/editions.json. A project that chooses none (null or "") uses its edition's.
 */
public final class FloorMethods {
    private static final FloorMethods BUILT_IN = load("/engine/editions.json");

    private final Map<String, MethodData> byId;

    private FloorMethods(Map<String, MethodData> byId) { this.byId = byId; }

    public static FloorMethods builtIn() { return BUILT_IN; }

    public List<MethodData> all() { return List.copyOf(byId.values()); }

    /** The data sets written for this unit system, in the data's order. */
    public List<MethodData> forUnits(UnitSystem system) {
        List<MethodData> out = new ArrayList<>();
        for (MethodData m : byId.values()) if (m.supports(system)) out.add(m);
        return out;
    }

    public boolean has(String id) { return byId.containsKey(id); }

    public MethodData get(String id) {
        MethodData m = byId.get(id);
        if (m == null) throw new InputError("floorMethod", id, "is not a known floor reduction method (" + String.join(", ", byId.keySet()) + ")");
        return m;
    }

    /**
     * Checks a project's choice against its unit system: null or blank is the edition's own method, always allowed.
     *
     * @return the id, or null for the edition's own
     */
    public String validate(String id, UnitSystem system) {
        if (id == null || id.isBlank()) return null;
        MethodData m = get(id.trim());
        if (!m.supports(system))
            throw new InputError("floorMethod", id, "is written for " + m.units().stream().map(Enum::name).sorted().toList()
                    + " projects only; this project is " + system);
        return m.id();
    }

    static FloorMethods load(String resource) {
        try (InputStream in = FloorMethods.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("missing resource " + resource);
            JsonNode root = new ObjectMapper().readTree(in);
            Map<String, MethodData> byId = new LinkedHashMap<>();
            for (JsonNode m : root.path("floorMethods")) {
                MethodData d = parse(m);
                if (byId.put(d.id(), d) != null) throw new IllegalStateException("floor method " + d.id() + " given twice");
            }
            return new FloorMethods(byId);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static MethodData parse(JsonNode m) {
        List<UnitSystem> units = new ArrayList<>();
        for (JsonNode u : m.get("units")) units.add(UnitSystem.valueOf(u.asText()));
        Map<String, Double> constants = new LinkedHashMap<>();
        m.get("constants").fields().forEachRemaining(f -> constants.put(f.getKey(), f.getValue().asDouble()));
        return MethodData.of(m.get("id").asText(), m.get("method").asText(), m.get("standard").asText(), m.get("title").asText(),
                units, strings(m.get("clauses")), strings(m.path("standards")), strings(m.get("confidence")), constants,
                strings(m.path("categories")), set(m.path("reducible")), set(m.path("floorCategories")));
    }

    private static Map<String, String> strings(JsonNode n) {
        Map<String, String> out = new LinkedHashMap<>();
        n.fields().forEachRemaining(f -> out.put(f.getKey(), f.getValue().asText()));
        return out;
    }

    private static Set<String> set(JsonNode n) {
        Set<String> out = new LinkedHashSet<>();
        for (JsonNode v : n) out.add(v.asText());
        return out;
    }
}
