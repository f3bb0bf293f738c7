package com.baysheet.web;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The server's flags: a safe default bind, a database password kept off the command line, the TLS proxy flag. */
class ServerOptionsTest {
    private static final String[] NONE = {};

    @Test
    void bindsToThisMachineOnlyUnlessTheOfficeNetworkIsAskedFor() throws Exception {
        assertThat(ServerOptions.parse(NONE, Map.of()).bind()).isEqualTo("127.0.0.1");
        assertThat(ServerOptions.parse(new String[]{"--bind", "0.0.0.0"}, Map.of()).bind()).isEqualTo("0.0.0.0");
        assertThat(ServerOptions.parse(NONE, Map.of("BAYSHEET_BIND", "0.0.0.0")).bind()).isEqualTo("0.0.0.0");
    }

    @Test
    void theDatabasePasswordComesFromAFileOrTheEnvironmentAndIsNeverPrinted(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("db-password");
        Files.writeString(file, "s3cret from file\n");
        String[] args = {"--db-url", "jdbc:postgresql://db/baysheet?user=baysheet", "--db-password-file", file.toString()};
        ServerOptions fromFile = ServerOptions.parse(args, Map.of());
        assertThat(fromFile.dbPassword()).as("the first line, without its newline").isEqualTo("s3cret from file");
        assertThat(String.join(" ", args)).as("what ps shows").doesNotContain("s3cret");
        assertThat(fromFile.toString()).doesNotContain("s3cret");

        ServerOptions fromEnv = ServerOptions.parse(new String[]{"--db-url", "jdbc:postgresql://db/baysheet?user=baysheet"},
                Map.of("BAYSHEET_DB_PASSWORD", "env s3cret"));
        assertThat(fromEnv.dbPassword()).isEqualTo("env s3cret");
        assertThat(fromEnv.toString()).doesNotContain("s3cret");
        assertThat(ServerOptions.parse(NONE, Map.of("BAYSHEET_DB_PASSWORD_FILE", file.toString())).dbPassword())
                .isEqualTo("s3cret from file");
        assertThat(ServerOptions.parse(NONE, Map.of()).dbPassword()).isNull();

        assertThatThrownBy(() -> ServerOptions.parse(new String[]{"--db-password-file", dir.resolve("missing").toString()}, Map.of()))
                .isInstanceOf(ServerOptions.BadOption.class).hasMessageContaining("--db-password-file").hasMessageContaining("cannot be read");
        Files.writeString(file, "\n");
        assertThatThrownBy(() -> ServerOptions.parse(new String[]{"--db-password-file", file.toString()}, Map.of()))
                .isInstanceOf(ServerOptions.BadOption.class).hasMessageContaining("is empty");
    }

    @Test
    void behindTlsByFlagOrEnvironmentAndOffByDefault() throws Exception {
        assertThat(ServerOptions.parse(NONE, Map.of()).behindTls()).isFalse();
        assertThat(ServerOptions.parse(new String[]{"--behind-tls"}, Map.of()).behindTls()).isTrue();
        assertThat(ServerOptions.parse(NONE, Map.of("BAYSHEET_BEHIND_TLS", "true")).behindTls()).isTrue();
    }

    @Test
    void theSigningKeyLiesBesideTheDataFolderUnlessNamedAndItsPasswordIsNeverPrinted(@TempDir Path dir) throws Exception {
        ServerOptions d = ServerOptions.parse(new String[]{"--data", dir.resolve("data").toString()}, Map.of());
        assertThat(d.signingKey()).isEqualTo(dir.resolve("baysheet-signing.p12").toAbsolutePath());
        assertThat(d.signingKeyNamed()).isFalse();
        assertThat(d.signingKeyPassword()).isEmpty();
        Path pw = dir.resolve("key-password");
        Files.writeString(pw, "k3y pass\n");
        ServerOptions named = ServerOptions.parse(new String[]{"--signing-key", dir.resolve("office.p12").toString(),
                "--signing-key-password-file", pw.toString()}, Map.of());
        assertThat(named.signingKey()).isEqualTo(dir.resolve("office.p12").toAbsolutePath());
        assertThat(named.signingKeyNamed()).isTrue();
        assertThat(named.signingKeyPassword()).isEqualTo("k3y pass");
        assertThat(named.toString()).doesNotContain("k3y pass").contains("signingKeyPassword=(hidden)");
        ServerOptions fromEnv = ServerOptions.parse(NONE, Map.of("BAYSHEET_SIGNING_KEY", dir.resolve("e.p12").toString(),
                "BAYSHEET_SIGNING_KEY_PASSWORD", "from env"));
        assertThat(fromEnv.signingKeyNamed()).isTrue();
        assertThat(fromEnv.signingKeyPassword()).isEqualTo("from env");
        assertThatThrownBy(() -> ServerOptions.parse(new String[]{"--signing-key-password-file", dir.resolve("missing").toString()}, Map.of()))
                .isInstanceOf(ServerOptions.BadOption.class).hasMessageContaining("--signing-key-password-file");
    }

    @Test
    void theSmtpPasswordComesFromAFileOrTheEnvironmentAndIsNeverPrinted(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("smtp-password");
        Files.writeString(file, "mail s3cret\n");
        ServerOptions fromFile = ServerOptions.parse(new String[]{"--smtp-password-file", file.toString()}, Map.of());
        assertThat(fromFile.smtpPassword()).isEqualTo("mail s3cret");
        assertThat(fromFile.toString()).doesNotContain("s3cret").contains("smtpPassword=(hidden)");
        assertThat(ServerOptions.parse(NONE, Map.of("BAYSHEET_SMTP_PASSWORD_FILE", file.toString())).smtpPassword()).isEqualTo("mail s3cret");
        assertThat(ServerOptions.parse(NONE, Map.of("BAYSHEET_SMTP_PASSWORD", "env s3cret")).smtpPassword()).isEqualTo("env s3cret");
        assertThat(ServerOptions.parse(NONE, Map.of()).smtpPassword()).isEmpty();
        assertThatThrownBy(() -> ServerOptions.parse(new String[]{"--smtp-password-file", dir.resolve("missing").toString()}, Map.of()))
                .isInstanceOf(ServerOptions.BadOption.class).hasMessageContaining("--smtp-password-file");
    }
}
