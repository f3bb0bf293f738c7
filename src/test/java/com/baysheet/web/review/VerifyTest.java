package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.framing.DerivedMember;
import com.baysheet.project.ProjectInfo;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Verifying an upload tells who and what in the office's words (job, project, member by name, revision, preparer,
 * checker, issue date), never stored ids; a file that is not a PDF is told so; downloads carry their SHA-256 and
 * the file name docs/sheets.md promises.
 */
class VerifyTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void anIssuedSheetVerifiesByJobProjectNameRevisionAndSignatures() {
        Client eng = server.as("gideon", Role.ENGINEER);  // GIDE
        Client chk = server.as("harriet", Role.CHECKER);  // HARR
        DerivedMember member = server.member();
        ProjectInfo info = server.store.projects().find(server.project()).info();
        String issuedAs = server.mark().text(); // the mark the member carries: its sheet is the mark's
        String sheet = server.sheetPath();
        String html = eng.get(sheet).body();
        eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit"))));
        html = chk.get(sheet).body();
        chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve"))));
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", "First issue"))).statusCode()).isEqualTo(303);

        HttpResponse<byte[]> pdf = eng.getBytes(Html.one(eng.get(sheet).body(), "a[href$=/issued.pdf]").attr("href"));
        assertThat(pdf.headers().firstValue("X-Content-SHA256")).hasValue(Tokens.sha256(pdf.body()));
        assertThat(pdf.headers().firstValue("Content-Disposition").orElse(""))
                .isEqualTo("attachment; filename=\"" + safe(info.jobNumber() + "-" + issuedAs + "-rev0.pdf") + "\"");

        String said = Html.text(eng.upload("/verify", "pdf", "sheet.pdf", pdf.body()).body(), "section#verdict");
        assertThat(said).contains("Matches an issued revision", "job " + info.jobNumber() + ", " + info.name(),
                "mark " + issuedAs + ",", "revision 0", "prepared by GIDE", "checked by HARR",
                "issued " + LocalDate.now(server.clock), "(now issued)");
        assertThat(said).as("no stored ids in what the verdict says")
                .doesNotContain("Project " + server.project(), "member " + member.id() + " ");
    }

    @Test
    void aCheckingCopyDownloadCarriesItsHashAndName() {
        Client eng = server.as("ivo", Role.ENGINEER);
        ProjectInfo info = server.store.projects().find(server.project()).info();
        HttpResponse<byte[]> pdf = eng.getBytes(server.sheetPath() + "/checking.pdf");
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("X-Content-SHA256")).hasValue(Tokens.sha256(pdf.body()));
        assertThat(pdf.headers().firstValue("Content-Disposition").orElse(""))
                .isEqualTo("attachment; filename=\"" + safe(info.jobNumber() + "-" + server.mark().text() + "-checking-copy.pdf") + "\"");
    }

    @Test
    void aFileThatIsNotAPdfIsToldSo() {
        Client eng = server.as("jonas", Role.ENGINEER);
        HttpResponse<String> r = eng.upload("/verify", "pdf", "notes.pdf", "Meeting notes, not a PDF".getBytes(StandardCharsets.UTF_8));
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(Html.text(r.body(), "section#verdict")).contains("Not a PDF", "notes.pdf", "%PDF-").doesNotContain("No match");
    }

    private static String safe(String name) { return name.replaceAll("[^A-Za-z0-9._-]", "_"); }
}
