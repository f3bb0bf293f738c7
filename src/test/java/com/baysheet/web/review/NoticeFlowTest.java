package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetState;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import com.icegreen.greenmail.junit5.GreenMailExtension;
import com.icegreen.greenmail.util.ServerSetupTest;
import jakarta.mail.internet.MimeMessage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.ServerSocket;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * E-mail notices of review steps through the office's SMTP server (GreenMail in this process): set up on the
 * administration page, sent after each step to the people it concerns, one per person for a batch, nothing while off,
 * and a failed send shown on the page while the step stands.
 */
class NoticeFlowTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();
    @RegisterExtension
    static final GreenMailExtension smtp = new GreenMailExtension(ServerSetupTest.SMTP.dynamicPort());

    private static final String OFFICE = "http://calc.firm.example";

    private static String path(MarkSheets.MarkSheet s) { return "/review/projects/" + server.project() + "/marks/" + s.mark().id(); }

    private static MarkSheets.MarkSheet sheet(int i) {
        var c = server.store.results().of(server.project());
        return server.store.marks().of(server.project(), c.derived()).all().stream().filter(MarkSheets.MarkSheet::stored).toList().get(i);
    }

    private static void act(Client c, MarkSheets.MarkSheet s, String action) {
        String html = c.get(path(s)).body();
        assertThat(c.post(path(s) + "/" + action, List.of(Map.entry("version", version(html, "/" + action)))).statusCode()).isEqualTo(303);
    }

    private static void settings(Client admin, boolean on, int port) {
        String page = admin.get("/admin/mail").body();
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(Map.entry("version", version(page, "/admin/mail")),
                Map.entry("host", "127.0.0.1"), Map.entry("port", String.valueOf(port)), Map.entry("security", "NONE"),
                Map.entry("username", ""), Map.entry("fromAddress", "Checks <checks@firm.example>"), Map.entry("officeAddress", OFFICE)));
        if (on) f.add(Map.entry("on", "on"));
        assertThat(admin.post("/admin/mail", f).statusCode()).isEqualTo(303);
    }

    private static void address(Client admin, Client who, String email) {
        assertThat(admin.post("/admin/mail/addresses/" + who.user.id(), List.of(Map.entry("email", email))).statusCode()).isEqualTo(303);
    }

    /** The messages received since the last call, once the notices posted so far are dealt with. */
    private static List<MimeMessage> received() throws Exception {
        assertThat(server.office.notifier().idle(Duration.ofSeconds(20))).isTrue();
        List<MimeMessage> got = List.of(smtp.getReceivedMessages());
        smtp.purgeEmailFromAllMailboxes();
        return got;
    }

    private static String body(MimeMessage m) throws Exception {
        return ((String) m.getContent()).replace("\r\n", "\n");
    }

    private static List<String> to(MimeMessage m) throws Exception {
        return Arrays.stream(m.getAllRecipients()).map(Object::toString).toList();
    }

    @Test
    void eachStepTellsThePeopleItConcernsAndABatchTellsEachOnce() throws Exception {
        Client admin = server.as("admin", Role.ADMINISTRATOR), eng = server.as("enzo", Role.ENGINEER),
                chk = server.as("cleo", Role.CHECKER), other = server.as("dana", Role.CHECKER);
        address(admin, eng, "enzo@firm.example");
        address(admin, chk, "cleo@firm.example");
        address(admin, other, "dana@firm.example");
        settings(admin, true, smtp.getSmtp().getPort());
        String job = server.store.projects().find(server.project()).info().jobNumber();

        MarkSheets.MarkSheet a = sheet(0), b = sheet(1), c = sheet(2);
        act(eng, a, "submit");
        List<MimeMessage> got = received();
        assertThat(got).hasSize(2); // one copy per recipient
        assertThat(to(got.get(0))).containsExactlyInAnyOrder("cleo@firm.example", "dana@firm.example");
        assertThat(got.get(0).getSubject()).startsWith(job + " ").endsWith(": Sheet " + a.text() + " submitted for your check");
        assertThat(body(got.get(0))).contains("by enzo (" + eng.user.initials() + ")",
                "The check queue: " + OFFICE + "/review/projects/" + server.project() + "/queue");

        chk.post(path(a) + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "Check the span")));
        act(chk, a, "return");
        got = received();
        assertThat(got).hasSize(1);
        assertThat(to(got.get(0))).containsExactly("enzo@firm.example");
        assertThat(got.get(0).getSubject()).endsWith(": Sheet " + a.text() + " returned to you with markups");

        // a batch approve: the other checker hears of both sheets at once, the approver and the preparer not at all
        act(eng, b, "submit");
        act(eng, c, "submit");
        received();
        String queue = chk.get("/review/projects/" + server.project() + "/queue?show=all").body();
        List<Map.Entry<String, String>> ticks = new ArrayList<>();
        for (MarkSheets.MarkSheet s : List.of(b, c))
            ticks.add(Map.entry("sheet", Html.one(queue, "table#queue tr[data-mark=" + s.mark().id() + "] input[name=sheet]").val()));
        assertThat(chk.post("/review/projects/" + server.project() + "/batch/approve", ticks).statusCode()).isEqualTo(303);
        got = received();
        assertThat(got).hasSize(1);
        assertThat(to(got.get(0))).containsExactly("dana@firm.example");
        assertThat(got.get(0).getSubject()).endsWith(": 2 sheets approved, ready to issue");
        assertThat(body(got.get(0))).contains("  " + b.text() + "\n", "  " + c.text() + "\n");
    }

    @Test
    void aFailedSendLeavesTheStepDoneAndIsShownOnTheAdministrationPageAndOffSendsNothing() throws Exception {
        Client admin = server.as("admin", Role.ADMINISTRATOR), eng = server.as("enzo", Role.ENGINEER), chk = server.as("cleo", Role.CHECKER);
        address(admin, chk, "cleo@firm.example");
        int closed;
        try (ServerSocket s = new ServerSocket(0)) {
            closed = s.getLocalPort();
        }
        settings(admin, true, closed);
        MarkSheets.MarkSheet s = sheet(4);
        act(eng, s, "submit");
        assertThat(received()).isEmpty();
        assertThat(server.office.review().reviews().view(s.ref(server.project())).current().revision().state())
                .as("the step stands").isEqualTo(SheetState.SUBMITTED);
        String page = admin.get("/admin/mail").body();
        assertThat(Html.text(page, "#failed-notice")).endsWith(": Sheet " + s.text() + " submitted for your check");
        assertThat(Html.text(page, "#failure")).contains("127.0.0.1:" + closed, "MailConnectException");
        assertThat(server.office.review().mail().get().lastFailure()).as("kept in the store too").isPresent();

        settings(admin, false, smtp.getSmtp().getPort());
        act(eng, sheet(5), "submit");
        assertThat(received()).as("notices off").isEmpty();
    }

    @Test
    void theSettingsFormNamesTheFieldItRefusesAndStoresNothing() {
        Client admin = server.as("admin", Role.ADMINISTRATOR);
        long before = server.office.review().mail().get().version();
        String page = admin.get("/admin/mail").body();
        var r = admin.post("/admin/mail", List.of(Map.entry("version", version(page, "/admin/mail")), Map.entry("on", "on"),
                Map.entry("host", "127.0.0.1"), Map.entry("port", "25"), Map.entry("security", "NONE"),
                Map.entry("username", ""), Map.entry("fromAddress", "not an address"), Map.entry("officeAddress", "")));
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(Html.shown(r.body())).contains("must be one e-mail address");
        assertThat(server.office.review().mail().get().version()).isEqualTo(before);
        assertThat(admin.post("/admin/mail/addresses/" + admin.user.id(), List.of(Map.entry("email", "nobody"))).statusCode()).isEqualTo(400);
        assertThat(admin.post("/admin/mail/addresses/" + admin.user.id(), List.of()).statusCode()).as("the field missing").isEqualTo(400);
        assertThat(server.as("cleo", Role.CHECKER).get("/admin/mail").statusCode()).as("the administrator's alone").isEqualTo(403);
    }
}
