package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.http.Context;

/** JSON in and out of the API, with the deterministic mapper of calculation records. */
final class Json {
    private Json() {}

    static void send(Context ctx, int status, Object body) {
        ctx.status(status).contentType("application/json; charset=utf-8").result(RecordJson.write(body));
    }

    static void send(Context ctx, Object body) { send(ctx, 200, body); }

    /** The request body as a JSON object; malformed JSON is the caller's mistake, a 400. */
    static JsonNode body(Context ctx) {
        try {
            JsonNode n = RecordJson.mapper().readTree(ctx.body());
            if (n == null || !n.isObject()) throw new InputError("body", n == null ? "nothing" : n.getNodeType(), "must be a JSON object");
            return n;
        } catch (JsonProcessingException e) {
            throw new InputError("body", "JSON", "is not valid JSON: " + e.getOriginalMessage());
        }
    }
}
