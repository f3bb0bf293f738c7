package com.baysheet.engine.record;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.MapperFeature;

/**
 * Deterministic JSON of a record: record components in declaration order, map keys sorted,
 * doubles in Java's shortest round-trip form. The same record always gives the same text.
 */
public final class RecordJson {
    private RecordJson() {}

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .build();

    public static String write(Object record) {
        try {
            return MAPPER.writeValueAsString(record);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("record not serializable", e);
        }
    }

    public static ObjectMapper mapper() { return MAPPER; }
}
