package com.baysheet.notice;

import com.baysheet.engine.InputError;
import com.icegreen.greenmail.configuration.GreenMailConfiguration;
import com.icegreen.greenmail.junit5.GreenMailExtension;
import com.icegreen.greenmail.util.ServerSetupTest;
import jakarta.mail.internet.MimeMessage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.ServerSocket;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Notices sent to an in-process SMTP server (GreenMail), read back as received; a failed send is kept, never thrown. */
class NotifierTest {
    @RegisterExtension
    static final GreenMailExtension smtp = new GreenMailExtension(ServerSetupTest.SMTP.dynamicPort())
            .withConfiguration(GreenMailConfiguration.aConfig().withUser("office@firm.example", "notices", "s3cret pass"));

    private static final Duration WAIT = Duration.ofSeconds(20);

    private static MailSettings plain(boolean on, String user) {
        return new MailSettings(on, "127.0.0.1", smtp.getSmtp().getPort(), MailSettings.Security.NONE, user, "Checks <office@firm.example>", "");
    }

    private static Notice submitted(List<String> sheets, String... to) {
        return new Notice(Notice.Kind.SUBMITTED, "26-014 Pier Street Offices", sheets, "Erin Marsh (EM)",
                "https://calc.firm.example/review/projects/7/queue", List.of(to));
    }

    @Test
    void aNoticeArrivesWithItsSheetsWhoDidItAndWhereToLookAfterAnSmtpLogin() throws Exception {
        List<Notifier.Failure> failures = new ArrayList<>();
        try (Notifier n = new Notifier(() -> plain(true, "notices"), () -> "s3cret pass", Clock.systemUTC(), failures::add)) {
            n.post(submitted(List.of("G1", "B2 · Level 2"), "chris@firm.example", "dana@firm.example"));
            assertThat(n.idle(WAIT)).isTrue();
            assertThat(failures).isEmpty();
            assertThat(n.lastFailure()).isEmpty();
        }
        MimeMessage[] got = smtp.getReceivedMessages();
        assertThat(got).as("one copy per recipient").hasSize(2);
        MimeMessage m = got[0];
        assertThat(m.getSubject()).isEqualTo("26-014 Pier Street Offices: 2 sheets submitted for your check");
        assertThat(m.getFrom()[0].toString()).isEqualTo("Checks <office@firm.example>");
        assertThat(Arrays.stream(m.getAllRecipients()).map(Object::toString)).containsExactly("chris@firm.example", "dana@firm.example");
        String body = ((String) m.getContent()).replace("\r\n", "\n");
        assertThat(body).contains("These 2 sheets were submitted for your check by Erin Marsh (EM) in 26-014 Pier Street Offices:",
                "  G1\n", "  B2 · Level 2\n", "The check queue: https://calc.firm.example/review/projects/7/queue",
                "licensed engineer");
    }

    @Test
    void aWrongPasswordIsAFailureKeptAndHandedOnNeverThrown() {
        AtomicReference<Notifier.Failure> recorded = new AtomicReference<>();
        try (Notifier n = new Notifier(() -> plain(true, "notices"), () -> "wrong", Clock.systemUTC(), recorded::set)) {
            n.post(new Notice(Notice.Kind.RETURNED, "26-014", List.of("G1"), "Chris Vale (CV)", "https://x.example/q", List.of("erin@firm.example")));
            assertThat(n.idle(WAIT)).isTrue();
            assertThat(n.lastFailure()).hasValueSatisfying(f -> {
                assertThat(f.notice()).isEqualTo("26-014: Sheet G1 returned to you with markups");
                assertThat(f.error()).startsWith("through 127.0.0.1:" + smtp.getSmtp().getPort() + " (none (plain smtp)): ")
                        .contains("AuthenticationFailedException");
            });
            assertThat(recorded.get()).isEqualTo(n.lastFailure().orElseThrow());
        }
        assertThat(smtp.getReceivedMessages()).isEmpty();
    }

    @Test
    void aServerNobodyAnswersAtFailsTheSendAndTheNextNoticeStillGoes() throws Exception {
        int closed;
        try (ServerSocket s = new ServerSocket(0)) {
            closed = s.getLocalPort();
        }
        AtomicReference<MailSettings> settings = new AtomicReference<>(
                new MailSettings(true, "127.0.0.1", closed, MailSettings.Security.NONE, "", "office@firm.example", ""));
        try (Notifier n = new Notifier(settings::get, () -> "", Clock.systemUTC(), f -> { })) {
            n.post(submitted(List.of("G1"), "chris@firm.example"));
            assertThat(n.idle(WAIT)).isTrue();
            assertThat(n.lastFailure()).hasValueSatisfying(f -> assertThat(f.error()).contains("127.0.0.1:" + closed, "MailConnectException"));
            // the administrator corrects the port: the settings are read for each notice
            settings.set(plain(true, ""));
            n.post(submitted(List.of("G1"), "chris@firm.example"));
            assertThat(n.idle(WAIT)).isTrue();
        }
        assertThat(smtp.getReceivedMessages()).hasSize(1);
    }

    @Test
    void nothingIsSentWhileNoticesAreOffAndAFailingRecorderIsOnlyLogged() {
        try (Notifier n = new Notifier(() -> plain(false, ""), () -> "", Clock.systemUTC(), f -> { throw new IllegalStateException("db down"); })) {
            n.post(submitted(List.of("G1"), "chris@firm.example"));
            assertThat(n.idle(WAIT)).isTrue();
            assertThat(n.lastFailure()).isEmpty();
        }
        assertThat(smtp.getReceivedMessages()).isEmpty();
        try (Notifier n = new Notifier(() -> { throw new IllegalStateException("db down"); }, () -> "", Clock.systemUTC(),
                f -> { throw new IllegalStateException("db down"); })) {
            n.post(submitted(List.of("G1"), "chris@firm.example"));
            assertThat(n.idle(WAIT)).isTrue();
            assertThat(n.lastFailure()).hasValueSatisfying(f -> assertThat(f.error()).contains("could not be read", "db down"));
        }
    }

    @Test
    void aBatchNoticeListsThirtySheetsAndCountsTheRest() {
        List<String> sheets = new ArrayList<>();
        for (int i = 1; i <= 32; i++) sheets.add("B" + i);
        Notice n = new Notice(Notice.Kind.APPROVED, "26-014", sheets, "Chris Vale (CV)", "https://x.example/q", List.of("dana@firm.example"));
        assertThat(n.subject()).isEqualTo("26-014: 32 sheets approved, ready to issue");
        assertThat(n.text()).contains("  B30\n", "  and 2 more\n").doesNotContain("B31");
        assertThat(new Notice(Notice.Kind.APPROVED, "26-014", List.of("B1"), "CV", "https://x.example/q", List.of("d@firm.example")).text())
                .startsWith("This sheet was approved, ready to issue by CV in 26-014:");
    }

    @Test
    void settingsNameTheFieldTheyRefuse() {
        assertThatThrownBy(() -> new MailSettings(true, "", 587, MailSettings.Security.STARTTLS, "", "office@firm.example", ""))
                .isInstanceOf(InputError.class).hasMessageStartingWith("host: ");
        assertThatThrownBy(() -> new MailSettings(false, "mail.firm.example", 0, MailSettings.Security.TLS, "", "", ""))
                .isInstanceOf(InputError.class).hasMessageStartingWith("port: ");
        assertThatThrownBy(() -> new MailSettings(true, "mail.firm.example", 465, MailSettings.Security.TLS, "", "not an address", ""))
                .isInstanceOf(InputError.class).hasMessageStartingWith("fromAddress: ");
        assertThatThrownBy(() -> new MailSettings(false, "mail firm", 25, MailSettings.Security.NONE, "", "", ""))
                .isInstanceOf(InputError.class).hasMessageStartingWith("host: ");
        assertThatThrownBy(() -> new MailSettings(false, "mail.firm.example", 25, MailSettings.Security.NONE, "", "", "calc.firm.example"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("officeAddress: ");
        assertThat(new MailSettings(false, "", 25, MailSettings.Security.NONE, "", "", "https://calc.firm.example/").link("/review/queue"))
                .isEqualTo("https://calc.firm.example/review/queue");
        assertThatThrownBy(() -> MailSettings.Security.parse("security", "SSLv3"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("security: ");
        assertThat(MailSettings.OFF.on()).isFalse();
    }

    @Test
    void starttlsIsRequiredNotMerelyTriedAndTlsChecksTheServersName() {
        var starttls = Mailer.properties(new MailSettings(true, "mail.firm.example", 587, MailSettings.Security.STARTTLS, "u", "o@firm.example", ""));
        assertThat(starttls).containsEntry("mail.smtp.starttls.enable", "true").containsEntry("mail.smtp.starttls.required", "true")
                .containsEntry("mail.smtp.auth", "true").containsEntry("mail.smtp.ssl.checkserveridentity", "true");
        var tls = Mailer.properties(new MailSettings(true, "mail.firm.example", 465, MailSettings.Security.TLS, "", "o@firm.example", ""));
        assertThat(tls).containsEntry("mail.smtp.ssl.enable", "true").containsEntry("mail.smtp.auth", "false")
                .doesNotContainKey("mail.smtp.starttls.enable");
        assertThat(tls.get("mail.smtp.timeout")).isEqualTo(String.valueOf(Mailer.TIMEOUT_MS));
    }
}
