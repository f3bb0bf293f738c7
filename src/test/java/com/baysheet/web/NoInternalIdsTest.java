package com.baysheet.web;

import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.store.Results;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.ByteArrayOutputStream;
import java.time.LocalDate;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * No page or sheet shows a member's or a stack's internal id ("L12-c3x7", "L3-bay1x6-b2", "c3x7"): a reader
 * finds a member by its level and grid position. Links may carry ids; the text read never does.
 */
class NoInternalIdsTest {
    static final Pattern ID = Pattern.compile("\\bL\\d+-(?:c|h|v|bay)\\d+x\\d+|\\bc\\d+x\\d+\\b");
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    @Test
    void theDemoPackageReadsWithoutAnInternalId() throws Exception {
        for (var project : List.of(server.alder(), server.deck())) {
            Results.Computed c = server.store.results().of(project.id());
            SheetHeader h = new SheetHeader("Harbor & Pine Structural", project.info().name(), project.info().jobNumber(), "Project package",
                    SheetHeader.NOT_SUBMITTED, null, "", null, "1", null, LocalDate.of(2026, 1, 5));
            // the whole office project, and one level of the SI deck (its sheets are written by the same code)
            CalcPackage whole = project == server.alder() ? FramingSheets.project(h, c.derived(), List.of())
                    : FramingSheets.level(h, c.derived(), c.derived().members().get(0).level(), List.of());
            CalcPackage pkg = whole.withSubmittal(server.store.projects().submittals().find(project.id()));
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            PackageRenderer.checking(pkg, out, PackageRenderer.Progress.NONE);
            try (PDDocument d = Loader.loadPDF(out.toByteArray())) {
                assertNoId(project.info().name() + " package", new PDFTextStripper().getText(d));
            }
        }
    }

    @Test
    void theMemberTakeDownPlanAndSummaryPagesReadWithoutAnInternalId() {
        Results.Computed c = server.store.results().of(server.alder().id());
        String base = "/projects/" + server.alder().id();
        String level = c.derived().members().get(0).level();
        for (DerivedMember m : c.derived().onLevel(level)) assertNoId(m.id(), text(server.get(base + "/members/" + m.id()).body()));
        for (TakeDown t : c.derived().takeDowns()) assertNoId(t.id(), text(server.get(base + "/takedowns/" + t.id()).body()));
        for (String page : List.of("/members", "/takedowns", "/plan", "/schedules"))
            assertNoId(page, text(server.get(base + page).body()));
    }

    @Test
    void thePatternFindsTheIdsItGuardsAgainst() {
        assertThat(ID.matcher("see the column record L2-c1x1").find()).isTrue();
        assertThat(ID.matcher("L3-bay1x6-b2").find()).isTrue();
        assertThat(ID.matcher("stack c3x7").find()).isTrue();
        assertThat(ID.matcher("Column B/2 below Level 2; 4x4 bays").find()).isFalse();
    }

    /** The text a reader sees: tags (and the ids in their links) dropped. */
    static String text(String html) {
        return html.replaceAll("(?s)<script.*?</script>", " ").replaceAll("<[^>]*>", " ");
    }

    private static void assertNoId(String where, String text) {
        Matcher m = ID.matcher(text);
        if (m.find()) {
            int from = Math.max(0, m.start() - 60), to = Math.min(text.length(), m.end() + 20);
            throw new AssertionError(where + " shows the internal id " + m.group() + ": …" + text.substring(from, to).replace('\n', ' ') + "…");
        }
    }
}
