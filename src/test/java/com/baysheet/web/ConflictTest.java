package com.baysheet.web;

import com.baysheet.project.StoredLevel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** Two people editing the same project: the second save, based on the old version, is refused and overwrites nothing. */
class ConflictTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void aFormPostedOverAStaleVersionIsRefusedWithAClearMessage() {
        long p = server.alder().id();
        StoredLevel roof = server.store.levels().findByProject(p).stream().filter(l -> l.name().equals("Roof")).findFirst().orElseThrow();
        String opened = String.valueOf(server.version(p));
        HttpResponse<String> first = server.post("/projects/" + p + "/levels/" + roof.id(), List.of(entry("version", opened),
                entry("name", "Roof"), entry("elevation", "41"), entry("roof", "on"), entry("roofSlope", "0.5")));
        assertThat(first.statusCode()).isEqualTo(303);
        HttpResponse<String> second = server.post("/projects/" + p + "/levels/" + roof.id(), List.of(entry("version", opened),
                entry("name", "Roof"), entry("elevation", "44"), entry("roof", "on"), entry("roofSlope", "0.25")));
        assertThat(second.statusCode()).isEqualTo(409);
        assertThat(Html.shown(second.body())).contains("Not saved", "changed by another save");
        assertThat(Html.field(second.body(), "elevation")).isEqualTo("44");
        assertThat(server.store.levels().find(p, roof.id()).info().elevation()).isEqualTo(41);
        assertThat(server.store.levels().find(p, roof.id()).info().roofSlope()).isEqualTo(0.5);
    }

    @Test
    void anApiChangeOverAStaleVersionIsA409() {
        long p = server.deck().id();
        long v = server.version(p);
        String level = "{\"version\": %d, \"name\": \"Upper deck\", \"elevation\": 7.2}";
        HttpResponse<String> ok = server.json("POST", "/api/projects/" + p + "/levels", level.formatted(v));
        assertThat(ok.statusCode()).isEqualTo(201);
        HttpResponse<String> stale = server.json("POST", "/api/projects/" + p + "/levels", level.replace("Upper", "Top").formatted(v));
        assertThat(stale.statusCode()).isEqualTo(409);
        assertThat(JsonBody.of(stale).path("field").asText()).isEqualTo("version");
        assertThat(JsonBody.of(stale).path("error").asText()).contains("changed by another save");
        assertThat(server.store.levels().findByProject(p)).extracting(StoredLevel::name).containsExactly("Deck", "Upper deck");
    }
}
