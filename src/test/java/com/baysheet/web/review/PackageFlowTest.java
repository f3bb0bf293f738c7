package com.baysheet.web.review;

import com.baysheet.store.Editor;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.model.Bay;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.PackageScope;
import com.baysheet.store.BayAssignment;
import com.baysheet.store.Cell;
import com.baysheet.store.StoredLevel;
import com.baysheet.web.TestLogin.Client;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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
        assertThat(first(list, "id=\"packages\">(?s)(.*?)</table>")).contains("Project package", scope.title(), "href=\"" + pkg + "\"");

        String html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("being prepared");
        assertThat(first(html, "id=\"manifest\">(?s)(.*?)</table>")).contains(member.name());
        assertThat(eng.post(pkg + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);

        html = chk.get(pkg).body();
        assertThat(state(html)).isEqualTo("submitted for check");
        assertThat(html).contains("<option value=\"input:" + member.id() + "\">");
        assertThat(eng.post(pkg + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "mine"))).statusCode())
                .as("the preparer does not mark up their own package").isEqualTo(403);
        assertThat(chk.post(pkg + "/markups", List.of(Map.entry("target", "step:R"), Map.entry("text", "no steps"))).statusCode())
                .as("a package's markups target its sheets or the whole").isEqualTo(400);
        assertThat(chk.post(pkg + "/markups", List.of(Map.entry("target", "input:" + member.id()),
                Map.entry("text", "Check the girder reaction on this beam"))).statusCode()).isEqualTo(303);
        html = chk.get(pkg).body();
        assertThat(html.indexOf("id=\"input-" + member.id() + "\"")).as("the markup sits in its sheet's row")
                .isPositive().isLessThan(html.indexOf("Check the girder reaction on this beam"));
        assertThat(chk.post(pkg + "/return", List.of(Map.entry("version", version(html, "/return")))).statusCode()).isEqualTo(303);

        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("returned with markups");
        String markup = first(html, "id=\"markup-(\\d+)\"");
        eng.post(pkg + "/markups/" + markup + "/reply", List.of(Map.entry("text", "Reaction taken from the girder sheet")));
        html = eng.get(pkg).body();
        assertThat(eng.post(pkg + "/resubmit", List.of(Map.entry("version", version(html, "/resubmit")))).statusCode()).isEqualTo(303);

        html = chk.get(pkg).body();
        assertThat(state(html)).isEqualTo("resubmitted");
        assertThat(html).contains("Reaction taken from the girder sheet");
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
        assertThat(chk.post(pkg + "/issue", List.of(Map.entry("version", version(html, "/issue")))).statusCode()).isEqualTo(303);

        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("issued");
        String sha = first(html, "SHA-256 ([0-9a-f]{64})");
        String pdfPath = first(html, "href=\"(/review/revisions/\\d+/issued\\.pdf)\"");
        HttpResponse<byte[]> pdf = eng.getBytes(pdfPath);
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("Content-Type").orElse("")).startsWith("application/pdf");
        assertThat(Tokens.sha256(pdf.body())).isEqualTo(sha);
        assertThat(eng.getBytes(pdfPath).body()).as("the frozen bytes, every time").isEqualTo(pdf.body());
        try (PDDocument doc = Loader.loadPDF(pdf.body())) {
            // cover, criteria, index and the level's plan sheet (every member labelled), then the revision log: enough to read
            PDFTextStripper front = new PDFTextStripper();
            front.setEndPage(5);
            PDFTextStripper back = new PDFTextStripper();
            back.setStartPage(doc.getNumberOfPages());
            String text = front.getText(doc) + back.getText(doc);
            assertThat(text).contains(scope.title(), member.name(), "Index of sheets", "Revision log", "First issue",
                    chk.user.initials()).doesNotContain("CHECK PRINT", "CHECKING COPY");
        }
        String verdict = eng.upload("/verify", "pdf", "package.pdf", pdf.body()).body();
        assertThat(verdict).contains("Matches an issued revision", sha, "href=\"" + pkg + "\"");

        Map<String, String> before = fingerprints(member.level());
        oneBayHeavier(member.level(), 15);
        Map<String, String> after = fingerprints(member.level());
        List<String> changed = new ArrayList<>();
        for (DerivedMember m : server.store.results().of(server.project()).derived().onLevel(member.level()))
            if (!before.get(m.id()).equals(after.get(m.id()))) changed.add(m.name());
        assertThat(changed).as("one bay changes some of the level's sheets, not all").isNotEmpty()
                .hasSizeLessThan(after.size());

        // any change posted to the project supersedes at once: here, asking for a checking copy of the package
        assertThat(eng.post("/projects/" + server.project() + "/packages", List.of(Map.entry("scope", member.level())))
                .statusCode()).isEqualTo(303);
        list = eng.get("/review/projects/" + server.project()).body();
        String row = first(list, "(<tr>\\s*<td><a href=\"" + Pattern.quote(pkg) + "\">(?s).*?</tr>)");
        assertThat(row).contains("<td>2</td>", "being prepared");
        html = eng.get(pkg).body();
        assertThat(state(html)).isEqualTo("being prepared");
        assertThat(first(html, "id=\"revisions\">(?s)(.*?)</table>")).contains("superseded");

        String compare = eng.get(pkg + "/compare?from=1&to=2").body();
        assertThat(compare).contains(scope.title());
        String changedInputs = first(compare, "id=\"changed-inputs\">(?s)(.*?)</table>");
        assertThat(names(changedInputs).stream().filter(n -> !n.startsWith("Column take-down")).toList())
                .containsExactlyInAnyOrderElementsOf(changed);
        assertThat(eng.upload("/verify", "pdf", "package.pdf", pdf.body()).body())
                .as("the superseded issue still verifies, as superseded").contains("Matches an issued revision", "superseded");

        String audit = server.as("admin", Role.ADMINISTRATOR).get("/admin/audit").body();
        for (String action : List.of("submit", "markup", "return", "reply", "resubmit", "resolve", "approve", "issue", "supersede"))
            assertThat(audit).contains("<td>" + action + "</td>");
        assertThat(audit).contains(scope.subject());
    }

    private static Map<String, String> fingerprints(String level) {
        Map<String, String> out = new HashMap<>();
        for (DerivedMember m : server.store.results().of(server.project()).derived().onLevel(level))
            out.put(m.id(), CalcFingerprint.of(m.result().record()));
        return out;
    }

    /** The labels in the first column of a comparison table. */
    private static List<String> names(String table) {
        List<String> out = new ArrayList<>();
        Matcher m = Pattern.compile("<th>([^<]*)</th>\\s*<td class=\"num\">").matcher(table);
        while (m.find()) out.add(m.group(1));
        return out;
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
