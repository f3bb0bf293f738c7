package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.first;
import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/** The check of one sheet in the browser's terms, from submission to a verified issued PDF and revision 2. */
class SheetFlowTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void preparedCheckedIssuedVerifiedAndRevised() {
        Client eng = server.as("eve", Role.ENGINEER);
        Client chk = server.as("carl", Role.CHECKER);
        String sheet = server.sheetPath();

        String html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("being prepared");
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);

        html = chk.get(sheet).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        String step = first(html, "<option value=\"step:([^\"]+)\"");
        String script = "<script>alert('x')</script> is K_LL right?";
        assertThat(chk.post(sheet + "/markups", List.of(Map.entry("target", "step:" + step), Map.entry("text", script)))
                .statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(html).contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; is K_LL right?").doesNotContain("<script>alert");
        assertThat(html.indexOf("id=\"step-" + step + "\"")).as("the markup sits in its step's row")
                .isLessThan(html.indexOf("is K_LL right?"));
        chk.post(sheet + "/return", List.of(Map.entry("version", version(html, "/return"))));

        html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("returned with markups");
        String markup = first(html, "id=\"markup-(\\d+)\"");
        eng.post(sheet + "/markups/" + markup + "/reply", List.of(Map.entry("text", "Interior beam: K_LL = 2")));
        html = eng.get(sheet).body();
        eng.post(sheet + "/resubmit", List.of(Map.entry("version", version(html, "/resubmit"))));

        html = chk.get(sheet).body();
        assertThat(state(html)).isEqualTo("resubmitted");
        assertThat(html).contains("Interior beam: K_LL = 2");
        assertThat(eng.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode())
                .as("the preparer may not approve").isEqualTo(403);
        chk.post(sheet + "/markups/" + markup + "/resolve", List.of(Map.entry("version", version(html, "/markups/" + markup + "/resolve"))));
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(state(html)).isEqualTo("approved");
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")))).statusCode()).isEqualTo(303);

        html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("issued");
        String sha = first(html, "SHA-256 ([0-9a-f]{64})");
        String pdfPath = first(html, "href=\"(/review/revisions/\\d+/issued\\.pdf)\"");
        HttpResponse<byte[]> pdf = eng.getBytes(pdfPath);
        assertThat(pdf.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).startsWith("application/pdf"));
        assertThat(Tokens.sha256(pdf.body())).isEqualTo(sha);
        assertThat(eng.getBytes(pdfPath).body()).as("the frozen bytes, every time").isEqualTo(pdf.body());

        String verdict = eng.upload("/verify", "pdf", "sheet.pdf", pdf.body()).body();
        assertThat(verdict).contains("Matches an issued revision").contains(sha);
        byte[] altered = pdf.body().clone();
        altered[altered.length / 2] ^= 1;
        assertThat(eng.upload("/verify", "pdf", "sheet.pdf", altered).body()).contains("No match");

        server.heavierFloor(10);
        html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("being prepared");
        assertThat(html).contains("superseded");
        String compare = eng.get(sheet + "/compare?from=1&to=2").body();
        assertThat(compare).contains("changed-inputs").doesNotContain("No input or result differs");
        // the dead load shows in the steps, not the record's input table, so the results are what changed
        assertThat(first(compare, "id=\"changed-results\">(?s)(.*?)</table>")).doesNotContain(">none<");

        Client admin = server.as("admin", Role.ADMINISTRATOR);
        String audit = admin.get("/admin/audit").body();
        for (String action : List.of("submit", "markup", "return", "reply", "resubmit", "resolve", "approve", "issue", "supersede"))
            assertThat(audit).contains("<td>" + action + "</td>");
        HttpResponse<String> csv = admin.get("/admin/audit.csv");
        assertThat(csv.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).startsWith("text/csv"));
        assertThat(csv.body()).startsWith("id,when (UTC),user,action,subject,detail,address,chain hash\r\n").contains("\"issue\"");
    }
}
