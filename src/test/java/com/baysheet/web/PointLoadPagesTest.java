package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.store.StoredPointLoad;
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
 * A level's point loads on their page and through the API: the demo's rooftop unit listed, drawn on the plan and
 * shared onto the roof beams by the lever rule, a load entered in feet and inches, and bad entries refused beside
 * their field with nothing stored.
 */
class PointLoadPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project() { return server.alderId(); }

    static long level(String name) { return server.levelId(project(), name); }

    static String page(String level) { return server.levelPage(project(), level, "point-loads"); }

    static List<StoredPointLoad> loads(String level) { return server.store.pointLoads().findByLevel(project(), level(level)); }

    static List<Map.Entry<String, String>> inBay(String label, String x, String y, String dead) {
        return server.versioned(project(), entry("label", label),
                entry("placeBy", "bay"), entry("xLine", "1"), entry("yLine", "A"), entry("x", x), entry("y", y), entry("dead", dead));
    }

    static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    @Test
    void theDemoRooftopUnitIsListedDrawnAndSharedByTheLeverRule() throws Exception {
        assertThat(server.get(page("Roof")).body()).contains("RTU-1 rooftop unit", "bay A-B/3-4", "3.50 kip", "licensed engineer");
        assertThat(Html.texts(server.get("/projects/" + project() + "/plan?level=" + level("Roof")).body(), "g.point-load > title"))
                .contains("point load: RTU-1 rooftop unit");
        // roof beams along y at 7.5 ft in the 30 ft bay; x = 12 ft lies 4.5 ft past the beam at 7.5 ft: 0.4 of it there, 0.6 on the next
        boolean shared = false;
        for (JsonNode m : json(server.get("/api/projects/" + project() + "/members")))
            if (m.get("level").asText().equals("Roof")) {
                String body = server.get("/api/projects/" + project() + "/members/" + m.get("id").asText()).body();
                if (body.contains("RTU-1 rooftop unit: 0.600 of it by the lever rule")) shared = true;
            }
        assertThat(shared).isTrue();
    }

    @Test
    void aLoadEnteredInFeetAndInchesIsStored() {
        HttpResponse<String> r = server.post(page("Level 2"), inBay("Tank", "12'-6\"", "7'", "2000"));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(loads("Level 2")).anySatisfy(p -> {
            assertThat(p.label()).isEqualTo("Tank");
            assertThat(p.x()).isEqualTo(12.5);
            assertThat(p.y()).isEqualTo(7.0);
            assertThat(p.where()).isEqualTo("bay A-B/1-2");
        });
    }

    @Test
    void aLoadOutsideItsBayIsRefusedBesideTheFieldAndNothingIsStored() {
        int count = loads("Level 1").size();
        long version = server.version(project());
        HttpResponse<String> r = server.post(page("Level 1"), inBay("Safe", "31", "4", "900"));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-x")).contains("lies outside bay");
        assertThat(Html.text(server.post(page("Level 1"), inBay("Safe", "-2", "4", "900")).body(), "#error-x")).isNotBlank();
        assertThat(loads("Level 1")).hasSize(count);
        assertThat(server.version(project())).isEqualTo(version);
    }

    @Test
    void theApiAddsRefusesAndDeletesAPointLoadOnAMember() throws Exception {
        String api = "/api/projects/" + project() + "/levels/" + level("Level 1") + "/point-loads";
        long v = server.version(project());
        HttpResponse<String> off = server.json("POST", api, "{\"version\": " + v + ", \"label\": \"Hoist\", \"line\": \"A\","
                + " \"from\": \"1\", \"to\": \"2\", \"distance\": 45, \"dead\": 500}");
        assertThat(off.statusCode()).isEqualTo(400);
        assertThat(json(off).get("field").asText()).isEqualTo("distance");
        HttpResponse<String> ok = server.json("POST", api, "{\"version\": " + v + ", \"label\": \"Hoist\", \"line\": \"A\","
                + " \"from\": \"2\", \"to\": \"1\", \"distance\": 10, \"dead\": 500, \"live\": 1000, \"liveOccupancy\": \"office\"}");
        assertThat(ok.statusCode()).as(ok.body()).isEqualTo(201);
        JsonNode saved = json(ok).get("saved");
        assertThat(saved.get("where").asText()).isEqualTo("line A, from 2 toward 1");
        assertThat(saved.get("distance").asDouble()).isEqualTo(10.0);
        long id = saved.get("id").asLong(), after = json(ok).get("version").asLong();
        // a grid change that would remove a line the load is placed by is refused, naming the load
        HttpResponse<String> grid = server.json("PUT", "/api/projects/" + project() + "/grid", "{\"version\": " + after
                + ", \"x\": {\"names\": [\"1\", \"3\", \"4\", \"5\"], \"spacings\": [60, 30, 30]},"
                + " \"y\": {\"names\": [\"A\", \"B\", \"C\", \"D\"], \"spacings\": [28, 10, 28]}}");
        assertThat(grid.statusCode()).isEqualTo(400);
        assertThat(grid.body()).contains("grid line 2 cannot be removed: the point load").doesNotContain("Exception");
        assertThat(server.json("DELETE", api + "/" + id + "?version=" + after, null).statusCode()).isEqualTo(200);
        assertThat(json(server.get(api))).isEmpty();
    }
}
