package com.baysheet.web;

import com.fasterxml.jackson.databind.JsonNode;
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
        // the demo project states its own self weights: start from the firm's defaults
        server.store.selfWeights().set(com.baysheet.store.Editor.DEMO, project(), server.version(project()), null);
        String settings = "/projects/" + project() + "/settings";
        assertThat(server.get(settings).body()).contains("Self weight of the members", "takes the firm", "licensed engineer");
        assertThat(member("GIRDER")).doesNotContain("project value for girders");
        String v = String.valueOf(server.version(project()));
        HttpResponse<String> partial = server.post("/projects/" + project() + "/self-weights",
                List.of(entry("version", v), entry("swInfillBeam", "30")));
        assertThat(partial.statusCode()).isEqualTo(422);
        assertThat(Html.text(partial.body(), "#error-swGirder")).contains("give all four");
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

    @Test
    void aMembersOwnWeightIsEnteredOnItsPageRefusedWhenNegativeAndClearedWhenBlank() {
        String id = server.store.results().of(project()).derived().members().stream()
                .filter(m -> m.role().name().equals("INFILL_BEAM")).findFirst().orElseThrow().id();
        String page = "/projects/" + project() + "/members/" + id, post = page + "/weight";
        assertThat(Html.one(server.get(page).body(), "#own-weight-form").attr("action")).isEqualTo(post);
        String v = String.valueOf(server.version(project()));
        HttpResponse<String> negative = server.post(post, List.of(entry("version", v), entry("ownWeight", "-5")));
        assertThat(negative.statusCode()).isEqualTo(422);
        assertThat(Html.text(negative.body(), "#error-ownWeight")).contains("0 or more");
        assertThat(Html.field(negative.body(), "ownWeight")).isEqualTo("-5");
        assertThat(server.store.selfWeights().members(project())).isEmpty();
        assertThat(server.post(post, List.of(entry("version", v), entry("ownWeight", "85"))).statusCode()).isEqualTo(303);
        assertThat(server.store.selfWeights().members(project())).containsEntry(id, 85.0);
        assertThat(Html.text(server.get(page).body(), "#weight-now")).contains("85", "entered for this member");
        // the API's record says where the weight came from on its self-weight step, as the page does
        assertThat(ownWeightSteps(id)).singleElement().asString().endsWith("(entered for this member)");
        // the form's version is now stale: another save in between is refused, nothing changes
        assertThat(server.post(post, List.of(entry("version", v), entry("ownWeight", "95"))).statusCode()).isEqualTo(409);
        assertThat(server.store.selfWeights().members(project())).containsEntry(id, 85.0);
        HttpResponse<String> cleared = server.post(post, List.of(entry("version", String.valueOf(server.version(project()))),
                entry("ownWeight", "")));
        assertThat(cleared.statusCode()).isEqualTo(303);
        assertThat(server.store.selfWeights().members(project())).isEmpty();
        assertThat(Html.text(server.get(page).body(), "#weight-now")).contains("for infill beams").doesNotContain("entered for this member");
    }

    @Test
    void theApiListsTheWeightsAndSetsAMembersOwnRefusingABadValueNamingTheField() throws Exception {
        String id = server.store.results().of(project()).derived().members().stream()
                .filter(m -> m.role().name().equals("COLUMN")).findFirst().orElseThrow().id();
        String at = "/api/projects/" + project() + "/members/" + id + "/weight";
        long v = server.version(project());
        HttpResponse<String> bad = server.json("PUT", at, "{\"version\": " + v + ", \"ownWeight\": \"heavy\"}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(JsonBody.of(bad).path("field").asText()).isEqualTo("ownWeight");
        HttpResponse<String> ok = server.json("PUT", at, "{\"version\": " + v + ", \"ownWeight\": 150}");
        assertThat(ok.statusCode()).isEqualTo(200);
        JsonNode listed = JsonBody.of(server.get("/api/projects/" + project() + "/self-weights"));
        assertThat(listed.path("members").path(id).asDouble()).isEqualTo(150.0);
        assertThat(listed.path("units").asText()).isEqualTo("plf");
        assertThat(server.json("PUT", at, "{\"version\": " + server.version(project()) + ", \"ownWeight\": null}").statusCode()).isEqualTo(200);
        assertThat(server.store.selfWeights().members(project())).isEmpty();
    }

    /** The descriptions of the self-weight steps ({@code w_sw}, or {@code P_sw} on a column) of a member's record, as the API gives it. */
    private List<String> ownWeightSteps(String memberId) {
        List<String> out = new java.util.ArrayList<>();
        for (JsonNode step : JsonBody.of(server.get("/api/projects/" + project() + "/members/" + memberId)).path("record").path("steps"))
            if (List.of("w_sw", "P_sw").contains(step.path("symbol").asText())) out.add(step.path("description").asText());
        return out;
    }
}
