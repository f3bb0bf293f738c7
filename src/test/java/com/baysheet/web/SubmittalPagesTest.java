package com.baysheet.web;

import com.baysheet.framing.model.Submittal;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** The submittal data on the project settings page: saved over the version, refused beside the field named. */
class SubmittalPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void theDemoCarriesItsEngineerOfRecordAndTheCodeAsAdopted() {
        long id = server.alder().id();
        String page = server.get("/projects/" + id + "/settings").body();
        assertThat(page).contains("Submittal data", "Imogen Thackeray, PE", "PE-40217", "IBC", "2018");
        Submittal s = server.store.projects().submittals().find(id);
        assertThat(s.address()).isEqualTo("1480 Alder Street, Riverton");
        assertThat(s.adoptedCode()).isEqualTo("IBC 2018, as adopted by the jurisdiction");
    }

    @Test
    void aSaveOverTheCurrentVersionIsStoredAndAnOldVersionIsRefused() {
        long id = server.deck().id(), v = server.version(id);
        HttpResponse<String> r = server.post("/projects/" + id + "/settings/submittal", List.of(entry("version", String.valueOf(v)),
                entry("engineerOfRecord", "Tobias Wrenfield, PEng"), entry("licenceNumber", "88120"), entry("licenceState", "ON"),
                entry("buildingCode", "OBC"), entry("codeYear", "2012")));
        assertThat(r.statusCode()).isEqualTo(303);
        assertThat(server.store.projects().submittals().find(id).engineerLine()).isEqualTo("Tobias Wrenfield, PEng, licence ON 88120");
        assertThat(server.version(id)).isEqualTo(v + 1);
        HttpResponse<String> stale = server.post("/projects/" + id + "/settings/submittal", List.of(entry("version", String.valueOf(v)),
                entry("engineerOfRecord", "Someone Else")));
        assertThat(stale.statusCode()).isEqualTo(409);
        assertThat(server.store.projects().submittals().find(id).engineerOfRecord()).isEqualTo("Tobias Wrenfield, PEng");
    }

    @Test
    void aBadFieldIsRefusedByNameAndNothingIsStored() {
        long id = server.alder().id();
        Submittal before = server.store.projects().submittals().find(id);
        long v = server.version(id);
        HttpResponse<String> r = server.post("/projects/" + id + "/settings/submittal", List.of(entry("version", String.valueOf(v)),
                entry("engineerOfRecord", "Imogen Thackeray, PE"), entry("licenceNumber", "PE-40217"), entry("licenceState", "OR"),
                entry("buildingCode", "IBC"), entry("codeYear", "18")));
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-codeYear")).contains("four digits");
        assertThat(Html.field(r.body(), "codeYear")).isEqualTo("18");
        HttpResponse<String> orphan = server.post("/projects/" + id + "/settings/submittal", List.of(entry("version", String.valueOf(v)),
                entry("engineerOfRecord", ""), entry("licenceNumber", "PE-1"), entry("licenceState", "OR"), entry("buildingCode", ""),
                entry("codeYear", "")));
        assertThat(orphan.statusCode()).isEqualTo(422);
        assertThat(Html.text(orphan.body(), "#error-engineerOfRecord")).isNotBlank();
        assertThat(server.store.projects().submittals().find(id)).isEqualTo(before);
        assertThat(server.version(id)).isEqualTo(v);
        assertThat(server.post("/projects/" + id + "/settings/submittal", List.of()).statusCode()).isBetween(400, 499);
    }
}
