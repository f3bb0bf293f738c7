package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.AuditEvent;
import com.baysheet.web.TestLogin.Client;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.sql.Connection;
import java.sql.Statement;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static com.baysheet.web.review.Pages.first;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * What the audit trail records beyond the changes themselves, over HTTP: a refused privileged attempt, a form
 * without its token (coalesced), the download of an issued PDF; the chain head printed in the issued PDF is an
 * entry of the trail; the audit page verifies the chain and names the first entry edited behind its back.
 */
class AuditRecordTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private List<AuditEvent> trail() { return server.office.review().audit().all(); }

    private List<AuditEvent> actions(String action) {
        return trail().stream().filter(e -> e.action().equals(action)).toList();
    }

    @Test
    void refusedAttemptsAndFormTokenFailuresAreRecordedAndCoalesced() {
        Client eng = server.as("erica", Role.ENGINEER);
        assertThat(eng.get("/admin/users").statusCode()).isEqualTo(403);
        List<AuditEvent> refused = actions("access refused").stream().filter(e -> e.actorUsername().equals("erica")).toList();
        assertThat(refused).hasSize(1);
        assertThat(refused.get(0).subject()).isEqualTo("GET /admin/users");
        assertThat(refused.get(0).detail()).startsWith("engineer");

        for (int i = 0; i < 5; i++)
            assertThat(eng.postRaw("/projects", List.of(Map.entry("jobNumber", "X-" + i))).statusCode()).isEqualTo(403);
        List<AuditEvent> token = actions("form token refused").stream().filter(e -> e.actorUsername().equals("erica")).toList();
        assertThat(token).as("five refusals within a minute make one entry").hasSize(1);
        server.clock.advance(java.time.Duration.ofSeconds(61));
        eng.postRaw("/projects", List.of(Map.entry("jobNumber", "X-9")));
        token = actions("form token refused").stream().filter(e -> e.actorUsername().equals("erica")).toList();
        assertThat(token).hasSize(2);
        assertThat(token.get(1).detail()).contains("4 more like it");
    }

    @Test
    void aReviewActionRefusedForThePersonsRightsIsRecorded() {
        Client eng = server.as("evan", Role.ENGINEER);
        // a sheet of its own (a column's), submitted by the engineer, who then tries to approve it
        String member = server.store.results().of(server.project()).derived().members().stream()
                .filter(m -> m.kind().name().contains("COLUMN")).findFirst().orElseThrow().id();
        // the member's address leads to its mark's sheet, the unit of review
        String sheet = eng.get("/review/projects/" + server.project() + "/members/" + member).headers().firstValue("Location").orElseThrow();
        String html = eng.get(sheet).body();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        long markId = Long.parseLong(sheet.substring(sheet.lastIndexOf('/') + 1));
        String v = String.valueOf(server.office.review().reviews().view(new com.baysheet.review.SheetRef(server.project(),
                com.baysheet.review.MarkSheets.PREFIX + markId)).current().version());
        assertThat(eng.post(sheet + "/approve", List.of(Map.entry("version", v))).statusCode()).isEqualTo(403);
        List<AuditEvent> refused = actions("review action refused").stream().filter(e -> e.actorUsername().equals("evan")).toList();
        assertThat(refused).singleElement().satisfies(e -> assertThat(e.subject()).isEqualTo("POST " + sheet + "/approve"));
    }

    @Test
    void anIssuedPdfCarriesTheChainHeadAndItsDownloadIsRecorded() throws Exception {
        Client eng = server.as("ed", Role.ENGINEER);
        Client chk = server.as("cat", Role.CHECKER);
        String sheet = server.sheetPath();
        String html = eng.get(sheet).body();
        eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit"))));
        html = chk.get(sheet).body();
        chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve"))));
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", "First issue")))
                .statusCode()).isEqualTo(303);
        String pdfPath = com.baysheet.web.Html.one(eng.get(sheet).body(), "a[href$=/issued.pdf]").attr("href");
        byte[] pdf = eng.getBytes(pdfPath).body();

        String text;
        try (PDDocument d = Loader.loadPDF(pdf)) {
            text = new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
        Matcher m = Pattern.compile("Audit trail at issue: entry (\\d+), SHA-256 ([0-9a-f]{64})").matcher(text);
        assertThat(m.find()).as(text).isTrue();
        long id = Long.parseLong(m.group(1));
        AuditEvent quoted = trail().stream().filter(e -> e.id() == id).findFirst().orElseThrow();
        assertThat(quoted.hash()).as("the printed head is that entry's chain hash").isEqualTo(m.group(2));

        List<AuditEvent> downloads = actions("issued PDF downloaded");
        assertThat(downloads).isNotEmpty();
        assertThat(downloads.get(downloads.size() - 1).actorUsername()).isEqualTo("ed");
        assertThat(downloads.get(downloads.size() - 1).detail()).contains("revision 1");
    }

    @Test
    void theAuditPageVerifiesTheChainAndNamesAnEditedEntry() throws Exception {
        Client admin = server.as("ada", Role.ADMINISTRATOR);
        String page = admin.get("/admin/audit").body();
        AuditEvent last = trail().get(trail().size() - 1);
        assertThat(page).contains("Chain head: entry <strong>" + last.id() + "</strong>").contains(last.hash());
        assertThat(admin.get("/admin/audit/verify").body()).contains("Chain verified: ");

        String csv = admin.get("/admin/audit.csv").body();
        assertThat(csv).startsWith("id,when (UTC),user,action,subject,detail,address,chain hash\r\n").contains(last.hash());

        long victim = trail().get(1).id();
        String was = trail().get(1).actorUsername();
        try (Connection c = server.db.dataSource().getConnection(); Statement s = c.createStatement()) {
            s.executeUpdate("UPDATE audit_event SET actor_username = 'someone else' WHERE id = " + victim);
        }
        try {
            assertThat(admin.get("/admin/audit/verify").body()).contains("Chain broken at entry " + victim + ":");
        } finally {
            try (Connection c = server.db.dataSource().getConnection(); Statement s = c.createStatement()) {
                s.executeUpdate("UPDATE audit_event SET actor_username = '" + was + "' WHERE id = " + victim);
            }
        }
    }
}
