package com.baysheet;

import com.baysheet.store.Database;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.ServerOptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assumptions.assumeThat;

/** The server as {@code main} starts it: what it prints for the person at the console, and the files it makes. */
class AppStartTest {
    @Test
    void aFirstStartMakesAnOwnerOnlyDataFolderAndPrintsWhereItListensAndTheSetUpCode(@TempDir Path dir) throws Exception {
        assumeThat(FileSystems.getDefault().supportedFileAttributeViews()).as("POSIX permissions").contains("posix");
        Path data = dir.resolve("data");
        List<String> console = new ArrayList<>();
        try (App.Running r = App.start(ServerOptions.parse(new String[]{"--port", "0", "--data", data.toString()}, Map.of()), console::add)) {
            assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(data))).isEqualTo("rwx------");
            assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(data.resolve("baysheet.mv.db")))).isEqualTo("rw-------");
            assertThat(console).contains("listening on 127.0.0.1:" + r.app().port()
                    + " (this machine only; --bind 0.0.0.0 for the office network), database " + data);
            String code = r.office().setupCode().code();
            assertThat(console).filteredOn(l -> l.startsWith("set-up code: ")).singleElement().asString().contains(code);
            assertThat(code).hasSize(8).matches("[23456789ABCDEFGHJKMNPQRSTUVWXYZ]{8}");
        }
    }

    @Test
    void anExistingWorldReadableFolderIsTightenedAtStart(@TempDir Path dir) throws Exception {
        assumeThat(FileSystems.getDefault().supportedFileAttributeViews()).contains("posix");
        Path data = Files.createDirectories(dir.resolve("old"));
        Files.setPosixFilePermissions(data, PosixFilePermissions.fromString("rwxr-xr-x"));
        Database.prepareDataDir(data);
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(data))).isEqualTo("rwx------");
    }

    @Test
    void thePasswordFromAFileReachesTheDatabaseWithoutTheCommandLineOrTheConsole(@TempDir Path dir) throws Exception {
        String secret = "kept off the command line 42";
        String url = "jdbc:h2:file:" + dir.resolve("pw").resolve("baysheet") + ";USER=office;MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE";
        Database.open(url, secret).close(); // an H2 file is made with the password it is first opened with
        assertThatThrownBy(() -> Database.open(url, "not the password")).hasStackTraceContaining("Wrong user name or password");
        Path file = dir.resolve("db-password");
        Files.writeString(file, secret + "\n");
        String[] args = {"--port", "0", "--data", dir.resolve("pw").toString(), "--db-url", url, "--db-password-file", file.toString()};
        List<String> console = new ArrayList<>();
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of()), console::add)) {
            assertThat(r.office().accounts().logins().setupDone()).as("the database answered").isFalse();
        }
        assertThat(String.join(" ", args)).doesNotContain(secret);
        assertThat(String.join("\n", console)).doesNotContain(secret);
    }

    @Test
    void theDemoAddsAnInventedEngineerAndCheckerWhosePrintedPasswordsWork(@TempDir Path dir) throws Exception {
        List<String> console = new ArrayList<>();
        String[] args = {"--port", "0", "--data", dir.resolve("demo").toString(), "--demo"};
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of()), console::add)) {
            for (String who : List.of("mquenby", "afairweather")) {
                Matcher m = Pattern.compile("demo account .* " + who + " password ([A-Z0-9]{12})$").matcher(
                        console.stream().filter(l -> l.contains(" " + who + " ")).findFirst().orElse(""));
                assertThat(m.find()).as(who + " printed in " + console).isTrue();
                SignedIn in = r.office().accounts().logins().login(who, m.group(1), "127.0.0.1", null);
                assertThat(in.user().username()).isEqualTo(who);
            }
            assertThat(console).anySatisfy(l -> assertThat(l).contains("demo account (invented"));
        }
        console.clear();
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of()), console::add)) {
            assertThat(console).as("a second start adds nobody and shows no password")
                    .anySatisfy(l -> assertThat(l).contains("mquenby exists already")).noneMatch(l -> l.contains("password ")
                            && !l.contains("not shown"));
        }
    }

    @Test
    void theSigningKeyIsMadeOnceBesideTheDataFolderAndReusedWithItsFingerprintPrinted(@TempDir Path dir) throws Exception {
        Path data = dir.resolve("data");
        String[] args = {"--port", "0", "--data", data.toString()};
        List<String> first = new ArrayList<>(), second = new ArrayList<>();
        String fingerprint;
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of()), first::add)) {
            fingerprint = r.office().issuing().signingKey().fingerprint();
        }
        Path key = dir.resolve("baysheet-signing.p12");
        assertThat(key).isRegularFile();
        try (var inData = Files.walk(data)) {
            assertThat(inData.filter(f -> f.toString().endsWith(".p12"))).as("nothing of the key in the data folder").isEmpty();
        }
        byte[] made = Files.readAllBytes(key);
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of()), second::add)) {
            assertThat(r.office().issuing().signingKey().fingerprint()).isEqualTo(fingerprint);
        }
        assertThat(Files.readAllBytes(key)).as("read, not made again").isEqualTo(made);
        assertThat(first).contains("signing key made at " + key + ": keep a copy of it apart from the database backups");
        assertThat(first).anySatisfy(l -> assertThat(l).contains("signing issued PDFs with " + key, "SHA-256 fingerprint " + fingerprint));
        assertThat(second).anySatisfy(l -> assertThat(l).contains("signing issued PDFs with " + key, "SHA-256 fingerprint " + fingerprint))
                .noneMatch(l -> l.startsWith("signing key made"));
    }

    @Test
    void aNamedSigningKeyIsReadWithItsPasswordFromTheEnvironmentAndAMissingOneStopsTheStart(@TempDir Path dir) throws Exception {
        Path key = dir.resolve("office.p12");
        String fingerprint = com.baysheet.sheet.signing.OfficeKey.readOrCreate(key, "s3cret".toCharArray(), "Harbor Structural",
                java.time.Clock.systemUTC()).fingerprint();
        String[] args = {"--port", "0", "--data", dir.resolve("data").toString(), "--signing-key", key.toString()};
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of("BAYSHEET_SIGNING_KEY_PASSWORD", "s3cret")), l -> {})) {
            assertThat(r.office().issuing().signingKey().fingerprint()).isEqualTo(fingerprint);
        }
        assertThat(dir.resolve("baysheet-signing.p12")).as("no key made when one is named").doesNotExist();
        String[] missing = {"--port", "0", "--data", dir.resolve("data").toString(), "--signing-key", dir.resolve("none.p12").toString()};
        assertThatThrownBy(() -> App.start(ServerOptions.parse(missing, Map.of()), l -> {}))
                .hasMessageContaining("none.p12").hasMessageContaining("does not exist");
        assertThatThrownBy(() -> App.start(ServerOptions.parse(args, Map.of("BAYSHEET_SIGNING_KEY_PASSWORD", "wrong")), l -> {}))
                .hasMessageContaining("wrong password");
    }

    @Test
    void theOfficesOwnKeyReadBesideTheDatabaseStopsTheStartWithItsReasonWhenItsPasswordIsWrong(@TempDir Path dir) throws Exception {
        // the key beside the data folder is read while the database opens: a refusal still stops the start, saying why
        Path key = dir.resolve("baysheet-signing.p12");
        com.baysheet.sheet.signing.OfficeKey.readOrCreate(key, "kept apart".toCharArray(), "Harbor Structural", java.time.Clock.systemUTC());
        String[] args = {"--port", "0", "--data", dir.resolve("data").toString()};
        assertThatThrownBy(() -> App.start(ServerOptions.parse(args, Map.of("BAYSHEET_SIGNING_KEY_PASSWORD", "not it")), l -> {}))
                .isInstanceOf(com.baysheet.sheet.signing.OfficeKey.Unusable.class).hasMessageContaining("wrong password");
        try (App.Running r = App.start(ServerOptions.parse(args, Map.of("BAYSHEET_SIGNING_KEY_PASSWORD", "kept apart")), l -> {})) {
            assertThat(r.office().issuing().signingKey().fingerprint())
                    .isEqualTo(com.baysheet.sheet.signing.OfficeKey.read(key, "kept apart".toCharArray()).fingerprint());
        }
    }
}
