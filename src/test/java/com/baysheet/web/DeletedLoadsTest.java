package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.store.DeletedItem;
import com.baysheet.store.Editor;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.Map;
import java.util.TreeMap;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * Line and point loads deleted through the API are kept for 30 days as those deleted from the pages are, and restored
 * with the same members and records; a restore whose label another load has taken since is refused, storing nothing.
 */
class DeletedLoadsTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private static long project() { return server.alderId(); }

    private static String api(String kind) { return "/api/projects/" + project() + "/levels/" + server.levelId(project(), "Level 1") + "/" + kind; }

    private static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    private static JsonNode add(String kind, String body) throws Exception {
        HttpResponse<String> r = server.json("POST", api(kind), "{\"version\": " + server.version(project()) + ", " + body + "}");
        assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
        return json(r).get("saved");
    }

    private static DeletedItem kept(String kind, String label) {
        return server.store.deleted().list().stream().filter(i -> i.kind().equals(kind) && i.label().contains(label)).findFirst().orElseThrow();
    }

    @Test
    void loadsDeletedThroughTheApiAreKeptAndRestoredWithTheSameRecords() throws Exception {
        JsonNode wallSaved = add("line-loads", "\"line\": 1, \"from\": \"A\", \"to\": \"D\", \"label\": \"West wall\", \"deadPressure\": 40, \"height\": 14");
        JsonNode hoist = add("point-loads", "\"label\": \"Hoist\", \"line\": \"A\", \"from\": \"2\", \"to\": \"1\", \"distance\": 10, "
                + "\"dead\": 500, \"live\": 1000, \"liveOccupancy\": \"office\"");
        long wallId = wallSaved.get("id").asLong();
        Map<String, String> before = records();

        assertThat(server.json("DELETE", api("line-loads") + "/" + wallId + "?version=" + server.version(project()), null).statusCode()).isEqualTo(200);
        assertThat(server.json("DELETE", api("point-loads") + "/" + hoist.get("id").asLong() + "?version=" + server.version(project()), null)
                .statusCode()).isEqualTo(200);
        assertThat(records()).isNotEqualTo(before);
        DeletedItem wall = kept(DeletedItem.LINE_LOAD, "West wall"), point = kept(DeletedItem.POINT_LOAD, "Hoist");
        assertThat(wall.label()).startsWith("Line load West wall on Level 1, ");
        assertThat(point.label()).startsWith("Point load Hoist on Level 1, ");

        server.store.deleted().restore(Editor.DEMO, wall.id());
        server.store.deleted().restore(Editor.DEMO, point.id());
        assertThat(records()).as("the same members, ids and records").isEqualTo(before);
        assertThat(server.store.deleted().list()).noneMatch(i -> i.id() == wall.id() || i.id() == point.id());
    }

    @Test
    void aLoadDeletedOnItsPageIsKeptTooAndARestoreWhoseLabelIsTakenIsRefused() throws Exception {
        JsonNode saved = add("point-loads", "\"label\": \"Tank\", \"line\": \"A\", \"from\": \"2\", \"to\": \"1\", \"distance\": 5, \"dead\": 800");
        String delete = server.levelPage(project(), "Level 1", "point-loads") + "/" + saved.get("id").asLong() + "/delete";
        assertThat(server.post(delete, server.versioned(project(), entry("confirm", "yes"))).statusCode()).isEqualTo(303);
        DeletedItem item = kept(DeletedItem.POINT_LOAD, "Tank");
        add("point-loads", "\"label\": \"Tank\", \"line\": \"A\", \"from\": \"1\", \"to\": \"2\", \"distance\": 3, \"dead\": 200");
        long version = server.version(project());
        assertThatThrownBy(() -> server.store.deleted().restore(Editor.DEMO, item.id()))
                .hasMessageContaining("cannot be restored").hasMessageContaining("already the label");
        assertThat(server.version(project())).isEqualTo(version);
        assertThat(server.store.deleted().list()).anyMatch(i -> i.id() == item.id());
    }

    private static Map<String, String> records() {
        var d = server.store.results().of(project()).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), RecordJson.write(m.result().record()) + " | " + m.name() + " " + m.areas());
        for (TakeDown t : d.takeDowns()) out.put("takedown " + t.id(), RecordJson.write(t.record()));
        return out;
    }
}
