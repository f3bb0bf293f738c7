package com.baysheet.engine.code;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the tables of an edition's snow block (editions.json, {@code snow.<edition id>}). */
final class SnowReader {
    private SnowReader() {}

    static SnowData tables(JsonNode snow) {
        Map<String, Map<String, Double>> exposure = new LinkedHashMap<>();
        snow.get("exposure").fields().forEachRemaining(f -> exposure.put(f.getKey(), Editions.numbers(f.getValue())));
        List<SnowData.SlopeCurve> curves = new ArrayList<>();
        for (JsonNode c : snow.get("slopeCurves"))
            curves.add(new SnowData.SlopeCurve(c.get("ct").asDouble(), c.get("slippery").asDouble(), c.get("other").asDouble()));
        return new SnowData(null, exposure, Editions.numbers(snow.get("thermal")), Editions.numbers(snow.get("importance")), curves);
    }
}
