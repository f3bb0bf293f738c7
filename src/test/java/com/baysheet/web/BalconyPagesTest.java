package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.model.Bay;
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
 * The occupancy of a bay's cantilever slabs in the bay editor and the API: shown (the default being the
 * balcony serving the bay's occupancy), editable, and an unknown id refused beside its field with nothing saved.
 * The demo's Level 3 assembly room has a 6 ft cantilever balcony on its north side (cells 0,2 and 1,2).
 */
class BalconyPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static long project() { return server.alderId(); }

    static long level(String name) { return server.levelId(project(), name); }

    static String bays(String level) { return server.levelPage(project(), level, "bays"); }

    static List<Map.Entry<String, String>> assembly(String cantileverOccupancy) {
        List<Map.Entry<String, String>> f = server.versioned(project(), entry("cells", "0,2"), entry("cells", "1,2"),
                entry("action", "assign"), entry("occupancy", "assembly-movable-seats"),
                entry("deadLoad", "70"), entry("beams", "Y"), entry("infillBeams", "2"), entry("cantilevers.north", "6"));
        f.add(entry("cantileverOccupancy", cantileverOccupancy));
        return f;
    }

    static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    @Test
    void theEditorShowsTheCantileverOccupancyWithTheBalconyAsDefault() {
        String page = server.get(bays("Level 3")).body();
        assertThat(Html.text(page, "label[for=cantileverOccupancy]")).isEqualTo("Occupancy of the cantilever slabs");
        org.jsoup.nodes.Element choice = Html.one(page, "select#cantileverOccupancy");
        assertThat(choice.selectFirst("option[selected]").val()).isEmpty();
        assertThat(choice.selectFirst("option[selected]").text()).startsWith("Balcony or deck serving the bay");
        assertThat(choice.select("option").eachAttr("value")).contains("balcony:office");
        assertThat(choice.select("option").eachText()).contains("Balcony or deck serving Offices — 75.0 psf");
        assertThat(Html.shown(page)).contains("cantilever north 6.00 ft (Balcony or deck serving Assembly: movable seats)", "licensed engineer");
        assertThat(Html.all(page, "[data-cantilever-occupancy]")).isEmpty();
    }

    @Test
    void anEnclosedCantileverIsGivenItsOwnOccupancyAndAnUnknownOneIsRefused() {
        long v = server.version(project());
        HttpResponse<String> bad = server.post(bays("Level 3"), assembly("ballroom"));
        assertThat(bad.statusCode()).isEqualTo(422);
        assertThat(Html.text(bad.body(), "#error-cantileverOccupancy")).contains("is not in the occupancy catalogue");
        assertThat(Html.shown(bad.body())).contains("Nothing was saved");
        assertThat(bad.body()).doesNotContain("Exception");
        assertThat(server.version(project())).isEqualTo(v);
        assertThat(server.store.bays().findByLevel(project(), level("Level 3"))).allMatch(b -> b.cantileverOccupancy() == null);

        HttpResponse<String> ok = server.post(bays("Level 3"), assembly("office"));
        assertThat(ok.statusCode()).as(ok.body()).isEqualTo(303);
        List<Bay> stored = server.store.bays().findByLevel(project(), level("Level 3"));
        assertThat(stored).filteredOn(b -> !b.cantilevers().isEmpty()).hasSize(2).allMatch(b -> "office".equals(b.cantileverOccupancy()));
        String after = server.get(bays("Level 3")).body();
        assertThat(Html.all(after, "[data-cantilever-occupancy]").eachAttr("data-cantilever-occupancy")).isNotEmpty().containsOnly("office");
        assertThat(Html.shown(after)).contains("cantilever north 6.00 ft (Offices)");

        // back to the default: the blank choice stores NULL
        assertThat(server.post(bays("Level 3"), assembly("")).statusCode()).isEqualTo(303);
        assertThat(server.store.bays().findByLevel(project(), level("Level 3"))).allMatch(b -> b.cantileverOccupancy() == null);
    }

    @Test
    void theApiReadsAndWritesTheCantileverOccupancyAndRefusesAnUnknownOne() throws Exception {
        String at = "/api/projects/" + project() + "/levels/" + level("Level 2") + "/bays";
        String body = ", \"cells\": [[0, 0]], \"occupancy\": \"office\", \"deadLoad\": 65, \"beams\": \"Y\", \"infillBeams\": 2,"
                + " \"cantilevers\": {\"south\": 5}";
        long v = server.version(project());
        HttpResponse<String> bad = server.json("POST", at, "{\"version\": " + v + body + ", \"cantileverOccupancy\": \"ballroom\"}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(json(bad).get("field").asText()).isEqualTo("cantileverOccupancy");
        assertThat(json(bad).get("value").asText()).isEqualTo("ballroom");
        assertThat(server.version(project())).isEqualTo(v);

        HttpResponse<String> byDefault = server.json("POST", at, "{\"version\": " + v + body + "}");
        assertThat(byDefault.statusCode()).isEqualTo(200);
        JsonNode saved = json(byDefault).get("saved").get(0);
        assertThat(saved.get("cantileverOccupancy").isNull()).isTrue();
        // the edge member along the south slab carries balcony area and says so, citing the load table
        JsonNode members = json(server.get("/api/projects/" + project() + "/members?level=Level+2"));
        String edge = null;
        for (JsonNode m : members) if (m.get("areas").has("balcony:office")) edge = m.get("id").asText();
        assertThat(edge).isNotNull();
        JsonNode notes = json(server.get("/api/projects/" + project() + "/members/" + edge)).get("record").get("notes");
        assertThat(notes).anySatisfy(n -> {
            assertThat(n.path("text").asText()).startsWith("Balcony or deck serving Offices: L0 = ");
            assertThat(n.path("clause").path("ref").asText()).isEqualTo("Table 4.3-1");
        });

        HttpResponse<String> given = server.json("POST", at, "{\"version\": " + json(byDefault).get("version").asLong() + body
                + ", \"cantileverOccupancy\": \"balcony:retail-upper\"}");
        assertThat(given.statusCode()).isEqualTo(200);
        assertThat(json(given).get("saved").get(0).get("cantileverOccupancy").asText()).isEqualTo("balcony:retail-upper");
        JsonNode listed = json(server.get(at));
        List<String> atOrigin = new ArrayList<>();
        for (JsonNode bay : listed)
            if (bay.path("col").asInt() == 0 && bay.path("row").asInt() == 0) atOrigin.add(bay.path("cantileverOccupancy").asText());
        assertThat(atOrigin).as("the bay at column 0, row 0 as listed").containsExactly("balcony:retail-upper");
    }
}
