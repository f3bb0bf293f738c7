package com.baysheet.web;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** A project's own self weights on its settings page override the firm's defaults, and every sheet says which it took. */
class SelfWeightPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project() { return server.alderId(); }

    static String member(String role) {
        for (var m : server.store.results().of(project()).derived().members())
            if (m.role().name().equals(role)) return server.get("/api/projects/" + project() + "/members/" + m.id()).body();
        throw new AssertionError(role);
    }

    @Test
    void projectValuesOverrideTheFirmDefaultsAndTheSheetsSaySo() {
        String settings = "/projects/" + project() + "/settings";
        assertThat(server.get(settings).body()).contains("Self weight of the members", "takes the firm", "licensed engineer");
        assertThat(member("GIRDER")).doesNotContain("project value for girders");
        String v = String.valueOf(server.version(project()));
        HttpResponse<String> partial = server.post("/projects/" + project() + "/self-weights",
                List.of(entry("version", v), entry("swInfillBeam", "30")));
        assertThat(partial.statusCode()).isEqualTo(422);
        assertThat(partial.body()).contains("id=\"error-swGirder\"", "give all four");
        assertThat(server.store.selfWeights().find(project())).isEmpty();
        HttpResponse<String> ok = server.post("/projects/" + project() + "/self-weights", List.of(entry("version", v),
                entry("swInfillBeam", "30"), entry("swGridBeam", "35"), entry("swGirder", "90"), entry("swColumn", "120")));
        assertThat(ok.statusCode()).isEqualTo(303);
        assertThat(server.get(settings).body()).contains("states its own self weights");
        assertThat(member("GIRDER")).contains("project value for girders");
        assertThat(member("COLUMN")).contains("project value for columns");
        // all four blank: back to the firm's defaults
        HttpResponse<String> back = server.post("/projects/" + project() + "/self-weights", List.of(entry("version",
                String.valueOf(server.version(project()))), entry("swInfillBeam", ""), entry("swGridBeam", ""), entry("swGirder", ""), entry("swColumn", "")));
        assertThat(back.statusCode()).isEqualTo(303);
        assertThat(server.store.selfWeights().find(project())).isEmpty();
        assertThat(member("GIRDER")).doesNotContain("project value");
    }
}
