package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
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

        String state = "";
        for (int i = 0; i < 600 && !state.contains("\"finished\":true"); i++) { // bounded wait for the worker
            state = eng.get(job + "?format=json").body();
            if (!state.contains("\"finished\":true")) Thread.sleep(100);
        }
        assertThat(state).contains("\"finished\":true").contains("\"error\":\"\"");
        assertThat(Html.shown(eng.get(job).body())).contains("download the checking copy");

        HttpResponse<byte[]> pdf = eng.getBytes(job + "/file");
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("Content-Type").orElse("")).startsWith("application/pdf");
        assertThat(pdf.headers().firstValue("X-Content-SHA256")).hasValue(Tokens.sha256(pdf.body()));
        try (PDDocument doc = Loader.loadPDF(pdf.body())) {
            String text = new PDFTextStripper().getText(doc);
            assertThat(text).contains("CHECK PRINT — NOT FOR CONSTRUCTION", server.member().name(), "Index of sheets");
            assertThat(text).contains("of " + doc.getNumberOfPages());
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
