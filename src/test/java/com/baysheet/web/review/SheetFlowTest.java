package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.web.Html;
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
        String step = Html.one(html, "option[value^=step:]").val().substring("step:".length());
        String script = "<script>alert('x')</script> is K_LL right?";
        assertThat(chk.post(sheet + "/markups", List.of(Map.entry("target", "step:" + step), Map.entry("text", script)))
                .statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        // the markup shows as the text it is, and never becomes an element of the page
        assertThat(Html.shown(html)).contains("<script>alert('x')</script> is K_LL right?");
        assertThat(Html.all(html, "script").eachAttr("src")).allMatch(src -> src.startsWith("/static/"));
        assertThat(html).doesNotContain("<script>alert");
        assertThat(html.indexOf("id=\"step-" + step + "\"")).as("the markup sits in its step's row")
                .isLessThan(html.indexOf("is K_LL right?"));
        chk.post(sheet + "/return", List.of(Map.entry("version", version(html, "/return"))));

        html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("returned with markups");
        String markup = Html.one(html, "[id^=markup-]").id().substring("markup-".length());
        eng.post(sheet + "/markups/" + markup + "/reply", List.of(Map.entry("text", "Interior beam: K_LL = 2")));
        html = eng.get(sheet).body();
        eng.post(sheet + "/resubmit", List.of(Map.entry("version", version(html, "/resubmit"))));

        html = chk.get(sheet).body();
        assertThat(state(html)).isEqualTo("resubmitted");
        assertThat(Html.shown(html)).contains("Interior beam: K_LL = 2");
        assertThat(eng.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode())
                .as("the preparer may not approve").isEqualTo(403);
        chk.post(sheet + "/markups/" + markup + "/resolve", List.of(Map.entry("version", version(html, "/markups/" + markup + "/resolve"))));
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(state(html)).isEqualTo("approved");
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", "First issue"))).statusCode()).isEqualTo(303);

        html = eng.get(sheet).body();
        assertThat(state(html)).isEqualTo("issued");
        String sha = first(html, "SHA-256 ([0-9a-f]{64})");
        String pdfPath = Html.one(html, "a[href$=/issued.pdf]").attr("href");
        HttpResponse<byte[]> pdf = eng.getBytes(pdfPath);
        assertThat(pdf.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).startsWith("application/pdf"));
        assertThat(Tokens.sha256(pdf.body())).isEqualTo(sha);
        assertThat(eng.getBytes(pdfPath).body()).as("the frozen bytes, every time").isEqualTo(pdf.body());

        String verdict = eng.upload("/verify", "pdf", "sheet.pdf", pdf.body()).body();
        assertThat(Html.shown(verdict)).contains("Matches an issued revision").contains(sha);
        byte[] altered = pdf.body().clone();
        altered[altered.length / 2] ^= 1;
        assertThat(Html.shown(eng.upload("/verify", "pdf", "sheet.pdf", altered).body())).contains("No match");

        server.heavierFloor(10);
        html = eng.get(sheet).body();
        assertThat(state(html)).as("an issued revision stays current until the next is issued").isEqualTo("issued");
        assertThat(Html.all(html, "#changed-since-issue")).isNotEmpty();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = eng.get(sheet).body();
        assertThat(state(html)).as("the submission opens the next revision").isEqualTo("submitted for check");
        String compare = eng.get(sheet + "/compare?from=1&to=2").body();
        assertThat(Html.all(compare, "table#changed-inputs")).hasSize(1);
        assertThat(Html.shown(compare)).doesNotContain("No input or result differs");
        // the dead load shows in the steps, not the record's input table, so the results are what changed
        assertThat(Html.texts(compare, "table#changed-results td")).doesNotContain("none");

        Client admin = server.as("admin", Role.ADMINISTRATOR);
        String audit = admin.get("/admin/audit").body();
        for (String action : List.of("submit", "markup", "return", "reply", "resubmit", "resolve", "approve", "issue"))
            assertThat(Html.texts(audit, "td")).contains(action);
        HttpResponse<String> csv = admin.get("/admin/audit.csv");
        assertThat(csv.headers().firstValue("Content-Type")).hasValueSatisfying(t -> assertThat(t).startsWith("text/csv"));
        assertThat(csv.body()).startsWith("id,when (UTC),user,action,subject,detail,address,chain hash\r\n").contains("\"issue\"");
    }
}
