package com.baysheet.web;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

class ProjectPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void projectListShowsTheDemoProjects() {
        HttpResponse<String> r = server.get("/projects");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(Html.texts(r.body(), "tbody tr td a")).contains("Alder Street Commons", "Millrace Park-and-Ride Deck");
        assertThat(Html.texts(r.body(), "tbody tr td")).contains("24-031", "SI");
        assertThat(Html.text(r.body(), "footer .caution-line")).contains("Results are for review by a licensed engineer");
    }

    @Test
    void rootRedirectsToTheProjects() {
        HttpResponse<String> r = server.get("/");
        assertThat(r.statusCode()).isBetween(301, 303);
        assertThat(r.headers().firstValue("Location")).hasValue("/projects");
    }

    @Test
    void aNewProjectIsCreatedAndThenRedirectedTo() {
        HttpResponse<String> r = server.post("/projects", List.of(entry("jobNumber", "25-900"), entry("name", "Wren Court Lofts"),
                entry("address", "12 Wren Court"), entry("client", "Wren Holdings"), entry("edition", "ASCE 7-16"),
                entry("units", "SI"), entry("partitionAllowance", "on")));
        assertThat(r.statusCode()).isEqualTo(303);
        String location = r.headers().firstValue("Location").orElseThrow();
        HttpResponse<String> page = server.get(location);
        assertThat(Html.shown(page.body())).contains("Wren Court Lofts", "Wren Holdings", "SI", "added");
        String levels = server.get(location + "/levels").body();
        assertThat(Html.text(levels, "label[for=\"x.spacings\"]")).isEqualTo("Spacings along x (m)");
        assertThat(Html.field(levels, "x.spacings")).isEqualTo("9 9");
    }

    @Test
    void aBadNewProjectIsRefusedBesideItsFieldWithTheInputKept() {
        int before = server.store.projects().findAll().size();
        HttpResponse<String> r = server.post("/projects", List.of(entry("jobNumber", "24-031"), entry("name", "Copy of Alder"),
                entry("edition", "ASCE 7-16"), entry("units", "US")));
        assertThat(r.statusCode()).isEqualTo(409);
        assertThat(Html.text(r.body(), "#error-jobNumber")).contains("is already the job number of Alder Street Commons");
        assertThat(Html.field(r.body(), "name")).isEqualTo("Copy of Alder");
        assertThat(Html.shown(r.body())).contains("Nothing was saved");
        assertThat(server.store.projects().findAll()).hasSize(before);
    }

    @Test
    void settingsAreSavedOverTheCurrentVersion() {
        long id = server.deck().id();
        long v = server.version(id);
        HttpResponse<String> form = server.get("/projects/" + id + "/settings");
        assertThat(Html.field(form.body(), "version")).isEqualTo(String.valueOf(v));
        assertThat(Html.field(form.body(), "client")).isEqualTo("Riverton Transit Authority");
        HttpResponse<String> r = server.post("/projects/" + id + "/settings", List.of(entry("version", String.valueOf(v)),
                entry("jobNumber", "24-058"), entry("name", "Millrace Park-and-Ride Deck"), entry("client", "Riverton Transit Authority"),
                entry("address", "Millrace Road"), entry("edition", "ASCE 7-22"), entry("units", "SI")));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.store.projects().find(id).info().edition()).isEqualTo("ASCE 7-22");
        assertThat(Html.shown(server.get("/projects/" + id).body())).contains("ASCE 7-22");
    }

    @Test
    void theUpliftOptionIsOfferedOnTheSettingsFormAndSaved() {
        HttpResponse<String> created = server.post("/projects", List.of(entry("jobNumber", "25-901"), entry("name", "Osprey Pier Shed"),
                entry("edition", "ASCE 7-16"), entry("units", "US")));
        String location = created.headers().firstValue("Location").orElseThrow();
        long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
        assertThat(server.store.projects().find(id).info().upliftReducedDead()).isFalse();
        HttpResponse<String> form = server.get(location + "/settings");
        assertThat(Html.one(form.body(), "input[name=upliftReducedDead]").hasAttr("checked")).isFalse();
        assertThat(Html.shown(form.body())).contains("0.9D + 1.6L");
        HttpResponse<String> r = server.post(location + "/settings", List.of(entry("version", String.valueOf(server.version(id))),
                entry("jobNumber", "25-901"), entry("name", "Osprey Pier Shed"), entry("edition", "ASCE 7-16"), entry("units", "US"),
                entry("upliftReducedDead", "on")));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.store.projects().find(id).info().upliftReducedDead()).isTrue();
        assertThat(Html.one(server.get(location + "/settings").body(), "input[name=upliftReducedDead]").hasAttr("checked")).isTrue();
    }

    @Test
    void unknownIdsGiveANotFoundPageAndNoStackTrace() {
        for (String path : List.of("/projects/9999", "/projects/abc/levels", "/projects/1/members/no-such-member",
                "/projects/1/takedowns/nowhere", "/projects/1/levels/9999/bays", "/no/such/page")) {
            HttpResponse<String> r = server.get(path);
            assertThat(r.statusCode()).as(path).isEqualTo(404);
            assertThat(Html.shown(r.body())).as(path).contains("Not found");
            assertThat(r.body()).as(path).doesNotContain("Exception", "at com.baysheet");
        }
    }

    @Test
    void aPostWithoutAVersionIsRefusedNotSaved() {
        long id = server.alder().id();
        long v = server.version(id);
        HttpResponse<String> r = server.post("/projects/" + id + "/levels", List.of(entry("name", "Penthouse"), entry("elevation", "50")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.shown(r.body())).contains("carries no project version");
        assertThat(server.version(id)).isEqualTo(v);
    }
}
