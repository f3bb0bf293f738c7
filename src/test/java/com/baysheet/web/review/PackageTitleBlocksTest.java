package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.PackageScope;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.TextNode;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every page of a package and of a checking copy states what happened to the sheet on it: a member checked and
 * issued on its own says so (its checker, its revision) in a checking copy of its package; a member nobody
 * submitted says "not submitted", "not yet checked", "not issued", even in an issued package checked by someone
 * else; a package never issued never says "issued".
 */
class PackageTitleBlocksTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void eachPageStatesItsOwnSheetsCheckAndRevision() throws Exception {
        Client eng = server.as("quentin", Role.ENGINEER);       // QUEN
        Client memberChecker = server.as("walter", Role.CHECKER);   // WALT
        Client packageChecker = server.as("yolanda", Role.CHECKER); // YOLA
        DerivedMember member = server.member();
        var d = server.store.results().of(server.project()).derived();
        String checked = server.mark().text();
        String untouched = PackageScope.ofLevel(member.level()).marks(d, server.store.marks().of(server.project(), d)).stream()
                .map(m -> m.text()).filter(t -> !t.equals(checked)).findFirst().orElseThrow();
        walk(eng, memberChecker, server.sheetPath());
        LocalDate today = LocalDate.now(server.clock);

        List<String> copy = pages(eng.getBytes(job(eng, member.level()) + "/file").body());
        String own = pageOf(copy, checked);
        assertThat(own).contains("CHECK PRINT — NOT FOR CONSTRUCTION", "Prepared by\nQUEN", "Checked by\nWALT", "Revision\n0\n", "Issue date\n" + today)
                .doesNotContain("not yet checked", "Revision\ncheck");
        String none = pageOf(copy, untouched);
        assertThat(none).contains("Prepared by\nnot submitted", "Checked by\nnot yet checked", "Revision\nnot issued",
                "Issue date\nnot issued").doesNotContain("QUEN", "WALT");
        String cover = copy.get(0);
        assertThat(cover).contains("Revision 1, not issued: checking copy printed " + today, "Issue date\nnot issued",
                "Printed " + today).doesNotContainPattern("issued \\d{4}-");
        assertThat(copy.get(copy.size() - 1)).contains("Revision log").doesNotContainPattern("(?m)/\\s*$");

        String pkg = "/review/projects/" + server.project() + "/packages/" + PackageScope.ofLevel(member.level()).key();
        walk(eng, packageChecker, pkg);
        String pdfPath = Html.one(eng.get(pkg).body(), "a[href$=/issued.pdf]").attr("href");
        List<String> issued = pages(eng.getBytes(pdfPath).body());
        assertThat(issued.get(0)).contains("Revision 1, issued " + today, "YOLA").doesNotContain("not issued");
        own = pageOf(issued, checked);
        assertThat(own).contains("Checked by\nWALT", "Revision\n0\n", "ISSUED · " + member.level() + " package · Rev 1 · " + today)
                .doesNotContain("YOLA");
        none = pageOf(issued, untouched);
        assertThat(none).contains("Checked by\nnot yet checked", "Revision\nnot issued", "Prepared by\nnot submitted")
                .doesNotContain("YOLA", "QUEN");
        assertThat(issued.get(issued.size() - 1)).contains("First issue", "QUEN / YOLA");
    }

    @Test
    void aSheetsCheckingCopyIsNotIssuedAndSaysWhenItWasPrinted() throws IOException {
        Client eng = server.as("ursula", Role.ENGINEER);
        String text = pages(eng.getBytes(server.sheetPath() + "/checking.pdf").body()).get(0);
        LocalDate today = LocalDate.now(server.clock);
        assertThat(text).contains("CHECK PRINT — NOT FOR CONSTRUCTION", "Issue date\nnot issued", "Printed " + today)
                .doesNotContain("Issue date\n" + today);
    }

    /** Submitted by one, approved and issued by another, through the pages' own forms. */
    private static void walk(Client preparer, Client checker, String sheet) {
        String html = preparer.get(sheet).body();
        assertThat(preparer.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = checker.get(sheet).body();
        assertThat(checker.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = checker.get(sheet).body();
        assertThat(checker.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")), Map.entry("description", "First issue"))).statusCode()).isEqualTo(303);
    }

    /** Starts a checking copy of the level's package and waits (bounded) for the worker. */
    private static String job(Client c, String level) throws InterruptedException {
        String base = "/projects/" + server.project() + "/packages";
        String job = c.post(base, List.of(Map.entry("scope", level))).headers().firstValue("Location").orElseThrow();
        JsonNode state = Pages.finished(c, job);
        assertThat(state.path("error")).as("the job's error").isEqualTo(TextNode.valueOf(""));
        return job;
    }

    /** The first page whose title block is about this subject. */
    private static String pageOf(List<String> pages, String subject) {
        return pages.stream().filter(p -> p.contains("Subject\n" + subject + "\n")).findFirst()
                .orElseThrow(() -> new AssertionError("no page about " + subject));
    }

    private static List<String> pages(byte[] pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            List<String> out = new ArrayList<>();
            PDFTextStripper s = new PDFTextStripper();
            for (int p = 1; p <= d.getNumberOfPages(); p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                out.add(s.getText(d));
            }
            return out;
        }
    }
}
