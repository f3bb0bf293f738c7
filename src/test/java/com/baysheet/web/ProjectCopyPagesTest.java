package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** A project copied as a new job, archived and un-archived, through the pages. */
class ProjectCopyPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void aCopyIsANewJobWithTheSameMembersAndRecordsAndNoSheets() {
        Project alder = server.alder();
        String form = server.get("/projects/" + alder.id() + "/copy").body();
        assertThat(Html.field(form, "name")).isEqualTo("Alder Street Commons");
        assertThat(Html.shown(form)).contains("licensed engineer");
        HttpResponse<String> r = server.post("/projects/" + alder.id() + "/copy",
                List.of(entry("jobNumber", "26-004"), entry("name", "Alder Street Commons, phase 2")));
        assertThat(r.statusCode()).isEqualTo(303);
        Project copy = byJob("26-004");
        assertThat(r.headers().firstValue("Location")).hasValue("/projects/" + copy.id() + "?saved=copied");
        assertThat(copy.info().name()).isEqualTo("Alder Street Commons, phase 2");
        assertThat(records(server, copy)).hasSizeGreaterThan(50).isEqualTo(records(server, alder));
        ObjectNode file = server.store.exports().of(copy.id());
        ((ObjectNode) file.get("project")).put("jobNumber", alder.info().jobNumber()).put("name", alder.info().name());
        assertThat(RecordJson.write(file)).isEqualTo(RecordJson.write(server.store.exports().of(alder.id())));
        assertThat(server.store.projects().issued(copy.id())).isFalse();
        assertThat(Html.text(server.get("/projects/" + copy.id() + "?saved=copied").body(), ".notice.saved")).contains("no sheets yet");
    }

    @Test
    void aTakenJobNumberIsRefusedBesideTheFieldWithNothingStored() {
        int before = server.store.projects().findAll().size();
        HttpResponse<String> r = server.post("/projects/" + server.alderId() + "/copy",
                List.of(entry("jobNumber", "24-058"), entry("name", "Another deck")));
        assertThat(r.statusCode()).isEqualTo(409);
        assertThat(Html.text(r.body(), "#error-jobNumber")).contains("is already the job number of Millrace Park-and-Ride Deck");
        assertThat(Html.field(r.body(), "name")).isEqualTo("Another deck");
        HttpResponse<String> blank = server.post("/projects/" + server.alderId() + "/copy", List.of(entry("jobNumber", ""), entry("name", "")));
        assertThat(blank.statusCode()).isEqualTo(422);
        assertThat(Html.text(blank.body(), "#error-jobNumber")).contains("give the new job's number");
        assertThat(server.store.projects().findAll()).hasSize(before);
    }

    @Test
    void anArchivedProjectLeavesTheListAndRefusesABayEditUntilUnArchived() {
        assertThat(server.post("/projects/" + server.alderId() + "/copy", List.of(entry("jobNumber", "26-005"), entry("name", ""))).statusCode())
                .isEqualTo(303);
        Project p = byJob("26-005");
        HttpResponse<String> archived = server.post("/projects/" + p.id() + "/archive", server.versioned(p.id()));
        assertThat(archived.statusCode()).isEqualTo(303);
        assertThat(jobsListed("/projects")).contains("24-031").doesNotContain("26-005");
        assertThat(jobsListed("/projects?archived=yes")).containsExactly("26-005");
        String page = server.get("/projects/" + p.id()).body();
        assertThat(Html.text(page, "#project-archived")).isEqualTo("archived");
        assertThat(Html.text(page, "#project-state")).startsWith("archived");

        long version = server.version(p.id());
        HttpResponse<String> edit = bayEdit(p.id());
        assertThat(edit.statusCode()).isEqualTo(422);
        assertThat(Html.text(edit.body(), ".general-error")).contains("26-005 Alder Street Commons is archived", "un-archived");
        assertThat(server.version(p.id())).isEqualTo(version);
        ObjectNode settings = RecordJson.mapper().valueToTree(p.info());
        settings.put("version", version);
        HttpResponse<String> api = server.json("PUT", "/api/projects/" + p.id(), RecordJson.write(settings));
        assertThat(api.statusCode()).isEqualTo(409);
        assertThat(JsonBody.of(api).path("error").asText()).contains("is archived");

        assertThat(server.post("/projects/" + p.id() + "/unarchive", server.versioned(p.id())).statusCode()).isEqualTo(303);
        assertThat(jobsListed("/projects")).contains("26-005");
        assertThat(Html.all(server.get("/projects/" + p.id()).body(), "#project-archived")).isEmpty();
        assertThat(bayEdit(p.id()).statusCode()).isEqualTo(303);
    }

    private static HttpResponse<String> bayEdit(long project) {
        long level = server.store.levels().findByProject(project).get(1).id();
        return server.post("/projects/" + project + "/levels/" + level + "/bays", server.versioned(project, entry("cells", "0,0"),
                entry("action", "assign"), entry("occupancy", "office"), entry("deadLoad", "70"), entry("beams", "Y"),
                entry("infillBeams", "2"), entry("cantilevers.north", ""), entry("cantilevers.south", ""), entry("cantilevers.east", ""),
                entry("cantilevers.west", ""), entry("cantileverOccupancy", "")));
    }

    private static List<String> jobsListed(String path) {
        return Html.all(server.get(path).body(), "tbody tr").stream().map(tr -> tr.child(0).text()).toList();
    }

    private static Project byJob(String job) {
        return server.store.projects().findAll().stream().filter(p -> p.info().jobNumber().equals(job)).findFirst().orElseThrow();
    }

    /** Every member's record as JSON text, keyed by id with the level's row key replaced by its name (ids follow the rows). */
    static Map<String, String> records(TestServer server, Project p) {
        Map<String, String> keys = new TreeMap<>();
        for (StoredLevel l : server.store.levels().findByProject(p.id())) keys.put("L" + l.id() + "-", l.name() + "-");
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : server.store.results().of(p.id()).derived().members())
            out.put(renamed(m.id(), keys), renamed(RecordJson.write(m.result().record()), keys));
        return out;
    }

    private static String renamed(String text, Map<String, String> keys) {
        String out = text;
        for (var k : keys.entrySet()) out = out.replace(k.getKey(), k.getValue());
        return out;
    }
}
