package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;

import java.net.http.HttpResponse;

/**
 * Reading a JSON answer as JSON, with the API's own mapper: a test asserts on a field found by its path, where a
 * substring of the text would also match the same words in another field, an error message or a nested object.
 */
public final class JsonBody {
    private JsonBody() {}

    public static JsonNode of(String json) {
        try {
            return RecordJson.mapper().readTree(json);
        } catch (JsonProcessingException e) {
            throw new AssertionError("not JSON: " + e.getOriginalMessage() + " in " + json, e);
        }
    }

    public static JsonNode of(HttpResponse<String> r) {
        return of(r.body());
    }
}
