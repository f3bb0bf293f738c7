package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.project.StoredLineLoad;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * A level's line loads on their page and through the API: the demo's south cladding shown with its weight per
 * area and height, a wall added, bad entries refused beside their field with nothing stored, and a deletion
 * that needs its confirmation.
 */
class LineLoadPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project() { return server.alderId(); }

    static long level(String name) { return server.levelId(project(), name); }

    static String page(String level) { return server.levelPage(project(), level, "line-loads"); }

    static List<StoredLineLoad> loads(String level) { return server.store.lineLoads().findByLevel(project(), level(level)); }

    static List<Map.Entry<String, String>> wall(String line, String from, String to, String dead) {
        return server.versioned(project(), entry("label", "Core wall"),
                entry("line", line), entry("from", from), entry("to", to), entry("deadBy", "length"), entry("dead", dead));
    }

    static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    @Test
    void theDemoCladdingIsListedWithItsWeightPerAreaAndHeight() {
        String body = server.get(page("Level 2")).body();
        // 15 psf × 13 ft = 195 plf
        assertThat(String.join(" | ", Html.texts(body, "tbody td"))).contains("South cladding", "A, 1-5", "195 plf", "15.0 psf", "13.0 ft");
        assertThat(Html.shown(body)).contains("licensed engineer", "Add a line load");
        assertThat(Html.texts(server.get("/projects/" + project() + "/levels/" + level("Level 2") + "/bays").body(), "a"))
                .contains("Line loads of this level");
    }

    @Test
    void theFramingPlanDrawsTheCladdingAlongItsLineWithItsLabel() {
        String plan = server.get("/projects/" + project() + "/plan?level=" + level("Level 2")).body();
        assertThat(Html.texts(plan, "svg g.line-load > title")).contains("line load: South cladding");
        assertThat(Html.texts(plan, "svg text")).contains("South cladding");
        assertThat(server.get("/projects/" + project() + "/plan?level=" + level("Level 3")).body()).doesNotContain("South cladding");
    }

    @Test
    void aWallAddedOnTheFormIsStoredAndCarriedByTheMembersBeneath() throws Exception {
        long before = server.version(project());
        HttpResponse<String> r = server.post(page("Level 3"), wall("3", "A", "B", "400"));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(loads("Level 3")).singleElement().satisfies(l -> {
            assertThat(l.segment()).isEqualTo("3, A-B");
            assertThat(l.dead()).isEqualTo(400.0);
            assertThat(l.cladding()).isFalse();
        });
        assertThat(server.version(project())).isEqualTo(before + 1);
        assertThat(String.join(" | ", Html.texts(server.get(page("Level 3")).body(), "tbody td"))).contains("Core wall", "400 plf");
        JsonNode members = json(server.get("/api/projects/" + project() + "/members"));
        // some member of Level 3 lists the wall among its record's inputs, as a line load of its own
        List<String> lineInputs = new ArrayList<>();
        for (JsonNode m : members)
            if (m.get("level").asText().equals("Level 3"))
                for (JsonNode in : json(server.get("/api/projects/" + project() + "/members/" + m.get("id").asText())).path("record").path("inputs"))
                    if (in.path("key").asText().startsWith("lineLoad[")) lineInputs.add(in.path("shown").asText());
        assertThat(lineInputs).anySatisfy(shown -> assertThat(shown).startsWith("Core wall: dead 400 plf"));
    }

    @Test
    void badEntriesAreRefusedBesideTheirFieldAndNothingIsStored() {
        int count = loads("Roof").size();
        long version = server.version(project());
        Map<String, List<Map.Entry<String, String>>> cases = Map.of(
                "line", wall("Z", "1", "2", "300"),
                "from", wall("A", "9", "2", "300"),
                "dead", wall("A", "1", "2", "-300"));
        for (var c : cases.entrySet()) {
            HttpResponse<String> r = server.post(page("Roof"), c.getValue());
            assertThat(r.statusCode()).as(c.getKey()).isEqualTo(422);
            assertThat(Html.text(r.body(), "#error-" + c.getKey())).as(c.getKey()).isNotBlank();
            assertThat(Html.shown(r.body())).as(c.getKey()).contains("Nothing was saved");
        }
        List<Map.Entry<String, String>> cladding = wall("A", "1", "2", "");
        cladding.removeIf(e -> e.getKey().equals("deadBy") || e.getKey().equals("dead"));
        cladding.addAll(List.of(entry("deadBy", "pressure"), entry("deadPressure", "12"), entry("height", "-4")));
        assertThat(Html.text(server.post(page("Roof"), cladding).body(), "#error-height")).isNotBlank();
        assertThat(loads("Roof")).hasSize(count);
        assertThat(server.version(project())).isEqualTo(version);
    }

    @Test
    void aLoadWithNoMemberBeneathIsRefusedNamingTheLine() {
        // Level 2's bay 4-5/B-C is the stair opening: no floor, so nothing spans line 5 from B to C
        int count = loads("Level 2").size();
        HttpResponse<String> r = server.post(page("Level 2"), wall("5", "B", "C", "300"));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-line")).contains("no member at Level 2 along 5/B-C");
        assertThat(loads("Level 2")).hasSize(count);
    }

    @Test
    void theApiAddsRefusesAndDeletesWithTheVersion() throws Exception {
        String api = "/api/projects/" + project() + "/levels/" + level("Level 1") + "/line-loads";
        long v = server.version(project());
        HttpResponse<String> bad = server.json("POST", api, "{\"version\": " + v + ", \"line\": 1, \"from\": \"A\", \"to\": \"D\","
                + " \"label\": \"West wall\", \"deadPressure\": 40, \"height\": -14}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(json(bad).get("field").asText()).isEqualTo("height");
        HttpResponse<String> both = server.json("POST", api, "{\"version\": " + v + ", \"line\": 1, \"from\": \"A\", \"to\": \"D\","
                + " \"label\": \"West wall\", \"dead\": 300, \"deadPressure\": 40, \"height\": 14}");
        assertThat(json(both).get("field").asText()).isEqualTo("dead");
        HttpResponse<String> ok = server.json("POST", api, "{\"version\": " + v + ", \"line\": 1, \"from\": \"A\", \"to\": \"D\","
                + " \"label\": \"West wall\", \"deadPressure\": 40, \"height\": 14, \"live\": 20, \"liveOccupancy\": \"office\"}");
        assertThat(ok.statusCode()).as(ok.body()).isEqualTo(201);
        JsonNode saved = json(ok).get("saved");
        // 40 psf × 14 ft = 560 plf
        assertThat(saved.get("dead").asDouble()).isEqualTo(560.0);
        assertThat(saved.get("deadPressure").asDouble()).isEqualTo(40.0);
        assertThat(saved.get("line").asText() + saved.get("from").asText() + saved.get("to").asText()).isEqualTo("1AD");
        assertThat(json(server.get(api))).hasSize(1);
        long id = saved.get("id").asLong(), after = json(ok).get("version").asLong();
        assertThat(server.json("DELETE", api + "/" + id + "?version=" + v, null).statusCode()).isEqualTo(409);
        assertThat(server.json("DELETE", api + "/" + id + "?version=" + after, null).statusCode()).isEqualTo(200);
        assertThat(json(server.get(api))).isEmpty();
    }

    @Test
    void deletingOnThePageNeedsTheConfirmation() {
        List<Map.Entry<String, String>> parapet = wall("D", "1", "5", "150");
        parapet.set(1, entry("label", "North parapet"));
        assertThat(server.post(page("Roof"), parapet).statusCode()).isEqualTo(303);
        StoredLineLoad demo = loads("Roof").stream().filter(l -> l.label().equals("North parapet")).findFirst().orElseThrow();
        String delete = page("Roof") + "/" + demo.id() + "/delete";
        // the list leads to the confirmation page, which names the load and carries confirm=yes
        assertThat(Html.one(server.get(page("Roof")).body(), "#line-load-" + demo.id() + " a[href$=/delete]").attr("href")).isEqualTo(delete);
        String confirm = server.get(delete).body();
        assertThat(Html.text(confirm, "#what-goes")).contains("North parapet (D, 1-5)").contains("Roof");
        assertThat(Html.one(confirm, "form[action$=/delete] input[name=confirm]").val()).isEqualTo("yes");
        HttpResponse<String> unconfirmed = server.post(delete, server.versioned(project()));
        assertThat(unconfirmed.statusCode()).isEqualTo(400);
        assertThat(Html.shown(unconfirmed.body())).contains("confirm").contains("must be yes");
        assertThat(loads("Roof")).contains(demo);
        HttpResponse<String> confirmed = server.post(delete, server.versioned(project(), entry("confirm", "yes")));
        assertThat(confirmed.statusCode()).isEqualTo(303);
        assertThat(loads("Roof")).doesNotContain(demo);
    }
}
