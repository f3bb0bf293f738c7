package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.project.Project;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;

import static org.assertj.core.api.Assertions.assertThat;

/** The model file on the project pages and in the API: downloaded, uploaded as a new project, refused when it is not one. */
class ModelFilePagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void aDownloadedModelUploadsAsANewProjectWithTheSameMembers() throws Exception {
        Project alder = server.alder();
        assertThat(server.get("/projects/" + alder.id()).body()).contains("Download the model as one JSON file");
        HttpResponse<String> file = server.get("/projects/" + alder.id() + "/model.json");
        assertThat(file.statusCode()).isEqualTo(200);
        assertThat(file.headers().firstValue("Content-Disposition")).hasValue("attachment; filename=\"24-031-model.json\"");
        assertThat(RecordJson.mapper().readTree(file.body()).path("levels").size()).isEqualTo(4);

        HttpResponse<String> up = upload(file.body(), "24-031-COPY");
        assertThat(up.statusCode()).isEqualTo(303);
        Project copy = server.store.projects().findAll().stream().filter(p -> p.info().jobNumber().equals("24-031-COPY")).findFirst().orElseThrow();
        assertThat(up.headers().firstValue("Location")).hasValue("/projects/" + copy.id());
        assertThat(server.store.results().of(copy.id()).derived().members()).hasSameSizeAs(server.store.results().of(alder.id()).derived().members());
    }

    @Test
    void anUploadThatIsNoModelIsRefusedBesideTheFileWithNothingStored() throws Exception {
        int before = server.store.projects().findAll().size();
        HttpResponse<String> notJson = upload("this is not json", "X-1");
        assertThat(notJson.statusCode()).isEqualTo(422);
        assertThat(notJson.body()).contains("is not valid JSON", "Nothing was saved", "licensed engineer");
        HttpResponse<String> taken = upload(server.get("/projects/" + server.deck().id() + "/model.json").body(), "");
        assertThat(taken.statusCode()).isEqualTo(409);
        assertThat(taken.body()).contains("already the job number");
        assertThat(server.post("/projects/import", java.util.List.of()).statusCode()).isEqualTo(422);
        assertThat(server.store.projects().findAll()).hasSize(before);
    }

    @Test
    void theApiExportsAndImportsTheSameFile() throws Exception {
        String model = server.get("/api/projects/" + server.deck().id() + "/model").body();
        HttpResponse<String> r = server.json("POST", "/api/projects/import", "{\"jobNumber\": \"24-058-API\", \"model\": " + model + "}");
        assertThat(r.statusCode()).isEqualTo(201);
        JsonNode created = RecordJson.mapper().readTree(r.body());
        String again = server.get("/api/projects/" + created.get("id").asLong() + "/model").body();
        assertThat(again.replace("24-058-API", "24-058")).isEqualTo(model);
    }

    @Test
    void aConversionSaysThatResultsChangeAndNeedsItsConfirmation() {
        long deck = server.deck().id();
        String page = server.get("/projects/" + deck + "/units").body();
        assertThat(page).contains("Convert 24-058 to US units", "The results change", "opens a new revision", "licensed engineer");
        long before = server.version(deck);
        HttpResponse<String> unconfirmed = server.post("/projects/" + deck + "/units",
                java.util.List.of(java.util.Map.entry("version", String.valueOf(before))));
        assertThat(unconfirmed.statusCode()).isEqualTo(422);
        assertThat(unconfirmed.body()).contains("tick the box");
        assertThat(server.version(deck)).isEqualTo(before);
        double spanSi = server.store.grids().find(deck).x().spacing(0);
        HttpResponse<String> done = server.post("/projects/" + deck + "/units", java.util.List.of(
                java.util.Map.entry("version", String.valueOf(before)), java.util.Map.entry("confirm", "yes")));
        assertThat(done.statusCode()).isEqualTo(303);
        assertThat(server.store.projects().find(deck).info().units()).isEqualTo(com.baysheet.engine.units.UnitSystem.US);
        // 16.8 m / 0.3048 m/ft
        assertThat(server.store.grids().find(deck).x().spacing(0)).isEqualTo(spanSi / 0.3048);
    }

    private static HttpResponse<String> upload(String content, String jobNumber) {
        return server.engineer.upload("/projects/import", java.util.Map.of("jobNumber", jobNumber), "file", "model.json",
                "application/json", content.getBytes(StandardCharsets.UTF_8));
    }
}
