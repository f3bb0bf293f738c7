package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.project.StoredLevel;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.state;
import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * A file as issued may no longer stand: /verify headlines an issued revision a later issue of its sheet replaced as
 * superseded, naming the revision that is current, and one whose members were deleted as withdrawn; the revision in
 * force reads neither. Each test has its own office, since one deletes a level.
 */
class VerifyStandingTest {
    @Test
    void anOlderRevisionUploadedAfterANewerIssueReadsSupersededAndNamesTheCurrentOne() {
        try (ReviewServer server = new ReviewServer()) {
            Client eng = server.as("gideon", Role.ENGINEER), chk = server.as("harriet", Role.CHECKER);
            byte[] first = issue(server, eng, chk, "First issue");
            server.heavierFloor(5.0); // the calculation changes: the next submission opens revision 1
            byte[] second = issue(server, eng, chk, "Heavier floor");
            assertThat(second).isNotEqualTo(first);

            String old = eng.upload("/verify", "pdf", "rev0.pdf", first).body();
            assertThat(Html.one(old, "section#verdict h2").text())
                    .startsWith("Matches an issued revision, signed by this office")
                    .contains("superseded: revision 1 of this mark is current").doesNotContain("withdrawn");
            assertThat(Html.text(old, "#matches")).contains("revision 0", "(now superseded)", "the current revision is 1");
            assertThat(Html.one(old, "#standing")).isNotNull();
            assertThat(Html.one(old, "section#verdict h2").hasClass("caution")).isTrue();

            String now = eng.upload("/verify", "pdf", "rev1.pdf", second).body();
            assertThat(Html.one(now, "section#verdict h2").text()).isEqualTo("Matches an issued revision, signed by this office");
            assertThat(Html.text(now, "#matches")).contains("revision 1", "(now issued)").doesNotContain("superseded", "withdrawn", "current");
            assertThat(Html.all(now, "#standing")).isEmpty();
            assertThat(Html.one(now, "section#verdict h2").hasClass("caution")).isFalse();
        }
    }

    @Test
    void aWithdrawnSheetsPdfReadsWithdrawn() {
        try (ReviewServer server = new ReviewServer()) {
            Client eng = server.as("erin", Role.ENGINEER), chk = server.as("cody", Role.CHECKER);
            byte[] pdf = issue(server, eng, chk, "First issue");
            assertThat(Html.one(eng.upload("/verify", "pdf", "sheet.pdf", pdf).body(), "section#verdict h2").text())
                    .as("before the delete it stands").isEqualTo("Matches an issued revision, signed by this office");

            long p = server.project();
            String levelName = server.member().level();
            StoredLevel level = server.store.levels().findByProject(p).stream().filter(x -> x.name().equals(levelName)).findFirst().orElseThrow();
            String confirm = "/projects/" + p + "/levels/" + level.id() + "/delete";
            assertThat(eng.post(confirm, List.of(Map.entry("version", version(eng.get(confirm).body(), "/delete")),
                    Map.entry("confirm", "yes"))).statusCode()).isEqualTo(303);

            String said = eng.upload("/verify", "pdf", "sheet.pdf", pdf).body();
            assertThat(Html.one(said, "section#verdict h2").text())
                    .startsWith("Matches an issued revision, signed by this office")
                    .contains("withdrawn: its members were deleted").doesNotContain("superseded");
            assertThat(Html.text(said, "#matches")).contains("(now issued, withdrawn)", "no revision of it is current");
            assertThat(Html.one(said, "#standing")).isNotNull();
        }
    }

    /** Submits, approves and issues the mark's sheet as it is now; the issued copy's bytes. */
    private static byte[] issue(ReviewServer server, Client eng, Client chk, String description) {
        String sheet = server.sheetPath();
        Pages.submitApproveIssue(eng, chk, sheet, description);
        assertThat(state(eng.get(sheet).body())).isEqualTo("issued");
        long issued = server.office.review().reviews().view(server.ref()).current().id();
        return eng.getBytes("/review/revisions/" + issued + "/issued.pdf").body();
    }
}
