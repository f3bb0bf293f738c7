package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.sheet.PdfText;
import com.baysheet.web.Html;
import com.baysheet.web.JsonBody;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** The firm's settings act: new projects start with the firm's edition, and its name and logo text are shown. */
class FirmSettingsTest {
    static final String NAME = "Harbor & Pine Structural";
    static final String LOGO = "H&P";

    ReviewServer server;
    Client admin;

    @BeforeEach
    void start() {
        server = new ReviewServer();
        admin = server.as("admin", Role.ADMINISTRATOR);
    }

    @AfterEach
    void stop() { server.close(); }

    HttpResponse<String> saveFirm(String edition) {
        String page = admin.get("/admin/firm").body();
        return admin.post("/admin/firm", List.of(Map.entry("firmName", NAME), Map.entry("logoText", LOGO),
                Map.entry("defaultEdition", edition), Map.entry("version", Pages.version(page, "/admin/firm"))));
    }

    @Test
    void savingTheFirmSettingsConfirmsItAfterTheRedirect() {
        HttpResponse<String> saved = saveFirm("ASCE 7-22");
        assertThat(saved.statusCode()).isEqualTo(303);
        String location = saved.headers().firstValue("Location").orElseThrow();
        assertThat(location).startsWith("/admin/firm");
        assertThat(Html.shown(admin.get(location).body())).contains("Saved: firm settings.");
        assertThat(admin.get("/admin/firm").body()).as("only right after the save").doesNotContain("Saved:");
        assertThat(admin.get("/admin/firm?saved=%3Cb%3Ehi").body()).as("an unknown code shows nothing")
                .doesNotContain("Saved:").doesNotContain("<b>hi");
    }

    @Test
    void aRefusedSaveSaysNothingWasSavedAndNotSaved() {
        String page = admin.get("/admin/firm").body();
        HttpResponse<String> bad = admin.post("/admin/firm", List.of(Map.entry("firmName", ""), Map.entry("logoText", LOGO),
                Map.entry("defaultEdition", "ASCE 7-22"), Map.entry("version", Pages.version(page, "/admin/firm"))));
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(Html.shown(bad.body())).contains("Nothing was saved").doesNotContain("Saved:");
    }

    HttpResponse<String> saveWeights(String girder) {
        String page = admin.get("/admin/firm").body();
        return admin.post("/admin/firm", List.of(Map.entry("firmName", NAME), Map.entry("logoText", LOGO),
                Map.entry("defaultEdition", "ASCE 7-16"), Map.entry("infillBeamWeight", "30"), Map.entry("gridBeamWeight", ""),
                Map.entry("girderWeight", girder), Map.entry("columnWeight", "50"), Map.entry("version", Pages.version(page, "/admin/firm"))));
    }

    @Test
    void selfWeightDefaultsAreSavedAndABadOneIsRefusedNamingTheField() {
        assertThat(saveWeights("-5").statusCode()).isEqualTo(400);
        assertThat(saveWeights("x").statusCode()).isEqualTo(400);
        assertThat(Html.field(admin.get("/admin/firm").body(), "columnWeight")).isEqualTo("0");
        assertThat(saveWeights("75").statusCode()).isEqualTo(303);
        String page = admin.get("/admin/firm").body();
        assertThat(Html.field(page, "girderWeight")).isEqualTo("75");
        assertThat(Html.field(page, "columnWeight")).isEqualTo("50");
        assertThat(Html.field(page, "gridBeamWeight")).isEqualTo("0");
    }

    @Test
    void theEditionFormListsTheEditionsWithTheFirmsSelected() {
        saveFirm("ASCE 7-10");
        String firm = admin.get("/admin/firm").body();
        assertThat(Html.all(firm, "select[name=defaultEdition] option[selected]").eachAttr("value")).containsExactly("ASCE 7-10");
        assertThat(Html.all(firm, "select[name=defaultEdition] option").eachAttr("value")).contains("ASCE 7-22");
    }

    @Test
    void aNewProjectStartsWithTheFirmsEditionOnThePage() {
        Client eng = server.as("eve", Role.ENGINEER);
        assertThat(Html.all(eng.get("/projects/new").body(), "select[name=edition] option[selected]").eachAttr("value"))
                .containsExactly("ASCE 7-16");
        saveFirm("ASCE 7-22");
        String form = eng.get("/projects/new").body();
        assertThat(Html.all(form, "select[name=edition] option[selected]").eachAttr("value")).containsExactly("ASCE 7-22");
    }

    @Test
    void theApiGivesANewProjectTheFirmsEditionWhenTheBodyNamesNone() {
        saveFirm("ASCE 7-22");
        Client eng = server.as("eve", Role.ENGINEER);
        HttpResponse<String> made = eng.json("POST", "/api/projects", "{\"jobNumber\": \"26-001\", \"name\": \"Quay Shed\", \"units\": \"US\"}");
        assertThat(made.statusCode()).isEqualTo(201);
        assertThat(JsonBody.of(made).path("info").path("edition").asText()).isEqualTo("ASCE 7-22");
        HttpResponse<String> named = eng.json("POST", "/api/projects",
                "{\"jobNumber\": \"26-002\", \"name\": \"Quay Store\", \"units\": \"US\", \"edition\": \"ASCE 7-10\"}");
        assertThat(JsonBody.of(named).path("info").path("edition").asText()).isEqualTo("ASCE 7-10");

        // a change that names no edition keeps the project's, even after the firm's default moves on
        saveFirm("ASCE 7-16");
        String path = made.headers().firstValue("Location").orElseThrow();
        HttpResponse<String> changed = eng.json("PUT", path,
                "{\"version\": 1, \"jobNumber\": \"26-001\", \"name\": \"Quay Shed, north\", \"units\": \"US\"}");
        assertThat(changed.statusCode()).isEqualTo(200);
        assertThat(JsonBody.of(changed).path("info").path("edition").asText()).isEqualTo("ASCE 7-22");
        assertThat(JsonBody.of(changed).path("info").path("name").asText()).isEqualTo("Quay Shed, north");
    }

    @Test
    void theFirmsNameAndLogoTextAreInThePageHeader() {
        Client eng = server.as("eve", Role.ENGINEER);
        assertThat(Html.texts(eng.get("/projects").body(), ".firm .logo")).doesNotContain("H&P");
        saveFirm("ASCE 7-16");
        String page = eng.get("/projects").body();
        assertThat(Html.text(page, ".firm strong.logo")).isEqualTo("H&P");
        assertThat(Html.text(page, ".firm strong.logo + span")).isEqualTo("Harbor & Pine Structural");
    }

    @Test
    void theFirmsNameAndLogoTextAreOnTheSheetsTitleBlock() throws IOException {
        saveFirm("ASCE 7-16");
        Client eng = server.as("eve", Role.ENGINEER);
        HttpResponse<byte[]> pdf = eng.getBytes(server.sheetPath() + "/checking.pdf");
        assertThat(pdf.statusCode()).isEqualTo(200);
        // the title block's firm cell: the logo text, then the name, on a line of their own
        assertThat(PdfText.pages(pdf.body()).get(0)).contains(LOGO + " " + NAME);
    }
}
