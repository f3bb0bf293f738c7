package com.baysheet.e2e;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The shipped jar's {@code warm-up} under {@code -XX:ArchiveClassesAtExit} leaves a class archive, and a server
 * started with {@code -XX:SharedArchiveFile} takes its classes from it (docs/deploy.md, a shorter start) and
 * serves as usual; the warm-up's throw-away directory is gone when it ends.
 */
class StartArchiveIT {
    @TempDir
    Path dir;

    @Test
    void theWarmUpLeavesAnArchiveThatAServerStartsFrom() throws Exception {
        Path archive = dir.resolve("baysheet.jsa"), tmp = Files.createDirectories(dir.resolve("tmp"));
        Process warm = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx512m",
                "-XX:ArchiveClassesAtExit=" + archive, "-Xlog:cds=error", "-Djava.io.tmpdir=" + tmp,
                "-jar", ChildServer.jar().toString(), "warm-up")
                .redirectErrorStream(true).redirectOutput(dir.resolve("warm-up.log").toFile()).start();
        assertThat(warm.waitFor(180, TimeUnit.SECONDS)).as("warm-up ends").isTrue();
        String log = Files.readString(dir.resolve("warm-up.log"));
        assertThat(warm.exitValue()).as(log).isZero();
        assertThat(log).contains("warm-up done");
        assertThat(Files.size(archive)).as("archive written").isGreaterThan(1_000_000);
        try (var left = Files.list(tmp)) {
            assertThat(left.filter(p -> p.getFileName().toString().startsWith("baysheet-warm-up")).toList())
                    .as("the warm-up's directory removed").isEmpty();
        }

        try (ChildServer s = ChildServer.start(Files.createDirectories(dir.resolve("data")), false,
                List.of("-XX:SharedArchiveFile=" + archive, "-Xlog:class+load=info"), List.of(), Map.of())) {
            String served = new OfficeClient(s.base()).get("/setup").body();
            assertThat(served).contains("set-up code");
            // the JVM names the source of each class it loads: ours come from the archive's top layer
            assertThat(s.logText()).containsPattern("com\\.baysheet\\.web\\.Office source: shared objects file \\(top\\)");
        }
    }
}
