package com.baysheet.web.review;

import com.baysheet.store.Editor;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.model.Bay;
import com.baysheet.review.PackageScope;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.StoredLevel;
import com.baysheet.sheet.PdfText;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.first;
import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/** A level's package checked and issued as a whole, verified by upload, then superseded by a change to one bay. */
class PackageFlowTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void aLevelPackageIsCheckedIssuedVerifiedAndRevisedWhenOneOfItsSheetsChanges() throws IOException {
        Client eng = server.as("pat", Role.ENGINEER);
        Client chk = server.as("cora", Role.CHECKER);
        DerivedMember member = server.member();
        PackageScope scope = PackageScope.ofLevel(member.level());
        String pkg = "/review/projects/" + server.project() + "/packages/" + scope.key();

        String list = eng.get("/review/projects/" + server.project()).body();
        assertThat(Html.text(list, "table#packages")).contains("Project package", scope.title());
        assertThat(Html.all(list, "table#packages a").eachAttr("href")).contains(pkg);

        String html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("being prepared");
        String markKey = server.mark().ref(server.project()).subject();
        assertThat(Html.text(html, "table#manifest")).contains("Mark " + server.mark().text());
        assertThat(eng.post(pkg + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);

        html = chk.get(pkg).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        assertThat(html).contains("<option value=\"input:" + markKey + "\">");
        assertThat(eng.post(pkg + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "mine"))).statusCode())
                .as("the preparer does not mark up their own package").isEqualTo(403);
        assertThat(chk.post(pkg + "/markups", List.of(Map.entry("target", "step:R"), Map.entry("text", "no steps"))).statusCode())
                .as("a package's markups target its sheets or the whole").isEqualTo(400);
        assertThat(chk.post(pkg + "/markups", List.of(Map.entry("target", "input:" + markKey),
                Map.entry("text", "Check the girder reaction on this beam"))).statusCode()).isEqualTo(303);
        html = chk.get(pkg).body();
        assertThat(html.indexOf("id=\"input-" + markKey + "\"")).as("the markup sits in its sheet's row")
                .isPositive().isLessThan(html.indexOf("Check the girder reaction on this beam"));
        assertThat(chk.post(pkg + "/return", List.of(Map.entry("version", version(html, "/return")))).statusCode()).isEqualTo(303);

        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("returned with markups");
        String markup = Html.one(html, "[id^=markup-]").id().substring("markup-".length());
        eng.post(pkg + "/markups/" + markup + "/reply", List.of(Map.entry("text", "Reaction taken from the girder sheet")));
        html = eng.get(pkg).body();
        assertThat(eng.post(pkg + "/resubmit", List.of(Map.entry("version", version(html, "/resubmit")))).statusCode()).isEqualTo(303);

        html = chk.get(pkg).body();
        assertThat(state(html)).isEqualTo("resubmitted");
        assertThat(Html.shown(html)).contains("Reaction taken from the girder sheet");
        assertThat(eng.post(pkg + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode())
                .as("the preparer may not approve").isEqualTo(403);
        assertThat(chk.post(pkg + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode())
                .as("not while a markup is open").isEqualTo(409);
        chk.post(pkg + "/markups/" + markup + "/resolve", List.of(Map.entry("version", version(html, "/markups/" + markup + "/resolve"))));
        html = chk.get(pkg).body();
        assertThat(chk.post(pkg + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(pkg).body();
        assertThat(state(html)).isEqualTo("approved");
        assertThat(html).contains(chk.user.initials() + " ");
        assertThat(chk.post(pkg + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", "First issue"))).statusCode()).isEqualTo(303);

        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("issued");
        String sha = first(html, "SHA-256 ([0-9a-f]{64})");
        String pdfPath = Html.one(html, "a[href$=/issued.pdf]").attr("href");
        HttpResponse<byte[]> pdf = eng.getBytes(pdfPath);
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("Content-Type").orElse("")).startsWith("application/pdf");
        assertThat(Tokens.sha256(pdf.body())).isEqualTo(sha);
        assertThat(eng.getBytes(pdfPath).body()).as("the frozen bytes, every time").isEqualTo(pdf.body());
        // cover, criteria, index and the level's plan sheet (every member labelled), then the revision log: enough to read
        List<List<String>> pages = PdfText.pages(pdf.body());
        List<String> front = pages.subList(0, Math.min(5, pages.size())).stream().flatMap(List::stream).toList();
        List<String> log = pages.get(pages.size() - 1);
        assertThat(front).contains("Index of sheets").anySatisfy(l -> assertThat(l).contains(scope.title()));
        assertThat(front).as("the plan labels the mark").anySatisfy(l -> assertThat(PdfText.words(l)).contains(server.mark().text()));
        assertThat(log).contains("Revision log");
        assertThat(log).as("the issue's line in the revision log, with the checker's initials")
                .anySatisfy(l -> assertThat(l).contains("First issue").satisfies(x -> assertThat(PdfText.words(x)).contains(chk.user.initials())));
        assertThat(pages.stream().flatMap(List::stream)).noneMatch(l -> l.contains("CHECK PRINT") || l.contains("CHECKING COPY"));
        // the issued package is signed with the office's key over the whole file, and still PDF/A
        assertThat(com.baysheet.sheet.signing.SignatureCheck.of(pdf.body(), com.baysheet.TestKeys.key().certificate()).status())
                .isEqualTo(com.baysheet.sheet.signing.SignatureCheck.Status.OFFICE);
        assertThat(com.baysheet.sheet.PdfA.failures(pdf.body())).isEmpty();
        String verdict = eng.upload("/verify", "pdf", "package.pdf", pdf.body()).body();
        assertThat(Html.shown(verdict)).contains("Matches an issued revision", sha);
        assertThat(Html.all(verdict, "a").eachAttr("href")).contains(pkg);

        // one bay heavier: the issued package is changed since issue, not superseded; it stays current until the next issue
        oneBayHeavier(member.level(), 15);
        list = eng.get("/review/projects/" + server.project()).body();
        org.jsoup.nodes.Element row = Html.one(list, "tr:has(td > a[href=" + pkg + "])");
        assertThat(row.select("td").eachText()).contains("1", "issued");
        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("issued");
        assertThat(Html.all(html, "#changed-since-issue")).isNotEmpty();
        assertThat(eng.post(pkg + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        assertThat(Html.text(html, "table#revisions")).contains("issued").doesNotContain("superseded");

        String compare = eng.get(pkg + "/compare?from=1&to=2").body();
        assertThat(compare).contains(scope.title());
        List<String> changed = names(compare, "table#changed-inputs").stream()
                .filter(n -> !n.startsWith("Column take-down")).toList();
        int sheets = PackageScope.ofLevel(member.level()).marks(server.store.results().of(server.project()).derived(),
                server.store.marks().of(server.project(), server.store.results().of(server.project()).derived())).size();
        assertThat(changed).as("one bay changes some of the level's mark sheets, not all").isNotEmpty().hasSizeLessThan(sheets)
                .allSatisfy(n -> assertThat(n).startsWith("Mark "));
        assertThat(eng.upload("/verify", "pdf", "package.pdf", pdf.body()).body())
                .as("the issued copy still verifies, and is still in force").contains("Matches an issued revision", "issued");

        String audit = server.as("admin", Role.ADMINISTRATOR).get("/admin/audit").body();
        for (String action : List.of("submit", "markup", "return", "reply", "resubmit", "resolve", "approve", "issue"))
            assertThat(Html.texts(audit, "td")).contains(action);
        assertThat(audit).contains(scope.subject()).contains("changed since issue");
    }

    /** The labels of a comparison table's rows of values (a heading cell followed by a number). */
    private static List<String> names(String html, String table) {
        return Html.all(html, table + " th").stream().filter(th -> th.nextElementSibling() != null
                && th.nextElementSibling().is("td.num")).map(org.jsoup.nodes.Element::text).toList();
    }

    /** Adds dead load (psf) to the first floored bay of the level, through the store as the bay editor does. */
    private static void oneBayHeavier(String level, double more) {
        long p = server.project();
        var store = server.store;
        StoredLevel l = store.levels().findByProject(p).stream().filter(x -> x.info().name().equals(level)).findFirst().orElseThrow();
        Bay b = store.bays().findByLevel(p, l.id()).stream().filter(x -> !x.opening()).findFirst().orElseThrow();
        store.bays().assign(Editor.DEMO, p, store.projects().find(p).version(), l.id(), new BayAssignment(List.of(new Cell(b.col(), b.row())),
                false, b.occupancy(), b.deadLoad() + more, b.framing(), b.cantilevers()));
    }
}
