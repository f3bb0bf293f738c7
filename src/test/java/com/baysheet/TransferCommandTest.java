package com.baysheet;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** The transfer command's arguments: each mistake named in one line before anything is opened. */
class TransferCommandTest {
    private static final String PG = "jdbc:postgresql://127.0.0.1:1/none";

    private record Run(int code, String err) {}

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(), err = new ByteArrayOutputStream();
        int code = TransferCommand.run(args, Map.of(), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertThat(out.size()).as("nothing reported as done").isZero();
        return new Run(code, err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void eachBadArgumentIsNamed() {
        assertThat(run().err).startsWith("baysheet: --from is missing");
        assertThat(run("--from", "data").err).startsWith("baysheet: --to is missing");
        assertThat(run("--from").err).startsWith("baysheet: --from needs a value");
        assertThat(run("--from", "data", "--to", "--from").err).startsWith("baysheet: --to needs a value");
        assertThat(run("--from", "data", "--into", PG).err).startsWith("baysheet: unknown argument --into");
        assertThat(run("--from", "data", "--to", "jdbc:h2:mem:x;PASSWORD=secret").err)
                .startsWith("baysheet: --to must be a PostgreSQL JDBC URL").doesNotContain("secret");
        assertThat(run("--from", "data").code).isEqualTo(TransferCommand.USAGE);
    }

    @Test
    void aDirectoryWithoutAnOfficeIsRefusedBeforeTheTargetIsTouched(@TempDir Path empty) {
        Run r = run("--from", empty.toString(), "--to", PG);
        assertThat(r.code).isEqualTo(TransferCommand.SOURCE);
        assertThat(r.err.strip()).isEqualTo("baysheet: transfer refused: no readable Baysheet database in " + empty
                + " (expected baysheet.mv.db)");
    }

    @Test
    void anUnreachableTargetIsOneLine(@TempDir Path dir) throws Exception {
        com.baysheet.store.Database.prepareDataDir(dir);
        com.baysheet.store.Database.open(com.baysheet.store.Database.h2Url(dir)).close();
        Run r = run("--from", dir.toString(), "--to", PG);
        assertThat(r.code).isEqualTo(TransferCommand.TARGET);
        assertThat(r.err).startsWith("baysheet: transfer refused: cannot connect to the target: ").hasLineCount(1);
    }
}
