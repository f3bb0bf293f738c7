package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Typical levels on the level pages and through the API: a level made the same as another shows that level's
 * bays and says where to edit them, repeating adds linked levels, a refusal is shown beside the levels with
 * nothing stored, and unlinking leaves the level its own bays.
 */
class TypicalPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private long project() { return server.deck().id(); }

    private long level(String name) { return server.levelId(project(), name); }

    private String path(String level, String action) { return "/projects/" + project() + "/levels/" + level(level) + "/" + action; }

    private List<Map.Entry<String, String>> version() { return List.of(entry("version", String.valueOf(server.version(project())))); }

    @Test
    void aLevelMadeTheSameShowsItsTypicalsBaysUntilUnlinked() {
        long p = server.alder().id();
        long l2 = server.levelId(p, "Level 2"), l3 = server.levelId(p, "Level 3");
        String base = "/projects/" + p + "/levels/";
        HttpResponse<String> r = server.post(base + l2 + "/typical", List.of(entry("version", String.valueOf(server.version(p))),
                entry("levels", String.valueOf(l3))));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.store.levels().find(p, l3).typicalOf()).isEqualTo(l2);
        assertThat(server.store.bays().findByLevel(p, l3)).isEqualTo(server.store.bays().findByLevel(p, l2));
        String bays = server.get(base + l3 + "/bays").body();
        assertThat(Html.text(bays, "#typical-note")).contains("the bays shown are that level");
        assertThat(Html.shown(bays)).contains("licensed engineer");
        assertThat(server.get("/projects/" + p + "/levels").body()).contains("same as Level 2");
        assertThat(Html.shown(server.get(base + l2 + "/edit").body())).contains("The same as this level: Level 3");

        // a bay edit on the linked level is refused beside the form, and nothing is stored
        long before = server.version(p);
        HttpResponse<String> edit = server.post(base + l3 + "/bays", List.of(entry("version", String.valueOf(before)),
                entry("cells", "0,0"), entry("action", "opening")));
        assertThat(edit.statusCode()).isEqualTo(422);
        assertThat(edit.body()).contains("edit the bays there");
        assertThat(server.version(p)).isEqualTo(before);

        assertThat(server.post(base + l3 + "/unlink", List.of(entry("version", String.valueOf(before)))).statusCode()).isEqualTo(303);
        assertThat(server.store.levels().find(p, l3).linked()).isFalse();
        assertThat(server.store.bays().findByLevel(p, l3)).isEqualTo(server.store.bays().findByLevel(p, l2));
    }

    @Test
    void aRefusedLinkIsShownBesideTheLevelsWithNothingStored() {
        long before = server.version(project());
        HttpResponse<String> self = server.post(path("Deck", "typical"), List.of(entry("version", String.valueOf(before)),
                entry("levels", String.valueOf(level("Deck")))));
        assertThat(self.statusCode()).isEqualTo(422);
        assertThat(self.body()).contains("cannot be the same as itself", "Nothing was saved");
        HttpResponse<String> none = server.post(path("Deck", "typical"), version());
        assertThat(none.statusCode()).isEqualTo(422);
        assertThat(none.body()).contains("tick at least one level");
        assertThat(server.post(path("Deck", "repeat"), List.of()).statusCode()).isEqualTo(422);
        assertThat(server.version(project())).isEqualTo(before);
    }

    @Test
    void theApiRepeatsATypicalAndReportsTheLinks() throws Exception {
        long p = project();
        String level = "/api/projects/" + p + "/levels/" + level("Deck");
        HttpResponse<String> r = server.json("POST", level + "/repeat",
                "{\"version\": " + server.version(p) + ", \"count\": 2, \"storeyHeight\": 3.2}");
        assertThat(r.statusCode()).isEqualTo(200);
        JsonNode levels = RecordJson.mapper().readTree(r.body()).get("saved");
        long linked = 0;
        for (JsonNode l : levels) if (l.get("typicalOf").asLong() == level("Deck")) linked++;
        assertThat(linked).isEqualTo(2);
        HttpResponse<String> bad = server.json("POST", level + "/copy", "{\"version\": " + server.version(p) + ", \"levels\": \"all\"}");
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(bad.body()).contains("levels");
    }
}
