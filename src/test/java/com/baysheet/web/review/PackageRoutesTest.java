package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.sheet.PdfText;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.BooleanNode;
import com.fasterxml.jackson.databind.node.TextNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** Level and project packages from the browser: started, followed, downloaded; bad requests refused clearly. */
class PackageRoutesTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aLevelPackageRendersInTheBackgroundAndDownloadsWithItsHash() throws Exception {
        Client eng = server.as("pia", Role.ENGINEER);
        String base = "/projects/" + server.project() + "/packages";
        String level = server.member().level();
        assertThat(Html.shown(eng.get(base).body())).contains("Calculation packages", level);

        HttpResponse<String> started = eng.post(base, List.of(Map.entry("scope", level)));
        assertThat(started.statusCode()).isEqualTo(303);
        String job = started.headers().firstValue("Location").orElseThrow();
        assertThat(job).startsWith(base + "/");

        JsonNode state = Pages.finished(eng, job);
        assertThat(state.path("error")).as("the job's error").isEqualTo(TextNode.valueOf(""));
        assertThat(state.path("cancelled")).isEqualTo(BooleanNode.FALSE);
        assertThat(Html.shown(eng.get(job).body())).contains("download the checking copy");

        HttpResponse<byte[]> pdf = eng.getBytes(job + "/file");
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("Content-Type").orElse("")).startsWith("application/pdf");
        assertThat(pdf.headers().firstValue("X-Content-SHA256")).hasValue(Tokens.sha256(pdf.body()));
        List<List<String>> pages = PdfText.pages(pdf.body());
        List<String> lines = pages.stream().flatMap(List::stream).toList();
        assertThat(lines).anySatisfy(l -> assertThat(l).startsWith("Index of sheets"));
        assertThat(lines).anySatisfy(l -> assertThat(l).contains(server.member().name()));
        // every page is marked a check print on its printed line, and its title block and footer count it among all
        for (int i = 0; i < pages.size(); i++) {
            List<String> page = pages.get(i);
            String of = (i + 1) + " of " + pages.size();
            assertThat(page).as("page %d", i + 1)
                    .anySatisfy(l -> assertThat(l).startsWith("Printed ").endsWith(" CHECK PRINT — NOT FOR CONSTRUCTION"))
                    .anySatisfy(l -> assertThat(l).endsWith(" Page " + of));
            assertThat(PdfText.after(page, "Sheet")).as("page %d", i + 1).isEqualTo(of);
        }
    }

    @Test
    void anUnknownLevelOrJobIsRefusedByName() {
        Client eng = server.as("quin", Role.ENGINEER);
        String base = "/projects/" + server.project() + "/packages";
        HttpResponse<String> bad = eng.post(base, List.of(Map.entry("scope", "Level 99")));
        assertThat(bad.statusCode()).isBetween(400, 499);
        assertThat(Html.shown(bad.body())).contains("Level 99");
        assertThat(eng.get(base + "/no-such-job").statusCode()).isEqualTo(404);
        assertThat(eng.get("/projects/987654/packages").statusCode()).isEqualTo(404);
    }

    @Test
    void anAdministratorMayNotStartOneAndAnonymousVisitorsAreSentToLogin() {
        Client admin = server.as("adele", Role.ADMINISTRATOR);
        String base = "/projects/" + server.project() + "/packages";
        assertThat(admin.post(base, List.of(Map.entry("scope", "project"))).statusCode()).isEqualTo(403);
        Client nobody = com.baysheet.web.TestLogin.anonymous(server.app);
        assertThat(nobody.get(base).statusCode()).isIn(302, 303);
    }

}
