package com.baysheet.engine.code;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The code editions the engine knows, read once from the resource engine/editions.json. */
public final class Editions {
    private static final Editions BUILT_IN = load("/engine/editions.json");

    private final Map<String, Edition> byId;
    private final String defaultId;

    private Editions(Map<String, Edition> byId, String defaultId) {
        this.byId = byId;
        this.defaultId = defaultId;
    }

    public static Editions builtIn() { return BUILT_IN; }

    public Edition get(String id) {
        Edition e = byId.get(id);
        if (e == null) throw Edition.unknown(id);
        return e;
    }

    public Edition byDefault() { return byId.get(defaultId); }

    public List<String> ids() { return List.copyOf(byId.keySet()); }

    static Editions load(String resource) {
        try (InputStream in = Editions.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("missing resource " + resource);
            JsonNode root = new ObjectMapper().readTree(in);
            Map<String, Edition> byId = new LinkedHashMap<>();
            JsonNode snow = root.path("snow");
            for (JsonNode e : root.get("editions")) {
                Edition ed = parse(e, snow.path(e.get("id").asText()));
                byId.put(ed.id(), ed);
            }
            return new Editions(byId, root.get("default").asText());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Edition parse(JsonNode e, JsonNode snow) {
        Map<MemberKind, Double> kll = new EnumMap<>(MemberKind.class);
        e.get("kll").fields().forEachRemaining(f -> kll.put(MemberKind.valueOf(f.getKey()), f.getValue().asDouble()));
        Map<String, String> clauses = strings(e.get("clauses")), confidence = strings(e.get("confidence"));
        Map<String, Double> constants = numbers(e.get("constants"));
        SnowData snowData = null;
        if (snow.has("unsupported")) snowData = SnowData.unsupported(snow.get("unsupported").asText());
        else if (!snow.isMissingNode()) {
            clauses.putAll(strings(snow.get("clauses")));
            confidence.putAll(strings(snow.get("confidence")));
            constants.putAll(numbers(snow.get("constants")));
            snowData = SnowReader.tables(snow);
        }
        return new Edition(e.get("id").asText(), e.get("floorMethod").asText(), clauses, confidence, kll, constants, snowData);
    }

    static Map<String, String> strings(JsonNode n) {
        Map<String, String> m = new LinkedHashMap<>();
        n.fields().forEachRemaining(f -> m.put(f.getKey(), f.getValue().asText()));
        return m;
    }

    static Map<String, Double> numbers(JsonNode n) {
        Map<String, Double> m = new LinkedHashMap<>();
        n.fields().forEachRemaining(f -> m.put(f.getKey(), f.getValue().asDouble()));
        return m;
    }
}
