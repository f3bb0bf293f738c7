package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;

import static org.assertj.core.api.Assertions.assertThat;

/** The JSON API: a project entered from nothing to member records, with the same validation as the forms. */
class ApiTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    @Test
    void aProjectEnteredThroughTheApiDerivesMembersWithRecords() throws Exception {
        HttpResponse<String> created = server.json("POST", "/api/projects",
                "{\"jobNumber\": \"25-301\", \"name\": \"Heron Yard Studio\", \"units\": \"US\"}");
        assertThat(created.statusCode()).isEqualTo(201);
        long id = json(created).get("id").asLong();
        long v = json(created).get("version").asLong();
        HttpResponse<String> grid = server.json("PUT", "/api/projects/" + id + "/grid", "{\"version\": " + v
                + ", \"x\": {\"names\": [\"1\", \"2\", \"3\"], \"spacings\": [24, 24]}, \"y\": {\"names\": [\"A\", \"B\"], \"spacings\": [20]}}");
        assertThat(grid.statusCode()).isEqualTo(200);
        v = json(grid).get("version").asLong();
        HttpResponse<String> level = server.json("POST", "/api/projects/" + id + "/levels", "{\"version\": " + v
                + ", \"name\": \"Level 2\", \"elevation\": 12}");
        long levelId = json(level).get("saved").get("id").asLong();
        v = json(level).get("version").asLong();
        HttpResponse<String> bays = server.json("POST", "/api/projects/" + id + "/levels/" + levelId + "/bays", "{\"version\": " + v
                + ", \"cols\": [0, 1], \"rows\": [0, 0], \"occupancy\": \"office\", \"deadLoad\": 60, \"beams\": \"Y\", \"infillBeams\": 2,"
                + " \"cantilevers\": {\"south\": 5}}");
        assertThat(bays.statusCode()).isEqualTo(200);
        assertThat(json(bays).get("saved")).hasSize(2);
        assertThat(json(bays).get("saved").get(0).get("cantilevers").get("south").asDouble()).isEqualTo(5);

        JsonNode members = json(server.get("/api/projects/" + id + "/members?role=GIRDER"));
        assertThat(members.size()).isPositive();
        String memberId = members.get(0).get("id").asText();
        JsonNode detail = json(server.get("/api/projects/" + id + "/members/" + memberId));
        assertThat(detail.get("member").get("role").asText()).isEqualTo("GIRDER");
        // the mark it is calculated under: the same as its sheet's, a girder's G prefix
        var computed = server.store.results().of(id);
        assertThat(detail.get("mark").asText()).startsWith("G").isNotEqualTo(memberId)
                .isEqualTo(server.store.marks().of(id, computed.derived()).label(memberId));
        assertThat(detail.get("record").get("steps").size()).isPositive();
        assertThat(json(server.get("/api/projects/" + id + "/takedowns")).size())
                .isEqualTo(server.store.results().of(id).derived().takeDowns().size()).isPositive();
        JsonNode stacks = json(server.get("/api/projects/" + id + "/takedowns"));
        JsonNode one = json(server.get("/api/projects/" + id + "/takedowns/" + stacks.get(0).get("id").asText()));
        assertThat(one.get("rows").get(0).get("level").asText()).isEqualTo("Level 2");
        assertThat(one.get("record").get("steps").size()).isPositive();
        assertThat(json(server.get("/api/projects/" + id)).get("levels").get(0).get("name").asText()).isEqualTo("Level 2");
    }

    @Test
    void mistakesAre400sNamingTheFieldAndTheValue() throws Exception {
        long p = server.alder().id();
        long level = server.store.levels().findByProject(p).get(1).id();
        long v = server.version(p);
        HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels/" + level + "/bays",
                "{\"version\": " + v + ", \"cells\": [[0, 0]], \"occupancy\": \"office\", \"deadLoad\": -4, \"beams\": \"Y\", \"infillBeams\": 1}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("bay.deadLoad");
        assertThat(json(r).get("value").asText()).isEqualTo("-4.0");
        HttpResponse<String> text = server.json("POST", "/api/projects/" + p + "/levels", "{\"version\": " + v + ", \"name\": \"X\", \"elevation\": \"high\"}");
        assertThat(text.statusCode()).isEqualTo(400);
        assertThat(json(text).get("field").asText()).isEqualTo("elevation");
        HttpResponse<String> bad = server.json("POST", "/api/projects", "{not json");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(json(bad).get("field").asText()).isEqualTo("body");
        assertThat(server.version(p)).isEqualTo(v);
    }

    @Test
    void theUpliftOptionIsAProjectFieldOfTheApi() throws Exception {
        HttpResponse<String> created = server.json("POST", "/api/projects",
                "{\"jobNumber\": \"25-302\", \"name\": \"Kestrel Dock\", \"units\": \"US\", \"upliftReducedDead\": true}");
        assertThat(created.statusCode()).isEqualTo(201);
        assertThat(json(created).get("info").get("upliftReducedDead").asBoolean()).isTrue();
        long id = json(created).get("id").asLong();
        HttpResponse<String> off = server.json("PUT", "/api/projects/" + id, "{\"version\": " + json(created).get("version").asLong()
                + ", \"jobNumber\": \"25-302\", \"name\": \"Kestrel Dock\", \"units\": \"US\"}");
        assertThat(off.statusCode()).isEqualTo(200);
        assertThat(json(off).get("info").get("upliftReducedDead").asBoolean()).isFalse();
        HttpResponse<String> bad = server.json("POST", "/api/projects",
                "{\"jobNumber\": \"25-303\", \"name\": \"Kestrel Dock 2\", \"units\": \"US\", \"upliftReducedDead\": \"yes\"}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(json(bad).get("field").asText()).isEqualTo("upliftReducedDead");
    }

    @Test
    void unknownIdsAre404sInJson() throws Exception {
        HttpResponse<String> r = server.get("/api/projects/" + server.alder().id() + "/members/nope");
        assertThat(r.statusCode()).isEqualTo(404);
        assertThat(json(r).get("error").asText()).contains("no member nope");
        assertThat(server.get("/api/projects/424242").statusCode()).isEqualTo(404);
    }

    @Test
    void recordJsonIsTheEngineRecordUnchanged() {
        var m = server.store.results().of(server.deck().id()).derived().members().get(0);
        String body = server.get("/api/projects/" + server.deck().id() + "/members/" + m.id() + "/record").body();
        assertThat(body).isEqualTo(RecordJson.write(m.result().record()));
    }
}
